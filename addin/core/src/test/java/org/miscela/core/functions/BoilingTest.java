package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * A card's boiling temperatures guard the temperature rise and the path: reached, the result is refused in words
 * unless the call accepts it. The boiling points here are invented (the mechanism is tested, not the acid's data):
 * 100 °C at pure water, 140 °C at x_acid = 0.2, 200 °C at 0.5.
 */
class BoilingTest {
    private static Object[][] withRow(Object... row) {
        Object[][] cells = TestCards.cells("sulfuric-acid-water-whole-range.tsv");
        Object[][] more = Arrays.copyOf(cells, cells.length + 1);
        more[cells.length] = row;
        return more;
    }

    private static final Card CARD = CardReader.read(withRow("boiling temperatures", "sulfuric acid", 0.0, 100.0,
            0.2, 140.0, 0.5, 200.0));

    @Test
    void theCurveJoinsItsPointsAndKnowsNothingBeyondThem() {
        assertEquals(373.15, CARD.boiling().kelvinAt(new double[] {0, 1}), 1e-12);
        assertEquals(393.15, CARD.boiling().kelvinAt(new double[] {0.1, 0.9}), 1e-9);
        assertEquals(443.15, CARD.boiling().kelvinAt(new double[] {0.35, 0.65}), 1e-9);
        assertTrue(Double.isNaN(CARD.boiling().kelvinAt(new double[] {0.6, 0.4})));
    }

    /**
     * 1 mol acid in 10 mol water reaches about 107 °C, below the 118.2 °C this curve gives at x = 1/11, and is
     * accepted; 1 mol in 2 mol water reaches about 194 °C, above the curve's 166.7 °C at x = 1/3, and is refused
     * unless the call accepts it.
     */
    @Test
    void aBatchThatWouldBoilIsRefusedUnlessAccepted() {
        double rise = CardFunctions.adiabaticRise(CARD, new double[] {1, 10}, AmountBasis.MOL, 25.0,
                Extrapolation.ALLOW);
        assertTrue(25.0 + rise < 118.2, "below the boiling point: " + rise);
        MiscelaException boils = assertThrows(MiscelaException.class, () -> CardFunctions.adiabaticRise(CARD,
                new double[] {1, 2}, AmountBasis.MOL, 25.0, Extrapolation.ALLOW));
        assertEquals(Problem.BOILS, boils.problem());
        assertTrue(boils.getMessage().contains("boiling point of 166.6666667 °C"), boils.getMessage());
        double accepted = CardFunctions.adiabaticRise(CARD, new double[] {1, 2}, AmountBasis.MOL, 25.0,
                Extrapolation.ALLOW, true);
        assertTrue(25.0 + accepted > 166.7, "the balance's temperature, accepted: " + accepted);
    }

    /** Water into acid passes x = 1/3 on its way to 1/11: the path is refused at its peak, though its end is not. */
    @Test
    void aPathThatWouldBoilOnTheWayIsRefused() {
        MiscelaException boils = assertThrows(MiscelaException.class, () -> new TemperaturePath(CARD,
                new int[] {0, 1}, new double[] {1, 10}, AmountBasis.MOL, new double[] {25, 25}, 0, 0,
                Extrapolation.ALLOW, false).path(20));
        assertEquals(Problem.BOILS, boils.problem());
        double[][] acidIntoWater = new TemperaturePath(CARD, new int[] {1, 0}, new double[] {10, 1},
                AmountBasis.MOL, new double[] {25, 25}, 0, 0, Extrapolation.ALLOW, false).path(20);
        assertTrue(acidIntoWater[20][1] < 118.2, "acid into water stays below its boiling points");
    }

    @Test
    void aCurveThatCannotBeReadIsRefusedOnItsRow() {
        MiscelaException odd = assertThrows(MiscelaException.class, () -> CardReader.read(withRow(
                "boiling temperatures", "sulfuric acid", 0.0, 100.0, 0.2)));
        assertEquals(Problem.MODEL_VALUES, odd.problem());
        MiscelaException back = assertThrows(MiscelaException.class, () -> CardReader.read(withRow(
                "boiling temperatures", "sulfuric acid", 0.2, 140.0, 0.1, 120.0)));
        assertEquals(Problem.MODEL_VALUES, back.problem());
        assertTrue(back.getMessage().contains("increasing"), back.getMessage());
        MiscelaException unknown = assertThrows(MiscelaException.class, () -> CardReader.read(withRow(
                "boiling temperatures", "oleum", 0.0, 100.0, 0.2, 140.0)));
        assertEquals(Problem.UNKNOWN_COMPONENT, unknown.problem());
    }
}
