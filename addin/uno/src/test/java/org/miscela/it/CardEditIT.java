package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCell;
import com.sun.star.uno.UnoRuntime;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;

/**
 * The card is live: editing a coefficient cell recalculates every dependent cell in place, a broken cell turns the
 * results into Err:502 with the card check naming the row, and saved workbooks keep their formulas across reload.
 */
@ExtendWith(OfficeParameterResolver.class)
class CardEditIT {
    private static final String DENSITY = "=MIX.DENSITY(card;0.4;20)";
    private static final String EXCESS = "=MIX.EXCESSVOLUME(card;0.4;20)";

    @Test
    void editingACardCellRecalculatesDependents(Office office) throws Exception {
        Object[][] cells = TestCards.cells("ethanol-water-oiml.tsv");
        int a0Row = rowOf(cells, "excess volume A0");
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet sheet = setUp(doc, cells);
            XCell density = Sheets.cell(sheet, 0, 0);
            XCell excess = Sheets.cell(sheet, 0, 1);
            XCell check = Sheets.cell(sheet, 0, 2);
            Card original = CardReader.read(cells);
            assertEquals(CardFunctions.excessMolarVolume(original, 0.4, 20, Extrapolation.AS_CARD), excess.getValue(),
                    1e-12);
            double before = density.getValue();

            // edit the constant term of A0 on the card sheet; automatic recalculation must follow
            XSpreadsheet cardSheet = Sheets.sheet(doc, "Card");
            Sheets.cell(cardSheet, 2, a0Row).setValue(-5.0);
            cells[a0Row][2] = -5.0;
            Card edited = CardReader.read(cells);
            assertEquals(CardFunctions.excessMolarVolume(edited, 0.4, 20, Extrapolation.AS_CARD), excess.getValue(),
                    1e-12, "excess volume after the edit");
            assertNotEquals(before, density.getValue(), "density must follow the edited coefficient");
            assertTrue(density.getValue() > before, "a more negative V^E means a denser mixture");

            // text in a number cell: every dependent shows Err:502 and the card check names the row
            Sheets.put(cardSheet, 2, a0Row, "minus five");
            assertEquals(502, density.getError());
            assertTrue(Sheets.text(check).startsWith("Card row " + (a0Row + 1) + " (excess volume A0)"),
                    Sheets.text(check));

            // restore, save, reload: same values, formulas intact under their permanent names
            Sheets.cell(cardSheet, 2, a0Row).setValue((Double) TestCards.cells("ethanol-water-oiml.tsv")[a0Row][2]);
            assertEquals(before, density.getValue(), 1e-12);
            Path saved = office.scratch("card-edit.ods");
            UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(saved.toUri().toString(),
                    new com.sun.star.beans.PropertyValue[] {Office.property("FilterName", "calc8")});
            String content = contentXml(saved);
            assertTrue(content.contains("of:=ORG.MISCELA.CALC.MIXTUREFUNCTIONS.MIXTUREDENSITY(card;0.4;20)"),
                    "saved formula uses the permanent service and method name");
            // MIX.CHECK's trailing optional argument (added after workbooks were saved with one argument) and its
            // result type, now any: stored under the same method name, with the argument
            assertTrue(content.contains("of:=ORG.MISCELA.CALC.MIXTUREFUNCTIONS.CHECKCARD(card)"), "one argument");
            assertTrue(content.contains("of:=ORG.MISCELA.CALC.MIXTUREFUNCTIONS.CHECKCARD(card;&quot;extent&quot;)"),
                    "the result argument");
            String extent = Sheets.text(Sheets.cell(sheet, 0, 3));
            assertTrue(extent.startsWith("The range is " + cells.length + " rows"), extent);
            XComponent reloaded = office.load(saved);
            try {
                Sheets.recalculate(reloaded);
                XSpreadsheet s = Sheets.sheet(reloaded, 0);
                assertEquals(before, Sheets.cell(s, 0, 0).getValue(), 1e-12, "density after reload");
                assertEquals(0, Sheets.cell(s, 0, 0).getError());
                assertEquals("OK", Sheets.text(Sheets.cell(s, 0, 2)));
                assertEquals(extent, Sheets.text(Sheets.cell(s, 0, 3)), "MIX.CHECK(card; \"extent\") after reload");
            } finally {
                Sheets.close(reloaded);
            }
        } finally {
            Sheets.close(doc);
        }
    }

    private static XSpreadsheet setUp(XComponent doc, Object[][] cells) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        sd.getSheets().insertNewByName("Card", (short) 1);
        Sheets.putCard(doc, Sheets.sheet(doc, "Card"), "Card", "card", cells, 0, 0);
        XSpreadsheet sheet = Sheets.sheet(doc, 0);
        Sheets.cell(sheet, 0, 0).setFormula(DENSITY);
        Sheets.cell(sheet, 0, 1).setFormula(EXCESS);
        Sheets.cell(sheet, 0, 2).setFormula("=MIX.CHECK(card)");
        Sheets.cell(sheet, 0, 3).setFormula("=MIX.CHECK(card;\"extent\")");
        return sheet;
    }

    /** The 0-based row of the card cells whose label is {@code label}. */
    static int rowOf(Object[][] cells, String label) {
        for (int r = 0; r < cells.length; r++) {
            if (label.equals(cells[r][0])) {
                return r;
            }
        }
        throw new IllegalArgumentException(label);
    }

    private static String contentXml(Path ods) throws Exception {
        try (ZipFile z = new ZipFile(ods.toFile())) {
            ZipEntry e = z.getEntry("content.xml");
            try (InputStream in = z.getInputStream(e)) {
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            }
        }
    }
}
