package org.miscela.core.card;

/**
 * What a card states about one component's melting: its melting point T_m, its enthalpy of fusion ΔH_fus at T_m and,
 * optionally, its heat capacity of fusion ΔCp = Cp(liquid) − Cp(solid) (zero when the card gives none), in SI units.
 * Immutable. The solid is taken to be the pure component (no solid solution), as the freezing-point equation assumes.
 */
public final class Fusion {
    private final double meltingKelvin;
    private final double meltingAsStated;
    private final double enthalpy;
    private final double heatCapacity;
    private final boolean heatCapacityStated;

    Fusion(double meltingKelvin, double meltingAsStated, double enthalpy, double heatCapacity,
            boolean heatCapacityStated) {
        this.meltingKelvin = meltingKelvin;
        this.meltingAsStated = meltingAsStated;
        this.enthalpy = enthalpy;
        this.heatCapacity = heatCapacity;
        this.heatCapacityStated = heatCapacityStated;
    }

    /** T_m in kelvin. */
    public double meltingKelvin() {
        return meltingKelvin;
    }

    /** T_m as the card writes it, in the card's temperature unit (returned unchanged for the pure component). */
    public double meltingAsStated() {
        return meltingAsStated;
    }

    /** ΔH_fus at T_m, J/mol. */
    public double enthalpy() {
        return enthalpy;
    }

    /** ΔCp = Cp(liquid) − Cp(solid), J/(mol·K); zero when the card states none. */
    public double heatCapacity() {
        return heatCapacity;
    }

    /** Whether the card states a heat capacity of fusion. */
    public boolean statesHeatCapacity() {
        return heatCapacityStated;
    }
}
