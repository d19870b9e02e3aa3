package org.miscela.core.model;

/**
 * Density of a pure liquid as a function of temperature. Implementations are immutable.
 */
public interface PureDensity {
    /** Density in kg/m³ at the temperature {@code kelvin}; may be non-positive far outside the model's range. */
    double at(double kelvin);

    /** The model's name as written on a card. */
    String modelName();

    /** Lowest temperature (K) the model itself is valid for; the card's own range must lie inside. */
    default double lowestKelvin() {
        return 0.0;
    }

    /** Highest temperature (K) the model itself is valid for. */
    default double highestKelvin() {
        return Double.POSITIVE_INFINITY;
    }
}
