package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/**
 * MIX.EXCESSENTROPY and MIX.PARTIALENTROPY, checked from values on {@code invented-gibbs-helmholtz.tsv} (invented
 * values, identity tests only: its excess enthalpy rows are computed from its G^E/RT rows by the Gibbs–Helmholtz
 * relation, so S^E = −(∂G^E/∂T)_x holds exactly there).
 */
class ExcessEntropyTest {
    private static final Card GH = TestCards.card("invented-gibbs-helmholtz.tsv");
    private static final Extrapolation E = Extrapolation.AS_CARD;

    /**
     * S^E = (H^E − G^E)/T against −∂G^E/∂T by a central difference of MIX.EXCESSGIBBS alone (step 0.01 K; G^E is
     * quadratic-times-linear in T, so the difference's truncation is of order 10⁻⁸ J/(mol·K)).
     */
    @Test
    void entropyIsMinusTheTemperatureSlopeOfGibbs() {
        double worst = 0.0;
        for (double t : new double[] {15, 25, 40, 55}) {
            for (double x1 : new double[] {0.05, 0.3, 0.5, 0.8, 0.97}) {
                double[] x = {x1, 1 - x1};
                double s = PhaseFunctions.excessEntropy(GH, -1, x, t, E);
                double h = 0.01;
                double slope = (PhaseFunctions.excessGibbs(GH, -1, x, t + h, E)
                        - PhaseFunctions.excessGibbs(GH, -1, x, t - h, E)) / (2 * h);
                worst = Math.max(worst, Math.abs(s + slope));
                assertEquals(-slope, s, 1e-6, "x1 = " + x1 + ", t = " + t);
            }
        }
        Figures.note(ExcessEntropyTest.class, "S^E against -dG^E/dT: worst %.3g J/(mol K)", worst);
    }

    /**
     * The partials from values: S̄_1^E = S^E + x2·dS^E/dx1 and S̄_2^E = S^E − x1·dS^E/dx1 with the slope a five-point
     * central difference of MIX.EXCESSENTROPY alone (step 10⁻³; S^E is a polynomial of degree 3 in x1, so the
     * difference is exact to rounding), then S^E = Σ x_k·S̄_k^E with the function's own partials.
     */
    @Test
    void partialsFromValuesAndSummability() {
        double worst = 0.0;
        for (double t : new double[] {20, 45}) {
            for (double x1 : new double[] {0.1, 0.3, 0.5, 0.75, 0.9}) {
                double d = 1e-3;
                double slope = (-se(x1 + 2 * d, t) + 8 * se(x1 + d, t) - 8 * se(x1 - d, t) + se(x1 - 2 * d, t))
                        / (12 * d);
                double[] x = {x1, 1 - x1};
                double s = se(x1, t);
                double s1 = PhaseFunctions.excessEntropy(GH, 0, x, t, E);
                double s2 = PhaseFunctions.excessEntropy(GH, 1, x, t, E);
                assertEquals(s + (1 - x1) * slope, s1, 1e-9, "component 1 at x1 = " + x1);
                assertEquals(s - x1 * slope, s2, 1e-9, "component 2 at x1 = " + x1);
                assertEquals(s, x1 * s1 + (1 - x1) * s2, 1e-12);
                worst = Math.max(worst, Math.abs(s + (1 - x1) * slope - s1));
            }
        }
        Figures.note(ExcessEntropyTest.class, "partial S^E against differences of S^E: worst %.3g J/(mol K)", worst);
    }

    /**
     * By hand at 25 °C, the reference temperature of the card's polynomials: g = G^E/RT = x1·x2·(0.9 + 0.2·d) and
     * ∂g/∂T = x1·x2·(−0.004 + 0.001·d), d = x1 − x2, so S^E = −∂(R·T·g)/∂T = −R·(g + T·∂g/∂T).
     */
    @Test
    void byHandAtTheReferenceTemperature() {
        double r = 8.314462618;
        double x1 = 0.3;
        double d = x1 - (1 - x1);
        double g = x1 * (1 - x1) * (0.9 + 0.2 * d);
        double dg = x1 * (1 - x1) * (-0.004 + 0.001 * d);
        double expected = -r * (g + 298.15 * dg);
        assertEquals(expected, PhaseFunctions.excessEntropy(GH, -1, new double[] {x1, 1 - x1}, 25, E), 1e-10);
    }

    /** A card without excess enthalpy, or without G^E, is refused with words. */
    @Test
    void refusedWithoutEitherSection() {
        Card vle = TestCards.card("ethanol-water-vle.tsv");
        Card acid = TestCards.card("sulfuric-acid-water-nbs.tsv");
        double[] x = {0.3, 0.7};
        assertEquals(Problem.NO_ENTHALPY, assertThrows(MiscelaException.class,
                () -> PhaseFunctions.excessEntropy(vle, -1, x, 50, E)).problem());
        assertEquals(Problem.NO_GIBBS, assertThrows(MiscelaException.class,
                () -> PhaseFunctions.excessEntropy(acid, 0, new double[] {0.1, 0.9}, 25, E)).problem());
    }

    private static double se(double x1, double t) {
        return PhaseFunctions.excessEntropy(GH, -1, new double[] {x1, 1 - x1}, t, E);
    }
}
