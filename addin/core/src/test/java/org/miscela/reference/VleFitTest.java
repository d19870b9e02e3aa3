package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.TestCards;
import org.miscela.core.fit.VleFit;
import org.miscela.core.fit.VleFitter;
import org.miscela.core.model.LocalCompositionGibbs;
import org.miscela.core.model.VapourPressure;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/**
 * The vapour–liquid fit (MIX.FITVLE's core) against published data and published model parameters:
 *
 * <ul>
 *   <li>R. C. Pemberton, C. J. Mash, J. Chem. Thermodyn. 10 (1978) 867, ethanol + water at 303.15 K (23 points), and
 *       R. M. Rieder, A. R. Thompson, Ind. Eng. Chem. 41 (1949) 2905, at 101.3 kPa (34 points), as transcribed in
 *       open-source repositories (reference/ethanol-water-vle.tsv names them), with the vapour pressures of the
 *       ethanol + water test card (Wagner and Pruß 1993 for water, Poling et al.'s Wagner constants for ethanol);</li>
 *   <li>J. Gmehling, B. Kolbe, M. Kleiber, J. Rarey, Chemical Thermodynamics for Process Simulation (Wiley-VCH 2012),
 *       problems P05.01a and P05.01b: ethanol + water at 70 °C by Wilson (Λ12 = 0.154, Λ21 = 0.888) and NRTL
 *       (τ12 = −0.178, τ21 = 1.963, α = 0.2974), with γ1 = 1.8814926 and 1.9363184 at x1 = 0.252 (as transcribed in
 *       the thermo library's tests).</li>
 * </ul>
 */
class VleFitTest {
    private static final Card CARD = TestCards.card("ethanol-water-vle.tsv");
    private static final VapourPressure ETHANOL = CARD.vapourPressure(0);
    private static final VapourPressure WATER = CARD.vapourPressure(1);
    /** Molar volumes for Wilson's Λ, cm³/mol: any pair does for the round trips, which recover Λ itself. */
    private static final double[] VOLUMES = {58.68, 18.07};

    /** One data set of reference/ethanol-water-vle.tsv as columns x1, y1, T (K), p (Pa). */
    static double[][] set(String name) {
        List<double[]> out = new ArrayList<>();
        for (String[] r : VleCardFitter.rows()) {
            if (r[0].equals(name)) {
                out.add(new double[] {Double.parseDouble(r[3]), Double.parseDouble(r[4]), Double.parseDouble(r[2]),
                    1000 * Double.parseDouble(r[1])});
            }
        }
        double[][] t = new double[4][out.size()];
        for (int i = 0; i < out.size(); i++) {
            for (int j = 0; j < 4; j++) {
                t[j][i] = out.get(i)[j];
            }
        }
        return t;
    }

    private static VleFitter fitter(VleFitter.Model model, int order, double alpha, double[][] d, boolean withY) {
        return new VleFitter(model, order, 0, 298.15, alpha, model == VleFitter.Model.WILSON ? VOLUMES : null,
                ETHANOL, WATER, d[0], withY ? d[1] : null, d[2], d[3], null);
    }

    @Test
    void pembertonMashIsothermIsReproduced() {
        double[][] d = set("isothermal");
        VleFitter f = fitter(VleFitter.Model.REDLICH_KISTER, 4, 0, d, true);
        VleFit fit = f.fit();
        double[] p = fit.relativePressureDeviation();
        double[] y = fit.vapourDeviation();
        double[] point = f.pointTest();
        double[] area = f.areaTest();
        Figures.note(VleFitTest.class, "%s", String.format(Locale.ROOT, "Pemberton and Mash 1978, 303.15 K, %d points, "
                + "Redlich-Kister A0..A4 fitted to p and y: p within %.3f %% rms (largest %.3f %%), y within %.4f "
                + "mean (largest %.4f); point test mean |dy| %.4f, area test D = %.2f", fit.points(), 100 * p[0],
                100 * p[1], y[0], y[1], point[0], area[2]));
        assertEquals(23, fit.points());
        assertTrue(p[0] < 0.002 && p[1] < 0.005, Arrays.toString(p));
        assertTrue(y[0] < 0.002, Arrays.toString(y));
        // A0 of G^E/RT near 1.2 at 30 °C: the value the card fitted through G^E/RT points also has (VleCardTest)
        assertEquals(1.2, fit.parameters()[0], 0.02);
        assertTrue(point[0] < VleFitter.POINT_TEST_LIMIT, "point test " + point[0]);
        assertTrue(area[2] - area[3] < VleFitter.AREA_TEST_LIMIT, "area test " + Arrays.toString(area));
        // isothermal: J is zero
        assertEquals(0.0, area[3], 0.0);
    }

    @Test
    void riederThompsonIsobarIsReproducedByEachModel() {
        double[][] d = set("isobaric-rieder");
        StringBuilder note = new StringBuilder("Rieder and Thompson 1949, 101.3 kPa, 34 points:");
        for (VleFitter.Model m : VleFitter.Model.values()) {
            VleFitter f = fitter(m, 2, 0.3, d, true);
            VleFit fit = f.fit();
            double[] p = fit.relativePressureDeviation();
            double[] y = fit.vapourDeviation();
            note.append(String.format(Locale.ROOT, " %s p %.2f %% rms, y %.4f mean;", m.word(), 100 * p[0], y[0]));
            // 1 % in p is about 0.3 K in the boiling temperature near 90 °C
            assertTrue(p[0] < 0.01, m + " " + Arrays.toString(p));
            assertTrue(y[0] < 0.01, m + " " + Arrays.toString(y));
        }
        VleFitter f = fitter(VleFitter.Model.WILSON, 0, 0, d, true);
        double[] point = f.pointTest();
        double[] area = f.areaTest();
        note.append(String.format(Locale.ROOT, " point test mean |dy| %.4f (largest %.4f); area test D = %.2f, "
                + "J = %.2f", point[0], point[1], area[2], area[3]));
        Figures.note(VleFitTest.class, "%s", note.toString());
        assertTrue(point[0] < VleFitter.POINT_TEST_LIMIT);
        // J = 150·(372.45 − 351.45)/351.45 from the data's own boiling range
        assertEquals(150 * (372.45 - 351.45) / 351.45, area[3], 0.2);
    }

    /** p and y at 70 °C over nine compositions, from the published parameters by modified Raoult's law. */
    private static double[][] synthetic(LocalCompositionGibbs model) {
        double t = 343.15;
        double[][] d = new double[4][9];
        for (int i = 0; i < 9; i++) {
            double x = 0.1 * (i + 1);
            double[] lg = new double[2];
            model.partials(new double[] {x, 1 - x}, t, false, lg);
            double p1 = x * Math.exp(lg[0]) * ETHANOL.pascal(t);
            double p2 = (1 - x) * Math.exp(lg[1]) * WATER.pascal(t);
            d[0][i] = x;
            d[1][i] = p1 / (p1 + p2);
            d[2][i] = t;
            d[3][i] = p1 + p2;
        }
        return d;
    }

    private static double gamma1(LocalCompositionGibbs model, double x) {
        double[] lg = new double[2];
        model.partials(new double[] {x, 1 - x}, 343.15, false, lg);
        return Math.exp(lg[0]);
    }

    @Test
    void barkerRecoversThePublishedWilsonParameters() {
        double t = 343.15;
        // Λ12 = (V2/V1)·exp(−a12/T): the a that give Gmehling et al.'s Λ at 70 °C with these volumes
        double a12 = -t * Math.log(0.154 * VOLUMES[0] / VOLUMES[1]);
        double a21 = -t * Math.log(0.888 * VOLUMES[1] / VOLUMES[0]);
        LocalCompositionGibbs published = wilson(a12, a21);
        assertEquals(1.8814926, gamma1(published, 0.252), 5e-8);
        VleFit fit = fitter(VleFitter.Model.WILSON, 0, 0, synthetic(published), false).fit();
        double[] a = fit.parameters();
        assertEquals(a12, a[0], 1e-4);
        assertEquals(a21, a[1], 1e-4);
        assertEquals(1.8814926, gamma1(wilson(a[0], a[1]), 0.252), 5e-8);
        assertTrue(fit.relativePressureDeviation()[1] < 1e-9);
    }

    private static LocalCompositionGibbs wilson(double a12, double a21) {
        return LocalCompositionGibbs.wilson(VOLUMES, new double[][] {{0, a12}, {a21, 0}}, new double[2][2],
                new double[2][2], new boolean[2][2]);
    }

    @Test
    void fitToPAndYRecoversThePublishedNrtlParameters() {
        double t = 343.15;
        // τ = B/T with B = τ·T reproduces P05.01b's τ at 70 °C
        LocalCompositionGibbs published = nrtl(-0.178 * t, 1.963 * t);
        assertEquals(1.9363184, gamma1(published, 0.252), 5e-8);
        VleFit fit = fitter(VleFitter.Model.NRTL, 0, 0.2974, synthetic(published), true).fit();
        double[] b = fit.parameters();
        assertEquals(-0.178, b[0] / t, 1e-7);
        assertEquals(1.963, b[1] / t, 1e-7);
        assertEquals(1.9363184, gamma1(nrtl(b[0], b[1]), 0.252), 5e-8);
    }

    private static LocalCompositionGibbs nrtl(double b12, double b21) {
        return LocalCompositionGibbs.nrtl(new double[2][2], new double[][] {{0, b12}, {b21, 0}},
                new double[][] {{0, 0.2974}, {0.2974, 0}}, new boolean[2][2]);
    }

    @Test
    void thePointTestFailsDataWhoseVapourDisagreesWithTheirPressures() {
        // the Pemberton and Mash isotherm with every y moved 0.03 towards ethanol: pressures and vapours now
        // contradict each other, which the point test must see (the pressures alone still fit as before)
        double[][] d = set("isothermal");
        for (int i = 0; i < d[1].length; i++) {
            d[1][i] = Math.min(0.999, d[1][i] + 0.03);
        }
        double[] point = fitter(VleFitter.Model.REDLICH_KISTER, 4, 0, d, true).pointTest();
        assertTrue(point[0] > VleFitter.POINT_TEST_LIMIT, "point test " + point[0]);
    }

    @Test
    void refusalsSayWhy() {
        double[][] d = set("isothermal");
        assertEquals(Problem.VLE_FIT_UNDETERMINED, assertThrows(MiscelaException.class,
                () -> new VleFitter(VleFitter.Model.REDLICH_KISTER, 2, 1, 303.15, 0, null, ETHANOL, WATER, d[0],
                        d[1], d[2], d[3], null).fit()).problem());
        assertEquals(Problem.CONSISTENCY_NEEDS_VAPOUR, assertThrows(MiscelaException.class,
                () -> fitter(VleFitter.Model.WILSON, 0, 0, d, false).pointTest()).problem());
        assertEquals(Problem.NRTL_ALPHA, assertThrows(MiscelaException.class,
                () -> fitter(VleFitter.Model.NRTL, 0, 0, d, true)).problem());
        assertEquals(Problem.UNKNOWN_GIBBS_MODEL, assertThrows(MiscelaException.class,
                () -> VleFitter.Model.lookup("UNIQUAC")).problem());
        assertEquals(VleFitter.Model.REDLICH_KISTER, VleFitter.Model.lookup(" redlich–kister "));
        double[][] few = {{0.3}, {0.6}, {303.15}, {9000}};
        assertEquals(Problem.TOO_FEW_POINTS, assertThrows(MiscelaException.class,
                () -> fitter(VleFitter.Model.REDLICH_KISTER, 2, 0, few, false).fit()).problem());
    }
}
