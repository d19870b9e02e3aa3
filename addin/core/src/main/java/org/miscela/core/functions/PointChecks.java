package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Units;
import org.miscela.core.card.Validity;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.List;

/**
 * The checks every cell function makes on its point before computing (temperature above 0 K, the point inside the
 * card's validity range unless extrapolation is allowed, the pure and mixture densities physical there), and the
 * messages of each limit a point exceeds. Temperatures {@code t} are in the card's unit, {@code kelvin} the same in K;
 * compositions are checked mole fractions in card order.
 */
final class PointChecks {
    private PointChecks() {
    }

    /** Checks temperature and composition limits (unless extrapolation is allowed) and the pure densities. */
    static double checkPoint(Card card, double[] x, double t, Extrapolation e) {
        double kelvin = checkTemperature(card, t, e);
        if (!card.mayExtrapolate(e) && !within(card, x, kelvin)) {
            throw violations(card, x, kelvin, t).get(0).refusal();
        }
        for (int k = 0; k < x.length; k++) {
            if (!card.hypotheticalPure(k)) {
                pureDensityAt(card, k, kelvin, t);
            }
        }
        return kelvin;
    }

    /**
     * {@link #checkPoint} for the heat functions: a pure liquid (one mole fraction exactly 1) is valid whatever
     * compositions the card's data cover, since its excess properties are zero; only its temperature is checked.
     */
    static double checkHeatPoint(Card card, double[] x, double t, Extrapolation e) {
        if (org.miscela.core.card.Mixture.pureComponent(x) >= 0) {
            return checkTemperature(card, t, e);
        }
        return checkPoint(card, x, t, e);
    }

    /** The temperature in K: finite, above absolute zero, and inside the card's range unless it may extrapolate. */
    static double checkTemperature(Card card, double t, Extrapolation e) {
        if (Double.isNaN(t) || Double.isInfinite(t)) {
            throw Problem.ARG_NOT_FINITE.raise("temperature");
        }
        Units.Temperature unit = card.units().temperature();
        double kelvin = unit.toKelvin(t);
        if (!(kelvin > 0.0)) {
            throw Problem.BELOW_ABSOLUTE_ZERO.raise(Numbers.show(t), unit.symbol());
        }
        Validity v = card.validity();
        if (!card.mayExtrapolate(e) && !v.containsTemperature(kelvin)) {
            throw Problem.OUTSIDE_TEMPERATURE.raise(Numbers.show(t), unit.symbol(),
                    Numbers.show(unit.fromKelvin(v.lowestKelvin())), Numbers.show(unit.fromKelvin(v.highestKelvin())),
                    unit.symbol());
        }
        return kelvin;
    }

    /**
     * Whether the point exceeds no validity limit: the same answer as {@code violations(…).isEmpty()}, without
     * writing the messages (this runs on every call).
     */
    static boolean within(Card card, double[] x, double kelvin) {
        Validity v = card.validity();
        if (!v.containsTemperature(kelvin)) {
            return false;
        }
        for (int k = 0; k < x.length; k++) {
            if (!v.containsFraction(k, x[k])) {
                return false;
            }
        }
        List<Validity.PairLimit> limits = v.pairLimits();
        for (int i = 0; i < limits.size(); i++) {
            Validity.PairLimit p = limits.get(i);
            boolean present = x[p.first()] > 0.0 && x[p.second()] > 0.0;
            if (present && !p.containsTemperature(kelvin) || !p.containsRatio(x)) {
                return false;
            }
        }
        return true;
    }

    /** Every validity limit the point exceeds, in the order: temperature, components, pairs. */
    static List<Violation> violations(Card card, double[] x, double kelvin, double t) {
        List<Violation> out = new ArrayList<>();
        Validity v = card.validity();
        Units.Temperature unit = card.units().temperature();
        if (!v.containsTemperature(kelvin)) {
            out.add(new Violation(Problem.OUTSIDE_TEMPERATURE, Numbers.show(t), unit.symbol(),
                    Numbers.show(unit.fromKelvin(v.lowestKelvin())), Numbers.show(unit.fromKelvin(v.highestKelvin())),
                    unit.symbol()));
        }
        for (int k = 0; k < x.length; k++) {
            if (!v.containsFraction(k, x[k])) {
                out.add(new Violation(Problem.OUTSIDE_COMPOSITION, card.components().get(k).name(), Numbers.show(x[k]),
                        Numbers.show(v.lowestFraction(k)), Numbers.show(v.highestFraction(k))));
            }
        }
        for (Validity.PairLimit p : v.pairLimits()) {
            String a = card.components().get(p.first()).name();
            String b = card.components().get(p.second()).name();
            boolean present = x[p.first()] > 0.0 && x[p.second()] > 0.0;
            if (present && !p.containsTemperature(kelvin)) {
                out.add(new Violation(Problem.OUTSIDE_PAIR_TEMPERATURE, Numbers.show(t), unit.symbol(),
                        Numbers.show(unit.fromKelvin(p.lowestKelvin())),
                        Numbers.show(unit.fromKelvin(p.highestKelvin())), unit.symbol(), a + " + " + b));
            }
            if (!p.containsRatio(x)) {
                out.add(new Violation(Problem.OUTSIDE_PAIR_COMPOSITION, a + " + " + b, "x(" + a + ")/(x(" + a + ") + x(" + b
                        + "))", Numbers.show(p.ratio(x)), Numbers.show(p.lowestRatio()),
                        Numbers.show(p.highestRatio())));
            }
        }
        return out;
    }

    /** Whether the temperature lies inside the card's range and the ranges of every pair present at x. */
    static boolean insideTemperature(Card card, double[] x, double kelvin) {
        if (!card.validity().containsTemperature(kelvin)) {
            return false;
        }
        for (Validity.PairLimit p : card.validity().pairLimits()) {
            if (x[p.first()] > 0.0 && x[p.second()] > 0.0 && !p.containsTemperature(kelvin)) {
                return false;
            }
        }
        return true;
    }

    /** The pure density of component k in kg/m³, refused when not positive and finite. */
    static double pureDensityAt(Card card, int k, double kelvin, double t) {
        card.requireRealPure(k);
        double rho = card.components().get(k).density().at(kelvin);
        if (!(rho > 0.0) || Double.isInfinite(rho)) {
            throw nonPhysical(card, t, "density of " + card.components().get(k).name(), rho);
        }
        return rho;
    }

    /** The mixture's density in kg/m³, refused when not positive and finite. */
    static double physicalDensity(Card card, double[] x, double kelvin, double t) {
        double rho = card.mixture().density(x, kelvin);
        if (!(rho > 0.0) || Double.isInfinite(rho)) {
            throw nonPhysical(card, t, "mixture density", rho);
        }
        return rho;
    }

    /** The refusal of a quantity that is not physical (not finite, or not positive where it must be) at t. */
    static MiscelaException nonPhysical(Card card, double t, String what, double value) {
        return Problem.NON_PHYSICAL.raise(Numbers.show(t), card.units().temperature().symbol(), what,
                Numbers.show(value));
    }
}
