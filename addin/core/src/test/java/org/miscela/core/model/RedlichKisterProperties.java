package org.miscela.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * The binary Redlich–Kister expansion and the ternary term against what they are by definition, checked through
 * values computed another way: temperature slopes of the coefficients against differences in temperature, the
 * second composition derivative against differences of B^E, scaling, and which sets depend on temperature. Every
 * coefficient is invented at random (A_k within ±8, temperature terms of realistic size, up to cubic in T).
 */
class RedlichKisterProperties {
    private static final double U = Math.ulp(1.0) / 2;
    private static final double T_REF = 298.15;

    /** Coefficients a[k][j] of orders 0..6 in x and 0..3 in T: |a_k0| ≤ 8, |a_k1| ≤ 0.02, |a_k2| ≤ 1e-4, |a_k3| ≤ 1e-6. */
    static double[][] coefficients(Random r) {
        double[][] a = new double[1 + r.nextInt(7)][];
        for (int k = 0; k < a.length; k++) {
            a[k] = new double[1 + r.nextInt(4)];
            double size = 8;
            for (int j = 0; j < a[k].length; j++) {
                a[k][j] = size * (2 * r.nextDouble() - 1);
                size *= j == 0 ? 0.0025 : 0.005;
            }
        }
        return a;
    }

    /** Σ_j |a_kj|·|T − T_ref|^j: bounds every partial sum of the temperature polynomial's Horner scheme. */
    private static double size(double[] row, double kelvin) {
        double s = 0;
        for (int j = 0; j < row.length; j++) {
            s += Math.abs(row[j]) * Math.pow(Math.abs(kelvin - T_REF), j);
        }
        return s;
    }

    /**
     * dA_k/dT against the five-point central difference of A_k in T, which is exact for polynomials up to degree 4,
     * so only rounding remains: each A_k(T) is a Horner chain of at most 4 steps, off by at most 8·u·size, and the
     * weights (1, −8, 8, −1)/12h sum to 1.5/h in absolute value; the bound is 4 times that with h = 1 K.
     */
    @Property(tries = 1000)
    void coefficientSlopesAreTemperatureDerivatives(@ForAll long seed,
            @ForAll @DoubleRange(min = 250, max = 400) double kelvin) {
        Random r = new Random(seed);
        double[][] a = coefficients(r);
        RedlichKister rk = new RedlichKister(T_REF, a);
        double h = 1.0;
        for (int k = 0; k <= rk.order(); k++) {
            double d = (rk.coefficientAt(k, kelvin - 2 * h) - 8 * rk.coefficientAt(k, kelvin - h)
                    + 8 * rk.coefficientAt(k, kelvin + h) - rk.coefficientAt(k, kelvin + 2 * h)) / (12 * h);
            double bound = 4 * 1.5 * 8 * U * size(a[k], kelvin + 2 * h) / h;
            assertEquals(d, rk.coefficientSlopeAt(k, kelvin), bound, "A" + k + " of seed " + seed);
        }
    }

    /** The ternary term's coefficient slopes, the same way (rows C0..C2, up to cubic in T). */
    @Property(tries = 500)
    void ternaryCoefficientSlopesAreTemperatureDerivatives(@ForAll long seed,
            @ForAll @DoubleRange(min = 250, max = 400) double kelvin) {
        Random r = new Random(seed);
        double[][] a = coefficients(r);
        double[][] c = java.util.Arrays.copyOf(a, Math.min(3, a.length));
        TernaryTerm t = new TernaryTerm(0, 1, 2, T_REF, c);
        double h = 1.0;
        for (int m = 0; m < c.length; m++) {
            double d = (t.coefficientAt(m, kelvin - 2 * h, false) - 8 * t.coefficientAt(m, kelvin - h, false)
                    + 8 * t.coefficientAt(m, kelvin + h, false) - t.coefficientAt(m, kelvin + 2 * h, false)) / (12 * h);
            double bound = 4 * 1.5 * 8 * U * size(c[m], kelvin + 2 * h) / h;
            assertEquals(d, t.coefficientAt(m, kelvin, true), bound, "C" + m + " of seed " + seed);
        }
    }

    /**
     * d²B^E/dx1² from {@link RedlichKister#evaluate} against the five-point second difference of B^E,
     * [−B(x−2h) + 16B(x−h) − 30B(x) + 16B(x+h) − B(x+2h)]/(12h²), with h = 2⁻¹⁰. Its error is h⁴/90·B⁽⁶⁾ plus
     * rounding. With d = 2x1 − 1, B = (1 − d²)/4·Σ A_k d^k, so |B⁽⁶⁾| ≤ 2⁶/4·Σ_k |A_k|·(k!/(k−6)! + (k+2)!/(k−4)!)
     * on |d| ≤ 1; each value is off by at most 32·u·Σ|A_k| (a Horner chain of at most 7 steps and the product with
     * x1·x2), and the weights sum to 64/12 in absolute value, so rounding adds at most (64/12)·32·u·Σ|A_k|/h².
     */
    @Property(tries = 1000)
    void secondDerivativeMatchesSecondDifferences(@ForAll long seed,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double x1,
            @ForAll @DoubleRange(min = 250, max = 400) double kelvin) {
        RedlichKister rk = new RedlichKister(T_REF, coefficients(new Random(seed)));
        double h = 0x1p-10;
        double sixth = 0;
        double sum = 0;
        for (int k = 0; k <= rk.order(); k++) {
            double a = Math.abs(rk.coefficientAt(k, kelvin));
            sixth += a * (falling(k, 6) + falling(k + 2, 6));
            sum += a;
        }
        sixth *= 64 / 4.0;
        double d2 = (-rk.value(x1 - 2 * h, kelvin) + 16 * rk.value(x1 - h, kelvin) - 30 * rk.value(x1, kelvin)
                + 16 * rk.value(x1 + h, kelvin) - rk.value(x1 + 2 * h, kelvin)) / (12 * h * h);
        double bound = Math.pow(h, 4) / 90 * sixth + 64 / 12.0 * 32 * U * sum / (h * h);
        double[] e = new double[3];
        rk.evaluate(x1, kelvin, e);
        assertEquals(d2, e[2], bound, "seed " + seed + ", x1 " + x1);
        assertEquals(rk.value(x1, kelvin), e[0], 0.0, "evaluate and value agree");
    }

    /** m!/(m − 6)!, zero below 6. */
    private static double falling(int m, int count) {
        double f = 1;
        for (int i = 0; i < count; i++) {
            f *= Math.max(0, m - i);
        }
        return f;
    }

    /**
     * Scaling the set (a change of units) scales every coefficient and every value: each side rounds a few times on
     * terms bounded by the coefficient sizes.
     */
    @Property(tries = 300)
    void scalingScalesEveryValue(@ForAll long seed, @ForAll @DoubleRange(min = 0, max = 1) double x1,
            @ForAll @DoubleRange(min = 0.01, max = 1000) double factor) {
        double[][] a = coefficients(new Random(seed));
        RedlichKister rk = new RedlichKister(T_REF, a);
        RedlichKister scaled = rk.scaled(factor);
        assertEquals(rk.order(), scaled.order());
        double sum = 0;
        for (int k = 0; k <= rk.order(); k++) {
            assertEquals(factor * rk.coefficientAt(k, 310), scaled.coefficientAt(k, 310),
                    16 * U * factor * size(a[k], 310), "A" + k);
            sum += size(a[k], 310);
        }
        assertEquals(factor * rk.value(x1, 310), scaled.value(x1, 310), 64 * U * factor * sum);
    }

    @Test
    void onlySetsWithTemperatureTermsDependOnTemperature() {
        RedlichKister constant = new RedlichKister(T_REF, new double[][] {{-4.0}, {1.5}});
        RedlichKister varying = new RedlichKister(T_REF, new double[][] {{-4.0}, {1.5, 0.01}});
        assertFalse(constant.temperatureDependent());
        assertEquals(0.0, constant.coefficientSlopeAt(1, 350), 0.0);
        assertTrue(varying.temperatureDependent());
        assertEquals(0.01, varying.coefficientSlopeAt(1, 350), 1e-17);

        TernaryTerm flat = new TernaryTerm(0, 1, 2, T_REF, new double[][] {{0.3}, {0.1}});
        TernaryTerm sloped = new TernaryTerm(0, 1, 2, T_REF, new double[][] {{0.3}, {0.1}, {0.2, -0.001}});
        assertFalse(flat.temperatureDependent());
        assertTrue(sloped.temperatureDependent());

        RedlichKister[][] pairs = new RedlichKister[3][3];
        pairs[0][1] = constant;
        assertFalse(new ExcessFunction(3, GeometricModel.MUGGIANU, -1, pairs, Collections.emptyList())
                .temperatureDependent());
        assertFalse(new ExcessFunction(3, GeometricModel.MUGGIANU, -1, pairs, Collections.singletonList(flat))
                .temperatureDependent());
        assertTrue(new ExcessFunction(3, GeometricModel.MUGGIANU, -1, pairs, Collections.singletonList(sloped))
                .temperatureDependent());
        pairs[1][2] = varying;
        assertTrue(new ExcessFunction(3, GeometricModel.MUGGIANU, -1, pairs, Collections.singletonList(flat))
                .temperatureDependent());
    }
}
