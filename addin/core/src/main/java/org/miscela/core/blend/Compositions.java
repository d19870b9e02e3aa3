package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;

/**
 * Conversions of a composition between the bases of {@link CompositionBasis}, for any number of components: any
 * basis in, any basis out, through the mole fractions. Values are in card order; temperatures in the card's unit.
 *
 * <p>Mole and mass fractions convert by the molar masses alone, and volume fractions by the pure densities alone;
 * neither needs the mixture, so neither checks the card's composition range. The concentration bases measured per
 * volume of mixture (strength, molarity, mass concentration) need the mixture's molar volume at their temperature,
 * which the card checks like any other evaluation (validity range, extrapolation). Reading them needs a solve: see
 * {@link #toMoleFractions}.
 *
 * <p>Model estimates: where a strength or concentration feeds custody transfer, duty or labelling, defer to
 * calibrated measurement, the prescribed tables, local codes and licensed practice.
 */
public final class Compositions {
    /** How far from 1 fractions may sum (rounding in typed or computed values), as in the card functions. */
    static final double SUM_TOLERANCE = 1e-6;
    /** How far a given balance entry may differ, relative, from the one the other entries imply. */
    static final double BALANCE_TOLERANCE = 1e-6;
    /**
     * Cells of the scan for the balance component's mole fraction (so {@value} + 1 points); see {@link Roots}. Public
     * so that the function catalogue's texts quote it rather than repeat it.
     */
    public static final int SCAN_CELLS = 128;

    private Compositions() {
    }

    /** The composition {@code values}, written on {@code from}, written on {@code to}. */
    public static double[] convert(Card card, double[] values, CompositionBasis from, CompositionBasis to,
            Extrapolation e) {
        return fromMoleFractions(card, toMoleFractions(card, values, from, e), to, e);
    }

    /**
     * Mole fractions, in card order, of a composition written on {@code basis}.
     *
     * <p>Per-volume concentrations q_k (k not the balance b) fix the mixture's moles per litre of each such
     * component, u_k = q_k/f_k with f_k = 1 (mol/L), M_k (g/L) or V_k*(T)/10 (%vol, V* in cm³/mol). Their mole
     * fractions are then in the ratios of u_k, and the balance's mole fraction s solves
     * (1 − s)·1000/V_m(x(s), T) = Σ u_k, the litre being filled by the mixture: a single equation in s on 0..1,
     * scanned in {@value #SCAN_CELLS} cells and solved by Brent's method in the cell where it changes sign. When the
     * equation has several roots the input is ambiguous and refused, except that without extrapolation roots outside
     * the card's validity range do not count (the card says nothing there).
     */
    public static double[] toMoleFractions(Card card, double[] values, CompositionBasis basis, Extrapolation e) {
        Checks.length(card, values, basis.plural());
        switch (basis.kind()) {
            case MOLE_FRACTION:
                return fractions(card, values, basis, null);
            case MASS_FRACTION:
            case MASS_PERCENT:
                return fractions(card, values, basis, molarMasses(card));
            case MOLE_PERCENT:
                return fractions(card, values, basis, null);
            case VOLUME_FRACTION:
                return fractions(card, values, basis, pureMolarVolumes(card, basis.temperature(), e));
            case MOLALITY:
                return fromMolalities(card, values, basis, e);
            default:
                return fromVolumeConcentrations(card, values, basis, e);
        }
    }

    /** The composition with mole fractions {@code x} (checked like the card functions' compositions) on {@code basis}. */
    public static double[] fromMoleFractions(Card card, double[] x, CompositionBasis basis, Extrapolation e) {
        double[] z = CardFunctions.moleFractions(card, x);
        int n = z.length;
        double[] out = new double[n];
        switch (basis.kind()) {
            case MOLE_FRACTION:
                return z;
            case MOLE_PERCENT:
                for (int k = 0; k < n; k++) {
                    out[k] = 100.0 * z[k];
                }
                return out;
            case MASS_FRACTION:
            case MASS_PERCENT: {
                double mean = Checks.meanMolarMass(card, z);
                double scale = basis.kind().scale();
                for (int k = 0; k < n; k++) {
                    out[k] = scale * z[k] * Checks.molarMass(card, k) / mean;
                }
                return out;
            }
            case VOLUME_FRACTION: {
                double[] v = pureMolarVolumes(card, basis.temperature(), e);
                double total = 0.0;
                for (int k = 0; k < n; k++) {
                    total += z[k] * v[k];
                }
                for (int k = 0; k < n; k++) {
                    out[k] = z[k] * v[k] / total;
                }
                return out;
            }
            case MOLALITY: {
                int s = solvent(card, basis);
                if (!(z[s] > 0.0)) {
                    throw Problem.NO_SOLVENT.raise(Checks.name(card, s), Checks.name(card, s));
                }
                double kgSolvent = z[s] * Checks.molarMass(card, s) / 1000.0;
                for (int k = 0; k < n; k++) {
                    out[k] = z[k] / kgSolvent;
                }
                return out;
            }
            default: {
                double[] f = factors(card, basis, e);
                double litresPerMole = Checks.molarVolume(card, z, basis.temperature(), e) / 1000.0;
                for (int k = 0; k < n; k++) {
                    out[k] = f[k] * z[k] / litresPerMole;
                }
                return out;
            }
        }
    }

    // --- reading each kind

    /** x_k ∝ v_k/d_k: d_k the molar mass, or the pure molar volume; null for mole fractions themselves. */
    private static double[] fractions(Card card, double[] v, CompositionBasis basis, double[] divisors) {
        int n = v.length;
        double sum = 0.0;
        for (int k = 0; k < n; k++) {
            entry(card, v[k], k, basis, "write 0 for a component that is absent");
        }
        double scale = basis.kind().scale();
        for (int k = 0; k < n; k++) {
            sum += v[k] / scale;
        }
        if (!(Math.abs(sum - 1.0) <= SUM_TOLERANCE)) {
            throw Problem.FRACTION_SUM.raise(basis.plural(), Show.number(sum * scale), Show.number(scale));
        }
        double[] moles = new double[n];
        for (int k = 0; k < n; k++) {
            moles[k] = divisors == null ? v[k] : v[k] / divisors[k];
        }
        return Checks.normalised(moles);
    }

    private static double[] fromMolalities(Card card, double[] v, CompositionBasis basis, Extrapolation e) {
        int s = solvent(card, basis);
        int n = v.length;
        double[] moles = new double[n];
        for (int k = 0; k < n; k++) {
            if (k != s) {
                moles[k] = entry(card, v[k], k, basis, "write 0 for a component that is absent");
            }
        }
        moles[s] = 1000.0 / Checks.molarMass(card, s);
        double[] x = Checks.normalised(moles);
        checkBalance(card, v, x, basis, e);
        return x;
    }

    private static double[] fromVolumeConcentrations(Card card, double[] v, CompositionBasis basis,
            Extrapolation e) {
        int b = balance(card, basis);
        int n = v.length;
        double t = basis.temperature();
        double kelvin = Checks.kelvin(card, t, e);
        double[] f = factors(card, basis, e);
        double[] u = new double[n];
        double total = 0.0;
        for (int k = 0; k < n; k++) {
            if (k != b) {
                u[k] = entry(card, v[k], k, basis, "write 0 for a component that is absent") / f[k];
                total += u[k];
            }
        }
        if (total == 0.0) {
            double[] pure = new double[n];
            pure[b] = 1.0;
            Checks.molarVolume(card, pure, t, e);
            checkBalance(card, v, pure, basis, e);
            return pure;
        }
        if (Double.isInfinite(total)) {
            // Entries whose moles per litre add up beyond the double range: no liquid holds a fraction of that.
            throw Problem.TOO_CONCENTRATED.raise(basis.plural(), Show.number(t),
                    card.units().temperature().symbol(), Checks.name(card, b), Show.number(0.0));
        }
        double[] r = Checks.scaled(u, 1.0 / total);
        final double molesPerLitre = total;
        UnivariateFunction excess = s -> {
            double vm = card.mixture().molarVolume(along(r, b, s), kelvin);
            return vm > 0.0 && Double.isFinite(vm) ? (1.0 - s) * 1000.0 / vm - molesPerLitre : Double.NaN;
        };
        List<Double> roots = Roots.all(excess, null, 0.0, 1.0, SCAN_CELLS);
        List<Double> usable = new ArrayList<>();
        for (double s : roots) {
            if (s < 1.0 && (Checks.mayExtrapolate(card, e) || CardFunctions.isInside(card, along(r, b, s), t))) {
                usable.add(s);
            }
        }
        if (usable.isEmpty()) {
            if (!roots.isEmpty() && roots.get(0) < 1.0) {
                // Let the card say why: its message names the limit that the composition exceeds.
                Checks.molarVolume(card, along(r, b, roots.get(0)), t, e);
            }
            double reach = 1000.0 / card.mixture().molarVolume(r, kelvin) / total;
            if (Double.isFinite(reach) && reach > 0.0 && reach < 1.0) {
                throw Problem.TOO_CONCENTRATED.raise(basis.plural(), Show.number(t),
                        card.units().temperature().symbol(), Checks.name(card, b), Show.number(100.0 * reach));
            }
            // No root although the others alone would over-fill the litre: the model breaks down on the way.
            // Let the card say where (its non-physical or validity message); the catalogue's message is the fallback.
            for (int i = 0; i <= SCAN_CELLS; i++) {
                double[] x = along(r, b, (double) i / SCAN_CELLS);
                if (!Double.isFinite(excess.value((double) i / SCAN_CELLS))) {
                    Checks.molarVolume(card, x, t, e);
                }
            }
            throw Problem.NO_COMPOSITION.raise(basis.plural(), Show.number(t),
                    card.units().temperature().symbol(), Checks.name(card, b));
        }
        if (usable.size() > 1) {
            double[] list = new double[usable.size()];
            for (int i = 0; i < list.length; i++) {
                list[i] = usable.get(i);
            }
            throw Problem.SEVERAL_COMPOSITIONS.raise(basis.plural(), usable.size(), Show.number(t),
                    card.units().temperature().symbol(), Checks.name(card, b), Show.numbers(list));
        }
        double[] x = along(r, b, usable.get(0));
        Checks.molarVolume(card, x, t, e);
        checkBalance(card, v, x, basis, e);
        return x;
    }

    /** (1 − s)·r + s·e_b: the balance at mole fraction s, the others in the ratios r. */
    private static double[] along(double[] r, int b, double s) {
        double[] x = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            x[k] = (1.0 - s) * r[k];
        }
        x[b] += s;
        return x;
    }

    /** A value of a concentration or fraction: given, finite, non-negative. */
    private static double entry(Card card, double v, int k, CompositionBasis basis, String hint) {
        String what = basis.kind().label() + (basis.kind().unit().isEmpty() ? "" : " (" + basis.kind().unit() + ")");
        if (Double.isNaN(v)) {
            throw Problem.BLANK_VALUE.raise(what, Checks.name(card, k), hint);
        }
        if (Double.isInfinite(v)) {
            throw Problem.VALUE_NOT_FINITE.raise(what, Checks.name(card, k), Show.number(v));
        }
        if (v < 0.0) {
            throw Problem.VALUE_NEGATIVE.raise(what, Checks.name(card, k), Show.number(v));
        }
        if (v > basis.kind().maximum()) {
            throw Problem.VALUE_OUT_OF_RANGE.raise(basis.kind().label(), Show.number(v),
                    Show.number(basis.kind().maximum()), Checks.name(card, k));
        }
        return v;
    }

    /** The balance entry, when given, must be the one the rest implies: otherwise the input contradicts itself. */
    private static void checkBalance(Card card, double[] v, double[] x, CompositionBasis basis, Extrapolation e) {
        int b = basis.balance();
        double given = v[b];
        if (Double.isNaN(given)) {
            return;
        }
        double implied = fromMoleFractions(card, x, basis, e)[b];
        if (!(Math.abs(given - implied) <= BALANCE_TOLERANCE * Math.max(Math.abs(given), Math.abs(implied)))) {
            throw Problem.BALANCE_DISAGREES.raise(basis.kind().label(), Checks.name(card, b), Show.number(given),
                    Show.number(implied));
        }
    }

    private static int balance(Card card, CompositionBasis basis) {
        if (basis.balance() == CompositionBasis.NO_BALANCE) {
            throw Problem.NEEDS_BALANCE.raise(basis.plural());
        }
        return Checks.component(card, basis.balance(), "balance component");
    }

    private static int solvent(Card card, CompositionBasis basis) {
        if (basis.balance() == CompositionBasis.NO_BALANCE) {
            throw Problem.NEEDS_SOLVENT.raise();
        }
        return Checks.component(card, basis.balance(), "solvent");
    }

    /** f_k: the basis's value of component k per mol/L of it. */
    private static double[] factors(Card card, CompositionBasis basis, Extrapolation e) {
        int n = card.componentCount();
        double[] f = new double[n];
        for (int k = 0; k < n; k++) {
            switch (basis.kind()) {
                case MOLARITY:
                    f[k] = 1.0;
                    break;
                case MASS_CONCENTRATION:
                    f[k] = Checks.molarMass(card, k);
                    break;
                case STRENGTH:
                    // %vol = 100·n_k·V_k*/V; per mol/L: 100·V_k*[cm³/mol]/1000 cm³.
                    f[k] = Checks.pureMolarVolume(card, k, basis.temperature(), e) / 10.0;
                    break;
                default:
                    throw new IllegalStateException(basis.kind().toString());
            }
        }
        return f;
    }

    private static double[] molarMasses(Card card) {
        double[] m = new double[card.componentCount()];
        for (int k = 0; k < m.length; k++) {
            m[k] = Checks.molarMass(card, k);
        }
        return m;
    }

    private static double[] pureMolarVolumes(Card card, double t, Extrapolation e) {
        double[] v = new double[card.componentCount()];
        for (int k = 0; k < v.length; k++) {
            v[k] = Checks.pureMolarVolume(card, k, t, e);
        }
        return v;
    }
}
