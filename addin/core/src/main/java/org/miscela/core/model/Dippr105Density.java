package org.miscela.core.model;

/**
 * Liquid density by equation 105 of the DIPPR compilation, the form of the liquid-density table of Perry's Chemical
 * Engineers' Handbook: ρ = C1 / C2^(1 + (1 − T/C3)^C4) in mol/dm³ (C3 is the critical temperature, K), times the
 * molar mass for kg/m³. Defined below C3 only. Immutable.
 */
public final class Dippr105Density implements PureDensity {
    public static final String NAME = "DIPPR 105";

    private final double c1;
    private final double c2;
    private final double c3;
    private final double c4;
    private final double molarMass;

    /** @param molarMass g/mol, to turn mol/dm³ into kg/m³ */
    public Dippr105Density(double c1, double c2, double c3, double c4, double molarMass) {
        this.c1 = c1;
        this.c2 = c2;
        this.c3 = c3;
        this.c4 = c4;
        this.molarMass = molarMass;
    }

    @Override
    public double at(double kelvin) {
        double tau = 1.0 - kelvin / c3;
        if (!(tau >= 0.0)) {
            return Double.NaN; // above the critical temperature there is no liquid
        }
        return c1 * molarMass / Math.pow(c2, 1.0 + Math.pow(tau, c4));
    }

    @Override
    public String modelName() {
        return NAME;
    }

    @Override
    public double highestKelvin() {
        return c3;
    }
}
