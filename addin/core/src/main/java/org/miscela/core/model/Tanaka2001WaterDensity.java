package org.miscela.core.model;

/**
 * Density of air-free SMOW water at 101.325 kPa, 0–40 °C: M. Tanaka, G. Girard, R. Davis, A. Peuto, N. Bignell,
 * Metrologia 38, 301–309 (2001): ρ = a5 · [1 − (t + a1)² (t + a2) / (a3 (t + a4))], t in °C.
 */
public final class Tanaka2001WaterDensity extends BuiltInWaterDensity {
    public static final String NAME = "Tanaka 2001";
    public static final Tanaka2001WaterDensity INSTANCE = new Tanaka2001WaterDensity();

    private static final double A1 = -3.983035;
    private static final double A2 = 301.797;
    private static final double A3 = 522528.9;
    private static final double A4 = 69.34881;
    private static final double A5 = 999.974950;

    private Tanaka2001WaterDensity() {
        super(NAME, 273.15, 313.15);
    }

    @Override
    public double at(double kelvin) {
        double t = kelvin - 273.15;
        double s = t + A1;
        return A5 * (1.0 - s * s * (t + A2) / (A3 * (t + A4)));
    }
}
