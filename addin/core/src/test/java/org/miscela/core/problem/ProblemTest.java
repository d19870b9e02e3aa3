package org.miscela.core.problem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The one catalogue: its sections, and the statement of an entry as apart from its advice. */
class ProblemTest {
    @Test
    void theSectionsFollowEachOtherInCatalogueOrderAndNoneIsEmpty() {
        List<Problem> bySection = new ArrayList<>();
        for (Problem.Section s : Problem.Section.values()) {
            assertFalse(Problem.of(s).isEmpty(), s.toString());
            bySection.addAll(Problem.of(s));
        }
        assertEquals(Arrays.asList(Problem.values()), bySection, "each section is one run of entries, in order");
    }

    @Test
    void theStatementIsTheMessageWithoutItsAdvice() {
        assertEquals("The temperature 45 °C is outside the card's validity range 0 to 40 °C.",
                Problem.OUTSIDE_TEMPERATURE.statement("45", "°C", "0", "40", "°C"));
        assertEquals("The temperature 45 °C is outside the card's validity range 0 to 40 °C. Extrapolation is refused; "
                + "to accept it, pass TRUE as 'extrapolate' or write 'extrapolation | allow' on the card.",
                Problem.OUTSIDE_TEMPERATURE.format("45", "°C", "0", "40", "°C"));
        // an entry without advice: the statement is the whole message
        assertEquals(Problem.ARG_BLANK.format("component"), Problem.ARG_BLANK.statement("component"));
        List<Problem> advised = new ArrayList<>();
        for (Problem p : Problem.values()) {
            if (p.pattern().contains("Extrapolation is refused")) {
                advised.add(p);
                assertTrue(p.pattern().endsWith(". Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' "
                        + "or write 'extrapolation | allow' on the card."), p.toString());
            }
        }
        // the validity limits (the vapour-pressure constants' range among them) and the blending path outside them
        assertEquals(Arrays.asList(Problem.OUTSIDE_VAPOUR_PRESSURE, Problem.OUTSIDE_PAIR_TEMPERATURE, Problem.OUTSIDE_PAIR_COMPOSITION,
                Problem.OUTSIDE_FINAL_TEMPERATURE, Problem.OUTSIDE_TEMPERATURE, Problem.OUTSIDE_COMPOSITION,
                Problem.EMPTY_PATH), advised);
    }
}
