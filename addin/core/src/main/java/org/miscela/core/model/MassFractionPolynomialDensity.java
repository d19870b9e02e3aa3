package org.miscela.core.model;

/**
 * The density of a two-component mixture as a double polynomial in the mass fraction w of one component and the
 * temperature: ρ(w, T) = Σ_j Σ_i a_ji·w^i·(T − T_ref)^j, in kg/m³ and kelvin. The form of the OIML R 22 (1975)
 * formula for ethanol + water (there w is the ethanol mass fraction, T_ref = 20 °C, and the a_0i, a_j0 and a_ji are
 * its A, B and C coefficients) and of many published ρ(w, T) correlations. Both pure liquids are real: ρ(0, T) and
 * ρ(1, T) are their densities. Immutable.
 */
public final class MassFractionPolynomialDensity implements MixtureDensityModel {
    public static final String NAME = "mass fraction polynomial";

    private final int component;
    private final double referenceKelvin;
    private final double[][] a;

    /**
     * @param component the component (0 or 1) whose mass fraction is w
     * @param a a[j][i] multiplies w^i·(T − T_ref)^j, in kg/m³ per K^j
     */
    public MassFractionPolynomialDensity(int component, double referenceKelvin, double[][] a) {
        if (component != 0 && component != 1) {
            throw new IllegalArgumentException("a two-component model");
        }
        this.component = component;
        this.referenceKelvin = referenceKelvin;
        this.a = new double[a.length][];
        for (int j = 0; j < a.length; j++) {
            this.a[j] = a[j].clone();
        }
    }

    @Override
    public int componentCount() {
        return 2;
    }

    @Override
    public String modelName() {
        return NAME;
    }

    @Override
    public boolean hypotheticalPure(int k) {
        return false;
    }

    /** The component whose mass fraction is the polynomial's variable. */
    public int component() {
        return component;
    }

    /** ρ, ∂ρ/∂w and ∂²ρ/∂w² at (w, T) into {@code out}. */
    public void density(double w, double kelvin, double[] out) {
        double dt = kelvin - referenceKelvin;
        double rho = 0.0;
        double d1 = 0.0;
        double d2 = 0.0;
        double tj = 1.0;
        for (double[] row : a) {
            // Horner in w for the value and both derivatives
            double p = 0.0;
            double p1 = 0.0;
            double p2 = 0.0;
            for (int i = row.length - 1; i >= 0; i--) {
                p2 = p2 * w + 2.0 * p1;
                p1 = p1 * w + p;
                p = p * w + row[i];
            }
            rho += tj * p;
            d1 += tj * p1;
            d2 += tj * p2;
            tj *= dt;
        }
        out[0] = rho;
        out[1] = d1;
        out[2] = d2;
    }

    @Override
    public double specificVolume(double[] w, double kelvin, double[] gradient, double[][] hessian) {
        double[] r = new double[3];
        density(w[component], kelvin, r);
        double v = 1000.0 / r[0];
        if (gradient != null) {
            java.util.Arrays.fill(gradient, 0.0);
            gradient[component] = -1000.0 * r[1] / (r[0] * r[0]);
        }
        if (hessian != null) {
            for (double[] row : hessian) {
                java.util.Arrays.fill(row, 0.0);
            }
            hessian[component][component] = 1000.0 * (2.0 * r[1] * r[1] / r[0] - r[2]) / (r[0] * r[0]);
        }
        return v;
    }
}
