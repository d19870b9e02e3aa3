package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.sun.star.container.XNamed;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.uno.UnoRuntime;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.TestCards;

/**
 * The layout rules in a real office, as a user enters them: per-component results entered as array formulas down a
 * column and across a row, read cell by cell; one component per cell; and the refused two-cell column. The card is the
 * OIML R 22 ethanol-water card; the recipes are by mass, so the expected masses follow from the mass balance alone
 * (1 kg at mass fraction w holds w kg of ethanol), and the adjustment's 250 g of water from 500/0.4 − 1000.
 */
@ExtendWith(OfficeParameterResolver.class)
class LayoutIT {
    private static final double TOL = 1e-12;
    /** Calc's code for an IllegalArgumentException from an add-in. */
    private static final int REFUSED = 502;

    @Test
    void perComponentResultsFollowTheLayoutTheyAreGiven(Office office) throws Exception {
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            String name = UnoRuntime.queryInterface(XNamed.class, sheet).getName();
            Sheets.putCard(doc, sheet, name, "card", TestCards.cells("ethanol-water-oiml.tsv"), 12, 0);
            // A1:A2 a composition down a column (mass fractions), E1:F1 the same across a row, A6:A7 a batch in grams
            Sheets.put(sheet, 0, 0, 0.4);
            Sheets.put(sheet, 0, 1, 0.6);
            Sheets.put(sheet, 4, 0, 0.4);
            Sheets.put(sheet, 5, 0, 0.6);
            Sheets.put(sheet, 0, 5, 500.0);
            Sheets.put(sheet, 0, 6, 500.0);
            array(sheet, 1, 0, 1, 1, "=MIX.RECIPE(card;1;\"kg\";A1:A2;\"mass fraction\";20)");
            array(sheet, 4, 1, 5, 1, "=MIX.RECIPE(card;1;\"kg\";E1:F1;\"mass fraction\";20)");
            // a lone x1 gives a row; down a column Calc repeats its first value (the platform's rule)
            array(sheet, 2, 0, 2, 1, "=MIX.RECIPE(card;1;\"kg\";0.4;\"mass fraction\";20)");
            // one component per cell: the bill-of-materials layout
            Sheets.cell(sheet, 3, 0).setFormula("=MIX.RECIPE(card;1;\"kg\";0.4;\"mass fraction\";20;;;;;1)");
            Sheets.cell(sheet, 3, 1).setFormula("=MIX.RECIPE(card;1;\"kg\";0.4;\"mass fraction\";20;;;;;\"water\")");
            array(sheet, 1, 5, 1, 6, "=MIX.ADJUST(card;A6:A7;\"g\";0.4;\"mass fraction\";20;;;;;\"g\")");
            Sheets.cell(sheet, 2, 6).setFormula("=MIX.ADJUST(card;A6:A7;\"g\";0.4;\"mass fraction\";20;;;;;\"g\";;;2)");
            Sheets.cell(sheet, 6, 0).setFormula("=MIX.DENSITY(card;A1:A2;20)");
            Sheets.cell(sheet, 6, 1).setFormula("=MIX.DENSITY(card;E1:F1;20)");
            Sheets.cell(sheet, 6, 2).setFormula("=MIX.DENSITY(card;0.4;20)");
            Sheets.recalculate(doc);

            StringBuilder seen = new StringBuilder();
            double[] down = {value(sheet, 1, 0, seen), value(sheet, 1, 1, seen)};
            double[] across = {value(sheet, 4, 1, seen), value(sheet, 5, 1, seen)};
            double[] repeated = {value(sheet, 2, 0, seen), value(sheet, 2, 1, seen)};
            double[] picked = {value(sheet, 3, 0, seen), value(sheet, 3, 1, seen)};
            double[] additions = {value(sheet, 1, 5, seen), value(sheet, 1, 6, seen)};
            double water = value(sheet, 2, 6, seen);
            Figures.note(LayoutIT.class, "%s", "layout cells: " + seen);
            assertEquals(0.4, down[0], TOL, "a column in, a column out: ethanol");
            assertEquals(0.6, down[1], TOL, "a column in, a column out: water");
            assertEquals(0.4, across[0], TOL, "a row in, a row out: ethanol");
            assertEquals(0.6, across[1], TOL, "a row in, a row out: water");
            assertEquals(0.4, repeated[1], TOL, "a row result down a column repeats its first value (platform)");
            assertEquals(0.4, picked[0], TOL, "component 1 alone");
            assertEquals(0.6, picked[1], TOL, "component \"water\" alone");
            assertEquals(0.0, additions[0], 1e-9, "no ethanol is added");
            assertEquals(250.0, additions[1], 1e-9, "the additions down a column: 250 g of water");
            assertEquals(250.0, water, 1e-9, "the water addition alone");
            assertEquals(REFUSED, Sheets.cell(sheet, 6, 0).getError(),
                    "a two-cell column adding up to 1 on a two-component card is refused");
            assertEquals(0, Sheets.cell(sheet, 6, 1).getError(), "a two-cell row is one composition");
            // the row holds mass fractions read as mole fractions (x1 = 0.4), the same as x1 alone
            assertEquals(Sheets.cell(sheet, 6, 2).getValue(), Sheets.cell(sheet, 6, 1).getValue(), 0.0);
        } finally {
            Sheets.close(doc);
        }
    }

    private static double value(XSpreadsheet sheet, int col, int row, StringBuilder seen) throws Exception {
        int error = Sheets.cell(sheet, col, row).getError();
        assertEquals(0, error, Sheets.column(col) + (row + 1) + " shows Err:" + error);
        double v = Sheets.cell(sheet, col, row).getValue();
        seen.append(Sheets.column(col)).append(row + 1).append('=').append(v).append(' ');
        return v;
    }

    private static void array(XSpreadsheet sheet, int c0, int r0, int c1, int r1, String formula) throws Exception {
        UnoRuntime.queryInterface(XArrayFormulaRange.class, sheet.getCellRangeByPosition(c0, r0, c1, r1))
                .setArrayFormula(formula);
    }
}
