package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.reference.Oiml22;

/**
 * Batch totals and additions of ethanol + water through the OIML card, against the OIML R 22 check values of
 * ethanol-water.md: ρ(0.5, 20 °C) = 913.771, ρ(1, 20 °C) = 789.239, ρ(0, 20 °C) = 998.201, ρ(1, 25 °C) = 784.954,
 * ρ(0.4, 20 °C) = 935.145 kg/m³. A volume V = m/ρ errs relatively as ρ: by (0.011 + 0.0005)/ρ for a mixture, by the
 * check value's rounding 0.0005/ρ alone for a pure liquid (the card's pure densities are the formula's).
 */
class BatchesTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double MIX = Cards.OIML_DENSITY_TOLERANCE + Cards.OIML_ROUNDING;

    /** 50 g + 50 g at 20 °C: V = 100/0.913771 = 109.4366 mL; pure volumes 63.3522 + 50.0901 mL; 3.53 % contraction. */
    @Test
    void fiftyGramsEachAt20Celsius() {
        BatchTotals b = Batches.totals(CARD, Amounts.of(new double[] {50, 50}, AmountUnit.G), 20, E);
        double v = 100 / 0.913771;
        double pure = 50 / 0.789239 + 50 / 0.998201;
        assertEquals(v, b.volume(AmountUnit.ML), v * MIX / 913.771);
        assertEquals(pure, b.pureVolume(AmountUnit.ML), 50 / 0.789239 * Cards.OIML_ROUNDING / 789.239
                + 50 / 0.998201 * Cards.OIML_ROUNDING / 998.201);
        double contraction = pure - v;
        double tolerance = v * MIX / 913.771 + 1e-4;
        assertEquals(contraction, b.contraction(AmountUnit.ML), tolerance);
        assertEquals(100 * contraction / pure, b.contractionPercent(), 100 * tolerance / pure);
        assertEquals(913.771, b.density(), MIX);
        assertEquals(100, b.mass(AmountUnit.G), 1e-12);
        assertEquals(0.1, b.mass(AmountUnit.KG), 1e-15);
        assertEquals(50 / Oiml22.M_ETHANOL + 50 / Oiml22.M_WATER, b.totalMoles(AmountUnit.MOL), 1e-12);
        Figures.note(BatchesTest.class,
                "50 g ethanol + 50 g water at 20 °C: V = %.4f mL, contraction %.4f mL = %.4f %%",
                b.volume(AmountUnit.ML), b.contraction(AmountUnit.ML), b.contractionPercent());
    }

    /**
     * The same batch drawn by volume from tanks at different temperatures: 50 g of ethanol at 25 °C is
     * 50/0.784954 mL, 50 g of water at 20 °C is 50/0.998201 mL; the totals are those of the 50 g + 50 g batch.
     */
    @Test
    void volumesDrawnAtTheirOwnTemperatures() {
        Amounts drawn = Amounts.of(new double[] {50 / 0.784954, 50 / 0.998201}, AmountUnit.ML, new double[] {25, 20});
        BatchTotals b = Batches.totals(CARD, drawn, 20, E);
        assertEquals(100, b.mass(AmountUnit.G), 100 * Cards.OIML_ROUNDING / 784.954);
        assertEquals(100 / 0.913771, b.volume(AmountUnit.ML), 100 / 0.913771 * MIX / 913.771);
    }

    /** Units change nothing but the numbers: 0.05 kg each in L equals 50 g each in mL / 1000. */
    @Test
    void unitsOfTheBatch() {
        BatchTotals g = Batches.totals(CARD, Amounts.of(new double[] {50, 50}, AmountUnit.G), 20, E);
        BatchTotals kg = Batches.totals(CARD, Amounts.of(new double[] {0.05, 0.05}, AmountUnit.KG), 20, E);
        assertEquals(g.volume(AmountUnit.ML) / 1000, kg.volume(AmountUnit.L), 1e-15);
        assertEquals(g.volume(AmountUnit.ML) / 1e6, kg.volume(AmountUnit.M3), 1e-18);
        assertEquals(g.totalMoles(AmountUnit.MOL) / 1000, kg.totalMoles(AmountUnit.KMOL), 1e-18);
        AlcoholometryTest.assertRefused(Problem.WRONG_DIMENSION, () -> g.volume(AmountUnit.KG));
    }

    /**
     * Adding 10 g of ethanol to 100 g at p = 0.5, 20 °C: exactly V(110 g at p = 60/110) − V(100 g at 0.5) from the
     * OIML formula. The first-order estimate V̄·Δn misses by the curvature of V(n): its error is of second order, so
     * for small additions (1 g and 0.5 g; at 10 g the third-order term still shows) halving the addition divides it by
     * four.
     */
    @Test
    void volumeChangeOfAnAddition() {
        Amounts batch = Amounts.of(new double[] {50, 50}, AmountUnit.G);
        AdditionVolume a = Batches.addition(CARD, batch, 0, Quantity.of(10, AmountUnit.G), 20, E);
        double exact = 110 / (Oiml22.density(60.0 / 110, 20) / 1000) - 100 / (Oiml22.density(0.5, 20) / 1000);
        double tolerance = (110 / 0.9 + 100 / 0.9) * Cards.OIML_DENSITY_TOLERANCE / 900;
        assertEquals(exact, a.exact(AmountUnit.ML), tolerance);
        assertEquals(10 / 0.789239, a.pureVolume(AmountUnit.ML), 10 / 0.789239 * Cards.OIML_ROUNDING / 789.239);
        assertEquals(10 / Oiml22.M_ETHANOL, a.moles(AmountUnit.MOL), 1e-15);
        AdditionVolume one = Batches.addition(CARD, batch, 0, Quantity.of(1, AmountUnit.G), 20, E);
        AdditionVolume half = Batches.addition(CARD, batch, 0, Quantity.of(0.5, AmountUnit.G), 20, E);
        double ratio = one.linearError(AmountUnit.ML) / half.linearError(AmountUnit.ML);
        assertEquals(4, ratio, 0.05);
        assertTrue(Math.abs(a.relativeLinearError()) < 0.01, "10 % more ethanol: linear estimate off by "
                + a.relativeLinearError());
        // the first-order estimate is V̄_ethanol of the batch before the addition times the moles added
        double n1 = 50 / Oiml22.M_ETHANOL;
        double x1 = n1 / (n1 + 50 / Oiml22.M_WATER);
        double partial = org.miscela.core.functions.CardFunctions.partialMolarVolume(CARD, 0, x1, 20, E);
        assertEquals(partial * 10 / Oiml22.M_ETHANOL, a.firstOrder(AmountUnit.ML), 1e-9);
        assertEquals((a.firstOrder(AmountUnit.ML) - a.exact(AmountUnit.ML)) / a.exact(AmountUnit.ML),
                a.relativeLinearError(), 1e-12);
        Figures.note(BatchesTest.class,
                "+10 g ethanol to 100 g at p = 0.5, 20 °C: exact %.4f mL, first order %.4f mL (%.2e)",
                a.exact(AmountUnit.ML), a.firstOrder(AmountUnit.ML), a.relativeLinearError());
    }

    /**
     * A volume added is of the pure liquid at its own temperature: 10 g of ethanol as 10/0.784954 mL at 25 °C. The
     * check value's rounding (0.0005 kg/m³) makes that 10 g within 6.4e-7 relative, and the volume change with it.
     */
    @Test
    void additionByVolume() {
        Amounts batch = Amounts.of(new double[] {50, 50}, AmountUnit.G);
        AdditionVolume byMass = Batches.addition(CARD, batch, 0, Quantity.of(10, AmountUnit.G), 20, E);
        AdditionVolume byVolume = Batches.addition(CARD, batch, 0, Quantity.of(10 / 0.784954, AmountUnit.ML, 25), 20,
                E);
        assertEquals(byMass.exact(AmountUnit.ML), byVolume.exact(AmountUnit.ML),
                byMass.exact(AmountUnit.ML) * Cards.OIML_ROUNDING / 784.954);
    }

    @Test
    void refusals() {
        AlcoholometryTest.assertRefused(Problem.BLEND_AMOUNT_ZERO,
                () -> Batches.totals(CARD, Amounts.of(new double[] {0, 0}, AmountUnit.G), 20, E));
        AlcoholometryTest.assertRefused(Problem.VALUE_NEGATIVE,
                () -> Batches.totals(CARD, Amounts.of(new double[] {-1, 2}, AmountUnit.G), 20, E));
        AlcoholometryTest.assertRefused(Problem.BLANK_VALUE,
                () -> Batches.totals(CARD, Amounts.of(new double[] {Double.NaN, 2}, AmountUnit.G), 20, E));
        AlcoholometryTest.assertRefused(Problem.NEEDS_TEMPERATURES,
                () -> Amounts.of(new double[] {1, 2}, AmountUnit.L));
        AlcoholometryTest.assertRefused(Problem.NEEDS_TEMPERATURES,
                () -> Batches.totals(CARD, Amounts.of(new double[] {1, 2}, AmountUnit.L, null), 20, E));
        AlcoholometryTest.assertRefused(Problem.BLANK_ARGUMENT, () -> Batches.totals(CARD,
                Amounts.of(new double[] {1, 2}, AmountUnit.L, new double[] {20, Double.NaN}), 20, E));
        AlcoholometryTest.assertRefused(Problem.LENGTH,
                () -> Batches.totals(CARD, Amounts.of(new double[] {1, 2, 3}, AmountUnit.G), 20, E));
        AlcoholometryTest.assertRefused(Problem.NO_SUCH_COMPONENT, () -> Batches.addition(CARD,
                Amounts.of(new double[] {1, 2}, AmountUnit.G), 2, Quantity.of(1, AmountUnit.G), 20, E));
        AlcoholometryTest.assertRefused(Problem.BLEND_NOT_POSITIVE, () -> Quantity.of(0, AmountUnit.G));
        AlcoholometryTest.assertRefused(Problem.NEEDS_TEMPERATURE, () -> Quantity.of(1, AmountUnit.L));
        // a tank volume with no temperature is not read when the component is absent
        BatchTotals b = Batches.totals(CARD, Amounts.of(new double[] {0, 2}, AmountUnit.L,
                new double[] {Double.NaN, 20}), 20, E);
        assertEquals(1.0, b.moleFractions()[1], 0);
    }
}
