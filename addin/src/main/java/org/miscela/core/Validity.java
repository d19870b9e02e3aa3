package org.miscela.core;

/**
 * The range a card's coefficients were fitted over: a temperature span and, per component, a mole-fraction span.
 * Immutable.
 */
public final class Validity {
    private final double lowestKelvin;
    private final double highestKelvin;
    private final double[] lowestFraction;
    private final double[] highestFraction;

    public Validity(double lowestKelvin, double highestKelvin, double[] lowestFraction, double[] highestFraction) {
        this.lowestKelvin = lowestKelvin;
        this.highestKelvin = highestKelvin;
        this.lowestFraction = lowestFraction.clone();
        this.highestFraction = highestFraction.clone();
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
}
