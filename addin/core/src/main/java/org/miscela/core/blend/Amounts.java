package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * Amounts of each component of a batch, in card order: moles, masses, or volumes of the pure liquids, each volume at
 * the temperature it was measured at (its tank's temperature). Masses weighed in air (conventional mass) come with
 * the temperature each was weighed at too, whose pure density turns them into true masses. Immutable; the values are
 * checked against a card when used, so the message can name the component.
 */
public final class Amounts {
    private final double[] values;
    private final AmountUnit unit;
    private final double[] temperatures;

    private Amounts(double[] values, AmountUnit unit, double[] temperatures) {
        if (values == null) {
            throw Problem.BLANK_ARGUMENT.raise("amounts");
        }
        if (unit == null) {
            throw Problem.BLANK_ARGUMENT.raise("unit of the amounts");
        }
        this.values = values.clone();
        this.unit = unit;
        this.temperatures = temperatures == null ? null : temperatures.clone();
    }

    /** Moles or true masses; a volume or a conventional mass here fails, because it needs its temperature. */
    public static Amounts of(double[] values, AmountUnit unit) {
        if (unit != null && unit.needsTemperature()) {
            throw Problem.NEEDS_TEMPERATURES.raise("amounts", unit.needingTemperature(true));
        }
        return new Amounts(values, unit, null);
    }

    /**
     * Any amounts; {@code temperatures} (card unit, one per component) are read only when the unit is a volume or a
     * conventional mass, and then only for components whose amount is not zero.
     */
    public static Amounts of(double[] values, AmountUnit unit, double[] temperatures) {
        return new Amounts(values, unit, temperatures);
    }

    public double[] values() {
        return values.clone();
    }

    public AmountUnit unit() {
        return unit;
    }

    /** The temperatures given, or null. */
    public double[] temperatures() {
        return temperatures == null ? null : temperatures.clone();
    }

    /** Moles of each component, checked; {@code what} names the amounts in messages ("amounts in the batch"). */
    double[] moles(Card card, String what, Extrapolation e) {
        Checks.length(card, values, what);
        if (unit.needsTemperature()) {
            if (temperatures == null) {
                throw Problem.NEEDS_TEMPERATURES.raise(what, unit.needingTemperature(true));
            }
            Checks.length(card, temperatures, "temperatures of the " + what);
        }
        double[] moles = new double[values.length];
        for (int k = 0; k < values.length; k++) {
            String name = Checks.name(card, k);
            double v = values[k];
            if (Double.isNaN(v)) {
                throw Problem.BLANK_VALUE.raise("amount", name, "write 0 for a component that is absent");
            }
            if (Double.isInfinite(v)) {
                throw Problem.VALUE_NOT_FINITE.raise("amount", name, Show.number(v));
            }
            if (v < 0.0) {
                throw Problem.VALUE_NEGATIVE.raise("amount", name, Show.number(v));
            }
            double base = unit.toBase(v);
            switch (unit.dimension()) {
                case AMOUNT:
                    moles[k] = base;
                    break;
                case MASS:
                    if (unit.isConventional() && v > 0.0) {
                        double t = Checks.temperature(temperatures[k], "temperature of the weighing of " + name);
                        base *= Checks.trueMassPerConventional(card, k, t, e);
                    }
                    moles[k] = base / Checks.molarMass(card, k);
                    break;
                default:
                    if (v > 0.0) {
                        double t = Checks.temperature(temperatures[k], "temperature of the volume of " + name);
                        moles[k] = base / Checks.pureMolarVolume(card, k, t, e);
                    }
            }
        }
        return moles;
    }
}
