package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.Catalogue;

/**
 * The conditioning check of MIX.CHECK ({@link CardDigits}): how many significant digits each coefficient needs for
 * the card's density to stay within 0.01 kg/m³, against the digits written. The sourced sodium chloride card (CRC
 * Handbook densities after Rogers and Pitzer 1982, fitted with A0..A6 each cubic in t, terms of up to 10⁷ cm³/mol
 * adding up to a few) is the case: as fitted it carries every digit it needs; rounded to 6 significant digits it
 * loses a fifth of its density at the edge of its range, and MIX.CHECK must say so.
 */
class CardDigitsTest {
    private static final Object[][] NACL = TestCards.cells("sodium-chloride-water-crc.tsv");
    /** The density of the card's range: x(NaCl) from 0 to its 0.0826 limit, 0 to 40 °C. */
    private static final double X_MAX = 0.0826319289957113;

    /** The NaCl card with every excess volume coefficient rounded to {@code digits} significant digits (half up). */
    private static Object[][] rounded(int digits) {
        Object[][] out = new Object[NACL.length][];
        for (int i = 0; i < NACL.length; i++) {
            out[i] = NACL[i].clone();
            if (NACL[i][0].toString().startsWith("excess volume A")) {
                for (int c = 2; c < out[i].length; c++) {
                    out[i][c] = new BigDecimal((Double) NACL[i][c]).round(new MathContext(digits)).doubleValue();
                }
            }
        }
        return out;
    }

    /** The largest difference in density (kg/m³) between two cards over the NaCl card's range, 21 × 9 points. */
    private static double largestDifference(Object[][] a, Object[][] b) {
        Card one = CardReader.read(a);
        Card two = CardReader.read(b);
        double worst = 0.0;
        for (int i = 0; i <= 20; i++) {
            double[] x = {X_MAX * i / 20, 1 - X_MAX * i / 20};
            for (int t = 0; t <= 40; t += 5) {
                double k = 273.15 + t;
                worst = Math.max(worst, Math.abs(one.mixture().density(x, k) - two.mixture().density(x, k)));
            }
        }
        return worst;
    }

    private static List<String> digitWarnings(Object[][] cells) {
        List<String> out = new ArrayList<>();
        for (String w : CardSanity.warnings(cells, CardReader.read(cells))) {
            if ("Problem.WARN_DIGITS".equals(Catalogue.entryOf(w))) {
                out.add(w);
            }
        }
        return out;
    }

    @Test
    void theDigitsWrittenAreThoseOfTheShortestDecimalForm() {
        assertEquals(2, CardDigits.written(-4.2));
        assertEquals(1, CardDigits.written(0.1));
        assertEquals(1, CardDigits.written(-4.0));
        assertEquals(4, CardDigits.written(2165.0));
        assertEquals(8, CardDigits.written(998.20123));
        assertEquals(17, CardDigits.written(-1496316.0661151598));
        assertEquals(16, CardDigits.written(99462.66454386276));
        assertEquals(1, CardDigits.written(1e-300));
        assertEquals(6, CardDigits.exponent(-1496316.0661151598));
        assertEquals(-4, CardDigits.exponent(0.00092));
        assertEquals(0, CardDigits.exponent(9.9999));
        assertEquals(2, CardDigits.exponent(998.2));
    }

    /** As fitted (16–17 digits) the card needs 10 to 13 per coefficient and has them: no warning. */
    @Test
    void theSourcedSodiumChlorideCardCarriesTheDigitsItNeeds() {
        assertEquals(Collections.emptyList(), digitWarnings(NACL));
        List<CardDigits.Coefficient> all = CardDigits.coefficients(CardGrammar.parse(NACL), CardReader.read(NACL));
        assertEquals(29, all.size(), "28 excess volume coefficients and the constant NaCl density");
        for (CardDigits.Coefficient c : all) {
            if (c.row.label.startsWith("excess volume A")) {
                assertTrue(c.written >= c.needed, c.row.label + " column " + c.column() + ": " + c.written + " < "
                        + c.needed);
                assertTrue(c.needed >= 10 && c.needed <= 13, c.row.label + " needs " + c.needed);
                assertTrue(c.cancellation > 1000, c.row.label + " cancels: " + c.cancellation);
            } else {
                // 2165 kg/m³ has 4 digits where 0.01 kg/m³ would ask for 6, but nothing cancels: taken as written
                assertEquals(4, c.written);
                assertEquals(1.0, c.cancellation, 1e-9, "a constant density is its own whole");
            }
        }
    }

    /**
     * Rounded to 6 significant digits (the committed test card sodium-chloride-water-crc-6-digits.tsv, checked here to
     * be exactly that rounding) the card's density is off by more than 6 % of itself somewhere in its range: MIX.CHECK
     * warns once per A_k row, naming the digits written and needed.
     */
    @Test
    void roundedToSixDigitsTheSodiumChlorideCardIsWarnedAbout() {
        Object[][] six = TestCards.cells("sodium-chloride-water-crc-6-digits.tsv");
        Object[][] expected = rounded(6);
        for (int i = 0; i < six.length; i++) {
            if (!six[i][0].equals("title") && !six[i][0].equals("source")) {
                assertEquals(java.util.Arrays.asList(expected[i]), java.util.Arrays.asList(six[i]), "row " + (i + 1));
            }
        }
        double off = largestDifference(NACL, six);
        assertTrue(off > 0.06 * 1000, "the rounded card's density is off by " + off + " kg/m³");
        List<String> w = digitWarnings(six);
        assertEquals(7, w.size(), w.toString());
        for (int k = 0; k < 7; k++) {
            assertTrue(w.get(k).startsWith("Card row " + (15 + k) + " (excess volume A" + k + "): the coefficients in "
                    + "columns "), w.get(k));
            assertTrue(w.get(k).contains("for its density to stay within 0.01 kg/m³: its terms cancel"), w.get(k));
        }
        assertTrue(w.get(0).startsWith("Card row 15 (excess volume A0): the coefficients in columns 3, 4, 5 and 6 are "
                + "written with 6, 6, 6 and 6 significant digits, but the card needs 11, 11, 10 and 11"), w.get(0));
    }

    /**
     * The digits the check asks for are enough and not far from needed: rounded to 12 digits the card stays within
     * 0.01 kg/m³ of itself and gets no warning; rounded to 10 it moves by more than 0.01 kg/m³ and gets warnings.
     */
    @Test
    void theDigitsNeededAgreeWithWhatRoundingDoes() {
        Object[][] twelve = rounded(12);
        assertTrue(largestDifference(NACL, twelve) < 0.01, "12 digits: " + largestDifference(NACL, twelve));
        assertEquals(Collections.emptyList(), digitWarnings(twelve));
        Object[][] ten = rounded(10);
        assertTrue(largestDifference(NACL, ten) > 0.01, "10 digits: " + largestDifference(NACL, ten));
        assertTrue(!digitWarnings(ten).isEmpty());
    }

    /**
     * Short coefficients on a card whose terms do not cancel are taken as written (the invented test card: A0 = -4,
     * A1 = 1.5, A2 = -0.5, 1 and 2 digits): the digits table shows fewer digits than the tolerance would ask, and no
     * warning follows.
     */
    @Test
    void aWellConditionedCardIsTakenAsWritten() {
        Object[][] cells = TestCard.base().cells();
        assertEquals(Collections.emptyList(), CardSanity.warnings(cells, CardReader.read(cells)));
        boolean shortOne = false;
        for (CardDigits.Coefficient c : CardDigits.coefficients(CardGrammar.parse(cells), CardReader.read(cells))) {
            shortOne |= c.written < c.needed;
            assertTrue(c.cancellation <= CardDigits.CANCELLATION, c.row.label + ": " + c.cancellation);
        }
        assertTrue(shortOne, "the test card's coefficients are shorter than 0.01 kg/m³ would need");
    }

    /**
     * Excess enthalpy coefficients weigh in the enthalpy (1 J/mol): an invented pair whose A0 = 30000 − 100·T J/mol
     * (T in K, reference 0 K) cancels to at most 1200 J/mol over 288–308 K, so 1 significant digit is far too few.
     */
    @Test
    void enthalpyCoefficientsAreWeighedInTheEnthalpy() {
        Object[][] cells = TestCard.base().set(1, "Miscela card", 2).row("enthalpy unit", "J/mol")
                .row("excess enthalpy reference temperature", "alpha + beta", 0)
                .row("excess enthalpy A0", "alpha + beta", 30000, -100).cells();
        List<String> w = digitWarnings(cells);
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("Card row 22 (excess enthalpy A0): the coefficients in columns 3 and 4 are "
                + "written with 1 and 1 significant digits, but the card needs "), w.get(0));
        assertTrue(w.get(0).contains("for its excess enthalpy to stay within 1 J/mol"), w.get(0));
        Object[][] nbs = TestCards.cells("sulfuric-acid-water-nbs.tsv");
        Object[][] table = CardSanity.digits(nbs, CardReader.read(nbs));
        boolean enthalpy = false;
        for (int i = 1; i < table.length; i++) {
            enthalpy |= table[i][8].equals("excess enthalpy, kJ/mol") || table[i][8].equals("excess enthalpy, J/mol");
            assertTrue((Double) table[i][5] >= (Double) table[i][6], java.util.Arrays.toString(table[i]));
        }
        assertTrue(enthalpy, "the NBS card's enthalpy coefficients are in the table");
    }

    /** Ternary terms are weighed over their triangle. */
    @Test
    void ternaryTermsAreWeighed() {
        Object[][] cells = TestCard.ternary().row("excess volume ternary C0", "alpha + beta + gamma", 0.6).cells();
        Object[][] table = CardSanity.digits(cells, CardReader.read(cells));
        boolean ternary = false;
        for (Object[] row : table) {
            ternary |= "excess volume ternary C0".equals(row[1]);
        }
        assertTrue(ternary, java.util.Arrays.deepToString(table));
    }
}
