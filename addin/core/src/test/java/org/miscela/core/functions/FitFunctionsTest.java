package org.miscela.core.functions;

import org.miscela.testing.Figures;
import org.miscela.core.card.BinaryMixture;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.TestCards;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.miscela.reference.Oiml22;

/** The fit functions in card units, against the OIML R 22 ethanol + water formula and exactly representable data. */
class FitFunctionsTest {
    static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");

    /** Mole fraction of ethanol at mass fraction p (OIML R 22 molar masses). */
    static double x(double p) {
        return (p / Oiml22.M_ETHANOL) / (p / Oiml22.M_ETHANOL + (1 - p) / Oiml22.M_WATER);
    }

    /**
     * Densities from the OIML R 22 formula at 20 °C for p = 0, 0.01, …, 1 refitted through the card's pure liquids
     * (which are the formula's own): A0..A14 follow the formula within 0.011 kg/m³ (the printed tables' resolution)
     * at 200 compositions between the fitted points. (With every 0.05 only, such a high order oscillates between
     * the points in the water-rich region; the order table is how a user sees that coming.)
     */
    @Test
    void densityFitFollowsOiml() {
        Card pure = CardReader.readPureComponents(CARD);
        int n = 101;
        double[] xs = new double[n];
        double[] rho = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            double p = i / 100.0;
            xs[i] = x(p);
            rho[i] = Oiml22.density(p, 20);
            t[i] = 20;
        }
        double worst = worstBetween(pure, xs, rho, t, 14);
        Figures.note(FitFunctionsTest.class,
                "OIML R 22 at 20 °C refitted by MIX.FITDENSITY's core (A0..A14, 101 points): worst "
                + "deviation between points %.4f kg/m³", worst);
        assertTrue(worst < 0.011, "worst deviation between fitted points " + worst + " kg/m³");
        Object[][] stats = FitFunctions.density(pure, 0, 1, xs, rho, t, 14, 0, Double.NaN, null,
                FitOutput.STATISTICS);
        assertEquals("standard deviation of the fit [kg/m³]", stats[4][0]);
        assertTrue((Double) stats[4][1] < 0.005, "fit SD " + stats[4][1]);
        assertEquals(101.0, stats[1][1]);
        assertEquals(15, FitFunctions.density(pure, 0, 1, xs, rho, t, 14, 0, Double.NaN, null,
                FitOutput.COEFFICIENTS).length);
    }

    /**
     * The statistics of a density fit state the largest residual in density, as the "residuals" output gives it:
     * OIML R 22 densities at 15 and 25 °C with seeded noise of 0.05 kg/m³ (the least squares themselves run on
     * weighted excess volumes, whose raw residuals are volumes a thousand times smaller).
     */
    @Test
    void densityFitStatisticsGiveTheLargestDensityResidual() {
        Card pure = CardReader.readPureComponents(CARD);
        double[][] data = noisyOiml(5);
        double[] xs = data[0];
        double[] rho = data[1];
        double[] t = data[2];
        int n = xs.length;
        Object[][] res = FitFunctions.density(pure, 0, 1, xs, rho, t, 4, 1, 20, null, FitOutput.RESIDUALS);
        int worst = 0;
        for (int i = 1; i < n; i++) {
            if (Math.abs((Double) res[i][0]) > Math.abs((Double) res[worst][0])) {
                worst = i;
            }
        }
        Object[][] stats = FitFunctions.density(pure, 0, 1, xs, rho, t, 4, 1, 20, null, FitOutput.STATISTICS);
        assertEquals("largest residual [kg/m³]", stats[5][0]);
        assertEquals((Double) res[worst][0], (Double) stats[5][1], 0.0);
        assertEquals(worst + 1.0, stats[6][1]);
        double s = (Double) stats[4][1];
        assertTrue(Math.abs((Double) stats[5][1]) > s, "largest |residual| " + stats[5][1] + " against SD " + s);
    }

    /**
     * A density fit on a card in °F takes temperatures in °F and gives each a_kj per °F^j: the same data as in °C
     * (OIML R 22 at 15 and 25 °C, 59 and 77 °F, with seeded noise), fitted about 20 °C = 68 °F, give a_kj(°F) =
     * a_kj(°C)·(5/9)^j, standard errors alike, covariance entries times (5/9)^(j+j'), and the same residuals (one
     * degree Fahrenheit is 5/9 K, NIST SP 811 (2008), B.9).
     */
    @Test
    void densityFitOnACardInFahrenheit() {
        Card celsius = CardReader.readPureComponents(CARD);
        Card fahrenheit = CardReader.readPureComponents(TestCards.cells("ethanol-water-oiml-fahrenheit.tsv"));
        double[][] data = noisyOiml(7);
        double[] xs = data[0];
        double[] rho = data[1];
        double[] t = data[2];
        double[] tf = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            tf[i] = 1.8 * t[i] + 32;
        }
        int orderInT = 1;
        for (FitOutput out : new FitOutput[] {FitOutput.COEFFICIENTS, FitOutput.STANDARD_ERRORS,
            FitOutput.COVARIANCE, FitOutput.RESIDUALS}) {
            Object[][] c = FitFunctions.density(celsius, 0, 1, xs, rho, t, 3, orderInT, 20, null, out);
            Object[][] f = FitFunctions.density(fahrenheit, 0, 1, xs, rho, tf, 3, orderInT, 68, null, out);
            assertEquals(c.length, f.length);
            for (int i = 0; i < c.length; i++) {
                for (int j = 0; j < c[i].length; j++) {
                    int power = out == FitOutput.COVARIANCE ? i % (orderInT + 1) + j % (orderInT + 1)
                            : out == FitOutput.RESIDUALS ? 0 : j;
                    double expected = (Double) c[i][j] * Math.pow(5.0 / 9.0, power);
                    assertEquals(expected, (Double) f[i][j], 1e-9 * Math.abs(expected) + 1e-15,
                            out + " " + i + "," + j);
                }
            }
        }
    }

    /** x, ρ and t of OIML R 22 densities at 15 and 25 °C, 15 mass fractions each, with seeded noise of 0.05 kg/m³. */
    private static double[][] noisyOiml(long seed) {
        Random r = new Random(seed);
        int n = 30;
        double[][] data = new double[3][n];
        for (int i = 0; i < n; i++) {
            double p = (i % 15 + 0.5) / 15;
            data[2][i] = i < 15 ? 15 : 25;
            data[0][i] = x(p);
            data[1][i] = Oiml22.density(p, data[2][i]) + 0.05 * r.nextGaussian();
        }
        return data;
    }

    static double worstBetween(Card pure, double[] xs, double[] rho, double[] t, int order) {
        Object[][] a = FitFunctions.density(pure, 0, 1, xs, rho, t, order, 0, Double.NaN, null, FitOutput.COEFFICIENTS);
        double[][] c = new double[order + 1][1];
        for (int k = 0; k <= order; k++) {
            c[k][0] = (Double) a[k][0];
        }
        RedlichKister rk = new RedlichKister(293.15, c);
        BinaryMixture m = BinaryMixture.of(pure);
        double worst = 0;
        for (int i = 0; i < 200; i++) {
            double p = (i + 0.5) / 200.0;
            double vm = x(p) * m.pureMolarVolume(0, 293.15) + (1 - x(p)) * m.pureMolarVolume(1, 293.15)
                    + rk.value(x(p), 293.15);
            worst = Math.max(worst, Math.abs(1000 * m.meanMolarMass(x(p)) / vm - Oiml22.density(p, 20)));
        }
        return worst;
    }

    /** Temperature-dependent data made exactly from known coefficients come back to rounding, in any T scale. */
    @Test
    void excessFitRecoversKnownCoefficients() {
        double[][] known = {{-4.0, 0.02}, {1.1, -0.003}, {-0.4, 0.0}};
        RedlichKister rk = new RedlichKister(293.15, known);
        Random r = new Random(7);
        int n = 40;
        double[] xs = new double[n];
        double[] celsius = new double[n];
        double[] ve = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = 0.02 + 0.96 * r.nextDouble();
            celsius[i] = 5 + 30 * r.nextDouble();
            ve[i] = rk.value(xs[i], celsius[i] + 273.15);
        }
        Object[][] a = FitFunctions.excess(xs, ve, 2, celsius, 1, 20.0, null, FitOutput.COEFFICIENTS);
        for (int k = 0; k < 3; k++) {
            for (int j = 0; j < 2; j++) {
                assertEquals(known[k][j], (Double) a[k][j], 1e-10, "a" + k + j);
            }
        }
        Object[][] residuals = FitFunctions.excess(xs, ve, 2, celsius, 1, 20.0, null, FitOutput.RESIDUALS);
        assertEquals(n, residuals.length);
    }

    /** With noise of 1e-4 on order-2 data, orders 0..5: the F-test keeps order 2 (seeded, so reproducible). */
    @Test
    void orderTablePicksTheOrderTheDataHave() {
        RedlichKister rk = new RedlichKister(298.15, new double[][] {{-3.0}, {0.8}, {-0.6}});
        Random r = new Random(11);
        int n = 30;
        double[] xs = new double[n];
        double[] ve = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = (i + 0.5) / n;
            ve[i] = rk.value(xs[i], 298.15) + 1e-4 * r.nextGaussian();
        }
        Object[][] t = FitFunctions.excess(xs, ve, 5, null, 0, Double.NaN, null, FitOutput.ORDERS);
        assertEquals("order", t[0][0]);
        assertEquals(8, t[0].length);
        assertEquals("selected order (F-test at 5 %)", t[7][0]);
        assertEquals(2.0, t[7][1]);
        assertEquals("", t[1][4], "order 0 has no F-test against a lower order");
    }

    @Test
    void refusals() {
        double[] xs = {0.1, 0.5, 0.9};
        double[] ve = {-0.3, -1.0, -0.3};
        assertEquals(Problem.FIT_NEEDS_REFERENCE, assertThrows(MiscelaException.class,
                () -> FitFunctions.excess(xs, ve, 1, new double[] {20, 25, 30}, 1, Double.NaN, null,
                        FitOutput.COEFFICIENTS)).problem());
        assertEquals(Problem.FIT_NEEDS_TEMPERATURE, assertThrows(MiscelaException.class,
                () -> FitFunctions.excess(xs, ve, 1, null, 1, 20, null, FitOutput.COEFFICIENTS)).problem());
        assertEquals(Problem.FIT_OUTPUT_NOT_HERE, assertThrows(MiscelaException.class,
                () -> FitFunctions.leastSquares(new double[][] {{1}, {1}}, new double[] {1, 2}, null,
                        FitOutput.ORDERS)).problem());
        assertEquals(Problem.UNKNOWN_FIT_OUTPUT, assertThrows(MiscelaException.class,
                () -> FitOutput.lookup("everything")).problem());
        Object[][] exact = FitFunctions.excess(xs, ve, 2, null, 0, Double.NaN, null, FitOutput.STATISTICS);
        assertEquals("none: as many parameters as points", exact[4][1], "no NaN when dof = 0");
    }
}
