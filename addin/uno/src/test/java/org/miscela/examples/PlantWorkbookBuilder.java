package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.array;
import static org.miscela.examples.ExampleWorkbooks.input;
import static org.miscela.examples.ExampleWorkbooks.result;
import static org.miscela.examples.ExampleWorkbooks.section;
import static org.miscela.examples.ExampleWorkbooks.total;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.block;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.fitted;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.merge;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.widths;

import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheets;
import com.sun.star.table.CellHoriJustify;
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/plant-makeup.ods from nothing, through a real office with the built extension
 * installed: a plant's make-up and adjustment of an ethanol + water batch in a tank. The company, the tank, the batch
 * record, the lab reading and the target are invented; the card is the project's ethanol + water card fitted to the
 * OIML R 22 densities (not invented).
 *
 * <p>Sheets: Make-up (the batch, the lab check, the adjustment to a target within the tank's working volume, and a
 * water top-up exact against first order) and Card. The constants that locate cells are shared with ExamplesIT
 * (0-based rows; single values in column B, per-component values in B (ethanol) and C (water)).
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.PlantWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class PlantWorkbookBuilder {
    static final String FILE = "plant-makeup.ods";

    // --- the batch
    static final int RECORD_ROW = 7;
    static final int TANK_T_ROW = 8;
    static final int BRIM_ROW = 9;
    static final int WORKING_ROW = 10;
    static final int BASIS_T_ROW = 11;
    static final int RECORD_STRENGTH_ROW = 12;
    private static final double[] RECORD_KG = {1420, 1680};
    private static final double TANK_T = 16;
    private static final double BRIM_L = 6300;
    private static final double WORKING_L = 5600;

    // --- the lab check
    static final int DENSITY_ROW = 16;
    static final int SAMPLE_T_ROW = 17;
    static final int LAB_STRENGTH_ROW = 18;
    static final int LAB_W_ROW = 19;
    static final int LAB_AMOUNTS_ROW = 21;
    static final int VOLUME_NOW_ROW = 22;
    private static final double DENSITY = 925.0;
    private static final double SAMPLE_T = 17.5;

    // --- the adjustment
    static final int TARGET_ROW = 26;
    static final int TARGET_W_ROW = 27;
    static final int LEAST_ROW = 28;
    static final int LEAST_VOLUME_ROW = 29;
    static final int ROOM_ROW = 30;
    static final int WITHIN_ROW = 32;
    static final int WITHIN_VOLUME_ROW = 33;
    static final int WITHIN_STRENGTH_ROW = 34;
    static final int SUMMARY_ROW = 35;
    static final int KEEP_ROW = 39;
    static final int TRANSFER_ROW = 40;
    static final int KEPT_ROW = 42;
    static final int KEPT_ADD_ROW = 43;
    static final int KEPT_VOLUME_ROW = 44;
    private static final double TARGET = 30;

    // --- the top-up (columns G..K)
    static final int TOP_UP_FIRST = 8;
    static final double[] TOP_UP_KG = {10, 50, 200, 500, 1000};
    static final int TOP_UP_ADDED = 6;
    static final int TOP_UP_EXACT = 7;
    static final int TOP_UP_FIRST_ORDER = 8;
    static final int TOP_UP_DIFFERENCE = 9;
    static final int PARTIAL_ROW = TOP_UP_FIRST + 5;

    private static Formats formats;

    private PlantWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Make-up", "Card");
        formats = new Formats(doc);
        ExampleWorkbooks.writeOimlCard(doc, sheet(sheets, "Card"));
        writeMakeUp(sheet(sheets, "Make-up"));
        pageSetup(doc);
    }

    private static String b(int row) {
        return "$B$" + (row + 1);
    }

    private static String pair(int row) {
        return "$B$" + (row + 1) + ":$C$" + (row + 1);
    }

    /** Width of columns A..E and of A..K in mm (for the heights of wrapped rows; bold text needs more room). */
    private static final int LEFT_MM = 112 + 24 * 3 + 12;
    private static final int WIDE_MM = (LEFT_MM + 5 + 30 + 24 + 26 + 28 + 22) * 17 / 20;

    private static void writeMakeUp(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Brackwater Spirits (invented company): making up and adjusting a batch in tank T-3");
        bold(s, "A1", 14);
        fitted(s, "A2:K2", 1, "INVENTED SCENARIO. The company, the tank and its volumes, the batch record, the lab "
                + "reading and the target are made up to show how the Miscela functions work; they are no one's real "
                + "figures. The card on sheet Card is not invented: it is the project's ethanol + water card fitted "
                + "to the OIML R 22 density formula (its source is written there).", WIDE_MM);
        band(s, "A2:K2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        String[] cautions = {
            "OVERFILLING. Plan every addition against the tank's working volume, the fill limit your site's "
                    + "procedure sets, never against the brim: liquid expands when it warms, and a tank filled to the "
                    + "brim overflows. Confirm the level with the tank's own gauging before and during an addition.",
            "FLAMMABLE VAPOURS. Ethanol and its blends with water give off vapours that can ignite. Transfer, add and "
                    + "sample only where the area is rated for it, with earthing, ventilation and no ignition "
                    + "sources.",
            "These are model estimates with the card's fit error. Site procedures, local codes, safety data sheets "
                    + "and licensed practice take precedence over anything this workbook computes.",
        };
        ExampleWorkbooks.cautions(s, "K", WIDE_MM, 2, cautions);

        // the batch
        tableHead(s, 6, "The batch in tank T-3 (change the blue cells)");
        text(s, 0, RECORD_ROW, "Charged, from the batch record (invented)");
        for (int k = 0; k < 2; k++) {
            s.getCellByPosition(1 + k, RECORD_ROW).setValue(RECORD_KG[k]);
        }
        band(s, "B" + (RECORD_ROW + 1) + ":C" + (RECORD_ROW + 1), INPUT_COLOUR);
        total(formats, s, RECORD_ROW, "kg", "#,##0.0");
        prop(s, "B" + (RECORD_ROW + 1) + ":C" + (RECORD_ROW + 1), "NumberFormat", formats.key("#,##0.0"));
        input(formats, s, TANK_T_ROW, "Temperature of the batch in the tank", TANK_T, "°C", "0.0");
        input(formats, s, BRIM_ROW, "Tank capacity to the brim (invented)", BRIM_L, "L", "#,##0");
        input(formats, s, WORKING_ROW, "Working volume: the fill limit of the site's procedure (invented)", WORKING_L, "L",
                "#,##0");
        input(formats, s, BASIS_T_ROW, "Temperature strengths are stated at", 20.0, "°C", "0.0");
        result(formats, s, RECORD_STRENGTH_ROW, "Strength from the batch record (MIX.CONVERT)",
                "=MIX.CONVERT(card;$B$" + (RECORD_ROW + 1) + "/$D$" + (RECORD_ROW + 1) + ";\"mass fraction\";\"%vol\";"
                        + b(BASIS_T_ROW) + ")", "%vol", "0.00");
        result(formats, s, 13, "Card check (MIX.CHECK)", "=MIX.CHECK(card)", "", "@");

        // the lab check
        section(s, 15, "Lab check: densitometer reading of a sample (invented)");
        input(formats, s, DENSITY_ROW, "Density measured", DENSITY, "kg/m³", "0.00");
        input(formats, s, SAMPLE_T_ROW, "Temperature of the sample in the densitometer", SAMPLE_T, "°C", "0.0");
        band(s, "B" + (DENSITY_ROW + 1) + ":B" + (SAMPLE_T_ROW + 1), INVENTED_COLOUR);
        String reading = "card;" + b(DENSITY_ROW) + ";" + b(SAMPLE_T_ROW) + ";1;";
        result(formats, s, LAB_STRENGTH_ROW, "Strength from the density (MIX.FROMDENSITY)",
                "=MIX.FROMDENSITY(" + reading + "\"%vol\";" + b(BASIS_T_ROW) + ")", "%vol", "0.00");
        result(formats, s, LAB_W_ROW, "Ethanol mass fraction from the density (MIX.FROMDENSITY)",
                "=MIX.FROMDENSITY(" + reading + "\"mass fraction\")", "kg/kg", "0.0000");
        result(formats, s, 20, "Lab minus batch record", "=" + b(LAB_STRENGTH_ROW) + "-" + b(RECORD_STRENGTH_ROW), "%vol",
                "+0.00;-0.00;0.00");
        text(s, 0, LAB_AMOUNTS_ROW, "In the tank: the recorded total at the lab's strength");
        s.getCellByPosition(1, LAB_AMOUNTS_ROW).setFormula("=$D$" + (RECORD_ROW + 1) + "*" + b(LAB_W_ROW));
        s.getCellByPosition(2, LAB_AMOUNTS_ROW).setFormula("=$D$" + (RECORD_ROW + 1) + "*(1-" + b(LAB_W_ROW) + ")");
        prop(s, "B" + (LAB_AMOUNTS_ROW + 1) + ":C" + (LAB_AMOUNTS_ROW + 1), "NumberFormat", formats.key("#,##0.0"));
        total(formats, s, LAB_AMOUNTS_ROW, "kg", "#,##0.0");
        String amounts = pair(LAB_AMOUNTS_ROW) + ";\"kg\"";
        String tankT = b(TANK_T_ROW);
        result(formats, s, VOLUME_NOW_ROW, "Volume in the tank now, at its temperature (MIX.BATCH)",
                "=MIX.BATCH(card;" + amounts + ";" + tankT + ")", "L", "#,##0");
        result(formats, s, 23, "Point check in the tank (MIX.CHECKPOINT)",
                "=MIX.CHECKPOINT(card;MIX.FROMDENSITY(" + reading + "\"mole fraction\");" + tankT + ")", "", "@");

        // the adjustment
        tableHead(s, 25, "Adjust to the target strength (MIX.ADJUST)");
        input(formats, s, TARGET_ROW, "Target strength", TARGET, "%vol", "0.0");
        result(formats, s, TARGET_W_ROW, "The target as an ethanol mass fraction (MIX.CONVERT)",
                "=MIX.CONVERT(card;" + b(TARGET_ROW) + ";\"%vol\";\"mass fraction\";" + b(BASIS_T_ROW) + ")", "kg/kg",
                "0.0000");
        String adjust = "=MIX.ADJUST(card;" + amounts + ";" + b(TARGET_W_ROW) + ";\"mass fraction\";" + tankT;
        pairRow(s, LEAST_ROW, "Least additions that reach the target", adjust + ")", "kg", "#,##0.0");
        result(formats, s, LEAST_VOLUME_ROW, "Volume after them, at the tank's temperature",
                adjust + ";;;;\"volume\";\"L\")", "L", "#,##0");
        result(formats, s, ROOM_ROW, "Room left below the working volume",
                "=" + b(WORKING_ROW) + "-" + b(LEAST_VOLUME_ROW), "L", "#,##0;-#,##0");
        s.getCellByPosition(0, ROOM_ROW + 1).setFormula("=IF(" + b(ROOM_ROW) + ">=0;\"fits within the working "
                + "volume\";\"EXCEEDS the working volume by \"&TEXT(-" + b(ROOM_ROW) + ";\"#,##0\")&\" L: do not "
                + "make all of these additions in this tank\")");
        merge(s, "A" + (ROOM_ROW + 2) + ":E" + (ROOM_ROW + 2));
        bold(s, "A" + (ROOM_ROW + 2), 10);
        prop(s, "A" + (ROOM_ROW + 2), "HoriJustify", CellHoriJustify.RIGHT);
        String within = adjust + ";\"within\";" + b(WORKING_ROW) + ";\"L\"";
        pairRow(s, WITHIN_ROW, "Additions within the working volume (\"within\")", within + ")", "kg", "#,##0.0");
        result(formats, s, WITHIN_VOLUME_ROW, "Volume after them, at the tank's temperature",
                within + ";\"volume\";\"L\")", "L", "#,##0");
        result(formats, s, WITHIN_STRENGTH_ROW, "Strength they reach (MIX.CONVERT)",
                "=MIX.CONVERT(card;($B$" + (LAB_AMOUNTS_ROW + 1) + "+$B$" + (WITHIN_ROW + 1) + ")/($D$"
                        + (LAB_AMOUNTS_ROW + 1) + "+$D$" + (WITHIN_ROW + 1) + ");\"mass fraction\";\"%vol\";"
                        + b(BASIS_T_ROW) + ")", "%vol", "0.00");
        text(s, 0, SUMMARY_ROW, "What MIX.ADJUST says (result \"summary\")");
        s.getCellByPosition(0, SUMMARY_ROW + 1).setFormula(within + ";\"summary\")");
        String summary = "A" + (SUMMARY_ROW + 2) + ":E" + (SUMMARY_ROW + 3);
        merge(s, summary);
        prop(s, summary, "IsTextWrapped", Boolean.TRUE);
        prop(s, summary, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        prop(s, "A" + (SUMMARY_ROW + 2), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        result(formats, s, KEEP_ROW, "Part of the batch that can stay, so that the target fits",
                "=MIN(1;" + b(WORKING_ROW) + "/" + b(LEAST_VOLUME_ROW) + ")", "", "0.0%");
        result(formats, s, TRANSFER_ROW, "Transfer out first (to another tank)", "=(1-" + b(KEEP_ROW) + ")*$D$"
                + (LAB_AMOUNTS_ROW + 1), "kg", "#,##0");
        result(formats, s, TRANSFER_ROW + 1, "… which is, at the tank's temperature",
                "=(1-" + b(KEEP_ROW) + ")*" + b(VOLUME_NOW_ROW), "L", "#,##0");
        text(s, 0, KEPT_ROW, "What stays in T-3");
        for (int k = 0; k < 2; k++) {
            String c = String.valueOf((char) ('B' + k));
            s.getCellByPosition(1 + k, KEPT_ROW).setFormula("=" + b(KEEP_ROW) + "*" + c + (LAB_AMOUNTS_ROW + 1));
        }
        prop(s, "B" + (KEPT_ROW + 1) + ":C" + (KEPT_ROW + 1), "NumberFormat", formats.key("#,##0.0"));
        total(formats, s, KEPT_ROW, "kg", "#,##0.0");
        String keptAdjust = "=MIX.ADJUST(card;" + pair(KEPT_ROW) + ";\"kg\";" + b(TARGET_W_ROW) + ";\"mass fraction\";"
                + tankT;
        pairRow(s, KEPT_ADD_ROW, "Least additions to what stays (MIX.ADJUST)", keptAdjust + ")", "kg", "#,##0.0");
        result(formats, s, KEPT_VOLUME_ROW, "Volume after them, at the tank's temperature", keptAdjust
                + ";;;;\"volume\";\"L\")", "L", "#,##0");

        writeTopUp(s, amounts, tankT);
        writeNotes(s);
        prop(s, "C" + (TANK_T_ROW + 1) + ":C" + (KEPT_VOLUME_ROW + 1), "ParaLeftMargin", 150);
        prop(s, "E" + (RECORD_ROW + 1) + ":E" + (KEPT_VOLUME_ROW + 1), "ParaLeftMargin", 150);
        widths(s, 112, 24, 24, 24, 12, 5, 30, 24, 26, 28, 22);
    }

    private static void writeTopUp(XSpreadsheet s, String amounts, String tankT) throws Exception {
        text(s, TOP_UP_ADDED, 6, "Water top-up: exact or first order? (MIX.ADDVOLUME)");
        head(s, "G7:K7");
        String[] heads = {"water, kg", "exact, L", "1st order, L", "difference, L", "relative"};
        for (int i = 0; i < heads.length; i++) {
            text(s, TOP_UP_ADDED + i, 7, heads[i]);
        }
        head(s, "G8:K8");
        prop(s, "G8:K8", "HoriJustify", CellHoriJustify.CENTER);
        String call = "=MIX.ADDVOLUME(card;" + amounts + ";\"water\";";
        for (int i = 0; i < TOP_UP_KG.length; i++) {
            int r = TOP_UP_FIRST + i;
            String added = "$G$" + (r + 1);
            s.getCellByPosition(TOP_UP_ADDED, r).setValue(TOP_UP_KG[i]);
            s.getCellByPosition(TOP_UP_EXACT, r).setFormula(call + added + ";" + tankT + ";;\"L\")");
            s.getCellByPosition(TOP_UP_FIRST_ORDER, r).setFormula(call + added + ";" + tankT
                    + ";\"first order\";\"L\")");
            s.getCellByPosition(TOP_UP_DIFFERENCE, r).setFormula(call + added + ";" + tankT
                    + ";\"difference\";\"L\")");
            s.getCellByPosition(TOP_UP_DIFFERENCE + 1, r).setFormula("=J" + (r + 1) + "/H" + (r + 1));
        }
        int last = TOP_UP_FIRST + TOP_UP_KG.length;
        band(s, "G" + (TOP_UP_FIRST + 1) + ":G" + last, INPUT_COLOUR);
        prop(s, "G" + (TOP_UP_FIRST + 1) + ":G" + last, "NumberFormat", formats.key("#,##0"));
        prop(s, "H" + (TOP_UP_FIRST + 1) + ":I" + last, "NumberFormat", formats.key("#,##0.00"));
        prop(s, "J" + (TOP_UP_FIRST + 1) + ":J" + last, "NumberFormat", formats.key("+0.00;-0.00;0.00"));
        prop(s, "K" + (TOP_UP_FIRST + 1) + ":K" + last, "NumberFormat", formats.key("+0.00%;-0.00%;0.00%"));
        text(s, TOP_UP_ADDED, PARTIAL_ROW, "V̄ water now (MIX.PARTIALVOLUME)");
        merge(s, "G" + (PARTIAL_ROW + 1) + ":I" + (PARTIAL_ROW + 1));
        s.getCellByPosition(TOP_UP_DIFFERENCE, PARTIAL_ROW).setFormula("=MIX.PARTIALVOLUME(card;\"water\";"
                + "MIX.FROMDENSITY(card;" + b(DENSITY_ROW) + ";" + b(SAMPLE_T_ROW) + ");" + tankT + ")");
        prop(s, "J" + (PARTIAL_ROW + 1), "NumberFormat", formats.key("0.000"));
        text(s, TOP_UP_DIFFERENCE + 1, PARTIAL_ROW, "cm³/mol");
        block(s, "G" + (PARTIAL_ROW + 2) + ":K" + (PARTIAL_ROW + 9), "Exact: the batch's volume after the addition "
                + "less its volume before. First order: the partial molar volume of water at the batch's present "
                + "composition times the moles added, a straight line. Difference: first order − exact (result "
                + "\"difference\"), and relative to the exact change. Water going in moves the "
                + "composition, and with it the partial molar volume, so the line drifts from the exact change as "
                + "the addition grows. Use the first-order figure only where the relative gap is well inside the "
                + "accuracy you need; otherwise use the exact one.");
    }

    private static void writeNotes(XSpreadsheet s) throws Exception {
        int top = PARTIAL_ROW + 10;
        text(s, TOP_UP_ADDED, top, "How the adjustment is worked out");
        head(s, "G" + (top + 1) + ":K" + (top + 1));
        block(s, "G" + (top + 2) + ":K" + (KEPT_VOLUME_ROW + 1), "1. The lab's densitometer reading gives the "
                + "strength (MIX.FROMDENSITY); with the recorded total mass it gives the amounts in the tank. Compare "
                + "it with the batch record before adjusting: a large gap means a charging or sampling error.\n"
                + "2. A strength in %vol is stated at 20 °C while the tank is at its own temperature, so the target "
                + "goes to MIX.ADJUST as a mass fraction, which does not depend on temperature.\n"
                + "3. MIX.ADJUST gives the least additions that reach the target and the volume they make. If that "
                + "is more than the working volume, \"within\" gives the closest strength that fits and says so; "
                + "to reach the target, move part of the batch out first and adjust what stays.\n"
                + "4. Add in steps, mix, sample and measure again: the lab, not the model, releases the batch.");
    }

    // --- small helpers


    /** A section head with the per-component column names over B..D. */
    private static void tableHead(XSpreadsheet s, int row, String title) throws Exception {
        String[] heads = {title, "ethanol", "water", "total", ""};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, row, heads[c]);
        }
        head(s, "A" + (row + 1) + ":E" + (row + 1));
        prop(s, "B" + (row + 1) + ":D" + (row + 1), "HoriJustify", CellHoriJustify.RIGHT);
    }



    /** One value per component: an array formula over B:C and its total in D. */
    private static void pairRow(XSpreadsheet s, int row, String label, String formula, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        array(s, "B" + (row + 1) + ":C" + (row + 1), formula);
        prop(s, "B" + (row + 1) + ":C" + (row + 1), "NumberFormat", formats.key(format));
        total(formats, s, row, unit, format);
    }

}
