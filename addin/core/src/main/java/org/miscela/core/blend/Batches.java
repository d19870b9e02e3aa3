package org.miscela.core.blend;


import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * Batch totals: from the amounts charged to the mixture's mass, moles, volume and density at a stated temperature,
 * and the volume change when one component is added. Temperatures in the card's unit, densities in the card's
 * density unit, every other quantity in the unit asked for.
 *
 * <p>Model estimates from the card: where they feed custody transfer, invoicing or filling decisions, defer to
 * calibrated measurement, local codes and licensed practice.
 */
public final class Batches {
    private Batches() {
    }

    /** The batch made of {@code amounts}, mixed and brought to temperature t. */
    public static BatchTotals totals(Card card, Amounts amounts, double t, Extrapolation e) {
        return ofMoles(card, positiveTotal(card, amounts.moles(card, "amounts", e), "amounts"), t, e);
    }

    /**
     * The volume change at temperature t when {@code added} of component k is stirred into the batch {@code amounts}
     * (a volume added is of the pure liquid at its own temperature).
     */
    public static AdditionVolume addition(Card card, Amounts amounts, int component, Quantity added, double t,
            Extrapolation e) {
        int k = Checks.component(card, component, "component added");
        double[] before = positiveTotal(card, amounts.moles(card, "amounts", e), "amounts");
        double dn = added.molesOfPure(card, k, e);
        double[] after = before.clone();
        after[k] += dn;
        BatchTotals b = ofMoles(card, before, t, e);
        BatchTotals a = ofMoles(card, after, t, e);
        double exact = a.volume(AmountUnit.ML) - b.volume(AmountUnit.ML);
        double linear = Checks.partialMolarVolume(card, k, b.moleFractions(), t, e) * dn;
        double pure = card.hypotheticalPure(k) ? Double.NaN : dn * Checks.pureMolarVolume(card, k, t, e);
        return new AdditionVolume(card, k, exact, linear, pure, dn);
    }

    /** Totals of a batch given in moles; the composition is checked at t like any card evaluation. */
    static BatchTotals ofMoles(Card card, double[] moles, double t, Extrapolation e) {
        Checks.temperature(t, "temperature of the batch");
        double total = Checks.sum(moles);
        double[] x = Checks.scaled(moles, 1.0 / total);
        double vm = Checks.molarVolume(card, x, t, e);
        double mass = 0.0;
        double pure = 0.0;
        for (int k = 0; k < moles.length; k++) {
            mass += moles[k] * Checks.molarMass(card, k);
            // a dissolved salt has no pure-liquid volume: the batch's contraction is then refused when asked for
            pure += moles[k] == 0.0 ? 0.0 : card.hypotheticalPure(k) ? Double.NaN
                    : moles[k] * Checks.pureMolarVolume(card, k, t, e);
        }
        double density = card.units().density().fromKgPerM3(Checks.density(card, x, t, e));
        return new BatchTotals(card, moles, mass, total * vm, pure, density, t);
    }

    static double[] positiveTotal(Card card, double[] moles, String what) {
        double total = Checks.sum(moles);
        if (Double.isInfinite(total)) {
            throw Problem.BLEND_AMOUNT_TOO_LARGE.raise(what);
        }
        if (!(total > 0.0)) {
            throw Problem.BLEND_AMOUNT_ZERO.raise(what);
        }
        return moles;
    }
}
