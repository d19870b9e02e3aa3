package org.miscela.core.functions;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Units;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * The temperature of a batch along its order of addition: a sequence of charges (a component, an amount, the
 * temperature it is fed at), the first already in the vessel, each of the others added gradually in turn. The batch
 * is taken as well stirred, at constant pressure, exchanging no heat but the heat removed, which leaves in proportion
 * to the amount added. Since enthalpy is a function of state, the temperature after any part of the addition is the
 * adiabatic temperature of everything charged so far ({@link AdiabaticRise#finalKelvin}); the path is that temperature
 * at evenly spaced points of each charge, and its peak is refined between the points by Brent's method.
 *
 * <p>The end of the path is the batch's own result: with every feed at one temperature and nothing removed it is
 * MIX.TEMPERATURERISE's final temperature, whatever the order.
 */
public final class TemperaturePath {
    /** The most points a charge may be divided into. */
    public static final int MOST_STEPS = 1000;

    /** What the path function returns. */
    public enum Output {
        PATH("path"), PEAK("peak"), PEAK_AT("peak at"), FINAL("final"), COOLING("cooling");

        private final String word;

        Output(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }

        /** The output named {@code text} (case and surrounding spaces ignored). */
        public static Output lookup(String text) {
            String t = text == null ? "" : text.trim();
            StringBuilder all = new StringBuilder();
            for (Output o : values()) {
                if (o.word.equalsIgnoreCase(t)) {
                    return o;
                }
                all.append(all.length() == 0 ? "" : ", ").append(o.word);
            }
            throw Problem.UNKNOWN_FIT_OUTPUT.raise(t, all);
        }
    }

    private final Card card;
    private final int[] components;
    private final double[] moles;
    private final double[] amounts;
    private final double[] feedKelvin;
    private final double vessel;
    private final double removed;
    private final Extrapolation e;
    private final boolean boiling;
    private final double totalAdded;

    /**
     * @param components each charge's component, in charging order (the first in the vessel at the start)
     * @param amounts each charge's amount in {@code basis}, zero or more
     * @param temperatures each charge's feed temperature in the card's unit
     * @param vesselHeatCapacity the vessel's heat capacity in the card's energy unit per degree (0: none)
     * @param heatRemoved the heat removed over the whole addition in the card's energy unit (negative: supplied)
     * @param boiling whether a point at or above the card's boiling temperature is accepted (else refused)
     */
    public TemperaturePath(Card card, int[] components, double[] amounts, AmountBasis basis, double[] temperatures,
            double vesselHeatCapacity, double heatRemoved, Extrapolation e, boolean boiling) {
        if (components.length == 0 || amounts.length != components.length
                || temperatures.length != components.length) {
            throw Problem.DATA_LENGTH.raise("amounts", amounts.length, "charges", components.length);
        }
        card.mixture().enthalpy(); // a card without excess enthalpy gives no path: NO_ENTHALPY, in words
        this.card = card;
        this.components = components.clone();
        this.amounts = amounts.clone();
        this.e = e;
        this.boiling = boiling;
        this.moles = new double[components.length];
        this.feedKelvin = new double[components.length];
        double added = 0.0;
        for (int c = 0; c < components.length; c++) {
            feedKelvin[c] = PointChecks.checkTemperature(card, temperatures[c], e);
            String name = card.components().get(components[c]).name();
            if (!Double.isFinite(amounts[c])) {
                throw Problem.ARG_NOT_FINITE.raise("amount of " + name);
            }
            if (amounts[c] < 0.0) {
                throw Problem.AMOUNT_NEGATIVE.raise(name, Numbers.show(amounts[c]));
            }
            double[] one = new double[card.componentCount()];
            one[components[c]] = amounts[c];
            moles[c] = amounts[c] == 0.0 ? 0.0
                    : CardFunctions.amountsToMoles(card, one, basis, temperatures[c], e)[components[c]];
            if (c > 0) {
                added += amounts[c];
            }
        }
        if (!(moles[0] > 0.0)) {
            throw Problem.PATH_EMPTY_VESSEL.raise(card.components().get(components[0]).name());
        }
        this.totalAdded = added;
        Units.Temperature unit = card.units().temperature();
        double perKelvin = unit.toPerKelvin(card.units().enthalpy().toJoulePerMol(vesselHeatCapacity), 1);
        if (!Double.isFinite(perKelvin) || perKelvin < 0.0) {
            throw Problem.ARG_NOT_FINITE.raise("vessel heat capacity (zero or more)");
        }
        double joules = card.units().enthalpy().toJoulePerMol(heatRemoved);
        if (!Double.isFinite(joules)) {
            throw Problem.ARG_NOT_FINITE.raise("heat removed");
        }
        this.vessel = perKelvin;
        this.removed = joules;
    }

    /**
     * The temperature (K) once the charges before {@code charge} and the fraction {@code s} of it are in the vessel.
     */
    double kelvinAt(int charge, double s) {
        double[] charged = new double[charge + 1];
        double added = 0.0;
        for (int c = 0; c <= charge; c++) {
            double part = c == charge && c > 0 ? s : 1.0;
            charged[c] = moles[c] * part;
            if (c > 0) {
                added += amounts[c] * part;
            }
        }
        double share = totalAdded > 0.0 ? added / totalAdded : 0.0;
        return AdiabaticRise.finalKelvin(card, java.util.Arrays.copyOf(components, charge + 1), charged,
                java.util.Arrays.copyOf(feedKelvin, charge + 1), vessel, feedKelvin[0], removed * share, e, boiling);
    }

    /** The temperature (card unit) once every charge is in: the batch's own adiabatic result. */
    public double end() {
        return card.units().temperature().fromKelvin(kelvinAt(components.length - 1, 1.0));
    }

    /**
     * The path: one row per point, the amount added so far (in the amounts' unit, the first charge not counted) and
     * the temperature in the card's unit; the first row is the vessel's first charge, then {@code steps} points per
     * further charge, the last at its end.
     */
    public double[][] path(int steps) {
        checkSteps(steps);
        Units.Temperature unit = card.units().temperature();
        double[][] rows = new double[1 + (components.length - 1) * steps][];
        rows[0] = new double[] {0.0, unit.fromKelvin(kelvinAt(0, 1.0))};
        double before = 0.0;
        int r = 1;
        for (int c = 1; c < components.length; c++) {
            for (int i = 1; i <= steps; i++) {
                double s = (double) i / steps;
                rows[r++] = new double[] {before + amounts[c] * s, unit.fromKelvin(kelvinAt(c, s))};
            }
            before += amounts[c];
        }
        return rows;
    }

    /**
     * The highest temperature along the path (card unit) and the amount added when it is reached: the highest of
     * {@code steps} points per charge, refined by Brent's method between its neighbours.
     */
    public double[] peak(int steps) {
        double[][] rows = path(steps);
        int best = 0;
        for (int r = 1; r < rows.length; r++) {
            if (rows[r][1] > rows[best][1]) {
                best = r;
            }
        }
        if (best == 0) {
            return rows[0].clone();
        }
        int charge = 1 + (best - 1) / steps;
        int i = (best - 1) % steps + 1;
        double lo = (double) (i - 1) / steps;
        double hi = Math.min(1.0, (double) (i + 1) / steps);
        double before = rows[best][0] - amounts[charge] * i / steps;
        Units.Temperature unit = card.units().temperature();
        UnivariatePointValuePair p = new BrentOptimizer(1e-10, 1e-12).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(s -> kelvinAt(charge, s)), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi, (double) i / steps));
        double t = unit.fromKelvin(p.getValue());
        if (t < rows[best][1]) {
            return rows[best].clone();
        }
        return new double[] {before + amounts[charge] * p.getPoint(), t};
    }

    /**
     * The least heat to remove over the addition (in the card's energy unit, in proportion to the amount added, as the
     * heat removed of a path is) for the peak to stay at or below {@code limit} (card unit): 0 when it already does;
     * otherwise the root of peak(Q) = limit, which falls as Q grows, bracketed by doubling Q from the heat the
     * batch's excess over the limit holds, then found by Brent's method.
     */
    public static double cooling(Card card, int[] charges, double[] amounts, AmountBasis basis,
            double[] temperatures, double vesselHeatCapacity, Extrapolation e, boolean boiling, double limit,
            int steps) {
        Units.Temperature unit = card.units().temperature();
        TemperaturePath bare = new TemperaturePath(card, charges, amounts, basis, temperatures, vesselHeatCapacity,
                0.0, e, boiling);
        double limitKelvin = unit.toKelvin(limit);
        if (!Double.isFinite(limitKelvin) || !(limitKelvin > bare.feedKelvin[0])) {
            throw Problem.PATH_LIMIT.raise(Numbers.show(limit), unit.symbol(),
                    Numbers.show(unit.fromKelvin(bare.feedKelvin[0])), unit.symbol());
        }
        UnivariateFunction excess = q -> new TemperaturePath(card, charges, amounts, basis, temperatures,
                vesselHeatCapacity, q, e, boiling).peak(steps)[1] - limit;
        double over = bare.peak(steps)[1] - limit;
        if (over <= 0.0) {
            return 0.0;
        }
        double moles = 0.0;
        for (double n : bare.moles) {
            moles += n;
        }
        // first guess: the excess warmed out of a batch holding about 75 J/(mol·K) (water's heat capacity)
        double hi = card.units().enthalpy().fromJoulePerMol(moles * 75.0 * unit.differenceToKelvin(over));
        for (int i = 0; excess.value(hi) > 0.0; i++) {
            hi *= 2.0;
            if (i > 60) {
                throw Problem.NO_CONVERGENCE.raise("the cooling that keeps the peak at " + Numbers.show(limit) + " "
                        + unit.symbol(), "no amount of heat removed in proportion to the addition brings it there");
            }
        }
        try {
            return new BrentSolver(1e-12, Math.abs(hi) * 1e-10).solve(200, excess, 0.0, hi);
        } catch (TooManyEvaluationsException | NoBracketingException ex) {
            throw Problem.NO_CONVERGENCE.raise("the cooling that keeps the peak at " + Numbers.show(limit) + " "
                    + unit.symbol(), "the search for it did not converge");
        }
    }

    private static void checkSteps(int steps) {
        if (steps < 1 || steps > MOST_STEPS) {
            throw Problem.PATH_STEPS.raise(MOST_STEPS, Numbers.show(steps));
        }
    }
}
