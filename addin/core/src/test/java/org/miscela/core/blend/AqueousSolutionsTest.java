package org.miscela.core.blend;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.reference.AqueousCardsTest;
import org.miscela.reference.CrcSulfuricAcid;
import org.miscela.reference.RogersPitzerNaCl;

/**
 * Concentration bases of aqueous solutions against their tables: NaCl molality ↔ molarity against the CRC table
 * after Rogers and Pitzer (1982) (c = m·ρ/(1000 + m·M) with the table's own ρ = 1/v), and H2SO4 mass fraction ↔
 * density and molarity against the CRC table at 20 °C.
 */
class AqueousSolutionsTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final CompositionBasis MOLALITY = CompositionBasis.molality(1);
    private static final CompositionBasis MASS = CompositionBasis.massFraction();

    /**
     * At fixed composition c ∝ ρ, so the molarity errs relatively as the card's density does: at most
     * 0.0125 kg/m³ over ρ (the card's fit, AqueousCardsTest); the table's six decimals add 5e-7 relative.
     */
    @Test
    void sodiumChlorideMolalityToMolarityFollowsTheTable() {
        double worst = 0;
        for (int i = 0; i < RogersPitzerNaCl.CELSIUS.length; i++) {
            double t = RogersPitzerNaCl.CELSIUS[i];
            for (int j = 0; j < RogersPitzerNaCl.MOLALITY.length; j++) {
                double m = RogersPitzerNaCl.MOLALITY[j];
                double rho = RogersPitzerNaCl.density(i, j);
                double table = RogersPitzerNaCl.molarity(m, rho);
                double card = Compositions.convert(Cards.SODIUM_CHLORIDE, new double[] {m, Double.NaN}, MOLALITY,
                        CompositionBasis.molarity(t, 1), E)[0];
                double relative = (card - table) / table;
                worst = Math.max(worst, Math.abs(relative));
                assertEquals(0, relative, AqueousCardsTest.NACL_DENSITY_TOLERANCE / rho + 5e-7,
                        "t = " + t + ", m = " + m);
            }
        }
        Figures.note(AqueousSolutionsTest.class,
                "NaCl molality -> molarity vs table, 0-40 °C, 0.1-5 mol/kg: worst relative %.2e", worst);
    }

    /** 1.000 mol/kg at 25 °C: ρ = 1/0.965038 g/cm³ (aqueous-solutions.md) → c = 1036.229/1058.44 = 0.979015 mol/L. */
    @Test
    void oneMolalAt25Celsius() {
        double c = Compositions.convert(Cards.SODIUM_CHLORIDE, new double[] {1.0, Double.NaN}, MOLALITY,
                CompositionBasis.molarity(25, 1), E)[0];
        double table = 1.0 * (1000 / 0.965038) / (1000 + 58.44);
        assertEquals(0.979015, table, 5e-7);
        assertEquals(table, c, table * (AqueousCardsTest.NACL_DENSITY_TOLERANCE / 1036.2 + 5e-7));
    }

    /**
     * Molarity → molality needs the solve for the water's share. With c = m·ρ/(1000 + m·M),
     * d ln c/d ln m = 1 + (m/ρ)·dρ/dm − m·M/(1000 + m·M) ≥ 0.9 on the table (at 5 mol/kg: 1 + 0.126 − 0.226),
     * so a relative density error ε gives a relative molality error below ε/0.9; 1.2ε is allowed. The table's last
     * column, 5 mol/kg, is the card's validity limit, and the card's density error moves the answer just past it
     * (by 1e-7 in x), so extrapolation is allowed here; the refusal itself is checked below.
     */
    @Test
    void sodiumChlorideMolarityToMolalityFollowsTheTable() {
        for (int i = 0; i < RogersPitzerNaCl.CELSIUS.length; i++) {
            double t = RogersPitzerNaCl.CELSIUS[i];
            for (int j = 0; j < RogersPitzerNaCl.MOLALITY.length; j++) {
                double m = RogersPitzerNaCl.MOLALITY[j];
                double rho = RogersPitzerNaCl.density(i, j);
                double c = RogersPitzerNaCl.molarity(m, rho);
                double card = Compositions.convert(Cards.SODIUM_CHLORIDE, new double[] {c, Double.NaN},
                        CompositionBasis.molarity(t, 1), MOLALITY, Extrapolation.ALLOW)[0];
                assertEquals(m, card, m * 1.2 * (AqueousCardsTest.NACL_DENSITY_TOLERANCE / rho + 5e-7),
                        "t = " + t + ", m = " + m);
            }
        }
    }

    /** Beyond the table (6 mol/kg) the card refuses, with its own message, unless extrapolation is allowed. */
    @Test
    void sodiumChlorideBeyondTheTableIsRefused() {
        MiscelaException ex = assertThrows(MiscelaException.class, () -> Compositions.convert(Cards.SODIUM_CHLORIDE,
                new double[] {6.0, Double.NaN}, MOLALITY, CompositionBasis.molarity(25, 1), E));
        assertEquals(Problem.OUTSIDE_COMPOSITION, ex.problem());
        double c = Compositions.convert(Cards.SODIUM_CHLORIDE, new double[] {6.0, Double.NaN}, MOLALITY,
                CompositionBasis.molarity(25, 1), Extrapolation.ALLOW)[0];
        assertTrue(c > 5.0 && c < 6.0, "c = " + c);
    }

    /** Mass fraction → density at 20 °C for the table's eight points 1–70 %, within the card's fit. */
    @Test
    void sulfuricAcidMassFractionToDensity() {
        for (int i = 0; i < 8; i++) {
            double w = CrcSulfuricAcid.MASS_PERCENT[i] / 100;
            double[] x = Compositions.convert(Cards.SULFURIC_ACID, new double[] {w, 1 - w}, MASS,
                    CompositionBasis.moleFraction(), E);
            double rho = org.miscela.core.functions.CardFunctions.density(Cards.SULFURIC_ACID, x, 20, E);
            assertEquals(1000 * CrcSulfuricAcid.DENSITY_G_PER_CM3[i], rho, AqueousCardsTest.ACID_DENSITY_TOLERANCE,
                    w + "");
        }
    }

    /**
     * Density → mass fraction at 20 °C (the densitometer's job): the table's densities give back its mass fractions
     * within the density tolerance over the smallest slope dρ/dw on the table, 672 kg/m³ (between 1 % and 5 %).
     */
    @Test
    void sulfuricAcidDensityToMassFraction() {
        double worst = 0;
        for (int i = 0; i < 8; i++) {
            double w = CrcSulfuricAcid.MASS_PERCENT[i] / 100;
            double[] x = DensityInversion.composition(Cards.SULFURIC_ACID,
                    1000 * CrcSulfuricAcid.DENSITY_G_PER_CM3[i], 20, 0, null, Double.NaN, Double.NaN, E);
            double card = Compositions.fromMoleFractions(Cards.SULFURIC_ACID, x, MASS, E)[0];
            worst = Math.max(worst, Math.abs(card - w));
            assertEquals(w, card, AqueousCardsTest.ACID_DENSITY_TOLERANCE / 672, w + "");
        }
        Figures.note(AqueousSolutionsTest.class,
                "H2SO4 density -> mass fraction vs CRC table at 20 °C: worst %.5f", worst);
    }

    /** 40 % at 20 °C: ρ = 1.3028 g/cm³ (CRC) → c = 0.40·1302.8/98.072 = 5.3137 mol/L. */
    @Test
    void sulfuricAcidMolarityAtFortyPercent() {
        double c = Compositions.convert(Cards.SULFURIC_ACID, new double[] {0.4, 0.6}, MASS,
                CompositionBasis.molarity(20, 1), E)[0];
        double table = 0.4 * 1302.8 / CrcSulfuricAcid.M_ACID;
        assertEquals(table, c, table * (AqueousCardsTest.ACID_DENSITY_TOLERANCE + CrcSulfuricAcid.ROUNDING) / 1302.8);
    }

    /** Concentrated acid (100 %, the table's last point) lies outside the card's validity: refused. */
    @Test
    void sulfuricAcidBeyondSeventyPercentIsRefused() {
        MiscelaException ex = assertThrows(MiscelaException.class, () -> Compositions.convert(Cards.SULFURIC_ACID,
                new double[] {0.9, 0.1}, MASS, CompositionBasis.molarity(20, 1), E));
        assertEquals(Problem.OUTSIDE_COMPOSITION, ex.problem());
    }
}
