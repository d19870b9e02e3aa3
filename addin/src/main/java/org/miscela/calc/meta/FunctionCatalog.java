package org.miscela.calc.meta;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.miscela.core.Problem;
import org.miscela.core.fit.FitProblem;

/**
 * The single source of truth for every cell function's user-facing metadata. The wizard's CalcAddIns.xcu and
 * docs/functions.md are generated from this list; tests check it against the IDL and the implementation.
 */
public final class FunctionCatalog {
    /** The UNO service: permanent, written into every saved workbook. */
    public static final String SERVICE = "org.miscela.calc.MixtureFunctions";
    /** Calc's fixed category names allow no category of our own; "Add-In" is where extension functions belong. */
    static final String CATEGORY = "Add-In";

    private static final ArgumentInfo CARD = required("card", "card",
            "The named range holding the mixture's card: labels in the first column, values to their right.");
    private static final ArgumentInfo MOLE_FRACTION = required("moleFraction", "x",
            "Composition: the mole fractions of all components in card order, as a row or column; or a block with "
                    + "one composition per row (the result is a column). For a two-component card, x1 alone, "
                    + "or a range of x1 values.");
    private static final ArgumentInfo TEMPERATURE = required("temperature", "temperature",
            "Temperature in the card's temperature unit: a single value, or one per composition (a column for a "
                    + "block, the same shape for a range of x1).");
    private static final ArgumentInfo EXTRAPOLATE = optional("extrapolate", "extrapolate",
            "Optional. TRUE accepts a result outside the card's validity range; FALSE refuses it; "
                    + "left out, the card's 'extrapolation' row decides (refuse when absent).");
    private static final ArgumentInfo MOLE_FRACTION_ONE = required("moleFraction", "x",
            "One composition: the mole fractions of all components in card order, as a row or column; "
                    + "for a two-component card, x1 alone.");
    private static final ArgumentInfo TEMPERATURE_ONE = required("temperature", "temperature",
            "Temperature in the card's temperature unit (one value).");
    private static final ArgumentInfo COMPONENT = required("component", "component",
            "The component: its number on the card (1 for the first) or its name as written on the card.");
    private static final ArgumentInfo AMOUNTS = required("amounts", "amounts",
            "Amount of each component in card order, as a row or column (one batch); or a block with one batch "
                    + "per row (the result is a column).");
    private static final ArgumentInfo BATCH_TEMPERATURE = required("temperature", "temperature",
            "Temperature of the components and of the mixture, in the card's temperature unit: a single value, "
                    + "or a column with one per batch.");
    private static final ArgumentInfo ORDER = required("order", "order",
            "The highest k of the coefficients A0..Ak to fit, 0 to 30.");
    private static final ArgumentInfo ORDER_IN_T = optional("orderInTemperature", "order in T",
            "Optional. The highest power j of (T − T_ref) in each A_k (left out: 0, constant coefficients).");
    private static final ArgumentInfo REFERENCE_T = optional("referenceTemperature", "reference temperature",
            "Optional. T_ref of the temperature polynomials; needed when the order in T is above 0.");
    private static final ArgumentInfo WEIGHTS = optional("weights", "weights",
            "Optional. A weight per point, zero or positive (left out: 1 each); a zero weight leaves the point out.");
    private static final ArgumentInfo RESULT = optional("result", "result",
            "Optional. \"coefficients\" (left out), \"standard errors\", \"statistics\", \"covariance\", "
                    + "\"residuals\", \"orders\" (fits of order 0 to the order given, with F-tests, AIC and BIC) or "
                    + "\"check\" (\"OK\", or why the fit is refused, in words).");
    private static final ArgumentInfo BASIS = optional("basis", "basis",
            "Optional. The unit of the amounts: \"mol\" (left out), \"kmol\", \"g\" or \"kg\"; masses are "
                    + "converted with the card's molar masses.");

    // --- the problems functions report, by kind (card problems come on top for every function but the fits)
    private static final List<Enum<?>> COMPOSITION_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.ARG_NOT_FINITE, Problem.ARG_SHAPE, Problem.NOT_BINARY, Problem.MOLE_FRACTION_OUTSIDE_UNIT,
            Problem.COMPOSITION_LENGTH, Problem.COMPOSITION_NEGATIVE, Problem.COMPOSITION_SUM,
            Problem.COMPOSITION_SHAPE);
    private static final List<Enum<?>> POINT_PROBLEMS = list(Problem.ARG_NOT_FLAG, Problem.BELOW_ABSOLUTE_ZERO,
            Problem.OUTSIDE_TEMPERATURE, Problem.OUTSIDE_COMPOSITION, Problem.OUTSIDE_PAIR_TEMPERATURE,
            Problem.OUTSIDE_PAIR_COMPOSITION, Problem.NON_PHYSICAL);
    private static final List<Enum<?>> VOLUME_PROBLEMS = list(Problem.NO_VOLUME);
    private static final List<Enum<?>> COMPONENT_PROBLEMS = list(Problem.UNKNOWN_COMPONENT_ARG);
    private static final List<Enum<?>> AMOUNT_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.ARG_NOT_FINITE, Problem.ARG_SHAPE, Problem.COMPOSITION_LENGTH, Problem.COMPOSITION_SHAPE,
            Problem.AMOUNT_NEGATIVE, Problem.AMOUNT_ZERO, Problem.UNKNOWN_BASIS);
    private static final List<Enum<?>> DATA_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.DATA_SHAPE, Problem.DATA_LENGTH, Problem.DATA_PARTLY_BLANK, Problem.NOT_A_COUNT,
            Problem.UNKNOWN_FIT_OUTPUT);
    private static final List<Enum<?>> FIT_ENGINE_PROBLEMS = list(FitProblem.values());

    private static final List<FunctionInfo> FUNCTIONS = Collections.unmodifiableList(Arrays.asList(
            new FunctionInfo("excessMolarVolume", "MIX.EXCESSVOLUME",
                    "Excess molar volume of the mixture from the card's Redlich–Kister coefficients, "
                            + "in the card's molar volume unit.",
                    "V^E = Σ_i<j x_i·x_j·Σ_k A_k^ij(T)·d_ij^k + ternary terms; binary: d = x1 − x2 (Redlich & Kister "
                            + "1948); d_ij by the card's model: Muggianu x_i − x_j, Kohler (x_i − x_j)/(x_i + x_j), "
                            + "Toop 2x_a − 1 for pairs with the asymmetric component a",
                    "=MIX.EXCESSVOLUME(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("-1.0567").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS)),
            new FunctionInfo("partialMolarVolume", "MIX.PARTIALVOLUME",
                    "Partial molar volume of one component in the mixture, in the card's molar volume unit.",
                    "V̄_k = V_k* + V^E + ∂V^E/∂x_k − Σ_j x_j·∂V^E/∂x_j (binary: V̄_1 = V_1* + V^E + x2·dV^E/dx1)",
                    "=MIX.PARTIALVOLUME(card; 1; 0.3; 20)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("56.670").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, COMPONENT_PROBLEMS)),
            new FunctionInfo("partialExcessMolarVolume", "MIX.PARTIALEXCESS",
                    "Partial molar excess volume of one component "
                            + "(its partial molar volume less its pure molar volume), in the card's molar volume unit.",
                    "V̄_k^E = V^E + ∂V^E/∂x_k − Σ_j x_j·∂V^E/∂x_j (binary: V̄_1^E = V^E + x2·dV^E/dx1)",
                    "=MIX.PARTIALEXCESS(card; \"water\"; 0.3; 20)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("-0.7808").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, COMPONENT_PROBLEMS)),
            new FunctionInfo("mixtureMolarVolume", "MIX.MOLARVOLUME",
                    "Molar volume of the mixture (volume per mole of mixture), in the card's molar volume unit.",
                    "V_m = Σ_k x_k·V_k* + V^E, V_k* = M_k / ρ_k(T)",
                    "=MIX.MOLARVOLUME(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("29.088").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS)),
            new FunctionInfo("mixtureDensity", "MIX.DENSITY",
                    "Density of the mixture, in the card's density unit.",
                    "ρ = Σ_k x_k·M_k / V_m",
                    "=MIX.DENSITY(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("908.667").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS)),
            new FunctionInfo("pureDensity", "MIX.PUREDENSITY",
                    "Density of one pure component from its model on the card, in the card's density unit.",
                    "constant: ρ = c0; polynomial: ρ = Σ_j c_j·(T − T_ref)^j; Tanaka 2001: the CIPM water formula",
                    "=MIX.PUREDENSITY(card; \"water\"; 20)",
                    CARD, COMPONENT, required("temperature", "temperature",
                            "Temperature in the card's temperature unit. A single value, or a range for an array "
                                    + "result."), EXTRAPOLATE)
                    .shows("998.201").refuses(union(COMPONENT_PROBLEMS, list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER, Problem.ARG_NOT_FINITE, Problem.ARG_NOT_FLAG, Problem.BELOW_ABSOLUTE_ZERO, Problem.OUTSIDE_TEMPERATURE, Problem.NON_PHYSICAL))),
            new FunctionInfo("checkCard", "MIX.CHECK",
                    "\"OK\" when the card can be read and used; otherwise its first problem, naming the row.",
                    "—",
                    "=MIX.CHECK(card)",
                    CARD)
                    .shows("OK").refuses(list()),
            new FunctionInfo("checkPoint", "MIX.CHECKPOINT",
                    "\"OK\" when the functions can answer at this composition and temperature; otherwise why they "
                            + "refuse (for example the validity limit that is exceeded).",
                    "—",
                    "=MIX.CHECKPOINT(card; 0.3; 45)",
                    CARD, MOLE_FRACTION_ONE, TEMPERATURE_ONE, EXTRAPOLATE)
                    .shows("The temperature 45 °C is outside the card's validity range 0 to 40 °C.").refuses(list(Problem.CHECK_NEEDS_BOTH, Problem.ARG_NOT_SINGLE)),
            new FunctionInfo("excessEnthalpy", "MIX.EXCESSENTHALPY",
                    "Excess molar enthalpy (heat of mixing per mole of mixture) from the card's excess enthalpy "
                            + "coefficients, in the card's enthalpy unit; negative when mixing releases heat.",
                    "H^E = Σ_i<j x_i·x_j·Σ_k A_k^ij(T)·d_ij^k + ternary terms, combined as for V^E",
                    "=MIX.EXCESSENTHALPY(tern; {0.3; 0.5; 0.2}; 25)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("-719.5").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("partialExcessEnthalpy", "MIX.PARTIALENTHALPY",
                    "Partial molar excess enthalpy of one component (its partial molar enthalpy less its pure molar "
                            + "enthalpy), in the card's enthalpy unit.",
                    "H̄_k^E = H^E + ∂H^E/∂x_k − Σ_j x_j·∂H^E/∂x_j",
                    "=MIX.PARTIALENTHALPY(tern; \"Q\"; {0.3; 0.5; 0.2}; 25)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE)
                    .shows("-773.5").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("mixingHeat", "MIX.MIXINGHEAT",
                    "Enthalpy change when the given amounts of the pure components, all at one temperature, are mixed "
                            + "and kept at that temperature: J or kJ as the card's enthalpy unit; negative means heat "
                            + "is released and must be removed.",
                    "ΔH = N·H^E(x, T), N = Σ n_k, x_k = n_k/N",
                    "=MIX.MIXINGHEAT(acid; {1; 10}; 25)",
                    CARD, AMOUNTS, BATCH_TEMPERATURE, BASIS, EXTRAPOLATE)
                    .shows("-66.50").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("additionHeat", "MIX.ADDITIONHEAT",
                    "Enthalpy change when an amount of one component is added to an existing batch, all at one "
                            + "temperature: J or kJ as the card's enthalpy unit; negative means heat is released.",
                    "ΔH = (N + Δn)·H^E(x') − N·H^E(x)",
                    "=MIX.ADDITIONHEAT(acid; {1; 1}; \"water\"; 9; 25)",
                    CARD, AMOUNTS, COMPONENT, required("added", "added",
                            "The amount of the component added, in the same basis as the amounts."),
                    BATCH_TEMPERATURE, BASIS, EXTRAPOLATE)
                    .shows("-38.70").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("adiabaticRise", "MIX.TEMPERATURERISE",
                    "Estimated temperature rise, in K (the same in °C), of a batch mixed from pure components all at "
                            + "one temperature with no heat exchanged. An estimate for planning, not a safety "
                            + "rating: it ignores the vessel, losses, evaporation and reaction.",
                    "Σ_k n_k·∫_T^T_f Cp_k dT + N·H^E(x, T_f) = 0, solved for T_f (Brent); result T_f − T",
                    "=MIX.TEMPERATURERISE(acid; {1; 10}; 25; \"mol\"; TRUE())",
                    CARD, AMOUNTS, required("temperature", "temperature",
                            "Starting temperature of every component, in the card's temperature unit: a single "
                                    + "value, or a column with one per batch."), BASIS, EXTRAPOLATE)
                    .shows("74.57").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, list(Problem.NO_ENTHALPY, Problem.NO_HEAT_CAPACITY, Problem.NO_TEMPERATURE_ROOT, Problem.OUTSIDE_FINAL_TEMPERATURE))),
            new FunctionInfo("insideValidity", "MIX.INSIDE",
                    "1 (TRUE) when the composition and temperature lie inside every validity limit the card states "
                            + "(temperature, each component's mole fraction, each pair's limits); 0 (FALSE) otherwise.",
                    "—",
                    "=MIX.INSIDE(tern; {0.1; 0.3; 0.6}; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE)
                    .shows("0").refuses(union(COMPOSITION_PROBLEMS, list(Problem.BELOW_ABSOLUTE_ZERO))),
            new FunctionInfo("traceEvaluation", "MIX.TRACE",
                    "Every intermediate number of one evaluation, as a two-column array of labels and values, so the "
                            + "result can be re-derived by hand (see docs/trace.md).",
                    "—",
                    "=MIX.TRACE(card; 0.3; 20)",
                    CARD, MOLE_FRACTION_ONE, TEMPERATURE_ONE, optional("quantity", "property",
                            "Optional. \"volume\" (left out) or \"enthalpy\": which of the card's properties to "
                                    + "trace."), EXTRAPOLATE)
                    .shows("card").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, list(Problem.NO_ENTHALPY, Problem.UNKNOWN_PROPERTY, Problem.ARG_NOT_SINGLE))),
            new FunctionInfo("fitExcessVolume", "MIX.FITEXCESS",
                    "Redlich–Kister coefficients fitted by least squares to excess volumes: an array of A0..Am "
                            + "(one row each, one column per power of T − T_ref) to enter over a card's coefficient "
                            + "cells, or the fit's standard errors, statistics, covariance, residuals or order table.",
                    "min Σ w_i (V^E_i − x1·x2·Σ_k Σ_j a_kj (x1 − x2)^k (T_i − T_ref)^j)², Householder QR with column "
                            + "scaling and iterative refinement",
                    "=INDEX(MIX.FITEXCESS({0.2|0.4|0.6|0.8}; {-0.736|-1.008|-0.912|-0.544}; 1); 2; 1)",
                    required("moleFraction", "x1", "Mole fraction of the first component at each point: a column "
                            + "(or row). Points left blank in every data range are skipped."),
                    required("excessVolume", "excess volume", "The excess molar volume at each point, in any unit: "
                            + "the coefficients come out in the same unit."),
                    ORDER,
                    optional("temperature", "temperature", "Optional. The temperature of each point, needed for "
                            + "temperature-dependent coefficients; any scale (only differences from T_ref are used)."),
                    ORDER_IN_T, REFERENCE_T, WEIGHTS, RESULT)
                    .shows("1.0000").refuses(union(DATA_PROBLEMS, FIT_ENGINE_PROBLEMS, list(Problem.FIT_NEEDS_TEMPERATURE, Problem.FIT_NEEDS_REFERENCE))),
            new FunctionInfo("fitDensity", "MIX.FITDENSITY",
                    "Redlich–Kister coefficients of one pair fitted to measured densities, with the pure liquids' "
                            + "molar masses and densities taken from a card: an array to enter over the card's "
                            + "coefficient cells (in its molar volume unit), or the fit's statistics.",
                    "V^E_i = Σ x M / ρ_i − x1·V_1*(T_i) − x2·V_2*(T_i); min Σ w_i (ρ_i − ρ_fit,i)² to first order "
                            + "(each V^E residual weighted by (ρ_i²/M_i)²)",
                    "=INDEX(MIX.FITDENSITY(card; \"ethanol + water\"; {0.1|0.3|0.5|0.7|0.9}; {965.728|908.666|863.096|829.229|801.749}; 20; 2); 1; 1)",
                    required("pure", "pure data", "The cells of a card's pure-component part: header, units, "
                            + "components and density models (put the coefficient rows, which hold this formula, "
                            + "below it)."),
                    optional("pair", "pair", "The pair as \"first + second\"; may be left out for a card of two "
                            + "components."),
                    required("moleFraction", "x", "Mole fraction of the pair's first component at each point (a "
                            + "column). Points left blank in every data range are skipped."),
                    required("density", "density", "The measured density at each point, in the card's density "
                            + "unit."),
                    required("temperature", "temperature", "The temperature of each point, or one value for all, in "
                            + "the card's temperature unit."),
                    ORDER, ORDER_IN_T, REFERENCE_T, WEIGHTS, RESULT)
                    .shows("-4.400").refuses(union(DATA_PROBLEMS, FIT_ENGINE_PROBLEMS, list(Problem.FIT_NEEDS_REFERENCE, Problem.UNKNOWN_PAIR_ARG, Problem.NON_PHYSICAL))),
            new FunctionInfo("leastSquares", "MIX.LEASTSQUARES",
                    "General weighted linear least squares y ≈ X·b, by the same engine as the card fits: the "
                            + "coefficients b as a column, or their standard errors, the statistics, the covariance "
                            + "or the residuals.",
                    "min Σ w_i (y_i − Σ_j X_ij b_j)², Householder QR with column scaling and iterative refinement",
                    "=INDEX(MIX.LEASTSQUARES({1;1|1;2|1;3}; {2.1|3.9|6.0}); 2; 1)",
                    required("design", "X", "The design matrix: one row per point, one column per parameter "
                            + "(include a column of 1s for an intercept)."),
                    required("response", "y", "The observed values, one per point (a column)."),
                    WEIGHTS, optional("result", "result", "Optional. \"coefficients\" (left out), \"standard "
                            + "errors\", \"statistics\", \"covariance\", \"residuals\" or \"check\"."))
                    .shows("1.95").refuses(union(list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER, Problem.DATA_SHAPE, Problem.UNKNOWN_FIT_OUTPUT, Problem.FIT_OUTPUT_NOT_HERE), FIT_ENGINE_PROBLEMS)),
            new FunctionInfo("uncertainty", "MIX.UNCERTAINTY",
                    "Standard uncertainty of the density, excess volume, molar volume or a partial molar volume, "
                            + "propagated linearly from the coefficient covariance the card holds (the pure liquids "
                            + "taken as exact), in the result's unit.",
                    "u²(Q) = Σ_pairs gᵀ·C·g, g = ∂Q/∂a (GUM, JCGM 100:2008, law of propagation of uncertainty)",
                    "=MIX.UNCERTAINTY(cov; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, optional("quantity", "quantity",
                            "Optional. \"density\" (left out), \"excess volume\", \"molar volume\" or "
                                    + "\"partial volume\" (then give the component)."),
                    optional("component", "component", "For a partial volume: the component's number on the card "
                            + "or its name."), EXTRAPOLATE)
                    .shows("0.178").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, COMPONENT_PROBLEMS, list(Problem.NO_COVARIANCE, Problem.UNKNOWN_QUANTITY, Problem.ARG_NOT_TEXT)))));

    private FunctionCatalog() {
    }

    /** Every function, in the order of the IDL interface. */
    public static List<FunctionInfo> functions() {
        return FUNCTIONS;
    }

    /** The function with this IDL method name. */
    public static FunctionInfo byMethod(String method) {
        for (FunctionInfo f : FUNCTIONS) {
            if (f.method().equals(method)) {
                return f;
            }
        }
        throw new IllegalArgumentException("no function " + method);
    }

    private static List<Enum<?>> list(Enum<?>... problems) {
        return Arrays.asList(problems);
    }

    @SafeVarargs
    private static List<Enum<?>> union(List<Enum<?>>... lists) {
        java.util.LinkedHashSet<Enum<?>> all = new java.util.LinkedHashSet<>();
        for (List<Enum<?>> l : lists) {
            all.addAll(l);
        }
        return new java.util.ArrayList<>(all);
    }

    private static ArgumentInfo required(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, false);
    }

    private static ArgumentInfo optional(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, true);
    }
}
