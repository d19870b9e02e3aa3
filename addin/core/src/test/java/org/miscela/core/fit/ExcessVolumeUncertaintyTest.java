package org.miscela.core.fit;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Random;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.random.CorrelatedRandomVectorGenerator;
import org.apache.commons.math3.random.GaussianRandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.descriptive.SummaryStatistics;
import org.junit.jupiter.api.Test;
import org.miscela.core.model.Component;
import org.miscela.core.model.PolynomialDensity;
import org.miscela.core.model.RedlichKister;

/**
 * Linear propagation of coefficient covariance, checked against finite differences of {@link RedlichKister} and
 * against a Monte Carlo run. The fitted data are invented: an expansion of plausible size plus Gaussian noise.
 */
class ExcessVolumeUncertaintyTest {
    private static final double T_REF = 298.15;
    private static final double[][] A = {{-4.2, 0.011}, {-0.9, -0.004}, {0.35, 0.002}};
    private static final Component FIRST = new Component("first", 46.07,
            new PolynomialDensity(T_REF, new double[] {785.1, -0.84}));
    private static final Component SECOND = new Component("second", 18.02,
            new PolynomialDensity(T_REF, new double[] {997.0, -0.26}));
    private static final int DRAWS = 20_000;
    /**
     * The sample standard deviation of N normal draws has a relative standard error of about 1/√(2N) = 0.5 % for
     * N = 20 000; the quantities are linear in the coefficients (ρ nearly so), so agreement within 4 such errors is
     * required.
     */
    private static final double MONTE_CARLO_TOLERANCE = 4.0 / Math.sqrt(2.0 * DRAWS);

    /** A fit of order 2 in x and 1 in T to noisy invented data: 12 compositions × 4 temperatures. */
    static RedlichKisterFit invented() {
        Random random = new Random(2024);
        RedlichKister truth = new RedlichKister(T_REF, A);
        int n = 48;
        double[] x = new double[n];
        double[] t = new double[n];
        double[] ve = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (i % 12 + 0.5) / 12;
            t[i] = 283.15 + 10 * (i / 12);
            ve[i] = truth.value(x[i], t[i]) + 0.01 * random.nextGaussian();
        }
        return RedlichKisterFitter.excessVolumes(x, t, ve, 2, 1, T_REF, null);
    }

    @Test
    void gradientsMatchFiniteDifferencesOfTheExpansion() {
        RedlichKisterFit fit = invented();
        ExcessVolumeUncertainty u = ExcessVolumeUncertainty.of(fit);
        double[][] a = fit.coefficients();
        double x1 = 0.27;
        double t = 305.0;
        double[] gValue = u.excessVolumeGradient(x1, t);
        double[] g1 = u.partialExcessVolumeGradient(1, x1, t);
        double[] g2 = u.partialExcessVolumeGradient(2, x1, t);
        double h = 1e-3;
        for (int k = 0; k < a.length; k++) {
            for (int j = 0; j < a[k].length; j++) {
                double[][] up = copy(a);
                double[][] down = copy(a);
                up[k][j] += h;
                down[k][j] -= h;
                double[] pu = partials(new RedlichKister(T_REF, up), x1, t);
                double[] pd = partials(new RedlichKister(T_REF, down), x1, t);
                int index = fit.parameterIndex(k, j);
                // all three are linear in a_kj, so the central difference is exact up to rounding
                assertEquals((pu[0] - pd[0]) / (2 * h), gValue[index], 1e-9, "V^E " + k + j);
                assertEquals((pu[1] - pd[1]) / (2 * h), g1[index], 1e-9, "V1^E " + k + j);
                assertEquals((pu[2] - pd[2]) / (2 * h), g2[index], 1e-9, "V2^E " + k + j);
            }
        }
    }

    @Test
    void linearPropagationAgreesWithMonteCarlo() {
        RedlichKisterFit fit = invented();
        ExcessVolumeUncertainty linear = ExcessVolumeUncertainty.of(fit);
        double[] mean = fit.leastSquares().coefficients();
        CorrelatedRandomVectorGenerator draws = new CorrelatedRandomVectorGenerator(mean,
                MatrixUtils.createRealMatrix(fit.leastSquares().covariance()), 1e-14,
                new GaussianRandomGenerator(new Well19937c(20240601L)));
        double[][] points = {{0.1, 283.15}, {0.5, 298.15}, {0.8, 318.15}};
        String[] names = {"V^E", "V1^E", "V2^E", "rho"};
        int q = names.length;
        SummaryStatistics[][] spread = new SummaryStatistics[points.length][q];
        for (SummaryStatistics[] row : spread) {
            for (int i = 0; i < q; i++) {
                row[i] = new SummaryStatistics();
            }
        }
        int rows = fit.orderInX() + 1;
        int columns = fit.orderInT() + 1;
        for (int draw = 0; draw < DRAWS; draw++) {
            double[] v = draws.nextVector();
            double[][] a = new double[rows][columns];
            for (int k = 0; k < rows; k++) {
                System.arraycopy(v, k * columns, a[k], 0, columns);
            }
            RedlichKister rk = new RedlichKister(T_REF, a);
            for (int p = 0; p < points.length; p++) {
                double[] values = partials(rk, points[p][0], points[p][1]);
                double rho = MixtureVolumes.density(points[p][0], points[p][1], values[0], FIRST, SECOND);
                double[] all = {values[0], values[1], values[2], rho};
                for (int i = 0; i < q; i++) {
                    spread[p][i].addValue(all[i]);
                }
            }
        }
        StringBuilder report = new StringBuilder(String.format(Locale.ROOT,
                "Linear propagation vs Monte Carlo (%d draws, order 2 in x and 1 in T, invented data)%n", DRAWS));
        report.append(String.format(Locale.ROOT, "%5s %7s %5s %13s %13s %8s%n", "x1", "T/K", "q", "u linear",
                "u Monte Carlo", "ratio-1"));
        double worst = 0;
        for (int p = 0; p < points.length; p++) {
            double x1 = points[p][0];
            double t = points[p][1];
            double[] lin = {linear.excessVolume(x1, t), linear.partialExcessVolume(1, x1, t),
                linear.partialExcessVolume(2, x1, t), linear.density(x1, t, FIRST, SECOND)};
            for (int i = 0; i < q; i++) {
                double sd = spread[p][i].getStandardDeviation();
                double ratio = sd / lin[i] - 1;
                worst = Math.max(worst, Math.abs(ratio));
                report.append(String.format(Locale.ROOT, "%5.2f %7.2f %5s %13.5e %13.5e %+8.4f%n", x1, t, names[i],
                        lin[i], sd, ratio));
            }
        }
        report.append(String.format(Locale.ROOT, "worst |ratio - 1| = %.4f, allowed %.4f%n", worst,
                MONTE_CARLO_TOLERANCE));
        Figures.write("figures/ExcessVolumeUncertaintyTest.txt", report.toString());
        assertTrue(worst <= MONTE_CARLO_TOLERANCE, report.toString());
    }

    @Test
    void pureComponentsHaveNoExcessUncertainty() {
        ExcessVolumeUncertainty u = ExcessVolumeUncertainty.of(invented());
        assertEquals(0.0, u.excessVolume(0, 300));
        assertEquals(0.0, u.excessVolume(1, 300));
        assertEquals(0.0, u.partialExcessVolume(2, 0, 300));
        assertTrue(u.partialExcessVolume(1, 0, 300) > 0, "the solute at infinite dilution keeps its uncertainty");
    }

    @Test
    void rejectsUnusableCovariance() {
        RedlichKister rk = new RedlichKister(T_REF, A);
        assertEquals("The covariance must be 6×6 for this expansion; found 3×3.", assertThrows(IllegalArgumentException.class,
                () -> new ExcessVolumeUncertainty(rk, 1, new double[3][3])).getMessage());
        double[][] c = new double[6][6];
        for (int i = 0; i < 6; i++) {
            c[i][i] = 1;
        }
        c[0][1] = 0.5;
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ExcessVolumeUncertainty(rk, 1, c)).getMessage()
                .startsWith("The covariance is not symmetric"));
        c[1][0] = 0.5;
        c[2][2] = -1;
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ExcessVolumeUncertainty(rk, 1, c)).getMessage()
                .startsWith("The covariance has a negative variance"));
        c[2][2] = Double.NaN;
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ExcessVolumeUncertainty(rk, 1, c)).getMessage()
                .startsWith("The covariance entry (3, 3) is not a finite number"));
        c[2][2] = 1;
        ExcessVolumeUncertainty u = new ExcessVolumeUncertainty(rk, 1, c);
        assertEquals("The component must be 1 or 2; found 3.", assertThrows(IllegalArgumentException.class, () -> u.partialExcessVolume(3, 0.5, 300)).getMessage());
        assertEquals("The mole fraction 1.2 lies outside 0..1.",
                assertThrows(IllegalArgumentException.class, () -> u.excessVolume(1.2, 300)).getMessage());
        assertEquals("The temperature -1.0 K is not a finite value above absolute zero.",
                assertThrows(IllegalArgumentException.class, () -> u.density(0.5, -1, FIRST, SECOND)).getMessage());
    }

    /** {V^E, V̄1^E, V̄2^E} from the library's own expansion and its analytic slope. */
    private static double[] partials(RedlichKister rk, double x1, double t) {
        double[] out = new double[3];
        rk.evaluate(x1, t, out);
        return new double[] {out[0], out[0] + (1 - x1) * out[1], out[0] - x1 * out[1]};
    }

    private static double[][] copy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }
}
