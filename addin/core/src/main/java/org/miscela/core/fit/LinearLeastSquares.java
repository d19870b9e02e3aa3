package org.miscela.core.fit;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import java.util.Objects;
import org.apache.commons.math3.util.MathArrays;

/**
 * Weighted linear least squares, min Σ w_i (y_i − Σ_j X_ij b_j)², solved by Householder QR of the column-scaled,
 * weighted design (Commons Math QRDecomposition, see {@link ScaledQr}) and iterative refinement; the normal equations
 * are never formed, so the condition number is not squared.
 *
 * <p>Contracts: at least one point and one parameter; every design row of the same length; one response (and one
 * weight, if weights are given) per row; all values finite; weights zero or positive (a zero weight leaves the point
 * out of the fit and of the counts, but its residual is still reported); at least as many points with positive
 * weight as parameters; a design of full column rank. Each violation throws a {@link MiscelaException} that says which.
 */
public final class LinearLeastSquares {
    private LinearLeastSquares() {
    }

    /** Unweighted fit. */
    public static LeastSquaresFit fit(double[][] design, double[] response) {
        return fit(design, response, null);
    }

    /**
     * @param design X, one row per point, one column per parameter (not modified)
     * @param response y, one per point
     * @param weights w, one per point, or null for unit weights
     */
    public static LeastSquaresFit fit(double[][] design, double[] response, double[] weights) {
        int n = checkShape(design, response, weights);
        int p = design[0].length;
        checkValues(design, response, weights);
        int used = 0;
        for (int i = 0; i < n; i++) {
            if (weight(weights, i) > 0) {
                used++;
            }
        }
        if (used < p) {
            throw Problem.TOO_FEW_POINTS.raise(p, used);
        }

        ScaledQr solver = new ScaledQr(design, response, weights);
        double[] coefficients = solver.refinedSolution();
        double[] residuals = residuals(design, response, coefficients);
        double rss = 0;
        int largest = -1;
        for (int i = 0; i < n; i++) {
            double w = weight(weights, i);
            if (w > 0) {
                rss += w * residuals[i] * residuals[i];
                if (largest < 0 || Math.abs(residuals[i]) > Math.abs(residuals[largest])) {
                    largest = i;
                }
            }
        }
        boolean centred = hasConstantColumn(design, weights);
        double rSquared = 1.0 - rss / totalSumOfSquares(response, weights, centred);
        double[][] covariance = solver.covariance(used > p ? rss / (used - p) : Double.NaN);
        return new LeastSquaresFit(coefficients, covariance, residuals, used, rss, rSquared, centred, largest,
                solver.conditionNumber());
    }

    private static int checkShape(double[][] design, double[] response, double[] weights) {
        Objects.requireNonNull(response, "response");
        if (design == null || design.length == 0) {
            throw Problem.NO_POINTS.raise();
        }
        int n = design.length;
        int p = design[0].length;
        if (p == 0) {
            throw Problem.NO_PARAMETERS.raise();
        }
        for (int i = 1; i < n; i++) {
            if (design[i].length != p) {
                throw Problem.RAGGED_DESIGN.raise(i + 1, design[i].length, p);
            }
        }
        if (response.length != n) {
            throw Problem.LENGTH_MISMATCH.raise(n, "design rows", response.length, "responses");
        }
        if (weights != null && weights.length != n) {
            throw Problem.LENGTH_MISMATCH.raise(n, "design rows", weights.length, "weights");
        }
        return n;
    }

    private static void checkValues(double[][] design, double[] response, double[] weights) {
        for (int i = 0; i < design.length; i++) {
            for (int j = 0; j < design[i].length; j++) {
                if (!Double.isFinite(design[i][j])) {
                    throw Problem.FIT_NOT_FINITE.raise("design value in column " + (j + 1), i + 1, design[i][j]);
                }
            }
            if (!Double.isFinite(response[i])) {
                throw Problem.FIT_NOT_FINITE.raise("response", i + 1, response[i]);
            }
            if (weights != null) {
                if (!Double.isFinite(weights[i])) {
                    throw Problem.FIT_NOT_FINITE.raise("weight", i + 1, weights[i]);
                }
                if (weights[i] < 0) {
                    throw Problem.NEGATIVE_WEIGHT.raise(i + 1, weights[i]);
                }
            }
        }
    }

    static double weight(double[] weights, int i) {
        return weights == null ? 1.0 : weights[i];
    }

    /** y − X·b, each by a compensated dot product so that a near-exact fit shows its true (tiny) residuals. */
    private static double[] residuals(double[][] design, double[] response, double[] coefficients) {
        int p = coefficients.length;
        double[] factors = new double[p + 1];
        for (int j = 0; j < p; j++) {
            factors[j] = -coefficients[j];
        }
        factors[p] = 1.0;
        double[] terms = new double[p + 1];
        double[] residuals = new double[design.length];
        for (int i = 0; i < design.length; i++) {
            System.arraycopy(design[i], 0, terms, 0, p);
            terms[p] = response[i];
            residuals[i] = MathArrays.linearCombination(terms, factors);
        }
        return residuals;
    }

    /** True when some column takes one and the same non-zero value at every point with positive weight. */
    private static boolean hasConstantColumn(double[][] design, double[] weights) {
        for (int j = 0; j < design[0].length; j++) {
            double first = Double.NaN;
            boolean constant = true;
            for (int i = 0; i < design.length && constant; i++) {
                if (weight(weights, i) > 0) {
                    if (Double.isNaN(first)) {
                        first = design[i][j];
                    } else if (design[i][j] != first) {
                        constant = false;
                    }
                }
            }
            if (constant && first != 0) {
                return true;
            }
        }
        return false;
    }

    private static double totalSumOfSquares(double[] y, double[] weights, boolean centred) {
        double mean = 0;
        if (centred) {
            double sw = 0;
            double swy = 0;
            for (int i = 0; i < y.length; i++) {
                sw += weight(weights, i);
                swy += weight(weights, i) * y[i];
            }
            mean = swy / sw;
        }
        double tss = 0;
        for (int i = 0; i < y.length; i++) {
            double d = y[i] - mean;
            tss += weight(weights, i) * d * d;
        }
        return tss;
    }
}
