package org.miscela.core.model;

/**
 * The vapour pressure of a pure liquid by Antoine's equation, log10(p/p_unit) = A − B/(C + t), with t the temperature
 * in the unit the constants were written for and p_unit the pressure unit, within the range the constants hold for.
 * Internal units: K and Pa. Immutable.
 */
public final class AntoineVapourPressure extends RangedVapourPressure {
    public static final String NAME = "Antoine";

    private final double a;
    private final double b;
    private final double c;
    private final double perKelvin;
    private final double offset;
    private final double pascalPerUnit;

    /**
     * @param perKelvin and {@code offset}: t = perKelvin·T + offset (1 and −273.15 for °C)
     * @param lowestKelvin the constants' range, or −∞ and +∞ when the card states none
     */
    public AntoineVapourPressure(double a, double b, double c, double perKelvin, double offset, double pascalPerUnit,
            double lowestKelvin, double highestKelvin) {
        super(lowestKelvin, highestKelvin);
        this.a = a;
        this.b = b;
        this.c = c;
        this.perKelvin = perKelvin;
        this.offset = offset;
        this.pascalPerUnit = pascalPerUnit;
    }

    /** p in Pa at T in K (NaN where C + t is not positive: below the equation's pole). */
    @Override
    public double pascal(double kelvin) {
        double t = perKelvin * kelvin + offset;
        if (!(c + t > 0.0)) {
            return Double.NaN;
        }
        return pascalPerUnit * Math.pow(10.0, a - b / (c + t));
    }

    @Override
    public String form() {
        return NAME;
    }
}
