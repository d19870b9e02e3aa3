package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCard;
import org.miscela.core.model.ExcessFunction;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import org.junit.jupiter.api.Test;

/**
 * The trace's numbers against the same quantities computed another way: each result through its own cell function
 * ({@link CardFunctions}), each card number as the card states it, each unit conversion by the SI definitions
 * (°C + 273.15 = K, 1 g/cm³ = 1000 kg/m³, 1 L = 1000 cm³, 1 kg = 1000 g, 1 kJ = 1000 J), each pair term by the model's
 * definition (Toop: d = 2x_a − 1 for the asymmetric component's pairs; the set written the other way round has
 * A_k → (−1)^k A_k), and the derivatives by differences. The cards use units other than the internal ones so that
 * every conversion shows; their values are invented.
 */
class TraceTest {
    private static final double[] X = {0.2, 0.3, 0.5};

    /** Three components in °C, g/cm³, L/mol and kg/mol; Toop with beta asymmetric; alpha + gamma ideal. */
    static Card volumeCard() {
        return TestCard.empty().row("Miscela card", 2)
                .row("title", "Trace audit").row("source", "invented values, for tests")
                .row("temperature unit", "°C").row("density unit", "g/cm³").row("molar volume unit", "L/mol")
                .row("molar mass unit", "kg/mol").row("valid temperature", 10, 40)
                .row("multicomponent model", "Toop", "beta").row("missing pairs", "ideal")
                .row("component", "alpha", 0.04607).row("component", "beta", 0.018015)
                .row("component", "gamma", 0.09209)
                .row("density model", "alpha", "polynomial").row("density reference temperature", "alpha", 20)
                .row("density coefficients", "alpha", 0.7893, -0.00085)
                .row("density model", "beta", "constant").row("density coefficients", "beta", 0.997)
                .row("density model", "gamma", "constant").row("density coefficients", "gamma", 1.261)
                .row("valid mole fraction", "alpha", 0, 1)
                .row("excess volume A0", "alpha + beta", -0.004, 0.00002)
                .row("excess volume A1", "alpha + beta", 0.0015)
                .row("excess volume reference temperature", "alpha + beta", 25)
                .row("excess volume A0", "beta + gamma", -0.0008)
                .row("excess volume ternary C0", "alpha + beta + gamma", 0.0003)
                .row("valid pair temperature", "alpha + beta", 15, 35).read();
    }

    /** Three components with excess enthalpy in kJ/mol, heat capacities for two of them. */
    static Card enthalpyCard() {
        return TestCard.ternary().row("enthalpy unit", "kJ/mol")
                .row("excess enthalpy A0", "alpha + beta", -0.5, 0.002)
                .row("excess enthalpy reference temperature", "alpha + beta", 298.15)
                .row("excess enthalpy A1", "alpha + beta", 0.12)
                .row("excess enthalpy A0", "alpha + gamma", 0.2).row("excess enthalpy A0", "beta + gamma", 0.1)
                .row("excess enthalpy ternary C0", "alpha + beta + gamma", 0.04)
                .row("heat capacity", "alpha", 0.112).row("heat capacity", "beta", 0.0753).read();
    }

    static Object value(Object[][] rows, String label) {
        Object found = null;
        for (Object[] row : rows) {
            if (row[0].equals(label)) {
                if (found != null) {
                    fail("the trace has the label \"" + label + "\" twice");
                }
                found = row[1];
            }
        }
        if (found == null) {
            fail("the trace has no row \"" + label + "\"");
        }
        return found;
    }

    static double number(Object[][] rows, String label) {
        Object v = value(rows, label);
        assertTrue(v instanceof Double, label + " should be a number, is " + v);
        return (Double) v;
    }

    private static void close(double expected, Object[][] rows, String label) {
        assertEquals(expected, number(rows, label), 1e-12 * Math.max(1e-3, Math.abs(expected)), label);
    }

    @Test
    void volumeTraceInTheCardsUnits() {
        Card card = volumeCard();
        double t = 30;
        Extrapolation e = Extrapolation.AS_CARD;
        Object[][] rows = CardFunctions.trace(card, X, t, PropertyKind.VOLUME, e);
        assertEquals("Trace audit", value(rows, "card"));
        assertEquals("invented values, for tests", value(rows, "source"));
        assertEquals("volume", value(rows, "property"));
        assertEquals(3.0, number(rows, "components"));
        assertEquals("Toop (asymmetric component: beta)", value(rows, "multicomponent model"));
        assertEquals(30.0, number(rows, "temperature [°C]"));
        close(303.15, rows, "temperature [K]");
        assertEquals("refused (the card's default)", value(rows, "extrapolation"));
        assertEquals("none", value(rows, "outside validity"));
        String[] names = {"alpha", "beta", "gamma"};
        double[] kgPerMol = {0.04607, 0.018015, 0.09209};
        double[] gPerCm3 = {0.7893 - 0.00085 * (t - 20), 0.997, 1.261};
        for (int k = 0; k < 3; k++) {
            close(X[k], rows, "mole fraction: " + names[k]);
            close(kgPerMol[k], rows, "molar mass: " + names[k] + " [kg/mol]");
            close(gPerCm3[k], rows, "pure density: " + names[k] + " [g/cm³]");
            close(CardFunctions.pureDensity(card, k, t, e), rows, "pure density: " + names[k] + " [g/cm³]");
            // M/ρ: kg/mol over kg/m³ is m³/mol, a thousand litres each
            close(kgPerMol[k] / (1000 * gPerCm3[k]) * 1000, rows, "pure molar volume: " + names[k] + " [L/mol]");
        }
        assertEquals("polynomial", value(rows, "pure density model: alpha"));
        assertEquals("constant", value(rows, "pure density model: beta"));

        assertEquals(0.0, number(rows, "pair term: alpha + gamma [L/mol]"));
        assertEquals("none on the card: treated as ideal", value(rows, "pair coefficients: alpha + gamma"));
        // beta is Toop's asymmetric component: its pairs are written beta first, with d = 2·x_beta − 1
        double d = 2 * X[1] - 1;
        close(d, rows, "pair argument d: beta + alpha");
        close(d, rows, "pair argument d: beta + gamma");
        double a0 = -0.004 + 0.00002 * (t - 25);
        double a1 = -0.0015;
        close(a0, rows, "A0 at T: beta + alpha [L/mol]");
        close(a1, rows, "A1 at T: beta + alpha [L/mol]");
        close(-0.0008, rows, "A0 at T: beta + gamma [L/mol]");
        double ab = X[1] * X[0] * (a0 + a1 * d);
        double bg = X[1] * X[2] * -0.0008;
        double abc = X[0] * X[1] * X[2] * 0.0003;
        close(ab, rows, "pair term: beta + alpha [L/mol]");
        close(bg, rows, "pair term: beta + gamma [L/mol]");
        close(0.0003, rows, "C0 at T: alpha + beta + gamma [L/mol]");
        close(abc, rows, "ternary term: alpha + beta + gamma [L/mol]");
        close(ab + bg + abc, rows, "excess molar volume [L/mol]");
        close(CardFunctions.excessMolarVolume(card, X, t, e), rows, "excess molar volume [L/mol]");

        ExcessFunction f = card.excessVolume();
        double mean = 0;
        for (int k = 0; k < 3; k++) {
            // ∂V^E/∂x_k with the other fractions held (the trace's gradient), by a five-point difference in cm³/mol
            double h = 1e-3;
            double[][] at = new double[4][];
            double[] steps = {-2 * h, -h, h, 2 * h};
            for (int s = 0; s < 4; s++) {
                at[s] = X.clone();
                at[s][k] += steps[s];
            }
            double slope = (f.value(at[0], 303.15) - 8 * f.value(at[1], 303.15) + 8 * f.value(at[2], 303.15)
                    - f.value(at[3], 303.15)) / (12 * h) / 1000;
            // a cubic in x: the five-point difference is exact to rounding
            assertEquals(slope, number(rows, "derivative dVE/dx: " + names[k] + " [L/mol]"), 1e-12, names[k]);
            mean += X[k] * number(rows, "derivative dVE/dx: " + names[k] + " [L/mol]");
            close(CardFunctions.partialExcessMolarVolume(card, k, X, t, e), rows,
                    "partial molar excess volume: " + names[k] + " [L/mol]");
            close(CardFunctions.partialMolarVolume(card, k, X, t, e), rows,
                    "partial molar volume: " + names[k] + " [L/mol]");
        }
        close(mean, rows, "sum of x·dVE/dx [L/mol]");
        close(CardFunctions.molarVolume(card, X, t, e), rows, "mixture molar volume [L/mol]");
        close(X[0] * kgPerMol[0] + X[1] * kgPerMol[1] + X[2] * kgPerMol[2], rows, "mean molar mass [kg/mol]");
        close(CardFunctions.density(card, X, t, e), rows, "mixture density [g/cm³]");
    }

    /** Outside a pair's temperature range the trace names the range in the card's unit, and the chosen route. */
    @Test
    void outsideValidityAndExtrapolation() {
        Card card = volumeCard();
        Object[][] allowed = CardFunctions.trace(card, X, 37, PropertyKind.VOLUME, Extrapolation.ALLOW);
        assertEquals("allowed by the extrapolate argument", value(allowed, "extrapolation"));
        String outside = (String) value(allowed, "outside validity");
        assertTrue(outside.contains("37 °C") && outside.contains("15 to 35 °C") && outside.contains("alpha + beta"),
                outside);
        assertTrue(!outside.contains("Extrapolation is refused"), outside);
        Object[][] refused = CardFunctions.trace(card, X, 30, PropertyKind.VOLUME, Extrapolation.REFUSE);
        assertEquals("refused by the extrapolate argument", value(refused, "extrapolation"));
    }

    @Test
    void enthalpyTraceInTheCardsUnits() {
        Card card = enthalpyCard();
        double t = 300;
        Extrapolation e = Extrapolation.AS_CARD;
        Object[][] rows = CardFunctions.trace(card, X, t, PropertyKind.ENTHALPY, e);
        assertEquals("enthalpy", value(rows, "property"));
        assertEquals("Muggianu", value(rows, "multicomponent model"));
        close(-0.5 + 0.002 * (t - 298.15), rows, "A0 at T: alpha + beta [kJ/mol]");
        close(0.12, rows, "A1 at T: alpha + beta [kJ/mol]");
        close(0.04, rows, "C0 at T: alpha + beta + gamma [kJ/mol]");
        close(CardFunctions.excessEnthalpy(card, X, t, e), rows, "excess molar enthalpy [kJ/mol]");
        String[] names = {"alpha", "beta", "gamma"};
        for (int k = 0; k < 3; k++) {
            close(CardFunctions.partialExcessEnthalpy(card, k, X, t, e), rows,
                    "partial molar excess enthalpy: " + names[k] + " [kJ/mol]");
        }
        // dH^E/dT: the coefficients are linear in T, so a central difference is exact to rounding
        double slope = (CardFunctions.excessEnthalpy(card, X, t + 1, e) - CardFunctions.excessEnthalpy(card, X, t - 1,
                e)) / 2;
        assertEquals(slope, number(rows, "excess heat capacity dHE/dT [kJ/mol/K]"), 1e-14);
        assertTrue(Math.abs(slope) > 1e-5, "the card's enthalpy depends on temperature");
        close(0.112, rows, "heat capacity: alpha [kJ/mol/K]");
        close(0.0753, rows, "heat capacity: beta [kJ/mol/K]");
        assertEquals("not on the card", value(rows, "heat capacity: gamma [kJ/mol/K]"));
    }

    /** Toop's asymmetric component may be the first; a ternary term with C0 alone shows no C1 or C2 row. */
    @Test
    void toopWithTheFirstComponentAsymmetric() {
        Card card = TestCard.ternary().row("multicomponent model", "Toop", "alpha")
                .row("excess volume ternary C0", "alpha + beta + gamma", 0.3).read();
        Object[][] rows = CardFunctions.trace(card, X, 298.15, PropertyKind.VOLUME, Extrapolation.AS_CARD);
        assertEquals("Toop (asymmetric component: alpha)", value(rows, "multicomponent model"));
        close(2 * X[0] - 1, rows, "pair argument d: alpha + beta");
        close(0.3, rows, "C0 at T: alpha + beta + gamma [cm³/mol]");
        for (Object[] row : rows) {
            assertTrue(!((String) row[0]).startsWith("C1 at T") && !((String) row[0]).startsWith("C2 at T"),
                    "a row for a coefficient the card does not give: " + row[0]);
        }
    }
}
