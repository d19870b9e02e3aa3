package org.miscela.reference;

/**
 * Density of aqueous sulfuric acid at 20 °C: CRC Handbook of Chemistry and Physics, "Concentrative Properties of
 * Aqueous Solutions" (via a public reproduction), as copied into the project's reference notes
 * (aqueous-solutions.md). Mass percent of H2SO4 and density in g/cm³, four decimals.
 */
public final class CrcSulfuricAcid {
    public static final double[] MASS_PERCENT = {1, 5, 10, 20, 30, 40, 50, 70, 100};
    public static final double[] DENSITY_G_PER_CM3 = {1.0049, 1.0318, 1.0661, 1.1398, 1.2191, 1.3028, 1.3952, 1.6105,
        1.8305};
    /** Half a unit of the table's last digit, kg/m³. */
    public static final double ROUNDING = 0.05;
    /**
     * Molar masses from the CIAAW 2021 abridged standard atomic weights (Prohaska et al., Pure Appl. Chem. 94, 573
     * (2022)) as listed in aqueous-solutions.md: H 1.0080, S 32.06, O 15.999.
     */
    public static final double M_ACID = 2 * 1.0080 + 32.06 + 4 * 15.999;
    public static final double M_WATER = 2 * 1.0080 + 15.999;

    private CrcSulfuricAcid() {
    }

    /** Mole fraction of acid at mass fraction w. */
    public static double moleFraction(double w) {
        double a = w / M_ACID;
        return a / (a + (1.0 - w) / M_WATER);
    }
}
