package org.miscela.core.problem;

import java.math.BigDecimal;

/**
 * Formatting of numbers inside messages: short, exact enough to find the cell, in plain form; only numbers of 10^15
 * and more, or below 10^-9, in exponent form as Calc writes them (1E+308), since their plain form runs to hundreds of
 * digits.
 */
public final class Numbers {
    private static final java.util.regex.Pattern TRAILING_ZEROS = java.util.regex.Pattern.compile("\\.?0+$");

    private Numbers() {
    }

    public static String show(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        if (v != 0.0 && (Math.abs(v) >= 1e15 || Math.abs(v) < 1e-9)) {
            String s = String.format(java.util.Locale.ROOT, "%.9E", v);
            int e = s.indexOf('E');
            int exponent = Integer.parseInt(s.substring(e + 1));
            return TRAILING_ZEROS.matcher(s.substring(0, e)).replaceFirst("") + (exponent < 0 ? "E-" : "E+")
                    + Math.abs(exponent);
        }
        BigDecimal d = new BigDecimal(v).round(new java.math.MathContext(10));
        return d.stripTrailingZeros().toPlainString();
    }
}
