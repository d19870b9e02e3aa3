package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.TestCards;

/**
 * The trailing basis arguments through the adapter, on the card fitted to the OIML R 22 densities. Reference values:
 * the OIML R 22 (1975) formula (ρ(p = 0.3, 20 °C) = 953.784 kg/m³; the true 40 %vol blend, p = 0.332996, has
 * 957.615 kg/m³ at 5 °C and 2,500 L of it at 12 °C hold 793.575 kg of ethanol, computed from the formula in
 * StrengthReferenceTest), and the definitions of the bases.
 */
class BasisArgumentsTest {
    private static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");
    private static final double M_ETHANOL = 46.06844;
    private static final double M_WATER = 18.01528;
    private final MixtureAddIn addIn = new MixtureAddIn();

    private static Object[][] one(Object v) {
        return new Object[][] {{v}};
    }

    private static double x(double w) {
        return (w / M_ETHANOL) / (w / M_ETHANOL + (1 - w) / M_WATER);
    }

    /** Left out, the composition is mole fractions, as before; given, "%w/w" and friends are mass percent. */
    @Test
    void propertyFunctionsReadTheirBasis() throws IllegalArgumentException {
        double asMole = (Double) addIn.mixtureDensity(CARD, one(x(0.3)), one(20.0), Any.VOID, Any.VOID, Any.VOID);
        assertEquals(953.784, asMole, 0.011);
        for (String b : new String[] {"%w/w", "wt%", "mass %", "% m/m"}) {
            assertEquals(asMole, (Double) addIn.mixtureDensity(CARD, one(30.0), one(20.0), Any.VOID, b, Any.VOID),
                    1e-9, b);
        }
        assertEquals(asMole, (Double) addIn.mixtureDensity(CARD, new Object[][] {{0.3, 0.7}}, one(20.0), Any.VOID,
                "mass fraction", Any.VOID), 1e-9);
        assertEquals((Double) addIn.mixtureMolarMass(CARD, one(x(0.3)), Any.VOID, Any.VOID),
                (Double) addIn.mixtureMolarMass(CARD, one(0.3), "w", Any.VOID), 1e-12);
        assertEquals((Double) addIn.partialMolarVolume(CARD, one(1.0), one(x(0.3)), one(20.0), Any.VOID, Any.VOID,
                Any.VOID), (Double) addIn.partialMolarVolume(CARD, one(1.0), one(30.0), one(20.0), Any.VOID,
                "mass percent", Any.VOID), 1e-12);
        assertEquals("OK", addIn.checkPoint(CARD, one(30.0), one(20.0), Any.VOID, "%w/w", Any.VOID));
    }

    /** A strength stays at its 20 °C reference whatever the temperature of the evaluation. */
    @Test
    void strengthIsAtItsReference() throws IllegalArgumentException {
        assertEquals(957.615, (Double) addIn.mixtureDensity(CARD, one(40.0), one(5.0), Any.VOID, "%vol", Any.VOID),
                0.011);
        // stated at 5 °C, 40 %vol is a stronger blend (the true 40 %vol blend reads 39.76 %vol there), so lighter
        assertTrue((Double) addIn.mixtureDensity(CARD, one(40.0), one(5.0), Any.VOID, "%vol", 5.0) < 957.615 - 0.1);
        double read = (Double) addIn.compositionFromDensity(CARD, one(957.615), one(5.0), 1.0, "%vol", Any.VOID,
                Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID);
        assertEquals(40.0, read, 0.01);
    }

    /** MIX.RECIPE and MIX.ADJUST read %vol at the reference unless a basis temperature is given. */
    @Test
    void recipeTakesTheReferenceNotTheDeliveryTemperature() throws IllegalArgumentException {
        Object[][] now = (Object[][]) ((Any) addIn.recipe(CARD, one(2500.0), one("L"), one(40.0), one("%vol"),
                one(12.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(793.575, (Double) now[0][0], 0.05);
        Object[][] stated20 = (Object[][]) ((Any) addIn.recipe(CARD, one(2500.0), one("L"), one(40.0), one("%vol"),
                one(12.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID, 20.0)).getObject();
        assertEquals((Double) now[0][0], (Double) stated20[0][0], 0.0);
        Object[][] at12 = (Object[][]) ((Any) addIn.recipe(CARD, one(2500.0), one("L"), one(40.0), one("%vol"),
                one(12.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID, 12.0)).getObject();
        assertEquals(796.057, (Double) at12[0][0], 0.05);
    }

    /** The trace lists the reference and the basis the composition was read on. */
    @Test
    void traceShowsTheReference() throws IllegalArgumentException {
        Object[][] t = (Object[][]) ((Any) addIn.traceEvaluation(CARD, one(40.0), one(20.0), Any.VOID, Any.VOID,
                "%vol", Any.VOID)).getObject();
        assertEquals(20.0, value(t, "basis reference temperature [°C]"));
        assertEquals("default: 20 °C (OIML R 22)", value(t, "basis reference from"));
        assertEquals("strength", value(t, "composition basis"));
        assertEquals(20.0, value(t, "composition basis temperature [°C]"));
    }

    /** Out of range: the value typed is named, in the basis's own terms. */
    @Test
    void outOfRangeNamesTheValue() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one(140.0), one(20.0), Any.VOID, "mass %", Any.VOID));
        assertTrue(ex.getMessage().startsWith("The mass percent 140 is outside 0 to 100"), ex.getMessage());
        IllegalArgumentException unknown = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one(0.3), one(20.0), Any.VOID, "ppm", Any.VOID));
        assertTrue(unknown.getMessage().contains("\"ppm\" is not recognised"), unknown.getMessage());
    }

    private static Object value(Object[][] table, String label) {
        for (Object[] row : table) {
            if (label.equals(row[0])) {
                return row[1];
            }
        }
        throw new AssertionError("no row " + label);
    }
}
