package org.miscela.core.fit;

/**
 * The outcome of a {@link VleFitter} fit: the parameters in the fitter's order, their covariance (s²·(JᵀJ)⁻¹ of the
 * weighted residuals), and the deviations of p (Pa) and y at every point. Immutable; arrays are copied out.
 */
public final class VleFit {
    private final VleFitter.Model model;
    private final int orderInX;
    private final int orderInT;
    private final double alpha;
    private final double[] parameters;
    private final double[][] covariance;
    private final double[] pressureDeviations;
    private final double[] vapourDeviations;
    private final double[] pressures;
    private final double[] x;
    private final double[] weights;
    private final boolean withVapour;
    private final int points;
    private final int residualCount;
    private final double standardDeviation;
    private final int degreesOfFreedom;
    private final int iterations;

    VleFit(VleFitter.Model model, int orderInX, int orderInT, double alpha, double[] parameters,
            double[][] covariance, double[] pressureDeviations, double[] vapourDeviations, double[] pressures,
            double[] x, double[] weights, boolean withVapour, int points, int residualCount, double standardDeviation,
            int degreesOfFreedom, int iterations) {
        this.model = model;
        this.orderInX = orderInX;
        this.orderInT = orderInT;
        this.alpha = alpha;
        this.parameters = parameters.clone();
        this.covariance = covariance;
        this.pressureDeviations = pressureDeviations.clone();
        this.vapourDeviations = vapourDeviations.clone();
        this.pressures = pressures.clone();
        this.x = x.clone();
        this.weights = weights == null ? null : weights.clone();
        this.withVapour = withVapour;
        this.points = points;
        this.residualCount = residualCount;
        this.standardDeviation = standardDeviation;
        this.degreesOfFreedom = degreesOfFreedom;
        this.iterations = iterations;
    }

    public VleFitter.Model model() {
        return model;
    }

    public int orderInX() {
        return orderInX;
    }

    public int orderInT() {
        return orderInT;
    }

    /** NRTL's α as given (unused by the other models). */
    public double alpha() {
        return alpha;
    }

    /**
     * The parameters: Redlich–Kister a_kj at index k·(orderInT + 1) + j (per K^j); Wilson a_12 [, b_12], a_21 [, b_21]
     * (K, K/K); NRTL [A_12,] B_12, [A_21,] B_21 (B in K).
     */
    public double[] parameters() {
        return parameters.clone();
    }

    public double[][] covariance() {
        double[][] c = new double[covariance.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = covariance[i].clone();
        }
        return c;
    }

    /** sqrt of the covariance's diagonal (NaN without degrees of freedom). */
    public double[] standardErrors() {
        double[] s = new double[parameters.length];
        for (int i = 0; i < s.length; i++) {
            s[i] = Math.sqrt(covariance[i][i]);
        }
        return s;
    }

    /** p_calc − p at every point, Pa. */
    public double[] pressureDeviations() {
        return pressureDeviations.clone();
    }

    /** y_calc − y at every point (NaN without measured y). */
    public double[] vapourDeviations() {
        return vapourDeviations.clone();
    }

    /** Whether the fit used the vapour compositions (else Barker's method, p alone). */
    public boolean withVapour() {
        return withVapour;
    }

    /** Points with positive weight. */
    public int points() {
        return points;
    }

    /** Residuals that took part: the points, twice when the fit used y. */
    public int residualCount() {
        return residualCount;
    }

    public int degreesOfFreedom() {
        return degreesOfFreedom;
    }

    /** sqrt(Σ w·r²/dof), r the relative pressure deviations (and y deviations): dimensionless. */
    public double standardDeviation() {
        return standardDeviation;
    }

    public int iterations() {
        return iterations;
    }

    /** {root mean square of (p_calc/p − 1), largest |p_calc/p − 1|, its point (0-based)} over weighted points. */
    public double[] relativePressureDeviation() {
        return summary(pressureDeviations, true);
    }

    /** {mean |y_calc − y|, largest, its point} over weighted points strictly inside 0 &lt; x &lt; 1, or null. */
    public double[] vapourDeviation() {
        return Double.isNaN(vapourDeviations[0]) ? null : summary(vapourDeviations, false);
    }

    private double[] summary(double[] d, boolean relative) {
        double sum = 0;
        int count = 0;
        int worst = -1;
        for (int i = 0; i < d.length; i++) {
            if (weights != null && !(weights[i] > 0)) {
                continue;
            }
            double v = Math.abs(relative ? d[i] / pressures[i] : d[i]);
            if (!relative && !(x[i] > 0 && x[i] < 1)) {
                continue;
            }
            sum += relative ? v * v : v;
            count++;
            if (worst < 0 || v > Math.abs(relative ? d[worst] / pressures[worst] : d[worst])) {
                worst = i;
            }
        }
        if (count == 0) {
            return new double[] {0, 0, 0};
        }
        double largest = Math.abs(relative ? d[worst] / pressures[worst] : d[worst]);
        return new double[] {relative ? Math.sqrt(sum / count) : sum / count, largest, worst};
    }
}
