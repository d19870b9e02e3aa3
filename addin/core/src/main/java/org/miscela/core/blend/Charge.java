package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * What to charge of each component, in card order: moles, masses and, when storage temperatures are known, the
 * volumes of the pure liquids to draw, each at its own storage temperature, and the masses a balance shows when each
 * is weighed in air there (conventional mass). Immutable; mol, g and cm³ inside.
 *
 * <p>Model estimates: where they feed custody transfer or filling decisions, defer to calibrated measurement, local
 * codes and licensed practice.
 */
public final class Charge {
    private final double[] moles;
    private final double[] masses;
    private final double[] volumes;
    /** Each pure component's density at its storage temperature, kg/m³ (NaN where none is charged), or null. */
    private final double[] densities;
    private final double[] temperatures;
    /** The card, for the words of a refusal of conventional masses. */
    private final Card card;

    private Charge(Card card, double[] moles, double[] masses, double[] volumes, double[] densities,
            double[] temperatures) {
        this.card = card;
        this.moles = moles;
        this.masses = masses;
        this.volumes = volumes;
        this.densities = densities;
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
        double[] densities = null;
        if (temperatures != null) {
            Checks.length(card, temperatures, "storage temperatures");
            volumes = new double[n];
            densities = new double[n];
            for (int k = 0; k < n; k++) {
                densities[k] = Double.NaN;
                volumes[k] = Double.NaN;
                if (moles[k] > 0.0 && !card.hypotheticalPure(k)) {
                    double t = Checks.temperature(temperatures[k], "storage temperature of "
                            + Checks.name(card, k));
                    volumes[k] = moles[k] * Checks.pureMolarVolume(card, k, t, e);
                    densities[k] = Checks.pureDensity(card, k, t, e);
                }
            }
        }
        return new Charge(card, moles.clone(), masses, volumes, densities,
                temperatures == null ? null : temperatures.clone());
    }

    /**
     * Each component's amount in {@code unit}: moles, masses, or volumes of the pure liquids at their storage
     * temperatures, or conventional masses weighed there (both need storage temperatures to have been given).
     */
    public double[] amounts(AmountUnit unit) {
        double[] source;
        switch (unit.dimension()) {
            case AMOUNT:
                source = moles;
                break;
            case MASS:
                source = unit.isConventional() ? conventionalMasses(unit) : masses;
                break;
            default:
                if (volumes == null) {
                    throw Problem.NO_STORAGE_TEMPERATURES.raise(unit.needingTemperature(true));
                }
                source = volumes;
                requireRealPures();
        }
        double[] out = new double[source.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = unit.fromBase(source[k]);
        }
        return out;
    }

    private double[] conventionalMasses(AmountUnit unit) {
        if (densities == null) {
            throw Problem.NO_STORAGE_TEMPERATURES.raise(unit.needingTemperature(true));
        }
        requireRealPures();
        double[] out = new double[masses.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = masses[k] > 0.0 ? masses[k] / Checks.trueMassPerConventional(card, densities[k],
                    Checks.name(card, k), temperatures[k]) : masses[k];
        }
        return out;
    }

    /** Refuses pure-liquid volumes or weighings of a charge holding a component that is no liquid alone. */
    private void requireRealPures() {
        for (int k = 0; k < moles.length; k++) {
            if (moles[k] > 0.0) {
                card.requireRealPure(k);
            }
        }
    }

    /** The storage temperatures given (card unit), or null. */
    public double[] storageTemperatures() {
        return temperatures == null ? null : temperatures.clone();
    }

    /** These amounts as input for {@link Batches#totals}, in {@code unit}. */
    public Amounts asAmounts(AmountUnit unit) {
        return Amounts.of(amounts(unit), unit, temperatures);
    }

    /** Sum of the masses, in a mass unit (of conventional masses, each weighed at its storage temperature). */
    public double totalMass(AmountUnit unit) {
        unit.require(AmountUnit.Dimension.MASS, "total mass");
        return unit.fromBase(Checks.sum(unit.isConventional() ? conventionalMasses(unit) : masses));
    }
}
