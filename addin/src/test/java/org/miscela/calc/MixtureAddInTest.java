package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import org.junit.jupiter.api.Test;
import org.miscela.core.CardFunctions;
import org.miscela.core.Extrapolation;
import org.miscela.core.TestCards;

/** The UNO adapter in a plain JVM: argument decoding, array results, blanks and error mapping. */
class MixtureAddInTest {
    private static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");
    private final MixtureAddIn addIn = new MixtureAddIn();

    private static Object[][] one(Object v) {
        return new Object[][] {{v}};
    }

    @Test
    void scalarArgumentsGiveOneNumber() throws Exception {
        Object r = addIn.mixtureDensity(CARD, one(0.3), one(20.0), Any.VOID);
        double expected = CardFunctions.density(TestCards.card("ethanol-water-oiml.tsv"), 0.3, 20,
                Extrapolation.AS_CARD);
        assertEquals(expected, (Double) r, 0.0);
    }

    @Test
    void aColumnGivesAColumnAndBlanksStayBlank() throws Exception {
        Object[][] xs = {{0.1}, {""}, {0.5}};
        Object r = addIn.excessMolarVolume(CARD, xs, one(20.0), Any.VOID);
        Object[][] grid = (Object[][]) ((Any) r).getObject();
        assertEquals(3, grid.length);
        assertTrue(grid[0][0] instanceof Double);
        assertEquals("", grid[1][0]);
        assertEquals((Double) addIn.excessMolarVolume(CARD, one(0.5), one(20.0), Any.VOID), (Double) grid[2][0], 0.0);
    }

    @Test
    void temperatureColumnPairsWithCompositionColumn() throws Exception {
        Object[][] xs = {{0.2}, {0.2}};
        Object[][] ts = {{10.0}, {30.0}};
        Object[][] grid = (Object[][]) ((Any) addIn.mixtureDensity(CARD, xs, ts, Any.VOID)).getObject();
        assertTrue((Double) grid[0][0] > (Double) grid[1][0], "density falls with temperature");
    }

    @Test
    void mismatchedShapesAreRefused() {
        Object[][] xs = {{0.2}, {0.3}};
        Object[][] ts = {{10.0}, {20.0}, {30.0}};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, xs, ts, Any.VOID));
        assertTrue(e.getMessage().contains("same shape"), e.getMessage());
    }

    @Test
    void componentByNumberOrName() throws Exception {
        Object byNumber = addIn.partialMolarVolume(CARD, 2.0, one(0.4), one(25.0), Any.VOID);
        Object byName = addIn.partialMolarVolume(CARD, "Water", one(0.4), one(25.0), Any.VOID);
        assertEquals((Double) byNumber, (Double) byName, 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.partialMolarVolume(CARD, 3.0, one(0.4), one(25.0), Any.VOID));
        assertTrue(e.getMessage().contains("ethanol, water"), e.getMessage());
    }

    @Test
    void outsideTheValidityRangeIsRefusedUnlessAllowed() throws Exception {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one(0.4), one(45.0), Any.VOID));
        assertTrue(e.getMessage().contains("0 to 40 °C"), e.getMessage());
        assertTrue((Double) addIn.mixtureDensity(CARD, one(0.4), one(45.0), Boolean.TRUE) > 0);
        assertTrue(addIn.checkPoint(CARD, one(0.4), one(45.0), Any.VOID).contains("outside"));
        assertEquals("OK", addIn.checkPoint(CARD, one(0.4), one(45.0), 1.0));
    }

    @Test
    void textWhereANumberBelongs() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one("abc"), one(20.0), Any.VOID));
        assertTrue(e.getMessage().contains("mole fraction"), e.getMessage());
    }

    @Test
    void checkCardReportsTheFirstProblem() {
        assertEquals("OK", addIn.checkCard(CARD));
        Object[][] broken = CARD.clone();
        broken[3] = new Object[] {"temperature unit", "°F"};
        String message = addIn.checkCard(broken);
        assertTrue(message.startsWith("Card row 4 (temperature unit)"), message);
        assertThrows(IllegalArgumentException.class, () -> addIn.mixtureDensity(broken, one(0.4), one(20.0),
                Any.VOID));
    }
}
