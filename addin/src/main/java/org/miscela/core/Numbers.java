package org.miscela.core;

import java.math.BigDecimal;

/** Formatting of numbers inside messages: short, exact enough to find the cell, never in exponent form for plain values. */
final class Numbers {
    private Numbers() {
    }

    static String show(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        BigDecimal d = new BigDecimal(v).round(new java.math.MathContext(10));
        return d.stripTrailingZeros().toPlainString();
    }
}
