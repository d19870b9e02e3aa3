package org.miscela.core.model;

/**
 * The density of an aqueous solution of one or more solutes by the apparent-specific-volume model of Laliberté and
 * Cooper (M. Laliberté, W. E. Cooper, "Model for Calculating the Density of Aqueous Electrolyte Solutions",
 * J. Chem. Eng. Data 49 (2004) 1141–1151; parameters updated in M. Laliberté, J. Chem. Eng. Data 54 (2009)
 * 1725–1760):
 *
 * <pre>
 *   1/ρ = w_w/ρ_w(t) + Σ_i w_i/ρ_app,i,   ρ_app,i = (c0·s + c1)·exp(10⁻⁶·(t + c4)²) / (s + c2 + c3·t)
 * </pre>
 *
 * with ρ in kg/m³, t in °C, w_w the water's mass fraction, w_i each solute's and s = 1 − w_w = Σ_i w_i the total
 * solute fraction. The solvent's density ρ_w(t) is the card's own model for it (the authors used Kell's 1975
 * equation, {@link Kell1975WaterDensity}). A solute alone (s = 1) is the model's limit, not a liquid:
 * {@link #hypotheticalPure} says so. Immutable.
 */
public final class ApparentVolumeDensity implements MixtureDensityModel {
    public static final String NAME = "Laliberté–Cooper 2004";

    private final int solvent;
    private final PureDensity water;
    /** c[k] = {c0, c1, c2, c3, c4} for every solute k; null at the solvent. */
    private final double[][] c;

    public ApparentVolumeDensity(int solvent, PureDensity water, double[][] parameters) {
        this.solvent = solvent;
        this.water = water;
        this.c = new double[parameters.length][];
        for (int k = 0; k < parameters.length; k++) {
            if (k != solvent) {
                if (parameters[k].length != 5) {
                    throw new IllegalArgumentException("five parameters c0..c4 per solute");
                }
                c[k] = parameters[k].clone();
            }
        }
    }

    @Override
    public int componentCount() {
        return c.length;
    }

    @Override
    public String modelName() {
        return NAME;
    }

    @Override
    public boolean hypotheticalPure(int k) {
        return k != solvent;
    }

    public int solvent() {
        return solvent;
    }

    /** The solvent's density model. */
    public PureDensity water() {
        return water;
    }

    /** ρ_app of solute k (kg/m³) at a total solute fraction s and t in °C. */
    public double apparentDensity(int k, double s, double celsius) {
        double[] p = c[k];
        return (p[0] * s + p[1]) * Math.exp(1e-6 * (celsius + p[4]) * (celsius + p[4])) / (s + p[2] + p[3] * celsius);
    }

    @Override
    public double specificVolume(double[] w, double kelvin, double[] gradient, double[][] hessian) {
        int n = c.length;
        double t = kelvin - 273.15;
        double s = 0.0;
        for (int k = 0; k < n; k++) {
            if (k != solvent) {
                s += w[k];
            }
        }
        double vw = 1000.0 / water.at(kelvin);
        // u_k(s) = 1000/ρ_app,k and its first two derivatives in s
        double[] u = new double[n];
        double[] u1 = new double[n];
        double[] u2 = new double[n];
        double v = w[solvent] * vw;
        double p1 = 0.0;
        double p2 = 0.0;
        for (int k = 0; k < n; k++) {
            if (k == solvent) {
                continue;
            }
            double[] p = c[k];
            double e = Math.exp(1e-6 * (t + p[4]) * (t + p[4]));
            double q = p[0] * s + p[1];
            double b = p[1] - p[0] * (p[2] + p[3] * t);
            u[k] = 1000.0 * (s + p[2] + p[3] * t) / (q * e);
            u1[k] = 1000.0 * b / (e * q * q);
            u2[k] = -2.0 * p[0] * u1[k] / q;
            v += w[k] * u[k];
            p1 += w[k] * u1[k];
            p2 += w[k] * u2[k];
        }
        if (gradient != null) {
            for (int k = 0; k < n; k++) {
                gradient[k] = k == solvent ? vw : u[k] + p1;
            }
        }
        if (hessian != null) {
            for (int k = 0; k < n; k++) {
                for (int l = 0; l < n; l++) {
                    hessian[k][l] = k == solvent || l == solvent ? 0.0 : u1[k] + u1[l] + p2;
                }
            }
        }
        return v;
    }
}
