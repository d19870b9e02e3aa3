package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.model.ConventionalMass;

/**
 * Argument checks and the card's properties in internal units (K, cm³/mol, kg/m³, g/mol), always through
 * {@link CardFunctions} so that the card's validity range, extrapolation rule and physical checks apply exactly as
 * in the other functions.
 */
final class Checks {
    private Checks() {
    }

    /** A finite temperature (in the card's unit); the range is checked where the card is evaluated. */
    static double temperature(double t, String what) {
        if (Double.isNaN(t)) {
            throw Problem.BLANK_ARGUMENT.raise(what);
        }
        if (Double.isInfinite(t)) {
            throw Problem.ARGUMENT_NOT_FINITE.raise(what, Show.number(t));
        }
        return t;
    }

    /** A finite number greater than zero. */
    static double positive(double v, String what) {
        if (Double.isNaN(v)) {
            throw Problem.BLANK_ARGUMENT.raise(what);
        }
        if (Double.isInfinite(v) || !(v > 0.0)) {
            throw Problem.BLEND_NOT_POSITIVE.raise(what, Show.number(v));
        }
        return v;
    }

    /** A 0-based component index that exists on the card. */
    static int component(Card card, int k, String what) {
        if (k < 0 || k >= card.componentCount()) {
            throw Problem.NO_SUCH_COMPONENT.raise(what, k + 1, card.componentCount(), names(card));
        }
        return k;
    }

    static void length(Card card, double[] values, String what) {
        if (values == null) {
            throw Problem.BLANK_ARGUMENT.raise(what);
        }
        if (values.length != card.componentCount()) {
            throw Problem.LENGTH.raise(what, values.length, card.componentCount(), names(card));
        }
    }

    static String name(Card card, int k) {
        return card.components().get(k).name();
    }

    static String names(Card card) {
        StringBuilder b = new StringBuilder();
        for (int k = 0; k < card.componentCount(); k++) {
            b.append(k == 0 ? "" : ", ").append(name(card, k));
        }
        return b.toString();
    }

    static double molarMass(Card card, int k) {
        return card.components().get(k).molarMass();
    }

    static boolean mayExtrapolate(Card card, Extrapolation e) {
        return e == Extrapolation.ALLOW || (e == Extrapolation.AS_CARD && card.extrapolationAllowed());
    }

    /** The temperature in K after the card's temperature checks (range, and every pure density physical there). */
    static double kelvin(Card card, double t, Extrapolation e) {
        for (int k = 0; k < card.componentCount(); k++) {
            if (!card.hypotheticalPure(k)) {
                CardFunctions.pureDensity(card, k, t, e);
            }
        }
        return card.units().temperature().toKelvin(t);
    }

    /** V_k*(t) = M_k/ρ_k(t) in cm³/mol, checked. */
    static double pureMolarVolume(Card card, int k, double t, Extrapolation e) {
        double rho = card.units().density().toKgPerM3(CardFunctions.pureDensity(card, k, t, e));
        return 1000.0 * molarMass(card, k) / rho;
    }

    /** ρ_k(t) of a pure component in kg/m³, checked. */
    static double pureDensity(Card card, int k, double t, Extrapolation e) {
        return card.units().density().toKgPerM3(CardFunctions.pureDensity(card, k, t, e));
    }

    /**
     * m/m_c for a body of density {@code kgPerM3} weighed in air (OIML D 28, {@link ConventionalMass}); {@code what}
     * ("ethanol", "the mixture") and t (card unit) name it in the refusal when it is not denser than air.
     */
    static double trueMassPerConventional(Card card, double kgPerM3, String what, double t) {
        return ConventionalMass.trueMassPerConventional(kgPerM3, what, t, card.units().temperature().symbol(),
                AmountUnit.Dimension.MASS.trueUnits());
    }

    /** m/m_c of pure component k weighed at t (card unit). */
    static double trueMassPerConventional(Card card, int k, double t, Extrapolation e) {
        return trueMassPerConventional(card, pureDensity(card, k, t, e), name(card, k), t);
    }

    /** V_m(x, t) in cm³/mol, checked (validity range, physical). */
    static double molarVolume(Card card, double[] x, double t, Extrapolation e) {
        return card.units().molarVolume().toCm3PerMol(CardFunctions.molarVolume(card, x, t, e));
    }

    /** ρ(x, t) in kg/m³, checked. */
    static double density(Card card, double[] x, double t, Extrapolation e) {
        return card.units().density().toKgPerM3(CardFunctions.density(card, x, t, e));
    }

    /** V̄_k(x, t) in cm³/mol, checked. */
    static double partialMolarVolume(Card card, int k, double[] x, double t, Extrapolation e) {
        return card.units().molarVolume().toCm3PerMol(CardFunctions.partialMolarVolume(card, k, x, t, e));
    }

    /** Σ x_k M_k in g/mol. */
    static double meanMolarMass(Card card, double[] x) {
        return card.mixture().meanMolarMass(x);
    }

    static double sum(double[] v) {
        double s = 0.0;
        for (double d : v) {
            s += d;
        }
        return s;
    }

    static double[] scaled(double[] v, double f) {
        double[] out = new double[v.length];
        for (int k = 0; k < v.length; k++) {
            out[k] = v[k] * f;
        }
        return out;
    }

    /** v divided by its sum; the sum must be positive. */
    static double[] normalised(double[] v) {
        return scaled(v, 1.0 / sum(v));
    }
}
