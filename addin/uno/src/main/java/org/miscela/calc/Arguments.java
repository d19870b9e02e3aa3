package org.miscela.calc;

import com.sun.star.uno.Any;
import com.sun.star.uno.AnyConverter;
import com.sun.star.uno.Type;
import org.miscela.core.functions.AmountBasis;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardCache;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.functions.CheckOutput;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.functions.FitOutput;
import org.miscela.core.problem.Problem;
import org.miscela.core.functions.PropertyKind;

/**
 * Decoding of Calc's single-value arguments (card, component, flags, words, numbers) and of ranges broadcast against
 * each other, plus the cell helpers the other decoders share; {@link CompositionArguments} decodes compositions and
 * batches, {@link DataArguments} lab data. Calc passes an {@code any} argument as a Double, a String, a Boolean, a
 * {@code sequence<sequence<any>>} for a range, or void when the argument is left out.
 */
final class Arguments {
    static final Type GRID = new Type(Object[][].class);

    private Arguments() {
    }

    /** A function of one point: the card and the point's numbers, in argument order. */
    interface PointFunction {
        double at(Card card, double[] point);
    }

    static Card card(Object[][] cells) {
        return CardCache.shared().get(cells);
    }

    /**
     * A required single value as the decoders read it. Such a parameter is typed as a range in the IDL (so that the
     * Function Wizard shows it as required, see FunctionCatalog), and Calc passes a value, a cell or a formula's
     * result as a one-cell range: that range is its cell's value, exactly what an {@code any} parameter would have
     * received. A larger range stays a range (as an {@code any} would receive it), so each decoder refuses it with its
     * own words; null (which Calc never passes: it refuses a call that leaves the argument out) stays null.
     */
    static Object value(Object[][] cells) {
        if (cells != null && cells.length == 1 && cells[0] != null && cells[0].length == 1) {
            return cells[0][0];
        }
        return cells;
    }

    /** A component given by number or name (a one-cell range holding one counts as that cell). */
    static int component(Card card, Object value) {
        Object v = unwrap(value);
        if (v instanceof Object[][]) {
            Object[][] g = (Object[][]) v;
            if (g.length != 1 || g[0].length != 1) {
                throw Problem.ARG_NOT_SINGLE.raise("component");
            }
            v = g[0][0];
        }
        if (v instanceof Boolean) {
            v = ((Boolean) v) ? 1.0 : 0.0;
        }
        if (v instanceof Number) {
            return CardFunctions.componentByNumber(card, ((Number) v).doubleValue());
        }
        if (v instanceof String && !((String) v).trim().isEmpty()) {
            return CardFunctions.componentByName(card, (String) v);
        }
        throw Problem.ARG_BLANK.raise("component");
    }

    static Extrapolation extrapolation(Object value) {
        Object v = unwrap(value);
        if (v == null) {
            return Extrapolation.AS_CARD;
        }
        if (v instanceof Boolean) {
            return ((Boolean) v) ? Extrapolation.ALLOW : Extrapolation.REFUSE;
        }
        if (v instanceof Number && Double.isFinite(((Number) v).doubleValue())) {
            return ((Number) v).doubleValue() != 0.0 ? Extrapolation.ALLOW : Extrapolation.REFUSE;
        }
        throw Problem.ARG_NOT_FLAG.raise("extrapolate argument", describe(v));
    }

    /** An optional TRUE/FALSE argument (a number counts as Calc counts it): {@code absent} when left out. */
    static boolean flag(String what, Object value, boolean absent) {
        Object v = unwrap(value);
        if (v == null) {
            return absent;
        }
        if (v instanceof Boolean) {
            return (Boolean) v;
        }
        if (v instanceof Number && Double.isFinite(((Number) v).doubleValue())) {
            return ((Number) v).doubleValue() != 0.0;
        }
        throw Problem.ARG_NOT_FLAG.raise(what, describe(v));
    }

    /** One number from a one-cell argument. */
    static double single(String what, Object[][] cells) {
        if (cells == null || cells.length != 1 || cells[0].length != 1) {
            throw Problem.ARG_NOT_SINGLE.raise(what);
        }
        return required(what, cells[0][0]);
    }

    /**
     * Evaluates f over the named arguments, each a single value or a range: all ranges must have the same shape and
     * the result has that shape; a blank cell in any range gives a blank result there. With no range, one Double.
     */
    static Object broadcast(Card card, String[] names, Object[][][] values, PointFunction f) {
        Object[][][] grids = new Object[values.length][][];
        Object[] scalars = new Object[values.length];
        int rows = -1;
        int cols = -1;
        int shapeFrom = -1;
        for (int i = 0; i < values.length; i++) {
            Object[][] g = values[i];
            if (g == null || g.length == 0 || g[0].length == 0) {
                throw Problem.ARG_BLANK.raise(names[i]);
            }
            if (g.length > 1 || g[0].length > 1) {
                int r = g.length;
                int c = r == 0 ? 0 : g[0].length;
                if (shapeFrom >= 0 && (r != rows || c != cols)) {
                    throw Problem.ARG_SHAPE.raise(names[shapeFrom], rows, cols, names[i], r, c);
                }
                rows = r;
                cols = c;
                shapeFrom = i;
                grids[i] = g;
            } else {
                scalars[i] = g[0][0];
            }
        }
        double[] point = new double[values.length];
        if (shapeFrom < 0) {
            for (int i = 0; i < values.length; i++) {
                point[i] = required(names[i], scalars[i]);
            }
            return finite(f.at(card, point));
        }
        Object[][] out = new Object[rows][cols];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                boolean blank = false;
                for (int i = 0; i < values.length; i++) {
                    Object cell = grids[i] != null ? grids[i][r][c] : scalars[i];
                    if (grids[i] != null && isBlank(cell)) {
                        blank = true;
                        break;
                    }
                    point[i] = required(names[i], cell);
                }
                out[r][c] = blank ? "" : (Object) finite(f.at(card, point));
            }
        }
        return new Any(GRID, out);
    }

    /** A component given by number or name, or {@code absent} (0-based) when left out. */
    static int optionalComponent(Card card, Object value, int absent) {
        return unwrap(value) == null ? absent : component(card, value);
    }

    /** The amount basis argument: "mol" when left out. */
    static AmountBasis basis(Object value) {
        Object v = unwrap(value);
        if (v == null) {
            return AmountBasis.MOL;
        }
        AmountBasis b = v instanceof String ? AmountBasis.lookup((String) v) : null;
        if (b == null) {
            throw Problem.UNKNOWN_BASIS.raise(v instanceof String ? v : describe(v), AmountBasis.accepted());
        }
        return b;
    }

    /** A property name argument: "volume" when left out. */
    static PropertyKind property(Object value) {
        Object v = unwrap(value);
        if (v == null) {
            return PropertyKind.VOLUME;
        }
        if (!(v instanceof String)) {
            throw Problem.UNKNOWN_PROPERTY.raise(describe(v), "volume, enthalpy, vapour, flash, freezing");
        }
        return PropertyKind.lookup((String) v);
    }

    /** One number from an {@code any} argument. */
    static double number(String what, Object value) {
        Object v = unwrap(value);
        if (v instanceof Object[][]) {
            Object[][] g = (Object[][]) v;
            return single(what, g);
        }
        return required(what, v);
    }

    /** A table of numbers and text as Calc's array result (checked: no NaN or infinity). */
    static Object table(Object[][] rows) {
        for (Object[] r : rows) {
            for (Object v : r) {
                if (v instanceof Double) {
                    finite((Double) v);
                }
            }
        }
        return new Any(GRID, rows);
    }

    /** An optional range argument: null when left out. A single cell arrives as a plain value. */
    static Object[][] optionalRange(Object value) {
        Object v = unwrap(value);
        if (v == null) {
            return null;
        }
        if (v instanceof Object[][]) {
            return (Object[][]) v;
        }
        return new Object[][] {{v}};
    }

    /** A whole number from 0 to {@code highest}; {@code absent} when left out. */
    static int count(String what, Object value, int highest, int absent) {
        Object v = unwrap(value);
        if (v == null) {
            return absent;
        }
        double d = number(what, v);
        if (d != Math.rint(d) || d < 0 || d > highest) {
            throw Problem.NOT_A_COUNT.raise(what, highest, describe(v));
        }
        return (int) d;
    }

    /** A whole number from 0 to {@code highest} that must be given. */
    static int requiredCount(String what, Object value, int highest) {
        if (unwrap(value) == null) {
            throw Problem.ARG_BLANK.raise(what);
        }
        return count(what, value, highest, 0);
    }

    /** An optional number: NaN when left out. */
    static double optionalNumber(String what, Object value) {
        Object v = unwrap(value);
        return v == null ? Double.NaN : number(what, v);
    }

    /** An optional text argument: {@code absent} when left out. */
    /** The activity argument: true for "ideal" (γ = 1), false for "card" or left out; refused otherwise. */
    static boolean idealActivity(Object value) {
        String a = text("activity", value, "card").trim().toLowerCase(java.util.Locale.ROOT);
        if (a.isEmpty() || a.equals("card")) {
            return false;
        }
        if (a.equals("ideal")) {
            return true;
        }
        throw Problem.UNKNOWN_ACTIVITY.raise(a);
    }

    static String text(String what, Object value, String absent) {
        Object v = unwrap(value);
        if (v == null) {
            return absent;
        }
        if (!(v instanceof String)) {
            throw Problem.ARG_NOT_TEXT.raise(what, describe(v));
        }
        return (String) v;
    }

    /** The per argument of the heat-capacity functions: false for "mol" (left out), true for "kg". */
    static boolean perMass(Object value) {
        String t = text("per", value, "mol").trim();
        if (t.equalsIgnoreCase("mol") || t.isEmpty()) {
            return false;
        }
        if (t.equalsIgnoreCase("kg")) {
            return true;
        }
        throw Problem.UNKNOWN_BASIS.raise(t, "mol, kg");
    }

    /** MIX.CHECK's result argument: the summary when left out. */
    static CheckOutput checkOutput(Object value) {
        Object v = unwrap(value);
        if (v == null) {
            return CheckOutput.SUMMARY;
        }
        if (!(v instanceof String)) {
            throw Problem.UNKNOWN_FIT_OUTPUT.raise(describe(v), CheckOutput.words());
        }
        return CheckOutput.lookup((String) v);
    }

    /** The fit output argument: coefficients when left out. */
    static FitOutput fitOutput(Object value) {
        Object v = unwrap(value);
        if (v == null) {
            return FitOutput.COEFFICIENTS;
        }
        if (!(v instanceof String)) {
            throw Problem.UNKNOWN_FIT_OUTPUT.raise(describe(v), "coefficients, standard errors, statistics, "
                    + "covariance, residuals, orders, check");
        }
        return FitOutput.lookup((String) v);
    }

    /** A pair "a + b" of the card's components as {first, second}; left out, the two components of a binary card. */
    static int[] pair(Card card, Object value) {
        Object v = unwrap(value);
        if (v == null || (v instanceof String && ((String) v).trim().isEmpty())) {
            if (card.componentCount() != 2) {
                throw Problem.UNKNOWN_PAIR_ARG.raise("", card.componentCount() + " components");
            }
            return new int[] {0, 1};
        }
        String text = v instanceof String ? (String) v : describe(v);
        String[] parts = text.split("\\+", -1);
        if (parts.length == 2) {
            int a = card.indexOf(parts[0]);
            int b = card.indexOf(parts[1]);
            if (a >= 0 && b >= 0 && a != b) {
                return new int[] {a, b};
            }
        }
        StringBuilder names = new StringBuilder();
        for (org.miscela.core.model.Component c : card.components()) {
            names.append(names.length() == 0 ? "" : ", ").append(c.name());
        }
        throw Problem.UNKNOWN_PAIR_ARG.raise(text.trim(), names);
    }

    static boolean nonEmpty(Object[][] g) {
        return g != null && g.length > 0 && g[0] != null && g[0].length > 0;
    }

    static boolean allBlank(Object[] line) {
        for (Object o : line) {
            if (!isBlank(o)) {
                return false;
            }
        }
        return true;
    }

    static double required(String what, Object v) {
        if (isBlank(v)) {
            throw Problem.ARG_BLANK.raise(what);
        }
        return numberOf(what, v);
    }

    private static double numberOf(String what, Object v) {
        if (v instanceof Number) {
            return ((Number) v).doubleValue();
        }
        if (v instanceof Boolean) {
            return ((Boolean) v) ? 1.0 : 0.0;
        }
        throw Problem.ARG_NOT_NUMBER.raise(what, describe(v));
    }

    static boolean isBlank(Object v) {
        return v == null || (v instanceof String && ((String) v).trim().isEmpty());
    }

    /**
     * The last line of defence: Calc must never receive NaN or infinity from us. A result that is not finite (numbers
     * near the limits of double precision on a card, say) is refused as not physical, the designed error, rather than
     * escaping as an exception no caller expects.
     */
    static Double finite(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            throw Problem.NON_PHYSICAL.raise("the point", "asked for", "result", Double.toString(v));
        }
        return v;
    }

    /** The plain Java value inside a UNO any; null for void. */
    static Object unwrap(Object value) {
        Object v = value;
        if (v instanceof Any) {
            v = ((Any) v).getObject();
        }
        if (v == null || AnyConverter.isVoid(v)) {
            return null;
        }
        return v;
    }

    static String describe(Object v) {
        if (v instanceof String) {
            return "the text \"" + v + "\"";
        }
        if (v instanceof Object[][]) {
            return "a range";
        }
        if (v instanceof Number) {
            return org.miscela.core.problem.Numbers.show(((Number) v).doubleValue());
        }
        return String.valueOf(v);
    }
}
