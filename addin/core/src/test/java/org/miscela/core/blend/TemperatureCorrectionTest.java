package org.miscela.core.blend;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Extrapolation;
import org.miscela.reference.AqueousCardsTest;
import org.miscela.reference.RogersPitzerNaCl;

/** Volume correction factors against OIML R 22, Tanaka et al. 2001 and the NaCl table. */
class TemperatureCorrectionTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final CompositionBasis MASS = CompositionBasis.massFraction();

    /**
     * p = 0.5 from 25 °C to 20 °C: ρ(0.5, 25) = 909.770 and ρ(0.5, 20) = 913.771 kg/m³ (OIML R 22, ethanol-water.md),
     * VCF = 909.770/913.771; each density may err by 0.011 + 0.0005 kg/m³.
     */
    @Test
    void ethanolWaterFrom25To20Celsius() {
        TemperatureCorrection c = TemperatureCorrection.between(Cards.ETHANOL_WATER, new double[] {0.5, 0.5}, MASS,
                25, 20, E);
        double tolerance = 2 * (Cards.OIML_DENSITY_TOLERANCE + Cards.OIML_ROUNDING) / 910;
        assertEquals(909.770 / 913.771, c.volumeFactor(), tolerance);
        assertEquals(909.770, c.density(), Cards.OIML_DENSITY_TOLERANCE + Cards.OIML_ROUNDING);
        assertEquals(913.771, c.referenceDensity(), Cards.OIML_DENSITY_TOLERANCE + Cards.OIML_ROUNDING);
        assertEquals(1000 * 909.770 / 913.771, c.referenceVolume(1000), 1000 * tolerance);
        // a measured 909.800 at 25 °C keeps its own level: 909.800 × ρ(20)/ρ(25)
        assertEquals(909.800 * 913.771 / 909.770, c.referenceDensityFromMeasured(909.800), 909.8 * tolerance);
        Figures.note(TemperatureCorrectionTest.class,
                "p = 0.5, 25 -> 20 °C: VCF card %.7f, OIML %.7f", c.volumeFactor(), 909.770 / 913.771);
    }

    /** Pure ethanol 40 °C → 20 °C: 771.932/789.239 (OIML check values); the card's pure density is the formula's. */
    @Test
    void pureEthanolFrom40To20Celsius() {
        TemperatureCorrection c = TemperatureCorrection.between(Cards.ETHANOL_WATER, new double[] {1, 0}, MASS, 40, 20,
                E);
        assertEquals(771.932 / 789.239, c.volumeFactor(), 2 * Cards.OIML_ROUNDING / 771);
    }

    /** Pure water 15 °C → 20 °C by Tanaka et al. 2001 (water.md): 999.1026/998.2067, four decimals. */
    @Test
    void pureWaterFrom15To20Celsius() {
        TemperatureCorrection c = TemperatureCorrection.between(Cards.SODIUM_CHLORIDE, new double[] {0, 1},
                CompositionBasis.moleFraction(), 15, 20, E);
        assertEquals(999.1026 / 998.2067, c.volumeFactor(), 1e-7);
    }

    /** 1 mol/kg NaCl 40 °C → 20 °C: v(20)/v(40) = 0.963544/0.970455 (CRC, Rogers and Pitzer). */
    @Test
    void sodiumChlorideFrom40To20Celsius() {
        TemperatureCorrection c = TemperatureCorrection.between(Cards.SODIUM_CHLORIDE, new double[] {1, Double.NaN},
                CompositionBasis.molality(1), 40, 20, E);
        double tolerance = 2 * AqueousCardsTest.NACL_DENSITY_TOLERANCE / 1030 + 2 * 5e-7;
        assertEquals(RogersPitzerNaCl.SPECIFIC_VOLUME[2][4] / RogersPitzerNaCl.SPECIFIC_VOLUME[5][4], c.volumeFactor(),
                tolerance);
    }
}
