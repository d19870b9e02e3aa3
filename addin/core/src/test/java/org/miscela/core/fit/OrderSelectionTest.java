package org.miscela.core.fit;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.miscela.core.model.RedlichKister;

/** Order selection on invented data: an expansion of known order plus Gaussian noise, fixed seeds. */
class OrderSelectionTest {
    private static final double T_REF = 298.15;

    private static double[][] noisyExcessVolumes(double[][] a, int n, double noise, long seed, int temperatures) {
        Random random = new Random(seed);
        RedlichKister truth = new RedlichKister(T_REF, a);
        double[][] xtv = new double[3][n * temperatures];
        for (int i = 0; i < n * temperatures; i++) {
            xtv[0][i] = (i % n + 0.5) / n;
            xtv[1][i] = 283.15 + 15.0 * (i / n);
            xtv[2][i] = truth.value(xtv[0][i], xtv[1][i]) + noise * random.nextGaussian();
        }
        return xtv;
    }

    @Test
    void findsTheOrderOfTheGeneratingExpansion() {
        // invented: A0..A2 of plausible size, noise 0.005 cm³/mol, 40 compositions
        double[][] d = noisyExcessVolumes(new double[][] {{-3.1}, {0.8}, {-0.7}}, 40, 0.005, 99, 1);
        OrderSelection selection = OrderSelection.compare(6,
                m -> RedlichKisterFitter.excessVolumes(d[0], d[2], m, T_REF, null).leastSquares(), 0.05);
        Figures.write("figures/OrderSelectionTest.txt", table(selection));
        assertEquals(2, selection.selectedOrder(), table(selection));
        assertEquals(2, selection.lowestBicOrder(), table(selection));
        assertFalse(selection.reachedHighestOrder());
        assertEquals(7, selection.steps().size());
        assertTrue(Double.isNaN(selection.steps().get(0).pValue()));
    }

    /** With one added parameter, F is the square of the added coefficient's t statistic, and p its two-sided p. */
    @Test
    void singleTermStepIsTheTTestOfTheAddedCoefficient() {
        double[][] d = noisyExcessVolumes(new double[][] {{-3.1}, {0.8}, {-0.7}, {0.05}}, 25, 0.01, 7, 1);
        OrderSelection selection = OrderSelection.compare(4,
                m -> RedlichKisterFitter.excessVolumes(d[0], d[2], m, T_REF, null).leastSquares(), 0.05);
        for (int m = 1; m <= 4; m++) {
            OrderSelection.Step step = selection.steps().get(m);
            double t = step.fit().coefficients()[m] / step.fit().standardErrors()[m];
            assertEquals(t * t, step.fStatistic(), 1e-9 * t * t, "F at order " + m);
            double p = 2 * (1 - new TDistribution(null, step.degreesOfFreedom()).cumulativeProbability(Math.abs(t)));
            assertEquals(p, step.pValue(), 1e-9 + 1e-7 * p, "p at order " + m);
        }
    }

    /** With several added parameters, F is the Wald statistic of the added block divided by their number. */
    @Test
    void multiTermStepIsTheWaldTestOfTheAddedBlock() {
        double[][] a = {{-3.1, 0.01}, {0.8, -0.004}, {-0.7, 0.003}};
        double[][] d = noisyExcessVolumes(a, 15, 0.004, 5, 4);
        OrderSelection selection = OrderSelection.compare(3,
                m -> RedlichKisterFitter.excessVolumes(d[0], d[1], d[2], m, 1, T_REF, null).leastSquares(), 0.05);
        for (int m = 1; m <= 3; m++) {
            LeastSquaresFit fit = selection.steps().get(m).fit();
            int[] added = {2 * m, 2 * m + 1};
            RealMatrix cov = MatrixUtils.createRealMatrix(fit.covariance()).getSubMatrix(added, added);
            RealVector b = MatrixUtils.createRealVector(
                    new double[] {fit.coefficients()[added[0]], fit.coefficients()[added[1]]});
            double wald = MatrixUtils.inverse(cov).operate(b).dotProduct(b) / 2;
            assertEquals(wald, selection.steps().get(m).fStatistic(), 1e-8 * wald, "order " + m);
        }
        assertEquals(2, selection.selectedOrder(), table(selection));
    }

    /**
     * AIC = n·ln(RSS/n) + 2p and BIC = n·ln(RSS/n) + p·ln n, the least-squares forms for normal errors (Akaike 1974,
     * Schwarz 1978; as in Burnham &amp; Anderson 2002, from memory), with RSS recomputed here from the data and each
     * step's coefficients; the orders with the lowest of each; s = √(RSS/(n − p)).
     */
    @Test
    void informationCriteriaFollowTheirDefinitions() {
        double[][] d = noisyExcessVolumes(new double[][] {{-3.1}, {0.8}, {-0.7}}, 30, 0.01, 11, 1);
        OrderSelection selection = OrderSelection.compare(5,
                m -> RedlichKisterFitter.excessVolumes(d[0], d[2], m, T_REF, null).leastSquares(), 0.05);
        assertEquals(0.05, selection.significance(), 0.0);
        int n = d[0].length;
        int bestAic = 0;
        int bestBic = 0;
        double[] aic = new double[6];
        double[] bic = new double[6];
        for (int m = 0; m <= 5; m++) {
            OrderSelection.Step step = selection.steps().get(m);
            double[] c = step.fit().coefficients();
            double[][] a = new double[c.length][];
            for (int k = 0; k < c.length; k++) {
                a[k] = new double[] {c[k]};
            }
            RedlichKister rk = new RedlichKister(T_REF, a);
            double rss = 0;
            for (int i = 0; i < n; i++) {
                double r = d[2][i] - rk.value(d[0][i], T_REF);
                rss += r * r;
            }
            assertEquals(m + 1, step.parameterCount());
            assertEquals(n - m - 1, step.degreesOfFreedom());
            assertEquals(Math.sqrt(rss / (n - m - 1)), step.residualStandardDeviation(), 1e-9 * Math.sqrt(rss / n));
            aic[m] = n * Math.log(rss / n) + 2 * (m + 1);
            bic[m] = n * Math.log(rss / n) + (m + 1) * Math.log(n);
            assertEquals(aic[m], step.aic(), 1e-9 * Math.abs(aic[m]), "AIC at order " + m);
            assertEquals(bic[m], step.bic(), 1e-9 * Math.abs(bic[m]), "BIC at order " + m);
            bestAic = aic[m] < aic[bestAic] ? m : bestAic;
            bestBic = bic[m] < bic[bestBic] ? m : bestBic;
        }
        assertEquals(bestAic, selection.lowestAicOrder(), table(selection));
        assertEquals(bestBic, selection.lowestBicOrder(), table(selection));
    }

    /** When every added term is significant, the verdict is the highest order tried, and says so. */
    @Test
    void everyStepSignificantEndsAtTheHighestOrder() {
        double[][] d = noisyExcessVolumes(new double[][] {{-3.1}, {0.8}, {-0.7}, {0.5}, {-0.4}}, 40, 0.001, 3, 1);
        OrderSelection selection = OrderSelection.compare(3,
                m -> RedlichKisterFitter.excessVolumes(d[0], d[2], m, T_REF, null).leastSquares(), 0.05);
        for (int m = 1; m <= 3; m++) {
            assertTrue(selection.steps().get(m).pValue() < 0.05, table(selection));
        }
        assertTrue(selection.reachedHighestOrder(), table(selection));
        assertEquals(3, selection.selectedOrder());
    }

    /**
     * A step to a fit with no residual degrees of freedom has F and p undefined and is not significant; a first
     * step that is not significant selects order 0, however later steps turn out. Invented data.
     */
    @Test
    void undefinedAndEarlyVerdicts() {
        double[] x = {0.2, 0.5, 0.8};
        double[] v = {-0.5, -0.8, -0.45};
        OrderSelection exact = OrderSelection.compare(2,
                m -> RedlichKisterFitter.excessVolumes(x, v, m, T_REF, null).leastSquares(), 0.05);
        OrderSelection.Step last = exact.steps().get(2);
        assertEquals(0, last.degreesOfFreedom());
        assertTrue(Double.isNaN(last.fStatistic()), table(exact));
        assertTrue(Double.isNaN(last.pValue()), table(exact));
        assertFalse(exact.reachedHighestOrder());
        assertTrue(exact.selectedOrder() <= 1, table(exact));

        double[][] d = noisyExcessVolumes(new double[][] {{-3.1}}, 30, 0.01, 21, 1);
        OrderSelection flat = OrderSelection.compare(4,
                m -> RedlichKisterFitter.excessVolumes(d[0], d[2], m, T_REF, null).leastSquares(), 0.05);
        assertTrue(flat.steps().get(1).pValue() >= 0.05 && flat.steps().get(2).pValue() >= 0.05,
                "the invented data were chosen so that neither of the first two steps is significant:\n"
                        + table(flat));
        assertEquals(0, flat.selectedOrder(), table(flat));

        LeastSquaresFit all = flat.steps().get(0).fit();
        LeastSquaresFit fewer = RedlichKisterFitter.excessVolumes(java.util.Arrays.copyOf(d[0], 29),
                java.util.Arrays.copyOf(d[2], 29), 1, T_REF, null).leastSquares();
        assertEquals("Fit 2 of the order comparison uses 29 point(s) but fit 1 uses 30; compare fits to the same "
                + "data.", assertThrows(MiscelaException.class,
                        () -> OrderSelection.compare(java.util.Arrays.asList(all, fewer), 0.05)).getMessage());
    }

    @Test
    void rejectsUnusableComparisons() {
        double[][] d = noisyExcessVolumes(new double[][] {{-3.1}, {0.8}}, 10, 0.01, 1, 1);
        LeastSquaresFit one = RedlichKisterFitter.excessVolumes(d[0], d[2], 1, T_REF, null).leastSquares();
        LeastSquaresFit two = RedlichKisterFitter.excessVolumes(d[0], d[2], 2, T_REF, null).leastSquares();
        assertEquals(Problem.NOT_NESTED,
                assertThrows(MiscelaException.class, () -> OrderSelection.compare(Arrays.asList(two, one), 0.05))
                        .problem());
        double[] fewer = Arrays.copyOf(d[0], 9);
        LeastSquaresFit other = RedlichKisterFitter.excessVolumes(fewer, Arrays.copyOf(d[2], 9), 2, T_REF, null)
                .leastSquares();
        assertEquals(Problem.NOT_SAME_POINTS,
                assertThrows(MiscelaException.class, () -> OrderSelection.compare(Arrays.asList(one, other), 0.05))
                        .problem());
        assertEquals("The significance level must lie strictly between 0 and 1; found 1.0.", assertThrows(
                MiscelaException.class, () -> OrderSelection.compare(Arrays.asList(one, two), 1.0)).getMessage());
        assertEquals(Problem.BAD_ORDER, assertThrows(MiscelaException.class,
                () -> OrderSelection.compare(-1, m -> one, 0.05)).problem());
    }

    static String table(OrderSelection s) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%5s %3s %4s %11s %11s %9s %9s %9s%n",
                "order", "p", "dof", "s", "F", "p-value", "AIC", "BIC"));
        for (OrderSelection.Step step : s.steps()) {
            b.append(String.format(Locale.ROOT, "%5d %3d %4d %11.4e %11.4e %9.3g %9.2f %9.2f%n", step.order(),
                    step.parameterCount(), step.degreesOfFreedom(), step.residualStandardDeviation(),
                    step.fStatistic(), step.pValue(), step.aic(), step.bic()));
        }
        return b.append(String.format(Locale.ROOT, "selected order %d at level %.2f (AIC %d, BIC %d)%n",
                s.selectedOrder(), s.significance(), s.lowestAicOrder(), s.lowestBicOrder())).toString();
    }
}
