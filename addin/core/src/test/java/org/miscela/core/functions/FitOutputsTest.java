package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.TestCard;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Every output of the fit functions against what it is by definition: the straight line's least-squares
 * coefficients, standard errors, covariance, residuals and R² by the textbook formulas (b1 = Sxy/Sxx,
 * b0 = ȳ − b1·x̄, SE(b1) = s/√Sxx, SE(b0) = s·√(1/n + x̄²/Sxx), cov(b0, b1) = −x̄·s²/Sxx, R² = 1 − RSS/TSS); a
 * density fit's outputs in the card's units (g/cm³, L/mol, °C) against the densities recomputed here from its
 * coefficients and the card's pure liquids (ρ = Σ x_k M_k/V_m, V_m = Σ x_k M_k/ρ_k + V^E); and the outputs' mutual
 * consistency (standard errors are the covariance's root diagonal; the order table's s is each order's fit's).
 * Data invented.
 */
class FitOutputsTest {
    private static final double[] T = {0, 1, 2, 3, 4};
    private static final double[] Y = {1.1, 2.9, 5.2, 6.8, 9.1};

    private static double[][] line() {
        double[][] d = new double[T.length][];
        for (int i = 0; i < T.length; i++) {
            d[i] = new double[] {1, T[i]};
        }
        return d;
    }

    private static double number(Object[][] table, String label) {
        for (Object[] row : table) {
            if (row[0].equals(label)) {
                return (Double) row[1];
            }
        }
        throw new AssertionError("no row " + label);
    }

    @Test
    void straightLineOutputsAreTheTextbookOnes() {
        int n = T.length;
        double tm = 2;
        double ym = (1.1 + 2.9 + 5.2 + 6.8 + 9.1) / 5;
        double sxx = 10;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            sxy += (T[i] - tm) * (Y[i] - ym);
        }
        double b1 = sxy / sxx;
        double b0 = ym - b1 * tm;
        double rss = 0;
        double tss = 0;
        double worst = 0;
        int at = 0;
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = Y[i] - b0 - b1 * T[i];
            rss += r[i] * r[i];
            tss += (Y[i] - ym) * (Y[i] - ym);
            if (Math.abs(r[i]) > Math.abs(worst)) {
                worst = r[i];
                at = i;
            }
        }
        double s2 = rss / (n - 2);
        Object[][] c = FitFunctions.leastSquares(line(), Y, null, FitOutput.COEFFICIENTS);
        assertEquals(b0, (Double) c[0][0], 1e-14);
        assertEquals(b1, (Double) c[1][0], 1e-14);
        Object[][] se = FitFunctions.leastSquares(line(), Y, null, FitOutput.STANDARD_ERRORS);
        assertEquals(Math.sqrt(s2 / sxx), (Double) se[1][0], 1e-14);
        assertEquals(Math.sqrt(s2 * (1.0 / n + tm * tm / sxx)), (Double) se[0][0], 1e-14);
        Object[][] cov = FitFunctions.leastSquares(line(), Y, null, FitOutput.COVARIANCE);
        assertEquals(-tm * s2 / sxx, (Double) cov[0][1], 1e-14);
        assertEquals(-tm * s2 / sxx, (Double) cov[1][0], 1e-14);
        Object[][] res = FitFunctions.leastSquares(line(), Y, null, FitOutput.RESIDUALS);
        for (int i = 0; i < n; i++) {
            assertEquals(r[i], (Double) res[i][0], 1e-14, "residual " + (i + 1));
        }
        Object[][] stats = FitFunctions.leastSquares(line(), Y, null, FitOutput.STATISTICS);
        assertEquals("the response", stats[0][1]);
        assertEquals(5.0, number(stats, "points"));
        assertEquals(2.0, number(stats, "parameters"));
        assertEquals(3.0, number(stats, "degrees of freedom"));
        assertEquals(Math.sqrt(s2), number(stats, "standard deviation of the fit"), 1e-14);
        assertEquals(worst, number(stats, "largest residual"), 1e-14);
        assertEquals(at + 1.0, number(stats, "largest residual at point"));
        assertEquals(1 - rss / tss, number(stats, "R²"), 1e-14);
        assertTrue(number(stats, "condition number (scaled columns)") >= 1);
        assertEquals(CardFunctions.OK, FitFunctions.leastSquares(line(), Y, null, FitOutput.CHECK)[0][0]);
    }

    /** Without a constant column R² is the uncentred 1 − RSS/Σy². */
    @Test
    void rSquaredWithoutAnInterceptIsUncentred() {
        double[][] d = {{1}, {2}, {3}};
        double[] y = {2.1, 3.9, 6.2};
        double b = (2.1 + 2 * 3.9 + 3 * 6.2) / 14;
        double rss = Math.pow(2.1 - b, 2) + Math.pow(3.9 - 2 * b, 2) + Math.pow(6.2 - 3 * b, 2);
        Object[][] stats = FitFunctions.leastSquares(d, y, null, FitOutput.STATISTICS);
        assertEquals(1 - rss / (2.1 * 2.1 + 3.9 * 3.9 + 6.2 * 6.2), number(stats, "R² (uncentred)"), 1e-14);
    }

    /** Two invented liquids in g/cm³, L/mol and °C, and densities of an invented mixture with noise. */
    static Card pureCard() {
        return TestCard.empty().row("Miscela card", 2).row("source", "invented values, for tests")
                .row("temperature unit", "°C").row("density unit", "g/cm³").row("molar volume unit", "L/mol")
                .row("molar mass unit", "g/mol").row("valid temperature", 10, 40)
                .row("component", "alpha", 46.07).row("component", "beta", 18.015)
                .row("density model", "alpha", "polynomial").row("density reference temperature", "alpha", 20)
                .row("density coefficients", "alpha", 0.7893, -0.0008)
                .row("density model", "beta", "constant").row("density coefficients", "beta", 0.997)
                .row("valid mole fraction", "alpha", 0, 1).readPure();
    }

    private static double pureVolume(double mass, double gPerCm3) {
        return mass / gPerCm3; // cm³/mol
    }

    /** ρ in g/cm³ of the invented mixture with V^E = x1·x2·(A0 + A1·d) in cm³/mol at t °C. */
    private static double density(double x1, double t, double a0, double a1) {
        double v = x1 * pureVolume(46.07, 0.7893 - 0.0008 * (t - 20)) + (1 - x1) * pureVolume(18.015, 0.997)
                + x1 * (1 - x1) * (a0 + a1 * (2 * x1 - 1));
        return (x1 * 46.07 + (1 - x1) * 18.015) / v;
    }

    /** {x, ρ, t}: n compositions evenly spread at 25 °C, A0 = −4.0 and A1 = 1.2 cm³/mol, noise 2e-5 g/cm³. */
    private static double[][] noisyDensities(int n, long seed) {
        Random r = new Random(seed);
        double[][] d = new double[3][n];
        for (int i = 0; i < n; i++) {
            d[0][i] = (i + 0.5) / n;
            d[2][i] = 25;
            d[1][i] = density(d[0][i], d[2][i], -4.0, 1.2) + 2e-5 * r.nextGaussian();
        }
        return d;
    }

    @Test
    void densityFitOutputsInTheCardsUnits() {
        Card pure = pureCard();
        int n = 25;
        double[][] data = noisyDensities(n, 3);
        double[] x = data[0];
        double[] rho = data[1];
        double[] t = data[2];
        Object[][] a = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, null, FitOutput.COEFFICIENTS);
        double a0 = (Double) a[0][0] * 1000;
        double a1 = (Double) a[1][0] * 1000;
        assertEquals(-4.0, a0, 0.05, "A0 in cm³/mol");
        assertEquals(1.2, a1, 0.1, "A1 in cm³/mol");
        Object[][] res = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, null, FitOutput.RESIDUALS);
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double expected = rho[i] - density(x[i], t[i], a0, a1);
            assertEquals(expected, (Double) res[i][0], 1e-12, "residual " + (i + 1));
            sum += expected * expected;
        }
        Object[][] se = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, null,
                FitOutput.STANDARD_ERRORS);
        Object[][] cov = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, null, FitOutput.COVARIANCE);
        for (int k = 0; k < 2; k++) {
            assertEquals((Double) se[k][0], Math.sqrt((Double) cov[k][k]), 1e-12 * (Double) se[k][0], "A" + k);
        }
        Object[][] stats = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, null, FitOutput.STATISTICS);
        // the fit minimises density deviations through weighted excess volumes: to first order its s is theirs
        double s = number(stats, "standard deviation of the fit [g/cm³]");
        assertEquals(Math.sqrt(sum / (n - 2)), s, 0.01 * s);
        Object[][] orders = FitFunctions.density(pure, 0, 1, x, rho, t, 2, 0, Double.NaN, null, FitOutput.ORDERS);
        assertEquals(s, (Double) orders[2][3], 1e-12 * s, "the order table's s of order 1 is that fit's");
        assertEquals(CardFunctions.OK, FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, null,
                FitOutput.CHECK)[0][0]);
    }

    /** The largest residual of a weighted density fit is looked for among the points that count (weight > 0). */
    @Test
    void theLargestResidualIsAmongWeightedPoints() {
        Card pure = pureCard();
        int n = 12;
        double[][] data = noisyDensities(n, 8);
        double[] x = data[0];
        double[] rho = data[1];
        double[] t = data[2];
        double[] w = new double[n];
        java.util.Arrays.fill(w, 1.0);
        rho[4] += 0.01;
        w[4] = 0;
        Object[][] res = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, w, FitOutput.RESIDUALS);
        int worst = -1;
        for (int i = 0; i < n; i++) {
            if (w[i] > 0 && (worst < 0 || Math.abs((Double) res[i][0]) > Math.abs((Double) res[worst][0]))) {
                worst = i;
            }
        }
        assertTrue(Math.abs((Double) res[4][0]) > 100 * Math.abs((Double) res[worst][0]), "the left-out point");
        Object[][] stats = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 0, Double.NaN, w, FitOutput.STATISTICS);
        assertEquals(worst + 1.0, number(stats, "largest residual at point"));
        assertEquals((Double) res[worst][0], number(stats, "largest residual [g/cm³]"), 0.0);
        assertEquals(11.0, number(stats, "points"));
    }

    /** When every added term is significant the order table says to try a higher order. */
    @Test
    void theOrderTableNotesWhenEveryTermCounts() {
        Random r = new Random(4);
        int n = 30;
        double[] x = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (i + 0.5) / n;
            double d = 2 * x[i] - 1;
            v[i] = x[i] * (1 - x[i]) * (-3 + 0.8 * d - 0.7 * d * d + 0.5 * d * d * d) + 1e-5 * r.nextGaussian();
        }
        Object[][] table = FitFunctions.excess(x, v, 2, null, 0, Double.NaN, null, FitOutput.ORDERS);
        Object[] last = table[table.length - 1];
        assertEquals("note", last[0]);
        assertEquals("every added term was significant: try a higher order", last[1]);
        assertEquals(2.0, number(table, "selected order (F-test at 5 %)"));
        assertEquals(CardFunctions.OK, FitFunctions.excess(x, v, 2, null, 0, Double.NaN, null,
                FitOutput.CHECK)[0][0]);
    }

    @Test
    void densityFitRefusals() {
        Card pure = pureCard();
        double[] x = {0.2, 0.5, 0.8};
        double[] rho = {0.95, 0.9, 0.83};
        assertEquals(Problem.FIT_NEEDS_REFERENCE, assertThrows(MiscelaException.class, () -> FitFunctions.density(pure,
                0, 1, x, rho, new double[] {20, 25, 30}, 1, 1, Double.NaN, null, FitOutput.COEFFICIENTS)).problem());
        // alpha's polynomial, 0.7893 − 0.0008·(t − 20) g/cm³, is negative above 1006.6 °C
        MiscelaException e = assertThrows(MiscelaException.class, () -> FitFunctions.density(pure, 0, 1, x, rho,
                new double[] {25, 1100, 25}, 1, 0, Double.NaN, null, FitOutput.COEFFICIENTS));
        assertEquals(Problem.NON_PHYSICAL, e.problem());
        assertTrue(e.getMessage().contains("density of alpha") && e.getMessage().contains("1100 °C"), e.getMessage());
    }

    /** The words the functions accept for what they return and for the property, any case, spaces trimmed. */
    @Test
    void outputAndPropertyWords() {
        for (FitOutput o : FitOutput.values()) {
            assertEquals(o, FitOutput.lookup("  " + o.word().toUpperCase(java.util.Locale.ROOT) + " "));
        }
        assertEquals("standard errors", FitOutput.STANDARD_ERRORS.word());
        for (PropertyKind p : PropertyKind.values()) {
            assertEquals(p, PropertyKind.lookup(" " + p.word().toUpperCase(java.util.Locale.ROOT)));
        }
        assertEquals("enthalpy", PropertyKind.ENTHALPY.word());
        assertEquals(Problem.UNKNOWN_PROPERTY,
                assertThrows(MiscelaException.class, () -> PropertyKind.lookup("entropy")).problem());
        assertEquals(Problem.UNKNOWN_FIT_OUTPUT.format("all", "coefficients, standard errors, statistics, covariance, "
                + "residuals, orders, consistency, check"), assertThrows(MiscelaException.class, () -> FitOutput.lookup(" all "))
                .getMessage());
    }

    /** No points is the catalogue's refusal, not a crash. */
    @Test
    void aDensityFitWithoutPoints() {
        double[] none = {};
        assertThrows(MiscelaException.class, () -> FitFunctions.density(pureCard(), 0, 1, none, none,
                none, 1, 0, Double.NaN, null, FitOutput.COEFFICIENTS));
    }

    /**
     * Densities made exactly from temperature-dependent coefficients a_k0 + a_k1·(t − 25 °C) come back as those
     * coefficients when 25 °C is given as the reference (and in L/mol, per °C).
     */
    @Test
    void aTemperatureDependentDensityFitUsesTheGivenReference() {
        Card pure = pureCard();
        int n = 24;
        double[] x = new double[n];
        double[] rho = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (i % 8 + 0.5) / 8;
            t[i] = 15 + 10 * (i / 8);
            double a0 = -4.0 + 0.01 * (t[i] - 25);
            double a1 = 1.2 - 0.004 * (t[i] - 25);
            rho[i] = density(x[i], t[i], a0, a1);
        }
        Object[][] a = FitFunctions.density(pure, 0, 1, x, rho, t, 1, 1, 25, null, FitOutput.COEFFICIENTS);
        assertEquals(-4.0e-3, (Double) a[0][0], 1e-12);
        assertEquals(0.01e-3, (Double) a[0][1], 1e-13);
        assertEquals(1.2e-3, (Double) a[1][0], 1e-12);
        assertEquals(-0.004e-3, (Double) a[1][1], 1e-13);
    }
}
