package org.miscela.reference;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.card.TestCards;
import org.miscela.core.fit.MixtureVolumes;

/**
 * The committed aqueous cards against their tables and against their fitters (a stale card would differ from a fresh
 * fit): NaCl + water after the CRC table of Rogers and Pitzer (1982), H2SO4 + water after the CRC table at 20 °C.
 */
public class AqueousCardsTest {
    private static final Card NACL = TestCards.card("sodium-chloride-water-crc.tsv");
    private static final Card ACID = TestCards.card("sulfuric-acid-water-crc.tsv");
    private static final Extrapolation E = Extrapolation.AS_CARD;

    /**
     * Largest |ρ_card − ρ_table| over the 54 points of the NaCl table, kg/m³. The fit (A0..A6, each cubic in t)
     * reaches 0.0118: a polynomial in x cannot follow the dilute square-root law exactly. The blending tests use
     * this bound.
     */
    public static final double NACL_DENSITY_TOLERANCE = 0.0125;
    /**
     * Largest |ρ_card − ρ_table| over the eight H2SO4 points 1–70 %, kg/m³. The F-test chooses A0..A2 (the step to
     * A3 has p = 0.061), which reaches 0.964 kg/m³, about twenty units of the table's last digit.
     */
    public static final double ACID_DENSITY_TOLERANCE = 1.0;

    @Test
    void sodiumChlorideCardReproducesTheTable() {
        double worst = 0;
        for (int i = 0; i < RogersPitzerNaCl.CELSIUS.length; i++) {
            for (int j = 0; j < RogersPitzerNaCl.MOLALITY.length; j++) {
                double x = RogersPitzerNaCl.moleFraction(RogersPitzerNaCl.MOLALITY[j]);
                double d = CardFunctions.density(NACL, x, RogersPitzerNaCl.CELSIUS[i], E)
                        - RogersPitzerNaCl.density(i, j);
                worst = Math.max(worst, Math.abs(d));
                assertTrue(Math.abs(d) <= NACL_DENSITY_TOLERANCE, "t = " + RogersPitzerNaCl.CELSIUS[i] + ", m = "
                        + RogersPitzerNaCl.MOLALITY[j] + ": " + d);
            }
        }
        Figures.note(AqueousCardsTest.class,
                "NaCl + water card vs CRC/Rogers-Pitzer table: worst density deviation %.4f kg/m³", worst);
    }

    /** The committed card is the fitter's output: its densities agree to rounding on a grid. */
    @Test
    void sodiumChlorideCardIsTheFittersOutput() {
        RedlichKister rk = NaclCardFitter.fit().toRedlichKister();
        org.miscela.core.model.Component[] c = NaclCardFitter.components();
        for (int t = 0; t <= 40; t += 5) {
            for (double m = 0; m <= 5.0; m += 0.25) {
                double x = RogersPitzerNaCl.moleFraction(m);
                double fresh = MixtureVolumes.density(x, t + 273.15, rk.value(x, t + 273.15), c[0], c[1]);
                assertEquals(fresh, CardFunctions.density(NACL, x, t, E), 1e-9, "t = " + t + ", m = " + m);
            }
        }
    }

    /** The table rises with molality at every temperature; so must the card between and below its points. */
    @Test
    void sodiumChlorideDensityRisesWithMolality() {
        for (int t = 0; t <= 40; t += 5) {
            double previous = 0;
            for (int i = 0; i <= 500; i++) {
                double rho = CardFunctions.density(NACL, RogersPitzerNaCl.moleFraction(i / 100.0), t, E);
                assertTrue(rho > previous, "t = " + t + ", m = " + i / 100.0);
                previous = rho;
            }
        }
    }

    /**
     * Infinite-dilution partial molar volume of NaCl at 25 °C: about 16.6 cm³/mol (Millero, Chem. Rev. 71, 147 (1971),
     * from memory, in aqueous-solutions.md). The card has no square-root term and no data below 0.1 mol/kg, so only
     * a loose agreement, 0.5 cm³/mol, is expected.
     */
    @Test
    void sodiumChlorideInfiniteDilutionPartialVolume() {
        double v = CardFunctions.partialMolarVolume(NACL, 0, 0.0, 25, E);
        Figures.note(AqueousCardsTest.class,
                "NaCl card: partial molar volume of NaCl at infinite dilution, 25 °C: %.3f cm³/mol", v);
        assertEquals(16.6, v, 0.5);
    }

    @Test
    void sulfuricAcidCardReproducesTheTable() {
        double worst = 0;
        for (int i = 0; i < SulfuricAcidCardFitter.POINTS; i++) {
            double x = CrcSulfuricAcid.moleFraction(CrcSulfuricAcid.MASS_PERCENT[i] / 100);
            double d = CardFunctions.density(ACID, x, 20, E) - 1000 * CrcSulfuricAcid.DENSITY_G_PER_CM3[i];
            worst = Math.max(worst, Math.abs(d));
            assertTrue(Math.abs(d) <= ACID_DENSITY_TOLERANCE, CrcSulfuricAcid.MASS_PERCENT[i] + " %: " + d);
        }
        Figures.note(AqueousCardsTest.class,
                "H2SO4 + water card vs CRC table at 20 °C: worst density deviation %.3f kg/m³", worst);
        // the pure acid is the table's 100 % value exactly
        assertEquals(1830.5, CardFunctions.pureDensity(ACID, 0, 20, E), 1e-9);
    }

    @Test
    void sulfuricAcidCardIsTheFittersOutput() {
        int order = SulfuricAcidCardFitter.selection().selectedOrder();
        assertEquals(ACID.excessVolume(0, 1).order(), order);
        RedlichKister rk = SulfuricAcidCardFitter.fit(order).toRedlichKister();
        org.miscela.core.model.Component[] c = SulfuricAcidCardFitter.components();
        for (int i = 0; i <= 30; i++) {
            double x = i / 100.0;
            double fresh = MixtureVolumes.density(x, 293.15, rk.value(x, 293.15), c[0], c[1]);
            assertEquals(fresh, CardFunctions.density(ACID, x, 20, E), 1e-9, "x = " + x);
        }
    }
}
