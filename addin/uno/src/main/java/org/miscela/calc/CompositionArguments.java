package org.miscela.calc;

import com.sun.star.uno.Any;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * Decoding of composition-like arguments: a row or column of one value per component, a block with one line per
 * composition (or batch), or, for a two-component card, x1 alone or a range of x1 values; and the shaping of their
 * results. Blank lines give blank results; a partly blank line is refused, except where a blank is meaningful.
 */
final class CompositionArguments {
    private CompositionArguments() {
    }

    /** A function of one composition (or one batch's amounts) and a temperature. */
    interface RowFunction {
        double at(Card card, double[] row, double temperature);
    }

    /**
     * Evaluates f over compositions. For a two-component card a single value or a range that is not two columns wide
     * holds values of x1 (broadcast against the temperature as in {@link #broadcast}); otherwise see
     * {@link #overRows}.
     */
    static Object overCompositions(Card card, Object[][] composition, Object[][] temperature, RowFunction f) {
        return overCompositions(card, composition, temperature, v -> CardFunctions.binary(card, v), f);
    }

    /** As above, with {@code expand} turning a two-component card's lone value into its full composition. */
    static Object overCompositions(Card card, Object[][] composition, Object[][] temperature,
            java.util.function.DoubleFunction<double[]> expand, RowFunction f) {
        if (card.componentCount() == 2 && !(Arguments.nonEmpty(composition) && composition[0].length == 2)) {
            refuseAmbiguousColumn(composition);
            return Arguments.broadcast(card, new String[] {"mole fraction", "temperature"},
                    new Object[][][] {composition, temperature},
                    (k, p) -> f.at(k, expand.apply(p[0]), p[1]));
        }
        return overRows(card, "composition", composition, temperature, f);
    }

    /**
     * The one shape a two-component card cannot read from the card alone: a column of exactly two numbers adding up
     * to 1 is two values of x1 by the rule for columns, but reads as one composition (x1, x2) as well, which is how a
     * column of n cells is read on a card of n &gt; 2 components. Two numbers not adding up to 1 cannot be a
     * composition, and a blank cell is a blank x1, so only this case is refused.
     */
    static void refuseAmbiguousColumn(Object[][] composition) {
        if (composition != null && composition.length == 2 && composition[0].length == 1
                && composition[1].length == 1 && composition[0][0] instanceof Double
                && composition[1][0] instanceof Double) {
            double a = (Double) composition[0][0];
            double b = (Double) composition[1][0];
            if (Math.abs(a + b - 1.0) <= SUM_TOLERANCE) {
                throw Problem.COMPOSITION_AMBIGUOUS.raise(Numbers.show(a), Numbers.show(b));
            }
        }
    }

    /** The tolerance within which mole fractions must sum to 1 (as COMPOSITION_SUM states). */
    private static final double SUM_TOLERANCE = 1e-6;

    /**
     * Evaluates f over rows of n values, one per component in card order: a row or a column of n cells is one row
     * (a single result); a block of n columns is one row per line (a column of results). The temperature is a single
     * value or a column with one value per line. A line that is entirely blank, or whose temperature is blank,
     * gives a blank result.
     */
    static Object overRows(Card card, String what, Object[][] grid, Object[][] temperature, RowFunction f) {
        Object[][] lines = lines(card, what, grid);
        Object[] temperatures = temperatures(temperature, lines.length);
        if (lines.length == 1) {
            // a lone line must be there: only a block may hold a blank line
            if (Arguments.allBlank(lines[0]) || Arguments.isBlank(temperatures[0])) {
                throw Problem.ARG_BLANK.raise(Arguments.allBlank(lines[0]) ? what : "temperature");
            }
            return Arguments.finite(lineAt(card, what, lines, temperatures, 0, f));
        }
        Object[][] out = new Object[lines.length][1];
        for (int r = 0; r < lines.length; r++) {
            boolean blank = Arguments.allBlank(lines[r]) || Arguments.isBlank(temperatures[r]);
            out[r][0] = blank ? "" : (Object) Arguments.finite(lineAt(card, what, lines, temperatures, r, f));
        }
        return new Any(Arguments.GRID, out);
    }

    /** f at line r, which is not blank, given its own array of values. */
    private static double lineAt(Card card, String what, Object[][] lines, Object[] temperatures, int r,
            RowFunction f) {
        int n = card.componentCount();
        double[] row = new double[n];
        for (int k = 0; k < n; k++) {
            Object v = lines[r][k];
            // the common case costs no message text; the name is written only for a cell that needs one
            row[k] = v instanceof Double ? (Double) v : Arguments.required(valueName(card, what, k, r, lines.length), v);
        }
        return f.at(card, row, Arguments.required("temperature", temperatures[r]));
    }

    /** How a message names value k of line r: "composition of water", "… in line 3" for a block. */
    private static String valueName(Card card, String what, int k, int r, int lines) {
        return what + " of " + card.components().get(k).name() + (lines > 1 ? " in line " + (r + 1) : "");
    }

    /** One composition (or batch) given as a row or column of n cells, or x1 alone for a binary card. */
    static double[] singleComposition(Card card, String what, Object[][] grid) {
        if (card.componentCount() == 2 && Arguments.nonEmpty(grid) && grid.length == 1 && grid[0].length == 1) {
            return CardFunctions.binary(card, Arguments.single(what, grid));
        }
        Object[][] lines = lines(card, what, grid);
        if (lines.length != 1) {
            throw Problem.ARG_NOT_SINGLE.raise(what);
        }
        double[] row = new double[card.componentCount()];
        for (int k = 0; k < row.length; k++) {
            row[k] = Arguments.required(what + " of " + card.components().get(k).name(), lines[0][k]);
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
        return overValueLines(card, what, grid, temperature, expand, scalarGivesFirst, -1, f);
    }

    /**
     * As {@link #overValueLines(Card, String, Object[][], Object[][], java.util.function.DoubleFunction, boolean,
     * LineFunction)}, but when {@code pick} is a component's index (not -1) each line answers with that component's
     * value alone: one number for one line, a column for a block.
     */
    static Object overValueLines(Card card, String what, Object[][] grid, Object[][] temperature,
            java.util.function.DoubleFunction<double[]> expand, boolean scalarGivesFirst, int pick, LineFunction f) {
        if (card.componentCount() == 2 && Arguments.nonEmpty(grid) && grid.length == 1 && grid[0].length == 1) {
            double v = Arguments.required(what, grid[0][0]);
            double[] result = f.at(expand.apply(v), Arguments.single("temperature", temperature));
            if (pick >= 0) {
                return Arguments.finite(result[pick]);
            }
            return scalarGivesFirst ? Arguments.finite(result[0]) : row(result);
        }
        boolean column = Arguments.nonEmpty(grid) && grid[0].length == 1 && grid.length == card.componentCount()
                && card.componentCount() > 1;
        Object[][] lines = lines(card, what, grid);
        Object[] temperatures = temperatures(temperature, lines.length);
        Object[][] out = new Object[lines.length][];
        for (int r = 0; r < lines.length; r++) {
            if (Arguments.allBlank(lines[r]) || Arguments.isBlank(temperatures[r])) {
                if (lines.length == 1) {
                    throw Problem.ARG_BLANK.raise(Arguments.allBlank(lines[r]) ? what : "temperature");
                }
                out[r] = null;
                continue;
            }
            double[] values = new double[lines[r].length];
            for (int k = 0; k < values.length; k++) {
                Object cell = lines[r][k];
                values[k] = Arguments.isBlank(cell) ? Double.NaN : Arguments.required(what + " of " + card.components().get(k).name(),
                        cell);
            }
            double[] result = f.at(values, Arguments.required("temperature", temperatures[r]));
            if (pick >= 0) {
                result = new double[] {result[pick]};
            }
            out[r] = new Object[result.length];
            for (int k = 0; k < result.length; k++) {
                out[r][k] = Arguments.finite(result[k]);
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
        if (lines.length == 1 && pick >= 0) {
            return out[0][0];
        }
        if (lines.length == 1 && column) {
            Object[][] transposed = new Object[width][1];
            for (int k = 0; k < width; k++) {
                transposed[k][0] = out[0][k];
            }
            return new Any(Arguments.GRID, transposed);
        }
        if (lines.length == 1 && width == 1) {
            return out[0][0];
        }
        return new Any(Arguments.GRID, out);
    }

    /** One line of n values (blank cells NaN), or null when the argument was left out. */
    static double[] optionalLine(Card card, String what, Object value) {
        Object[][] g = Arguments.optionalRange(value);
        if (g == null) {
            return null;
        }
        if (g.length == 1 && g[0].length == 1) {
            return new double[] {Arguments.required(what, g[0][0])};
        }
        Object[][] lines = lines(card, what, g);
        if (lines.length != 1) {
            throw Problem.ARG_NOT_SINGLE.raise(what);
        }
        double[] v = new double[lines[0].length];
        for (int k = 0; k < v.length; k++) {
            v[k] = Arguments.isBlank(lines[0][k]) ? Double.NaN : Arguments.required(what, lines[0][k]);
        }
        return v;
    }

    /**
     * One line of per-component results shaped as the argument it answers was: a column when {@code given} was a
     * column of n cells (n &gt; 1), a row otherwise; or, when {@code pick} is a component's index, that value alone.
     */
    static Object perComponent(Card card, Object[][] given, double[] values, int pick) {
        if (pick >= 0) {
            return Arguments.finite(values[pick]);
        }
        int n = card.componentCount();
        if (n > 1 && Arguments.nonEmpty(given) && given.length == n && given[0].length == 1) {
            Object[][] out = new Object[values.length][1];
            for (int k = 0; k < values.length; k++) {
                out[k][0] = Arguments.finite(values[k]);
            }
            return new Any(Arguments.GRID, out);
        }
        return row(values);
    }

    /** A row of results as Calc's array result. */
    static Object row(double[] values) {
        Object[][] out = new Object[1][values.length];
        for (int k = 0; k < values.length; k++) {
            out[0][k] = Arguments.finite(values[k]);
        }
        return new Any(Arguments.GRID, out);
    }


    /** The lines of a row/column/block argument, each with one cell per component. */
    private static Object[][] lines(Card card, String what, Object[][] grid) {
        int n = card.componentCount();
        if (!Arguments.nonEmpty(grid)) {
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
        if (!Arguments.nonEmpty(grid)) {
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

}
