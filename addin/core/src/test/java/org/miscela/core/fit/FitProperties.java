package org.miscela.core.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.miscela.core.model.RedlichKister;

/** Properties of the fitting engine over random (invented) Redlich–Kister problems. */
class FitProperties {
    private static final double T_REF = 298.15;
    /** Temperatures span T_ref ± 25 K. */
    private static final double T_SPAN = 25.0;

    /** A random problem: orders, coefficients a_kj of size ~1 per unit of (T − T_ref)/T_SPAN, and a seed. */
    static final class Problem {
        final int orderInX;
        final int orderInT;
        final double[][] a;
        final long seed;

        Problem(int orderInX, int orderInT, double[] values, long seed) {
            this.orderInX = orderInX;
            this.orderInT = orderInT;
            this.seed = seed;
            a = new double[orderInX + 1][orderInT + 1];
            for (int k = 0; k <= orderInX; k++) {
                for (int j = 0; j <= orderInT; j++) {
                    a[k][j] = values[k * (orderInT + 1) + j] / Math.pow(T_SPAN, j);
                }
            }
        }

        /** Compositions 0.02..0.98 and orderInT + 2 temperatures, with twice as many points as parameters. */
        double[][] points(double noise) {
            Random random = new Random(seed);
            RedlichKister truth = new RedlichKister(T_REF, a);
            int nx = 2 * (orderInX + 1) + 3;
            int nt = orderInT + 2;
            double[][] xtv = new double[3][nx * nt];
            for (int i = 0; i < nx * nt; i++) {
                xtv[0][i] = 0.02 + 0.96 * ((i % nx) + random.nextDouble() * 0.5) / nx;
                xtv[1][i] = T_REF - T_SPAN + 2 * T_SPAN * (i / nx) / (nt - 1);
                xtv[2][i] = truth.value(xtv[0][i], xtv[1][i]) + noise * random.nextGaussian();
            }
            return xtv;
        }

        RedlichKisterFit fit(double[][] xtv, double[] weights) {
            return RedlichKisterFitter.excessVolumes(xtv[0], xtv[1], xtv[2], orderInX, orderInT, T_REF, weights);
        }
    }

    @Provide
    Arbitrary<Problem> problems() {
        return Arbitraries.integers().between(0, 6).flatMap(mx -> Arbitraries.integers().between(0, 2)
                .flatMap(mt -> Arbitraries.doubles().between(-5, 5).array(double[].class)
                        .ofSize((mx + 1) * (mt + 1))
                        .flatMap(v -> Arbitraries.longs().map(seed -> new Problem(mx, mt, v, seed)))));
    }

    /** Data lying exactly on an expansion give that expansion back. */
    @Property(tries = 300)
    void exactDataGiveTheCoefficients(@ForAll("problems") Problem problem) {
        RedlichKisterFit fit = problem.fit(problem.points(0.0), null);
        double[][] a = fit.coefficients();
        for (int k = 0; k <= problem.orderInX; k++) {
            for (int j = 0; j <= problem.orderInT; j++) {
                // in the units the values were drawn in (per T_SPAN^j, within ±5): 1e-9 of the largest possible
                double scale = Math.pow(T_SPAN, j);
                assertEquals(problem.a[k][j] * scale, a[k][j] * scale, 1e-9 * 5, "a_" + k + j);
            }
        }
    }

    /** Multiplying every weight by c changes neither coefficients nor covariance; s scales by √c. */
    @Property(tries = 200)
    void weightsAreScaleInvariant(@ForAll("problems") Problem problem,
            @ForAll @DoubleRange(min = -6, max = 6) double log10Scale) {
        double[][] xtv = problem.points(0.01);
        Random random = new Random(problem.seed + 1);
        double c = Math.pow(10, log10Scale);
        double[] w = new double[xtv[0].length];
        double[] cw = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = 0.1 + random.nextDouble();
            cw[i] = c * w[i];
        }
        LeastSquaresFit plain = problem.fit(xtv, w).leastSquares();
        LeastSquaresFit scaled = problem.fit(xtv, cw).leastSquares();
        double[] b = plain.coefficients();
        double[] bc = scaled.coefficients();
        double[] se = plain.standardErrors();
        double[][] cov = plain.covariance();
        double[][] covc = scaled.covariance();
        for (int i = 0; i < b.length; i++) {
            assertEquals(b[i], bc[i], 1e-9 * se[i] + 1e-14 * Math.abs(b[i]), "coefficient " + i);
            for (int j = 0; j < b.length; j++) {
                assertEquals(cov[i][j], covc[i][j], 1e-9 * se[i] * se[j], "covariance " + i + "," + j);
            }
        }
        assertEquals(Math.sqrt(c) * plain.residualStandardDeviation(), scaled.residualStandardDeviation(),
                1e-10 * Math.sqrt(c) * plain.residualStandardDeviation());
        assertEquals(plain.rSquared(), scaled.rSquared(), 1e-12);
    }

    /** The covariance is exactly symmetric and positive semi-definite (to rounding). */
    @Property(tries = 200)
    void covarianceIsSymmetricPositiveSemiDefinite(@ForAll("problems") Problem problem,
            @ForAll @IntRange(min = -4, max = 0) int log10Noise) {
        LeastSquaresFit fit = problem.fit(problem.points(Math.pow(10, log10Noise)), null).leastSquares();
        double[][] cov = fit.covariance();
        for (int i = 0; i < cov.length; i++) {
            assertTrue(cov[i][i] > 0, "variance " + i);
            for (int j = 0; j < i; j++) {
                assertEquals(cov[i][j], cov[j][i], 0.0, "symmetry " + i + "," + j);
            }
        }
        double[] eigen = new EigenDecomposition(MatrixUtils.createRealMatrix(cov)).getRealEigenvalues();
        double largest = 0;
        double smallest = Double.POSITIVE_INFINITY;
        for (double e : eigen) {
            largest = Math.max(largest, e);
            smallest = Math.min(smallest, e);
        }
        assertTrue(smallest >= -1e-12 * largest, "eigenvalues from " + smallest + " to " + largest);
    }
}
