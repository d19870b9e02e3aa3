package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.functions.PhaseFunctions;
import org.miscela.testing.Figures;

/**
 * MIX.DEWPRESSURE against the other phase functions, from values: the vapour over a bubbling liquid has that liquid's
 * bubble pressure as its dew pressure (MIX.VAPOURFRACTION, MIX.BUBBLEPRESSURE), and MIX.DEWPOINT at the dew pressure
 * gives the temperature back. On the Redlich–Kister card fitted to published data and on the Wilson card with Gmehling
 * et al.'s published parameters.
 */
class DewPressureTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final Card[] CARDS = {TestCards.card("ethanol-water-vle.tsv"),
        TestCards.card("ethanol-water-wilson.tsv")};

    /** Bubble → vapour → dew pressure: the same pressure to 10⁻¹⁰ relative; the dew point there is T to 10⁻⁶ K. */
    @Test
    void dewPressureOfTheVapourOverABubblingLiquid() {
        double worstP = 0.0;
        double worstT = 0.0;
        for (Card c : CARDS) {
            for (double t : new double[] {35, 60, 90}) {
                for (double x1 : new double[] {0.02, 0.2, 0.5, 0.8, 0.98}) {
                    double[] x = {x1, 1 - x1};
                    double p = PhaseFunctions.bubblePressure(c, x, t, E);
                    double y1 = PhaseFunctions.vapourFraction(c, 0, x, t, E);
                    double[] y = {y1, 1 - y1};
                    double dew = PhaseFunctions.dewPressure(c, y, t, E);
                    worstP = Math.max(worstP, Math.abs(dew / p - 1));
                    assertEquals(p, dew, 1e-10 * p, "x1 = " + x1 + ", t = " + t);
                    double back = PhaseFunctions.dewPoint(c, y, dew, E);
                    worstT = Math.max(worstT, Math.abs(back - t));
                    assertEquals(t, back, 1e-6, "dew point at the dew pressure, x1 = " + x1 + ", t = " + t);
                }
            }
        }
        Figures.note(DewPressureTest.class, "dew vs bubble pressure: worst %.3g relative; dew point back: worst %.3g K",
                worstP, worstT);
    }

    /** A pure vapour condenses at its own vapour pressure (MIX.BUBBLEPRESSURE of the pure liquid). */
    @Test
    void pureVapour() {
        for (Card c : CARDS) {
            assertEquals(PhaseFunctions.bubblePressure(c, new double[] {0, 1}, 80, E),
                    PhaseFunctions.dewPressure(c, new double[] {0, 1}, 80, E), 1e-12);
        }
    }

    /**
     * A liquid that splits: the Redlich–Kister card with A0 of G^E/RT raised to 3.5 (an edit for this test only; a
     * symmetric G^E/RT = A·x1·x2 splits above A = 2). The substitution still settles (no NO_CONVERGENCE) for every
     * vapour from y1 = 0.01 to 0.99 at 60 °C, with a finite positive pressure.
     */
    @Test
    void settlesWhereTheLiquidSplits() {
        Object[][] cells = TestCards.cells("ethanol-water-vle.tsv");
        for (Object[] row : cells) {
            if ("excess Gibbs energy A0".equals(row[0])) {
                row[2] = 3.5;
                row[3] = 0.0;
            }
        }
        Card split = CardReader.read(cells);
        int n = 0;
        for (int i = 1; i < 100; i++) {
            double y1 = i / 100.0;
            double p = PhaseFunctions.dewPressure(split, new double[] {y1, 1 - y1}, 60, E);
            assertTrue(p > 0 && Double.isFinite(p), "y1 = " + y1);
            n++;
        }
        assertEquals(99, n);
    }
}
