package org.miscela.core.fit;

import java.util.Locale;

/**
 * Every message the fitting engine can produce, each naming what was wrong and how to fix it. Kept apart from the
 * library's main catalogue until the fit functions reach the spreadsheet; point numbers count from 1, as a user reads
 * rows.
 */
public enum FitProblem {
    NO_POINTS("No data points were given."),
    LENGTH_MISMATCH("There are %d %s but %d %s; give one of each per point."),
    RAGGED_DESIGN("Row %d of the design has %d column(s) but row 1 has %d."),
    NO_PARAMETERS("The design has no column: a fit needs at least one parameter."),
    NOT_FINITE("The %s at point %d is not a finite number (%s)."),
    NEGATIVE_WEIGHT("The weight at point %d is %s; weights must be zero or positive."),
    TOO_FEW_POINTS("The fit has %d parameter(s) but only %d point(s) with positive weight; give at least as many "
            + "points as parameters, or lower the order."),
    ZERO_COLUMN("Parameter %d multiplies zero at every point with positive weight, so the data say nothing about it; "
            + "spread the points or lower the order."),
    RANK_DEFICIENT("The points cannot separate the %d parameters: the design is rank deficient (condition number %s "
            + "after column scaling, limit %s); spread the points or lower the order."),
    MOLE_FRACTION_OUTSIDE_UNIT("The mole fraction at point %d, %s, lies outside 0..1."),
    NOT_POSITIVE("The %s at point %d is %s; it must be greater than zero."),
    BAD_ORDER("The %s must be a whole number from 0 to %d; found %d."),
    BAD_SIGNIFICANCE("The significance level must lie strictly between 0 and 1; found %s."),
    NOT_NESTED("Fit %d of the order comparison has %d parameter(s), no more than fit %d with %d; each order must "
            + "add parameters to the one before."),
    NOT_SAME_POINTS("Fit %d of the order comparison uses %d point(s) but fit 1 uses %d; compare fits to the same data."),
    COVARIANCE_SHAPE("The covariance must be %d×%d for this expansion; found %d×%d."),
    COVARIANCE_NOT_FINITE("The covariance entry (%d, %d) is not a finite number (%s)."),
    COVARIANCE_NOT_SYMMETRIC("The covariance is not symmetric: entry (%d, %d) is %s but (%d, %d) is %s."),
    COVARIANCE_NEGATIVE_VARIANCE("The covariance has a negative variance %s at (%d, %d)."),
    MOLE_FRACTION("The mole fraction %s lies outside 0..1."),
    TEMPERATURE("The temperature %s K is not a finite value above absolute zero."),
    BAD_COMPONENT("The component must be 1 or 2; found %d.");

    private final String pattern;

    FitProblem(String pattern) {
        this.pattern = pattern;
    }

    /** The message pattern, for documentation. */
    public String pattern() {
        return pattern;
    }

    /** The message with its blanks filled in. */
    public String format(Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    /** A {@link FitException} carrying this problem. */
    public FitException raise(Object... args) {
        return new FitException(this, format(args));
    }
}
