package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.beans.PropertyValue;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XCellRangeAddressable;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.TableSortField;
import com.sun.star.table.XCellRange;
import com.sun.star.table.XColumnRowRange;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.util.XSortable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.TestCard;
import org.miscela.core.problem.Catalogue;

/**
 * Card mistakes made with the office's own tools, and what MIX.CHECK says: a card sorted with Data ▸ Sort (the
 * office's sort, with and without "Range contains column labels", with and without a 'component order' row), a row
 * typed below a tight named range (not read; inserted inside the range it is), and a card named as whole columns.
 * The card is invented (water, by the built-in Tanaka et al. 2001 formula, first; an invented partner second).
 */
@ExtendWith(OfficeParameterResolver.class)
class CardSanityIT {
    /** Water first, then ethanol: a sort by column 2 puts ethanol first and changes what x1 is. */
    private static Object[][] card(boolean stated) {
        return TestCard.waterThenEthanol(stated).cells();
    }

    /**
     * The card on a sheet "Card", its cells named "card"; the formulas down column A of the first sheet, calculated.
     * Returns the first sheet.
     */
    private static XSpreadsheet withFormulas(XComponent doc, Object[][] cells, String... formulas) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        sd.getSheets().insertNewByName("Card", (short) 1);
        Sheets.putCard(doc, Sheets.sheet(doc, "Card"), "Card", "card", cells, 0, 0);
        XSpreadsheet s = Sheets.sheet(doc, 0);
        for (int i = 0; i < formulas.length; i++) {
            s.getCellByPosition(0, i).setFormula(formulas[i]);
        }
        Sheets.recalculate(doc);
        return s;
    }

    /** The office's Data ▸ Sort over the card's cells, by one column (0-based), ascending. */
    private static void sort(XSpreadsheet sheet, int rows, int column, boolean header) throws Exception {
        XCellRange range = sheet.getCellRangeByPosition(0, 0, 4, rows - 1);
        TableSortField field = new TableSortField();
        field.Field = column;
        field.IsAscending = true;
        field.IsCaseSensitive = false;
        UnoRuntime.queryInterface(XSortable.class, range).sort(new PropertyValue[] {
            Office.property("ContainsHeader", header), Office.property("SortFields", new TableSortField[] {field})});
    }

    @Test
    void aCardSortedByTheOfficeIsCaughtEitherWay(Office office) throws Exception {
        Object[][] cells = card(false);
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet s = withFormulas(doc, cells, "=MIX.CHECK(card)", "=MIX.PUREDENSITY(card;1;20)",
                    "=INDEX(MIX.CHECK(card;\"warnings\");1;1)&\"\"");
            XSpreadsheet card = Sheets.sheet(doc, "Card");
            assertEquals("OK", Sheets.text(s.getCellByPosition(0, 0)));
            assertEquals(998.2067, s.getCellByPosition(0, 1).getValue(), 1e-4, "component 1 is water (Tanaka 2001)");

            // sorted by column 2 below the header: the card reads, ethanol is now component 1, MIX.CHECK warns
            sort(card, cells.length, 1, true);
            Sheets.recalculate(doc);
            assertEquals(789.3, s.getCellByPosition(0, 1).getValue(), 0.0, "x1 now means ethanol");
            String warning = Sheets.text(s.getCellByPosition(0, 2));
            assertEquals("Problem.WARN_SORTED", Catalogue.entryOf(warning), warning);
            assertTrue(warning.contains("sorted by column 2 (ascending)") && warning.contains("Check that ethanol"),
                    warning);
            assertTrue(Sheets.text(s.getCellByPosition(0, 0)).startsWith("OK with 1 warning: Card rows 2 to "));

            // sorted again, the header among the rows: the header leaves the top and the card is refused
            sort(card, cells.length, 0, false);
            Sheets.recalculate(doc);
            String refused = Sheets.text(s.getCellByPosition(0, 0));
            assertEquals("Problem.CARD_HEADER", Catalogue.entryOf(refused), refused);
            assertEquals(502, s.getCellByPosition(0, 1).getError());
        } finally {
            Sheets.close(doc);
        }
    }

    @Test
    void aStatedComponentOrderMakesASortedCardRefused(Office office) throws Exception {
        Object[][] cells = card(true);
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet s = withFormulas(doc, cells, "=MIX.CHECK(card)", "=MIX.DENSITY(card;0.5;20)");
            XSpreadsheet card = Sheets.sheet(doc, "Card");
            assertEquals("OK", Sheets.text(s.getCellByPosition(0, 0)));
            sort(card, cells.length, 1, true);
            Sheets.recalculate(doc);
            String refused = Sheets.text(s.getCellByPosition(0, 0));
            assertEquals("Problem.COMPONENT_ORDER", Catalogue.entryOf(refused), refused);
            assertTrue(refused.contains("in the order \"water\", \"ethanol\", but its 'component' rows declare "
                    + "\"ethanol\", \"water\""), refused);
            assertEquals(502, s.getCellByPosition(0, 1).getError());
        } finally {
            Sheets.close(doc);
        }
    }

    /**
     * A row typed below a tight named range is not read, as MIX.CHECK's extent and the refusal's advice say; inserted
     * inside the range (Sheet ▸ Insert Rows above its last row) the office widens the name and the row is read.
     */
    @Test
    void aRowBelowATightRangeIsNotReadAndInsideItIs(Office office) throws Exception {
        Object[][] cells = card(false);
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet s = withFormulas(doc, cells, "=MIX.CHECK(card;\"extent\")", "=MIX.DENSITY(card;0.5;35)",
                    "=MIX.EXPLAIN(\"MIX.DENSITY\";card;0.5;35)");
            XSpreadsheet card = Sheets.sheet(doc, "Card");
            String extent = Sheets.text(s.getCellByPosition(0, 0));
            assertEquals("Problem.CHECK_EXTENT_TIGHT", Catalogue.entryOf(extent), extent);
            assertEquals(502, s.getCellByPosition(0, 1).getError(), "35 °C is outside 10 to 30 °C");

            // typed below the range: nothing changes
            Sheets.put(card, 0, cells.length, "extrapolation");
            Sheets.put(card, 1, cells.length, "allow");
            Sheets.recalculate(doc);
            assertEquals(502, s.getCellByPosition(0, 1).getError(), "the row below the range is not read");
            assertEquals(extent, Sheets.text(s.getCellByPosition(0, 0)));

            // the same row inserted inside the range: the name widens, the row is read
            UnoRuntime.queryInterface(XColumnRowRange.class, card).getRows().insertByIndex(cells.length - 1, 1);
            Sheets.put(card, 0, cells.length - 1, "extrapolation");
            Sheets.put(card, 1, cells.length - 1, "allow");
            Sheets.recalculate(doc);
            assertEquals(0, s.getCellByPosition(0, 1).getError(), "extrapolation allowed by the inserted row");
            assertEquals("OK", Sheets.text(s.getCellByPosition(0, 2)));
            assertTrue(Sheets.text(s.getCellByPosition(0, 0)).startsWith("The range is " + (cells.length + 1)
                    + " rows"), Sheets.text(s.getCellByPosition(0, 0)));
        } finally {
            Sheets.close(doc);
        }
    }

    /** A card named as whole columns (A:E): MIX.CHECK warns with the cost, every other function still computes. */
    @Test
    void aCardNamedAsWholeColumnsIsWarnedAbout(Office office) throws Exception {
        Object[][] cells = card(false);
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
            sd.getSheets().insertNewByName("Card", (short) 1);
            XSpreadsheet card = Sheets.sheet(doc, "Card");
            for (int r = 0; r < cells.length; r++) {
                for (int c = 0; c < cells[r].length; c++) {
                    if (!"".equals(cells[r][c])) {
                        Sheets.put(card, c, r, cells[r][c]);
                    }
                }
            }
            int rows = UnoRuntime.queryInterface(XCellRangeAddressable.class, card.getCellRangeByName("A:A"))
                    .getRangeAddress().EndRow + 1;
            Sheets.nameRange(doc, "card", "$Card.$A$1:$E$" + rows);
            XSpreadsheet s = Sheets.sheet(doc, 0);
            s.getCellByPosition(0, 0).setFormula("=INDEX(MIX.CHECK(card;\"warnings\");1;1)&\"\"");
            s.getCellByPosition(0, 1).setFormula("=MIX.PUREDENSITY(card;1;20)");
            Sheets.recalculate(doc);
            String warning = Sheets.text(s.getCellByPosition(0, 0));
            assertEquals("Problem.WARN_RANGE_SIZE", Catalogue.entryOf(warning), warning);
            assertTrue(warning.startsWith(String.format(java.util.Locale.ROOT, "The card's range is %,d rows × 5 "
                    + "columns", rows)), warning);
            assertEquals(998.2067, s.getCellByPosition(0, 1).getValue(), 1e-4);
            Figures.note(CardSanityIT.class, "a card named as whole columns: %,d rows; MIX.CHECK says: %s", rows, warning);
        } finally {
            Sheets.close(doc);
        }
    }
}
