package org.miscela.core.card;

import org.miscela.core.functions.CardFunctions;
import org.miscela.core.model.PureDensity;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.params.provider.Arguments.arguments;

import java.util.EnumSet;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The card reader: every card problem of the catalogue is produced by a minimal malformed card and names the row it
 * is in; well-formed variations (units, pair order, layout) read as intended. All card values are invented.
 */
class CardReaderTest {

    // ------------------------------------------------------------------ malformed cards

    /** A malformed card: the problem it must raise, the row its message must name (0: none) and a text fragment. */
    private static Arguments bad(String what, Problem problem, int row, String fragment, Object[][] cells) {
        return arguments(what, problem, row, fragment, cells);
    }

    private static Object[][] base(java.util.function.UnaryOperator<TestCard> edit) {
        return edit.apply(TestCard.base()).cells();
    }

    private static Object[][] v2(java.util.function.UnaryOperator<TestCard> edit) {
        return edit.apply(TestCard.base().set(1, "Miscela card", 2)).cells();
    }

    private static Object[][] ternary(java.util.function.UnaryOperator<TestCard> edit) {
        return edit.apply(TestCard.ternary()).cells();
    }

    static Stream<Arguments> malformed() {
        return Stream.of(
                bad("no cells", Problem.CARD_EMPTY, 0, "empty", new Object[0][]),
                bad("only blank cells", Problem.CARD_EMPTY, 0, "empty",
                        new Object[][] {{"", null}, {" ", ""}, null}),
                bad("null range", Problem.CARD_EMPTY, 0, "empty", null),
                bad("wrong header", Problem.CARD_HEADER, 1, "\"Miscela cards\"",
                        base(c -> c.set(1, "Miscela cards", 1))),
                bad("header after a blank row is still the first row", Problem.CARD_HEADER, 3, "\"title\"",
                        base(c -> c.insert(1).blank(2))),
                bad("comment before the header", Problem.CARD_HEADER, 1, "\"# draft\"",
                        base(c -> c.insert(1, "# draft"))),
                bad("version 3", Problem.CARD_VERSION, 1, "version 3 is not supported",
                        base(c -> c.set(1, "Miscela card", 3))),
                bad("a version 2 row on a version 1 card", Problem.NEEDS_VERSION_2, 20, "'Miscela card | 2'",
                        base(c -> c.row("multicomponent model", "Kohler"))),
                bad("an excess enthalpy row on a version 1 card", Problem.NEEDS_VERSION_2, 20, "excess enthalpy A0",
                        base(c -> c.row("excess enthalpy A0", "alpha + beta", -800))),
                bad("version 1.5", Problem.CARD_VERSION, 1, "version 1.5",
                        base(c -> c.set(1, "Miscela card", 1.5))),
                bad("unknown label", Problem.UNKNOWN_LABEL, 20, "\"viscosity\"",
                        base(c -> c.row("viscosity", 1.1))),
                bad("excess coefficient without a number", Problem.UNKNOWN_LABEL, 17, "\"excess volume A\"",
                        base(c -> c.set(17, "excess volume A", "alpha + beta", -4.0))),
                bad("global row twice", Problem.DUPLICATE_ROW, 20, "also in row 4",
                        base(c -> c.row("Temperature unit", "K"))),
                bad("component twice, other case", Problem.DUPLICATE_ROW, 20, "also in row 10",
                        base(c -> c.row("component", "ALPHA", 46.07))),
                bad("excess row twice, other spacing", Problem.DUPLICATE_ROW, 20, "also in row 17",
                        base(c -> c.row("excess volume A0", "alpha+beta", -4.0))),
                bad("excess reference twice", Problem.DUPLICATE_ROW, 21, "also in row 20",
                        base(c -> c.row("excess volume reference temperature", "alpha + beta", 298.15)
                                .row("excess volume reference temperature", "alpha +beta", 298.15))),
                bad("no source", Problem.MISSING_ROW, 0, "\"source\"", base(c -> c.blank(3))),
                bad("no density unit", Problem.MISSING_ROW, 0, "\"density unit\"", base(c -> c.blank(5))),
                bad("no valid temperature", Problem.MISSING_ROW, 0, "\"valid temperature\"",
                        base(c -> c.blank(8))),
                bad("values without a label", Problem.NO_LABEL, 9, "no label",
                        base(c -> c.set(9, "", "refuse"))),
                bad("values under a null label", Problem.NO_LABEL, 9, "no label",
                        base(c -> c.set(9, null, "refuse"))),
                bad("upper temperature missing", Problem.MISSING_VALUE, 8, "column 3",
                        base(c -> c.set(8, "valid temperature", 288.15))),
                bad("component without name", Problem.MISSING_VALUE, 10, "column 2",
                        base(c -> c.set(10, "component", "", 46.07))),
                bad("text for a molar mass", Problem.NOT_A_NUMBER, 10, "column 3 holds the text \"heavy\"",
                        base(c -> c.set(10, "component", "alpha", "heavy"))),
                bad("a number typed as text", Problem.NUMBER_AS_TEXT, 13, "\"789.3\" where a number belongs; it "
                        + "reads as 789.3 with '.' as the decimal separator",
                        base(c -> c.set(13, "density coefficients", "alpha", "789.3"))),
                bad("a number typed with a decimal comma", Problem.NUMBER_AS_TEXT, 15, "it reads as 0.997 with ',' "
                        + "as the decimal separator", base(c -> c.set(15, "density coefficients", "beta", "0,997"))),
                bad("a '+' in a component name (AutoInput)", Problem.NAME_WITH_PLUS, 10,
                        "the component name \"alpha + beta\" contains '+'",
                        base(c -> c.set(10, "component", "alpha + beta", 46.07))),
                bad("a '+' at the end of a name", Problem.NAME_WITH_PLUS, 11, "\"beta+\" contains '+'",
                        base(c -> c.set(11, "component", "beta+", 18.015))),
                bad("component rows out of the stated order", Problem.COMPONENT_ORDER, 20,
                        "in the order \"beta\", \"alpha\", but its 'component' rows declare \"alpha\", \"beta\"",
                        base(c -> c.set(1, "Miscela card", 2).row("component order", "beta", "alpha"))),
                bad("a stated order naming a component the card lacks", Problem.COMPONENT_ORDER, 20,
                        "in the order \"alpha\", \"beta\", \"gamma\"",
                        base(c -> c.set(1, "Miscela card", 2).row("component order", "alpha", "beta", "gamma"))),
                bad("a component order row on a version 1 card", Problem.NEEDS_VERSION_2, 20, "component order",
                        base(c -> c.row("component order", "alpha", "beta"))),
                bad("number for a component name", Problem.NOT_TEXT, 10, "column 2 must hold text; found 5",
                        base(c -> c.set(10, "component", 5, 46.07))),
                bad("number for a unit", Problem.NOT_TEXT, 4, "column 2",
                        base(c -> c.set(4, "temperature unit", 1))),
                bad("NaN coefficient", Problem.NOT_FINITE, 17, "column 3",
                        base(c -> c.set(17, "excess volume A0", "alpha + beta", Double.NaN))),
                bad("infinite temperature", Problem.NOT_FINITE, 8, "column 3",
                        base(c -> c.set(8, "valid temperature", 288.15, Double.POSITIVE_INFINITY))),
                bad("extra unit cell", Problem.EXTRA_VALUE, 4, "column 3 (\"kelvin\")",
                        base(c -> c.set(4, "temperature unit", "K", "kelvin"))),
                bad("extra value after a gap", Problem.EXTRA_VALUE, 3, "column 4",
                        base(c -> c.set(3, "source", "invented", "", "more"))),
                bad("extra value on the header", Problem.EXTRA_VALUE, 1, "column 3",
                        base(c -> c.set(1, "Miscela card", 1, "x"))),
                bad("second constant density value", Problem.EXTRA_VALUE, 13, "column 4",
                        base(c -> c.set(13, "density coefficients", "alpha", 789.3, 0.1))),
                bad("unknown temperature unit", Problem.UNKNOWN_UNIT, 4, "\"kelvin\"",
                        base(c -> c.set(4, "temperature unit", "kelvin"))),
                bad("the accepted temperature units, grouped by unit", Problem.UNKNOWN_UNIT, 4,
                        "use one of: °C (or ºC, ˚C, ℃, degC, C); K; °F (or ºF, ˚F, ℉, degF, F).",
                        base(c -> c.set(4, "temperature unit", "°R"))),
                bad("unit spelling is case sensitive", Problem.UNKNOWN_UNIT, 5, "\"KG/M3\"",
                        base(c -> c.set(5, "density unit", "KG/M3"))),
                bad("unknown molar volume unit", Problem.UNKNOWN_UNIT, 6, "cm³/mol",
                        base(c -> c.set(6, "molar volume unit", "cc/mol"))),
                bad("unknown molar mass unit", Problem.UNKNOWN_UNIT, 7, "g/mol",
                        base(c -> c.set(7, "molar mass unit", "Da"))),
                bad("unknown density model", Problem.BAD_KEYWORD, 12, "constant, polynomial, Tanaka 2001",
                        base(c -> c.set(12, "density model", "alpha", "cubic"))),
                bad("unknown extrapolation word", Problem.BAD_KEYWORD, 9, "refuse, allow",
                        base(c -> c.set(9, "extrapolation", "maybe"))),
                bad("density of an undeclared component", Problem.UNKNOWN_COMPONENT, 20, "\"gamma\"",
                        base(c -> c.row("density model", "gamma", "constant"))),
                bad("pair with an undeclared component", Problem.UNKNOWN_COMPONENT, 17, "\"gamma\"",
                        base(c -> c.set(17, "excess volume A0", "alpha + gamma", -4.0))),
                bad("limit of an undeclared component", Problem.UNKNOWN_COMPONENT, 16, "\"gamma\"",
                        base(c -> c.set(16, "valid mole fraction", "gamma", 0, 1))),
                bad("pair of three", Problem.BAD_PAIR, 17, "\"alpha + beta + alpha\"",
                        base(c -> c.set(17, "excess volume A0", "alpha + beta + alpha", -4.0))),
                bad("pair of one component twice", Problem.BAD_PAIR, 18, "\"alpha + Alpha\"",
                        base(c -> c.set(18, "excess volume A1", "alpha + Alpha", 1.5))),
                bad("pair without '+'", Problem.BAD_PAIR, 17, "\"alpha beta\"",
                        base(c -> c.set(17, "excess volume A0", "alpha beta", -4.0))),
                bad("pair with a blank half", Problem.BAD_PAIR, 17, "\"alpha +\"",
                        base(c -> c.set(17, "excess volume A0", "alpha + ", -4.0))),
                bad("zero molar mass", Problem.NOT_POSITIVE, 11, "molar mass",
                        base(c -> c.set(11, "component", "beta", 0))),
                bad("negative molar mass", Problem.NOT_POSITIVE, 10, "found -46.07",
                        base(c -> c.set(10, "component", "alpha", -46.07))),
                bad("validity below absolute zero", Problem.NOT_POSITIVE, 8, "kelvin",
                        base(c -> c.set(8, "valid temperature", -10, 300))),
                bad("validity below absolute zero in °C", Problem.NOT_POSITIVE, 8, "found -6.85 K",
                        base(c -> c.set(4, "temperature unit", "°C").set(8, "valid temperature", -280, 30))),
                bad("temperature range reversed", Problem.BAD_RANGE, 8, "308.15 must be below the upper limit 288.15",
                        base(c -> c.set(8, "valid temperature", 308.15, 288.15))),
                bad("temperature range empty", Problem.BAD_RANGE, 8, "lower limit 300",
                        base(c -> c.set(8, "valid temperature", 300, 300))),
                bad("mole fraction range reversed", Problem.BAD_RANGE, 16, "0.8",
                        base(c -> c.set(16, "valid mole fraction", "alpha", 0.8, 0.2))),
                bad("mole fraction below 0", Problem.MOLE_FRACTION_LIMIT, 16, "-0.1..1",
                        base(c -> c.set(16, "valid mole fraction", "alpha", -0.1, 1))),
                bad("mole fraction above 1", Problem.MOLE_FRACTION_LIMIT, 16, "0..1.2",
                        base(c -> c.set(16, "valid mole fraction", "alpha", 0, 1.2))),
                bad("one component", Problem.TOO_FEW_COMPONENTS, 0, "declares 1 component",
                        base(c -> c.blank(11))),
                bad("no component", Problem.TOO_FEW_COMPONENTS, 0, "declares 0 component",
                        base(c -> c.blank(10).blank(11))),
                bad("no density model", Problem.MISSING_DENSITY, 0, "component \"beta\"",
                        base(c -> c.blank(14).blank(15))),
                bad("constant density with a reference temperature", Problem.MODEL_VALUES, 20,
                        "no reference temperature",
                        base(c -> c.row("density reference temperature", "alpha", 298.15))),
                bad("constant density without coefficients", Problem.MODEL_VALUES, 12, "that row is missing",
                        base(c -> c.blank(13))),
                bad("polynomial without reference temperature", Problem.MODEL_VALUES, 12,
                        "'density reference temperature' row",
                        base(c -> c.set(12, "density model", "alpha", "polynomial"))),
                bad("Tanaka 2001 with coefficients", Problem.MODEL_VALUES, 15, "no coefficients",
                        base(c -> c.set(14, "density model", "beta", "Tanaka 2001"))),
                bad("Tanaka 2001 beyond 40 °C", Problem.MODEL_RANGE, 14, "from 273.15 to 313.15 K",
                        base(c -> c.set(14, "density model", "beta", "tanaka 2001").blank(15)
                                .set(8, "valid temperature", 288.15, 320))),
                bad("Tanaka 2001 below 0 °C", Problem.MODEL_RANGE, 14, "runs from 263.15 to 308.15 K",
                        base(c -> c.set(14, "density model", "beta", "Tanaka 2001").blank(15)
                                .set(8, "valid temperature", 263.15, 308.15))),
                bad("pair written both ways", Problem.PAIR_ORDER, 18, "\"beta + alpha\" here but \"alpha + beta\" in row 17",
                        base(c -> c.set(18, "excess volume A1", "beta + alpha", -1.5))),
                bad("pair order: the later row in card order is the one reported", Problem.PAIR_ORDER, 18,
                        "in row 17",
                        base(c -> c.set(17, "excess volume A1", "beta + alpha", -1.5)
                                .set(18, "excess volume A0", "alpha + beta", -4.0).blank(19))),
                bad("reference temperature written the other way", Problem.PAIR_ORDER, 20, "in row 17",
                        base(c -> c.row("excess volume reference temperature", "beta + alpha", 298.15))),
                bad("negative constant density", Problem.DENSITY_NOT_POSITIVE, 13, "gives -5 kg/m³",
                        base(c -> c.set(13, "density coefficients", "alpha", -5))),
                bad("polynomial density that dips below zero away from the ends and middle",
                        Problem.DENSITY_NOT_POSITIVE, 21, "density model of alpha",
                        base(c -> c.set(12, "density model", "alpha", "polynomial")
                                .blank(13)
                                .row("density reference temperature", "alpha", 293.15)
                                .row("density coefficients", "alpha", -1, 0, 0.1))),
                bad("no excess volume rows", Problem.MISSING_PAIR, 0, "pair alpha + beta",
                        base(c -> c.blank(17).blank(18).blank(19))),
                bad("reference temperature without coefficients", Problem.MISSING_PAIR_ROW, 0,
                        "'excess volume reference temperature' rows for alpha + beta but no 'excess volume A0' row",
                        base(c -> c.blank(17).blank(18).blank(19)
                                .row("excess volume reference temperature", "alpha + beta", 298.15))),
                bad("temperature-dependent A0 without reference temperature", Problem.MISSING_PAIR_ROW, 0,
                        "no 'excess volume reference temperature' row",
                        base(c -> c.set(17, "excess volume A0", "alpha + beta", -4.0, 0.01))),
                bad("gap in coefficients", Problem.COEFFICIENT_GAP, 0, "'excess volume A2' for alpha + beta but not 'excess volume A1'",
                        base(c -> c.blank(18))),
                bad("no A0", Problem.COEFFICIENT_GAP, 0, "but not 'excess volume A0'",
                        base(c -> c.blank(17))),
                bad("no composition limit", Problem.NO_COMPOSITION_LIMIT, 0, "'valid mole fraction'",
                        base(c -> c.blank(16))),
                // --- multicomponent, enthalpy and validity rows
                bad("ternary term naming two components", Problem.BAD_TRIPLE, 25, "\"alpha + beta\"",
                        ternary(c -> c.row("excess volume ternary C0", "alpha + beta", 0.3))),
                bad("ternary term naming one component twice", Problem.BAD_TRIPLE, 25, "\"alpha + beta + beta\"",
                        ternary(c -> c.row("excess volume ternary C0", "alpha + beta + beta", 0.3))),
                bad("ternary coefficient beyond C2", Problem.UNKNOWN_LABEL, 25, "excess volume ternary C3",
                        ternary(c -> c.row("excess volume ternary C3", "alpha + beta + gamma", 0.3))),
                bad("ternary gap", Problem.COEFFICIENT_GAP, 0, "'excess volume ternary C0'",
                        ternary(c -> c.row("excess volume ternary C1", "alpha + beta + gamma", 0.3))),
                bad("ternary written two ways", Problem.PAIR_ORDER, 26, "in row 25",
                        ternary(c -> c.row("excess volume ternary C0", "alpha + beta + gamma", 0.3)
                                .row("excess volume ternary C1", "beta + alpha + gamma", 0.1))),
                bad("T-dependent ternary term without reference temperature", Problem.MISSING_PAIR_ROW, 0,
                        "'excess volume reference temperature'",
                        ternary(c -> c.row("excess volume ternary C0", "alpha + beta + gamma", 0.3, 0.01))),
                bad("ternary reference temperature without terms", Problem.MISSING_PAIR_ROW, 0,
                        "no 'excess volume ternary C0' row",
                        ternary(c -> c.row("excess volume reference temperature", "alpha + beta + gamma", 298.15))),
                bad("missing pair in a ternary card", Problem.MISSING_PAIR, 0, "pair beta + gamma",
                        ternary(c -> c.blank(24))),
                bad("unknown model", Problem.BAD_KEYWORD, 25, "Muggianu, Kohler, Toop",
                        ternary(c -> c.row("multicomponent model", "Redlich"))),
                bad("Toop without its asymmetric component", Problem.MISSING_VALUE, 25, "column 3",
                        ternary(c -> c.row("multicomponent model", "Toop"))),
                bad("Toop naming an unknown component", Problem.UNKNOWN_COMPONENT, 25, "\"delta\"",
                        ternary(c -> c.row("multicomponent model", "Toop", "delta"))),
                bad("Muggianu with a component", Problem.EXTRA_VALUE, 25, "column 3",
                        ternary(c -> c.row("multicomponent model", "Muggianu", "alpha"))),
                bad("unknown missing-pairs word", Problem.BAD_KEYWORD, 25, "refuse, ideal",
                        ternary(c -> c.row("missing pairs", "zero"))),
                bad("excess enthalpy without an enthalpy unit", Problem.MISSING_ROW, 0, "\"enthalpy unit\"",
                        v2(c -> c.row("excess enthalpy A0", "alpha + beta", -800))),
                bad("unknown enthalpy unit", Problem.UNKNOWN_UNIT, 20, "J/mol; kJ/mol",
                        v2(c -> c.row("enthalpy unit", "cal/mol"))),
                bad("heat capacity without an enthalpy unit", Problem.MISSING_ROW, 0, "\"enthalpy unit\"",
                        v2(c -> c.row("heat capacity", "alpha", 112.0))),
                bad("temperature-dependent heat capacity without reference", Problem.MISSING_PAIR_ROW, 0,
                        "'heat capacity reference temperature'",
                        v2(c -> c.row("enthalpy unit", "J/mol").row("heat capacity", "alpha", 112.0, 0.3))),
                bad("heat capacity of an unknown component", Problem.UNKNOWN_COMPONENT, 21, "\"delta\"",
                        v2(c -> c.row("enthalpy unit", "J/mol").row("heat capacity", "delta", 112.0))),
                bad("pair temperature range reversed", Problem.BAD_RANGE, 20, "lower limit 300",
                        v2(c -> c.row("valid pair temperature", "alpha + beta", 300, 290))),
                bad("pair mole-fraction range beyond 1", Problem.MOLE_FRACTION_LIMIT, 20, "0..1.5",
                        v2(c -> c.row("valid pair mole fraction", "alpha + beta", 0, 1.5))),
                bad("covariance with too few rows", Problem.COVARIANCE_SIZE, 20, "3 coefficients",
                        v2(c -> c.row("excess volume covariance", "alpha + beta", 0.01, 0, 0))),
                bad("covariance row too short", Problem.COVARIANCE_SIZE, 21, "2 value(s) in this row",
                        v2(c -> c.row("excess volume covariance", "alpha + beta", 0.01, 0, 0)
                                .row("excess volume covariance", "alpha + beta", 0, 0.02)
                                .row("excess volume covariance", "alpha + beta", 0, 0, 0.03))),
                bad("covariance not symmetric", Problem.COVARIANCE_NOT_SYMMETRIC, 21, "entry (2, 1)",
                        v2(c -> c.row("excess volume covariance", "alpha + beta", 0.01, 0, 0)
                                .row("excess volume covariance", "alpha + beta", 0.005, 0.02, 0)
                                .row("excess volume covariance", "alpha + beta", 0, 0, 0.03))),
                bad("negative variance", Problem.COVARIANCE_NEGATIVE, 22, "coefficient 3",
                        v2(c -> c.row("excess volume covariance", "alpha + beta", 0.01, 0, 0)
                                .row("excess volume covariance", "alpha + beta", 0, 0.02, 0)
                                .row("excess volume covariance", "alpha + beta", 0, 0, -0.03))),
                bad("covariance written the other way round", Problem.PAIR_ORDER, 20, "in row 17",
                        v2(c -> c.row("excess volume covariance", "beta + alpha", 0.01, 0, 0))),
                bad("pair limit on a pair of one", Problem.BAD_PAIR, 20, "\"alpha\"",
                        v2(c -> c.row("valid pair mole fraction", "alpha", 0, 0.5))),
                // the solution heat-capacity model (invented parameters: only the card's grammar is tested here)
                bad("solution heat capacity without a solvent row", Problem.MISSING_ROW, 0, "\"solvent\"",
                        v2(c -> c.row("solution heat capacity", "alpha", "Laliberté 2009", 1, 0, 0, 0, 1, 1))),
                bad("a solvent row without a solution heat capacity", Problem.MISSING_PAIR_ROW, 0,
                        "'solvent' rows for the solution", v2(c -> c.row("solvent", "beta"))),
                bad("a solvent that is no component", Problem.UNKNOWN_COMPONENT, 21, "\"gamma\"",
                        v2(c -> c.row("solution heat capacity", "alpha", "Laliberté 2009", 1, 0, 0, 0, 1, 1)
                                .row("solvent", "gamma"))),
                bad("a solute without a solution heat capacity", Problem.NO_SOLUTION_MODEL, 0,
                        "solvent alpha needs one of each kind; gamma has none", ternary(c -> c.row("solvent", "alpha")
                                .row("solution heat capacity", "beta", "Laliberté 2009", 1, 0, 0, 0, 1, 1))),
                bad("the solvent with a solution heat capacity", Problem.SOLVENT_WITH_SOLUTION_MODEL, 20,
                        "beta is the card's solvent", v2(c -> c.row("solution heat capacity", "beta",
                                "Laliberté 2009", 1, 0, 0, 0, 1, 1).row("solution heat capacity", "alpha",
                                "Laliberté 2009", 1, 0, 0, 0, 1, 1).row("solvent", "beta"))),
                bad("a solution model of another name", Problem.BAD_KEYWORD, 20, "\"Laliberte 2008\"",
                        v2(c -> c.row("solution heat capacity", "alpha", "Laliberte 2008", 1, 0, 0, 0, 1, 1)
                                .row("solvent", "beta"))),
                bad("a packed card of another version", Problem.PACKED_VERSION, 0, "format version 7",
                        new Object[][] {{"Miscela packed card 7 · a card"}}),
                bad("a packed card edited after packing", Problem.PACKED_DAMAGED, 0, "its checksum",
                        new Object[][] {{PackedCard.pack(base(c -> c)).replace("n46.07", "n46.08")}}),
                bad("a solution model with five parameters", Problem.MODEL_VALUES, 20, "six parameters a1 to a6",
                        v2(c -> c.row("solution heat capacity", "alpha", "Laliberté 2009", 1, 0, 0, 0, 1)
                                .row("solvent", "beta"))),
                // Pitzer's osmotic coefficient (invented parameters: only the card's grammar is tested here)
                bad("an osmotic coefficient without a solvent row", Problem.MISSING_ROW, 0, "\"solvent\"",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1))),
                bad("an osmotic coefficient beside G^E rows", Problem.MODEL_VALUES, 20, "no G^E rows beside it",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1)
                                .row("solvent", "beta").row("excess Gibbs energy A0", "alpha + beta", 0.5))),
                bad("an osmotic coefficient on a card of three", Problem.MODEL_VALUES, 25, "mixed salts",
                        ternary(c -> c.row("osmotic coefficient", "beta", "Pitzer", 1, 1)
                                .row("solvent", "alpha"))),
                bad("an osmotic coefficient with three numbers", Problem.MODEL_VALUES, 20, "found 3 number(s)",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1, 0.08)
                                .row("solvent", "beta"))),
                bad("a charge that is no whole number", Problem.MODEL_VALUES, 20, "found 1.5",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1.5, 1).row("solvent", "beta"))),
                bad("a 2:2 salt", Problem.MODEL_VALUES, 20, "β(2)",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 2, 2).row("solvent", "beta"))),
                bad("a range upside down", Problem.MODEL_VALUES, 20, "found 25 and -60",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1, 25, -60)
                                .row("solvent", "beta"))),
                bad("an osmotic coefficient without its beta0 row", Problem.MISSING_PAIR_ROW, 0, "'pitzer beta0'",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta"))),
                bad("an osmotic coefficient without its ice limit", Problem.MISSING_PAIR_ROW, 0, "'ice limit'",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta")
                                .row("Pitzer beta0", "alpha", 0.08).row("Pitzer beta1", "alpha", 0.27)
                                .row("Pitzer Cphi", "alpha", 0.001))),
                bad("an ice limit past the card's valid mole fraction", Problem.MODEL_VALUES, 25,
                        "typed for a mole fraction", v2(c -> c.set(16, "valid mole fraction", "alpha", 0, 0.1)
                        .row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta")
                        .row("Pitzer beta0", "alpha", 0.08).row("Pitzer beta1", "alpha", 0.27)
                        .row("Pitzer Cphi", "alpha", 0.001).row("ice limit", "alpha", 0.233))),
                bad("an ice limit of 1", Problem.MODEL_VALUES, 25, "found 1", v2(c -> c
                        .row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta")
                        .row("Pitzer beta0", "alpha", 0.08).row("Pitzer beta1", "alpha", 0.27)
                        .row("Pitzer Cphi", "alpha", 0.001).row("ice limit", "alpha", 1))),
                bad("Pitzer rows without an osmotic coefficient row", Problem.MISSING_PAIR_ROW, 0,
                        "'pitzer beta1' rows for the salt", v2(c -> c.row("Pitzer beta1", "alpha", 0.27))),
                bad("seven terms of beta1", Problem.MODEL_VALUES, 23, "one to six terms", v2(c -> c
                        .row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta")
                        .row("Pitzer beta0", "alpha", 0.08).row("Pitzer beta1", "alpha", 1, 2, 3, 4, 5, 6, 7)
                        .row("Pitzer Cphi", "alpha", 0.001))),
                bad("a Pitzer row for the water", Problem.MODEL_VALUES, 25, "this row names another component",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta")
                                .row("Pitzer beta0", "alpha", 0.08).row("Pitzer beta1", "alpha", 0.27)
                                .row("Pitzer Cphi", "alpha", 0.001).row("Pitzer Cphi", "beta", 0.001))),
                bad("an osmotic coefficient for the solvent", Problem.SOLVENT_WITH_SOLUTION_MODEL, 20,
                        "beta is the card's solvent", v2(c -> c.row("osmotic coefficient", "beta", "Pitzer", 1, 1)
                                .row("osmotic coefficient", "alpha", "Pitzer", 1, 1).row("solvent", "beta"))),
                bad("an osmotic model of another name", Problem.BAD_KEYWORD, 20, "\"Debye\"",
                        v2(c -> c.row("osmotic coefficient", "alpha", "Debye", 1, 1).row("solvent", "beta"))),
                // mixture-density models (invented coefficients: only the card's grammar is tested here)
                bad("a density formula and excess volume rows", Problem.VOLUME_STATED_TWICE, 0,
                        "by its mass fraction polynomial model and by 'excess volume' rows",
                        v2(c -> c.set(12, "# off").set(13, "# off").set(14, "# off").set(15, "# off")
                                .row("mixture density reference temperature", 293.15)
                                .row("mixture density T0", "alpha", 997.0, -200.0))),
                bad("a density formula and a component's own density", Problem.DENSITY_FROM_MIXTURE_MODEL, 12,
                        "the density of alpha comes from the card's mass fraction polynomial model",
                        v2(c -> c.row("mixture density reference temperature", 293.15)
                                .row("mixture density T0", "alpha", 997.0, -200.0))),
                bad("a density formula without its T0 row", Problem.MISSING_PAIR_ROW, 0, "mixture density T0",
                        v2(c -> c.set(12, "# off").set(13, "# off").set(14, "# off").set(15, "# off")
                                .row("mixture density reference temperature", 293.15)
                                .row("mixture density T1", "alpha", -0.2))),
                bad("an apparent density with four parameters", Problem.MODEL_VALUES, 20,
                        "five parameters c0 to c4", v2(c -> c.set(12, "# off").set(13, "# off")
                                .row("apparent density", "alpha", "Laliberté–Cooper 2004", 1, 2, 3, 4)
                                .row("solvent", "beta"))),
                bad("a three-component Wilson card without one pair", Problem.MISSING_MODEL_PAIR, 0,
                        "no 'Wilson' row for the pair beta + gamma", ternary(c -> c.set(1, "Miscela card", 2)
                                .row("wilson", "alpha + beta", 100, 200).row("wilson", "alpha + gamma", 100, 200)
                                .row("wilson volume", "alpha", 58).row("wilson volume", "beta", 18)
                                .row("wilson volume", "gamma", 73))),
                bad("a DIPPR 101 vapour pressure with four constants", Problem.MODEL_VALUES, 21,
                        "5 constants, then optionally the lowest and highest temperature",
                        v2(c -> c.row("pressure unit", "kPa")
                                .row("vapour pressure", "alpha", "DIPPR 101", 73.3, -7122.3, -7.14, 2.9e-6))),
                bad("an unknown vapour-pressure form names DIPPR 101 among the forms", Problem.BAD_KEYWORD, 21,
                        "DIPPR 101", v2(c -> c.row("pressure unit", "kPa")
                                .row("vapour pressure", "alpha", "DIPPR 105", 1, 2, 3, 4, 5))),
                bad("a Wilson pair written both ways", Problem.DUPLICATE_ROW, 21, "row 20",
                        v2(c -> c.row("wilson", "alpha + beta", 100, 200).row("wilson", "beta + alpha", 200, 100)
                                .row("wilson volume", "alpha", 58).row("wilson volume", "beta", 18))),
                bad("a card cut short by a small array block", Problem.CARD_CUT_SHORT, 20,
                        "the card has 21 rows and 4 columns, but the range holds only 20 rows and 4 columns",
                        v2(c -> c.row("card size", 21, 4))),
                bad("an apparent density of another name", Problem.BAD_KEYWORD, 20, "\"Cooper 2004\"",
                        v2(c -> c.set(12, "# off").set(13, "# off")
                                .row("apparent density", "alpha", "Cooper 2004", 1, 2, 3, 4, 5)
                                .row("solvent", "beta"))),
                // melting data for the freezing point (invented values: only the card's grammar is tested here)
                bad("a melting point without an enthalpy of fusion", Problem.MISSING_PAIR_ROW, 0,
                        "'melting point' rows for alpha but no 'enthalpy of fusion' row",
                        v2(c -> c.row("enthalpy unit", "J/mol").row("melting point", "alpha", 250))),
                bad("a heat capacity of fusion alone", Problem.MISSING_PAIR_ROW, 0,
                        "'heat capacity of fusion' rows for beta but no 'melting point' row",
                        v2(c -> c.row("enthalpy unit", "J/mol").row("heat capacity of fusion", "beta", 30))),
                bad("melting data without an enthalpy unit", Problem.MISSING_ROW, 0, "\"enthalpy unit\"",
                        v2(c -> c.row("melting point", "alpha", 250).row("enthalpy of fusion", "alpha", 5000))),
                bad("a zero enthalpy of fusion", Problem.NOT_POSITIVE, 22, "the enthalpy of fusion must be greater",
                        v2(c -> c.row("enthalpy unit", "J/mol").row("melting point", "alpha", 250)
                                .row("enthalpy of fusion", "alpha", 0))),
                bad("a melting point below absolute zero", Problem.NOT_POSITIVE, 21, "the melting point (in kelvin)",
                        v2(c -> c.row("enthalpy unit", "J/mol").row("melting point", "alpha", -300)
                                .row("enthalpy of fusion", "alpha", 5000))),
                bad("a heat capacity of fusion that would cancel the enthalpy of fusion", Problem.MODEL_VALUES, 23,
                        "within 10 % of the melting point", v2(c -> c.row("enthalpy unit", "J/mol")
                                .row("melting point", "alpha", 250).row("enthalpy of fusion", "alpha", 5000)
                                .row("heat capacity of fusion", "alpha", 250))),
                bad("melting data on a version 1 card", Problem.NEEDS_VERSION_2, 20, "melting point",
                        base(c -> c.row("melting point", "alpha", 250))));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("malformed")
    void malformedCardNamesProblemAndRow(String what, Problem problem, int row, String fragment, Object[][] cells) {
        MiscelaException e = assertThrows(MiscelaException.class, () -> CardReader.read(cells));
        assertEquals(problem, e.problem(), e.getMessage());
        String m = e.getMessage();
        if (row > 0) {
            assertTrue(m.startsWith("Card row " + row + " ") || m.startsWith("Card row " + row + ":"),
                    "expected row " + row + " in: " + m);
        } else {
            assertFalse(m.contains("Card row"), "no row expected in: " + m);
        }
        assertTrue(m.contains(fragment), "expected \"" + fragment + "\" in: " + m);
    }

    /** Every card problem in the catalogue (those before the argument problems) has a malformed card above. */
    @Test
    void everyCardProblemIsProduced() {
        Set<Problem> produced = malformed().map(a -> (Problem) a.get()[1])
                .collect(Collectors.toCollection(() -> EnumSet.noneOf(Problem.class)));
        Set<Problem> card = EnumSet.range(Problem.CARD_EMPTY, Problem.NO_COMPOSITION_LIMIT);
        Set<Problem> missing = EnumSet.copyOf(card);
        missing.removeAll(produced);
        assertTrue(missing.isEmpty(), "no malformed card for " + missing);
        assertEquals(45, card.size(), "the card problems changed; update the malformed cards");
    }

    // ------------------------------------------------------------------ well-formed cards

    private static final double T = 298.15;

    @Test
    void baseCardReads() {
        Card card = TestCard.base().read();
        assertEquals("Test pair", card.title());
        assertEquals("invented values, for tests", card.source());
        assertEquals(2, card.componentCount());
        assertEquals("alpha", card.components().get(0).name());
        assertEquals("beta", card.components().get(1).name());
        assertEquals(46.07, card.components().get(0).molarMass(), 0.0);
        assertEquals(789.3, card.components().get(0).density().at(T), 0.0);
        assertEquals(288.15, card.validity().lowestKelvin(), 0.0);
        assertEquals(308.15, card.validity().highestKelvin(), 0.0);
        assertEquals(0.0, card.validity().lowestFraction(0), 0.0);
        assertEquals(1.0, card.validity().highestFraction(1), 0.0);
        assertFalse(card.extrapolationAllowed());
        RedlichKister rk = card.excessVolume(0, 1);
        assertEquals(2, rk.order());
        assertEquals(-4.0, rk.coefficientAt(0, T), 0.0);
        assertEquals(1.5, rk.coefficientAt(1, T), 0.0);
        assertEquals(-0.5, rk.coefficientAt(2, T), 0.0);
    }

    @Test
    void titleIsOptionalAndExtrapolationDefaultsToRefuse() {
        Card card = TestCard.base().blank(2).blank(9).read();
        assertEquals("", card.title());
        assertFalse(card.extrapolationAllowed());
        assertTrue(TestCard.base().set(9, "extrapolation", " Allow ").read().extrapolationAllowed());
    }

    @Test
    void densityInGramPerCm3EqualsKgPerM3Internally() {
        Card kg = TestCard.base().read();
        for (String spelling : new String[] {"g/cm³", "g/cm3", "g/mL", "g/ml", "g/cc", "kg/L", "kg/l", "kg/litre",
            "kg/liter", "kg/dm³", "kg/dm3", "t/m³", "t/m3"}) {
            Card g = TestCard.base().set(5, "density unit", spelling)
                    .set(13, "density coefficients", "alpha", 0.7893)
                    .set(15, "density coefficients", "beta", 0.997).read();
            for (int k = 0; k < 2; k++) {
                assertEquals(kg.components().get(k).density().at(T), g.components().get(k).density().at(T),
                        1e-9, spelling);
            }
            // results come back in the card's unit
            double rhoKg = CardFunctions.density(kg, 0.4, T, Extrapolation.AS_CARD);
            double rhoG = CardFunctions.density(g, 0.4, T, Extrapolation.AS_CARD);
            assertEquals(rhoKg / 1000.0, rhoG, 1e-12, spelling);
        }
        for (String spelling : new String[] {"kg/m3", "g/L", "g/l", "g/litre", "g/liter"}) {
            Card same = TestCard.base().set(5, "density unit", spelling).read();
            assertEquals(789.3, same.components().get(0).density().at(T), 0.0, spelling);
        }
        // a card in kg/L answers in kg/L and says so
        Card kgPerL = TestCard.base().set(5, "density unit", "kg/L").set(13, "density coefficients", "alpha", 0.7893)
                .set(15, "density coefficients", "beta", 0.997).read();
        assertEquals("kg/L", kgPerL.units().density().symbol());
    }

    /**
     * Pounds per US gallon: 1 lb/gal = 0.45359237 kg / 0.003785411784 m³ = 119.826 427 3 kg/m³ (both factors exact,
     * NIST SP 811 (2008), B.8; its table lists lb/gal (U.S.) as 1.198 264 E+02 kg/m³). Water of 997 kg/m³ is
     * 997/119.826427 = 8.32037 lb/gal.
     */
    @Test
    void densityInPoundsPerUsGallon() {
        Card kg = TestCard.base().read();
        for (String spelling : new String[] {"lb/gal", "lb/US gal"}) {
            Card lb = TestCard.base().set(5, "density unit", spelling)
                    .set(13, "density coefficients", "alpha", 789.3 / 119.826427316897)
                    .set(15, "density coefficients", "beta", 997.0 / 119.826427316897).read();
            assertEquals(997.0, lb.components().get(1).density().at(T), 1e-9, spelling);
            assertEquals(CardFunctions.density(kg, 0.4, T, Extrapolation.AS_CARD) / 119.826427316897,
                    CardFunctions.density(lb, 0.4, T, Extrapolation.AS_CARD), 1e-12, spelling);
        }
        assertEquals(1.198264e2, Units.Density.LB_PER_GAL.toKgPerM3(1.0), 1e-4, "NIST SP 811 B.8, rounded there");
        assertEquals(8.32037, Units.Density.LB_PER_GAL.fromKgPerM3(997.0), 5e-6);
    }

    @Test
    void polynomialDensityCoefficientsAreConvertedToo() {
        Card g = TestCard.base().set(5, "density unit", "g/cm³")
                .set(13, "density coefficients", "alpha", 0.79, -0.0008)
                .set(12, "density model", "alpha", "polynomial")
                .set(15, "density coefficients", "beta", 0.997)
                .row("density reference temperature", "alpha", 293.15).read();
        PureDensity d = g.components().get(0).density();
        assertEquals(790.0, d.at(293.15), 1e-9);
        assertEquals(790.0 - 0.8 * 10.0, d.at(303.15), 1e-9);
    }

    @Test
    void celsiusTemperatureUnit() {
        // "ºC" (ordinal indicator) and "˚C" (ring above) are what keyboards give for a degree sign that looks right
        for (String spelling : new String[] {"°C", "ºC", "˚C", "℃", "degC", "C"}) {
            Card c = TestCard.base().set(4, "temperature unit", spelling)
                    .set(8, "valid temperature", 15, 35)
                    .set(12, "density model", "alpha", "polynomial")
                    .set(13, "density coefficients", "alpha", 790, -0.8)
                    .row("density reference temperature", "alpha", 20)
                    .set(17, "excess volume A0", "alpha + beta", -4.0, 0.02)
                    .row("excess volume reference temperature", "alpha + beta", 25).read();
            // a slope per °C is the same as per K; the reference temperature is shifted
            assertTheSlopedPair(c, spelling);
            // function arguments are read in the card's temperature unit
            Card k = TestCard.base().set(12, "density model", "alpha", "polynomial")
                    .set(13, "density coefficients", "alpha", 790, -0.8)
                    .row("density reference temperature", "alpha", 293.15)
                    .set(17, "excess volume A0", "alpha + beta", -4.0, 0.02)
                    .row("excess volume reference temperature", "alpha + beta", 298.15).read();
            assertEquals(CardFunctions.density(k, 0.3, 300.15, Extrapolation.AS_CARD),
                    CardFunctions.density(c, 0.3, 27, Extrapolation.AS_CARD), 1e-9, spelling);
        }
        assertEquals(Units.Temperature.KELVIN, TestCard.base().read().units().temperature());
    }

    /**
     * The base pair with alpha's density 790 kg/m³ at 293.15 K falling 0.8 kg/m³ per K, A0 = −4 cm³/mol at 298.15 K
     * rising 0.02 per K, valid from 288.15 to 308.15 K, in whatever temperature unit the card was written.
     */
    private static void assertTheSlopedPair(Card c, String spelling) {
        assertEquals(288.15, c.validity().lowestKelvin(), 1e-12, spelling);
        assertEquals(308.15, c.validity().highestKelvin(), 1e-12, spelling);
        assertEquals(790.0, c.components().get(0).density().at(293.15), 1e-9, spelling);
        assertEquals(782.0, c.components().get(0).density().at(303.15), 1e-9, spelling);
        assertEquals(298.15, c.excessVolume(0, 1).referenceKelvin(), 1e-12, spelling);
        assertEquals(-4.0 + 0.02 * 5, c.excessVolume(0, 1).coefficientAt(0, 303.15), 1e-12, spelling);
    }

    /**
     * A card in °F (NIST SP 811 (2008), B.9: T/K = (t/°F + 459.67)/1.8; one °F is 5/9 K): 59 to 95 °F is 288.15 to
     * 308.15 K; a density slope of −0.8 kg/m³ per K is −0.8·5/9 per °F about 68 °F (293.15 K); A0's slope of 0.02
     * cm³/mol per K is 0.02·5/9 per °F about 77 °F (298.15 K). Function arguments are read in °F: 80.6 °F is
     * 300.15 K.
     */
    @Test
    void fahrenheitTemperatureUnit() {
        Card k = TestCard.base().set(12, "density model", "alpha", "polynomial")
                .set(13, "density coefficients", "alpha", 790, -0.8)
                .row("density reference temperature", "alpha", 293.15)
                .set(17, "excess volume A0", "alpha + beta", -4.0, 0.02)
                .row("excess volume reference temperature", "alpha + beta", 298.15).read();
        for (String spelling : new String[] {"°F", "ºF", "˚F", "℉", "degF", "F"}) {
            Card f = TestCard.base().set(4, "temperature unit", spelling)
                    .set(8, "valid temperature", 59, 95)
                    .set(12, "density model", "alpha", "polynomial")
                    .set(13, "density coefficients", "alpha", 790, -0.8 * 5 / 9)
                    .row("density reference temperature", "alpha", 68)
                    .set(17, "excess volume A0", "alpha + beta", -4.0, 0.02 * 5 / 9)
                    .row("excess volume reference temperature", "alpha + beta", 77).read();
            assertEquals(Units.Temperature.FAHRENHEIT, f.units().temperature(), spelling);
            assertTheSlopedPair(f, spelling);
            assertEquals(CardFunctions.density(k, 0.3, 300.15, Extrapolation.AS_CARD),
                    CardFunctions.density(f, 0.3, 80.6, Extrapolation.AS_CARD), 1e-9, spelling);
        }
        assertEquals(273.15, Units.Temperature.FAHRENHEIT.toKelvin(32), 1e-12, "ice point, NIST SP 811 B.9");
        assertEquals(373.15, Units.Temperature.FAHRENHEIT.toKelvin(212), 1e-12, "steam point, 212 °F");
        assertEquals(0.0, Units.Temperature.FAHRENHEIT.toKelvin(-459.67), 1e-12, "absolute zero, −459.67 °F");
        assertEquals(-40.0, Units.Temperature.FAHRENHEIT.fromKelvin(Units.Temperature.CELSIUS.toKelvin(-40)), 1e-12,
                "−40 °F is −40 °C");
        assertEquals(1.8, Units.Temperature.FAHRENHEIT.differenceFromKelvin(1.0), 1e-15, "1 K = 1.8 °F");
        assertEquals("°F", Units.Temperature.FAHRENHEIT.degree());
        assertEquals("K", Units.Temperature.CELSIUS.degree());
    }

    @Test
    void molarVolumeUnits() {
        Card cm3 = TestCard.base().read();
        Object[][] spellings = {{"L/mol", 1e-3}, {"l/mol", 1e-3}, {"dm³/mol", 1e-3}, {"dm3/mol", 1e-3},
            {"m³/mol", 1e-6}, {"m3/mol", 1e-6}, {"mL/mol", 1.0}, {"ml/mol", 1.0}, {"cm3/mol", 1.0},
            {"litre/mol", 1e-3}, {"liter/mol", 1e-3}};
        for (Object[] s : spellings) {
            double f = (Double) s[1];
            Card c = TestCard.base().set(6, "molar volume unit", s[0])
                    .set(17, "excess volume A0", "alpha + beta", -4.0 * f)
                    .set(18, "excess volume A1", "alpha + beta", 1.5 * f)
                    .set(19, "excess volume A2", "alpha + beta", -0.5 * f).read();
            for (int k = 0; k <= 2; k++) {
                assertEquals(cm3.excessVolume(0, 1).coefficientAt(k, T), c.excessVolume(0, 1).coefficientAt(k, T),
                        1e-12, (String) s[0]);
            }
            // results come back in the card's molar volume unit
            assertEquals(CardFunctions.excessMolarVolume(cm3, 0.3, T, Extrapolation.AS_CARD) * f,
                    CardFunctions.excessMolarVolume(c, 0.3, T, Extrapolation.AS_CARD), 1e-12 * Math.max(f, 1e-3),
                    (String) s[0]);
        }
    }

    @Test
    void molarMassInKgPerMol() {
        Card c = TestCard.base().set(7, "molar mass unit", "kg/mol")
                .set(10, "component", "alpha", 0.04607).set(11, "component", "beta", 0.018015).read();
        assertEquals(46.07, c.components().get(0).molarMass(), 1e-9);
        assertEquals(18.015, c.components().get(1).molarMass(), 1e-9);
        // kg/kmol is g/mol (10³/10³)
        Card kmol = TestCard.base().set(7, "molar mass unit", "kg/kmol").read();
        assertEquals(46.07, kmol.components().get(0).molarMass(), 0.0);
        assertEquals("g/mol", kmol.units().molarMass().symbol());
    }

    @Test
    void reversedPairFlipsOddCoefficients() {
        double[] a = {-4.0, 1.5, -0.5, 0.25};
        TestCard reversed = TestCard.base();
        for (int k = 0; k < 3; k++) {
            reversed.set(17 + k, "excess volume A" + k, "beta + alpha", a[k]);
        }
        reversed.row("excess volume A3", "Beta+ALPHA", a[3]);
        Card c = reversed.read();
        RedlichKister rk = c.excessVolume(0, 1);
        RedlichKister asWritten = c.excessVolume(1, 0);
        for (int k = 0; k < a.length; k++) {
            assertEquals((k % 2 == 0 ? 1 : -1) * a[k], rk.coefficientAt(k, T), 0.0, "A" + k);
            assertEquals(a[k], asWritten.coefficientAt(k, T), 0.0, "A" + k);
        }
        // the excess volume itself does not depend on the order the pair was written in
        Card forward = TestCard.base().set(18, "excess volume A1", "alpha + beta", -1.5)
                .row("excess volume A3", "alpha + beta", -0.25).read();
        for (double x = 0.0; x <= 1.0; x += 0.125) {
            assertEquals(forward.excessVolume(0, 1).value(x, T), rk.value(x, T), 1e-12);
        }
    }

    @Test
    void reversedPairFlipsTemperatureTermsOfOddCoefficients() {
        Card c = TestCard.base()
                .set(17, "excess volume A0", "beta + alpha", -4.0, 0.01)
                .set(18, "excess volume A1", "beta + alpha", 1.5, 0.02, 0.001)
                .blank(19)
                .row("excess volume reference temperature", "beta + alpha", 298.15).read();
        RedlichKister rk = c.excessVolume(0, 1);
        double t = 303.15;
        assertEquals(-4.0 + 0.01 * 5, rk.coefficientAt(0, t), 1e-12);
        assertEquals(-(1.5 + 0.02 * 5 + 0.001 * 25), rk.coefficientAt(1, t), 1e-12);
    }

    @Test
    void blankRowsAndTrailingBlankCellsAreIgnored() {
        TestCard spaced = TestCard.base();
        for (int r = 19; r >= 2; r -= 3) {
            spaced.insert(r);
        }
        spaced.insert(1, "", "", null).row().row(" ", "", null);
        Object[][] cells = spaced.cells(9); // every row padded with empty cells to 9 columns
        cells[5] = new Object[] {cells[5][0], cells[5][1], null, null, " "};
        Card c = CardReader.read(cells);
        Card plain = TestCard.base().read();
        assertEquals(plain.components().get(1).name(), c.components().get(1).name());
        assertEquals(plain.validity().highestKelvin(), c.validity().highestKelvin(), 0.0);
        assertEquals(plain.excessVolume(0, 1).coefficientAt(2, T), c.excessVolume(0, 1).coefficientAt(2, T), 0.0);
        // row numbers in messages still count the blank rows
        Object[][] broken = spaced.cells(9);
        int viscosityRow = broken.length + 1;
        Object[][] longer = java.util.Arrays.copyOf(broken, broken.length + 1);
        longer[broken.length] = new Object[] {"viscosity", 1.0, ""};
        MiscelaException e = assertThrows(MiscelaException.class, () -> CardReader.read(longer));
        assertTrue(e.getMessage().startsWith("Card row " + viscosityRow + ":"), e.getMessage());
    }

    @Test
    void labelsIgnoreCaseWhitespaceAndTrailingColon() {
        Card c = TestCard.base()
                .set(1, "  MISCELA   Card: ", 1)
                .set(4, "Temperature Unit:", "K")
                .set(8, "valid\ttemperature :", 288.15, 308.15)
                .set(10, " COMPONENT ", "alpha", 46.07)
                .set(12, "Density  Model", " Alpha ", " Constant ")
                .set(16, "Valid Mole Fraction:", "ALPHA", 0, 1)
                .set(17, "EXCESS VOLUME a0:", "ALPHA  +  beta", -4.0).read();
        assertEquals("alpha", c.components().get(0).name());
        assertEquals(789.3, c.components().get(0).density().at(T), 0.0);
        assertEquals(-4.0, c.excessVolume(0, 1).coefficientAt(0, T), 0.0);
    }

    @Test
    void noteAndHashRowsAreIgnored() {
        Card c = TestCard.base()
                .insert(2, "note", "anything", 42, "even", "numbers")
                .insert(5, "#", "a comment row")
                .insert(9, "# component", "gamma", 1.0)
                .row("Note:", "fitted by hand")
                .row("#excess volume A0", "alpha + gamma", 99)
                .row("note").read();
        assertEquals(2, c.componentCount());
        assertEquals(-4.0, c.excessVolume(0, 1).coefficientAt(0, T), 0.0);
    }

    @Test
    void tanaka2001WaterModel() {
        Card c = TestCard.base().set(14, "density model", "beta", "Tanaka 2001").blank(15)
                .set(8, "valid temperature", 273.15, 313.15).read();
        PureDensity water = c.components().get(1).density();
        assertEquals("Tanaka 2001", water.modelName());
        // M. Tanaka et al., Metrologia 38, 301 (2001): 997.0470 kg/m³ at 25 °C and 998.2067 at 20 °C (as quoted in the
        // project's reference notes); 999.9750 at 4 °C is the paper's table value from memory (the formula gives
        // 999.9749, water.md).
        assertEquals(997.0470, water.at(298.15), 5e-4);
        assertEquals(998.2067, water.at(293.15), 5e-4);
        assertEquals(999.9750, water.at(277.15), 5e-4);
        // in °C the full 0..40 range is accepted
        TestCard.base().set(4, "temperature unit", "°C").set(8, "valid temperature", 0, 40)
                .set(14, "density model", "beta", "Tanaka 2001").blank(15).read();
    }

    @Test
    void compositionLimitsPerComponent() {
        Card c = TestCard.base().set(16, "valid mole fraction", "alpha", 0.1, 0.9)
                .row("valid mole fraction", "beta", 0.2, 0.8).read();
        Validity v = c.validity();
        assertEquals(0.1, v.lowestFraction(0), 0.0);
        assertEquals(0.9, v.highestFraction(0), 0.0);
        assertEquals(0.2, v.lowestFraction(1), 0.0);
        assertEquals(0.8, v.highestFraction(1), 0.0);
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> CardFunctions.excessMolarVolume(c, 0.95, T, Extrapolation.AS_CARD));
        assertEquals(Problem.OUTSIDE_COMPOSITION, e.problem());
        CardFunctions.excessMolarVolume(c, 0.95, T, Extrapolation.ALLOW);
    }

    /** A limit of the second component is inclusive like every other: x2 = 1 − 0.8 = 0.2 is inside 0.2..0.8. */
    @Test
    void secondComponentLimitIsInclusive() {
        Card c = TestCard.base().row("valid mole fraction", "beta", 0.2, 0.8).read();
        assertEquals(CardFunctions.OK, CardFunctions.check(c, 0.8, T, Extrapolation.AS_CARD));
    }

    @Test
    void extrapolationRowAndArgument() {
        Card refuse = TestCard.base().read();
        Card allow = TestCard.base().set(9, "extrapolation", "allow").read();
        double hot = 320.0;
        assertEquals(Problem.OUTSIDE_TEMPERATURE, assertThrows(MiscelaException.class,
                () -> CardFunctions.density(refuse, 0.5, hot, Extrapolation.AS_CARD)).problem());
        CardFunctions.density(refuse, 0.5, hot, Extrapolation.ALLOW);
        CardFunctions.density(allow, 0.5, hot, Extrapolation.AS_CARD);
        assertEquals(Problem.OUTSIDE_TEMPERATURE, assertThrows(MiscelaException.class,
                () -> CardFunctions.density(allow, 0.5, hot, Extrapolation.REFUSE)).problem());
    }
}
