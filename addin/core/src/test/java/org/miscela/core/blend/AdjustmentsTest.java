package org.miscela.core.blend;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/** Adjusting batches by additions: against the OIML R 22 check values, mass balances and hand-worked projections. */
class AdjustmentsTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final CompositionBasis MASS = CompositionBasis.massFraction();
    private static final Amounts HALF_AND_HALF = Amounts.of(new double[] {500, 500}, AmountUnit.G);

    /**
     * 1 kg at p = 0.5 to p = 0.4 takes 250 g of water (mass balance: 500 g ethanol in 1250 g); the result's volume at
     * 20 °C is 1250 g/ρ(0.4, 20 °C), with ρ(0.4, 20 °C) = 935.145 kg/m³ (OIML R 22, ethanol-water.md).
     */
    @Test
    void dilutingToFortyPercentByMass() {
        Adjustment a = Adjustments.leastAdditions(CARD, HALF_AND_HALF, new double[] {0.4, 0.6}, MASS, 20, null, E);
        assertTrue(a.reached(), a.summary());
        assertEquals(Adjustment.REACHED, a.summary());
        assertEquals(0, a.additions().amounts(AmountUnit.G)[0], 1e-9);
        assertEquals(250, a.additions().amounts(AmountUnit.G)[1], 1e-9);
        double v = 1250 / 0.935145;
        assertEquals(v, a.result().volume(AmountUnit.ML),
                v * (Cards.OIML_DENSITY_TOLERANCE + Cards.OIML_ROUNDING) / 935.145);
        assertEquals(1250, a.result().mass(AmountUnit.G), 1e-9);
    }

    /** Strengthening needs ethanol only; the water sets the total. A 0.5 kg/kg batch to p = 0.6: 250 g ethanol. */
    @Test
    void strengtheningByMass() {
        Adjustment a = Adjustments.leastAdditions(CARD, HALF_AND_HALF, new double[] {0.6, 0.4}, MASS, 20,
                new double[] {20, 20}, E);
        assertEquals(250, a.additions().amounts(AmountUnit.G)[0], 1e-9);
        assertEquals(0, a.additions().amounts(AmountUnit.G)[1], 1e-9);
        // the ethanol to add, measured at 20 °C: 250 g/ρ(1, 20 °C) with 789.239 kg/m³ (ethanol-water.md)
        assertEquals(250 / 0.789239, a.additions().amounts(AmountUnit.ML)[0], 250 / 0.789239 * 0.0005 / 789.239);
    }

    /** A target given as %vol is met to rounding. */
    @Test
    void targetStrength() {
        Adjustment a = Adjustments.leastAdditions(CARD, HALF_AND_HALF, new double[] {40, Double.NaN},
                CompositionBasis.strength(20, 1), 20, null, E);
        double s = Compositions.fromMoleFractions(CARD, a.achieved(), CompositionBasis.strength(20, 1), E)[0];
        assertEquals(40, s, 40 * 1e-12);
        assertEquals(0, a.additions().amounts(AmountUnit.G)[0], 1e-9);
    }

    /** Pure ethanol cannot be reached from a blend by adding; the message names the component in the way. */
    @Test
    void removalIsRefused() {
        MiscelaException ex = AlcoholometryTest.assertRefused(Problem.NEEDS_REMOVAL, () -> Adjustments
                .leastAdditions(CARD, HALF_AND_HALF, new double[] {1, 0}, MASS, 20, null, E));
        assertTrue(ex.getMessage().contains("water"), ex.getMessage());
    }

    /**
     * Within a ceiling of 1.2 L at 20 °C the dilution to p = 0.4 (1336.7 mL) does not fit: the batch is filled to
     * 1.2 L exactly, with the closest composition; a 1.5 L ceiling leaves the exact answer unchanged.
     */
    @Test
    void ceilingOfAVessel() {
        Adjustment wide = Adjustments.within(CARD, HALF_AND_HALF, new double[] {0.4, 0.6}, MASS,
                Quantity.of(1.5, AmountUnit.L, 20), 20, null, E);
        assertTrue(wide.reached());
        assertEquals(250, wide.additions().amounts(AmountUnit.G)[1], 1e-9);
        Adjustment tight = Adjustments.within(CARD, HALF_AND_HALF, new double[] {0.4, 0.6}, MASS,
                Quantity.of(1.2, AmountUnit.L, 20), 20, null, E);
        assertFalse(tight.reached());
        assertEquals(1.2, tight.result().volume(AmountUnit.L), 1.2 * 1e-12);
        assertEquals(0, tight.additions().amounts(AmountUnit.G)[0], 0);
        assertTrue(tight.summary().startsWith("The target composition cannot be reached"), tight.summary());
        double p = Compositions.fromMoleFractions(CARD, tight.achieved(), MASS, E)[0];
        assertTrue(p > 0.4 && p < 0.5, "p = " + p);
    }

    /** Making up to a final 3 L at 40 %vol from 1 kg at p = 0.5 is the recipe for 3 L minus what is there. */
    @Test
    void makeUpToAFinalVolume() {
        Quantity three = Quantity.of(3, AmountUnit.L, 20);
        double[] target = {40, Double.NaN};
        CompositionBasis strength = CompositionBasis.strength(20, 1);
        Adjustment a = Adjustments.makeUpTo(CARD, HALF_AND_HALF, target, strength, three, 20, null, E);
        assertTrue(a.reached());
        double[] recipe = Recipes.forTarget(CARD, three, target, strength, null, E).amounts(AmountUnit.G);
        double[] added = a.additions().amounts(AmountUnit.G);
        assertEquals(recipe[0] - 500, added[0], 1e-9 * recipe[0]);
        assertEquals(recipe[1] - 500, added[1], 1e-9 * recipe[1]);
        assertEquals(3, a.result().volume(AmountUnit.L), 3e-12);
    }

    @Test
    void aFinalQuantityBelowTheBatchIsRefused() {
        AlcoholometryTest.assertRefused(Problem.LIMIT_BELOW_BATCH, () -> Adjustments.makeUpTo(CARD,
                HALF_AND_HALF, new double[] {0.4, 0.6}, MASS, Quantity.of(0.9, AmountUnit.KG), 20, null, E));
    }

    /**
     * Hand-worked projection (invented ternary card; the arithmetic needs no card): 1 mol each of A, B, C, target
     * x* = (0.5, 0.5, 0), final total 6 mol. Bounds n/N' = 1/6 each; C stays at its bound, A and B take
     * x* + λ with λ = (1 − 1/6 − 1)/2 = −1/12, so y = (5/12, 5/12, 1/6): add 1.5 mol of A and of B.
     */
    @Test
    void closestCompositionWorkedByHand() {
        Amounts batch = Amounts.of(new double[] {1, 1, 1}, AmountUnit.MOL);
        Adjustment a = Adjustments.makeUpTo(Cards.TERNARY, batch, new double[] {0.5, 0.5, 0},
                CompositionBasis.moleFraction(), Quantity.of(6, AmountUnit.MOL), 20, null, E);
        assertFalse(a.reached());
        assertArrayEquals(new double[] {1.5, 1.5, 0}, a.additions().amounts(AmountUnit.MOL), 1e-12);
        assertArrayEquals(new double[] {5 / 12.0, 5 / 12.0, 1 / 6.0}, a.achieved(), 1e-15);
        assertEquals(1 / 6.0, a.largestDeviation(), 1e-15);
        AlcoholometryTest.assertRefused(Problem.NEEDS_REMOVAL, () -> Adjustments.leastAdditions(Cards.TERNARY,
                batch, new double[] {0.5, 0.5, 0}, CompositionBasis.moleFraction(), 20, null, E));
    }

    /**
     * Hand-worked, with one component over target: n = (3, 1, 0) mol, x* = (0.2, 0.3, 0.5), N' = 10 mol. Bounds
     * (0.3, 0.1, 0); A (breakpoint 0.1) stays at 0.3; B and C take x* + λ, λ = (1 − 0.3 − 0.8)/2 = −0.05:
     * y = (0.3, 0.25, 0.45), so add 0, 1.5 and 4.5 mol.
     */
    @Test
    void closestCompositionWithOneComponentOverTarget() {
        double[] after = Adjustments.closest(new double[] {3, 1, 0}, new double[] {0.2, 0.3, 0.5}, 10);
        assertArrayEquals(new double[] {3, 2.5, 4.5}, after, 1e-12);
        // reachable exactly from N' = max n_k/x*_k = 15 mol
        assertArrayEquals(new double[] {3, 4.5, 7.5}, Adjustments.closest(new double[] {3, 1, 0},
                new double[] {0.2, 0.3, 0.5}, 15), 1e-12);
    }
}
