package org.miscela.examples;

import com.sun.star.beans.PropertyValue;
import com.sun.star.beans.XPropertySet;
import com.sun.star.container.XIndexAccess;
import com.sun.star.container.XNameAccess;
import com.sun.star.container.XNamed;
import com.sun.star.frame.XStorable;
import com.sun.star.lang.Locale;
import com.sun.star.lang.XComponent;
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
}
