package org.miscela.core.problem;

import static org.miscela.core.problem.Problem.Section.BLEND;
import static org.miscela.core.problem.Problem.Section.CALL;
import static org.miscela.core.problem.Problem.Section.CARD;
import static org.miscela.core.problem.Problem.Section.CHECK;
import static org.miscela.core.problem.Problem.Section.EXPLAIN;
import static org.miscela.core.problem.Problem.Section.FAILURE;
import static org.miscela.core.problem.Problem.Section.FIT;
import static org.miscela.core.problem.Problem.Section.SLIP;

import java.util.Locale;

/**
 * The catalogue of every message the add-in can produce, in one enum with a section per kind of problem: a card's own
 * problems, a call's, the fitting engine's, the blending functions', MIX.EXPLAIN's answers about a call it cannot run,
 * and the words for an unexpected failure. Each entry is one kind of problem with a message pattern
 * ({@link String#format} style) that names what was wrong and how to fix it. Keeping them in one place lets the
 * documentation list them all (docs/errors.md is generated from it) and lets tests prove each can occur. An entry's
 * name is unique across the sections; {@link #raise} makes the one exception type that carries it,
 * {@link MiscelaException}.
 */
public enum Problem {
    // --- the card as a whole
    CARD_EMPTY(CARD, "The card is empty: the range must hold a card whose first row is 'Miscela card | 1'."),
    CARD_HEADER(CARD, "Card row %d: a card starts with the row 'Miscela card | 1'; found \"%s\"."),
    CARD_VERSION(CARD, "Card row %d: card format version %s is not supported; this add-in reads versions 1 to %d."),
    NEEDS_VERSION_2(CARD, "Card row %d: \"%s\" is a card format version 2 row; change the header to 'Miscela card | 2'."),
    UNKNOWN_LABEL(CARD, "Card row %d: unknown label \"%s\"."),
    DUPLICATE_ROW(CARD, "Card row %d: \"%s\" is given twice (also in row %d)."),
    MISSING_ROW(CARD, "The card lacks the row \"%s\".", Advice.INSIDE_RANGE),
    NO_LABEL(CARD, "Card row %d holds values but no label in its first column."),
    MISSING_VALUE(CARD, "Card row %d (%s): column %d is empty; a value belongs there."),
    NOT_A_NUMBER(CARD, "Card row %d (%s): column %d holds the text \"%s\" where a number belongs."),
    NUMBER_AS_TEXT(CARD, "Card row %d (%s): column %d holds the text \"%s\" where a number belongs; it reads as %s "
            + "with '%s' as the decimal separator. Calc keeps a number as text when it is typed with the decimal "
            + "separator its locale does not use, after an apostrophe, or in a cell formatted as text: enter it as a "
            + "number, with the decimal separator of Calc's locale (Tools ▸ Options ▸ Language Settings ▸ Languages)."),
    NOT_TEXT(CARD, "Card row %d (%s): column %d must hold text; found %s."),
    NOT_FINITE(CARD, "Card row %d (%s): column %d is not a finite number."),
    EXTRA_VALUE(CARD, "Card row %d (%s): unexpected value in column %d (\"%s\")."),
    UNKNOWN_UNIT(CARD, "Card row %d (%s): unit \"%s\" is not recognised; use one of: %s."),
    BAD_KEYWORD(CARD, "Card row %d (%s): \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_COMPONENT(CARD, "Card row %d (%s): \"%s\" is not declared by a 'component' row."),
    BAD_TRIPLE(CARD, "Card row %d (%s): \"%s\" must name three different components joined by '+', e.g. 'ethanol + water + glycerol'."),
    BAD_PAIR(CARD, "Card row %d (%s): \"%s\" must name two different components joined by '+', e.g. 'ethanol + water'."),
    NAME_WITH_PLUS(CARD, "Card row %d (%s): the component name \"%s\" contains '+', which joins the components of a "
            + "pair ('a + b'); remove it from the name. Calc's AutoInput may have put it there: typing a name under a "
            + "cell whose text starts the same way (a title such as 'ethanol + water') completes it to that text. "
            + "Retype the name and press Delete before Enter, or switch off Tools ▸ AutoInput."),
    NOT_POSITIVE(CARD, "Card row %d (%s): %s must be greater than zero; found %s."),
    BAD_RANGE(CARD, "Card row %d (%s): the lower limit %s must be below the upper limit %s."),
    MOLE_FRACTION_LIMIT(CARD, "Card row %d (%s): mole-fraction limits must lie within 0..1; found %s..%s."),
    TOO_FEW_COMPONENTS(CARD, "The card declares %d component(s); a mixture needs at least 2."),
    COMPONENT_ORDER(CARD, "Card row %d (%s): the card states the components in the order %s, but its 'component' rows "
            + "declare %s; "
            + "put the 'component' rows back in the stated order. A sort (Data ▸ Sort) moves rows, and the first "
            + "'component' row is the one whose mole fraction is x1."),
    MISSING_DENSITY(CARD, "The card gives no 'density model' row for component \"%s\".", Advice.INSIDE_RANGE),
    MODEL_VALUES(CARD, "Card row %d (%s): the %s model takes %s; %s."),
    CARD_CUT_SHORT(CARD, "Card row %d (card size): the card has %d rows and %d columns, but the range holds only %d rows and %d columns to its last value: an array formula entered over too small a block cuts a card short. Select a block at least that large, or enter the formula in one cell with Ctrl+Shift+Enter, which sizes the block."),
    MISSING_MODEL_PAIR(CARD, "The card gives no '%s' row for the pair %s + %s: add one, or write 'missing pairs | ideal' on the card to treat every pair without one as ideal.", Advice.INSIDE_RANGE),
    VOLUME_STATED_TWICE(CARD, "The card states the mixture's volume twice: by its %s model and by 'excess volume' rows; keep one of them (see docs/card-format.md)."),
    DENSITY_FROM_MIXTURE_MODEL(CARD, "Card row %d (%s): the density of %s comes from the card's %s model, so a row of its own would state it a second time; remove this row."),
    MODEL_RANGE(CARD, "Card row %d (%s): the %s model is valid from %s to %s K, but the card's 'valid temperature' range runs from %s to %s K."),
    PAIR_ORDER(CARD, "Card row %d (%s): the pair is written \"%s\" here but \"%s\" in row %d; write every row of a pair in the same order."),
    DENSITY_NOT_POSITIVE(CARD, "Card row %d (%s): the density model of %s gives %s kg/m³ at %s K, inside the card's validity range."),
    MISSING_PAIR(CARD, "The card gives no %s for the pair %s + %s: add its '%s A0' row (write 0 for an ideal pair), or write 'missing pairs | ideal' on the card to treat every pair without rows as ideal.", Advice.INSIDE_RANGE),
    MISSING_PAIR_ROW(CARD, "The card gives '%s' rows for %s but no '%s' row."),
    COEFFICIENT_GAP(CARD, "The card gives '%s' for %s but not '%s'; coefficients must run from the first without gaps (write 0 where needed)."),
    COVARIANCE_SIZE(CARD, "Card row %d (%s): the pair %s has %d coefficients, so its covariance takes %d rows of %d values; found %s."),
    COVARIANCE_NOT_SYMMETRIC(CARD, "Card row %d (%s): the covariance is not symmetric: entry (%d, %d) is %s but (%d, %d) is %s."),
    COVARIANCE_NEGATIVE(CARD, "Card row %d (%s): the variance of coefficient %d is %s; a variance cannot be negative."),
    NO_SOLUTION_MODEL(CARD, "The card gives solution-model rows (one per solute), so every component but the solvent "
            + "%s needs one of each kind; %s has none.", Advice.INSIDE_RANGE),
    SOLVENT_WITH_SOLUTION_MODEL(CARD, "Card row %d (%s): %s is the card's solvent, whose own data are its pure-liquid "
            + "rows; a row of this kind belongs to a solute."),
    PACKED_VERSION(CARD, "The packed card is of format version %s; this add-in reads version %d. Pack the card again "
            + "with MIX.PACK, or name its range instead."),
    PACKED_DAMAGED(CARD, "The packed card does not read: %s does not match what it holds, so the text was changed "
            + "after MIX.PACK wrote it. Pack the card again with MIX.PACK, or name its range instead."),
    NO_COMPOSITION_LIMIT(CARD, "The card gives no 'valid mole fraction' row; state the composition range the coefficients were fitted over.", Advice.INSIDE_RANGE),

    // --- what MIX.CHECK says about a card that reads but looks odd, and its details (never a refusal)
    CHECK_WARNINGS(CHECK, "OK with %s: %s"),
    WARN_RANGE_SIZE(CHECK, "The card's range is %s rows × %s columns (%s cells), but the card fills only %d rows × %d "
            + "columns (%s cells): Calc converts every cell of the range for every call, about %s s per call at "
            + "0.34 µs a cell, and a sheet of 50 single-cell formulas over a card named as whole columns took about "
            + "5 GB of office memory and 90 s per recalculation. Name only the card's cells, with a few blank rows to "
            + "spare; or put =MIX.PACK(card) in one cell and name that cell in the formulas, so the range is read "
            + "once per recalculation."),
    WARN_SORTED(CHECK, "Card rows %d to %d are sorted by column %d (%s), as Data ▸ Sort leaves them: if the card was "
            + "sorted, its 'component' rows may now be in another order than written, and x1 (the mole fraction of "
            + "the first) then means another component. Check that %s (row %d) is meant to be component 1; a "
            + "'component order' row (format version 2) makes every function refuse a card whose component rows "
            + "have moved."),
    WARN_MOLAR_MASS(CHECK, "Card row %d (%s): the molar mass of %s comes to %s g/mol, outside %s to %s g/mol, the "
            + "range of common liquids: check the value and the 'molar mass unit' row (g/mol values under the unit "
            + "kg/mol read 1000 times too large)."),
    WARN_DENSITY(CHECK, "Card row %d (%s): the density of %s comes to %s %s at %s %s, outside %s to %s %s, the range "
            + "of common liquids: check the coefficients and the 'density unit' row (a value typed with the other "
            + "locale's decimal separator can turn into thousands, one written 10 times too large shows here). Heavy "
            + "liquids such as mercury (13,534 kg/m³) are real: then nothing is wrong."),
    WARN_EXPANSION(CHECK, "Card row %d (%s): the density of %s changes by %s per K at %s %s (a thermal expansion "
            + "coefficient of %s per K), outside %s to %s per K, the range of common liquids: check the temperature "
            + "coefficients (one written 10 times too large, or with the wrong sign)."),
    WARN_MOLAR_VOLUME(CHECK, "The molar volume of %s, M/ρ, comes to %s cm³/mol at %s %s, outside %s to %s cm³/mol, the "
            + "range of common liquids: check its molar mass (row %d), its density (row %d) and their units."),
    WARN_DIGITS(CHECK, "Card row %d (%s): %s written with %s, but the card needs %s for its %s to stay within %s: "
            + "its terms cancel (one is %s times %s), so rounding in the last digits written moves the %s by up to %s "
            + "here and %s in all. Copy the coefficients with all their digits."),
    WARN_GIBBS_HELMHOLTZ(CHECK, "The card's excess Gibbs energy and excess enthalpy disagree by the Gibbs–Helmholtz "
            + "relation H^E = −T²·∂(G^E/T)/∂T: the temperature slope of its G^E/RT implies H^E = %s %s where its "
            + "excess enthalpy rows give %s %s (at %s %s, %s: the worst difference, %s %s, of %d points over the "
            + "validity range). One of them is not to be trusted for heats, or for how the phase equilibrium moves "
            + "with temperature: a G^E fitted at one temperature, or with an assumed slope in T, often disagrees so."),
    CHECK_EXTENT_TIGHT(CHECK, "The range is %d rows × %d columns; the card fills it to row %d and column %d (%d "
            + "non-blank rows read). Its last row is filled: a row typed below the range is not part of the card, so "
            + "insert rows inside the range, or widen it (Sheet ▸ Named Ranges and Expressions ▸ Manage)."),
    CHECK_EXTENT_SPARE(CHECK, "The range is %d rows × %d columns; the card fills it to row %d and column %d (%d "
            + "non-blank rows read). Rows %d to %d are blank: a row typed there is read, a row below row %d is not."),
    // --- what MIX.EXPLAIN says about the arguments of a call that gives a result but looks like a slip
    WARN_PERCENT_AS_FRACTION(SLIP, "The composition is on the basis \"%s\" (0 to 100), but its largest value is %s %s, "
            + "under 1 %s: if it was written as a fraction, %s %s was meant; write %s. So small a content is real for "
            + "a trace or a low-alcohol product; then nothing is wrong."),
    WARN_BASIS_TEMPERATURE_UNUSED(SLIP, "A basis temperature (%s %s) is given, but the basis is %s, which is not "
            + "measured per volume, so the basis temperature is not used. If the composition is a strength (%%vol), "
            + "a molarity (mol/L), a mass concentration (g/L) or a volume fraction, give that basis; otherwise leave "
            + "the basis temperature out."),
    WARN_SMALL_BATCH(SLIP, "%s %s %s in all, a batch %s: every result describes a batch of millilitres. If %s "
            + "was meant, write that unit (a unit 1000 times too small changes every result). A laboratory batch is "
            + "real; then nothing is wrong."),
    WARN_PURE_HEAT_CAPACITY(SLIP, "The card gives no excess heat capacity (its excess enthalpy does not vary with "
            + "temperature and it states no solution model), so the blend's heat capacity is taken as the sum of the "
            + "pure liquids'. Real solutions such as aqueous acids hold less heat than that sum, and a temperature "
            + "rise then comes out low (7 to 10 %% for sulfuric acid): add a 'solution heat capacity' row or "
            + "temperature-dependent enthalpy coefficients (docs/card-format.md)."),
    WARN_SWAPPED_TEMPERATURES(SLIP, "The reference temperature %s %s is none of the trade's usual ones (15 °C, "
            + "20 °C, 60 °F), but the measured temperature %s %s is one: if the two were swapped, the factor is the "
            + "inverse of the one wanted (and the densities belong to the other temperature). A correction to a "
            + "working or delivery temperature is real; then nothing is wrong."),

    // --- arguments of a call
    NOT_BINARY(CALL, "A single mole fraction describes a mixture only when the card has 2 components; this card has %d: give the mole fractions of all of them, in card order, as a row or column of cells."),
    COMPOSITION_LENGTH(CALL, "The composition has %d mole fraction(s) but the card has %d components (%s); give one per component, in card order."),
    COMPOSITION_NEGATIVE(CALL, "The mole fraction of %s is %s; mole fractions cannot be negative."),
    COMPOSITION_SUM(CALL, "The mole fractions sum to %s; they must sum to 1 (within 1e-6)."),
    COMPOSITION_SHAPE(CALL, "The composition range is %d×%d, but the card has %d components: give a row or a column of %d cells, or a block of %d columns with one composition per row."),
    COMPOSITION_AMBIGUOUS(CALL, "On a two-component card a column of two cells is read as two values of x1, but %s and %s add up to 1, so they could also be one composition (x1, x2): for one composition give x1 alone or a row of two cells; for two values of x1 give each its own formula."),
    COMPONENT_NOT_HERE(CALL, "A component is given, but the result \"%s\" is one value for the whole batch, not one per component; leave the component out, or ask for \"additions\"."),
    AMOUNT_NEGATIVE(CALL, "The amount of %s is %s; amounts cannot be negative."),
    AMOUNT_ZERO(CALL, "The amounts add up to nothing; give a positive amount of at least one component."),
    AMOUNT_TOO_LARGE(CALL, "The amounts come to more moles than a number can hold (over 1.8e308 in all); check the amounts and their basis."),
    UNKNOWN_BASIS(CALL, "The amount basis \"%s\" is not recognised; use one of: %s."),
    NO_ENTHALPY(CALL, "The card holds no excess enthalpy data: add an 'enthalpy unit' row and 'excess enthalpy A0' rows (see docs/card-format.md).", Advice.INSIDE_RANGE),
    NO_VOLUME(CALL, "The card holds no excess volume data (it describes enthalpy only), so it gives no volumes or densities: add 'excess volume A0' rows (see docs/card-format.md).", Advice.INSIDE_RANGE),
    PURE_HYPOTHETICAL(CALL, "The card's %s model describes %s only dissolved in %s, so it has no pure-liquid density or volume: give its amount by mass or moles, not as a volume or volume fraction of the pure liquid."),
    NO_GIBBS(CALL, "The card gives no 'excess Gibbs energy' rows, so it gives no activity coefficients or vapour pressures of a blend: add 'excess Gibbs energy A0' rows (coefficients of G^E/RT, see docs/card-format.md).", Advice.INSIDE_RANGE),
    NO_VAPOUR_PRESSURE(CALL, "The card gives no 'vapour pressure' row for %s; the blend's vapour pressure needs one for every component present.", Advice.INSIDE_RANGE),
    OUTSIDE_VAPOUR_PRESSURE(CALL, "The temperature %s %s is outside the range %s to %s %s the vapour pressure constants of %s hold for.", Advice.EXTRAPOLATION),
    NO_BUBBLE_POINT(CALL, "No temperature from %s to %s %s gives this blend a bubble pressure of %s %s: over that range it runs from %s to %s %s."),
    NO_DEW_POINT(CALL, "No temperature from %s to %s %s is the dew point of this vapour at %s %s: the vapour condenses at all of them, or at none."),
    NO_AZEOTROPE(CALL, "The card gives %s + %s no azeotrope at %s %s: the vapour is richer in the same component over the whole range (x1 from 0.0025 to 0.9975)."),
    SEVERAL_AZEOTROPES(CALL, "The card gives %d compositions where vapour and liquid agree at %s %s (x1 = %s): its excess Gibbs energy is not fixed well enough there to name one azeotrope."),
    NOT_BINARY_AZEOTROPE(CALL, "An azeotrope is searched on a two-component card only; this card has %d components."),
    NO_DILUENT(CALL, "The composition holds nothing but %s, so there is nothing to dilute it in: give the mole fractions of the liquids around it (its own entry is ignored)."),
    NO_ENERGY_UNIT(CALL, "The card states no 'enthalpy unit', the unit an excess Gibbs energy is given in: add one (J/mol or kJ/mol).", Advice.INSIDE_RANGE),
    NO_PRESSURE_UNIT(CALL, "The card states no 'pressure unit', the unit of the pressures this function takes and gives: add one (kPa, bar, atm, mmHg, …).", Advice.INSIDE_RANGE),
    NO_HEAT_CAPACITY(CALL, "The card gives no 'heat capacity' row for %s; the temperature rise needs the heat capacity of every component.", Advice.INSIDE_RANGE),
    NO_TEMPERATURE_ROOT(CALL, "No temperature between %s and %s K balances the heat of mixing; the card's heat capacities or excess enthalpy are not physical there."),
    OUTSIDE_PAIR_TEMPERATURE(CALL, "The temperature %s %s is outside the range %s to %s %s stated for the pair %s.", Advice.EXTRAPOLATION),
    OUTSIDE_PAIR_COMPOSITION(CALL, "The pair %s is present at the ratio %s = %s, outside the range %s to %s stated for it.", Advice.EXTRAPOLATION),
    OUTSIDE_FINAL_TEMPERATURE(CALL, "The batch would reach %s %s, outside the card's validity range %s to %s %s.", Advice.EXTRAPOLATION),
    BOILS(CALL, "The batch would reach %s %s, at or above its boiling point of %s %s at this composition (%s): it "
            + "would boil first, throwing out hot liquid and vapour, and the heat balance no "
            + "longer holds. Plan more cooling or a slower addition; to see the temperature the balance gives all the "
            + "same, pass TRUE as 'boiling'."),
    PATH_EMPTY_VESSEL(CALL, "The first charge, %s, is what the vessel holds when the addition starts; it must be more "
            + "than nothing: put the first component charged first."),
    PATH_LIMIT(CALL, "The limit %s %s must lie above the temperature the vessel starts at (%s %s): give the highest "
            + "temperature the batch may reach, as 'limit', with the result \"cooling\"."),
    PATH_STEPS(CALL, "The number of steps per charge must be a whole number from 1 to %d; found %s."),
    FIT_NEEDS_TEMPERATURE(CALL, "A fit with temperature-dependent coefficients (order in T above 0) needs a temperature for every point."),
    FIT_NEEDS_REFERENCE(CALL, "A fit with temperature-dependent coefficients (order in T above 0) needs a reference temperature: write the one the card's 'reference temperature' row will hold."),
    FIT_OUTPUT_NOT_HERE(CALL, "The result \"%s\" is not available from this function."),
    UNKNOWN_GIBBS_MODEL(CALL, "The model \"%s\" is not recognised; use one of: Redlich-Kister, Wilson, NRTL."),
    FIT_ORDER_NOT_HERE(CALL, "The %s model has a fixed number of parameters: leave the order out (it is the Redlich–Kister order)."),
    NRTL_ALPHA(CALL, "NRTL's α must lie above 0 and at most 1 (values from 0.2 to 0.47 are usual); found %s."),
    FIT_NEEDS_WILSON_VOLUMES(CALL, "A Wilson fit needs the molar volume Λ uses for %s: add a 'Wilson volume' row for it to the pure part the fit reads, so that the card's fitted rows below use the same volumes."),
    FIT_OUTSIDE_VAPOUR_PRESSURE(CALL, "Point %d is at %s %s, outside the range %s to %s %s the vapour pressure constants of %s hold for: remove the point or give constants that cover it."),
    VLE_FIT_NOT_CONVERGED(CALL, "The fit did not converge within %d iterations: the data may not suit this model; try another model or a lower order, and check the points' units."),
    VLE_FIT_POOR(CALL, "The best fit misses the measured pressures by %s %% root mean square (%s %% at point %d), too far for coefficients to trust: check the units of p and T and the order of x and y, or try another model; the \"statistics\" and \"residuals\" still show the fit."),
    VLE_FIT_UNDETERMINED(CALL, "The data cannot separate the %d parameters (for example a temperature dependence from points at one temperature): lower the order or the order in T, or add points."),
    CONSISTENCY_NEEDS_VAPOUR(CALL, "The consistency tests compare measured vapour compositions: give y for at least two points strictly between the pure liquids."),
    NO_FLASH_POINT_ROW(CALL, "The card gives no 'flash point' row for %s: write its closed-cup flash point and the test method (or its 'lower flammable limit'), or 'none' for a liquid that does not flash (such as water); a flammable liquid left out would make the blend's flash point look higher than it is."),
    NOT_FLAMMABLE(CALL, "None of the liquids present flashes by the card's 'flash point' rows (%s: none), so this model gives the blend no flash point; check those rows if the blend can burn."),
    NO_FLASH_POINT(CALL, "No flash point between %s and %s %s, the range searched (the card's validity and its vapour-pressure constants' ranges): Le Chatelier's sum of the flammable vapour is %s at the bottom and %s at the top (1 at the flash point); allow extrapolation to search further."),
    UNKNOWN_ACTIVITY(CALL, "The activity \"%s\" is not recognised; use \"card\" (the card's G^E) or \"ideal\" (γ = 1, for comparison)."),
    NOT_BINARY_FLASH(CALL, "A minimum flash point is searched on a two-component card only; this card has %d components."),
    NO_FLASH_MINIMUM(CALL, "No blend flashes below both pure liquids: the lowest flash point is that of pure %s, %s %s, and the flash point rises steadily away from it."),
    UNKNOWN_FIT_OUTPUT(CALL, "The result \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_PAIR_ARG(CALL, "The pair \"%s\" does not name two different components of the card (%s); write it as 'first + second'."),
    DATA_SHAPE(CALL, "The %s range is %d×%d; give a single column or row of values, one per point."),
    DATA_LENGTH(CALL, "The %s range has %d value(s) but the %s range has %d; give one of each per point."),
    DATA_PARTLY_BLANK(CALL, "Point %d has a %s but a blank %s; fill it in, or clear the whole point."),
    NOT_A_COUNT(CALL, "The %s must be a whole number from 0 to %d; found %s."),
    NO_MODEL_COVARIANCE(CALL, "The card's %s model gives no covariance of its parameters, so the uncertainty cannot be propagated; the model's stated accuracy is on the card's source row."),
    NO_COVARIANCE(CALL, "The card gives no 'excess volume covariance' rows for the pair %s, so the uncertainty cannot be propagated (fit the pair with MIX.FITDENSITY or MIX.FITEXCESS and result \"covariance\")."),
    UNKNOWN_QUANTITY(CALL, "The quantity \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_PROPERTY(CALL, "The property \"%s\" is not recognised; use one of: %s."),
    LIBRARY_NO_MATCH(CALL, "No library card's name, title, components or source contains \"%s\"; MIX.LIBRARY() with no argument lists them all."),
    UNKNOWN_LIBRARY_CARD(CALL, "The library has no card named \"%s\"; its cards are: %s (MIX.LIBRARY lists them with their sources)."),
    UNKNOWN_INFO_ITEM(CALL, "The item \"%s\" is not recognised; use one of: %s."),
    ARG_BLANK(CALL, "The %s is blank."),
    ARG_NOT_NUMBER(CALL, "The %s must be a number; found %s."),
    ARG_NOT_FINITE(CALL, "The %s must be a finite number."),
    ARG_NOT_TEXT(CALL, "The %s must be text; found %s."),
    ARG_NOT_FLAG(CALL, "The %s must be TRUE or FALSE (or left out); found %s."),
    ARG_NOT_SINGLE(CALL, "The %s must be a single value here, not a range."),
    ARG_SHAPE(CALL, "The %s range is %d×%d but the %s range is %d×%d; give ranges of the same shape, or a single value."),
    MOLE_FRACTION_OUTSIDE_UNIT(CALL, "The mole fraction %s lies outside 0..1."),
    BELOW_ABSOLUTE_ZERO(CALL, "The temperature %s %s is below absolute zero."),
    UNKNOWN_COMPONENT_ARG(CALL, "Component %s is not on the card; give a number from 1 to %d or one of the names: %s."),
    OUTSIDE_TEMPERATURE(CALL, "The temperature %s %s is outside the card's validity range %s to %s %s.", Advice.EXTRAPOLATION),
    OUTSIDE_COMPOSITION(CALL, "The mole fraction of %s, %s, is outside the card's validity range %s to %s.", Advice.EXTRAPOLATION),
    CHECK_NEEDS_BOTH(CALL, "To check a point, give both the mole fraction and the temperature."),
    NON_PHYSICAL(CALL, "At %s %s the card gives a %s of %s, which is not physical; the card is being used where its models do not hold."),
    NO_CONVERGENCE(CALL, "The numerical search for %s did not converge (%s), so there is no result; the card's models "
            + "may be irregular there: check them near this point."),
    NO_FUSION_DATA(CALL, "The card gives no 'melting point' and 'enthalpy of fusion' rows for %s, so it cannot say when a solid forms: add both rows for the component that crystallises (see docs/card-format.md).", Advice.INSIDE_RANGE),
    FREEZING_NEEDS_GIBBS(CALL, "The card gives no excess Gibbs energy (G^E/RT rows) and no osmotic coefficient, so the freezing point cannot allow for how the liquids interact: add them, or pass \"ideal\" as 'activity' to assume an ideal solution (γ = 1), which can be kelvins too warm for a strong blend.", Advice.INSIDE_RANGE),
    IDEAL_NEEDS_IONS(CALL, "The card is a solution of salts or acids in %s, and it does not say how many ions each solute gives (an 'osmotic coefficient' row does), so an ideal solution would count each solute as one molecule and put the freezing point far too warm: add the row (see docs/card-format.md).", Advice.INSIDE_RANGE),
    OSMOTIC_SERIES_RANGE(CALL, "The water's activity from Pitzer's osmotic coefficient needs the Debye–Hückel slope, known from −39 to 100 °C (the series of Clegg, Rard and Pitzer, 1994); %s %s lies outside, so none is given there."),
    PAST_ICE_LIMIT(CALL, "The brine's mole fraction of %s, %s, is past the card's 'ice limit' of %s (the eutectic, or the strongest brine known to freeze to ice): there the salt or one of its hydrates crystallises first, at a warmer temperature than the ice line, which Miscela does not compute, so no freezing point is given."),
    SOLUTE_ACTIVITY(CALL, "The card's osmotic coefficient gives the activity of the water only, not of %s: a solid of the dissolved salt (or its hydrate) is not computed; ask for the ice from %s."),
    FREEZING_COMPONENT_ABSENT(CALL, "The blend holds no %s, so no solid %s can form from it; name a component that is present, or leave the component out for the one that freezes first."),
    FREEZING_TOO_FAR(CALL, "The freezing point found, %s %s, lies %s K below the lowest temperature of the card's data (%s %s): further than Miscela extrapolates a card's G^E (%s K), and another liquid without melting rows on the card may crystallise first. Use a card whose data reach nearer the freezing point."),
    NO_FREEZING_POINT(CALL, "No temperature from %s to %s %s lets solid %s form from this blend (x = %s): its activity in the liquid does not meet the melting curve there; the card's activity model may not hold so far from its data."),

    // --- the fitting engine (point numbers count from 1, as a user reads rows)
    NO_POINTS(FIT, "No data points were given."),
    FIT_PURE_FROM_MODEL(FIT, "The card given for the pure liquids states its density by a %s model, not by pure-liquid density rows, so coefficients fitted against it would fit no card: give the top of a card with a 'density model' row for each component."),
    LENGTH_MISMATCH(FIT, "There are %d %s but %d %s; give one of each per point."),
    RAGGED_DESIGN(FIT, "Row %d of the design has %d column(s) but row 1 has %d."),
    NO_PARAMETERS(FIT, "The design has no column: a fit needs at least one parameter."),
    FIT_NOT_FINITE(FIT, "The %s at point %d is not a finite number (%s)."),
    NEGATIVE_WEIGHT(FIT, "The weight at point %d is %s; weights must be zero or positive."),
    TOO_FEW_POINTS(FIT, "The fit has %d parameter(s) but only %d point(s) with positive weight; give at least as many "
            + "points as parameters, or lower the order."),
    ZERO_COLUMN(FIT, "Parameter %d multiplies zero at every point with positive weight, so the data say nothing about it; "
            + "spread the points or lower the order."),
    RANK_DEFICIENT(FIT, "The points cannot separate the %d parameters: the design is rank deficient (condition number %s "
            + "after column scaling, limit %s); spread the points or lower the order."),
    FIT_MOLE_FRACTION_OUTSIDE_UNIT(FIT, "The mole fraction at point %d, %s, lies outside 0..1."),
    FIT_NOT_POSITIVE(FIT, "The %s at point %d is %s; it must be greater than zero."),
    BAD_ORDER(FIT, "The %s must be a whole number from 0 to %d; found %d."),
    BAD_SIGNIFICANCE(FIT, "The significance level must lie strictly between 0 and 1; found %s."),
    NOT_NESTED(FIT, "Fit %d of the order comparison has %d parameter(s), no more than fit %d with %d; each order must "
            + "add parameters to the one before."),
    NOT_SAME_POINTS(FIT, "Fit %d of the order comparison uses %d point(s) but fit 1 uses %d; compare fits to the same data."),

    // --- the blending functions (the card's own checks, such as the validity range, are the call entries above)
    // ... their arguments
    BLANK_ARGUMENT(BLEND, "The %s is blank."),
    ARGUMENT_NOT_FINITE(BLEND, "The %s must be a finite number; found %s."),
    BLEND_NOT_POSITIVE(BLEND, "The %s must be a number greater than zero; found %s."),
    NO_SUCH_COMPONENT(BLEND, "The %s, component %d, is not on the card; it has %d components (%s), counted from 1 in card "
            + "order."),
    LENGTH(BLEND, "The %s have %d value(s) but the card has %d components (%s); give one per component, in card order."),
    BLANK_VALUE(BLEND, "The %s of %s is blank; %s."),
    VALUE_NOT_FINITE(BLEND, "The %s of %s must be a finite number; found %s."),
    VALUE_NEGATIVE(BLEND, "The %s of %s is %s; it cannot be negative."),
    VALUE_OUT_OF_RANGE(BLEND, "The %s %s is outside 0 to %s (the entry for %s)."),
    BLEND_UNKNOWN_UNIT(BLEND, "The unit \"%s\" is not recognised; use one of: %s."),
    WRONG_DIMENSION(BLEND, "%s is a unit of %s, but the %s needs a unit of %s (%s)."),
    BLEND_UNKNOWN_BASIS(BLEND, "The composition basis \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_RESULT(BLEND, "The choice \"%s\" is not recognised; use one of: %s."),

    // ... compositions
    FRACTION_SUM(BLEND, "The %s sum to %s; they must sum to %s (within 1e-6)."),
    NEEDS_BALANCE(BLEND, "Reading %s needs a balance component: name the component that makes up the rest of the mixture "
            + "(usually the solvent); its own entry may then be left blank."),
    NEEDS_SOLVENT(BLEND, "Molalities need a solvent: name the component per kilogram of which the moles are counted."),
    NO_SOLVENT(BLEND, "The composition holds no %s, so molalities (moles per kilogram of %s) are undefined; choose a "
            + "solvent that is present."),
    BALANCE_DISAGREES(BLEND, "The %s given for the balance component %s is %s, but the other entries imply %s; leave that "
            + "entry blank, or correct it."),
    TOO_CONCENTRATED(BLEND, "No composition gives these %s at %s %s: even with no %s at all, the other components in the "
            + "proportions given reach only %s %% of the values entered; lower them."),
    NO_COMPOSITION(BLEND, "No composition of this card gives these %s at %s %s with %s as the balance: the card's molar "
            + "volume is not physical along the way; check the card and the values."),
    SEVERAL_COMPOSITIONS(BLEND, "The %s entered fit %d compositions of this card at %s %s (mole fraction of %s: %s), so "
            + "they do not say which is meant; give the composition on another basis, such as mass fractions."),

    // ... batches
    NEEDS_TEMPERATURES(BLEND, "The %s are %s, so each needs the temperature it was measured at: give one temperature "
            + "per component (a component with none of it needs none)."),
    NEEDS_TEMPERATURE(BLEND, "The %s is %s, so it needs the temperature it was measured at."),
    NO_STORAGE_TEMPERATURES(BLEND, "No storage temperatures were given, so the %s of the pure components to draw are "
            + "not known; give one temperature per component."),
    LIGHTER_THAN_AIR(BLEND, "The density of %s is %s kg/m³ at %s %s, not above the 1.2 kg/m³ of air that conventional "
            + "mass assumes, so a mass weighed in air cannot be turned into a true mass; give true masses (%s)."),
    BLEND_AMOUNT_ZERO(BLEND, "The %s add up to nothing; give a positive amount of at least one component."),
    BLEND_AMOUNT_TOO_LARGE(BLEND, "The %s come to more moles than a number can hold (over 1.8e308 in all); check them and their "
            + "unit."),
    NEEDS_REMOVAL(BLEND, "The target cannot be reached by additions alone: the batch holds %s, which the target excludes. "
            + "Give a final quantity, or the largest the vessel can take, to get the closest composition within it."),
    LIMIT_BELOW_BATCH(BLEND, "The batch already amounts to %s %s, more than the %s of %s %s; additions can only increase "
            + "it."),
    LIMIT_UNREACHABLE(BLEND, "Additions cannot bring the batch to the %s of %s %s: the card's volumes are not physical "
            + "along the way."),

    // ... composition from density
    NEEDS_REFERENCE(BLEND, "With %d components, varying %s alone does not fix a composition: give a reference composition "
            + "(mole fractions) whose other components keep their ratios."),
    NO_PROPORTIONS(BLEND, "The reference composition holds nothing but %s, so it gives no ratios for the other components; "
            + "give one that contains some of them."),
    RANGE_HALF(BLEND, "Give both ends of the range of the mole fraction of %s, or neither."),
    BLEND_BAD_RANGE(BLEND, "The range of the mole fraction of %s must run from 'from' to 'to' with 0 ≤ from < to ≤ 1; found %s "
            + "to %s."),
    EMPTY_PATH(BLEND, "No composition along this path, varying %s with the others in the reference's ratios, lies inside "
            + "the card's validity range.", Advice.EXTRAPOLATION),
    DENSITY_NOT_FOUND(BLEND, "No composition with the mole fraction of %s from %s to %s has the density %s %s at %s %s; "
            + "along that range the card gives %s to %s %s."),
    SEVERAL_DENSITIES(BLEND, "The density %s %s at %s %s occurs at %d compositions along this path, mole fraction of %s = "
            + "%s; give a range (from, to) that contains only the one you mean."),

    // --- what MIX.EXPLAIN answers about a call it cannot run (its answers, never a refusal)
    EXPLAIN_UNKNOWN_FUNCTION(EXPLAIN, "%s names no function that MIX.EXPLAIN can explain; give one of these names, with or without 'MIX.': %s."),
    EXPLAIN_ARGUMENT_COUNT(EXPLAIN, "%s takes %s (%s), not %d: Calc shows Err:504 for such a call without calling the function."),
    EXPLAIN_RANGE_LEFT_OUT(EXPLAIN, "The %s, argument %d of %s, is left out; a required argument cannot be, so Calc shows Err:502 for the call without calling the function: give a value, a cell or a range."),

    // --- the words for an unexpected failure (the adapter fills them in; never raised as a refusal)
    UNEXPECTED_FAILURE(FAILURE, "Unexpected failure in %s: %s. This is a fault in the add-in, not in the data: "
            + "please report it with the call.");

    /** The kind of problem an entry is; docs/errors.md has a table for each. */
    public enum Section {
        /** A card that cannot be read: reported by every function given the card, and by MIX.CHECK in words. */
        CARD,
        /**
         * What MIX.CHECK says about a card that reads but looks odd (its warnings, never a refusal: no other function's
         * result changes), and the words of its details.
         */
        CHECK,
        /**
         * What MIX.EXPLAIN says about the arguments of a call that gives a result but look like a slip (warnings, never
         * a refusal: legitimate input looks the same, and the result does not change).
         */
        SLIP,
        /** The arguments of a call: what a cell can get wrong, or a point the card cannot answer. */
        CALL,
        /** The fitting engine's problems with the data (MIX.FITEXCESS, MIX.FITDENSITY, MIX.LEASTSQUARES). */
        FIT,
        /** The blending functions' problems with their arguments and with the compositions asked for. */
        BLEND,
        /** What MIX.EXPLAIN answers about a call it cannot run: its answers, never a refusal. */
        EXPLAIN,
        /** The words for a failure that is no refusal (a fault in the add-in); never raised as a problem. */
        FAILURE
    }

    /** The advice shared by several entries, appended after the statement of what went wrong. */
    private interface Advice {
        String EXTRAPOLATION = "Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write "
                + "'extrapolation | allow' on the card.";
        /** For a row the card lacks: the row may be on the sheet, below a named range that does not reach it. */
        String INSIDE_RANGE = "A row typed below the card's named range is not part of the card: insert rows inside "
                + "the range, or widen the range (Sheet ▸ Named Ranges and Expressions ▸ Manage).";
    }

    private final Section section;
    private final String statement;
    private final String pattern;

    Problem(Section section, String pattern) {
        this(section, pattern, null);
    }

    Problem(Section section, String statement, String advice) {
        this.section = section;
        this.statement = statement;
        this.pattern = advice == null ? statement : statement + " " + advice;
    }

    /** Which kind of problem this is. */
    public Section section() {
        return section;
    }

    /** The message pattern, for documentation. */
    public String pattern() {
        return pattern;
    }

    /** The message with its blanks filled in; numbers are formatted by the caller. */
    public String format(Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    /**
     * What went wrong without the advice that follows it in the message (for an entry without advice, the message
     * itself): the audit trace lists a validity limit crossed this way, as a fact rather than a refusal.
     */
    public String statement(Object... args) {
        return String.format(Locale.ROOT, statement, args);
    }

    /** The entries of one section, in catalogue order. */
    public static java.util.List<Problem> of(Section section) {
        java.util.List<Problem> out = new java.util.ArrayList<>();
        for (Problem p : values()) {
            if (p.section == section) {
                out.add(p);
            }
        }
        return java.util.Collections.unmodifiableList(out);
    }

    /** A {@link MiscelaException} carrying this problem. */
    public MiscelaException raise(Object... args) {
        return new MiscelaException(this, format(args));
    }
}
