package org.miscela.core;

/**
 * Volumetric properties of a two-component card, in internal units: temperature in K, molar volumes in cm³/mol,
 * densities in kg/m³, composition as the mole fraction x1 of the card's first component (x2 = 1 − x1).
 * No range checks happen here; {@link CardFunctions} checks and converts units. Component indices are 0 and 1.
 */
public final class BinaryMixture {
    private final Component first;
    private final Component second;
    private final RedlichKister excess;

    BinaryMixture(Card card) {
        this.first = card.components().get(0);
        this.second = card.components().get(1);
        this.excess = card.excessVolume(0, 1);
    }

    public Component component(int k) {
        return k == 0 ? first : second;
    }

    /** The excess-volume expansion, written as component 1 then component 2. */
    public RedlichKister excessExpansion() {
        return excess;
    }

    /** V_k* in cm³/mol. */
    public double pureMolarVolume(int k, double kelvin) {
        return component(k).molarVolume(kelvin);
    }

    /** V^E = x1·x2·Σ A_k (x1 − x2)^k in cm³/mol. */
    public double excessMolarVolume(double x1, double kelvin) {
        return excess.value(x1, kelvin);
    }

    /**
     * Partial molar excess volume of component k: V̄1^E = V^E + x2·dV^E/dx1, V̄2^E = V^E − x1·dV^E/dx1
     * (the tangent-intercept construction, exact at infinite dilution).
     */
    public double partialExcessMolarVolume(int k, double x1, double kelvin) {
        double[] e = new double[3];
        excess.evaluate(x1, kelvin, e);
        return k == 0 ? e[0] + (1.0 - x1) * e[1] : e[0] - x1 * e[1];
    }

    /** V̄_k = V_k* + V̄_k^E in cm³/mol. */
    public double partialMolarVolume(int k, double x1, double kelvin) {
        return pureMolarVolume(k, kelvin) + partialExcessMolarVolume(k, x1, kelvin);
    }

    /** dV̄_k/dx1: x2·V^E'' for component 1, −x1·V^E'' for component 2 (which makes Gibbs–Duhem hold exactly). */
    public double partialMolarVolumeSlope(int k, double x1, double kelvin) {
        double[] e = new double[3];
        excess.evaluate(x1, kelvin, e);
        return k == 0 ? (1.0 - x1) * e[2] : -x1 * e[2];
    }

    /** V_m = x1·V1* + x2·V2* + V^E in cm³/mol. */
    public double molarVolume(double x1, double kelvin) {
        return x1 * pureMolarVolume(0, kelvin) + (1.0 - x1) * pureMolarVolume(1, kelvin)
                + excessMolarVolume(x1, kelvin);
    }

    /** Mean molar mass x1·M1 + x2·M2 in g/mol. */
    public double meanMolarMass(double x1) {
        return x1 * first.molarMass() + (1.0 - x1) * second.molarMass();
    }

    /** ρ = Σ x_k M_k / V_m in kg/m³. */
    public double density(double x1, double kelvin) {
        return 1000.0 * meanMolarMass(x1) / molarVolume(x1, kelvin);
    }
}
