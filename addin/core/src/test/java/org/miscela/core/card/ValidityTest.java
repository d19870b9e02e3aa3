package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import org.junit.jupiter.api.Test;

/**
 * A card's validity range as docs/card-format.md states it: the limits themselves are inside; a component's mole
 * fraction is judged with a slack of 1e-12 (rounding in 1 − x, documented on {@link Validity#containsFraction}); a
 * pair's own composition x_a/(x_a + x_b) only where both are present; unstated pair limits do not limit.
 */
class ValidityTest {
    private static final Validity.PairLimit PAIR = new Validity.PairLimit(0, 2, 290, 300, 0.2, 0.6);
    private static final Validity V = new Validity(280, 320, new double[] {0, 0.1, 0}, new double[] {1, 0.5, 1},
            Collections.singletonList(PAIR));

    @Test
    void theLimitsThemselvesAreInside() {
        assertTrue(V.containsTemperature(280));
        assertTrue(V.containsTemperature(320));
        assertFalse(V.containsTemperature(Math.nextDown(280.0)));
        assertFalse(V.containsTemperature(Math.nextUp(320.0)));
        assertTrue(V.containsFraction(1, 0.1 - 0.9e-12));
        assertTrue(V.containsFraction(1, 0.5 + 0.9e-12));
        assertFalse(V.containsFraction(1, 0.1 - 1.1e-12));
        assertFalse(V.containsFraction(1, 0.5 + 1.1e-12));
        assertTrue(PAIR.containsTemperature(290));
        assertTrue(PAIR.containsTemperature(300));
        assertFalse(PAIR.containsTemperature(Math.nextDown(290.0)));
        assertFalse(PAIR.containsTemperature(Math.nextUp(300.0)));
    }

    @Test
    void aPairsOwnComposition() {
        assertEquals(0.25, PAIR.ratio(new double[] {0.1, 0.5, 0.3}), 1e-15);
        assertTrue(Double.isNaN(PAIR.ratio(new double[] {0.0, 0.5, 0.5})));
        assertTrue(Double.isNaN(PAIR.ratio(new double[] {0.5, 0.5, 0.0})));
        // 0.2 and 0.6 themselves, and within the slack, are inside
        assertTrue(PAIR.containsRatio(new double[] {0.1, 0.5, 0.4}));
        assertTrue(PAIR.containsRatio(new double[] {0.3, 0.5, 0.2}));
        assertFalse(PAIR.containsRatio(new double[] {0.05, 0.5, 0.45}));
        assertFalse(PAIR.containsRatio(new double[] {0.35, 0.5, 0.15}));
        // only where both are present
        assertTrue(PAIR.containsRatio(new double[] {0.0, 0.5, 0.5}));
        assertEquals(290, PAIR.lowestKelvin(), 0.0);
        assertEquals(300, PAIR.highestKelvin(), 0.0);
        assertEquals(0.2, PAIR.lowestRatio(), 0.0);
        assertEquals(0.6, PAIR.highestRatio(), 0.0);
        assertEquals(0, PAIR.first());
        assertEquals(2, PAIR.second());
    }

    @Test
    void unstatedPairLimitsDoNotLimit() {
        Validity.PairLimit temperatureOnly = new Validity.PairLimit(0, 1, 290, 300, Double.NaN, Double.NaN);
        assertTrue(temperatureOnly.hasTemperature());
        assertFalse(temperatureOnly.hasRatio());
        assertTrue(temperatureOnly.containsRatio(new double[] {0.99, 0.01}));
        Validity.PairLimit ratioOnly = new Validity.PairLimit(0, 1, Double.NaN, Double.NaN, 0.2, 0.6);
        assertFalse(ratioOnly.hasTemperature());
        assertTrue(ratioOnly.containsTemperature(1000));
        assertFalse(ratioOnly.containsRatio(new double[] {0.9, 0.1}));
    }
}
