package org.miscela.calc;

import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.Catalogue;

/**
 * Regression tests for what the fuzzers ({@link MixtureAddInFuzzProperties}) found: each is the failing call reduced
 * to its cause. Before the fixes each of these reached Calc as an undeclared exception (the adapter's last-line
 * IllegalStateException for a NaN or an infinity, or a Commons Math exception) instead of a number, a text or the
 * designed error. Card values are invented.
 */
class FuzzFindingsTest {
    private final MixtureAddIn addIn = new MixtureAddIn();

    private static Object[][] one(Object v) {
        return new Object[][] {{v}};
    }

    /** A range padded with "" to a rectangle, as Calc passes it. */
    private static Object[][] range(Object[]... rows) {
        int width = 0;
        for (Object[] r : rows) {
            width = Math.max(width, r.length);
        }
        Object[][] out = new Object[rows.length][];
        for (int i = 0; i < rows.length; i++) {
            out[i] = Arrays.copyOf(rows[i], width);
            for (int c = rows[i].length; c < width; c++) {
                out[i][c] = "";
            }
        }
        return out;
    }

    private static Object[] row(Object... cells) {
        return cells;
    }

    /** A table result: every cell a finite number or a text. Returns the rows. */
    private static Object[][] table(Object result) {
        Object[][] rows = (Object[][]) ((Any) result).getObject();
        for (Object[] r : rows) {
            for (Object v : r) {
                assertTrue(v instanceof String || (v instanceof Double && Double.isFinite((Double) v)),
                        () -> "cell " + v + " in " + Arrays.deepToString(rows));
            }
        }
        return rows;
    }

    private static Object valueOf(Object[][] statistics, String label) {
        for (Object[] r : statistics) {
            if (label.equals(r[0])) {
                return r[1];
            }
        }
        throw new AssertionError("no row " + label + " in " + Arrays.deepToString(statistics));
    }

    /**
     * Found by the adapter fuzzer (LEAST_SQUARES, "statistics", a response of −1e308): the residual sum of squares
     * overflows, so the standard deviation was +∞. Fix: FitFunctions gives the statistic as a text saying why.
     */
    @Test
    void statisticsOfResponsesNearTheDoubleRangeSayOverflow() throws Exception {
        Object[][] design = {{1.0, 0.0}, {1.0, 1.0}, {1.0, 2.0}, {1.0, 3.0}};
        Object[][] response = {{-1e308}, {1.0}, {2.0}, {3.0}};
        Object[][] statistics = table(addIn.leastSquares(design, response, Any.VOID, "statistics"));
        Object s = valueOf(statistics, "standard deviation of the fit");
        assertTrue(s instanceof String && ((String) s).startsWith("overflow"), () -> "standard deviation " + s);
    }

    /**
     * Found by the adapter fuzzer (FIT_EXCESS, "statistics", one point, order 0): the data do not vary, so
     * R² = 1 − RSS/0 was −∞ (RSS rounded to a tiny positive number rather than 0). Fix: R² is "undefined".
     */
    @Test
    void rSquaredOfDataThatDoNotVaryIsUndefined() throws Exception {
        Object[][] statistics = table(addIn.fitExcessVolume(one(0.5988679358961072), one(-1.9274398520227651), one(0.0),
                Any.VOID, Any.VOID, Any.VOID, Any.VOID, "statistics"));
        assertEquals("undefined", valueOf(statistics, "R²"));
    }

    /** A binary v2 card with constant densities, heat capacities and an excess enthalpy (invented values). */
    private static List<Object[]> heatCard() {
        return new ArrayList<>(Arrays.asList(row("Miscela card", 2.0), row("source", "invented values, for a test"),
                row("temperature unit", "K"), row("density unit", "kg/m³"), row("molar volume unit", "cm³/mol"),
                row("molar mass unit", "g/mol"), row("enthalpy unit", "J/mol"), row("valid temperature", 280.0, 320.0),
                row("extrapolation", "allow"), row("component", "alpha", 46.07), row("component", "beta", 18.015),
                row("density model", "alpha", "constant"), row("density coefficients", "alpha", 789.3),
                row("density model", "beta", "constant"), row("density coefficients", "beta", 997.0),
                row("heat capacity", "alpha", 112.0), row("heat capacity", "beta", 75.3),
                row("valid mole fraction", "alpha", 0.0, 1.0), row("excess volume A0", "alpha + beta", -4.0),
                row("excess enthalpy A0", "alpha + beta", -800.0)));
    }

    /**
     * Found by the adapter fuzzer (ADIABATIC_RISE at 1e308, extrapolation allowed): the heat balance is NaN there
     * (∞ − ∞ in the heat-capacity integral), the bracket search stopped at once and Commons Math's solver threw
     * NumberIsTooLargeException. Fix: a balance that is not finite ends the search with NO_TEMPERATURE_ROOT.
     */
    @Test
    void temperatureRiseWhereTheBalanceOverflowsIsRefusedByDesign() throws Exception {
        Object[][] card = range(heatCard().toArray(new Object[0][]));
        assertTrue((Double) addIn.adiabaticRise(card, range(row(1.0, 1.0)), one(300.0), Any.VOID, Any.VOID, Any.VOID) > 0,
                "the card itself works: exothermic mixing warms the batch");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.adiabaticRise(card, range(row(1.0, 1.0)), one(1e308), Any.VOID, Boolean.TRUE, Any.VOID));
        assertEquals("Problem.NO_TEMPERATURE_ROOT", Catalogue.entryOf(e.getMessage()), e.getMessage());
    }

    /**
     * Found by the adapter fuzzer (UNCERTAINTY of the density of a pure component whose molar mass is the smallest
     * double): the density's sensitivity −ρ/V_m overflows and 0·∞ made the uncertainty NaN. Fix: a non-finite
     * uncertainty is refused as NON_PHYSICAL, like every other non-finite result.
     */
    @Test
    void uncertaintyThatIsNotFiniteIsRefusedByDesign() throws Exception {
        List<Object[]> rows = heatCard();
        rows.set(10, row("component", "beta", Double.MIN_VALUE));
        rows.add(row("excess volume covariance", "alpha + beta", 1e-4));
        Object[][] card = range(rows.toArray(new Object[0][]));
        assertTrue((Double) addIn.uncertainty(card, one(0.5), one(300.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID) > 0,
                "the card itself works at an ordinary point");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.uncertainty(card, one(0.0), one(300.0), "density", Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(e.getMessage()), e.getMessage());
    }

    /**
     * Found by the adapter fuzzer (TRACE of the enthalpy of an extreme card): a coefficient of 1e306 kJ/mol is
     * +∞ in J/mol, and the enthalpy trace, which has no final density to check, carried it. Fix: a trace with a
     * non-finite intermediate is refused as NON_PHYSICAL, as MIX.EXCESSENTHALPY refuses the same point.
     */
    @Test
    void traceWithAnIntermediateThatOverflowsIsRefusedByDesign() throws Exception {
        List<Object[]> rows = heatCard();
        rows.set(6, row("enthalpy unit", "kJ/mol"));
        rows.set(19, row("excess enthalpy A0", "alpha + beta", -1e306));
        Object[][] card = range(rows.toArray(new Object[0][]));
        assertTrue(((String) addIn.checkCard(card, Any.VOID)).startsWith("OK"), "the card reads (its values look odd)");
        IllegalArgumentException enthalpy = assertThrows(IllegalArgumentException.class,
                () -> addIn.excessEnthalpy(card, one(0.5), one(300.0), Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(enthalpy.getMessage()), enthalpy.getMessage());
        IllegalArgumentException trace = assertThrows(IllegalArgumentException.class,
                () -> addIn.traceEvaluation(card, one(0.5), one(300.0), "enthalpy", Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(trace.getMessage()), trace.getMessage());
        table(addIn.traceEvaluation(range(heatCard().toArray(new Object[0][])), one(0.5), one(300.0), "enthalpy",
                Any.VOID, Any.VOID, Any.VOID));
    }

    /** The binary card of {@link #heatCard} with the first molar mass 1e300 g/mol (still a valid card). */
    private static Object[][] heavyCard() {
        List<Object[]> rows = heatCard();
        rows.set(9, row("component", "alpha", 1e300));
        return range(rows.toArray(new Object[0][]));
    }

    /**
     * Found by the adapter fuzzer once the blending functions were merged (MIX.BATCH of an extreme card): the mass of
     * 10⁹ mol of a component of 1e300 g/mol overflows, and the adapter's last-line check threw IllegalStateException.
     * Fix: that check raises the designed NON_PHYSICAL error.
     */
    @Test
    void batchTotalThatOverflowsIsRefusedByDesign() throws Exception {
        Object[][] card = heavyCard();
        assertTrue((Double) addIn.batchTotals(card, range(row(1.0, 1.0)), one("mol"), one(300.0), "mass",
                Any.VOID, Any.VOID, Any.VOID) > 0, "an ordinary batch of the same card");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> addIn.batchTotals(card,
                range(row(1e6, 1.0)), one("kmol"), one(300.0), "mass", Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(e.getMessage()), e.getMessage());
    }

    /**
     * Found by the adapter fuzzer (MIX.ADDVOLUME, MIX.ADJUST on a card with a density of 1e-300 kg/m³): these return
     * one number without passing it through the adapter's check, so a volume that overflows (10 kmol of a liquid of
     * molar volume 2·10³⁰⁴ cm³/mol) reached Calc as NaN (∞ − ∞) or infinity. Fix: both go through the check.
     */
    @Test
    void additionVolumeAndAdjustmentThatOverflowAreRefusedByDesign() throws Exception {
        List<Object[]> rows = heatCard();
        rows.set(14, row("density coefficients", "beta", 1e-300));
        Object[][] card = range(rows.toArray(new Object[0][]));
        assertTrue(((String) addIn.checkCard(card, Any.VOID)).startsWith("OK"), "the card reads (its values look odd)");
        IllegalArgumentException add = assertThrows(IllegalArgumentException.class, () -> addIn.additionVolume(card,
                range(row(10.0, 10.0)), one("kmol"), one(2.0), one(2.0), one(300.0), Any.VOID, Any.VOID, Any.VOID,
                Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(add.getMessage()), add.getMessage());
        IllegalArgumentException adjust = assertThrows(IllegalArgumentException.class, () -> addIn.adjustBatch(card,
                range(row(10.0, 10.0)), one("kmol"), range(row(0.4, 0.6)), one("mole fraction"), one(300.0), Any.VOID,
                Any.VOID,
                Any.VOID, "volume", Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(adjust.getMessage()), adjust.getMessage());
        Object[][] ordinary = range(heatCard().toArray(new Object[0][]));
        assertTrue(Double.isFinite((Double) addIn.additionVolume(ordinary, range(row(10.0, 10.0)), one("kmol"),
                one(2.0), one(2.0), one(300.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID)), "the same addition on an ordinary card");
    }

    /**
     * Found by the full fuzz profile (MIX.ADJUST "make up" on an extreme card): the batch's own volume is not physical
     * (its molar volume is negative: a large negative A0 at x1 = 0.5) while the made-up composition's is, so the
     * search started from a NaN and Commons Math's solver threw NoBracketingException. Fix: a measure that is NaN at
     * the batch, or where the solver looks, ends the search with LIMIT_UNREACHABLE.
     */
    @Test
    void makeUpFromABatchThatIsNotPhysicalIsRefusedByDesign() throws Exception {
        List<Object[]> rows = heatCard();
        rows.set(18, row("excess volume A0", "alpha + beta", -400.0));
        Object[][] card = range(rows.toArray(new Object[0][]));
        IllegalArgumentException batch = assertThrows(IllegalArgumentException.class,
                () -> addIn.batchTotals(card, range(row(1.0, 1.0)), one("mol"), one(300.0), "volume", "mL", Any.VOID,
                        Any.VOID));
        assertEquals("Problem.NON_PHYSICAL", Catalogue.entryOf(batch.getMessage()), "the batch itself is refused");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> addIn.adjustBatch(card,
                range(row(1.0, 1.0)), one("mol"), range(row(0.05, 0.95)), one("mole fraction"), one(300.0), "make up",
                10.0, "mL",
                Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.LIMIT_UNREACHABLE", Catalogue.entryOf(e.getMessage()), e.getMessage());
    }

    /**
     * Found by the adapter fuzzer (MIX.MIXINGHEAT and MIX.BATCH of 1e308 kg of each component): the moles overflow to
     * infinity, and the check "the amounts add up to a positive, finite number" reported them as adding up to
     * nothing. Fix: a total beyond the double range has a message of its own, AMOUNT_TOO_LARGE.
     */
    @Test
    void amountsWhoseTotalOverflowsAreNotCalledNothing() throws Exception {
        Object[][] card = range(heatCard().toArray(new Object[0][]));
        assertTrue(Double.isFinite((Double) addIn.mixingHeat(card, range(row(1.0, 1.0)), one(300.0), "kg",
                Any.VOID)), "an ordinary batch of the same card");
        IllegalArgumentException heat = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixingHeat(card, range(row(1e308, 1e308)), one(300.0), "kg", Any.VOID));
        assertEquals("Problem.AMOUNT_TOO_LARGE", Catalogue.entryOf(heat.getMessage()), heat.getMessage());
        IllegalArgumentException added = assertThrows(IllegalArgumentException.class,
                () -> addIn.additionHeat(card, range(row(1e308, 1.0)), one(1.0), one(1e308), one(300.0), "mol",
                        Any.VOID));
        assertEquals("Problem.AMOUNT_TOO_LARGE", Catalogue.entryOf(added.getMessage()), added.getMessage());
        IllegalArgumentException batch = assertThrows(IllegalArgumentException.class, () -> addIn.batchTotals(card,
                range(row(1e308, 1e308)), one("kg"), one(300.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.BLEND_AMOUNT_TOO_LARGE", Catalogue.entryOf(batch.getMessage()), batch.getMessage());
        IllegalArgumentException zero = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixingHeat(card, range(row(0.0, 0.0)), one(300.0), "kg", Any.VOID));
        assertEquals("Problem.AMOUNT_ZERO", Catalogue.entryOf(zero.getMessage()), "nothing is still nothing");
    }

    /**
     * Found by the adapter fuzzer (a component argument given as a range of two cells): it was refused as "The
     * component is blank.". Fix: a range of more than one cell is refused as ARG_NOT_SINGLE; a one-cell range is its
     * cell, as a single cell is.
     */
    @Test
    void componentGivenAsARangeMustBeASingleValue() throws Exception {
        Object[][] card = range(heatCard().toArray(new Object[0][]));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.partialMolarVolume(card, range(row(1.0, 2.0)), one(0.5), one(300.0), Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.ARG_NOT_SINGLE", Catalogue.entryOf(e.getMessage()), e.getMessage());
        assertTrue(e.getMessage().contains("component"), e.getMessage());
        assertEquals(addIn.partialMolarVolume(card, one(2.0), one(0.5), one(300.0), Any.VOID, Any.VOID, Any.VOID),
                addIn.partialMolarVolume(card, one("beta"), one(0.5), one(300.0), Any.VOID, Any.VOID, Any.VOID),
                "a one-cell range: the number and the name of the same component");
    }

    /**
     * Found by the adapter fuzzer (extrapolate = NaN): a flag that is not a finite number counted as TRUE, so the
     * call extrapolated. Fix: NaN and infinities are refused as ARG_NOT_FLAG; 0 and other numbers keep Calc's meaning.
     */
    @Test
    void extrapolateFlagThatIsNotFiniteIsRefused() throws Exception {
        List<Object[]> rows = heatCard();
        rows.removeIf(r -> "extrapolation".equals(r[0]));
        Object[][] card = range(rows.toArray(new Object[0][]));
        assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(card, one(0.5), one(330.0), Any.VOID, Any.VOID, Any.VOID), "330 K is outside 280–320 K");
        assertTrue((Double) addIn.mixtureDensity(card, one(0.5), one(330.0), 1.0, Any.VOID, Any.VOID) > 0, "1 allows extrapolation");
        for (double flag : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> addIn.mixtureDensity(card, one(0.5), one(330.0), flag, Any.VOID, Any.VOID), "flag " + flag);
            assertEquals("Problem.ARG_NOT_FLAG", Catalogue.entryOf(e.getMessage()), e.getMessage());
            IllegalArgumentException inside = assertThrows(IllegalArgumentException.class,
                    () -> addIn.mixtureDensity(card, one(0.5), one(300.0), flag, Any.VOID, Any.VOID), "flag " + flag);
            assertEquals("Problem.ARG_NOT_FLAG", Catalogue.entryOf(inside.getMessage()), "refused inside too");
        }
    }

    /**
     * Found by the adapter fuzzer once tonnes became a unit: MIX.ADJUST "within" a limit on an extreme card (fuzz card
     * EXTREME 1437, the call's arguments as the fuzzer made them) doubled the make-up search's upper end to infinity, and the solver's own exception
     * ("endpoints do not specify an interval: [∞, ∞]") escaped as an unexpected failure. Now the limit is refused as
     * unreachable, in words.
     */
    @Test
    void aMakeUpSearchThatRunsToInfinityIsRefusedInWords() {
        Object[][] card = org.miscela.core.card.FuzzCards.of(org.miscela.core.card.FuzzCards.Kind.EXTREME, 1437).cells;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new MixtureAddIn().adjustBatch(card, new Object[][] {{86.20062305796648, 32.375755581843976}},
                        new Object[][] {{"tonne"}}, new Object[][] {{1.0E-15}}, new Object[][] {{"volume fraction"}},
                        new Object[][] {{0.43021338832899825}}, "within", 487.013214977023, "t", "summary", Any.VOID,
                        1.0, Boolean.TRUE, Any.VOID, Any.VOID));
        assertEquals("Problem.LIMIT_UNREACHABLE", Catalogue.entryOf(e.getMessage()), e.getMessage());
    }
}
