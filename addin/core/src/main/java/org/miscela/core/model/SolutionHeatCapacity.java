package org.miscela.core.model;

/**
 * The heat capacity of an aqueous solution by Laliberté's mixing rule (J. Chem. Eng. Data 54 (2009) 1725–1760): the
 * specific heat capacity is w_w·Cp_w(t) + Σ_i w_i·Cp_app,i(t, w_w), summed over the solutes i with their
 * {@link ApparentHeatCapacity}, w the mass fractions and w_w the water's. Here Cp_w is the card's own heat capacity of
 * the solvent (its molar one divided by its molar mass), so the solution's heat capacity at w_w = 1 is exactly the
 * card's pure water.
 *
 * <p>The partial molar heat capacities follow from the total C = m_w·Cp_w + Σ_i m_i·Cp_app,i(w_w) of masses m (g):
 * with S = Σ_i w_i·∂Cp_app,i/∂w_w, ∂C/∂m_w = Cp_w + S·(1 − w_w) and ∂C/∂m_j = Cp_app,j − S·w_w, times each molar
 * mass; they add up to C (Σ m_k·∂C/∂m_k = C, since Σ_k m_k·∂w_w/∂m_k = 0). Immutable.
 */
public final class SolutionHeatCapacity {
    private final int solvent;
    private final double[] molarMass;
    private final ApparentHeatCapacity[] solutes;

    /**
     * @param solvent the water's index
     * @param molarMass every component's molar mass, g/mol
     * @param solutes each component's apparent heat capacity, null at the solvent's index (and only there)
     */
    public SolutionHeatCapacity(int solvent, double[] molarMass, ApparentHeatCapacity[] solutes) {
        if (solutes.length != molarMass.length || solutes[solvent] != null) {
            throw new IllegalArgumentException("one apparent heat capacity per solute, none for the solvent");
        }
        for (int k = 0; k < solutes.length; k++) {
            if (k != solvent && solutes[k] == null) {
                throw new IllegalArgumentException("component " + k + " has no apparent heat capacity");
            }
        }
        this.solvent = solvent;
        this.molarMass = molarMass.clone();
        this.solutes = solutes.clone();
    }

    /** The water's index. */
    public int solvent() {
        return solvent;
    }

    /** Cp of the solution, J/(mol·K), at mole fractions x; {@code solventMolar} is the pure water's J/(mol·K). */
    public double molar(double[] x, double kelvin, double solventMolar) {
        double[] w = massFractions(x);
        double meanMolarMass = meanMolarMass(x);
        double celsius = kelvin - 273.15;
        double specific = w[solvent] * solventMolar / molarMass[solvent];
        for (int i = 0; i < x.length; i++) {
            if (i != solvent && w[i] != 0.0) {
                specific += w[i] * solutes[i].at(celsius, w[solvent]);
            }
        }
        return specific * meanMolarMass;
    }

    /** The partial molar heat capacities, J/(mol·K), into {@code out}; returns the solution's molar Cp. */
    public double partials(double[] x, double kelvin, double solventMolar, double[] out) {
        double[] w = massFractions(x);
        double celsius = kelvin - 273.15;
        double ww = w[solvent];
        double slope = 0.0;
        for (int i = 0; i < x.length; i++) {
            if (i != solvent) {
                slope += solutes[i].solutionSlope(celsius, ww, w[i]);
            }
        }
        double solventSpecific = solventMolar / molarMass[solvent];
        for (int k = 0; k < x.length; k++) {
            double perGram = k == solvent ? solventSpecific + slope * (1.0 - ww)
                    : solutes[k].at(celsius, ww) - slope * ww;
            out[k] = perGram * molarMass[k];
        }
        return molar(x, kelvin, solventMolar);
    }

    private double meanMolarMass(double[] x) {
        double m = 0.0;
        for (int k = 0; k < x.length; k++) {
            m += x[k] * molarMass[k];
        }
        return m;
    }

    private double[] massFractions(double[] x) {
        double m = meanMolarMass(x);
        double[] w = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            w[k] = x[k] * molarMass[k] / m;
        }
        return w;
    }
}
