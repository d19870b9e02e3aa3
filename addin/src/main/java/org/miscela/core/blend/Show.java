package org.miscela.core.blend;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers inside messages: ten significant digits at most, never in exponent form, so a user can find the cell. */
final class Show {
    private Show() {
    }

    static String number(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return new BigDecimal(v).round(new MathContext(10)).stripTrailingZeros().toPlainString();
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
