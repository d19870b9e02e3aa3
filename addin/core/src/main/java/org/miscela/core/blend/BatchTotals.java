package org.miscela.core.blend;

import org.miscela.core.card.Card;

/**
 * A mixed batch at one temperature: its components' moles, total moles and mass, volume and density, and the
 * contraction on mixing. Immutable; values are kept in mol, g, cm³ and returned in the unit asked for.
 *
 * <p>The contraction is Σ n_k V_k*(T) − V(T): the sum of the pure components' volumes, each at the mixture's
 * temperature T, minus the mixture's volume at T. Positive when the mixture takes less room than its ingredients
 * (ethanol + water), negative for an expansion. It is −N·V^E, so it contains no thermal expansion: volumes drawn
 * from tanks at other temperatures differ from Σ n_k V_k*(T) by their own thermal expansion as well.
 *
 * <p>These are model estimates from the card. Where a volume feeds custody transfer, invoicing or a decision about
 * filling a vessel, defer to calibrated measurement, local codes and licensed practice.
 */
public final class BatchTotals {
    private final double[] moles;
    private final double totalMoles;
    private final double mass;
    private final double volume;
    private final double pureVolume;
    private final double density;
    private final double temperature;
    /** The card, for the words of a refusal of a conventional mass. */
    private final Card card;

    BatchTotals(Card card, double[] moles, double mass, double volume, double pureVolume, double density,
            double temperature) {
        this.card = card;
        this.moles = moles.clone();
        this.totalMoles = Checks.sum(moles);
        this.mass = mass;
        this.volume = volume;
        this.pureVolume = pureVolume;
        this.density = density;
        this.temperature = temperature;
    }

    /** Refuses the pure volumes of a batch holding a component whose pure liquid is only a model limit. */
    private void requireRealPures() {
        for (int k = 0; k < moles.length; k++) {
            if (moles[k] > 0.0) {
                card.requireRealPure(k);
            }
        }
    }

    /** Mole fractions in card order. */
    public double[] moleFractions() {
        return Checks.scaled(moles, 1.0 / totalMoles);
    }

    /** Moles of each component in an amount-of-substance unit. */
    public double[] moles(AmountUnit unit) {
        unit.require(AmountUnit.Dimension.AMOUNT, "amount of each component");
        double[] out = new double[moles.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = unit.fromBase(moles[k]);
        }
        return out;
    }

    public double totalMoles(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.AMOUNT, "total amount").fromBase(totalMoles);
    }

    /** The mass; in a conventional unit, what the batch weighs in air at its temperature (OIML D 28). */
    public double mass(AmountUnit unit) {
        unit.require(AmountUnit.Dimension.MASS, "mass");
        if (!unit.isConventional()) {
            return unit.fromBase(mass);
        }
        double kgPerM3 = 1000.0 * mass / volume;
        return unit.fromBase(mass / Checks.trueMassPerConventional(card, kgPerM3, "the mixture", temperature));
    }

    /** The mixture's volume at {@link #temperature()}. */
    public double volume(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.VOLUME, "volume").fromBase(volume);
    }

    /** Σ n_k V_k*(T): the pure components' volumes before mixing, each at the mixture's temperature. */
    public double pureVolume(AmountUnit unit) {
        requireRealPures();
        return unit.require(AmountUnit.Dimension.VOLUME, "volume of the pure components").fromBase(pureVolume);
    }

    /** Σ n_k V_k*(T) − V(T); positive for a contraction, negative for an expansion. */
    public double contraction(AmountUnit unit) {
        requireRealPures();
        return unit.require(AmountUnit.Dimension.VOLUME, "contraction").fromBase(pureVolume - volume);
    }

    /** 100·(Σ n_k V_k*(T) − V(T))/Σ n_k V_k*(T). */
    public double contractionPercent() {
        requireRealPures();
        return 100.0 * (pureVolume - volume) / pureVolume;
    }

    /** The mixture's density at {@link #temperature()}, in the card's density unit. */
    public double density() {
        return density;
    }

    /** The mixture's temperature, in the card's unit. */
    public double temperature() {
        return temperature;
    }
}
