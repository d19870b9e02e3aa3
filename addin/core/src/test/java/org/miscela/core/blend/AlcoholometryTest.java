package org.miscela.core.blend;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.reference.Oiml22;

/**
 * Composition bases of ethanol + water through the card fitted to the OIML R 22 density formula (International
 * Alcoholometric Tables; Council Directive 76/766/EEC), checked against the formula (test-side transcription
 * {@link Oiml22}, itself checked against the check values in ReferenceDataTest) and the check values of
 * ethanol-water.md.
 *
 * <p>Tolerances follow from the card's fit: its densities lie within δ = 0.011 kg/m³ of the formula and its pure
 * densities are the formula's own. A strength S = 100·p·ρ(p, t)/ρ(1, t) then errs by at most 100·p·δ/ρ(1, t).
 */
class AlcoholometryTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final CompositionBasis MASS = CompositionBasis.massFraction();
    private static final CompositionBasis STRENGTH_20 = CompositionBasis.strength(20, 1);
    private static final double DELTA = Cards.OIML_DENSITY_TOLERANCE;

    static double oimlStrength(double p, double t) {
        return 100 * p * Oiml22.density(p, t) / Oiml22.density(1, t);
    }

    /** Mass fraction of ethanol at which the OIML formula gives the strength S at t (solved on the test side). */
    static double oimlMassFraction(double strength, double t) {
        return new BrentSolver(1e-15, 1e-15).solve(200, p -> oimlStrength(p, t) - strength, 0, 1);
    }

    /** OIML R 22 via ethanol-water.md: p = 0.5 → 57.889 %vol at 20 °C (three decimals). */
    @Test
    void halfMassFractionIs57point889PercentVolume() {
        double[] s = Compositions.convert(CARD, new double[] {0.5, 0.5}, MASS, STRENGTH_20, E);
        assertEquals(57.889, s[0], 100 * 0.5 * DELTA / 789.239 + 0.0005);
    }

    /** And back: 57.889 %vol → p = 0.5, within the strength tolerance over dS/dp ≈ 126 %vol per unit p. */
    @Test
    void strength57point889IsHalfMassFraction() {
        double[] w = Compositions.convert(CARD, new double[] {57.889, Double.NaN}, STRENGTH_20, MASS, E);
        double slope = (oimlStrength(0.501, 20) - oimlStrength(0.499, 20)) / 0.002;
        assertEquals(0.5, w[0], (100 * 0.5 * DELTA / 789.239 + 0.0005) / slope);
        assertEquals(0.5, w[1], (100 * 0.5 * DELTA / 789.239 + 0.0005) / slope);
    }

    /** The formula's strength at 20 °C and 15 °C over p = 0.05..0.95, both directions. */
    @Test
    void strengthFollowsTheFormulaAt20And15Celsius() {
        double worst = 0;
        for (double t : new double[] {20, 15}) {
            CompositionBasis strength = CompositionBasis.strength(t, 1);
            for (int i = 1; i < 20; i++) {
                double p = i / 20.0;
                double tolerance = 100 * p * DELTA / Oiml22.density(1, t);
                double card = Compositions.convert(CARD, new double[] {p, 1 - p}, MASS, strength, E)[0];
                assertEquals(oimlStrength(p, t), card, tolerance, "p = " + p + ", t = " + t);
                worst = Math.max(worst, Math.abs(card - oimlStrength(p, t)));
                double slope = (oimlStrength(p + 1e-4, t) - oimlStrength(p - 1e-4, t)) / 2e-4;
                double back = Compositions.convert(CARD, new double[] {oimlStrength(p, t), Double.NaN}, strength, MASS,
                        E)[0];
                assertEquals(p, back, 1.01 * tolerance / slope, "p = " + p + ", t = " + t);
            }
        }
        Figures.note(AlcoholometryTest.class,
                "strength vs OIML R 22 formula, p = 0.05..0.95 at 20 and 15 °C: worst %.5f %%vol", worst);
    }

    /** The water entry of a strength is water's own %vol; given, it must agree with the ethanol's. */
    @Test
    void waterStrengthIsConsistentWithEthanolStrength() {
        double[] s = Compositions.convert(CARD, new double[] {0.5, 0.5}, MASS, STRENGTH_20, E);
        // 0.5 g water per g of mixture at ρ_w(20) = 998.201 kg/m³ and ρ(0.5, 20) = 913.771 kg/m³ (ethanol-water.md)
        assertEquals(100 * 0.5 * 913.771 / 998.201, s[1], 100 * 0.5 * DELTA / 998.201 + 0.0005);
        double[] w = Compositions.convert(CARD, s, STRENGTH_20, MASS, E);
        assertEquals(0.5, w[0], 1e-12);
        s[1] += 0.01;
        MiscelaException ex = assertRefused(Problem.BALANCE_DISAGREES,
                () -> Compositions.convert(CARD, s, STRENGTH_20, MASS, E));
        assertEquals(true, ex.getMessage().contains("water"), ex.getMessage());
    }

    /** 40 %vol (common practice for spirits) at 20 °C against the formula solved for p. */
    @Test
    void fortyPercentVolume() {
        double p = oimlMassFraction(40, 20);
        double[] w = Compositions.convert(CARD, new double[] {40, Double.NaN}, STRENGTH_20, MASS, E);
        double slope = (oimlStrength(p + 1e-4, 20) - oimlStrength(p - 1e-4, 20)) / 2e-4;
        assertEquals(p, w[0], 1.01 * 100 * p * DELTA / 789.239 / slope);
        Figures.note(AlcoholometryTest.class, "40 %%vol at 20 °C: OIML p = %.6f, card p = %.6f", p, w[0]);
    }

    /**
     * Molarity and mass concentration of ethanol at p = 0.5, 20 °C, from ρ(0.5, 20 °C) = 913.771 kg/m³
     * (ethanol-water.md): c = p·ρ/M = 9.91751 mol/L, γ = p·ρ = 456.8855 g/L; each errs as ρ does.
     */
    @Test
    void molarityAndMassConcentrationAtHalfMassFraction() {
        double tolerance = (DELTA + Cards.OIML_ROUNDING) / 913.771;
        double[] c = Compositions.convert(CARD, new double[] {0.5, 0.5}, MASS, CompositionBasis.molarity(20, 1), E);
        assertEquals(0.5 * 913.771 / Oiml22.M_ETHANOL, c[0], c[0] * tolerance);
        assertEquals(0.5 * 913.771 / Oiml22.M_WATER, c[1], c[1] * tolerance);
        double[] g = Compositions.convert(CARD, new double[] {0.5, 0.5}, MASS,
                CompositionBasis.massConcentration(20, 1), E);
        assertEquals(0.5 * 913.771, g[0], g[0] * tolerance);
        double[] back = Compositions.convert(CARD, new double[] {c[0], Double.NaN}, CompositionBasis.molarity(20, 1),
                MASS, E);
        assertEquals(0.5, back[0], 1e-12);
    }

    /**
     * Molality and volume fraction need no mixture: m = 1000·p/((1 − p)·M_ethanol) and, with the pure densities at
     * 20 °C of ethanol-water.md (789.239 and 998.201 kg/m³), φ = (p/ρ_e)/(p/ρ_e + (1 − p)/ρ_w).
     */
    @Test
    void molalityAndVolumeFraction() {
        double[] m = Compositions.convert(CARD, new double[] {0.5, 0.5}, MASS, CompositionBasis.molality(1), E);
        assertEquals(1000 / Oiml22.M_ETHANOL, m[0], 1e-12 * m[0]);
        assertEquals(1000 / Oiml22.M_WATER, m[1], 1e-12 * m[1]);
        double[] phi = Compositions.convert(CARD, new double[] {0.5, 0.5}, MASS, CompositionBasis.volumeFraction(20),
                E);
        double expected = (0.5 / 789.239) / (0.5 / 789.239 + 0.5 / 998.201);
        assertEquals(expected, phi[0], 1e-6);
        assertEquals(1 - expected, phi[1], 1e-6);
    }

    /** Mole fraction from mass fraction with the OIML molar masses (Oiml22.moleFraction, the same definition). */
    @Test
    void moleFractionFromMassFraction() {
        for (int i = 0; i <= 10; i++) {
            double p = i / 10.0;
            double[] x = Compositions.convert(CARD, new double[] {p, 1 - p}, MASS, CompositionBasis.moleFraction(), E);
            assertEquals(Oiml22.moleFraction(p), x[0], 1e-15);
        }
    }

    static MiscelaException assertRefused(Problem problem, org.junit.jupiter.api.function.Executable call) {
        MiscelaException ex = org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class, call);
        assertEquals(problem, ex.problem(), ex.getMessage());
        return ex;
    }
}
