package org.miscela.core.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.junit.jupiter.api.Test;
import org.miscela.testing.Figures;

/**
 * The least-squares engine against exact arithmetic on a problem where plain QR loses digits: a quintic in t on
 * [1, 2] (columns nearly parallel: condition number about 10⁶ after column scaling) with residuals a thousand times
 * the fitted values' variation, so that a backward-stable QR solution errs by about ε·κ² relative (Golub &amp; Van Loan,
 * Matrix Computations, §5.3, from memory) while the refined solution errs by about ε·κ. The reference is the exact
 * least-squares solution of the normal equations XᵀWX·b = XᵀW·y solved in 80-digit decimal arithmetic, which loses
 * at most log10 κ² ≈ 12 of its digits. Data invented from fixed seeds.
 */
class RefinementTest {
    private static final MathContext EXACT = new MathContext(80);

    /** The exact least-squares coefficients by Gaussian elimination with partial pivoting in 80 digits. */
    static double[] exact(double[][] x, double[] y, double[] w) {
        int n = x.length;
        int p = x[0].length;
        BigDecimal[][] a = new BigDecimal[p][p + 1];
        for (int j = 0; j < p; j++) {
            for (int k = 0; k <= p; k++) {
                BigDecimal s = BigDecimal.ZERO;
                for (int i = 0; i < n; i++) {
                    BigDecimal right = new BigDecimal(k < p ? x[i][k] : y[i]);
                    s = s.add(new BigDecimal(w[i]).multiply(new BigDecimal(x[i][j])).multiply(right), EXACT);
                }
                a[j][k] = s;
            }
        }
        for (int c = 0; c < p; c++) {
            int pivot = c;
            for (int r = c + 1; r < p; r++) {
                if (a[r][c].abs().compareTo(a[pivot][c].abs()) > 0) {
                    pivot = r;
                }
            }
            BigDecimal[] t = a[c];
            a[c] = a[pivot];
            a[pivot] = t;
            for (int r = c + 1; r < p; r++) {
                BigDecimal f = a[r][c].divide(a[c][c], EXACT);
                for (int k = c; k <= p; k++) {
                    a[r][k] = a[r][k].subtract(f.multiply(a[c][k], EXACT), EXACT);
                }
            }
        }
        double[] b = new double[p];
        BigDecimal[] bb = new BigDecimal[p];
        for (int r = p - 1; r >= 0; r--) {
            BigDecimal s = a[r][p];
            for (int k = r + 1; k < p; k++) {
                s = s.subtract(a[r][k].multiply(bb[k], EXACT), EXACT);
            }
            bb[r] = s.divide(a[r][r], EXACT);
            b[r] = bb[r].doubleValue();
        }
        return b;
    }

    private static double relativeError(double[] got, double[] exact) {
        double worst = 0;
        double size = 0;
        for (int j = 0; j < exact.length; j++) {
            worst = Math.max(worst, Math.abs(got[j] - exact[j]));
            size = Math.max(size, Math.abs(exact[j]));
        }
        return worst / size;
    }

    /** A quintic's design on n points of [1, 2], a response with large residuals, and random weights into w. */
    private static double[][] problem(long seed, int n, double[] y, double[] w) {
        Random r = new Random(seed);
        double[][] x = new double[n][6];
        for (int i = 0; i < n; i++) {
            double t = 1 + (double) i / (n - 1);
            for (int j = 0; j < 6; j++) {
                x[i][j] = Math.pow(t, j);
            }
            y[i] = 1 + t - 0.5 * t * t + 1000 * r.nextGaussian();
            w[i] = 0.5 + r.nextDouble();
        }
        return x;
    }

    /** κ of the column-scaled weighted design, by Commons Math's singular value decomposition. */
    static double scaledCondition(double[][] x, double[] w) {
        int n = x.length;
        int p = x[0].length;
        double[][] a = new double[n][p];
        for (int j = 0; j < p; j++) {
            double norm = 0;
            for (int i = 0; i < n; i++) {
                a[i][j] = Math.sqrt(w[i]) * x[i][j];
                norm += a[i][j] * a[i][j];
            }
            for (int i = 0; i < n; i++) {
                a[i][j] /= Math.sqrt(norm);
            }
        }
        return new SingularValueDecomposition(new Array2DRowRealMatrix(a)).getConditionNumber();
    }

    /**
     * Weighted and unweighted, three seeds each: the engine's coefficients err by at most 100·ε·κ relative to the
     * exact ones, while plain QR on the same scaled problem is seen to err far more (the reason for refinement);
     * the condition number the fit reports is the scaled design's.
     */
    @Test
    void refinedCoefficientsAreAccurateToTheConditionNumber() {
        StringBuilder record = new StringBuilder("seed\tweighted\tkappa\tengine error\tplain QR error\n");
        for (long seed = 1; seed <= 3; seed++) {
            for (boolean weighted : new boolean[] {false, true}) {
                int n = 60;
                double[] y = new double[n];
                double[] w = new double[n];
                double[][] x = problem(seed, n, y, w);
                if (!weighted) {
                    java.util.Arrays.fill(w, 1.0);
                }
                double[] exact = exact(x, y, w);
                LeastSquaresFit fit = LinearLeastSquares.fit(x, y, weighted ? w : null);
                double kappa = scaledCondition(x, w);
                assertEquals(kappa, fit.conditionNumber(), 1e-6 * kappa, "condition number, seed " + seed);
                double engine = relativeError(fit.coefficients(), exact);
                double plain = relativeError(plainQr(x, y, w), exact);
                record.append(String.format(java.util.Locale.ROOT, "%d\t%b\t%.3g\t%.3g\t%.3g%n", seed, weighted,
                        kappa, engine, plain));
                assertTrue(engine <= 100 * Math.ulp(1.0) * kappa, "seed " + seed + ": relative error " + engine
                        + " of the refined fit, κ " + kappa + ", plain QR " + plain);
                assertTrue(plain > 10 * engine, "the problem is meant to need refinement; plain QR " + plain
                        + ", refined " + engine);
            }
        }
        Figures.write("figures/RefinementTest.txt", record.toString());
    }

    /** Householder QR of the same column-scaled weighted problem, without refinement. */
    private static double[] plainQr(double[][] x, double[] y, double[] w) {
        int n = x.length;
        int p = x[0].length;
        double[][] a = new double[n][p];
        double[] scale = new double[p];
        for (int j = 0; j < p; j++) {
            for (int i = 0; i < n; i++) {
                a[i][j] = Math.sqrt(w[i]) * x[i][j];
                scale[j] += a[i][j] * a[i][j];
            }
            scale[j] = Math.sqrt(scale[j]);
            for (int i = 0; i < n; i++) {
                a[i][j] /= scale[j];
            }
        }
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = Math.sqrt(w[i]) * y[i];
        }
        double[] c = new QRDecomposition(new Array2DRowRealMatrix(a)).getSolver().solve(new ArrayRealVector(b))
                .toArray();
        for (int j = 0; j < p; j++) {
            c[j] /= scale[j];
        }
        return c;
    }
}
