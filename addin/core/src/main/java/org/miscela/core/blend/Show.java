package org.miscela.core.blend;

/**
 * Numbers inside messages: ten significant digits at most, in plain form so a user can find the cell; only numbers of
 * 10^15 and more, or below 10^-9, in exponent form as Calc writes them (see {@link org.miscela.core.problem.Numbers}).
 */
final class Show {
    private Show() {
    }

    static String number(double v) {
        return org.miscela.core.problem.Numbers.show(v);
    }

    /** Numbers joined by "; " for lists in messages. */
    static String numbers(double[] v) {
        StringBuilder b = new StringBuilder();
        for (double d : v) {
            b.append(b.length() == 0 ? "" : "; ").append(number(d));
        }
        return b.toString();
    }
}
