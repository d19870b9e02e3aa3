package org.miscela.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/**
 * A pure liquid's heat capacity polynomial Cp(T) = Σ_j c_j (T − T_ref)^j (docs/card-format.md) against its
 * definition evaluated term by term, and the enthalpy change ∫ Cp dT against Gauss–Legendre quadrature of Cp, which
 * with three nodes is exact for polynomials up to degree 5. Coefficients are invented at random, up to cubic in T,
 * of the size of liquids' heat capacities (c_0 between 20 and 500 J/(mol·K)).
 */
class HeatCapacityProperties {
    private static final double U = Math.ulp(1.0) / 2;

    private static double[] coefficients(Random r) {
        double[] c = new double[1 + r.nextInt(4)];
        c[0] = 20 + 480 * r.nextDouble();
        double size = 1.0;
        for (int j = 1; j < c.length; j++) {
            c[j] = size * (2 * r.nextDouble() - 1);
            size *= 0.005;
        }
        return c;
    }

    /** Σ_j |c_j|·|T − T_ref|^j, which bounds every partial sum of the polynomial. */
    private static double size(double[] c, double tRef, double kelvin) {
        double s = 0;
        for (int j = 0; j < c.length; j++) {
            s += Math.abs(c[j]) * Math.pow(Math.abs(kelvin - tRef), j);
        }
        return s;
    }

    /** Cp(T) against the sum of its terms (each term rounds a few times: 16·u·size covers both evaluations). */
    @Property(tries = 500)
    void valueIsThePolynomial(@ForAll long seed, @ForAll @DoubleRange(min = 200, max = 500) double kelvin) {
        Random r = new Random(seed);
        double[] c = coefficients(r);
        double tRef = 273.15 + 100 * r.nextDouble();
        double direct = 0;
        for (int j = 0; j < c.length; j++) {
            direct += c[j] * Math.pow(kelvin - tRef, j);
        }
        assertEquals(direct, new HeatCapacity(tRef, c).at(kelvin), 16 * U * size(c, tRef, kelvin), "seed " + seed);
    }

    /**
     * ∫ Cp dT from T1 to T2 against three-point Gauss–Legendre quadrature (nodes m ± √(3/5)·w, weights 5/9, 8/9,
     * 5/9 of the half-width w), exact for degree ≤ 5. Both sides round a few times on terms bounded by
     * size·|T2 − T1| (and the antiderivative by size·|T − T_ref|), so 64·u of the larger covers them.
     */
    @Property(tries = 500)
    void enthalpyChangeIsTheIntegral(@ForAll long seed, @ForAll @DoubleRange(min = 200, max = 500) double from,
            @ForAll @DoubleRange(min = 200, max = 500) double to) {
        Random r = new Random(seed);
        double[] c = coefficients(r);
        double tRef = 273.15 + 100 * r.nextDouble();
        HeatCapacity cp = new HeatCapacity(tRef, c);
        double mid = (from + to) / 2;
        double half = (to - from) / 2;
        double node = Math.sqrt(0.6) * half;
        double quadrature = half * (5 * cp.at(mid - node) + 8 * cp.at(mid) + 5 * cp.at(mid + node)) / 9;
        double scale = Math.max(size(c, tRef, from), size(c, tRef, to))
                * (Math.abs(to - from) + Math.abs(from - tRef) + Math.abs(to - tRef));
        assertEquals(quadrature, cp.enthalpyChange(from, to), 64 * U * scale, "seed " + seed);
        assertEquals(0.0, cp.enthalpyChange(to, to), 0.0);
    }
}
