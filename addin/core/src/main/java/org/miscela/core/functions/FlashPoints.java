package org.miscela.core.functions;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Units;
import org.miscela.core.model.VapourPressure;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * The flash point of a liquid blend by the vapour–liquid model of H.-J. Liaw and co-workers (H.-J. Liaw, Y.-H. Lee,
 * C.-L. Tang, H.-H. Hsu, J. Loss Prev. Process Ind. 15 (2002) 429; for aqueous blends Liaw and Chiu, J. Hazard.
 * Mater. (2003), its details from memory; the equation as described by Vidal et al., Process Saf. Environ. Prot. 84
 * (2006) 1): Le Chatelier's rule over the flammable components, each one's share of the vapour measured against the
 * vapour pressure it has at its own flash point, with modified Raoult's law for the
 * vapour:
 *
 * <p>Σ_{i flammable} x_i·γ_i(x, T)·p_i*(T) / p_i*(T_fp,i) = 1.
 *
 * <p>A liquid without a flash point but with a lower flammable limit L (volume fraction in air) takes L·p, p = 1 atm,
 * for p_i*(T_fp,i): its vapour flashes where it reaches that limit (the same Le Chatelier rule; closed-cup flash
 * points lie a few kelvin above that temperature, so the measured flash point, where the card has it, comes first).
 *
 * <p>Components whose 'flash point' row says none (water) only dilute. γ comes from the card's G^E, or is 1 when the
 * caller asks for the ideal-solution estimate explicitly. The result is an estimate of a closed-cup flash point (the
 * pure flash points on the card should be closed-cup values); measured values and local codes prevail.
 */
public final class FlashPoints {
    /** The flash-point search stops when the temperature is known to 10⁻⁹ K. */
    private static final double ACCURACY_KELVIN = 1e-9;
    /** Compositions scanned for a minimum flash point, between the ends. */
    static final int MINIMUM_SCAN = 200;

    private FlashPoints() {
    }

    /** The blend's flash point in the card's temperature unit. */
    public static double flashPoint(Card card, double[] x, boolean ideal, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double[] reference = referencePressures(card, z, e);
        Units.Temperature tu = card.units().temperature();
        double[] range = range(card, z, e);
        double lo = range[0];
        double hi = range[1];
        double fLo = residual(card, z, reference, lo, ideal);
        double fHi = residual(card, z, reference, hi, ideal);
        if (!(hi > lo) || !(fLo <= 0.0 && fHi >= 0.0)) {
            throw Problem.NO_FLASH_POINT.raise(Numbers.show(tu.fromKelvin(lo)), Numbers.show(tu.fromKelvin(hi)),
                    tu.symbol(), Numbers.show(Math.exp(fLo)), Numbers.show(Math.exp(fHi)));
        }
        BrentSolver solver = new BrentSolver(1e-15, ACCURACY_KELVIN);
        double kelvin = fLo == 0.0 ? lo : fHi == 0.0 ? hi
                : solver.solve(200, tk -> residual(card, z, reference, tk, ideal), lo, hi);
        double t = tu.fromKelvin(kelvin);
        PhaseFunctions.checkVapourPoint(card, z, t, e, !ideal);
        return t;
    }

    /**
     * A minimum flash point of a two-component blend: the composition x1 (or, with {@code temperature}, the flash
     * point) where the blend flashes lower than both pure liquids, found by a scan of {@value #MINIMUM_SCAN}
     * compositions and a golden-section refinement; refused with words when the flash point falls steadily towards
     * one end (a pure liquid that does not flash counts as flashing at no temperature).
     */
    public static double minimum(Card card, boolean temperature, boolean ideal, Extrapolation e) {
        if (card.componentCount() != 2) {
            throw Problem.NOT_BINARY_FLASH.raise(card.componentCount());
        }
        java.util.function.DoubleUnaryOperator f = x1 -> flashPoint(card, new double[] {x1, 1 - x1}, ideal, e);
        double[] ends = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        for (int end = 0; end < 2; end++) {
            if (Double.isFinite(card.flashPointKelvin(end))) {
                ends[end] = f.applyAsDouble(end == 0 ? 1.0 : 0.0);
            }
        }
        double bestX = Double.NaN;
        double best = Double.POSITIVE_INFINITY;
        for (int s = 1; s < MINIMUM_SCAN; s++) {
            double x1 = (double) s / MINIMUM_SCAN;
            double t = f.applyAsDouble(x1);
            if (t < best) {
                best = t;
                bestX = x1;
            }
        }
        // golden section between the scan's neighbours of the lowest point
        double a = Math.max(0.0, bestX - 1.0 / MINIMUM_SCAN);
        double b = Math.min(1.0, bestX + 1.0 / MINIMUM_SCAN);
        double g = (Math.sqrt(5) - 1) / 2;
        for (int i = 0; i < 60; i++) {
            double c = b - g * (b - a);
            double d = a + g * (b - a);
            if (f.applyAsDouble(c) < f.applyAsDouble(d)) {
                b = d;
            } else {
                a = c;
            }
        }
        bestX = (a + b) / 2;
        best = f.applyAsDouble(bestX);
        double lowestEnd = Math.min(ends[0], ends[1]);
        Units.Temperature tu = card.units().temperature();
        if (!(best < lowestEnd - 1e-6 * (1 + Math.abs(lowestEnd)))) {
            int end = ends[0] <= ends[1] ? 0 : 1;
            throw Problem.NO_FLASH_MINIMUM.raise(card.components().get(end).name(), Numbers.show(ends[end]),
                    tu.symbol());
        }
        return temperature ? best : bestX;
    }

    /**
     * The search range: the card's validity and the present components' vapour-pressure ranges; allowed to
     * extrapolate, {@link PhaseFunctions#EXTRAPOLATION_KELVIN} K beyond the validity at each end, within the
     * vapour-pressure constants' own ranges where they state one.
     */
    private static double[] range(Card card, double[] z, Extrapolation e) {
        if (!card.mayExtrapolate(e)) {
            return PhaseFunctions.searchRange(card, z, e);
        }
        return PhaseFunctions.withinVapourRanges(card, z,
                Math.max(1.0, card.validity().lowestKelvin() - PhaseFunctions.EXTRAPOLATION_KELVIN),
                card.validity().highestKelvin() + PhaseFunctions.EXTRAPOLATION_KELVIN);
    }

    /**
     * Component k's vapour pressure at its flash point, Pa: p_k*(T_fp,k) from its 'flash point' row, or L·(1 atm)
     * from its 'lower flammable limit' row when it has no flash point; +∞ for a liquid marked as not flashing, NaN
     * when the card has neither row.
     */
    static double referencePascal(Card card, int k) {
        double fp = card.flashPointKelvin(k);
        if (Double.isInfinite(fp)) {
            return fp;
        }
        if (Double.isNaN(fp)) {
            return card.lowerFlammableLimit(k) * BoilingPoints.OPEN_VESSEL_PASCAL;
        }
        return card.mixture().vapourPressure(k, fp);
    }

    /**
     * p_i*(T_fp,i) in Pa for each flammable component present (NaN for the others); refused with words when a
     * present component has no 'flash point' row, or none of them flashes.
     */
    private static double[] referencePressures(Card card, double[] z, Extrapolation e) {
        double[] out = new double[z.length];
        boolean any = false;
        StringBuilder inert = new StringBuilder();
        for (int k = 0; k < z.length; k++) {
            out[k] = Double.NaN;
            if (z[k] == 0.0) {
                continue;
            }
            String name = card.components().get(k).name();
            double fp = card.flashPointKelvin(k);
            if (Double.isNaN(fp) && Double.isNaN(card.lowerFlammableLimit(k))) {
                throw Problem.NO_FLASH_POINT_ROW.raise(name);
            }
            if (Double.isInfinite(fp)) {
                inert.append(inert.length() == 0 ? "" : ", ").append(name);
                continue;
            }
            VapourPressure p = card.vapourPressure(k);
            if (p == null) {
                throw Problem.NO_VAPOUR_PRESSURE.raise(name);
            }
            if (!Double.isNaN(fp) && !card.mayExtrapolate(e) && p.hasRange()
                    && (fp < p.lowestKelvin() || fp > p.highestKelvin())) {
                Units.Temperature tu = card.units().temperature();
                throw Problem.OUTSIDE_VAPOUR_PRESSURE.raise(Numbers.show(tu.fromKelvin(fp)), tu.symbol(),
                        Numbers.show(tu.fromKelvin(p.lowestKelvin())), Numbers.show(tu.fromKelvin(p.highestKelvin())),
                        tu.symbol(), name);
            }
            out[k] = referencePascal(card, k);
            any = true;
        }
        if (!any) {
            throw Problem.NOT_FLAMMABLE.raise(inert);
        }
        return out;
    }

    /** ln Σ x_i γ_i p_i*(T)/p_i*(T_fp,i) over the flammable components: negative below the flash point. */
    private static double residual(Card card, double[] z, double[] reference, double kelvin, boolean ideal) {
        double[] lnGamma = new double[z.length];
        if (!ideal) {
            card.mixture().logActivityCoefficients(z, kelvin, lnGamma);
        }
        double sum = 0.0;
        for (int k = 0; k < z.length; k++) {
            if (!Double.isNaN(reference[k])) {
                sum += z[k] * Math.exp(lnGamma[k]) * card.vapourPressure(k).pascal(kelvin) / reference[k];
            }
        }
        return Math.log(sum);
    }
}
