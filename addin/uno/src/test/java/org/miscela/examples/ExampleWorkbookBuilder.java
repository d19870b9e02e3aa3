package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.HEAD_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.REFERENCE_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.col;
import static org.miscela.examples.ExampleWorkbooks.fitted;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.merge;
import static org.miscela.examples.ExampleWorkbooks.nameRange;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.result;
import static org.miscela.examples.ExampleWorkbooks.rowHeight;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.textHeight;
import static org.miscela.examples.ExampleWorkbooks.widths;

import com.sun.star.awt.Rectangle;
import com.sun.star.beans.XPropertySet;
import com.sun.star.chart.ChartAxisAssign;
import com.sun.star.chart.ChartLegendPosition;
import com.sun.star.chart.ChartSymbolType;
import com.sun.star.chart.XAxisYSupplier;
import com.sun.star.chart.XChartDocument;
import com.sun.star.chart.XDiagram;
import com.sun.star.container.XNameAccess;
import com.sun.star.document.XEmbeddedObjectSupplier;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheets;
import com.sun.star.table.CellRangeAddress;
import com.sun.star.table.XCellRange;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.table.XTableCharts;
import com.sun.star.uno.UnoRuntime;
import org.miscela.core.library.CardLibrary;
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/coolant-blend.ods from nothing, through a real office with the built
 * extension installed. The scenario (Fernhollow Fluids Ltd), its volumes, tank and density reading are invented; the
 * card is not: it is the add-in's library card for ethylene glycol + water, placed on sheet Card by the array formula
 * {@code =MIX.LIBRARYCARD("ethylene glycol")} and named 'card'. That card holds 20 °C data (19.5 to 20.5 °C, 0 to
 * 60 % w/w), so everything the sheet computes is at 20 °C.
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.ExampleWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class ExampleWorkbookBuilder {
    static final String FILE = "coolant-blend.ods";

    /** The library card the workbook places, and the formula that places it. */
    static final String LIBRARY_NAME = "ethylene glycol";
    static final String CARD_FORMULA = "=MIX.LIBRARYCARD(\"" + LIBRARY_NAME + "\")";

    /** The card's first row on sheet Card (0-based), the MIX.CHECK row and the library's entry below the card. */
    static final int CARD_TOP = 5;
    static final int CARD_CHECK_ROW = 3;
    /** Sheet Card, column B: the library's stated accuracy and outside check (rows after the card, 0-based). */
    static int accuracyRow() {
        return CARD_TOP + cardCells().length + 2;
    }

    /** Sheet Blend, column B (0-based rows): inputs and results at the input point. */
    static final int STRENGTH_ROW = 7;
    static final int TEMPERATURE_ROW = 8;
    static final int POINT_CHECK_ROW = 10;
    static final int RESULTS_FIRST = 13;
    static final int MOLE_FRACTION_ROW = 13;
    static final int STRENGTH_VOL_ROW = 14;
    static final int EXCESS_ROW = 15;
    static final int PARTIAL_GLYCOL_ROW = 16;
    static final int PARTIAL_WATER_ROW = 17;
    static final int PARTIAL_EXCESS_GLYCOL_ROW = 18;
    static final int PARTIAL_EXCESS_WATER_ROW = 19;
    static final int MOLAR_VOLUME_ROW = 20;
    static final int DENSITY_ROW = 21;
    static final int PURE_GLYCOL_ROW = 22;
    static final int PURE_WATER_ROW = 23;
    static final int CHANGE_ROW = 24;
    /** Equal volumes mixed (MIX.BATCH). */
    static final int MAKEUP_GLYCOL_ROW = 27;
    static final int MAKEUP_WATER_ROW = 28;
    static final int MAKEUP_VOLUME_ROW = 29;
    static final int MAKEUP_CONTRACTION_ROW = 30;
    static final int MAKEUP_CONTRACTION_PERCENT_ROW = 31;
    static final int MAKEUP_MASS_PERCENT_ROW = 32;
    static final int MAKEUP_STRENGTH_ROW = 33;
    /** A tank of 40 %vol (MIX.RECIPE). */
    static final int TANK_VOLUME_ROW = 36;
    static final int TANK_STRENGTH_ROW = 37;
    static final int RECIPE_KG_ROW = 38;
    static final int RECIPE_L_ROW = 40;
    static final int RECIPE_CONTRACTION_ROW = 42;
    static final int RECIPE_VOLUME_CHECK_ROW = 43;
    static final int WORKING_VOLUME_ROW = 44;
    static final int ROOM_ROW = 45;
    /** Density check of the filled tank (MIX.FROMDENSITY). */
    static final int READING_ROW = 48;
    static final int READ_STRENGTH_ROW = 49;
    static final int READ_MASS_PERCENT_ROW = 50;
    static final int EXPECTED_DENSITY_ROW = 51;
    static final int READING_GAP_ROW = 52;

    /** Invented inputs: equal volumes of each liquid, the tank, its working volume and a density reading. */
    static final double MAKEUP_LITRES = 100.0;
    static final double TANK_LITRES = 2000.0;
    static final double TANK_STRENGTH = 40.0;
    static final double WORKING_LITRES = 2200.0;
    static final double READING = 1054.60;
    static final double STRENGTH = 40.0;
    static final double TEMPERATURE = 20.0;

    /** Composition table on sheet Blend: header row and first data row (0-based), first column, rows. */
    static final int TABLE_HEAD = 6;
    static final int TABLE_FIRST = 7;
    /** 0 to 57 % w/w in steps of 3, the last step below the card's limit of 60 %. */
    static final int TABLE_ROWS = 20;
    static final double TABLE_STEP = 3.0;
    static final int TABLE_COL = 5; // column F: % w/w; G: x1; H..N: the add-in's arrays
    static final int TABLE_X = TABLE_COL + 1;
    static final int TABLE_PARTIAL_GLYCOL = TABLE_COL + 2;
    static final int TABLE_PARTIAL_WATER = TABLE_COL + 3;
    static final int TABLE_EXCESS = TABLE_COL + 4;
    static final int TABLE_PARTIAL_EXCESS_GLYCOL = TABLE_COL + 5;
    static final int TABLE_PARTIAL_EXCESS_WATER = TABLE_COL + 6;
    static final int TABLE_MOLAR_VOLUME = TABLE_COL + 7;
    static final int TABLE_DENSITY = TABLE_COL + 8;

    /** Column widths of sheet Blend in mm, from column A, and their sum. */
    private static final int[] BLEND_WIDTHS = {100, 24, 19, 3, 3, 19, 20, 19, 18, 21, 19, 20, 18, 19};
    private static final int BLEND_WIDTH = java.util.Arrays.stream(BLEND_WIDTHS).sum();

    /** The number formats of the document being built. */
    private static Formats formats;

    private ExampleWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    /** The library card's cells as MIX.LIBRARYCARD returns them (the block's size and its labels). */
    static Object[][] cardCells() {
        return CardLibrary.find(LIBRARY_NAME).cells();
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Blend", "Card");
        XSpreadsheet blend = sheet(sheets, "Blend");
        XSpreadsheet card = sheet(sheets, "Card");
        formats = new Formats(doc);
        writeCard(doc, card);
        writeBlend(blend, formats);
        addCharts(blend);
        pageSetup(doc);
    }

    // --- sheet Card

    /** What each row of the library card says, by its label (and subject where the label repeats). */
    private static String explain(String label, Object subject) {
        switch (label) {
            case "Miscela card":
                return "card format version 2";
            case "card size":
                return "rows and columns of this block: a block cut short is refused, not read";
            case "title":
                return "the card's title";
            case "source":
                return "where every number comes from";
            case "note":
                return "20 °C DATA ONLY";
            case "component":
                return "water".equals(subject) ? "component 2; molar mass in g/mol"
                        : "component 1 (x1 is its mole fraction); molar mass in g/mol";
            case "density model":
                return "water".equals(subject) ? "the add-in's built-in water density (Tanaka et al. 2001)"
                        : "one density, no temperature term: the card holds 20 °C only";
            case "density coefficients":
                return "pure ethylene glycol at 20 °C, kg/m³";
            case "valid temperature":
                return "the functions refuse outside 19.5 to 20.5 °C";
            case "valid mole fraction":
                return "x1 up to 0.303315168: 60 % w/w ethylene glycol";
            case "extrapolation":
                return "no answers outside the validity range";
            default:
                return label.startsWith("excess volume A") ? "Redlich–Kister coefficient, cm³/mol (20 °C)" : "";
        }
    }

    private static void writeCard(XComponent doc, XSpreadsheet s) throws Exception {
        Object[][] cells = cardCells();
        int rows = cells.length;
        int columns = cells[0].length;
        String last = col(columns - 1);
        String explanation = col(columns + 1);
        int[] mm = {62, 120, 26, 26, 3, 86};
        int width = mm[0] + mm[1] + mm[2] + mm[3];
        text(s, 0, 0, "Miscela card: ethylene glycol + water from the add-in's library (sourced, not invented)");
        bold(s, "A1", 13);
        fitted(s, "A2:" + explanation + "2", 1, "NOT INVENTED. The card below is the add-in's own library card, "
                + "placed by the array formula " + CARD_FORMULA + " over A" + (CARD_TOP + 1) + ":" + last
                + (CARD_TOP + rows) + ": Redlich–Kister coefficients fitted by the add-in's engine to the CRC "
                + "Handbook's table of densities at 20 °C, 0 to 60 % w/w; its 'source' row names every source. "
                + "20 °C DATA ONLY: the card answers from 19.5 to 20.5 °C and up to 60 % w/w ethylene glycol, and "
                + "every function refuses (Err:502) outside. It computes no freezing point.", width + mm[4] + mm[5]);
        band(s, "A2:" + explanation + "2", REFERENCE_COLOUR);
        bold(s, "A2", 10);
        fitted(s, "A3:" + explanation + "3", 2, "The named range 'card' covers the whole array, A" + (CARD_TOP + 1)
                + ":" + last + (CARD_TOP + rows) + ". The cells are the formula's result: to use a card of your "
                + "own, replace the formula with that card (its source written in the 'source' row) and name it "
                + "again. Column " + explanation + " explains each row.", width + mm[4] + mm[5]);
        text(s, 0, CARD_CHECK_ROW, "Card check (MIX.CHECK)");
        bold(s, "A" + (CARD_CHECK_ROW + 1), 10);
        s.getCellByPosition(1, CARD_CHECK_ROW).setFormula("=MIX.CHECK(card)");
        String[] heads = {"label", "subject / value", "value", "value"};
        for (int c = 0; c < columns; c++) {
            text(s, c, CARD_TOP - 1, c < heads.length ? heads[c] : "value");
        }
        text(s, columns + 1, CARD_TOP - 1, "what the row says");
        head(s, "A" + CARD_TOP + ":" + explanation + CARD_TOP);
        String area = "A" + (CARD_TOP + 1) + ":" + last + (CARD_TOP + rows);
        ExampleWorkbooks.array(s, area, CARD_FORMULA);
        band(s, area, REFERENCE_COLOUR);
        prop(s, "B" + (CARD_TOP + 1) + ":B" + (CARD_TOP + rows), "IsTextWrapped", Boolean.TRUE);
        nameRange(doc, "card", "$Card.$A$" + (CARD_TOP + 1) + ":$" + last + "$" + (CARD_TOP + rows));
        for (int r = 0; r < rows; r++) {
            String label = String.valueOf(cells[r][0]);
            text(s, columns + 1, CARD_TOP + r, explain(label, cells[r][1]));
            if (cells[r][1] instanceof String && ((String) cells[r][1]).length() > 60) {
                rowHeight(s, CARD_TOP + r, textHeight((String) cells[r][1], mm[1]));
            }
        }
        prop(s, explanation + (CARD_TOP + 1) + ":" + explanation + (CARD_TOP + rows), "CharPosture",
                com.sun.star.awt.FontSlant.ITALIC);
        prop(s, "A" + (CARD_TOP + 1) + ":" + explanation + (CARD_TOP + rows), "VertJustify",
                com.sun.star.table.CellVertJustify2.TOP);
        int below = accuracyRow();
        text(s, 0, below - 1, "The library's entry (MIX.LIBRARY)");
        head(s, "A" + below + ":" + explanation + below);
        text(s, 0, below, "Stated accuracy");
        s.getCellByPosition(1, below).setFormula("=INDEX(MIX.LIBRARY(\"" + LIBRARY_NAME + "\");2;6)");
        text(s, 0, below + 1, "Outside check");
        s.getCellByPosition(1, below + 1).setFormula("=INDEX(MIX.LIBRARY(\"" + LIBRARY_NAME + "\");2;7)");
        for (int r = below; r <= below + 1; r++) {
            String range = "B" + (r + 1) + ":" + explanation + (r + 1);
            merge(s, range);
            prop(s, range, "IsTextWrapped", Boolean.TRUE);
            rowHeight(s, r, 1050);
            prop(s, "A" + (r + 1) + ":" + explanation + (r + 1), "VertJustify",
                    com.sun.star.table.CellVertJustify2.TOP);
        }
        widths(s, mm);
    }

    // --- sheet Blend

    private static void writeBlend(XSpreadsheet s, Formats f) throws Exception {
        text(s, 0, 0, "Fernhollow Fluids Ltd (invented company): ethylene glycol + water coolant blending at 20 °C");
        bold(s, "A1", 14);
        String bannerText = "Invented scenario: the company, the volumes, the tank and the density reading are "
                + "INVENTED (marked so). The card is NOT invented: it is the library's ethylene glycol + water card "
                + "(CRC Handbook densities at 20 °C; sheet Card). It holds 20 °C data only (19.5 to 20.5 °C, up to "
                + "60 % w/w glycol): every temperature on this sheet is 20 °C, and the functions refuse (Err:502) "
                + "outside.";
        fitted(s, "A2:N2", 1, bannerText, BLEND_WIDTH);
        band(s, "A2:N2", INVENTED_COLOUR);
        String[] cautions = {
            "CAUTION: ethylene glycol is toxic: harmful or fatal if swallowed, and its sweet taste attracts "
                    + "children and animals. Wear gloves and eye protection, label and close every container, "
                    + "clean up spills and dispose of coolant as local rules require. Follow the supplier's safety "
                    + "data sheet.",
            "This sheet computes densities, volumes and strengths at 20 °C only. It computes NO freezing point and "
                    + "claims no freeze or boil-over protection: choose the strength a cooling system needs from "
                    + "the equipment maker's instructions and the coolant supplier's data; local codes and licensed "
                    + "practice prevail.",
            "Do not overfill: keep the expansion space the tank and system makers require (a blend warmer than "
                    + "20 °C takes more room). Figures here are not for custody transfer, trade or labelling.",
        };
        for (int i = 0; i < cautions.length; i++) {
            int row = 2 + i;
            String a = "A" + (row + 1) + ":N" + (row + 1);
            fitted(s, a, row, cautions[i], BLEND_WIDTH);
            band(s, a, CAUTION_COLOUR);
        }
        bold(s, "A3", 10);

        // inputs
        text(s, 0, 6, "Inputs (change the blue cells)");
        head(s, "A7:C7");
        ExampleWorkbooks.input(f, s, STRENGTH_ROW, "Ethylene glycol content (card: 0 to 60)", STRENGTH, "% w/w",
                "0.0");
        ExampleWorkbooks.input(f, s, TEMPERATURE_ROW, "Temperature (card: 19.5 to 20.5 °C only)", TEMPERATURE,
                "°C", "0.0");
        String x = "$B$" + (STRENGTH_ROW + 1);
        String t = "$B$" + (TEMPERATURE_ROW + 1);
        String w = ";;\"%w/w\")";
        result(f, s, 9, "Card check (MIX.CHECK)", "=MIX.CHECK(card)", "", "General");
        result(f, s, POINT_CHECK_ROW, "Point check (MIX.CHECKPOINT)", "=MIX.CHECKPOINT(card;" + x + ";" + t + w,
                "", "General");

        // results at the input point
        text(s, 0, 12, "Results at the input point");
        head(s, "A13:C13");
        String[][] results = {
            {"Mole fraction of glycol x1 (MIX.CONVERT)", "=MIX.CONVERT(card;" + x + ";\"%w/w\";\"x\")",
                "mol/mol", "0.0000"},
            {"Strength at 20 °C (MIX.CONVERT)", "=MIX.CONVERT(card;" + x + ";\"%w/w\";\"%vol\";20)", "%vol",
                "0.00"},
            {"Excess molar volume Vᴱ (MIX.EXCESSVOLUME)", "=MIX.EXCESSVOLUME(card;" + x + ";" + t + w, "cm³/mol",
                "0.0000"},
            {"Partial molar volume, glycol (MIX.PARTIALVOLUME)",
                "=MIX.PARTIALVOLUME(card;1;" + x + ";" + t + w, "cm³/mol", "0.000"},
            {"Partial molar volume, water (MIX.PARTIALVOLUME)",
                "=MIX.PARTIALVOLUME(card;\"water\";" + x + ";" + t + w, "cm³/mol", "0.000"},
            {"Partial excess volume, glycol (MIX.PARTIALEXCESS)",
                "=MIX.PARTIALEXCESS(card;1;" + x + ";" + t + w, "cm³/mol", "0.0000"},
            {"Partial excess volume, water (MIX.PARTIALEXCESS)", "=MIX.PARTIALEXCESS(card;2;" + x + ";" + t + w,
                "cm³/mol", "0.0000"},
            {"Molar volume of the blend (MIX.MOLARVOLUME)", "=MIX.MOLARVOLUME(card;" + x + ";" + t + w, "cm³/mol",
                "0.000"},
            {"Density of the blend (MIX.DENSITY)", "=MIX.DENSITY(card;" + x + ";" + t + w, "kg/m³", "0.00"},
            {"Density of pure glycol (MIX.PUREDENSITY)", "=MIX.PUREDENSITY(card;1;" + t + ")", "kg/m³",
                "0.00"},
            {"Density of pure water (MIX.PUREDENSITY)", "=MIX.PUREDENSITY(card;\"water\";" + t + ")", "kg/m³",
                "0.00"},
            {"Volume change on mixing, Vᴱ / ideal volume", "=B" + (EXCESS_ROW + 1) + "/(B" + (MOLAR_VOLUME_ROW + 1)
                + "-B" + (EXCESS_ROW + 1) + ")", "—", "0.00%"},
        };
        for (int i = 0; i < results.length; i++) {
            result(f, s, RESULTS_FIRST + i, results[i][0], results[i][1], results[i][2], results[i][3]);
        }

        // equal volumes mixed
        ExampleWorkbooks.section(s, MAKEUP_GLYCOL_ROW - 1, "Make-up: equal volumes of glycol and water (MIX.BATCH)");
        ExampleWorkbooks.input(f, s, MAKEUP_GLYCOL_ROW, "Ethylene glycol poured, at 20 °C (invented)", MAKEUP_LITRES,
                "L", "#,##0.0");
        ExampleWorkbooks.input(f, s, MAKEUP_WATER_ROW, "Water poured, at 20 °C (invented)", MAKEUP_LITRES, "L",
                "#,##0.0");
        band(s, "B" + (MAKEUP_GLYCOL_ROW + 1) + ":B" + (MAKEUP_WATER_ROW + 1), INVENTED_COLOUR);
        String poured = "B" + (MAKEUP_GLYCOL_ROW + 1) + ":B" + (MAKEUP_WATER_ROW + 1);
        String batch = "=MIX.BATCH(card;" + poured + ";\"L\";" + t + ";";
        result(f, s, MAKEUP_VOLUME_ROW, "Volume of the blend at 20 °C", batch + "\"volume\";\"L\";" + t + ")", "L",
                "#,##0.00");
        result(f, s, MAKEUP_CONTRACTION_ROW, "Contraction on mixing", batch + "\"contraction\";\"L\";" + t + ")",
                "L", "#,##0.00");
        result(f, s, MAKEUP_CONTRACTION_PERCENT_ROW, "Contraction, per cent of the volumes poured",
                batch + "\"contraction %\";;" + t + ")", "%", "0.00");
        String phi = "B" + (MAKEUP_GLYCOL_ROW + 1) + "/(B" + (MAKEUP_GLYCOL_ROW + 1) + "+B" + (MAKEUP_WATER_ROW + 1)
                + ")";
        result(f, s, MAKEUP_MASS_PERCENT_ROW, "Its strength by mass (MIX.CONVERT)",
                "=MIX.CONVERT(card;" + phi + ";\"volume fraction\";\"%w/w\";" + t + ")", "% w/w", "0.00");
        result(f, s, MAKEUP_STRENGTH_ROW, "Its strength by volume, not 50 (MIX.CONVERT)",
                "=MIX.CONVERT(card;" + phi + ";\"volume fraction\";\"%vol\";" + t + ")", "%vol", "0.00");

        // a tank of 40 %vol
        ExampleWorkbooks.section(s, TANK_VOLUME_ROW - 1, "Recipe: a tank of 40 %vol at 20 °C (MIX.RECIPE)");
        ExampleWorkbooks.input(f, s, TANK_VOLUME_ROW, "Volume of blend to make, at 20 °C (invented)", TANK_LITRES, "L",
                "#,##0");
        ExampleWorkbooks.input(f, s, TANK_STRENGTH_ROW, "Strength ordered, at 20 °C (invented)", TANK_STRENGTH,
                "%vol", "0.0");
        band(s, "B" + (TANK_VOLUME_ROW + 1) + ":B" + (TANK_STRENGTH_ROW + 1), INVENTED_COLOUR);
        String recipe = "=MIX.RECIPE(card;B" + (TANK_VOLUME_ROW + 1) + ";\"L\";B" + (TANK_STRENGTH_ROW + 1)
                + ";\"%vol\";" + t + ";";
        result(f, s, RECIPE_KG_ROW, "Ethylene glycol to charge", recipe + ";\"kg\";;;1)", "kg", "#,##0.00");
        result(f, s, RECIPE_KG_ROW + 1, "Water to charge", recipe + ";\"kg\";;;2)", "kg", "#,##0.00");
        result(f, s, RECIPE_L_ROW, "Ethylene glycol to draw, at 20 °C", recipe + t + ";\"L\";;;1)", "L",
                "#,##0.00");
        result(f, s, RECIPE_L_ROW + 1, "Water to draw, at 20 °C", recipe + t + ";\"L\";;;2)", "L", "#,##0.00");
        String kg = "B" + (RECIPE_KG_ROW + 1) + ":B" + (RECIPE_KG_ROW + 2);
        result(f, s, RECIPE_CONTRACTION_ROW, "Contraction on mixing (MIX.BATCH)",
                "=MIX.BATCH(card;" + kg + ";\"kg\";" + t + ";\"contraction\";\"L\")", "L", "#,##0.00");
        result(f, s, RECIPE_VOLUME_CHECK_ROW, "Check: the masses make (MIX.BATCH)",
                "=MIX.BATCH(card;" + kg + ";\"kg\";" + t + ")", "L", "#,##0.00");
        ExampleWorkbooks.input(f, s, WORKING_VOLUME_ROW, "Tank's working volume, at 20 °C (invented)", WORKING_LITRES,
                "L", "#,##0");
        band(s, "B" + (WORKING_VOLUME_ROW + 1), INVENTED_COLOUR);
        result(f, s, ROOM_ROW, "Room left below the working volume", "=B" + (WORKING_VOLUME_ROW + 1) + "-B"
                + (RECIPE_VOLUME_CHECK_ROW + 1), "L", "#,##0.00");

        // density check
        ExampleWorkbooks.section(s, READING_ROW - 1, "Density check of the filled tank (MIX.FROMDENSITY)");
        ExampleWorkbooks.input(f, s, READING_ROW, "Density read at 20 °C (invented reading)", READING, "kg/m³",
                "0.00");
        band(s, "B" + (READING_ROW + 1), INVENTED_COLOUR);
        String read = "=MIX.FROMDENSITY(card;B" + (READING_ROW + 1) + ";" + t + ";1;";
        result(f, s, READ_STRENGTH_ROW, "Strength found from the reading", read + "\"%vol\";20)", "%vol", "0.00");
        result(f, s, READ_MASS_PERCENT_ROW, "The same by mass", read + "\"%w/w\")", "% w/w", "0.00");
        result(f, s, EXPECTED_DENSITY_ROW, "Density the recipe should give (MIX.DENSITY)",
                "=MIX.DENSITY(card;B" + (TANK_STRENGTH_ROW + 1) + ";" + t + ";;\"%vol\";20)", "kg/m³", "0.00");
        result(f, s, READING_GAP_ROW, "Reading minus expected density", "=B" + (READING_ROW + 1) + "-B"
                + (EXPECTED_DENSITY_ROW + 1), "kg/m³", "0.00");
        int noteRow = READING_GAP_ROW + 2;
        String note = "A" + (noteRow + 1) + ":C" + (noteRow + 1);
        fitted(s, note, noteRow, "A cell showing Err:502 means the add-in refused: the point check above says why "
                + "(for example a temperature outside 19.5 to 20.5 °C, or more than 60 % w/w glycol).", 143);
        prop(s, note, "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        // a little room between the numbers and their units
        prop(s, "C8:C" + (READING_GAP_ROW + 1), "ParaLeftMargin", 150);

        // composition table (array formulas over the x1 column)
        text(s, TABLE_COL, TABLE_HEAD - 1, "Across the card's range at the input temperature (array formulas)");
        bold(s, col(TABLE_COL) + TABLE_HEAD, 10);
        String[] heads = {"glycol\n% w/w", "x1 glycol\nmol/mol", "V̄ glycol\ncm³/mol", "V̄ water\ncm³/mol",
            "Vᴱ\ncm³/mol", "V̄ᴱ glycol\ncm³/mol", "V̄ᴱ water\ncm³/mol", "Vm blend\ncm³/mol", "ρ blend\nkg/m³"};
        for (int c = 0; c < heads.length; c++) {
            text(s, TABLE_COL + c, TABLE_HEAD, heads[c]);
        }
        String headRange = col(TABLE_COL) + (TABLE_HEAD + 1) + ":" + col(TABLE_COL + heads.length - 1)
                + (TABLE_HEAD + 1);
        head(s, headRange);
        prop(s, headRange, "IsTextWrapped", Boolean.TRUE);
        prop(s, headRange, "HoriJustify", com.sun.star.table.CellHoriJustify.CENTER);
        for (int i = 0; i < TABLE_ROWS; i++) {
            s.getCellByPosition(TABLE_COL, TABLE_FIRST + i).setValue(i * TABLE_STEP);
        }
        // x1 from the card's own molar masses (its 'component' rows on sheet Card)
        String w1 = column(TABLE_COL) + "/100";
        String m1 = cardCell(0);
        String m2 = cardCell(1);
        String x1 = column(TABLE_X);
        String[] arrays = {
            "=(" + w1 + "/" + m1 + ")/(" + w1 + "/" + m1 + "+(1-" + w1 + ")/" + m2 + ")",
            "=MIX.PARTIALVOLUME(card;1;" + x1 + ";" + t + ")",
            "=MIX.PARTIALVOLUME(card;2;" + x1 + ";" + t + ")",
            "=MIX.EXCESSVOLUME(card;" + x1 + ";" + t + ")",
            "=MIX.PARTIALEXCESS(card;1;" + x1 + ";" + t + ")",
            "=MIX.PARTIALEXCESS(card;2;" + x1 + ";" + t + ")",
            "=MIX.MOLARVOLUME(card;" + x1 + ";" + t + ")",
            "=MIX.DENSITY(card;" + x1 + ";" + t + ")",
        };
        String[] numberFormats = {"0.0000", "0.000", "0.000", "0.0000", "0.0000", "0.0000", "0.000", "0.00"};
        for (int c = 0; c < arrays.length; c++) {
            XCellRange r = s.getCellRangeByName(column(TABLE_X + c));
            UnoRuntime.queryInterface(XArrayFormulaRange.class, r).setArrayFormula(arrays[c]);
            prop(s, column(TABLE_X + c), "NumberFormat", f.key(numberFormats[c]));
        }
        prop(s, column(TABLE_COL), "NumberFormat", f.key("0"));
        int end = TABLE_FIRST + TABLE_ROWS;
        text(s, TABLE_COL, end, "V̄ = partial molar volume; V̄ᴱ = partial molar excess volume; "
                + "Vm = molar volume of the blend; x1 from the card's molar masses.");
        prop(s, col(TABLE_COL) + (end + 1), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        text(s, TABLE_COL, end + 1, "The table runs in steps of 3 % to 57 %; the card holds up to 60 % w/w, the "
                + "CRC table's last strength, and refuses more.");
        prop(s, col(TABLE_COL) + (end + 2), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        rowHeight(s, TABLE_HEAD, 900);
        widths(s, BLEND_WIDTHS);
    }

    /** The absolute address on sheet Card of a component's molar mass (its 'component' row, column C). */
    private static String cardCell(int component) {
        Object[][] cells = cardCells();
        int seen = 0;
        for (int r = 0; r < cells.length; r++) {
            if ("component".equals(cells[r][0]) && seen++ == component) {
                return "$Card.$C$" + (CARD_TOP + r + 1);
            }
        }
        throw new IllegalStateException("the library card has no component " + (component + 1));
    }

    /** Two XY charts under the table: the partial molar volumes, and the excess volumes, against % w/w. */
    private static void addCharts(XSpreadsheet s) throws Exception {
        int last = TABLE_FIRST + TABLE_ROWS - 1;
        CellRangeAddress w = new CellRangeAddress((short) 0, TABLE_COL, TABLE_HEAD, TABLE_COL, last);
        CellRangeAddress partial = new CellRangeAddress((short) 0, TABLE_PARTIAL_GLYCOL, TABLE_HEAD,
                TABLE_PARTIAL_WATER, last);
        CellRangeAddress excess = new CellRangeAddress((short) 0, TABLE_EXCESS, TABLE_HEAD,
                TABLE_PARTIAL_EXCESS_WATER, last);
        int top = TABLE_FIRST + TABLE_ROWS + 3;
        XDiagram a = chart(s, "partial-volumes", new CellRangeAddress[] {w, partial}, 0, top, 8500,
                "Partial molar volumes at 20 °C", "V̄ glycol, cm³/mol", "0.0");
        XPropertySet ap = UnoRuntime.queryInterface(XPropertySet.class, a);
        // water (the second series) on the right-hand axis, so that both curves show their shape
        ap.setPropertyValue("HasSecondaryYAxis", Boolean.TRUE);
        ap.setPropertyValue("HasSecondaryYAxisTitle", Boolean.TRUE);
        UnoRuntime.queryInterface(XPropertySet.class, UnoRuntime.queryInterface(
                com.sun.star.chart.XSecondAxisTitleSupplier.class, a).getSecondYAxisTitle())
                .setPropertyValue("String", "V̄ water, cm³/mol");
        // in this API an XY chart's data row 0 is the x column, so the water series is row 2
        a.getDataRowProperties(2).setPropertyValue("Axis", ChartAxisAssign.SECONDARY_Y);
        XPropertySet y2 = UnoRuntime.queryInterface(com.sun.star.chart.XTwoAxisYSupplier.class, a)
                .getSecondaryYAxis();
        y2.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        y2.setPropertyValue("NumberFormat", numberFormat(s, "0.00"));
        chart(s, "excess-volumes", new CellRangeAddress[] {w, excess}, 8800, top, 8500,
                "Excess volumes at 20 °C", "cm³/mol", "0.0");
    }

    /**
     * One XY line chart whose top left corner is {@code dx} (1/100 mm) right of the table's first column, in the given
     * row; returns its diagram.
     */
    private static XDiagram chart(XSpreadsheet s, String name, CellRangeAddress[] ranges, int dx, int row,
            int width, String title, String yTitle, String yFormat) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        XPropertySet anchor = UnoRuntime.queryInterface(XPropertySet.class, s.getCellByPosition(TABLE_COL, row));
        com.sun.star.awt.Point p = (com.sun.star.awt.Point) anchor.getPropertyValue("Position");
        charts.addNewByName(name, new Rectangle(p.X + dx, p.Y, width, 8200), ranges, true, false);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(name);
        XChartDocument cd = UnoRuntime.queryInterface(XChartDocument.class,
                UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject());
        XDiagram d = ExampleWorkbooks.xyDiagram(cd, title, 11f);
        XPropertySet cp = UnoRuntime.queryInterface(XPropertySet.class, cd);
        cp.setPropertyValue("HasLegend", Boolean.TRUE);
        UnoRuntime.queryInterface(XPropertySet.class, cd.getLegend()).setPropertyValue("Alignment",
                ChartLegendPosition.BOTTOM);
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, d);
        dp.setPropertyValue("Lines", Boolean.TRUE);
        dp.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        dp.setPropertyValue("HasXAxisTitle", Boolean.TRUE);
        dp.setPropertyValue("HasYAxisTitle", Boolean.TRUE);
        // ethylene glycol in % w/w, fixed from 0 to 60 (the card's range)
        ExampleWorkbooks.fixedXAxis(d, "ethylene glycol, % w/w", 60.0, 10.0, numberFormat(s, "0"));
        XAxisYSupplier ys = UnoRuntime.queryInterface(XAxisYSupplier.class, d);
        UnoRuntime.queryInterface(XPropertySet.class, ys.getYAxisTitle()).setPropertyValue("String", yTitle);
        XPropertySet yAxis = ys.getYAxis();
        yAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        yAxis.setPropertyValue("NumberFormat", numberFormat(s, yFormat));
        for (int i = 0; i < 3; i++) {
            try {
                d.getDataRowProperties(i).setPropertyValue("LineWidth", 50);
            } catch (com.sun.star.lang.IndexOutOfBoundsException e) {
                break;
            }
        }
        return d;
    }

    /** The chart's axis formats are keys of the spreadsheet's own number formats. */
    private static int numberFormat(XSpreadsheet s, String code) throws Exception {
        return formats.key(code);
    }

    // --- small helpers

    /** The table's data cells in column c, as an absolute range. */
    private static String column(int c) {
        return "$" + col(c) + "$" + (TABLE_FIRST + 1) + ":$" + col(c) + "$" + (TABLE_FIRST + TABLE_ROWS);
    }
}
