package org.miscela.core.model;

/**
 * The boiling temperature of a two-component blend against the mole fraction of one of its components, as data
 * points joined by straight lines: what a card states from a published table or a safety data sheet, at the pressure
 * the batch is at. Between the points the line is an interpolation; outside them nothing is known (NaN). Immutable.
 */
public final class BoilingCurve {
    private final int component;
    private final double[] fraction;
    private final double[] kelvin;

    /**
     * @param component the component whose mole fraction the points give
     * @param fraction its mole fractions, strictly increasing, within 0..1
     * @param kelvin the boiling temperature at each, K
     */
    public BoilingCurve(int component, double[] fraction, double[] kelvin) {
        if (fraction.length < 2 || fraction.length != kelvin.length) {
            throw new IllegalArgumentException("at least two points, each a mole fraction and a temperature");
        }
        this.component = component;
        this.fraction = fraction.clone();
        this.kelvin = kelvin.clone();
    }

    /** The component whose mole fraction the points give. */
    public int component() {
        return component;
    }

    /** The boiling temperature (K) at the blend x, or NaN where the points do not reach. */
    public double kelvinAt(double[] x) {
        double v = x[component];
        if (v < fraction[0] || v > fraction[fraction.length - 1]) {
            return Double.NaN;
        }
        for (int i = 1; i < fraction.length; i++) {
            if (v <= fraction[i]) {
                double s = (v - fraction[i - 1]) / (fraction[i] - fraction[i - 1]);
                return kelvin[i - 1] + s * (kelvin[i] - kelvin[i - 1]);
            }
        }
        return kelvin[kelvin.length - 1];
    }
}
