package org.miscela.core.model;

/**
 * Density of liquid water at one standard atmosphere, 0–150 °C, by the equation of G. S. Kell, "Density, Thermal
 * Expansivity, and Compressibility of Liquid Water from 0° to 150 °C: Correlations and Tables for Atmospheric
 * Pressure and Saturation Reviewed and Expressed on 1968 Temperature Scale", J. Chem. Eng. Data 20 (1975) 97–105:
 * ρ = (a0 + a1·t + a2·t² + a3·t³ + a4·t⁴ + a5·t⁵)/(1 + b·t), t in °C, ρ in kg/m³. The water density of the
 * Laliberté–Cooper model ({@link ApparentVolumeDensity}).
 */
public final class Kell1975WaterDensity extends BuiltInWaterDensity {
    public static final String NAME = "Kell 1975";
    public static final Kell1975WaterDensity INSTANCE = new Kell1975WaterDensity();

    private static final double A0 = 999.83952;
    private static final double A1 = 16.945176;
    private static final double A2 = -7.9870401e-3;
    private static final double A3 = -46.170461e-6;
    private static final double A4 = 105.56302e-9;
    private static final double A5 = -280.54253e-12;
    private static final double B = 16.879850e-3;

    private Kell1975WaterDensity() {
        super(NAME, 273.15, 423.15);
    }

    @Override
    public double at(double kelvin) {
        double t = kelvin - 273.15;
        return (((((A5 * t + A4) * t + A3) * t + A2) * t + A1) * t + A0) / (1.0 + B * t);
    }
}
