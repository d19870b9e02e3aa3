package org.miscela.core.card;

import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * One non-blank row of a card: its 1-based row number within the range, its label (trimmed, as written), the label's
 * normalised key, and the cells after the label, up to the last non-blank one. Reading a value checks its kind and
 * names this row and the value's column when it fails.
 *
 * <p>Values are null (blank), {@link Double} (numbers and logical cells) or {@link String} (text).
 */
final class CardRow {
    /** A decimal number written with one separator, a point or a comma, and digits on both sides: "0,998", "-4.2". */
    private static final java.util.regex.Pattern ONE_SEPARATOR =
            java.util.regex.Pattern.compile("([-+]?\\d{1,20})([.,])(\\d{1,20})");
    final int number;
    final String label;
    final String key;
    final Object[] values;

    CardRow(int number, String label, Object[] values) {
        this.number = number;
        this.label = label;
        this.key = CardReader.normalise(label);
        this.values = values;
    }

    /** Column number (1-based, within the card range) of value i. */
    private static int column(int i) {
        return i + 2;
    }

    /** Value i, which must be text. */
    String text(int i) {
        Object v = i < values.length ? values[i] : null;
        if (v == null) {
            throw Problem.MISSING_VALUE.raise(number, label, column(i));
        }
        if (v instanceof Double) {
            throw Problem.NOT_TEXT.raise(number, label, column(i), Numbers.show((Double) v));
        }
        return (String) v;
    }

    /** Value i, which must be a finite number. */
    double number(int i) {
        Object v = i < values.length ? values[i] : null;
        if (v == null) {
            throw Problem.MISSING_VALUE.raise(number, label, column(i));
        }
        if (!(v instanceof Double)) {
            String text = ((String) v).trim();
            java.util.regex.Matcher m = ONE_SEPARATOR.matcher(text);
            if (m.matches()) {
                // a number with one decimal separator, kept as text: a locale mix-up, an apostrophe, a text cell
                String separator = m.group(2);
                throw Problem.NUMBER_AS_TEXT.raise(number, label, column(i), text,
                        Numbers.show(Double.parseDouble(m.group(1) + "." + m.group(3))), separator);
            }
            throw Problem.NOT_A_NUMBER.raise(number, label, column(i), text);
        }
        double d = (Double) v;
        if (Double.isNaN(d) || Double.isInfinite(d)) {
            throw Problem.NOT_FINITE.raise(number, label, column(i));
        }
        return d;
    }

    /** All values from index i to the last non-blank one, each a finite number; at least one. */
    double[] numbersFrom(int i) {
        int n = Math.max(values.length - i, 1);
        double[] out = new double[n];
        for (int j = 0; j < n; j++) {
            out[j] = number(i + j);
        }
        return out;
    }

    /** Fails when a value follows the first {@code n}. */
    void atMost(int n) {
        if (values.length > n) {
            while (values[n] == null) {
                n++; // the last value is never blank, so this stops
            }
            Object v = values[n];
            throw Problem.EXTRA_VALUE.raise(number, label, column(n), v instanceof Double
                    ? Numbers.show((Double) v) : String.valueOf(v));
        }
    }
}
