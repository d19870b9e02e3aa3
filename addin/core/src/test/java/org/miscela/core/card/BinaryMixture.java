package org.miscela.core.card;

/**
 * The two-component view of a {@link Mixture}: composition as the mole fraction x1 of the card's first component
 * (x2 = 1 − x1), internal units, no range checks. Components are 0 and 1.
 */
public final class BinaryMixture {
    private final Mixture mixture;

    /**
     * The two-component view of a card; fails with the catalogue's message when the card does not have exactly two
     * components. A test tool: the cell functions work on any number of components through {@link Mixture}.
     */
    public static BinaryMixture of(Card card) {
        if (card.componentCount() != 2) {
            throw org.miscela.core.problem.Problem.NOT_BINARY.raise(card.componentCount());
        }
        return new BinaryMixture(card.mixture());
    }

    BinaryMixture(Mixture mixture) {
        this.mixture = mixture;
    }

    private static double[] x(double x1) {
        return new double[] {x1, 1.0 - x1};
    }

    /** V_k* in cm³/mol. */
    public double pureMolarVolume(int k, double kelvin) {
        return mixture.pureMolarVolume(k, kelvin);
    }

    /** V^E = x1·x2·Σ A_k (x1 − x2)^k in cm³/mol. */
    public double excessMolarVolume(double x1, double kelvin) {
        return mixture.excessMolarVolume(x(x1), kelvin);
    }

    /** V̄_k^E: the tangent-intercept construction, exact at infinite dilution. */
    public double partialExcessMolarVolume(int k, double x1, double kelvin) {
        return mixture.partialExcessMolarVolume(k, x(x1), kelvin);
    }

    /** V̄_k = V_k* + V̄_k^E in cm³/mol. */
    public double partialMolarVolume(int k, double x1, double kelvin) {
        return mixture.partialMolarVolume(k, x(x1), kelvin);
    }

    /** dV̄_k/dx1 along x2 = 1 − x1, from the analytic Hessian of V^E. */
    public double partialMolarVolumeSlope(int k, double x1, double kelvin) {
        double[] out = new double[2];
        mixture.partialExcessVolumeSlopes(x(x1), kelvin, new double[] {1.0, -1.0}, out);
        return out[k];
    }

    /** V_m in cm³/mol. */
    public double molarVolume(double x1, double kelvin) {
        return mixture.molarVolume(x(x1), kelvin);
    }

    /** x1·M1 + x2·M2 in g/mol. */
    public double meanMolarMass(double x1) {
        return mixture.meanMolarMass(x(x1));
    }

    /** ρ in kg/m³. */
    public double density(double x1, double kelvin) {
        return mixture.density(x(x1), kelvin);
    }
}
