package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.HEAD_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.col;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.merge;
import static org.miscela.examples.ExampleWorkbooks.nameRange;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.rowHeight;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.widths;
import static org.miscela.examples.ExampleWorkbooks.wrapped;

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
import org.miscela.examples.ExampleWorkbooks.Formats;

/**
 * Builds the example workbook examples/coolant-blend.ods from nothing, through a real office with the built
 * extension installed. The scenario (Fernhollow Fluids Ltd) and every coefficient on its card are invented.
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.ExampleWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class ExampleWorkbookBuilder {
    static final String FILE = "coolant-blend.ods";

    /** The card's first row on sheet Card (0-based) and its size. */
    private static final int CARD_TOP = 5;
    private static final int CARD_COLUMNS = 5;

    /** Composition table on sheet Blend: header row and first data row (0-based), first column. */
    private static final int TABLE_HEAD = 6;
    private static final int TABLE_FIRST = 7;
    private static final int TABLE_ROWS = 21;
    private static final int TABLE_COL = 5; // column F

    /** The number formats of the document being built. */
    private static Formats formats;

    private ExampleWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Blend", "Card");
        XSpreadsheet blend = sheet(sheets, "Blend");
        XSpreadsheet card = sheet(sheets, "Card");
        formats = new Formats(doc);
        int cardRows = writeCard(card);
        String area = "$Card.$A$" + (CARD_TOP + 1) + ":$" + (char) ('A' + CARD_COLUMNS - 1) + "$"
                + (CARD_TOP + cardRows);
        nameRange(doc, "card", area);
        writeBlend(blend, formats);
        addCharts(blend);
        pageSetup(doc);
    }

    // --- sheet Card

    private static int writeCard(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Miscela card: ethanol + water for the Fernhollow Fluids Ltd example (invented company)");
        bold(s, "A1", 13);
        text(s, 0, 1, "INVENTED VALUES. Every coefficient on this card was made up to show how the add-in works. "
                + "They are not measurements and come from no publication: do not use them for real blending, "
                + "design or trade.");
        band(s, "A2:G2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        wrapped(s, "A2:G2", 1);
        text(s, 0, 2, "The named range 'card' covers A" + (CARD_TOP + 1) + ":E" + (CARD_TOP + 21)
                + ". Labels are in column A and values to their right; in keyed rows column B names the component "
                + "or the pair. Rows whose label starts with # are comments. Column G explains each row.");
        wrapped(s, "A3:G3", 2);
        String[] heads = {"label", "subject / value", "value", "value", "value", "", "what the row says"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, CARD_TOP - 1, heads[c]);
        }
        band(s, "A" + CARD_TOP + ":G" + CARD_TOP, HEAD_COLOUR);
        bold(s, "A" + CARD_TOP + ":G" + CARD_TOP, 10);
        Object[][] rows = {
            {"Miscela card", 1.0, null, null, null, "card format version 1"},
            {"# invented", "coefficients below are invented", null, null, null,
                "a comment row (label starts with #): the reader skips it"},
            {"title", "Ethanol + water (invented coefficients)", null, null, null, ""},
            {"source", "Invented for the Miscela example; not measured", null, null, null,
                "where the coefficients came from: here, nowhere (they are invented)"},
            {"temperature unit", "°C", null, null, null, ""},
            {"density unit", "kg/m³", null, null, null, ""},
            {"molar volume unit", "cm³/mol", null, null, null, ""},
            {"molar mass unit", "g/mol", null, null, null, ""},
            {"valid temperature", 5.0, 35.0, null, null, "the functions refuse outside 5..35 °C"},
            {"extrapolation", "refuse", null, null, null, "no answers outside the validity range"},
            {"component", "ethanol", 46.07, null, null, "component 1 (x1 is its mole fraction); molar mass g/mol"},
            {"component", "water", 18.015, null, null, "component 2; molar mass g/mol"},
            {"density model", "ethanol", "polynomial", null, null, ""},
            {"density reference temperature", "ethanol", 20.0, null, null, ""},
            {"density coefficients", "ethanol", 789.3, -0.84, null,
                "ρ = 789.3 − 0.84·(T − 20 °C) kg/m³ (invented)"},
            {"density model", "water", "Tanaka 2001", null, null, "the add-in's built-in water model"},
            {"valid mole fraction", "ethanol", 0.0, 1.0, null, "whole composition range"},
            {"excess volume reference temperature", "ethanol + water", 20.0, null, null, ""},
            {"excess volume A0", "ethanol + water", -4.2, -0.012, null,
                "A0 = −4.2 − 0.012·(T − 20 °C) cm³/mol (invented)"},
            {"excess volume A1", "ethanol + water", -0.9, 0.004, null,
                "A1 = −0.9 + 0.004·(T − 20 °C) cm³/mol (invented)"},
            {"excess volume A2", "ethanol + water", 0.6, null, null, "A2 = 0.6 cm³/mol, constant (invented)"},
        };
        for (int r = 0; r < rows.length; r++) {
            for (int c = 0; c < CARD_COLUMNS; c++) {
                Object v = rows[r][c];
                if (v instanceof String) {
                    text(s, c, CARD_TOP + r, (String) v);
                } else if (v instanceof Double) {
                    s.getCellByPosition(c, CARD_TOP + r).setValue((Double) v);
                }
            }
            text(s, 6, CARD_TOP + r, (String) rows[r][5]);
        }
        int last = CARD_TOP + rows.length;
        band(s, "A" + (CARD_TOP + 1) + ":E" + last, INVENTED_COLOUR);
        prop(s, "G" + (CARD_TOP + 1) + ":G" + last, "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        text(s, 0, last + 1, "The shaded card holds the invented density and excess volume coefficients (the molar "
                + "masses are ordinary rounded values). Replace them only with coefficients of your own whose source "
                + "you know, and write that source in the 'source' row.");
        wrapped(s, "A" + (last + 2) + ":G" + (last + 2), last + 1);
        widths(s, 74, 66, 22, 16, 12, 4, 92);
        return rows.length;
    }

    // --- sheet Blend

    private static void writeBlend(XSpreadsheet s, Formats f) throws Exception {
        text(s, 0, 0, "Fernhollow Fluids Ltd (invented company): ethanol + water blend sheet");
        bold(s, "A1", 14);
        text(s, 0, 1, "Invented scenario with INVENTED coefficients (see sheet Card). The numbers show how the "
                + "Miscela functions work; they are not measured properties of any product.");
        band(s, "A2:N2", INVENTED_COLOUR);
        String[] cautions = {
            "CAUTION: ethanol and its blends with water are flammable liquids, and their vapours can ignite. Keep "
                    + "ignition sources away, ventilate, earth containers, and blend and store only as your site "
                    + "safety rules and local fire codes require.",
            "Volumes and densities from this sheet are not for custody transfer, trade, tax or labelling. Use "
                    + "such figures only after a check by a licensed or accredited measurement body, under the "
                    + "rules that apply where you are.",
            "Glycol coolants are harmful if swallowed. If you adapt this sheet to a glycol, use a card with a "
                    + "known source and follow the supplier's safety data sheet and local regulations.",
        };
        for (int i = 0; i < cautions.length; i++) {
            int row = 2 + i;
            text(s, 0, row, cautions[i]);
            String a = "A" + (row + 1) + ":N" + (row + 1);
            merge(s, a);
            band(s, a, CAUTION_COLOUR);
            prop(s, a, "IsTextWrapped", Boolean.TRUE);
        }
        bold(s, "A3", 10);

        // inputs
        text(s, 0, 6, "Inputs (change the blue cells)");
        head(s, "A7:C7");
        label(s, 7, "Ethanol mole fraction x1 (component 1)", "mol/mol");
        s.getCellByPosition(1, 7).setValue(0.5);
        label(s, 8, "Temperature", "°C");
        s.getCellByPosition(1, 8).setValue(20.0);
        band(s, "B8:B9", INPUT_COLOUR);
        prop(s, "B8", "NumberFormat", f.key("0.000"));
        prop(s, "B9", "NumberFormat", f.key("0.0"));
        label(s, 9, "Card check (MIX.CHECK)", "");
        s.getCellByPosition(1, 9).setFormula("=MIX.CHECK(card)");
        label(s, 10, "Point check (MIX.CHECKPOINT)", "");
        s.getCellByPosition(1, 10).setFormula("=MIX.CHECKPOINT(card;B8;B9)");
        prop(s, "B10:B11", "HoriJustify", com.sun.star.table.CellHoriJustify.RIGHT);

        // results at the input point
        text(s, 0, 12, "Results at the input point");
        head(s, "A13:C13");
        String[][] results = {
            {"Excess molar volume Vᴱ (MIX.EXCESSVOLUME)", "=MIX.EXCESSVOLUME(card;B8;B9)", "cm³/mol", "0.0000"},
            {"Partial molar volume of ethanol (MIX.PARTIALVOLUME)", "=MIX.PARTIALVOLUME(card;1;B8;B9)", "cm³/mol",
                "0.000"},
            {"Partial molar volume of water (MIX.PARTIALVOLUME)", "=MIX.PARTIALVOLUME(card;\"water\";B8;B9)",
                "cm³/mol", "0.000"},
            {"Partial excess volume of ethanol (MIX.PARTIALEXCESS)", "=MIX.PARTIALEXCESS(card;1;B8;B9)", "cm³/mol",
                "0.0000"},
            {"Partial excess volume of water (MIX.PARTIALEXCESS)", "=MIX.PARTIALEXCESS(card;2;B8;B9)", "cm³/mol",
                "0.0000"},
            {"Molar volume of the blend (MIX.MOLARVOLUME)", "=MIX.MOLARVOLUME(card;B8;B9)", "cm³/mol", "0.000"},
            {"Density of the blend (MIX.DENSITY)", "=MIX.DENSITY(card;B8;B9)", "kg/m³", "0.00"},
            {"Density of pure ethanol (MIX.PUREDENSITY)", "=MIX.PUREDENSITY(card;\"ethanol\";B9)", "kg/m³", "0.00"},
            {"Density of pure water (MIX.PUREDENSITY)", "=MIX.PUREDENSITY(card;2;B9)", "kg/m³", "0.00"},
            {"Ethanol mass fraction w1 (from the card's molar masses)",
                "=B8*$Card.C16/(B8*$Card.C16+(1-B8)*$Card.C17)", "kg/kg", "0.0000"},
            {"Volume change on mixing, Vᴱ / ideal volume",
                "=B14/(B19-B14)", "—", "0.00%"},
        };
        for (int i = 0; i < results.length; i++) {
            int row = 13 + i;
            label(s, row, results[i][0], results[i][2]);
            s.getCellByPosition(1, row).setFormula(results[i][1]);
            prop(s, "B" + (row + 1), "NumberFormat", f.key(results[i][3]));
        }
        int noteRow = 13 + results.length + 1;
        text(s, 0, noteRow, "A cell showing Err:502 means the add-in refused: the point check above says why "
                + "(for example a temperature outside 5..35 °C).");
        String note = "A" + (noteRow + 1) + ":C" + (noteRow + 2);
        merge(s, note);
        prop(s, note, "IsTextWrapped", Boolean.TRUE);
        prop(s, note, "VertJustify", com.sun.star.table.CellVertJustify.TOP);
        prop(s, note, "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        // a little room between the numbers and their units
        prop(s, "C8:C" + (12 + results.length), "ParaLeftMargin", 150);

        // composition table (array formulas over the x1 column)
        text(s, TABLE_COL, TABLE_HEAD - 1, "Across the composition range at the input temperature (array formulas)");
        bold(s, col(TABLE_COL) + TABLE_HEAD, 10);
        String[] heads = {"x1 ethanol\nmol/mol", "V̄ ethanol\ncm³/mol", "V̄ water\ncm³/mol", "Vᴱ\ncm³/mol",
            "V̄ᴱ ethanol\ncm³/mol", "V̄ᴱ water\ncm³/mol", "Vm blend\ncm³/mol", "ρ blend\nkg/m³",
            "w1 ethanol\nkg/kg"};
        for (int c = 0; c < heads.length; c++) {
            text(s, TABLE_COL + c, TABLE_HEAD, heads[c]);
        }
        String headRange = col(TABLE_COL) + (TABLE_HEAD + 1) + ":" + col(TABLE_COL + heads.length - 1)
                + (TABLE_HEAD + 1);
        head(s, headRange);
        prop(s, headRange, "IsTextWrapped", Boolean.TRUE);
        prop(s, headRange, "HoriJustify", com.sun.star.table.CellHoriJustify.CENTER);
        for (int i = 0; i < TABLE_ROWS; i++) {
            s.getCellByPosition(TABLE_COL, TABLE_FIRST + i).setValue(i * 5 / 100.0);
        }
        String x = column(TABLE_COL);
        String[] arrays = {
            "=MIX.PARTIALVOLUME(card;1;" + x + ";$B$9)",
            "=MIX.PARTIALVOLUME(card;2;" + x + ";$B$9)",
            "=MIX.EXCESSVOLUME(card;" + x + ";$B$9)",
            "=MIX.PARTIALEXCESS(card;1;" + x + ";$B$9)",
            "=MIX.PARTIALEXCESS(card;2;" + x + ";$B$9)",
            "=MIX.MOLARVOLUME(card;" + x + ";$B$9)",
            "=MIX.DENSITY(card;" + x + ";$B$9)",
            "=" + x + "*$Card.$C$16/(" + x + "*$Card.$C$16+(1-" + x + ")*$Card.$C$17)",
        };
        String[] numberFormats = {"0.000", "0.000", "0.0000", "0.0000", "0.0000", "0.000", "0.00", "0.0000"};
        for (int c = 0; c < arrays.length; c++) {
            XCellRange r = s.getCellRangeByName(column(TABLE_COL + 1 + c));
            UnoRuntime.queryInterface(XArrayFormulaRange.class, r).setArrayFormula(arrays[c]);
            prop(s, column(TABLE_COL + 1 + c), "NumberFormat", f.key(numberFormats[c]));
        }
        prop(s, column(TABLE_COL), "NumberFormat", f.key("0.00"));
        int end = TABLE_FIRST + TABLE_ROWS;
        text(s, TABLE_COL, end, "V̄ = partial molar volume; V̄ᴱ = partial molar excess volume; "
                + "Vm = molar volume of the blend; w1 = ethanol mass fraction.");
        prop(s, col(TABLE_COL) + (end + 1), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        // rows
        for (int r = 2; r <= 4; r++) {
            rowHeight(s, r, 900);
        }
        rowHeight(s, TABLE_HEAD, 900);
        widths(s, 100, 24, 19, 3, 3, 19, 20, 19, 18, 21, 19, 20, 18, 19);
    }

    /** Two XY charts under the tables: the partial molar volumes, and the excess volumes. */
    private static void addCharts(XSpreadsheet s) throws Exception {
        int last = TABLE_FIRST + TABLE_ROWS - 1;
        CellRangeAddress x = new CellRangeAddress((short) 0, TABLE_COL, TABLE_HEAD, TABLE_COL, last);
        CellRangeAddress partial = new CellRangeAddress((short) 0, TABLE_COL, TABLE_HEAD, TABLE_COL + 2, last);
        CellRangeAddress excess = new CellRangeAddress((short) 0, TABLE_COL + 3, TABLE_HEAD, TABLE_COL + 5, last);
        int top = TABLE_FIRST + TABLE_ROWS + 2;
        XDiagram a = chart(s, "partial-volumes", new CellRangeAddress[] {partial}, 0, top, 14000,
                "Partial molar volumes (invented coefficients)", "V̄ ethanol, cm³/mol", "0.0");
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
        y2.setPropertyValue("NumberFormat", numberFormat(s, "0.0"));
        chart(s, "excess-volumes", new CellRangeAddress[] {x, excess}, TABLE_COL, top, 17400,
                "Excess volumes (invented coefficients)", "cm³/mol", "0.0");
    }

    /** One XY line chart anchored at a cell; returns its diagram. */
    private static XDiagram chart(XSpreadsheet s, String name, CellRangeAddress[] ranges, int column, int row,
            int width, String title, String yTitle, String yFormat) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        XPropertySet anchor = UnoRuntime.queryInterface(XPropertySet.class, s.getCellByPosition(column, row));
        com.sun.star.awt.Point p = (com.sun.star.awt.Point) anchor.getPropertyValue("Position");
        charts.addNewByName(name, new Rectangle(p.X, p.Y, width, 8000), ranges, true, false);
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
        ExampleWorkbooks.moleFractionAxis(d, "ethanol mole fraction x1", numberFormat(s, "0.0"));
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

    private static void label(XSpreadsheet s, int r, String label, String unit) throws Exception {
        text(s, 0, r, label);
        if (!unit.isEmpty()) {
            text(s, 2, r, unit);
        }
    }

    /** The table's data cells in column c, as an absolute range. */
    private static String column(int c) {
        return "$" + col(c) + "$" + (TABLE_FIRST + 1) + ":$" + col(c) + "$" + (TABLE_FIRST + TABLE_ROWS);
    }
}
