package org.miscela.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The model's own rules, from values: the ions a formula unit gives, the Debye–Hückel limiting law as the salt
 * vanishes, the series' range, the temperature function's terms, and the constructor's guards. The parameters are
 * invented (β0 = 0.1, β1 = 0.3, C^φ = 0.002), except where a published value is named.
 */
class PitzerOsmoticTest {
    private static final double[][] CONSTANT = {{0.1}, {0.3}, {0.002}};

    private static PitzerOsmotic salt(int zM, int zX, double[][] terms) {
        return new PitzerOsmotic(1, 0, 18.015, zM, zX, terms, Double.NaN, Double.NaN, 0.1);
    }

    @Test
    void ionsPerFormulaUnit() {
        assertEquals(2, salt(1, 1, CONSTANT).ions());
        assertEquals(3, salt(2, 1, CONSTANT).ions());
        assertEquals(3, salt(1, 2, CONSTANT).ions());
        assertEquals(4, salt(3, 1, CONSTANT).ions());
    }

    /**
     * As the salt vanishes, (φ − 1)/√I tends to −|z_M·z_X|·A_φ (the Debye–Hückel limiting law): within 0.2 % at
     * I = 10⁻⁸ for a 1:1 and a 2:1 salt; and the parameters' terms matter only away from that limit.
     */
    @Test
    void debyeHuckelLimitingLaw() {
        double t = 298.15;
        double aPhi = PitzerOsmotic.debyeHuckel(t);
        for (int zM = 1; zM <= 2; zM++) {
            PitzerOsmotic o = salt(zM, 1, CONSTANT);
            double m = 1e-8;
            double ionic = 0.5 * m * (1 * zM * zM + zM * 1);
            double slope = (o.osmoticCoefficient(m, t) - 1) / Math.sqrt(ionic);
            assertEquals(-zM * aPhi, slope, 0.002 * zM * aPhi, "z_M = " + zM);
        }
    }

    /** The water's ln a is −φ·ν·m·M_w, from the mole fractions: m = x_salt/(x_w·M_w), here x_salt = 0.01. */
    @Test
    void waterActivityFromTheOsmoticCoefficient() {
        PitzerOsmotic o = salt(2, 1, CONSTANT);
        double[] x = {0.01, 0.99};
        double m = 0.01 / (0.99 * 0.018015);
        assertEquals(m, o.molality(x), 1e-12);
        assertEquals(-o.osmoticCoefficient(m, 280) * 3 * m * 0.018015, o.lnWaterActivity(x, 280), 1e-15);
        assertEquals(0.0, o.lnWaterActivity(new double[] {0, 1}, 280));
        // the ideal solution of the ions: ln of the water's share among water and ions
        assertEquals(Math.log(0.99 / (0.99 + 3 * 0.01)), o.lnIdealWaterActivity(x), 1e-15);
    }

    /** Each term of p(T) = a0 + a1(1/T − 1/T_r) + a2 ln(T/T_r) + a3(T − T_r) + a4(T² − T_r²) + a5(1/T² − 1/T_r²). */
    @Test
    void temperatureFunction() {
        double r = 298.15;
        double t = 260;
        double[] a = {0.5, 2, 3, 4, 5, 6};
        double expected = 0.5 + 2 * (1 / t - 1 / r) + 3 * Math.log(t / r) + 4 * (t - r) + 5 * (t * t - r * r)
                + 6 * (1 / (t * t) - 1 / (r * r));
        PitzerOsmotic o = salt(1, 1, new double[][] {a, {0.3}, {0.002, 0, 0, 1e-4}});
        assertEquals(expected, o.parameter(0, t), 1e-9);
        assertEquals(0.3, o.parameter(1, t));
        assertEquals(0.002 + 1e-4 * (t - r), o.parameter(2, t), 1e-15);
        assertEquals(0.5, o.parameter(0, r), 1e-15);
    }

    /** A_φ is the series' only within its fitted range, 234.15 to 373.15 K; NaN outside (the callers refuse). */
    @Test
    void theSeriesRange() {
        assertTrue(Double.isFinite(PitzerOsmotic.debyeHuckel(234.15)));
        assertTrue(Double.isFinite(PitzerOsmotic.debyeHuckel(373.15)));
        assertTrue(Double.isNaN(PitzerOsmotic.debyeHuckel(234.14)));
        assertTrue(Double.isNaN(PitzerOsmotic.debyeHuckel(373.16)));
    }

    @Test
    void guards() {
        assertThrows(IllegalArgumentException.class, () -> salt(2, 2, CONSTANT));
        assertThrows(IllegalArgumentException.class, () -> salt(0, 1, CONSTANT));
        assertThrows(IllegalArgumentException.class, () -> salt(1, 4, CONSTANT));
        assertThrows(IllegalArgumentException.class, () -> salt(4, 1, CONSTANT));
        assertThrows(IllegalArgumentException.class, () -> salt(1, 0, CONSTANT));
        assertThrows(IllegalArgumentException.class, () -> salt(1, 1, new double[][] {{0.1}, {0.3}}));
        assertThrows(IllegalArgumentException.class, () -> salt(1, 1, new double[][] {{0.1}, {}, {0.002}}));
        assertThrows(IllegalArgumentException.class,
                () -> salt(1, 1, new double[][] {{0.1}, {1, 2, 3, 4, 5, 6, 7}, {0.002}}));
        PitzerOsmotic ranged = new PitzerOsmotic(0, 1, 18.015, 1, 1, CONSTANT, 213.15, 298.15, 0.08);
        assertTrue(ranged.hasRange());
        assertEquals(213.15, ranged.lowestKelvin());
        assertEquals(298.15, ranged.highestKelvin());
        assertEquals(0.08, ranged.iceLimit());
        assertEquals(0, ranged.solvent());
        assertEquals(1, ranged.solute());
        assertTrue(!salt(1, 1, CONSTANT).hasRange());
    }
}
