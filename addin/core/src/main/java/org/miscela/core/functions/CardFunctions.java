package org.miscela.core.functions;

import java.util.List;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardSanity;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Mixture;
import org.miscela.core.model.Component;
import org.miscela.core.model.ConventionalMass;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * The cell functions' arithmetic, one method per function: arguments and results in the card's own units, every
 * argument and the validity range checked, every result finite or a {@link MiscelaException}.
 * Components are numbered from 0 here; a composition is the mole fractions of every component in card order.
 * The checks every function makes on its point are PointChecks'; the adiabatic root search is AdiabaticRise's.
 */
public final class CardFunctions {
    /** The text {@link #check} returns for a card (and point) with nothing to report. */
    public static final String OK = "OK";
    /** How far from 1 a composition's sum may be (rounding in typed or computed fractions) before it is refused. */
    static final double SUM_TOLERANCE = 1e-6;

    private CardFunctions() {
    }

    // --- compositions

    /** The composition {x1, 1 − x1} of a two-component card from its first mole fraction. */
    public static double[] binary(Card card, double x1) {
        if (card.componentCount() != 2) {
            throw Problem.NOT_BINARY.raise(card.componentCount());
        }
        if (Double.isNaN(x1) || Double.isInfinite(x1)) {
            throw Problem.ARG_NOT_FINITE.raise("mole fraction");
        }
        if (x1 < 0.0 || x1 > 1.0) {
            throw Problem.MOLE_FRACTION_OUTSIDE_UNIT.raise(Numbers.show(x1));
        }
        return new double[] {x1, 1.0 - x1};
    }

    /**
     * A checked composition: one finite, non-negative mole fraction per component whose sum is 1 within
     * {@link #SUM_TOLERANCE}; returned divided by its sum so it sums to 1 to rounding.
     */
    public static double[] moleFractions(Card card, double[] x) {
        int n = card.componentCount();
        if (x.length != n) {
            throw Problem.COMPOSITION_LENGTH.raise(x.length, n, card.componentNames());
        }
        double sum = 0.0;
        for (int k = 0; k < n; k++) {
            if (Double.isNaN(x[k]) || Double.isInfinite(x[k])) {
                throw Problem.ARG_NOT_FINITE.raise("mole fraction of " + card.components().get(k).name());
            }
            if (x[k] < 0.0) {
                throw Problem.COMPOSITION_NEGATIVE.raise(card.components().get(k).name(), Numbers.show(x[k]));
            }
            sum += x[k];
        }
        if (!(Math.abs(sum - 1.0) <= SUM_TOLERANCE)) {
            throw Problem.COMPOSITION_SUM.raise(Numbers.show(sum));
        }
        double[] out = new double[n];
        for (int k = 0; k < n; k++) {
            out[k] = x[k] / sum;
        }
        return out;
    }

    /**
     * The moles of each component of a batch from its amounts (in moles or mass); conventional masses are weighed at
     * the batch's temperature t (card unit), whose pure densities turn them into true masses.
     */
    public static double[] amountsToMoles(Card card, double[] amounts, AmountBasis basis, double t, Extrapolation e) {
        int n = card.componentCount();
        if (amounts.length != n) {
            throw Problem.COMPOSITION_LENGTH.raise(amounts.length, n, card.componentNames());
        }
        double[] moles = new double[n];
        double total = 0.0;
        double kelvin = Double.NaN;
        for (int k = 0; k < n; k++) {
            Component c = card.components().get(k);
            if (Double.isNaN(amounts[k]) || Double.isInfinite(amounts[k])) {
                throw Problem.ARG_NOT_FINITE.raise("amount of " + c.name());
            }
            if (amounts[k] < 0.0) {
                throw Problem.AMOUNT_NEGATIVE.raise(c.name(), Numbers.show(amounts[k]));
            }
            double buoyancy = 1.0;
            if (basis.isConventional() && amounts[k] > 0.0) {
                kelvin = Double.isNaN(kelvin) ? PointChecks.checkTemperature(card, t, e) : kelvin;
                buoyancy = ConventionalMass.trueMassPerConventional(PointChecks.pureDensityAt(card, k, kelvin, t),
                        c.name(), t, card.units().temperature().symbol(), AmountBasis.trueMasses());
            }
            moles[k] = basis.toMoles(amounts[k], c.molarMass(), buoyancy);
            total += moles[k];
        }
        if (Double.isInfinite(total)) {
            throw Problem.AMOUNT_TOO_LARGE.raise();
        }
        if (!(total > 0.0)) {
            throw Problem.AMOUNT_ZERO.raise();
        }
        return moles;
    }

    /**
     * The mixture's mean molar mass M = Σ x_k·M_k (mass per mole of mixture), in the card's molar mass unit. It needs
     * only the components' molar masses: no temperature, no density, no validity range.
     */
    public static double meanMolarMass(Card card, double[] x) {
        double[] z = moleFractions(card, x);
        return card.units().molarMass().fromGramPerMol(card.mixture().meanMolarMass(z));
    }

    // --- volumetric properties

    public static double excessMolarVolume(Card card, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        return volumeOut(card, card.mixture().excessMolarVolume(z, kelvin), t);
    }

    public static double partialMolarVolume(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        return volumeOut(card, card.mixture().partialMolarVolume(component, z, kelvin), t);
    }

    public static double partialExcessMolarVolume(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        return volumeOut(card, card.mixture().partialExcessMolarVolume(component, z, kelvin), t);
    }

    public static double molarVolume(Card card, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        double v = card.mixture().molarVolume(z, kelvin);
        if (!(v > 0.0) || Double.isInfinite(v)) {
            throw PointChecks.nonPhysical(card, t, "molar volume", v);
        }
        return card.units().molarVolume().fromCm3PerMol(v);
    }

    public static double density(Card card, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        return card.units().density().fromKgPerM3(PointChecks.physicalDensity(card, z, kelvin, t));
    }

    public static double excessMolarVolume(Card card, double x1, double t, Extrapolation e) {
        return excessMolarVolume(card, binary(card, x1), t, e);
    }

    public static double partialMolarVolume(Card card, int component, double x1, double t, Extrapolation e) {
        return partialMolarVolume(card, component, binary(card, x1), t, e);
    }

    public static double partialExcessMolarVolume(Card card, int component, double x1, double t, Extrapolation e) {
        return partialExcessMolarVolume(card, component, binary(card, x1), t, e);
    }

    public static double molarVolume(Card card, double x1, double t, Extrapolation e) {
        return molarVolume(card, binary(card, x1), t, e);
    }

    public static double density(Card card, double x1, double t, Extrapolation e) {
        return density(card, binary(card, x1), t, e);
    }

    /** Density of one pure component (any number of components on the card). */
    public static double pureDensity(Card card, int component, double t, Extrapolation e) {
        double kelvin = PointChecks.checkTemperature(card, t, e);
        return card.units().density().fromKgPerM3(PointChecks.pureDensityAt(card, component, kelvin, t));
    }

    /**
     * Standard uncertainty of a volumetric result from the card's coefficient covariances (linear propagation), in
     * the result's unit: the density unit for "density", the molar volume unit otherwise.
     *
     * @param quantity "density", "excess volume", "molar volume" or "partial volume" (which needs the component)
     * @param component the component of a partial volume, or −1
     */
    public static double uncertainty(Card card, String quantity, int component, double[] x, double t,
            Extrapolation e) {
        Uncertainty.Quantity q = Uncertainty.Quantity.lookup(quantity);
        if (q == Uncertainty.Quantity.PARTIAL_VOLUME && component < 0) {
            throw Problem.ARG_BLANK.raise("component (needed for a partial volume)");
        }
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        PointChecks.physicalDensity(card, z, kelvin, t);
        double u = Uncertainty.of(card, q, component, z, kelvin);
        if (!Double.isFinite(u)) {
            // e.g. a density's sensitivity −ρ/V_m overflowing for a molar volume that underflows to nearly zero
            throw PointChecks.nonPhysical(card, t, "standard uncertainty", u);
        }
        return q == Uncertainty.Quantity.DENSITY ? card.units().density().fromKgPerM3(u)
                : card.units().molarVolume().fromCm3PerMol(u);
    }

    // --- enthalpy

    /** H^E in the card's enthalpy unit. */
    public static double excessEnthalpy(Card card, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        return enthalpyOut(card, card.mixture().excessEnthalpy(z, kelvin), t);
    }

    /** H̄_k^E = H̄_k − H_k* in the card's enthalpy unit. */
    public static double partialExcessEnthalpy(Card card, int component, double[] x, double t, Extrapolation e) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkPoint(card, z, t, e);
        double[] out = new double[z.length];
        card.mixture().partialExcessEnthalpies(z, kelvin, out);
        return enthalpyOut(card, out[component], t);
    }

    /**
     * The blend's molar heat capacity in the card's enthalpy unit per degree (per K, or per °F on a card in °F), or per
     * kg of blend when {@code perMass}: from the source {@link Mixture#heatCapacitySource} names. A pure liquid is a
     * valid point whatever compositions the card's data cover (its own heat capacity).
     */
    public static double heatCapacity(Card card, double[] x, double t, Extrapolation e, boolean perMass) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkHeatPoint(card, z, t, e);
        return heatCapacityOut(card, z, card.mixture().heatCapacity(z, kelvin), t, perMass);
    }

    /**
     * The partial molar heat capacity of one component, ∂(N·Cp)/∂n_k, in the card's enthalpy unit per degree (per kg
     * of that component when {@code perMass}).
     */
    public static double partialHeatCapacity(Card card, int component, double[] x, double t, Extrapolation e,
            boolean perMass) {
        double[] z = moleFractions(card, x);
        double kelvin = PointChecks.checkHeatPoint(card, z, t, e);
        double[] out = new double[z.length];
        card.mixture().partialHeatCapacities(z, kelvin, out);
        double[] alone = new double[z.length];
        alone[component] = 1.0;
        return heatCapacityOut(card, alone, out[component], t, perMass);
    }

    /** J/(mol·K) of a blend of composition z in the card's unit, per mole or per kg of it. */
    private static double heatCapacityOut(Card card, double[] z, double joulePerMolKelvin, double t, boolean perMass) {
        double v = joulePerMolKelvin;
        if (perMass) {
            v = v / card.mixture().meanMolarMass(z) * 1000.0;
        }
        v = card.units().temperature().fromPerKelvin(card.units().enthalpy().fromJoulePerMol(v), 1);
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            throw PointChecks.nonPhysical(card, t, "heat capacity", v);
        }
        return v;
    }

    /**
     * The enthalpy change ΔH = N·H^E when the given amounts of the pure components, all at T, are mixed at T: in
     * the card's energy unit (J or kJ); negative when mixing releases heat.
     */
    public static double mixingHeat(Card card, double[] amounts, AmountBasis basis, double t, Extrapolation e) {
        double[] n = amountsToMoles(card, amounts, basis, t, e);
        return enthalpyOut(card, batchExcessEnthalpy(card, n, t, e), t);
    }

    /**
     * The enthalpy change when {@code added} of one component at T is stirred into a batch at T (ends at T):
     * (N + Δn)·H^E(x') − N·H^E(x), in the card's energy unit; negative when heat is released.
     */
    public static double additionHeat(Card card, double[] amounts, int component, double added, AmountBasis basis,
            double t, Extrapolation e) {
        if (Double.isNaN(added) || Double.isInfinite(added)) {
            throw Problem.ARG_NOT_FINITE.raise("amount added");
        }
        if (added < 0.0) {
            throw Problem.AMOUNT_NEGATIVE.raise("the addition", Numbers.show(added));
        }
        double[] before = amountsToMoles(card, amounts, basis, t, e);
        double[] addition = new double[amounts.length];
        addition[component] = added;
        double[] more = sum(amounts, addition);
        if (Double.isInfinite(more[component])) {
            throw Problem.AMOUNT_TOO_LARGE.raise();
        }
        double[] after = amountsToMoles(card, more, basis, t, e);
        return enthalpyOut(card, batchExcessEnthalpy(card, after, t, e) - batchExcessEnthalpy(card, before, t, e), t);
    }

    /**
     * The temperature rise (in K, the same in °C; in °F on a card in °F) of a batch mixed adiabatically from pure
     * components all at T:
     * the final temperature T_f solves Σ n_k ∫_T^T_f Cp_k dT + N·H^E(x, T_f) = 0. Assumes constant pressure, no heat
     * exchange with the vessel or surroundings, no evaporation or reaction, and the card's models over T..T_f.
     */
    public static double adiabaticRise(Card card, double[] amounts, AmountBasis basis, double t, Extrapolation e) {
        return adiabaticRise(card, amounts, basis, t, e, false);
    }

    /**
     * {@link #adiabaticRise}, refusing a batch that reaches the boiling temperature the card states unless
     * {@code boiling} accepts it.
     */
    public static double adiabaticRise(Card card, double[] amounts, AmountBasis basis, double t, Extrapolation e,
            boolean boiling) {
        return AdiabaticRise.of(card, amounts, basis, t, e, boiling);
    }

    /**
     * The temperature along an order of addition ({@link TemperaturePath}): the path as rows (amount added, temperature
     * in the card's unit), or, as a number, its peak, the amount added at the peak, its end, or the cooling that keeps
     * the peak at {@code limit} (NaN: none given).
     */
    public static Object temperaturePath(Card card, int[] charges, double[] amounts, AmountBasis basis,
            double[] temperatures, Extrapolation e, TemperaturePath.Output output, int steps, double vessel,
            double removed, boolean boiling, double limit) {
        if (output == TemperaturePath.Output.COOLING) {
            if (Double.isNaN(limit)) {
                throw Problem.ARG_BLANK.raise("limit, which the result \"cooling\" needs,");
            }
            return TemperaturePath.cooling(card, charges, amounts, basis, temperatures, vessel, e, boiling, limit,
                    steps);
        }
        TemperaturePath p = new TemperaturePath(card, charges, amounts, basis, temperatures, vessel, removed, e,
                boiling);
        switch (output) {
            case PEAK:
                return p.peak(steps)[1];
            case PEAK_AT:
                return p.peak(steps)[0];
            case FINAL:
                return p.end();
            default:
                return p.path(steps);
        }
    }

    // --- validity

    /**
     * 1 when the point lies inside every limit of the card, 0 otherwise (extrapolation is not considered). A number,
     * because Calc shows an add-in's boolean result as 0 whatever its value; 1 and 0 work as TRUE and FALSE in IF.
     */
    public static double inside(Card card, double[] x, double t) {
        return isInside(card, x, t) ? 1.0 : 0.0;
    }

    /** Whether the point lies inside every limit of the card (extrapolation is not considered). */
    public static boolean isInside(Card card, double[] x, double t) {
        double[] z = moleFractions(card, x);
        if (Double.isNaN(t) || Double.isInfinite(t)) {
            throw Problem.ARG_NOT_FINITE.raise("temperature");
        }
        double kelvin = card.units().temperature().toKelvin(t);
        if (!(kelvin > 0.0)) {
            throw Problem.BELOW_ABSOLUTE_ZERO.raise(Numbers.show(t), card.units().temperature().symbol());
        }
        return PointChecks.within(card, z, kelvin);
    }

    /**
     * "OK" when a calculation at (x, t) would succeed, otherwise the message that explains why it would not.
     * Pass null for x and NaN for t to check only the card.
     */
    public static String check(Card card, double[] x, double t, Extrapolation e) {
        try {
            if ((x == null) != Double.isNaN(t)) {
                throw Problem.CHECK_NEEDS_BOTH.raise();
            }
            if (x != null) {
                if (card.volumeModel() != null) {
                    density(card, x, t, e);
                }
                if (card.excessEnthalpy() != null) {
                    excessEnthalpy(card, x, t, e);
                }
            }
            return OK;
        } catch (MiscelaException ex) {
            return ex.getMessage();
        }
    }

    /**
     * MIX.CHECK about a card that reads (a card that does not is answered with its problem): for
     * {@link CheckOutput#SUMMARY} "OK" or "OK with n warnings: …" ({@link #summary}); for WARNINGS "OK" or a column
     * with one warning per row; for EXTENT the words of {@link CardSanity.Extent}; for DIGITS the table of
     * {@link CardSanity#digits}. A text or an {@code Object[][]}.
     *
     * @param cells the range as Calc passes it
     * @param card the card those cells hold
     */
    public static Object checkCard(Object[][] cells, Card card, CheckOutput output) {
        switch (output) {
            case EXTENT:
                return CardSanity.extent(cells).words();
            case DIGITS:
                return CardSanity.digits(cells, card);
            case WARNINGS: {
                List<String> warnings = CardSanity.warnings(cells, card);
                if (warnings.isEmpty()) {
                    return OK;
                }
                Object[][] column = new Object[warnings.size()][];
                for (int i = 0; i < column.length; i++) {
                    column[i] = new Object[] {warnings.get(i)};
                }
                return column;
            }
            default:
                return summary(CardSanity.warnings(cells, card));
        }
    }

    /**
     * "OK" for no warnings; otherwise "OK with 1 warning: …" or "OK with 3 warnings: (1) … (2) … (3) …", every
     * warning in full: what MIX.CHECK says about a card that reads, and MIX.EXPLAIN about a call on it that succeeds.
     * A formula comparing MIX.CHECK(card) with "OK" stays TRUE exactly for a card with nothing to report.
     */
    public static String summary(List<String> warnings) {
        if (warnings.isEmpty()) {
            return OK;
        }
        if (warnings.size() == 1) {
            return Problem.CHECK_WARNINGS.format("1 warning", warnings.get(0));
        }
        StringBuilder all = new StringBuilder();
        for (int i = 0; i < warnings.size(); i++) {
            all.append(i == 0 ? "" : " ").append('(').append(i + 1).append(") ").append(warnings.get(i));
        }
        return Problem.CHECK_WARNINGS.format(warnings.size() + " warnings", all);
    }

    /** {@link #check} for a binary card's first mole fraction; NaN for both checks only the card. */
    public static String check(Card card, double x1, double t, Extrapolation e) {
        if (Double.isNaN(x1) && Double.isNaN(t)) {
            return check(card, null, t, e);
        }
        try {
            return check(card, binary(card, x1), t, e);
        } catch (MiscelaException ex) {
            return ex.getMessage();
        }
    }

    /** Every intermediate of one evaluation, for auditors: see {@link Trace}. */
    public static Object[][] trace(Card card, double[] x, double t, PropertyKind property, Extrapolation e) {
        double[] z = moleFractions(card, x);
        Object[][] rows;
        if (property == PropertyKind.FREEZING) {
            double kelvin = PhaseFunctions.checkFreezingPoint(card, z, t, e);
            if (card.osmotic() == null) {
                card.mixture().gibbs();
            } else {
                PhaseFunctions.requireOsmoticSeries(card, kelvin);
            }
            rows = Trace.freezing(card, z, t, kelvin, e, PhaseFunctions.freezingViolations(card, z, kelvin, t));
        } else if (property == PropertyKind.VAPOUR || property == PropertyKind.FLASH) {
            if (card.pressureUnit() == null) {
                throw Problem.NO_PRESSURE_UNIT.raise();
            }
            double kelvin = PhaseFunctions.checkVapourPoint(card, z, t, e);
            rows = Trace.vapour(card, z, t, kelvin, e, PointChecks.violations(card, z, kelvin, t));
            if (property == PropertyKind.FLASH) {
                rows = Trace.flash(card, z, kelvin, e, rows);
            }
        } else {
            double kelvin = PointChecks.checkPoint(card, z, t, e);
            if (property == PropertyKind.ENTHALPY) {
                card.mixture().enthalpy();
            } else {
                card.mixture().volume();
            }
            rows = Trace.of(card, z, t, kelvin, property, e, PointChecks.violations(card, z, kelvin, t));
        }
        for (Object[] row : rows) {
            // An intermediate that overflows (say a pure molar volume M/ρ of a card with extreme numbers) is refused
            // like a final result that does: a trace never shows NaN or infinity.
            if (row[1] instanceof Double && !Double.isFinite((Double) row[1])) {
                throw PointChecks.nonPhysical(card, t, (String) row[0], (Double) row[1]);
            }
        }
        return rows;
    }

    /** N·H^E of a batch given in moles, J; checks the batch's composition like any point. */
    private static double batchExcessEnthalpy(Card card, double[] moles, double t, Extrapolation e) {
        double total = 0.0;
        for (double v : moles) {
            total += v;
        }
        double[] x = moleFractions(card, scaled(moles, 1.0 / total));
        if (Mixture.pureComponent(x) >= 0) {
            // a pure liquid has no excess enthalpy, whatever compositions the card's data cover (on a card with some)
            card.mixture().enthalpy();
            PointChecks.checkTemperature(card, t, e);
            return 0.0;
        }
        double kelvin = PointChecks.checkPoint(card, x, t, e);
        return total * card.mixture().excessEnthalpy(x, kelvin);
    }

    private static double volumeOut(Card card, double cm3PerMol, double t) {
        if (Double.isNaN(cm3PerMol) || Double.isInfinite(cm3PerMol)) {
            throw PointChecks.nonPhysical(card, t, "volume", cm3PerMol);
        }
        return card.units().molarVolume().fromCm3PerMol(cm3PerMol);
    }

    private static double enthalpyOut(Card card, double joulePerMol, double t) {
        if (Double.isNaN(joulePerMol) || Double.isInfinite(joulePerMol)) {
            throw PointChecks.nonPhysical(card, t, "enthalpy", joulePerMol);
        }
        return card.units().enthalpy().fromJoulePerMol(joulePerMol);
    }

    static double[] scaled(double[] v, double f) {
        double[] out = new double[v.length];
        for (int k = 0; k < v.length; k++) {
            out[k] = v[k] * f;
        }
        return out;
    }

    private static double[] sum(double[] a, double[] b) {
        double[] out = new double[a.length];
        for (int k = 0; k < a.length; k++) {
            out[k] = a[k] + b[k];
        }
        return out;
    }

    /** Index of a component given by its 1-based number as a user counts. */
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
}
