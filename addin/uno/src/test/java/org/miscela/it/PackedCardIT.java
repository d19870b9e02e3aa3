package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.uno.UnoRuntime;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.TestCards;

/**
 * The packed card in a real office: a cell holding =MIX.PACK(card), entered as an ordinary formula and as a one-cell
 * array formula (the recommended form), and formulas naming either cell give the range's
 * results bit for bit, an edit of the card range recalculates through the packed cell (result → packed cell → card
 * range), MIX.TRACE names the same card, and a workbook saved as .ods and reopened keeps both forms, alike to the bit,
 * and their values.
 */
@ExtendWith(OfficeParameterResolver.class)
class PackedCardIT {
    /**
     * Column A the range form, column B the packed form (D1), column C the packed form entered as an array formula
     * (D2); the trace's first two rows are the card's title and source.
     */
    private static final String[] FORMULAS = {
        "=MIX.DENSITY(%s;0.4;20)",
        "=MIX.PARTIALVOLUME(%s;\"ethanol\";0.4;20)",
        "=MIX.EXCESSVOLUME(%s;0.25;15)",
        "=MIX.CONVERT(%s;40;\"%%vol\";\"mass fraction\")",
        "=INDEX(MIX.TRACE(%s;0.3;20);1;2)",
        "=INDEX(MIX.TRACE(%s;0.3;20);2;2)",
    };

    @Test
    void thePackedCellGivesTheRangesResultsAcrossEditAndReload(Office office) throws Exception {
        Object[][] cells = TestCards.cells("ethanol-water-oiml.tsv");
        int a0 = CardEditIT.rowOf(cells, "excess volume A0");
        XComponent doc = office.newSpreadsheet();
        double[] before = new double[FORMULAS.length];
        try {
            XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
            sd.getSheets().insertNewByName("Card", (short) 1);
            Sheets.putCard(doc, Sheets.sheet(doc, "Card"), "Card", "card", cells, 0, 0);
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            Sheets.cell(sheet, 3, 0).setFormula("=MIX.PACK(card)");
            // the recommended entry: a one-cell array formula (docs/performance.md, The packed card)
            UnoRuntime.queryInterface(com.sun.star.sheet.XArrayFormulaRange.class,
                    sheet.getCellRangeByName("D2:D2")).setArrayFormula("MIX.PACK(card)");
            for (int i = 0; i < FORMULAS.length; i++) {
                Sheets.cell(sheet, 0, i).setFormula(String.format(FORMULAS[i], "card"));
                Sheets.cell(sheet, 1, i).setFormula(String.format(FORMULAS[i], "$D$1"));
                Sheets.cell(sheet, 2, i).setFormula(String.format(FORMULAS[i], "$D$2"));
            }
            Sheets.recalculate(doc);
            assertTrue(Sheets.text(Sheets.cell(sheet, 3, 0)).startsWith("Miscela packed card 1 · Ethanol"),
                    Sheets.text(Sheets.cell(sheet, 3, 0)));
            same(sheet, "as built");
            for (int i = 0; i < FORMULAS.length; i++) {
                before[i] = Sheets.cell(sheet, 0, i).getValue();
            }
            // edit the card: both forms follow, the packed one through D1 (automatic recalculation)
            XSpreadsheet cardSheet = Sheets.sheet(doc, "Card");
            double a0Value = Sheets.cell(cardSheet, 2, a0).getValue();
            Sheets.cell(cardSheet, 2, a0).setValue(a0Value - 0.5);
            same(sheet, "after editing the card");
            assertNotEquals(before[0], Sheets.cell(sheet, 1, 0).getValue(), "the packed form followed the edit");
            assertNotEquals(before[0], Sheets.cell(sheet, 2, 0).getValue(), "the array form followed the edit");
            Sheets.cell(cardSheet, 2, a0).setValue(a0Value);
            same(sheet, "after undoing the edit");
            assertEquals(before[0], Sheets.cell(sheet, 1, 0).getValue(), 0.0);

            Path saved = office.scratch("packed-card.ods");
            UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(saved.toUri().toString(),
                    new com.sun.star.beans.PropertyValue[] {Office.property("FilterName", "calc8")});
            XComponent reloaded = office.load(saved);
            try {
                Sheets.recalculate(reloaded);
                XSpreadsheet s = Sheets.sheet(reloaded, 0);
                same(s, "after reload");
                for (int i = 0; i < FORMULAS.length; i++) {
                    // the card's own numbers come back from the file to within its stored digits (see
                    // FileFormatRoundTripIT); both forms read the reloaded card alike, which same() checks bit for bit
                    assertEquals(before[i], Sheets.cell(s, 1, i).getValue(), 1e-12 * Math.abs(before[i]),
                            "reloaded " + FORMULAS[i]);
                }
                assertTrue(Sheets.cell(s, 1, 0).getFormula().contains("$D$1"), Sheets.cell(s, 1, 0).getFormula());
                assertTrue(Sheets.text(Sheets.cell(s, 3, 1)).startsWith("Miscela packed card 1 · "),
                        "the array formula's packed text after reload");
                assertTrue(Sheets.cell(s, 3, 0).getFormula().toUpperCase().contains("CARD"),
                        Sheets.cell(s, 3, 0).getFormula());
            } finally {
                Sheets.close(reloaded);
            }
        } finally {
            Sheets.close(doc);
        }
    }

    /** Each row's three forms show the same value (bit for bit) or the same text, and no error. */
    private static void same(XSpreadsheet sheet, String when) throws Exception {
        for (int i = 0; i < FORMULAS.length; i++) {
            assertEquals(0, Sheets.cell(sheet, 0, i).getError(), when + ": " + FORMULAS[i]);
            for (int c = 1; c <= 2; c++) {
                String form = c == 1 ? "packed " : "packed as an array formula ";
                assertEquals(0, Sheets.cell(sheet, c, i).getError(), when + ": " + form + FORMULAS[i]);
                assertEquals(Sheets.text(Sheets.cell(sheet, 0, i)), Sheets.text(Sheets.cell(sheet, c, i)),
                        when + ": " + form + FORMULAS[i]);
                assertEquals(Double.doubleToRawLongBits(Sheets.cell(sheet, 0, i).getValue()),
                        Double.doubleToRawLongBits(Sheets.cell(sheet, c, i).getValue()), when + ": " + form
                        + FORMULAS[i]);
            }
        }
    }
}
