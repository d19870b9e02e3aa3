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
 * Builds the example workbook examples/estimator-quote.ods from nothing, through a real office with the built
 * extension installed: an estimator's quote for a delivered volume of ethanol + water at a strength and a temperature.
 * The company, the customer, the order, the tank temperatures, the prices, the charge and the margin are invented; the
 * card is the project's ethanol + water card fitted to the OIML R 22 densities (not invented).
 *
 * <p>Sheets: Quote (the order, the temperature correction, raw materials and tank volumes, contraction, price, the
 * strength on other bases) and Card. The constants that locate cells are shared with ExamplesIT (0-based rows; the
 * order's values are in column B).
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.QuoteWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class QuoteWorkbookBuilder {
    static final String FILE = "estimator-quote.ods";

    // --- the order (column B)
    static final int VOLUME_ROW = 8;
    static final int STRENGTH_ROW = 9;
    static final int BASIS_T_ROW = 10;
    static final int DELIVERY_T_ROW = 11;
    static final int REFERENCE_T_ROW = 12;
    private static final int CHECK_ROW = 13;
    private static final double VOLUME = 2500;
    private static final double STRENGTH = 40;
    private static final double BASIS_T = 20;
    private static final double DELIVERY_T = 12;
    private static final double REFERENCE_T = 20;

    // --- temperature correction (column B)
    static final int FACTOR_ROW = 17;
    static final int REFERENCE_VOLUME_ROW = 18;
    static final int DELIVERY_DENSITY_ROW = 19;
    static final int REFERENCE_DENSITY_ROW = 20;
    static final int BASIS_VOLUME_ROW = 21;

    // --- raw materials: ethanol in B, water in C, total in D
    private static final int MATERIALS_HEAD = 23;
    static final int TANK_T_ROW = 24;
    static final int PRICE_ROW = 25;
    static final int MASS_ROW = 26;
    static final int COST_ROW = 27;
    static final int DRAW_ROW = 28;
    static final int PURE_ROW = 29;
    private static final double[] TANK_T = {14, 9};
    private static final double[] PRICE = {1.38, 0.006};

    // --- contraction (column B)
    static final int BATCH_VOLUME_ROW = 32;
    static final int PURE_VOLUME_ROW = 33;
    static final int CONTRACTION_ROW = 34;
    static final int CONTRACTION_PERCENT_ROW = 35;
    static final int DELIVERY_CHECK_ROW = 36;

    // --- price (column B)
    static final int MATERIALS_COST_ROW = 39;
    static final int CHARGE_RATE_ROW = 40;
    static final int MARGIN_ROW = 41;
    static final int QUOTE_ROW = 44;
    private static final double CHARGE_RATE = 0.085;
    private static final double MARGIN = 0.12;

    // --- the strength on other bases: ethanol in H, water in I
    private static final int CONVERT_COL = 6;
    static final int OTHER_T_ROW = 7;
    static final int ORDERED_ROW = 8;
    static final int MASS_FRACTION_ROW = 9;
    static final int MOLE_FRACTION_ROW = 10;
    static final int OTHER_STRENGTH_ROW = 12;
    private static final double OTHER_T = 15;

    private static Formats formats;

    private QuoteWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Quote", "Card");
        formats = new Formats(doc);
        ExampleWorkbooks.writeOimlCard(doc, sheet(sheets, "Card"));
        writeQuote(sheet(sheets, "Quote"));
        pageSetup(doc);
    }

    private static String b(int row) {
        return "$B$" + (row + 1);
    }

    private static void writeQuote(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Harlow Pike Blending (invented company): quote for a delivered blend of ethanol and water");
        bold(s, "A1", 14);
        fitted(s, "A2:J2", 1, "INVENTED SCENARIO. The company, the customer, the order, the tank temperatures, the "
                + "prices, the charge and the margin are made up to show how the Miscela functions work; they are no "
                + "one's real figures. The card on sheet Card is not invented: it is the project's ethanol + water "
                + "card fitted to the OIML R 22 density formula (its source is written there).", WIDE_MM);
        band(s, "A2:J2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        String[] cautions = {
            "CUSTODY TRANSFER AND INVOICING. Every volume, strength and density here is a model estimate with the "
                    + "card's fit error. Quantities that are invoiced, taxed, declared or handed over must be measured "
                    + "with calibrated instruments and corrected with the tables your contract and your regulator "
                    + "prescribe; this sheet only prepares a quote.",
            "FLAMMABLE VAPOURS. Ethanol and its blends with water give off vapours that can ignite. Draw, blend and "
                    + "load only where the area is rated for it, with earthing, ventilation and no ignition sources, "
                    + "as your site's rules and local fire codes require.",
            "Local codes, safety data sheets and licensed practice take precedence over anything this workbook "
                    + "computes.",
        };
        ExampleWorkbooks.cautions(s, "J", WIDE_MM, 2, cautions);

        // the order
        section(s, 6, "The customer's order (change the blue cells)");
        text(s, 0, 7, "Customer");
        text(s, 1, 7, "Calder Lane Liqueurs (invented)");
        merge(s, "B8:D8");
        input(formats, s, VOLUME_ROW, "Volume to deliver (at the delivery temperature)", VOLUME, "L", "#,##0");
        input(formats, s, STRENGTH_ROW, "Strength ordered", STRENGTH, "%vol", "0.0");
        input(formats, s, BASIS_T_ROW, "Temperature the strength is stated at", BASIS_T, "°C",
                "0.0");
        input(formats, s, DELIVERY_T_ROW, "Temperature of the blend at delivery", DELIVERY_T, "°C", "0.0");
        input(formats, s, REFERENCE_T_ROW, "Reference temperature of the quote", REFERENCE_T, "°C", "0.0");
        result(formats, s, CHECK_ROW, "Card check (MIX.CHECK)", "=MIX.CHECK(card)", "", "@");
        result(formats, s, CHECK_ROW + 1, "Point check at delivery (MIX.CHECKPOINT)", "=MIX.CHECKPOINT(card;"
                + convertRange(MOLE_FRACTION_ROW) + ";" + b(DELIVERY_T_ROW) + ")", "", "@");

        // temperature correction
        section(s, 16, "The delivered volume at other temperatures (MIX.VOLUMEFACTOR)");
        String strength = b(STRENGTH_ROW) + ";\"%vol\"";
        result(formats, s, FACTOR_ROW, "Volume factor, delivery → reference temperature",
                "=MIX.VOLUMEFACTOR(card;" + strength + ";" + b(DELIVERY_T_ROW) + ";" + b(REFERENCE_T_ROW) + ";;"
                        + b(BASIS_T_ROW) + ")", "", "0.00000");
        result(formats, s, REFERENCE_VOLUME_ROW, "Volume at the reference temperature (quoted)",
                "=" + b(VOLUME_ROW) + "*" + b(FACTOR_ROW), "L", "#,##0.0");
        result(formats, s, DELIVERY_DENSITY_ROW, "Density at the delivery temperature",
                "=MIX.VOLUMEFACTOR(card;" + strength + ";" + b(DELIVERY_T_ROW) + ";" + b(REFERENCE_T_ROW)
                        + ";\"density\";" + b(BASIS_T_ROW) + ")", "kg/m³", "0.00");
        result(formats, s, REFERENCE_DENSITY_ROW, "Density at the reference temperature",
                "=MIX.VOLUMEFACTOR(card;" + strength + ";" + b(DELIVERY_T_ROW) + ";" + b(REFERENCE_T_ROW)
                        + ";\"reference density\";" + b(BASIS_T_ROW) + ")", "kg/m³", "0.00");
        result(formats, s, BASIS_VOLUME_ROW, "Volume at the strength's temperature (for MIX.RECIPE)",
                "=" + b(VOLUME_ROW) + "*MIX.VOLUMEFACTOR(card;" + strength + ";" + b(DELIVERY_T_ROW) + ";"
                        + b(BASIS_T_ROW) + ")", "L", "#,##0.0");

        // raw materials, one column per component
        String[] heads = {"Raw materials: anhydrous ethanol, water", "ethanol", "water", "total", ""};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, MATERIALS_HEAD, heads[c]);
        }
        head(s, "A" + (MATERIALS_HEAD + 1) + ":E" + (MATERIALS_HEAD + 1));
        prop(s, "B" + (MATERIALS_HEAD + 1) + ":D" + (MATERIALS_HEAD + 1), "HoriJustify", CellHoriJustify.RIGHT);
        text(s, 0, TANK_T_ROW, "Tank temperature (invented)");
        text(s, 0, PRICE_ROW, "Price of the raw material (invented)");
        for (int k = 0; k < 2; k++) {
            s.getCellByPosition(1 + k, TANK_T_ROW).setValue(TANK_T[k]);
            s.getCellByPosition(1 + k, PRICE_ROW).setValue(PRICE[k]);
        }
        text(s, 4, TANK_T_ROW, "°C");
        text(s, 4, PRICE_ROW, "€/kg");
        band(s, "B" + (TANK_T_ROW + 1) + ":C" + (TANK_T_ROW + 1), INPUT_COLOUR);
        band(s, "B" + (PRICE_ROW + 1) + ":C" + (PRICE_ROW + 1), INVENTED_COLOUR);
        prop(s, "B" + (TANK_T_ROW + 1) + ":C" + (TANK_T_ROW + 1), "NumberFormat", formats.key("0.0"));
        prop(s, "B" + (PRICE_ROW + 1) + ":C" + (PRICE_ROW + 1), "NumberFormat", formats.key("0.000"));
        String recipe = "=MIX.RECIPE(card;" + b(BASIS_VOLUME_ROW) + ";\"L\";" + b(STRENGTH_ROW) + ";\"%vol\";"
                + b(BASIS_T_ROW);
        tableRow(s, MASS_ROW, "Mass to charge (MIX.RECIPE)", recipe + ")", true, "kg", "#,##0.00");
        text(s, 0, COST_ROW, "Cost of the raw material");
        for (int k = 0; k < 2; k++) {
            String c = String.valueOf((char) ('B' + k));
            s.getCellByPosition(1 + k, COST_ROW).setFormula("=" + c + (MASS_ROW + 1) + "*" + c + (PRICE_ROW + 1));
        }
        prop(s, "B" + (COST_ROW + 1) + ":C" + (COST_ROW + 1), "NumberFormat", formats.key("#,##0.00"));
        total(formats, s, COST_ROW, "€", "#,##0.00");
        tableRow(s, DRAW_ROW, "Volume to draw, at the tank's temperature (MIX.RECIPE)",
                recipe + ";$B$" + (TANK_T_ROW + 1) + ":$C$" + (TANK_T_ROW + 1) + ";\"L\")", true, "L", "#,##0.0");
        tableRow(s, PURE_ROW, "Unmixed volume at the strength's temperature (MIX.RECIPE)",
                recipe + ";" + b(BASIS_T_ROW) + ";\"L\")", true, "L", "#,##0.0");

        // contraction
        section(s, 31, "Contraction on mixing (MIX.BATCH)");
        String masses = "$B$" + (MASS_ROW + 1) + ":$C$" + (MASS_ROW + 1) + ";\"kg\"";
        result(formats, s, BATCH_VOLUME_ROW, "Blend volume at the strength's temperature",
                "=MIX.BATCH(card;" + masses + ";" + b(BASIS_T_ROW) + ")", "L", "#,##0.0");
        result(formats, s, PURE_VOLUME_ROW, "The same liquids before mixing, at that temperature",
                "=MIX.BATCH(card;" + masses + ";" + b(BASIS_T_ROW) + ";\"pure volume\")", "L", "#,##0.0");
        result(formats, s, CONTRACTION_ROW, "Contraction (MIX.BATCH \"contraction\")",
                "=MIX.BATCH(card;" + masses + ";" + b(BASIS_T_ROW) + ";\"contraction\")", "L", "#,##0.0");
        result(formats, s, CONTRACTION_PERCENT_ROW, "Contraction (MIX.BATCH \"contraction %\")",
                "=MIX.BATCH(card;" + masses + ";" + b(BASIS_T_ROW) + ";\"contraction %\")", "%", "0.00");
        result(formats, s, DELIVERY_CHECK_ROW, "Check: blend volume at the delivery temperature",
                "=MIX.BATCH(card;" + masses + ";" + b(DELIVERY_T_ROW) + ")", "L", "#,##0.0");

        // price
        section(s, 38, "Price");
        result(formats, s, MATERIALS_COST_ROW, "Raw materials", "=D" + (COST_ROW + 1), "€", "#,##0.00");
        input(formats, s, CHARGE_RATE_ROW, "Blending and delivery charge (invented)", CHARGE_RATE, "€/L",
                "0.000");
        input(formats, s, MARGIN_ROW, "Margin (invented)", MARGIN, "", "0%");
        band(s, "B" + (CHARGE_RATE_ROW + 1) + ":B" + (MARGIN_ROW + 1), INVENTED_COLOUR);
        result(formats, s, 42, "Blending and delivery charge", "=" + b(CHARGE_RATE_ROW) + "*" + b(VOLUME_ROW), "€",
                "#,##0.00");
        result(formats, s, 43, "Cost before margin", "=" + b(MATERIALS_COST_ROW) + "+B43", "€", "#,##0.00");
        result(formats, s, QUOTE_ROW, "Quoted price, before duty and taxes", "=B44*(1+" + b(MARGIN_ROW) + ")", "€",
                "#,##0.00");
        bold(s, "A" + (QUOTE_ROW + 1) + ":C" + (QUOTE_ROW + 1), 11);
        result(formats, s, QUOTE_ROW + 1, "Per litre delivered (at the delivery temperature)",
                "=" + b(QUOTE_ROW) + "/" + b(VOLUME_ROW), "€/L", "0.0000");
        result(formats, s, QUOTE_ROW + 2, "Per litre at the reference temperature",
                "=" + b(QUOTE_ROW) + "/" + b(REFERENCE_VOLUME_ROW), "€/L", "0.0000");
        fitted(s, "A" + (QUOTE_ROW + 4) + ":E" + (QUOTE_ROW + 4), QUOTE_ROW + 3, "Duty, taxes and freight are not "
                + "included; they follow the rules where the blend is made, moved and sold. The invented prices are "
                + "per kg because raw materials are bought by mass, while the customer orders a volume.", LEFT_MM);
        prop(s, "A" + (QUOTE_ROW + 4), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);

        writeConversions(s);
        writeHowItWorks(s);
        prop(s, "C" + (VOLUME_ROW + 1) + ":C" + (QUOTE_ROW + 3), "ParaLeftMargin", 150);
        prop(s, "E" + (TANK_T_ROW + 1) + ":E" + (PURE_ROW + 1), "ParaLeftMargin", 150);
        widths(s, 112, 24, 24, 24, 12, 5, 96, 22, 22, 16);
    }

    /** Width of columns A..E, and of A..J, in mm (for the heights of wrapped rows). */
    private static final int LEFT_MM = 112 + 24 * 3 + 12;
    private static final int WIDE_MM = (LEFT_MM + 5 + 96 + 22 * 2 + 16) * 3 / 4;

    private static String convertRange(int row) {
        return "$H$" + (row + 1) + ":$I$" + (row + 1);
    }

    private static void writeConversions(XSpreadsheet s) throws Exception {
        int c = CONVERT_COL;
        String[] heads = {"Strength on other bases (MIX.CONVERT)", "ethanol", "water", ""};
        for (int i = 0; i < heads.length; i++) {
            text(s, c + i, 6, heads[i]);
        }
        head(s, "G7:J7");
        prop(s, "H7:I7", "HoriJustify", CellHoriJustify.RIGHT);
        text(s, c, OTHER_T_ROW, "Another temperature for a strength");
        s.getCellByPosition(c + 1, OTHER_T_ROW).setValue(OTHER_T);
        text(s, c + 3, OTHER_T_ROW, "°C");
        band(s, "H" + (OTHER_T_ROW + 1), INPUT_COLOUR);
        prop(s, "H" + (OTHER_T_ROW + 1), "NumberFormat", formats.key("0.0"));
        text(s, c, ORDERED_ROW, "as ordered (water: the balance, left blank)");
        s.getCellByPosition(c + 1, ORDERED_ROW).setFormula("=" + b(STRENGTH_ROW));
        text(s, c + 3, ORDERED_ROW, "%vol");
        prop(s, "H" + (ORDERED_ROW + 1), "NumberFormat", formats.key("0.00"));
        String from = "=MIX.CONVERT(card;" + convertRange(ORDERED_ROW) + ";\"%vol\";";
        String at = b(BASIS_T_ROW);
        Object[][] rows = {
            {MASS_FRACTION_ROW, "mass fraction", from + "\"mass fraction\";" + at + ")", "kg/kg", "0.0000", true},
            {MOLE_FRACTION_ROW, "mole fraction", from + "\"mole fraction\";" + at + ")", "mol/mol", "0.0000", true},
            {11, "volume fraction of the unmixed liquids",
                from + "\"volume fraction\";" + at + ")", "—", "0.0000", true},
            {OTHER_STRENGTH_ROW, "strength at the other temperature",
                from + "\"%vol\";" + at + ";$H$" + (OTHER_T_ROW + 1) + ")", "%vol", "0.00", true},
            {13, "grams per litre of blend", from + "\"g/L\";" + at + ")", "g/L",
                "0.0", true},
            {14, "moles per litre of blend", from + "\"mol/L\";" + at + ")", "mol/L",
                "0.000", true},
            {15, "moles of ethanol per kg of water", "=INDEX(" + from.substring(1) + "\"mol/kg\";" + at
                + ");1;1)", "mol/kg", "0.000", false},
        };
        for (Object[] r : rows) {
            int row = (Integer) r[0];
            text(s, c, row, (String) r[1]);
            String range = (Boolean) r[5] ? "H" + (row + 1) + ":I" + (row + 1) : "H" + (row + 1);
            if ((Boolean) r[5]) {
                array(s, range, (String) r[2]);
            } else {
                s.getCellByPosition(c + 1, row).setFormula((String) r[2]);
            }
            prop(s, range, "NumberFormat", formats.key((String) r[4]));
            text(s, c + 3, row, (String) r[3]);
        }
        block(s, "G17:J19", "Volume fractions, %vol, g/L and mol/L are at the strength's temperature. Water's "
                + "strength and g/L are its own volume before mixing, and its mass, per litre of blend. Ethanol's and water's %vol add up to more than 100: the difference is the "
                + "contraction.");
        prop(s, "G17", "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        prop(s, "J8:J16", "ParaLeftMargin", 150);
    }


    private static void writeHowItWorks(XSpreadsheet s) throws Exception {
        text(s, CONVERT_COL, 19, "How the quote is worked out");
        head(s, "G20:J20");
        String steps = "1. A strength in %vol is the volume of ethanol before mixing per volume of blend, both at "
                + "the stated temperature (20 °C here). The delivered volume is measured at the delivery temperature, "
                + "so MIX.VOLUMEFACTOR turns it into the volume at the quote's reference temperature, and into the "
                + "volume at the strength's temperature, which MIX.RECIPE needs.\n"
                + "2. MIX.RECIPE gives the mass of each raw material to charge (kg, bought at the invented prices) "
                + "and the volume to draw from each tank at that tank's own temperature.\n"
                + "3. The tank volumes add up to more than the blend: MIX.BATCH shows the contraction at one "
                + "temperature, and checks that the masses make the ordered volume at delivery.\n"
                + "4. The price adds an invented blending and delivery charge and an invented margin to the raw "
                + "materials.";
        block(s, "G21:J34", steps);
    }

    // --- small helpers




    /** A row of the raw-materials table: an array formula over B:C (one value per component) and its total in D. */
    private static void tableRow(XSpreadsheet s, int row, String label, String formula, boolean total, String unit,
            String format) throws Exception {
        text(s, 0, row, label);
        array(s, "B" + (row + 1) + ":C" + (row + 1), formula);
        prop(s, "B" + (row + 1) + ":C" + (row + 1), "NumberFormat", formats.key(format));
        if (total) {
            total(formats, s, row, unit, format);
        }
    }

}
