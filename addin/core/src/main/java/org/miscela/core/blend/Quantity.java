package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * One quantity of a batch or of a component: an amount of substance, a mass, or a volume at a stated temperature
 * (card unit). Finite and greater than zero. Immutable.
 */
public final class Quantity {
    private final double value;
    private final AmountUnit unit;
    private final double temperature;

    private Quantity(double value, AmountUnit unit, double temperature, String what) {
        if (unit == null) {
            throw Problem.BLANK_ARGUMENT.raise("unit of the " + what);
        }
        this.value = Checks.positive(value, what);
        this.unit = unit;
        this.temperature = temperature;
    }

    /** Moles or mass; a volume unit fails, because a volume needs its temperature. */
    public static Quantity of(double value, AmountUnit unit) {
        if (unit != null && unit.dimension() == AmountUnit.Dimension.VOLUME) {
            throw Problem.NEEDS_TEMPERATURE.raise("quantity");
        }
        return new Quantity(value, unit, Double.NaN, "quantity");
    }

    /** Any quantity; the temperature (card unit) is read only when the unit is a volume. */
    public static Quantity of(double value, AmountUnit unit, double temperature) {
        boolean volume = unit != null && unit.dimension() == AmountUnit.Dimension.VOLUME;
        return new Quantity(value, unit, volume ? Checks.temperature(temperature, "temperature of the volume")
                : Double.NaN, "quantity");
    }

    public double value() {
        return value;
    }

    public AmountUnit unit() {
        return unit;
    }

    /** The temperature of a volume (card unit); NaN for moles and masses. */
    public double temperature() {
        return temperature;
    }

    public boolean isVolume() {
        return unit.dimension() == AmountUnit.Dimension.VOLUME;
    }

    /** The value in mol, g or cm³. */
    double base() {
        return unit.toBase(value);
    }

    /** Moles of pure component k in this quantity (a volume is of the pure liquid at its temperature). */
    double molesOfPure(Card card, int k, Extrapolation e) {
        switch (unit.dimension()) {
            case AMOUNT:
                return base();
            case MASS:
                return base() / Checks.molarMass(card, k);
            default:
                return base() / Checks.pureMolarVolume(card, k, temperature, e);
        }
    }

    /**
     * The same measure of a batch with {@code moles} of each component, unchecked (internal model) so it can be
     * called inside a solve: mol, g, or cm³ at this quantity's temperature. NaN where the card's volume is not
     * physical.
     */
    double measureOf(Card card, double[] moles, double kelvin) {
        double total = Checks.sum(moles);
        switch (unit.dimension()) {
            case AMOUNT:
                return total;
            case MASS: {
                double mass = 0.0;
                for (int k = 0; k < moles.length; k++) {
                    mass += moles[k] * Checks.molarMass(card, k);
                }
                return mass;
            }
            default: {
                double vm = card.mixture().molarVolume(Checks.scaled(moles, 1.0 / total), kelvin);
                return vm > 0.0 && Double.isFinite(vm) ? total * vm : Double.NaN;
            }
        }
    }

    @Override
    public String toString() {
        return Show.number(value) + " " + unit.symbol() + (isVolume() ? " at " + Show.number(temperature) : "");
    }
}
