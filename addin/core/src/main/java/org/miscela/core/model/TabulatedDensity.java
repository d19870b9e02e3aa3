package org.miscela.core.model;

import java.util.Arrays;

/**
 * Liquid density from a table of (T, ρ) points joined by the monotone piecewise-cubic Hermite interpolant of Fritsch
 * and Carlson (SIAM J. Numer. Anal. 17 (1980) 238–246): it passes through every point, never overshoots between
 * them and keeps the table's monotonic stretches monotonic, so a published table is reproduced without invented
 * wiggles. Written by hand: Commons Math 3 has no monotone interpolant. Defined between the first and last
 * temperatures only. Immutable.
 */
public final class TabulatedDensity implements PureDensity {
    public static final String NAME = "table";

    private final double[] t;
    private final double[] rho;
    private final double[] slope;

    /** @param kelvin increasing temperatures, at least two; {@code density} in kg/m³ */
    public TabulatedDensity(double[] kelvin, double[] density) {
        int n = kelvin.length;
        if (n < 2 || density.length != n) {
            throw new IllegalArgumentException("two or more points");
        }
        for (int i = 1; i < n; i++) {
            if (!(kelvin[i] > kelvin[i - 1])) {
                throw new IllegalArgumentException("temperatures must increase");
            }
        }
        this.t = kelvin.clone();
        this.rho = density.clone();
        double[] secant = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            secant[i] = (rho[i + 1] - rho[i]) / (t[i + 1] - t[i]);
        }
        slope = new double[n];
        slope[0] = secant[0];
        slope[n - 1] = secant[n - 2];
        for (int i = 1; i < n - 1; i++) {
            slope[i] = secant[i - 1] * secant[i] <= 0.0 ? 0.0 : (secant[i - 1] + secant[i]) / 2.0;
        }
        // Fritsch–Carlson: limit the slopes so that each interval's cubic stays monotone
        for (int i = 0; i < n - 1; i++) {
            if (secant[i] == 0.0) {
                slope[i] = 0.0;
                slope[i + 1] = 0.0;
                continue;
            }
            double a = slope[i] / secant[i];
            double b = slope[i + 1] / secant[i];
            double s = a * a + b * b;
            if (s > 9.0) {
                double tau = 3.0 / Math.sqrt(s);
                slope[i] = tau * a * secant[i];
                slope[i + 1] = tau * b * secant[i];
            }
        }
    }

    @Override
    public double at(double kelvin) {
        if (!(kelvin >= t[0] && kelvin <= t[t.length - 1])) {
            return Double.NaN;
        }
        int i = Arrays.binarySearch(t, kelvin);
        if (i >= 0) {
            return rho[i];
        }
        i = -i - 2;
        double h = t[i + 1] - t[i];
        double s = (kelvin - t[i]) / h;
        double h00 = (1 + 2 * s) * (1 - s) * (1 - s);
        double h10 = s * (1 - s) * (1 - s);
        double h01 = s * s * (3 - 2 * s);
        double h11 = s * s * (s - 1);
        return h00 * rho[i] + h10 * h * slope[i] + h01 * rho[i + 1] + h11 * h * slope[i + 1];
    }

    @Override
    public String modelName() {
        return NAME;
    }

    @Override
    public double lowestKelvin() {
        return t[0];
    }

    @Override
    public double highestKelvin() {
        return t[t.length - 1];
    }
}
