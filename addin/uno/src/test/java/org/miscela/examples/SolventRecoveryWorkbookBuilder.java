package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.REFERENCE_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.array;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.block;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.col;
import static org.miscela.examples.ExampleWorkbooks.fitted;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.input;
import static org.miscela.examples.ExampleWorkbooks.merge;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.result;
import static org.miscela.examples.ExampleWorkbooks.section;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.textHeight;
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
import com.sun.star.table.CellHoriJustify;
import com.sun.star.table.CellRangeAddress;
import com.sun.star.table.XTableCharts;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.uno.UnoRuntime;
import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.miscela.core.card.TestCards;
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/solvent-recovery.ods from nothing, through a real office with the built
 * extension installed: an invented small plant recovers ethanol from spent aqueous sanitiser by batch distillation
 * at about 1 atm. The plant, its still's charge and pressure are invented; the two phase-equilibrium cards are the
 * project's ethanol + water test cards, copied unchanged onto their own sheets: {@link #WILSON_CARD} (Wilson's model
 * with Gmehling et al.'s published parameters), named {@link #WILSON}, which every result uses, and {@link #RK_CARD}
 * (Redlich–Kister G^E/RT fitted to published data), named {@link #RK}, which is shown refusing the azeotrope in its
 * own words. The lab-data sheet holds a published isobar (Rieder and Thompson 1949, as transcribed in
 * reference/ethanol-water-vle.tsv) standing in for the lab's own points, with the card's predictions and deviations,
 * and to its right MIX.FITVLE's fit of Wilson's model to those points, whose parameters are the Wilson row of a
 * third card, {@link #FITTED} (sheet Fitted card), with the fit's statistics and the data's consistency tests.
 *
 * <p>Sheets: Recovery (the still's charge, the azeotrope with the refusal in words, the activity table at a stated
 * temperature, the T–x–y table at the still's pressure, the chart), Lab VLE, Diagram data (the chart's columns),
 * Wilson card, RK card and Fitted card. The constants that locate cells are shared with ExamplesIT (0-based rows and columns).
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.SolventRecoveryWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class SolventRecoveryWorkbookBuilder {
    static final String FILE = "solvent-recovery.ods";
    static final String WILSON_CARD = "ethanol-water-wilson.tsv";
    static final String RK_CARD = "ethanol-water-vle.tsv";
    static final String CARD_DIR = "addin/core/src/test/resources/cards/";
    static final String REFERENCE_PATH = "addin/core/src/test/resources/reference/ethanol-water-vle.tsv";
    /** The range names of the two cards. */
    static final String WILSON = "wilson";
    static final String RK = "rk";
    /** The card whose Wilson row is MIX.FITVLE's fit of sheet Lab VLE's data block. */
    static final String FITTED = "fitted";
    static final String CHART_NAME = "TxyDiagram";
    /** The data set on sheet Lab VLE: its tag in the reference file. */
    static final String DATA_SET = "isobaric-rieder";
    static final String DATA_SOURCE = "R. M. Rieder, A. R. Thompson, Ind. Eng. Chem. 41 (1949) 2905–2908";

    /**
     * The published azeotrope of ethanol + water at 101.325 kPa, as the project's tests cite it
     * (reference/ethanol-water-vle.tsv, row 'azeotrope': Evans 1916 as cited on a reference page, the citation's
     * details from memory; VleCardTest).
     */
    static final double PUBLISHED_AZEOTROPE_X = 0.8947;
    static final double PUBLISHED_AZEOTROPE_C = 78.17;
    static final String PUBLISHED_AZEOTROPE_SOURCE = "Evans (1916) as cited on a reference page (J. Ind. Eng. Chem. 8 "
            + "(1916) 260; the citation's details are from memory), as in the project's reference file "
            + "reference/ethanol-water-vle.tsv";

    // --- invented inputs
    static final double PRESSURE = 101.325;
    static final double CHARGE_WW = 30;
    static final double TABLE_T = 70;

    // --- Recovery, left: label A, value B, unit C (0-based rows)
    static final int PRESSURE_ROW = 8;
    static final int CHARGE_ROW = 9;
    static final int CHARGE_X_ROW = 10;
    static final int CHARGE_T_ROW = 11;
    static final int CHARGE_Y_ROW = 12;
    static final int CHARGE_YW_ROW = 13;
    static final int ALPHA_ROW = 14;
    static final int AZ_X_ROW = 17;
    static final int AZ_T_ROW = 18;
    static final int AZ_W_ROW = 19;
    static final int AZ_Y_ROW = 20;
    static final int PUB_X_ROW = 21;
    static final int PUB_T_ROW = 22;
    static final int DEV_X_ROW = 23;
    static final int DEV_T_ROW = 24;
    /** The label of the Redlich–Kister card's refusal; its words are in the merged row below. */
    static final int RK_ROW = 32;
    static final int WHY_ROW = 34;
    /** The chart, across E..N from CHART_TOP to CHART_BOTTOM, beside the refusal and the notes. */
    static final int CHART_TOP = 32;
    static final int CHART_BOTTOM = 50;
    /** The last row of the notes' block in A..C. */
    static final int NOTES_LAST = 60;

    // --- Recovery, right: the activity table (E..I) and the T-x-y table (K..N)
    static final int TABLE_HEAD_ROW = 7;
    static final int TABLE_INPUT_ROW = 8;
    static final int TABLE_LABEL_ROW = 9;
    static final int TABLE_FIRST = 10;
    static final int TABLE_ROWS = 21;
    static final int ACT_X = 4;
    static final int ACT_G1 = 5;
    static final int ACT_G2 = 6;
    static final int ACT_P = 7;
    static final int ACT_Y = 8;
    static final int TXY_X = 10;
    static final int TXY_T = 11;
    static final int TXY_Y = 12;
    static final int TXY_DEW = 13;
    /** How the numbers are worked out: under the explanation of the refusal, in A..C. */
    static final int NOTES_ROW = WHY_ROW + 2;

    // --- Lab VLE: the data block (A..I) and the fit of Wilson's model to it (K..O)
    static final int LAB_HEAD_ROW = 5;
    static final int LAB_LABEL_ROW = 6;
    static final int LAB_FIRST = 7;
    static final int LAB_NO = 0;
    static final int LAB_X = 1;
    static final int LAB_Y = 2;
    static final int LAB_T = 3;
    static final int LAB_P = 4;
    static final int LAB_T_PRED = 5;
    static final int LAB_Y_PRED = 6;
    static final int LAB_DT = 7;
    static final int LAB_DY = 8;
    static final int FIT_FIRST_COL = 10;
    static final int FIT_LAST_COL = 14;
    static final int FIT_ROWS = 21;
    /** Rows of the fit area (0-based): the Wilson parameters, their standard errors, the fitted card's azeotrope. */
    static final int FIT_PARAMETERS_ROW = LAB_LABEL_ROW + 1;
    static final int FIT_ERRORS_ROW = LAB_LABEL_ROW + 2;
    static final int FIT_AZ_X_ROW = LAB_LABEL_ROW + 3;
    static final int FIT_AZ_T_ROW = LAB_LABEL_ROW + 4;
    /** First row of the fit's statistics (K..L) and consistency tests (N..O). */
    static final int FIT_TABLES_ROW = LAB_LABEL_ROW + 6;
    static final int FIT_STATISTICS_ROWS = 15;
    static final int FIT_CONSISTENCY_ROWS = 12;

    // --- Diagram data
    static final int PLOT_HEAD = 3;
    static final int PLOT_FIRST = 4;

    private static Formats formats;
    private static int labRows;
    private static int plotLast;

    private SolventRecoveryWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Recovery", "Lab VLE", "Diagram data", "Wilson card",
                "RK card", "Fitted card");
        formats = new Formats(doc);
        writeCard(doc, sheet(sheets, "Wilson card"), WILSON_CARD, WILSON, "Wilson's model with Gmehling et al.'s "
                + "published parameters", "Every result on sheets Recovery and Lab VLE uses this card. Its note row "
                + "says what is assumed: the book gives the Wilson parameters at 70 °C only, and the card carries them "
                + "to other temperatures as constant energy differences (equal Wilson volumes).");
        writeCard(doc, sheet(sheets, "RK card"), RK_CARD, RK, "Redlich–Kister G^E/RT fitted to published VLE data",
                "Sheet Recovery asks this card for the azeotrope only, to show its refusal in words: its four "
                + "coefficients, fitted to a 30 °C isotherm and a 101.3 kPa isobar with few points above x1 = 0.9, "
                + "give two compositions at 1 atm where vapour and liquid agree, and the function refuses to choose. "
                + "Note that its fit used the very isobar that sheet Lab VLE shows, so it is no independent check "
                + "of those points.");
        writeFittedCard(doc, sheet(sheets, "Fitted card"));
        writeLab(sheet(sheets, "Lab VLE"));
        XSpreadsheet r = sheet(sheets, "Recovery");
        writeRecovery(r);
        writeTables(r);
        writePlotData(sheet(sheets, "Diagram data"));
        addChart(r);
        pageSetup(doc);
    }

    // --- the published isobar

    /** The rows of the reference file's {@link #DATA_SET}: P (kPa), T (K), x1, y1 as transcribed (text), source. */
    static List<String[]> dataRows() {
        List<String[]> out = new ArrayList<>();
        try (InputStream in = SolventRecoveryWorkbookBuilder.class.getResourceAsStream(
                "/reference/ethanol-water-vle.tsv")) {
            if (in == null) {
                throw new IllegalStateException("the reference file " + REFERENCE_PATH + " is not on the class path");
            }
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                String[] f = line.split("\t", -1);
                if (f.length > 5 && DATA_SET.equals(f[0])) {
                    out.add(new String[] {f[1], f[2], f[3], f[4], f[5]});
                }
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        if (out.isEmpty()) {
            throw new IllegalStateException("no rows of " + DATA_SET + " in " + REFERENCE_PATH);
        }
        return out;
    }

    /** A temperature in kelvin as transcribed, in °C, exactly to its printed decimals. */
    static double celsius(String kelvin) {
        return new BigDecimal(kelvin).subtract(new BigDecimal("273.15")).doubleValue();
    }

    private static String b(int row) {
        return "$B$" + (row + 1);
    }

    private static String range(int c, int first, int rows) {
        return "$" + col(c) + "$" + (first + 1) + ":$" + col(c) + "$" + (first + rows);
    }

    /** Width of columns A..N of Recovery in mm; the left block A..C; the whole. */
    private static final int[] RECOVERY_MM = {96, 25, 20, 4, 14, 20, 18, 19, 17, 4, 14, 21, 17, 19};
    /** The left block A..C, with room for the office's wider screen font in wrapped text. */
    private static final int LEFT_MM = (96 + 25 + 20) * 13 / 20;
    private static final int WIDE_MM = java.util.Arrays.stream(RECOVERY_MM).sum() * 17 / 20;

    private static void writeRecovery(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Aldercombe Hygiene Supplies (invented company): recovering ethanol from spent sanitiser in "
                + "batch still S-1 at about 1 atm");
        bold(s, "A1", 14);
        fitted(s, "A2:N2", 1, "INVENTED SCENARIO. The company, still S-1, its pressure and the strength of its "
                + "charge are made up to show how the Miscela phase-equilibrium functions work; they are no one's real "
                + "figures. The cards are not invented: sheet 'Wilson card' (Wilson's model with the published "
                + "parameters of Gmehling et al.) and sheet 'RK card' (Redlich–Kister G^E/RT fitted to published data) "
                + "are the project's ethanol + water cards, copied unchanged with their source rows. The data on sheet "
                + "Lab VLE are a published isobar standing in for the lab's own measurements.", WIDE_MM);
        band(s, "A2:N2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        String[] cautions = {
            "FLAMMABLE VAPOUR. Ethanol vapour ignites easily: the liquid's flash point is about 13 °C pure and stays "
                    + "below ordinary room temperature in blends down to a few tens of percent ethanol (values from "
                    + "memory: take the flash point from the safety data sheet or a measurement). The vapour is "
                    + "heavier than air (molar mass 46 g/mol against air's 29), spreads along floors and collects in "
                    + "pits and drains. Hot still vapour is well above its flash point by design.",
            "ESTIMATES. Every number here is a model estimate by modified Raoult's law (an ideal vapour over the "
                    + "liquid), fair at low pressure only, from cards with stated sources and limits. Measured data, "
                    + "safety data sheets, local codes and licensed practice prevail over anything this workbook "
                    + "computes.",
            "NEVER use an estimate from this workbook to relax a hazard or area classification, or in the design "
                    + "of pressure relief, venting, inerting or ignition control: those follow the codes your site "
                    + "works under and the people licensed to apply them.",
            "The still cannot pass the azeotrope (section 2): at 1 atm simple or fractional distillation of "
                    + "ethanol + water stops near 95–96 % w/w, however many stages.",
        };
        ExampleWorkbooks.cautions(s, "N", WIDE_MM, 3, cautions);

        // 1. the still
        section(s, PRESSURE_ROW - 1, "1. Still S-1 and its charge (change the blue cells)");
        input(formats, s, PRESSURE_ROW, "Pressure in the still (invented: about 1 atm)", PRESSURE, "kPa", "0.000");
        input(formats, s, CHARGE_ROW, "Ethanol in the spent sanitiser charged (invented)", CHARGE_WW, "% w/w", "0.0");
        String p = b(PRESSURE_ROW);
        result(formats, s, CHARGE_X_ROW, "… as ethanol's mole fraction x1 (MIX.CONVERT)", "=MIX.CONVERT(" + WILSON
                + ";" + b(CHARGE_ROW) + ";\"%w/w\";\"x\")", "mol/mol", "0.0000");
        result(formats, s, CHARGE_T_ROW, "The charge starts to boil at (MIX.BUBBLEPOINT)", "=MIX.BUBBLEPOINT(" + WILSON
                + ";" + b(CHARGE_X_ROW) + ";" + p + ")", "°C", "0.00");
        result(formats, s, CHARGE_Y_ROW, "Ethanol in its first vapour, y1 (MIX.VAPOURFRACTION)",
                "=MIX.VAPOURFRACTION(" + WILSON + ";1;" + b(CHARGE_X_ROW) + ";" + b(CHARGE_T_ROW) + ")", "mol/mol",
                "0.0000");
        result(formats, s, CHARGE_YW_ROW, "… that vapour condensed, ethanol (MIX.CONVERT)", "=MIX.CONVERT(" + WILSON
                + ";" + b(CHARGE_Y_ROW) + ";\"x\";\"%w/w\")", "% w/w", "0.0");
        result(formats, s, ALPHA_ROW, "Relative volatility α12 (MIX.RELATIVEVOLATILITY)",
                "=MIX.RELATIVEVOLATILITY(" + WILSON + ";1;2;" + b(CHARGE_X_ROW) + ";" + b(CHARGE_T_ROW) + ")", "",
                "0.000");

        // 2. the azeotrope
        section(s, AZ_X_ROW - 1, "2. The azeotrope at the still's pressure (MIX.AZEOTROPE, Wilson card)");
        result(formats, s, AZ_X_ROW, "Azeotrope: ethanol's mole fraction x1", "=MIX.AZEOTROPE(" + WILSON + ";" + p
                + ")", "mol/mol", "0.0000");
        result(formats, s, AZ_T_ROW, "Azeotrope: boiling temperature", "=MIX.AZEOTROPE(" + WILSON + ";" + p
                + ";\"temperature\")", "°C", "0.00");
        result(formats, s, AZ_W_ROW, "… as ethanol, % w/w (MIX.CONVERT)", "=MIX.CONVERT(" + WILSON + ";"
                + b(AZ_X_ROW) + ";\"x\";\"%w/w\")", "% w/w", "0.0");
        result(formats, s, AZ_Y_ROW, "Vapour over it, y1 (MIX.VAPOURFRACTION: equals x1)", "=MIX.VAPOURFRACTION("
                + WILSON + ";1;" + b(AZ_X_ROW) + ";" + b(AZ_T_ROW) + ")", "mol/mol", "0.0000");
        reference(s, PUB_X_ROW, "Published: x1 (Evans 1916 as cited, see below)",
                PUBLISHED_AZEOTROPE_X, "mol/mol", "0.0000");
        reference(s, PUB_T_ROW, "Published: temperature at 101.325 kPa", PUBLISHED_AZEOTROPE_C, "°C", "0.00");
        result(formats, s, DEV_X_ROW, "Card minus published: x1", "=" + b(AZ_X_ROW) + "-" + b(PUB_X_ROW), "mol/mol",
                "+0.0000;-0.0000;0.0000");
        result(formats, s, DEV_T_ROW, "Card minus published: temperature", "="
                + b(AZ_T_ROW) + "-" + b(PUB_T_ROW), "K", "+0.00;-0.00;0.00");
        section(s, RK_ROW - 1, "The Redlich–Kister card refuses the azeotrope: its words");
        fitted(s, "A" + (RK_ROW + 1) + ":C" + (RK_ROW + 1), RK_ROW, "Asked the same, =MIX.AZEOTROPE(" + RK + "; B"
                + (PRESSURE_ROW + 1) + ") is refused (Err:502); =MIX.EXPLAIN(\"MIX.AZEOTROPE\"; " + RK + "; B"
                + (PRESSURE_ROW + 1) + ") in the next cell gives the reason in words:", LEFT_MM);
        String words = "A" + (RK_ROW + 2) + ":C" + (RK_ROW + 2);
        s.getCellByPosition(0, RK_ROW + 1).setFormula("=MIX.EXPLAIN(\"MIX.AZEOTROPE\";" + RK + ";" + p + ")");
        merge(s, words);
        prop(s, words, "IsTextWrapped", Boolean.TRUE);
        prop(s, words, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        band(s, words, CAUTION_COLOUR);
        ExampleWorkbooks.rowHeight(s, RK_ROW + 1, 3 * 460 + 120);
        fitted(s, "A" + (WHY_ROW + 1) + ":C" + (WHY_ROW + 1), WHY_ROW, "Why one card answers and the other refuses: "
                + "near x1 = 0.9 the vapour and the liquid differ by less than 0.01, so the azeotrope hangs on fine "
                + "detail of G^E. The Redlich–Kister card's four coefficients were fitted to data with few points "
                + "there; at 1 atm its vapour meets its liquid at two compositions close together (a fitting "
                + "artefact, not two azeotropes), and MIX.AZEOTROPE refuses rather than pick one (Err:502; "
                + "MIX.EXPLAIN shows the words). Wilson's two-parameter model cannot bend that way, and with "
                + "Gmehling et al.'s parameters it gives one azeotrope, close to the published one. Published source "
                + "of the azeotrope: " + PUBLISHED_AZEOTROPE_SOURCE + ".", LEFT_MM);
        band(s, "A" + (WHY_ROW + 1) + ":C" + (WHY_ROW + 1), REFERENCE_COLOUR);
        prop(s, "C" + (PRESSURE_ROW + 1) + ":C" + (DEV_T_ROW + 1), "ParaLeftMargin", 150);
        widths(s, RECOVERY_MM);
    }

    private static void reference(XSpreadsheet s, int row, String label, double value, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setValue(value);
        text(s, 2, row, unit);
        band(s, "B" + (row + 1), REFERENCE_COLOUR);
        prop(s, "B" + (row + 1), "NumberFormat", formats.key(format));
    }

    private static void writeTables(XSpreadsheet s) throws Exception {
        String x = range(ACT_X, TABLE_FIRST, TABLE_ROWS);
        // 3. activity coefficients and vapour pressure at one temperature
        String e = col(ACT_X);
        String i = col(ACT_Y);
        text(s, ACT_X, TABLE_HEAD_ROW, "3. Activity and vapour pressure");
        head(s, e + (TABLE_HEAD_ROW + 1) + ":" + i + (TABLE_HEAD_ROW + 1));
        text(s, ACT_X, TABLE_INPUT_ROW, "at the temperature, °C:");
        s.getCellByPosition(ACT_Y, TABLE_INPUT_ROW).setValue(TABLE_T);
        band(s, i + (TABLE_INPUT_ROW + 1), INPUT_COLOUR);
        prop(s, i + (TABLE_INPUT_ROW + 1), "NumberFormat", formats.key("0.0"));
        String t = "$" + i + "$" + (TABLE_INPUT_ROW + 1);
        String[] actHeads = {"x1", "γ ethanol", "γ water", "p, kPa", "y1"};
        for (int k = 0; k < actHeads.length; k++) {
            text(s, ACT_X + k, TABLE_LABEL_ROW, actHeads[k]);
        }
        head(s, e + (TABLE_LABEL_ROW + 1) + ":" + i + (TABLE_LABEL_ROW + 1));
        for (int r = 0; r < TABLE_ROWS; r++) {
            s.getCellByPosition(ACT_X, TABLE_FIRST + r).setValue(r / 20.0);
            s.getCellByPosition(TXY_X, TABLE_FIRST + r).setFormula("=" + e + (TABLE_FIRST + r + 1));
        }
        band(s, e + (TABLE_FIRST + 1) + ":" + e + (TABLE_FIRST + TABLE_ROWS), INPUT_COLOUR);
        array(s, range(ACT_G1, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.ACTIVITY(" + WILSON + ";1;" + x + ";"
                + t + ")");
        array(s, range(ACT_G2, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.ACTIVITY(" + WILSON + ";2;" + x + ";"
                + t + ")");
        array(s, range(ACT_P, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.BUBBLEPRESSURE(" + WILSON + ";" + x
                + ";" + t + ")");
        array(s, range(ACT_Y, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.VAPOURFRACTION(" + WILSON + ";1;" + x
                + ";" + t + ")");
        format(s, e, "0.00");
        format(s, col(ACT_G1), "0.000");
        format(s, col(ACT_G2), "0.000");
        format(s, col(ACT_P), "0.00");
        format(s, i, "0.000");

        // 4. T-x-y at the still's pressure
        String k = col(TXY_X);
        String n = col(TXY_DEW);
        text(s, TXY_X, TABLE_HEAD_ROW, "4. T–x–y at the still's pressure");
        head(s, k + (TABLE_HEAD_ROW + 1) + ":" + n + (TABLE_HEAD_ROW + 1));
        text(s, TXY_X, TABLE_INPUT_ROW, "pressure, kPa (from B" + (PRESSURE_ROW + 1) + "):");
        s.getCellByPosition(TXY_DEW, TABLE_INPUT_ROW).setFormula("=" + b(PRESSURE_ROW));
        prop(s, n + (TABLE_INPUT_ROW + 1), "NumberFormat", formats.key("0.000"));
        String[] txyHeads = {"x1, y1", "bubble °C", "y1", "dew °C"};
        for (int c = 0; c < txyHeads.length; c++) {
            text(s, TXY_X + c, TABLE_LABEL_ROW, txyHeads[c]);
        }
        head(s, k + (TABLE_LABEL_ROW + 1) + ":" + n + (TABLE_LABEL_ROW + 1));

        String kx = range(TXY_X, TABLE_FIRST, TABLE_ROWS);
        String pressure = "$" + n + "$" + (TABLE_INPUT_ROW + 1);
        array(s, range(TXY_T, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.BUBBLEPOINT(" + WILSON + ";" + kx + ";"
                + pressure + ")");
        array(s, range(TXY_Y, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.VAPOURFRACTION(" + WILSON + ";1;" + kx
                + ";" + range(TXY_T, TABLE_FIRST, TABLE_ROWS) + ")");
        array(s, range(TXY_DEW, TABLE_FIRST, TABLE_ROWS).replace("$", ""), "=MIX.DEWPOINT(" + WILSON + ";" + kx + ";"
                + pressure + ")");
        format(s, k, "0.00");
        format(s, col(TXY_T), "0.00");
        format(s, col(TXY_Y), "0.000");
        format(s, n, "0.00");
        prop(s, e + (TABLE_INPUT_ROW + 1) + ":" + n + (TABLE_LABEL_ROW + 1), "HoriJustify", CellHoriJustify.RIGHT);
        prop(s, e + (TABLE_INPUT_ROW + 1) + ":" + col(ACT_G2) + (TABLE_INPUT_ROW + 1), "HoriJustify",
                CellHoriJustify.LEFT);
        prop(s, k + (TABLE_INPUT_ROW + 1) + ":" + col(TXY_Y) + (TABLE_INPUT_ROW + 1), "HoriJustify",
                CellHoriJustify.LEFT);

        section(s, NOTES_ROW, "How the numbers are worked out");
        block(s, "A" + (NOTES_ROW + 2) + ":C" + (NOTES_LAST + 1), "Each column of the two tables is one array "
                + "formula over the x1 column (change the blue x1 values and both tables follow). Table 3: the "
                + "activity coefficients γ from Wilson's model at the stated temperature (the book's parameters are "
                + "for 70 °C), the blend's vapour pressure p = Σ x·γ·p* and the first vapour's ethanol y1. Table 4, "
                + "at the still's pressure: the bubble point (the liquid x1 starts to boil), the vapour it gives off, "
                + "and the dew point of a VAPOUR whose ethanol fraction is the same number (it starts to condense). "
                + "The chart draws the bubble line against x1 and the dew line against y1: between them the liquid "
                + "and the vapour are both present. They touch at the azeotrope, where the vapour is no richer than "
                + "the liquid and the still can enrich no further.\n"
                + "Vapour pressures: Wagner's equations on the card (water: Wagner and Pruß 1993). Modified Raoult's "
                + "law: an ideal vapour, so at 1 atm an estimate of a few tenths of a kelvin (sheet Lab VLE compares "
                + "it with a published isobar). The card's validity is 30 to 100 °C; the functions refuse outside.");
    }

    /** A number format on a table column of Recovery. */
    private static void format(XSpreadsheet s, String column, String code) throws Exception {
        prop(s, column + (TABLE_FIRST + 1) + ":" + column + (TABLE_FIRST + TABLE_ROWS), "NumberFormat",
                formats.key(code));
    }

    private static void writeLab(XSpreadsheet s) throws Exception {
        List<String[]> rows = dataRows();
        labRows = rows.size();
        int wide = (12 + 18 * 4 + 19 * 2 + 18 * 2 + 4 + 22 * 5) * 17 / 20;
        text(s, 0, 0, "Lab VLE data: ethanol + water at 101.3 kPa, against the Wilson card");
        bold(s, "A1", 13);
        fitted(s, "A2:O2", 1, "NOT INVENTED, AND NOT THE LAB'S OWN. Until the lab measures its own points, the "
                + "block 'Lab VLE data' holds a published isobar: " + DATA_SOURCE + ", " + labRows + " points at "
                + "101.3 kPa, as transcribed in open-source repositories (not checked against the paper's pages; the "
                + "project's file " + REFERENCE_PATH + " names the source of each row). Their temperatures were "
                + "given in kelvin; column D is that value minus 273.15. Replace them with your own measurements in "
                + "the same columns (x1, y1, T, P).", wide);
        band(s, "A2:O2", REFERENCE_COLOUR);
        bold(s, "A2", 10);
        fitted(s, "A3:O3", 2, "Beside each point, the Wilson card's prediction at the point's pressure and x1 "
                + "(MIX.BUBBLEPOINT, then MIX.VAPOURFRACTION at that temperature) and the deviations, card minus "
                + "data. The Redlich–Kister card is not used here: its coefficients were fitted to this very isobar "
                + "(with a 30 °C isotherm), so it would be no independent check. The block " + col(FIT_FIRST_COL)
                + ".." + col(FIT_LAST_COL) + " to the right fits Wilson's model to the data block itself "
                + "(MIX.FITVLE): its parameters are the Wilson row of card 'fitted' (sheet Fitted card), so new "
                + "points refit that card and everything computed from it.", wide);
        String last = col(LAB_DY);
        text(s, 0, LAB_HEAD_ROW, "Lab VLE data (stand-in: Rieder & Thompson 1949, 101.3 kPa)");
        head(s, "A" + (LAB_HEAD_ROW + 1) + ":" + last + (LAB_HEAD_ROW + 1));
        String[] heads = {"point", "x1 (liquid)", "y1 (vapour)", "T, °C", "P, kPa", "card: bubble, °C",
            "card: y1", "ΔT, K", "Δy1"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, LAB_LABEL_ROW, heads[c]);
        }
        head(s, "A" + (LAB_LABEL_ROW + 1) + ":" + last + (LAB_LABEL_ROW + 1));
        prop(s, "A" + (LAB_LABEL_ROW + 1) + ":" + last + (LAB_LABEL_ROW + 1), "IsTextWrapped", Boolean.TRUE);
        ExampleWorkbooks.rowHeight(s, LAB_LABEL_ROW, 3 * 460 + 120);
        for (int r = 0; r < labRows; r++) {
            String[] f = rows.get(r);
            int at = LAB_FIRST + r;
            s.getCellByPosition(LAB_NO, at).setValue(r + 1);
            s.getCellByPosition(LAB_X, at).setValue(Double.parseDouble(f[2]));
            s.getCellByPosition(LAB_Y, at).setValue(Double.parseDouble(f[3]));
            s.getCellByPosition(LAB_T, at).setValue(celsius(f[1]));
            s.getCellByPosition(LAB_P, at).setValue(Double.parseDouble(f[0]));
            s.getCellByPosition(LAB_DT, at).setFormula("=" + col(LAB_T_PRED) + (at + 1) + "-" + col(LAB_T) + (at + 1));
            s.getCellByPosition(LAB_DY, at).setFormula("=" + col(LAB_Y_PRED) + (at + 1) + "-" + col(LAB_Y) + (at + 1));
        }
        String data = "B" + (LAB_FIRST + 1) + ":" + col(LAB_P) + (LAB_FIRST + labRows);
        band(s, data, REFERENCE_COLOUR);
        array(s, range(LAB_T_PRED, LAB_FIRST, labRows).replace("$", ""), "=MIX.BUBBLEPOINT(" + WILSON + ";"
                + range(LAB_X, LAB_FIRST, labRows) + ";" + range(LAB_P, LAB_FIRST, labRows) + ")");
        array(s, range(LAB_Y_PRED, LAB_FIRST, labRows).replace("$", ""), "=MIX.VAPOURFRACTION(" + WILSON + ";1;"
                + range(LAB_X, LAB_FIRST, labRows) + ";" + range(LAB_T_PRED, LAB_FIRST, labRows) + ")");
        labFormat(s, LAB_NO, "0");
        labFormat(s, LAB_X, "0.0000");
        labFormat(s, LAB_Y, "0.000");
        labFormat(s, LAB_T, "0.00");
        labFormat(s, LAB_P, "0.0");
        labFormat(s, LAB_T_PRED, "0.00");
        labFormat(s, LAB_Y_PRED, "0.000");
        labFormat(s, LAB_DT, "+0.00;-0.00;0.00");
        labFormat(s, LAB_DY, "+0.000;-0.000;0.000");

        // summary of the deviations
        int sum = LAB_FIRST + labRows + 1;
        String dt = range(LAB_DT, LAB_FIRST, labRows);
        String dy = range(LAB_DY, LAB_FIRST, labRows);
        text(s, 0, sum, "Deviations, card minus data");
        head(s, "A" + (sum + 1) + ":" + last + (sum + 1));
        String[][] stats = {
            {"mean", "=AVERAGE(" + dt + ")", "=AVERAGE(" + dy + ")"},
            {"root mean square", "=SQRT(SUMSQ(" + dt + ")/COUNT(" + dt + "))", "=SQRT(SUMSQ(" + dy + ")/COUNT(" + dy
                + "))"},
            {"largest, in size", "=MAX(ABS(" + dt + "))", "=MAX(ABS(" + dy + "))"},
        };
        for (int r = 0; r < stats.length; r++) {
            int at = sum + 1 + r;
            text(s, 0, at, stats[r][0]);
            merge(s, "A" + (at + 1) + ":G" + (at + 1));
            prop(s, "A" + (at + 1), "HoriJustify", CellHoriJustify.RIGHT);
            if (r == 2) {
                array(s, col(LAB_DT) + (at + 1), stats[r][1]);
                array(s, col(LAB_DY) + (at + 1), stats[r][2]);
            } else {
                s.getCellByPosition(LAB_DT, at).setFormula(stats[r][1]);
                s.getCellByPosition(LAB_DY, at).setFormula(stats[r][2]);
            }
            prop(s, col(LAB_DT) + (at + 1), "NumberFormat", formats.key("0.00"));
            prop(s, col(LAB_DY) + (at + 1), "NumberFormat", formats.key("0.000"));
        }
        fitted(s, "A" + (sum + 5) + ":" + last + (sum + 5), sum + 4, "Below about 9 mol % ethanol the card's bubble "
                + "points run up to 0.9 K low and its vapour up to 0.03 richer than these data; above, within a few "
                + "tenths of a kelvin and 0.01. Points 3 and 4 (x1 = 0.0137 and 0.0144, both 96.0 °C, y1 = 0.157 and "
                + "0.135) show the data's own scatter at the dilute end.", (12 + 18 * 4 + 19 * 2 + 18 * 2) * 17 / 20);

        writeFit(s);
        widths(s, 12, 18, 18, 18, 18, 19, 19, 18, 18, 4, 70, 40, 30, 100, 24);
    }

    /** The fit of the data block: Wilson's Δλ/R, their standard errors, statistics, consistency, the fitted azeotrope. */
    private static void writeFit(XSpreadsheet s) throws Exception {
        String f0 = col(FIT_FIRST_COL);
        String f1 = col(FIT_LAST_COL);
        text(s, FIT_FIRST_COL, LAB_HEAD_ROW, "Wilson's model fitted to the data block (MIX.FITVLE, p and y)");
        head(s, f0 + (LAB_HEAD_ROW + 1) + ":" + f1 + (LAB_HEAD_ROW + 1));
        String call = "MIX.FITVLE(" + WILSON + ";;" + range(LAB_X, LAB_FIRST, labRows) + ";"
                + range(LAB_Y, LAB_FIRST, labRows) + ";" + range(LAB_T, LAB_FIRST, labRows) + ";"
                + range(LAB_P, LAB_FIRST, labRows) + ";\"Wilson\"";
        String a = col(FIT_FIRST_COL + 1);
        String b = col(FIT_FIRST_COL + 2);
        text(s, FIT_FIRST_COL, LAB_LABEL_ROW, "pure part read: card 'wilson'");
        text(s, FIT_FIRST_COL + 1, LAB_LABEL_ROW, "Δλ12/R, K");
        text(s, FIT_FIRST_COL + 2, LAB_LABEL_ROW, "Δλ21/R, K");
        head(s, f0 + (LAB_LABEL_ROW + 1) + ":" + b + (LAB_LABEL_ROW + 1));
        text(s, FIT_FIRST_COL, FIT_PARAMETERS_ROW, "fitted (the Wilson row of card 'fitted')");
        array(s, a + (FIT_PARAMETERS_ROW + 1) + ":" + b + (FIT_PARAMETERS_ROW + 1), "=" + call + ")");
        text(s, FIT_FIRST_COL, FIT_ERRORS_ROW, "standard errors");
        array(s, a + (FIT_ERRORS_ROW + 1) + ":" + b + (FIT_ERRORS_ROW + 1), "=" + call
                + ";;;;;;\"standard errors\")");
        prop(s, a + (FIT_PARAMETERS_ROW + 1) + ":" + b + (FIT_ERRORS_ROW + 1), "NumberFormat", formats.key("0.0"));
        text(s, FIT_FIRST_COL, FIT_AZ_X_ROW, "card 'fitted': azeotrope at 101.325 kPa, x1");
        s.getCellByPosition(FIT_FIRST_COL + 1, FIT_AZ_X_ROW).setFormula("=MIX.AZEOTROPE(" + FITTED + ";101.325)");
        prop(s, a + (FIT_AZ_X_ROW + 1), "NumberFormat", formats.key("0.0000"));
        text(s, FIT_FIRST_COL, FIT_AZ_T_ROW, "… its boiling temperature, °C");
        s.getCellByPosition(FIT_FIRST_COL + 1, FIT_AZ_T_ROW).setFormula("=MIX.AZEOTROPE(" + FITTED
                + ";101.325;\"temperature\")");
        prop(s, a + (FIT_AZ_T_ROW + 1), "NumberFormat", formats.key("0.00"));
        text(s, FIT_FIRST_COL + 2, FIT_AZ_X_ROW, "published 0.8947");
        text(s, FIT_FIRST_COL + 2, FIT_AZ_T_ROW, "published 78.17");
        text(s, FIT_FIRST_COL, FIT_TABLES_ROW - 1, "Fit statistics (\"statistics\")");
        text(s, FIT_FIRST_COL + 3, FIT_TABLES_ROW - 1, "Consistency of the data (\"consistency\")");
        head(s, f0 + FIT_TABLES_ROW + ":" + f1 + FIT_TABLES_ROW);
        array(s, f0 + (FIT_TABLES_ROW + 1) + ":" + a + (FIT_TABLES_ROW + FIT_STATISTICS_ROWS), "=" + call
                + ";;;;;;\"statistics\")");
        String c0 = col(FIT_FIRST_COL + 3);
        array(s, c0 + (FIT_TABLES_ROW + 1) + ":" + f1 + (FIT_TABLES_ROW + FIT_CONSISTENCY_ROWS), "=" + call
                + ";;;;;;\"consistency\")");
        prop(s, a + (FIT_TABLES_ROW + 1) + ":" + a + (FIT_TABLES_ROW + FIT_STATISTICS_ROWS), "NumberFormat",
                formats.key("0.####"));
        prop(s, f1 + (FIT_TABLES_ROW + 1) + ":" + f1 + (FIT_TABLES_ROW + FIT_CONSISTENCY_ROWS), "NumberFormat",
                formats.key("0.####"));
    }

    /**
     * Sheet Fitted card: the Wilson card's rows with its Wilson row replaced by the fit on sheet Lab VLE, and its
     * title, note and source saying so.
     */
    private static void writeFittedCard(XComponent doc, XSpreadsheet s) throws Exception {
        writeCard(doc, s, WILSON_CARD, FITTED, "Wilson's model fitted to sheet Lab VLE's data", "");
        Object[][] cells = TestCards.cells(WILSON_CARD);
        int top = 6;
        for (int r = 0; r < cells.length; r++) {
            Object label = cells[r][0];
            if ("Wilson".equals(label)) {
                s.getCellByPosition(2, top + r).setFormula("=$'Lab VLE'.$" + col(FIT_FIRST_COL + 1) + "$"
                        + (FIT_PARAMETERS_ROW + 1));
                s.getCellByPosition(3, top + r).setFormula("=$'Lab VLE'.$" + col(FIT_FIRST_COL + 2) + "$"
                        + (FIT_PARAMETERS_ROW + 1));
            } else if ("title".equals(label)) {
                text(s, 1, top + r, "Ethanol + water by Wilson's model fitted to the data block "
                        + "of sheet Lab VLE, with the Wilson card's vapour pressures and volumes");
            } else if ("note".equals(label)) {
                text(s, 1, top + r, "The Wilson row is MIX.FITVLE's fit on sheet Lab VLE: new "
                        + "points there refit it. Constant Δλ/R (as the fit gives them) carry it to other "
                        + "temperatures.");
            } else if ("source".equals(label)) {
                text(s, 1, top + r, "Wilson: fitted by MIX.FITVLE to " + DATA_SOURCE
                        + ", 101.3 kPa (sheet Lab VLE); vapour pressures: water W. Wagner, A. Pruss, J. Phys. Chem. "
                        + "Ref. Data 22 (1993) 783, ethanol the Wagner 2.5-5 constants of B. E. Poling, J. M. "
                        + "Prausnitz, J. P. O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), appendix "
                        + "A; densities: ethanol DIPPR 105 (Perry's Chemical Engineers' Handbook, 8th ed., Table "
                        + "2-32), water Kell 1975; molar masses CIAAW 2021 abridged");
            }
        }
        text(s, 0, 1, "FITTED TO PUBLISHED DATA. These rows are the Wilson card's, with its "
                + "Wilson row taken from the fit on sheet Lab VLE (cells " + col(FIT_FIRST_COL + 1)
                + (FIT_PARAMETERS_ROW + 1) + ":" + col(FIT_FIRST_COL + 2) + (FIT_PARAMETERS_ROW + 1) + ") and its "
                + "title, note and source rewritten to say so.");
    }

    private static void labFormat(XSpreadsheet s, int c, String code) throws Exception {
        prop(s, col(c) + (LAB_FIRST + 1) + ":" + col(c) + (LAB_FIRST + labRows), "NumberFormat", formats.key(code));
    }

    /** The chart's columns: one x column, one column per series, blank where a series has no point. */
    private static void writePlotData(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Still S-1 (INVENTED scenario): the columns of the T–x–y chart on sheet Recovery");
        bold(s, "A1", 12);
        fitted(s, "A2:G2", 1, "Formulas only, gathering for the chart: the bubble and dew lines from sheet Recovery's "
                + "table 4 (Wilson card), the card's azeotrope and the published one, and the published isobar of "
                + "sheet Lab VLE (liquid x1 and vapour y1 at each measured temperature). A series is blank where it "
                + "has no point.", 160);
        band(s, "A2:G2", INVENTED_COLOUR);
        String[] heads = {"x1 or y1", "bubble line (Wilson card)", "dew line (Wilson card)",
            "azeotrope, published (Evans 1916 as cited)", "azeotrope (Wilson card)",
            "Rieder & Thompson 1949: liquid", "Rieder & Thompson 1949: vapour"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, PLOT_HEAD, heads[c]);
        }
        head(s, "A" + (PLOT_HEAD + 1) + ":G" + (PLOT_HEAD + 1));
        prop(s, "A" + (PLOT_HEAD + 1) + ":G" + (PLOT_HEAD + 1), "IsTextWrapped", Boolean.TRUE);
        ExampleWorkbooks.rowHeight(s, PLOT_HEAD, 3 * 460 + 120);
        String rec = "$Recovery.";
        int r = PLOT_FIRST;
        for (int i = 0; i < TABLE_ROWS; i++, r++) {
            int at = TABLE_FIRST + i + 1;
            s.getCellByPosition(0, r).setFormula("=" + rec + "$" + col(TXY_X) + "$" + at);
            s.getCellByPosition(1, r).setFormula("=" + rec + "$" + col(TXY_T) + "$" + at);
            s.getCellByPosition(2, r).setFormula("=" + rec + "$" + col(TXY_DEW) + "$" + at);
        }
        s.getCellByPosition(0, r).setFormula("=" + rec + b(PUB_X_ROW));
        s.getCellByPosition(3, r).setFormula("=" + rec + b(PUB_T_ROW));
        r++;
        s.getCellByPosition(0, r).setFormula("=" + rec + b(AZ_X_ROW));
        s.getCellByPosition(4, r).setFormula("=" + rec + b(AZ_T_ROW));
        r++;
        String lab = "$'Lab VLE'.$";
        for (int side = 0; side < 2; side++) {
            for (int i = 0; i < labRows; i++, r++) {
                int at = LAB_FIRST + i + 1;
                s.getCellByPosition(0, r).setFormula("=" + lab + col(side == 0 ? LAB_X : LAB_Y) + "$" + at);
                s.getCellByPosition(5 + side, r).setFormula("=" + lab + col(LAB_T) + "$" + at);
            }
        }
        plotLast = r - 1;
        prop(s, "A" + (PLOT_FIRST + 1) + ":A" + (plotLast + 1), "NumberFormat", formats.key("0.0000"));
        prop(s, "B" + (PLOT_FIRST + 1) + ":G" + (plotLast + 1), "NumberFormat", formats.key("0.00"));
        widths(s, 22, 24, 24, 24, 30, 28, 28);
    }

    private static void addChart(XSpreadsheet s) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        com.sun.star.awt.Point p = ExampleWorkbooks.position(s, ACT_X, CHART_TOP);
        com.sun.star.awt.Point below = ExampleWorkbooks.position(s, ACT_X, CHART_BOTTOM + 1);
        com.sun.star.awt.Point right = ExampleWorkbooks.position(s, TXY_DEW + 1, CHART_TOP);
        CellRangeAddress data = new CellRangeAddress((short) 2, 0, PLOT_HEAD, 6, plotLast);
        charts.addNewByName(CHART_NAME, new Rectangle(p.X, p.Y, right.X - p.X - 100, below.Y - p.Y - 100),
                new CellRangeAddress[] {data}, true, false);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(CHART_NAME);
        XChartDocument cd = UnoRuntime.queryInterface(XChartDocument.class,
                UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject());
        XDiagram d = ExampleWorkbooks.lineChart(cd,
                "Ethanol + water at 101.325 kPa: T–x–y (Wilson card, estimates)", 10f,
                "mole fraction of ethanol: x1 in the liquid, y1 in the vapour", "temperature, °C");
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, d);
        dp.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        dp.setPropertyValue("MissingValueTreatment", com.sun.star.chart.MissingValueTreatment.LEAVE_GAP);
        ExampleWorkbooks.moleFractionAxis(d, "mole fraction of ethanol: x1 in the liquid, y1 in the vapour",
                formats.key("0.0"));
        XPropertySet yAxis = UnoRuntime.queryInterface(XAxisYSupplier.class, d).getYAxis();
        yAxis.setPropertyValue("AutoMin", Boolean.FALSE);
        yAxis.setPropertyValue("AutoMax", Boolean.FALSE);
        yAxis.setPropertyValue("AutoStepMain", Boolean.FALSE);
        yAxis.setPropertyValue("Min", 76.0);
        yAxis.setPropertyValue("Max", 100.0);
        yAxis.setPropertyValue("StepMain", 4.0);
        yAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        yAxis.setPropertyValue("NumberFormat", formats.key("0"));
        int[] colours = {0x2E6FB0, 0xC0392B};
        for (int i = 0; i < colours.length; i++) {
            XPropertySet series = d.getDataRowProperties(1 + i);
            series.setPropertyValue("Color", colours[i]);
            series.setPropertyValue("LineWidth", 45);
            series.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        }
        // the published azeotrope is drawn first and larger, so that the card's, a few thousandths away, shows on it
        marker(d.getDataRowProperties(3), 3, 380, 0xE67E22);
        marker(d.getDataRowProperties(4), 1, 240, 0x202020);
        d.getDataRowProperties(4).setPropertyValue("DataCaption", com.sun.star.chart.ChartDataCaption.VALUE);
        marker(d.getDataRowProperties(5), 8, 160, 0x5B8FC7);
        marker(d.getDataRowProperties(6), 8, 160, 0xD9776C);
    }

    /** A series drawn as markers only. */
    private static void marker(XPropertySet series, int symbol, int size, int colour) throws Exception {
        series.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        series.setPropertyValue("SymbolType", symbol);
        series.setPropertyValue("SymbolSize", new Size(size, size));
        series.setPropertyValue("Color", colour);
    }

    /** A card from the test resources, unchanged, with its named range, a banner and its source read off the card. */
    static void writeCard(XComponent doc, XSpreadsheet s, String resource, String name, String what,
            String use) throws Exception {
        Object[][] cells = TestCards.cells(resource);
        int top = 6;
        int columns = 0;
        int sourceRow = -1;
        for (int r = 0; r < cells.length; r++) {
            columns = Math.max(columns, cells[r].length);
            if (cells[r].length > 1 && "source".equals(cells[r][0])) {
                sourceRow = top + r;
            }
        }
        if (sourceRow < 0) {
            throw new IllegalStateException(resource + " has no source row");
        }
        String last = col(columns - 1);
        int width = (74 + 40 + 32 + (columns - 3) * 26) * 17 / 20;
        text(s, 0, 0, "Miscela card '" + name + "': ethanol + water, " + what + " (reference data, not invented)");
        bold(s, "A1", 13);
        String banner = "NOT INVENTED. These rows are the project's card " + CARD_DIR + resource + ", copied "
                + "unchanged; its 'source' row (row " + (sourceRow + 1) + ", repeated in the next line) names every "
                + "publication its numbers come from. " + use;
        fitted(s, "A2:" + last + "2", 1, banner, width);
        band(s, "A2:" + last + "2", REFERENCE_COLOUR);
        bold(s, "A2", 10);
        String source = (String) cells[sourceRow - top][1];
        s.getCellByPosition(0, 2).setFormula("=\"Source: \"&B" + (sourceRow + 1));
        merge(s, "A3:" + last + "3");
        prop(s, "A3:" + last + "3", "IsTextWrapped", Boolean.TRUE);
        prop(s, "A3:" + last + "3", "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        ExampleWorkbooks.rowHeight(s, 2, textHeight("Source: " + source, width));
        band(s, "A3:" + last + "3", REFERENCE_COLOUR);
        ExampleWorkbooks.cardTable(doc, s, cells, top, columns, 3, width, 32, name);
        prop(s, "A" + (top + 1) + ":" + last + (top + cells.length), "VertJustify",
                com.sun.star.table.CellVertJustify2.TOP);
    }
}
