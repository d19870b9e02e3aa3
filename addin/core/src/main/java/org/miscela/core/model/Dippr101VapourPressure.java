package org.miscela.core.model;

/**
 * The vapour pressure of a pure liquid by the DIPPR 101 equation, ln(p/Pa) = C1 + C2/T + C3·ln(T/K) + C4·T^C5 with T in
 * kelvin: the form of the vapour-pressure table of Perry's Chemical Engineers' Handbook (8th ed., Table 2-8), whose
 * constants are always for T in K and p in Pa, whatever the card's units. Immutable.
 */
public final class Dippr101VapourPressure extends RangedVapourPressure {
    public static final String NAME = "DIPPR 101";

    private final double c1;
    private final double c2;
    private final double c3;
    private final double c4;
    private final double c5;

    /** @param lowestKelvin the constants' range, or −∞ and +∞ when the card states none */
    public Dippr101VapourPressure(double c1, double c2, double c3, double c4, double c5, double lowestKelvin,
            double highestKelvin) {
        super(lowestKelvin, highestKelvin);
        this.c1 = c1;
        this.c2 = c2;
        this.c3 = c3;
        this.c4 = c4;
        this.c5 = c5;
    }

    /** p in Pa at T in K (NaN at or below 0 K). */
    @Override
    public double pascal(double kelvin) {
        if (!(kelvin > 0.0)) {
            return Double.NaN;
        }
        return Math.exp(c1 + c2 / kelvin + c3 * Math.log(kelvin) + c4 * Math.pow(kelvin, c5));
    }

    @Override
    public String form() {
        return NAME;
    }
}
