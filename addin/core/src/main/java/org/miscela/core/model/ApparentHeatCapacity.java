package org.miscela.core.model;

/**
 * The apparent specific heat capacity of one solute in water by the model of Laliberté (M. Laliberté, "A Model for
 * Calculating the Heat Capacity of Aqueous Solutions, with Updated Density and Viscosity Data", J. Chem. Eng. Data
 * 54 (2009) 1725–1760):
 *
 * <pre>
 *   Cp_app = a1·exp(α) + a5·(1 − w_w)^a6,   α = a2·t + a3·exp(0.01·t) + a4·(1 − w_w)
 * </pre>
 *
 * in J/(g·K), with t the temperature in °C and w_w the mass fraction of water in the solution. The solution's specific
 * heat capacity is then w_w·Cp_w(t) + Σ_i w_i·Cp_app,i ({@link SolutionHeatCapacity}). Immutable.
 */
public final class ApparentHeatCapacity {
    private final double a1;
    private final double a2;
    private final double a3;
    private final double a4;
    private final double a5;
    private final double a6;

    public ApparentHeatCapacity(double[] a) {
        if (a.length != 6) {
            throw new IllegalArgumentException("the model takes six parameters a1..a6");
        }
        this.a1 = a[0];
        this.a2 = a[1];
        this.a3 = a[2];
        this.a4 = a[3];
        this.a5 = a[4];
        this.a6 = a[5];
    }

    /** Cp_app in J/(g·K) at t (°C) and water mass fraction {@code waterFraction}. */
    public double at(double celsius, double waterFraction) {
        double s = 1.0 - waterFraction;
        return a1 * Math.exp(a2 * celsius + a3 * Math.exp(0.01 * celsius) + a4 * s) + a5 * Math.pow(s, a6);
    }

    /**
     * ∂Cp_app/∂w_w in J/(g·K) at t (°C): −a4·a1·exp(α) − a5·a6·(1 − w_w)^(a6 − 1). At w_w = 1 the second term is
     * infinite for a6 &lt; 1; every use multiplies it by a solute's mass fraction, so {@link #solutionSlope} is used
     * instead there.
     */
    public double slope(double celsius, double waterFraction) {
        double s = 1.0 - waterFraction;
        return -a4 * a1 * Math.exp(a2 * celsius + a3 * Math.exp(0.01 * celsius) + a4 * s)
                - a5 * a6 * Math.pow(s, a6 - 1.0);
    }

    /**
     * w_i·∂Cp_app/∂w_w for a solute at mass fraction {@code soluteFraction}: finite at infinite dilution, where it is
     * 0 (for a6 &gt; 0) though the slope alone is not.
     */
    public double solutionSlope(double celsius, double waterFraction, double soluteFraction) {
        if (soluteFraction == 0.0) {
            return 0.0;
        }
        double s = 1.0 - waterFraction;
        return -soluteFraction * a4 * a1 * Math.exp(a2 * celsius + a3 * Math.exp(0.01 * celsius) + a4 * s)
                - a5 * a6 * soluteFraction * Math.pow(s, a6 - 1.0);
    }
}
