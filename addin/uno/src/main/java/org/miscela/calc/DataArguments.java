package org.miscela.calc;

import org.miscela.core.card.Card;
import org.miscela.core.problem.Problem;

import java.util.ArrayList;
import java.util.List;

/** Decoding of lab data for the fits: columns of numbers, one value per point, and design matrices. */
final class DataArguments {
    private DataArguments() {
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
                if (Arguments.isBlank(vectors[i][r])) {
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
                    p[i] = Arguments.required(names[i] + " of point " + (r + 1), cell);
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
        if (!Arguments.nonEmpty(g)) {
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

    /** The components of a single column or row, each by name or number, none blank. */
    static int[] components(Card card, String what, Object[][] g) {
        Object[] v = vector(what, g);
        int[] out = new int[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = Arguments.component(card, v[i]);
        }
        return out;
    }

    /** The numbers of a single column or row, none blank. */
    static double[] values(String what, Object[][] g) {
        Object[] v = vector(what, g);
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = Arguments.required(what + " " + (i + 1), v[i]);
        }
        return out;
    }

    /** A matrix of numbers (a design), rows as given; blank rows are refused. */
    static double[][] numbers(String what, Object[][] g) {
        if (!Arguments.nonEmpty(g)) {
            throw Problem.ARG_BLANK.raise(what);
        }
        double[][] out = new double[g.length][g[0].length];
        for (int r = 0; r < g.length; r++) {
            for (int c = 0; c < g[r].length; c++) {
                out[r][c] = Arguments.required(what + " (row " + (r + 1) + ", column " + (c + 1) + ")", g[r][c]);
            }
        }
        return out;
    }

}
