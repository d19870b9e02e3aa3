package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.problem.MiscelaException;

/**
 * The boiling temperature the temperature-rise functions hold a batch to: the card's stated boiling points where it
 * has them (data at the batch's pressure); else, on a card with G^E/RT and every present liquid's vapour pressure, the
 * blend's bubble point at 1 atm (101.325 kPa: an open vessel), by modified Raoult's law; else unknown (NaN).
 */
public final class BoilingPoints {
    /** The pressure of an open vessel, Pa (1 atm, exact). */
    public static final double OPEN_VESSEL_PASCAL = 101325.0;

    private BoilingPoints() {
    }

    /** The blend's boiling temperature in K, or NaN where neither the card's points nor its phase data give one. */
    public static double kelvinAt(Card card, double[] x) {
        if (card.boiling() != null) {
            return card.boiling().kelvinAt(x);
        }
        if (!fromBubblePoint(card, x)) {
            return Double.NaN;
        }
        try {
            double t = PhaseFunctions.bubblePoint(card, x, card.pressureUnit().fromPascal(OPEN_VESSEL_PASCAL),
                    Extrapolation.AS_CARD);
            return card.units().temperature().toKelvin(t);
        } catch (MiscelaException outside) {
            return Double.NaN; // no bubble point inside the card's range: unknown, as outside stated points
        }
    }

    /** Whether the boiling temperature comes from the bubble point (no stated points; G^E and vapour pressures). */
    public static boolean fromBubblePoint(Card card, double[] x) {
        if (card.boiling() != null || card.excessGibbs() == null || card.pressureUnit() == null) {
            return false;
        }
        for (int k = 0; k < x.length; k++) {
            if (x[k] > 0.0 && card.vapourPressure(k) == null) {
                return false;
            }
        }
        return true;
    }
}
