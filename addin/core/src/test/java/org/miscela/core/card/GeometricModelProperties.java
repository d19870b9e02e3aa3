package org.miscela.core.card;

import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.TernaryTerm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.junit.jupiter.api.Test;

/**
 * The multicomponent models term by term against their textbook form, over the random cards of
 * {@link MixtureProperties}: each pair's contribution is the binary B_ij evaluated at the model's binary composition
 * X and weighted (Kohler 1960: (x_i + x_j)²·B_ij(X = x_i/(x_i + x_j)); Muggianu et al. 1975: x_i·x_j/(X(1 − X))·B_ij(X)
 * with X = (1 + x_i − x_j)/2; Toop 1965, asymmetric component a: x_j/(1 − x_a)·B_aj(X = x_a), other pairs as Kohler;
 * the forms as recalled from the papers, from memory), where B_ij(X) is evaluated by {@link RedlichKister#value}, not by
 * the multicomponent code; the pair argument d is 2X − 1; the ternary term is x_a·x_b·x_c·(C0 + C1·x_a + C2·x_b)
 * (the Cibulka form, as {@link TernaryTerm} documents); B^E is the sum of the terms.
 */
class GeometricModelProperties {
    static final double T = MixtureProperties.T;
    private static final double U = Math.ulp(1.0) / 2;

    /** The binary composition X of pair p (first component's share) under the function's model. */
    static double binaryComposition(ExcessFunction f, int p, double[] x) {
        int i = f.pairFirst(p);
        int j = f.pairSecond(p);
        if (f.model() == GeometricModel.MUGGIANU) {
            return (1 + x[i] - x[j]) / 2;
        }
        if (f.model() == GeometricModel.TOOP && (i == f.asymmetricComponent() || j == f.asymmetricComponent())) {
            return x[f.asymmetricComponent()];
        }
        double s = x[i] + x[j];
        return s > 0 ? x[i] / s : 0.5;
    }

    /** The weight of pair p's binary value under the function's model (0 where the pair is absent). */
    static double weight(ExcessFunction f, int p, double[] x) {
        int i = f.pairFirst(p);
        int j = f.pairSecond(p);
        double big = binaryComposition(f, p, x);
        if (f.model() == GeometricModel.MUGGIANU) {
            double xx = big * (1 - big);
            return xx > 0 ? x[i] * x[j] / xx : 0;
        }
        if (f.model() == GeometricModel.TOOP && (i == f.asymmetricComponent() || j == f.asymmetricComponent())) {
            int other = i == f.asymmetricComponent() ? j : i;
            double rest = 1 - x[f.asymmetricComponent()];
            return rest > 0 ? x[other] / rest : 0;
        }
        return (x[i] + x[j]) * (x[i] + x[j]);
    }

    /** Σ_k |A_k(T)|: bounds every term of one pair's series at |d| ≤ 1. */
    private static double size(RedlichKister rk) {
        double s = 0;
        for (int k = 0; k <= rk.order(); k++) {
            s += Math.abs(rk.coefficientAt(k, T));
        }
        return s;
    }

    /**
     * The pair argument and contribution against the textbook form. Both sides are Horner sums of at most 6 terms
     * bounded by Σ|A_k| and a few products; the textbook side also divides by X(1 − X) or 1 − x_a and multiplies
     * back, which can lose up to u/min(X, 1 − X) relatively: 64·u·Σ|A_k|/min(1, X, 1 − X) covers both.
     */
    @Property(tries = 2000)
    void everyPairTermIsTheWeightedBinary(@ForAll("cases") MixtureProperties.Case c) {
        ExcessFunction f = c.f;
        for (int p = 0; p < f.pairCount(); p++) {
            double big = binaryComposition(f, p, c.x);
            int i = f.pairFirst(p);
            int j = f.pairSecond(p);
            String where = "pair " + i + "-" + j + ", X " + big + ", " + c;
            if (c.x[i] + c.x[j] > 0 || f.model() != GeometricModel.KOHLER) {
                assertEquals(2 * big - 1, f.pairCoordinate(p, c.x), 4 * U, where);
            } else {
                assertEquals(0.0, f.pairCoordinate(p, c.x), 0.0, "Kohler's d where neither is present, " + c);
            }
            RedlichKister binary = f.pair(i, j);
            double expected = weight(f, p, c.x) * binary.value(big, T);
            double bound = 64 * U * size(binary) / Math.max(1e-300, Math.min(1, Math.min(big, 1 - big)));
            assertEquals(expected, f.pairContribution(p, c.x, T), bound, where);
        }
    }

    /** B^E is the sum of its pair and ternary terms, each ternary term the Cibulka form. */
    @Property(tries = 2000)
    void theExcessIsTheSumOfItsTerms(@ForAll("cases") MixtureProperties.Case c) {
        ExcessFunction f = c.f;
        double sum = 0;
        double size = 0;
        for (int p = 0; p < f.pairCount(); p++) {
            sum += f.pairContribution(p, c.x, T);
            size += size(f.pairExpansion(p));
        }
        List<TernaryTerm> ternary = f.ternaryTerms();
        for (int t = 0; t < ternary.size(); t++) {
            TernaryTerm term = ternary.get(t);
            double xa = c.x[term.first()];
            double xb = c.x[term.second()];
            double xc = c.x[term.third()];
            double c0 = term.coefficientAt(0, T, false);
            double c1 = term.coefficientAt(1, T, false);
            double c2 = term.coefficientAt(2, T, false);
            double expected = xa * xb * xc * (c0 + c1 * xa + c2 * xb);
            double termSize = Math.abs(c0) + Math.abs(c1) + Math.abs(c2);
            assertEquals(expected, f.ternaryContribution(t, c.x, T), 8 * U * termSize, "ternary " + t + ", " + c);
            sum += f.ternaryContribution(t, c.x, T);
            size += termSize;
        }
        assertEquals(sum, f.value(c.x, T), 64 * U * size, c.toString());
    }

    /** The gradient and Hessian arrays are overwritten, whatever they held. */
    @Property(tries = 500)
    void evaluationOverwritesItsArrays(@ForAll("cases") MixtureProperties.Case c) {
        int n = c.x.length;
        double[] g = new double[n];
        double[][] h = new double[n][n];
        double b = c.f.evaluate(c.x, T, false, g, h);
        double[] g2 = new double[n];
        double[][] h2 = new double[n][n];
        Arrays.fill(g2, 1e6);
        for (double[] row : h2) {
            Arrays.fill(row, -1e6);
        }
        assertEquals(b, c.f.evaluate(c.x, T, false, g2, h2), 0.0);
        assertEquals(Arrays.toString(g), Arrays.toString(g2), c.toString());
        assertEquals(Arrays.deepToString(h), Arrays.deepToString(h2), c.toString());
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<MixtureProperties.Case> cases() {
        return net.jqwik.api.Arbitraries.longs().map(MixtureProperties::randomCase);
    }

    /** Toop's model, and only it, names an asymmetric component (component 0 included). */
    @Test
    void onlyToopNamesAnAsymmetricComponent() {
        RedlichKister[][] pairs = new RedlichKister[3][3];
        pairs[0][1] = new RedlichKister(298.15, new double[][] {{-4.0}});
        List<TernaryTerm> none = Collections.emptyList();
        assertEquals(0, new ExcessFunction(3, GeometricModel.TOOP, 0, pairs, none).asymmetricComponent());
        assertThrows(IllegalArgumentException.class, () -> new ExcessFunction(3, GeometricModel.TOOP, -1, pairs, none));
        assertThrows(IllegalArgumentException.class, () -> new ExcessFunction(3, GeometricModel.KOHLER, 0, pairs, none));
        assertThrows(IllegalArgumentException.class,
                () -> new ExcessFunction(3, GeometricModel.MUGGIANU, 2, pairs, none));
    }
}
