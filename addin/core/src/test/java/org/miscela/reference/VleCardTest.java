package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.functions.PhaseFunctions;

/**
 * The ethanol + water phase-equilibrium card (G^E/RT fitted to Pemberton and Mash's 303.15 K isotherm and Rieder and
 * Thompson's 101.3 kPa isobar, see {@link VleCardFitter}) against data it was not fitted to: Kurihara et al., J. Chem.
 * Eng. Data 40 (1995) 679, at 323.15 K; Kirschbaum and Gerstner (1939) at 98.66 kPa; the azeotrope at 1 atm; and the
 * pure liquids' normal boiling points (CRC Handbook) and water's vapour pressure by Wagner and Pruß (J. Phys. Chem.
 * Ref. Data 22 (1993) 783). Data as transcribed in open-source repositories (reference/ethanol-water-vle.tsv names
 * each). Measured deviations are in the comments; the tolerances are a little wider.
 */
class VleCardTest {
    private static final Card VLE = TestCards.card("ethanol-water-vle.tsv");
    private static final Extrapolation E = Extrapolation.AS_CARD;

    /** The fitter writes today what is committed (no hand edits), all three cards. */
    @Test
    void theCardsAreTheirFittersOutput() throws java.io.IOException {
        try (java.io.InputStream in = VleCardTest.class.getResourceAsStream("/cards/ethanol-water-vle.tsv")) {
            assertEquals(VleCardFitter.card(), new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8));
        }
        try (java.io.InputStream in = VleCardTest.class.getResourceAsStream("/cards/ethanol-water-wilson.tsv")) {
            assertEquals(VleCardFitter.wilsonCard(), new String(in.readAllBytes(),
                    java.nio.charset.StandardCharsets.UTF_8));
        }
        try (java.io.InputStream in = VleCardTest.class.getResourceAsStream("/cards/ethanol-water-vle-ice.tsv")) {
            assertEquals(VleCardFitter.iceCard(), new String(in.readAllBytes(),
                    java.nio.charset.StandardCharsets.UTF_8));
        }
        // the library's phase-equilibrium card is the same card, shipped
        try (java.io.InputStream in = VleCardTest.class.getResourceAsStream(
                "/org/miscela/core/library/ethanol-water-vle.tsv")) {
            assertEquals(VleCardFitter.iceCard(), new String(in.readAllBytes(),
                    java.nio.charset.StandardCharsets.UTF_8));
        }
    }

    /**
     * The azeotrope at 101.325 kPa by the Wilson card (Gmehling et al.'s 70 °C parameters, see
     * {@link VleCardFitter#wilsonCard}) against the published one, 78.17 °C at x1 = 0.8947 (Evans 1916 as cited, see
     * {@link #azeotropeAndBoilingPoints}): measured x1 = 0.9007 (+0.006) at 78.13 °C (−0.04 K); asserted within 0.01
     * and 0.1 K. There the vapour is the liquid (an identity, 10⁻⁹). The Redlich–Kister card, whose ethanol-rich end
     * its data fix poorly, finds two such compositions and is refused rather than asked to choose.
     */
    @Test
    void azeotrope() {
        Card wilson = TestCards.card("ethanol-water-wilson.tsv");
        double x1 = PhaseFunctions.azeotrope(wilson, 101.325, false, E);
        double t = PhaseFunctions.azeotrope(wilson, 101.325, true, E);
        assertEquals(0.8947, x1, 0.01);
        assertEquals(78.17, t, 0.1);
        assertEquals(x1, PhaseFunctions.vapourFraction(wilson, 0, new double[] {x1, 1 - x1}, t, E), 1e-9);
        assertEquals(org.miscela.core.problem.Problem.SEVERAL_AZEOTROPES, org.junit.jupiter.api.Assertions
                .assertThrows(org.miscela.core.problem.MiscelaException.class,
                        () -> PhaseFunctions.azeotrope(VLE, 101.325, false, E)).problem());
    }

    /** Kurihara et al. 1995, 323.15 K: p within 1.6 % (measured 1.45 % at x1 = 0.18) and y1 within 0.02 (0.012). */
    @Test
    void kuriharasIsotherm() {
        int n = 0;
        for (String[] r : VleCardFitter.rows()) {
            if (!r[0].equals("isothermal-kurihara")) {
                continue;
            }
            double x1 = Double.parseDouble(r[3]);
            double[] x = {x1, 1 - x1};
            double p = PhaseFunctions.bubblePressure(VLE, x, 50, E);
            double y = PhaseFunctions.vapourFraction(VLE, 0, x, 50, E);
            assertEquals(Double.parseDouble(r[1]), p, 0.016 * p, "p at x1 = " + x1);
            assertEquals(Double.parseDouble(r[4]), y, 0.02, "y1 at x1 = " + x1);
            n++;
        }
        assertEquals(4, n);
    }

    /**
     * Kirschbaum and Gerstner 1939, 98.66 kPa: bubble point within 1.6 K (measured: up to 1.52 K low below 6 mol % ethanol,
     * within 0.64 K above) and y1 within 0.035 (measured 0.034, at the same points).
     */
    @Test
    void kirschbaumsIsobar() {
        int n = 0;
        for (String[] r : VleCardFitter.rows()) {
            if (!r[0].equals("isobaric-kirschbaum")) {
                continue;
            }
            double x1 = Double.parseDouble(r[3]);
            double t = Double.parseDouble(r[2]) - 273.15;
            double[] x = {x1, 1 - x1};
            double bubble = PhaseFunctions.bubblePoint(VLE, x, Double.parseDouble(r[1]), E);
            assertEquals(t, bubble, x1 < 0.06 ? 1.6 : 0.7, "T at x1 = " + x1);
            assertEquals(Double.parseDouble(r[4]), PhaseFunctions.vapourFraction(VLE, 0, x, bubble, E), 0.035,
                    "y1 at x1 = " + x1);
            n++;
        }
        assertTrue(n >= 15, n + " points");
    }

    /**
     * The azeotrope at 101.325 kPa, 78.17 °C at 95.6 % w/w ethanol (x1 = 0.8947) (Evans 1916 as cited on a reference
     * page; the citation's details are from memory): the card's bubble point there within 0.2 K (measured 78.31 °C,
     * +0.14 K) and its vapour within 0.005 of the liquid (measured 0.0003). Ethanol's normal boiling point 351.44 K (CRC Handbook, as copied in the data note): within
     * 0.2 K. Water by Wagner and Pruß's own check value, 101.325 kPa at 373.1243 K: within 0.5 Pa.
     */
    @Test
    void azeotropeAndBoilingPoints() {
        double[] az = {0.8947, 0.1053};
        double t = PhaseFunctions.bubblePoint(VLE, az, 101.325, E);
        assertEquals(78.17, t, 0.2);
        assertEquals(0.8947, PhaseFunctions.vapourFraction(VLE, 0, az, t, E), 0.005);
        assertEquals(351.44 - 273.15, PhaseFunctions.bubblePoint(VLE, new double[] {1, 0}, 101.325, E), 0.2);
        assertEquals(101325, VLE.mixture().vapourPressure(1, 373.1243), 0.5);
    }

    /**
     * The dew point of the vapour over a bubbling liquid is that liquid's bubble point (an identity of the two
     * searches, 10⁻⁶ K); and against Kirschbaum and Gerstner's 98.66 kPa data, the dew point of each measured vapour
     * within 0.6 K of the measured temperature (measured: 0.47 K at most below 6 mol % ethanol in the liquid, 0.54
     * above).
     */
    @Test
    void dewPoints() {
        for (double x1 : new double[] {0.02, 0.1, 0.3, 0.6, 0.85, 0.95}) {
            double[] x = {x1, 1 - x1};
            double tb = PhaseFunctions.bubblePoint(VLE, x, 101.325, E);
            double y1 = PhaseFunctions.vapourFraction(VLE, 0, x, tb, E);
            assertEquals(tb, PhaseFunctions.dewPoint(VLE, new double[] {y1, 1 - y1}, 101.325, E), 1e-6, "x1 = " + x1);
        }
        int n = 0;
        for (String[] r : VleCardFitter.rows()) {
            if (r[0].equals("isobaric-kirschbaum")) {
                double x1 = Double.parseDouble(r[3]);
                double y1 = Double.parseDouble(r[4]);
                double td = PhaseFunctions.dewPoint(VLE, new double[] {y1, 1 - y1}, Double.parseDouble(r[1]), E);
                assertEquals(Double.parseDouble(r[2]) - 273.15, td, 0.6, "y1 = " + y1 + " (x1 = " + x1 + ")");
                n++;
            }
        }
        assertTrue(n >= 15);
    }

    /** G^E = Σ x_k·Ḡ_k^E and Ḡ_k^E = R·T·ln γ_k (R = 8.314462618 J/(mol·K), exact in the 2019 SI). */
    @Test
    void excessGibbsEnergies() {
        for (double x1 : new double[] {0.05, 0.3, 0.7, 0.95}) {
            double[] x = {x1, 1 - x1};
            double g = PhaseFunctions.excessGibbs(VLE, -1, x, 50, E);
            double g1 = PhaseFunctions.excessGibbs(VLE, 0, x, 50, E);
            double g2 = PhaseFunctions.excessGibbs(VLE, 1, x, 50, E);
            assertEquals(g, x1 * g1 + (1 - x1) * g2, 1e-9);
            assertEquals(8.314462618 * 323.15 * Math.log(PhaseFunctions.activityCoefficient(VLE, 0, x, 50, E)), g1,
                    1e-9);
            assertTrue(g > 0, "ethanol + water has a positive G^E");
        }
    }
}
