package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The validity check's structured result: each limit a point crosses, as the limit in words (what the audit trace
 * lists) and as the refusal (the limit and the advice on extrapolation). The trace takes the limit as it is, without
 * cutting a message at a phrase. invented-limits.tsv (invented values, said so on the card): X + Y, valid from 0 to
 * 60 °C, the pair from 10 to 30 °C only.
 */
class ValidityViolationTest {
    private static final String ADVICE = " Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write "
            + "'extrapolation | allow' on the card.";
    private static final Card LIMITS = TestCards.card("invented-limits.tsv");

    @Test
    void eachLimitCrossedIsTheLimitAndTheRefusalIsTheLimitWithTheAdvice() {
        // 70 °C is outside the card's 0 to 60 °C and the pair's 10 to 30 °C
        List<Violation> found = PointChecks.violations(LIMITS, new double[] {0.5, 0.5}, 343.15, 70);
        assertEquals(2, found.size());
        assertEquals(Problem.OUTSIDE_TEMPERATURE, found.get(0).problem());
        assertEquals("The temperature 70 °C is outside the card's validity range 0 to 60 °C.", found.get(0).limit());
        assertEquals(Problem.OUTSIDE_PAIR_TEMPERATURE, found.get(1).problem());
        assertEquals("The temperature 70 °C is outside the range 10 to 30 °C stated for the pair X + Y.",
                found.get(1).limit());
        for (Violation v : found) {
            MiscelaException refusal = v.refusal();
            assertEquals(v.problem(), refusal.problem());
            assertEquals(v.limit() + ADVICE, refusal.getMessage());
        }
        // the refusal of a calculation there is the first limit's
        MiscelaException refused = org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class,
                () -> CardFunctions.density(LIMITS, new double[] {0.5, 0.5}, 70, Extrapolation.AS_CARD));
        assertEquals(found.get(0).refusal().getMessage(), refused.getMessage());
    }

    @Test
    void theTraceListsTheLimitsAsTheCheckGivesThem() {
        Object[][] rows = CardFunctions.trace(LIMITS, new double[] {0.5, 0.5}, 40, PropertyKind.VOLUME,
                Extrapolation.ALLOW);
        List<Object> listed = new ArrayList<>();
        for (Object[] row : rows) {
            if (row[0].equals("outside validity")) {
                listed.add(row[1]);
            }
        }
        assertEquals(List.of("The temperature 40 °C is outside the range 10 to 30 °C stated for the pair X + Y."),
                listed);
        // inside every limit: "none"
        List<Object> none = new ArrayList<>();
        for (Object[] row : CardFunctions.trace(LIMITS, new double[] {0.5, 0.5}, 20, PropertyKind.VOLUME,
                Extrapolation.AS_CARD)) {
            if (row[0].equals("outside validity")) {
                none.add(row[1]);
            }
        }
        assertEquals(List.of("none"), none);
    }
}
