package org.miscela.core.blend;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.MiscelaException;
import org.miscela.reference.Oiml22;

/**
 * The reference temperature of the volume-based bases. OIML R 22 (1975), International Alcoholometric Tables, defines
 * alcoholic strength by volume at 20 °C: the volume of ethanol at 20 °C in 100 volumes of the mixture at 20 °C. So a
 * strength keeps its value whatever the temperature the blend is measured or delivered at; only the reference
 * temperature may change it, and it defaults to 20 °C. Each check compares the card (fitted to the OIML formula within
 * {@link Cards#OIML_DENSITY_TOLERANCE}) with the formula itself ({@link Oiml22}, the test-side transcription).
 */
class StrengthReferenceTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double[] DELIVERY = {5, 10, 15, 20, 25, 30, 35};
    /**
     * Strength tolerance: the card's density error δ = 0.011 kg/m³ moves a strength read from a density by
     * δ/|dρ/dS| (about 0.008 %vol near 40 %vol, where dρ/dS ≈ −1.4 kg/m³ per %vol by the formula) and a strength
     * computed from a composition by 100·p·δ/ρ(1, t) (under 0.001 %vol); 0.01 %vol covers both.
     */
    private static final double STRENGTH_TOLERANCE = 0.01;

    /** The OIML strength at t of the blend of ethanol mass fraction p. */
    static double oimlStrength(double p, double t) {
        return 100 * p * Oiml22.density(p, t) / Oiml22.density(1, t);
    }

    /** The mass fraction whose OIML strength at t is s. */
    static double oimlMassFraction(double s, double t) {
        return new BrentSolver(1e-15, 1e-15).solve(200, p -> oimlStrength(p, t) - s, 0, 1);
    }

    /**
     * A true 40.00 %vol blend (at 20 °C) whose density is read at 5..35 °C: MIX.FROMDENSITY's default basis
     * temperature is now the 20 °C reference, so it answers 40.00 %vol at every delivery temperature; the strength
     * taken at the measurement temperature (the old default) is the OIML formula's strength at that temperature.
     */
    @Test
    void aTrueStrengthReadAtAnyTemperatureStaysTheSame() {
        double p = oimlMassFraction(40.0, 20);
        CompositionBasis byDefault = BlendFunctions.basis(CARD, "%vol", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
        assertEquals(20.0, byDefault.temperature(), 0.0);
        Figures.note(StrengthReferenceTest.class, "%s", "t [°C] | density (OIML) | strength read, basis at t (old default) | OIML strength at t"
                + " | strength read, basis at 20 °C (new default) | OIML");
        for (double t : DELIVERY) {
            double rho = Oiml22.density(p, t);
            double now = BlendFunctions.fromDensity(CARD, rho, t, 0, null, Double.NaN, Double.NaN, byDefault, E);
            CompositionBasis atT = BlendFunctions.basis(CARD, "%vol", t, BlendFunctions.DEFAULT_BALANCE);
            double before = BlendFunctions.fromDensity(CARD, rho, t, 0, null, Double.NaN, Double.NaN, atT, E);
            assertEquals(40.0, now, STRENGTH_TOLERANCE, "t = " + t);
            assertEquals(oimlStrength(p, t), before, STRENGTH_TOLERANCE, "t = " + t);
            Figures.note(StrengthReferenceTest.class, "%5.1f | %.3f | %.3f | %.3f | %.3f | 40.000", t, rho, before, oimlStrength(p, t), now);
        }
        // the figure of the issue: read at 5 °C with the basis at the measurement temperature, 39.76 %vol
        assertEquals(39.76, oimlStrength(p, 5), 0.005);
    }

    /**
     * 2,500 L of "40 %vol" delivered at 12 °C: the ethanol to buy is the OIML blend of strength 40 %vol at 20 °C,
     * 2.5 m³ × ρ(p, 12 °C) × p. Taking the strength at the delivery temperature instead (the old MIX.RECIPE) buys
     * the blend whose strength at 12 °C is 40 %vol.
     */
    @Test
    void aQuoteDeliveredAt12CelsiusBuysTheRightEthanol() {
        double p = oimlMassFraction(40.0, 20);
        double right = 2.5 * Oiml22.density(p, 12) * p;
        double pOld = oimlMassFraction(40.0, 12);
        double old = 2.5 * Oiml22.density(pOld, 12) * pOld;
        CompositionBasis byDefault = BlendFunctions.basis(CARD, "%vol", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
        double[] kg = BlendFunctions.recipe(CARD, 2500, "L", 12, new double[] {40, Double.NaN}, byDefault, null, "kg",
                E);
        CompositionBasis at12 = BlendFunctions.basis(CARD, "%vol", 12, BlendFunctions.DEFAULT_BALANCE);
        double[] kgOld = BlendFunctions.recipe(CARD, 2500, "L", 12, new double[] {40, Double.NaN}, at12, null, "kg",
                E);
        // δ/ρ ≈ 1.2e-5 relative on the mixture's mass, and the strength tolerance over dS/dp ≈ 126 %vol on p
        double tolerance = right * (1.5e-5 + STRENGTH_TOLERANCE / 40.0);
        assertEquals(right, kg[0], tolerance);
        assertEquals(old, kgOld[0], tolerance);
        Figures.note(StrengthReferenceTest.class, "2,500 L of 40 %%vol at 12 °C: ethanol %.3f kg (OIML %.3f) with the 20 °C reference; %.3f kg "
                + "(OIML %.3f) with the strength taken at 12 °C: %+.3f %%%n", kg[0], right, kgOld[0], old,
                100 * (kgOld[0] / kg[0] - 1));
        assertTrue(kgOld[0] > kg[0], "the strength at 12 °C is lower, so it would have bought more ethanol");
    }

    /** A card may state another reference (here 15 °C); its row sets the default of every volume-based basis. */
    @Test
    void theCardsRowSetsTheDefault() {
        Card card15 = withRow(15);
        assertEquals(20.0, CARD.basisReferenceTemperature(), 0.0);
        assertFalse(CARD.statesBasisReference());
        assertEquals(15.0, card15.basisReferenceTemperature(), 1e-12);
        assertTrue(card15.statesBasisReference());
        double p = oimlMassFraction(40.0, 15);
        CompositionBasis byDefault = BlendFunctions.basis(card15, "%vol", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
        assertEquals(15.0, byDefault.temperature(), 1e-12);
        double s = BlendFunctions.fromDensity(card15, Oiml22.density(p, 30), 30, 0, null, Double.NaN, Double.NaN,
                byDefault, E);
        assertEquals(40.0, s, STRENGTH_TOLERANCE);
        // a stated temperature still wins over the card's row
        assertEquals(25.0, BlendFunctions.basis(card15, "g/L", 25, -1).temperature(), 0.0);
    }

    /** The row is version 2 (a version 1 card is refused with the row named), and must be a temperature. */
    @Test
    void theRowNeedsVersion2AndATemperature() {
        MiscelaException v1 = org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class, () -> {
            List<Object[]> rows = new ArrayList<>(Arrays.asList(TestCards.cells("ethanol-water-oiml.tsv")));
            rows.add(new Object[] {"basis reference temperature", 15.0});
            CardReader.read(rows.toArray(new Object[0][]));
        });
        assertTrue(v1.getMessage().contains("basis reference temperature"), v1.getMessage());
        MiscelaException negative = org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class,
                () -> withRow(-300));
        assertTrue(negative.getMessage().contains("basis reference temperature"), negative.getMessage());
    }

    private static Card withRow(double t) {
        List<Object[]> rows = new ArrayList<>();
        for (Object[] r : TestCards.cells("ethanol-water-oiml.tsv")) {
            rows.add(r.clone());
        }
        rows.get(0)[1] = 2.0;
        rows.add(new Object[] {"basis reference temperature", t});
        return CardReader.read(rows.toArray(new Object[0][]));
    }
}
