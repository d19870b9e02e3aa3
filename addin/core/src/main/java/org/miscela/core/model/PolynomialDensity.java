package org.miscela.core.model;

import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;

/** ρ(T) = Σ c_j (T − T_ref)^j, evaluated by Horner's scheme. */
public final class PolynomialDensity implements PureDensity {
    public static final String NAME = "polynomial";
    private final double referenceKelvin;
    private final PolynomialFunction polynomial;

    /**
     * @param referenceKelvin T_ref in K
     * @param kgPerM3Coefficients c_0, c_1, ... in kg/m³ per K^j (copied)
     */
    public PolynomialDensity(double referenceKelvin, double[] kgPerM3Coefficients) {
        this.referenceKelvin = referenceKelvin;
        this.polynomial = new PolynomialFunction(kgPerM3Coefficients);
    }

    @Override
    public double at(double kelvin) {
        return polynomial.value(kelvin - referenceKelvin);
    }

    @Override
    public String modelName() {
        return NAME;
    }
}
