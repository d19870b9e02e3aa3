package org.miscela.core.model;

/**
 * Molar isobaric heat capacity of a pure liquid, Cp(T) = Σ_j c_j·(T − T_ref)^j in J/(mol·K), with its integral for
 * enthalpy changes between two temperatures. Immutable.
 */
public final class HeatCapacity {
    private final double referenceKelvin;
    private final double[] c;

    public HeatCapacity(double referenceKelvin, double[] coefficients) {
        if (coefficients.length == 0) {
            throw new IllegalArgumentException("at least one coefficient is needed");
        }
        this.referenceKelvin = referenceKelvin;
        this.c = coefficients.clone();
    }

    /** Cp in J/(mol·K). */
    public double at(double kelvin) {
        double dt = kelvin - referenceKelvin;
        double v = 0.0;
        for (int j = c.length - 1; j >= 0; j--) {
            v = v * dt + c[j];
        }
        return v;
    }

    /** ∫ Cp dT from {@code fromKelvin} to {@code toKelvin}, in J/mol. */
    public double enthalpyChange(double fromKelvin, double toKelvin) {
        return antiderivative(toKelvin) - antiderivative(fromKelvin);
    }

    private double antiderivative(double kelvin) {
        double dt = kelvin - referenceKelvin;
        double v = 0.0;
        for (int j = c.length - 1; j >= 0; j--) {
            v = v * dt + c[j] / (j + 1);
        }
        return v * dt;
    }
}
