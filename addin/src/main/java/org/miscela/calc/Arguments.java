package org.miscela.calc;

import com.sun.star.uno.Any;
import com.sun.star.uno.AnyConverter;
import com.sun.star.uno.Type;
import java.util.ArrayList;
import java.util.List;
import org.miscela.core.AmountBasis;
import org.miscela.core.Card;
import org.miscela.core.CardCache;
import org.miscela.core.CardFunctions;
import org.miscela.core.Extrapolation;
import org.miscela.core.FitOutput;
import org.miscela.core.Problem;
import org.miscela.core.PropertyKind;

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

    /** A function of one composition (or one batch's amounts) and a temperature. */
    interface RowFunction {
        double at(Card card, double[] row, double temperature);
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

    /**
     * Evaluates f over compositions. For a two-component card a single value or a range that is not two columns wide
     * holds values of x1 (broadcast against the temperature as in {@link #broadcast}); otherwise see
     * {@link #overRows}.
     */
    static Object overCompositions(Card card, Object[][] composition, Object[][] temperature, RowFunction f) {
        if (card.componentCount() == 2 && !(nonEmpty(composition) && composition[0].length == 2)) {
            return broadcast(card, new String[] {"mole fraction", "temperature"},
                    new Object[][][] {composition, temperature},
                    (k, p) -> f.at(k, CardFunctions.binary(k, p[0]), p[1]));
        }
        return overRows(card, "composition", composition, temperature, f);
    }

    /**
     * Evaluates f over rows of n values, one per component in card order: a row or a column of n cells is one row
     * (a single result); a block of n columns is one row per line (a column of results). The temperature is a single
     * value or a column with one value per line. A line that is entirely blank, or whose temperature is blank,
     * gives a blank result.
     */
    static Object overRows(Card card, String what, Object[][] grid, Object[][] temperature, RowFunction f) {
        Object[][] lines = lines(card, what, grid);
        Object[] temperatures = temperatures(temperature, lines.length);
        int n = card.componentCount();
        Object[][] out = new Object[lines.length][1];
        double[] row = new double[n];
        for (int r = 0; r < lines.length; r++) {
            if (allBlank(lines[r]) || isBlank(temperatures[r])) {
                if (lines.length == 1) {
                    throw Problem.ARG_BLANK.raise(allBlank(lines[r]) ? what : "temperature");
                }
                out[r][0] = "";
                continue;
            }
            for (int k = 0; k < n; k++) {
                String name = what + " of " + card.components().get(k).name()
                        + (lines.length > 1 ? " in line " + (r + 1) : "");
                row[k] = required(name, lines[r][k]);
            }
            out[r][0] = finite(f.at(card, row.clone(), required("temperature", temperatures[r])));
        }
        return lines.length == 1 ? out[0][0] : new Any(GRID, out);
    }

    /** One composition (or batch) given as a row or column of n cells, or x1 alone for a binary card. */
    static double[] singleComposition(Card card, String what, Object[][] grid) {
        if (card.componentCount() == 2 && nonEmpty(grid) && grid.length == 1 && grid[0].length == 1) {
            return CardFunctions.binary(card, single(what, grid));
        }
        Object[][] lines = lines(card, what, grid);
        if (lines.length != 1) {
            throw Problem.ARG_NOT_SINGLE.raise(what);
        }
        double[] row = new double[card.componentCount()];
        for (int k = 0; k < row.length; k++) {
            row[k] = required(what + " of " + card.components().get(k).name(), lines[0][k]);
        }
        return row;
    }

    /** A function from one line of n values (NaN for blank cells) and a temperature to a line of results. */
    interface LineFunction {
        double[] at(double[] values, double temperature);
    }

    /**
     * Evaluates f over the lines of a composition-like argument whose blank cells are NaN (a concentration's balance
     * entry may be left blank): a lone number on a two-component card is expanded by {@code expand} and answered by
     * the first value of f's result (or, unless {@code scalarGivesFirst}, by the whole result as a row); one line gives its result as a row (a column when the line was a column); a
     * block gives one row per line, blank lines blank. The temperature is one value, or a column with one per line.
     */
    static Object overValueLines(Card card, String what, Object[][] grid, Object[][] temperature,
            java.util.function.DoubleFunction<double[]> expand, boolean scalarGivesFirst, LineFunction f) {
        if (card.componentCount() == 2 && nonEmpty(grid) && grid.length == 1 && grid[0].length == 1) {
            double v = required(what, grid[0][0]);
            double[] result = f.at(expand.apply(v), single("temperature", temperature));
            return scalarGivesFirst ? finite(result[0]) : row(result);
        }
        boolean column = nonEmpty(grid) && grid[0].length == 1 && grid.length == card.componentCount()
                && card.componentCount() > 1;
        Object[][] lines = lines(card, what, grid);
        Object[] temperatures = temperatures(temperature, lines.length);
        Object[][] out = new Object[lines.length][];
        for (int r = 0; r < lines.length; r++) {
            if (allBlank(lines[r]) || isBlank(temperatures[r])) {
                if (lines.length == 1) {
                    throw Problem.ARG_BLANK.raise(allBlank(lines[r]) ? what : "temperature");
                }
                out[r] = null;
                continue;
            }
            double[] values = new double[lines[r].length];
            for (int k = 0; k < values.length; k++) {
                Object cell = lines[r][k];
                values[k] = isBlank(cell) ? Double.NaN : required(what + " of " + card.components().get(k).name(),
                        cell);
            }
            double[] result = f.at(values, required("temperature", temperatures[r]));
            out[r] = new Object[result.length];
            for (int k = 0; k < result.length; k++) {
                out[r][k] = finite(result[k]);
            }
        }
        int width = 1;
        for (Object[] r : out) {
            width = r == null ? width : Math.max(width, r.length);
        }
        for (int r = 0; r < out.length; r++) {
            if (out[r] == null) {
                out[r] = new Object[width];
                java.util.Arrays.fill(out[r], "");
            }
        }
        if (lines.length == 1 && column) {
            Object[][] transposed = new Object[width][1];
            for (int k = 0; k < width; k++) {
                transposed[k][0] = out[0][k];
            }
            return new Any(GRID, transposed);
        }
        if (lines.length == 1 && width == 1) {
            return out[0][0];
        }
        return new Any(GRID, out);
    }

    /** One line of n values (blank cells NaN), or null when the argument was left out. */
    static double[] optionalLine(Card card, String what, Object value) {
        Object[][] g = optionalRange(value);
        if (g == null) {
            return null;
        }
        if (g.length == 1 && g[0].length == 1) {
            return new double[] {required(what, g[0][0])};
        }
        Object[][] lines = lines(card, what, g);
        if (lines.length != 1) {
            throw Problem.ARG_NOT_SINGLE.raise(what);
        }
        double[] v = new double[lines[0].length];
        for (int k = 0; k < v.length; k++) {
            v[k] = isBlank(lines[0][k]) ? Double.NaN : required(what, lines[0][k]);
        }
        return v;
    }

    /** A row of results as Calc's array result. */
    static Object row(double[] values) {
        Object[][] out = new Object[1][values.length];
        for (int k = 0; k < values.length; k++) {
            out[0][k] = finite(values[k]);
        }
        return new Any(GRID, out);
    }

    /** A component given by number or name, or {@code absent} (0-based) when left out. */
    static int optionalComponent(Card card, Object value, int absent) {
        return unwrap(value) == null ? absent : component(card, value);
    }

    /** The lines of a row/column/block argument, each with one cell per component. */
    private static Object[][] lines(Card card, String what, Object[][] grid) {
        int n = card.componentCount();
        if (!nonEmpty(grid)) {
            throw Problem.ARG_BLANK.raise(what);
        }
        int rows = grid.length;
        int cols = grid[0].length;
        if (cols == n) {
            return grid;
        }
        if (cols == 1 && rows == n) {
            Object[] line = new Object[n];
            for (int k = 0; k < n; k++) {
                line[k] = grid[k][0];
            }
            return new Object[][] {line};
        }
        if (rows == 1 && cols == 1 && n > 2) {
            throw Problem.NOT_BINARY.raise(n);
        }
        throw Problem.COMPOSITION_SHAPE.raise(rows, cols, n, n, n);
    }

    private static Object[] temperatures(Object[][] grid, int lines) {
        if (!nonEmpty(grid)) {
            throw Problem.ARG_BLANK.raise("temperature");
        }
        Object[] out = new Object[lines];
        if (grid.length == 1 && grid[0].length == 1) {
            java.util.Arrays.fill(out, grid[0][0]);
            return out;
        }
        if (grid[0].length != 1 || grid.length != lines) {
            throw Problem.ARG_SHAPE.raise("composition", lines, 1, "temperature", grid.length, grid[0].length);
        }
        for (int r = 0; r < lines; r++) {
            out[r] = grid[r][0];
        }
        return out;
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
            throw Problem.UNKNOWN_PROPERTY.raise(describe(v), "volume, enthalpy");
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

    /**
     * Columns of lab data, one value per point in each: every range a single column or row of the same length (a
     * single cell in a range marked {@code broadcast} is used for every point). Points blank in every range are
     * left out, so a table may have room for more measurements; a point blank in some ranges only is refused.
     *
     * @param grids null for a range that was left out (its column is then null)
     */
    static double[][] dataColumns(String[] names, Object[][][] grids, boolean[] broadcast) {
        int length = -1;
        int lengthFrom = -1;
        Object[][] vectors = new Object[grids.length][];
        for (int i = 0; i < grids.length; i++) {
            if (grids[i] == null) {
                continue;
            }
            Object[] v = vector(names[i], grids[i]);
            vectors[i] = v;
            if (broadcast[i] && v.length == 1) {
                continue;
            }
            if (length >= 0 && v.length != length) {
                throw Problem.DATA_LENGTH.raise(names[lengthFrom], length, names[i], v.length);
            }
            length = v.length;
            lengthFrom = i;
        }
        if (length < 0) {
            length = 1;
        }
        List<double[]> points = new ArrayList<>();
        for (int r = 0; r < length; r++) {
            int present = -1;
            int absent = -1;
            for (int i = 0; i < grids.length; i++) {
                if (vectors[i] == null || (broadcast[i] && vectors[i].length == 1)) {
                    continue;
                }
                if (isBlank(vectors[i][r])) {
                    absent = absent < 0 ? i : absent;
                } else {
                    present = present < 0 ? i : present;
                }
            }
            if (present < 0) {
                continue;
            }
            if (absent >= 0) {
                throw Problem.DATA_PARTLY_BLANK.raise(r + 1, names[present], names[absent]);
            }
            double[] p = new double[grids.length];
            for (int i = 0; i < grids.length; i++) {
                if (vectors[i] != null) {
                    Object cell = vectors[i].length == 1 && broadcast[i] ? vectors[i][0] : vectors[i][r];
                    p[i] = required(names[i] + " of point " + (r + 1), cell);
                }
            }
            points.add(p);
        }
        double[][] columns = new double[grids.length][];
        for (int i = 0; i < grids.length; i++) {
            if (vectors[i] == null) {
                continue;
            }
            columns[i] = new double[points.size()];
            for (int r = 0; r < points.size(); r++) {
                columns[i][r] = points.get(r)[i];
            }
        }
        return columns;
    }

    /** The cells of a single column or row. */
    private static Object[] vector(String what, Object[][] g) {
        if (!nonEmpty(g)) {
            throw Problem.ARG_BLANK.raise(what);
        }
        if (g[0].length == 1) {
            Object[] v = new Object[g.length];
            for (int r = 0; r < g.length; r++) {
                v[r] = g[r][0];
            }
            return v;
        }
        if (g.length == 1) {
            return g[0].clone();
        }
        throw Problem.DATA_SHAPE.raise(what, g.length, g[0].length);
    }

    /** The numbers of a single column or row, none blank. */
    static double[] values(String what, Object[][] g) {
        Object[] v = vector(what, g);
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = required(what + " " + (i + 1), v[i]);
        }
        return out;
    }

    /** A matrix of numbers (a design), rows as given; blank rows are refused. */
    static double[][] numbers(String what, Object[][] g) {
        if (!nonEmpty(g)) {
            throw Problem.ARG_BLANK.raise(what);
        }
        double[][] out = new double[g.length][g[0].length];
        for (int r = 0; r < g.length; r++) {
            for (int c = 0; c < g[r].length; c++) {
                out[r][c] = required(what + " (row " + (r + 1) + ", column " + (c + 1) + ")", g[r][c]);
            }
        }
        return out;
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

    /** An optional number: NaN when left out. */
    static double optionalNumber(String what, Object value) {
        Object v = unwrap(value);
        return v == null ? Double.NaN : number(what, v);
    }

    /** An optional text argument: {@code absent} when left out. */
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
        for (org.miscela.core.Component c : card.components()) {
            names.append(names.length() == 0 ? "" : ", ").append(c.name());
        }
        throw Problem.UNKNOWN_PAIR_ARG.raise(text.trim(), names);
    }

    private static boolean nonEmpty(Object[][] g) {
        return g != null && g.length > 0 && g[0] != null && g[0].length > 0;
    }

    private static boolean allBlank(Object[] line) {
        for (Object o : line) {
            if (!isBlank(o)) {
                return false;
            }
        }
        return true;
    }

    private static double required(String what, Object v) {
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
