package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.Catalogue;

/**
 * The layout rules of per-component results and of composition ranges (docs/functions.md): one component's value
 * alone on request, a result in the orientation of the argument it answers, and a column of two cells on a
 * two-component card refused when it could be either two values of x1 or one composition. The cards are the OIML R 22
 * ethanol-water card and an invented three-solvent card (invented, says so on itself); the compositions and amounts
 * below are invented inputs, and every expected value is the same call's full result or a single-value call, so each
 * check compares two routes through the adapter.
 */
class LayoutRulesTest {
    private static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");
    private static final Object[][] SOLVENTS = TestCards.cells("invented-ternary.tsv");
    private final MixtureAddIn addIn = new MixtureAddIn();

    private static Object[][] one(Object v) {
        return new Object[][] {{v}};
    }

    private static Object[][] grid(Object result) {
        assertTrue(result instanceof Any, "an array result, got " + result);
        return (Object[][]) ((Any) result).getObject();
    }

    private Object recipe(Object[][] card, Object[][] composition, String basis, Object component) throws Exception {
        return addIn.recipe(card, one(2.5), one("L"), composition, one(basis), one(20.0), Any.VOID, "kg", Any.VOID,
                Any.VOID, component, Any.VOID);
    }

    private Object convert(Object[][] card, Object[][] values, Object component) throws Exception {
        return addIn.convertComposition(card, values, one("mass fraction"), one("mole fraction"), Any.VOID, Any.VOID,
                Any.VOID, Any.VOID, component);
    }

    private Object adjust(Object[][] amounts, Object result, Object component) throws Exception {
        return addIn.adjustBatch(CARD, amounts, one("g"), one(0.4), one("mass fraction"), one(20.0), Any.VOID,
                Any.VOID, Any.VOID, result, "g", Any.VOID, Any.VOID, component, Any.VOID);
    }

    private static String entry(IllegalArgumentException e) {
        return Catalogue.entryOf(e.getMessage());
    }

    // --- 1. one component at a time

    @Test
    void aRecipesComponentAloneIsThatElementOfTheWholeRecipeByNumberAndByName() throws Exception {
        Random r = new Random(14);
        for (int trial = 0; trial < 40; trial++) {
            double w = 0.05 + 0.9 * r.nextDouble();
            Object[][] whole = grid(recipe(CARD, one(w), "mass fraction", Any.VOID));
            assertEquals(1, whole.length, "a lone number gives a row");
            assertEquals(2, whole[0].length);
            assertEquals((Double) whole[0][0], (Double) recipe(CARD, one(w), "mass fraction", 1.0), 0.0);
            assertEquals((Double) whole[0][1], (Double) recipe(CARD, one(w), "mass fraction", 2.0), 0.0);
            assertEquals((Double) whole[0][1], (Double) recipe(CARD, one(w), "mass fraction", "water"), 0.0);
            assertEquals((Double) whole[0][0], (Double) recipe(CARD, one(w), "mass fraction", "ethanol"), 0.0);
        }
    }

    @Test
    void aTernaryRecipesComponentsAloneAreItsElementsInEveryOrientation() throws Exception {
        Random r = new Random(3);
        for (int trial = 0; trial < 20; trial++) {
            double a = 0.1 + 0.4 * r.nextDouble();
            double b = 0.1 + 0.3 * r.nextDouble();
            Object[][] row = {{a, b, 1 - a - b}};
            Object[][] column = {{a}, {b}, {1 - a - b}};
            Object[][] whole = grid(recipe(SOLVENTS, row, "mole fraction", Any.VOID));
            Object[][] down = grid(recipe(SOLVENTS, column, "mole fraction", Any.VOID));
            assertEquals(1, whole.length, "a row gives a row");
            assertEquals(3, down.length, "a column gives a column");
            for (int k = 0; k < 3; k++) {
                assertEquals((Double) whole[0][k], (Double) down[k][0], 0.0);
                assertEquals((Double) whole[0][k], (Double) recipe(SOLVENTS, row, "mole fraction", k + 1.0), 0.0);
                assertEquals((Double) whole[0][k], (Double) recipe(SOLVENTS, column, "mole fraction", k + 1.0), 0.0);
            }
        }
    }

    @Test
    void aBlockWithAComponentGivesAColumnOfThatComponentOnePerLine() throws Exception {
        Object[][] block = {{0.2, 0.8}, {"", ""}, {0.6, 0.4}};
        Object[][] whole = grid(recipe(CARD, block, "mass fraction", Any.VOID));
        Object[][] water = grid(recipe(CARD, block, "mass fraction", "water"));
        assertEquals(3, water.length);
        assertEquals(1, water[0].length);
        assertEquals((Double) whole[0][1], (Double) water[0][0], 0.0);
        assertEquals("", water[1][0], "a blank line stays blank");
        assertEquals((Double) whole[2][1], (Double) water[2][0], 0.0);
    }

    @Test
    void aConversionsComponentAloneIsThatElement() throws Exception {
        Object[][] whole = grid(convert(CARD, new Object[][] {{0.3, 0.7}}, Any.VOID));
        assertEquals((Double) whole[0][1], (Double) convert(CARD, new Object[][] {{0.3, 0.7}}, 2.0), 0.0);
        // a lone number gives the first component's value unless another is named
        assertEquals((Double) whole[0][0], (Double) convert(CARD, one(0.3), Any.VOID), 0.0);
        assertEquals((Double) whole[0][1], (Double) convert(CARD, one(0.3), "water"), 0.0);
        assertEquals(1.0, (Double) whole[0][0] + (Double) whole[0][1], 1e-12, "mole fractions sum to 1");
    }

    @Test
    void anAdditionAloneIsThatElementAndTheAdditionsFollowTheBatchsOrientation() throws Exception {
        Object[][] asRow = grid(adjust(new Object[][] {{500.0, 500.0}}, Any.VOID, Any.VOID));
        Object[][] asColumn = grid(adjust(new Object[][] {{500.0}, {500.0}}, Any.VOID, Any.VOID));
        assertEquals(1, asRow.length);
        assertEquals(2, asRow[0].length);
        assertEquals(2, asColumn.length, "a batch given as a column gives the additions as a column");
        assertEquals(1, asColumn[0].length);
        for (int k = 0; k < 2; k++) {
            assertEquals((Double) asRow[0][k], (Double) asColumn[k][0], 0.0);
            assertEquals((Double) asRow[0][k], (Double) adjust(new Object[][] {{500.0}, {500.0}}, Any.VOID, k + 1.0),
                    0.0);
            assertEquals((Double) asRow[0][k], (Double) adjust(new Object[][] {{500.0, 500.0}}, "additions",
                    k + 1.0), 0.0);
        }
        // 500 g + 500 g to w = 0.4 ethanol needs only water: 500/0.4 − 1000 = 250 g (mass balance)
        assertEquals(0.0, (Double) asRow[0][0], 1e-9);
        assertEquals(250.0, (Double) asRow[0][1], 1e-9);
    }

    @Test
    void aComponentWithAWholeBatchResultIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> adjust(new Object[][] {{500.0, 500.0}}, "volume", 2.0));
        assertEquals("Problem.COMPONENT_NOT_HERE", entry(e), e.getMessage());
        assertTrue(e.getMessage().contains("\"volume\""), e.getMessage());
    }

    @Test
    void aComponentNotOnTheCardIsRefused() {
        for (Object bad : new Object[] {0.0, 3.0, "glycerol"}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> recipe(CARD, one(0.4), "mass fraction", bad));
            assertEquals("Problem.UNKNOWN_COMPONENT_ARG", entry(e), e.getMessage());
        }
    }

    // --- 2. orientation

    @Test
    void aRecipeFollowsTheCompositionsOrientation() throws Exception {
        Object[][] row = grid(recipe(CARD, new Object[][] {{0.4, 0.6}}, "mass fraction", Any.VOID));
        Object[][] column = grid(recipe(CARD, new Object[][] {{0.4}, {0.6}}, "mass fraction", Any.VOID));
        assertEquals(1, row.length);
        assertEquals(2, row[0].length);
        assertEquals(2, column.length);
        assertEquals(1, column[0].length);
        assertEquals((Double) row[0][1], (Double) column[1][0], 0.0);
    }

    // --- 3. reading a composition range on a two-component card

    @Test
    void aTwoCellColumnAddingUpToOneIsRefusedWithTheRule() {
        for (Object[][] column : new Object[][][] {{{0.3}, {0.7}}, {{0.5}, {0.5}}, {{1.0}, {0.0}}}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> addIn.mixtureDensity(CARD, column, one(20.0), Any.VOID, Any.VOID, Any.VOID));
            assertEquals("Problem.COMPOSITION_AMBIGUOUS", entry(e), e.getMessage());
            assertTrue(e.getMessage().contains("row of two cells"), e.getMessage());
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.partialMolarVolume(CARD, one(1.0), new Object[][] {{0.25}, {0.75}}, one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.COMPOSITION_AMBIGUOUS", entry(e), e.getMessage());
    }

    @Test
    void theUnambiguousFormsGiveWhatTheRuleSays() throws Exception {
        double at03 = (Double) addIn.mixtureDensity(CARD, one(0.3), one(20.0), Any.VOID, Any.VOID, Any.VOID);
        double at07 = (Double) addIn.mixtureDensity(CARD, one(0.7), one(20.0), Any.VOID, Any.VOID, Any.VOID);
        double at02 = (Double) addIn.mixtureDensity(CARD, one(0.2), one(20.0), Any.VOID, Any.VOID, Any.VOID);
        // a row of two cells is one composition (x1, x2)
        assertEquals(at03, (Double) addIn.mixtureDensity(CARD, new Object[][] {{0.3, 0.7}}, one(20.0), Any.VOID, Any.VOID, Any.VOID),
                0.0);
        // a column of two cells not adding up to 1 is two values of x1
        Object[][] two = grid(addIn.mixtureDensity(CARD, new Object[][] {{0.3}, {0.2}}, one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertArrayEquals(new Object[] {at03, at02}, new Object[] {two[0][0], two[1][0]});
        // a column of three cells on a two-component card is three values of x1, even when they add up to 1
        Object[][] three = grid(addIn.mixtureDensity(CARD, new Object[][] {{0.3}, {0.0}, {0.7}}, one(20.0),
                Any.VOID, Any.VOID, Any.VOID));
        assertEquals(3, three.length);
        assertEquals(at07, (Double) three[2][0], 0.0);
        // a blank beside x1 is a blank x1, not half a composition
        Object[][] blank = grid(addIn.mixtureDensity(CARD, new Object[][] {{0.3}, {""}}, one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertEquals(at03, (Double) blank[0][0], 0.0);
        assertEquals("", blank[1][0]);
        // on a three-component card a column of three cells is one composition
        double rowResult = (Double) addIn.mixtureDensity(SOLVENTS, new Object[][] {{0.2, 0.5, 0.3}}, one(20.0),
                Any.VOID, Any.VOID, Any.VOID);
        assertEquals(rowResult, (Double) addIn.mixtureDensity(SOLVENTS, new Object[][] {{0.2}, {0.5}, {0.3}},
                one(20.0), Any.VOID, Any.VOID, Any.VOID), 0.0);
    }

    @Test
    void explainGivesTheRuleForTheAmbiguousColumn() {
        String words = addIn.explainCall(one("MIX.DENSITY"), new Object[] {CARD, new Object[][] {{0.4}, {0.6}},
            20.0});
        assertTrue(words.contains("could also be one composition"), words);
    }
}
