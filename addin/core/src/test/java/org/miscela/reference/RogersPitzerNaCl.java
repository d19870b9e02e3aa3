package org.miscela.reference;

/**
 * Specific volume of aqueous sodium chloride at 100 kPa, from the CRC Handbook of Chemistry and Physics table
 * "Volumetric Properties of Aqueous Sodium Chloride Solutions", after P. S. Z. Rogers and K. S. Pitzer, J. Phys. Chem.
 * Ref. Data 11, 15 (1982). Copied from the project's reference notes (aqueous-solutions.md, nacl-specific-volume.csv),
 * where the table was retrieved from a public copy of the CRC page. Only 0–40 °C are kept: the card's water model
 * (Tanaka et al. 2001) stops at 40 °C, so the 50 °C column of the table is not used.
 */
public final class RogersPitzerNaCl {
    /** Molality of NaCl, mol per kg of water. */
    public static final double[] MOLALITY = {0.100, 0.250, 0.500, 0.750, 1.000, 2.000, 3.000, 4.000, 5.000};
    /** Temperatures of the table's rows, °C. */
    public static final double[] CELSIUS = {0, 10, 20, 25, 30, 40};
    /** Specific volume v in cm³/g, [temperature row][molality column]; density = 1/v. */
    public static final double[][] SPECIFIC_VOLUME = {
        {0.995732, 0.989259, 0.978889, 0.968991, 0.959525, 0.925426, 0.896292, 0.870996, 0.848646},
        {0.995998, 0.989781, 0.979804, 0.970256, 0.961101, 0.927905, 0.899262, 0.874201, 0.851958},
        {0.997620, 0.991564, 0.981833, 0.972505, 0.963544, 0.930909, 0.902565, 0.877643, 0.855469},
        {0.998834, 0.992832, 0.983185, 0.973932, 0.965038, 0.932590, 0.904339, 0.879457, 0.857301},
        {1.000279, 0.994319, 0.984735, 0.975539, 0.966694, 0.934382, 0.906194, 0.881334, 0.859185},
        {1.003796, 0.997883, 0.988374, 0.979243, 0.970455, 0.938287, 0.910145, 0.885276, 0.863108}};
    /** Half a unit in the table's last digit, cm³/g: the table's own rounding. */
    public static final double SPECIFIC_VOLUME_ROUNDING = 0.5e-6;

    /**
     * Molar masses from the CIAAW 2021 abridged standard atomic weights (Prohaska et al., Pure Appl. Chem. 94, 573
     * (2022)) as listed in aqueous-solutions.md: Na 22.990, Cl 35.45, H 1.0080, O 15.999.
     */
    public static final double M_NACL = 22.990 + 35.45;
    public static final double M_WATER = 2 * 1.0080 + 15.999;

    private RogersPitzerNaCl() {
    }

    /** Density in kg/m³ at table row i, column j. */
    public static double density(int i, int j) {
        return 1000.0 / SPECIFIC_VOLUME[i][j];
    }

    /** Mole fraction of NaCl at molality m (mol/kg of water). */
    public static double moleFraction(double m) {
        return m / (m + 1000.0 / M_WATER);
    }

    /** Molarity in mol/L from molality m (mol/kg) and density ρ (kg/m³ = g/L): c = m·ρ/(1000 + m·M). */
    public static double molarity(double m, double rho) {
        return m * rho / (1000.0 + m * M_NACL);
    }
}
