package org.miscela.core.fit;

import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.IntFunction;
import org.apache.commons.math3.distribution.FDistribution;

/**
 * Evidence for choosing an expansion's order: nested fits of orders 0..N side by side, each with its standard
 * deviation, an F-test against the order below and the information criteria. Immutable.
 *
 * <p>F = ((RSS_{m−1} − RSS_m)/(p_m − p_{m−1})) / (RSS_m/dof_m), with p-value P(F(p_m − p_{m−1}, dof_m) > F). AIC and
 * BIC take the least-squares form for normal errors, n·ln(RSS/n) + 2p and n·ln(RSS/n) + p·ln n (additive constants
 * dropped, which does not change which order is lowest; n counts points with positive weight).
 *
 * <p>Verdict: the lowest order m after which the next term is not significant at the chosen level, i.e. the first m
 * whose step to m + 1 has p ≥ level; the highest order when every step is significant ({@link #reachedHighestOrder()}).
 * An F-test needs residual degrees of freedom: a step to a fit with none has F and p NaN and counts as not
 * significant.
 */
public final class OrderSelection {
    private final List<Step> steps;
    private final double significance;
    private final int selectedOrder;

    private OrderSelection(List<Step> steps, double significance, int selectedOrder) {
        this.steps = Collections.unmodifiableList(new ArrayList<>(steps));
        this.significance = significance;
        this.selectedOrder = selectedOrder;
    }

    /** Fits of order 0..highestOrder made by the given function, e.g. one of {@link RedlichKisterFitter}'s. */
    public static OrderSelection compare(int highestOrder, IntFunction<LeastSquaresFit> fitOfOrder,
            double significance) {
        if (highestOrder < 0 || highestOrder > RedlichKisterFitter.MAX_ORDER_IN_X) {
            throw Problem.BAD_ORDER.raise("highest order", RedlichKisterFitter.MAX_ORDER_IN_X, highestOrder);
        }
        List<LeastSquaresFit> fits = new ArrayList<>();
        for (int m = 0; m <= highestOrder; m++) {
            fits.add(fitOfOrder.apply(m));
        }
        return compare(fits, significance);
    }

    /**
     * @param fits nested fits to the same points, in increasing order (order m is element m); each must have more
     *     parameters than the one before
     * @param significance level of the F-tests, strictly between 0 and 1 (0.05 is common practice)
     */
    public static OrderSelection compare(List<LeastSquaresFit> fits, double significance) {
        if (!(significance > 0 && significance < 1)) {
            throw Problem.BAD_SIGNIFICANCE.raise(significance);
        }
        if (fits.isEmpty()) {
            throw Problem.NO_POINTS.raise();
        }
        List<Step> steps = new ArrayList<>();
        int selected = -1;
        for (int m = 0; m < fits.size(); m++) {
            LeastSquaresFit fit = fits.get(m);
            double f = Double.NaN;
            double p = Double.NaN;
            if (m > 0) {
                LeastSquaresFit below = fits.get(m - 1);
                if (fit.parameterCount() <= below.parameterCount()) {
                    throw Problem.NOT_NESTED.raise(m + 1, fit.parameterCount(), m, below.parameterCount());
                }
                if (fit.pointCount() != fits.get(0).pointCount()) {
                    throw Problem.NOT_SAME_POINTS.raise(m + 1, fit.pointCount(), fits.get(0).pointCount());
                }
                f = fStatistic(below, fit);
                p = pValue(f, fit.parameterCount() - below.parameterCount(), fit.degreesOfFreedom());
                if (selected < 0 && !(p < significance)) {
                    selected = m - 1;
                }
            }
            steps.add(new Step(m, fit, f, p));
        }
        return new OrderSelection(steps, significance, selected < 0 ? fits.size() - 1 : selected);
    }

    private static double fStatistic(LeastSquaresFit below, LeastSquaresFit fit) {
        int dof = fit.degreesOfFreedom();
        if (dof == 0) {
            return Double.NaN;
        }
        double gain = (below.residualSumOfSquares() - fit.residualSumOfSquares())
                / (fit.parameterCount() - below.parameterCount());
        // an exact fit after an inexact one: infinitely significant; two exact fits: no evidence either way
        return gain / (fit.residualSumOfSquares() / dof);
    }

    private static double pValue(double f, int added, int dof) {
        if (Double.isNaN(f)) {
            return Double.NaN;
        }
        if (f == Double.POSITIVE_INFINITY) {
            return 0.0;
        }
        // no random generator: the distribution is used for its CDF only
        return 1.0 - new FDistribution(null, added, dof).cumulativeProbability(Math.max(0.0, f));
    }

    /** One row per order, from 0. */
    public List<Step> steps() {
        return steps;
    }

    public double significance() {
        return significance;
    }

    /** The lowest order after which adding a term is not significant at {@link #significance()}. */
    public int selectedOrder() {
        return selectedOrder;
    }

    /** True when every step was significant, so the verdict is only the highest order tried. */
    public boolean reachedHighestOrder() {
        for (int m = 1; m < steps.size(); m++) {
            if (!(steps.get(m).pValue() < significance)) {
                return false;
            }
        }
        return true;
    }

    public int lowestAicOrder() {
        return lowest(true);
    }

    public int lowestBicOrder() {
        return lowest(false);
    }

    private int lowest(boolean aic) {
        int best = 0;
        for (Step s : steps) {
            double v = aic ? s.aic() : s.bic();
            double b = aic ? steps.get(best).aic() : steps.get(best).bic();
            if (v < b) {
                best = s.order();
            }
        }
        return best;
    }

    /** One order's fit and its comparison with the order below. */
    public static final class Step {
        private final int order;
        private final LeastSquaresFit fit;
        private final double fStatistic;
        private final double pValue;

        Step(int order, LeastSquaresFit fit, double fStatistic, double pValue) {
            this.order = order;
            this.fit = fit;
            this.fStatistic = fStatistic;
            this.pValue = pValue;
        }

        public int order() {
            return order;
        }

        public LeastSquaresFit fit() {
            return fit;
        }

        public int parameterCount() {
            return fit.parameterCount();
        }

        public int degreesOfFreedom() {
            return fit.degreesOfFreedom();
        }

        public double residualStandardDeviation() {
            return fit.residualStandardDeviation();
        }

        /** F of this order against the one below; NaN for order 0. */
        public double fStatistic() {
            return fStatistic;
        }

        /** P(F ≥ observed) under the hypothesis that the added terms are zero; NaN for order 0. */
        public double pValue() {
            return pValue;
        }

        public double aic() {
            return informationBase() + 2.0 * fit.parameterCount();
        }

        public double bic() {
            return informationBase() + fit.parameterCount() * Math.log(fit.pointCount());
        }

        private double informationBase() {
            int n = fit.pointCount();
            return n * Math.log(fit.residualSumOfSquares() / n);
        }
    }
}
