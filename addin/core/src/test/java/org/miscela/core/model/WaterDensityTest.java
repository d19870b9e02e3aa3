package org.miscela.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The built-in water model against published values. */
class WaterDensityTest {
    private static final PureDensity WATER = Tanaka2001WaterDensity.INSTANCE;

    /**
     * Tanaka et al., Metrologia 38, 301 (2001): 998.2067 kg/m³ at 20 °C and 997.0470 at 25 °C; the other points are
     * the check values computed from the paper's coefficients in the project's reference notes (water.md), 4 decimals.
     */
    @Test
    void tanakaCheckValues() {
        double[][] table = {{0, 999.8428}, {4, 999.9749}, {10, 999.7027}, {15, 999.1026}, {20, 998.2067},
            {25, 997.0470}, {30, 995.6488}, {35, 994.0326}, {40, 992.2152}};
        for (double[] row : table) {
            assertEquals(row[1], WATER.at(row[0] + 273.15), 0.00006, row[0] + " °C");
        }
    }

    /** IAPWS-95 (Wagner & Pruß 2002) at 0.101325 MPa; the two formulations agree within 0.002 kg/m³ over 0–40 °C. */
    @Test
    void agreesWithIapws95() {
        assertEquals(998.2072, WATER.at(293.15), 0.002);
        assertEquals(997.0476, WATER.at(298.15), 0.002);
        assertEquals(992.2164, WATER.at(313.15), 0.002);
    }

    /**
     * Kell 1975 (the water of the Laliberté–Cooper model) against two later, independent formulations: Tanaka et al.
     * 2001 from 0 to 40 °C (measured: Kell is 0.0033 kg/m³ lower at 0 °C, the gap closing to 0.0006 at 40 °C;
     * Kell's equation is on the 1968 temperature scale) and the IAPWS-95 release's own check value at 300 K and
     * 0.0992418352 MPa, 996.5560 kg/m³ (Table 7, as copied in several open implementations' tests), within 0.002.
     */
    @Test
    void kellAgreesWithTanakaAndIapws95() {
        for (double t = 0; t <= 40; t += 2.5) {
            assertEquals(WATER.at(t + 273.15), Kell1975WaterDensity.INSTANCE.at(t + 273.15), 0.004, t + " °C");
        }
        assertEquals(996.5560, Kell1975WaterDensity.INSTANCE.at(300.0), 0.002);
        assertEquals(273.15, Kell1975WaterDensity.INSTANCE.lowestKelvin(), 0.0);
        assertEquals(423.15, Kell1975WaterDensity.INSTANCE.highestKelvin(), 0.0);
    }
}
