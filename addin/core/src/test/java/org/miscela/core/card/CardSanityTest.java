package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.functions.CheckOutput;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * MIX.CHECK's warnings about a card that reads: the range's extent, rows in sorted order, and the plausibility of
 * the pure components. (The conditioning of the coefficients is {@link CardDigitsTest}'s.) Each warning is a
 * catalogue entry of the CHECK section; none changes what the card computes.
 */
class CardSanityTest {
    private static final Object[][] OIML = TestCards.cells("ethanol-water-oiml.tsv");

    private static List<String> warnings(Object[][] cells) {
        return CardSanity.warnings(cells, CardReader.read(cells));
    }

    private static String only(Object[][] cells, Problem expected) {
        List<String> w = warnings(cells);
        assertEquals(1, w.size(), () -> "one warning expected: " + w);
        assertEquals("Problem." + expected.name(), Catalogue.entryOf(w.get(0)), w.get(0));
        return w.get(0);
    }

    /** A copy of the cells with row {@code number} (1-based) replaced. */
    private static Object[][] with(Object[][] cells, int number, Object... row) {
        Object[][] out = cells.clone();
        out[number - 1] = row;
        return out;
    }

    // ------------------------------------------------------------------ sourced cards have nothing to report

    @Test
    void theSourcedCardsHaveNoWarnings() {
        for (String card : new String[] {"ethanol-water-oiml.tsv", "sodium-chloride-water-crc.tsv",
            "sulfuric-acid-water-nbs.tsv", "sulfuric-acid-water-crc.tsv", "water-ideal-partner.tsv"}) {
            Object[][] cells = TestCards.cells(card);
            assertEquals(Collections.emptyList(), warnings(cells), card);
            assertEquals(CardFunctions.OK, CardFunctions.checkCard(cells, CardReader.read(cells), CheckOutput.SUMMARY),
                    card + ": a clean card is exactly OK, so a formula comparing with \"OK\" keeps working");
        }
    }

    // ------------------------------------------------------------------ plausibility

    /** The unit row changed to kg/mol, the g/mol values kept: both molar masses read 1000 times too large. */
    @Test
    void molarMassesInTheWrongUnitAreWarnedAbout() {
        Object[][] cells = with(OIML, 7, "molar mass unit", "kg/mol");
        List<String> w = warnings(cells);
        assertEquals(Arrays.asList(
                "Card row 8 (component): the molar mass of ethanol comes to 46070 g/mol, outside 2 to 1000 g/mol, the "
                        + "range of common liquids: check the value and the 'molar mass unit' row (g/mol values under "
                        + "the unit kg/mol read 1000 times too large).",
                "Card row 9 (component): the molar mass of water comes to 18020 g/mol, outside 2 to 1000 g/mol, the "
                        + "range of common liquids: check the value and the 'molar mass unit' row (g/mol values under "
                        + "the unit kg/mol read 1000 times too large)."), w);
        // the card still reads and computes (a warning never refuses)
        CardReader.read(cells).mixture().density(new double[] {0.3, 0.7}, 293.15);
        // and the other way round: kg/mol values under g/mol
        only(with(OIML, 8, "component", "ethanol", 0.04606844), Problem.WARN_MOLAR_MASS);
    }

    /**
     * Densities a common liquid cannot have: a constant written 10 times too large, 998,2 turned into thousands by a
     * locale that reads the comma as a thousands separator, 0.998 (g/cm³) on a kg/m³ card.
     */
    @Test
    void densitiesOutsideTheRangeOfCommonLiquidsAreWarnedAbout() {
        String tenTimes = only(TestCard.base().set(13, "density coefficients", "alpha", 7893.0).cells(),
                Problem.WARN_DENSITY);
        assertTrue(tenTimes.startsWith("Card row 13 (density coefficients): the density of alpha comes to 7893 kg/m³ "
                + "at 288.15 K, outside 500 to 3000 kg/m³"), tenTimes);
        String thousands = only(TestCard.base().set(15, "density coefficients", "beta", 9982.0).cells(),
                Problem.WARN_DENSITY);
        assertTrue(thousands.contains("the density of beta comes to 9982 kg/m³"), thousands);
        String gramPerCm3 = only(TestCard.base().set(15, "density coefficients", "beta", 0.998).cells(),
                Problem.WARN_DENSITY);
        assertTrue(gramPerCm3.contains("comes to 0.998 kg/m³"), gramPerCm3);
        // a card in g/cm³ shows the bounds in its own unit
        String own = only(TestCard.base().set(5, "density unit", "g/cm³").set(13, "density coefficients", "alpha",
                0.7893).set(15, "density coefficients", "beta", 9.97).cells(), Problem.WARN_DENSITY);
        assertTrue(own.contains("comes to 9.97 g/cm³ at 288.15 K, outside 0.5 to 3 g/cm³"), own);
    }

    /**
     * Mercury is a real liquid at 13,534 kg/m³ (25 °C; CRC Handbook of Chemistry and Physics, from memory) with molar
     * mass 200.59 g/mol (IUPAC, from memory): a warning, not a refusal, and the card computes as written.
     */
    @Test
    void mercuryIsWarnedAboutButComputes() {
        Object[][] cells = TestCard.base().set(10, "component", "alpha", 200.59)
                .set(13, "density coefficients", "alpha", 13534.0).cells();
        String w = only(cells, Problem.WARN_DENSITY);
        assertTrue(w.contains("comes to 13530 kg/m³") && w.endsWith("Heavy liquids such as mercury (13,534 kg/m³) "
                + "are real: then nothing is wrong."), w);
        assertEquals(13534.0, CardReader.read(cells).components().get(0).density().at(298.15), 0.0);
    }

    /**
     * The thermal expansion coefficient α = −(dρ/dT)/ρ: ethanol's 1.1·10⁻³ per K at 20 °C (CRC Handbook, from
     * memory) passes, ten times that or the wrong sign does not; water's from the built-in Tanaka et al. (2001)
     * formula over 0–40 °C (−6.8·10⁻⁵ to 3.9·10⁻⁴ per K) passes.
     */
    @Test
    void thermalExpansionOutsideTheRangeOfCommonLiquidsIsWarnedAbout() {
        java.util.function.DoubleFunction<Object[][]> ethanol = c1 -> TestCard.empty()
                .row("Miscela card", 1).row("source", "invented values, for tests").row("temperature unit", "°C")
                .row("density unit", "kg/m³").row("molar volume unit", "cm³/mol").row("molar mass unit", "g/mol")
                .row("valid temperature", 0, 40).row("component", "ethanol", 46.07).row("component", "water", 18.015)
                .row("density model", "ethanol", "polynomial").row("density reference temperature", "ethanol", 20)
                .row("density coefficients", "ethanol", 789.3, c1).row("density model", "water", "Tanaka 2001")
                .row("valid mole fraction", "ethanol", 0, 1).row("excess volume A0", "ethanol + water", -4.2)
                .cells();
        assertEquals(Collections.emptyList(), warnings(ethanol.apply(-0.84)), "ethanol as it is, water by Tanaka");
        String tenTimes = only(ethanol.apply(-8.4), Problem.WARN_EXPANSION);
        assertTrue(tenTimes.startsWith("Card row 12 (density coefficients): the density of ethanol changes by -8.4 "
                + "kg/m³ per K at 40 °C (a thermal expansion coefficient of 0.0135 per K), outside -0.0007 to 0.003 "
                + "per K"), tenTimes);
        String sign = only(ethanol.apply(0.84), Problem.WARN_EXPANSION);
        assertTrue(sign.contains("changes by 0.84 kg/m³ per K at 0 °C (a thermal expansion coefficient of "
                + "-0.00109 per K)"), sign);
    }

    /** A molar mass and a density each plausible whose ratio is not: an invented heavy oil of 950 g/mol at 900 kg/m³. */
    @Test
    void aMolarVolumeOutsideTheRangeOfCommonLiquidsIsWarnedAbout() {
        String w = only(TestCard.base().set(10, "component", "alpha", 950.0)
                .set(13, "density coefficients", "alpha", 900.0).cells(), Problem.WARN_MOLAR_VOLUME);
        assertEquals("The molar volume of alpha, M/ρ, comes to 1056 cm³/mol at 288.15 K, outside 10 to 1000 cm³/mol, "
                + "the range of common liquids: check its molar mass (row 10), its density (row 13) and their units.",
                w);
    }

    // ------------------------------------------------------------------ sorted cards

    /** Water first, then ethanol: a sort by column 2 puts ethanol first and changes what x1 is. */
    private static Object[][] waterFirst(boolean stated) {
        return TestCard.waterThenEthanol(stated).cells();
    }

    @Test
    void aCardSortedBelowItsHeaderIsWarnedAbout() {
        Object[][] byLabel = CalcSort.sorted(OIML, 0, true, false);
        String w = only(byLabel, Problem.WARN_SORTED);
        assertEquals("Card rows 2 to " + OIML.length + " are sorted by column 1 (ascending), as Data ▸ Sort leaves them: if the card was "
                + "sorted, its 'component' rows may now be in another order than written, and x1 (the mole fraction "
                + "of the first) then means another component. Check that ethanol (row 2) is meant to be component 1; "
                + "a 'component order' row (format version 2) makes every function refuse a card whose component rows "
                + "have moved.", w);
        assertTrue(only(CalcSort.sorted(OIML, 0, true, true), Problem.WARN_SORTED).contains("by column 1 (descending)"));
        // sorted by column 2: water's rows go below ethanol's, and x1 is now ethanol's mole fraction
        Object[][] bySubject = CalcSort.sorted(waterFirst(false), 1, true, false);
        assertEquals("ethanol", CardReader.read(bySubject).components().get(0).name());
        assertTrue(only(bySubject, Problem.WARN_SORTED).contains("sorted by column 2 (ascending)"));
        assertEquals(Collections.emptyList(), warnings(waterFirst(false)), "a card as written is not sorted");
    }

    /** Sorted with the header row among the rest, the header leaves the top and the card is refused. */
    @Test
    void aCardSortedWithItsHeaderIsRefused() {
        for (boolean descending : new boolean[] {false, true}) {
            MiscelaException e = assertThrows(MiscelaException.class,
                    () -> CardReader.read(CalcSort.sorted(OIML, 0, false, descending)));
            assertEquals(Problem.CARD_HEADER, e.problem(), e.getMessage());
        }
    }

    /** A 'component order' row survives a sort (its cells stay in their columns): the moved card is refused. */
    @Test
    void aStatedComponentOrderCatchesASort() {
        assertEquals(Collections.emptyList(), warnings(waterFirst(true)));
        MiscelaException e = assertThrows(MiscelaException.class,
                () -> CardReader.read(CalcSort.sorted(waterFirst(true), 1, true, false)));
        assertEquals(Problem.COMPONENT_ORDER, e.problem());
        assertTrue(e.getMessage().contains("the card states the components in the order \"water\", \"ethanol\", but its "
                + "'component' rows declare \"ethanol\", \"water\""), e.getMessage());
        // a sort that leaves the components in their order reads, and needs no warning: the row vouches for it
        Object[][] byLabel = CalcSort.sorted(waterFirst(true), 0, true, false);
        assertEquals("water", CardReader.read(byLabel).components().get(0).name());
        assertEquals(Collections.emptyList(), warnings(byLabel));
    }

    @Test
    void theOrderOfKeysIsCalcsSortOrder() {
        assertEquals("ascending", CardSanity.order(Arrays.asList(1.0, 2.0, "a", "B", "c", null, null)));
        assertEquals("descending", CardSanity.order(Arrays.asList("c", "B", "a", 2.0, 1.0, null)));
        assertEquals(null, CardSanity.order(Arrays.asList("a", null, "b", "c")), "a blank in the middle");
        assertEquals(null, CardSanity.order(Arrays.asList("a", "a", "b", "b")), "two different keys say nothing");
        assertEquals(null, CardSanity.order(Arrays.asList("title", "source", "temperature unit", "density unit",
                "molar volume unit", "molar mass unit", "valid temperature", "component", "component",
                "density model")), "the labels of a card as written");
        assertEquals("ascending", CardSanity.order(Arrays.asList("a", "c", "b", "d", "e", "f", "g", "h")),
                "one step against the order is let pass (Calc's collation is only approximated)");
        assertEquals(null, CardSanity.order(Arrays.asList("a", "c", "b", "e", "d", "f", "g", "h")));
        // text: case and accents aside, spaces before punctuation before symbols before digits before letters
        assertTrue(CardSanity.compareText("°C", "cm³/mol") < 0);
        assertTrue(CardSanity.compareText("kg/m³", "kg/m3") == 0);
        assertTrue(CardSanity.compareText("Water", "water + ethanol") < 0);
        assertTrue(CardSanity.compareText("a b", "a/b") < 0 && CardSanity.compareText("a/b", "a1") < 0);
        assertTrue(CardSanity.compareText("A9", "a10") > 0, "no natural sort: Calc's default");
        assertTrue(CardSanity.compareText("é", "E") == 0);
    }

    // ------------------------------------------------------------------ extent

    /** The OIML card padded with blank rows to {@code rows}, as a range named larger than its card arrives. */
    private static Object[][] padded(int rows, int columns) {
        Object[][] out = new Object[rows][];
        Object[] blank = new Object[columns];
        Arrays.fill(blank, "");
        for (int i = 0; i < rows; i++) {
            if (i < OIML.length) {
                out[i] = Arrays.copyOf(OIML[i], columns);
                for (int c = OIML[i].length; c < columns; c++) {
                    out[i][c] = "";
                }
            } else {
                out[i] = blank;
            }
        }
        return out;
    }

    @Test
    void theExtentSaysWhichRowsHoldTheCardAndWhatARowBelowDoes() {
        int width = 0;
        for (Object[] r : OIML) {
            width = Math.max(width, r.length);
        }
        int n = OIML.length;
        CardSanity.Extent tight = CardSanity.extent(OIML);
        assertEquals("The range is " + n + " rows × " + width + " columns; the card fills it to row " + n + " and "
                + "column " + width + " (" + n + " non-blank rows read). Its last row is filled: a row typed below the "
                + "range is not part of the card, so insert rows inside the range, or widen it (Sheet ▸ Named Ranges "
                + "and Expressions ▸ Manage).", tight.words());
        CardSanity.Extent spare = CardSanity.extent(padded(n + 10, width + 2));
        assertEquals("The range is " + (n + 10) + " rows × " + (width + 2) + " columns; the card fills it to row " + n
                + " and column " + width + " (" + n + " non-blank rows read). Rows " + (n + 1) + " to " + (n + 10)
                + " are blank: a row typed there is read, a row below row " + (n + 10) + " is not.", spare.words());
        assertEquals(Problem.CARD_EMPTY, assertThrows(MiscelaException.class,
                () -> CardSanity.extent(new Object[][] {{"", " "}})).problem());
    }

    /**
     * A card named as whole columns (1,048,576 rows, Calc's sheet height) costs every call every cell: a warning with
     * the cost; a few spare rows cost nothing worth a warning.
     */
    @Test
    void aRangeFarLargerThanItsCardIsWarnedAbout() {
        int width = CardSanity.extent(OIML).lastColumn();
        Object[][] columns = padded(1_048_576, width);
        String w = only(columns, Problem.WARN_RANGE_SIZE);
        long cells = 1_048_576L * width;
        assertEquals(String.format(java.util.Locale.ROOT, "The card's range is 1,048,576 rows × %d columns (%,d cells), "
                + "but the card fills only %d rows × %d columns (%,d cells): Calc converts every cell of the range for "
                + "every call, about %s s per call at 0.34 µs a cell, and a sheet of 50 single-cell formulas over a card "
                + "named as whole columns took about 5 GB of office memory and 90 s per recalculation. Name only the "
                + "card's cells, with a few blank rows to spare; or put =MIX.PACK(card) in one cell and name that cell "
                + "in the formulas, so the range is read once per recalculation.", width, cells, OIML.length, width,
                (long) OIML.length * width,
                CardPlausibility.shown(cells * 0.34e-6, 2)), w);
        assertEquals(Collections.emptyList(), warnings(padded(300, width)), "ten times the card is still small");
        assertEquals(1, warnings(padded(3000, width)).size(), "100 times the card, over 10,000 cells");
    }

    // ------------------------------------------------------------------ the summary

    @Test
    void theSummaryIsOkOrEveryWarningInOneText() {
        assertEquals("OK", CardFunctions.summary(Collections.emptyList()));
        assertEquals("OK with 1 warning: A.", CardFunctions.summary(Collections.singletonList("A.")));
        assertEquals("OK with 2 warnings: (1) A. (2) B.", CardFunctions.summary(Arrays.asList("A.", "B.")));
        assertEquals("Problem.CHECK_WARNINGS", Catalogue.entryOf(CardFunctions.summary(Arrays.asList("A.", "B."))));
    }
}
