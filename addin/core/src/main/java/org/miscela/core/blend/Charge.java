package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * What to charge of each component, in card order: moles, masses and, when storage temperatures are known, the
 * volumes of the pure liquids to draw, each at its own storage temperature. Immutable; mol, g and cm³ inside.
 *
 * <p>Model estimates: where they feed custody transfer or filling decisions, defer to calibrated measurement, local
 * codes and licensed practice.
 */
public final class Charge {
    private final double[] moles;
    private final double[] masses;
    private final double[] volumes;
    private final double[] temperatures;

    private Charge(double[] moles, double[] masses, double[] volumes, double[] temperatures) {
        this.moles = moles;
        this.masses = masses;
        this.volumes = volumes;
        this.temperatures = temperatures;
    }

    /** @param temperatures storage temperatures (card unit), one per component, or null */
    static Charge of(Card card, double[] moles, double[] temperatures, Extrapolation e) {
        int n = moles.length;
        double[] masses = new double[n];
        for (int k = 0; k < n; k++) {
            masses[k] = moles[k] * Checks.molarMass(card, k);
        }
        double[] volumes = null;
        if (temperatures != null) {
            Checks.length(card, temperatures, "storage temperatures");
            volumes = new double[n];
            for (int k = 0; k < n; k++) {
                if (moles[k] > 0.0) {
                    double t = Checks.temperature(temperatures[k], "storage temperature of "
                            + Checks.name(card, k));
                    volumes[k] = moles[k] * Checks.pureMolarVolume(card, k, t, e);
                }
            }
        }
        return new Charge(moles.clone(), masses, volumes, temperatures == null ? null : temperatures.clone());
    }

    /**
     * Each component's amount in {@code unit}: moles, masses, or volumes of the pure liquids at their storage
     * temperatures (which needs storage temperatures to have been given).
     */
    public double[] amounts(AmountUnit unit) {
        double[] source;
        switch (unit.dimension()) {
            case AMOUNT:
                source = moles;
                break;
            case MASS:
                source = masses;
                break;
            default:
                if (volumes == null) {
                    throw Problem.NO_STORAGE_TEMPERATURES.raise();
                }
                source = volumes;
        }
        double[] out = new double[source.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = unit.fromBase(source[k]);
        }
        return out;
    }

    /** The storage temperatures given (card unit), or null. */
    public double[] storageTemperatures() {
        return temperatures == null ? null : temperatures.clone();
    }

    /** These amounts as input for {@link Batches#totals}, in {@code unit}. */
    public Amounts asAmounts(AmountUnit unit) {
        return Amounts.of(amounts(unit), unit, temperatures);
    }

    /** Sum of the masses, in a mass unit. */
    public double totalMass(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.MASS, "total mass").fromBase(Checks.sum(masses));
    }
}
