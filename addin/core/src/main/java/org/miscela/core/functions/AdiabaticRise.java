package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Mixture;
import org.miscela.core.card.Units;
import org.miscela.core.card.Validity;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * The final temperature of an adiabatic mixing: a root of the batch's energy balance, bracketed and then solved.
 *
 * <p>The balance takes the blend's enthalpy from a reference temperature T0 (the feeds' mole-weighted mean): the
 * pure feeds are brought from their own temperatures to T0, mixed there (N·H^E(x, T0)), and the blend is warmed to
 * T_f with its own heat capacity ({@link Mixture#heatCapacity}: the card's solution model, or the pure liquids' plus
 * ∂H^E/∂T); a vessel warms with the batch and the heat removed leaves it:
 *
 * <pre>
 *   N·H^E(x, T0) + N·∫_T0^T_f Cp_blend dT − Σ_k n_k·∫_T0^T_k Cp_k dT + C_vessel·(T_f − T_vessel) + Q_removed = 0
 * </pre>
 *
 * Without a solution model and with every feed at T this is Σ_k n_k·∫_T^T_f Cp_k dT + N·H^E(x, T_f) = 0 exactly, the
 * balance of the pure liquids warmed to T_f and mixed there.
 */
final class AdiabaticRise {
    /** How far the adiabatic search may move from the start temperature, in K. */
    private static final double SEARCH_SPAN = 2000.0;
    /** The evaluations of the heat balance the final temperature's search may use. */
    static final int BALANCE_EVALUATIONS = 200;

    private AdiabaticRise() {
    }

    /**
     * {@link CardFunctions#adiabaticRise}, in degrees of the card's temperature scale: every feed at t, no vessel, no
     * heat removed; T_f must lie inside the card's validity range unless it may extrapolate.
     */
    static double of(Card card, double[] amounts, AmountBasis basis, double t, Extrapolation e, boolean boiling) {
        double[] n = CardFunctions.amountsToMoles(card, amounts, basis, t, e);
        double start = PointChecks.checkTemperature(card, t, e);
        int[] components = new int[n.length];
        double[] feeds = new double[n.length];
        for (int k = 0; k < n.length; k++) {
            components[k] = k;
            feeds[k] = start;
        }
        double end = finalKelvin(card, components, n, feeds, 0.0, start, 0.0, e, boiling);
        return card.units().temperature().differenceFromKelvin(end - start);
    }

    /**
     * The final temperature (K) of the charges {@code chargeMoles} of components {@code components}, each fed at its
     * {@code feedKelvin}, with a vessel of heat capacity {@code vessel} (J/K) starting at {@code vesselKelvin} and
     * {@code removed} J taken away (negative: added); refused outside the card's validity range unless it may
     * extrapolate, and at or above the boiling temperature the card states unless {@code boiling} accepts it. The
     * balance is bracketed by steps doubling away from T0 (at most {@link #SEARCH_SPAN} K) on the side it drives the
     * batch, then solved by Brent's method.
     */
    static double finalKelvin(Card card, int[] components, double[] chargeMoles, double[] feedKelvin, double vessel,
            double vesselKelvin, double removed, Extrapolation e, boolean boiling) {
        card.mixture().enthalpy(); // NO_ENTHALPY first, also for a batch of one pure liquid
        double[] n = new double[card.componentCount()];
        double total = 0.0;
        for (int c = 0; c < components.length; c++) {
            n[components[c]] += chargeMoles[c];
            total += chargeMoles[c];
        }
        double mean = 0.0;
        for (int c = 0; c < components.length; c++) {
            // the mole-weighted mean, each share taken first (Σ n·T would overflow for amounts near the double range)
            mean += chargeMoles[c] / total * feedKelvin[c];
        }
        final double reference = mean;
        double[] x = CardFunctions.moleFractions(card, CardFunctions.scaled(n, 1.0 / total));
        Units.Temperature unit = card.units().temperature();
        boolean pure = Mixture.pureComponent(x) >= 0;
        if (pure) {
            PointChecks.checkTemperature(card, unit.fromKelvin(reference), e);
        } else {
            PointChecks.checkPoint(card, x, unit.fromKelvin(reference), e);
        }
        Mixture m = card.mixture();
        for (int k = 0; k < n.length; k++) {
            m.heatCapacity(k);
        }
        final double moles = total;
        final double mixing = pure ? 0.0 : moles * m.excessEnthalpy(x, reference);
        double feedsToReference = 0.0;
        for (int c = 0; c < components.length; c++) {
            if (chargeMoles[c] > 0.0) {
                feedsToReference += chargeMoles[c]
                        * m.heatCapacity(components[c]).enthalpyChange(reference, feedKelvin[c]);
            }
        }
        final double fed = feedsToReference;
        UnivariateFunction balance = tf -> {
            double h = mixing + moles * m.heating(x, reference, tf) - fed + vessel * (tf - vesselKelvin) + removed;
            if (!Double.isFinite(h)) {
                // The polynomials overflow (temperatures or amounts near the double range): no root to bracket.
                throw Problem.NO_TEMPERATURE_ROOT.raise(Numbers.show(Math.min(reference, tf)),
                        Numbers.show(Math.max(reference, tf)));
            }
            return h;
        };
        double f0 = balance.value(reference);
        double end;
        if (f0 == 0.0) {
            end = reference;
        } else {
            // Heat released (f0 < 0) warms the batch, heat absorbed cools it: bracket on that side.
            double direction = f0 < 0.0 ? 1.0 : -1.0;
            double step = 1.0;
            double far = reference + direction * step;
            while (Math.signum(balance.value(far)) == Math.signum(f0)) {
                step *= 2.0;
                far = reference + direction * step;
                if (step > SEARCH_SPAN || far <= 1.0) {
                    // (the search may have stepped below 0 K; the range worth naming starts at 0 K)
                    throw Problem.NO_TEMPERATURE_ROOT.raise(Numbers.show(Math.max(0.0, Math.min(reference, far))),
                            Numbers.show(Math.max(reference, far)));
                }
            }
            end = finalTemperature(balance, Math.min(reference, far), Math.max(reference, far), BALANCE_EVALUATIONS);
        }
        double boils = BoilingPoints.kelvinAt(card, x);
        if (!boiling && end >= boils) {
            throw Problem.BOILS.raise(Numbers.show(unit.fromKelvin(end)), unit.symbol(),
                    Numbers.show(unit.fromKelvin(boils)), unit.symbol(), BoilingPoints.source(card, x, boils));
        }
        if (!card.mayExtrapolate(e) && !(pure ? card.validity().containsTemperature(end)
                : PointChecks.insideTemperature(card, x, end))) {
            Validity v = card.validity();
            throw Problem.OUTSIDE_FINAL_TEMPERATURE.raise(Numbers.show(unit.fromKelvin(end)), unit.symbol(),
                    Numbers.show(unit.fromKelvin(v.lowestKelvin())), Numbers.show(unit.fromKelvin(v.highestKelvin())),
                    unit.symbol());
        }
        double cp = m.heatCapacity(x, end);
        if (!(cp > 0.0)) {
            throw PointChecks.nonPhysical(card, unit.fromKelvin(end), "mixture heat capacity", cp);
        }
        return end;
    }

    /**
     * The root of the heat balance between lo and hi (K), where its signs differ: Brent's method, to 1e-9 K, within so
     * many evaluations. The bracket the temperature rise passes is at most 1024 K wide (its search doubles the step up
     * to SEARCH_SPAN), which bisection alone narrows in 40 steps, and the balance's non-finite values are refused
     * before (NO_TEMPERATURE_ROOT); no input is known that makes the solver fail within the 200 evaluations it allows.
     * Should it fail all the same, that is a catalogued refusal (NO_CONVERGENCE, Err:523 in Calc), never an exception
     * of the solver's own.
     */
    static double finalTemperature(UnivariateFunction balance, double lo, double hi, int evaluations) {
        try {
            return new BrentSolver(1e-12, 1e-9).solve(evaluations, balance, lo, hi);
        } catch (TooManyEvaluationsException | NoBracketingException e) {
            throw Problem.NO_CONVERGENCE.raise("the final temperature between " + Numbers.show(lo) + " and "
                    + Numbers.show(hi) + " K", e instanceof NoBracketingException ? "the heat balance has the same "
                    + "sign at both ends" : "no root within " + evaluations + " evaluations of the heat balance");
        }
    }
}
