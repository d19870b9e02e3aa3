package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.HEAD_COLOUR;
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
import static org.miscela.examples.ExampleWorkbooks.merge;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.textHeight;
import static org.miscela.examples.ExampleWorkbooks.widths;

import com.sun.star.awt.Rectangle;
import com.sun.star.awt.Size;
import com.sun.star.beans.XPropertySet;
import com.sun.star.chart.ChartSymbolType;
import com.sun.star.chart.XAxisXSupplier;
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
import org.miscela.core.card.TestCards;
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/acid-dilution.ods from nothing, through a real office with the built extension
 * installed: sulfuric acid diluted into water in a stirred tank. The company, the tank, the amounts, the temperatures,
 * the limit, the addition time and the vessel's heat capacity are invented; the card is the project's sulfuric acid +
 * water card ({@link #CARD_PATH}, its source row naming the publications), copied unchanged onto sheet Card.
 *
 * <p>Sheets: Dilution (the batch; both orders of addition with their peaks, the forbidden one labelled as such; the
 * cooling that keeps the safe order below a limit; the vessel's effect; the boiling note; the cautions; a chart of
 * both paths), Paths (the paths as MIX.TEMPERATUREPATH array formulas and the chart's columns) and Card. The
 * constants that locate cells are shared with ExamplesIT (0-based rows; the safe order in column B, the forbidden
 * one in column C).
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.AcidDilutionWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class AcidDilutionWorkbookBuilder {
    static final String FILE = "acid-dilution.ods";
    static final String CARD = "sulfuric-acid-water-whole-range.tsv";
    static final String CARD_PATH = "addin/core/src/test/resources/cards/" + CARD;
    static final String CHART_NAME = "TemperaturePaths";
    static final String ACID = "sulfuric acid";
    static final String WATER = "water";

    /** Points per added charge in every path (the paths' array formulas have 1 + STEPS rows). */
    static final int STEPS = 40;
    static final int PATH_ROWS = 1 + STEPS;

    // --- invented inputs
    static final double WATER_KG = 1000;
    static final double ACID_KG = 400;
    static final double START_C = 25;
    static final double LIMIT_C = 60;
    static final double HOURS = 2;
    static final double VESSEL_KJ_PER_K = 300;

    // --- Dilution: the batch (column B)
    static final int WATER_ROW = 8;
    static final int ACID_ROW = 9;
    static final int START_ROW = 10;
    /** The batch in card order: sulfuric acid in B, water in C. */
    static final int CARD_ORDER_ROW = 11;
    static final int STRENGTH_ROW = 12;
    static final int MOLE_FRACTION_ROW = 13;
    static final int INSIDE_ROW = 14;
    static final int MIXING_HEAT_ROW = 15;
    static final int HEAT_CAPACITY_ROW = 16;
    static final int RISE_ROW = 17;
    static final int RISE_FINAL_ROW = 18;

    // --- Dilution: the two orders (acid into water in B, water into acid in C)
    static final int ORDER_HEAD_ROW = 20;
    static final int FIRST_ROW = 21;
    static final int ADDED_ROW = 22;
    static final int FIRST_KG_ROW = 23;
    static final int ADDED_KG_ROW = 24;
    static final int PEAK_ROW = 25;
    static final int PEAK_AT_ROW = 26;
    static final int FINAL_ROW = 27;
    static final int PEAK_RISE_ROW = 28;
    static final int NEVER_ROW = 29;

    // --- Dilution: cooling (acid into water)
    static final int LIMIT_ROW = 32;
    static final int COOLING_ROW = 33;
    static final int HOURS_ROW = 34;
    static final int DUTY_ROW = 35;
    static final int COOLED_PEAK_ROW = 36;
    static final int COOLED_FINAL_ROW = 37;

    // --- Dilution: the vessel (acid into water)
    static final int VESSEL_ROW = 40;
    static final int VESSEL_PEAK_ROW = 41;
    static final int VESSEL_LOWER_ROW = 42;
    static final int VESSEL_COOLING_ROW = 43;
    static final int VESSEL_LESS_ROW = 44;

    static final int BOILING_ROW = 47;
    /** The notes under the chart, from column F. */
    static final int NOTES_ROW = 31;

    // --- Paths: three path arrays (amount added, °C) from row PATH_FIRST, and the chart's columns
    static final int PATH_HEAD = 3;
    static final int PATH_FIRST = 4;
    static final int SAFE_COL = 0;
    static final int NEVER_COL = 3;
    static final int COOLED_COL = 6;
    static final int PLOT_COL = 9;

    private static Formats formats;

    private AcidDilutionWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Dilution", "Paths", "Card");
        formats = new Formats(doc);
        writeCard(doc, sheet(sheets, "Card"));
        writeDilution(sheet(sheets, "Dilution"));
        writePaths(sheet(sheets, "Paths"));
        addChart(sheet(sheets, "Dilution"));
        pageSetup(doc);
    }

    private static String b(int row) {
        return "$B$" + (row + 1);
    }

    /** Width of columns A..K of Dilution in mm, for the heights of wrapped rows. */
    private static final int[] DILUTION_MM = {118, 34, 34, 18, 4, 25, 25, 25, 25, 25, 25};
    private static final int WIDE_MM = sum(DILUTION_MM) * 17 / 20;

    private static int sum(int[] mm) {
        int s = 0;
        for (int m : mm) {
            s += m;
        }
        return s;
    }

    private static XSpreadsheet dilution;

    private static void writeDilution(XSpreadsheet s) throws Exception {
        dilution = s;
        text(s, 0, 0, "Hollin Vale Chemicals (invented company): diluting sulfuric acid in stirred tank D-4");
        bold(s, "A1", 14);
        fitted(s, "A2:K2", 1, "INVENTED SCENARIO. The company, tank D-4, the amounts, the temperatures, the "
                + "temperature limit, the addition time and the vessel's heat capacity are made up to show how the "
                + "Miscela functions work; they are no one's real figures. The card on sheet Card is not invented: "
                + "it is the project's sulfuric acid + water card, and its source row names the publications.",
                WIDE_MM);
        band(s, "A2:K2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        String[] cautions = {
            "ADD ACID TO WATER, NEVER WATER TO ACID. Charge the water first, start the stirrer and the cooling, then "
                    + "add the acid slowly, watching the temperature. Water added to concentrated acid heats where "
                    + "it lands far more than the whole batch does, can boil there and throw out hot acid.",
            "Diluting sulfuric acid is strongly exothermic. These numbers are estimates for planning: they do not "
                    + "rate a process as safe. Safety data sheets, site procedures, local codes and licensed practice "
                    + "prevail over anything this workbook computes.",
            "EXTRAPOLATION. The card's heats of mixing come from data at 25 °C (valid 24.5–25.5 °C) and its "
                    + "solution heat capacity (Laliberté 2009) is fitted up to 55 °C, so every temperature here above "
                    + "25.5 °C is an extrapolation (the path functions get TRUE as 'extrapolate'), and above 55 °C "
                    + "beyond the heat-capacity fit too. Boiling is not checked: see section 5.",
        };
        ExampleWorkbooks.cautions(s, "K", WIDE_MM, 3, cautions);

        // 1. the batch
        heads(s, 7, "1. The batch in tank D-4 (change the blue cells)", "", "");
        input(s, WATER_ROW, "Water, charged first (invented)", WATER_KG, "kg", "#,##0");
        input(s, ACID_ROW, "Sulfuric acid, 100 %, added to the water (invented)", ACID_KG, "kg", "#,##0");
        input(s, START_ROW, "Temperature of both at the start (invented)", START_C, "°C", "0.0");
        text(s, 0, CARD_ORDER_ROW, "The batch in the card's order: sulfuric acid (B), water (C)");
        s.getCellByPosition(1, CARD_ORDER_ROW).setFormula("=" + b(ACID_ROW));
        s.getCellByPosition(2, CARD_ORDER_ROW).setFormula("=" + b(WATER_ROW));
        format("B" + (CARD_ORDER_ROW + 1) + ":C" + (CARD_ORDER_ROW + 1), "#,##0");
        text(s, 3, CARD_ORDER_ROW, "kg");
        String batch = "$B$" + (CARD_ORDER_ROW + 1) + ":$C$" + (CARD_ORDER_ROW + 1);
        String start = b(START_ROW);
        result(s, STRENGTH_ROW, "Strength of the diluted acid (MIX.CONVERT)", "=MIX.CONVERT(card;" + b(ACID_ROW)
                + "/SUM(" + batch + ");\"mass fraction\";\"%w/w\";;;;;\"" + ACID + "\")", "% w/w", "0.00");
        result(s, MOLE_FRACTION_ROW, "… as the acid's mole fraction (MIX.CONVERT)", "=MIX.CONVERT(card;"
                + b(STRENGTH_ROW) + ";\"%w/w\";\"mole fraction\";;;;;\"" + ACID + "\")", "mol/mol", "0.0000");
        result(s, INSIDE_ROW, "Inside the card's data at the start? (MIX.INSIDE, 1 = yes)", "=MIX.INSIDE(card;"
                + b(MOLE_FRACTION_ROW) + ";" + start + ")", "", "0");
        result(s, MIXING_HEAT_ROW, "Heat of mixing (MIX.MIXINGHEAT; negative = released)",
                "=MIX.MIXINGHEAT(card;" + batch + ";" + start + ";\"kg\")", "kJ", "#,##0");
        result(s, HEAT_CAPACITY_ROW, "Heat capacity of the diluted acid at the start (MIX.HEATCAPACITY)",
                "=MIX.HEATCAPACITY(card;" + b(STRENGTH_ROW) + ";" + start + ";;\"%w/w\";;\"kg\")", "kJ/(kg·K)",
                "0.0000");
        result(s, RISE_ROW, "Rise if all mixed at once (MIX.TEMPERATURERISE)",
                "=MIX.TEMPERATURERISE(card;" + batch + ";" + start + ";\"kg\";TRUE())", "K", "0.0");
        result(s, RISE_FINAL_ROW, "… so the batch ends at (extrapolated)", "=" + start + "+" + b(RISE_ROW), "°C",
                "0.0");

        // 2. the two orders
        heads(s, ORDER_HEAD_ROW, "2. Order of addition: no cooling, the vessel left out", "acid into water",
                "water into acid");
        band(s, "C" + (ORDER_HEAD_ROW + 1), CAUTION_COLOUR);
        text(s, 0, FIRST_ROW, "In the tank first");
        text(s, 1, FIRST_ROW, WATER);
        text(s, 2, FIRST_ROW, ACID);
        text(s, 0, ADDED_ROW, "Added to it, slowly");
        text(s, 1, ADDED_ROW, ACID);
        text(s, 2, ADDED_ROW, WATER);
        prop(s, "B" + (FIRST_ROW + 1) + ":C" + (ADDED_ROW + 1), "HoriJustify", CellHoriJustify.RIGHT);
        text(s, 0, FIRST_KG_ROW, "Amount in the tank first");
        s.getCellByPosition(1, FIRST_KG_ROW).setFormula("=" + b(WATER_ROW));
        s.getCellByPosition(2, FIRST_KG_ROW).setFormula("=" + b(ACID_ROW));
        text(s, 0, ADDED_KG_ROW, "Amount added");
        s.getCellByPosition(1, ADDED_KG_ROW).setFormula("=" + b(ACID_ROW));
        s.getCellByPosition(2, ADDED_KG_ROW).setFormula("=" + b(WATER_ROW));
        format("B" + (FIRST_KG_ROW + 1) + ":C" + (ADDED_KG_ROW + 1), "#,##0");
        text(s, 3, FIRST_KG_ROW, "kg");
        text(s, 3, ADDED_KG_ROW, "kg");
        both(s, PEAK_ROW, "Peak temperature (MIX.TEMPERATUREPATH, \"peak\")", "peak", "°C", "0.0");
        both(s, PEAK_AT_ROW, "… reached after adding (\"peak at\")", "peak at", "kg", "#,##0");
        both(s, FINAL_ROW, "Temperature at the end (\"final\")", "final", "°C", "0.0");
        for (int c = 1; c <= 2; c++) {
            String l = col(c);
            s.getCellByPosition(c, PEAK_RISE_ROW).setFormula("=" + l + (PEAK_ROW + 1) + "-" + start);
        }
        text(s, 0, PEAK_RISE_ROW, "Peak above the start");
        format("B" + (PEAK_RISE_ROW + 1) + ":C" + (PEAK_RISE_ROW + 1), "0.0");
        text(s, 3, PEAK_RISE_ROW, "K");
        String never = "A" + (NEVER_ROW + 1) + ":D" + (NEVER_ROW + 1);
        fitted(s, never, NEVER_ROW, "Column C, water into acid, is the FORBIDDEN order: it is shown only to show why. "
                + "Never add water to acid. The first water meets a great excess of acid and the batch heats at once.",
                (DILUTION_MM[0] + DILUTION_MM[1] + DILUTION_MM[2] + DILUTION_MM[3]) * 17 / 20);
        band(s, never, CAUTION_COLOUR);
        bold(s, never, 10);

        // 3. cooling to a limit
        heads(s, 31, "3. Cooling to stay below a limit (acid into water)", "", "");
        input(s, LIMIT_ROW, "Highest temperature allowed in the tank (invented)", LIMIT_C, "°C", "0.0");
        String safe = "B$" + (FIRST_ROW + 1) + ":B$" + (ADDED_ROW + 1) + ";B$" + (FIRST_KG_ROW + 1) + ":B$"
                + (ADDED_KG_ROW + 1);
        String call = "=MIX.TEMPERATUREPATH(card;" + safe + ";" + start + ";\"kg\";TRUE();";
        result(s, COOLING_ROW, "Heat to remove over the addition (\"cooling\" at the limit)", call + "\"cooling\";"
                + STEPS + ";0;;;" + b(LIMIT_ROW) + ")", "kJ", "#,##0");
        input(s, HOURS_ROW, "Time the acid takes to go in (invented)", HOURS, "h", "0.0");
        result(s, DUTY_ROW, "Mean cooling duty over the addition", "=" + b(COOLING_ROW) + "/(" + b(HOURS_ROW)
                + "*3600)", "kW", "0.0");
        result(s, COOLED_PEAK_ROW, "Peak with that heat removed (\"peak\"; equals the limit)", call + "\"peak\";"
                + STEPS + ";0;" + b(COOLING_ROW) + ")", "°C", "0.00");
        result(s, COOLED_FINAL_ROW, "Temperature at the end with that heat removed (\"final\")", call + "\"final\";"
                + STEPS + ";0;" + b(COOLING_ROW) + ")", "°C", "0.0");

        // 4. the vessel
        heads(s, 39, "4. The tank's own heat capacity (acid into water, no cooling)", "", "");
        input(s, VESSEL_ROW, "Heat capacity of tank D-4 and its stirrer (invented)", VESSEL_KJ_PER_K, "kJ/K", "#,##0");
        result(s, VESSEL_PEAK_ROW, "Peak with the tank warming too (\"peak\")", call + "\"peak\";" + STEPS + ";"
                + b(VESSEL_ROW) + ")", "°C", "0.0");
        result(s, VESSEL_LOWER_ROW, "Lower than with the tank left out by", "=" + b(PEAK_ROW) + "-"
                + b(VESSEL_PEAK_ROW), "K", "0.0");
        result(s, VESSEL_COOLING_ROW, "Heat to remove to stay below the limit, tank included", call + "\"cooling\";"
                + STEPS + ";" + b(VESSEL_ROW) + ";;;" + b(LIMIT_ROW) + ")", "kJ", "#,##0");
        result(s, VESSEL_LESS_ROW, "Less than with the tank left out by", "=" + b(COOLING_ROW) + "-"
                + b(VESSEL_COOLING_ROW), "kJ", "#,##0");

        // 5. boiling
        heads(s, BOILING_ROW - 1, "5. Boiling is not checked", "", "");
        String boiling = "A" + (BOILING_ROW + 1) + ":D" + (BOILING_ROW + 1);
        fitted(s, boiling, BOILING_ROW, "This card carries no 'boiling temperatures' row: no published table of "
                + "where sulfuric acid + water boils was at hand when it was made, so none was invented and NOTHING "
                + "here is checked against boiling. Compare every peak with the boiling point of the acid at that "
                + "strength from its safety data sheet; a peak near or above 100 °C means the batch may boil. With a "
                + "'boiling temperatures' row on the card (points of mole fraction and temperature, from the safety "
                + "data sheet; docs/card-format.md explains the row), MIX.TEMPERATURERISE and every point of "
                + "MIX.TEMPERATUREPATH refuse a batch that would boil (Err:502, BOILS) unless TRUE is passed as "
                + "'boiling'.", (DILUTION_MM[0] + DILUTION_MM[1] + DILUTION_MM[2] + DILUTION_MM[3]) * 17 / 20);
        band(s, boiling, CAUTION_COLOUR);

        // how to read it, under the chart
        int notes = NOTES_ROW;
        text(s, 5, notes, "How the numbers are worked out");
        head(s, "F" + (notes + 1) + ":K" + (notes + 1));
        block(s, "F" + (notes + 2) + ":K" + (BOILING_ROW + 1), "The tank is taken as well stirred, at constant "
                + "pressure, exchanging no heat but the heat removed, which leaves in proportion to the amount "
                + "added. Each point of a path is the temperature of everything charged so far (the heat of mixing "
                + "warms the blend with its own heat capacity; MIX.TEMPERATUREPATH, " + STEPS + " points per "
                + "charge, the peak refined between them); the end of either order is the batch's own result, "
                + "MIX.TEMPERATURERISE's.\n"
                + "Acid into water: the tank holds a large excess of water all along, so it warms gradually to "
                + "the end. Water into acid: the first water meets concentrated acid, which releases far more heat "
                + "per kilogram of water, and the peak comes early and far higher.\n"
                + "The cooling is the least heat that keeps the peak at the limit; the duty is that heat spread "
                + "evenly over the addition time. The tank's own heat capacity lowers the peak; leaving it out, as "
                + "sections 2 and 3 do, errs on the high side.\n"
                + "The paths are on sheet Paths; the card and its sources on sheet Card.");
        prop(s, "D" + (WATER_ROW + 1) + ":D" + (VESSEL_LESS_ROW + 1), "ParaLeftMargin", 150);
        widths(s, DILUTION_MM);
    }

    /** The result of one order of addition in B (acid into water) and C (water into acid). */
    private static void both(XSpreadsheet s, int row, String label, String output, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        for (int c = 1; c <= 2; c++) {
            String l = col(c);
            s.getCellByPosition(c, row).setFormula("=MIX.TEMPERATUREPATH(card;" + l + "$" + (FIRST_ROW + 1) + ":" + l
                    + "$" + (ADDED_ROW + 1) + ";" + l + "$" + (FIRST_KG_ROW + 1) + ":" + l + "$" + (ADDED_KG_ROW + 1)
                    + ";" + b(START_ROW) + ";\"kg\";TRUE();\"" + output + "\";" + STEPS + ")");
        }
        format("B" + (row + 1) + ":C" + (row + 1), format);
        text(s, 3, row, unit);
    }

    private static void writePaths(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Tank D-4 (INVENTED scenario): the temperature along each order of addition, and the chart's data");
        bold(s, "A1", 12);
        fitted(s, "A2:O2", 1, "Each pair of columns is one MIX.TEMPERATUREPATH array formula (result \"path\", "
                + STEPS + " points per added charge): the amount added so far and the temperature of the tank. "
                + "Columns J–O gather them for the chart on sheet Dilution. Water into acid is the FORBIDDEN order, "
                + "shown only to show why. Every temperature above 25.5 °C is an extrapolation of the card.", 250);
        band(s, "A2:O2", INVENTED_COLOUR);
        String d = "Dilution.";
        String safe = d + "$B$" + (FIRST_ROW + 1) + ":$B$" + (ADDED_ROW + 1) + ";" + d + "$B$" + (FIRST_KG_ROW + 1)
                + ":$B$" + (ADDED_KG_ROW + 1);
        String never = d + "$C$" + (FIRST_ROW + 1) + ":$C$" + (ADDED_ROW + 1) + ";" + d + "$C$" + (FIRST_KG_ROW + 1)
                + ":$C$" + (ADDED_KG_ROW + 1);
        String common = ";" + d + b(START_ROW) + ";\"kg\";TRUE();\"path\";" + STEPS;
        pathArray(s, SAFE_COL, "acid into water", "acid added, kg", "=MIX.TEMPERATUREPATH(card;" + safe + common
                + ")");
        pathArray(s, NEVER_COL, "water into acid: NEVER", "water added, kg", "=MIX.TEMPERATUREPATH(card;" + never
                + common + ")");
        band(s, col(NEVER_COL) + (PATH_HEAD) + ":" + col(NEVER_COL + 1) + (PATH_HEAD), CAUTION_COLOUR);
        pathArray(s, COOLED_COL, "acid into water, cooled", "acid added, kg", "=MIX.TEMPERATUREPATH(card;" + safe
                + common + ";0;" + d + b(COOLING_ROW) + ")");

        // the chart's columns: one x column, one column per series, blank where a series has no point
        String[] heads = {"added, kg", "acid into water", "water into acid (never)", "acid into water, cooled to "
            + "the limit", "peaks", "limit"};
        text(s, PLOT_COL, PATH_HEAD - 1, "For the chart");
        head(s, col(PLOT_COL) + PATH_HEAD + ":" + col(PLOT_COL + 5) + PATH_HEAD);
        for (int i = 0; i < heads.length; i++) {
            text(s, PLOT_COL + i, PATH_HEAD, heads[i]);
        }
        head(s, col(PLOT_COL) + (PATH_HEAD + 1) + ":" + col(PLOT_COL + 5) + (PATH_HEAD + 1));
        prop(s, col(PLOT_COL) + (PATH_HEAD + 1) + ":" + col(PLOT_COL + 5) + (PATH_HEAD + 1), "IsTextWrapped",
                Boolean.TRUE);
        ExampleWorkbooks.rowHeight(s, PATH_HEAD, 1900);
        int[] from = {SAFE_COL, NEVER_COL, COOLED_COL};
        int r = PATH_FIRST;
        for (int series = 0; series < from.length; series++) {
            for (int i = 0; i < PATH_ROWS; i++, r++) {
                String at = (PATH_FIRST + i + 1) + "";
                s.getCellByPosition(PLOT_COL, r).setFormula("=" + col(from[series]) + at);
                s.getCellByPosition(PLOT_COL + 1 + series, r).setFormula("=" + col(from[series] + 1) + at);
            }
        }
        for (int c = 1; c <= 2; c++, r++) {
            s.getCellByPosition(PLOT_COL, r).setFormula("=" + d + col(c) + (PEAK_AT_ROW + 1));
            s.getCellByPosition(PLOT_COL + 4, r).setFormula("=" + d + col(c) + (PEAK_ROW + 1));
        }
        s.getCellByPosition(PLOT_COL, r).setValue(0);
        s.getCellByPosition(PLOT_COL + 5, r).setFormula("=" + d + b(LIMIT_ROW));
        r++;
        s.getCellByPosition(PLOT_COL, r).setFormula("=MAX(" + d + b(WATER_ROW) + ";" + d + b(ACID_ROW) + ")");
        s.getCellByPosition(PLOT_COL + 5, r).setFormula("=" + d + b(LIMIT_ROW));
        plotLast = r;
        format(s, col(PLOT_COL) + (PATH_FIRST + 1) + ":" + col(PLOT_COL) + (r + 1), "#,##0.0");
        format(s, col(PLOT_COL + 1) + (PATH_FIRST + 1) + ":" + col(PLOT_COL + 5) + (r + 1), "0.0");
        widths(s, 36, 18, 3, 36, 18, 3, 36, 18, 3, 20, 22, 22, 30, 16, 16);
    }

    private static int plotLast;

    private static void pathArray(XSpreadsheet s, int c, String title, String amount, String formula)
            throws Exception {
        text(s, c, PATH_HEAD - 1, title);
        merge(s, col(c) + PATH_HEAD + ":" + col(c + 1) + PATH_HEAD);
        head(s, col(c) + PATH_HEAD + ":" + col(c + 1) + PATH_HEAD);
        text(s, c, PATH_HEAD, amount);
        text(s, c + 1, PATH_HEAD, "°C");
        head(s, col(c) + (PATH_HEAD + 1) + ":" + col(c + 1) + (PATH_HEAD + 1));
        String range = col(c) + (PATH_FIRST + 1) + ":" + col(c + 1) + (PATH_FIRST + PATH_ROWS);
        array(s, range, formula);
        format(s, col(c) + (PATH_FIRST + 1) + ":" + col(c) + (PATH_FIRST + PATH_ROWS), "#,##0.0");
        format(s, col(c + 1) + (PATH_FIRST + 1) + ":" + col(c + 1) + (PATH_FIRST + PATH_ROWS), "0.0");
    }

    private static void addChart(XSpreadsheet s) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        // from the top of F8 to just above the notes in F32, across F..K
        com.sun.star.awt.Point p = ExampleWorkbooks.position(s, 5, 7);
        com.sun.star.awt.Point below = ExampleWorkbooks.position(s, 5, NOTES_ROW);
        com.sun.star.awt.Point right = ExampleWorkbooks.position(s, 11, 7);
        CellRangeAddress data = new CellRangeAddress((short) 1, PLOT_COL, PATH_HEAD, PLOT_COL + 5, plotLast);
        charts.addNewByName(CHART_NAME, new Rectangle(p.X, p.Y, right.X - p.X - 200, below.Y - p.Y - 300),
                new CellRangeAddress[] {data}, true, false);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(CHART_NAME);
        XChartDocument cd = UnoRuntime.queryInterface(XChartDocument.class,
                UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject());
        XDiagram d = ExampleWorkbooks.lineChart(cd, "Tank D-4: temperature against the amount added (estimates)",
                10f, "amount added so far, kg (acid, or water in the forbidden order)", "temperature in the tank, °C");
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, d);
        dp.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        dp.setPropertyValue("MissingValueTreatment", com.sun.star.chart.MissingValueTreatment.LEAVE_GAP);
        XPropertySet xAxis = UnoRuntime.queryInterface(XAxisXSupplier.class, d).getXAxis();
        xAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        xAxis.setPropertyValue("NumberFormat", formats.key("#,##0"));
        XPropertySet yAxis = UnoRuntime.queryInterface(XAxisYSupplier.class, d).getYAxis();
        yAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        yAxis.setPropertyValue("NumberFormat", formats.key("0"));
        int[] colours = {0x2E6FB0, 0xC0392B, 0x3A9E5C};
        for (int i = 0; i < colours.length; i++) {
            XPropertySet series = d.getDataRowProperties(1 + i);
            series.setPropertyValue("Color", colours[i]);
            series.setPropertyValue("LineWidth", 45);
            series.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        }
        XPropertySet peaks = d.getDataRowProperties(4);
        peaks.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        peaks.setPropertyValue("SymbolType", 0);
        peaks.setPropertyValue("SymbolSize", new Size(280, 280));
        peaks.setPropertyValue("Color", 0x202020);
        peaks.setPropertyValue("DataCaption", com.sun.star.chart.ChartDataCaption.VALUE);
        XPropertySet limit = d.getDataRowProperties(5);
        limit.setPropertyValue("Color", 0x7F7F7F);
        limit.setPropertyValue("LineWidth", 25);
        limit.setPropertyValue("SymbolType", ChartSymbolType.NONE);
    }

    /** The card from the test resource, unchanged, with its named range 'card' and a banner naming its source. */
    private static void writeCard(XComponent doc, XSpreadsheet s) throws Exception {
        Object[][] cells = TestCards.cells(CARD);
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
            throw new IllegalStateException(CARD + " has no source row");
        }
        String last = col(columns - 1);
        int width = (74 + 40 + 32 + (columns - 3) * 26) * 17 / 20;
        text(s, 0, 0, "Miscela card: sulfuric acid + water (reference data, not invented)");
        bold(s, "A1", 13);
        String banner = "NOT INVENTED. These rows are the project's reference card " + CARD_PATH + ", copied "
                + "unchanged. Its 'source' row (row " + (sourceRow + 1) + ", repeated in the next line) names the "
                + "publications its heats of mixing and heat capacities come from, and its 'note' rows say how far "
                + "the data reach: heats of mixing at 25 °C only, the solution heat capacity fitted up to 55 °C and "
                + "93.89 % w/w. The card has no 'boiling temperatures' row.";
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
        ExampleWorkbooks.cardTable(doc, s, cells, top, columns, 3, width, 32);
    }

    // --- small helpers

    /** A section head over A..D with the column titles of B and C. */
    private static void heads(XSpreadsheet s, int row, String title, String b, String c) throws Exception {
        text(s, 0, row, title);
        if (!b.isEmpty()) {
            text(s, 1, row, b);
            text(s, 2, row, c);
        }
        head(s, "A" + (row + 1) + ":D" + (row + 1));
        prop(s, "B" + (row + 1) + ":C" + (row + 1), "HoriJustify", CellHoriJustify.RIGHT);
        band(s, "A" + (row + 1) + ":D" + (row + 1), HEAD_COLOUR);
    }

    private static void input(XSpreadsheet s, int row, String label, double value, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setValue(value);
        text(s, 3, row, unit);
        band(s, "B" + (row + 1), INPUT_COLOUR);
        format(s, "B" + (row + 1), format);
    }

    private static void result(XSpreadsheet s, int row, String label, String formula, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setFormula(formula);
        if (!unit.isEmpty()) {
            text(s, 3, row, unit);
        }
        format(s, "B" + (row + 1), format);
        prop(s, "B" + (row + 1), "HoriJustify", CellHoriJustify.RIGHT);
    }

    /** A number format on sheet Dilution. */
    private static void format(String range, String code) throws Exception {
        format(dilution, range, code);
    }

    private static void format(XSpreadsheet s, String range, String code) throws Exception {
        prop(s, range, "NumberFormat", formats.key(code));
    }
}
