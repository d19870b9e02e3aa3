package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.problem.MiscelaException;

/**
 * The boiling temperature the temperature-rise functions hold a batch to: the card's stated boiling points where it
 * has them (data at the batch's pressure); else, on a card with G^E/RT and every present liquid's vapour pressure, the
 * blend's bubble point at 1 atm (101.325 kPa: an open vessel), by modified Raoult's law, extrapolated beyond the
 * card's range where the blend boils above it; else unknown (NaN).
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
            // no bubble point inside the card's range: if the blend's vapour already exceeds 1 atm at the range's
            // lowest temperature it boils below the range, so that temperature is the limit (a batch inside the
            // range is past it); otherwise it boils above the range: the bubble point found by extrapolating the
            // card's G^E and vapour pressures (as far as MIX.BUBBLEPOINT extrapolates) is a better limit for an
            // extrapolated rise than none; unknown when even that finds none
            double lowest = card.validity().lowestKelvin();
            try {
                if (card.mixture().bubblePressure(x, lowest, null) >= OPEN_VESSEL_PASCAL) {
                    return lowest;
                }
                return aboveRange(card, x);
            } catch (MiscelaException unknown) {
                return Double.NaN;
            }
        }
    }

    /**
     * The bubble point at 1 atm above the card's highest temperature, within {@link PhaseFunctions#EXTRAPOLATION_KELVIN}
     * of it and inside the ranges the vapour-pressure constants state (Brent's method to 10⁻⁶ K); NaN when none lies
     * there.
     */
    private static double aboveRange(Card card, double[] x) {
        double highest = card.validity().highestKelvin();
        double[] range = PhaseFunctions.withinVapourRanges(card, x, highest,
                highest + PhaseFunctions.EXTRAPOLATION_KELVIN);
        if (!(range[1] > range[0])) {
            return Double.NaN;
        }
        java.util.function.DoubleUnaryOperator excess = tk -> card.mixture().bubblePressure(x, tk, null)
                - OPEN_VESSEL_PASCAL;
        double lo = excess.applyAsDouble(range[0]);
        double hi = excess.applyAsDouble(range[1]);
        if (!(lo < 0.0 && hi > 0.0)) {
            return Double.NaN;
        }
        return new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-12, 1e-6)
                .solve(200, excess::applyAsDouble, range[0], range[1]);
    }

    /**
     * The words naming where {@link #kelvinAt}'s limit came from, for refusals and the trace: the card's stated
     * points, the bubble point at 1 atm, or the card's lowest temperature when the blend boils at or below it.
     */
    public static String source(Card card, double[] x, double kelvin) {
        if (!fromBubblePoint(card, x)) {
            return "the card's 'boiling temperatures'";
        }
        if (kelvin > card.validity().highestKelvin()) {
            return "its bubble point at 1 atm from the card's G^E and vapour pressures, extrapolated above the card's "
                    + "highest temperature";
        }
        return kelvin == card.validity().lowestKelvin() ? "its bubble point at 1 atm is at or below the card's lowest "
                + "temperature, the limit used" : "its bubble point at 1 atm from the card's G^E and vapour pressures";
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
