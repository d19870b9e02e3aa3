package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/**
 * ln γ_k from the card's G^E/RT (the ethanol + water phase-equilibrium test card) against the identities, from values:
 * ln γ_k is the partial molar quantity of g = G^E/RT (checked against central differences of n·g(n), never the
 * partials' own formula), summability g = Σ x_k ln γ_k, and Gibbs–Duhem Σ x_k d ln γ_k = 0 along a composition
 * change, the d ln γ_k taken by differences of the values.
 */
class ActivityProperties {
    private static final Card VLE = TestCards.card("ethanol-water-vle.tsv");
    /** The worst residuals seen: summability, ln γ against differences, Gibbs–Duhem (reported after the run). */
    private static final double[] WORST = new double[3];

    private static synchronized void worst(int which, double residual) {
        WORST[which] = Math.max(WORST[which], Math.abs(residual));
    }

    @net.jqwik.api.lifecycle.AfterContainer
    static void report() {
        org.miscela.testing.Figures.note(ActivityProperties.class, "worst residuals over every try: summability "
                + "%.2e, ln gamma against central differences of n g %.2e, Gibbs-Duhem sum x_k d ln gamma_k %.2e",
                WORST[0], WORST[1], WORST[2]);
    }

    @Property(tries = 500)
    void logActivityCoefficientsKeepTheIdentities(@ForAll @DoubleRange(min = 0.01, max = 0.99) double x1,
            @ForAll @DoubleRange(min = 30, max = 100) double t) {
        double kelvin = t + 273.15;
        double[] x = {x1, 1 - x1};
        Mixture m = VLE.mixture();
        double[] lnGamma = new double[2];
        double g = m.logActivityCoefficients(x, kelvin, lnGamma);
        worst(0, g - (x[0] * lnGamma[0] + x[1] * lnGamma[1]));
        assertEquals(g, x[0] * lnGamma[0] + x[1] * lnGamma[1], 1e-14, "summability");
        double h = PartialsFromValues.step(x);
        for (int k = 0; k < 2; k++) {
            PartialsFromValues.Estimate e = PartialsFromValues.partial(z -> m.gibbs().value(z, kelvin), x, k, h,
                    1e-15);
            worst(1, e.value - lnGamma[k]);
            assertEquals(e.value, lnGamma[k], e.bound + 1e-12, "ln γ_" + k + " at x1 = " + x1);
        }
        double step = 1e-5;
        double[] up = new double[2];
        double[] down = new double[2];
        m.logActivityCoefficients(new double[] {x1 + step, 1 - x1 - step}, kelvin, up);
        m.logActivityCoefficients(new double[] {x1 - step, 1 - x1 + step}, kelvin, down);
        double gd = x[0] * (up[0] - down[0]) + x[1] * (up[1] - down[1]);
        double scale = Math.abs(x[0] * (up[0] - down[0])) + Math.abs(x[1] * (up[1] - down[1]));
        worst(2, gd);
        assertTrue(Math.abs(gd) <= 1e-9 + 1e-6 * scale, "Gibbs–Duhem: Σ x_k Δln γ_k = " + gd);
    }

    /** Three components by Wilson's model (parameters of a published example, see LocalCompositionTest) and by NRTL
     * (invented parameters): the same identities, from values, anywhere inside the triangle. */
    private static Card local(boolean wilson) {
        return local(wilson, 3);
    }

    /** The same card with only its first {@code components} components (and their pairs' rows). */
    private static Card local(boolean wilson, int components) {
        java.util.List<Object[]> c = new java.util.ArrayList<>(java.util.Arrays.asList(new Object[][] {
            {"Miscela card", 2.0}, {"source", "invented densities; Wilson parameters of a published example, NRTL "
                + "parameters invented values"}, {"temperature unit", "K"}, {"density unit", "kg/m³"},
            {"molar volume unit", "cm³/mol"}, {"molar mass unit", "g/mol"}, {"valid temperature", 300.0, 360.0},
            {"component", "P", 58.08}, {"density model", "P", "constant"}, {"density coefficients", "P", 784.0},
            {"component", "Q", 119.38}, {"density model", "Q", "constant"}, {"density coefficients", "Q", 1480.0},
            {"component", "R", 32.04}, {"density model", "R", "constant"}, {"density coefficients", "R", 791.0},
            {"valid mole fraction", "P", 0.0, 1.0}}));
        if (wilson) {
            c.add(new Object[] {"Wilson", "P + Q", 375.2835, -3.78434, 7.91073e-3, -1722.58, 6.405502, -7.47788e-3});
            c.add(new Object[] {"Wilson", "P + R", 31.1208, -0.67704, 8.68371e-4, 747.217, -0.256645, -1.24796e-3});
            c.add(new Object[] {"Wilson", "Q + R", -1140.79, 2.59359, 3.1e-5, 3596.17, -6.2234, 3e-5});
            c.add(new Object[] {"Wilson volume", "P", 74.04});
            c.add(new Object[] {"Wilson volume", "Q", 80.67});
            c.add(new Object[] {"Wilson volume", "R", 40.73});
        } else {
            c.add(new Object[] {"NRTL", "P + Q", 0.3, 120.0, -0.5, 300.0, 0.3});
            c.add(new Object[] {"NRTL", "P + R", 1.1, -50.0, 0.2, 80.0, 0.47});
            c.add(new Object[] {"NRTL", "Q + R", -0.2, 200.0, 0.9, -100.0, 0.2});
        }
        if (components == 2) {
            c.removeIf(r -> r.length > 1 && (r[1].equals("R") || String.valueOf(r[1]).endsWith("+ R")));
        }
        return CardReader.read(c.toArray(new Object[0][]));
    }

    private static final Card WILSON = local(true);
    private static final Card NRTL = local(false);

    @Property(tries = 500)
    void localCompositionModelsKeepTheIdentities(@ForAll @DoubleRange(min = 0.02, max = 0.96) double a,
            @ForAll @DoubleRange(min = 0.02, max = 0.96) double b, @ForAll @DoubleRange(min = 300, max = 360) double t,
            @ForAll boolean wilson) {
        if (a + b > 0.98) {
            return;
        }
        double[] x = {a, b, 1 - a - b};
        Mixture m = (wilson ? WILSON : NRTL).mixture();
        double[] lnGamma = new double[3];
        double g = m.logActivityCoefficients(x, t, lnGamma);
        worst(0, g - (x[0] * lnGamma[0] + x[1] * lnGamma[1] + x[2] * lnGamma[2]));
        assertEquals(g, x[0] * lnGamma[0] + x[1] * lnGamma[1] + x[2] * lnGamma[2], 1e-13, "summability");
        double h = PartialsFromValues.step(x);
        for (int k = 0; k < 3; k++) {
            PartialsFromValues.Estimate e = PartialsFromValues.partial(z -> m.gibbs().value(z, t), x, k, h, 1e-14);
            worst(1, e.value - lnGamma[k]);
            assertEquals(e.value, lnGamma[k], e.bound + 1e-11, "ln γ_" + k);
        }
        double step = 1e-5;
        double[] up = new double[3];
        double[] down = new double[3];
        m.logActivityCoefficients(new double[] {a + step, b, 1 - a - b - step}, t, up);
        m.logActivityCoefficients(new double[] {a - step, b, 1 - a - b + step}, t, down);
        double gd = 0;
        double scale = 0;
        for (int k = 0; k < 3; k++) {
            gd += x[k] * (up[k] - down[k]);
            scale += Math.abs(x[k] * (up[k] - down[k]));
        }
        worst(2, gd);
        assertTrue(Math.abs(gd) <= 1e-9 + 1e-6 * scale, "Gibbs–Duhem: " + gd);
    }

    /**
     * Model reduction: with the third component absent, the ternary card's ln γ of P and Q are the binary card's (the
     * same pair rows without R); and the infinite-dilution limit: ln γ_P at x_P = 0 is the limit of its values as x_P
     * falls to zero.
     */
    @Property(tries = 300)
    void localCompositionModelsReduceToTheBinaryAndReachTheirLimits(
            @ForAll @DoubleRange(min = 0.0, max = 1.0) double a, @ForAll @DoubleRange(min = 300, max = 360) double t,
            @ForAll boolean wilson) {
        double[] ternary = new double[3];
        double[] binary = new double[2];
        (wilson ? WILSON : NRTL).mixture().logActivityCoefficients(new double[] {a, 1 - a, 0}, t, ternary);
        (wilson ? WILSON_PQ : NRTL_PQ).mixture().logActivityCoefficients(new double[] {a, 1 - a}, t, binary);
        assertEquals(binary[0], ternary[0], 1e-13, "ln γ_P without R");
        assertEquals(binary[1], ternary[1], 1e-13, "ln γ_Q without R");
        double[] limit = new double[2];
        double[] near = new double[2];
        Mixture m = (wilson ? WILSON_PQ : NRTL_PQ).mixture();
        m.logActivityCoefficients(new double[] {0, 1}, t, limit);
        m.logActivityCoefficients(new double[] {1e-7, 1 - 1e-7}, t, near);
        assertEquals(limit[0], near[0], 1e-5 * (1 + Math.abs(limit[0])), "ln γ_P at infinite dilution");
    }

    private static final Card WILSON_PQ = local(true, 2);
    private static final Card NRTL_PQ = local(false, 2);
}
