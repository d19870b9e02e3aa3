package org.miscela.core.functions;

import org.miscela.testing.Figures;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.model.Component;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.random.CorrelatedRandomVectorGenerator;
import org.apache.commons.math3.random.GaussianRandomGenerator;
import org.apache.commons.math3.random.MersenneTwister;
import org.junit.jupiter.api.Test;
import org.miscela.core.fit.ExcessVolumeUncertainty;
import org.miscela.reference.Oiml22;

/**
 * Uncertainty of results from a card's coefficient covariance. The card is fitted to OIML R 22 densities at 20 °C
 * with synthetic noise (σ = 0.05 kg/m³, seeded; the noise is invented, to give the fit a covariance). Linear
 * propagation is checked against the fitting engine's own binary propagation (an independent implementation), against
 * a Monte Carlo run over the coefficient distribution, and for a pair written the other way round.
 */
class UncertaintyTest {
    static final int ORDER = 4;
    static final double[] XS = {0.05, 0.3, 0.7};

    /** Cells of the OIML card with its excess rows replaced by a 20 °C fit of order 4 and its covariance. */
    static Object[][] fittedCard(boolean reversed, double[][] a, double[][] c) {
        List<Object[]> rows = new ArrayList<>();
        for (Object[] r : TestCards.cells("ethanol-water-oiml.tsv")) {
            String label = String.valueOf(r[0]).toLowerCase(Locale.ROOT);
            if (!label.startsWith("excess volume")) {
                rows.add(r);
            }
        }
        rows.set(0, new Object[] {"Miscela card", 2.0});
        for (int i = 0; i < rows.size(); i++) {
            String label = String.valueOf(rows.get(i)[0]);
            if (label.equals("title")) {
                rows.set(i, new Object[] {"title", "Ethanol + water at 20 °C with coefficient covariance (test card)"});
            } else if (label.equals("source")) {
                rows.set(i, new Object[] {"source", "pure liquids: OIML R 22 formula; A0..A4 and their covariance: "
                        + "least-squares fit to OIML R 22 densities at 20 C with invented noise (sigma 0.05 kg/m3, "
                        + "seeded), for tests of uncertainty propagation"});
            } else if (label.equals("valid temperature")) {
                rows.set(i, new Object[] {"valid temperature", 19.5, 20.5});
            }
        }
        String pair = reversed ? "water + ethanol" : "ethanol + water";
        for (int k = 0; k <= ORDER; k++) {
            double sign = reversed && k % 2 == 1 ? -1 : 1;
            rows.add(new Object[] {"excess volume A" + k, pair, sign * a[k][0]});
        }
        for (int p = 0; p <= ORDER; p++) {
            Object[] r = new Object[ORDER + 3];
            r[0] = "excess volume covariance";
            r[1] = pair;
            for (int q = 0; q <= ORDER; q++) {
                double sign = reversed && (p + q) % 2 == 1 ? -1 : 1;
                r[q + 2] = sign * c[p][q];
            }
            rows.add(r);
        }
        int width = 0;
        for (Object[] r : rows) {
            width = Math.max(width, r.length);
        }
        Object[][] out = new Object[rows.size()][width];
        for (int i = 0; i < out.length; i++) {
            for (int j = 0; j < width; j++) {
                Object[] r = rows.get(i);
                out[i][j] = j < r.length && r[j] != null ? r[j] : "";
            }
        }
        return out;
    }

    static Object[][][] fit() {
        Card pure = CardReader.readPureComponents(TestCards.cells("ethanol-water-oiml.tsv"));
        Random noise = new Random(2024);
        int n = 41;
        double[] xs = new double[n];
        double[] rho = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            double p = i / 40.0;
            xs[i] = FitFunctionsTest.x(p);
            rho[i] = Oiml22.density(p, 20) + 0.05 * noise.nextGaussian();
            t[i] = 20;
        }
        return new Object[][][] {
            FitFunctions.density(pure, 0, 1, xs, rho, t, ORDER, 0, Double.NaN, null, FitOutput.COEFFICIENTS),
            FitFunctions.density(pure, 0, 1, xs, rho, t, ORDER, 0, Double.NaN, null, FitOutput.COVARIANCE)};
    }

    static double[][] numbers(Object[][] cells) {
        double[][] out = new double[cells.length][];
        for (int i = 0; i < cells.length; i++) {
            out[i] = new double[cells[i].length];
            for (int j = 0; j < cells[i].length; j++) {
                out[i][j] = (Double) cells[i][j];
            }
        }
        return out;
    }

    @Test
    void linearPropagationAgreesWithTheFittingEngineAndMonteCarlo() {
        Object[][][] f = fit();
        double[][] a = numbers(f[0]);
        double[][] c = numbers(f[1]);
        Card card = CardReader.read(fittedCard(false, a, c));
        Card reversed = CardReader.read(fittedCard(true, a, c));
        ExcessVolumeUncertainty independent = new ExcessVolumeUncertainty(new RedlichKister(293.15, a), 0, c);
        Component ethanol = card.components().get(0);
        Component water = card.components().get(1);
        CorrelatedRandomVectorGenerator draws = new CorrelatedRandomVectorGenerator(new double[ORDER + 1],
                new Array2DRowRealMatrix(c), 1e-14, new GaussianRandomGenerator(new MersenneTwister(99)));
        int samples = 20000;
        double worstMonteCarlo = 0;
        for (double x : XS) {
            double[] z = {x, 1 - x};
            double uVe = CardFunctions.uncertainty(card, "excess volume", -1, z, 20, Extrapolation.AS_CARD);
            double uRho = CardFunctions.uncertainty(card, "density", -1, z, 20, Extrapolation.AS_CARD);
            assertEquals(independent.excessVolume(x, 293.15), uVe, 1e-9 * uVe, "u(V^E) at x = " + x);
            assertEquals(independent.density(x, 293.15, ethanol, water), uRho, 1e-9 * uRho, "u(ρ) at x = " + x);
            for (int k = 0; k < 2; k++) {
                double uPartial = CardFunctions.uncertainty(card, "partial volume", k, z, 20, Extrapolation.AS_CARD);
                assertEquals(independent.partialExcessVolume(k + 1, x, 293.15), uPartial, 1e-9 * uPartial);
                assertEquals(uPartial, CardFunctions.uncertainty(reversed, "partial volume", k, z, 20,
                        Extrapolation.AS_CARD), 1e-9 * uPartial, "the pair written the other way round");
            }
            assertEquals(uVe, CardFunctions.uncertainty(reversed, "excess volume", -1, z, 20,
                    Extrapolation.AS_CARD), 1e-9 * uVe);
            // Monte Carlo: the spread of ρ over coefficient draws (ρ is non-linear in them).
            double sum = 0;
            double sum2 = 0;
            double[] noise;
            for (int s = 0; s < samples; s++) {
                noise = draws.nextVector();
                double[][] drawn = new double[ORDER + 1][1];
                for (int k = 0; k <= ORDER; k++) {
                    drawn[k][0] = a[k][0] + noise[k];
                }
                double ve = new RedlichKister(293.15, drawn).value(x, 293.15);
                double vm = x * ethanol.molarVolume(293.15) + (1 - x) * water.molarVolume(293.15) + ve;
                double rho = 1000 * (x * ethanol.molarMass() + (1 - x) * water.molarMass()) / vm;
                sum += rho;
                sum2 += rho * rho;
            }
            double sd = Math.sqrt((sum2 - sum * sum / samples) / (samples - 1));
            worstMonteCarlo = Math.max(worstMonteCarlo, Math.abs(sd / uRho - 1));
            // 20,000 draws estimate an SD to about 1/√(2N) = 0.5 %; allow four times that.
            assertEquals(1.0, sd / uRho, 0.02, "Monte Carlo vs linear u(ρ) at x = " + x);
        }
        Figures.note(UncertaintyTest.class,
                "card uncertainty: Monte Carlo vs linear u(ρ), worst relative difference %.4f",
                worstMonteCarlo);
    }

    /** The committed card cards/ethanol-water-covariance.tsv is this fit (it feeds the spreadsheet examples). */
    @Test
    void theCommittedCovarianceCardIsThisFit() {
        Object[][][] f = fit();
        Card made = CardReader.read(fittedCard(false, numbers(f[0]), numbers(f[1])));
        Card committed = TestCards.card("ethanol-water-covariance.tsv");
        for (double x : XS) {
            double[] z = {x, 1 - x};
            assertEquals(CardFunctions.density(made, z, 20, Extrapolation.AS_CARD),
                    CardFunctions.density(committed, z, 20, Extrapolation.AS_CARD), 1e-9);
            double u = CardFunctions.uncertainty(made, "density", -1, z, 20, Extrapolation.AS_CARD);
            assertEquals(u, CardFunctions.uncertainty(committed, "density", -1, z, 20, Extrapolation.AS_CARD),
                    1e-9 * u);
        }
    }

    @Test
    void aCardWithoutCovarianceSaysSo() {
        Card card = TestCards.card("ethanol-water-oiml.tsv");
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> CardFunctions.uncertainty(card, "density", -1, new double[] {0.3, 0.7}, 20,
                        Extrapolation.AS_CARD));
        assertEquals(Problem.NO_COVARIANCE, e.problem());
        assertEquals(Problem.UNKNOWN_QUANTITY, assertThrows(MiscelaException.class,
                () -> CardFunctions.uncertainty(card, "viscosity", -1, new double[] {0.3, 0.7}, 20,
                        Extrapolation.AS_CARD)).problem());
    }
}
