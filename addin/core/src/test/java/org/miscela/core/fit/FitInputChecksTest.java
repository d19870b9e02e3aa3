package org.miscela.core.fit;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.miscela.core.model.Component;
import org.miscela.core.model.ConstantDensity;

/**
 * Every refusal of the fit entry points, at the edges of what they accept: the expected texts are the entries of
 * the {@link FitProblem} catalogue with their blanks filled in (points counted from 1, as a user reads rows), and
 * the edge values themselves (x1 = 0 and 1, the highest orders) must be accepted. The data are invented.
 */
class FitInputChecksTest {
    private static final double T = 298.15;
    private static final double[] X = {0.1, 0.3, 0.5, 0.7, 0.9};
    private static final double[] VE = {-0.3, -0.7, -0.9, -0.7, -0.3};
    private static final Component A = new Component("a", 46.07, new ConstantDensity(789.3));
    private static final Component B = new Component("b", 18.015, new ConstantDensity(997.0));
    private static final double[] RHO = {960, 930, 900, 860, 820};

    private static String refusal(Executable call) {
        return assertThrows(MiscelaException.class, call).getMessage();
    }

    /** The words of the test tool ExcessVolumeUncertainty, which refuses with plain IllegalArgumentExceptions. */
    private static String toolRefusal(Executable call) {
        return assertThrows(IllegalArgumentException.class, call).getMessage();
    }

    private static double[] with(double[] v, int i, double value) {
        double[] c = v.clone();
        c[i] = value;
        return c;
    }

    private static double[] same(double value) {
        double[] t = new double[X.length];
        Arrays.fill(t, value);
        return t;
    }

    @Test
    void excessVolumesAtOneTemperature() {
        assertEquals("The temperature in K at point 1 is 0.0; it must be greater than zero.",
                refusal(() -> RedlichKisterFitter.excessVolumes(X, VE, 1, 0.0, null)));
        assertEquals("The temperature in K at point 1 is Infinity; it must be greater than zero.",
                refusal(() -> RedlichKisterFitter.excessVolumes(X, VE, 1, Double.POSITIVE_INFINITY, null)));
        assertEquals("There are 5 mole fractions but 4 excess volumes; give one of each per point.",
                refusal(() -> RedlichKisterFitter.excessVolumes(X, Arrays.copyOf(VE, 4), 1, T, null)));
        assertEquals("The mole fraction at point 3, 1.5, lies outside 0..1.",
                refusal(() -> RedlichKisterFitter.excessVolumes(with(X, 2, 1.5), VE, 1, T, null)));
        assertEquals("The mole fraction at point 2, -0.1, lies outside 0..1.",
                refusal(() -> RedlichKisterFitter.excessVolumes(with(X, 1, -0.1), VE, 1, T, null)));
        // the pure liquids themselves are points of the curve (V^E = 0 there)
        double[] edges = {0.0, 0.3, 0.5, 0.7, 1.0};
        double[] excess = {0.0, -0.7, -0.9, -0.7, 0.0};
        assertEquals(5, RedlichKisterFitter.excessVolumes(edges, excess, 2, T, null).leastSquares().pointCount());
    }

    @Test
    void excessVolumesOverTemperatures() {
        assertEquals("There are 5 mole fractions but 4 temperatures; give one of each per point.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, Arrays.copyOf(same(T), 4), VE, 1, 0, T, null)));
        assertEquals("There are 5 mole fractions but 6 excess volumes; give one of each per point.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, same(T), Arrays.copyOf(VE, 6), 1, 0, T, null)));
        assertEquals("The temperature in K at point 4 is -1.0; it must be greater than zero.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, with(same(T), 3, -1.0), VE, 1, 0, T, null)));
        assertEquals("The reference temperature at point 1 is not a finite number (NaN).", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, 1, 0, Double.NaN, null)));
        assertEquals("The order in x must be a whole number from 0 to 30; found -1.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, -1, 0, T, null)));
        assertEquals("The order in x must be a whole number from 0 to 30; found 31.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, 31, 0, T, null)));
        assertEquals("The order in T must be a whole number from 0 to 10; found 11.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, 1, 11, T, null)));
        assertEquals("The order in T must be a whole number from 0 to 10; found -1.", refusal(
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, 1, -1, T, null)));
        // the highest orders pass the order check (and then meet the point count)
        assertEquals(Problem.TOO_FEW_POINTS, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, 30, 0, T, null)).problem());
        assertEquals(Problem.TOO_FEW_POINTS, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(X, same(T), VE, 0, 10, T, null)).problem());
    }

    @Test
    void excessVolumesAtTemperatureOffsets() {
        double[] tau = {-10, 5, 0, -5, 10};
        assertEquals("There are 5 mole fractions but 3 temperatures; give one of each per point.", refusal(
                () -> RedlichKisterFitter.excessVolumesAtOffsets(X, Arrays.copyOf(tau, 3), VE, 1, 0, null)));
        assertEquals("There are 5 mole fractions but 2 excess volumes; give one of each per point.", refusal(
                () -> RedlichKisterFitter.excessVolumesAtOffsets(X, tau, Arrays.copyOf(VE, 2), 1, 0, null)));
        assertEquals("The mole fraction at point 5, 2.0, lies outside 0..1.", refusal(
                () -> RedlichKisterFitter.excessVolumesAtOffsets(with(X, 4, 2.0), tau, VE, 1, 0, null)));
        assertEquals("The temperature at point 2 is not a finite number (NaN).", refusal(
                () -> RedlichKisterFitter.excessVolumesAtOffsets(X, with(tau, 1, Double.NaN), VE, 1, 0, null)));
        assertEquals("The order in x must be a whole number from 0 to 30; found 40.", refusal(
                () -> RedlichKisterFitter.excessVolumesAtOffsets(X, tau, VE, 40, 0, null)));
        RedlichKisterFit fit = RedlichKisterFitter.excessVolumesAtOffsets(X, tau, VE, 1, 1, null);
        assertTrue(Double.isNaN(fit.referenceKelvin()), "no temperature scale, so no reference temperature");
        assertEquals(298.15, RedlichKisterFitter.excessVolumes(X, VE, 1, T, null).referenceKelvin(), 0.0);
    }

    @Test
    void densities() {
        assertEquals("The temperature in K at point 1 is NaN; it must be greater than zero.", refusal(
                () -> RedlichKisterFitter.densities(X, RHO, A, B, Double.NaN, 1, DeviationMeasure.DENSITY, null)));
        assertEquals("There are 5 mole fractions but 4 temperatures; give one of each per point.", refusal(
                () -> RedlichKisterFitter.densities(X, Arrays.copyOf(same(T), 4), RHO, A, B, 1, 0, T,
                        DeviationMeasure.DENSITY, null)));
        assertEquals("There are 5 mole fractions but 4 densities; give one of each per point.", refusal(
                () -> RedlichKisterFitter.densities(X, Arrays.copyOf(RHO, 4), A, B, T, 1, DeviationMeasure.DENSITY,
                        null)));
        assertEquals("There are 5 mole fractions but 3 weights; give one of each per point.", refusal(
                () -> RedlichKisterFitter.densities(X, RHO, A, B, T, 1, DeviationMeasure.DENSITY, new double[3])));
        assertEquals("The mole fraction at point 4, -0.5, lies outside 0..1.", refusal(
                () -> RedlichKisterFitter.densities(with(X, 3, -0.5), RHO, A, B, T, 1, DeviationMeasure.DENSITY,
                        null)));
        assertEquals("The temperature in K at point 2 is 0.0; it must be greater than zero.", refusal(
                () -> RedlichKisterFitter.densities(X, with(same(T), 1, 0.0), RHO, A, B, 1, 0, T,
                        DeviationMeasure.DENSITY, null)));
        assertEquals("The density at point 5 is 0.0; it must be greater than zero.", refusal(
                () -> RedlichKisterFitter.densities(X, with(RHO, 4, 0.0), A, B, T, 1, DeviationMeasure.DENSITY,
                        null)));
        assertEquals("The density at point 1 is Infinity; it must be greater than zero.", refusal(
                () -> RedlichKisterFitter.densities(X, with(RHO, 0, Double.POSITIVE_INFINITY), A, B, T, 1,
                        DeviationMeasure.EXCESS_VOLUME, null)));
    }

    /** Points and columns are counted from 1 in the least-squares engine's messages too. */
    @Test
    void leastSquaresCountsFromOne() {
        double[][] design = {{1, 0}, {1, 1}, {1, 2}, {1, 3}};
        double[] y = {1, 2, 3, 4};
        assertEquals("Row 3 of the design has 1 column(s) but row 1 has 2.", refusal(
                () -> LinearLeastSquares.fit(new double[][] {{1, 0}, {1, 1}, {1}, {1, 3}}, y, null)));
        assertEquals("The weight at point 2 is not a finite number (NaN).", refusal(
                () -> LinearLeastSquares.fit(design, y, new double[] {1, Double.NaN, 1, 1})));
        assertEquals("The weight at point 4 is -1.0; weights must be zero or positive.", refusal(
                () -> LinearLeastSquares.fit(design, y, new double[] {1, 1, 1, -1})));
        assertEquals("The response at point 3 is not a finite number (Infinity).", refusal(
                () -> LinearLeastSquares.fit(design, new double[] {1, 2, Double.POSITIVE_INFINITY, 4}, null)));
        assertEquals("Parameter 2 multiplies zero at every point with positive weight, so the data say nothing about "
                + "it; spread the points or lower the order.", refusal(
                () -> LinearLeastSquares.fit(new double[][] {{1, 0}, {1, 0}, {1, 0}}, new double[] {1, 2, 3}, null)));
    }

    /** The largest residual is found wherever it is, the first point included. */
    @Test
    void largestResidualAtTheFirstPoint() {
        double[][] line = {{1, 0}, {1, 1}, {1, 2}, {1, 3}, {1, 4}};
        LeastSquaresFit fit = LinearLeastSquares.fit(line, new double[] {2.5, 3, 5, 7, 9}, null);
        double[] r = fit.residuals();
        for (int i = 1; i < r.length; i++) {
            assertTrue(Math.abs(r[0]) > Math.abs(r[i]), "the invented data put the largest residual first");
        }
        assertEquals(0, fit.largestResidualIndex());
    }

    /**
     * A column constant at every point with positive weight makes R² centred, whatever a point of zero weight holds
     * there (the documented rule); R² is then 1 − RSS/Σ w(y − ȳ)² with the weighted mean.
     */
    @Test
    void centringLooksOnlyAtWeightedPoints() {
        double[][] design = {{1, 0}, {1, 1}, {1, 2}, {7, 3}};
        double[] y = {1.1, 2.9, 5.2, 40};
        double[] w = {1, 1, 1, 0};
        LeastSquaresFit fit = LinearLeastSquares.fit(design, y, w);
        assertTrue(fit.isCentred());
        double mean = (1.1 + 2.9 + 5.2) / 3;
        double tss = Math.pow(1.1 - mean, 2) + Math.pow(2.9 - mean, 2) + Math.pow(5.2 - mean, 2);
        assertEquals(1 - fit.residualSumOfSquares() / tss, fit.rSquared(), 1e-14);
    }

    /**
     * The covariance checks: the symmetry tolerance is relative to √(c_ii·c_jj) (1e-9), so a difference just inside
     * is accepted and symmetrised and one just outside is refused, with both entries named from 1.
     */
    @Test
    void covarianceSymmetryIsJudgedRelativeToTheVariances() {
        org.miscela.core.model.RedlichKister rk = new org.miscela.core.model.RedlichKister(T,
                new double[][] {{-3.0}, {0.8}});
        double[][] c = {{4.0, 1.0}, {1.0 + 0.9e-9 * 2 * 3, 9.0}};
        ExcessVolumeUncertainty u = new ExcessVolumeUncertainty(rk, 0, c);
        double[] g = u.excessVolumeGradient(0.3, T);
        double mixed = 0.5 * (1.0 + 1.0 + 0.9e-9 * 6);
        double expected = Math.sqrt(g[0] * g[0] * 4 + 2 * g[0] * g[1] * mixed + g[1] * g[1] * 9);
        assertEquals(expected, u.excessVolume(0.3, T), 1e-15 * expected);
        double[][] d = {{4.0, 1.0}, {1.0 + 1.1e-9 * 6, 9.0}};
        assertEquals("The covariance is not symmetric: entry (2, 1) is " + d[1][0] + " but (1, 2) is 1.0.",
                toolRefusal(() -> new ExcessVolumeUncertainty(rk, 0, d)));
        double[][] e = {{4.0, Double.POSITIVE_INFINITY}, {1.0, 9.0}};
        assertEquals("The covariance entry (1, 2) is not a finite number (Infinity).",
                toolRefusal(() -> new ExcessVolumeUncertainty(rk, 0, e)));
        double[][] f = {{4.0, 1.0}, {1.0, -9.0}};
        assertEquals("The covariance has a negative variance -9.0 at (2, 2).",
                toolRefusal(() -> new ExcessVolumeUncertainty(rk, 0, f)));
        // a variance of exactly zero is allowed (a coefficient fixed by the card)
        assertEquals(0.0, new ExcessVolumeUncertainty(rk, 0, new double[][] {{0, 0}, {0, 0}}).excessVolume(0.3, T));
        assertEquals("The covariance must be 2×2 for this expansion; found 2×0.",
                toolRefusal(() -> new ExcessVolumeUncertainty(rk, 0, new double[][] {{}, {}})));
        assertEquals("The order in x must be a whole number from 0 to 30; found 31.", refusal(
                () -> new ExcessVolumeUncertainty(new org.miscela.core.model.RedlichKister(T, new double[32][1]), 0,
                        new double[32][32])));
        assertEquals("The temperature 0.0 K is not a finite value above absolute zero.",
                toolRefusal(() -> u.excessVolume(0.5, 0.0)));
        assertEquals(0.0, u.excessVolume(0.0, T), 0.0);
        assertEquals(0.0, u.excessVolume(1.0, T), 0.0);
    }

    /** Order comparisons: 0 is a valid highest order, the 30th too; levels 0 and 1 are refused, the fits nested. */
    @Test
    void orderComparisonEdges() {
        double[][] design = new double[40][31];
        double[] y = new double[40];
        for (int i = 0; i < 40; i++) {
            for (int j = 0; j <= Math.min(i, 30); j++) {
                design[i][j] = 1.0 / (1 + i + j); // invented, full rank
            }
            y[i] = Math.sin(i);
        }
        List<Integer> sizes = new ArrayList<>();
        OrderSelection highest = OrderSelection.compare(30, m -> {
            double[][] d = new double[40][m + 1];
            for (int i = 0; i < 40; i++) {
                d[i] = Arrays.copyOf(design[i], m + 1);
            }
            sizes.add(m + 1);
            return LinearLeastSquares.fit(d, y, null);
        }, 0.05);
        assertEquals(31, highest.steps().size());
        assertEquals(31, sizes.size());
        OrderSelection lowest = OrderSelection.compare(0, m -> LinearLeastSquares.fit(
                new double[][] {{1}, {1}, {1}}, new double[] {1, 2, 4}, null), 0.05);
        assertEquals(0, lowest.selectedOrder());
        assertEquals(1, lowest.steps().size());
        assertEquals("The highest order must be a whole number from 0 to 30; found 31.",
                refusal(() -> OrderSelection.compare(31, m -> null, 0.05)));
        assertEquals(Problem.BAD_SIGNIFICANCE, assertThrows(MiscelaException.class,
                () -> OrderSelection.compare(Arrays.asList(lowest.steps().get(0).fit()), 0.0)).problem());
        assertEquals(Problem.NO_POINTS, assertThrows(MiscelaException.class,
                () -> OrderSelection.compare(new ArrayList<>(), 0.05)).problem());
        LeastSquaresFit one = lowest.steps().get(0).fit();
        assertEquals("Fit 2 of the order comparison has 1 parameter(s), no more than fit 1 with 1; each order must "
                + "add parameters to the one before.", refusal(() -> OrderSelection.compare(Arrays.asList(one, one),
                        0.05)));
    }
}
