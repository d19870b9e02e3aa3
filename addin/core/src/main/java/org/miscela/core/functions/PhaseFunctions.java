package org.miscela.core.functions;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Fusion;
import org.miscela.core.card.Units;
import org.miscela.core.model.PitzerOsmotic;
import org.miscela.core.model.VapourPressure;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * The cell functions of the Gibbs-energy half: activity coefficients from the card's G^E/RT, and the blend's vapour
 * by modified Raoult's law, y_k·p = x_k·γ_k·p_k* (an ideal vapour and a liquid whose volume is neglected: good at low
 * pressure, say below a few bar, and stated as such in the documentation). Arguments and results in the card's units;
 * the composition, temperature and vapour-pressure ranges are checked unless extrapolation is allowed.
 */
public final class PhaseFunctions {
    /** The bubble-point search stops when the temperature is known to 10⁻⁹ K. */
    private static final double ACCURACY_KELVIN = 1e-9;

    private PhaseFunctions() {
    }

    /** γ_k of one component at a composition and temperature. */
    public static double activityCoefficient(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        double[] lnGamma = new double[z.length];
        card.mixture().logActivityCoefficients(z, kelvin, lnGamma);
        return finite(card, t, "activity coefficient of " + card.components().get(component).name(),
                Math.exp(lnGamma[component]));
    }

    /**
     * γ_k^∞, the activity coefficient of one component at infinite dilution in the rest of the given composition: the
     * component's own entry is ignored and the others renormalised to add up to 1 (x_j/(1 − x_k), j ≠ k), and ln γ_k
     * is taken there at x_k = 0. Refused when nothing but the component is left. The point checks (validity range)
     * apply to that solvent composition.
     */
    public static double infiniteDilutionActivity(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double rest = 0.0;
        for (int j = 0; j < z.length; j++) {
            rest += j == component ? 0.0 : z[j];
        }
        if (!(rest > 0.0)) {
            throw Problem.NO_DILUENT.raise(card.components().get(component).name());
        }
        double[] s = new double[z.length];
        for (int j = 0; j < z.length; j++) {
            s[j] = j == component ? 0.0 : z[j] / rest;
        }
        double kelvin = PointChecks.checkPoint(card, s, t, e);
        double[] lnGamma = new double[s.length];
        card.mixture().logActivityCoefficients(s, kelvin, lnGamma);
        return finite(card, t, "activity coefficient at infinite dilution of " + card.components().get(component).name(),
                Math.exp(lnGamma[component]));
    }

    /** The gas constant, J/(mol·K), exact since the 2019 SI (N_A·k). */
    public static final double GAS_CONSTANT = 8.314462618;

    /**
     * G^E = RT·g (component < 0) or the partial molar excess Gibbs energy Ḡ_k^E = RT·ln γ_k, in the card's enthalpy
     * unit (refused with words when the card states none).
     */
    public static double excessGibbs(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        if (card.units().enthalpy() == null) {
            throw Problem.NO_ENERGY_UNIT.raise();
        }
        double[] lnGamma = new double[z.length];
        double g = card.mixture().logActivityCoefficients(z, kelvin, lnGamma);
        double v = GAS_CONSTANT * kelvin * (component < 0 ? g : lnGamma[component]);
        if (!Double.isFinite(v)) {
            throw PointChecks.nonPhysical(card, t, "excess Gibbs energy", v);
        }
        return card.units().enthalpy().fromJoulePerMol(v);
    }

    /**
     * S^E = (H^E − G^E)/T (component < 0) or the partial molar excess entropy S̄_k^E = (H̄_k^E − R·T·ln γ_k)/T, from
     * the card's excess enthalpy and its G^E/RT, in the card's enthalpy unit per kelvin (per °F on a card in °F);
     * refused with words when the card lacks either section.
     */
    public static double excessEntropy(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        card.mixture().gibbs();
        card.mixture().enthalpy(); // a card with excess enthalpy rows always states its enthalpy unit
        double[] lnGamma = new double[z.length];
        double g = card.mixture().logActivityCoefficients(z, kelvin, lnGamma);
        double[] hBar = new double[z.length];
        double h = card.mixture().partialExcessEnthalpies(z, kelvin, hBar);
        double v = component < 0 ? h / kelvin - GAS_CONSTANT * g
                : hBar[component] / kelvin - GAS_CONSTANT * lnGamma[component];
        if (!Double.isFinite(v)) {
            throw PointChecks.nonPhysical(card, t, "excess entropy", v);
        }
        return card.units().temperature().fromPerKelvin(card.units().enthalpy().fromJoulePerMol(v), 1);
    }

    /** The bubble pressure Σ x_k γ_k p_k* in the card's pressure unit. */
    public static double bubblePressure(Card card, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        Units.Pressure unit = pressureUnit(card);
        double kelvin = checkVapourPoint(card, z, t, e);
        return unit.fromPascal(finite(card, t, "bubble pressure", card.mixture().bubblePressure(z, kelvin, null)));
    }

    /** y_k, the mole fraction of one component in the vapour at the bubble point at t. */
    public static double vapourFraction(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double kelvin = checkVapourPoint(card, z, t, e);
        double[] partial = new double[z.length];
        double p = card.mixture().bubblePressure(z, kelvin, partial);
        return finite(card, t, "vapour mole fraction of " + card.components().get(component).name(),
                partial[component] / p);
    }

    /** p_k = y_k·p = x_k·γ_k·p_k*, one component's partial pressure over the blend at t, in the card's pressure unit. */
    public static double partialPressure(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        Units.Pressure unit = pressureUnit(card);
        double kelvin = checkVapourPoint(card, z, t, e);
        double[] partial = new double[z.length];
        card.mixture().bubblePressure(z, kelvin, partial);
        return unit.fromPascal(finite(card, t, "partial pressure of " + card.components().get(component).name(),
                partial[component]));
    }

    /**
     * The bubble-point temperature at a pressure (card units): the root of Σ x_k γ_k(T) p_k*(T) = p, searched over the
     * card's validity range and, unless extrapolation is allowed, the range every present component's vapour
     * pressure constants hold for; refused with the bubble pressures at the ends when there is none there.
     */
    public static double bubblePoint(Card card, double[] x, double pressure, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        Units.Pressure unit = pressureUnit(card);
        return searchTemperature(card, z, pressure, e, tk -> z,
            (tk, p) -> Math.log(p / card.mixture().bubblePressure(z, tk, null)),
            (lo, hi, tu) -> Problem.NO_BUBBLE_POINT.raise(Numbers.show(tu.fromKelvin(lo)),
                    Numbers.show(tu.fromKelvin(hi)), tu.symbol(), Numbers.show(pressure), unit.symbol(),
                    Numbers.show(unit.fromPascal(card.mixture().bubblePressure(z, lo, null))),
                    Numbers.show(unit.fromPascal(card.mixture().bubblePressure(z, hi, null))), unit.symbol()));
    }

    /**
     * The dew-point temperature of a vapour of composition y at a pressure (card units): the temperature at which the
     * first drop forms, Σ_k y_k·p/(γ_k(x, T)·p_k*(T)) = 1 with the drop's composition x_k = y_k·p/(γ_k·p_k*) found by
     * successive substitution inside Brent's search on T, over the same range as {@link #bubblePoint}.
     */
    public static double dewPoint(Card card, double[] y, double pressure, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, y);
        Units.Pressure unit = pressureUnit(card);
        double pascal = unit.toPascal(pressure);
        return searchTemperature(card, z, pressure, e, tk -> dropComposition(card, z, tk, pascal),
            (tk, p) -> dewResidual(card, z, tk, p),
            (lo, hi, tu) -> Problem.NO_DEW_POINT.raise(Numbers.show(tu.fromKelvin(lo)),
                    Numbers.show(tu.fromKelvin(hi)), tu.symbol(), Numbers.show(pressure), unit.symbol()));
    }

    /** The dew-pressure substitution stops when no fraction of the drop moves by more than this. */
    private static final double DROP_SETTLED = 1e-13;
    /** The dew-pressure substitution gives up after this many rounds. */
    static final int DEW_PRESSURE_ROUNDS = 500;

    /**
     * The dew pressure of a vapour of composition y at t (card units): the pressure at which the first drop forms,
     * 1/p = Σ_k y_k/(γ_k(x)·p_k*) with the drop's composition x_k = y_k·p/(γ_k·p_k*), by successive substitution
     * from the ideal drop (γ = 1), each round's p making Σ x_k = 1 exactly, until no fraction of the drop moves by
     * more than 10⁻¹³ (at most {@value #DEW_PRESSURE_ROUNDS} rounds, else NO_CONVERGENCE). Where the card's G^E splits
     * the liquid, the drop found is the one the substitution reaches from the ideal drop. The point is checked with the
     * vapour's components and then with the drop (its composition within the card's validity range).
     */
    public static double dewPressure(Card card, double[] y, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, y);
        Units.Pressure unit = pressureUnit(card);
        double kelvin = checkVapourPoint(card, z, t, e);
        int n = z.length;
        double[] pure = new double[n];
        for (int k = 0; k < n; k++) {
            pure[k] = z[k] == 0.0 ? Double.NaN : card.mixture().vapourPressure(k, kelvin);
        }
        double[] lnGamma = new double[n];
        double[] x = new double[n];
        double p = Double.NaN;
        boolean settled = false;
        for (int round = 0; round < DEW_PRESSURE_ROUNDS && !settled; round++) {
            double sum = 0.0;
            for (int k = 0; k < n; k++) {
                sum += z[k] == 0.0 ? 0.0 : z[k] / (Math.exp(lnGamma[k]) * pure[k]);
            }
            p = 1.0 / sum;
            double moved = 0.0;
            for (int k = 0; k < n; k++) {
                double next = z[k] == 0.0 ? 0.0 : z[k] * p / (Math.exp(lnGamma[k]) * pure[k]);
                moved = Math.max(moved, Math.abs(next - x[k]));
                x[k] = next;
            }
            if (!(moved >= 0.0)) {
                throw PointChecks.nonPhysical(card, t, "dew pressure", p);
            }
            settled = round > 0 && moved <= DROP_SETTLED;
            card.mixture().logActivityCoefficients(x, kelvin, lnGamma);
        }
        if (!settled) {
            throw Problem.NO_CONVERGENCE.raise("the drop that forms from this vapour at " + Numbers.show(t) + " "
                    + card.units().temperature().symbol(), "its composition still moved after " + DEW_PRESSURE_ROUNDS
                    + " rounds of successive substitution; the card's G^E may split the liquid there");
        }
        checkVapourPoint(card, x, t, e);
        return unit.fromPascal(finite(card, t, "dew pressure", p));
    }

    /**
     * The relative volatility of component i to component j in the vapour over the liquid at t:
     * α_ij = (y_i/x_i)/(y_j/x_j) = γ_i·p_i* / (γ_j·p_j*) (at infinite dilution where a fraction is zero).
     */
    public static double relativeVolatility(Card card, int i, int j, double[] x, double t, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        double kelvin = checkVapourPoint(card, z, t, e);
        double[] lnGamma = new double[z.length];
        card.mixture().logActivityCoefficients(z, kelvin, lnGamma);
        return finite(card, t, "relative volatility", Math.exp(lnGamma[i] - lnGamma[j])
                * card.mixture().vapourPressure(i, kelvin) / card.mixture().vapourPressure(j, kelvin));
    }

    /** The number of compositions the azeotrope search looks at before refining a change of sign. */
    static final int AZEOTROPE_SCAN = 400;

    /**
     * The azeotrope of a two-component card at a pressure: the liquid mole fraction x1 where the vapour has the
     * liquid's composition (α12 = 1 at the bubble point), searched between 0.0025 and 0.9975 (a scan of
     * {@value #AZEOTROPE_SCAN} points, each change of sign refined by Brent's method); {@code temperature} asks for
     * its bubble-point temperature instead. Refused with words when there is none, and when there are several (the
     * card's G^E is then not to be trusted for it).
     */
    public static double azeotrope(Card card, double pressure, boolean temperature, Extrapolation e) {
        if (card.componentCount() != 2) {
            throw Problem.NOT_BINARY_AZEOTROPE.raise(card.componentCount());
        }
        pressureUnit(card);
        java.util.function.DoubleUnaryOperator f = x1 -> {
            double[] x = {x1, 1 - x1};
            double t = bubblePoint(card, x, pressure, e);
            return Math.log(relativeVolatility(card, 0, 1, x, t, e));
        };
        java.util.List<Double> roots = new java.util.ArrayList<>();
        double step = 0.995 / AZEOTROPE_SCAN;
        double a = 0.0025;
        double fa = f.applyAsDouble(a);
        BrentSolver solver = new BrentSolver(1e-13, 1e-12);
        for (int s = 1; s <= AZEOTROPE_SCAN; s++) {
            double b = 0.0025 + step * s;
            double fb = f.applyAsDouble(b);
            if (fa == 0.0) {
                roots.add(a);
            } else if (fa * fb < 0.0) {
                roots.add(solver.solve(200, f::applyAsDouble, a, b));
            }
            a = b;
            fa = fb;
        }
        Units.Pressure unit = card.pressureUnit();
        if (roots.isEmpty()) {
            throw Problem.NO_AZEOTROPE.raise(card.components().get(0).name(), card.components().get(1).name(),
                    Numbers.show(pressure), unit.symbol());
        }
        if (roots.size() > 1) {
            StringBuilder list = new StringBuilder();
            for (double r : roots) {
                list.append(list.length() == 0 ? "" : ", ").append(Numbers.show(Math.round(r * 1e4) / 1e4));
            }
            throw Problem.SEVERAL_AZEOTROPES.raise(roots.size(), Numbers.show(pressure), unit.symbol(), list);
        }
        double x1 = roots.get(0);
        return temperature ? bubblePoint(card, new double[] {x1, 1 - x1}, pressure, e) : x1;
    }

    /** A residual of the temperature search: positive below the root, negative above (T in K, p in Pa). */
    private interface Residual {
        double at(double kelvin, double pascal);
    }

    /** The refusal when the search range holds no root. */
    private interface NoRoot {
        RuntimeException at(double loKelvin, double hiKelvin, Units.Temperature unit);
    }

    /**
     * The root in T of a residual over the card's validity range and, unless extrapolating, the vapour pressures'
     * ranges (Brent's method to 10⁻⁹ K); the point is then checked like any other, with the liquid at the root (the
     * blend itself for a bubble point, the drop for a dew point).
     */
    private static double searchTemperature(Card card, double[] z, double pressure, Extrapolation e,
            java.util.function.DoubleFunction<double[]> liquidAt, Residual f, NoRoot none) {
        if (!(pressure > 0.0) || Double.isInfinite(pressure)) {
            throw Problem.BLEND_NOT_POSITIVE.raise("pressure", Numbers.show(pressure));
        }
        Units.Temperature tu = card.units().temperature();
        double target = card.pressureUnit().toPascal(pressure);
        double[] range = searchRange(card, z, e);
        double lo = range[0];
        double hi = range[1];
        // a balance the card's models cannot evaluate is refused in words, never handed to the solver as NaN
        java.util.function.DoubleUnaryOperator g = tk -> {
            double v = f.at(tk, target);
            if (Double.isNaN(v)) {
                throw Problem.NO_CONVERGENCE.raise("the temperature at which this blend and its vapour are in "
                        + "balance", "at " + Numbers.show(tu.fromKelvin(tk)) + " " + tu.symbol() + " the card's "
                        + "models give no finite balance");
            }
            return v;
        };
        double fLo = g.applyAsDouble(lo);
        double fHi = g.applyAsDouble(hi);
        if (!(hi > lo) || !(fLo >= 0.0 && fHi <= 0.0)) {
            throw none.at(lo, hi, tu);
        }
        BrentSolver solver = new BrentSolver(1e-15, ACCURACY_KELVIN);
        double kelvin = fLo == 0.0 ? lo : fHi == 0.0 ? hi : solver.solve(200, g::applyAsDouble, lo, hi);
        double t = tu.fromKelvin(kelvin);
        checkVapourPoint(card, liquidAt.apply(kelvin), t, e);
        return t;
    }

    /** ln Σ_k y_k·p/(γ_k·p_k*) at T, with the drop's composition found by successive substitution. */
    private static double dewResidual(Card card, double[] y, double kelvin, double pascal) {
        double[] x = dropComposition(card, y, kelvin, pascal);
        double[] lnGamma = new double[y.length];
        card.mixture().logActivityCoefficients(x, kelvin, lnGamma);
        double sum = 0.0;
        for (int k = 0; k < y.length; k++) {
            if (y[k] > 0.0) {
                sum += y[k] * pascal / (Math.exp(lnGamma[k]) * card.mixture().vapourPressure(k, kelvin));
            }
        }
        return Math.log(sum);
    }

    /**
     * The liquid in equilibrium with vapour y at T and p: x_k ∝ y_k·p/(γ_k(x)·p_k*), iterated from the ideal drop
     * until no fraction moves by more than 10⁻¹³ (at most 500 rounds; a liquid split would not settle, and the last
     * round is then used, which the search's bracket still checks).
     */
    private static double[] dropComposition(Card card, double[] y, double kelvin, double pascal) {
        int n = y.length;
        double[] x = new double[n];
        double[] lnGamma = new double[n];
        for (int round = 0; round < 500; round++) {
            double[] next = new double[n];
            double sum = 0.0;
            for (int k = 0; k < n; k++) {
                next[k] = y[k] == 0.0 ? 0.0 : y[k] * pascal / (Math.exp(round == 0 ? 0.0 : lnGamma[k])
                        * card.mixture().vapourPressure(k, kelvin));
                sum += next[k];
            }
            double moved = 0.0;
            for (int k = 0; k < n; k++) {
                next[k] /= sum;
                moved = Math.max(moved, Math.abs(next[k] - x[k]));
            }
            x = next;
            card.mixture().logActivityCoefficients(x, kelvin, lnGamma);
            if (moved < 1e-13) {
                break;
            }
        }
        return x;
    }

    /** The temperature search range: the card's validity and, unless extrapolating, the vapour pressures' ranges. */
    static double[] searchRange(Card card, double[] z, Extrapolation e) {
        double lo = card.validity().lowestKelvin();
        double hi = card.validity().highestKelvin();
        return card.mayExtrapolate(e) ? new double[] {lo, hi} : withinVapourRanges(card, z, lo, hi);
    }

    /**
     * How far beyond the lowest or highest temperature of a card's data the searches that may extrapolate go (the
     * flash point's) or accept a result (the freezing point's): no card's G^E is trusted further.
     */
    static final double EXTRAPOLATION_KELVIN = 100.0;

    /** lo..hi (K) narrowed to the ranges the present components' vapour-pressure constants state. */
    static double[] withinVapourRanges(Card card, double[] z, double lo, double hi) {
        for (int k = 0; k < z.length; k++) {
            VapourPressure p = card.vapourPressure(k);
            if (z[k] > 0.0 && p != null && p.hasRange()) {
                lo = Math.max(lo, p.lowestKelvin());
                hi = Math.min(hi, p.highestKelvin());
            }
        }
        return new double[] {lo, hi};
    }

    /** The card's pressure unit; refused with words when it states none. */
    private static Units.Pressure pressureUnit(Card card) {
        if (card.pressureUnit() == null) {
            throw Problem.NO_PRESSURE_UNIT.raise();
        }
        return card.pressureUnit();
    }

    /** The point's checks, then each present component's vapour pressure range (unless extrapolation is allowed). */
    static double checkVapourPoint(Card card, double[] z, double t, Extrapolation e) {
        return checkVapourPoint(card, z, t, e, true);
    }

    /** As {@link #checkVapourPoint(Card, double[], double, Extrapolation)}; the card's G^E required or not. */
    static double checkVapourPoint(Card card, double[] z, double t, Extrapolation e, boolean needsGibbs) {
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        if (needsGibbs) {
            card.mixture().gibbs();
        }
        for (int k = 0; k < z.length; k++) {
            if (z[k] == 0.0) {
                continue;
            }
            card.mixture().vapourPressure(k, kelvin); // refuses a component without a row
            VapourPressure p = card.vapourPressure(k);
            if (!card.mayExtrapolate(e) && p.hasRange() && (kelvin < p.lowestKelvin() || kelvin > p.highestKelvin())) {
                Units.Temperature tu = card.units().temperature();
                throw Problem.OUTSIDE_VAPOUR_PRESSURE.raise(Numbers.show(t), tu.symbol(),
                        Numbers.show(tu.fromKelvin(p.lowestKelvin())), Numbers.show(tu.fromKelvin(p.highestKelvin())),
                        tu.symbol(), card.components().get(k).name());
            }
        }
        return kelvin;
    }

    /** How the freezing point takes the liquid's activity: from the card's G^E/RT, or an ideal solution, asked for. */
    public enum Activity {
        /** γ_k from the card's G^E/RT; refused when the card has none. */
        CARD,
        /** γ_k = 1: the ideal solution, only when the caller names it (never a quiet default). */
        IDEAL
    }

    /**
     * The freezing point of the liquid blend (card temperature unit): the temperature at which pure solid
     * {@code component} starts to form, the root in T of the solid–liquid equilibrium with a pure solid,
     * ln(x_k·γ_k(x, T)) = −(ΔH_fus/R)(1/T − 1/T_m) + (ΔCp/R)[(T_m/T − 1) − ln(T_m/T)] (J. M. Prausnitz, R. N.
     * Lichtenthaler, E. G. de Azevedo, Molecular Thermodynamics of Fluid-Phase Equilibria, 3rd ed., 1999, ch. 11),
     * by Brent's method to 10⁻⁹ K. A component &lt; 0 takes the one that freezes first: the highest such temperature
     * among the present components with melting data. The pure component gives its stated T_m exactly. With the card's
     * G^E the point found is checked against the card's validity (refused outside unless extrapolating); with
     * {@link Activity#IDEAL} only the melting data are used.
     */
    public static double freezingPoint(Card card, int component, double[] x, Activity a, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        PitzerOsmotic o = card.osmotic();
        if (o != null && z[o.solute()] > o.iceLimit()) {
            throw Problem.PAST_ICE_LIMIT.raise(card.components().get(o.solute()).name(), Numbers.show(z[o.solute()]),
                    Numbers.show(o.iceLimit()));
        }
        int k = freezingComponent(card, component, z, a);
        double kelvin = freezingKelvin(card, k, z, a);
        Fusion f = card.fusion(k);
        Units.Temperature tu = card.units().temperature();
        if (kelvin == f.meltingKelvin()) {
            return f.meltingAsStated();
        }
        double t = tu.fromKelvin(kelvin);
        if (a == Activity.CARD && z[k] < 1.0) {
            checkFreezingPoint(card, z, t, e);
            double lowest = card.validity().lowestKelvin();
            if (kelvin < lowest - EXTRAPOLATION_KELVIN) {
                throw Problem.FREEZING_TOO_FAR.raise(Numbers.show(t), tu.symbol(), Numbers.show(lowest - kelvin),
                        Numbers.show(tu.fromKelvin(lowest)), tu.symbol(),
                        Numbers.show(EXTRAPOLATION_KELVIN));
            }
        }
        return t;
    }

    /**
     * {@link PointChecks#checkPoint} for a freezing point: on a card whose osmotic-coefficient row states its own
     * temperature range, that range replaces the card's (whose densities may start at 0 °C while the brine's
     * parameters reach far below); compositions are the card's.
     */
    static double checkFreezingPoint(Card card, double[] z, double t, Extrapolation e) {
        PitzerOsmotic o = card.osmotic();
        if (o == null || !o.hasRange()) {
            return PointChecks.checkPoint(card, z, t, e);
        }
        double kelvin = PointChecks.checkTemperature(card, t, Extrapolation.ALLOW); // finite, above 0 K
        if (!card.mayExtrapolate(e)) {
            List<Violation> outside = freezingViolations(card, z, kelvin, t);
            if (!outside.isEmpty()) {
                throw outside.get(0).refusal();
            }
        }
        return kelvin;
    }

    /** {@link PointChecks#violations} for a freezing point, with the osmotic row's range as above. */
    static List<Violation> freezingViolations(Card card, double[] z, double kelvin, double t) {
        List<Violation> all = PointChecks.violations(card, z, kelvin, t);
        PitzerOsmotic o = card.osmotic();
        if (o == null || !o.hasRange()) {
            return all;
        }
        List<Violation> out = new java.util.ArrayList<>();
        if (kelvin < o.lowestKelvin() || kelvin > o.highestKelvin()) {
            Units.Temperature u = card.units().temperature();
            out.add(new Violation(Problem.OUTSIDE_TEMPERATURE, Numbers.show(t), u.symbol(),
                    Numbers.show(u.fromKelvin(o.lowestKelvin())), Numbers.show(u.fromKelvin(o.highestKelvin())),
                    u.symbol()));
        }
        for (Violation v : all) {
            if (v.problem() != Problem.OUTSIDE_TEMPERATURE) {
                out.add(v);
            }
        }
        return out;
    }

    /**
     * The index of the component whose freezing point {@link #freezingPoint} gives: {@code component} itself when
     * given (≥ 0), else the present component with melting data that freezes at the highest temperature.
     */
    public static int freezingComponent(Card card, int component, double[] x, Activity a) {
        double[] z = CardFunctions.moleFractions(card, x);
        if (a == Activity.CARD && card.excessGibbs() == null && card.osmotic() == null) {
            throw Problem.FREEZING_NEEDS_GIBBS.raise();
        }
        if (a == Activity.IDEAL && card.osmotic() == null && card.solventIndex() >= 0) {
            throw Problem.IDEAL_NEEDS_IONS.raise(card.components().get(card.solventIndex()).name());
        }
        if (component >= 0) {
            String name = card.components().get(component).name();
            if (card.fusion(component) == null) {
                throw Problem.NO_FUSION_DATA.raise(name);
            }
            if (!(z[component] > 0.0)) {
                throw Problem.FREEZING_COMPONENT_ABSENT.raise(name, name);
            }
            return component;
        }
        int best = -1;
        double warmest = Double.NEGATIVE_INFINITY;
        int firstWithData = -1;
        for (int k = 0; k < z.length; k++) {
            if (card.fusion(k) == null) {
                continue;
            }
            firstWithData = firstWithData < 0 ? k : firstWithData;
            if (z[k] > 0.0) {
                double kelvin = freezingRoot(card, k, z, a);
                if (kelvin > warmest) {
                    warmest = kelvin;
                    best = k;
                }
                best = best < 0 ? k : best; // no root: still named in the refusal
            }
        }
        if (firstWithData < 0) {
            throw Problem.NO_FUSION_DATA.raise("any of its components");
        }
        if (best < 0) {
            String name = card.components().get(firstWithData).name();
            throw Problem.FREEZING_COMPONENT_ABSENT.raise(name, name);
        }
        return best;
    }

    /** The freezing temperature of component k in K; refused with words when the search range holds none. */
    private static double freezingKelvin(Card card, int k, double[] z, Activity a) {
        double kelvin = freezingRoot(card, k, z, a);
        if (Double.isNaN(kelvin)) {
            double[] range = freezingRange(card, k);
            Units.Temperature tu = card.units().temperature();
            throw Problem.NO_FREEZING_POINT.raise(Numbers.show(tu.fromKelvin(range[0])),
                    Numbers.show(tu.fromKelvin(range[1])), tu.symbol(), card.components().get(k).name(),
                    Numbers.show(z[k]));
        }
        return kelvin;
    }

    /**
     * The search range in K: T_m/4 to 1.25·T_m, narrowed to where the enthalpy of fusion at T,
     * ΔH_fus + ΔCp·(T − T_m), stays above a tenth of its value at T_m (the right-hand side rises with T there, so
     * the root is unique).
     */
    private static double[] freezingRange(Card card, int k) {
        double[] range = freezingRange(card.fusion(k));
        if (card.osmotic() != null) {
            // the osmotic coefficient's Debye–Hückel slope is known only within its series' range
            range[0] = Math.max(range[0], PitzerOsmotic.LOWEST_KELVIN);
            range[1] = Math.min(range[1], PitzerOsmotic.HIGHEST_KELVIN);
        }
        return range;
    }

    private static double[] freezingRange(Fusion f) {
        double tm = f.meltingKelvin();
        double lo = tm / 4;
        double hi = 1.25 * tm;
        double dcp = f.heatCapacity();
        if (dcp > 0.0) {
            lo = Math.max(lo, tm - 0.9 * f.enthalpy() / dcp);
        } else if (dcp < 0.0) {
            hi = Math.min(hi, tm + 0.9 * f.enthalpy() / -dcp);
        }
        return new double[] {lo, hi};
    }

    /** The root in K, T_m itself when the residual vanishes there, or NaN when the range holds none. */
    private static double freezingRoot(Card card, int k, double[] z, Activity a) {
        Fusion f = card.fusion(k);
        java.util.function.DoubleUnaryOperator residual = tk -> lnActivity(card, k, z, tk, a) - solidLine(f, tk);
        double tm = f.meltingKelvin();
        double atMelting = residual.applyAsDouble(tm);
        if (atMelting == 0.0) {
            return tm;
        }
        double[] range = freezingRange(card, k);
        double lo = atMelting < 0.0 ? range[0] : tm;
        double hi = atMelting < 0.0 ? tm : range[1];
        double fLo = residual.applyAsDouble(lo);
        double fHi = residual.applyAsDouble(hi);
        if (!Double.isFinite(atMelting) || !(fLo >= 0.0 && fHi <= 0.0)) {
            return Double.NaN;
        }
        if (fLo == 0.0 || fHi == 0.0) {
            return fLo == 0.0 ? lo : hi;
        }
        return new BrentSolver(1e-15, ACCURACY_KELVIN).solve(200, residual::applyAsDouble, lo, hi);
    }

    /**
     * ln(x_k·γ_k), the log of component k's activity in the liquid at T (K): γ from the card's G^E/RT, or 1 for the
     * ideal solution. On a card whose 'osmotic coefficient' row gives the water's activity, the water's is ln a_w =
     * −φ·ν·m·M_w, or for the ideal solution the log of its mole fraction among the ions; the salt's is refused.
     */
    static double lnActivity(Card card, int k, double[] z, double kelvin, Activity a) {
        PitzerOsmotic osmotic = card.osmotic();
        if (osmotic != null) {
            if (k != osmotic.solvent()) {
                throw Problem.SOLUTE_ACTIVITY.raise(card.components().get(k).name(),
                        card.components().get(osmotic.solvent()).name());
            }
            if (a == Activity.IDEAL) {
                return osmotic.lnIdealWaterActivity(z);
            }
            requireOsmoticSeries(card, kelvin);
            return osmotic.lnWaterActivity(z, kelvin);
        }
        double lnActivity = Math.log(z[k]);
        if (a == Activity.CARD) {
            double[] lnGamma = new double[z.length];
            card.mixture().logActivityCoefficients(z, kelvin, lnGamma);
            lnActivity += lnGamma[k];
        }
        return lnActivity;
    }

    /** Refuses a temperature (K) outside the range of the osmotic coefficient's Debye–Hückel series. */
    static void requireOsmoticSeries(Card card, double kelvin) {
        if (!(kelvin >= PitzerOsmotic.LOWEST_KELVIN && kelvin <= PitzerOsmotic.HIGHEST_KELVIN)) {
            Units.Temperature tu = card.units().temperature();
            throw Problem.OSMOTIC_SERIES_RANGE.raise(Numbers.show(tu.fromKelvin(kelvin)), tu.symbol());
        }
    }

    /**
     * The right-hand side of the freezing equation at T (K): ln of the activity of the pure liquid relative to the pure
     * solid, −(ΔH_fus/R)(1/T − 1/T_m) + (ΔCp/R)[(T_m/T − 1) − ln(T_m/T)]; zero at T_m.
     */
    static double solidLine(Fusion f, double kelvin) {
        double tm = f.meltingKelvin();
        double r = tm / kelvin;
        return (-f.enthalpy() * (1.0 / kelvin - 1.0 / tm) + f.heatCapacity() * ((r - 1.0) - Math.log(r)))
                / GAS_CONSTANT;
    }

    private static double finite(Card card, double t, String what, double v) {
        if (!Double.isFinite(v) || !(v >= 0.0)) {
            throw PointChecks.nonPhysical(card, t, what, v);
        }
        return v;
    }
}
