package org.miscela.reference;

/**
 * Integral heats of solution of sulfuric acid in water at 298.15 K from the NBS tables (Wagman et al., "The NBS
 * tables of chemical thermodynamic properties", J. Phys. Chem. Ref. Data 11, Suppl. 2 (1982)), as quoted in a
 * general chemistry text: Δ_fH° of H2SO4 in n mol H2O, kJ/mol. The integral heat of solution per mole of acid is the
 * difference from the pure liquid, e.g. −880.5 − (−814.0) = −66.5 kJ/mol at n = 10.
 */
public final class NbsSulfuricAcid {
    /** Moles of water per mole of acid. */
    public static final double[] WATER_PER_ACID = {1, 10, 50, 100, 500, 1000};
    /** Δ_fH° of H2SO4 in n H2O, kJ/mol, for the n above. */
    public static final double[] FORMATION = {-841.8, -880.5, -886.8, -887.7, -890.5, -892.3};
    /** Δ_fH° of pure liquid H2SO4, kJ/mol. */
    public static final double PURE = -814.0;
    /** Δ_fH° at infinite dilution, kJ/mol. */
    public static final double INFINITE_DILUTION = -909.3;
    /** Resolution of the printed values, kJ/mol. */
    public static final double RESOLUTION = 0.1;

    private NbsSulfuricAcid() {
    }

    /** Integral heat of solution of 1 mol acid in n mol water, kJ. */
    public static double heatOfSolution(int i) {
        return FORMATION[i] - PURE;
    }
}
