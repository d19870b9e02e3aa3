package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCard;
import org.miscela.core.model.GeometricModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

/**
 * The core's excess volume, partial molar volumes and density against an independent evaluation of the same formulas
 * (docs/card-format.md) in BigDecimal with 50 significant digits: binary and multicomponent cards, every geometric
 * model (Muggianu, Kohler, Toop), ternary terms, temperature-dependent coefficients, unit conversions, compositions
 * at the corners, on the edges, 1e-15 from a corner and inside, and near-degenerate cards (tiny and huge
 * coefficients, near-equal molar masses, steep density polynomials, orders up to A20 with alternating signs). The
 * reference reads the cards' numbers, not the parsed card, and takes partial molar volumes as V̄_k = V_k* + V^E +
 * D_v V^E along v = e_k − x by a central difference at h = 1e-20 (its error, below 1e-29, is far under double
 * precision). All card values are invented.
 *
 * <p>The bound asserted is a forward error bound of the evaluation order: |computed − exact| ≤ N·u·S, u = 2^-53,
 * with S the sum of the magnitudes of every term summed (for the partials an upper bound of them, the pure molar
 * volumes weighted by their polynomial's condition number) and N the number of rounding steps a term passes through
 * (Horner in T and in d, the products, the sum over pairs, unit conversions), counted generously. The reference
 * works at the exact temperature t + 273.15 while the core rounds it once (and each reference temperature once), so
 * S also holds (|T| + |T_ref|)·|∂term/∂T| for every temperature polynomial: the effect of those two roundings. A relative error
 * |Δ|/|exact| is reported as well; it is large only where V^E itself nearly cancels.
 */
class HighPrecisionTest {
    private static final MathContext MC = new MathContext(50);
    private static final double U = Math.ulp(1.0) / 2;
    private static final BigDecimal H = new BigDecimal("1e-20");
    private static final BigDecimal ZERO_CELSIUS = new BigDecimal("273.15");
    private static final BigDecimal THOUSAND = BigDecimal.valueOf(1000);
    /** Per quantity: worst relative error, worst fraction of the bound, cases, and the case of the worst error. */
    private static final Map<String, Object[]> WORST = new TreeMap<>();

    /** One pair's rows as written: the components in written order and a[k][j] in the card's unit. */
    static final class Pair {
        int first;
        int second;
        double reference;
        double[][] a;
    }

    /** One ternary term as written. */
    static final class Ternary {
        int[] members;
        double reference;
        double[][] c;
    }

    /** A card's numbers, the card's cells made from them, and a point to evaluate. */
    static final class Case {
        String what;
        int n;
        GeometricModel model = GeometricModel.MUGGIANU;
        int asymmetric = -1;
        boolean celsius;
        double volumeFactor = 1;
        double densityFactor = 1;
        double massFactor = 1;
        double[] mass;
        /** Per component: null for a constant density (then {@link #densityConstant}), else the polynomial. */
        double[][] densityPolynomial;
        double[] densityConstant;
        double[] densityReference;
        final List<Pair> pairs = new ArrayList<>();
        final List<Ternary> ternaries = new ArrayList<>();
        double lowest;
        double highest;

        Card card() {
            String[] names = new String[n];
            for (int i = 0; i < n; i++) {
                names[i] = "c" + i;
            }
            TestCard t = TestCard.empty().row("Miscela card", 2).row("source", "invented values, for a test")
                    .row("temperature unit", celsius ? "°C" : "K")
                    .row("density unit", densityFactor == 1 ? "kg/m³" : "g/cm³")
                    .row("molar volume unit", volumeFactor == 1 ? "cm³/mol" : "L/mol")
                    .row("molar mass unit", massFactor == 1 ? "g/mol" : "kg/mol")
                    .row("valid temperature", lowest, highest).row("extrapolation", "allow");
            if (model == GeometricModel.TOOP) {
                t.row("multicomponent model", "Toop", names[asymmetric]);
            } else {
                t.row("multicomponent model", model.cardName());
            }
            for (int i = 0; i < n; i++) {
                t.row("component", names[i], mass[i]);
                if (densityPolynomial[i] == null) {
                    t.row("density model", names[i], "constant").row("density coefficients", names[i],
                            densityConstant[i]);
                } else {
                    Object[] row = new Object[2 + densityPolynomial[i].length];
                    row[0] = "density coefficients";
                    row[1] = names[i];
                    for (int j = 0; j < densityPolynomial[i].length; j++) {
                        row[2 + j] = densityPolynomial[i][j];
                    }
                    t.row("density model", names[i], "polynomial")
                            .row("density reference temperature", names[i], densityReference[i]).row(row);
                }
            }
            t.row("valid mole fraction", names[0], 0, 1);
            for (Pair p : pairs) {
                String subject = names[p.first] + " + " + names[p.second];
                for (int k = 0; k < p.a.length; k++) {
                    Object[] row = new Object[2 + p.a[k].length];
                    row[0] = "excess volume A" + k;
                    row[1] = subject;
                    for (int j = 0; j < p.a[k].length; j++) {
                        row[2 + j] = p.a[k][j];
                    }
                    t.row(row);
                }
                t.row("excess volume reference temperature", subject, p.reference);
            }
            for (Ternary tt : ternaries) {
                String subject = names[tt.members[0]] + " + " + names[tt.members[1]] + " + " + names[tt.members[2]];
                for (int m = 0; m < tt.c.length; m++) {
                    Object[] row = new Object[2 + tt.c[m].length];
                    row[0] = "excess volume ternary C" + m;
                    row[1] = subject;
                    for (int j = 0; j < tt.c[m].length; j++) {
                        row[2 + j] = tt.c[m][j];
                    }
                    t.row(row);
                }
                t.row("excess volume reference temperature", subject, tt.reference);
            }
            return t.read();
        }

        int highestOrder() {
            int m = 0;
            for (Pair p : pairs) {
                m = Math.max(m, p.a.length - 1);
                for (double[] row : p.a) {
                    m = Math.max(m, row.length - 1);
                }
            }
            return m;
        }

        int highestDensityDegree() {
            int d = 0;
            for (double[] c : densityPolynomial) {
                d = Math.max(d, c == null ? 0 : c.length - 1);
            }
            return d;
        }
    }

    // ------------------------------------------------------------------ the reference evaluation

    private static BigDecimal bd(double v) {
        return new BigDecimal(v);
    }

    /** A temperature of the card in K, exactly. */
    private static BigDecimal kelvin(Case c, double t) {
        return c.celsius ? bd(t).add(ZERO_CELSIUS) : bd(t);
    }

    /**
     * Σ_j a_j·dt^j; {@code abs} (when given) receives its magnitude for the error bound: Σ_j |a_j|·|dt|^j plus
     * (|T| + |T_ref|)·Σ_j j·|a_j|·|dt|^(j−1), the change that one rounding of each temperature (°C → K) can cause.
     *
     * @param temperatures |T| + |T_ref| in K
     */
    private static BigDecimal polynomial(double[] a, BigDecimal dt, BigDecimal temperatures, BigDecimal[] abs) {
        BigDecimal v = BigDecimal.ZERO;
        BigDecimal w = BigDecimal.ZERO;
        BigDecimal slope = BigDecimal.ZERO;
        for (int j = a.length - 1; j >= 0; j--) {
            v = v.multiply(dt, MC).add(bd(a[j]), MC);
            slope = slope.multiply(dt.abs(), MC).add(w, MC);
            w = w.multiply(dt.abs(), MC).add(bd(a[j]).abs(), MC);
        }
        if (abs != null) {
            abs[0] = w.add(slope.multiply(temperatures, MC), MC);
        }
        return v;
    }

    /** ρ_k in kg/m³ and its condition Σ|c_j||dt|^j/|ρ|. */
    private static BigDecimal[] pureDensity(Case c, int k, BigDecimal tK) {
        BigDecimal f = bd(c.densityFactor);
        if (c.densityPolynomial[k] == null) {
            return new BigDecimal[] {bd(c.densityConstant[k]).multiply(f, MC), BigDecimal.ONE};
        }
        BigDecimal[] abs = new BigDecimal[1];
        BigDecimal rho = polynomial(c.densityPolynomial[k], tK.subtract(kelvin(c, c.densityReference[k]), MC),
                tK.add(kelvin(c, c.densityReference[k]).abs(), MC), abs);
        return new BigDecimal[] {rho.multiply(f, MC), abs[0].divide(rho.abs(), MC)};
    }

    /** V_k* = 1000·M/ρ in cm³/mol. */
    private static BigDecimal pureVolume(Case c, int k, BigDecimal tK) {
        return THOUSAND.multiply(bd(c.mass[k]).multiply(bd(c.massFactor), MC), MC).divide(pureDensity(c, k, tK)[0],
                MC);
    }

    /**
     * V^E in cm³/mol at the (exact, normalised) composition x, each pair x_f·x_s·Σ A_k d^k with d from the model
     * and the pair written f then s; {@code scale[0]} receives the same sum of the terms' magnitudes.
     */
    static BigDecimal excess(Case c, BigDecimal[] x, BigDecimal tK, BigDecimal[] scale) {
        BigDecimal vf = bd(c.volumeFactor);
        BigDecimal total = BigDecimal.ZERO;
        BigDecimal magnitude = BigDecimal.ZERO;
        for (Pair p : c.pairs) {
            BigDecimal xf = x[p.first];
            BigDecimal xs = x[p.second];
            BigDecimal d;
            boolean toop = c.model == GeometricModel.TOOP && (p.first == c.asymmetric || p.second == c.asymmetric);
            if (c.model == GeometricModel.MUGGIANU) {
                d = xf.subtract(xs, MC);
            } else if (toop) {
                // the binary at the asymmetric component's own fraction: (x_a, 1 − x_a), written order kept
                BigDecimal xa = x[c.asymmetric];
                BigDecimal bf = p.first == c.asymmetric ? xa : BigDecimal.ONE.subtract(xa, MC);
                BigDecimal bs = p.first == c.asymmetric ? BigDecimal.ONE.subtract(xa, MC) : xa;
                d = bf.subtract(bs, MC);
            } else {
                BigDecimal s = xf.add(xs, MC);
                if (s.signum() == 0) {
                    continue; // x_f·x_s = 0: the pair contributes nothing
                }
                d = xf.subtract(xs, MC).divide(s, MC);
            }
            BigDecimal dt = tK.subtract(kelvin(c, p.reference), MC);
            BigDecimal temperatures = tK.add(kelvin(c, p.reference).abs(), MC);
            BigDecimal series = BigDecimal.ZERO;
            BigDecimal seriesAbs = BigDecimal.ZERO;
            BigDecimal power = BigDecimal.ONE;
            for (double[] ak : p.a) {
                BigDecimal[] abs = new BigDecimal[1];
                BigDecimal coefficient = polynomial(ak, dt, temperatures, abs).multiply(vf, MC);
                series = series.add(coefficient.multiply(power, MC), MC);
                seriesAbs = seriesAbs.add(abs[0].multiply(vf, MC).multiply(power.abs(), MC), MC);
                power = power.multiply(d, MC);
            }
            BigDecimal weight = xf.multiply(xs, MC);
            total = total.add(weight.multiply(series, MC), MC);
            magnitude = magnitude.add(weight.abs().multiply(seriesAbs, MC), MC);
        }
        for (Ternary t : c.ternaries) {
            BigDecimal xa = x[t.members[0]];
            BigDecimal xb = x[t.members[1]];
            BigDecimal xc = x[t.members[2]];
            BigDecimal dt = tK.subtract(kelvin(c, t.reference), MC);
            BigDecimal temperatures = tK.add(kelvin(c, t.reference).abs(), MC);
            BigDecimal[] cm = new BigDecimal[3];
            BigDecimal[] cmAbs = new BigDecimal[3];
            for (int m = 0; m < 3; m++) {
                BigDecimal[] abs = {BigDecimal.ZERO};
                cm[m] = m < t.c.length ? polynomial(t.c[m], dt, temperatures, abs).multiply(vf, MC)
                        : BigDecimal.ZERO;
                cmAbs[m] = abs[0].multiply(vf, MC);
            }
            BigDecimal product = xa.multiply(xb, MC).multiply(xc, MC);
            BigDecimal linear = cm[0].add(cm[1].multiply(xa, MC), MC).add(cm[2].multiply(xb, MC), MC);
            BigDecimal linearAbs = cmAbs[0].add(cmAbs[1].multiply(xa.abs(), MC), MC)
                    .add(cmAbs[2].multiply(xb.abs(), MC), MC);
            total = total.add(product.multiply(linear, MC), MC);
            magnitude = magnitude.add(product.abs().multiply(linearAbs, MC), MC);
        }
        if (scale != null) {
            scale[0] = magnitude;
        }
        return total;
    }

    /** Σ_pairs Σ_k |A_k(T)| and Σ_ternary Σ_m |C_m(T)|, cm³/mol: what the partials' terms are bounded by. */
    private static double[] coefficientMagnitudes(Case c, BigDecimal tK) {
        double pairs = 0;
        for (Pair p : c.pairs) {
            BigDecimal dt = tK.subtract(kelvin(c, p.reference), MC);
            for (double[] ak : p.a) {
                BigDecimal[] abs = new BigDecimal[1];
                polynomial(ak, dt, tK.add(kelvin(c, p.reference).abs(), MC), abs);
                pairs += abs[0].doubleValue() * c.volumeFactor * (p.a.length + 1) * (p.a.length + 1);
            }
        }
        double ternary = 0;
        for (Ternary t : c.ternaries) {
            BigDecimal dt = tK.subtract(kelvin(c, t.reference), MC);
            for (double[] cm : t.c) {
                BigDecimal[] abs = new BigDecimal[1];
                polynomial(cm, dt, tK.add(kelvin(c, t.reference).abs(), MC), abs);
                ternary += abs[0].doubleValue() * c.volumeFactor;
            }
        }
        return new double[] {pairs, ternary};
    }

    // ------------------------------------------------------------------ comparison

    private static void record(String quantity, double computed, BigDecimal exact, double bound, String what) {
        double error = bd(computed).subtract(exact, MC).abs().doubleValue();
        double relative = exact.signum() == 0 ? (error == 0 ? 0 : Double.POSITIVE_INFINITY)
                : error / exact.abs().doubleValue();
        double ofBound = bound == 0 ? (error == 0 ? 0 : Double.POSITIVE_INFINITY) : error / bound;
        synchronized (WORST) {
            Object[] w = WORST.computeIfAbsent(quantity, q -> new Object[] {0.0, 0.0, 0, "", ""});
            if (relative > (Double) w[0]) {
                w[0] = relative;
                w[3] = what;
            }
            if (ofBound > (Double) w[1]) {
                w[1] = ofBound;
                w[4] = what;
            }
            w[2] = (Integer) w[2] + 1;
        }
        assertTrue(error <= bound, () -> String.format(Locale.ROOT,
                "%s: computed %s, exact %s, error %.3g above the bound %.3g, for %s", quantity, computed,
                exact.round(new MathContext(20)), error, bound, what));
    }

    /** Evaluates one case at one point (composition as given, temperature t in the card's unit) and compares. */
    static void compare(Case c, Card card, double[] x, double t, String what) {
        int n = c.n;
        BigDecimal[] xe = new BigDecimal[n];
        BigDecimal sum = BigDecimal.ZERO;
        for (double v : x) {
            sum = sum.add(bd(v), MC);
        }
        for (int k = 0; k < n; k++) {
            xe[k] = bd(x[k]).divide(sum, MC);
        }
        BigDecimal tK = kelvin(c, t);
        int order = c.highestOrder();
        int terms = c.pairs.size() + c.ternaries.size();
        // Horner in T and in d (2 roundings a step each), the products, the sum over terms, conversions, slack.
        int steps = 2 * order + 2 * terms + 24;
        String at = what + " at x = " + java.util.Arrays.toString(x) + ", t = " + t;

        BigDecimal[] scale = new BigDecimal[1];
        BigDecimal ve = excess(c, xe, tK, scale);
        double veComputed = CardFunctions.excessMolarVolume(card, x, t, Extrapolation.ALLOW);
        double veBound = steps * U * scale[0].doubleValue() / c.volumeFactor;
        record("excess volume", veComputed, ve.divide(bd(c.volumeFactor), MC), veBound, at);
        if (!c.celsius) {
            // without the °C → K rounding: the evaluation's own error
            record("excess volume, cards in K", veComputed, ve.divide(bd(c.volumeFactor), MC), veBound, at);
        }

        double[] magnitudes = coefficientMagnitudes(c, tK);
        int degree = c.highestDensityDegree();
        BigDecimal pureSum = BigDecimal.ZERO;
        double pureScale = 0;
        for (int k = 0; k < n; k++) {
            BigDecimal vk = pureVolume(c, k, tK);
            double cond = pureDensity(c, k, tK)[1].doubleValue();
            pureSum = pureSum.add(xe[k].multiply(vk, MC), MC);
            pureScale += xe[k].doubleValue() * vk.doubleValue() * cond;
            BigDecimal[] v = new BigDecimal[n];
            for (int j = 0; j < n; j++) {
                v[j] = (j == k ? BigDecimal.ONE : BigDecimal.ZERO).subtract(xe[j], MC);
            }
            BigDecimal[] plus = new BigDecimal[n];
            BigDecimal[] minus = new BigDecimal[n];
            for (int j = 0; j < n; j++) {
                plus[j] = xe[j].add(H.multiply(v[j], MC), MC);
                minus[j] = xe[j].subtract(H.multiply(v[j], MC), MC);
            }
            BigDecimal slope = excess(c, plus, tK, null).subtract(excess(c, minus, tK, null), MC)
                    .divide(H.add(H), MC);
            BigDecimal partial = vk.add(ve, MC).add(slope, MC);
            double computed = CardFunctions.partialMolarVolume(card, k, x, t, Extrapolation.ALLOW);
            double bound = (steps + 2 * degree + 16) * U
                    * (vk.doubleValue() * cond + 4 * magnitudes[0] + 8 * magnitudes[1]) / c.volumeFactor;
            record("partial molar volume", computed, partial.divide(bd(c.volumeFactor), MC), bound, at + ", k " + k);
        }
        BigDecimal vm = pureSum.add(ve, MC);
        BigDecimal meanMass = BigDecimal.ZERO;
        for (int k = 0; k < n; k++) {
            meanMass = meanMass.add(xe[k].multiply(bd(c.mass[k]).multiply(bd(c.massFactor), MC), MC), MC);
        }
        BigDecimal rho = THOUSAND.multiply(meanMass, MC).divide(vm, MC).divide(bd(c.densityFactor), MC);
        double rhoComputed = CardFunctions.density(card, x, t, Extrapolation.ALLOW);
        double conditionVm = (pureScale + scale[0].doubleValue()) / vm.doubleValue();
        double bound = (steps + 2 * degree + 2 * n + 16) * U * (conditionVm + 1) * rho.doubleValue();
        record("density", rhoComputed, rho, bound, at);
    }

    // ------------------------------------------------------------------ cases

    /** A random card: n components, a model, orders and temperature terms, polynomial or constant densities. */
    static Case randomCase(Random r, int n, GeometricModel model) {
        Case c = new Case();
        c.n = n;
        c.model = model;
        c.asymmetric = model == GeometricModel.TOOP ? r.nextInt(n) : -1;
        c.celsius = r.nextBoolean();
        c.volumeFactor = r.nextInt(4) == 0 ? 1000 : 1;
        c.densityFactor = r.nextInt(4) == 0 ? 1000 : 1;
        c.massFactor = r.nextInt(5) == 0 ? 1000 : 1;
        double lowK = 260 + 60 * r.nextDouble();
        double highK = lowK + 5 + 60 * r.nextDouble();
        c.lowest = c.celsius ? lowK - 273.15 : lowK;
        c.highest = c.celsius ? highK - 273.15 : highK;
        c.mass = new double[n];
        c.densityPolynomial = new double[n][];
        c.densityConstant = new double[n];
        c.densityReference = new double[n];
        for (int k = 0; k < n; k++) {
            c.mass[k] = (10 + 200 * r.nextDouble()) / c.massFactor;
            double rho0 = 700 + 900 * r.nextDouble();
            if (r.nextBoolean()) {
                c.densityConstant[k] = rho0 / c.densityFactor;
            } else {
                int degree = 1 + r.nextInt(3);
                double half = (highK - lowK) / 2;
                c.densityReference[k] = (c.lowest + c.highest) / 2;
                c.densityPolynomial[k] = new double[degree + 1];
                c.densityPolynomial[k][0] = rho0 / c.densityFactor;
                for (int j = 1; j <= degree; j++) {
                    c.densityPolynomial[k][j] = (r.nextBoolean() ? 1 : -1) * 0.3 * r.nextDouble() * rho0
                            / degree / Math.pow(half, j) / c.densityFactor;
                }
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                Pair p = new Pair();
                boolean reversed = r.nextBoolean();
                p.first = reversed ? j : i;
                p.second = reversed ? i : j;
                p.reference = c.lowest + (c.highest - c.lowest) * r.nextDouble();
                int order = r.nextInt(6);
                p.a = new double[order + 1][];
                for (int k = 0; k <= order; k++) {
                    p.a[k] = new double[1 + (r.nextInt(3) == 0 ? 1 + r.nextInt(2) : 0)];
                    for (int q = 0; q < p.a[k].length; q++) {
                        p.a[k][q] = 6 * (2 * r.nextDouble() - 1) / (1 + k) / Math.pow(50, q) / c.volumeFactor;
                    }
                }
                c.pairs.add(p);
            }
        }
        if (n >= 3 && r.nextBoolean()) {
            Ternary t = new Ternary();
            List<Integer> all = new ArrayList<>();
            for (int k = 0; k < n; k++) {
                all.add(k);
            }
            java.util.Collections.shuffle(all, r);
            t.members = new int[] {all.get(0), all.get(1), all.get(2)};
            t.reference = (c.lowest + c.highest) / 2;
            t.c = new double[1 + r.nextInt(3)][];
            for (int m = 0; m < t.c.length; m++) {
                t.c[m] = new double[] {4 * (2 * r.nextDouble() - 1) / c.volumeFactor,
                    0.01 * (2 * r.nextDouble() - 1) / c.volumeFactor};
            }
            c.ternaries.add(t);
        }
        c.what = n + " components, " + model + (c.asymmetric >= 0 ? " (asymmetric " + c.asymmetric + ")" : "")
                + (c.celsius ? ", °C" : ", K") + (c.volumeFactor > 1 ? ", L/mol" : "")
                + (c.densityFactor > 1 ? ", g/cm³" : "") + (c.massFactor > 1 ? ", kg/mol" : "");
        return c;
    }

    /** Points: the corners exactly, 1e-15 from them, edge midpoints, and random inner points. */
    static List<double[]> points(Random r, int n, int inner) {
        List<double[]> out = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double[] corner = new double[n];
            corner[k] = 1.0;
            out.add(corner);
            double[] near = new double[n];
            near[k] = 1 - 1e-15;
            near[(k + 1) % n] = 1e-15;
            out.add(near);
        }
        double[] edge = new double[n];
        edge[0] = 0.5;
        edge[n - 1] = 0.5;
        out.add(edge);
        for (int i = 0; i < inner; i++) {
            double[] x = new double[n];
            double s = 0;
            for (int k = 0; k < n; k++) {
                x[k] = -Math.log(1 - r.nextDouble());
                s += x[k];
            }
            for (int k = 0; k < n; k++) {
                x[k] /= s; // sums to 1 within rounding; the core and the reference both normalise
            }
            out.add(x);
        }
        return out;
    }

    private static double temperatureIn(Case c, Random r) {
        int p = r.nextInt(4);
        return p == 0 ? c.lowest : p == 1 ? c.highest : c.lowest + (c.highest - c.lowest) * r.nextDouble();
    }

    @Test
    void randomCardsOfEveryModelAgreeWithTheReference() {
        Random r = new Random(20_261_202L);
        for (int i = 0; i < 60; i++) {
            int n = i % 3 == 0 ? 2 : 3 + r.nextInt(3);
            Case c = randomCase(r, n, GeometricModel.values()[i % 3]);
            Card card = c.card();
            for (double[] x : points(r, n, 3)) {
                compare(c, card, x, temperatureIn(c, r), c.what + ", card " + i);
            }
        }
    }

    @Test
    void nearDegenerateCardsAgreeWithTheReference() {
        Random r = new Random(7);
        List<Case> cases = new ArrayList<>();
        // near-equal molar masses (one ulp-scale apart) and equal densities: the mixture density barely varies
        Case equalMasses = randomCase(r, 2, GeometricModel.MUGGIANU);
        equalMasses.mass = new double[] {18.015, 18.015 + 1e-12};
        equalMasses.densityConstant = new double[] {997.0, 997.0 + 1e-10};
        equalMasses.densityPolynomial = new double[2][];
        equalMasses.what = "near-equal molar masses and densities";
        cases.add(equalMasses);
        // tiny coefficients: V^E of order 1e-12 cm³/mol next to molar volumes of order 100
        Case tiny = randomCase(r, 3, GeometricModel.KOHLER);
        for (Pair p : tiny.pairs) {
            for (double[] ak : p.a) {
                for (int q = 0; q < ak.length; q++) {
                    ak[q] *= 1e-12;
                }
            }
        }
        tiny.what = "tiny coefficients (1e-12), Kohler";
        cases.add(tiny);
        // huge coefficients against huge molar volumes (polymers: M ~ 1e5 g/mol)
        Case huge = randomCase(r, 3, GeometricModel.TOOP);
        for (int k = 0; k < 3; k++) {
            huge.mass[k] = 1e5 * (1 + k) / huge.massFactor;
        }
        for (Pair p : huge.pairs) {
            for (double[] ak : p.a) {
                for (int q = 0; q < ak.length; q++) {
                    ak[q] *= 1e3;
                }
            }
        }
        huge.what = "huge coefficients (×1e3) and molar masses (1e5), Toop";
        cases.add(huge);
        // A0..A20 with alternating signs: the series cancels, so V^E is small against its terms
        Case alternating = randomCase(r, 2, GeometricModel.MUGGIANU);
        Pair p0 = alternating.pairs.get(0);
        p0.a = new double[21][];
        for (int k = 0; k <= 20; k++) {
            p0.a[k] = new double[] {(k % 2 == 0 ? 1 : -1) * 10.0 / alternating.volumeFactor};
        }
        alternating.what = "A0..A20 of alternating sign";
        cases.add(alternating);
        // steep density polynomials: degree 6, each term near the bound that keeps the density positive
        Case steep = randomCase(r, 3, GeometricModel.MUGGIANU);
        double lowK = steep.celsius ? steep.lowest + 273.15 : steep.lowest;
        double highK = steep.celsius ? steep.highest + 273.15 : steep.highest;
        double half = (highK - lowK) / 2;
        for (int k = 0; k < 3; k++) {
            double rho0 = 800 + 100 * k;
            steep.densityReference[k] = (steep.lowest + steep.highest) / 2;
            steep.densityPolynomial[k] = new double[7];
            steep.densityPolynomial[k][0] = rho0 / steep.densityFactor;
            for (int j = 1; j <= 6; j++) {
                steep.densityPolynomial[k][j] = (j % 2 == 0 ? 1 : -1) * 0.999 * rho0 / 2 / 6 / Math.pow(half, j)
                        / steep.densityFactor;
            }
        }
        steep.what = "steep degree-6 density polynomials";
        cases.add(steep);
        for (Case c : cases) {
            Card card = c.card();
            for (double[] x : points(r, c.n, 6)) {
                for (double t : new double[] {c.lowest, c.highest, (c.lowest + c.highest) / 2}) {
                    compare(c, card, x, t, c.what);
                }
            }
        }
    }

    /**
     * At a pure component exactly, every pair has a zero factor x_i·x_j: V^E and that component's partial excess
     * volume are exactly 0, its partial molar volume is its pure molar volume, and 1e-15 away each moves by no more
     * than 1e-15 times its first-order rate (the other components' partials are their infinite-dilution values).
     */
    @Test
    void pureComponentsGiveThePureValuesAndNeighboursMoveByFirstOrder() {
        Random r = new Random(11);
        for (int i = 0; i < 60; i++) {
            int n = 2 + r.nextInt(4);
            Case c = randomCase(r, n, GeometricModel.values()[i % 3]);
            Card card = c.card();
            double t = temperatureIn(c, r);
            double rates = coefficientMagnitudes(c, kelvin(c, t))[0] + coefficientMagnitudes(c, kelvin(c, t))[1];
            for (int k = 0; k < n; k++) {
                double[] corner = new double[n];
                corner[k] = 1.0;
                assertEquals(0.0, CardFunctions.excessMolarVolume(card, corner, t, Extrapolation.ALLOW), 0.0);
                assertEquals(0.0, CardFunctions.partialExcessMolarVolume(card, k, corner, t, Extrapolation.ALLOW),
                        0.0);
                double pure = card.mixture().pureMolarVolume(k, card.units().temperature().toKelvin(t))
                        / c.volumeFactor;
                assertEquals(pure, CardFunctions.partialMolarVolume(card, k, corner, t, Extrapolation.ALLOW), 0.0);
                double[] near = corner.clone();
                near[k] = 1 - 1e-15;
                near[(k + 1) % n] = 1e-15;
                double moved = CardFunctions.excessMolarVolume(card, near, t, Extrapolation.ALLOW);
                assertTrue(Math.abs(moved) <= 2e-15 * rates / c.volumeFactor, c.what + ": V^E 1e-15 away " + moved);
                for (int j = 0; j < n; j++) {
                    double atCorner = CardFunctions.partialMolarVolume(card, j, corner, t, Extrapolation.ALLOW);
                    double nearby = CardFunctions.partialMolarVolume(card, j, near, t, Extrapolation.ALLOW);
                    assertTrue(Double.isFinite(atCorner));
                    assertTrue(Math.abs(nearby - atCorner) <= 1e-13 * (rates + Math.abs(atCorner)),
                            c.what + ": partial " + j + " moved from " + atCorner + " to " + nearby);
                }
            }
        }
    }

    @AfterAll
    static void report() throws IOException {
        StringBuilder b = new StringBuilder(
                "quantity\tpoints\tworst relative error\tworst error / bound\tworst relative error at\n");
        WORST.forEach((q, w) -> b.append(String.format(Locale.ROOT, "%s\t%d\t%.3g\t%.3g\t%s%n", q, w[2], w[0], w[1],
                w[3])));
        Path out = Paths.get("target", "fuzz", "high-precision.txt");
        Files.createDirectories(out.getParent());
        Files.write(out, b.toString().getBytes(StandardCharsets.UTF_8));
    }
}
