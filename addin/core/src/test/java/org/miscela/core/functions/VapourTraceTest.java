package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;

/**
 * MIX.TRACE's "vapour" quantity: its rows re-derive the phase functions' results by hand. On the Wilson card its Λ at
 * 70 °C are Gmehling et al.'s published 0.154 and 0.888 (Chemical Thermodynamics for Process Simulation, 2012,
 * P05.01a); ln γ from Wilson's equation written out with those Λ, x_k·γ_k·p_k* and their sum are checked against the
 * listed rows and against MIX.ACTIVITY, MIX.BUBBLEPRESSURE and MIX.VAPOURFRACTION.
 */
class VapourTraceTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;

    @Test
    void wilsonRowsByHand() {
        Card c = TestCards.card("ethanol-water-wilson.tsv");
        double x1 = 0.3;
        double x2 = 0.7;
        Map<String, Object> r = rows(CardFunctions.trace(c, new double[] {x1, x2}, 70, PropertyKind.VAPOUR, E));
        assertEquals("Wilson", r.get("activity model"));
        double l12 = (Double) r.get("Lambda at T: ethanol + water");
        double l21 = (Double) r.get("Lambda at T: water + ethanol");
        assertEquals(0.154, l12, 1e-12);
        assertEquals(0.888, l21, 1e-12);
        // Wilson (1964), binary: ln γ1 = −ln(x1 + Λ12·x2) + x2·(Λ12/(x1 + Λ12·x2) − Λ21/(x2 + Λ21·x1))
        double s1 = x1 + l12 * x2;
        double s2 = x2 + l21 * x1;
        double ln1 = -Math.log(s1) + x2 * (l12 / s1 - l21 / s2);
        double ln2 = -Math.log(s2) - x1 * (l12 / s1 - l21 / s2);
        assertEquals(ln1, (Double) r.get("ln activity coefficient: ethanol"), 1e-13);
        assertEquals(ln2, (Double) r.get("ln activity coefficient: water"), 1e-13);
        assertEquals(x1 * ln1 + x2 * ln2, (Double) r.get("excess Gibbs energy G^E/RT"), 1e-13);
        assertEquals(PhaseFunctions.activityCoefficient(c, 0, new double[] {x1, x2}, 70, E),
                (Double) r.get("activity coefficient: ethanol"), 1e-13);
        double p1 = x1 * Math.exp(ln1) * (Double) r.get("vapour pressure: ethanol [kPa]");
        double p2 = x2 * Math.exp(ln2) * (Double) r.get("vapour pressure: water [kPa]");
        assertEquals(p1, (Double) r.get("partial pressure: ethanol [kPa]"), 1e-10);
        assertEquals(p1 + p2, (Double) r.get("bubble pressure [kPa]"), 1e-10);
        assertEquals(PhaseFunctions.bubblePressure(c, new double[] {x1, x2}, 70, E),
                (Double) r.get("bubble pressure [kPa]"), 1e-12);
        assertEquals(p1 / (p1 + p2), (Double) r.get("vapour mole fraction: ethanol"), 1e-13);
        assertEquals(PhaseFunctions.vapourFraction(c, 1, new double[] {x1, x2}, 70, E),
                (Double) r.get("vapour mole fraction: water"), 1e-13);
        assertEquals("Wagner 2.5-5", r.get("vapour pressure form: ethanol"));
        assertEquals("Wagner 3-6", r.get("vapour pressure form: water"));
        assertEquals(Trace.RAOULT, r.get("assumption"));
    }

    /**
     * The Redlich–Kister card: G^E/RT = x1·x2·Σ_k A_k·d^k from the listed A_k at T; an NRTL card (the Redlich–Kister
     * card's G^E rows replaced by an invented NRTL row, for this test only): G_ij = exp(−α·τ_ij) from the listed τ and
     * α, and the NRTL binary ln γ1 = x2²·(τ21·(G21/(x1 + x2·G21))² + τ12·G12/(x2 + x1·G12)²) (Renon and Prausnitz 1968).
     */
    @Test
    void redlichKisterAndNrtlRowsByHand() {
        Card rk = TestCards.card("ethanol-water-vle.tsv");
        Map<String, Object> r = rows(CardFunctions.trace(rk, new double[] {0.4, 0.6}, 50, PropertyKind.VAPOUR, E));
        double d = (Double) r.get("pair argument d: ethanol + water");
        double sum = 0.0;
        for (int k = 0; k < 4; k++) {
            sum += (Double) r.get("A" + k + " at T: ethanol + water [1]") * Math.pow(d, k);
        }
        assertEquals(0.4 * 0.6 * sum, (Double) r.get("excess Gibbs energy G^E/RT"), 1e-13);

        Object[][] cells = TestCards.cells("ethanol-water-vle.tsv");
        java.util.List<Object[]> kept = new java.util.ArrayList<>();
        for (Object[] row : cells) {
            if (!String.valueOf(row[0]).startsWith("excess Gibbs energy")) {
                kept.add(row);
            }
        }
        kept.add(new Object[] {"NRTL", "ethanol + water", 0.1, 1.2, 0.3});
        Card nrtl = CardReader.read(kept.toArray(new Object[0][]));
        double x1 = 0.25;
        double x2 = 0.75;
        Map<String, Object> n = rows(CardFunctions.trace(nrtl, new double[] {x1, x2}, 60, PropertyKind.VAPOUR, E));
        assertEquals("NRTL", n.get("activity model"));
        double t12 = (Double) n.get("tau at T: ethanol + water");
        double t21 = (Double) n.get("tau at T: water + ethanol");
        double a = (Double) n.get("alpha: ethanol + water");
        assertEquals(0.1, t12, 0);
        assertEquals(1.2, t21, 0);
        assertEquals(0.3, a, 0);
        double g12 = Math.exp(-a * t12);
        double g21 = Math.exp(-a * t21);
        assertEquals(g12, (Double) n.get("G at T: ethanol + water"), 1e-15);
        double ln1 = x2 * x2 * (t21 * Math.pow(g21 / (x1 + x2 * g21), 2) + t12 * g12 / Math.pow(x2 + x1 * g12, 2));
        assertEquals(ln1, (Double) n.get("ln activity coefficient: ethanol"), 1e-13);
    }

    private static Map<String, Object> rows(Object[][] trace) {
        Map<String, Object> m = new HashMap<>();
        for (Object[] row : trace) {
            m.put((String) row[0], row[1]);
        }
        return m;
    }
}
