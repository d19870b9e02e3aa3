package org.miscela.core.card;

import java.util.function.ToDoubleFunction;

/**
 * Partial molar quantities from values of a molar property alone, for checking the library's analytic partials
 * against something they cannot agree with by construction.
 *
 * <p>For a molar property B(x), the extensive total of a mixture of mole numbers n is G(n) = N·B(n/N) with
 * N = Σ n_j, and the partial molar quantity of component k is B̄_k = ∂G/∂n_k at fixed n_j (j ≠ k). Here it is taken
 * at n = x (N = 1) by the five-point central difference R(h) = [G(−2h) − 8G(−h) + 8G(h) − G(2h)]/(12h) in n_k, where
 * G(t) evaluates B — never a partial — at the composition (x + t·e_k)/(1 + t).
 *
 * <p><b>Error bound.</b> Let δ bound the absolute rounding error of one evaluation of B near x (the caller's
 * rounding analysis: a constant times the unit roundoff u = 2⁻⁵³ times the sum of the absolute values of the terms B
 * adds up). Multiplying by N ≤ 1 + 2h and forming x/N adds a few roundings of the same terms, so each G carries at
 * most 1.01·δ + u·|G|. The weights of R(h) have absolute sum 18/12, and forming the weighted sum rounds at most
 * 3u·Σ|w·G|, so rounding moves R(h) by at most ρ(h) = [1.5·(1.01·δ) + 1.5·u·max|G| + 4.5·u·max|G|]/h. The truncation
 * error of R(h) is −h⁴·G⁽⁵⁾/30, so R(2h) errs 16 times as much and |R(h) − exact| ≤ (|R(2h) − R(h)| + ρ(h) +
 * ρ(2h))/15 to leading order; twice that covers the next order. The bound returned is ρ(h) plus twice the
 * truncation estimate. The step balances the two: ρ grows as 1/h and truncation as h⁴, and with δ ≈ 10⁻¹⁴ × the
 * scale of B and fifth derivatives up to about 10⁴ × that scale (a seventh-degree polynomial in the mole fractions)
 * the sum is smallest near h = (45·δ/(4·|G⁽⁵⁾|))^(1/5) ≈ 10⁻³, so callers use h = 2⁻¹⁰ times the smallest non-zero
 * mole fraction (a Kohler pair's coordinate has derivatives that grow as that fraction shrinks; a step well below it
 * keeps the estimate in its asymptotic range and every pair sum x_i + x_j of a present component positive).
 */
final class PartialsFromValues {
    /** The unit roundoff of double precision, 2⁻⁵³. */
    static final double U = Math.ulp(1.0) / 2;

    private PartialsFromValues() {
    }

    /** A central-difference estimate and a bound on its error. */
    static final class Estimate {
        final double value;
        final double bound;

        Estimate(double value, double bound) {
            this.value = value;
            this.bound = bound;
        }
    }

    /** The step for a composition: 2⁻¹⁰ times the smallest mole fraction present (at most 2⁻¹⁰). */
    static double step(double[] x) {
        double smallest = 1.0;
        for (double v : x) {
            if (v > 0) {
                smallest = Math.min(smallest, v);
            }
        }
        return 0x1p-10 * smallest;
    }

    /** ∂(N·B(n/N))/∂n_k at n = x by R(h), with the error bound of the class comment for rounding bound δ of B. */
    static Estimate partial(ToDoubleFunction<double[]> molar, double[] x, int k, double h, double delta) {
        double[] g = new double[9]; // G at t = (i − 4)·h, i = 0..8
        double largest = 0;
        for (int i = 0; i < 9; i++) {
            if (i == 4) {
                continue;
            }
            g[i] = total(molar, x, k, (i - 4) * h);
            largest = Math.max(largest, Math.abs(g[i]));
        }
        double r1 = (g[2] - 8 * g[3] + 8 * g[5] - g[6]) / (12 * h);
        double r2 = (g[0] - 8 * g[2] + 8 * g[6] - g[8]) / (24 * h);
        double rounding = (1.5 * 1.01 * delta + 6 * U * largest) / h;
        double truncation = (Math.abs(r2 - r1) + rounding + rounding / 2) / 15;
        return new Estimate(r1, rounding + 2 * truncation);
    }

    /** G = N·B(n/N) at n = x + t·e_k (N = Σ x_j + t, which is 1 + t up to rounding). */
    private static double total(ToDoubleFunction<double[]> molar, double[] x, int k, double t) {
        double total = t;
        for (double v : x) {
            total += v;
        }
        double[] y = new double[x.length];
        for (int j = 0; j < x.length; j++) {
            y[j] = (j == k ? x[j] + t : x[j]) / total;
        }
        return total * molar.applyAsDouble(y);
    }
}
