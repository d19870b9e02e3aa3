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

    @Property(tries = 500)
    void logActivityCoefficientsKeepTheIdentities(@ForAll @DoubleRange(min = 0.01, max = 0.99) double x1,
            @ForAll @DoubleRange(min = 30, max = 100) double t) {
        double kelvin = t + 273.15;
        double[] x = {x1, 1 - x1};
        Mixture m = VLE.mixture();
        double[] lnGamma = new double[2];
        double g = m.logActivityCoefficients(x, kelvin, lnGamma);
        assertEquals(g, x[0] * lnGamma[0] + x[1] * lnGamma[1], 1e-14, "summability");
        double h = PartialsFromValues.step(x);
        for (int k = 0; k < 2; k++) {
            PartialsFromValues.Estimate e = PartialsFromValues.partial(z -> m.gibbs().value(z, kelvin), x, k, h,
                    1e-15);
            assertEquals(e.value, lnGamma[k], e.bound + 1e-12, "ln γ_" + k + " at x1 = " + x1);
        }
        double step = 1e-5;
        double[] up = new double[2];
        double[] down = new double[2];
        m.logActivityCoefficients(new double[] {x1 + step, 1 - x1 - step}, kelvin, up);
        m.logActivityCoefficients(new double[] {x1 - step, 1 - x1 + step}, kelvin, down);
        double gd = x[0] * (up[0] - down[0]) + x[1] * (up[1] - down[1]);
        double scale = Math.abs(x[0] * (up[0] - down[0])) + Math.abs(x[1] * (up[1] - down[1]));
        assertTrue(Math.abs(gd) <= 1e-9 + 1e-6 * scale, "Gibbs–Duhem: Σ x_k Δln γ_k = " + gd);
    }
}
