package org.miscela.core.model;

/**
 * A published correlation of a mixture's density as a function of its mass fractions and temperature, written as the
 * specific volume v(w, T) = 1000/ρ in cm³/g (ρ in kg/m³), with its gradient and Hessian in the n mass fractions
 * (treated as independent variables; see {@link ExcessModel} on why the extension off the simplex does not matter).
 * {@link DensityModelVolume} turns it into molar volumes and exact partial molar volumes. Immutable.
 */
public interface MixtureDensityModel {
    int componentCount();

    /**
     * v(w, T) in cm³/g; the gradient ∂v/∂w_k and Hessian ∂²v/∂w_k∂w_l go into the arrays when they are not null
     * (overwritten).
     */
    double specificVolume(double[] w, double kelvin, double[] gradient, double[][] hessian);

    /** The model's name as written on a card. */
    String modelName();

    /**
     * Whether component k's pure state is a limit of the correlation that no real liquid has (a dissolved salt
     * "at w = 1"), so its pure-liquid density must not be used as one.
     */
    boolean hypotheticalPure(int k);
}
