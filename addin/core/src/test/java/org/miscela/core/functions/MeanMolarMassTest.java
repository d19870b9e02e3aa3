package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.TestCard;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * MIX.MOLARMASS's arithmetic, M = Σ x_k·M_k, against molar masses made from the IUPAC standard atomic weights (from
 * memory): the 2007 values C 12.0107, H 1.00794, O 15.9994, which the OIML ethanol + water card's molar masses
 * follow, and the abridged values H 1.008, O 15.999, S 32.06, which the NBS sulfuric acid card's follow.
 */
class MeanMolarMassTest {
    private static final double C = 12.0107;
    private static final double H = 1.00794;
    private static final double O = 15.9994;
    /** C2H5OH and H2O from the 2007 atomic weights: 46.06844 and 18.01528 g/mol. */
    private static final double ETHANOL = 2 * C + 6 * H + O;
    private static final double WATER = 2 * H + O;

    @Test
    void ethanolAndWaterFromTheAtomicWeights() {
        Card card = TestCards.card("ethanol-water-oiml.tsv");
        assertEquals(46.06844, ETHANOL, 1e-12, "C2H6O from the atomic weights");
        assertEquals(18.01528, WATER, 1e-12, "H2O from the atomic weights");
        for (double x1 : new double[] {0.0, 0.3, 0.5, 1.0}) {
            double expected = x1 * ETHANOL + (1 - x1) * WATER;
            assertEquals(expected, CardFunctions.meanMolarMass(card, new double[] {x1, 1 - x1}), 1e-12, "x1 " + x1);
        }
        assertEquals(26.431228, CardFunctions.meanMolarMass(card, new double[] {0.3, 0.7}), 1e-9,
                "the reference's example: 0.3 × 46.06844 + 0.7 × 18.01528");
    }

    /** A card with heats only (no densities) still has molar masses: H2SO4 + H2O. */
    @Test
    void sulfuricAcidAndWaterOnACardWithoutDensities() {
        Card card = TestCards.card("sulfuric-acid-water-nbs.tsv");
        double acid = 2 * 1.008 + 32.06 + 4 * 15.999;
        double water = 2 * 1.008 + 15.999;
        assertEquals(98.072, acid, 1e-9, "H2SO4 from the abridged atomic weights");
        assertEquals(0.1 * acid + 0.9 * water, CardFunctions.meanMolarMass(card, new double[] {0.1, 0.9}), 1e-9);
    }

    /** The result is in the card's molar mass unit; three components (invented values) add up the same way. */
    @Test
    void theCardsUnitAndThreeComponents() {
        Card grams = ternary("g/mol", 1);
        Card kilograms = ternary("kg/mol", 1000);
        double[] x = {0.2, 0.5, 0.3};
        double expected = 0.2 * 46.07 + 0.5 * 18.015 + 0.3 * 92.09;
        assertEquals(expected, CardFunctions.meanMolarMass(grams, x), 1e-12);
        assertEquals(expected / 1000, CardFunctions.meanMolarMass(kilograms, x), 1e-15);
    }

    /** A three-component card with invented values, its molar masses 46.07, 18.015 and 92.09 g/mol in the unit. */
    private static Card ternary(String unit, double perGram) {
        return TestCard.empty().row("Miscela card", 2).row("title", "three invented liquids")
                .row("source", "invented values, for tests").row("temperature unit", "K")
                .row("density unit", "kg/m³").row("molar volume unit", "cm³/mol").row("molar mass unit", unit)
                .row("valid temperature", 288.15, 308.15)
                .row("component", "alpha", 46.07 / perGram).row("component", "beta", 18.015 / perGram)
                .row("component", "gamma", 92.09 / perGram)
                .row("density model", "alpha", "constant").row("density coefficients", "alpha", 789.3)
                .row("density model", "beta", "constant").row("density coefficients", "beta", 997.0)
                .row("density model", "gamma", "constant").row("density coefficients", "gamma", 1261.0)
                .row("valid mole fraction", "alpha", 0, 1)
                .row("excess volume A0", "alpha + beta", -4.0).row("excess volume A0", "alpha + gamma", -1.2)
                .row("excess volume A0", "beta + gamma", -0.8).read();
    }

    @Test
    void aCompositionThatIsNoneIsRefused() {
        Card card = TestCards.card("ethanol-water-oiml.tsv");
        MiscelaException sum = assertThrows(MiscelaException.class,
                () -> CardFunctions.meanMolarMass(card, new double[] {0.3, 0.6}));
        assertEquals(Problem.COMPOSITION_SUM, sum.problem());
        MiscelaException negative = assertThrows(MiscelaException.class,
                () -> CardFunctions.meanMolarMass(card, new double[] {1.2, -0.2}));
        assertEquals(Problem.COMPOSITION_NEGATIVE, negative.problem());
    }
}
