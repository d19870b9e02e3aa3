package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The mixture's enthalpic properties from values: each partial molar excess enthalpy against the derivative of
 * the extensive N·H^E in its mole number ({@link PartialsFromValues}, with the rounding bound of
 * {@link MixtureProperties}), the mixture's heat capacity as Σ x_k Cp_k + ∂H^E/∂T (the excess heat capacity by a
 * central difference in T, exact here because the coefficients are linear in T), and the volume partials returning
 * V^E. The card is the invented ternary test card with enthalpy rows added.
 */
class MixtureTest {
    private static final double[] X = {0.2, 0.3, 0.5};

    static Card card() {
        return TestCard.ternary().row("enthalpy unit", "J/mol")
                .row("excess enthalpy A0", "alpha + beta", -500, 2).row("excess enthalpy A1", "alpha + beta", 120)
                .row("excess enthalpy reference temperature", "alpha + beta", 298.15)
                .row("excess enthalpy A0", "alpha + gamma", 200).row("excess enthalpy A0", "beta + gamma", 100, -1)
                .row("excess enthalpy reference temperature", "beta + gamma", 298.15)
                .row("excess enthalpy ternary C0", "alpha + beta + gamma", 40)
                .row("heat capacity", "alpha", 112).row("heat capacity", "beta", 75.3)
                .row("heat capacity", "gamma", 218.9).read();
    }

    @Test
    void partialExcessEnthalpiesAreDerivativesOfTheExtensiveTotal() {
        Mixture m = card().mixture();
        double t = 300;
        double[] partial = new double[3];
        assertEquals(m.excessEnthalpy(X, t), m.partialExcessEnthalpies(X, t, partial), 0.0);
        assertEquals(3, m.componentCount());
        double delta = MixtureProperties.valueRounding(m.enthalpy(), t);
        for (int k = 0; k < 3; k++) {
            PartialsFromValues.Estimate d = PartialsFromValues.partial(y -> m.excessEnthalpy(y, t), X, k,
                    PartialsFromValues.step(X), delta);
            assertEquals(d.value, partial[k], d.bound + MixtureProperties.partialRounding(m.enthalpy(), t),
                    "component " + k);
        }
    }

    @Test
    void heatCapacityIsThePureOnesPlusTheExcess() {
        Mixture m = card().mixture();
        double t = 300;
        double excess = (m.excessEnthalpy(X, t + 1) - m.excessEnthalpy(X, t - 1)) / 2;
        assertEquals(excess, m.excessHeatCapacity(X, t), 1e-12);
        assertEquals(0.2 * 112 + 0.3 * 75.3 + 0.5 * 218.9 + excess, m.heatCapacity(X, t), 1e-11);
    }

    @Test
    void volumePartialsReturnTheExcessVolume() {
        Mixture m = card().mixture();
        double[] partial = new double[3];
        assertEquals(m.excessMolarVolume(X, 300), m.partialExcessMolarVolumes(X, 300, partial), 0.0);
    }
}
