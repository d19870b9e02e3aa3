package org.miscela.core.model;

/**
 * A binary Redlich–Kister expansion with temperature-dependent coefficients:
 * B^E = x1·x2·Σ_k A_k(T)·(x1 − x2)^k, with A_k(T) = Σ_j a_kj·(T − T_ref)^j.
 * Immutable; the coefficient array is copied in.
 */
public final class RedlichKister {
    private final double referenceKelvin;
    private final double[][] a;

    /**
     * @param referenceKelvin T_ref in K
     * @param coefficients a[k][j]: row k holds the temperature polynomial of A_k (at least one row, each non-empty)
     */
    public RedlichKister(double referenceKelvin, double[][] coefficients) {
        if (coefficients.length == 0) {
            throw new IllegalArgumentException("at least A0 is needed");
        }
        this.referenceKelvin = referenceKelvin;
        this.a = new double[coefficients.length][];
        for (int k = 0; k < coefficients.length; k++) {
            if (coefficients[k].length == 0) {
                throw new IllegalArgumentException("A" + k + " has no coefficient");
            }
            this.a[k] = coefficients[k].clone();
        }
    }

    /** The highest k. */
    public int order() {
        return a.length - 1;
    }

    public double referenceKelvin() {
        return referenceKelvin;
    }

    /** How many temperature coefficients A_k has (1 for a constant). */
    public int temperatureTerms(int k) {
        return a[k].length;
    }

    /** A_k at the given temperature. */
    public double coefficientAt(int k, double kelvin) {
        double dt = kelvin - referenceKelvin;
        double[] row = a[k];
        double v = row[row.length - 1];
        for (int j = row.length - 2; j >= 0; j--) {
            v = v * dt + row[j];
        }
        return v;
    }

    /** dA_k/dT at the given temperature, per kelvin. */
    public double coefficientSlopeAt(int k, double kelvin) {
        double dt = kelvin - referenceKelvin;
        double[] row = a[k];
        double v = 0.0;
        for (int j = row.length - 1; j >= 1; j--) {
            v = v * dt + j * row[j];
        }
        return v;
    }

    /** Whether any A_k depends on temperature. */
    public boolean temperatureDependent() {
        for (double[] row : a) {
            if (row.length > 1) {
                return true;
            }
        }
        return false;
    }

    /**
     * The series S(d) = Σ_k A_k·d^k and its first two derivatives in d, with the coefficients at T
     * (or, when {@code temperatureSlope}, their temperature derivatives dA_k/dT). Multicomponent models evaluate
     * each binary as x_i·x_j·S(d) with a model-specific d.
     *
     * @param out receives {S, dS/dd, d²S/dd²}
     */
    public void series(double d, double kelvin, boolean temperatureSlope, double[] out) {
        int last = a.length - 1;
        double s = temperatureSlope ? coefficientSlopeAt(last, kelvin) : coefficientAt(last, kelvin);
        double ds = 0.0;
        double dds = 0.0;
        for (int k = last - 1; k >= 0; k--) {
            dds = dds * d + ds;
            ds = ds * d + s;
            s = s * d + (temperatureSlope ? coefficientSlopeAt(k, kelvin) : coefficientAt(k, kelvin));
        }
        out[0] = s;
        out[1] = ds;
        out[2] = 2.0 * dds;
    }

    /** S(d) = Σ_k A_k(T)·d^k alone (or its temperature slope): what {@link #series} puts first, with no array. */
    public double sum(double d, double kelvin, boolean temperatureSlope) {
        int last = a.length - 1;
        double s = temperatureSlope ? coefficientSlopeAt(last, kelvin) : coefficientAt(last, kelvin);
        for (int k = last - 1; k >= 0; k--) {
            s = s * d + (temperatureSlope ? coefficientSlopeAt(k, kelvin) : coefficientAt(k, kelvin));
        }
        return s;
    }

    /** The same expansion written for the components in the other order: A_k → (−1)^k A_k. */
    public RedlichKister swapped() {
        double[][] b = new double[a.length][];
        for (int k = 0; k < a.length; k++) {
            b[k] = a[k].clone();
            if (k % 2 == 1) {
                for (int j = 0; j < b[k].length; j++) {
                    b[k][j] = -b[k][j];
                }
            }
        }
        return new RedlichKister(referenceKelvin, b);
    }

    /** The expansion scaled by a constant factor (a change of units). */
    RedlichKister scaled(double factor) {
        double[][] b = new double[a.length][];
        for (int k = 0; k < a.length; k++) {
            b[k] = a[k].clone();
            for (int j = 0; j < b[k].length; j++) {
                b[k][j] *= factor;
            }
        }
        return new RedlichKister(referenceKelvin, b);
    }

    /**
     * B^E and its first two derivatives with respect to x1 along x2 = 1 − x1.
     *
     * @param out receives {B^E, dB^E/dx1, d²B^E/dx1²}
     */
    public void evaluate(double x1, double kelvin, double[] out) {
        double x2 = 1.0 - x1;
        double d = x1 - x2;
        // Horner for S(d) = Σ A_k d^k and its derivatives (dds holds S''/2).
        double s = coefficientAt(a.length - 1, kelvin);
        double ds = 0.0;
        double dds = 0.0;
        for (int k = a.length - 2; k >= 0; k--) {
            dds = dds * d + ds;
            ds = ds * d + s;
            s = s * d + coefficientAt(k, kelvin);
        }
        double u = x1 * x2;
        double du = x2 - x1;
        // d/dx1 of d is 2, so dS/dx1 = 2 S' and d²S/dx1² = 4 S''.
        out[0] = u * s;
        out[1] = du * s + u * 2.0 * ds;
        out[2] = -2.0 * s + 2.0 * du * 2.0 * ds + u * 4.0 * (2.0 * dds);
    }

    /** B^E at one point. */
    public double value(double x1, double kelvin) {
        double[] out = new double[3];
        evaluate(x1, kelvin, out);
        return out[0];
    }
}
