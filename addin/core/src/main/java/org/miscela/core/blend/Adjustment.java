package org.miscela.core.blend;

/**
 * The result of adjusting a batch: what to add of each component, the batch that results, and whether it has the
 * target composition or only the closest one that additions can reach (see {@link Adjustments}). Immutable.
 *
 * <p>Model estimates: where they feed custody transfer or filling decisions, defer to calibrated measurement, local
 * codes and licensed practice.
 */
public final class Adjustment {
    /** {@link #summary()} when the target is met. */
    public static final String REACHED = "The target composition is reached by additions alone.";
    /** {@link #summary()} otherwise; filled with the largest mole-fraction difference. */
    public static final String NOT_REACHED = "The target composition cannot be reached by additions within the "
            + "quantity given; this is the closest (least squares in mole fraction), differing from the target by up "
            + "to %s in mole fraction.";

    private final Charge additions;
    private final BatchTotals result;
    private final double[] target;
    private final boolean reached;

    Adjustment(Charge additions, BatchTotals result, double[] target, boolean reached) {
        this.additions = additions;
        this.result = result;
        this.target = target.clone();
        this.reached = reached;
    }

    /** What to add of each component (zero for those that need none). */
    public Charge additions() {
        return additions;
    }

    /** The batch after the additions, at the temperature asked for. */
    public BatchTotals result() {
        return result;
    }

    /** The target's mole fractions. */
    public double[] target() {
        return target.clone();
    }

    /** The resulting batch's mole fractions. */
    public double[] achieved() {
        return result.moleFractions();
    }

    /** Whether the result has the target composition (to rounding). */
    public boolean reached() {
        return reached;
    }

    /** max_k |x_k(result) − x_k(target)|. */
    public double largestDeviation() {
        double[] x = achieved();
        double worst = 0.0;
        for (int k = 0; k < x.length; k++) {
            worst = Math.max(worst, Math.abs(x[k] - target[k]));
        }
        return worst;
    }

    /** A sentence for the user: the target is reached, or how far the closest reachable composition is from it. */
    public String summary() {
        return reached ? REACHED : String.format(java.util.Locale.ROOT, NOT_REACHED, Show.number(largestDeviation()));
    }
}
