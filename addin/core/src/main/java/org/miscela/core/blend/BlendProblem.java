package org.miscela.core.blend;

import java.util.Locale;

/**
 * Every message the blending functions produce themselves, each naming what was wrong and how to fix it. The card's
 * own checks (validity range, extrapolation, non-physical results) come from {@link org.miscela.core.problem.Problem}. Kept
 * apart from that catalogue until the blending functions reach the spreadsheet.
 */
public enum BlendProblem {
    // --- arguments
    BLANK_ARGUMENT("The %s is blank."),
    ARGUMENT_NOT_FINITE("The %s must be a finite number; found %s."),
    NOT_POSITIVE("The %s must be a number greater than zero; found %s."),
    NO_SUCH_COMPONENT("The %s, component %d, is not on the card; it has %d components (%s), counted from 1 in card "
            + "order."),
    LENGTH("The %s have %d value(s) but the card has %d components (%s); give one per component, in card order."),
    BLANK_VALUE("The %s of %s is blank; %s."),
    VALUE_NOT_FINITE("The %s of %s must be a finite number; found %s."),
    VALUE_NEGATIVE("The %s of %s is %s; it cannot be negative."),
    UNKNOWN_UNIT("The unit \"%s\" is not recognised; use one of: %s."),
    WRONG_DIMENSION("%s is a unit of %s, but the %s needs a unit of %s (%s)."),
    UNKNOWN_BASIS("The composition basis \"%s\" is not recognised; use one of: %s."),
    UNKNOWN_RESULT("The choice \"%s\" is not recognised; use one of: %s."),

    // --- compositions
    FRACTION_SUM("The %s sum to %s; they must sum to 1 (within 1e-6)."),
    NEEDS_BALANCE("Reading %s needs a balance component: name the component that makes up the rest of the mixture "
            + "(usually the solvent); its own entry may then be left blank."),
    NEEDS_SOLVENT("Molalities need a solvent: name the component per kilogram of which the moles are counted."),
    NO_SOLVENT("The composition holds no %s, so molalities (moles per kilogram of %s) are undefined; choose a "
            + "solvent that is present."),
    BALANCE_DISAGREES("The %s given for the balance component %s is %s, but the other entries imply %s; leave that "
            + "entry blank, or correct it."),
    TOO_CONCENTRATED("No composition gives these %s at %s %s: even with no %s at all, the other components in the "
            + "proportions given reach only %s %% of the values entered; lower them."),
    NO_COMPOSITION("No composition of this card gives these %s at %s %s with %s as the balance: the card's molar "
            + "volume is not physical along the way; check the card and the values."),
    SEVERAL_COMPOSITIONS("The %s entered fit %d compositions of this card at %s %s (mole fraction of %s: %s), so "
            + "they do not say which is meant; give the composition on another basis, such as mass fractions."),

    // --- batches
    NEEDS_TEMPERATURES("The %s are volumes, so each needs the temperature it was measured at: give one temperature "
            + "per component (a component with no volume needs none)."),
    NEEDS_TEMPERATURE("The %s is a volume, so it needs the temperature it was measured at."),
    NO_STORAGE_TEMPERATURES("No storage temperatures were given, so the volumes of the pure components to draw are "
            + "not known; give one temperature per component."),
    AMOUNT_ZERO("The %s add up to nothing; give a positive amount of at least one component."),
    AMOUNT_TOO_LARGE("The %s come to more moles than a number can hold (over 1.8e308 in all); check them and their "
            + "unit."),
    NEEDS_REMOVAL("The target cannot be reached by additions alone: the batch holds %s, which the target excludes. "
            + "Give a final quantity, or the largest the vessel can take, to get the closest composition within it."),
    LIMIT_BELOW_BATCH("The batch already amounts to %s %s, more than the %s of %s %s; additions can only increase "
            + "it."),
    LIMIT_UNREACHABLE("Additions cannot bring the batch to the %s of %s %s: the card's volumes are not physical "
            + "along the way."),

    // --- composition from density
    NEEDS_REFERENCE("With %d components, varying %s alone does not fix a composition: give a reference composition "
            + "(mole fractions) whose other components keep their ratios."),
    NO_PROPORTIONS("The reference composition holds nothing but %s, so it gives no ratios for the other components; "
            + "give one that contains some of them."),
    RANGE_HALF("Give both ends of the range of the mole fraction of %s, or neither."),
    BAD_RANGE("The range of the mole fraction of %s must run from 'from' to 'to' with 0 ≤ from < to ≤ 1; found %s "
            + "to %s."),
    EMPTY_PATH("No composition along this path, varying %s with the others in the reference's ratios, lies inside "
            + "the card's validity range. Extrapolation is refused; to accept it, pass TRUE as 'extrapolate' or write "
            + "'extrapolation | allow' on the card."),
    DENSITY_NOT_FOUND("No composition with the mole fraction of %s from %s to %s has the density %s %s at %s %s; "
            + "along that range the card gives %s to %s %s."),
    SEVERAL_DENSITIES("The density %s %s at %s %s occurs at %d compositions along this path, mole fraction of %s = "
            + "%s; give a range (from, to) that contains only the one you mean.");

    private final String pattern;

    BlendProblem(String pattern) {
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

    BlendException raise(Object... args) {
        return new BlendException(this, format(args));
    }
}
