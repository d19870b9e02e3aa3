package org.miscela.core.model;

/**
 * The vapour pressure of a pure liquid by a Wagner equation, ln(p/p_c) = (T_c/T)·Σ_i a_i·τ^e_i with τ = 1 − T/T_c,
 * in one of its two usual sets of exponents: "Wagner 3-6" (1, 1.5, 3, 3.5, 4, 7.5: the form of W. Wagner and A. Pruß,
 * J. Phys. Chem. Ref. Data 22 (1993) 783, for water) and "Wagner 2.5-5" (1, 1.5, 2.5, 5: the form of the tables of
 * Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids). Defined up to T_c. Immutable.
 */
public final class WagnerVapourPressure extends RangedVapourPressure {
    public static final String NAME_3_6 = "Wagner 3-6";
    public static final String NAME_2_5 = "Wagner 2.5-5";
    static final double[] EXPONENTS_3_6 = {1, 1.5, 3, 3.5, 4, 7.5};
    static final double[] EXPONENTS_2_5 = {1, 1.5, 2.5, 5};

    private final double criticalKelvin;
    private final double criticalPascal;
    private final double[] a;
    private final double[] exponents;

    /** @param a six coefficients for the 3-6 form, four for the 2.5-5 form */
    public WagnerVapourPressure(double criticalKelvin, double criticalPascal, double[] a, double lowestKelvin,
            double highestKelvin) {
        super(lowestKelvin, Math.min(highestKelvin, criticalKelvin));
        if (a.length != 6 && a.length != 4) {
            throw new IllegalArgumentException("six or four coefficients");
        }
        this.criticalKelvin = criticalKelvin;
        this.criticalPascal = criticalPascal;
        this.a = a.clone();
        this.exponents = a.length == 6 ? EXPONENTS_3_6 : EXPONENTS_2_5;
    }

    @Override
    public double pascal(double kelvin) {
        double tau = 1.0 - kelvin / criticalKelvin;
        if (!(tau >= 0.0) || !(kelvin > 0.0)) {
            return Double.NaN;
        }
        double sum = 0.0;
        for (int i = 0; i < a.length; i++) {
            sum += a[i] * Math.pow(tau, exponents[i]);
        }
        return criticalPascal * Math.exp(criticalKelvin / kelvin * sum);
    }

    @Override
    public String form() {
        return a.length == 6 ? NAME_3_6 : NAME_2_5;
    }
}
