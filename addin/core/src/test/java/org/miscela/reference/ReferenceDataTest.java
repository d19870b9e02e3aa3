package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Our transcription of the OIML R 22 formula against the check values in the project's reference notes. */
class ReferenceDataTest {
    /** ρ(p, 20 °C) check values (kg/m³, 3 decimals) computed from the OIML R 22 formula, ethanol-water.md. */
    @Test
    void oimlFormulaReproducesItsCheckValues() {
        double[] p = {0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1.0};
        double[] rho = {998.201, 981.848, 968.607, 953.784, 935.145, 913.771, 891.098, 867.611, 843.386, 817.883,
            789.239};
        for (int i = 0; i < p.length; i++) {
            assertEquals(rho[i], Oiml22.density(p[i], 20), 0.0006, "p = " + p[i]);
        }
        assertEquals(771.932, Oiml22.density(1, 40), 0.0006);
        assertEquals(784.954, Oiml22.density(1, 25), 0.0006);
        assertEquals(909.770, Oiml22.density(0.5, 25), 0.0006);
    }

    /** Tabulated OIML values quoted by an independent implementation (ethanol-water.md), 2 decimals. */
    @Test
    void oimlFormulaMatchesTabulatedValues() {
        assertEquals(956.42, Oiml22.density(0.31, 13), 0.006);
        assertEquals(848.57, Oiml22.density(0.88, -10), 0.006);
    }
}
