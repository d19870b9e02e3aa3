package org.miscela.core.fit;

import org.apache.commons.math3.util.MathArrays;
import org.miscela.core.model.Component;
import org.miscela.core.model.RedlichKister;

/**
 * Standard uncertainties of V^E, of the partial molar excess volumes and of the mixture density that follow from the
 * covariance of a Redlich–Kister expansion's coefficients, by linear propagation: u(q)² = gᵀ·C·g with g the gradient
 * of q with respect to the coefficients. V^E and the partial excess volumes are linear in the coefficients, so for
 * them this is exact; ρ depends on V^E nonlinearly, and its gradient is taken at the expansion's own V^E. The pure
 * liquids' densities are taken as exact.
 *
 * <p>A test tool: an independent propagation the tests compare MIX.UNCERTAINTY's with; no cell function uses it.
 *
 * <p>Coefficients are numbered as in {@link RedlichKisterFit}: a_kj is k·(orderInT + 1) + j. Immutable.
 */
public final class ExcessVolumeUncertainty {
    /** The linear propagation of a fit's own coefficient covariance (what RedlichKisterFit offered before). */
    public static ExcessVolumeUncertainty of(RedlichKisterFit fit) {
        return new ExcessVolumeUncertainty(fit.toRedlichKister(), fit.orderInT(), fit.leastSquares().covariance());
    }

    /** A test tool's refusal: plain words, not a catalogue entry (no cell function reaches this class). */
    private static IllegalArgumentException refused(String pattern, Object... args) {
        return new IllegalArgumentException(String.format(java.util.Locale.ROOT, pattern, args));
    }

    /** Entries (i, j) and (j, i) may differ by this much relative to √(C_ii·C_jj), e.g. after printing to cells. */
    static final double SYMMETRY_TOLERANCE = 1e-9;

    private final RedlichKister expansion;
    private final int orderInX;
    private final int orderInT;
    private final double[][] covariance;

    /**
     * @param expansion the coefficients' values (every A_k a polynomial of degree orderInT at most in T − T_ref)
     * @param orderInT highest power of T − T_ref the covariance covers
     * @param covariance (order + 1)(orderInT + 1) square, symmetric, non-negative variances; copied (symmetrised)
     */
    public ExcessVolumeUncertainty(RedlichKister expansion, int orderInT, double[][] covariance) {
        RedlichKisterFitter.checkOrders(expansion.order(), orderInT);
        this.expansion = expansion;
        this.orderInX = expansion.order();
        this.orderInT = orderInT;
        this.covariance = checkedCovariance(covariance, (orderInX + 1) * (orderInT + 1));
    }

    /** u(V^E) in cm³/mol. */
    public double excessVolume(double x1, double kelvin) {
        return propagate(excessVolumeGradient(x1, kelvin));
    }

    /** u(V̄_k^E) in cm³/mol, component 1 or 2. */
    public double partialExcessVolume(int component, double x1, double kelvin) {
        return propagate(partialExcessVolumeGradient(component, x1, kelvin));
    }

    /**
     * u(ρ) in kg/m³. ρ = 1000·M/V_m with V_m = x1·V1* + x2·V2* + V^E, so ∂ρ/∂V^E = −ρ/V_m and u(ρ) = (ρ/V_m)·u(V^E).
     */
    public double density(double x1, double kelvin, Component first, Component second) {
        double excess = expansion.value(x1, kelvin);
        double volume = MixtureVolumes.idealMolarVolume(x1, kelvin, first, second) + excess;
        double rho = 1000.0 * MixtureVolumes.molarMass(x1, first, second) / volume;
        return rho / volume * excessVolume(x1, kelvin);
    }

    /** ∂V^E/∂a_kj = x1·x2·(x1 − x2)^k·(T − T_ref)^j. */
    double[] excessVolumeGradient(double x1, double kelvin) {
        checkPoint(x1, kelvin);
        return RedlichKisterFitter.basis(x1, kelvin - expansion.referenceKelvin(), orderInX, orderInT);
    }

    /** V̄1^E = V^E + x2·∂V^E/∂x1 and V̄2^E = V^E − x1·∂V^E/∂x1, differentiated with respect to each a_kj. */
    double[] partialExcessVolumeGradient(int component, double x1, double kelvin) {
        if (component != 1 && component != 2) {
            throw refused("The component must be 1 or 2; found %d.", component);
        }
        double[] value = excessVolumeGradient(x1, kelvin);
        double[] slope = slopeGradient(x1, kelvin - expansion.referenceKelvin());
        double factor = component == 1 ? 1.0 - x1 : -x1;
        double[] g = new double[value.length];
        for (int i = 0; i < g.length; i++) {
            g[i] = value[i] + factor * slope[i];
        }
        return g;
    }

    /** ∂/∂a_kj of ∂V^E/∂x1: d/dx1 [x1·x2·d^k] = −d^(k+1) + 2k·x1·x2·d^(k−1), with d = x1 − x2 and x2 = 1 − x1. */
    private double[] slopeGradient(double x1, double tau) {
        double x2 = 1.0 - x1;
        double d = x1 - x2;
        double u = x1 * x2;
        double[] g = new double[(orderInX + 1) * (orderInT + 1)];
        double dkMinus1 = 0; // d^(k−1), unused for k = 0
        double dk = 1;
        for (int k = 0; k <= orderInX; k++) {
            double s = -dk * d + 2.0 * k * u * dkMinus1;
            for (int j = 0; j <= orderInT; j++) {
                g[k * (orderInT + 1) + j] = s;
                s *= tau;
            }
            dkMinus1 = dk;
            dk *= d;
        }
        return g;
    }

    private double propagate(double[] g) {
        double[] cg = new double[g.length];
        for (int i = 0; i < g.length; i++) {
            cg[i] = MathArrays.linearCombination(covariance[i], g);
        }
        // a covariance rounded on its way to a card may be slightly indefinite: never return NaN for a tiny negative
        return Math.sqrt(Math.max(0.0, MathArrays.linearCombination(g, cg)));
    }

    private static void checkPoint(double x1, double kelvin) {
        if (!(x1 >= 0 && x1 <= 1)) {
            throw refused("The mole fraction %s lies outside 0..1.", x1);
        }
        if (!(kelvin > 0) || !Double.isFinite(kelvin)) {
            throw refused("The temperature %s K is not a finite value above absolute zero.", kelvin);
        }
    }

    private static double[][] checkedCovariance(double[][] c, int size) {
        int columns = c.length == 0 ? 0 : c[0].length;
        for (double[] row : c) {
            if (row.length != columns) {
                columns = -1;
            }
        }
        if (c.length != size || columns != size) {
            throw refused("The covariance must be %d×%d for this expansion; found %d×%d.", size, size, c.length, Math.max(columns, 0));
        }
        double[][] s = new double[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                if (!Double.isFinite(c[i][j])) {
                    throw refused("The covariance entry (%d, %d) is not a finite number (%s).", i + 1, j + 1, c[i][j]);
                }
            }
            if (c[i][i] < 0) {
                throw refused("The covariance has a negative variance %s at (%d, %d).", c[i][i], i + 1, i + 1);
            }
        }
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < i; j++) {
                double allowed = SYMMETRY_TOLERANCE * Math.sqrt(c[i][i] * c[j][j]);
                if (Math.abs(c[i][j] - c[j][i]) > allowed) {
                    throw refused("The covariance is not symmetric: entry (%d, %d) is %s but (%d, %d) is %s.", i + 1, j + 1, c[i][j], j + 1, i + 1, c[j][i]);
                }
                s[i][j] = 0.5 * (c[i][j] + c[j][i]);
                s[j][i] = s[i][j];
            }
            s[i][i] = c[i][i];
        }
        return s;
    }
}
