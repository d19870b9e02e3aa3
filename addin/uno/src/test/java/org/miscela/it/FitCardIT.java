package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.beans.XPropertySet;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XNamedRanges;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.table.CellAddress;
import com.sun.star.table.XCell;
import com.sun.star.uno.UnoRuntime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.TestCards;
import org.miscela.reference.Oiml22;

/**
 * A card whose coefficient cells are the fit: lab densities in a table, MIX.FITDENSITY as an array formula over the
 * card's A0..A14 cells (reading the pure-component part of the same card), MIX.FITDENSITY's covariance in the
 * card's covariance rows, and results that follow every new measurement. The "measurements" are the OIML R 22
 * formula's densities of ethanol + water at 20 °C, so the fitted card must reproduce the formula between the points
 * within 0.011 kg/m³ (the printed tables' resolution; the same fit in the core reaches 0.0097).
 */
@ExtendWith(OfficeParameterResolver.class)
class FitCardIT {
    private static final int ORDER = 14;
    private static final int POINTS = 101;
    private static final int ROOM = 140;

    @Test
    void theCardRefitsWhenMeasurementsChange(Office office) throws Exception {
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet lab = Sheets.sheet(doc, 0);
            Sheets.put(lab, 0, 0, "x ethanol");
            Sheets.put(lab, 1, 0, "t / °C");
            Sheets.put(lab, 2, 0, "density / kg/m³ (OIML R 22 formula)");
            for (int i = 0; i < POINTS; i++) {
                double p = i / 100.0;
                Sheets.cell(lab, 0, i + 1).setValue(x(p));
                Sheets.cell(lab, 1, i + 1).setValue(20);
                Sheets.cell(lab, 2, i + 1).setValue(Oiml22.density(p, 20));
            }
            String data = "$Sheet1.$A$2:$A$" + (ROOM + 1) + ";$Sheet1.$C$2:$C$" + (ROOM + 1) + ";$Sheet1.$B$2:$B$"
                    + (ROOM + 1);

            com.sun.star.sheet.XSpreadsheets sheets = UnoRuntime.queryInterface(
                    com.sun.star.sheet.XSpreadsheetDocument.class, doc).getSheets();
            sheets.insertNewByName("Card", (short) 1);
            XSpreadsheet card = Sheets.sheet(doc, "Card");
            List<Object[]> pure = new ArrayList<>();
            List<Object[]> rest = new ArrayList<>();
            for (Object[] r : TestCards.cells("ethanol-water-oiml.tsv")) {
                String label = String.valueOf(r[0]).toLowerCase(Locale.ROOT);
                if (label.startsWith("excess volume")) {
                    continue;
                }
                (label.equals("valid mole fraction") ? rest : pure).add(r);
            }
            pure.set(0, new Object[] {"Miscela card", 2.0});
            int row = 0;
            for (Object[] r : pure) {
                putRow(card, row++, r);
            }
            name(doc, "pure", "$Card.$A$1:$H$" + row);
            for (Object[] r : rest) {
                putRow(card, row++, r);
            }
            int a0 = row;
            for (int k = 0; k <= ORDER; k++) {
                Sheets.put(card, 0, row, "excess volume A" + k);
                Sheets.put(card, 1, row++, "ethanol + water");
            }
            array(card, 2, a0, 2, a0 + ORDER, "=MIX.FITDENSITY(pure;\"ethanol + water\";" + data + ";" + ORDER + ")");
            int cov = row;
            for (int p = 0; p <= ORDER; p++) {
                Sheets.put(card, 0, row, "excess volume covariance");
                Sheets.put(card, 1, row++, "ethanol + water");
            }
            array(card, 2, cov, 2 + ORDER, cov + ORDER, "=MIX.FITDENSITY(pure;\"ethanol + water\";" + data + ";"
                    + ORDER + ";;;;\"covariance\")");
            name(doc, "card", "$Card.$A$1:$" + Sheets.column(2 + ORDER) + "$" + row);

            XSpreadsheet results = Sheets.sheet(doc, 0);
            XCell check = Sheets.cell(results, 5, 0);
            check.setFormula("=MIX.CHECK(card)");
            XCell density = Sheets.cell(results, 5, 1);
            double p = 0.355;
            density.setFormula("=MIX.DENSITY(card;" + x(p) + ";20)");
            XCell uncertainty = Sheets.cell(results, 5, 2);
            uncertainty.setFormula("=MIX.UNCERTAINTY(card;" + x(p) + ";20)");
            XCell points = Sheets.cell(results, 5, 3);
            points.setFormula("=INDEX(MIX.FITDENSITY(pure;\"ethanol + water\";" + data + ";" + ORDER
                    + ";;;;\"statistics\");2;2)");
            Sheets.recalculate(doc);

            assertEquals("OK", Sheets.text(check));
            assertEquals(0, density.getError(), "the card must not refer to itself (Err:522 would mean it does)");
            assertEquals(Oiml22.density(p, 20), density.getValue(), 0.011, "fitted card against OIML R 22");
            assertTrue(uncertainty.getValue() > 0 && uncertainty.getValue() < 0.01, "u(ρ) " + uncertainty.getValue());
            assertEquals(POINTS, points.getValue(), 0.0);

            // A new measurement in the spare rows refits the card and moves the result (an outlier, on purpose).
            double before = density.getValue();
            Sheets.cell(lab, 0, POINTS + 1).setValue(x(0.36));
            Sheets.cell(lab, 1, POINTS + 1).setValue(20);
            Sheets.cell(lab, 2, POINTS + 1).setValue(Oiml22.density(0.36, 20) + 2.0);
            assertEquals(POINTS + 1, points.getValue(), 0.0, "the new point takes part in the fit");
            assertNotEquals(before, density.getValue(), "the card's coefficients follow the data");
            assertTrue(density.getValue() > before, "a denser measurement pulls the fit up");
            // A half-filled measurement row is refused, not read as zero: the coefficient cells show Err:502, the
            // card's users Err:504 (Calc's own code for an error inside a range argument), and the fit's check says
            // why in words.
            UnoRuntime.queryInterface(com.sun.star.sheet.XSheetOperation.class,
                    lab.getCellRangeByPosition(2, POINTS + 1, 2, POINTS + 1))
                    .clearContents(com.sun.star.sheet.CellFlags.VALUE);
            assertEquals(502, Sheets.cell(card, 2, a0).getError());
            assertEquals(504, density.getError());
            XCell why = Sheets.cell(results, 5, 4);
            why.setFormula("=MIX.FITDENSITY(pure;\"ethanol + water\";" + data + ";" + ORDER + ";;;;\"check\")");
            assertEquals("Point " + (POINTS + 1) + " has a mole fraction but a blank density; fill it in, or clear "
                    + "the whole point.", Sheets.text(why));
        } finally {
            Sheets.close(doc);
        }
    }

    static double x(double p) {
        return (p / Oiml22.M_ETHANOL) / (p / Oiml22.M_ETHANOL + (1 - p) / Oiml22.M_WATER);
    }

    private static void putRow(XSpreadsheet sheet, int row, Object[] cells) throws Exception {
        for (int c = 0; c < cells.length; c++) {
            if (!"".equals(cells[c])) {
                Sheets.put(sheet, c, row, cells[c]);
            }
        }
    }

    private static void name(XComponent doc, String name, String address) throws Exception {
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
        XNamedRanges ranges = UnoRuntime.queryInterface(XNamedRanges.class, dp.getPropertyValue("NamedRanges"));
        ranges.addNewByName(name, address, new CellAddress((short) 0, 0, 0), 0);
    }

    private static void array(XSpreadsheet sheet, int c0, int r0, int c1, int r1, String formula) throws Exception {
        UnoRuntime.queryInterface(XArrayFormulaRange.class, sheet.getCellRangeByPosition(c0, r0, c1, r1))
                .setArrayFormula(formula);
    }
}
