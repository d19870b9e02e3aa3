package org.miscela.core.blend;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * Recipes: how much of each component makes a target quantity of a target composition.
 *
 * <p>Model estimates from the card: where a recipe feeds custody transfer, invoicing or filling decisions, defer to
 * calibrated measurement, local codes and licensed practice.
 */
public final class Recipes {
    private Recipes() {
    }

    /**
     * The charge that makes {@code target} (moles, a mass, or a volume of mixture at the target's temperature) of
     * the composition {@code composition} written on {@code basis}. With N the total moles (N = Q for moles,
     * Q/M̄(x) for a mass, V/V_m(x, T) for a volume at T; a conventional mass weighed at T is first made a true mass
     * with the mixture's density ρ(x, T)), component k is charged as n_k = N·x_k; its pure volume is n_k·V_k*(T_k)
     * at its own storage temperature T_k (card unit; pass null when only masses and moles are needed), and its
     * conventional mass is weighed at T_k too.
     */
    public static Charge forTarget(Card card, Quantity target, double[] composition, CompositionBasis basis,
            double[] storageTemperatures, Extrapolation e) {
        double[] x = Compositions.toMoleFractions(card, composition, basis, e);
        double total;
        switch (target.unit().dimension()) {
            case AMOUNT:
                total = target.base();
                break;
            case MASS:
                double grams = target.unit().isConventional() ? target.trueGramsOfMixture(card, x, e) : target.base();
                total = grams / Checks.meanMolarMass(card, x);
                break;
            default:
                total = target.base() / Checks.molarVolume(card, x, target.temperature(), e);
        }
        return Charge.of(card, Checks.scaled(x, total), storageTemperatures, e);
    }
}
