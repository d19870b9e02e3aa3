package org.miscela.core.fit;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.miscela.core.model.Component;
import org.miscela.core.model.ConstantDensity;
import org.miscela.core.model.PolynomialDensity;
import org.miscela.core.model.RedlichKister;

/**
 * Redlich–Kister fits on data generated from known expansions. All coefficients and pure-liquid properties here are
 * invented for the test; they only need to be plausible in size.
 */
class RedlichKisterFitterTest {
    private static final double T_REF = 298.15;
    /** Invented: A0..A3 in cm³/mol, each linear in T − T_ref. */
    private static final double[][] A = {{-4.2, 0.011}, {-0.9, -0.004}, {0.35, 0.002}, {-0.6, 0.0}};
    private static final RedlichKister TRUE = new RedlichKister(T_REF, A);
    /** Invented pure liquids with temperature-dependent densities (kg/m³, linear in T − T_ref). */
    private static final Component FIRST = new Component("first", 46.07,
            new PolynomialDensity(T_REF, new double[] {785.1, -0.84}));
    private static final Component SECOND = new Component("second", 18.02,
            new PolynomialDensity(T_REF, new double[] {997.0, -0.26}));

    private static double[] grid(int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (i + 0.5) / n;
        }
        return x;
    }

    @Test
    void excessVolumesAtOneTemperatureGiveTheCoefficients() {
        double[] x = grid(15);
        double[] ve = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            ve[i] = TRUE.value(x[i], 310.0);
        }
        RedlichKisterFit fit = RedlichKisterFitter.excessVolumes(x, ve, 3, 310.0, null);
        for (int k = 0; k <= 3; k++) {
            assertEquals(TRUE.coefficientAt(k, 310.0), fit.coefficients()[k][0], 1e-12, "A" + k);
        }
        assertEquals(310.0, fit.toRedlichKister().referenceKelvin());
        assertEquals(TRUE.value(0.37, 310.0), fit.toRedlichKister().value(0.37, 999), 1e-13);
    }

    @Test
    void densitiesAtOneTemperatureGiveTheCoefficients() {
        double t = 288.15;
        double[] x = grid(12);
        double[] rho = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            rho[i] = MixtureVolumes.density(x[i], t, TRUE.value(x[i], t), FIRST, SECOND);
        }
        for (DeviationMeasure measure : DeviationMeasure.values()) {
            RedlichKisterFit fit = RedlichKisterFitter.densities(x, rho, FIRST, SECOND, t, 3, measure, null);
            for (int k = 0; k <= 3; k++) {
                assertEquals(TRUE.coefficientAt(k, t), fit.coefficients()[k][0], 1e-10, measure + " A" + k);
            }
        }
    }

    @Test
    void densitiesOverTemperatureGiveTheTemperatureCoefficients() {
        double[] x = grid(10);
        int n = x.length * 5;
        double[] xs = new double[n];
        double[] ts = new double[n];
        double[] rho = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = x[i % x.length];
            ts[i] = 278.15 + 10 * (i / x.length);
            rho[i] = MixtureVolumes.density(xs[i], ts[i], TRUE.value(xs[i], ts[i]), FIRST, SECOND);
        }
        RedlichKisterFit fit = RedlichKisterFitter.densities(xs, ts, rho, FIRST, SECOND, 3, 1, T_REF,
                DeviationMeasure.DENSITY, null);
        double[][] a = fit.coefficients();
        for (int k = 0; k <= 3; k++) {
            assertEquals(A[k][0], a[k][0], 1e-10, "a" + k + "0");
            assertEquals(A[k][1], a[k][1], 1e-11, "a" + k + "1");
        }
        assertEquals(fit.leastSquares().coefficients()[fit.parameterIndex(2, 1)], a[2][1]);
        assertEquals(TRUE.value(0.61, 301.3), fit.toRedlichKister().value(0.61, 301.3), 1e-12);
    }

    /** The DENSITY measure is the EXCESS_VOLUME fit with weights (ρ/V_m)² = (ρ²/(1000·M))². */
    @Test
    void densityMeasureIsAWeighting() {
        Random random = new Random(11);
        double t = 298.15;
        double[] x = grid(20);
        double[] rho = new double[x.length];
        double[] ve = new double[x.length];
        double[] w = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            rho[i] = MixtureVolumes.density(x[i], t, TRUE.value(x[i], t), FIRST, SECOND) + 0.01 * random.nextGaussian();
            ve[i] = MixtureVolumes.excessVolume(x[i], t, rho[i], FIRST, SECOND);
            double slope = rho[i] * rho[i] / (1000 * MixtureVolumes.molarMass(x[i], FIRST, SECOND));
            w[i] = slope * slope;
        }
        RedlichKisterFit byDensity = RedlichKisterFitter.densities(x, rho, FIRST, SECOND, t, 3,
                DeviationMeasure.DENSITY, null);
        RedlichKisterFit weighted = RedlichKisterFitter.excessVolumes(x, ve, 3, t, w);
        assertArrayEquals(weighted.leastSquares().coefficients(), byDensity.leastSquares().coefficients(), 1e-13);

        // and its residual standard deviation is, to first order, that of the density deviations in kg/m³
        RedlichKister rk = byDensity.toRedlichKister();
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            double d = MixtureVolumes.density(x[i], t, rk.value(x[i], t), FIRST, SECOND) - rho[i];
            sum += d * d;
        }
        double densitySd = Math.sqrt(sum / byDensity.leastSquares().degreesOfFreedom());
        assertEquals(densitySd, byDensity.leastSquares().residualStandardDeviation(), 1e-4 * densitySd);
    }

    /** Writing the pair the other way round, x1 → 1 − x1, turns A_k into (−1)^k·A_k. */
    @Test
    void swappingTheComponentsAlternatesTheSigns() {
        Random random = new Random(3);
        double[] x = grid(25);
        double[] swappedX = new double[x.length];
        double[] ve = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            ve[i] = TRUE.value(x[i], T_REF) + 0.002 * random.nextGaussian();
            swappedX[i] = 1 - x[i];
        }
        RedlichKister forward = RedlichKisterFitter.excessVolumes(x, ve, 3, T_REF, null).toRedlichKister();
        RedlichKister backward = RedlichKisterFitter.excessVolumes(swappedX, ve, 3, T_REF, null).toRedlichKister();
        for (int k = 0; k <= 3; k++) {
            assertEquals(forward.swapped().coefficientAt(k, T_REF), backward.coefficientAt(k, T_REF), 1e-12);
        }
    }

    @Test
    void standardErrorsAreArrangedLikeTheCoefficients() {
        Random random = new Random(5);
        double[] x = grid(30);
        double[] ve = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            ve[i] = TRUE.value(x[i], T_REF) + 0.003 * random.nextGaussian();
        }
        RedlichKisterFit fit = RedlichKisterFitter.excessVolumes(x, ve, 2, T_REF, null);
        double[] flat = fit.leastSquares().standardErrors();
        for (int k = 0; k <= 2; k++) {
            assertEquals(flat[k], fit.standardErrors()[k][0]);
        }
    }

    @Test
    void rejectsBadInput() {
        double[] x = grid(6);
        double[] ve = new double[6];
        assertEquals("The mole fraction at point 2, 1.5, lies outside 0..1.", assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(new double[] {0.1, 1.5}, new double[2], 0, T_REF, null))
                .getMessage());
        assertEquals(Problem.BAD_ORDER, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, ve, -1, T_REF, null)).problem());
        assertEquals(Problem.BAD_ORDER, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, new double[6], x, 2, 11, T_REF, null)).problem());
        assertEquals(Problem.TOO_FEW_POINTS, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, ve, 6, T_REF, null)).problem());
        assertEquals(Problem.LENGTH_MISMATCH, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, new double[5], 1, T_REF, null)).problem());
        double[] rho = {900, 900, -1, 900, 900, 900};
        assertEquals("The density at point 3 is -1.0; it must be greater than zero.", assertThrows(
                MiscelaException.class, () -> RedlichKisterFitter.densities(x, rho, FIRST, SECOND, T_REF, 1,
                        DeviationMeasure.DENSITY, null)).getMessage());
        assertEquals(Problem.FIT_NOT_POSITIVE, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, ve, 1, -3, null)).problem());
        // one temperature only: a slope in T cannot be told from the constant
        double[] oneT = new double[6];
        java.util.Arrays.fill(oneT, 300);
        assertEquals(Problem.RANK_DEFICIENT, assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, oneT, ve, 1, 1, T_REF, null)).problem());
        // ... and at T_ref itself the slope's basis is zero
        assertEquals("Parameter 2 multiplies zero at every point with positive weight, so the data say nothing about "
                + "it; spread the points or lower the order.", assertThrows(MiscelaException.class,
                () -> RedlichKisterFitter.excessVolumes(x, oneT, ve, 1, 1, 300, null)).getMessage());
    }

    @Test
    void constantPureDensitiesAreAcceptedToo() {
        Component a = new Component("a", 100, new ConstantDensity(1200));
        Component b = new Component("b", 50, new ConstantDensity(800));
        double[] x = grid(8);
        double[] rho = new double[8];
        for (int i = 0; i < 8; i++) {
            rho[i] = MixtureVolumes.density(x[i], 300, -1.5 * x[i] * (1 - x[i]), a, b);
        }
        RedlichKisterFit fit = RedlichKisterFitter.densities(x, rho, a, b, 300, 0, DeviationMeasure.EXCESS_VOLUME,
                null);
        assertEquals(-1.5, fit.coefficients()[0][0], 1e-12);
    }
}
