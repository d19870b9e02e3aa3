package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.reference.Oiml22;

/** Recipes for ethanol + water through the OIML card, against the OIML R 22 formula and its check values. */
class RecipesTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;

    /**
     * One litre of 40 %vol at 20 °C. By the definition of %vol (OIML R 22) it takes 400 mL of ethanol measured at
     * 20 °C, whatever the card: 400 × 0.789239 = 315.6956 g (ρ(1, 20 °C), ethanol-water.md). The litre weighs
     * ρ(p40, 20 °C) × 1 L, with p40 the formula's mass fraction at 40 %vol; the card's density error ε moves it by
     * ε·(1 − p·ρ'/(ρ + p·ρ')) ≤ 1.2·ε, the ethanol's mass being fixed.
     */
    @Test
    void oneLitreOfFortyPercentVolume() {
        Charge c = Recipes.forTarget(CARD, Quantity.of(1, AmountUnit.L, 20), new double[] {40, Double.NaN},
                CompositionBasis.strength(20, 1), new double[] {20, 20}, E);
        double[] volumes = c.amounts(AmountUnit.ML);
        assertEquals(400, volumes[0], 1e-9);
        double[] masses = c.amounts(AmountUnit.G);
        assertEquals(400 * 0.789239, masses[0], 400 * Cards.OIML_ROUNDING / 1000);
        double p40 = AlcoholometryTest.oimlMassFraction(40, 20);
        double litre = Oiml22.density(p40, 20);
        assertEquals(litre, masses[0] + masses[1], 1.2 * Cards.OIML_DENSITY_TOLERANCE + 1e-6);
        assertEquals(litre - 400 * Oiml22.density(1, 20) / 1000, masses[1],
                1.2 * Cards.OIML_DENSITY_TOLERANCE + 1e-6);
        Figures.note(RecipesTest.class,
                "1 L of 40 %%vol at 20 °C: %.4f g ethanol (400 mL), %.4f g water (%.4f mL at 20 °C)",
                masses[0], masses[1], volumes[1]);
    }

    /** A kilogram at p = 0.5 is 500 g of each, by definition; from 15 °C tanks the volumes are m/ρ(15 °C). */
    @Test
    void oneKilogramAtHalfMassFraction() {
        Charge c = Recipes.forTarget(CARD, Quantity.of(1, AmountUnit.KG), new double[] {0.5, 0.5},
                CompositionBasis.massFraction(), new double[] {15, 15}, E);
        assertEquals(0.5, c.amounts(AmountUnit.KG)[0], 1e-15);
        assertEquals(0.5, c.amounts(AmountUnit.KG)[1], 1e-15);
        assertEquals(500 / (Oiml22.density(1, 15) / 1000), c.amounts(AmountUnit.ML)[0], 1e-9);
        assertEquals(500 / (Oiml22.density(0, 15) / 1000), c.amounts(AmountUnit.ML)[1], 1e-9);
        assertEquals(1, c.totalMass(AmountUnit.KG), 1e-15);
    }

    /** Without storage temperatures there are masses and moles but no volumes to draw. */
    @Test
    void volumesNeedStorageTemperatures() {
        Charge c = Recipes.forTarget(CARD, Quantity.of(10, AmountUnit.MOL), new double[] {0.2, 0.8},
                CompositionBasis.moleFraction(), null, E);
        assertEquals(2, c.amounts(AmountUnit.MOL)[0], 1e-15);
        assertEquals(8 * Oiml22.M_WATER, c.amounts(AmountUnit.G)[1], 1e-12);
        AlcoholometryTest.assertRefused(Problem.NO_STORAGE_TEMPERATURES, () -> c.amounts(AmountUnit.L));
    }

    /** The recipe's charge, mixed, gives back the target: volume at its temperature and composition. */
    @Test
    void chargeGivesBackTheTarget() {
        Quantity target = Quantity.of(2.5, AmountUnit.M3, 15);
        Charge c = Recipes.forTarget(CARD, target, new double[] {45, Double.NaN}, CompositionBasis.strength(20, 1),
                new double[] {10, 30}, E);
        BatchTotals b = Batches.totals(CARD, c.asAmounts(AmountUnit.L), 15, E);
        assertEquals(2.5, b.volume(AmountUnit.M3), 2.5 * 1e-12);
        double strength = Compositions.fromMoleFractions(CARD, b.moleFractions(), CompositionBasis.strength(20, 1),
                E)[0];
        assertEquals(45, strength, 45 * 1e-12);
    }
}
