package org.miscela.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The trade's spellings of mass percent, mole percent and %v/v, and range messages that name the value typed.
 *
 * <p>Reference for the mass → mole conversion: molar masses from the IUPAC standard atomic weights (abridged to five
 * significant figures: C 12.011, H 1.008, O 15.999; from memory), so ethanol C2H6O 46.069 g/mol and water H2O
 * 18.015 g/mol, computed here independently of the card (whose molar masses, 46.06844 and 18.01528 g/mol, are the
 * ones used with the OIML tables). The two sets differ by under 2e-5 relative each, which moves x by under 5e-5 relative: the tolerance.
 */
class TradeBasesTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double M_ETHANOL_IUPAC = 2 * 12.011 + 6 * 1.008 + 15.999;
    private static final double M_WATER_IUPAC = 2 * 1.008 + 15.999;

    private static double iupacMoleFraction(double massPercent) {
        double n1 = massPercent / M_ETHANOL_IUPAC;
        double n2 = (100 - massPercent) / M_WATER_IUPAC;
        return n1 / (n1 + n2);
    }

    /** 30 %w/w ethanol is x = 0.143535 (IUPAC molar masses), whichever way the trade spells mass percent. */
    @Test
    void everySpellingOfMassPercentIsMassPercent() {
        double expected = iupacMoleFraction(30);
        assertEquals(0.143535, expected, 1e-6);
        for (String spelling : new String[] {"%w/w", "% w/w", "wt%", "wt %", "mass %", "% m/m", "%m/m", "w/w %",
            "mass percent", " WT% "}) {
            CompositionBasis b = BlendFunctions.basis(CARD, spelling, Double.NaN, BlendFunctions.DEFAULT_BALANCE);
            assertEquals(CompositionBasis.Kind.MASS_PERCENT, b.kind(), spelling);
            double[] x = Compositions.toMoleFractions(CARD, BlendFunctions.binary(CARD, 30, b), b, E);
            assertEquals(expected, x[0], 5e-5 * expected, spelling);
            assertEquals(1 - expected, x[1], 5e-5 * expected, spelling);
        }
        // and a mass fraction of 0.3 is the same composition
        double[] w = Compositions.toMoleFractions(CARD, new double[] {0.3, 0.7}, CompositionBasis.massFraction(), E);
        assertEquals(expected, w[0], 5e-5 * expected);
    }

    /** Mole percent is 100 × mole fraction, both ways; "%v/v" is the strength at the reference temperature. */
    @Test
    void molePercentAndVolumePercentSpellings() {
        for (String spelling : new String[] {"mol %", "mole %", "mol%", "mole percent"}) {
            CompositionBasis b = BlendFunctions.basis(CARD, spelling, Double.NaN, BlendFunctions.DEFAULT_BALANCE);
            double[] x = Compositions.toMoleFractions(CARD, BlendFunctions.binary(CARD, 25, b), b, E);
            assertEquals(0.25, x[0], 1e-15, spelling);
            assertEquals(25.0, Compositions.fromMoleFractions(CARD, x, b, E)[0], 1e-12, spelling);
        }
        CompositionBasis vv = BlendFunctions.basis(CARD, "%v/v", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
        assertEquals(CompositionBasis.Kind.STRENGTH, vv.kind());
        assertEquals(20.0, vv.temperature(), 0.0);
        // mass percent written back: 30 %w/w → mole fractions → 30 %w/w
        CompositionBasis wt = BlendFunctions.basis(CARD, "wt%", Double.NaN, -1);
        double[] round = Compositions.convert(CARD, new double[] {30, 70}, wt, wt, E);
        assertEquals(30.0, round[0], 1e-12);
        assertEquals(70.0, round[1], 1e-12);
    }

    /** A value outside its basis's range is named itself, not through the balance component's remainder. */
    @Test
    void outOfRangeValuesAreNamed() {
        CompositionBasis wt = BlendFunctions.basis(CARD, "mass %", Double.NaN, -1);
        MiscelaException ex = assertThrows(MiscelaException.class,
                () -> Compositions.toMoleFractions(CARD, BlendFunctions.binary(CARD, 140, wt), wt, E));
        assertEquals(Problem.VALUE_OUT_OF_RANGE, ex.problem());
        assertTrue(ex.getMessage().startsWith("The mass percent 140 is outside 0 to 100"), ex.getMessage());
        CompositionBasis w = CompositionBasis.massFraction();
        MiscelaException fraction = assertThrows(MiscelaException.class,
                () -> Compositions.toMoleFractions(CARD, BlendFunctions.binary(CARD, 1.4, w), w, E));
        assertTrue(fraction.getMessage().startsWith("The mass fraction 1.4 is outside 0 to 1"), fraction.getMessage());
        CompositionBasis s = BlendFunctions.basis(CARD, "%vol", Double.NaN, -1);
        MiscelaException strength = assertThrows(MiscelaException.class,
                () -> Compositions.toMoleFractions(CARD, BlendFunctions.binary(CARD, 140, s), s, E));
        assertTrue(strength.getMessage().startsWith("The strength 140 is outside 0 to 100"), strength.getMessage());
        // percents must sum to 100
        MiscelaException sum = assertThrows(MiscelaException.class,
                () -> Compositions.toMoleFractions(CARD, new double[] {30, 60}, wt, E));
        assertEquals("The mass percents sum to 90; they must sum to 100 (within 1e-6).", sum.getMessage());
    }
}
