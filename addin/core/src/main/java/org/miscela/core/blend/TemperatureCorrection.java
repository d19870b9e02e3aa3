package org.miscela.core.blend;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * A blend of known composition taken from the temperature it was measured at, T, to a reference temperature T_ref
 * (such as 15 °C or 20 °C for quotes): its density at both, and the volume correction factor
 * VCF = V(T_ref)/V(T) = V_m(x, T_ref)/V_m(x, T) = ρ(T)/ρ(T_ref), so that a volume measured at T times the factor is
 * the same mass's volume at T_ref. Composition fixed (no evaporation); temperatures and densities in the card's
 * units. Immutable.
 *
 * <p>These are model estimates from the card. Custody transfer and duty use the correction tables or standards that
 * the contract or local law prescribes; defer to them, to calibrated measurement and to licensed practice.
 */
public final class TemperatureCorrection {
    private final double density;
    private final double referenceDensity;
    private final double temperature;
    private final double referenceTemperature;

    private TemperatureCorrection(double density, double referenceDensity, double temperature,
            double referenceTemperature) {
        this.density = density;
        this.referenceDensity = referenceDensity;
        this.temperature = temperature;
        this.referenceTemperature = referenceTemperature;
    }

    /** The correction for the composition {@code values} written on {@code basis}, from t to tRef. */
    public static TemperatureCorrection between(Card card, double[] values, CompositionBasis basis, double t,
            double tRef, Extrapolation e) {
        Checks.temperature(t, "measured temperature");
        Checks.temperature(tRef, "reference temperature");
        double[] x = Compositions.toMoleFractions(card, values, basis, e);
        double at = Checks.density(card, x, t, e);
        double atRef = Checks.density(card, x, tRef, e);
        return new TemperatureCorrection(card.units().density().fromKgPerM3(at),
                card.units().density().fromKgPerM3(atRef), t, tRef);
    }

    /** The card's density at the measured temperature, card unit. */
    public double density() {
        return density;
    }

    /** The card's density at the reference temperature, card unit. */
    public double referenceDensity() {
        return referenceDensity;
    }

    /** V(T_ref)/V(T). */
    public double volumeFactor() {
        return density / referenceDensity;
    }

    /** A volume measured at T, expressed at T_ref (same unit as given). */
    public double referenceVolume(double volumeAtT) {
        return Checks.positive(volumeAtT, "volume at the measured temperature") * volumeFactor();
    }

    /**
     * A density measured at T carried to T_ref with the card's thermal expansion: ρ_measured·ρ(T_ref)/ρ(T). This
     * keeps the measurement's own level and borrows only the temperature dependence from the card.
     */
    public double referenceDensityFromMeasured(double measuredDensity) {
        return Checks.positive(measuredDensity, "measured density") / volumeFactor();
    }

    public double temperature() {
        return temperature;
    }

    public double referenceTemperature() {
        return referenceTemperature;
    }
}
