package org.miscela.core.model;

/** The vapour pressure of a pure liquid as a function of temperature, in K and Pa. Implementations are immutable. */
public interface VapourPressure {
    /** The form's name as a card writes it ("Antoine", "Wagner 3-6", …). */
    String form();

    /** p in Pa at T in K; NaN where the form is not defined. */
    double pascal(double kelvin);

    /** The lowest temperature (K) the constants hold for, −∞ when the card states none. */
    double lowestKelvin();

    /** The highest temperature (K) the constants hold for, +∞ when the card states none. */
    double highestKelvin();

    /** Whether the constants state a range. */
    default boolean hasRange() {
        return Double.isFinite(lowestKelvin());
    }
}
