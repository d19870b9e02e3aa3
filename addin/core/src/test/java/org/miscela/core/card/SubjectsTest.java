package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/** Subjects of keyed rows resolved against the declared components (invented names), without a whole card. */
class SubjectsTest {
    private static final Subjects SUBJECTS = new Subjects(Arrays.asList("Alpha", "beta  acid", "gamma"));

    private static CardRow subject(String text) {
        return new CardRow(12, "excess volume A0", new Object[] {text, 1.0});
    }

    private static MiscelaException refused(Problem problem, Runnable read) {
        MiscelaException e = assertThrows(MiscelaException.class, read::run);
        assertEquals(problem, e.problem());
        return e;
    }

    @Test
    void membersAreFoundInTheOrderWrittenWhateverTheCaseAndSpacing() {
        assertArrayEquals(new int[] {1, 0}, SUBJECTS.members(subject(" BETA ACID +alpha")));
        assertArrayEquals(new int[] {2, 0, 1}, SUBJECTS.members(subject("gamma + alpha + Beta Acid")));
        assertArrayEquals(new int[] {0, 2}, SUBJECTS.pair(subject("alpha + gamma")));
        assertEquals(2, SUBJECTS.indexOf(" Gamma:"));
        assertEquals(-1, SUBJECTS.indexOf("delta"));
    }

    @Test
    void namesAreJoinedInTheirDeclaredSpelling() {
        assertEquals("gamma + Alpha", SUBJECTS.joined(2, 0));
        assertEquals("Alpha + beta  acid + gamma", SUBJECTS.joined(0, 1, 2));
    }

    @Test
    void aSetKeyIgnoresTheOrderWritten() {
        assertEquals(Subjects.setKey(0, 2), Subjects.setKey(2, 0));
        assertEquals(Subjects.setKey(2, 0, 1), Subjects.setKey(0, 1, 2));
        assertEquals(false, Subjects.setKey(0, 1).equals(Subjects.setKey(0, 2)));
    }

    @Test
    void aPairRowTakesExactlyTwoDifferentComponents() {
        assertEquals("Card row 12 (excess volume A0): \"alpha + beta acid + gamma\" must name two different components "
                + "joined by '+', e.g. 'ethanol + water'.",
                refused(Problem.BAD_PAIR, () -> SUBJECTS.pair(subject("alpha + beta acid + gamma"))).getMessage());
        refused(Problem.BAD_PAIR, () -> SUBJECTS.members(subject("alpha + ALPHA")));
        refused(Problem.BAD_PAIR, () -> SUBJECTS.members(subject("alpha +  ")));
        refused(Problem.BAD_PAIR, () -> SUBJECTS.members(subject("alpha beta")));
        refused(Problem.BAD_PAIR, () -> SUBJECTS.members(subject("alpha + gamma + beta acid"), 2));
    }

    @Test
    void aTernaryRowTakesExactlyThreeDifferentComponents() {
        refused(Problem.BAD_TRIPLE, () -> SUBJECTS.members(subject("alpha + gamma"), 3));
        refused(Problem.BAD_TRIPLE, () -> SUBJECTS.members(subject("alpha + gamma + alpha")));
    }

    @Test
    void anUndeclaredNameIsNamedTrimmed() {
        assertEquals("Card row 12 (excess volume A0): \"delta\" is not declared by a 'component' row.",
                refused(Problem.UNKNOWN_COMPONENT, () -> SUBJECTS.members(subject("alpha +  delta "))).getMessage());
    }
}
