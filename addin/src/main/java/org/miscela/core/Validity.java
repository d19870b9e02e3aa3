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

    public boolean containsFraction(int component, double x) {
        return x >= lowestFraction[component] && x <= highestFraction[component];
    }
}
