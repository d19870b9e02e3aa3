package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.TestCards;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/**
 * The quick validity test every call runs ({@link PointChecks#within}) gives the same answer as the list of
 * violations the messages come from, on an invented ternary card with component, pair-ratio and pair-temperature
 * limits, at points inside, on and beyond every limit.
 */
class ValidityCheckProperties {
    private static final Card CARD = card();

    private static Card card() {
        Object[][] cells = TestCards.cells("ternary-invented.tsv");
        Object[][] more = Arrays.copyOf(cells, cells.length + 1);
        more[cells.length] = new Object[] {"valid pair temperature", "Q + R", 10.0, 30.0};
        return CardReader.read(more);
    }

    @Property(tries = 3000)
    void theQuickTestAgreesWithTheViolations(@ForAll @DoubleRange(min = 0, max = 1) double u,
            @ForAll @DoubleRange(min = 0, max = 1) double v, @ForAll @IntRange(min = 0, max = 3) int corner,
            @ForAll @DoubleRange(min = -10, max = 50) double celsius) {
        // corner 0: anywhere on the simplex; 1–3: one component absent, where pair limits switch off
        double a = corner == 1 ? 0 : u;
        double b = corner == 2 ? 0 : (1 - a) * v;
        double c = corner == 3 ? 0 : 1 - a - b;
        double sum = a + b + c;
        double[] x = {a / sum, b / sum, c / sum};
        double kelvin = celsius + 273.15;
        assertEquals(PointChecks.violations(CARD, x, kelvin, celsius).isEmpty(),
                PointChecks.within(CARD, x, kelvin), () -> Arrays.toString(x) + " at " + celsius + " °C");
    }

    @Property(tries = 500)
    void limitsThemselvesAgreeToo(@ForAll @IntRange(min = 0, max = 4) int which,
            @ForAll @DoubleRange(min = 0, max = 1) double u) {
        // points exactly on a stated limit: R at 0.5, the R + P ratio at 0.6, 0 °C, 40 °C, the Q + R pair at 10 °C
        double[][] points = {{0.5 * u, 0.5 * (1 - u), 0.5}, {0.4 * u, 0.4 * (1 - u), 0.6}, {0.2, 0.5, 0.3},
            {0.2, 0.5, 0.3}, {0.3, 0.4, 0.3}};
        double[] celsius = {20, 20, 0, 40, 10};
        // for which = 1, R/(R + P) = 0.6 exactly: P = 0.4·s, R = 0.6·s with s the pair's share
        double[] x = which == 1 ? new double[] {0.4 * (1 - u * 0.5), u * 0.5, 0.6 * (1 - u * 0.5)} : points[which];
        assertEquals(PointChecks.violations(CARD, x, celsius[which] + 273.15, celsius[which]).isEmpty(),
                PointChecks.within(CARD, x, celsius[which] + 273.15), () -> Arrays.toString(x));
    }
}
