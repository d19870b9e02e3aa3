package org.miscela.reference;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.miscela.core.model.Component;
import org.miscela.core.model.PolynomialDensity;
import org.miscela.core.fit.DeviationMeasure;
import org.miscela.core.fit.RedlichKisterFit;
import org.miscela.core.fit.RedlichKisterFitter;

/**
 * Writes the ethanol + water card fitted to OIML R 22 densities (test resource cards/ethanol-water-oiml.tsv):
 * pure-component polynomials taken exactly from the formula, Redlich–Kister coefficients of V^E = x1·x2·Σ A_k (x1 −
 * x2)^k with A_k(t) = Σ_j a_kj (t − 20)^j fitted by the library's fit engine ({@link RedlichKisterFitter}, scaled
 * Householder QR) to the formula's densities on a grid of mass fractions and temperatures. Run once; the tests check
 * the committed card against the formula, so the numbers are never trusted on their own.
 */
public final class OimlCardFitter {
    static final int ORDER_X = Integer.getInteger("fit.orderX", 15);
    static final int ORDER_T = Integer.getInteger("fit.orderT", 4);
    static final double T_LOW = 0.0;
    static final double T_HIGH = 40.0;
    /** The pure liquids: the formula's own polynomials in t − 20 °C at p = 1 and p = 0. */
    static final Component ETHANOL = new Component("ethanol", Oiml22.M_ETHANOL,
            new PolynomialDensity(293.15, Oiml22.pureEthanolPolynomial()));
    static final Component WATER = new Component("water", Oiml22.M_WATER,
            new PolynomialDensity(293.15, Oiml22.pureWaterPolynomial()));

    private OimlCardFitter() {
    }

    public static void main(String[] args) throws IOException {
        double[][] a = fit();
        System.out.println("worst density deviation " + worst(a) + " kg/m³");
        StringBuilder b = new StringBuilder();
        row(b, "Miscela card", "1");
        row(b, "title", "Ethanol + water, fitted to OIML R 22 densities");
        row(b, "source", String.format(Locale.ROOT, "OIML R 22 (1975) density formula; pure liquids exact from the "
                + "formula; Redlich-Kister A0..A%d, each quartic in (t - 20), least-squares fit over p = 0..1, "
                + "t = %.0f..%.0f C", ORDER_X, T_LOW, T_HIGH));
        row(b, "temperature unit", "°C");
        row(b, "density unit", "kg/m³");
        row(b, "molar volume unit", "cm³/mol");
        row(b, "molar mass unit", "g/mol");
        row(b, "component", "ethanol", num(Oiml22.M_ETHANOL));
        row(b, "component", "water", num(Oiml22.M_WATER));
        row(b, "density model", "ethanol", "polynomial");
        row(b, "density reference temperature", "ethanol", "20");
        row(b, "density coefficients", "ethanol", nums(Oiml22.pureEthanolPolynomial()));
        row(b, "density model", "water", "polynomial");
        row(b, "density reference temperature", "water", "20");
        row(b, "density coefficients", "water", nums(Oiml22.pureWaterPolynomial()));
        row(b, "excess volume reference temperature", "ethanol + water", "20");
        for (int k = 0; k < a.length; k++) {
            row(b, "excess volume A" + k, "ethanol + water", nums(a[k]));
        }
        row(b, "valid temperature", num(T_LOW), num(T_HIGH));
        row(b, "valid mole fraction", "ethanol", "0", "1");
        row(b, "extrapolation", "refuse");
        Files.write(Paths.get(args[0]), b.toString().getBytes(StandardCharsets.UTF_8));
    }

    /** a[k][j] in cm³/mol. */
    static double[][] fit() {
        return fitWithStatistics().coefficients();
    }

    /**
     * The fit engine's Redlich–Kister fit to OIML densities over p = 1/400..399/400 and t = T_LOW..T_HIGH in steps of
     * 1 °C, minimising density deviations (each V^E residual weighted by (ρ/V_m)²).
     */
    static RedlichKisterFit fitWithStatistics() {
        List<double[]> points = new ArrayList<>();
        for (int ip = 1; ip < 400; ip++) {
            double p = ip / 400.0;
            for (double t = T_LOW; t <= T_HIGH + 1e-9; t += 1.0) {
                points.add(new double[] {Oiml22.moleFraction(p), t + 273.15, Oiml22.density(p, t)});
            }
        }
        double[] x = new double[points.size()];
        double[] kelvin = new double[x.length];
        double[] rho = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = points.get(i)[0];
            kelvin[i] = points.get(i)[1];
            rho[i] = points.get(i)[2];
        }
        return RedlichKisterFitter.densities(x, kelvin, rho, ETHANOL, WATER, ORDER_X, ORDER_T, 293.15,
                DeviationMeasure.DENSITY, null);
    }

    /** Largest |ρ − ρ_OIML| on the test grid p = 0..1 step 0.01, t = 0..40 step 1. */
    static double worst(double[][] a) {
        double[] e = Oiml22.pureEthanolPolynomial();
        double[] w = Oiml22.pureWaterPolynomial();
        double worst = 0;
        for (int ip = 0; ip <= 100; ip++) {
            double p = ip / 100.0;
            double x = Oiml22.moleFraction(p);
            for (int t = 0; t <= 40; t++) {
                double d = 2 * x - 1;
                double s = 0;
                for (int k = a.length - 1; k >= 0; k--) {
                    s = s * d + horner(a[k], t - 20);
                }
                double vm = x * 1000.0 * Oiml22.M_ETHANOL / horner(e, t - 20)
                        + (1 - x) * 1000.0 * Oiml22.M_WATER / horner(w, t - 20) + x * (1 - x) * s;
                double rho = 1000.0 * (x * Oiml22.M_ETHANOL + (1 - x) * Oiml22.M_WATER) / vm;
                worst = Math.max(worst, Math.abs(rho - Oiml22.density(p, t)));
            }
        }
        return worst;
    }

    static double horner(double[] c, double x) {
        double v = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            v = v * x + c[i];
        }
        return v;
    }

    private static String num(double v) {
        return Double.toString(v);
    }

    private static String[] nums(double[] v) {
        String[] s = new String[v.length];
        for (int i = 0; i < v.length; i++) {
            s[i] = Double.toString(v[i]);
        }
        return s;
    }

    private static void row(StringBuilder b, String label, Object... values) {
        b.append(label);
        for (Object v : values) {
            if (v instanceof String[]) {
                for (String s : (String[]) v) {
                    b.append('\t').append(s);
                }
            } else {
                b.append('\t').append(v);
            }
        }
        b.append('\n');
    }
}
