package org.miscela.core.model;

/**
 * An optional ternary correction x_a·x_b·x_c·(C0 + C1·x_a + C2·x_b), added to the combined binaries (the form used by
 * Cibulka 1982 for excess volumes), with each C_m(T) = Σ_j c_mj·(T − T_ref)^j. Immutable.
 */
public final class TernaryTerm {
    private final int a;
    private final int b;
    private final int c;
    private final double referenceKelvin;
    private final double[][] coefficients;
    private final int given;

    /**
     * @param coefficients rows C0, C1, C2 (one to three rows), each a temperature polynomial, internal units
     */
    public TernaryTerm(int a, int b, int c, double referenceKelvin, double[][] coefficients) {
        if (coefficients.length < 1 || coefficients.length > 3) {
            throw new IllegalArgumentException("a ternary term has C0 to C2");
        }
        this.a = a;
        this.b = b;
        this.c = c;
        this.referenceKelvin = referenceKelvin;
        this.given = coefficients.length;
        this.coefficients = new double[3][];
        for (int m = 0; m < 3; m++) {
            this.coefficients[m] = m < coefficients.length ? coefficients[m].clone() : new double[] {0.0};
        }
    }

    public int first() {
        return a;
    }

    public int second() {
        return b;
    }

    public int third() {
        return c;
    }

    /** How many of C0..C2 the card gave (the others are zero). */
    public int coefficientCount() {
        return given;
    }

    /** C_m at T, or dC_m/dT when {@code temperatureSlope}. */
    public double coefficientAt(int m, double kelvin, boolean temperatureSlope) {
        double dt = kelvin - referenceKelvin;
        double[] row = coefficients[m];
        double v = 0.0;
        if (temperatureSlope) {
            for (int j = row.length - 1; j >= 1; j--) {
                v = v * dt + j * row[j];
            }
        } else {
            for (int j = row.length - 1; j >= 0; j--) {
                v = v * dt + row[j];
            }
        }
        return v;
    }

    /** Whether any coefficient depends on temperature. */
    public boolean temperatureDependent() {
        for (double[] row : coefficients) {
            if (row.length > 1) {
                return true;
            }
        }
        return false;
    }

    /**
     * Adds this term's value, gradient and (when {@code hessian} is not null) Hessian with respect to the mole
     * fractions; returns the term's value.
     */
    double accumulate(double[] x, double kelvin, boolean temperatureSlope, double[] gradient, double[][] hessian) {
        double c0 = coefficientAt(0, kelvin, temperatureSlope);
        double c1 = coefficientAt(1, kelvin, temperatureSlope);
        double c2 = coefficientAt(2, kelvin, temperatureSlope);
        double xa = x[a];
        double xb = x[b];
        double xc = x[c];
        double p = xa * xb * xc;
        double l = c0 + c1 * xa + c2 * xb;
        if (gradient != null) {
            gradient[a] += xb * xc * l + p * c1;
            gradient[b] += xa * xc * l + p * c2;
            gradient[c] += xa * xb * l;
        }
        if (hessian != null) {
            double ab = xc * l + xb * xc * c2 + xa * xc * c1;
            double ac = xb * l + xa * xb * c1;
            double bc = xa * l + xa * xb * c2;
            hessian[a][a] += 2.0 * xb * xc * c1;
            hessian[b][b] += 2.0 * xa * xc * c2;
            hessian[a][b] += ab;
            hessian[b][a] += ab;
            hessian[a][c] += ac;
            hessian[c][a] += ac;
            hessian[b][c] += bc;
            hessian[c][b] += bc;
        }
        return p * l;
    }
}
