package org.miscela.core.card;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The range a card's coefficients were fitted over: a temperature span, per component a mole-fraction span, and per
 * pair (where the card states one) a narrower temperature span or a span of the pair's own composition. Immutable.
 */
public final class Validity {
    private final double lowestKelvin;
    private final double highestKelvin;
    private final double[] lowestFraction;
    private final double[] highestFraction;
    private final List<PairLimit> pairLimits;

    public Validity(double lowestKelvin, double highestKelvin, double[] lowestFraction, double[] highestFraction) {
        this(lowestKelvin, highestKelvin, lowestFraction, highestFraction, Collections.<PairLimit>emptyList());
    }

    public Validity(double lowestKelvin, double highestKelvin, double[] lowestFraction, double[] highestFraction,
            List<PairLimit> pairLimits) {
        this.lowestKelvin = lowestKelvin;
        this.highestKelvin = highestKelvin;
        this.lowestFraction = lowestFraction.clone();
        this.highestFraction = highestFraction.clone();
        this.pairLimits = Collections.unmodifiableList(new ArrayList<>(pairLimits));
    }

    /** The per-pair limits the card states, in card order. */
    public List<PairLimit> pairLimits() {
        return pairLimits;
    }

    public double lowestKelvin() {
        return lowestKelvin;
    }

    public double highestKelvin() {
        return highestKelvin;
    }

    public double lowestFraction(int component) {
        return lowestFraction[component];
    }

    public double highestFraction(int component) {
        return highestFraction[component];
    }

    public boolean containsTemperature(double kelvin) {
        return kelvin >= lowestKelvin && kelvin <= highestKelvin;
    }

    /**
     * Whether a mole fraction is inside the component's limits. A component's fraction is often computed as 1 − x1,
     * which can miss a limit by an ulp (1 − 0.8 = 0.19999999999999996), so limits are widened by 1e-12.
     */
    public boolean containsFraction(int component, double x) {
        return x >= lowestFraction[component] - FRACTION_SLACK && x <= highestFraction[component] + FRACTION_SLACK;
    }

    /** Far below any meaningful composition difference, far above rounding in 1 − x. */
    static final double FRACTION_SLACK = 1e-12;

    /**
     * Limits that hold for one pair's coefficients: a temperature span, and a span of the pair's own composition
     * r = x_i/(x_i + x_j), which is checked only where both components are present.
     */
    public static final class PairLimit {
        private final int first;
        private final int second;
        private final double lowestKelvin;
        private final double highestKelvin;
        private final double lowestRatio;
        private final double highestRatio;

        /** Pass NaN for a span the card does not state. */
        public PairLimit(int first, int second, double lowestKelvin, double highestKelvin, double lowestRatio,
                double highestRatio) {
            this.first = first;
            this.second = second;
            this.lowestKelvin = lowestKelvin;
            this.highestKelvin = highestKelvin;
            this.lowestRatio = lowestRatio;
            this.highestRatio = highestRatio;
        }

        public int first() {
            return first;
        }

        public int second() {
            return second;
        }

        public boolean hasTemperature() {
            return !Double.isNaN(lowestKelvin);
        }

        public boolean hasRatio() {
            return !Double.isNaN(lowestRatio);
        }

        public double lowestKelvin() {
            return lowestKelvin;
        }

        public double highestKelvin() {
            return highestKelvin;
        }

        public double lowestRatio() {
            return lowestRatio;
        }

        public double highestRatio() {
            return highestRatio;
        }

        /** x_first/(x_first + x_second), or NaN when either is absent. */
        public double ratio(double[] x) {
            double a = x[first];
            double b = x[second];
            return a > 0.0 && b > 0.0 ? a / (a + b) : Double.NaN;
        }

        public boolean containsTemperature(double kelvin) {
            return !hasTemperature() || (kelvin >= lowestKelvin && kelvin <= highestKelvin);
        }

        public boolean containsRatio(double[] x) {
            double r = ratio(x);
            return !hasRatio() || Double.isNaN(r)
                    || (r >= lowestRatio - FRACTION_SLACK && r <= highestRatio + FRACTION_SLACK);
        }
    }
}
