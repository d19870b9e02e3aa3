package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.Validity;

/**
 * The composition at which the card's density equals a measured density (a densitometer reading of strength).
 *
 * <p><b>Path.</b> One component k varies; the others keep their ratios: x(s) = s·e_k + (1 − s)·r, where s is the
 * mole fraction of k and r the reference composition with k taken out and the rest renormalised. For a binary card
 * the path is simply x_k from 0 to 1 and no reference is needed; for more components the reference (mole fractions,
 * e.g. the blend's nominal composition) must be given. A result in another basis follows from {@link Compositions}.
 *
 * <p><b>Every root.</b> Density need not be monotonic along the path (aqueous systems with a density maximum), so
 * the range is scanned in {@value #SCAN_CELLS} cells and, using the analytic slope dρ/ds (from the partial molar
 * volumes: dV_m/ds = Σ V̄_j·dx_j/ds), every cell holding an extremum is split there, so that each piece is
 * monotonic; each sign change is then solved by Brent's method (Commons Math). One root is the answer; several are
 * refused with a message listing them, unless the caller restricts the range to one of them; none is refused with
 * the density range the card covers there.
 *
 * <p><b>Range.</b> By default s runs over the card's validity range along the path (the component limits; pair
 * limits are checked on the result), or 0..1 when extrapolation is allowed. A caller's range (from, to) replaces
 * it; a root found outside the validity range is then refused with the card's own message unless extrapolation is
 * allowed.
 *
 * <p>A model estimate: where a strength feeds custody transfer or duty, defer to calibrated measurement, the
 * official tables, local codes and licensed practice.
 */
public final class DensityInversion {
    /** Cells of the scan along the path; public so that the function catalogue's formula text quotes it. */
    public static final int SCAN_CELLS = 256;

    private DensityInversion() {
    }

    /**
     * Mole fractions (card order) of the single composition on the path with density {@code density} (card
     * unit) at t (card unit).
     *
     * @param varied the component that varies (0-based)
     * @param reference mole fractions fixing the other components' ratios; may be null for a binary card
     * @param from lower end of the range of x_varied, or NaN for the default range
     * @param to upper end of the range of x_varied, or NaN for the default range
     */
    public static double[] composition(Card card, double density, double t, int varied, double[] reference,
            double from, double to, Extrapolation e) {
        Path path = path(card, density, t, varied, reference, from, to, e);
        List<Double> roots = path.roots();
        if (roots.isEmpty()) {
            double[] span = path.densitySpan();
            throw Problem.DENSITY_NOT_FOUND.raise(path.name, Show.number(path.lo), Show.number(path.hi),
                    Show.number(density), card.units().density().symbol(), Show.number(t),
                    card.units().temperature().symbol(), Show.number(path.densityOut(span[0])),
                    Show.number(path.densityOut(span[1])), card.units().density().symbol());
        }
        if (roots.size() > 1) {
            double[] s = new double[roots.size()];
            for (int i = 0; i < s.length; i++) {
                s[i] = roots.get(i);
            }
            throw Problem.SEVERAL_DENSITIES.raise(Show.number(density), card.units().density().symbol(),
                    Show.number(t), card.units().temperature().symbol(), s.length, path.name, Show.numbers(s));
        }
        double[] x = path.at(roots.get(0));
        CardFunctions.density(card, x, t, e);
        return x;
    }

    /**
     * The mole fractions of the varied component at every composition along the path with this density, in
     * increasing order (empty when there is none), without refusing several; for showing the user the choices.
     */
    public static double[] roots(Card card, double density, double t, int varied, double[] reference, double from,
            double to, Extrapolation e) {
        List<Double> roots = path(card, density, t, varied, reference, from, to, e).roots();
        double[] out = new double[roots.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = roots.get(i);
        }
        return out;
    }

    private static Path path(Card card, double density, double t, int varied, double[] reference, double from,
            double to, Extrapolation e) {
        double rho = card.units().density().toKgPerM3(Checks.positive(density, "measured density"));
        Checks.temperature(t, "temperature of the measurement");
        double kelvin = Checks.kelvin(card, t, e);
        int k = Checks.component(card, varied, "component that varies");
        int n = card.componentCount();
        double[] r = new double[n];
        if (n == 2 && reference == null) {
            r[1 - k] = 1.0;
        } else {
            if (reference == null) {
                throw Problem.NEEDS_REFERENCE.raise(n, Checks.name(card, k));
            }
            double[] z = CardFunctions.moleFractions(card, reference);
            double rest = 1.0 - z[k];
            if (!(rest > 0.0)) {
                throw Problem.NO_PROPORTIONS.raise(Checks.name(card, k));
            }
            for (int j = 0; j < n; j++) {
                r[j] = j == k ? 0.0 : z[j] / rest;
            }
        }
        double lo;
        double hi;
        if (Double.isNaN(from) && Double.isNaN(to)) {
            if (Checks.mayExtrapolate(card, e)) {
                lo = 0.0;
                hi = 1.0;
            } else {
                double[] span = validSpan(card, k, r);
                lo = span[0];
                hi = span[1];
            }
        } else {
            if (Double.isNaN(from) || Double.isNaN(to)) {
                throw Problem.RANGE_HALF.raise(Checks.name(card, k));
            }
            if (!(from >= 0.0 && to <= 1.0 && from < to)) {
                throw Problem.BLEND_BAD_RANGE.raise(Checks.name(card, k), Show.number(from), Show.number(to));
            }
            lo = from;
            hi = to;
        }
        return new Path(card, k, r, kelvin, rho, lo, hi);
    }

    /** The s-range along the path where every component's mole fraction is inside the card's limits. */
    private static double[] validSpan(Card card, int k, double[] r) {
        Validity v = card.validity();
        double slack = 1e-12;
        double lo = Math.max(0.0, v.lowestFraction(k));
        double hi = Math.min(1.0, v.highestFraction(k));
        for (int j = 0; j < r.length; j++) {
            if (j == k) {
                continue;
            }
            // x_j = (1 − s)·r_j must lie in [low_j, high_j].
            if (r[j] > 0.0) {
                lo = Math.max(lo, 1.0 - v.highestFraction(j) / r[j]);
                hi = Math.min(hi, 1.0 - v.lowestFraction(j) / r[j]);
            } else if (v.lowestFraction(j) > slack) {
                hi = -1.0;
            }
        }
        if (!(lo < hi)) {
            throw Problem.EMPTY_PATH.raise(Checks.name(card, k));
        }
        return new double[] {lo, hi};
    }

    /** The path, its density residual and slope. */
    private static final class Path {
        final Card card;
        final int k;
        final double[] r;
        final double kelvin;
        final double rho;
        final double lo;
        final double hi;
        final String name;

        Path(Card card, int k, double[] r, double kelvin, double rho, double lo, double hi) {
            this.card = card;
            this.k = k;
            this.r = r;
            this.kelvin = kelvin;
            this.rho = rho;
            this.lo = lo;
            this.hi = hi;
            this.name = Checks.name(card, k);
        }

        double[] at(double s) {
            double[] x = new double[r.length];
            for (int j = 0; j < r.length; j++) {
                x[j] = (1.0 - s) * r[j];
            }
            x[k] += s;
            return x;
        }

        /** ρ(x(s)) in kg/m³, NaN where the model is not physical. */
        double density(double s) {
            double v = card.mixture().density(at(s), kelvin);
            return v > 0.0 && Double.isFinite(v) ? v : Double.NaN;
        }

        /** dρ/ds = 1000·(M'·V_m − M̄·V_m')/V_m², with M' = Σ M_j d_j and V_m' = Σ V̄_j d_j, d = e_k − r. */
        double slope(double s) {
            double[] x = at(s);
            double[] partial = new double[x.length];
            card.mixture().partialExcessMolarVolumes(x, kelvin, partial);
            double vm = card.mixture().molarVolume(x, kelvin);
            double mean = card.mixture().meanMolarMass(x);
            double dm = 0.0;
            double dv = 0.0;
            for (int j = 0; j < x.length; j++) {
                double d = (j == k ? 1.0 : 0.0) - r[j];
                dm += Checks.molarMass(card, j) * d;
                dv += (card.mixture().pureMolarVolume(j, kelvin) + partial[j]) * d;
            }
            return 1000.0 * (dm * vm - mean * dv) / (vm * vm);
        }

        List<Double> roots() {
            UnivariateFunction f = s -> density(s) - rho;
            return Roots.all(f, this::slope, lo, hi, SCAN_CELLS);
        }

        /** Smallest and largest density on the scan grid, kg/m³. */
        double[] densitySpan() {
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (int i = 0; i <= SCAN_CELLS; i++) {
                double d = density(lo + (hi - lo) * i / SCAN_CELLS);
                if (Double.isFinite(d)) {
                    min = Math.min(min, d);
                    max = Math.max(max, d);
                }
            }
            return new double[] {min, max};
        }

        double densityOut(double kgPerM3) {
            return card.units().density().fromKgPerM3(kgPerM3);
        }
    }
}
