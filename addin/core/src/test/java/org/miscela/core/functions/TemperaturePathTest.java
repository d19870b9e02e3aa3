package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCard;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;

/**
 * The temperature along an order of addition: its end is the batch's own adiabatic result whatever the order, acid
 * into water climbs steadily while water into acid passes a peak well above the end, the energy balance closes with a
 * vessel and with heat removed, and feeds at different temperatures mix as calorimetry says.
 */
class TemperaturePathTest {
    private static final Card WHOLE = BlendHeatCapacityTest.WHOLE;
    private static final Card NBS = BlendHeatCapacityTest.NBS;
    private static final int ACID = 0;
    private static final int WATER = 1;

    private static TemperaturePath path(Card card, int[] order, double[] amounts, double[] t, double vessel,
            double removed) {
        return new TemperaturePath(card, order, amounts, AmountBasis.MOL, t, vessel, removed, Extrapolation.ALLOW, false);
    }

    private static double end(double[][] rows) {
        return rows[rows.length - 1][1];
    }

    /** 1 mol acid and 10 mol water from 25 °C: both orders end at the batch's adiabatic temperature. */
    @Test
    void theEndOfThePathIsTheBatchResultWhateverTheOrder() {
        for (Card card : new Card[] {WHOLE, NBS}) {
            double batch = 25.0 + CardFunctions.adiabaticRise(card, new double[] {1, 10}, AmountBasis.MOL, 25.0,
                    Extrapolation.ALLOW);
            double[][] acidIntoWater = path(card, new int[] {WATER, ACID}, new double[] {10, 1},
                    new double[] {25, 25}, 0, 0).path(20);
            double[][] waterIntoAcid = path(card, new int[] {ACID, WATER}, new double[] {1, 10},
                    new double[] {25, 25}, 0, 0).path(20);
            assertEquals(batch, end(acidIntoWater), 1e-7, card.title());
            assertEquals(batch, end(waterIntoAcid), 1e-7, card.title());
            assertEquals(25.0, acidIntoWater[0][1], 1e-9, "the first charge alone stays at its temperature");
            assertEquals(21, acidIntoWater.length, "the first charge, then 20 points");
            assertEquals(1.0, acidIntoWater[20][0], 1e-12, "the amount added so far: all of the acid");
        }
    }

    /**
     * Acid into water climbs steadily to the end; water into acid passes a peak far above it, near 2 mol water per
     * mol acid (where the heat of solution per unit of heat capacity is largest: the NBS heats and Laliberté's heat
     * capacity put H^E's minimum per mole of blend between x = 0.33 and 0.5).
     */
    @Test
    void theOrderOfAdditionDecidesThePeak() {
        double[][] acidIntoWater = path(WHOLE, new int[] {WATER, ACID}, new double[] {10, 1},
                new double[] {25, 25}, 0, 0).path(40);
        for (int r = 1; r < acidIntoWater.length; r++) {
            assertTrue(acidIntoWater[r][1] >= acidIntoWater[r - 1][1], "acid into water climbs: row " + r);
        }
        TemperaturePath reverse = path(WHOLE, new int[] {ACID, WATER}, new double[] {1, 10},
                new double[] {25, 25}, 0, 0);
        double[] peak = reverse.peak(40);
        double[][] rows = reverse.path(40);
        for (double[] r : rows) {
            assertTrue(peak[1] >= r[1] - 1e-9, "the refined peak is at least every point of the path");
        }
        assertTrue(peak[1] > end(rows) + 60.0, "water into acid peaks far above the end: " + peak[1]);
        assertTrue(peak[0] > 1.5 && peak[0] < 2.6, "the peak lies near 2 mol water per mol acid: " + peak[0]);
        Figures.note(TemperaturePathTest.class, "H2SO4 1 mol + water 10 mol from 25 °C (whole-range card): acid into "
                + "water ends at %.1f °C; water into acid peaks at %.1f °C after %.2f mol water, then ends at %.1f °C",
                end(acidIntoWater), peak[1], peak[0], end(rows));
    }

    /**
     * Removing exactly the heat of mixing keeps the batch at its start temperature (first law); a vessel of heat
     * capacity C takes its share: N·∫Cp dT + C·ΔT = −N·H^E, with the integral from the card's own heat capacity.
     */
    @Test
    void theEnergyBalanceClosesWithAVesselAndHeatRemoved() {
        double mixing = CardFunctions.mixingHeat(WHOLE, new double[] {1, 10}, AmountBasis.MOL, 25.0,
                Extrapolation.ALLOW);
        double[][] cooled = path(WHOLE, new int[] {WATER, ACID}, new double[] {10, 1}, new double[] {25, 25}, 0,
                -mixing).path(10);
        assertEquals(25.0, end(cooled), 1e-6);
        double vessel = 2.0; // kJ/K, the card's energy unit per degree (invented vessel)
        double tf = end(path(WHOLE, new int[] {WATER, ACID}, new double[] {10, 1}, new double[] {25, 25}, vessel, 0)
                .path(5));
        double[] x = {1.0 / 11, 10.0 / 11};
        double warmed = 11 * WHOLE.mixture().heating(x, 298.15, tf + 273.15) / 1000.0 + vessel * (tf - 25.0);
        assertEquals(-mixing, warmed, 1e-6 * Math.abs(mixing));
        double bare = 25.0 + CardFunctions.adiabaticRise(WHOLE, new double[] {1, 10}, AmountBasis.MOL, 25.0,
                Extrapolation.ALLOW);
        assertTrue(tf < bare, "a vessel takes part of the heat");
    }

    /**
     * Two liquids with no heat of mixing, fed at 10 °C and 40 °C, end at the heat-capacity-weighted mean temperature
     * (the method of mixtures of calorimetry, common practice): (1·112·10 + 3·75.3·40)/(1·112 + 3·75.3) °C with
     * constant heat capacities (invented liquids).
     */
    @Test
    void feedsAtDifferentTemperaturesMixAsCalorimetrySays() {
        Card ideal = CardReader.read(TestCard.ternary().set(8, "valid temperature", 270.0, 330.0)
                .row("enthalpy unit", "J/mol")
                .row("heat capacity", "alpha", 112.0)
                .row("heat capacity", "beta", 75.3)
                .row("heat capacity", "gamma", 219.0)
                .row("excess enthalpy A0", "alpha + beta", 0.0)
                .row("excess enthalpy A0", "alpha + gamma", 0.0)
                .row("excess enthalpy A0", "beta + gamma", 0.0).cells());
        double[][] rows = new TemperaturePath(ideal, new int[] {0, 1}, new double[] {1, 3}, AmountBasis.MOL,
                new double[] {283.15, 313.15}, 0, 0, Extrapolation.AS_CARD, false).path(4);
        double expected = (112.0 * 283.15 + 3 * 75.3 * 313.15) / (112.0 + 3 * 75.3);
        assertEquals(expected, end(rows), 1e-6);
        assertEquals(283.15, rows[0][1], 1e-9);
    }

    /**
     * The cooling that keeps a path at a limit: removed over the addition, the path's peak is the limit. Acid into
     * water peaks at its end, so the cooling is the heat of mixing less the heat the batch holds between 25 °C and the
     * limit (first law, with the integral from the card's own heat capacity); water into acid needs more for the same
     * limit, since its heat comes early while the cooling follows the addition.
     */
    @Test
    void theCoolingThatKeepsThePeakAtALimit() {
        int[] acidIntoWater = {WATER, ACID};
        double[] amounts = {10, 1};
        double[] t = {25, 25};
        double q = TemperaturePath.cooling(WHOLE, acidIntoWater, amounts, AmountBasis.MOL, t, 0, Extrapolation.ALLOW,
                false, 60.0, 20);
        assertEquals(60.0, path(WHOLE, acidIntoWater, amounts, t, 0, q).peak(20)[1], 1e-6);
        double mixing = CardFunctions.mixingHeat(WHOLE, new double[] {1, 10}, AmountBasis.MOL, 25.0,
                Extrapolation.ALLOW);
        double held = 11 * WHOLE.mixture().heating(new double[] {1.0 / 11, 10.0 / 11}, 298.15, 333.15) / 1000.0;
        assertEquals(-mixing - held, q, 1e-6 * Math.abs(mixing));
        double reverse = TemperaturePath.cooling(WHOLE, new int[] {ACID, WATER}, new double[] {1, 10}, AmountBasis.MOL,
                t, 0, Extrapolation.ALLOW, false, 60.0, 20);
        assertEquals(60.0, path(WHOLE, new int[] {ACID, WATER}, new double[] {1, 10}, t, 0, reverse).peak(20)[1],
                1e-6);
        assertTrue(reverse > q, "water into acid needs more cooling: " + reverse + " kJ against " + q);
        assertEquals(0.0, TemperaturePath.cooling(WHOLE, acidIntoWater, amounts, AmountBasis.MOL, t, 0,
                Extrapolation.ALLOW, false, 150.0, 20), "a limit above the peak needs no cooling");
        MiscelaException below = assertThrows(MiscelaException.class, () -> TemperaturePath.cooling(WHOLE,
                acidIntoWater, amounts, AmountBasis.MOL, t, 0, Extrapolation.ALLOW, false, 20.0, 20));
        assertEquals(Problem.PATH_LIMIT, below.problem());
        Figures.note(TemperaturePathTest.class, "to stay at or below 60 °C, 1 mol acid into 10 mol water needs %.2f kJ "
                + "removed over the addition, water into acid %.2f kJ", q, reverse);
    }

    @Test
    void whatCannotBeAPathIsRefusedInWords() {
        MiscelaException empty = assertThrows(MiscelaException.class, () -> path(WHOLE, new int[] {WATER, ACID},
                new double[] {0, 1}, new double[] {25, 25}, 0, 0));
        assertEquals(Problem.PATH_EMPTY_VESSEL, empty.problem());
        MiscelaException steps = assertThrows(MiscelaException.class, () -> path(WHOLE, new int[] {WATER, ACID},
                new double[] {10, 1}, new double[] {25, 25}, 0, 0).path(0));
        assertEquals(Problem.PATH_STEPS, steps.problem());
        // the NBS card covers x_acid from 0.0099: the first drops of acid into pure water lie below it
        MiscelaException outside = assertThrows(MiscelaException.class, () -> new TemperaturePath(NBS,
                new int[] {WATER, ACID}, new double[] {10, 1}, AmountBasis.MOL, new double[] {25, 25}, 0, 0,
                Extrapolation.AS_CARD, false).path(20));
        assertEquals(Problem.OUTSIDE_COMPOSITION, outside.problem());
    }
}
