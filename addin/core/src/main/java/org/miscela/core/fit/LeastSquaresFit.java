package org.miscela.core.fit;

/**
 * The outcome of one weighted linear least-squares fit: coefficients and their statistics. Immutable; every array is
 * copied in and out. Weighted quantities use the weights as given (the residual standard deviation is that of unit
 * weight), so with unit weights they are the ordinary ones.
 */
public final class LeastSquaresFit {
    private final double[] coefficients;
    private final double[][] covariance;
    private final double[] residuals;
    private final int pointCount;
    private final double residualSumOfSquares;
    private final double rSquared;
    private final boolean centred;
    private final int largestResidualIndex;
    private final double conditionNumber;

    LeastSquaresFit(double[] coefficients, double[][] covariance, double[] residuals, int pointCount,
            double residualSumOfSquares, double rSquared, boolean centred, int largestResidualIndex,
            double conditionNumber) {
        this.coefficients = coefficients.clone();
        this.covariance = copy(covariance);
        this.residuals = residuals.clone();
        this.pointCount = pointCount;
        this.residualSumOfSquares = residualSumOfSquares;
        this.rSquared = rSquared;
        this.centred = centred;
        this.largestResidualIndex = largestResidualIndex;
        this.conditionNumber = conditionNumber;
    }

    /** The fitted coefficients, one per design column. */
    public double[] coefficients() {
        return coefficients.clone();
    }

    public int parameterCount() {
        return coefficients.length;
    }

    /** Points with positive weight: those that take part in the fit. */
    public int pointCount() {
        return pointCount;
    }

    /** Points with positive weight less parameters; 0 when the fit passes through every point. */
    public int degreesOfFreedom() {
        return pointCount - coefficients.length;
    }

    /** Σ w·r² over all points. */
    public double residualSumOfSquares() {
        return residualSumOfSquares;
    }

    /** sqrt(Σ w·r² / dof), the standard deviation of unit weight; NaN when there are no degrees of freedom. */
    public double residualStandardDeviation() {
        int dof = degreesOfFreedom();
        return dof > 0 ? Math.sqrt(residualSumOfSquares / dof) : Double.NaN;
    }

    /** y − ŷ at every point given, in the units of y (unweighted; zero-weight points included). */
    public double[] residuals() {
        return residuals.clone();
    }

    /** Index (from 0) of the point with positive weight whose |residual| is largest. */
    public int largestResidualIndex() {
        return largestResidualIndex;
    }

    /** The residual at {@link #largestResidualIndex()}, with its sign. */
    public double largestResidual() {
        return residuals[largestResidualIndex];
    }

    /**
     * R² = 1 − RSS/TSS. TSS is taken about the weighted mean when {@link #isCentred()} (the design has a constant
     * column), and about zero otherwise, the convention NIST uses for its no-intercept problems NoInt1 and NoInt2.
     * NaN when TSS is zero.
     */
    public double rSquared() {
        return rSquared;
    }

    /** True when a design column is constant (an intercept), so that R² is centred. */
    public boolean isCentred() {
        return centred;
    }

    /** Standard error of each coefficient: the square root of the covariance diagonal (NaN without dof). */
    public double[] standardErrors() {
        double[] se = new double[coefficients.length];
        for (int j = 0; j < se.length; j++) {
            se[j] = Math.sqrt(covariance[j][j]);
        }
        return se;
    }

    /** s²·(XᵀWX)⁻¹, the estimated covariance of the coefficients (NaN without dof). */
    public double[][] covariance() {
        return copy(covariance);
    }

    /** Ratio of the largest to the smallest singular value of the weighted design after column scaling. */
    public double conditionNumber() {
        return conditionNumber;
    }

    private static double[][] copy(double[][] m) {
        double[][] c = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            c[i] = m[i].clone();
        }
        return c;
    }
}
