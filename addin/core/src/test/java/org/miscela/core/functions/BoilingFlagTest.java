package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The temperature rise's boiling flag on a card without stated boiling temperatures but with G^E/RT and vapour
 * pressures: the blend's bubble point at 1 atm is the limit (identities on an invented card: the limit is
 * MIX.BUBBLEPOINT's value at 101.325 kPa, and a rise past it is refused unless accepted).
 */
class BoilingFlagTest {
    private static final Card HOT = TestCards.card("invented-hot-mixing.tsv");
    private static final Extrapolation E = Extrapolation.AS_CARD;

    @Test
    void theBubblePointAtOneAtmosphereIsTheBoilingLimit() {
        double[] x = {0.5, 0.5};
        double bubble = PhaseFunctions.bubblePoint(HOT, x, 101.325, E);
        assertEquals(bubble + 273.15, BoilingPoints.kelvinAt(HOT, x), 1e-9);
        assertTrue(BoilingPoints.fromBubblePoint(HOT, x));
        // 1 mol + 1 mol from 20 °C: H^E = −30000/4 J/mol released into 2 × 100 J/K: about 75 K, past the bubble point
        double[] amounts = {1, 1};
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> CardFunctions.adiabaticRise(HOT, amounts, AmountBasis.MOL, 20, E));
        assertEquals(Problem.BOILS, e.problem());
        assertTrue(e.getMessage().contains("bubble point at 1 atm"), e.getMessage());
        double rise = CardFunctions.adiabaticRise(HOT, amounts, AmountBasis.MOL, 20, E, true);
        assertTrue(20 + rise > bubble, "accepted, the balance's temperature lies past the bubble point: " + rise);
    }

    @Test
    void aCardWithoutPhaseDataHasNoBoilingLimit() {
        assertTrue(Double.isNaN(BoilingPoints.kelvinAt(TestCards.card("sulfuric-acid-water-nbs.tsv"),
                new double[] {0.1, 0.9})));
    }

    /**
     * A blend that boils below the card's range: on the same invented card valid from 95 °C only, the equimolar
     * blend's vapour already exceeds 1 atm there (its bubble point is 89.9 °C on the full card), so the lowest
     * temperature of the range is the limit and a rise from 100 °C is refused, not left unchecked.
     */
    @Test
    void aBlendThatBoilsBelowTheCardsRangeIsHeldToItsBottom() {
        Card hot = org.miscela.core.card.CardReader.read(org.miscela.core.card.CardEdits.apply(
                TestCards.cells("invented-hot-mixing.tsv"), "set 22 = valid temperature | 95 | 150"));
        double[] x = {0.5, 0.5};
        assertEquals(95 + 273.15, BoilingPoints.kelvinAt(hot, x), 1e-9);
        assertEquals(Problem.BOILS, assertThrows(MiscelaException.class,
                () -> CardFunctions.adiabaticRise(hot, new double[] {1, 1}, AmountBasis.MOL, 100, E)).problem());
    }

    /**
     * A blend that boils above the card's range: on the same invented card valid to 60 °C only, the equimolar blend's
     * bubble point lies above the range (89.9 °C on the full card); extrapolating the card's G^E and vapour pressures
     * finds the same temperature, which is now the limit: a rise from 20 °C that the caller lets extrapolate (to about
     * 95 °C) is refused as boiling, not left unchecked, and the refusal says the limit was extrapolated.
     */
    @Test
    void aBlendThatBoilsAboveTheCardsRangeIsHeldToItsExtrapolatedBubblePoint() {
        Card cool = org.miscela.core.card.CardReader.read(org.miscela.core.card.CardEdits.apply(
                TestCards.cells("invented-hot-mixing.tsv"), "set 22 = valid temperature | 0 | 60"));
        double[] x = {0.5, 0.5};
        double full = PhaseFunctions.bubblePoint(HOT, x, 101.325, E);
        assertTrue(full > 60, "the full card's bubble point lies above 60 °C: " + full);
        assertEquals(full + 273.15, BoilingPoints.kelvinAt(cool, x), 1e-6);
        MiscelaException boils = assertThrows(MiscelaException.class,
                () -> CardFunctions.adiabaticRise(cool, new double[] {1, 1}, AmountBasis.MOL, 20, Extrapolation.ALLOW));
        assertEquals(Problem.BOILS, boils.problem());
        assertTrue(boils.getMessage().contains("extrapolated above"), boils.getMessage());
    }

    /**
     * Where the limit comes from, in the words the refusal and the trace quote: the bubble point inside the range, the
     * range's bottom for a blend that boils below it, the extrapolated bubble point above it, and the card's stated
     * boiling temperatures on a card that has them.
     */
    @Test
    void theSourceOfTheLimitInWords() {
        double[] x = {0.5, 0.5};
        String inside = BoilingPoints.source(HOT, x, BoilingPoints.kelvinAt(HOT, x));
        assertTrue(inside.contains("from the card's G^E and vapour pressures") && !inside.contains("lowest")
                && !inside.contains("extrapolated"), inside);
        Card below = edited("set 22 = valid temperature | 95 | 150");
        String bottom = BoilingPoints.source(below, x, BoilingPoints.kelvinAt(below, x));
        assertTrue(bottom.contains("at or below the card's lowest temperature"), bottom);
        Card above = edited("set 22 = valid temperature | 0 | 60");
        String extrapolated = BoilingPoints.source(above, x, BoilingPoints.kelvinAt(above, x));
        assertTrue(extrapolated.contains("extrapolated above the card's highest temperature"), extrapolated);
        Card stated = edited("add boiling temperatures | liquid P | 0 | 100 | 1 | 80");
        assertEquals(90 + 273.15, BoilingPoints.kelvinAt(stated, x), 1e-9);
        assertEquals("the card's 'boiling temperatures'", BoilingPoints.source(stated, x, 363.15));
    }

    /**
     * No limit where none can be known: a present liquid without a vapour-pressure row (then the bubble point is not
     * used at all), and a blend whose bubble point lies more than 100 K above the card's range (an invented card
     * valid from −100 to −90 °C only: the equimolar blend boils near 90 °C).
     */
    @Test
    void noLimitWhereNoneCanBeKnown() {
        Card oneVapour = edited("set 19 = note | the vapour pressure of liquid Q taken out");
        assertTrue(!BoilingPoints.fromBubblePoint(oneVapour, new double[] {0.5, 0.5}));
        assertTrue(Double.isNaN(BoilingPoints.kelvinAt(oneVapour, new double[] {0.5, 0.5})));
        assertTrue(BoilingPoints.fromBubblePoint(oneVapour, new double[] {1, 0}), "liquid Q absent: its row is not needed");
        Card far = edited("set 22 = valid temperature | -100 | -90");
        assertTrue(Double.isNaN(BoilingPoints.kelvinAt(far, new double[] {0.5, 0.5})));
        // above a range of 0 to 60 °C, but liquid P's vapour-pressure constants stop at 60 °C too: not extrapolated
        Card stops = edited("set 22 = valid temperature | 0 | 60; set 18 = vapour pressure | liquid P | Antoine | 6.2 "
                + "| 1300 | 230 | 0 | 60");
        assertTrue(Double.isNaN(BoilingPoints.kelvinAt(stops, new double[] {0.5, 0.5})));
    }

    private static Card edited(String edits) {
        return org.miscela.core.card.CardReader.read(org.miscela.core.card.CardEdits.apply(
                TestCards.cells("invented-hot-mixing.tsv"), edits));
    }
}
