package org.miscela.core.fit;

import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;
import org.miscela.core.model.LocalCompositionGibbs;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.VapourPressure;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * G^E/RT of a binary liquid fitted to vapour–liquid equilibrium data by nonlinear least squares (Commons Math's
 * Levenberg–Marquardt), with modified Raoult's law for the vapour: p = x1·γ1·p1* + x2·γ2·p2*, y1 = x1·γ1·p1* / p.
 *
 * <ul>
 *   <li>With the vapour compositions y: min Σ w·[(p_calc/p − 1)² + (y1,calc − y1)²], both computed at the measured x
 *       and T, so that a 1 % pressure deviation weighs as much as 0.01 in y.</li>
 *   <li>Without them, Barker's method (J. A. Barker, Aust. J. Chem. 6 (1953) 207): min Σ w·(p_calc/p − 1)², which for
 *       data at one pressure stands for the boiling temperature's deviation.</li>
 * </ul>
 *
 * The models: Redlich–Kister on G^E/RT (a_kj, k = 0..m, j = 0..orderInT, per K^j about T_ref); Wilson with
 * Δλ_ab/R = a + b·T (K; b only when orderInT is 1), given the two molar volumes Λ uses; NRTL with τ = A + B/T (B in K;
 * A only when orderInT is 1) and a fixed α. Every start is the ideal solution (all parameters zero).
 *
 * <p>The consistency tests of the data: the point test (H. C. Van Ness, S. M. Byer, R. E. Gibbs, AIChE J. 19 (1973)
 * 238): fit to p alone and compare the y it predicts with the measured y, the data consistent when the mean |Δy| is
 * below 0.01 (the criterion of A. Fredenslund, J. Gmehling, P. Rasmussen, Vapor-Liquid Equilibria Using UNIFAC,
 * Elsevier 1977); and the area test (O. Redlich, A. T. Kister, Ind. Eng. Chem. 40 (1948) 345; E. F. G. Herington,
 * J. Inst. Petrol. 37 (1951) 457): ∫₀¹ ln(γ1/γ2) dx1 = 0 at constant T, judged by D = 100·|A − B|/(A + B) against
 * J = 150·(T_max − T_min)/T_min (D − J below 10), with the integrand a least-squares cubic in x1 through the measured
 * ln(γ1/γ2).
 *
 * <p>Units: K, Pa, mole fractions of the first component. Immutable.
 */
public final class VleFitter {
    /** The G^E models a fit can produce. */
    public enum Model {
        REDLICH_KISTER("Redlich-Kister"), WILSON("Wilson"), NRTL("NRTL");

        private final String word;

        Model(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }

        /** The model spelled {@code text} (case, spaces and the dash's kind ignored). */
        public static Model lookup(String text) {
            String t = text.trim().toLowerCase(java.util.Locale.ROOT).replace('–', '-').replace(" ", "");
            for (Model m : values()) {
                if (m.word.toLowerCase(java.util.Locale.ROOT).equals(t)) {
                    return m;
                }
            }
            throw Problem.UNKNOWN_GIBBS_MODEL.raise(text.trim());
        }
    }

    /** The iteration limit of the Levenberg–Marquardt search. */
    public static final int MAX_ITERATIONS = 2000;
    /** Mean |Δy| below which the point test passes (Fredenslund, Gmehling and Rasmussen 1977). */
    public static final double POINT_TEST_LIMIT = 0.01;
    /** D − J below which the area test passes (Herington 1951). */
    public static final double AREA_TEST_LIMIT = 10.0;
    /** A residual the model cannot compute (an overflowing exponential) counts as this deviation. */
    private static final double UNCOMPUTABLE = 1e6;

    private final Model model;
    private final int orderInX;
    private final int orderInT;
    private final double referenceKelvin;
    private final double alpha;
    private final double[] volumes;
    private final VapourPressure first;
    private final VapourPressure second;
    private final double[] x;
    private final double[] y;
    private final double[] kelvin;
    private final double[] pascal;
    private final double[] weights;

    /**
     * @param orderInX the Redlich–Kister order (0 for the other models)
     * @param orderInT 0 or more for Redlich–Kister; 0 or 1 for Wilson and NRTL
     * @param referenceKelvin T_ref of the Redlich–Kister temperature polynomials (any value when orderInT is 0)
     * @param alpha NRTL's α (unused otherwise)
     * @param volumes the molar volumes Wilson's Λ uses (any one unit; null otherwise)
     * @param y the vapour mole fractions, or null for Barker's method
     * @param weights one per point, zero or positive, or null
     */
    public VleFitter(Model model, int orderInX, int orderInT, double referenceKelvin, double alpha, double[] volumes,
            VapourPressure first, VapourPressure second, double[] x, double[] y, double[] kelvin, double[] pascal,
            double[] weights) {
        this.model = model;
        this.orderInX = orderInX;
        this.orderInT = orderInT;
        this.referenceKelvin = referenceKelvin;
        this.alpha = alpha;
        this.volumes = volumes == null ? null : volumes.clone();
        this.first = first;
        this.second = second;
        this.x = x.clone();
        this.y = y == null ? null : y.clone();
        this.kelvin = kelvin.clone();
        this.pascal = pascal.clone();
        this.weights = weights == null ? null : weights.clone();
        check();
    }

    private void check() {
        int maxT = model == Model.REDLICH_KISTER ? RedlichKisterFitter.MAX_ORDER_IN_T : 1;
        if (orderInT < 0 || orderInT > maxT) {
            throw Problem.BAD_ORDER.raise("order in T", maxT, orderInT);
        }
        if (model == Model.REDLICH_KISTER) {
            RedlichKisterFitter.checkOrders(orderInX, orderInT);
        }
        if (model == Model.NRTL && !(alpha > 0 && alpha <= 1)) {
            throw Problem.NRTL_ALPHA.raise(Numbers.show(alpha));
        }
        int n = x.length;
        if (n == 0) {
            throw Problem.NO_POINTS.raise();
        }
        for (int i = 0; i < n; i++) {
            if (!(x[i] >= 0 && x[i] <= 1)) {
                throw Problem.FIT_MOLE_FRACTION_OUTSIDE_UNIT.raise(i + 1, Numbers.show(x[i]));
            }
            if (y != null && !(y[i] >= 0 && y[i] <= 1)) {
                throw Problem.FIT_MOLE_FRACTION_OUTSIDE_UNIT.raise(i + 1, Numbers.show(y[i]));
            }
            if (!(kelvin[i] > 0) || Double.isInfinite(kelvin[i])) {
                throw Problem.FIT_NOT_POSITIVE.raise("temperature (in kelvin)", i + 1, Numbers.show(kelvin[i]));
            }
            if (!(pascal[i] > 0) || Double.isInfinite(pascal[i])) {
                throw Problem.FIT_NOT_POSITIVE.raise("pressure", i + 1, Numbers.show(pascal[i]));
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

    /** How many parameters the model has. */
    public int parameterCount() {
        switch (model) {
            case REDLICH_KISTER:
                return (orderInX + 1) * (orderInT + 1);
            default:
                return 2 * (orderInT + 1);
        }
    }

    /** ln γ1 and ln γ2 at x1 and T for the parameters theta. */
    void logGammas(double[] theta, double x1, double t, double[] out) {
        switch (model) {
            case REDLICH_KISTER: {
                double[][] a = new double[orderInX + 1][orderInT + 1];
                for (int k = 0; k <= orderInX; k++) {
                    for (int j = 0; j <= orderInT; j++) {
                        a[k][j] = theta[k * (orderInT + 1) + j];
                    }
                }
                double[] g = new double[3];
                new RedlichKister(referenceKelvin, a).evaluate(x1, t, g);
                out[0] = g[0] + (1 - x1) * g[1];
                out[1] = g[0] - x1 * g[1];
                return;
            }
            case WILSON: {
                int per = orderInT + 1;
                double[][] a = {{0, theta[0]}, {theta[per], 0}};
                double[][] b = {{0, per == 2 ? theta[1] : 0}, {per == 2 ? theta[3] : 0, 0}};
                LocalCompositionGibbs.wilson(volumes, a, b, new double[2][2], new boolean[2][2])
                        .partials(new double[] {x1, 1 - x1}, t, false, out);
                return;
            }
            default: {
                double[][] a = {{0, orderInT == 1 ? theta[0] : 0}, {orderInT == 1 ? theta[2] : 0, 0}};
                double[][] b = orderInT == 1 ? new double[][] {{0, theta[1]}, {theta[3], 0}}
                        : new double[][] {{0, theta[0]}, {theta[1], 0}};
                double[][] al = {{0, alpha}, {alpha, 0}};
                LocalCompositionGibbs.nrtl(a, b, al, new boolean[2][2]).partials(new double[] {x1, 1 - x1}, t, false,
                        out);
            }
        }
    }

    /** {p, y1} by modified Raoult's law at point i's x and T. */
    double[] bubble(double[] theta, int i) {
        double[] lg = new double[2];
        logGammas(theta, x[i], kelvin[i], lg);
        double p1 = x[i] * Math.exp(lg[0]) * first.pascal(kelvin[i]);
        double p2 = (1 - x[i]) * Math.exp(lg[1]) * second.pascal(kelvin[i]);
        return new double[] {p1 + p2, p1 / (p1 + p2)};
    }

    /** The weighted residuals: n relative pressure deviations, then (with y) n vapour-composition deviations. */
    double[] residuals(double[] theta, boolean withVapour) {
        int n = x.length;
        double[] r = new double[withVapour ? 2 * n : n];
        for (int i = 0; i < n; i++) {
            double w = weights == null ? 1.0 : Math.sqrt(weights[i]);
            double[] b = bubble(theta, i);
            r[i] = w * (b[0] / pascal[i] - 1);
            if (withVapour) {
                r[n + i] = w * (b[1] - y[i]);
            }
        }
        for (int i = 0; i < r.length; i++) {
            if (!Double.isFinite(r[i])) {
                r[i] = UNCOMPUTABLE;
            }
        }
        return r;
    }

    /** The fit: to p and y when the data have y, else to p alone (Barker's method). */
    public VleFit fit() {
        return fit(y != null);
    }

    /** The fit to p alone, or to p and y. */
    public VleFit fit(boolean withVapour) {
        return fit(withVapour, MAX_ITERATIONS);
    }

    /** The fit with an iteration limit of its own (the cell function's is {@value #MAX_ITERATIONS}). */
    public VleFit fit(boolean withVapour, int maxIterations) {
        int p = parameterCount();
        int n = x.length;
        int used = 0;
        for (int i = 0; i < n; i++) {
            used += weights == null || weights[i] > 0 ? 1 : 0;
        }
        int residualCount = withVapour ? 2 * used : used;
        if (residualCount < p) {
            throw Problem.TOO_FEW_POINTS.raise(p, used);
        }
        MultivariateJacobianFunction f = point -> {
            double[] theta = point.toArray();
            double[] value = residuals(theta, withVapour);
            double[][] jacobian = new double[value.length][p];
            for (int j = 0; j < p; j++) {
                double h = 1e-6 * Math.max(1.0, Math.abs(theta[j]));
                double keep = theta[j];
                theta[j] = keep + h;
                double[] up = residuals(theta, withVapour);
                theta[j] = keep - h;
                double[] down = residuals(theta, withVapour);
                theta[j] = keep;
                for (int i = 0; i < value.length; i++) {
                    jacobian[i][j] = (up[i] - down[i]) / (2 * h);
                }
            }
            return new Pair<RealVector, RealMatrix>(new ArrayRealVector(value, false),
                    new Array2DRowRealMatrix(jacobian, false));
        };
        LeastSquaresProblem problem = new LeastSquaresBuilder().start(new double[p]).model(f)
                .target(new double[withVapour ? 2 * n : n]).maxIterations(maxIterations)
                .maxEvaluations(maxIterations * 4).lazyEvaluation(false).build();
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(problem);
        } catch (TooManyEvaluationsException | TooManyIterationsException | ConvergenceException e) {
            throw Problem.VLE_FIT_NOT_CONVERGED.raise(maxIterations);
        }
        double[] theta = optimum.getPoint().toArray();
        double[] r = residuals(theta, withVapour);
        double rss = 0;
        for (double v : r) {
            rss += v * v;
            if (v == UNCOMPUTABLE) {
                throw Problem.VLE_FIT_NOT_CONVERGED.raise(maxIterations);
            }
        }
        int dof = residualCount - p;
        double[][] covariance;
        try {
            RealMatrix c = optimum.getCovariances(1e-14);
            covariance = c.scalarMultiply(dof > 0 ? rss / dof : Double.NaN).getData();
        } catch (SingularMatrixException e) {
            throw Problem.VLE_FIT_UNDETERMINED.raise(p);
        }
        double[] dp = new double[n];
        double[] dy = new double[n];
        for (int i = 0; i < n; i++) {
            double[] b = bubble(theta, i);
            dp[i] = b[0] - pascal[i];
            dy[i] = y == null ? Double.NaN : b[1] - y[i];
        }
        return new VleFit(model, orderInX, orderInT, alpha, theta, covariance, dp, dy, pascal, x, weights, withVapour,
                used, residualCount, Math.sqrt(rss / Math.max(dof, 1)), dof, optimum.getIterations());
    }

    /**
     * The point test: the fit to p alone, and the mean and largest |y_calc − y| over the points with positive weight
     * strictly inside 0 &lt; x1 &lt; 1: {mean, largest, index of the largest (0-based)}.
     */
    public double[] pointTest() {
        if (y == null) {
            throw Problem.CONSISTENCY_NEEDS_VAPOUR.raise();
        }
        VleFit barker = fit(false);
        double sum = 0;
        int count = 0;
        int worst = -1;
        double[] dy = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0 && x[i] < 1 && (weights == null || weights[i] > 0)) {
                dy[i] = bubble(barker.parameters(), i)[1] - y[i];
                sum += Math.abs(dy[i]);
                count++;
                if (worst < 0 || Math.abs(dy[i]) > Math.abs(dy[worst])) {
                    worst = i;
                }
            }
        }
        if (count == 0) {
            throw Problem.CONSISTENCY_NEEDS_VAPOUR.raise();
        }
        return new double[] {sum / count, Math.abs(dy[worst]), worst};
    }

    /**
     * The area test: {A, B, D, J} from the measured ln(γ1/γ2) = ln(y1·x2·p2* / (y2·x1·p1*)) at the points strictly
     * inside 0 &lt; x1, y1 &lt; 1 with positive weight, through a least-squares polynomial in x1 of degree 3 (fewer
     * with fewer than five points) integrated over 0..1.
     */
    public double[] areaTest() {
        if (y == null) {
            throw Problem.CONSISTENCY_NEEDS_VAPOUR.raise();
        }
        int n = 0;
        double tMin = Double.POSITIVE_INFINITY;
        double tMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            if (inside(i)) {
                n++;
                tMin = Math.min(tMin, kelvin[i]);
                tMax = Math.max(tMax, kelvin[i]);
            }
        }
        if (n < 2) {
            throw Problem.CONSISTENCY_NEEDS_VAPOUR.raise();
        }
        int degree = Math.min(3, n - 2);
        double[][] design = new double[n][degree + 1];
        double[] ratio = new double[n];
        int row = 0;
        for (int i = 0; i < x.length; i++) {
            if (inside(i)) {
                for (int j = 0; j <= degree; j++) {
                    design[row][j] = Math.pow(x[i], j);
                }
                ratio[row] = Math.log(y[i] * (1 - x[i]) * second.pascal(kelvin[i])
                        / ((1 - y[i]) * x[i] * first.pascal(kelvin[i])));
                row++;
            }
        }
        double[] c = LinearLeastSquares.fit(design, ratio, null).coefficients();
        // Simpson's rule on 2000 intervals of the positive and negative parts
        int steps = 2000;
        double above = 0;
        double below = 0;
        for (int s = 0; s <= steps; s++) {
            double xs = (double) s / steps;
            double v = 0;
            for (int j = degree; j >= 0; j--) {
                v = v * xs + c[j];
            }
            double weight = (s == 0 || s == steps ? 1 : s % 2 == 1 ? 4 : 2) / (3.0 * steps);
            if (v > 0) {
                above += weight * v;
            } else {
                below -= weight * v;
            }
        }
        double d = 100 * Math.abs(above - below) / (above + below);
        double j = 150 * (tMax - tMin) / tMin;
        return new double[] {above, below, d, j};
    }

    private boolean inside(int i) {
        return x[i] > 0 && x[i] < 1 && y[i] > 0 && y[i] < 1 && (weights == null || weights[i] > 0);
    }
}
