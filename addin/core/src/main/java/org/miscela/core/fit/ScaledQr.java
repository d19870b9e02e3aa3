package org.miscela.core.fit;

import org.miscela.core.problem.Problem;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.MathArrays;

/**
 * Householder QR (Commons Math) of the weighted design A = D·X·C⁻¹, D = diag(√w), with C the column norms of D·X.
 * The column scaling changes nothing in exact arithmetic; it makes R's singular values comparable across columns, so
 * that the rank test does not depend on the units of each column. Inputs are checked by {@link LinearLeastSquares}.
 */
final class ScaledQr {
    private static final int MAX_REFINEMENT_STEPS = 8;

    private final double[][] design;
    private final double[] response;
    private final double[] weights;
    private final double[] root;
    private final double[] scale;
    private final DecompositionSolver solver;
    private final RealMatrix r;
    private final double conditionNumber;

    ScaledQr(double[][] design, double[] response, double[] weights) {
        this.design = design;
        this.response = response;
        this.weights = weights;
        int n = design.length;
        int p = design[0].length;
        root = new double[n];
        for (int i = 0; i < n; i++) {
            root[i] = Math.sqrt(LinearLeastSquares.weight(weights, i));
        }
        double[][] a = new double[n][p];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                a[i][j] = root[i] * design[i][j];
            }
        }
        scale = new double[p];
        double[] column = new double[n];
        for (int j = 0; j < p; j++) {
            for (int i = 0; i < n; i++) {
                column[i] = a[i][j];
            }
            scale[j] = MathArrays.safeNorm(column);
            if (scale[j] == 0) {
                throw Problem.ZERO_COLUMN.raise(j + 1);
            }
            for (int i = 0; i < n; i++) {
                a[i][j] /= scale[j];
            }
        }
        QRDecomposition qr = new QRDecomposition(new Array2DRowRealMatrix(a, false));
        solver = qr.getSolver();
        r = qr.getR().getSubMatrix(0, p - 1, 0, p - 1);
        // R carries the singular values of the scaled design and is only p×p.
        double[] s = new SingularValueDecomposition(r).getSingularValues();
        conditionNumber = s[0] / s[p - 1];
        // The usual numerical-rank tolerance, σ_min ≤ σ_max·max(n, p)·ε: below it the last digits of the data decide.
        double limit = 1.0 / (Math.max(n, p) * Math.ulp(1.0));
        if (!(conditionNumber < limit)) {
            throw Problem.RANK_DEFICIENT.raise(p, String.format(Locale.ROOT, "%.3g", conditionNumber),
                    String.format(Locale.ROOT, "%.3g", limit));
        }
    }

    double conditionNumber() {
        return conditionNumber;
    }

    /**
     * The QR solution improved by iterative refinement of the augmented system [I A; Aᵀ 0]·[r; b] = [D·y; 0]
     * (Björck 1967, from memory), whose residuals are computed by compensated dot products from the unscaled data.
     * Each step solves for the corrections with the same factors. This recovers the digits plain QR loses when the
     * residual is large next to the fitted values (there the condition number enters squared); it converges while
     * condition·ε ≪ 1, which the rank test ensures, and stops when no coefficient changes or the correction grows.
     */
    double[] refinedSolution() {
        int n = design.length;
        int p = scale.length;
        double[] x = solveScaled(weightedResponse());
        // e is the unweighted residual; the weighted one is D·e
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = gap(i, x, 0.0);
        }
        double[] gap = new double[n];
        double[] f = new double[n];
        double[] weightedResidual = new double[n];
        double[] column = new double[n];
        double previous = Double.POSITIVE_INFINITY;
        for (int step = 0; step < MAX_REFINEMENT_STEPS; step++) {
            // how far (D·e, x) is from satisfying the system: f = D·(y − X·x − e), g = −XᵀW·e
            for (int i = 0; i < n; i++) {
                gap[i] = gap(i, x, e[i]);
                f[i] = root[i] * gap[i];
                weightedResidual[i] = LinearLeastSquares.weight(weights, i) * e[i];
            }
            double[] g = new double[p];
            for (int j = 0; j < p; j++) {
                for (int i = 0; i < n; i++) {
                    column[i] = design[i][j];
                }
                g[j] = -MathArrays.linearCombination(column, weightedResidual);
            }
            // corrections: dx = u − z with u = argmin‖f − D·X·u‖ and z = (XᵀWX)⁻¹·g; then D·de = f − D·X·dx
            double[] u = solveScaled(f);
            double[] z = normalInverseTimes(g);
            double[] dx = new double[p];
            double size = 0;
            for (int j = 0; j < p; j++) {
                dx[j] = u[j] - z[j];
                size = Math.max(size, Math.abs(dx[j] * scale[j]));
            }
            if (!(size < previous)) {
                break;
            }
            previous = size;
            boolean settled = true;
            for (int j = 0; j < p; j++) {
                double before = x[j];
                x[j] += dx[j];
                settled &= x[j] == before;
            }
            for (int i = 0; i < n; i++) {
                double change = 0;
                for (int j = 0; j < p; j++) {
                    change += design[i][j] * dx[j];
                }
                e[i] += gap[i] - change;
            }
            if (settled) {
                break;
            }
        }
        return x;
    }

    /** s²·(XᵀWX)⁻¹ = s²·C⁻¹(RᵀR)⁻¹C⁻¹. */
    double[][] covariance(double variance) {
        int p = scale.length;
        double[][] inverseColumns = new double[p][];
        for (int j = 0; j < p; j++) {
            // column j of R⁻¹ solves R·v = e_j; R is triangular, so no further decomposition is needed
            RealVector unit = new ArrayRealVector(p);
            unit.setEntry(j, 1.0);
            MatrixUtils.solveUpperTriangularSystem(r, unit);
            inverseColumns[j] = unit.toArray();
        }
        double[][] cov = new double[p][p];
        double[] rowI = new double[p];
        double[] rowK = new double[p];
        for (int i = 0; i < p; i++) {
            for (int k = 0; k <= i; k++) {
                for (int j = 0; j < p; j++) {
                    rowI[j] = inverseColumns[j][i];
                    rowK[j] = inverseColumns[j][k];
                }
                double v = variance * MathArrays.linearCombination(rowI, rowK) / (scale[i] * scale[k]);
                cov[i][k] = v;
                cov[k][i] = v;
            }
        }
        return cov;
    }

    private double[] weightedResponse() {
        double[] b = new double[response.length];
        for (int i = 0; i < b.length; i++) {
            b[i] = root[i] * response[i];
        }
        return b;
    }

    /** argmin‖v − D·X·x‖ in the unscaled variables. */
    private double[] solveScaled(double[] v) {
        double[] x = solver.solve(new ArrayRealVector(v, false)).toArray();
        for (int j = 0; j < x.length; j++) {
            x[j] /= scale[j];
        }
        return x;
    }

    /** (XᵀWX)⁻¹·g = C⁻¹·R⁻¹·R⁻ᵀ·C⁻¹·g by two triangular solves. */
    private double[] normalInverseTimes(double[] g) {
        RealVector w = new ArrayRealVector(g.length);
        for (int j = 0; j < g.length; j++) {
            w.setEntry(j, g[j] / scale[j]);
        }
        MatrixUtils.solveLowerTriangularSystem(r.transpose(), w);
        MatrixUtils.solveUpperTriangularSystem(r, w);
        double[] out = w.toArray();
        for (int j = 0; j < out.length; j++) {
            out[j] /= scale[j];
        }
        return out;
    }

    /** y_i − X_i·x − e by one compensated dot product. */
    private double gap(int i, double[] x, double e) {
        int p = x.length;
        double[] terms = new double[p + 2];
        double[] factors = new double[p + 2];
        for (int j = 0; j < p; j++) {
            terms[j] = design[i][j];
            factors[j] = -x[j];
        }
        terms[p] = response[i];
        factors[p] = 1.0;
        terms[p + 1] = e;
        factors[p + 1] = -1.0;
        return MathArrays.linearCombination(terms, factors);
    }
}
