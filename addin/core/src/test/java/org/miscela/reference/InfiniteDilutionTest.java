package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.functions.PhaseFunctions;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/** MIX.ACTIVITYLIMIT: γ_k^∞ against Wilson's closed form and against the limit of MIX.ACTIVITY as x_k → 0. */
class InfiniteDilutionTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final Card WILSON = TestCards.card("ethanol-water-wilson.tsv");
    private static final Card VLE = TestCards.card("ethanol-water-vle.tsv");

    /**
     * J. Gmehling, B. Kolbe, M. Kleiber, J. Rarey, Chemical Thermodynamics for Process Simulation (Wiley-VCH 2012),
     * problem P05.01a: Wilson, ethanol (1) + water (2) at 70 °C, Λ12 = 0.154, Λ21 = 0.888. Wilson's binary limits
     * ln γ1^∞ = 1 − ln Λ12 − Λ21 and ln γ2^∞ = 1 − ln Λ21 − Λ12 give γ1^∞ = 7.26307… and γ2^∞ = 2.62422…; the card
     * (written at 70 °C from those Λ) gives them to 10⁻¹² relative, whatever the other entries of the composition.
     */
    @Test
    void wilsonClosedFormAtSeventyDegrees() {
        double g1 = Math.exp(1 - Math.log(0.154) - 0.888);
        double g2 = Math.exp(1 - Math.log(0.888) - 0.154);
        for (double x1 : new double[] {0.0, 0.4, 0.9}) {
            double[] x = {x1, 1 - x1};
            assertEquals(g1, PhaseFunctions.infiniteDilutionActivity(WILSON, 0, x, 70, E), 1e-12 * g1);
        }
        for (double x1 : new double[] {1.0, 0.4, 0.1}) {
            double[] x = {x1, 1 - x1};
            assertEquals(g2, PhaseFunctions.infiniteDilutionActivity(WILSON, 1, x, 70, E), 1e-12 * g2);
        }
        Figures.note(InfiniteDilutionTest.class, "Wilson 70 C: gamma1inf %.6f (closed form %.6f), gamma2inf %.6f "
                + "(closed form %.6f)", PhaseFunctions.infiniteDilutionActivity(WILSON, 0, new double[] {0, 1}, 70, E),
                g1, PhaseFunctions.infiniteDilutionActivity(WILSON, 1, new double[] {1, 0}, 70, E), g2);
    }

    /**
     * The limit from values of MIX.ACTIVITY alone: ln γ_k at x_k = h, 2h and 3h (h = 10⁻⁵), extrapolated by the
     * quadratic through them to x_k = 0 (3·l(h) − 3·l(2h) + l(3h), error of order h³ times the third derivative; the
     * linear 2·l(h) − l(2h) was 1.6·10⁻⁸ off on the Wilson card, whose ln γ1 curves strongly there), equals
     * ln γ_k^∞; on both cards, at several temperatures, for each component.
     */
    @Test
    void theLimitOfTheActivityCoefficient() {
        double h = 1e-5;
        double worst = 0.0;
        for (Card c : new Card[] {WILSON, VLE}) {
            for (double t : new double[] {35, 60, 95}) {
                for (int k = 0; k < 2; k++) {
                    double l1 = Math.log(PhaseFunctions.activityCoefficient(c, k, dilute(k, h), t, E));
                    double l2 = Math.log(PhaseFunctions.activityCoefficient(c, k, dilute(k, 2 * h), t, E));
                    double l3 = Math.log(PhaseFunctions.activityCoefficient(c, k, dilute(k, 3 * h), t, E));
                    double limit = 3 * l1 - 3 * l2 + l3;
                    double lnInf = Math.log(PhaseFunctions.infiniteDilutionActivity(c, k, new double[] {0.5, 0.5}, t,
                            E));
                    worst = Math.max(worst, Math.abs(limit - lnInf));
                    assertEquals(limit, lnInf, 1e-8, "component " + k + " at " + t);
                }
            }
        }
        Figures.note(InfiniteDilutionTest.class, "limit of ln gamma from values: worst %.3g", worst);
    }

    /** Nothing left to dilute in: refused with words. */
    @Test
    void refusedForThePureComponent() {
        assertEquals(Problem.NO_DILUENT, assertThrows(MiscelaException.class,
                () -> PhaseFunctions.infiniteDilutionActivity(VLE, 0, new double[] {1, 0}, 50, E)).problem());
    }

    private static double[] dilute(int k, double xk) {
        return k == 0 ? new double[] {xk, 1 - xk} : new double[] {1 - xk, xk};
    }
}
