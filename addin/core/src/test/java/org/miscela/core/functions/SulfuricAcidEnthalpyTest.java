package org.miscela.core.functions;

import org.miscela.testing.Figures;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.reference.NbsSulfuricAcid;

/**
 * Heats of mixing and dilution through a sulfuric acid + water card fitted to the NBS integral heats of solution
 * (Wagman et al. 1982; see {@link NbsSulfuricAcid}). The card's Redlich–Kister fit reproduces the table within its
 * printed resolution (0.1 kJ/mol), so that is the tolerance of each tabulated value; a difference of two values
 * carries twice that.
 */
class SulfuricAcidEnthalpyTest {
    static final Card CARD = TestCards.card("sulfuric-acid-water-nbs.tsv");
    static final double T = 25.0;

    @Test
    void integralHeatsOfSolutionMatchTheTable() {
        double worst = 0;
        for (int i = 0; i < 4; i++) {
            double n = NbsSulfuricAcid.WATER_PER_ACID[i];
            double heat = CardFunctions.mixingHeat(CARD, new double[] {1, n}, AmountBasis.MOL, T,
                    Extrapolation.AS_CARD);
            worst = Math.max(worst, Math.abs(heat - NbsSulfuricAcid.heatOfSolution(i)));
            assertEquals(NbsSulfuricAcid.heatOfSolution(i), heat, NbsSulfuricAcid.RESOLUTION, "n = " + n);
        }
        Figures.note(SulfuricAcidEnthalpyTest.class,
                "H2SO4 + water: worst deviation from the NBS integral heats (n = 1..100): %.3f kJ/mol",
                worst);
    }

    /** Diluting 1 mol acid from n = 1 to n = 10: Δ_fH(10) − Δ_fH(1) = −880.5 − (−841.8) = −38.7 kJ (NBS). */
    @Test
    void heatOfDilutionIsTheDifferenceOfTabulatedValues() {
        double heat = CardFunctions.additionHeat(CARD, new double[] {1, 1}, 1, 9, AmountBasis.MOL, T,
                Extrapolation.AS_CARD);
        assertEquals(NbsSulfuricAcid.FORMATION[1] - NbsSulfuricAcid.FORMATION[0], heat,
                2 * NbsSulfuricAcid.RESOLUTION);
        assertTrue(heat < 0, "dilution of the acid releases heat");
    }

    /** The same batch given by mass: 98.072 g acid (1 mol) and 180.15 g water (10 mol, CIAAW molar masses). */
    @Test
    void massBasisGivesTheSameHeat() {
        double byMoles = CardFunctions.mixingHeat(CARD, new double[] {1, 10}, AmountBasis.MOL, T,
                Extrapolation.AS_CARD);
        double byMass = CardFunctions.mixingHeat(CARD, new double[] {0.098072, 0.18015}, AmountBasis.KG, T,
                Extrapolation.AS_CARD);
        assertEquals(byMoles * 1000, byMass * 1000, 1e-9);
        assertEquals(byMoles, CardFunctions.mixingHeat(CARD, new double[] {98.072, 180.15}, AmountBasis.G, T,
                Extrapolation.AS_CARD), 1e-12);
    }

    /**
     * 1 mol acid into 10 mol water with no heat exchanged: with a temperature-independent H^E and constant heat
     * capacities the balance is linear, ΔT = 66.5 kJ / (138.9 + 10·75.29) J/K = 74.6 K (NBS heat of solution, heat
     * capacities from memory). The batch leaves the card's 24.5–25.5 °C range, so the result needs an explicit
     * opt-in.
     */
    @Test
    void adiabaticRiseOfADilution() {
        double[] batch = {1, 10};
        MiscelaException refused = assertThrows(MiscelaException.class,
                () -> CardFunctions.adiabaticRise(CARD, batch, AmountBasis.MOL, T, Extrapolation.AS_CARD));
        assertEquals(Problem.OUTSIDE_FINAL_TEMPERATURE, refused.problem());
        double rise = CardFunctions.adiabaticRise(CARD, batch, AmountBasis.MOL, T, Extrapolation.ALLOW);
        double cp = 138.9 + 10 * 75.29;
        assertEquals(-NbsSulfuricAcid.heatOfSolution(1) * 1000 / cp, rise, NbsSulfuricAcid.RESOLUTION * 1000 / cp);
    }

    /** n = 500 mol water per mol acid lies beyond the fitted range (n ≤ 100): refused, with the limit named. */
    @Test
    void dilutionBeyondTheFittedRangeIsRefused() {
        MiscelaException e = assertThrows(MiscelaException.class, () -> CardFunctions.mixingHeat(CARD,
                new double[] {1, 500}, AmountBasis.MOL, T, Extrapolation.AS_CARD));
        assertEquals(Problem.OUTSIDE_COMPOSITION, e.problem());
        assertTrue(e.getMessage().contains("sulfuric acid"), e.getMessage());
    }

    @Test
    void anEnthalpyOnlyCardRefusesVolumes() {
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> CardFunctions.density(CARD, 0.1, T, Extrapolation.AS_CARD));
        assertEquals(Problem.NO_VOLUME, e.problem());
        assertEquals(CardFunctions.OK, CardFunctions.check(CARD, 0.1, T, Extrapolation.AS_CARD));
    }
}
