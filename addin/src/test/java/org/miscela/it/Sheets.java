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
final class Sheets {
    private Sheets() {
    }

    static XSpreadsheet sheet(XComponent doc, int index) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        return UnoRuntime.queryInterface(XSpreadsheet.class,
                UnoRuntime.queryInterface(XIndexAccess.class, sd.getSheets()).getByIndex(index));
    }

    static XSpreadsheet sheet(XComponent doc, String name) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        return UnoRuntime.queryInterface(XSpreadsheet.class, sd.getSheets().getByName(name));
    }

    static XCell cell(XSpreadsheet sheet, int col, int row) throws Exception {
        return sheet.getCellByPosition(col, row);
    }

    /** Writes a Double as a number, anything else as text. */
    static void put(XSpreadsheet sheet, int col, int row, Object value) throws Exception {
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

    static String text(XCell c) {
        return UnoRuntime.queryInterface(XText.class, c).getString();
    }

    /** Writes a card's cells at (col, row) and names the range. */
    static void putCard(XComponent doc, XSpreadsheet sheet, String sheetName, String name, Object[][] cells, int col,
            int row) throws Exception {
        int width = 0;
        for (int r = 0; r < cells.length; r++) {
            for (int c = 0; c < cells[r].length; c++) {
                put(sheet, col + c, row + r, cells[r][c]);
            }
            width = Math.max(width, cells[r].length);
        }
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
        XNamedRanges ranges = UnoRuntime.queryInterface(XNamedRanges.class, dp.getPropertyValue("NamedRanges"));
        String address = "$'" + sheetName + "'.$" + column(col) + "$" + (row + 1) + ":$" + column(col + width - 1) + "$"
                + (row + cells.length);
        ranges.addNewByName(name, address, new CellAddress((short) 0, 0, 0), 0);
    }

    static String column(int index) {
        StringBuilder b = new StringBuilder();
        int i = index + 1;
        while (i > 0) {
            int r = (i - 1) % 26;
            b.insert(0, (char) ('A' + r));
            i = (i - 1) / 26;
        }
        return b.toString();
    }

    static void recalculate(XComponent doc) {
        UnoRuntime.queryInterface(XCalculatable.class, doc).calculateAll();
    }

    static void close(XComponent doc) {
        try {
            UnoRuntime.queryInterface(XCloseable.class, doc).close(true);
        } catch (Exception e) {
            doc.dispose();
        }
    }
}
