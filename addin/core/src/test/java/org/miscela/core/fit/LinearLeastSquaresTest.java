package org.miscela.core.fit;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

/** Contracts and statistics of {@link LinearLeastSquares} on small hand-made problems (invented data). */
class LinearLeastSquaresTest {
    private static final double[][] LINE = {{1, 0}, {1, 1}, {1, 2}, {1, 3}, {1, 4}};

    @Test
    void exactLineIsRecovered() {
        double[] y = {1, 3, 5, 7, 9};
        LeastSquaresFit fit = LinearLeastSquares.fit(LINE, y);
        assertArrayEquals(new double[] {1, 2}, fit.coefficients(), 1e-14);
        assertEquals(0.0, fit.residualStandardDeviation(), 1e-14);
        assertEquals(1.0, fit.rSquared(), 1e-15);
        assertTrue(fit.isCentred());
        assertEquals(5, fit.pointCount());
        assertEquals(3, fit.degreesOfFreedom());
    }

    /** Textbook: for y = b0 + b1·x on x = 0..4, SE(b1) = s/√Σ(x − x̄)² = s/√10, SE(b0) = s·√(1/5 + 4/10). */
    @Test
    void standardErrorsOfAStraightLine() {
        double[] y = {1.1, 2.9, 5.2, 6.8, 9.1};
        LeastSquaresFit fit = LinearLeastSquares.fit(LINE, y);
        double s = fit.residualStandardDeviation();
        assertEquals(s / Math.sqrt(10), fit.standardErrors()[1], 1e-15);
        assertEquals(s * Math.sqrt(0.2 + 0.4), fit.standardErrors()[0], 1e-15);
        assertEquals(-s * s * 2 / 10, fit.covariance()[0][1], 1e-15);
    }

    @Test
    void largestResidualAndWhere() {
        double[] y = {1, 3, 5, 7.5, 9};
        LeastSquaresFit fit = LinearLeastSquares.fit(LINE, y);
        double[] r = fit.residuals();
        int expected = 0;
        for (int i = 1; i < r.length; i++) {
            if (Math.abs(r[i]) > Math.abs(r[expected])) {
                expected = i;
            }
        }
        assertEquals(3, expected);
        assertEquals(expected, fit.largestResidualIndex());
        assertEquals(r[3], fit.largestResidual());
        assertTrue(fit.largestResidual() > 0);
    }

    /** A weight of 2 is the same as giving the point twice. */
    @Test
    void integerWeightEqualsRepeatedPoint() {
        double[] y = {1.1, 2.9, 5.2, 6.8, 9.1};
        LeastSquaresFit weighted = LinearLeastSquares.fit(LINE, y, new double[] {1, 1, 2, 1, 1});
        double[][] repeated = {{1, 0}, {1, 1}, {1, 2}, {1, 2}, {1, 3}, {1, 4}};
        LeastSquaresFit twice = LinearLeastSquares.fit(repeated, new double[] {1.1, 2.9, 5.2, 5.2, 6.8, 9.1});
        assertArrayEquals(twice.coefficients(), weighted.coefficients(), 1e-14);
        assertEquals(twice.residualSumOfSquares(), weighted.residualSumOfSquares(), 1e-14);
        assertEquals(twice.rSquared(), weighted.rSquared(), 1e-14);
    }

    /** A zero weight drops the point from the fit and the counts, but its residual is still reported. */
    @Test
    void zeroWeightLeavesThePointOut() {
        double[] y = {1, 3, 5, 70, 9};
        LeastSquaresFit fit = LinearLeastSquares.fit(LINE, y, new double[] {1, 1, 1, 0, 1});
        assertArrayEquals(new double[] {1, 2}, fit.coefficients(), 1e-13);
        assertEquals(4, fit.pointCount());
        assertEquals(2, fit.degreesOfFreedom());
        assertEquals(63, fit.residuals()[3], 1e-12);
        assertTrue(fit.largestResidualIndex() != 3);
    }

    @Test
    void noDegreesOfFreedomLeavesTheStatisticsUndefined() {
        LeastSquaresFit fit = LinearLeastSquares.fit(new double[][] {{1, 0}, {1, 1}}, new double[] {2, 5});
        assertArrayEquals(new double[] {2, 3}, fit.coefficients(), 1e-15);
        assertEquals(0, fit.degreesOfFreedom());
        assertTrue(Double.isNaN(fit.residualStandardDeviation()));
        assertTrue(Double.isNaN(fit.standardErrors()[0]));
    }

    /** Without a constant column R² is taken about zero: 1 − RSS/Σy². */
    @Test
    void uncentredRSquaredWithoutIntercept() {
        double[][] x = {{1}, {2}, {3}, {4}};
        double[] y = {2.2, 3.8, 6.3, 7.9};
        LeastSquaresFit fit = LinearLeastSquares.fit(x, y);
        assertFalse(fit.isCentred());
        double syy = 0;
        for (double v : y) {
            syy += v * v;
        }
        assertEquals(1 - fit.residualSumOfSquares() / syy, fit.rSquared(), 1e-15);
    }

    /** Cross-check with Commons Math's own QR regression on a random problem (invented data, fixed seed). */
    @Test
    void agreesWithCommonsMathRegression() {
        Random random = new Random(7);
        int n = 40;
        double[][] x = new double[n][4];
        double[][] predictors = new double[n][3];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i][0] = 1;
            for (int j = 1; j < 4; j++) {
                x[i][j] = random.nextGaussian() * j;
                predictors[i][j - 1] = x[i][j];
            }
            y[i] = 0.5 + x[i][1] - 2 * x[i][2] + 0.1 * x[i][3] + 0.3 * random.nextGaussian();
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.newSampleData(y, predictors);
        LeastSquaresFit fit = LinearLeastSquares.fit(x, y);
        assertArrayEquals(ols.estimateRegressionParameters(), fit.coefficients(), 1e-13);
        assertArrayEquals(ols.estimateRegressionParametersStandardErrors(), fit.standardErrors(), 1e-13);
        assertArrayEquals(ols.estimateResiduals(), fit.residuals(), 1e-13);
        assertEquals(ols.calculateRSquared(), fit.rSquared(), 1e-13);
        assertEquals(ols.estimateRegressionStandardError(), fit.residualStandardDeviation(), 1e-13);
    }

    @Test
    void rejectsFewerPointsThanParameters() {
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> LinearLeastSquares.fit(new double[][] {{1, 0, 0}, {1, 1, 1}}, new double[] {1, 2}));
        assertEquals(Problem.TOO_FEW_POINTS, e.problem());
        assertEquals("The fit has 3 parameter(s) but only 2 point(s) with positive weight; give at least as many "
                + "points as parameters, or lower the order.", e.getMessage());
        MiscelaException zeroWeights = assertThrows(MiscelaException.class,
                () -> LinearLeastSquares.fit(LINE, new double[5], new double[] {1, 0, 0, 0, 0}));
        assertEquals(Problem.TOO_FEW_POINTS, zeroWeights.problem());
    }

    @Test
    void rejectsRankDeficiency() {
        double[][] twice = {{1, 2, 2}, {1, 3, 3}, {1, 5, 5}, {1, 7, 7}};
        MiscelaException e = assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(twice, new double[4]));
        assertEquals(Problem.RANK_DEFICIENT, e.problem());
        assertTrue(e.getMessage().startsWith("The points cannot separate the 3 parameters: the design is rank "
                + "deficient (condition number "), e.getMessage());
        double[][] zero = {{1, 0}, {1, 0}, {1, 0}};
        assertEquals(Problem.ZERO_COLUMN,
                assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(zero, new double[3])).problem());
    }

    @Test
    void rejectsNonFiniteValues() {
        double[][] nan = {{1, 0}, {1, Double.NaN}, {1, 2}};
        MiscelaException e = assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(nan, new double[3]));
        assertEquals("The design value in column 2 at point 2 is not a finite number (NaN).", e.getMessage());
        MiscelaException inf = assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(LINE,
                new double[] {1, 2, Double.POSITIVE_INFINITY, 4, 5}));
        assertEquals("The response at point 3 is not a finite number (Infinity).", inf.getMessage());
        assertEquals(Problem.FIT_NOT_FINITE, assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(LINE,
                new double[5], new double[] {1, 1, 1, 1, Double.NaN})).problem());
    }

    @Test
    void rejectsNegativeWeights() {
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> LinearLeastSquares.fit(LINE, new double[5], new double[] {1, -0.5, 1, 1, 1}));
        assertEquals("The weight at point 2 is -0.5; weights must be zero or positive.", e.getMessage());
    }

    @Test
    void rejectsMismatchedShapes() {
        assertEquals(Problem.LENGTH_MISMATCH,
                assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(LINE, new double[4])).problem());
        assertEquals(Problem.LENGTH_MISMATCH, assertThrows(MiscelaException.class,
                () -> LinearLeastSquares.fit(LINE, new double[5], new double[3])).problem());
        assertEquals(Problem.RAGGED_DESIGN, assertThrows(MiscelaException.class,
                () -> LinearLeastSquares.fit(new double[][] {{1, 0}, {1}}, new double[2])).problem());
        assertEquals(Problem.NO_POINTS,
                assertThrows(MiscelaException.class, () -> LinearLeastSquares.fit(new double[0][], new double[0]))
                        .problem());
        assertEquals(Problem.NO_PARAMETERS, assertThrows(MiscelaException.class,
                () -> LinearLeastSquares.fit(new double[][] {{}}, new double[1])).problem());
    }

    @Test
    void inputsAreNotModifiedAndResultsAreCopies() {
        double[][] x = {{1, 0}, {1, 1}, {1, 2}};
        double[] y = {1, 2, 4};
        LeastSquaresFit fit = LinearLeastSquares.fit(x, y);
        assertArrayEquals(new double[] {1, 1}, x[1]);
        assertArrayEquals(new double[] {1, 2, 4}, y);
        fit.coefficients()[0] = 99;
        fit.covariance()[0][0] = 99;
        assertTrue(fit.coefficients()[0] != 99 && fit.covariance()[0][0] != 99);
    }
}
