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
 * and random ternary terms, each checked against values the library computes another way: the partials against
 * differences of the extensive total in the mole numbers, Gibbs–Duhem from partials at neighbouring compositions,
 * summability of partials obtained from differences, the analytic derivatives against finite differences, the
 * reduction of every model to the binary Redlich–Kister expansion, invariance under renumbering the components, and
 * zero excess at every pure-component corner. (Summability Σ x_k B̄_k = B and Σ x_k dB̄_k = 0 evaluated with the
 * library's own B̄_k = B + ∂B/∂x_k − Σ x_j ∂B/∂x_j hold by construction whatever the gradient, so they are not
 * checked that way.)
 *
 * <p>Every case is built from one random seed so a failure can be replayed; the generated cards are invented.
 */
class MixtureProperties {
    static final double T = 300.0;
    /** Worst relative residual seen per identity, written after the run for the record. */
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

    /**
     * The rounding scale of B^E and of its partials: Σ over pairs of Σ_k (k+1)·|A_k(T)| plus Σ over ternary terms of
     * Σ_m |C_m(T)|. With mole fractions in [0, 1] (and |d| ≤ 1) every term the evaluation adds is at most this sum,
     * and every gradient component at most three times it.
     */
    static double coefficientScale(ExcessFunction f, double kelvin) {
        double a = 0;
        for (int p = 0; p < f.pairCount(); p++) {
            RedlichKister rk = f.pairExpansion(p);
            for (int k = 0; k <= rk.order(); k++) {
                a += (k + 1) * Math.abs(rk.coefficientAt(k, kelvin));
            }
        }
        for (TernaryTerm t : f.ternaryTerms()) {
            for (int m = 0; m < 3; m++) {
                a += Math.abs(t.coefficientAt(m, kelvin, false));
            }
        }
        return a;
    }

    /**
     * Bound on the rounding error of one evaluation of B^E: 64·u·A (A the {@link #coefficientScale}). A value is a
     * sum over at most 15 pairs and 2 ternary terms, each a Horner chain of at most 5 steps in d, the pair
     * coordinate (at most 3 operations), the product with x_i·x_j, and the composition's own rounding (relative u in
     * each x, moving a term by at most (k + 2)·u of its size): fewer than 50 roundings of terms bounded by A.
     */
    static double valueRounding(ExcessFunction f, double kelvin) {
        return 64 * PartialsFromValues.U * coefficientScale(f, kelvin);
    }

    /**
     * Bound on the rounding error of one library partial B̄_k = B + g_k − Σ_j x_j g_j: the three parts are bounded
     * by A, 3A and 3A and each comes from chains of at most 64 roundings, so 7 × 64 &lt; 640 roundings of A.
     */
    static double partialRounding(ExcessFunction f, double kelvin) {
        return 640 * PartialsFromValues.U * coefficientScale(f, kelvin);
    }

    /**
     * Each partial molar excess quantity against the derivative of the extensive excess N·B^E(n/N) in the mole
     * number n_k at fixed other n_j, taken from values of B^E alone ({@link PartialsFromValues}: five-point central
     * difference, step 2⁻¹⁰ × the smallest mole fraction present, the bound from the rounding analysis there plus the
     * library's own rounding). At an absent component the difference runs through small negative amounts of it;
     * the models are smooth there, since every pair sum with a present component stays positive.
     */
    @Property(tries = 2000)
    void partialsAreDerivativesOfTheExtensiveTotal(@ForAll("cases") Case c) {
        int n = c.x.length;
        double[] partial = new double[n];
        c.f.partials(c.x, T, false, partial);
        double h = PartialsFromValues.step(c.x);
        double delta = valueRounding(c.f, T);
        double scale = coefficientScale(c.f, T);
        for (int k = 0; k < n; k++) {
            PartialsFromValues.Estimate d = PartialsFromValues.partial(y -> c.f.value(y, T), c.x, k, h, delta);
            double bound = d.bound + partialRounding(c.f, T);
            record("partial vs difference of the extensive total (error / bound)", partial[k] - d.value, bound);
            record("partial vs difference of the extensive total (error / A)", partial[k] - d.value, scale);
            assertEquals(d.value, partial[k], bound, "component " + k + ", step " + h + ", bound " + bound + ", " + c);
        }
    }

    /**
     * Gibbs–Duhem from values: Σ_k x_k [B̄_k(x + δv) − B̄_k(x − δv)] = 0 to third order in δ, with the library's
     * partials evaluated at two neighbouring compositions. v is random with Σ v = 0 and zero on absent components
     * (off a face of the simplex Kohler's pair terms have no second derivative), δ = 2⁻²⁶ × the smallest mole
     * fraction present. Bound: each partial is off by at most the partial rounding ε_P, so the sum by 2·ε_P
     * (Σ x_k = 1), plus n·u·Σ|x_k·difference| for the sum itself. The leading truncation term is
     * (δ³/3)·Σ x_k B̄_k‴(v); allowing third derivatives of B̄_k up to 10⁶·A/x_min² (far above what a seventh-degree
     * polynomial in x reaches) it stays below 10⁻¹⁸·A, a thousandth of the rounding term, so a derivative bound
     * wrong by a factor of a thousand would still not matter. A wrong gradient leaves a residual of order δ·|dB|.
     */
    @Property(tries = 3000)
    void gibbsDuhemFromNeighbouringCompositions(@ForAll("cases") Case c) {
        int n = c.x.length;
        Random r = new Random(c.seed + 1);
        double[] v = new double[n];
        double mean = 0;
        int present = 0;
        double smallest = 1;
        for (int k = 0; k < n; k++) {
            if (c.x[k] > 0) {
                v[k] = 2 * r.nextDouble() - 1;
                mean += v[k];
                present++;
                smallest = Math.min(smallest, c.x[k]);
            }
        }
        for (int k = 0; k < n; k++) {
            if (c.x[k] > 0) {
                v[k] -= mean / present;
            }
        }
        double delta = 0x1p-26 * smallest;
        double[] plus = new double[n];
        double[] minus = new double[n];
        c.f.partials(step(c.x, v, delta), T, false, plus);
        c.f.partials(step(c.x, v, -delta), T, false, minus);
        double sum = 0;
        double size = 0;
        for (int k = 0; k < n; k++) {
            sum += c.x[k] * (plus[k] - minus[k]);
            size += Math.abs(c.x[k] * (plus[k] - minus[k]));
        }
        double scale = coefficientScale(c.f, T);
        double bound = 2 * partialRounding(c.f, T) + n * PartialsFromValues.U * size
                + Math.pow(delta, 3) / 3 * 1e6 * scale / (smallest * smallest);
        record("Gibbs-Duhem from values (residual / bound)", sum, bound);
        record("Gibbs-Duhem from values (residual / sum of |terms|)", sum, size);
        assertEquals(0.0, sum, bound, "delta " + delta + ", v " + java.util.Arrays.toString(v) + ", bound " + bound
                + ", " + c);
    }

    /**
     * Summability with partials that owe nothing to the library's formula: Σ x_k ∂G/∂n_k from the differences of
     * {@link #partialsAreDerivativesOfTheExtensiveTotal} equals B^E(x). Euler's theorem makes this hold for any B,
     * so it checks the reference partials themselves; with the comparison there it gives summability of the
     * library's partials without assuming it.
     */
    @Property(tries = 1000)
    void summabilityOfPartialsFromDifferences(@ForAll("cases") Case c) {
        int n = c.x.length;
        double h = PartialsFromValues.step(c.x);
        double delta = valueRounding(c.f, T);
        double sum = 0;
        double bound = delta;
        for (int k = 0; k < n; k++) {
            PartialsFromValues.Estimate d = PartialsFromValues.partial(y -> c.f.value(y, T), c.x, k, h, delta);
            sum += c.x[k] * d.value;
            bound += c.x[k] * d.bound + n * PartialsFromValues.U * Math.abs(c.x[k] * d.value);
        }
        double b = c.f.value(c.x, T);
        record("summability of partials from differences (error / bound)", sum - b, bound);
        assertEquals(b, sum, bound, "bound " + bound + ", " + c);
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
