package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.model.ConventionalMass;

/**
 * One quantity of a batch or of a component: an amount of substance, a mass, or a volume at a stated temperature
 * (card unit). A mass weighed in air (conventional mass) comes with a temperature too: the density of what was weighed
 * at that temperature turns it into a true mass. Finite and greater than zero. Immutable.
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

    /** Moles or true mass; a volume or conventional mass fails, because it needs its temperature. */
    public static Quantity of(double value, AmountUnit unit) {
        if (unit != null && unit.needsTemperature()) {
            throw Problem.NEEDS_TEMPERATURE.raise("quantity", unit.needingTemperature(false));
        }
        return new Quantity(value, unit, Double.NaN, "quantity");
    }

    /**
     * Any quantity; the temperature (card unit) is read only when the unit is a volume (its temperature) or a
     * conventional mass (the temperature it was weighed at).
     */
    public static Quantity of(double value, AmountUnit unit, double temperature) {
        if (unit == null || !unit.needsTemperature()) {
            return new Quantity(value, unit, Double.NaN, "quantity");
        }
        return new Quantity(value, unit, Checks.temperature(temperature, unit.isConventional()
                ? "temperature of the weighing" : "temperature of the volume"), "quantity");
    }

    public double value() {
        return value;
    }

    public AmountUnit unit() {
        return unit;
    }

    /** The temperature of a volume, or of the weighing of a conventional mass (card unit); NaN otherwise. */
    public double temperature() {
        return temperature;
    }

    public boolean isVolume() {
        return unit.dimension() == AmountUnit.Dimension.VOLUME;
    }

    /** Whether the quantity carries a temperature: a volume, or a conventional mass. */
    public boolean needsTemperature() {
        return unit.needsTemperature();
    }

    /** The value in mol, g or cm³ (g of conventional mass for a conventional mass). */
    double base() {
        return unit.toBase(value);
    }

    /**
     * The true mass in g of a mixture of composition x that this conventional mass (weighed at its temperature)
     * stands for, checked: m = m_c·(1 − 1.2/8000)/(1 − 1.2/ρ(x)).
     */
    double trueGramsOfMixture(Card card, double[] x, Extrapolation e) {
        return base() * Checks.trueMassPerConventional(card, Checks.density(card, x, temperature, e), "the mixture",
                temperature);
    }

    /** Moles of pure component k in this quantity (a volume is of the pure liquid at its temperature). */
    double molesOfPure(Card card, int k, Extrapolation e) {
        switch (unit.dimension()) {
            case AMOUNT:
                return base();
            case MASS:
                double grams = unit.isConventional()
                        ? base() * Checks.trueMassPerConventional(card, k, temperature, e) : base();
                return grams / Checks.molarMass(card, k);
            default:
                return base() / Checks.pureMolarVolume(card, k, temperature, e);
        }
    }

    /**
     * The same measure of a batch with {@code moles} of each component, unchecked (internal model) so it can be
     * called inside a solve: mol, g (of conventional mass for a conventional unit: the mixture's density at this
     * quantity's temperature converts it), or cm³ at this quantity's temperature. NaN where the card's volume is not
     * physical or the mixture is not denser than air.
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
                if (!unit.isConventional()) {
                    return mass;
                }
                double rho = card.mixture().density(Checks.scaled(moles, 1.0 / total), kelvin);
                return ConventionalMass.weighable(rho) ? mass / ConventionalMass.trueMassPerConventional(rho)
                        : Double.NaN;
            }
            default: {
                double vm = card.mixture().molarVolume(Checks.scaled(moles, 1.0 / total), kelvin);
                return vm > 0.0 && Double.isFinite(vm) ? total * vm : Double.NaN;
            }
        }
    }

    @Override
    public String toString() {
        return Show.number(value) + " " + unit.symbol() + (needsTemperature() ? " at " + Show.number(temperature) : "");
    }
}
