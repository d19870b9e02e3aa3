package org.miscela.it;

import com.sun.star.beans.XPropertySet;
import com.sun.star.container.XIndexAccess;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XCalculatable;
import com.sun.star.sheet.XNamedRanges;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.CellAddress;
import com.sun.star.table.XCell;
import com.sun.star.text.XText;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.util.XCloseable;

/** Small conveniences over the spreadsheet API for the integration tests. */
public final class Sheets {
    private Sheets() {
    }

    public static XSpreadsheet sheet(XComponent doc, int index) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        return UnoRuntime.queryInterface(XSpreadsheet.class,
                UnoRuntime.queryInterface(XIndexAccess.class, sd.getSheets()).getByIndex(index));
    }

    public static XSpreadsheet sheet(XComponent doc, String name) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        return UnoRuntime.queryInterface(XSpreadsheet.class, sd.getSheets().getByName(name));
    }

    public static XCell cell(XSpreadsheet sheet, int col, int row) throws Exception {
        return sheet.getCellByPosition(col, row);
    }

    /** Writes a Double as a number, anything else as text. */
    public static void put(XSpreadsheet sheet, int col, int row, Object value) throws Exception {
        XCell c = sheet.getCellByPosition(col, row);
        if (value instanceof Double) {
            c.setValue((Double) value);
        } else {
            String s = String.valueOf(value);
            if (!s.isEmpty()) {
                UnoRuntime.queryInterface(XText.class, c).setString(s);
            }
        }
    }

    public static String text(XCell c) {
        return UnoRuntime.queryInterface(XText.class, c).getString();
    }

    /** Writes a card's cells at (col, row) and names the range. */
    public static void putCard(XComponent doc, XSpreadsheet sheet, String sheetName, String name, Object[][] cells, int col,
            int row) throws Exception {
        int width = 0;
        for (int r = 0; r < cells.length; r++) {
            for (int c = 0; c < cells[r].length; c++) {
                if (!"".equals(cells[r][c])) { // a blank cell stays untouched (a range of a million rows is quick)
                    put(sheet, col + c, row + r, cells[r][c]);
                }
            }
            width = Math.max(width, cells[r].length);
        }
        nameRange(doc, name, "$'" + sheetName + "'.$" + column(col) + "$" + (row + 1) + ":$" + column(col + width - 1)
                + "$" + (row + cells.length));
    }

    /** Names a range given by its absolute address (e.g. "$Card.$A$1:$H$40") for the whole document. */
    public static void nameRange(XComponent doc, String name, String address) throws Exception {
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
        XNamedRanges ranges = UnoRuntime.queryInterface(XNamedRanges.class, dp.getPropertyValue("NamedRanges"));
        ranges.addNewByName(name, address, new CellAddress((short) 0, 0, 0), 0);
    }

    public static String column(int index) {
        StringBuilder b = new StringBuilder();
        int i = index + 1;
        while (i > 0) {
            int r = (i - 1) % 26;
            b.insert(0, (char) ('A' + r));
            i = (i - 1) / 26;
        }
        return b.toString();
    }

    /** What a test reads from a cell. */
    public interface CellReader<T> {
        T read(XCell cell) throws Exception;
    }

    /**
     * Enters the formulas down a column from its first row, recalculates the document, and reads each cell back: the
     * result per formula, in the formulas' order.
     */
    public static <T> java.util.Map<String, T> results(XComponent doc, XSpreadsheet sheet, int col,
            Iterable<String> formulas, CellReader<T> reader) throws Exception {
        int row = 0;
        for (String formula : formulas) {
            cell(sheet, col, row++).setFormula(formula);
        }
        recalculate(doc);
        java.util.Map<String, T> out = new java.util.LinkedHashMap<>();
        row = 0;
        for (String formula : formulas) {
            out.put(formula, reader.read(cell(sheet, col, row++)));
        }
        return out;
    }

    public static void recalculate(XComponent doc) {
        UnoRuntime.queryInterface(XCalculatable.class, doc).calculateAll();
    }

    public static void close(XComponent doc) {
        try {
            UnoRuntime.queryInterface(XCloseable.class, doc).close(true);
        } catch (Exception e) {
            doc.dispose();
        }
    }
}
