package org.miscela.core.problem;

import java.util.Locale;

/**
 * The catalogue of every message the library can produce. Each entry is one kind of problem with a message pattern
 * ({@link String#format} style) that names what was wrong and how to fix it. Keeping them in one place lets the
 * documentation list them all and lets tests prove each can occur.
 */
public enum Problem {
    // --- the card as a whole
    CARD_EMPTY("The card is empty: the range must hold a card whose first row is 'Miscela card | 1'."),
    CARD_HEADER("Card row %d: a card starts with the row 'Miscela card | 1'; found \"%s\"."),
    CARD_VERSION("Card row %d: card format version %s is not supported; this add-in reads versions 1 to %d."),
    NEEDS_VERSION_2("Card row %d: \"%s\" is a card format version 2 row; change the header to 'Miscela card | 2'."),
    UNKNOWN_LABEL("Card row %d: unknown label \"%s\"."),
    DUPLICATE_ROW("Card row %d: \"%s\" is given twice (also in row %d)."),
    MISSING_ROW("The card lacks the row \"%s\"."),
    NO_LABEL("Card row %d holds values but no label in its first column."),
    MISSING_VALUE("Card row %d (%s): column %d is empty; a value belongs there."),
    NOT_A_NUMBER("Card row %d (%s): column %d holds the text \"%s\" where a number belongs."),
    NOT_TEXT("Card row %d (%s): column %d must hold text; found %s."),
    NOT_FINITE("Card row %d (%s): column %d is not a finite number."),
    EXTRA_VALUE("Card row %d (%s): unexpected value in column %d (\"%s\")."),
    UNKNOWN_UNIT("Card row %d (%s): unit \"%s\" is not recognised; use one of: %s."),
    BAD_KEYWORD("Card row %d (%s): \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_COMPONENT("Card row %d (%s): \"%s\" is not declared by a 'component' row."),
    BAD_TRIPLE("Card row %d (%s): \"%s\" must name three different components joined by '+', e.g. 'ethanol + water + glycerol'."),
    BAD_PAIR("Card row %d (%s): \"%s\" must name two different components joined by '+', e.g. 'ethanol + water'."),
    NOT_POSITIVE("Card row %d (%s): %s must be greater than zero; found %s."),
    BAD_RANGE("Card row %d (%s): the lower limit %s must be below the upper limit %s."),
    MOLE_FRACTION_LIMIT("Card row %d (%s): mole-fraction limits must lie within 0..1; found %s..%s."),
    TOO_FEW_COMPONENTS("The card declares %d component(s); a mixture needs at least 2."),
    MISSING_DENSITY("The card gives no 'density model' row for component \"%s\"."),
    MODEL_VALUES("Card row %d (%s): the %s model takes %s; %s."),
    MODEL_RANGE("Card row %d (%s): the %s model is valid from %s to %s K, but the card's 'valid temperature' range runs from %s to %s K."),
    PAIR_ORDER("Card row %d (%s): the pair is written \"%s\" here but \"%s\" in row %d; write every row of a pair in the same order."),
    DENSITY_NOT_POSITIVE("Card row %d (%s): the density model of %s gives %s kg/m³ at %s K, inside the card's validity range."),
    MISSING_PAIR("The card gives no %s for the pair %s + %s: add its '%s A0' row (write 0 for an ideal pair), or write 'missing pairs | ideal' on the card to treat every pair without rows as ideal."),
    MISSING_PAIR_ROW("The card gives '%s' rows for %s but no '%s' row."),
    COEFFICIENT_GAP("The card gives '%s' for %s but not '%s'; coefficients must run from the first without gaps (write 0 where needed)."),
    COVARIANCE_SIZE("Card row %d (%s): the pair %s has %d coefficients, so its covariance takes %d rows of %d values; found %s."),
    COVARIANCE_NOT_SYMMETRIC("Card row %d (%s): the covariance is not symmetric: entry (%d, %d) is %s but (%d, %d) is %s."),
    COVARIANCE_NEGATIVE("Card row %d (%s): the variance of coefficient %d is %s; a variance cannot be negative."),
    NO_COMPOSITION_LIMIT("The card gives no 'valid mole fraction' row; state the composition range the coefficients were fitted over."),

    // --- arguments of a call
    NOT_BINARY("A single mole fraction describes a mixture only when the card has 2 components; this card has %d: give the mole fractions of all of them, in card order, as a row or column of cells."),
    COMPOSITION_LENGTH("The composition has %d mole fraction(s) but the card has %d components (%s); give one per component, in card order."),
    COMPOSITION_NEGATIVE("The mole fraction of %s is %s; mole fractions cannot be negative."),
    COMPOSITION_SUM("The mole fractions sum to %s; they must sum to 1 (within 1e-6)."),
    COMPOSITION_SHAPE("The composition range is %d×%d, but the card has %d components: give a row or a column of %d cells, or a block of %d columns with one composition per row."),
    AMOUNT_NEGATIVE("The amount of %s is %s; amounts cannot be negative."),
    AMOUNT_ZERO("The amounts add up to nothing; give a positive amount of at least one component."),
    AMOUNT_TOO_LARGE("The amounts come to more moles than a number can hold (over 1.8e308 in all); check the amounts and their basis."),
    UNKNOWN_BASIS("The amount basis \"%s\" is not recognised; use one of: %s."),
    NO_ENTHALPY("The card holds no excess enthalpy data: add an 'enthalpy unit' row and 'excess enthalpy A0' rows (see docs/card-format.md)."),
    NO_VOLUME("The card holds no excess volume data (it describes enthalpy only), so it gives no volumes or densities: add 'excess volume A0' rows (see docs/card-format.md)."),
    NO_HEAT_CAPACITY("The card gives no 'heat capacity' row for %s; the temperature rise needs the heat capacity of every component."),
    NO_TEMPERATURE_ROOT("No temperature between %s and %s K balances the heat of mixing; the card's heat capacities or excess enthalpy are not physical there."),
    OUTSIDE_PAIR_TEMPERATURE("The temperature %s %s is outside the range %s to %s %s stated for the pair %s. Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write 'extrapolation | allow' on the card."),
    OUTSIDE_PAIR_COMPOSITION("The pair %s is present at the ratio %s = %s, outside the range %s to %s stated for it. Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write 'extrapolation | allow' on the card."),
    OUTSIDE_FINAL_TEMPERATURE("The batch would reach %s %s, outside the card's validity range %s to %s %s. Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write 'extrapolation | allow' on the card."),
    FIT_NEEDS_TEMPERATURE("A fit with temperature-dependent coefficients (order in T above 0) needs a temperature for every point."),
    FIT_NEEDS_REFERENCE("A fit with temperature-dependent coefficients (order in T above 0) needs a reference temperature: write the one the card's 'reference temperature' row will hold."),
    FIT_OUTPUT_NOT_HERE("The result \"%s\" is not available from this function."),
    UNKNOWN_FIT_OUTPUT("The result \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_PAIR_ARG("The pair \"%s\" does not name two different components of the card (%s); write it as 'first + second'."),
    DATA_SHAPE("The %s range is %d×%d; give a single column or row of values, one per point."),
    DATA_LENGTH("The %s range has %d value(s) but the %s range has %d; give one of each per point."),
    DATA_PARTLY_BLANK("Point %d has a %s but a blank %s; fill it in, or clear the whole point."),
    NOT_A_COUNT("The %s must be a whole number from 0 to %d; found %s."),
    NO_COVARIANCE("The card gives no 'excess volume covariance' rows for the pair %s, so the uncertainty cannot be propagated (fit the pair with MIX.FITDENSITY or MIX.FITEXCESS and result \"covariance\")."),
    UNKNOWN_QUANTITY("The quantity \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_PROPERTY("The property \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_INFO_ITEM("The item \"%s\" is not recognised; use one of: %s."),
    ARG_BLANK("The %s is blank."),
    ARG_NOT_NUMBER("The %s must be a number; found %s."),
    ARG_NOT_FINITE("The %s must be a finite number."),
    ARG_NOT_TEXT("The %s must be text; found %s."),
    ARG_NOT_FLAG("The %s must be TRUE or FALSE (or left out); found %s."),
    ARG_NOT_SINGLE("The %s must be a single value here, not a range."),
    ARG_SHAPE("The %s range is %d×%d but the %s range is %d×%d; give ranges of the same shape, or a single value."),
    MOLE_FRACTION_OUTSIDE_UNIT("The mole fraction %s lies outside 0..1."),
    BELOW_ABSOLUTE_ZERO("The temperature %s %s is below absolute zero."),
    UNKNOWN_COMPONENT_ARG("Component %s is not on the card; give a number from 1 to %d or one of the names: %s."),
    OUTSIDE_TEMPERATURE("The temperature %s %s is outside the card's validity range %s to %s %s. Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write 'extrapolation | allow' on the card."),
    OUTSIDE_COMPOSITION("The mole fraction of %s, %s, is outside the card's validity range %s to %s. Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write 'extrapolation | allow' on the card."),
    CHECK_NEEDS_BOTH("To check a point, give both the mole fraction and the temperature."),
    NON_PHYSICAL("At %s %s the card gives a %s of %s, which is not physical; the card is being used where its models do not hold."),

    // --- what MIX.EXPLAIN answers about a call it cannot run (its answers, never a refusal)
    EXPLAIN_UNKNOWN_FUNCTION("%s names no function that MIX.EXPLAIN can explain; give one of these names, with or without 'MIX.': %s."),
    EXPLAIN_ARGUMENT_COUNT("%s takes %s (%s), not %d: Calc shows Err:504 for such a call without calling the function."),
    EXPLAIN_RANGE_LEFT_OUT("The %s, argument %d of %s, is left out; a range argument cannot be, so Calc shows Err:502 for the call without calling the function: give a value, a cell or a range.");

    private final String pattern;

    Problem(String pattern) {
        this.pattern = pattern;
    }

    /** The message pattern, for documentation. */
    public String pattern() {
        return pattern;
    }

    /** The message with its blanks filled in; numbers are formatted by the caller. */
    public String format(Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    /** A {@link MiscelaException} carrying this problem. */
    public MiscelaException raise(Object... args) {
        return new MiscelaException(this, format(args));
    }
}
