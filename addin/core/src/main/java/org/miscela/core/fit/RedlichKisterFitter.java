package org.miscela.core.fit;

import org.miscela.core.problem.Problem;
import java.util.Arrays;
import org.miscela.core.model.Component;

/**
 * Least-squares Redlich–Kister coefficients for a binary pair, V^E = x1·x2·Σ_k A_k(T)·(x1 − x2)^k with
 * A_k(T) = Σ_j a_kj·(T − T_ref)^j, from excess volumes or from densities. The expansion is linear in every a_kj, so
 * each fit is one {@link LinearLeastSquares} problem with the basis x1·x2·(x1 − x2)^k·(T − T_ref)^j.
 *
 * <p>Units: mole fraction x1 of the first component, K, cm³/mol, kg/m³, g/mol. Weights are optional (null for unit
 * weights), zero or positive, one per point.
 */
public final class RedlichKisterFitter {
    /**
     * The highest order in x and in T a fit accepts, the one definition every check and message uses: beyond these
     * the power basis is too ill-conditioned to fit in double precision, and the rank test would refuse.
     */
    public static final int MAX_ORDER_IN_X = 30;
    /** See {@link #MAX_ORDER_IN_X}. */
    public static final int MAX_ORDER_IN_T = 10;

    private RedlichKisterFitter() {
    }

    /**
     * Coefficients A0..A_order at one temperature from (x1, V^E) pairs.
     *
     * @param kelvin the temperature of the data, kept as the expansion's reference temperature
     */
    public static RedlichKisterFit excessVolumes(double[] x1, double[] excessVolume, int order, double kelvin,
            double[] weights) {
        checkTemperature(kelvin, 1);
        double[] t = new double[x1.length];
        Arrays.fill(t, kelvin);
        return excessVolumes(x1, t, excessVolume, order, 0, kelvin, weights);
    }

    /** Coefficients a_kj, k = 0..orderInX, j = 0..orderInT, from (x1, T, V^E) triples. */
    public static RedlichKisterFit excessVolumes(double[] x1, double[] kelvin, double[] excessVolume, int orderInX,
            int orderInT, double referenceKelvin, double[] weights) {
        checkOrders(orderInX, orderInT);
        checkLengths(x1.length, "mole fractions", kelvin.length, "temperatures");
        checkLengths(x1.length, "mole fractions", excessVolume.length, "excess volumes");
        for (int i = 0; i < x1.length; i++) {
            checkMoleFraction(x1[i], i + 1);
            checkTemperature(kelvin[i], i + 1);
        }
        if (!Double.isFinite(referenceKelvin)) {
            throw Problem.FIT_NOT_FINITE.raise("reference temperature", 1, referenceKelvin);
        }
        double[][] design = new double[x1.length][];
        for (int i = 0; i < x1.length; i++) {
            design[i] = basis(x1[i], kelvin[i] - referenceKelvin, orderInX, orderInT);
        }
        LeastSquaresFit fit = LinearLeastSquares.fit(design, excessVolume, weights);
        return new RedlichKisterFit(fit, orderInX, orderInT, referenceKelvin);
    }

    /**
     * Coefficients a_kj from (x1, τ, V^E) with τ = T − T_ref given directly, for data whose temperature scale is not
     * known (the basis only uses temperature differences, which are the same in K and °C).
     */
    public static RedlichKisterFit excessVolumesAtOffsets(double[] x1, double[] tau, double[] excessVolume,
            int orderInX, int orderInT, double[] weights) {
        checkOrders(orderInX, orderInT);
        checkLengths(x1.length, "mole fractions", tau.length, "temperatures");
        checkLengths(x1.length, "mole fractions", excessVolume.length, "excess volumes");
        double[][] design = new double[x1.length][];
        for (int i = 0; i < x1.length; i++) {
            checkMoleFraction(x1[i], i + 1);
            if (!Double.isFinite(tau[i])) {
                throw Problem.FIT_NOT_FINITE.raise("temperature", i + 1, tau[i]);
            }
            design[i] = basis(x1[i], tau[i], orderInX, orderInT);
        }
        return new RedlichKisterFit(LinearLeastSquares.fit(design, excessVolume, weights), orderInX, orderInT,
                Double.NaN);
    }

    /** Coefficients A0..A_order at one temperature from (x1, ρ) pairs, with the pure liquids' densities given. */
    public static RedlichKisterFit densities(double[] x1, double[] density, Component first, Component second,
            double kelvin, int order, DeviationMeasure measure, double[] weights) {
        checkTemperature(kelvin, 1);
        double[] t = new double[x1.length];
        Arrays.fill(t, kelvin);
        return densities(x1, t, density, first, second, order, 0, kelvin, measure, weights);
    }

    /** Coefficients a_kj from (x1, T, ρ) triples, with the pure liquids' densities given. */
    public static RedlichKisterFit densities(double[] x1, double[] kelvin, double[] density, Component first,
            Component second, int orderInX, int orderInT, double referenceKelvin, DeviationMeasure measure,
            double[] weights) {
        checkLengths(x1.length, "mole fractions", kelvin.length, "temperatures");
        checkLengths(x1.length, "mole fractions", density.length, "densities");
        if (weights != null) {
            checkLengths(x1.length, "mole fractions", weights.length, "weights");
        }
        double[] excess = new double[x1.length];
        double[] w = new double[x1.length];
        for (int i = 0; i < x1.length; i++) {
            checkMoleFraction(x1[i], i + 1);
            checkTemperature(kelvin[i], i + 1);
            if (!(density[i] > 0) || !Double.isFinite(density[i])) {
                throw Problem.FIT_NOT_POSITIVE.raise("density", i + 1, density[i]);
            }
            excess[i] = MixtureVolumes.excessVolume(x1[i], kelvin[i], density[i], first, second);
            double given = weights == null ? 1.0 : weights[i];
            if (measure == DeviationMeasure.DENSITY) {
                double slope = density[i] * density[i] / (1000.0 * MixtureVolumes.molarMass(x1[i], first, second));
                w[i] = given * slope * slope;
            } else {
                w[i] = given;
            }
        }
        return excessVolumes(x1, kelvin, excess, orderInX, orderInT, referenceKelvin, w);
    }

    /** x1·x2·d^k·τ^j for k = 0..orderInX, j = 0..orderInT, k-major (index k·(orderInT + 1) + j). */
    static double[] basis(double x1, double tau, int orderInX, int orderInT) {
        double x2 = 1.0 - x1;
        double d = x1 - x2;
        double[] row = new double[(orderInX + 1) * (orderInT + 1)];
        double dk = x1 * x2;
        for (int k = 0; k <= orderInX; k++) {
            double term = dk;
            for (int j = 0; j <= orderInT; j++) {
                row[k * (orderInT + 1) + j] = term;
                term *= tau;
            }
            dk *= d;
        }
        return row;
    }

    static void checkOrders(int orderInX, int orderInT) {
        if (orderInX < 0 || orderInX > MAX_ORDER_IN_X) {
            throw Problem.BAD_ORDER.raise("order in x", MAX_ORDER_IN_X, orderInX);
        }
        if (orderInT < 0 || orderInT > MAX_ORDER_IN_T) {
            throw Problem.BAD_ORDER.raise("order in T", MAX_ORDER_IN_T, orderInT);
        }
    }

    private static void checkLengths(int n, String what, int m, String other) {
        if (n != m) {
            throw Problem.LENGTH_MISMATCH.raise(n, what, m, other);
        }
    }

    private static void checkMoleFraction(double x1, int point) {
        if (!(x1 >= 0 && x1 <= 1)) {
            throw Problem.FIT_MOLE_FRACTION_OUTSIDE_UNIT.raise(point, x1);
        }
    }

    private static void checkTemperature(double kelvin, int point) {
        if (!(kelvin > 0) || !Double.isFinite(kelvin)) {
            throw Problem.FIT_NOT_POSITIVE.raise("temperature in K", point, kelvin);
        }
    }
}
