package org.miscela.core.model;

import java.util.ArrayList;
import java.util.List;

/**
 * The excess part of one extensive property (volume, enthalpy, …) of an n-component mixture: every binary pair's
 * Redlich–Kister set combined by a {@link GeometricModel}, plus optional ternary terms. Values, gradients and
 * Hessians with respect to the mole fractions are analytic. Internal units; immutable.
 *
 * <p>The gradient treats the n mole fractions as independent variables. Partial molar quantities only use it along
 * directions inside the simplex (B̄_k = B + Σ_j (δ_jk − x_j)·∂B/∂x_j), where the choice of extension does not matter.
 */
public final class ExcessFunction implements ExcessModel {
    private final int n;
    private final GeometricModel model;
    private final int asymmetric;
    private final RedlichKister[][] byPair;
    private final int[] first;
    private final int[] second;
    private final RedlichKister[] expansion;
    private final boolean[] keepsOwnFraction;
    private final TernaryTerm[] ternary;
    private final double[][][][] covariance;

    /**
     * @param pairs pairs[i][j] for i &lt; j: the set written as i then j, or null for a pair the card treats as ideal
     * @param asymmetric the Toop model's asymmetric component, or −1 for the other models
     */
    public ExcessFunction(int n, GeometricModel model, int asymmetric, RedlichKister[][] pairs,
            List<TernaryTerm> ternary) {
        this(n, model, asymmetric, pairs, ternary, null);
    }

    /**
     * @param covariance covariance[i][j] for i &lt; j: the covariance of pair i–j's coefficients (order a_00, a_01, …,
     *     a_10, …, as written i then j), or null where the card gives none; null for none at all
     */
    public ExcessFunction(int n, GeometricModel model, int asymmetric, RedlichKister[][] pairs,
            List<TernaryTerm> ternary, double[][][][] covariance) {
        if ((model == GeometricModel.TOOP) != (asymmetric >= 0)) {
            throw new IllegalArgumentException("the Toop model, and only it, names an asymmetric component");
        }
        this.n = n;
        this.model = model;
        this.asymmetric = asymmetric;
        this.byPair = new RedlichKister[n][n];
        List<int[]> present = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                byPair[i][j] = pairs[i][j];
                if (pairs[i][j] != null) {
                    present.add(new int[] {i, j});
                }
            }
        }
        int m = present.size();
        first = new int[m];
        second = new int[m];
        expansion = new RedlichKister[m];
        keepsOwnFraction = new boolean[m];
        for (int p = 0; p < m; p++) {
            int i = present.get(p)[0];
            int j = present.get(p)[1];
            // In Toop's model the asymmetric component's pairs are evaluated with it written first.
            boolean swap = j == asymmetric;
            first[p] = swap ? j : i;
            second[p] = swap ? i : j;
            expansion[p] = swap ? pairs[i][j].swapped() : pairs[i][j];
            keepsOwnFraction[p] = model == GeometricModel.TOOP && (i == asymmetric || j == asymmetric);
        }
        this.ternary = ternary.toArray(new TernaryTerm[0]);
        this.covariance = new double[n][n][][];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double[][] c = covariance == null ? null : covariance[i][j];
                this.covariance[i][j] = c == null ? null : copy(c);
            }
        }
    }

    private static double[][] copy(double[][] m) {
        double[][] out = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            out[i] = m[i].clone();
        }
        return out;
    }

    /** The covariance of pair i–j's coefficients (i &lt; j, written i then j, internal units), or null. */
    public double[][] covariance(int i, int j) {
        double[][] c = covariance[i][j];
        return c == null ? null : copy(c);
    }

    @Override
    public int componentCount() {
        return n;
    }

    public GeometricModel model() {
        return model;
    }

    /** The Toop model's asymmetric component, or −1. */
    public int asymmetricComponent() {
        return asymmetric;
    }

    /** The set of pair i–j written as i then j, or null when the card treats the pair as ideal. */
    public RedlichKister pair(int i, int j) {
        if (i < j) {
            return byPair[i][j];
        }
        RedlichKister r = byPair[j][i];
        return r == null ? null : r.swapped();
    }

    /** Number of pairs with coefficients (pairs treated as ideal are not counted). */
    public int pairCount() {
        return expansion.length;
    }

    /** The component written first in pair p as it is evaluated (for Toop, the asymmetric one). */
    public int pairFirst(int p) {
        return first[p];
    }

    public int pairSecond(int p) {
        return second[p];
    }

    /** Pair p's set, written as {@link #pairFirst} then {@link #pairSecond}. */
    public RedlichKister pairExpansion(int p) {
        return expansion[p];
    }

    public List<TernaryTerm> ternaryTerms() {
        return java.util.Arrays.asList(ternary.clone());
    }

    /** Whether any coefficient depends on temperature. */
    @Override
    public boolean temperatureDependent() {
        for (RedlichKister r : expansion) {
            if (r.temperatureDependent()) {
                return true;
            }
        }
        for (TernaryTerm t : ternary) {
            if (t.temperatureDependent()) {
                return true;
            }
        }
        return false;
    }

    /** The argument d of pair p's series at this composition. */
    public double pairCoordinate(int p, double[] x) {
        double xi = x[first[p]];
        double xj = x[second[p]];
        if (model == GeometricModel.MUGGIANU) {
            return xi - xj;
        }
        if (keepsOwnFraction[p]) {
            return 2.0 * xi - 1.0;
        }
        double s = xi + xj;
        return s > 0.0 ? (xi - xj) / s : 0.0;
    }

    /** Pair p's contribution x_i·x_j·S(d). */
    public double pairContribution(int p, double[] x, double kelvin) {
        return x[first[p]] * x[second[p]] * expansion[p].sum(pairCoordinate(p, x), kelvin, false);
    }

    /** Ternary term t's contribution. */
    public double ternaryContribution(int t, double[] x, double kelvin) {
        return ternary[t].accumulate(x, kelvin, false, null, null);
    }

    /**
     * B^E (or ∂B^E/∂T when {@code temperatureSlope}) with, optionally, its gradient and Hessian with respect to the
     * mole fractions. The arrays are overwritten; pass null for what is not needed.
     */
    @Override
    public double evaluate(double[] x, double kelvin, boolean temperatureSlope, double[] gradient,
            double[][] hessian) {
        if (gradient != null) {
            java.util.Arrays.fill(gradient, 0.0);
        }
        if (hessian != null) {
            for (double[] row : hessian) {
                java.util.Arrays.fill(row, 0.0);
            }
        }
        // the value alone needs no scratch array: a call per cell then allocates nothing here
        double[] s = gradient == null && hessian == null ? null : new double[3];
        double total = 0.0;
        for (int p = 0; p < expansion.length; p++) {
            total += accumulatePair(p, x, kelvin, temperatureSlope, s, gradient, hessian);
        }
        for (TernaryTerm t : ternary) {
            total += t.accumulate(x, kelvin, temperatureSlope, gradient, hessian);
        }
        return total;
    }

    /**
     * A Kohler pair, d = (x_i − x_j)/(x_i + x_j), written with the pair's own fractions a = x_i/(x_i + x_j) and
     * b = x_j/(x_i + x_j) so that no power of the sum appears: x_i·x_j·∂d/∂x_i = 2ab·x_j, and every second-derivative
     * term is a polynomial in a and b. The same values as the textbook form, but a pair whose sum is tiny (10⁻²⁰⁰, say,
     * where its square underflows to zero) gives zeros instead of 0/0.
     */
    private double kohlerPair(int p, double xi, double xj, double sum, double kelvin, boolean temperatureSlope,
            double[] s, double[] gradient, double[][] hessian) {
        int i = first[p];
        int j = second[p];
        double a = xi / sum;
        double b = xj / sum;
        double d = a - b;
        double u = xi * xj;
        if (s == null) {
            return u * expansion[p].sum(d, kelvin, temperatureSlope);
        }
        expansion[p].series(d, kelvin, temperatureSlope, s);
        double ab = a * b;
        if (gradient != null) {
            gradient[i] += xj * s[0] + 2.0 * ab * xj * s[1];
            gradient[j] += xi * s[0] - 2.0 * ab * xi * s[1];
        }
        if (hessian != null) {
            hessian[i][i] += 4.0 * b * b * b * (s[1] + a * s[2]);
            hessian[j][j] += 4.0 * a * a * a * (b * s[2] - s[1]);
            double mixed = s[0] - 4.0 * ab * ab * s[2] + 2.0 * ab * (a - b) * s[1];
            hessian[i][j] += mixed;
            hessian[j][i] += mixed;
        }
        return u * s[0];
    }

    private double accumulatePair(int p, double[] x, double kelvin, boolean temperatureSlope, double[] s,
            double[] gradient, double[][] hessian) {
        int i = first[p];
        int j = second[p];
        double xi = x[i];
        double xj = x[j];
        double d;
        double di;
        double dj;
        double dii = 0.0;
        double djj = 0.0;
        double dij = 0.0;
        if (model == GeometricModel.MUGGIANU) {
            d = xi - xj;
            di = 1.0;
            dj = -1.0;
        } else if (keepsOwnFraction[p]) {
            d = 2.0 * xi - 1.0;
            di = 2.0;
            dj = 0.0;
        } else {
            double sum = xi + xj;
            if (!(sum > 0.0)) {
                // x_i·x_j·S and its gradient vanish here; the Kohler term has no curvature limit at this corner.
                return 0.0;
            }
            return kohlerPair(p, xi, xj, sum, kelvin, temperatureSlope, s, gradient, hessian);
        }
        double u = xi * xj;
        if (s == null) {
            return u * expansion[p].sum(d, kelvin, temperatureSlope);
        }
        expansion[p].series(d, kelvin, temperatureSlope, s);
        if (gradient != null) {
            gradient[i] += xj * s[0] + u * s[1] * di;
            gradient[j] += xi * s[0] + u * s[1] * dj;
        }
        if (hessian != null) {
            hessian[i][i] += 2.0 * xj * s[1] * di + u * (s[2] * di * di + s[1] * dii);
            hessian[j][j] += 2.0 * xi * s[1] * dj + u * (s[2] * dj * dj + s[1] * djj);
            double mixed = s[0] + xj * s[1] * dj + xi * s[1] * di + u * (s[2] * di * dj + s[1] * dij);
            hessian[i][j] += mixed;
            hessian[j][i] += mixed;
        }
        return u * s[0];
    }
}
