package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.REFERENCE_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.array;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.col;
import static org.miscela.examples.ExampleWorkbooks.fitted;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.section;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.widths;

import com.sun.star.awt.Rectangle;
import com.sun.star.awt.Size;
import com.sun.star.beans.XPropertySet;
import com.sun.star.chart.ChartSymbolType;
import com.sun.star.chart.XAxisYSupplier;
import com.sun.star.chart.XChartDocument;
import com.sun.star.chart.XDiagram;
import com.sun.star.container.XNameAccess;
import com.sun.star.document.XEmbeddedObjectSupplier;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheets;
import com.sun.star.table.CellRangeAddress;
import com.sun.star.table.XTableCharts;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.uno.UnoRuntime;
import org.miscela.core.blend.BlendFunctions;
import org.miscela.core.blend.CompositionBasis;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.functions.FlashPoints;
import org.miscela.core.functions.PropertyKind;
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/sanitiser-strength.ods from nothing, through a real office with the built
 * extension installed: an invented small plant makes up ethanol-based hand sanitiser and cleaning solutions from 10
 * to 96 % by volume and wants, for each strength, an estimated flash point for its storage and labelling decisions.
 * The plant and its example classification limits are invented; the two cards are the project's ethanol + water test
 * cards, copied unchanged onto their own sheets: {@link #VLE_CARD} (Redlich–Kister G^E/RT fitted to published VLE
 * data, vapour pressures and ethanol's closed-cup flash point from NFPA 497), named {@link #VLE}, which gives every
 * flash point, and the card fitted to the OIML R 22 densities, named {@link #OIML}, which turns % by volume at 20 °C
 * into mole fractions (it carries the mixture's contraction; the VLE card has no excess volume).
 *
 * <p>Sheets: Strengths (the strength table with the card's and the ideal-solution flash points beside a published
 * list, the user's limits and the comparison with them, the freezing point of ice, the chart), Trace (MIX.TRACE
 * "flash" for one strength), Chart data, VLE card, OIML card. The constants that locate cells are shared with
 * ExamplesIT (0-based rows and columns).
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.SanitiserStrengthWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class SanitiserStrengthWorkbookBuilder {
    static final String FILE = "sanitiser-strength.ods";
    static final String VLE_CARD = "ethanol-water-vle-ice.tsv";
    static final String VLE = "vle";
    static final String OIML = "oiml";
    static final String CHART_NAME = "FlashPointChart";

    /** The strengths of the table, % by volume at 20 °C (the published list's strengths). */
    static final double[] STRENGTHS = {10, 20, 30, 40, 50, 60, 70, 80, 90, 96};
    /**
     * The flash points of aqueous ethanol at those strengths, °C, listed (method not stated) in the table of the
     * Wikipedia article "Ethanol" as quoted in a public mailing-list post (DCHAS-L, 2015); the same list as
     * FlashPointTest's, a rough plausibility check only, not a closed-cup reference.
     */
    static final double[] PUBLISHED = {49, 36, 29, 26, 24, 22, 21, 20, 17, 17};
    static final String PUBLISHED_SOURCE = "the table of the Wikipedia article \"Ethanol\" as quoted in a public "
            + "mailing-list post (DCHAS-L, 28 Jan 2015); the original reference is not named there and the test "
            + "method is not stated";
    /** The invented example limits, °C: not anybody's regulation. */
    static final double LIMIT_1 = 25;
    static final double LIMIT_2 = 45;
    /** The strength whose flash point sheet Trace re-derives, % by volume. */
    static final double TRACE_STRENGTH = 40;
    /** The card's G^E is fitted at 30 to 100 °C: below this, a flash point is an extrapolation. */
    static final double CARD_LOW = 30;

    // --- Strengths: the table (0-based rows and columns)
    static final int TABLE_HEAD_ROW = 6;
    static final int TABLE_LABEL_ROW = 7;
    static final int TABLE_FIRST = 8;
    static final int ROWS = STRENGTHS.length;
    static final int STRENGTH = 0;
    static final int X1 = 1;
    static final int FP_CARD = 2;
    static final int FP_IDEAL = 3;
    static final int FP_PUBLISHED = 4;
    static final int DEVIATION = 5;
    static final int RANGE = 6;
    static final int VERDICT = 7;
    static final int FREEZING = 8;
    /**
     * The strongest blend (% vol) given a freezing point: about 33 % w/w, within the CRC Handbook's checks of the card's
     * extrapolated G^E (FreezingPointTest: 5.6 K too warm at 30 % w/w); stronger blends freeze far below the card's
     * data, where ethanol itself (no melting rows on the card) may crystallise first.
     */
    static final int FREEZING_UP_TO = 40;
    /** The note under the table. */
    static final int TABLE_NOTE_ROW = TABLE_FIRST + ROWS;
    /** The limits: label A..E, value in column {@link #LIMIT_COL}, unit beside it. */
    static final int LIMITS_HEAD_ROW = TABLE_NOTE_ROW + 2;
    static final int LIMIT_1_ROW = LIMITS_HEAD_ROW + 1;
    static final int LIMIT_2_ROW = LIMITS_HEAD_ROW + 2;
    static final int LIMIT_COL = 6;
    static final int LIMITS_NOTE_ROW = LIMITS_HEAD_ROW + 3;
    /** MIX.FLASHMINIMUM asked through MIX.EXPLAIN: its words, merged across the sheet. */
    static final int MINIMUM_ROW = LIMITS_NOTE_ROW + 2;
    static final int CHART_TOP = MINIMUM_ROW + 3;
    static final int CHART_BOTTOM = CHART_TOP + 22;

    // --- Trace
    static final int TRACE_STRENGTH_ROW = 4;
    static final int TRACE_X_ROW = 5;
    static final int TRACE_T_ROW = 6;
    static final int TRACE_TOP = 9;

    // --- Chart data
    static final int PLOT_HEAD = 3;
    static final int PLOT_FIRST = 4;

    private static Formats formats;

    private SanitiserStrengthWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Strengths", "Trace", "Chart data", "VLE card",
                "OIML card");
        formats = new Formats(doc);
        SolventRecoveryWorkbookBuilder.writeCard(doc, sheet(sheets, "VLE card"), VLE_CARD, VLE,
                "Redlich–Kister G^E/RT fitted to published VLE data, with flash point rows", "Every flash point on "
                + "sheets Strengths and Trace uses this card: its G^E/RT for the activity coefficients, its vapour "
                + "pressures, and its 'flash point' rows (ethanol 13 °C closed cup, NFPA 497 (2008); water none). "
                + "Its G^E was fitted at 30 to 100 °C, so flash points below 30 °C are extrapolations, asked for "
                + "openly with extrapolate TRUE.");
        ExampleWorkbooks.writeOimlCard(doc, sheet(sheets, "OIML card"), OIML);
        XSpreadsheet s = sheet(sheets, "Strengths");
        writeStrengths(s);
        writeTrace(sheet(sheets, "Trace"));
        writePlotData(sheet(sheets, "Chart data"));
        addChart(s);
        ExampleWorkbooks.pageSetup(doc);
    }

    /** Widths of columns A..I of Strengths in mm, and the whole. */
    private static final int[] MM = {26, 22, 26, 26, 26, 24, 46, 54, 28};
    private static final int WIDE_MM = java.util.Arrays.stream(MM).sum() * 17 / 20;

    private static String abs(int c, int r) {
        return "$" + col(c) + "$" + (r + 1);
    }

    private static String column(int c) {
        return col(c) + (TABLE_FIRST + 1) + ":" + col(c) + (TABLE_FIRST + ROWS);
    }

    private static String absColumn(int c) {
        return "$" + col(c) + "$" + (TABLE_FIRST + 1) + ":$" + col(c) + "$" + (TABLE_FIRST + ROWS);
    }

    private static void writeStrengths(XSpreadsheet s) throws Exception {
        String last = col(FREEZING);
        text(s, 0, 0, "Brackwell Blending (invented company): estimated flash points of its ethanol + water "
                + "sanitisers and cleaning solutions, 10 to 96 % vol");
        bold(s, "A1", 14);
        fitted(s, "A2:" + last + "2", 1, "INVENTED SCENARIO. The company, its range of strengths and the example "
                + "limits in section 2 are made up to show how MIX.FLASHPOINT, MIX.FLASHMINIMUM and MIX.TRACE work; "
                + "they are no one's real figures. The cards are not invented: sheet 'VLE card' (Redlich–Kister "
                + "G^E/RT fitted to published VLE data, with ethanol's closed-cup flash point from NFPA 497 and the "
                + "melting of ice) and "
                + "sheet 'OIML card' (densities of OIML R 22) are the project's ethanol + water cards, copied "
                + "unchanged with their source rows. The published flash points in column E come from a secondary "
                + "source and are a rough check only.", WIDE_MM);
        band(s, "A2:" + last + "2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        String[] cautions = {
            "FLAMMABLE VAPOUR. Every strength in this table gives off vapour that can ignite; from about 30 % vol "
                    + "upwards the estimated flash point is at or below ordinary room temperature. The vapour is "
                    + "heavier than air, spreads along floors and collects in pits and drains. Keep ignition sources "
                    + "(flames, sparks, hot surfaces, static discharge, non-rated electrical equipment) away from "
                    + "open containers, filling and mixing.",
            "ESTIMATES ONLY. These flash points are model estimates (Liaw's model: Le Chatelier's rule over the "
                    + "vapour by modified Raoult's law), from cards with stated sources and limits. A measured "
                    + "closed-cup flash point, the safety data sheet, local codes and licensed practice prevail "
                    + "over anything this workbook computes.",
            "NEVER use an estimate from this workbook to relax a classification, a storage limit or a label: a "
                    + "measured closed-cup flash point decides, and where none is measured follow your rules' "
                    + "conservative route and the people licensed to apply them.",
        };
        ExampleWorkbooks.cautions(s, last, WIDE_MM, 3, cautions);

        // 1. the strength table
        section(s, TABLE_HEAD_ROW, "1. Flash point by strength (change the blue strengths; each flash point column "
                + "is one array formula)");
        String[] heads = {"ethanol, % vol at 20 °C", "x1, mol/mol (OIML card)",
            "flash point, °C: card's γ (MIX.FLASHPOINT)", "flash point, °C: ideal, γ = 1 (comparison only)",
            "flash point, °C: published (rough check)", "card minus published, K",
            "card's range (G^E fitted 30–100 °C)", "estimate against your limits (a measured value decides)",
            "ice forms at, °C: card's γ (MIX.FREEZINGPOINT; runs warm, see note)"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, TABLE_LABEL_ROW, heads[c]);
        }
        String labels = "A" + (TABLE_LABEL_ROW + 1) + ":" + last + (TABLE_LABEL_ROW + 1);
        head(s, labels);
        prop(s, labels, "IsTextWrapped", Boolean.TRUE);
        prop(s, labels, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        ExampleWorkbooks.rowHeight(s, TABLE_LABEL_ROW, 5 * 460 + 120);
        String l1 = abs(LIMIT_COL, LIMIT_1_ROW);
        String l2 = abs(LIMIT_COL, LIMIT_2_ROW);
        for (int i = 0; i < ROWS; i++) {
            int r = TABLE_FIRST + i;
            String at = String.valueOf(r + 1);
            s.getCellByPosition(STRENGTH, r).setValue(STRENGTHS[i]);
            s.getCellByPosition(X1, r).setFormula("=MIX.CONVERT(" + OIML + ";A" + at + ";\"%vol\";\"x\";20;;;;1)");
            s.getCellByPosition(FP_PUBLISHED, r).setValue(PUBLISHED[i]);
            s.getCellByPosition(DEVIATION, r).setFormula("=" + col(FP_CARD) + at + "-" + col(FP_PUBLISHED) + at);
            s.getCellByPosition(RANGE, r).setFormula("=IF(" + col(FP_CARD) + at + "<" + CARD_LOW
                    + ";\"extrapolated (< 30 °C)\";\"inside 30–100 °C\")");
            String fp = col(FP_CARD) + at;
            s.getCellByPosition(VERDICT, r).setFormula("=IF(OR(ISBLANK(" + l1 + ");ISBLANK(" + l2 + "));"
                    + "\"enter both limits\";IF(" + fp + "<" + l1 + ";\"below limit 1\";IF(" + fp + "<" + l2
                    + ";\"from limit 1 to below limit 2\";\"at or above limit 2\")))");
        }
        band(s, column(STRENGTH), INPUT_COLOUR);
        band(s, column(FP_PUBLISHED), REFERENCE_COLOUR);
        // one array formula per column: a column of x1 values on a two-component card gives one result each
        array(s, column(FP_CARD), "=MIX.FLASHPOINT(" + VLE + ";" + absColumn(X1) + ";\"card\";TRUE)");
        array(s, column(FP_IDEAL), "=MIX.FLASHPOINT(" + VLE + ";" + absColumn(X1) + ";\"ideal\";TRUE)");
        for (int i = 0; i < ROWS; i++) {
            int r = TABLE_FIRST + i;
            // the ice line only where the card's extrapolation stays within reach of the handbook's checks
            s.getCellByPosition(FREEZING, r).setFormula("=IF(A" + (r + 1) + "<=" + FREEZING_UP_TO
                    + ";MIX.FREEZINGPOINT(" + VLE + ";" + col(X1) + (r + 1) + ";;;;TRUE);\"not estimated above "
                    + FREEZING_UP_TO + " % vol\")");
        }
        format(s, FREEZING, "0.0");
        format(s, STRENGTH, "0");
        format(s, X1, "0.0000");
        format(s, FP_CARD, "0.0");
        format(s, FP_IDEAL, "0.0");
        format(s, FP_PUBLISHED, "0");
        format(s, DEVIATION, "+0.0;-0.0;0.0");
        fitted(s, "A" + (TABLE_NOTE_ROW + 1) + ":" + last + (TABLE_NOTE_ROW + 1), TABLE_NOTE_ROW, "Column B: the "
                + "strength at 20 °C as ethanol's mole fraction, by the OIML card (its densities carry the "
                + "contraction on mixing). Columns C and D: MIX.FLASHPOINT with the VLE card's activity coefficients "
                + "and, for comparison only, with γ = 1; ethanol is more volatile in water than an ideal solution "
                + "says, so the ideal estimate is too high and must not be used. Both are asked with extrapolate "
                + "TRUE because most of these flash points lie below 30 °C, where the card's G^E is extrapolated "
                + "(column G says which). Column E: " + PUBLISHED_SOURCE + "; a rough check, not a closed-cup "
                + "reference. Column I: the temperature at which ice starts to form (MIX.FREEZINGPOINT, the card's "
                + "melting rows of ice), again extrapolated from 30 °C: against the CRC Handbook's freezing points "
                + "of aqueous ethanol it runs warm, by 0.1 K at 10 % w/w, 1.5 K at 20 %, 5.6 K at 30 % and 9.1 K at "
                + "40 % w/w (FreezingPointTest), so store below it only with the handbook's or the maker's figures. Above " + FREEZING_UP_TO + " % vol it "
                + "is not estimated: the ice line lies far below the card's data, and ethanol may crystallise first.",
                WIDE_MM);
        band(s, "A" + (TABLE_NOTE_ROW + 1) + ":" + last + (TABLE_NOTE_ROW + 1), REFERENCE_COLOUR);

        // 2. the user's limits
        section(s, LIMITS_HEAD_ROW, "2. Your classification limits (enter the limits your rules name; these "
                + "example values are not a regulation)");
        limit(s, LIMIT_1_ROW, "Limit 1, your rules' stricter class below it (EXAMPLE value)", LIMIT_1);
        limit(s, LIMIT_2_ROW, "Limit 2, your rules' next class below it (EXAMPLE value)", LIMIT_2);
        fitted(s, "A" + (LIMITS_NOTE_ROW + 1) + ":" + last + (LIMITS_NOTE_ROW + 1), LIMITS_NOTE_ROW, "Enter the "
                + "limits your rules name; the example values " + (int) LIMIT_1 + " and " + (int) LIMIT_2 + " °C "
                + "are invented and are not a regulation. Column H compares each ESTIMATED flash point (column C) "
                + "with them. A measured closed-cup flash point decides the class, never the estimate; never use an "
                + "estimate to relax a classification. Near a limit, or where column G says extrapolated, measure.",
                WIDE_MM);
        band(s, "A" + (LIMITS_NOTE_ROW + 1) + ":" + last + (LIMITS_NOTE_ROW + 1), CAUTION_COLOUR);

        // MIX.FLASHMINIMUM: ethanol + water has no minimum flash point; its refusal in words
        text(s, 0, MINIMUM_ROW, "Does some blend flash below pure ethanol? =MIX.FLASHMINIMUM(vle; \"temperature\"; ; "
                + "TRUE) is refused (Err:502); MIX.EXPLAIN gives its words:");
        bold(s, "A" + (MINIMUM_ROW + 1), 10);
        String words = "A" + (MINIMUM_ROW + 2) + ":" + last + (MINIMUM_ROW + 2);
        s.getCellByPosition(0, MINIMUM_ROW + 1).setFormula("=MIX.EXPLAIN(\"MIX.FLASHMINIMUM\";" + VLE
                + ";\"temperature\";;TRUE)");
        ExampleWorkbooks.merge(s, words);
        prop(s, words, "IsTextWrapped", Boolean.TRUE);
        prop(s, words, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        band(s, words, REFERENCE_COLOUR);
        ExampleWorkbooks.rowHeight(s, MINIMUM_ROW + 1, 2 * 460 + 120);
        widths(s, MM);
    }

    private static void limit(XSpreadsheet s, int row, String label, double value) throws Exception {
        text(s, 0, row, label);
        ExampleWorkbooks.merge(s, "A" + (row + 1) + ":" + col(LIMIT_COL - 1) + (row + 1));
        s.getCellByPosition(LIMIT_COL, row).setValue(value);
        text(s, LIMIT_COL + 1, row, "°C (EXAMPLE, not a regulation)");
        band(s, col(LIMIT_COL) + (row + 1), INPUT_COLOUR);
        prop(s, col(LIMIT_COL) + (row + 1), "NumberFormat", formats.key("0.0"));
    }

    private static void format(XSpreadsheet s, int c, String code) throws Exception {
        prop(s, column(c), "NumberFormat", formats.key(code));
    }

    /** The x1 of a strength by the OIML card, as MIX.CONVERT gives it (for sizing the trace). */
    static double moleFraction(Card oiml, double strength) {
        CompositionBasis pv = BlendFunctions.basis(oiml, "%vol", 20, BlendFunctions.DEFAULT_BALANCE);
        return BlendFunctions.convert(oiml, BlendFunctions.binary(oiml, strength, pv), pv,
                CompositionBasis.moleFraction(), Extrapolation.AS_CARD)[0];
    }

    private static void writeTrace(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Trace: the flash point of one strength, term by term (MIX.TRACE with property flash), for an auditor");
        bold(s, "A1", 13);
        fitted(s, "A2:C2", 1, "Change the blue strength: x1 comes from the OIML card as on sheet Strengths, the "
                + "flash point from MIX.FLASHPOINT with the VLE card (extrapolate TRUE), and MIX.TRACE lists, at that "
                + "temperature, each liquid's flash point and test method from the card, its vapour pressure there "
                + "and its share of Le Chatelier's sum; the sum is 1 at the flash point. Estimates only: a measured "
                + "closed-cup flash point prevails.", 150);
        band(s, "A2:C2", INVENTED_COLOUR);
        text(s, 0, TRACE_STRENGTH_ROW, "ethanol, % vol at 20 °C (invented choice)");
        s.getCellByPosition(1, TRACE_STRENGTH_ROW).setValue(TRACE_STRENGTH);
        band(s, "B" + (TRACE_STRENGTH_ROW + 1), INPUT_COLOUR);
        text(s, 0, TRACE_X_ROW, "x1, mol/mol (MIX.CONVERT, OIML card)");
        s.getCellByPosition(1, TRACE_X_ROW).setFormula("=MIX.CONVERT(" + OIML + ";B" + (TRACE_STRENGTH_ROW + 1)
                + ";\"%vol\";\"x\";20;;;;1)");
        prop(s, "B" + (TRACE_X_ROW + 1), "NumberFormat", formats.key("0.0000"));
        text(s, 0, TRACE_T_ROW, "flash point, °C (MIX.FLASHPOINT, card's activities)");
        s.getCellByPosition(1, TRACE_T_ROW).setFormula("=MIX.FLASHPOINT(" + VLE + ";B" + (TRACE_X_ROW + 1)
                + ";\"card\";TRUE)");
        prop(s, "B" + (TRACE_T_ROW + 1), "NumberFormat", formats.key("0.00"));
        text(s, 0, TRACE_TOP - 1, "MIX.TRACE(vle; B" + (TRACE_X_ROW + 1) + "; B" + (TRACE_T_ROW + 1)
                + "; \"flash\"; TRUE): label");
        text(s, 1, TRACE_TOP - 1, "value");
        head(s, "A" + TRACE_TOP + ":B" + TRACE_TOP);
        int rows = traceRows();
        array(s, "A" + (TRACE_TOP + 1) + ":B" + (TRACE_TOP + rows), "=MIX.TRACE(" + VLE + ";B" + (TRACE_X_ROW + 1)
                + ";B" + (TRACE_T_ROW + 1) + ";\"flash\";TRUE)");
        prop(s, "A" + (TRACE_TOP + 1) + ":B" + (TRACE_TOP + rows), "IsTextWrapped", Boolean.TRUE);
        prop(s, "A" + (TRACE_TOP + 1) + ":B" + (TRACE_TOP + rows), "VertJustify",
                com.sun.star.table.CellVertJustify2.TOP);
        prop(s, "B" + (TRACE_TOP + 1) + ":B" + (TRACE_TOP + rows), "HoriJustify",
                com.sun.star.table.CellHoriJustify.LEFT);
        widths(s, 105, 110, 4);
    }

    /** The number of rows MIX.TRACE "flash" returns on the VLE card, from the core library itself. */
    static int traceRows() {
        Card vle = TestCards.card(VLE_CARD);
        double x = moleFraction(TestCards.card(ExampleWorkbooks.OIML_CARD), TRACE_STRENGTH);
        double[] z = {x, 1 - x};
        double t = FlashPoints.flashPoint(vle, z, false, Extrapolation.ALLOW);
        return CardFunctions.trace(vle, z, t, PropertyKind.FLASH, Extrapolation.ALLOW).length;
    }

    /** The chart's columns: strength, the two estimates, the published list and the user's two limits. */
    private static void writePlotData(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Brackwell Blending (INVENTED scenario): the columns of the flash point chart on sheet Strengths");
        bold(s, "A1", 12);
        fitted(s, "A2:F2", 1, "Formulas only, gathering for the chart from sheet Strengths: the strength, the "
                + "card's and the ideal-solution flash points, the published list, and the two limits repeated on "
                + "every row so that they draw as horizontal lines.", 150);
        band(s, "A2:F2", INVENTED_COLOUR);
        String[] heads = {"ethanol, % vol", "card's activities", "ideal solution (comparison only)",
            "published list (rough check)", "your limit 1", "your limit 2"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, PLOT_HEAD, heads[c]);
        }
        head(s, "A" + (PLOT_HEAD + 1) + ":F" + (PLOT_HEAD + 1));
        prop(s, "A" + (PLOT_HEAD + 1) + ":F" + (PLOT_HEAD + 1), "IsTextWrapped", Boolean.TRUE);
        ExampleWorkbooks.rowHeight(s, PLOT_HEAD, 3 * 460 + 120);
        String st = "$Strengths.";
        int[] from = {STRENGTH, FP_CARD, FP_IDEAL, FP_PUBLISHED};
        for (int i = 0; i < ROWS; i++) {
            int r = PLOT_FIRST + i;
            for (int c = 0; c < from.length; c++) {
                s.getCellByPosition(c, r).setFormula("=" + st + "$" + col(from[c]) + "$" + (TABLE_FIRST + i + 1));
            }
            s.getCellByPosition(4, r).setFormula("=" + st + abs(LIMIT_COL, LIMIT_1_ROW));
            s.getCellByPosition(5, r).setFormula("=" + st + abs(LIMIT_COL, LIMIT_2_ROW));
        }
        prop(s, "B" + (PLOT_FIRST + 1) + ":F" + (PLOT_FIRST + ROWS), "NumberFormat", formats.key("0.0"));
        widths(s, 22, 24, 28, 28, 22, 22);
    }

    private static void addChart(XSpreadsheet s) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        com.sun.star.awt.Point p = ExampleWorkbooks.position(s, 0, CHART_TOP);
        com.sun.star.awt.Point below = ExampleWorkbooks.position(s, 0, CHART_BOTTOM + 1);
        com.sun.star.awt.Point right = ExampleWorkbooks.position(s, FREEZING + 1, CHART_TOP);
        CellRangeAddress data = new CellRangeAddress((short) 2, 0, PLOT_HEAD, 5, PLOT_FIRST + ROWS - 1);
        charts.addNewByName(CHART_NAME, new Rectangle(p.X, p.Y, right.X - p.X - 100, below.Y - p.Y - 100),
                new CellRangeAddress[] {data}, true, false);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(CHART_NAME);
        XChartDocument cd = UnoRuntime.queryInterface(XChartDocument.class,
                UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject());
        XDiagram d = ExampleWorkbooks.lineChart(cd, "Estimated flash point of ethanol + water against strength "
                + "(estimates; a measured closed-cup value decides)", 10f, "ethanol, % vol at 20 °C",
                "flash point, °C");
        ExampleWorkbooks.fixedXAxis(d, "ethanol, % vol at 20 °C", 100.0, 10.0, formats.key("0"));
        XPropertySet yAxis = UnoRuntime.queryInterface(XAxisYSupplier.class, d).getYAxis();
        yAxis.setPropertyValue("AutoMin", Boolean.FALSE);
        yAxis.setPropertyValue("AutoMax", Boolean.FALSE);
        yAxis.setPropertyValue("AutoStepMain", Boolean.FALSE);
        yAxis.setPropertyValue("Min", 0.0);
        yAxis.setPropertyValue("Max", 90.0);
        yAxis.setPropertyValue("StepMain", 10.0);
        yAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        yAxis.setPropertyValue("NumberFormat", formats.key("0"));
        line(d.getDataRowProperties(1), 0x2E6FB0, 45, ChartSymbolType.AUTO);
        line(d.getDataRowProperties(2), 0x8E8E8E, 30, ChartSymbolType.NONE);
        XPropertySet published = d.getDataRowProperties(3);
        published.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        published.setPropertyValue("SymbolType", 3);
        published.setPropertyValue("SymbolSize", new Size(260, 260));
        published.setPropertyValue("Color", 0xE67E22);
        line(d.getDataRowProperties(4), 0xC0392B, 35, ChartSymbolType.NONE);
        line(d.getDataRowProperties(5), 0x7D3C98, 35, ChartSymbolType.NONE);
    }

    private static void line(XPropertySet series, int colour, int width, int symbol) throws Exception {
        series.setPropertyValue("Color", colour);
        series.setPropertyValue("LineWidth", width);
        series.setPropertyValue("SymbolType", symbol);
        if (symbol != ChartSymbolType.NONE) {
            series.setPropertyValue("SymbolSize", new Size(180, 180));
        }
    }
}
