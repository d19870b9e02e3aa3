package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/**
 * The card units against their definitions (SI Brochure, 9th edition: T/K = t/°C + 273.15; 1 L = 1 dm³ = 1000 cm³;
 * 1 m³ = 10⁶ cm³; 1 g/cm³ = 1000 kg/m³; 1 kg = 1000 g; 1 kJ = 1000 J), their symbols and spellings as
 * docs/card-format.md lists them, and value semantics (equal units are equal and hash alike).
 */
class UnitsTest {
    @Test
    void conversionsAreTheSiDefinitions() {
        assertEquals(298.15, Units.Temperature.CELSIUS.toKelvin(25.0), 1e-12);
        assertEquals(25.0, Units.Temperature.CELSIUS.fromKelvin(298.15), 1e-12);
        assertEquals(-273.15, Units.Temperature.CELSIUS.fromKelvin(0.0), 0.0);
        assertEquals(310.0, Units.Temperature.KELVIN.toKelvin(310.0), 0.0);
        assertEquals(310.0, Units.Temperature.KELVIN.fromKelvin(310.0), 0.0);
        assertEquals(997.0, Units.Density.G_PER_CM3.toKgPerM3(0.997), 1e-12);
        assertEquals(0.997, Units.Density.G_PER_CM3.fromKgPerM3(997.0), 1e-15);
        assertEquals(997.0, Units.Density.KG_PER_M3.fromKgPerM3(997.0), 0.0);
        assertEquals(18.0, Units.MolarVolume.L_PER_MOL.toCm3PerMol(0.018), 1e-12);
        assertEquals(0.018, Units.MolarVolume.L_PER_MOL.fromCm3PerMol(18.0), 1e-15);
        assertEquals(18.0, Units.MolarVolume.M3_PER_MOL.toCm3PerMol(18.0e-6), 1e-12);
        assertEquals(18.0e-6, Units.MolarVolume.M3_PER_MOL.fromCm3PerMol(18.0), 1e-18);
        assertEquals(18.015, Units.MolarMass.KG_PER_MOL.toGramPerMol(0.018015), 1e-12);
        assertEquals(18.015, Units.MolarMass.G_PER_MOL.toGramPerMol(18.015), 0.0);
        assertEquals(-1500.0, Units.MolarEnthalpy.KJ_PER_MOL.toJoulePerMol(-1.5), 1e-12);
        assertEquals(-1.5, Units.MolarEnthalpy.KJ_PER_MOL.fromJoulePerMol(-1500.0), 1e-15);
    }

    @Test
    void symbolsAndSpellings() {
        assertEquals("°C", Units.Temperature.CELSIUS.symbol());
        assertEquals("K", Units.Temperature.KELVIN.symbol());
        assertEquals("g/cm³", Units.Density.G_PER_CM3.symbol());
        assertEquals("L/mol", Units.MolarVolume.L_PER_MOL.symbol());
        assertEquals("kg/mol", Units.MolarMass.KG_PER_MOL.symbol());
        assertEquals("kJ/mol", Units.MolarEnthalpy.KJ_PER_MOL.symbol());
        assertEquals("J", Units.MolarEnthalpy.J_PER_MOL.energySymbol());
        assertEquals("kJ", Units.MolarEnthalpy.KJ_PER_MOL.energySymbol());
        assertEquals(Units.Temperature.CELSIUS, Units.lookup(Units.Temperature.class, " degC "));
        assertEquals(Units.MolarVolume.L_PER_MOL, Units.lookup(Units.MolarVolume.class, "dm3/mol"));
        assertNull(Units.lookup(Units.Density.class, "KG/M3"), "spellings are matched exactly, case included");
        assertEquals("°C (or ºC, ˚C, ℃, degC, C); K; °F (or ºF, ˚F, ℉, degF, F)",
                Units.accepted(Units.Temperature.class));
        assertEquals("J/mol; kJ/mol", Units.accepted(Units.MolarEnthalpy.class));
    }

    @Test
    void unitsAreValues() {
        Units a = new Units(Units.Temperature.CELSIUS, Units.Density.G_PER_CM3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.KG_PER_MOL, Units.MolarEnthalpy.KJ_PER_MOL);
        Units b = new Units(Units.Temperature.CELSIUS, Units.Density.G_PER_CM3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.KG_PER_MOL, Units.MolarEnthalpy.KJ_PER_MOL);
        assertEquals(a, b);
        assertEquals(a.hashCode(), b.hashCode());
        assertEquals("°C, g/cm³, L/mol, kg/mol, kJ/mol", a.toString());
        Units noEnthalpy = new Units(Units.Temperature.CELSIUS, Units.Density.G_PER_CM3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.KG_PER_MOL);
        assertEquals("°C, g/cm³, L/mol, kg/mol", noEnthalpy.toString());
        assertNotEquals(a, noEnthalpy);
        assertNotEquals(a, new Units(Units.Temperature.KELVIN, Units.Density.G_PER_CM3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.KG_PER_MOL, Units.MolarEnthalpy.KJ_PER_MOL));
        assertNotEquals(a, new Units(Units.Temperature.CELSIUS, Units.Density.KG_PER_M3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.KG_PER_MOL, Units.MolarEnthalpy.KJ_PER_MOL));
        assertNotEquals(a, new Units(Units.Temperature.CELSIUS, Units.Density.G_PER_CM3,
                Units.MolarVolume.CM3_PER_MOL, Units.MolarMass.KG_PER_MOL, Units.MolarEnthalpy.KJ_PER_MOL));
        assertNotEquals(a, new Units(Units.Temperature.CELSIUS, Units.Density.G_PER_CM3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.G_PER_MOL, Units.MolarEnthalpy.KJ_PER_MOL));
        assertNotEquals(a, new Units(Units.Temperature.CELSIUS, Units.Density.G_PER_CM3, Units.MolarVolume.L_PER_MOL,
                Units.MolarMass.KG_PER_MOL, Units.MolarEnthalpy.J_PER_MOL));
        assertFalse(a.equals("°C, g/cm³, L/mol, kg/mol, kJ/mol"));
    }
}
