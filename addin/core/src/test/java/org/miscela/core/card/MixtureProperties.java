package org.miscela.core.card;

import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.TernaryTerm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/**
 * Textbook identities of partial molar quantities over random cards of 2 to 6 components, every geometric model
 * and random ternary terms: summability Σ x_k B̄_k = B, Gibbs–Duhem Σ x_k dB̄_k = 0, agreement of the analytic
 * derivatives with finite differences, reduction of every model to the binary Redlich–Kister expansion, invariance
 * under renumbering the components, and zero excess at every pure-component corner.
 *
 * <p>Every case is built from one random seed so a failure can be replayed; the generated cards are invented.
 */
class MixtureProperties {
    static final double T = 300.0;
    /** Worst relative residual seen per identity, printed after the run for the record. */
    private static final java.util.Map<String, double[]> WORST = new java.util.concurrent.ConcurrentSkipListMap<>();

    private static void record(String identity, double residual, double scale) {
        double rel = scale > 0 ? Math.abs(residual) / scale : Math.abs(residual);
        WORST.compute(identity, (k, v) -> v == null ? new double[] {rel, 1} : new double[] {Math.max(v[0], rel),
            v[1] + 1});
    }

    @net.jqwik.api.lifecycle.AfterContainer
    static void report() throws java.io.IOException {
        StringBuilder b = new StringBuilder("identity\tcases\tworst relative residual\n");
        WORST.forEach((k, v) -> b.append(String.format(java.util.Locale.ROOT, "%s\t%.0f\t%.3g%n", k, v[1], v[0])));
        System.out.print(b);
        java.nio.file.Path out = java.nio.file.Paths.get("target", "mixture-property-residuals.txt");
        java.nio.file.Files.createDirectories(out.getParent());
        java.nio.file.Files.write(out, b.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    /** A random mixture: its excess function, the pure molar volumes and a composition. */
    static final class Case {
        final ExcessFunction f;
        final double[] x;
        final long seed;

        Case(ExcessFunction f, double[] x, long seed) {
            this.f = f;
            this.x = x;
            this.seed = seed;
        }

        @Override
        public String toString() {
            return "seed " + seed + ", model " + f.model() + ", n " + f.componentCount() + ", x "
                    + java.util.Arrays.toString(x);
        }
    }

    @Provide
    Arbitrary<Case> cases() {
        return Arbitraries.longs().map(MixtureProperties::randomCase);
    }

    static Case randomCase(long seed) {
        Random r = new Random(seed);
        int n = 2 + r.nextInt(5);
        return new Case(randomFunction(r, n), randomComposition(r, n), seed);
    }

    /** Random pairs (order 0..5, linear in T, sometimes ideal), a random model and 0..2 ternary terms. */
    static ExcessFunction randomFunction(Random r, int n) {
        GeometricModel model = GeometricModel.values()[r.nextInt(3)];
        int asymmetric = model == GeometricModel.TOOP ? r.nextInt(n) : -1;
        RedlichKister[][] pairs = new RedlichKister[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (r.nextInt(6) == 0) {
                    continue; // an ideal pair
                }
                int order = r.nextInt(6);
                double[][] a = new double[order + 1][2];
                for (int k = 0; k <= order; k++) {
                    a[k][0] = 8 * (2 * r.nextDouble() - 1);
                    a[k][1] = 0.02 * (2 * r.nextDouble() - 1);
                }
                pairs[i][j] = new RedlichKister(298.15, a);
            }
        }
        List<TernaryTerm> ternary = new ArrayList<>();
        if (n >= 3) {
            for (int t = r.nextInt(3); t > 0; t--) {
                int[] p = distinct(r, n, 3);
                double[][] c = new double[1 + r.nextInt(3)][];
                for (int m = 0; m < c.length; m++) {
                    c[m] = new double[] {5 * (2 * r.nextDouble() - 1), 0.01 * (2 * r.nextDouble() - 1)};
                }
                ternary.add(new TernaryTerm(p[0], p[1], p[2], 310.0, c));
            }
        }
        return new ExcessFunction(n, model, asymmetric, pairs, ternary);
    }

    /** A point of the simplex; a third of the time some components are absent (infinite dilution). */
    static double[] randomComposition(Random r, int n) {
        double[] x = new double[n];
        double sum = 0;
        boolean sparse = r.nextInt(3) == 0;
        for (int k = 0; k < n; k++) {
            x[k] = sparse && r.nextBoolean() ? 0.0 : -Math.log(1 - r.nextDouble());
            sum += x[k];
        }
        if (sum == 0) {
            x[r.nextInt(n)] = 1;
            sum = 1;
        }
        for (int k = 0; k < n; k++) {
            x[k] /= sum;
        }
        return x;
    }

    private static int[] distinct(Random r, int n, int count) {
        List<Integer> all = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            all.add(k);
        }
        Collections.shuffle(all, r);
        int[] out = new int[count];
        for (int i = 0; i < count; i++) {
            out[i] = all.get(i);
        }
        return out;
    }

    @Property(tries = 3000)
    void summability(@ForAll("cases") Case c) {
        double[] partial = new double[c.x.length];
        double b = c.f.partials(c.x, T, false, partial);
        double sum = 0;
        double scale = Math.abs(b);
        for (int k = 0; k < c.x.length; k++) {
            sum += c.x[k] * partial[k];
            scale += Math.abs(c.x[k] * partial[k]);
        }
        record("summability", b - sum, scale);
        assertEquals(b, sum, 1e-12 * Math.max(scale, 1e-300) + 1e-300, c.toString());
    }

    /** Σ x_k dB̄_k = 0 along a random direction that stays in the simplex (Σ v = 0). */
    @Property(tries = 3000)
    void gibbsDuhem(@ForAll("cases") Case c) {
        Random r = new Random(c.seed + 1);
        int n = c.x.length;
        double[] v = tangent(r, n);
        double[] slope = new double[n];
        c.f.partialSlopes(c.x, T, v, slope);
        // The sum cancels terms x_k·(H·v)_k (H the Hessian), so their size is the scale of its rounding error.
        double[][] hessian = new double[n][n];
        c.f.evaluate(c.x, T, false, null, hessian);
        double sum = 0;
        double scale = 0;
        for (int k = 0; k < n; k++) {
            sum += c.x[k] * slope[k];
            double hv = 0;
            for (int j = 0; j < n; j++) {
                hv += hessian[k][j] * v[j];
            }
            scale += Math.abs(c.x[k] * slope[k]) + Math.abs(c.x[k] * hv);
        }
        record("Gibbs-Duhem", sum, scale);
        assertEquals(0.0, sum, 1e-12 * scale + 1e-300, c.toString());
    }

    /** The analytic gradient and Hessian along the simplex against central differences of B and of B̄_k. */
    @Property(tries = 2000)
    void derivativesMatchFiniteDifferences(@ForAll("cases") Case c) {
        int n = c.x.length;
        double[] x = interior(c.x);
        double[] v = tangent(new Random(c.seed + 2), n);
        double h = 1e-6;
        double[] plus = step(x, v, h);
        double[] minus = step(x, v, -h);
        double[] g = new double[n];
        c.f.evaluate(x, T, false, g, null);
        double analytic = 0;
        for (int k = 0; k < n; k++) {
            analytic += g[k] * v[k];
        }
        double fd = (c.f.value(plus, T) - c.f.value(minus, T)) / (2 * h);
        record("gradient vs finite difference", fd - analytic, 1 + Math.abs(analytic));
        assertEquals(fd, analytic, 1e-6 * (1 + Math.abs(analytic)), c.toString());

        double[] slope = new double[n];
        c.f.partialSlopes(x, T, v, slope);
        double[] pPlus = new double[n];
        double[] pMinus = new double[n];
        c.f.partials(plus, T, false, pPlus);
        c.f.partials(minus, T, false, pMinus);
        for (int k = 0; k < n; k++) {
            double d = (pPlus[k] - pMinus[k]) / (2 * h);
            record("partial slopes vs finite difference", d - slope[k], 1 + Math.abs(slope[k]));
            assertEquals(d, slope[k], 1e-5 * (1 + Math.abs(slope[k])), "component " + k + ", " + c);
        }
    }

    /** dB^E/dT analytic against a central difference in temperature. */
    @Property(tries = 1000)
    void temperatureSlopeMatchesFiniteDifference(@ForAll("cases") Case c) {
        double h = 1e-3;
        double fd = (c.f.value(c.x, T + h) - c.f.value(c.x, T - h)) / (2 * h);
        double analytic = c.f.evaluate(c.x, T, true, null, null);
        record("dB/dT vs finite difference", fd - analytic, 1 + Math.abs(analytic));
        assertEquals(fd, analytic, 1e-7 * (1 + Math.abs(analytic)), c.toString());
    }

    /**
     * With only components i and j present, every model gives the binary expansion B = x_i·x_j·Σ A_k (x_i − x_j)^k,
     * and the partials of i and j equal the binary tangent-intercept values.
     */
    @Property(tries = 2000)
    void everyModelReducesToTheBinary(@ForAll("cases") Case c, @ForAll @DoubleRange(min = 0, max = 1) double xi) {
        int n = c.x.length;
        Random r = new Random(c.seed + 3);
        int[] p = distinct(r, n, 2);
        double[] x = new double[n];
        x[p[0]] = xi;
        x[p[1]] = 1 - xi;
        RedlichKister rk = c.f.pair(p[0], p[1]);
        double[] e = new double[3];
        if (rk != null) {
            rk.evaluate(xi, T, e);
        }
        double[] partial = new double[n];
        double b = c.f.partials(x, T, false, partial);
        double scale = 1 + Math.abs(e[0]) + Math.abs(e[1]);
        record("binary limit", e[0] - b, scale);
        record("binary limit, partials", Math.max(Math.abs(e[0] + (1 - xi) * e[1] - partial[p[0]]),
                Math.abs(e[0] - xi * e[1] - partial[p[1]])), scale);
        assertEquals(e[0], b, 1e-12 * scale, c.toString());
        assertEquals(e[0] + (1 - xi) * e[1], partial[p[0]], 1e-11 * scale, c.toString());
        assertEquals(e[0] - xi * e[1], partial[p[1]], 1e-11 * scale, c.toString());
    }

    /** Renumbering the components (pairs, ternary terms and the asymmetric component with them) changes nothing. */
    @Property(tries = 2000)
    void renumberingComponentsChangesNothing(@ForAll("cases") Case c) {
        int n = c.x.length;
        int[] perm = distinct(new Random(c.seed + 4), n, n); // new index of old component k is perm[k]
        ExcessFunction g = renumbered(c.f, perm);
        double[] y = new double[n];
        for (int k = 0; k < n; k++) {
            y[perm[k]] = c.x[k];
        }
        double[] p1 = new double[n];
        double[] p2 = new double[n];
        double b1 = c.f.partials(c.x, T, false, p1);
        double b2 = g.partials(y, T, false, p2);
        double scale = 1 + Math.abs(b1);
        for (double v : p1) {
            scale += Math.abs(v);
        }
        record("renumbering", b1 - b2, scale);
        assertEquals(b1, b2, 1e-12 * scale, c.toString());
        for (int k = 0; k < n; k++) {
            record("renumbering, partials", p1[k] - p2[perm[k]], scale);
            assertEquals(p1[k], p2[perm[k]], 1e-11 * scale, "component " + k + ", " + c);
        }
    }

    @Property(tries = 500)
    void noExcessAtAnyPureComponent(@ForAll("cases") Case c, @ForAll @IntRange(min = 0, max = 5) int corner) {
        int n = c.x.length;
        double[] x = new double[n];
        x[corner % n] = 1.0;
        double[] partial = new double[n];
        assertEquals(0.0, c.f.partials(x, T, false, partial), 0.0, c.toString());
        assertEquals(0.0, partial[corner % n], 1e-12, "a pure component's own partial excess is zero; " + c);
        for (double v : partial) {
            assertTrue(Double.isFinite(v), "partials at infinite dilution are finite; " + c);
        }
    }

    static ExcessFunction renumbered(ExcessFunction f, int[] perm) {
        int n = f.componentCount();
        RedlichKister[][] pairs = new RedlichKister[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                RedlichKister rk = f.pair(i, j);
                if (rk == null) {
                    continue;
                }
                int a = perm[i];
                int b = perm[j];
                if (a < b) {
                    pairs[a][b] = rk;
                } else {
                    pairs[b][a] = rk.swapped();
                }
            }
        }
        List<TernaryTerm> ternary = new ArrayList<>();
        for (TernaryTerm t : f.ternaryTerms()) {
            double[][] c = new double[t.coefficientCount()][];
            for (int m = 0; m < c.length; m++) {
                // Recover the polynomial from values at two temperatures (the generator uses linear terms).
                double c0 = t.coefficientAt(m, 310.0, false);
                double c1 = t.coefficientAt(m, 310.0, true);
                c[m] = new double[] {c0, c1};
            }
            ternary.add(new TernaryTerm(perm[t.first()], perm[t.second()], perm[t.third()], 310.0, c));
        }
        int asym = f.asymmetricComponent() >= 0 ? perm[f.asymmetricComponent()] : -1;
        return new ExcessFunction(n, f.model(), asym, pairs, ternary);
    }

    private static double[] tangent(Random r, int n) {
        double[] v = new double[n];
        double mean = 0;
        for (int k = 0; k < n; k++) {
            v[k] = 2 * r.nextDouble() - 1;
            mean += v[k] / n;
        }
        for (int k = 0; k < n; k++) {
            v[k] -= mean;
        }
        return v;
    }

    /** Moves a composition off the faces so a two-sided difference stays inside the simplex. */
    private static double[] interior(double[] x) {
        int n = x.length;
        double[] y = new double[n];
        for (int k = 0; k < n; k++) {
            y[k] = 0.9 * x[k] + 0.1 / n;
        }
        return y;
    }

    private static double[] step(double[] x, double[] v, double h) {
        double[] y = x.clone();
        for (int k = 0; k < y.length; k++) {
            y[k] += h * v[k];
        }
        return y;
    }
}
