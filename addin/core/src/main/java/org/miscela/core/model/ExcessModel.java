package org.miscela.core.model;

/**
 * The excess part B^E(x, T) of one extensive property of an n-component mixture, per mole of mixture, with its
 * gradient and Hessian in the mole fractions; the partial molar excess quantities and their slopes follow from those
 * exactly. Implemented by the Redlich–Kister sections ({@link ExcessFunction}) and by the excess volume that a
 * mixture-density model implies ({@link DensityModelVolume}). Internal units; implementations are immutable.
 *
 * <p>The gradient and Hessian treat the n mole fractions as independent variables; only their components along
 * directions inside the simplex are used, where the way a model is extended off the simplex does not matter.
 */
public interface ExcessModel {
    int componentCount();

    /** Whether B^E depends on temperature at fixed composition. */
    boolean temperatureDependent();

    /**
     * B^E (or ∂B^E/∂T when {@code temperatureSlope}) with, optionally, its gradient and Hessian with respect to the
     * mole fractions. The arrays are overwritten; pass null for what is not needed.
     */
    double evaluate(double[] x, double kelvin, boolean temperatureSlope, double[] gradient, double[][] hessian);

    /** B^E at this composition and temperature. */
    default double value(double[] x, double kelvin) {
        return evaluate(x, kelvin, false, null, null);
    }

    /**
     * The partial molar excess quantities B̄_k^E = B^E + ∂B^E/∂x_k − Σ_j x_j·∂B^E/∂x_j into {@code out}; returns B^E.
     */
    default double partials(double[] x, double kelvin, boolean temperatureSlope, double[] out) {
        int n = componentCount();
        double[] g = new double[n];
        double b = evaluate(x, kelvin, temperatureSlope, g, null);
        double mean = 0.0;
        for (int j = 0; j < n; j++) {
            mean += x[j] * g[j];
        }
        for (int k = 0; k < n; k++) {
            out[k] = b + g[k] - mean;
        }
        return b;
    }

    /**
     * The derivatives of every B̄_k^E along a composition direction v (Σ v_j = 0 stays inside the simplex):
     * dB̄_k = (H·v)_k − Σ_j x_j (H·v)_j, with H the Hessian of B^E. Used to check Gibbs–Duhem, Σ x_k dB̄_k = 0.
     */
    default void partialSlopes(double[] x, double kelvin, double[] direction, double[] out) {
        int n = componentCount();
        double[][] h = new double[n][n];
        evaluate(x, kelvin, false, null, h);
        double mean = 0.0;
        for (int k = 0; k < n; k++) {
            double hv = 0.0;
            for (int j = 0; j < n; j++) {
                hv += h[k][j] * direction[j];
            }
            out[k] = hv;
            mean += x[k] * hv;
        }
        for (int k = 0; k < n; k++) {
            out[k] -= mean;
        }
    }
}
