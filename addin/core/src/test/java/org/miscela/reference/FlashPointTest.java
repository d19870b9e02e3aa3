package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardEdits;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.functions.FlashPoints;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/**
 * The flash point of ethanol + water by Liaw's model on the ethanol + water phase-equilibrium test card, whose flash
 * point rows give ethanol's from NFPA 497 (2008), 286.15 K (13 °C), as transcribed (the transcription carries no
 * method column; the table's values are closed-cup), and water as not flashing.
 */
class FlashPointTest {
    private static final Card CARD = TestCards.card("ethanol-water-vle.tsv");
    private static final Extrapolation ALLOW = Extrapolation.ALLOW;

    /**
     * The flash points of aqueous ethanol listed (10 to 96 % by volume; method not stated) in the table of the
     * Wikipedia article "Ethanol" as quoted in a public mailing-list post: a rough plausibility check only, no
     * closed-cup reference. Mole fractions are the data researcher's conversion of the volume percentages (CRC
     * densities at 20 °C). The card's G^E was fitted at 30 to 100 °C: below 30 °C the card is extrapolated, allowed
     * here explicitly.
     */
    @Test
    void aqueousEthanolAgainstTheListedFlashPoints() {
        double[][] listed = {{0.0330, 49}, {0.0703, 36}, {0.1132, 29}, {0.1634, 26}, {0.2237, 24}, {0.2983, 22},
            {0.3935, 21}, {0.5200, 20}, {0.7004, 17}, {0.8567, 17}};
        StringBuilder note = new StringBuilder("ethanol + water flash point, x1: listed / activity / ideal (C):");
        double worstActivity = 0;
        double worstIdeal = 0;
        for (double[] p : listed) {
            double[] x = {p[0], 1 - p[0]};
            double withGamma = FlashPoints.flashPoint(CARD, x, false, ALLOW);
            double ideal = FlashPoints.flashPoint(CARD, x, true, ALLOW);
            note.append(String.format(Locale.ROOT, " %.4f: %.0f / %.1f / %.1f;", p[0], p[1], withGamma, ideal));
            worstActivity = Math.max(worstActivity, Math.abs(withGamma - p[1]));
            worstIdeal = Math.max(worstIdeal, Math.abs(ideal - p[1]));
            // the activity coefficients lower the flash point: ethanol's γ > 1 in water
            assertTrue(withGamma < ideal, "γ > 1 lowers the flash point at x1 = " + p[0]);
        }
        Figures.note(FlashPointTest.class, "%s worst |activity - listed| %.1f K, worst |ideal - listed| %.1f K",
                note.toString(), worstActivity, worstIdeal);
        assertTrue(worstActivity < 4.0, "within a few kelvin of the listed values: " + worstActivity);
        assertTrue(worstActivity < worstIdeal, "closer than the ideal-solution estimate");
    }

    @Test
    void pureEthanolFlashesAtItsOwnFlashPoint() {
        assertEquals(13.0, FlashPoints.flashPoint(CARD, new double[] {1, 0}, false, ALLOW), 1e-8);
    }

    @Test
    void refusalsSayWhy() {
        Card noWater = CardReader.read(CardEdits.apply(TestCards.cells("ethanol-water-vle.tsv"),
                "set 24 = note | the water's flash point row taken out"));
        assertEquals(Problem.NO_FLASH_POINT_ROW, assertThrows(MiscelaException.class,
                () -> FlashPoints.flashPoint(noWater, new double[] {0.3, 0.7}, false, ALLOW)).problem());
        // a liquid absent from the blend needs no row: pure ethanol on that card flashes at its own 13 °C
        assertEquals(13.0, FlashPoints.flashPoint(noWater, new double[] {1, 0}, false, ALLOW), 1e-8);
        assertEquals(Problem.NOT_FLAMMABLE, assertThrows(MiscelaException.class,
                () -> FlashPoints.flashPoint(CARD, new double[] {0, 1}, false, ALLOW)).problem());
        assertEquals(Problem.NO_FLASH_MINIMUM, assertThrows(MiscelaException.class,
                () -> FlashPoints.minimum(CARD, false, false, ALLOW)).problem());
        // without G^E the card cannot give γ: refused, never the ideal solution in silence; asked for, the ideal
        Card noGibbs = CardReader.read(CardEdits.apply(TestCards.cells("ethanol-water-vle.tsv"), "set 18 = note | x; "
                + "set 19 = note | x; set 20 = note | x; set 21 = note | x; set 22 = note | x; add missing pairs "
                + "| ideal"));
        assertEquals(Problem.NO_GIBBS, assertThrows(MiscelaException.class,
                () -> FlashPoints.flashPoint(noGibbs, new double[] {0.3, 0.7}, false, ALLOW)).problem());
        assertEquals(FlashPoints.flashPoint(CARD, new double[] {0.3, 0.7}, true, ALLOW),
                FlashPoints.flashPoint(noGibbs, new double[] {0.3, 0.7}, true, ALLOW), 1e-9);
    }

    /**
     * Minimum flash point behaviour on an invented card (two flammable liquids with a strong positive deviation,
     * invented values marked so on the card): the blend found flashes below both pure liquids, its flash point is the
     * flash point of that composition, and no composition of a scan flashes lower. The ideal solution of the same
     * liquids has no minimum (its flash point runs between the pure ones).
     */
    @Test
    void aMinimumFlashPointIsFoundWhereItIs() {
        Card c = TestCards.card("invented-flash-minimum.tsv");
        Extrapolation e = Extrapolation.AS_CARD;
        double x1 = FlashPoints.minimum(c, false, false, e);
        double t = FlashPoints.minimum(c, true, false, e);
        assertEquals(FlashPoints.flashPoint(c, new double[] {x1, 1 - x1}, false, e), t, 1e-9);
        assertTrue(t < 15 && t < 25, "below both pure flash points: " + t);
        for (int s = 1; s < 100; s++) {
            double x = s / 100.0;
            assertTrue(FlashPoints.flashPoint(c, new double[] {x, 1 - x}, false, e) >= t - 1e-7, "x1 = " + x);
        }
        MiscelaException noMinimum = assertThrows(MiscelaException.class,
                () -> FlashPoints.minimum(c, false, true, e));
        assertEquals(Problem.NO_FLASH_MINIMUM, noMinimum.problem());
        // the refusal names the liquid that flashes lower on its own, solvent P at 15 °C
        assertTrue(noMinimum.getMessage().contains("solvent P") && noMinimum.getMessage().contains("15"),
                noMinimum.getMessage());
        // a pure liquid's flash point outside the range its vapour-pressure constants state: refused
        Card narrow = CardReader.read(CardEdits.apply(TestCards.cells("invented-flash-minimum.tsv"),
                "set 15 = vapour pressure | solvent P | Antoine | 6.2 | 1300 | 230 | 20 | 60"));
        assertEquals(Problem.OUTSIDE_VAPOUR_PRESSURE, assertThrows(MiscelaException.class,
                () -> FlashPoints.flashPoint(narrow, new double[] {0.5, 0.5}, false, e)).problem());

        Figures.note(FlashPointTest.class, "invented minimum flash point: x1 = %.4f, %.2f C (pure 15 and 25 C)", x1, t);
    }

    /**
     * A liquid given by its lower flammable limit instead of a flash point: ethanol's 3.3 % by volume in air (a common
     * handbook value, from memory) puts pure ethanol's vapour at that limit at the temperature the card's vapour
     * pressure gives for 3.3 % of 1 atm, a little below its closed-cup flash point of 13 °C (NFPA 497), as closed-cup
     * flash points lie above the lower-limit temperature; a blend's estimate follows the same rule.
     */
    @Test
    void aLowerFlammableLimitStandsInForAFlashPoint() {
        Card lfl = CardReader.read(CardEdits.apply(TestCards.cells("ethanol-water-vle.tsv"),
                "set 23 = lower flammable limit | ethanol | 3.3 | % by volume"));
        double pure = FlashPoints.flashPoint(lfl, new double[] {1, 0}, false, ALLOW);
        assertEquals(0.033 * 101.325, lfl.vapourPressure(0).pascal(pure + 273.15) / 1000, 1e-9);
        assertTrue(pure < 13 && pure > 13 - 5, "a few kelvin below the closed-cup flash point: " + pure);
        double blend = FlashPoints.flashPoint(lfl, new double[] {0.1634, 0.8366}, false, ALLOW);
        assertTrue(blend < FlashPoints.flashPoint(CARD, new double[] {0.1634, 0.8366}, false, ALLOW));
        Figures.note(FlashPointTest.class, "from the lower flammable limit 3.3 %% vol: pure ethanol %.2f C, "
                + "40 %% vol %.2f C", pure, blend);
    }
}
