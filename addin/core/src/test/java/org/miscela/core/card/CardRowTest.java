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
        refused(Problem.NOT_A_NUMBER, "Card row 7 (Density Coefficients): column 3 holds the text \"heavy\" where a "
                + "number belongs.", () -> row("alpha", " heavy ").number(1));
        refused(Problem.NOT_A_NUMBER, "Card row 7 (Density Coefficients): column 3 holds the text \"1.234,5\" where "
                + "a number belongs.", () -> row("alpha", "1.234,5").number(1));
    }

    /** A number kept as text names the decimal separator: the other locale's, an apostrophe or a text cell. */
    @Test
    void aNumberKeptAsTextNamesTheDecimalSeparator() {
        String advice = " Calc keeps a number as text when it is typed with the decimal separator its locale does "
                + "not use, after an apostrophe, or in a cell formatted as text: enter it as a number, with the decimal "
                + "separator of Calc's locale (Tools ▸ Options ▸ Language Settings ▸ Languages).";
        refused(Problem.NUMBER_AS_TEXT, "Card row 7 (Density Coefficients): column 3 holds the text \"0,998\" where a "
                + "number belongs; it reads as 0.998 with ',' as the decimal separator." + advice,
                () -> row("alpha", "0,998").number(1));
        refused(Problem.NUMBER_AS_TEXT, "Card row 7 (Density Coefficients): column 4 holds the text \"-0.84\" where a "
                + "number belongs; it reads as -0.84 with '.' as the decimal separator." + advice,
                () -> row("alpha", 789.3, " -0.84 ").numbersFrom(1));
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
