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

/** The final temperature of an adiabatic mixing: a root of the batch's energy balance, bracketed and then solved. */
final class AdiabaticRise {
    /** How far the adiabatic search may move from the start temperature, in K. */
    private static final double SEARCH_SPAN = 2000.0;
    /** The evaluations of the heat balance the final temperature's search may use. */
    static final int BALANCE_EVALUATIONS = 200;

    private AdiabaticRise() {
    }

    /**
     * {@link CardFunctions#adiabaticRise}, in degrees of the card's temperature scale: the balance
     * Σ n_k ∫_T^T_f Cp_k dT + N·H^E(x, T_f) = 0 is bracketed by steps doubling away from T (at most
     * {@link #SEARCH_SPAN} K) on the side the heat of mixing drives the batch, then solved by Brent's method; T_f must
     * lie inside the card's validity range unless it may extrapolate.
     */
    static double of(Card card, double[] amounts, AmountBasis basis, double t, Extrapolation e) {
        double[] n = CardFunctions.amountsToMoles(card, amounts, basis, t, e);
        double total = 0.0;
        for (double v : n) {
            total += v;
        }
        double[] x = CardFunctions.moleFractions(card, CardFunctions.scaled(n, 1.0 / total));
        double start = PointChecks.checkPoint(card, x, t, e);
        Mixture m = card.mixture();
        for (int k = 0; k < n.length; k++) {
            m.heatCapacity(k);
        }
        final double moles = total;
        UnivariateFunction balance = tf -> {
            double h = moles * m.excessEnthalpy(x, tf);
            for (int k = 0; k < n.length; k++) {
                h += n[k] * m.heatCapacity(k).enthalpyChange(start, tf);
            }
            if (!Double.isFinite(h)) {
                // The polynomials overflow (temperatures or amounts near the double range): no root to bracket.
                throw Problem.NO_TEMPERATURE_ROOT.raise(Numbers.show(Math.min(start, tf)),
                        Numbers.show(Math.max(start, tf)));
            }
            return h;
        };
        double f0 = balance.value(start);
        double end;
        if (f0 == 0.0) {
            end = start;
        } else {
            // Heat released (f0 < 0) warms the batch, heat absorbed cools it: bracket on that side.
            double direction = f0 < 0.0 ? 1.0 : -1.0;
            double step = 1.0;
            double far = start + direction * step;
            while (Math.signum(balance.value(far)) == Math.signum(f0)) {
                step *= 2.0;
                far = start + direction * step;
                if (step > SEARCH_SPAN || far <= 1.0) {
                    // (the search may have stepped below 0 K; the range worth naming starts at 0 K)
                    throw Problem.NO_TEMPERATURE_ROOT.raise(Numbers.show(Math.max(0.0, Math.min(start, far))),
                            Numbers.show(Math.max(start, far)));
                }
            }
            end = finalTemperature(balance, Math.min(start, far), Math.max(start, far), BALANCE_EVALUATIONS);
        }
        if (!card.mayExtrapolate(e) && !PointChecks.insideTemperature(card, x, end)) {
            Units.Temperature unit = card.units().temperature();
            Validity v = card.validity();
            throw Problem.OUTSIDE_FINAL_TEMPERATURE.raise(Numbers.show(unit.fromKelvin(end)), unit.symbol(),
                    Numbers.show(unit.fromKelvin(v.lowestKelvin())), Numbers.show(unit.fromKelvin(v.highestKelvin())),
                    unit.symbol());
        }
        double cp = m.heatCapacity(x, end);
        if (!(cp > 0.0)) {
            throw PointChecks.nonPhysical(card, card.units().temperature().fromKelvin(end), "mixture heat capacity",
                    cp);
        }
        return card.units().temperature().differenceFromKelvin(end - start);
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
