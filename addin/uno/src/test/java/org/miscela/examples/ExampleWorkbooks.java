package org.miscela.examples;

import com.sun.star.beans.PropertyValue;
import com.sun.star.beans.XPropertySet;
import com.sun.star.container.XIndexAccess;
import com.sun.star.container.XNameAccess;
import com.sun.star.container.XNameContainer;
import com.sun.star.container.XNamed;
import com.sun.star.frame.XStorable;
import com.sun.star.lang.Locale;
import com.sun.star.lang.XComponent;
import com.sun.star.lang.XMultiServiceFactory;
import com.sun.star.sheet.XCalculatable;
import com.sun.star.sheet.XNamedRanges;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.sheet.XSpreadsheets;
import com.sun.star.style.XStyleFamiliesSupplier;
import com.sun.star.table.CellAddress;
import com.sun.star.table.XCell;
import com.sun.star.table.XColumnRowRange;
import com.sun.star.text.XText;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.uno.XComponentContext;
import com.sun.star.util.XMergeable;
import com.sun.star.util.XNumberFormats;
import com.sun.star.util.XNumberFormatsSupplier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import org.miscela.it.Office;

/**
 * What the example workbook builders share: building a document in a fresh office and saving it into examples/,
 * the house colours, cell text and style helpers, number formats, the page setup, and the repository root.
 */
final class ExampleWorkbooks {
    /** Background of cells holding invented values, and of the banners that say so. */
    static final int INVENTED_COLOUR = 0xFCE4D6;
    static final int CAUTION_COLOUR = 0xFFF2B3;
    static final int HEAD_COLOUR = 0xDCE9E4;
    /** Background of the cells a reader is meant to change. */
    static final int INPUT_COLOUR = 0xE8F0FB;
    /** Background of cells holding values from a named outside source (not invented). */
    static final int REFERENCE_COLOUR = 0xEDEDED;

    /** The project's ethanol + water card fitted to the OIML R 22 densities (a test resource). */
    static final String OIML_CARD = "ethanol-water-oiml.tsv";
    /** Where that card lives in the repository, for the sheets that say where it comes from. */
    static final String OIML_CARD_PATH = "addin/core/src/test/resources/cards/" + OIML_CARD;

    /** Fills a new, empty spreadsheet document; the office's context is there for services the document lacks. */
    interface Content {
        void build(XComponent doc, XComponentContext context) throws Exception;
    }

    private ExampleWorkbooks() {
    }

    /**
     * Starts an office with the built extension, builds a new document, recalculates it and saves it as
     * examples/{@code file} under the repository root, or at {@code args[0]} when given.
     */
    static void buildAndSave(String file, String[] args, Content content) throws Exception {
        Path target = args.length > 0 ? Paths.get(args[0]).toAbsolutePath()
                : repoRoot().resolve("examples").resolve(file);
        Office office = Office.start();
        try {
            XComponent doc = office.newSpreadsheet();
            content.build(doc, office.context());
            UnoRuntime.queryInterface(XCalculatable.class, doc).calculateAll();
            Path scratch = office.scratch(file);
            UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(scratch.toUri().toString(),
                    new PropertyValue[] {Office.property("FilterName", "calc8")});
            doc.dispose();
            Files.createDirectories(target.getParent());
            Files.copy(scratch, target, StandardCopyOption.REPLACE_EXISTING);
            System.out.println("wrote " + target);
        } finally {
            office.dispose();
        }
    }

    /** The repository root: system property miscela.repo, else the nearest directory up with addin/ and pom.xml. */
    static Path repoRoot() {
        String p = System.getProperty("miscela.repo");
        if (p != null) {
            return Paths.get(p).toAbsolutePath().normalize();
        }
        Path d = Paths.get("").toAbsolutePath();
        for (Path at = d; at != null; at = at.getParent()) {
            if (Files.isDirectory(at.resolve("addin")) && Files.exists(at.resolve("pom.xml"))) {
                return at;
            }
        }
        return d;
    }

    // --- document

    /** Gives a new document exactly these sheets, in this order: the first one renamed, the others inserted. */
    static XSpreadsheets nameSheets(XComponent doc, String... names) throws Exception {
        XSpreadsheets sheets = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc).getSheets();
        XIndexAccess index = UnoRuntime.queryInterface(XIndexAccess.class, sheets);
        UnoRuntime.queryInterface(XNamed.class, index.getByIndex(0)).setName(names[0]);
        for (int i = 1; i < names.length; i++) {
            sheets.insertNewByName(names[i], (short) i);
        }
        while (index.getCount() > names.length) {
            sheets.removeByName(UnoRuntime.queryInterface(XNamed.class, index.getByIndex(names.length)).getName());
        }
        return sheets;
    }

    static XSpreadsheet sheet(XSpreadsheets sheets, String name) throws Exception {
        return UnoRuntime.queryInterface(XSpreadsheet.class, sheets.getByName(name));
    }

    /** Names a range of the document, e.g. {@code nameRange(doc, "card", "$Card.$A$6:$E$26")}. */
    static void nameRange(XComponent doc, String name, String absoluteArea) throws Exception {
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
        XNamedRanges ranges = UnoRuntime.queryInterface(XNamedRanges.class, dp.getPropertyValue("NamedRanges"));
        ranges.addNewByName(name, absoluteArea, new CellAddress((short) 0, 0, 0), 0);
    }

    /** The default page style in landscape with 10 mm margins, each sheet scaled to one page. */
    static void pageSetup(XComponent doc) throws Exception {
        XNameAccess families = UnoRuntime.queryInterface(XStyleFamiliesSupplier.class, doc).getStyleFamilies();
        XNameAccess pages = UnoRuntime.queryInterface(XNameAccess.class, families.getByName("PageStyles"));
        XPropertySet ps = UnoRuntime.queryInterface(XPropertySet.class, pages.getByName("Default"));
        int w = (Integer) ps.getPropertyValue("Width");
        int h = (Integer) ps.getPropertyValue("Height");
        if (w < h) {
            ps.setPropertyValue("IsLandscape", Boolean.TRUE);
            ps.setPropertyValue("Width", h);
            ps.setPropertyValue("Height", w);
        }
        for (String m : new String[] {"LeftMargin", "RightMargin", "TopMargin", "BottomMargin"}) {
            ps.setPropertyValue(m, 1000);
        }
        ps.setPropertyValue("ScaleToPagesX", (short) 1);
        ps.setPropertyValue("ScaleToPagesY", (short) 1);
        ps.setPropertyValue("CenterHorizontally", Boolean.TRUE);
    }

    /**
     * Writes the project's ethanol + water card fitted to the OIML R 22 densities ({@link #OIML_CARD_PATH}) onto
     * sheet {@code s} (which must be named Card), says where it comes from, and names its range "card". Returns the
     * card's cells as Calc hands them to the add-in.
     */
    static Object[][] writeOimlCard(XComponent doc, XSpreadsheet s) throws Exception {
        return writeOimlCard(doc, s, "card");
    }

    /** As {@link #writeOimlCard(XComponent, XSpreadsheet)}, its range named {@code name}. */
    static Object[][] writeOimlCard(XComponent doc, XSpreadsheet s, String name) throws Exception {
        Object[][] cells = org.miscela.core.card.TestCards.cells(OIML_CARD);
        int top = 5;
        int columns = 0;
        for (Object[] row : cells) {
            columns = Math.max(columns, row.length);
        }
        String last = col(columns - 1);
        int width = 74 + 40 + 7 * 26;
        text(s, 0, 0, "Miscela card: ethanol + water fitted to the OIML R 22 densities (reference data, not invented)");
        bold(s, "A1", 13);
        fitted(s, "A2:" + last + "2", 1, "NOT INVENTED. These rows are the project's reference card "
                + OIML_CARD_PATH + ", written by org.miscela.reference.OimlCardFitter. The pure liquids' density "
                + "polynomials come exactly from the density formula of OIML R 22 (1975), International "
                + "Alcoholometric Tables; the Redlich–Kister coefficients A0…A15, each a quartic in (t − 20 °C), are "
                + "this project's least-squares fit to that formula over 0–40 °C. Over the whole composition range "
                + "and 0–40 °C the card reproduces the formula within 0.011 kg/m³ (checked by EthanolWaterCardTest). "
                + "It is a fitted model of the formula: not the printed tables, and not a legal measurement standard.",
                width);
        band(s, "A2:" + last + "2", REFERENCE_COLOUR);
        bold(s, "A2", 10);
        cardTable(doc, s, cells, top, columns, 2, width, 26, name);
        Object[][] padded = new Object[cells.length][columns];
        for (int r = 0; r < cells.length; r++) {
            for (int c = 0; c < columns; c++) {
                padded[r][c] = c < cells[r].length ? cells[r][c] : "";
            }
        }
        return padded;
    }

    /**
     * A card's table on the Card sheet: the note on its named range in row {@code noteRow} (0-based), the MIX.CHECK
     * row below it, the column heads in row {@code top} − 1, the cells from row {@code top}, their band, the named
     * range 'card' over them, and the widths: 74 mm for the labels, 40 for the subjects, {@code third} for the third
     * column and 26 for the rest.
     */
    static void cardTable(XComponent doc, XSpreadsheet s, Object[][] cells, int top, int columns, int noteRow,
            int width, int third) throws Exception {
        cardTable(doc, s, cells, top, columns, noteRow, width, third, "card");
    }

    /**
     * As {@link #cardTable(XComponent, XSpreadsheet, Object[][], int, int, int, int, int)}, the range named
     * {@code name}.
     */
    static void cardTable(XComponent doc, XSpreadsheet s, Object[][] cells, int top, int columns, int noteRow,
            int width, int third, String name) throws Exception {
        String last = col(columns - 1);
        fitted(s, "A" + (noteRow + 1) + ":" + last + (noteRow + 1), noteRow, "The named range '" + name + "' covers A"
                + (top + 1) + ":" + last + (top + cells.length) + ": labels in column A, values to their right; in "
                + "keyed rows column B names the component or the pair. Every function on the other sheets reads "
                + "these cells; change them only for a card whose source you know, and write that source in the "
                + "'source' row.", width);
        text(s, 0, noteRow + 1, "Card check (MIX.CHECK)");
        bold(s, "A" + (noteRow + 2), 10);
        s.getCellByPosition(1, noteRow + 1).setFormula("=MIX.CHECK(" + name + ")");
        String[] heads = {"label", "subject / value"};
        for (int c = 0; c < columns; c++) {
            text(s, c, top - 1, c < heads.length ? heads[c] : "value");
        }
        head(s, "A" + top + ":" + last + top);
        for (int r = 0; r < cells.length; r++) {
            for (int c = 0; c < cells[r].length; c++) {
                put(s, c, top + r, cells[r][c]);
            }
        }
        band(s, "A" + (top + 1) + ":" + last + (top + cells.length), REFERENCE_COLOUR);
        String sheetName = UnoRuntime.queryInterface(XNamed.class, s).getName();
        String quoted = sheetName.matches("[A-Za-z0-9_]+") ? sheetName : "'" + sheetName + "'";
        nameRange(doc, name, "$" + quoted + ".$A$" + (top + 1) + ":$" + last + "$" + (top + cells.length));
        int[] mm = new int[columns];
        mm[0] = 74;
        mm[1] = 40;
        for (int c = 2; c < columns; c++) {
            mm[c] = c == 2 ? third : 26;
        }
        widths(s, mm);
    }

    /** Long, narrow tables print in portrait, scaled to the page width, on as many pages as they need. */
    static void portraitFullWidth(XComponent doc, XSpreadsheet... tall) throws Exception {
        XNameAccess families = UnoRuntime.queryInterface(XStyleFamiliesSupplier.class, doc).getStyleFamilies();
        XNameContainer pages = UnoRuntime.queryInterface(XNameContainer.class, families.getByName("PageStyles"));
        Object style = UnoRuntime.queryInterface(XMultiServiceFactory.class, doc)
                .createInstance("com.sun.star.style.PageStyle");
        pages.insertByName("Tall table", style);
        XPropertySet ps = UnoRuntime.queryInterface(XPropertySet.class, style);
        int w = (Integer) ps.getPropertyValue("Width");
        int h = (Integer) ps.getPropertyValue("Height");
        if (w > h) {
            ps.setPropertyValue("Width", h);
            ps.setPropertyValue("Height", w);
        }
        ps.setPropertyValue("IsLandscape", Boolean.FALSE);
        for (String m : new String[] {"LeftMargin", "RightMargin", "TopMargin", "BottomMargin"}) {
            ps.setPropertyValue(m, 1000);
        }
        ps.setPropertyValue("ScaleToPagesX", (short) 1);
        ps.setPropertyValue("ScaleToPagesY", (short) 0);
        ps.setPropertyValue("CenterHorizontally", Boolean.TRUE);
        // the same header (sheet name) and footer (page number) as the other pages, and numbers that run on
        XPropertySet standard = UnoRuntime.queryInterface(XPropertySet.class, pages.getByName("Default"));
        for (String p : new String[] {"HeaderIsOn", "FooterIsOn", "RightPageHeaderContent", "RightPageFooterContent",
            "LeftPageHeaderContent", "LeftPageFooterContent"}) {
            ps.setPropertyValue(p, standard.getPropertyValue(p));
        }
        ps.setPropertyValue("FirstPageNumber", (short) 0);
        standard.setPropertyValue("FirstPageNumber", (short) 0);
        for (XSpreadsheet s : tall) {
            UnoRuntime.queryInterface(XPropertySet.class, s).setPropertyValue("PageStyle", "Tall table");
        }
    }

    // --- cells

    static void text(XSpreadsheet s, int c, int r, String v) throws Exception {
        XCell cell = s.getCellByPosition(c, r);
        UnoRuntime.queryInterface(XText.class, cell).setString(v);
    }

    /** Merges a one-row range, wraps its text and gives the row room for two lines. */
    static void wrapped(XSpreadsheet s, String range, int row) throws Exception {
        merge(s, range);
        prop(s, range, "IsTextWrapped", Boolean.TRUE);
        rowHeight(s, row, 900);
    }

    /**
     * Writes text into the first cell of a one-row range, merges and wraps it, and makes the row tall enough for the
     * number of lines the text needs at 10 pt in {@code widthMm} (about 2 mm a character).
     */
    static void fitted(XSpreadsheet s, String range, int row, String text, int widthMm) throws Exception {
        String first = range.substring(0, range.indexOf(':'));
        UnoRuntime.queryInterface(XText.class, s.getCellRangeByName(first).getCellByPosition(0, 0)).setString(text);
        merge(s, range);
        prop(s, range, "IsTextWrapped", Boolean.TRUE);
        prop(s, range, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        rowHeight(s, row, textHeight(text, widthMm));
    }

    /**
     * The caution rows under a sheet's banner: one per text from row 3, each merged across A..{@code last}, fitted to
     * {@code widthMm} and in the caution colour; the first {@code bolded} of them in bold.
     */
    static void cautions(XSpreadsheet s, String last, int widthMm, int bolded, String... texts) throws Exception {
        for (int i = 0; i < texts.length; i++) {
            String range = "A" + (3 + i) + ":" + last + (3 + i);
            fitted(s, range, 2 + i, texts[i], widthMm);
            band(s, range, CAUTION_COLOUR);
        }
        if (bolded > 0) {
            bold(s, "A3:A" + (2 + bolded), 10);
        }
    }

    /** Writes text into a block of cells merged into one, wrapped and aligned to the top (row heights unchanged). */
    static void block(XSpreadsheet s, String range, String text) throws Exception {
        String first = range.substring(0, range.indexOf(':'));
        UnoRuntime.queryInterface(XText.class, s.getCellRangeByName(first).getCellByPosition(0, 0)).setString(text);
        merge(s, range);
        prop(s, range, "IsTextWrapped", Boolean.TRUE);
        prop(s, range, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
    }

    /** The row height, in 1/100 mm, for a text wrapped at 10 pt in {@code widthMm}. */
    static int textHeight(String text, int widthMm) {
        int lines = (int) Math.ceil(text.length() * 1.85 / widthMm);
        return lines * 460 + 120;
    }

    /** Enters one array formula over a range, e.g. {@code array(s, "B5:C5", "=MIX.RECIPE(…)")}. */
    static void array(XSpreadsheet s, String range, String formula) throws Exception {
        UnoRuntime.queryInterface(com.sun.star.sheet.XArrayFormulaRange.class, s.getCellRangeByName(range))
                .setArrayFormula(formula);
    }

    /** A number (Double) or a text (String) into a cell; anything else, or empty text, leaves the cell blank. */
    static void put(XSpreadsheet s, int c, int r, Object v) throws Exception {
        if (v instanceof Double) {
            s.getCellByPosition(c, r).setValue((Double) v);
        } else if (v instanceof String && !((String) v).isEmpty()) {
            text(s, c, r, (String) v);
        }
    }

    static void merge(XSpreadsheet s, String range) throws Exception {
        UnoRuntime.queryInterface(XMergeable.class, s.getCellRangeByName(range)).merge(true);
    }

    /** A row's height in 1/100 mm (0-based row). */
    static void rowHeight(XSpreadsheet s, int row, int height) throws Exception {
        XIndexAccess rows = UnoRuntime.queryInterface(XIndexAccess.class,
                UnoRuntime.queryInterface(XColumnRowRange.class, s).getRows());
        UnoRuntime.queryInterface(XPropertySet.class, rows.getByIndex(row)).setPropertyValue("Height", height);
    }

    static void head(XSpreadsheet s, String range) throws Exception {
        band(s, range, HEAD_COLOUR);
        bold(s, range, 10);
    }

    static void bold(XSpreadsheet s, String range, float size) throws Exception {
        prop(s, range, "CharWeight", com.sun.star.awt.FontWeight.BOLD);
        prop(s, range, "CharHeight", size);
    }

    static void band(XSpreadsheet s, String range, int colour) throws Exception {
        prop(s, range, "CellBackColor", colour);
    }

    static void prop(XSpreadsheet s, String range, String name, Object value) throws Exception {
        UnoRuntime.queryInterface(XPropertySet.class, s.getCellRangeByName(range)).setPropertyValue(name, value);
    }

    /** Column widths in mm, from column A. */
    static void widths(XSpreadsheet s, int... mm) throws Exception {
        XIndexAccess cols = UnoRuntime.queryInterface(XIndexAccess.class,
                UnoRuntime.queryInterface(XColumnRowRange.class, s).getColumns());
        for (int i = 0; i < mm.length; i++) {
            UnoRuntime.queryInterface(XPropertySet.class, cols.getByIndex(i)).setPropertyValue("Width", mm[i] * 100);
        }
    }

    /** The letter of a column from A to Z (0-based). */
    static String col(int c) {
        if (c < 0 || c >= 26) {
            throw new IllegalArgumentException("column " + c + " is beyond Z");
        }
        return String.valueOf((char) ('A' + c));
    }

    // --- labelled rows of the blending examples: label in A, value in B, unit in C

    /** A section title over A..C. */
    static void section(XSpreadsheet s, int row, String title) throws Exception {
        text(s, 0, row, title);
        head(s, "A" + (row + 1) + ":C" + (row + 1));
    }

    /** An input the reader may change: a value in the input colour. */
    static void input(Formats formats, XSpreadsheet s, int row, String label, double value, String unit,
            String format) throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setValue(value);
        if (!unit.isEmpty()) {
            text(s, 2, row, unit);
        }
        band(s, "B" + (row + 1), INPUT_COLOUR);
        prop(s, "B" + (row + 1), "NumberFormat", formats.key(format));
    }

    /** A computed value, right-aligned (a formula may return text). */
    static void result(Formats formats, XSpreadsheet s, int row, String label, String formula, String unit,
            String format) throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setFormula(formula);
        if (!unit.isEmpty()) {
            text(s, 2, row, unit);
        }
        prop(s, "B" + (row + 1), "NumberFormat", formats.key(format));
        prop(s, "B" + (row + 1), "HoriJustify", com.sun.star.table.CellHoriJustify.RIGHT);
    }

    /** The sum of a two-component row B:C in D, with its unit in E. */
    static void total(Formats formats, XSpreadsheet s, int row, String unit, String format) throws Exception {
        s.getCellByPosition(3, row).setFormula("=SUM(B" + (row + 1) + ":C" + (row + 1) + ")");
        prop(s, "D" + (row + 1), "NumberFormat", formats.key(format));
        text(s, 4, row, unit);
    }

    /** Number format keys by format code, added to the document when missing. */
    static final class Formats {
        private final XNumberFormats formats;
        private final Locale locale = new Locale("en", "GB", "");

        Formats(XComponent doc) {
            formats = UnoRuntime.queryInterface(XNumberFormatsSupplier.class, doc).getNumberFormats();
        }

        int key(String code) throws Exception {
            int k = formats.queryKey(code, locale, false);
            return k >= 0 ? k : formats.addNew(code, locale);
        }
    }

    /**
     * Sets an XY diagram into a chart document and shows its main title with the given text and character height.
     * Returns the diagram.
     */
    static com.sun.star.chart.XDiagram xyDiagram(com.sun.star.chart.XChartDocument cd, String title, float charHeight)
            throws Exception {
        com.sun.star.chart.XDiagram d = com.sun.star.uno.UnoRuntime.queryInterface(com.sun.star.chart.XDiagram.class,
                com.sun.star.uno.UnoRuntime.queryInterface(com.sun.star.lang.XMultiServiceFactory.class, cd)
                        .createInstance("com.sun.star.chart.XYDiagram"));
        cd.setDiagram(d);
        com.sun.star.uno.UnoRuntime.queryInterface(com.sun.star.beans.XPropertySet.class, cd)
                .setPropertyValue("HasMainTitle", Boolean.TRUE);
        com.sun.star.beans.XPropertySet tp = com.sun.star.uno.UnoRuntime.queryInterface(
                com.sun.star.beans.XPropertySet.class, cd.getTitle());
        tp.setPropertyValue("String", title);
        tp.setPropertyValue("CharHeight", charHeight);
        return d;
    }

    /**
     * An XY chart drawn with lines, its title at {@code charHeight}, its legend below the plot and both axes titled.
     * Returns the diagram.
     */
    static com.sun.star.chart.XDiagram lineChart(com.sun.star.chart.XChartDocument cd, String title,
            float charHeight, String xTitle, String yTitle) throws Exception {
        com.sun.star.chart.XDiagram d = xyDiagram(cd, title, charHeight);
        UnoRuntime.queryInterface(XPropertySet.class, cd).setPropertyValue("HasLegend", Boolean.TRUE);
        UnoRuntime.queryInterface(XPropertySet.class, cd.getLegend()).setPropertyValue("Alignment",
                com.sun.star.chart.ChartLegendPosition.BOTTOM);
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, d);
        dp.setPropertyValue("Lines", Boolean.TRUE);
        dp.setPropertyValue("HasXAxisTitle", Boolean.TRUE);
        dp.setPropertyValue("HasYAxisTitle", Boolean.TRUE);
        Object xAxisTitle = UnoRuntime.queryInterface(com.sun.star.chart.XAxisXSupplier.class, d).getXAxisTitle();
        UnoRuntime.queryInterface(XPropertySet.class, xAxisTitle).setPropertyValue("String", xTitle);
        Object yAxisTitle = UnoRuntime.queryInterface(com.sun.star.chart.XAxisYSupplier.class, d).getYAxisTitle();
        UnoRuntime.queryInterface(XPropertySet.class, yAxisTitle).setPropertyValue("String", yTitle);
        return d;
    }

    /** The position of a cell's top left corner on its sheet, in 1/100 mm (for placing a chart). */
    static com.sun.star.awt.Point position(XSpreadsheet s, int c, int r) throws Exception {
        return (com.sun.star.awt.Point) UnoRuntime.queryInterface(XPropertySet.class, s.getCellByPosition(c, r))
                .getPropertyValue("Position");
    }

    /**
     * The mole-fraction axis of an XY chart: titled, fixed from 0 to 1 in steps of 0.2 with the given number format,
     * and kept at the foot of the plot even when the values are negative.
     */
    static void moleFractionAxis(com.sun.star.chart.XDiagram d, String title, int numberFormat) throws Exception {
        fixedXAxis(d, title, 1.0, 0.2, numberFormat);
    }

    /**
     * The x axis of an XY chart: titled, fixed from 0 to {@code max} in steps of {@code step} with the given number
     * format, and kept at the foot of the plot even when the values are negative.
     */
    static void fixedXAxis(com.sun.star.chart.XDiagram d, String title, double max, double step, int numberFormat)
            throws Exception {
        com.sun.star.chart.XAxisXSupplier xs = com.sun.star.uno.UnoRuntime.queryInterface(
                com.sun.star.chart.XAxisXSupplier.class, d);
        com.sun.star.uno.UnoRuntime.queryInterface(com.sun.star.beans.XPropertySet.class, xs.getXAxisTitle())
                .setPropertyValue("String", title);
        com.sun.star.beans.XPropertySet xAxis = xs.getXAxis();
        xAxis.setPropertyValue("AutoMin", Boolean.FALSE);
        xAxis.setPropertyValue("AutoMax", Boolean.FALSE);
        xAxis.setPropertyValue("AutoStepMain", Boolean.FALSE);
        xAxis.setPropertyValue("Min", 0.0);
        xAxis.setPropertyValue("Max", max);
        xAxis.setPropertyValue("StepMain", step);
        xAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        xAxis.setPropertyValue("NumberFormat", numberFormat);
        xAxis.setPropertyValue("CrossoverPosition", com.sun.star.chart.ChartAxisPosition.START);
    }
}
