package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * One row's cells read alone: each kind of value, and the message that names the row, its label and the column
 * (the label's column is 1, so value i is in column i + 2). Messages are compared whole against the catalogue's
 * patterns. All values are invented.
 */
class CardRowTest {
    /** Row 7 of a range: a label, then values as the grammar keeps them (null for a blank between values). */
    private static CardRow row(Object... values) {
        return new CardRow(7, "Density Coefficients", values);
    }

    private static void refused(Problem problem, String message, Executable read) {
        MiscelaException e = assertThrows(MiscelaException.class, read);
        assertEquals(problem, e.problem());
        assertEquals(message, e.getMessage());
    }

    @Test
    void keyIsTheNormalisedLabel() {
        assertEquals("density coefficients", new CardRow(3, "  Density   COEFFICIENTS: ", new Object[0]).key);
    }

    @Test
    void textAndNumbersReadFromTheirColumns() {
        CardRow r = row("alpha", 789.3, -0.25);
        assertEquals("alpha", r.text(0));
        assertEquals(789.3, r.number(1));
        assertArrayEquals(new double[] {789.3, -0.25}, r.numbersFrom(1));
    }

    @Test
    void aBlankOrAbsentValueNamesItsColumn() {
        refused(Problem.MISSING_VALUE, "Card row 7 (Density Coefficients): column 3 is empty; a value belongs there.",
                () -> row("alpha", null, 2.0).number(1));
        refused(Problem.MISSING_VALUE, "Card row 7 (Density Coefficients): column 5 is empty; a value belongs there.",
                () -> row("alpha", 1.0).number(3));
        refused(Problem.MISSING_VALUE, "Card row 7 (Density Coefficients): column 2 is empty; a value belongs there.",
                () -> row().text(0));
    }

    @Test
    void aValueOfTheOtherKindIsRefused() {
        refused(Problem.NOT_TEXT, "Card row 7 (Density Coefficients): column 2 must hold text; found 5.",
                () -> row(5.0).text(0));
        refused(Problem.NOT_A_NUMBER, "Card row 7 (Density Coefficients): column 3 holds the text \"789.3\" where a "
                + "number belongs.", () -> row("alpha", " 789.3 ").number(1));
    }

    @Test
    void aNumberMustBeFinite() {
        refused(Problem.NOT_FINITE, "Card row 7 (Density Coefficients): column 3 is not a finite number.",
                () -> row("alpha", Double.NaN).number(1));
        refused(Problem.NOT_FINITE, "Card row 7 (Density Coefficients): column 4 is not a finite number.",
                () -> row("alpha", 1.0, Double.NEGATIVE_INFINITY).numbersFrom(1));
    }

    @Test
    void aListOfNumbersHasNoGapAndAtLeastOneMember() {
        refused(Problem.MISSING_VALUE, "Card row 7 (Density Coefficients): column 4 is empty; a value belongs there.",
                () -> row("alpha", 1.0, null, 3.0).numbersFrom(1));
        refused(Problem.MISSING_VALUE, "Card row 7 (Density Coefficients): column 3 is empty; a value belongs there.",
                () -> row("alpha").numbersFrom(1));
    }

    @Test
    void atMostNamesTheFirstValueBeyondTheLimitAfterAnyGap() {
        row("alpha", 1.0).atMost(2);
        refused(Problem.EXTRA_VALUE, "Card row 7 (Density Coefficients): unexpected value in column 5 (\"extra\").",
                () -> row("alpha", 1.0, null, "extra").atMost(2));
        refused(Problem.EXTRA_VALUE, "Card row 7 (Density Coefficients): unexpected value in column 3 (\"0.5\").",
                () -> row("alpha", 0.5).atMost(1));
    }
}
