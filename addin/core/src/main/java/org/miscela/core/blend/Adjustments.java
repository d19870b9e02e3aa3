package org.miscela.core.blend;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import java.util.Arrays;
import java.util.Comparator;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * Adjusting an existing batch towards a target composition by additions only (nothing can be taken out).
 *
 * <p><b>Exact target.</b> With n the batch's moles and x* the target's mole fractions, the batch reaches x* with
 * the least additions at the total N' = max_k n_k/x*_k; component k is then given N'·x*_k − n_k ≥ 0, and the
 * component that sets N' gets nothing. When the batch holds a component the target excludes (x*_k = 0 < n_k) no
 * additions reach x*: diluting brings the composition ever closer, so "best" needs a limit on the final quantity.
 *
 * <p><b>Closest composition at a final total.</b> For a final total of N' moles the reachable compositions are
 * y with y_k ≥ n_k/N' (nothing removed) and Σ y_k = 1. "Closest" means least squares in mole fraction: y minimises
 * Σ (y_k − x*_k)² over that set. It is a strictly convex problem with the unique solution
 * y_k = max(n_k/N', x*_k + λ), λ fixed by Σ y_k = 1 (its Karush–Kuhn–Tucker conditions); it is found exactly by
 * enumerating the n possible active sets (components held at their current amount) in the order of n_k/N' − x*_k,
 * so no iterative optimiser is needed. A larger N' only loosens the bounds, so the distance never grows with N': the
 * closest composition within a limit on the final amount of substance lies at that limit. For a limit on mass or
 * volume the final total N' is the one at which this family of closest compositions reaches the limit, found by
 * Brent's method on N' (bracketed between the batch's own total and the exact target's, or by doubling); the mass
 * and, for positive partial molar volumes, the volume grow with N' along the family, since every component's moles
 * do.
 *
 * <p>Temperatures in the card's unit; a volume limit is at its own temperature, and a limit in conventional mass is
 * weighed at its own temperature (the mixture's density there converts it); the resulting batch is reported at the
 * temperature t. Model estimates: where they feed custody transfer or filling decisions, defer to calibrated
 * measurement, local codes and licensed practice.
 */
public final class Adjustments {
    private static final int MAX_DOUBLINGS = 200;
    private static final double ACCURACY = 1e-14;

    private Adjustments() {
    }

    /**
     * The least additions that give the batch the target composition; refused, naming the components in the way,
     * when additions alone cannot.
     *
     * @param additionTemperatures storage temperatures of the components to add (for their volumes), or null
     */
    public static Adjustment leastAdditions(Card card, Amounts batch, double[] target, CompositionBasis basis,
            double t, double[] additionTemperatures, Extrapolation e) {
        return adjust(card, batch, target, basis, null, false, t, additionTemperatures, e);
    }

    /**
     * The least additions that reach the target, if the result stays within {@code ceiling} (e.g. the vessel's
     * working capacity); otherwise the closest composition the ceiling allows, which then fills it exactly.
     */
    public static Adjustment within(Card card, Amounts batch, double[] target, CompositionBasis basis,
            Quantity ceiling, double t, double[] additionTemperatures, Extrapolation e) {
        return adjust(card, batch, target, basis, ceiling, false, t, additionTemperatures, e);
    }

    /**
     * The additions that bring the batch to exactly {@code finalQuantity}: at the target composition when it is
     * reachable at that quantity, otherwise at the closest reachable composition.
     */
    public static Adjustment makeUpTo(Card card, Amounts batch, double[] target, CompositionBasis basis,
            Quantity finalQuantity, double t, double[] additionTemperatures, Extrapolation e) {
        return adjust(card, batch, target, basis, finalQuantity, true, t, additionTemperatures, e);
    }

    private static Adjustment adjust(Card card, Amounts batch, double[] target, CompositionBasis basis,
            Quantity limit, boolean fill, double t, double[] additionTemperatures, Extrapolation e) {
        Checks.temperature(t, "temperature of the batch");
        double[] n = Batches.positiveTotal(card, batch.moles(card, "amounts in the batch", e), "amounts in the batch");
        double[] goal = Compositions.toMoleFractions(card, target, basis, e);
        double exactTotal = 0.0;
        StringBuilder excluded = new StringBuilder();
        for (int k = 0; k < n.length; k++) {
            if (goal[k] > 0.0) {
                exactTotal = Math.max(exactTotal, n[k] / goal[k]);
            } else if (n[k] > 0.0) {
                excluded.append(excluded.length() == 0 ? "" : ", ").append(Checks.name(card, k));
            }
        }
        boolean reachable = excluded.length() == 0;
        double total;
        if (limit == null) {
            if (!reachable) {
                throw Problem.NEEDS_REMOVAL.raise(excluded.toString());
            }
            total = exactTotal;
        } else {
            double kelvin = limit.needsTemperature() ? Checks.kelvin(card, limit.temperature(), e) : Double.NaN;
            double current = limit.measureOf(card, n, kelvin);
            if (current > limit.base() * (1.0 + ACCURACY)) {
                throw Problem.LIMIT_BELOW_BATCH.raise(Show.number(limit.unit().fromBase(current)),
                        limit.unit().symbol(), fill ? "final quantity" : "largest final quantity",
                        Show.number(limit.value()), limit.unit().symbol());
            }
            boolean exactFits = reachable
                    && limit.measureOf(card, Checks.scaled(goal, exactTotal), kelvin) <= limit.base();
            total = exactFits && !fill ? exactTotal
                    : totalAtLimit(card, n, goal, limit, kelvin, reachable ? exactTotal : Double.NaN, fill);
        }
        double[] after = closest(n, goal, total);
        double[] added = new double[n.length];
        for (int k = 0; k < n.length; k++) {
            added[k] = after[k] - n[k];
        }
        boolean reached = reachable && total >= exactTotal * (1.0 - 1e-12);
        return new Adjustment(Charge.of(card, added, additionTemperatures, e), Batches.ofMoles(card, after, t, e),
                goal, reached);
    }

    /**
     * The final moles n + a of the composition closest to {@code goal} at the final total N' = {@code total}:
     * y_k = max(n_k/N', x*_k + λ), with the active set found by enumeration (see the class comment).
     */
    static double[] closest(double[] n, double[] goal, double total) {
        int size = n.length;
        double[] lower = new double[size];
        double[] breakpoint = new double[size];
        for (int k = 0; k < size; k++) {
            lower[k] = n[k] / total;
            breakpoint[k] = lower[k] - goal[k];
        }
        Integer[] order = new Integer[size];
        for (int k = 0; k < size; k++) {
            order[k] = k;
        }
        Arrays.sort(order, Comparator.comparingDouble(k -> breakpoint[k]));
        // Free set = the m components with the smallest breakpoints; they take x*_k + λ, the rest stay at n_k/N'.
        double boundSum = 0.0;
        for (double l : lower) {
            boundSum += l;
        }
        double freeGoal = 0.0;
        double bestLambda = Double.NaN;
        double bestViolation = Double.POSITIVE_INFINITY;
        for (int m = 1; m <= size; m++) {
            int k = order[m - 1];
            boundSum -= lower[k];
            freeGoal += goal[k];
            double lambda = (1.0 - boundSum - freeGoal) / m;
            double violation = Math.max(0.0, breakpoint[k] - lambda)
                    + (m < size ? Math.max(0.0, lambda - breakpoint[order[m]]) : 0.0);
            if (violation < bestViolation) {
                bestViolation = violation;
                bestLambda = lambda;
            }
        }
        double[] after = new double[size];
        for (int k = 0; k < size; k++) {
            after[k] = Math.max(n[k], total * (goal[k] + bestLambda));
        }
        return after;
    }

    /**
     * N' at which the closest composition's measure (moles, mass, or volume or conventional mass at the limit's
     * temperature) is the limit.
     */
    private static double totalAtLimit(Card card, double[] n, double[] goal, Quantity limit, double kelvin,
            double exactTotal, boolean fill) {
        double wanted = limit.base();
        UnivariateFunction excess = total -> limit.measureOf(card, closest(n, goal, total), kelvin) - wanted;
        double lo = Checks.sum(n);
        double atBatch = excess.value(lo);
        if (atBatch >= 0.0) {
            return lo;
        }
        if (Double.isNaN(atBatch)) {
            throw unreachable(limit, fill);
        }
        double hi = Double.isNaN(exactTotal) || fill ? 2.0 * lo : exactTotal;
        if (!Double.isNaN(exactTotal) && fill) {
            hi = Math.max(hi, exactTotal);
        }
        int doublings = 0;
        double value = excess.value(hi);
        while (!(value >= 0.0)) {
            if (Double.isNaN(value) || ++doublings > MAX_DOUBLINGS) {
                throw unreachable(limit, fill);
            }
            lo = hi;
            hi *= 2.0;
            value = excess.value(hi);
        }
        if (!(Double.isFinite(lo) && Double.isFinite(hi) && lo < hi)) {
            // the doubling ran past the double range (amounts in large units on a card of extreme numbers)
            throw unreachable(limit, fill);
        }
        try {
            return new BrentSolver(ACCURACY, ACCURACY * hi).solve(1000, excess, lo, hi);
        } catch (NoBracketingException | TooManyEvaluationsException e) {
            // the measure is NaN (not physical) somewhere between the ends, where the solver looked
            throw unreachable(limit, fill);
        }
    }

    private static MiscelaException unreachable(Quantity limit, boolean fill) {
        return Problem.LIMIT_UNREACHABLE.raise(fill ? "final quantity" : "largest final quantity",
                Show.number(limit.value()), limit.unit().symbol());
    }
}
