package org.miscela.calc;

import com.sun.star.uno.Any;
import com.sun.star.uno.AnyConverter;
import com.sun.star.uno.Type;
import org.miscela.core.Card;
import org.miscela.core.CardCache;
import org.miscela.core.CardFunctions;
import org.miscela.core.Extrapolation;
import org.miscela.core.Problem;

/**
 * Decoding of Calc's arguments and encoding of results. Calc passes an {@code any} argument as a Double, a String,
 * a Boolean, a {@code sequence<sequence<any>>} for a range, or void when the argument is left out.
 */
final class Arguments {
    private static final Type GRID = new Type(Object[][].class);

    private Arguments() {
    }

    /** A function of one point: the card and the point's numbers, in argument order. */
    interface PointFunction {
        double at(Card card, double[] point);
    }

    static Card card(Object[][] cells) {
        return CardCache.shared().get(cells);
    }

    /** A component given by number or name. */
    static int component(Card card, Object value) {
        Object v = unwrap(value);
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
        if (v instanceof Number) {
            return ((Number) v).doubleValue() != 0.0 ? Extrapolation.ALLOW : Extrapolation.REFUSE;
        }
        throw Problem.ARG_NOT_FLAG.raise("extrapolate argument", describe(v));
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

    private static double required(String what, Object v) {
        if (isBlank(v)) {
            throw Problem.ARG_BLANK.raise(what);
        }
        return number(what, v);
    }

    private static double number(String what, Object v) {
        if (v instanceof Number) {
            return ((Number) v).doubleValue();
        }
        if (v instanceof Boolean) {
            return ((Boolean) v) ? 1.0 : 0.0;
        }
        throw Problem.ARG_NOT_NUMBER.raise(what, describe(v));
    }

    private static boolean isBlank(Object v) {
        return v == null || (v instanceof String && ((String) v).trim().isEmpty());
    }

    /** The last line of defence: Calc must never receive NaN or infinity from us. */
    private static Double finite(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            throw new IllegalStateException("non-finite result " + v);
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

    private static String describe(Object v) {
        if (v instanceof String) {
            return "the text \"" + v + "\"";
        }
        if (v instanceof Object[][]) {
            return "a range";
        }
        return String.valueOf(v);
    }
}
