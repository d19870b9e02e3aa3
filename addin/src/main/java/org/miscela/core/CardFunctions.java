package org.miscela.core;

/**
 * The cell functions' arithmetic, one method per function: arguments and results in the card's own units, every
 * argument and the validity range checked, every result finite or a {@link MiscelaException}.
 * Components are numbered from 0 here.
 */
public final class CardFunctions {
    /** The text {@link #check} returns for a card (and point) with nothing to report. */
    public static final String OK = "OK";

    private CardFunctions() {
    }

    public static double excessMolarVolume(Card card, double x1, double t, Extrapolation e) {
        BinaryMixture m = card.binary();
        double kelvin = checkPoint(card, m, x1, t, e);
        return volumeOut(card, m.excessMolarVolume(x1, kelvin), t);
    }

    public static double partialMolarVolume(Card card, int component, double x1, double t, Extrapolation e) {
        BinaryMixture m = card.binary();
        double kelvin = checkPoint(card, m, x1, t, e);
        return volumeOut(card, m.partialMolarVolume(component, x1, kelvin), t);
    }

    public static double partialExcessMolarVolume(Card card, int component, double x1, double t, Extrapolation e) {
        BinaryMixture m = card.binary();
        double kelvin = checkPoint(card, m, x1, t, e);
        return volumeOut(card, m.partialExcessMolarVolume(component, x1, kelvin), t);
    }

    public static double molarVolume(Card card, double x1, double t, Extrapolation e) {
        BinaryMixture m = card.binary();
        double kelvin = checkPoint(card, m, x1, t, e);
        double v = m.molarVolume(x1, kelvin);
        if (!(v > 0.0) || Double.isInfinite(v)) {
            throw nonPhysical(card, t, "molar volume", v);
        }
        return card.units().molarVolume().fromCm3PerMol(v);
    }

    public static double density(Card card, double x1, double t, Extrapolation e) {
        BinaryMixture m = card.binary();
        double kelvin = checkPoint(card, m, x1, t, e);
        double rho = m.density(x1, kelvin);
        if (!(rho > 0.0) || Double.isInfinite(rho)) {
            throw nonPhysical(card, t, "mixture density", rho);
        }
        return card.units().density().fromKgPerM3(rho);
    }

    /** Density of one pure component (any number of components on the card). */
    public static double pureDensity(Card card, int component, double t, Extrapolation e) {
        double kelvin = checkTemperature(card, t, e);
        return card.units().density().fromKgPerM3(pureDensityAt(card, component, kelvin, t));
    }

    /**
     * Index of a component given by its 1-based number as a user counts.
     */
    public static int componentByNumber(Card card, double number) {
        int n = card.componentCount();
        if (number != Math.rint(number) || number < 1 || number > n) {
            throw Problem.UNKNOWN_COMPONENT_ARG.raise(Numbers.show(number), n, card.componentNames());
        }
        return (int) number - 1;
    }

    /** Index of a component given by its name on the card (case ignored). */
    public static int componentByName(Card card, String name) {
        int i = card.indexOf(name);
        if (i < 0) {
            throw Problem.UNKNOWN_COMPONENT_ARG.raise("\"" + name.trim() + "\"", card.componentCount(),
                    card.componentNames());
        }
        return i;
    }

    /**
     * "OK" when a binary calculation at (x1, t) would succeed, otherwise the message that explains why it would not.
     * Pass NaN for x1 and t to check only the card.
     */
    public static String check(Card card, double x1, double t, Extrapolation e) {
        try {
            card.binary();
            if (Double.isNaN(x1) != Double.isNaN(t)) {
                throw Problem.CHECK_NEEDS_BOTH.raise();
            }
            if (!Double.isNaN(x1)) {
                density(card, x1, t, e);
            }
            return OK;
        } catch (MiscelaException ex) {
            return ex.getMessage();
        }
    }

    // --- checks shared by every function

    private static double checkPoint(Card card, BinaryMixture m, double x1, double t, Extrapolation e) {
        if (Double.isNaN(x1) || Double.isInfinite(x1)) {
            throw Problem.ARG_NOT_FINITE.raise("mole fraction");
        }
        if (x1 < 0.0 || x1 > 1.0) {
            throw Problem.MOLE_FRACTION_OUTSIDE_UNIT.raise(Numbers.show(x1));
        }
        double kelvin = checkTemperature(card, t, e);
        if (!card.mayExtrapolate(e)) {
            Validity v = card.validity();
            for (int k = 0; k < 2; k++) {
                double x = k == 0 ? x1 : 1.0 - x1;
                if (!v.containsFraction(k, x)) {
                    throw Problem.OUTSIDE_COMPOSITION.raise(m.component(k).name(), Numbers.show(x),
                            Numbers.show(v.lowestFraction(k)), Numbers.show(v.highestFraction(k)));
                }
            }
        }
        for (int k = 0; k < 2; k++) {
            pureDensityAt(card, k, kelvin, t);
        }
        return kelvin;
    }

    private static double checkTemperature(Card card, double t, Extrapolation e) {
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

    private static double pureDensityAt(Card card, int k, double kelvin, double t) {
        double rho = card.components().get(k).density().at(kelvin);
        if (!(rho > 0.0) || Double.isInfinite(rho)) {
            throw nonPhysical(card, t, "density of " + card.components().get(k).name(), rho);
        }
        return rho;
    }

    private static double volumeOut(Card card, double cm3PerMol, double t) {
        if (Double.isNaN(cm3PerMol) || Double.isInfinite(cm3PerMol)) {
            throw nonPhysical(card, t, "volume", cm3PerMol);
        }
        return card.units().molarVolume().fromCm3PerMol(cm3PerMol);
    }

    private static MiscelaException nonPhysical(Card card, double t, String what, double value) {
        return Problem.NON_PHYSICAL.raise(Numbers.show(t), card.units().temperature().symbol(), what,
                Numbers.show(value));
    }
}
