package org.miscela.core.card;

import org.miscela.core.functions.CardFunctions;
import org.miscela.core.functions.PropertyKind;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Cards of three and more components read from cells: each geometric model against the published formula written
 * out by hand, ternary terms, pairs treated as ideal by choice, per-pair validity limits, composition checks and the
 * audit trace. The card values are the invented ones of {@link TestCard#ternary}.
 */
class MulticomponentCardTest {
    static final double T = 298.15;
    static final double[] X = {0.2, 0.3, 0.5};
    /** alpha + beta A0..A2, alpha + gamma A0, beta + gamma A0 of the ternary test card. */
    static final double[] AB = {-4.0, 1.5, -0.5};
    static final double AG = -1.2;
    static final double BG = -0.8;

    static double series(double[] a, double d) {
        double s = 0;
        for (int k = 0; k < a.length; k++) {
            s += a[k] * Math.pow(d, k);
        }
        return s;
    }

    /** Muggianu et al. (1975): Σ x_i x_j Σ A_k (x_i − x_j)^k. */
    @Test
    void muggianuIsTheDefault() {
        Card c = TestCard.ternary().read();
        double expected = X[0] * X[1] * series(AB, X[0] - X[1]) + X[0] * X[2] * AG + X[1] * X[2] * BG;
        assertEquals(GeometricModel.MUGGIANU, c.excessVolume().model());
        assertEquals(expected, CardFunctions.excessMolarVolume(c, X, T, Extrapolation.AS_CARD), 1e-14);
    }

    /** Kohler (1960): Σ (x_i + x_j)² B_ij(x_i/(x_i + x_j)), i.e. x_i x_j Σ A_k ((x_i − x_j)/(x_i + x_j))^k. */
    @Test
    void kohler() {
        Card c = TestCard.ternary().row("multicomponent model", "Kohler").read();
        double s = X[0] + X[1];
        double r = X[0] / s;
        double binary = r * (1 - r) * series(AB, 2 * r - 1);
        double expected = s * s * binary + X[0] * X[2] * AG + X[1] * X[2] * BG;
        assertEquals(expected, CardFunctions.excessMolarVolume(c, X, T, Extrapolation.AS_CARD), 1e-14);
    }

    /**
     * A Kohler pair whose two fractions sum to almost nothing (10⁻²⁰⁰, whose square underflows to zero) contributes
     * nothing, continuously: the partial molar excess volumes equal those with the pair absent. Found by the fuzzer as
     * a dew-point search that met NaN (0/0 in the pair's derivatives) where the liquid held 10⁻³⁰⁰ of a component.
     */
    @Test
    void kohlerPairWithATinySum() {
        Card c = TestCard.ternary().row("multicomponent model", "Kohler").read();
        for (double tiny : new double[] {1e-200, 1e-300, Double.MIN_VALUE}) {
            double[] x = {tiny, 0, 1 - tiny};
            for (int k = 0; k < 3; k++) {
                double v = CardFunctions.partialExcessMolarVolume(c, k, x, T, Extrapolation.ALLOW);
                double absent = CardFunctions.partialExcessMolarVolume(c, k, new double[] {0, 0, 1}, T,
                        Extrapolation.ALLOW);
                assertEquals(absent, v, 1e-12, "component " + k + " at x1 = " + tiny);
            }
        }
    }

    /**
     * Toop (1965) with alpha asymmetric: x_j/(1 − x_a)·B_aj(x_a, 1 − x_a) for the pairs with alpha, Kohler's rule for
     * beta + gamma.
     */
    @Test
    void toop() {
        Card c = TestCard.ternary().row("multicomponent model", "Toop", "alpha").read();
        double xa = X[0];
        double ab = X[1] / (1 - xa) * xa * (1 - xa) * series(AB, xa - (1 - xa));
        double ag = X[2] / (1 - xa) * xa * (1 - xa) * AG;
        double s = X[1] + X[2];
        double bg = s * s * (X[1] / s) * (X[2] / s) * BG;
        assertEquals(ab + ag + bg, CardFunctions.excessMolarVolume(c, X, T, Extrapolation.AS_CARD), 1e-14);
        assertEquals(0, c.excessVolume().asymmetricComponent());
    }

    /** Toop with gamma asymmetric: the alpha + gamma pair is evaluated with gamma first (A1 changes sign). */
    @Test
    void toopWithTheLastComponentAsymmetric() {
        Card c = TestCard.ternary().set(23, "excess volume A0", "alpha + gamma", -1.2).row("excess volume A1",
                "alpha + gamma", 0.6).row("multicomponent model", "Toop", "gamma").read();
        double xg = X[2];
        double ga = X[0] / (1 - xg) * xg * (1 - xg) * series(new double[] {-1.2, -0.6}, xg - (1 - xg));
        double gb = X[1] / (1 - xg) * xg * (1 - xg) * BG;
        double s = X[0] + X[1];
        double ab = s * s * (X[0] / s) * (X[1] / s) * series(AB, (X[0] - X[1]) / s);
        assertEquals(ga + gb + ab, CardFunctions.excessMolarVolume(c, X, T, Extrapolation.AS_CARD), 1e-14);
    }

    /** Cibulka's (1982) ternary term x_a x_b x_c (C0 + C1 x_a + C2 x_b), here with a linear T term in C0. */
    @Test
    void ternaryTerm() {
        Card plain = TestCard.ternary().read();
        Card c = TestCard.ternary().row("excess volume reference temperature", "beta + gamma + alpha", 300)
                .row("excess volume ternary C0", "beta + gamma + alpha", 0.7, 0.01)
                .row("excess volume ternary C1", "beta + gamma + alpha", -0.3)
                .row("excess volume ternary C2", "beta + gamma + alpha", 0.2).read();
        double c0 = 0.7 + 0.01 * (T - 300);
        double term = X[1] * X[2] * X[0] * (c0 - 0.3 * X[1] + 0.2 * X[2]);
        assertEquals(CardFunctions.excessMolarVolume(plain, X, T, Extrapolation.AS_CARD) + term,
                CardFunctions.excessMolarVolume(c, X, T, Extrapolation.AS_CARD), 1e-14);
    }

    @Test
    void missingPairIsAnErrorUnlessTheCardChoosesIdeal() {
        assertEquals(Problem.MISSING_PAIR, assertThrows(MiscelaException.class,
                () -> TestCard.ternary().blank(24).read()).problem());
        Card c = TestCard.ternary().blank(24).row("missing pairs", "ideal").read();
        double expected = X[0] * X[1] * series(AB, X[0] - X[1]) + X[0] * X[2] * AG;
        assertEquals(expected, CardFunctions.excessMolarVolume(c, X, T, Extrapolation.AS_CARD), 1e-14);
        Map<String, Object> trace = trace(c, X);
        assertEquals("none on the card: treated as ideal", trace.get("pair coefficients: beta + gamma"));
    }

    @Test
    void compositionsAreChecked() {
        Card c = TestCard.ternary().read();
        assertEquals(Problem.COMPOSITION_SUM, problem(() -> CardFunctions.density(c, new double[] {0.2, 0.3, 0.4},
                T, Extrapolation.AS_CARD)));
        assertEquals(Problem.COMPOSITION_NEGATIVE, problem(() -> CardFunctions.density(c,
                new double[] {-0.1, 0.6, 0.5}, T, Extrapolation.AS_CARD)));
        assertEquals(Problem.COMPOSITION_LENGTH, problem(() -> CardFunctions.density(c, new double[] {0.5, 0.5},
                T, Extrapolation.AS_CARD)));
        assertEquals(Problem.NOT_BINARY, problem(() -> CardFunctions.density(c, 0.5, T, Extrapolation.AS_CARD)));
        assertEquals(Problem.ARG_NOT_FINITE, problem(() -> CardFunctions.density(c,
                new double[] {Double.NaN, 0.5, 0.5}, T, Extrapolation.AS_CARD)));
        // Rounding in typed fractions is accepted and normalised away.
        assertEquals(CardFunctions.density(c, new double[] {1 / 3.0, 1 / 3.0, 1 / 3.0}, T, Extrapolation.AS_CARD),
                CardFunctions.density(c, new double[] {0.3333334, 0.3333334, 0.3333334}, T, Extrapolation.AS_CARD),
                1e-12);
    }

    /** A pair's own limits apply only where both of its components are present. */
    @Test
    void pairLimits() {
        Card c = TestCard.ternary().row("valid pair mole fraction", "alpha + gamma", 0, 0.5)
                .row("valid pair temperature", "beta + gamma", 290, 300).read();
        assertEquals(1.0, CardFunctions.inside(c, X, T));
        double[] rich = {0.5, 0.1, 0.4}; // alpha/(alpha + gamma) = 0.556
        assertEquals(0.0, CardFunctions.inside(c, rich, T));
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> CardFunctions.density(c, rich, T, Extrapolation.AS_CARD));
        assertEquals(Problem.OUTSIDE_PAIR_COMPOSITION, e.problem());
        assertTrue(e.getMessage().contains("alpha + gamma"), e.getMessage());
        CardFunctions.density(c, rich, T, Extrapolation.ALLOW);
        assertEquals(Problem.OUTSIDE_PAIR_TEMPERATURE, problem(() -> CardFunctions.density(c, X, 305,
                Extrapolation.AS_CARD)));
        assertEquals(1.0, CardFunctions.inside(c, new double[] {0.5, 0, 0.5}, 305), "beta absent: its pair limit is moot");
        Map<String, Object> trace = traceAllowed(c, rich);
        assertTrue(String.valueOf(trace.get("outside validity")).contains("alpha + gamma"), trace.toString());
        assertEquals("allowed by the extrapolate argument", trace.get("extrapolation"));
    }

    /** The trace re-derives the result: pair terms add up to V^E, partials add up to V_m, density from V_m. */
    @Test
    void traceAddsUp() {
        Card c = TestCard.ternary().read();
        Map<String, Object> t = trace(c, X);
        double pairs = num(t, "pair term: alpha + beta [cm³/mol]") + num(t, "pair term: alpha + gamma [cm³/mol]")
                + num(t, "pair term: beta + gamma [cm³/mol]");
        assertEquals(num(t, "excess molar volume [cm³/mol]"), pairs, 1e-15);
        assertEquals(-4.0, num(t, "A0 at T: alpha + beta [cm³/mol]"), 0);
        assertEquals(X[0] - X[1], num(t, "pair argument d: alpha + beta"), 1e-15);
        double vm = 0;
        String[] names = {"alpha", "beta", "gamma"};
        for (int k = 0; k < 3; k++) {
            vm += X[k] * num(t, "partial molar volume: " + names[k] + " [cm³/mol]");
            assertEquals(num(t, "pure molar volume: " + names[k] + " [cm³/mol]")
                    + num(t, "partial molar excess volume: " + names[k] + " [cm³/mol]"),
                    num(t, "partial molar volume: " + names[k] + " [cm³/mol]"), 1e-12);
        }
        assertEquals(num(t, "mixture molar volume [cm³/mol]"), vm, 1e-12);
        assertEquals(1000 * num(t, "mean molar mass [g/mol]") / vm, num(t, "mixture density [kg/m³]"), 1e-9);
        assertEquals(CardFunctions.density(c, X, T, Extrapolation.AS_CARD), num(t, "mixture density [kg/m³]"), 0);
        assertEquals("none", t.get("outside validity"));
    }

    /** Six components, every pair given, each pair with its own set: summability holds through the card API. */
    @Test
    void sixComponents() {
        TestCard card = TestCard.ternary();
        String[] names = {"alpha", "beta", "gamma", "delta", "epsilon", "zeta"};
        for (int k = 3; k < 6; k++) {
            card.row("component", names[k], 50 + 10 * k).row("density model", names[k], "constant")
                    .row("density coefficients", names[k], 800 + 40 * k);
        }
        for (int i = 0; i < 6; i++) {
            for (int j = Math.max(i + 1, 3); j < 6; j++) {
                card.row("excess volume A0", names[i] + " + " + names[j], -0.1 * (i + j))
                        .row("excess volume A1", names[i] + " + " + names[j], 0.05 * (j - i));
            }
        }
        Card c = card.read();
        assertEquals(6, c.componentCount());
        double[] x = {0.1, 0.25, 0.05, 0.3, 0.2, 0.1};
        double sum = 0;
        for (int k = 0; k < 6; k++) {
            sum += x[k] * CardFunctions.partialMolarVolume(c, k, x, T, Extrapolation.AS_CARD);
        }
        assertEquals(CardFunctions.molarVolume(c, x, T, Extrapolation.AS_CARD), sum, 1e-12);
        assertEquals(15, c.excessVolume().pairCount());
    }

    @Test
    void enthalpyFunctionsRefuseACardWithoutEnthalpy() {
        Card c = TestCard.ternary().read();
        assertEquals(Problem.NO_ENTHALPY, problem(() -> CardFunctions.excessEnthalpy(c, X, T,
                Extrapolation.AS_CARD)));
        assertEquals(Problem.NO_ENTHALPY, problem(() -> CardFunctions.trace(c, X, T, PropertyKind.ENTHALPY,
                Extrapolation.AS_CARD)));
    }

    static Map<String, Object> trace(Card c, double[] x) {
        return toMap(CardFunctions.trace(c, x, T, PropertyKind.VOLUME, Extrapolation.AS_CARD));
    }

    static Map<String, Object> traceAllowed(Card c, double[] x) {
        return toMap(CardFunctions.trace(c, x, T, PropertyKind.VOLUME, Extrapolation.ALLOW));
    }

    private static Map<String, Object> toMap(Object[][] rows) {
        Map<String, Object> m = new HashMap<>();
        for (Object[] r : rows) {
            assertEquals(2, r.length);
            m.putIfAbsent((String) r[0], r[1]);
        }
        return m;
    }

    private static double num(Map<String, Object> t, String label) {
        Object v = t.get(label);
        assertTrue(v instanceof Double, label + " → " + v + " in " + t.keySet());
        return (Double) v;
    }

    private static Problem problem(org.junit.jupiter.api.function.Executable call) {
        return assertThrows(MiscelaException.class, call).problem();
    }
}
