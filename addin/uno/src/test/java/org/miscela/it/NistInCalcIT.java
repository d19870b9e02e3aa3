package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XCellRangeData;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.table.XCellRange;
import com.sun.star.uno.UnoRuntime;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.fit.NistDataset;
import org.miscela.core.fit.NistLinearRegressionTest;

/**
 * NIST StRD linear least-squares problems (NIST ITL Statistical Reference Datasets) solved in Calc: the data in a
 * sheet, the design built there by Calc's own formulas (=x^k), and MIX.LEASTSQUARES as array formulas for the
 * coefficients, their standard errors and the statistics. Reports the log relative error (correct significant
 * digits) of every certified value and requires at least 10, or 7 for Filip, as the core test does.
 */
@ExtendWith(OfficeParameterResolver.class)
class NistInCalcIT {
    private static final String[] DATASETS = {"Longley", "Filip", "Wampler1", "Wampler4", "Norris"};

    @Test
    void certifiedValuesThroughCalc(Office office) throws Exception {
        StringBuilder table = new StringBuilder(String.format(Locale.ROOT, "%-10s %8s %8s %8s %8s%n", "dataset",
                "coeffs", "SDs", "res.SD", "R²"));
        for (String name : DATASETS) {
            NistDataset d = NistDataset.load(name);
            double[] worst = solveInCalc(office, d);
            table.append(String.format(Locale.ROOT, "%-10s %8.1f %8.1f %8.1f %8.1f%n", name, worst[0], worst[1],
                    worst[2], worst[3]));
            double need = name.equals("Filip") ? 7 : 10;
            for (double w : worst) {
                assertTrue(w >= need, name + ": " + w + " correct digits, need " + need + "\n" + table);
            }
        }
        Files.write(Paths.get("target", "nist-lre-calc.txt"), table.toString().getBytes(StandardCharsets.UTF_8));
    }

    /** Worst LRE of {coefficients, standard errors, residual SD, R²}. */
    private static double[] solveInCalc(Office office, NistDataset d) throws Exception {
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            double[][] design = d.design();
            int n = design.length;
            int p = design[0].length;
            int predictors = d.data[0].length - 1;
            // Columns A: y, B..: the predictors as printed in the file; then the design columns by Calc formulas.
            Object[][] raw = new Object[n][predictors + 1];
            for (int i = 0; i < n; i++) {
                for (int c = 0; c <= predictors; c++) {
                    raw[i][c] = d.data[i][c];
                }
            }
            range(sheet, 0, 0, predictors, n - 1).setDataArray(raw);
            int first = predictors + 2;
            for (int k = 0; k < p; k++) {
                String formula = designFormula(d, k);
                for (int i = 0; i < n; i++) {
                    Sheets.cell(sheet, first + k, i).setFormula(formula.replace("#", Integer.toString(i + 1)));
                }
            }
            String x = Sheets.column(first) + "1:" + Sheets.column(first + p - 1) + n;
            String y = "A1:A" + n;
            int out = first + p + 1;
            array(sheet, out, 0, out, p - 1, "=MIX.LEASTSQUARES(" + x + ";" + y + ")");
            array(sheet, out + 1, 0, out + 1, p - 1, "=MIX.LEASTSQUARES(" + x + ";" + y + ";;\"standard errors\")");
            array(sheet, out + 2, 0, out + 3, 8, "=MIX.LEASTSQUARES(" + x + ";" + y + ";;\"statistics\")");
            Sheets.recalculate(doc);
            double worstB = 15;
            double worstSd = 15;
            for (int k = 0; k < p; k++) {
                worstB = Math.min(worstB, NistLinearRegressionTest.lre(value(sheet, out, k),
                        d.certifiedCoefficients[k]));
                worstSd = Math.min(worstSd, NistLinearRegressionTest.lre(value(sheet, out + 1, k),
                        d.certifiedStandardDeviations[k]));
            }
            assertEquals("standard deviation of the fit", Sheets.text(Sheets.cell(sheet, out + 2, 4)));
            double sd = NistLinearRegressionTest.lre(value(sheet, out + 3, 4), d.certifiedResidualSd);
            double r2 = NistLinearRegressionTest.lre(value(sheet, out + 3, 7), d.certifiedRSquared);
            return new double[] {worstB, worstSd, sd, r2};
        } finally {
            Sheets.close(doc);
        }
    }

    /** Calc's formula for design column k of row #: 1, a predictor, or its power. */
    private static String designFormula(NistDataset d, int k) {
        int[] term = d.term(k);
        if (term[0] == 0) {
            return "=1";
        }
        String cell = Sheets.column(term[0]) + "#";
        return term[1] == 1 ? "=" + cell : "=" + cell + "^" + term[1];
    }

    private static double value(XSpreadsheet sheet, int col, int row) throws Exception {
        assertEquals(0, Sheets.cell(sheet, col, row).getError(), "error in " + Sheets.column(col) + (row + 1));
        return Sheets.cell(sheet, col, row).getValue();
    }

    private static XCellRangeData range(XSpreadsheet sheet, int c0, int r0, int c1, int r1) throws Exception {
        XCellRange r = sheet.getCellRangeByPosition(c0, r0, c1, r1);
        return UnoRuntime.queryInterface(XCellRangeData.class, r);
    }

    private static void array(XSpreadsheet sheet, int c0, int r0, int c1, int r1, String formula) throws Exception {
        XCellRange r = sheet.getCellRangeByPosition(c0, r0, c1, r1);
        UnoRuntime.queryInterface(XArrayFormulaRange.class, r).setArrayFormula(formula);
    }
}
