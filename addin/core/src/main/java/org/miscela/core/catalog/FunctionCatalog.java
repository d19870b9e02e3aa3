package org.miscela.core.catalog;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.miscela.core.fit.RedlichKisterFitter;
import org.miscela.core.functions.FitFunctions;
import org.miscela.core.problem.Problem;
import org.miscela.core.blend.Compositions;
import org.miscela.core.blend.DensityInversion;

/**
 * The single source of every cell function's signature and user-facing metadata, in interface order (new functions go
 * at the end). The IDL interface, the wizard's CalcAddIns.xcu, docs/functions.md, docs/errors.md and the README's
 * function table are generated from this list; MIX.EXPLAIN's parameter kinds and the fuzzers' functions come from it,
 * and tests check the compiled interface, the adapter and the explain table against it.
 */
public final class FunctionCatalog {
    /** The UNO service: permanent, written into every saved workbook. */
    public static final String SERVICE = "org.miscela.calc.MixtureFunctions";
    /** The add-in's version, as MIX.INFO reports it; a test keeps it equal to the build's version. */
    public static final String VERSION = "0.1.0";
    /** Calc's fixed category names allow no category of our own; "Add-In" is where extension functions belong. */
    static final String CATEGORY = "Add-In";

    private static final ArgumentInfo CARD = range("card", "card",
            "The named range holding the mixture's card: labels in the first column, values to their right.");
    private static final ArgumentInfo MOLE_FRACTION = range("moleFraction", "x",
            "Mole fractions in card order (a row or column), a block with one composition per row, or x1 alone on a "
                    + "two-component card. On a two-component card a row of two cells, or a block two columns wide, "
                    + "holds compositions (x1, x2); any other single row or column holds values of x1, one result "
                    + "each, except a column of two cells adding up to 1, which could be either and is refused. A "
                    + "block gives a column of results.");
    private static final ArgumentInfo TEMPERATURE = range("temperature", "temperature",
            "Temperature in the card's unit: one value, or one per composition (a column for a block, the same "
                    + "shape for a range of x1).");
    private static final ArgumentInfo EXTRAPOLATE = optional("extrapolate", "extrapolate",
            "TRUE accepts a result outside the card's validity range, FALSE refuses it; left out, the card's "
                    + "'extrapolation' row decides. Without that row, such a result is refused.");
    private static final ArgumentInfo MOLE_FRACTION_ONE = range("moleFraction", "x",
            "One composition: the mole fractions of all components in card order, as a row or column; "
                    + "for a two-component card, x1 alone.");
    private static final ArgumentInfo TEMPERATURE_ONE = range("temperature", "temperature",
            "Temperature in the card's temperature unit (one value).");
    private static final ArgumentInfo COMPONENT = value("component", "component",
            "The component: its number on the card (1 for the first) or its name as written on the card.");
    /** Per-component results: one component's value alone, which a column of cells can show (Calc repeats a row). */
    private static final ArgumentInfo PICK = optional("component", "component",
            "One component's value alone, by its number on the card or its name (left out: one value per component). "
                    + "Down a column give one formula per component: Calc repeats the first value of a row result "
                    + "entered down a column.");
    private static final String LAYOUT = " Several values come out as a row when the composition was given as a row "
            + "or as a lone number, as a column when it was a column, and as one row per line for a block; the "
            + "component argument gives one value alone.";
    private static final ArgumentInfo AMOUNTS = range("amounts", "amounts",
            "Amount of each component in card order, as a row or column (one batch), or a block with one batch "
                    + "per row. A block gives a column of results.");
    private static final ArgumentInfo BATCH_TEMPERATURE = range("temperature", "temperature",
            "Temperature of the components and of the mixture, in the card's unit: one value, or a column with "
                    + "one per batch.");
    private static final String BASES = "Mole, mass or volume fraction, mass or mole percent, %vol, mol/L, g/L or "
            + "mol/kg. Spelled \"mole fraction\" (\"x\"), \"mass fraction\" (\"w\"), \"volume fraction\" "
            + "(\"phi\"), \"mass percent\" (\"%w/w\", \"wt%\", \"mass %\", \"% m/m\"), \"mole percent\" "
            + "(\"mol %\"), \"%vol\" (\"%v/v\"), \"mol/L\", \"g/L\", \"mol/kg\".";
    /** The trailing basis temperature of the blending functions: the reference of the volume-based bases. */
    private static final ArgumentInfo BASIS_T = optional("basisTemperature", "basis temperature",
            "The reference temperature of a volume-based basis (%vol, mol/L, g/L, volume fraction), card unit. "
                    + "Left out: the card's 'basis reference temperature' row, else 20 °C (OIML R 22); "
                    + "never the working temperature.");
    /** The trailing basis of the property functions: how the composition argument is written. */
    private static final ArgumentInfo COMPOSITION_BASIS = optional("compositionBasis", "basis",
            "The basis the composition is written on (left out: mole fraction); for %vol, mol/L, g/L the last "
                    + "component is the balance. " + BASES);
    private static final ArgumentInfo BALANCE = optional("balance", "balance",
            "The solvent that makes up the rest for %vol, mol/L, g/L and mol/kg, by number or name; left out, the "
                    + "card's last component.");
    private static final ArgumentInfo UNIT = value("unit", "unit",
            "The unit of the amounts: mol, kmol, g, kg, t, lb; mL, L, m³, US gal, imp gal for pure-liquid volumes. "
                    + "Masses weighed in air: \"kg (conventional)\" and the like.");
    private static final ArgumentInfo RESULT_UNIT = optional("resultUnit", "result unit",
            "The unit of the result, any the amounts take (left out: L for volumes, kg for masses, mol for moles).");
    private static final ArgumentInfo STORAGE_T = optional("storageTemperatures", "storage temperatures",
            "For volumes of the pure liquids, or masses weighed in air: the temperature of each, in card order (or one "
                    + "for all). Left out, masses weighed in air are at the batch's temperature.");
    private static final ArgumentInfo ORDER = value("order", "order",
            "The highest k of the coefficients A0..Ak to fit, 0 to " + RedlichKisterFitter.MAX_ORDER_IN_X + ".");
    private static final ArgumentInfo ORDER_IN_T = optional("orderInTemperature", "order in T",
            "The highest power j of (T − T_ref) in each A_k (left out: 0, constant coefficients).");
    private static final ArgumentInfo REFERENCE_T = optional("referenceTemperature", "reference temperature",
            "T_ref of the temperature polynomials; needed when the order in T is above 0.");
    private static final ArgumentInfo WEIGHTS = optional("weights", "weights",
            "A weight per point, zero or positive (left out: 1 each); a zero weight leaves the point out.");
    private static final ArgumentInfo RESULT = optional("result", "result",
            "What to return: \"coefficients\" (left out), \"standard errors\", \"statistics\", \"covariance\", "
                    + "\"residuals\", \"orders\" or \"check\". \"orders\" gives the fits of order 0 to the order "
                    + "given, with F-tests, AIC and BIC; \"check\" gives \"OK\", or why the fit is refused, in "
                    + "words.");
    private static final ArgumentInfo ACTIVITY = optional("activity", "activity",
            "\"card\" (left out): γ from the card's G^E/RT; \"ideal\": γ = 1, the ideal-solution estimate, for "
                    + "comparison only.");
    private static final ArgumentInfo BOILING = optional("boiling", "boiling",
            "TRUE gives the temperature even at or above the card's boiling point. Left out or FALSE, such a batch "
                    + "is refused: it would boil first.");
    private static final ArgumentInfo PER = optional("per", "per",
            "\"mol\" (left out): per mole of blend (or of the component); \"kg\": per kilogram of it.");
    private static final ArgumentInfo PRESSURE = range("pressure", "pressure",
            "Pressure in the card's pressure unit: one value, or one per composition (a column for a block, as x1 "
                    + "for a range).");
    private static final ArgumentInfo BASIS = optional("basis", "basis",
            "The unit of the amounts: \"mol\" (left out), \"kmol\", \"g\", \"kg\", \"t\", \"lb\" or a mass weighed in "
                    + "air (\"kg (conventional)\"). Masses are converted with the card's molar masses.");

    // --- call problems that no cell can produce (see notFromACell), with the reason; no function lists them
    private static final java.util.Map<Problem, String> NOT_FROM_A_CELL = notFromACell(
            Problem.ARG_NOT_FINITE, "Calc never passes NaN or an infinity (a cell that computes one shows an error, "
                    + "and Calc does not call a function with an error argument); the check guards the library's "
                    + "own callers",
            Problem.CHECK_NEEDS_BOTH, "MIX.CHECKPOINT always passes a composition and a temperature (leaving one "
                    + "out is Calc's own Err:502) and MIX.CHECK neither; the check guards the library's own callers",
            Problem.NO_CONVERGENCE, "the searches that could fail to converge are the final temperature's "
                    + "(MIX.TEMPERATURERISE, each point of MIX.TEMPERATUREPATH): Brent's method on a bracket whose ends "
                    + "differ in sign, at most 1024 K wide (40 bisection steps), within 200 evaluations, the balance's "
                    + "non-finite values refused before (NO_TEMPERATURE_ROOT); the hardest balance tried, a triple root "
                    + "in the widest bracket, needs 101 to 120 (FinalTemperatureSearchTest), and no card is known that "
                    + "reaches it; the cooling's (MIX.TEMPERATUREPATH's \"cooling\"), whose peak falls without "
                    + "bound as the heat removed grows, so its doubling always brackets the limit; and MIX.DEWPRESSURE's "
                    + "successive substitution of the drop, which settled on every card and vapour "
                    + "tried, liquids that split among them (DewPressureTest); and the bubble- and dew-point searches' "
                    + "guard against a balance the card's models cannot evaluate, which no card is known to reach "
                    + "since a Kohler pair of tiny fractions stopped giving 0/0 (MulticomponentCardTest). Calc would "
                    + "show Err:523",
            Problem.VLE_FIT_NOT_CONVERGED, "MIX.FITVLE's Levenberg–Marquardt search stops on its cost and "
                    + "parameter tolerances long before its " + org.miscela.core.fit.VleFitter.MAX_ITERATIONS
                    + " iterations on every data set tried (the published sets of VleFitTest take 5 to 14, slips of "
                    + "units and swapped columns end in VLE_FIT_POOR instead); the check guards a search that runs on",
            Problem.RAGGED_DESIGN, "a range or an inline array is rectangular, so every row of a design has as "
                    + "many columns as the first",
            Problem.NO_PARAMETERS, "a range has at least one column, and a Redlich–Kister fit at least one "
                    + "coefficient",
            Problem.BAD_ORDER, "the fit functions refuse an order outside 0 to " + RedlichKisterFitter.MAX_ORDER_IN_X
                    + ", or an order in T outside 0 to " + RedlichKisterFitter.MAX_ORDER_IN_T + ", first (NOT_A_COUNT), "
                    + "and an order given as empty text as blank (ARG_BLANK); leaving the order out is Calc's own "
                    + "error (Err:504), before any call",
            Problem.BAD_SIGNIFICANCE, "the order table's F-tests always use the 5 % level",
            Problem.NOT_NESTED, "the order table compares the fits of order 0, 1, 2, …, each with more "
                    + "coefficients than the one before",
            Problem.NOT_SAME_POINTS, "the order table fits every order to the same points",
            Problem.ARGUMENT_NOT_FINITE, "Calc never passes an infinity, and the blending functions compute no "
                    + "temperature of their own",
            Problem.NO_SUCH_COMPONENT, "every component argument is checked against the card first "
                    + "(UNKNOWN_COMPONENT_ARG)",
            Problem.VALUE_NOT_FINITE, "Calc never passes an infinity, and the values are checked as given",
            Problem.NEEDS_BALANCE, "the cell functions always name a balance: the card's last component when "
                    + "the argument is left out",
            Problem.NEEDS_SOLVENT, "the cell functions always name a solvent: the card's last component when "
                    + "the balance is left out",
            Problem.NO_COMPOSITION, "the concentration search's last fallback, for a card whose molar volume "
                    + "is not physical between two of the " + (Compositions.SCAN_CELLS + 1) + " points the search "
                    + "looks at while physical at all of "
                    + "them; no card or input is known that reaches it, and no test produces it (values too large "
                    + "to add up are TOO_CONCENTRATED)",
            Problem.NEEDS_TEMPERATURE, "every cell function that takes a quantity also takes the temperature "
                    + "it is measured at, as a required argument");

    // --- the problems functions report, by kind (card problems come on top for every function but the fits)
    private static final List<Problem> COMPOSITION_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.ARG_SHAPE, Problem.NOT_BINARY, Problem.MOLE_FRACTION_OUTSIDE_UNIT, Problem.COMPOSITION_NEGATIVE,
            Problem.COMPOSITION_SUM, Problem.COMPOSITION_SHAPE, Problem.COMPOSITION_AMBIGUOUS);
    /** One composition (MIX.TRACE): a column of n cells is one composition on any card, so nothing is ambiguous. */
    private static final List<Problem> ONE_COMPOSITION_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.ARG_SHAPE, Problem.NOT_BINARY, Problem.MOLE_FRACTION_OUTSIDE_UNIT, Problem.COMPOSITION_NEGATIVE,
            Problem.COMPOSITION_SUM, Problem.COMPOSITION_SHAPE);
    private static final List<Problem> POINT_PROBLEMS = list(Problem.ARG_NOT_FLAG, Problem.BELOW_ABSOLUTE_ZERO,
            Problem.OUTSIDE_TEMPERATURE, Problem.OUTSIDE_COMPOSITION, Problem.OUTSIDE_PAIR_TEMPERATURE,
            Problem.OUTSIDE_PAIR_COMPOSITION, Problem.NON_PHYSICAL);
    private static final List<Problem> VOLUME_PROBLEMS = list(Problem.NO_VOLUME);
    private static final List<Problem> VAPOUR_PROBLEMS = list(Problem.NO_GIBBS, Problem.NO_VAPOUR_PRESSURE,
            Problem.OUTSIDE_VAPOUR_PRESSURE, Problem.NO_PRESSURE_UNIT);
    private static final List<Problem> COMPONENT_PROBLEMS = list(Problem.UNKNOWN_COMPONENT_ARG, Problem.ARG_NOT_SINGLE);
    private static final List<Problem> AMOUNT_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.ARG_SHAPE, Problem.COMPOSITION_SHAPE,
            Problem.AMOUNT_NEGATIVE, Problem.AMOUNT_ZERO, Problem.AMOUNT_TOO_LARGE, Problem.UNKNOWN_BASIS,
            Problem.LIGHTER_THAN_AIR, Problem.PURE_HYPOTHETICAL);
    private static final List<Problem> DATA_PROBLEMS = list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER,
            Problem.ARG_NOT_SINGLE, Problem.DATA_SHAPE, Problem.DATA_LENGTH, Problem.DATA_PARTLY_BLANK, Problem.NOT_A_COUNT,
            Problem.UNKNOWN_FIT_OUTPUT);
    private static final List<Problem> FIT_ENGINE_PROBLEMS = fromACell(Problem.of(Problem.Section.FIT));
    private static final List<Problem> BLEND_PROBLEMS = union(fromACell(Problem.of(Problem.Section.BLEND)), list(Problem.ARG_BLANK,
            Problem.ARG_NOT_NUMBER, Problem.ARG_NOT_TEXT, Problem.ARG_NOT_SINGLE, Problem.COMPOSITION_SHAPE,
            Problem.UNKNOWN_COMPONENT_ARG, Problem.PURE_HYPOTHETICAL));

    private static final List<FunctionInfo> FUNCTIONS = Collections.unmodifiableList(Arrays.asList(
            new FunctionInfo("excessMolarVolume", "MIX.EXCESSVOLUME", "excess molar volume V^E",
                    "Excess molar volume of the mixture from the card's Redlich–Kister coefficients, "
                            + "in the card's molar volume unit.",
                    "V^E = Σ_i<j x_i·x_j·Σ_k A_k^ij(T)·d_ij^k + ternary terms; binary: d = x1 − x2 (Redlich & Kister "
                            + "1948); d_ij by the card's model: Muggianu x_i − x_j, Kohler (x_i − x_j)/(x_i + x_j), "
                            + "Toop 2x_a − 1 for pairs with the asymmetric component a",
                    "=MIX.EXCESSVOLUME(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("-1.0567").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS)),
            new FunctionInfo("partialMolarVolume", "MIX.PARTIALVOLUME", "partial molar volume of a component",
                    "Partial molar volume of one component in the mixture, in the card's molar volume unit.",
                    "V̄_k = V_k* + V^E + ∂V^E/∂x_k − Σ_j x_j·∂V^E/∂x_j (binary: V̄_1 = V_1* + V^E + x2·dV^E/dx1)",
                    "=MIX.PARTIALVOLUME(card; 1; 0.3; 20)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("56.670").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, COMPONENT_PROBLEMS)),
            new FunctionInfo("partialExcessMolarVolume", "MIX.PARTIALEXCESS",
                    "partial molar excess volume of a component",
                    "Partial molar excess volume of one component "
                            + "(its partial molar volume less its pure molar volume), in the card's molar volume unit.",
                    "V̄_k^E = V^E + ∂V^E/∂x_k − Σ_j x_j·∂V^E/∂x_j (binary: V̄_1^E = V^E + x2·dV^E/dx1)",
                    "=MIX.PARTIALEXCESS(card; \"water\"; 0.3; 20)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("-0.7808").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, COMPONENT_PROBLEMS)),
            new FunctionInfo("mixtureMolarVolume", "MIX.MOLARVOLUME", "molar volume of the mixture",
                    "Molar volume of the mixture (volume per mole of mixture), in the card's molar volume unit.",
                    "V_m = Σ_k x_k·V_k* + V^E, V_k* = M_k / ρ_k(T)",
                    "=MIX.MOLARVOLUME(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("29.088").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS)),
            new FunctionInfo("mixtureDensity", "MIX.DENSITY", "density of the mixture",
                    "Density of the mixture, in the card's density unit.",
                    "ρ = Σ_k x_k·M_k / V_m",
                    "=MIX.DENSITY(card; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("908.667").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS)),
            new FunctionInfo("pureDensity", "MIX.PUREDENSITY", "density of a pure component",
                    "Density of one pure component from its model on the card, in the card's density unit.",
                    "constant: ρ = c0; polynomial: ρ = Σ_j c_j·(T − T_ref)^j; Tanaka 2001: the CIPM water formula",
                    "=MIX.PUREDENSITY(card; \"water\"; 20)",
                    CARD, COMPONENT, range("temperature", "temperature",
                            "Temperature in the card's temperature unit. A single value, or a range for an array "
                                    + "result."), EXTRAPOLATE)
                    .shows("998.201").refuses(union(COMPONENT_PROBLEMS, list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER, Problem.ARG_NOT_FLAG, Problem.BELOW_ABSOLUTE_ZERO, Problem.OUTSIDE_TEMPERATURE, Problem.NON_PHYSICAL, Problem.PURE_HYPOTHETICAL))),
            new FunctionInfo("checkCard", "MIX.CHECK",
                    "\"OK\", the card's first problem naming its row, or \"OK with n warnings: …\"",
                    "\"OK\" when the card reads and nothing looks like a mistake; \"OK with n warnings: …\" when values "
                            + "look odd; otherwise its first problem, naming the row. Warnings change no other "
                            + "function's result. Asked for, the warnings one per row, the rows of the range that hold "
                            + "the card, or each coefficient's significant digits.",
                    "—",
                    "=MIX.CHECK(card)",
                    CARD, optional("result", "result", "What to return: \"summary\" (left out), \"warnings\", \"extent\" or "
                            + "\"digits\". The summary is one text as described; \"warnings\" lists one per row (\"OK\" "
                            + "when none); \"extent\" says which rows and columns of the range hold the card; "
                            + "\"digits\" gives every coefficient's significant digits, written and needed."))
                    .answersInWordsOrTables()
                    .shows("OK").refuses(list(Problem.UNKNOWN_FIT_OUTPUT)),
            new FunctionInfo("checkPoint", "MIX.CHECKPOINT", "\"OK\" or why the functions refuse at that point",
                    "\"OK\" when the functions can answer at this composition and temperature; otherwise why they "
                            + "refuse (for example the validity limit that is exceeded).",
                    "—",
                    "=MIX.CHECKPOINT(card; 0.3; 45)",
                    CARD, MOLE_FRACTION_ONE, TEMPERATURE_ONE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T).answersInWords()
                    .shows("The temperature 45 °C is outside the card's validity range 0 to 40 °C.").refuses(list(Problem.ARG_NOT_SINGLE)),
            new FunctionInfo("excessEnthalpy", "MIX.EXCESSENTHALPY",
                    "excess molar enthalpy H^E (heat of mixing per mole)",
                    "Excess molar enthalpy (heat of mixing per mole of mixture) from the card's excess enthalpy "
                            + "coefficients, in the card's enthalpy unit; negative when mixing releases heat.",
                    "H^E = Σ_i<j x_i·x_j·Σ_k A_k^ij(T)·d_ij^k + ternary terms, combined as for V^E",
                    "=MIX.EXCESSENTHALPY(tern; {0.3; 0.5; 0.2}; 25)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("-719.5").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("partialExcessEnthalpy", "MIX.PARTIALENTHALPY",
                    "partial molar excess enthalpy of a component",
                    "Partial molar excess enthalpy of one component (its partial molar enthalpy less its pure molar "
                            + "enthalpy), in the card's enthalpy unit.",
                    "H̄_k^E = H^E + ∂H^E/∂x_k − Σ_j x_j·∂H^E/∂x_j",
                    "=MIX.PARTIALENTHALPY(tern; \"Q\"; {0.3; 0.5; 0.2}; 25)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("-773.5").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("mixingHeat", "MIX.MIXINGHEAT",
                    "enthalpy change on mixing given amounts (negative: heat released)",
                    "Enthalpy change when the given amounts of the pure components, all at one temperature, are mixed "
                            + "and kept at that temperature. J or kJ as the card's enthalpy unit; negative means heat "
                            + "is released and must be removed.",
                    "ΔH = N·H^E(x, T), N = Σ n_k, x_k = n_k/N",
                    "=MIX.MIXINGHEAT(acid; {1; 10}; 25)",
                    CARD, AMOUNTS, BATCH_TEMPERATURE, BASIS, EXTRAPOLATE)
                    .shows("-66.50").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("additionHeat", "MIX.ADDITIONHEAT", "enthalpy change on adding one component to a batch",
                    "Enthalpy change when an amount of one component is added to an existing batch, all at one "
                            + "temperature: J or kJ as the card's enthalpy unit; negative means heat is released.",
                    "ΔH = (N + Δn)·H^E(x') − N·H^E(x)",
                    "=MIX.ADDITIONHEAT(acid; {1; 1}; \"water\"; 9; 25)",
                    CARD, AMOUNTS, COMPONENT, value("added", "added",
                            "The amount of the component added, in the same basis as the amounts."),
                    BATCH_TEMPERATURE, BASIS, EXTRAPOLATE)
                    .shows("-38.70").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS, list(Problem.NO_ENTHALPY))),
            new FunctionInfo("adiabaticRise", "MIX.TEMPERATURERISE",
                    "estimated adiabatic temperature rise of a batch, K (°F on a card in °F)",
                    "Estimated temperature rise, in K (the same in °C; in °F on a card in °F), of a batch mixed from "
                            + "pure components all at "
                            + "one temperature with no heat exchanged. An estimate for planning, not a safety "
                            + "rating: it ignores the vessel, losses, evaporation and reaction.",
                    "Σ_k n_k·∫_T^T_f Cp_k dT + N·H^E(x, T_f) = 0, solved for T_f (Brent); result T_f − T",
                    "=MIX.TEMPERATURERISE(acid; {1; 10}; 25; \"mol\"; TRUE())",
                    CARD, AMOUNTS, range("temperature", "temperature",
                            "Starting temperature of every component, in the card's unit: one value, or a column "
                                    + "with one per batch."), BASIS, EXTRAPOLATE, BOILING)
                    .shows("74.57").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, list(Problem.NO_ENTHALPY, Problem.NO_HEAT_CAPACITY, Problem.NO_TEMPERATURE_ROOT, Problem.OUTSIDE_FINAL_TEMPERATURE, Problem.BOILS))),
            new FunctionInfo("insideValidity", "MIX.INSIDE",
                    "1 (TRUE) when the point is inside every validity limit of the card, else 0",
                    "1 (TRUE) when the composition and temperature lie inside every validity limit the card states "
                            + "(temperature, each component's mole fraction, each pair's limits); 0 (FALSE) otherwise.",
                    "—",
                    "=MIX.INSIDE(tern; {0.1; 0.3; 0.6}; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, COMPOSITION_BASIS, BASIS_T)
                    .shows("0").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, list(Problem.BELOW_ABSOLUTE_ZERO))),
            new FunctionInfo("traceEvaluation", "MIX.TRACE",
                    "every intermediate number of one evaluation, as a label/value table ([`docs/trace.md`](docs/trace.md))",
                    "Every intermediate number of one evaluation, as a two-column array of labels and values, so the "
                            + "result can be re-derived by hand (see docs/trace.md).",
                    "—",
                    "=MIX.TRACE(card; 0.3; 20)",
                    CARD, MOLE_FRACTION_ONE, TEMPERATURE_ONE, optional("quantity", "property",
                            "\"volume\" (left out), \"enthalpy\", \"vapour\", \"flash\" or \"freezing\": what "
                                    + "to trace. \"vapour\": γ, the bubble pressure and the vapour; \"flash\": those "
                                    + "and the flash point's terms; \"freezing\": the freezing point's."),
                    EXTRAPOLATE, COMPOSITION_BASIS,
                    BASIS_T)
                    .shows("card").refuses(union(BLEND_PROBLEMS, ONE_COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, list(Problem.NO_ENTHALPY, Problem.UNKNOWN_PROPERTY, Problem.ARG_NOT_SINGLE,
                            Problem.OSMOTIC_SERIES_RANGE), VAPOUR_PROBLEMS)),
            new FunctionInfo("fitExcessVolume", "MIX.FITEXCESS",
                    "Redlich–Kister coefficients fitted to excess volumes (or their statistics)",
                    "Redlich–Kister coefficients fitted by least squares to excess volumes, or the fit's standard "
                            + "errors, statistics, covariance, residuals or order table. The coefficients are an array "
                            + "of A0..Am (one row each, one column per power of T − T_ref) to enter over a card's "
                            + "coefficient cells.",
                    "min Σ w_i (V^E_i − x1·x2·Σ_k Σ_j a_kj (x1 − x2)^k (T_i − T_ref)^j)², Householder QR with column "
                            + "scaling and iterative refinement",
                    "=INDEX(MIX.FITEXCESS({0.2|0.4|0.6|0.8}; {-0.736|-1.008|-0.912|-0.544}; 1); 2; 1)",
                    range("moleFraction", "x1", "Mole fraction of the first component at each point: a column "
                            + "(or row). Points left blank in every data range are skipped."),
                    range("excessVolume", "excess volume", "The excess molar volume at each point, in any unit: "
                            + "the coefficients come out in the same unit."),
                    ORDER,
                    optional("temperature", "temperature", "The temperature of each point, for "
                            + "temperature-dependent coefficients. Any scale: only differences from T_ref are used."),
                    ORDER_IN_T, REFERENCE_T, WEIGHTS, RESULT)
                    .shows("1.0000").refuses(union(DATA_PROBLEMS, FIT_ENGINE_PROBLEMS, list(Problem.FIT_NEEDS_TEMPERATURE, Problem.FIT_NEEDS_REFERENCE, Problem.FIT_OUTPUT_NOT_HERE))),
            new FunctionInfo("fitDensity", "MIX.FITDENSITY",
                    "Redlich–Kister coefficients of a pair fitted to measured densities",
                    "Redlich–Kister coefficients of one pair fitted to measured densities: an array to enter over the "
                            + "card's coefficient cells (in its molar volume unit), or the fit's statistics. The pure "
                            + "liquids' molar masses and densities are taken from a card.",
                    "V^E_i = Σ x M / ρ_i − x1·V_1*(T_i) − x2·V_2*(T_i); min Σ w_i (ρ_i − ρ_fit,i)² to first order "
                            + "(each V^E residual weighted by (ρ_i²/M_i)²)",
                    "=INDEX(MIX.FITDENSITY(card; \"ethanol + water\"; {0.1|0.3|0.5|0.7|0.9}; {965.728|908.666|863.096|829.229|801.749}; 20; 2); 1; 1)",
                    range("pure", "pure data", "The cells of a card's pure-component part: header, units, "
                            + "components and density models. Put the coefficient rows, which hold this formula, "
                            + "below it."),
                    optional("pair", "pair", "The pair as \"first + second\"; may be left out for a card of two "
                            + "components."),
                    range("moleFraction", "x", "Mole fraction of the pair's first component at each point (a "
                            + "column). Points left blank in every data range are skipped."),
                    range("density", "density", "The measured density at each point, in the card's density "
                            + "unit."),
                    range("temperature", "temperature", "The temperature of each point, or one value for all, in "
                            + "the card's temperature unit."),
                    ORDER, ORDER_IN_T, REFERENCE_T, WEIGHTS, RESULT)
                    .shows("-4.400").refuses(union(DATA_PROBLEMS, FIT_ENGINE_PROBLEMS, list(Problem.FIT_NEEDS_REFERENCE, Problem.UNKNOWN_PAIR_ARG, Problem.NON_PHYSICAL, Problem.FIT_OUTPUT_NOT_HERE))),
            new FunctionInfo("leastSquares", "MIX.LEASTSQUARES", "general linear least squares by the same engine",
                    "General weighted linear least squares y ≈ X·b, by the same engine as the card fits: the "
                            + "coefficients b as a column, or their standard errors, the statistics, the covariance "
                            + "or the residuals.",
                    "min Σ w_i (y_i − Σ_j X_ij b_j)², Householder QR with column scaling and iterative refinement",
                    "=INDEX(MIX.LEASTSQUARES({1;1|1;2|1;3}; {2.1|3.9|6.0}); 2; 1)",
                    range("design", "X", "The design matrix: one row per point, one column per parameter "
                            + "(include a column of 1s for an intercept)."),
                    range("response", "y", "The observed values, one per point (a column)."),
                    WEIGHTS, optional("result", "result", "\"coefficients\" (left out), \"standard "
                            + "errors\", \"statistics\", \"covariance\", \"residuals\" or \"check\"."))
                    .shows("1.95").refuses(union(list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER, Problem.DATA_SHAPE, Problem.UNKNOWN_FIT_OUTPUT, Problem.FIT_OUTPUT_NOT_HERE), FIT_ENGINE_PROBLEMS)),
            new FunctionInfo("uncertainty", "MIX.UNCERTAINTY",
                    "standard uncertainty of a result from the card's coefficient covariance",
                    "Standard uncertainty of the density, excess volume, molar volume or a partial molar volume, in "
                            + "the result's unit. It is propagated linearly from the coefficient covariance the card "
                            + "holds (the pure liquids taken as exact).",
                    "u²(Q) = Σ_pairs gᵀ·C·g, g = ∂Q/∂a (GUM, JCGM 100:2008, law of propagation of uncertainty)",
                    "=MIX.UNCERTAINTY(cov; 0.3; 20)",
                    CARD, MOLE_FRACTION, TEMPERATURE, optional("quantity", "quantity",
                            "\"density\" (left out), \"excess volume\", \"molar volume\" or "
                                    + "\"partial volume\" (then give the component)."),
                    optional("component", "component", "For a partial volume: the component's number on the card "
                            + "or its name."), EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("0.178").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VOLUME_PROBLEMS, COMPONENT_PROBLEMS, list(Problem.NO_COVARIANCE, Problem.NO_MODEL_COVARIANCE, Problem.UNKNOWN_QUANTITY, Problem.ARG_NOT_TEXT))),
            new FunctionInfo("convertComposition", "MIX.CONVERT",
                    "a composition on another basis: mole, mass or volume fraction, %vol, mol/L, g/L, mol/kg",
                    "A composition on one basis written on another: mole, mass or volume fraction, %vol, mol/L, g/L "
                            + "or mol/kg. Volume fractions are of the unmixed liquids; %vol is the strength, mol/L the "
                            + "molarity, g/L the mass concentration and mol/kg the molality (per kg of the balance "
                            + "component). A lone number on a two-component card gives the first component's value "
                            + "(or the one the component argument names)." + LAYOUT,
                    "x_k ↔ w_k = x_k M_k/Σ x M; φ_k = x_k V_k*(T)/Σ x V*; %vol_k = 100 x_k V_k*(T)/V_m(T); "
                            + "c_k = x_k/V_m(T); ρ_k = x_k M_k/V_m(T); b_k = x_k/(x_s M_s); concentrations read back by "
                            + "Brent's method on the balance's mole fraction",
                    "=MIX.CONVERT(card; 0.5; \"mass fraction\"; \"%vol\"; 20)",
                    CARD, range("values", "values", "The composition on the from basis: one value per component in "
                            + "card order (a row or column), or a block with one per row. On a concentration basis "
                            + "the balance's own entry may be blank. A lone number on a two-component card is the "
                            + "first component's value."),
                    value("from", "from", BASES), value("to", "to", BASES),
                    optional("temperature", "temperature", "The reference temperature of the from basis, and of the "
                            + "to basis unless the next argument gives one, in the card's unit. Left out: the card's "
                            + "'basis reference temperature' row, else 20 °C (OIML R 22)."),
                    optional("targetTemperature", "to temperature", "The temperature of the to basis."),
                    BALANCE, EXTRAPOLATE, PICK)
                    .shows("57.889").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS)),
            new FunctionInfo("batchTotals", "MIX.BATCH",
                    "volume, mass, moles, density or contraction of a batch made from amounts",
                    "The volume, mass, moles, density, pure-liquid volume or contraction on mixing (absolute or %) "
                            + "of a batch made from the given amounts. The batch is mixed and brought to the "
                            + "temperature given; the pure-liquid volume is the liquids' volume before mixing.",
                    "V = N·V_m(x, T); contraction = Σ n_k V_k*(T) − V (positive when the mixture shrinks)",
                    "=MIX.BATCH(card; {50; 50}; \"g\"; 20; \"contraction\"; \"mL\")",
                    CARD, AMOUNTS, UNIT, range("temperature", "temperature",
                            "The temperature of the mixed batch, in the card's unit: one value, or a column with one "
                                    + "per batch."),
                    optional("result", "result", "\"volume\" (left out), \"mass\", \"moles\", "
                            + "\"density\", \"pure volume\", \"contraction\" or \"contraction %\"."),
                    RESULT_UNIT, STORAGE_T, EXTRAPOLATE)
                    .shows("4.006").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS)),
            new FunctionInfo("recipe", "MIX.RECIPE",
                    "what to charge of each component for a target quantity and composition",
                    "What to charge of each component to make a quantity (a volume at a temperature, a mass or moles) "
                            + "of a target composition. The result is one amount per component in card order: masses in kg "
                            + "unless another unit is asked for (a volume unit gives each pure liquid's volume at its "
                            + "storage temperature)." + LAYOUT,
                    "N = Q (moles), Q/Σ x M (mass) or V/V_m(x, T) (volume); n_k = N·x_k; m_k = n_k M_k; "
                            + "V_k = n_k V_k*(T_k)",
                    "=INDEX(MIX.RECIPE(card; 1; \"L\"; 40; \"%vol\"; 20; 20; \"mL\"); 1; 1)",
                    CARD, value("quantity", "quantity", "The quantity to make."),
                    value("unit", "unit", "Its unit: mol, kmol, g, kg, t, lb, or mL, L, m³, US gal, imp gal for a "
                            + "volume of the mixture at the temperature. Masses weighed in air: \"kg (conventional)\" "
                            + "and the like."),
                    range("composition", "composition", "The target composition on the basis, one value per "
                            + "component; on a two-component card a lone number is the first component's. A block "
                            + "gives one recipe per row."),
                    value("basis", "basis", BASES),
                    value("temperature", "temperature", "The temperature of the quantity when a volume, in the "
                            + "card's unit (not of the basis: see basis temperature)."),
                    STORAGE_T, RESULT_UNIT, BALANCE, EXTRAPOLATE, PICK, BASIS_T)
                    .shows("400.00").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS)),
            new FunctionInfo("adjustBatch", "MIX.ADJUST",
                    "what to add to an existing batch to reach a target composition",
                    "How much of each component to add to an existing batch to reach a target composition, or the "
                            + "resulting volume, or a sentence saying whether the target is reached. The additions "
                            + "are the least ones, those giving the closest composition within a limit, or those "
                            + "making up to a final quantity. The additions come out as a row, or as a column when "
                            + "the batch was given as a column; the component argument gives one addition alone.",
                    "n'_k = n_k + a_k, a_k ≥ 0; least: N' = max_k n_k/x_k; otherwise the composition closest to the "
                            + "target in mole fraction (least squares) at the limit's total",
                    "=INDEX(MIX.ADJUST(card; {500; 500}; \"g\"; 0.4; \"mass fraction\"; 20); 1; 2)",
                    CARD, range("amounts", "amounts", "The batch: the amount of each component in card order."),
                    UNIT, range("target", "target", "The target composition on the basis (a lone number on a "
                            + "two-component card is the first component's)."),
                    value("basis", "basis", BASES),
                    value("temperature", "temperature", "The temperature of the batch, in the card's unit (not of "
                            + "the basis: see basis temperature)."),
                    optional("mode", "mode", "\"least\" additions (left out), \"within\" the limit (the closest "
                            + "composition if the target does not fit) or \"make up\" to it."),
                    optional("limit", "limit", "For within and make up: the largest, or the final, quantity."),
                    optional("limitUnit", "limit unit", "The unit of the limit, any the amounts take (a volume, or a "
                            + "mass weighed in air, is at the temperature)."),
                    optional("result", "result", "\"additions\" (left out), \"volume\" (of the batch "
                            + "after the additions) or \"summary\"."),
                    RESULT_UNIT, BALANCE, EXTRAPOLATE, PICK, BASIS_T)
                    .shows("0.2500").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS,
                            list(Problem.COMPONENT_NOT_HERE))),
            new FunctionInfo("additionVolume", "MIX.ADDVOLUME",
                    "volume change on adding a component, exact and to first order",
                    "The volume change of a batch when an amount of one component is added: exact, to first order, or "
                            + "the difference of the two. Exact is the difference of the two totals, first order the "
                            + "partial molar volume × amount; the difference shows when the linear estimate is good "
                            + "enough.",
                    "exact ΔV = V(n + Δn·e_k) − V(n); first order ΔV ≈ V̄_k(x)·Δn",
                    "=MIX.ADDVOLUME(card; {50; 50}; \"g\"; \"ethanol\"; 10; 20; ; \"mL\")",
                    CARD, range("amounts", "amounts", "The batch: the amount of each component in card order."),
                    UNIT, COMPONENT, value("added", "added", "The amount added, in the unit of the amounts."),
                    value("temperature", "temperature", "The temperature of the batch, in the card's unit."),
                    optional("result", "result", "\"exact\" (left out), \"first order\" or "
                            + "\"difference\" (first order minus exact)."),
                    RESULT_UNIT, STORAGE_T, EXTRAPOLATE)
                    .shows("12.302").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS)),
            new FunctionInfo("compositionFromDensity", "MIX.FROMDENSITY",
                    "the composition at which the card's density equals a measured one",
                    "The composition at which the card's density equals a measured density: the content of one "
                            + "component on a chosen basis. Every composition with that density is searched for; "
                            + "when there are several the call is refused, listing them, until a range is given.",
                    "ρ(x(s), T) = ρ_measured along x(s) (component k at s, the others in the reference's ratios); "
                            + "a scan in " + DensityInversion.SCAN_CELLS + " cells, each root refined by Brent's method",
                    "=MIX.FROMDENSITY(card; 913.771; 20; 1; \"mass fraction\")",
                    CARD, range("density", "density", "The measured density in the card's unit: a value, or a "
                            + "range for an array result."),
                    range("temperature", "temperature", "The temperature of the measurement in the card's unit: "
                            + "a value, or a range of the same shape."),
                    optional("component", "component", "The component whose content is sought (left out: "
                            + "the first)."),
                    optional("basis", "basis", "The basis of the result (left out: mole fraction). " + BASES),
                    optional("basisTemperature", "basis temperature", "The reference temperature of that basis "
                            + "(left out: the card's 'basis reference temperature' row, else 20 °C)."),
                    optional("reference", "reference", "For three or more components: mole fractions whose other "
                            + "components keep their ratios while the component varies."),
                    optional("from", "from", "The lowest mole fraction of the component to consider."),
                    optional("to", "to", "The highest mole fraction of the component to consider."),
                    BALANCE, EXTRAPOLATE)
                    .shows("0.5000").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS,
                            list(Problem.COMPOSITION_LENGTH))),
            new FunctionInfo("volumeCorrection", "MIX.VOLUMEFACTOR",
                    "volume correction factor to a reference temperature, or the density at either",
                    "Temperature correction of a blend of known composition: the factor turning a volume measured at "
                            + "one temperature into the volume at a reference temperature, or the density at either. "
                            + "The reference is 15 °C or 20 °C for quotes and custody transfer.",
                    "factor = V(T_ref)/V(T) = ρ(T)/ρ(T_ref) at fixed composition",
                    "=MIX.VOLUMEFACTOR(card; 0.5; \"mass fraction\"; 25; 20)",
                    CARD, range("composition", "composition", "The blend's composition on the basis; on a "
                            + "two-component card a lone number is the first component's. A block gives one factor "
                            + "per row."),
                    value("basis", "basis", BASES),
                    range("temperature", "temperature", "The measured temperature in the card's unit (one, or "
                            + "one per row of a block)."),
                    value("referenceTemperature", "reference temperature", "The reference temperature in the "
                            + "card's unit."),
                    optional("result", "result", "\"factor\" (left out), \"density\" (at the measured "
                            + "temperature) or \"reference density\"."),
                    optional("basisTemperature", "basis temperature", "The reference temperature of the basis "
                            + "(left out: the card's 'basis reference temperature' row, else 20 °C (OIML R 22))."),
                    BALANCE, EXTRAPOLATE)
                    .shows("0.99562").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS)),
            new FunctionInfo("addInInfo", "MIX.INFO",
                    "the add-in's version (for audit records), how many cards it has parsed and holds, or its last "
                            + "unexpected failure",
                    "Facts about the add-in itself: its version (for audit records), how many cards it has "
                            + "parsed and holds (each distinct card content is parsed once), or its last unexpected "
                            + "failure.",
                    "—",
                    "=MIX.INFO(\"version\")",
                    optional("item", "item", "What to report: \"version\" (left out), \"card reads\", \"cards "
                            + "kept\" or \"last failure\". Card reads: cards parsed since the office started; cards "
                            + "kept: parsed cards held now; last failure: the last unexpected failure since the office "
                            + "started (a #VALUE! cell's words, with its time in UTC)."))
                    .shows(VERSION).refuses(list(Problem.ARG_NOT_TEXT, Problem.UNKNOWN_INFO_ITEM)),
            new FunctionInfo("explainCall", "MIX.EXPLAIN",
                    "\"OK\" (with any warnings) or, for a call that shows Err:502, why: the same arguments after the name",
                    "The words for a call: \"OK\" when the named function gives a result, \"OK with n warnings: "
                            + "…\" when its card or an argument looks like a slip, otherwise why it is refused "
                            + "(Err:502). It runs that function on the same arguments, so it always agrees with the "
                            + "call; it never refuses itself. A warning changes no result.",
                    "—",
                    "=MIX.EXPLAIN(\"MIX.BATCH\"; card; {50; 50}; \"oz\"; 20)",
                    value("functionName", "function", "The function's name as text: \"MIX.DENSITY\" or "
                            + "\"density\" (case does not matter)."),
                    argumentList("arguments", "arguments", "The same arguments as the call, in its order (one per "
                            + "argument box); leave out here what the call leaves out.")).answersInWords()
                    .shows("The unit \"oz\" is not recognised").refuses(list()),
            new FunctionInfo("mixtureMolarMass", "MIX.MOLARMASS", "mean molar mass of the mixture",
                    "Mean molar mass of the mixture (mass per mole of mixture) from the molar masses on the card, in "
                            + "the card's molar mass unit. It needs no temperature and no density.",
                    "M = Σ_k x_k·M_k",
                    "=MIX.MOLARMASS(card; 0.3)",
                    CARD, MOLE_FRACTION, COMPOSITION_BASIS, BASIS_T)
                    .shows("26.431").refuses(union(BLEND_PROBLEMS, POINT_PROBLEMS, list(Problem.ARG_BLANK, Problem.ARG_NOT_NUMBER, Problem.NOT_BINARY,
                            Problem.MOLE_FRACTION_OUTSIDE_UNIT, Problem.COMPOSITION_NEGATIVE,
                            Problem.COMPOSITION_SUM, Problem.COMPOSITION_SHAPE, Problem.COMPOSITION_AMBIGUOUS))),
            new FunctionInfo("blendHeatCapacity", "MIX.HEATCAPACITY", "heat capacity of the blend",
                    "Heat capacity of the blend per mole (or per kg), in the card's enthalpy unit per degree: the "
                            + "card's solution model, or the pure liquids' plus ∂H^E/∂T (MIX.TRACE says which). A pure "
                            + "liquid is a valid point whatever compositions the card's data cover.",
                    "Cp = Σ_k x_k·Cp_k + ∂H^E/∂T, or w_w·Cp_w + Σ_i w_i·Cp_app,i (Laliberté 2009) per gram",
                    "=MIX.HEATCAPACITY(acid; 0.5; 25)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T, PER)
                    .shows("0.1071").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            list(Problem.NO_HEAT_CAPACITY, Problem.UNKNOWN_BASIS))),
            new FunctionInfo("partialHeatCapacity", "MIX.PARTIALHEATCAPACITY",
                    "partial molar heat capacity of a component",
                    "Partial molar heat capacity of one component, ∂(N·Cp)/∂n_k, in the card's enthalpy unit per "
                            + "degree (or per kg of the component). It is how much the blend's heat capacity grows per "
                            + "mole of it added.",
                    "C̄p_k = Cp_k + ∂H̄_k^E/∂T, or from the solution model's total heat capacity by n_k",
                    "=MIX.PARTIALHEATCAPACITY(acid; \"water\"; 0.5; 25)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T, PER)
                    .shows("0.07529").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, list(Problem.NO_HEAT_CAPACITY, Problem.UNKNOWN_BASIS))),
            new FunctionInfo("temperaturePath", "MIX.TEMPERATUREPATH",
                    "temperature along the order of addition, and its peak",
                    "The batch's temperature along its order of addition: amount added and temperature as two "
                            + "columns for a chart, or the peak, where it is reached, or the end. No heat is exchanged "
                            + "but the heat removed. An estimate for planning, not a safety rating.",
                    "after each part of the addition: the adiabatic temperature of everything charged so far "
                            + "(N·H^E(x,T0) + N·∫Cp_blend dT − Σ n_k∫Cp_k dT + C_vessel·ΔT + Q_removed = 0)",
                    "=MIX.TEMPERATUREPATH(acid; {\"water\"; \"sulfuric acid\"}; {10; 1}; 25; \"mol\"; TRUE(); "
                            + "\"peak\")",
                    CARD, range("charges", "charges", "The components in charging order, by name or number, as a row or "
                                    + "column. The first is in the vessel at the start; each next one is added in turn."),
                            range("amounts", "amounts", "The amount of each charge, one per charge, in the unit."),
                            range("temperature", "temperature", "The temperature each charge is fed at, in the card's "
                                    + "unit: one for all, or one per charge; the vessel starts at the first's."),
                            BASIS, EXTRAPOLATE,
                            optional("result", "result", "\"path\" (left out): amount added and temperature per point; "
                                    + "\"peak\", \"peak at\", \"final\", or \"cooling\" to stay at the limit."),
                            optional("steps", "steps", "Points per added charge, 1 to 1000 (left out: 20); the peak is "
                                    + "refined between them."),
                            optional("vesselHeatCapacity", "vessel heat capacity", "The vessel's heat capacity in the "
                                    + "card's energy unit per degree (J/K or kJ/K); it warms with the batch (left out: 0)."),
                            optional("heatRemoved", "heat removed", "The cooling over the whole addition in the card's "
                                    + "energy unit, removed in proportion to the amount added (left out: 0)."), BOILING,
                            optional("limit", "limit", "For the result \"cooling\": the highest temperature the batch may "
                                    + "reach, in the card's unit. The answer is the least heat to remove over the addition."))
                    .shows("99.57").refuses(union(AMOUNT_PROBLEMS, POINT_PROBLEMS, COMPONENT_PROBLEMS,
                            list(Problem.NO_ENTHALPY, Problem.NO_HEAT_CAPACITY, Problem.NO_TEMPERATURE_ROOT,
                                    Problem.OUTSIDE_FINAL_TEMPERATURE, Problem.PATH_EMPTY_VESSEL, Problem.PATH_STEPS,
                                    Problem.DATA_LENGTH, Problem.UNKNOWN_FIT_OUTPUT, Problem.BOILS,
                                    Problem.PATH_LIMIT))),
            new FunctionInfo("packCard", "MIX.PACK", "the card as one text, for fast single-cell formulas",
                    "The card's whole content as one text, title and source first: put it in one cell and name "
                            + "that cell instead of the card's range in single-cell formulas. Calc then reads the range "
                            + "once per recalculation instead of once per call; results are identical, calls about "
                            + "twice as fast, and a card named as whole columns stops costing a pass per call.",
                    "—",
                    "=LEFT(MIX.PACK(card); 21)",
                    range("card", "card", "The named range holding the card: labels in the first column, values to "
                            + "their right."))
                    .shows("Miscela packed card 1").refuses(list()),
            new FunctionInfo("libraryList", "MIX.LIBRARY",
                    "the cards that come with the add-in: names, validity, published sources and outside checks",
                    "A table of the cards that come with Miscela, headings first: name, title, components, valid "
                            + "temperatures, published source, stated accuracy and the outside check of each. "
                            + "MIX.LIBRARYCARD places one in the sheet.",
                    "—",
                    "=INDEX(MIX.LIBRARY(\"chloride\"); 2; 1)",
                    optional("find", "find", "Text to look for in the cards' names, titles, components and sources "
                            + "(case does not matter); left out, every card is listed."))
                    .shows("sodium chloride + water").refuses(list(Problem.ARG_NOT_TEXT, Problem.LIBRARY_NO_MATCH)),
            new FunctionInfo("libraryCard", "MIX.LIBRARYCARD",
                    "a card from the library as cells, to place in the sheet and name like any card",
                    "The cells of one library card, source row included, to enter as an array formula (in one cell "
                            + "with Ctrl+Shift+Enter). Name the block and use the name as any card. A block too small "
                            + "for the card is refused, not read cut short.",
                    "—",
                    "=INDEX(MIX.LIBRARYCARD(\"NaCl\"); 1; 1)",
                    value("name", "name", "The card's name as MIX.LIBRARY lists it, or another it is known by "
                            + "(\"NaCl\"); case and extra spaces do not matter."))
                    .shows("Miscela card").refuses(list(Problem.ARG_NOT_TEXT, Problem.UNKNOWN_LIBRARY_CARD)),
            new FunctionInfo("activityCoefficient", "MIX.ACTIVITY", "activity coefficient of a component in the liquid",
                    "Activity coefficient γ of one component in the liquid blend, from the card's excess Gibbs "
                            + "energy (G^E/RT as Redlich–Kister coefficients); 1 in an ideal solution.",
                    "ln γ_k = ∂(n·G^E/RT)/∂n_k = g + ∂g/∂x_k − Σ_j x_j·∂g/∂x_j, g = G^E/RT",
                    "=MIX.ACTIVITY(vle; \"ethanol\"; 0.1; 70)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("3.244").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, list(Problem.NO_GIBBS))),
            new FunctionInfo("bubblePressure", "MIX.BUBBLEPRESSURE",
                    "the blend's vapour pressure (bubble pressure) at a temperature, by modified Raoult's law",
                    "Vapour pressure of the liquid blend at a temperature (its bubble pressure), in the card's pressure "
                            + "unit, by modified Raoult's law: an ideal vapour, at low pressure.",
                    "p = Σ_k x_k·γ_k·p_k*(T)",
                    "=MIX.BUBBLEPRESSURE(vle; 0.1; 70)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("52.47").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VAPOUR_PROBLEMS)),
            new FunctionInfo("vapourFraction", "MIX.VAPOURFRACTION",
                    "mole fraction of a component in the vapour over the blend at its bubble point",
                    "Mole fraction of one component in the first vapour over the liquid blend at a temperature (at its "
                            + "bubble point), by modified Raoult's law.",
                    "y_k = x_k·γ_k·p_k*(T) / Σ_j x_j·γ_j·p_j*(T)",
                    "=MIX.VAPOURFRACTION(vle; \"ethanol\"; 0.1; 70)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("0.4474").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, VAPOUR_PROBLEMS)),
            new FunctionInfo("bubblePoint", "MIX.BUBBLEPOINT",
                    "the temperature at which the blend starts to boil at a pressure (its bubble point)",
                    "Temperature at which the liquid blend starts to boil at a pressure (its bubble point), in the "
                            + "card's temperature unit, by modified Raoult's law, searched within the card's range.",
                    "Σ_k x_k·γ_k(T)·p_k*(T) = p, solved for T (Brent's method)",
                    "=MIX.BUBBLEPOINT(vle; 0.1; 101.325)",
                    CARD, MOLE_FRACTION, PRESSURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("85.97").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS, VAPOUR_PROBLEMS,
                            list(Problem.NO_BUBBLE_POINT))),
            new FunctionInfo("dewPoint", "MIX.DEWPOINT",
                    "the temperature at which a vapour starts to condense at a pressure (its dew point)",
                    "Temperature at which a vapour of the given composition starts to condense at a pressure (its dew "
                            + "point), in the card's temperature unit, by modified Raoult's law.",
                    "Σ_k y_k·p / (γ_k(x, T)·p_k*(T)) = 1, x_k = y_k·p/(γ_k·p_k*), solved for T",
                    "=MIX.DEWPOINT(vle; 0.5; 101.325)",
                    CARD, range("vapourComposition", "y", "The vapour's mole fractions in card order (a row, a column, a "
                            + "block of one per row), or y1 alone on a two-component card."),
                    PRESSURE, EXTRAPOLATE)
                    .shows("84.07").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VAPOUR_PROBLEMS,
                            list(Problem.NO_DEW_POINT, Problem.BLEND_NOT_POSITIVE, Problem.ARG_NOT_SINGLE))),
            new FunctionInfo("relativeVolatility", "MIX.RELATIVEVOLATILITY",
                    "relative volatility of one component to another over the blend at a temperature",
                    "Relative volatility of one component to another in the vapour over the liquid blend at a "
                            + "temperature, by modified Raoult's law: above 1, the first goes to the vapour more.",
                    "α_ij = (y_i/x_i)/(y_j/x_j) = γ_i·p_i* / (γ_j·p_j*)",
                    "=MIX.RELATIVEVOLATILITY(vle; \"ethanol\"; \"water\"; 0.1; 80)",
                    CARD, COMPONENT, value("reference", "reference", "The component it is compared with, by number or "
                            + "name as for the first."), MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS,
                    BASIS_T)
                    .shows("7.251").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, VAPOUR_PROBLEMS)),
            new FunctionInfo("azeotrope", "MIX.AZEOTROPE",
                    "the azeotrope of a two-component blend at a pressure: its composition or temperature",
                    "The azeotrope of a two-component blend at a pressure, where vapour and liquid agree: its "
                            + "mole fraction x1, or its boiling temperature. Refused when there is none, or several.",
                    "y1(x1) = x1 at the bubble point, i.e. α12 = 1 (scan of 400 compositions, then Brent's method)",
                    "=MIX.AZEOTROPE(vlw; 101.325)",
                    CARD, value("pressure", "pressure", "The pressure, in the card's pressure unit."),
                    optional("result", "result", "\"composition\" (left out) for x1, or \"temperature\" for its "
                            + "boiling temperature in the card's unit."), EXTRAPOLATE)
                    .shows("0.9007").refuses(union(POINT_PROBLEMS, VAPOUR_PROBLEMS, list(Problem.NO_AZEOTROPE,
                            Problem.SEVERAL_AZEOTROPES, Problem.NOT_BINARY_AZEOTROPE, Problem.NO_BUBBLE_POINT,
                            Problem.BLEND_NOT_POSITIVE, Problem.ARG_NOT_NUMBER, Problem.ARG_NOT_TEXT,
                            Problem.UNKNOWN_RESULT))),
            new FunctionInfo("excessGibbs", "MIX.EXCESSGIBBS",
                    "excess molar Gibbs energy G^E of the liquid blend",
                    "Excess molar Gibbs energy of the liquid blend from the card's G^E/RT, in the card's enthalpy "
                            + "unit; positive when the liquids would rather stay apart.",
                    "G^E = R·T·g, g = G^E/RT = Σ_k x_k·ln γ_k (R = 8.314462618 J/(mol·K))",
                    "=MIX.EXCESSGIBBS(vle; 0.3; 50)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("758.67").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            list(Problem.NO_GIBBS, Problem.NO_ENERGY_UNIT))),
            new FunctionInfo("partialExcessGibbs", "MIX.PARTIALGIBBS",
                    "partial molar excess Gibbs energy of a component (R·T·ln γ)",
                    "Partial molar excess Gibbs energy of one component, R·T·ln γ, from the card's G^E/RT, in the "
                            + "card's enthalpy unit.",
                    "Ḡ_k^E = ∂(n·G^E)/∂n_k = R·T·ln γ_k",
                    "=MIX.PARTIALGIBBS(vle; \"ethanol\"; 0.3; 50)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("1462.93").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, list(Problem.NO_GIBBS, Problem.NO_ENERGY_UNIT))),
            new FunctionInfo("fitVapourLiquid", "MIX.FITVLE",
                    "G^E/RT of a pair fitted to vapour–liquid equilibrium data, with consistency tests",
                    "G^E/RT of one pair (Redlich–Kister, Wilson or NRTL) fitted to measured vapour–liquid "
                            + "equilibrium: values to enter over the card's rows, or statistics, or the data's "
                            + "consistency tests.",
                    "min Σ w·[(p_calc/p − 1)² + (y_calc − y)²] with y, Σ w·(p_calc/p − 1)² without (Barker's "
                            + "method); p_calc = Σ x_k·γ_k·p_k*(T); Levenberg–Marquardt from the ideal solution",
                    "=INDEX(MIX.FITVLE(vle; ; {0.06783|0.17111|0.32385|0.50492|0.72455|0.89064}; "
                            + "{0.3753|0.5479|0.6194|0.6797|0.781|0.8979}; 30; "
                            + "{6.386|8.189|9.085|9.663|10.199|10.427}; ; 1); 1; 1)",
                    range("pure", "pure data", "The cells of a card's pure-component part with both liquids' vapour "
                            + "pressures and its pressure unit. Put the fitted rows below it."),
                    optional("pair", "pair", "The pair as \"first + second\"; may be left out for a card of two "
                            + "components."),
                    range("moleFraction", "x", "Mole fraction of the pair's first component in the liquid at each "
                            + "point (a column). Points left blank in every data range are skipped."),
                    optional("vapourFraction", "y", "Mole fraction of the first component in the vapour at each point "
                            + "(left out: Barker's method, which fits the pressures alone)."),
                    range("temperature", "temperature", "The temperature of each point, or one value for all, in the "
                            + "card's temperature unit."),
                    range("pressure", "pressure", "The pressure of each point, or one value for all, in the card's "
                            + "pressure unit."),
                    optional("model", "model", "\"Redlich-Kister\" (left out), \"Wilson\" or \"NRTL\": the rows "
                            + "the card will hold. A Wilson fit takes the 'Wilson volume' rows of the pure part."),
                    optional("order", "order", "The Redlich–Kister order, the highest k of A0..Ak (left out: "
                            + FitFunctions.DEFAULT_VLE_ORDER + "); leave it out for Wilson and NRTL."),
                    optional("orderInTemperature", "order in T", "0 (left out) for constant parameters, or 1 for a "
                            + "linear term in T. Redlich–Kister: A_k in T − T_ref; Wilson: Δλ/R = a + b·T; NRTL: "
                            + "τ = A + B/T."),
                    REFERENCE_T,
                    optional("alpha", "alpha", "NRTL's non-randomness α, held fixed (left out: "
                            + FitFunctions.DEFAULT_NRTL_ALPHA + ")."),
                    WEIGHTS,
                    optional("result", "result", "The result: \"coefficients\" (left out), \"standard errors\", "
                            + "\"statistics\", \"covariance\", \"residuals\", \"consistency\" or \"check\". "
                            + "\"residuals\" gives p_calc − p and y_calc − y per point; \"consistency\" the point "
                            + "and area tests of the data."))
                    .shows("1.210").refuses(union(DATA_PROBLEMS, FIT_ENGINE_PROBLEMS, list(Problem.FIT_NEEDS_REFERENCE,
                            Problem.UNKNOWN_PAIR_ARG, Problem.ARG_NOT_TEXT, Problem.UNKNOWN_GIBBS_MODEL,
                            Problem.FIT_ORDER_NOT_HERE, Problem.NRTL_ALPHA, Problem.FIT_NEEDS_WILSON_VOLUMES,
                            Problem.FIT_OUTSIDE_VAPOUR_PRESSURE, Problem.VLE_FIT_UNDETERMINED, Problem.VLE_FIT_POOR, Problem.CONSISTENCY_NEEDS_VAPOUR, Problem.NO_PRESSURE_UNIT,
                            Problem.NO_VAPOUR_PRESSURE, Problem.FIT_OUTPUT_NOT_HERE))),
            new FunctionInfo("excessEntropy", "MIX.EXCESSENTROPY",
                    "excess molar entropy S^E of the liquid blend, from its H^E and G^E",
                    "Excess molar entropy of the liquid blend, (H^E − G^E)/T, from the card's excess enthalpy and its "
                            + "G^E/RT, in the card's enthalpy unit per kelvin (J/(mol·K) for J/mol).",
                    "S^E = (H^E − G^E)/T, G^E = R·T·Σ_k x_k·ln γ_k (T in K)",
                    "=MIX.EXCESSENTROPY(gibhelm; 0.3; 40)",
                    CARD, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("1.0893").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            list(Problem.NO_GIBBS, Problem.NO_ENTHALPY))),
            new FunctionInfo("partialExcessEntropy", "MIX.PARTIALENTROPY",
                    "partial molar excess entropy of a component, from its H̄^E and R·T·ln γ",
                    "Partial molar excess entropy of one component, (H̄_k^E − R·T·ln γ_k)/T, from the card's excess "
                            + "enthalpy and its G^E/RT, in the card's enthalpy unit per kelvin.",
                    "S̄_k^E = (H̄_k^E − Ḡ_k^E)/T, Ḡ_k^E = R·T·ln γ_k; S^E = Σ_k x_k·S̄_k^E",
                    "=MIX.PARTIALENTROPY(gibhelm; 1; 0.3; 40)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("1.2506").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, list(Problem.NO_GIBBS, Problem.NO_ENTHALPY))),
            new FunctionInfo("infiniteDilutionActivity", "MIX.ACTIVITYLIMIT",
                    "activity coefficient of a component at infinite dilution in the rest of the blend",
                    "Activity coefficient γ∞ of one component at infinite dilution in the other liquids of the given "
                            + "composition, from the card's G^E/RT; its own entry is ignored, the rest renormalised.",
                    "γ_k^∞ = lim γ_k as x_k → 0 at x_j/(1 − x_k) fixed (j ≠ k); Wilson, binary: ln γ_1^∞ = 1 − ln Λ12 "
                            + "− Λ21",
                    "=MIX.ACTIVITYLIMIT(vlw; \"ethanol\"; 0; 70)",
                    CARD, COMPONENT, range("moleFraction", "x", "The liquids it is diluted in: mole fractions in card "
                            + "order, the component's own entry ignored and the rest renormalised. A row or column, a "
                            + "block with one composition per row, or x1 alone on a two-component card, as for "
                            + "MIX.ACTIVITY."), TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("7.263").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, list(Problem.NO_GIBBS, Problem.NO_DILUENT))),
            new FunctionInfo("dewPressure", "MIX.DEWPRESSURE",
                    "the pressure at which a vapour starts to condense at a temperature (its dew pressure)",
                    "Pressure at which a vapour of the given composition starts to condense at a temperature (its dew "
                            + "pressure), in the card's pressure unit, by modified Raoult's law: an ideal vapour.",
                    "1/p = Σ_k y_k / (γ_k(x)·p_k*(T)), x_k = y_k·p/(γ_k·p_k*) (successive substitution from γ = 1)",
                    "=MIX.DEWPRESSURE(vle; 0.5; 70)",
                    CARD, range("vapourComposition", "y", "The vapour's mole fractions in card order (a row, a column, a "
                            + "block of one per row), or y1 alone on a two-component card."),
                    TEMPERATURE, EXTRAPOLATE)
                    .shows("56.50").refuses(union(COMPOSITION_PROBLEMS, POINT_PROBLEMS, VAPOUR_PROBLEMS)),
            new FunctionInfo("partialPressure", "MIX.PARTIALPRESSURE",
                    "partial pressure of a component over the blend at a temperature, by modified Raoult's law",
                    "Partial pressure of one component in the vapour over the liquid blend at a temperature (at its "
                            + "bubble point), in the card's pressure unit, by modified Raoult's law: an ideal vapour.",
                    "p_k = y_k·p = x_k·γ_k·p_k*(T); Σ_k p_k = p, the bubble pressure",
                    "=MIX.PARTIALPRESSURE(vle; \"ethanol\"; 0.1; 70)",
                    CARD, COMPONENT, MOLE_FRACTION, TEMPERATURE, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("23.47").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, VAPOUR_PROBLEMS)),
            new FunctionInfo("flashPoint", "MIX.FLASHPOINT",
                    "estimated closed-cup flash point of a blend (Liaw's model: Le Chatelier's rule with activities)",
                    "Estimated flash point of the liquid blend, in the card's temperature unit, by Liaw's model: the "
                            + "flammable liquids' vapour by modified Raoult's law, summed by Le Chatelier's rule.",
                    "Σ_{i flammable} x_i·γ_i(x, T)·p_i*(T) / p_i*(T_fp,i) = 1, solved for T (Brent's method)",
                    "=MIX.FLASHPOINT(vle; 0.3; ; TRUE)",
                    CARD, MOLE_FRACTION, ACTIVITY, EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("23.2").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            VAPOUR_PROBLEMS, list(Problem.NO_FLASH_POINT_ROW, Problem.NOT_FLAMMABLE,
                            Problem.NO_FLASH_POINT, Problem.UNKNOWN_ACTIVITY))),
            new FunctionInfo("flashMinimum", "MIX.FLASHMINIMUM",
                    "a two-component blend that flashes below both pure liquids: its composition or flash point",
                    "The blend of two components whose flash point is lower than both pure liquids' (minimum flash "
                            + "point behaviour): its mole fraction x1, or its flash point. Refused when there is none.",
                    "min over x1 of the flash point (scan of 200 compositions, then golden section)",
                    "=MIX.FLASHMINIMUM(fmin; \"temperature\")",
                    CARD, optional("result", "result", "\"composition\" (left out) for x1, or \"temperature\" for "
                            + "its flash point in the card's unit."), ACTIVITY, EXTRAPOLATE)
                    .shows("11.32").refuses(union(POINT_PROBLEMS, VAPOUR_PROBLEMS, list(Problem.NO_FLASH_POINT_ROW,
                            Problem.NOT_FLAMMABLE, Problem.NO_FLASH_POINT, Problem.NO_FLASH_MINIMUM,
                            Problem.NOT_BINARY_FLASH, Problem.UNKNOWN_ACTIVITY, Problem.ARG_NOT_TEXT,
                            Problem.UNKNOWN_RESULT))),
            new FunctionInfo("freezingPoint", "MIX.FREEZINGPOINT",
                    "the temperature at which a pure solid starts to crystallise from the liquid blend (freezing point)",
                    "Temperature at which a pure solid (ice, say) starts to form from the blend, card unit, from the "
                            + "card's melting rows and G^E/RT (or a brine's osmotic coefficient); an estimate.",
                    "ln(x_k·γ_k(x, T)) = −(ΔH_fus/R)(1/T − 1/T_m) + (ΔCp/R)[(T_m/T − 1) − ln(T_m/T)], solved for T "
                            + "(Brent's method); the solid is pure k",
                    "=MIX.FREEZINGPOINT(ice; 20; ; ; ; TRUE(); \"%w/w\")",
                    CARD, MOLE_FRACTION, optional("component", "component", "The component that crystallises, by "
                            + "number or name (left out: the one that freezes first, at the highest temperature)."),
                    optional("activity", "activity", "\"card\" (left out): γ from the card's G^E/RT; \"ideal\": "
                            + "assume an ideal solution (γ = 1), often kelvins too warm."),
                    optional("result", "result", "\"temperature\" (left out) for the freezing point, or "
                            + "\"component\" for the number of the component that crystallises."),
                    EXTRAPOLATE, COMPOSITION_BASIS, BASIS_T)
                    .shows("-9.42").refuses(union(BLEND_PROBLEMS, COMPOSITION_PROBLEMS, POINT_PROBLEMS,
                            COMPONENT_PROBLEMS, list(Problem.NO_FUSION_DATA, Problem.FREEZING_NEEDS_GIBBS,
                            Problem.IDEAL_NEEDS_IONS, Problem.SOLUTE_ACTIVITY, Problem.OSMOTIC_SERIES_RANGE,
                            Problem.PAST_ICE_LIMIT,
                            Problem.FREEZING_COMPONENT_ABSENT, Problem.NO_FREEZING_POINT, Problem.UNKNOWN_RESULT,
                            Problem.ARG_NOT_TEXT, Problem.UNKNOWN_ACTIVITY, Problem.FREEZING_TOO_FAR)))));

    private FunctionCatalog() {
    }

    /** Every function, in the order of the IDL interface. */
    public static List<FunctionInfo> functions() {
        return FUNCTIONS;
    }

    /**
     * The problems of a call rather than of a card, in the error catalogue's order: the call, fit and blending sections
     * of {@link Problem}.
     */
    public static List<Problem> callProblems() {
        List<Problem> all = new java.util.ArrayList<>(Problem.of(Problem.Section.CALL));
        all.addAll(Problem.of(Problem.Section.FIT));
        all.addAll(Problem.of(Problem.Section.BLEND));
        return Collections.unmodifiableList(all);
    }

    /** What MIX.EXPLAIN answers for a call it cannot run (never a refusal). */
    public static List<Problem> explainAnswers() {
        return Problem.of(Problem.Section.EXPLAIN);
    }

    /**
     * The call problems no cell can produce, each with the reason: checks that guard the library's own callers, or a
     * path the add-in never takes. No function lists them; the error catalogue says so, and a plain-JVM test
     * (UnreachableProblemsTest) produces each through the core.
     */
    public static java.util.Map<Problem, String> notFromACell() {
        return NOT_FROM_A_CELL;
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

    private static List<Problem> list(Problem... problems) {
        return Arrays.asList(problems);
    }

    /** The problems a cell can produce, of those given (all but those declared in NOT_FROM_A_CELL). */
    private static List<Problem> fromACell(List<Problem> problems) {
        List<Problem> out = new java.util.ArrayList<>();
        for (Problem p : problems) {
            if (!NOT_FROM_A_CELL.containsKey(p)) {
                out.add(p);
            }
        }
        return out;
    }

    /** Pairs of (problem, reason) as an ordered map. */
    private static java.util.Map<Problem, String> notFromACell(Object... pairs) {
        java.util.Map<Problem, String> m = new java.util.LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put((Problem) pairs[i], (String) pairs[i + 1]);
        }
        return Collections.unmodifiableMap(m);
    }

    @SafeVarargs
    private static List<Problem> union(List<Problem>... lists) {
        java.util.LinkedHashSet<Problem> all = new java.util.LinkedHashSet<>();
        for (List<Problem> l : lists) {
            all.addAll(l);
        }
        return new java.util.ArrayList<>(all);
    }

    /** A required range argument (IDL {@code sequence< sequence< any > >}): a range, a cell or an inline array. */
    private static ArgumentInfo range(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, false, IdlType.RANGE);
    }

    /**
     * A required single value (a number, a text or a flag). Its IDL type is a range's, {@code sequence< sequence<
     * any > >}, not {@code any}: Calc's Function Wizard shows every {@code any} parameter as optional, whatever the
     * metadata says, and a typed one as required. A value, a cell or a formula's result arrives as a one-cell range
     * (an empty cell as 0, as it would for an {@code any}); leaving the argument out is Calc's own error, before any
     * call (Err:502, or Err:504 at the end). The adapter reads a one-cell range as its cell's value.
     */
    private static ArgumentInfo value(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, false, IdlType.RANGE);
    }

    /** An optional single value (IDL {@code any}): left out, it arrives as void; the wizard shows it as optional. */
    private static ArgumentInfo optional(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, true, IdlType.ANY);
    }

    /** MIX.EXPLAIN's variable argument list (IDL {@code sequence< any >}), which may be empty. */
    private static ArgumentInfo argumentList(String name, String displayName, String description) {
        return new ArgumentInfo(name, displayName, description, true, IdlType.ARGUMENT_LIST);
    }
}
