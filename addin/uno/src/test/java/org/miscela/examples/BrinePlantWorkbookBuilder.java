package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.HEAD_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.REFERENCE_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.array;
import static org.miscela.examples.ExampleWorkbooks.band;
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
import org.miscela.core.library.CardLibrary;
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/brine-plant.ods from nothing, through a real office with the built extension
 * installed: a highways depot making sodium chloride brine for anti-icing. The depot, the tank, the target strength
 * and volume, the temperatures and the density meter's reading are invented; the card is the add-in's own library
 * card for sodium chloride + water, placed on sheet Card by the array formula {@code =MIX.LIBRARYCARD("NaCl")} and
 * named {@link #NAME}.
 *
 * <p>Sheets: Make-up (the batch from MIX.RECIPE, its volume and density from MIX.BATCH, the check by a density
 * reading with MIX.DENSITY and MIX.FROMDENSITY, two refusals in the card's own words from MIX.EXPLAIN, a table of
 * density against strength at three temperatures as MIX.DENSITY array formulas, and its chart, the brine's freezing
 * point from the card's osmotic coefficient beside the ideal solution of the ions, the margin to an invented road
 * temperature and the refusal past the eutectic) and Card. The
 * constants that locate cells are shared with ExamplesIT (0-based rows; single values in column B).
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.BrinePlantWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class BrinePlantWorkbookBuilder {
    static final String FILE = "brine-plant.ods";
    /** The library card's name as MIX.LIBRARYCARD takes it, and the range name over the placed block. */
    static final String LIBRARY_NAME = "NaCl";
    static final String NAME = "brine";
    static final String CHART_NAME = "DensityAgainstStrength";

    // --- Card: the placed block from row CARD_TOP (0-based), its source, the library's own words, the check
    static final int CARD_TOP = 9;
    static final int SOURCE_ROW = 2;
    static final int OUTSIDE_CHECK_ROW = 3;
    static final int LIBRARY_COUNT_ROW = 4;
    static final int CHECK_ROW = 5;

    // --- Make-up: the batch (column B)
    static final int STRENGTH_ROW = 7;
    static final int VOLUME_ROW = 8;
    static final int TEMPERATURE_ROW = 9;
    static final int SALT_ROW = 10;
    static final int WATER_ROW = 11;
    static final int MASS_ROW = 12;
    static final int BATCH_VOLUME_ROW = 13;
    static final int DENSITY_ROW = 14;

    // --- Make-up: the check by density
    static final int SAMPLE_T_ROW = 18;
    static final int EXPECTED_ROW = 19;
    static final int READING_ROW = 20;
    static final int IMPLIED_ROW = 21;
    static final int SHORT_ROW = 22;
    /** The batch as charged at the sample's strength: sodium chloride, then water (a column for MIX.ADJUST). */
    static final int AT_SAMPLE_ROW = 23;
    static final int ADD_SALT_ROW = 25;

    // --- Make-up: what the card refuses (the words in the merged row below each label)
    static final int PURE_SALT_ROW = 28;
    static final int TOO_STRONG_ROW = 30;
    static final double TOO_STRONG = 28;

    // --- Make-up: when the brine freezes (column B)
    /** Starts below row 40, which the chart's note on the right makes tall. */
    static final int FREEZING_ROW = 42;
    static final int FREEZING_IDEAL_ROW = 43;
    static final int ROAD_T_ROW = 44;
    static final int MARGIN_ROW = 45;
    static final int PAST_EUTECTIC_ROW = 47;
    static final double PAST_EUTECTIC = 24;

    // --- Make-up: the table, columns E (strength) and F..H (density at each temperature)
    static final int TABLE_HEAD_ROW = 6;
    static final int TABLE_T_ROW = 7;
    static final int TABLE_LABEL_ROW = 8;
    static final int TABLE_FIRST = 9;
    static final double[] TABLE_STRENGTHS = {0, 2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24, 26};
    static final int TABLE_ROWS = TABLE_STRENGTHS.length;
    static final int STRENGTH_COL = 4;
    static final double[] TABLE_T = {0, 20, 40};

    // --- invented inputs
    private static final double STRENGTH = 23;
    private static final double VOLUME_L = 12000;
    private static final double TEMPERATURE = 8;
    private static final double SAMPLE_T = 20;
    private static final double READING = 1168.5;
    private static final double ROAD_T = -15;

    private static Formats formats;

    private BrinePlantWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Make-up", "Card");
        formats = new Formats(doc);
        writeCard(doc, sheet(sheets, "Card"));
        XSpreadsheet s = sheet(sheets, "Make-up");
        writeMakeUp(s);
        writeTable(s);
        addChart(s);
        pageSetup(doc);
    }

    private static String b(int row) {
        return "$B$" + (row + 1);
    }

    /** Width of columns A..H of Make-up in mm, and of A..C (the left half), for the heights of wrapped rows. */
    private static final int[] MAKE_UP_MM = {104, 26, 24, 5, 34, 25, 25, 25};
    private static final int WIDE_MM = (104 + 26 + 24 + 5 + 34 + 25 + 25 + 25) * 17 / 20;
    private static final int LEFT_MM = (104 + 26 + 24) * 17 / 20;

    private static void writeMakeUp(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Corrin Moor Highways Depot (invented): making anti-icing brine in mixing tank B-1");
        bold(s, "A1", 14);
        fitted(s, "A2:H2", 1, "INVENTED SCENARIO. The depot, tank B-1, the target strength and volume, the "
                + "temperatures and the density meter's reading are made up to show how the Miscela functions work; "
                + "they are no one's real figures. The card on sheet Card is not invented: it is the add-in's library "
                + "card for sodium chloride + water, placed by =MIX.LIBRARYCARD(\"" + LIBRARY_NAME + "\"), whose "
                + "source row names the publications.", WIDE_MM);
        band(s, "A2:H2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        String[] cautions = {
            "ESTIMATES, NOT MEASUREMENTS. Every number here is a model estimate with the card's stated accuracy. "
                    + "Check each batch with a calibrated density meter or hydrometer and a calibrated thermometer; "
                    + "safety data sheets, site procedures, local codes and licensed practice prevail over anything "
                    + "this workbook computes, and it is not for custody transfer or sale by quantity.",
            "HANDLING AND TANKS. Brine irritates eyes and skin and corrodes steel and concrete: wear eye protection "
                    + "and gloves, rinse splashes at once. Plan the fill against the tank's working volume and the "
                    + "limit your site sets, never the brim; watch the level gauge and alarms while filling.",
            "SOLUBILITY LIMIT. The card's validity stops at 26.6 % w/w, near where the salt stops dissolving, and "
                    + "it refuses stronger brine (section 3). Undissolved salt left in the tank means the brine is "
                    + "not what the recipe says: stir until it has dissolved, then measure.",
        };
        ExampleWorkbooks.cautions(s, "H", WIDE_MM, 3, cautions);

        // 1. the batch
        section(s, STRENGTH_ROW - 1, "1. The batch in tank B-1 (change the blue cells)");
        input(formats, s, STRENGTH_ROW, "Target strength of the brine (invented)", STRENGTH, "% w/w", "0.0");
        input(formats, s, VOLUME_ROW, "Brine to make (invented)", VOLUME_L, "L", "#,##0");
        input(formats, s, TEMPERATURE_ROW, "… at the brine's temperature in the tank (invented)", TEMPERATURE,
                "°C", "0.0");
        String recipe = "=MIX.RECIPE(" + NAME + ";" + b(VOLUME_ROW) + ";\"L\";" + b(STRENGTH_ROW) + ";\"%w/w\";"
                + b(TEMPERATURE_ROW) + ";;;;;";
        result(formats, s, SALT_ROW, "Salt (sodium chloride) to charge (MIX.RECIPE)", recipe + "1)", "kg", "#,##0.0");
        result(formats, s, WATER_ROW, "Water to charge (MIX.RECIPE)", recipe + "2)", "kg", "#,##0.0");
        String amounts = b(SALT_ROW) + ":" + b(WATER_ROW);
        result(formats, s, MASS_ROW, "Mass of the batch", "=SUM(" + amounts + ")", "kg", "#,##0.0");
        String batch = "=MIX.BATCH(" + NAME + ";" + amounts + ";\"kg\";" + b(TEMPERATURE_ROW) + ";";
        result(formats, s, BATCH_VOLUME_ROW, "Volume of that charge (MIX.BATCH: the target back)",
                batch + "\"volume\";\"L\")", "L", "#,##0.0");
        result(formats, s, DENSITY_ROW, "Density of the batch in the tank (MIX.BATCH)", batch + "\"density\")",
                "kg/m³", "0.00");

        // 2. the check by density
        section(s, SAMPLE_T_ROW - 1, "2. Check by density: a sample on the depot's density meter");
        input(formats, s, SAMPLE_T_ROW, "Temperature of the sample in the meter (invented)", SAMPLE_T, "°C", "0.0");
        result(formats, s, EXPECTED_ROW, "Reading the target brine should give (MIX.DENSITY)", "=MIX.DENSITY("
                + NAME + ";" + b(STRENGTH_ROW) + ";" + b(SAMPLE_T_ROW) + ";;\"%w/w\")", "kg/m³", "0.00");
        input(formats, s, READING_ROW, "Reading of the sample (invented)", READING, "kg/m³", "0.00");
        result(formats, s, IMPLIED_ROW, "Strength that reading implies (MIX.FROMDENSITY)", "=MIX.FROMDENSITY("
                + NAME + ";" + b(READING_ROW) + ";" + b(SAMPLE_T_ROW) + ";1;\"%w/w\")", "% w/w", "0.00");
        result(formats, s, SHORT_ROW, "Strength of the sample minus the target", "=" + b(IMPLIED_ROW) + "-"
                + b(STRENGTH_ROW), "% w/w", "+0.00;-0.00;0.00");
        result(formats, s, AT_SAMPLE_ROW, "If the whole batch is at that strength: salt in it", "=" + b(MASS_ROW)
                + "*" + b(IMPLIED_ROW) + "/100", "kg", "#,##0.0");
        result(formats, s, AT_SAMPLE_ROW + 1, "… and water in it", "=" + b(MASS_ROW) + "-" + b(AT_SAMPLE_ROW), "kg",
                "#,##0.0");
        result(formats, s, ADD_SALT_ROW, "… salt to add to reach the target (MIX.ADJUST)", "=MIX.ADJUST(" + NAME
                + ";" + b(AT_SAMPLE_ROW) + ":" + b(AT_SAMPLE_ROW + 1) + ";\"kg\";" + b(STRENGTH_ROW) + ";\"%w/w\";"
                + b(TEMPERATURE_ROW) + ";;;;;;;;1)", "kg", "#,##0.0");

        // 3. refusals in words
        section(s, PURE_SALT_ROW - 1, "3. What the card refuses, in its own words (MIX.EXPLAIN)");
        refusal(s, PURE_SALT_ROW, "Density of pure salt: =MIX.PUREDENSITY(" + NAME + "; 1; …) says", "=MIX.EXPLAIN("
                + "\"MIX.PUREDENSITY\";" + NAME + ";1;" + b(TEMPERATURE_ROW) + ")");
        refusal(s, TOO_STRONG_ROW, "A brine of " + (int) TOO_STRONG + " % w/w: =MIX.DENSITY(" + NAME + "; "
                + (int) TOO_STRONG + "; …; ; \"%w/w\") says", "=MIX.EXPLAIN(\"MIX.DENSITY\";" + NAME + ";"
                + TOO_STRONG + ";" + b(TEMPERATURE_ROW) + ";;\"%w/w\")");
        int notes = TOO_STRONG_ROW + 3;
        fitted(s, "A" + (notes + 1) + ":C" + (notes + 1), notes, "How it works: MIX.RECIPE finds the salt and water "
                + "whose solution fills the volume at the tank's temperature; MIX.BATCH gives that charge's volume "
                + "and density back; MIX.FROMDENSITY searches the card for the strength whose density at the "
                + "sample's temperature is the reading; MIX.ADJUST the least salt that brings the batch to the "
                + "target. Before adding salt, make sure the salt charged has all dissolved. Salt and water go in by "
                + "mass: the card has no volume of pure salt, and refuses one.", LEFT_MM);

        // 5. when the brine freezes
        section(s, FREEZING_ROW - 1, "5. When the brine freezes (MIX.FREEZINGPOINT)");
        String freezing = "=MIX.FREEZINGPOINT(" + NAME + ";" + b(STRENGTH_ROW) + ";;";
        result(formats, s, FREEZING_ROW, "Ice starts to form in the target brine at",
                freezing + ";;;\"%w/w\")", "°C", "0.0");
        result(formats, s, FREEZING_IDEAL_ROW, "… an ideal solution of the ions would say",
                freezing + "\"ideal\";;;\"%w/w\")", "°C", "0.0");
        input(formats, s, ROAD_T_ROW, "Coldest road surface the depot plans for (invented)", ROAD_T, "°C", "0.0");
        result(formats, s, MARGIN_ROW, "… margin: road temperature minus freezing point", "="
                + b(ROAD_T_ROW) + "-" + b(FREEZING_ROW), "K", "+0.0;-0.0;0.0");
        refusal(s, PAST_EUTECTIC_ROW, "A brine of " + (int) PAST_EUTECTIC + " % w/w: =MIX.FREEZINGPOINT(" + NAME
                + "; " + (int) PAST_EUTECTIC + "; …; \"%w/w\") says", "=MIX.EXPLAIN(\"MIX.FREEZINGPOINT\";" + NAME
                + ";" + PAST_EUTECTIC + ";;;;;\"%w/w\")", 4);
        int freezingNote = PAST_EUTECTIC_ROW + 3;
        fitted(s, "A" + (freezingNote + 1) + ":C" + (freezingNote + 1), freezingNote, "FREEZING POINTS ARE "
                + "ESTIMATES. The card's osmotic coefficient (Pitzer's model with published low-temperature "
                + "parameters) puts this freezing point within about 0.3 K of the CRC Handbook's table up to the "
                + "eutectic (23.3 % w/w, about -21 °C). Brine stronger than that does not protect to a lower "
                + "temperature: salt crystallises out of it first, so the card refuses it. Once spread, brine is "
                + "diluted by melt water and its freezing point rises. Road-treatment guidance, the salt supplier's "
                + "data and local practice prevail over this estimate.", LEFT_MM);
        prop(s, "C" + (STRENGTH_ROW + 1) + ":C" + (MARGIN_ROW + 1), "ParaLeftMargin", 150);
        widths(s, MAKE_UP_MM);
    }

    /** A label and, in the merged row below it (A..C), the words of an MIX.EXPLAIN formula. */
    private static void refusal(XSpreadsheet s, int row, String label, String formula) throws Exception {
        refusal(s, row, label, formula, 3);
    }

    /** As above, the words' row {@code lines} lines high. */
    private static void refusal(XSpreadsheet s, int row, String label, String formula, int lines) throws Exception {
        text(s, 0, row, label);
        String range = "A" + (row + 2) + ":C" + (row + 2);
        s.getCellByPosition(0, row + 1).setFormula(formula);
        merge(s, range);
        prop(s, range, "IsTextWrapped", Boolean.TRUE);
        prop(s, range, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        band(s, range, CAUTION_COLOUR);
        ExampleWorkbooks.rowHeight(s, row + 1, lines * 460 + 120);
    }

    private static void writeTable(XSpreadsheet s) throws Exception {
        String e = col(STRENGTH_COL);
        String h = col(STRENGTH_COL + TABLE_T.length);
        text(s, STRENGTH_COL, TABLE_HEAD_ROW, "4. Density, kg/m³, against strength (MIX.DENSITY)");
        head(s, e + (TABLE_HEAD_ROW + 1) + ":" + h + (TABLE_HEAD_ROW + 1));
        text(s, STRENGTH_COL, TABLE_T_ROW, "temperature, °C:");
        text(s, STRENGTH_COL, TABLE_LABEL_ROW, "strength, % w/w");
        int last = TABLE_FIRST + TABLE_ROWS;
        for (int i = 0; i < TABLE_ROWS; i++) {
            s.getCellByPosition(STRENGTH_COL, TABLE_FIRST + i).setValue(TABLE_STRENGTHS[i]);
        }
        String strengths = "$" + e + "$" + (TABLE_FIRST + 1) + ":$" + e + "$" + last;
        for (int k = 0; k < TABLE_T.length; k++) {
            int c = STRENGTH_COL + 1 + k;
            String l = col(c);
            s.getCellByPosition(c, TABLE_T_ROW).setValue(TABLE_T[k]);
            s.getCellByPosition(c, TABLE_LABEL_ROW).setFormula("=\"at \"&" + l + "$" + (TABLE_T_ROW + 1)
                    + "&\" °C\"");
            array(s, l + (TABLE_FIRST + 1) + ":" + l + last, "=MIX.DENSITY(" + NAME + ";" + strengths + ";" + l + "$"
                    + (TABLE_T_ROW + 1) + ";;\"%w/w\")");
        }
        String temperatures = col(STRENGTH_COL + 1) + (TABLE_T_ROW + 1) + ":" + h + (TABLE_T_ROW + 1);
        band(s, temperatures, INPUT_COLOUR);
        band(s, e + (TABLE_FIRST + 1) + ":" + e + last, INPUT_COLOUR);
        head(s, e + (TABLE_LABEL_ROW + 1) + ":" + h + (TABLE_LABEL_ROW + 1));
        band(s, e + (TABLE_T_ROW + 1), HEAD_COLOUR);
        prop(s, col(STRENGTH_COL + 1) + (TABLE_T_ROW + 1) + ":" + h + (TABLE_LABEL_ROW + 1), "HoriJustify",
                CellHoriJustify.RIGHT);
        prop(s, temperatures, "NumberFormat", formats.key("0"));
        prop(s, e + (TABLE_FIRST + 1) + ":" + e + last, "NumberFormat", formats.key("0"));
        prop(s, col(STRENGTH_COL + 1) + (TABLE_FIRST + 1) + ":" + h + last, "NumberFormat", formats.key("0.0"));
    }

    private static void addChart(XSpreadsheet s) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        int top = TABLE_FIRST + TABLE_ROWS + 1;
        int bottom = top + 16;
        com.sun.star.awt.Point p = ExampleWorkbooks.position(s, STRENGTH_COL, top);
        com.sun.star.awt.Point below = ExampleWorkbooks.position(s, STRENGTH_COL, bottom);
        com.sun.star.awt.Point right = ExampleWorkbooks.position(s, STRENGTH_COL + TABLE_T.length + 1, top);
        CellRangeAddress data = new CellRangeAddress((short) 0, STRENGTH_COL, TABLE_LABEL_ROW,
                STRENGTH_COL + TABLE_T.length, TABLE_FIRST + TABLE_ROWS - 1);
        charts.addNewByName(CHART_NAME, new Rectangle(p.X, p.Y, right.X - p.X - 100, below.Y - p.Y),
                new CellRangeAddress[] {data}, true, false);
        String e = col(STRENGTH_COL);
        String h = col(STRENGTH_COL + TABLE_T.length);
        fitted(s, e + (bottom + 1) + ":" + h + (bottom + 1), bottom, "Each density column is one array formula over "
                + "the strengths: change a blue cell and it follows. The card stops at 26.6 % w/w and refuses more.",
                (34 + 25 * 3) * 17 / 20);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(CHART_NAME);
        XChartDocument cd = UnoRuntime.queryInterface(XChartDocument.class,
                UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject());
        XDiagram d = ExampleWorkbooks.lineChart(cd, "Brine density against strength (card estimates)", 10f,
                "strength, % w/w sodium chloride", "density, kg/m³");
        scale(UnoRuntime.queryInterface(XAxisXSupplier.class, d).getXAxis(), 0, 28, 4);
        XPropertySet yAxis = UnoRuntime.queryInterface(XAxisYSupplier.class, d).getYAxis();
        scale(yAxis, 950, 1250, 50);
        yAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        yAxis.setPropertyValue("NumberFormat", formats.key("#,##0"));
        int[] colours = {0x2E6FB0, 0x3A9E5C, 0xC0392B};
        for (int i = 0; i < colours.length; i++) {
            XPropertySet series = d.getDataRowProperties(1 + i);
            series.setPropertyValue("Color", colours[i]);
            series.setPropertyValue("LineWidth", 40);
            series.setPropertyValue("SymbolType", ChartSymbolType.AUTO);
        }
    }

    /** A fixed axis scale from min to max in steps. */
    private static void scale(XPropertySet axis, double min, double max, double step) throws Exception {
        axis.setPropertyValue("AutoMin", Boolean.FALSE);
        axis.setPropertyValue("AutoMax", Boolean.FALSE);
        axis.setPropertyValue("AutoStepMain", Boolean.FALSE);
        axis.setPropertyValue("Min", min);
        axis.setPropertyValue("Max", max);
        axis.setPropertyValue("StepMain", step);
    }

    /**
     * The library card placed by one array formula over exactly its block, named {@link #NAME}, with its source read
     * off its own 'source' row, the library's outside check for it, how many cards the library holds and MIX.CHECK.
     */
    private static void writeCard(XComponent doc, XSpreadsheet s) throws Exception {
        Object[][] cells = CardLibrary.find(LIBRARY_NAME).cells();
        int rows = cells.length;
        int columns = cells[0].length;
        String last = col(columns - 1);
        String block = "A" + (CARD_TOP + 1) + ":" + last + (CARD_TOP + rows);
        int[] mm = new int[columns];
        mm[0] = 60;
        mm[1] = 40;
        for (int c = 2; c < columns; c++) {
            mm[c] = c == 2 ? 44 : 28;
        }
        int width = 0;
        for (int m : mm) {
            width += m;
        }
        width = width * 17 / 20;
        text(s, 0, 0, "Miscela library card: sodium chloride + water (reference data, not invented)");
        bold(s, "A1", 13);
        fitted(s, "A2:" + last + "2", 1, "NOT INVENTED. The block " + block + " is placed by one array formula, "
                + "=MIX.LIBRARYCARD(\"" + LIBRARY_NAME + "\"): the card that ships in the add-in's library (select a "
                + "cell of it to see the formula). The range name '" + NAME + "' covers exactly that block, and every "
                + "function on sheet Make-up reads it. Its 'card size' row lets a reader refuse a block cut short. "
                + "=MIX.LIBRARY() lists the library's other cards with their sources; any of them is placed the same "
                + "way. The card describes the solution: it gives no density of pure salt.", width);
        band(s, "A2:" + last + "2", REFERENCE_COLOUR);
        bold(s, "A2", 10);
        String source = "=\"Source (the card's own 'source' row): \"&INDEX(" + NAME + ";MATCH(\"source\";INDEX("
                + NAME + ";0;1)&\"\";0);2)";
        String sourceText = (String) cells[rowOf(cells, "source")][1];
        wrappedFormula(s, SOURCE_ROW, last, source, textHeight("Source (the card's own 'source' row): "
                + sourceText, width));
        wrappedFormula(s, OUTSIDE_CHECK_ROW, last, "=\"Outside check (MIX.LIBRARY's 'outside check' column): \"&"
                + "INDEX(MIX.LIBRARY(\"" + LIBRARY_NAME + "\");2;7)", 2 * 460 + 120);
        text(s, 0, LIBRARY_COUNT_ROW, "Cards in the library");
        s.getCellByPosition(1, LIBRARY_COUNT_ROW).setFormula("=ROWS(MIX.LIBRARY())-1");
        text(s, 2, LIBRARY_COUNT_ROW, "=ROWS(MIX.LIBRARY())-1; =MIX.LIBRARY() lists them with their sources");
        text(s, 0, CHECK_ROW, "Card check (MIX.CHECK)");
        s.getCellByPosition(1, CHECK_ROW).setFormula("=MIX.CHECK(" + NAME + ")");
        bold(s, "A" + (LIBRARY_COUNT_ROW + 1) + ":A" + (CHECK_ROW + 1), 10);
        prop(s, "B" + (LIBRARY_COUNT_ROW + 1) + ":B" + (CHECK_ROW + 1), "HoriJustify", CellHoriJustify.LEFT);
        fitted(s, "A" + (CARD_TOP - 1) + ":" + last + (CARD_TOP - 1), CARD_TOP - 2, "The named range '" + NAME
                + "' covers " + block + ": labels in column A, values to their right. Do not type into it: the "
                + "whole block is one array formula, and the card changes only with the add-in's library.", width);
        String[] heads = {"label", "subject / value"};
        for (int c = 0; c < columns; c++) {
            text(s, c, CARD_TOP - 1, c < heads.length ? heads[c] : "value");
        }
        head(s, "A" + CARD_TOP + ":" + last + CARD_TOP);
        array(s, block, "=MIX.LIBRARYCARD(\"" + LIBRARY_NAME + "\")");
        band(s, block, REFERENCE_COLOUR);
        ExampleWorkbooks.nameRange(doc, NAME, "$Card.$A$" + (CARD_TOP + 1) + ":$" + last + "$" + (CARD_TOP + rows));
        widths(s, mm);
    }

    /** A formula whose text fills a merged, wrapped row across A..{@code last}. */
    private static void wrappedFormula(XSpreadsheet s, int row, String last, String formula, int height)
            throws Exception {
        String range = "A" + (row + 1) + ":" + last + (row + 1);
        s.getCellByPosition(0, row).setFormula(formula);
        merge(s, range);
        prop(s, range, "IsTextWrapped", Boolean.TRUE);
        prop(s, range, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        ExampleWorkbooks.rowHeight(s, row, height);
        band(s, range, REFERENCE_COLOUR);
    }

    /** The index of the row whose label is {@code label}. */
    static int rowOf(Object[][] cells, String label) {
        for (int r = 0; r < cells.length; r++) {
            if (label.equals(cells[r][0])) {
                return r;
            }
        }
        throw new IllegalStateException("the library card has no '" + label + "' row");
    }
}
