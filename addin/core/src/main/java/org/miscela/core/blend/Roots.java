package org.miscela.core.blend;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Every root of a function on an interval, found by scanning and bracketing: the interval is cut into equal cells, a
 * cell whose ends differ in sign is solved by Brent's method (Commons Math). When the slope is known, a cell whose ends
 * agree in sign but whose slope changes sign holds an extremum; it is located by Brent's method on the slope, and if
 * the function crosses zero there the cell's two roots are each bracketed on one side of it. So roots closer together
 * than one cell are found too, as long as a cell holds no more than one extremum.
 *
 * <p>The function may return NaN where the model is not physical; cells touching such a point are skipped.
 */
final class Roots {
    /** Accuracy of every root, relative to the interval's length. */
    static final double ACCURACY = 1e-14;
    private static final int MAX_EVALUATIONS = 400;

    private Roots() {
    }

    /** The roots in increasing order; {@code slope} may be null. */
    static List<Double> all(UnivariateFunction f, UnivariateFunction slope, double lo, double hi, int cells) {
        double[] s = new double[cells + 1];
        double[] v = new double[cells + 1];
        for (int i = 0; i <= cells; i++) {
            s[i] = i == cells ? hi : lo + (hi - lo) * i / cells;
            v[i] = f.value(s[i]);
        }
        BrentSolver solver = new BrentSolver(ACCURACY, ACCURACY * (hi - lo));
        List<Double> roots = new ArrayList<>();
        for (int i = 0; i <= cells; i++) {
            if (v[i] == 0.0) {
                roots.add(s[i]);
            }
            if (i == cells || !Double.isFinite(v[i]) || !Double.isFinite(v[i + 1]) || v[i] == 0.0
                    || v[i + 1] == 0.0) {
                continue;
            }
            if (Math.signum(v[i]) != Math.signum(v[i + 1])) {
                solve(solver, f, s[i], s[i + 1], roots);
            } else if (slope != null) {
                double d0 = slope.value(s[i]);
                double d1 = slope.value(s[i + 1]);
                if (Double.isFinite(d0) && Double.isFinite(d1) && Math.signum(d0) * Math.signum(d1) < 0) {
                    List<Double> found = new ArrayList<>();
                    solve(solver, slope, s[i], s[i + 1], found);
                    if (found.isEmpty()) {
                        continue;
                    }
                    double extremum = found.get(0);
                    double fe = f.value(extremum);
                    if (fe == 0.0) {
                        roots.add(extremum);
                    } else if (Double.isFinite(fe) && Math.signum(fe) != Math.signum(v[i])) {
                        solve(solver, f, s[i], extremum, roots);
                        solve(solver, f, extremum, s[i + 1], roots);
                    }
                }
            }
        }
        return roots;
    }

    /**
     * Brent's method on a cell whose ends differ in sign. The solver also evaluates inside the cell; where the function
     * is NaN there (a non-physical point the scan stepped over) it finds no bracket or no convergence, and the cell is
     * skipped like a cell touching such a point.
     */
    private static void solve(BrentSolver solver, UnivariateFunction f, double a, double b, List<Double> roots) {
        try {
            roots.add(solver.solve(MAX_EVALUATIONS, f, a, b));
        } catch (NoBracketingException | TooManyEvaluationsException e) {
            // skipped: see above
        }
    }
}
