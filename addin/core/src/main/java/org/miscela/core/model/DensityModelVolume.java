package org.miscela.core.model;

/**
 * The excess molar volume a {@link MixtureDensityModel} implies: V_m(x, T) = M̄·v(w, T) with M̄ = Σ x_k M_k and
 * w_k = x_k M_k/M̄, less Σ x_k V_k*, where V_k* = M_k·v(e_k, T) is the model's own pure-component limit (so V^E is
 * zero at every corner and the density the functions give is the model's, to rounding). Exact derivatives: with V
 * extended as the homogeneous function m(n)·v(w(n)) of the amounts,
 *
 * <pre>
 *   ∂V/∂n_k = M_k·(v + v_k − Σ_j w_j v_j),
 *   ∂²V/∂n_k∂n_l = (M_k M_l / m)·(v_kl − (Hw)_k − (Hw)_l + wᵀHw),
 * </pre>
 *
 * v_k and v_kl (H) being the model's gradient and Hessian in the mass fractions. Immutable.
 */
public final class DensityModelVolume implements ExcessModel {
    private final MixtureDensityModel model;
    private final double[] molarMass;

    /** @param molarMass g/mol, in the card's component order */
    public DensityModelVolume(MixtureDensityModel model, double[] molarMass) {
        if (model.componentCount() != molarMass.length) {
            throw new IllegalArgumentException("one molar mass per component");
        }
        this.model = model;
        this.molarMass = molarMass.clone();
    }

    public MixtureDensityModel model() {
        return model;
    }

    @Override
    public int componentCount() {
        return molarMass.length;
    }

    @Override
    public boolean temperatureDependent() {
        return true;
    }

    /** V_k* = M_k·v(e_k, T), cm³/mol: the model's limit for component k alone. */
    public double pureMolarVolume(int k, double kelvin) {
        double[] w = new double[molarMass.length];
        w[k] = 1.0;
        return molarMass[k] * model.specificVolume(w, kelvin, null, null);
    }

    @Override
    public double evaluate(double[] x, double kelvin, boolean temperatureSlope, double[] gradient,
            double[][] hessian) {
        if (temperatureSlope) {
            throw new UnsupportedOperationException("the temperature slope of a volume is not used");
        }
        int n = molarMass.length;
        double m = 0.0;
        for (int k = 0; k < n; k++) {
            m += x[k] * molarMass[k];
        }
        double[] w = new double[n];
        for (int k = 0; k < n; k++) {
            w[k] = x[k] * molarMass[k] / m;
        }
        double[] g = gradient == null && hessian == null ? null : new double[n];
        double[][] h = hessian == null ? null : new double[n][n];
        double v = model.specificVolume(w, kelvin, g, h);
        double excess = m * v;
        double[] pure = new double[n];
        for (int k = 0; k < n; k++) {
            pure[k] = pureMolarVolume(k, kelvin);
            excess -= x[k] * pure[k];
        }
        if (gradient != null) {
            double wg = 0.0;
            for (int j = 0; j < n; j++) {
                wg += w[j] * g[j];
            }
            for (int k = 0; k < n; k++) {
                gradient[k] = molarMass[k] * (v + g[k] - wg) - pure[k];
            }
        }
        if (hessian != null) {
            double[] hw = new double[n];
            double whw = 0.0;
            for (int k = 0; k < n; k++) {
                for (int l = 0; l < n; l++) {
                    hw[k] += h[k][l] * w[l];
                }
                whw += w[k] * hw[k];
            }
            for (int k = 0; k < n; k++) {
                for (int l = 0; l < n; l++) {
                    hessian[k][l] = molarMass[k] * molarMass[l] / m * (h[k][l] - hw[k] - hw[l] + whw);
                }
            }
        }
        return excess;
    }
}
