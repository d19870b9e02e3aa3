package org.miscela.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.FahrenheitCards;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.Problem;

/**
 * The slips MIX.EXPLAIN points at in a call that gives a result: each warns on the slip and stays silent on the
 * legitimate input next to it, so the line between them is pinned down on both sides.
 */
class CallWarningsTest {
    private static List<String> percent(String basis, double... values) {
        List<String> out = new ArrayList<>();
        CallWarnings.percentAsFraction(basis, values, out);
        return out;
    }

    /** Whether {@code message} is the entry's: it starts with the pattern's text up to its first blank. */
    private static boolean isA(Problem p, String message) {
        String pattern = p.pattern();
        int blank = pattern.indexOf('%');
        return message.startsWith(blank < 0 ? pattern : pattern.substring(0, blank));
    }

    @Test
    void aStrengthWrittenAsAFractionIsPointedAt() {
        List<String> w = percent("%vol", 0.4);
        assertEquals(1, w.size());
        assertTrue(isA(Problem.WARN_PERCENT_AS_FRACTION, w.get(0)), w.get(0));
        assertTrue(w.get(0).contains("0.4 %vol") && w.get(0).contains("40 %vol was meant"), w.get(0));
        // the trade's spellings of mass and mole percent are percents too
        assertEquals(1, percent("wt%", 0.3).size());
        assertEquals(1, percent("mol %", 0.5, Double.NaN).size());
        // a range of strengths all under 1: fractions typed throughout
        assertEquals(1, percent("%vol", 0.38, 0.4, 0.42).size());
    }

    @Test
    void realStrengthsAndFractionsAreLeftAlone() {
        // 0.5 %vol is a real strength (alcohol-free beer is sold at up to 0.5 %vol: common practice), but a column
        // of strengths that also holds 40 shows the percent is meant
        assertEquals(0, percent("%vol", 0.5, 40.0).size());
        assertEquals(0, percent("%vol", 40.0).size());
        assertEquals(0, percent("%vol", 1.0).size());
        assertEquals(0, percent("%vol", 0.0).size());
        // fractions and concentrations have no percent to mistake
        assertEquals(0, percent("mass fraction", 0.4).size());
        assertEquals(0, percent("mol/L", 0.4).size());
        assertEquals(0, percent(null, 0.4).size());
        assertEquals(0, percent("not a basis", 0.4).size());
    }

    @Test
    void aBasisTemperatureTheBasisDoesNotUseIsPointedAt() {
        Card card = Cards.ETHANOL_WATER;
        List<String> out = new ArrayList<>();
        CallWarnings.unusedBasisTemperature(card, "mass fraction", 20.0, out);
        CallWarnings.unusedBasisTemperature(card, null, 15.0, out);
        assertEquals(2, out.size());
        assertTrue(isA(Problem.WARN_BASIS_TEMPERATURE_UNUSED, out.get(0)), out.get(0));
        assertTrue(out.get(0).contains("(20 °C)") && out.get(0).contains("mass fraction"), out.get(0));
        assertTrue(out.get(1).contains("mole fraction"), out.get(1));
        out.clear();
        CallWarnings.unusedBasisTemperature(card, "%vol", 15.0, out);
        CallWarnings.unusedBasisTemperature(card, "mol/L", 15.0, out);
        CallWarnings.unusedBasisTemperature(card, "mass fraction", Double.NaN, out);
        assertEquals(List.of(), out);
    }

    @Test
    void aBatchOfMillilitresInGramsOrMillilitresIsPointedAt() {
        List<String> out = new ArrayList<>();
        // 40 kg + 60 kg typed with the unit g: 100 g in all
        CallWarnings.smallBatch("The amounts come to", "g", 100.0, out);
        CallWarnings.smallBatch("The quantity comes to", "mL", 750.0, out);
        assertEquals(2, out.size());
        assertTrue(isA(Problem.WARN_SMALL_BATCH, out.get(0)), out.get(0));
        assertTrue(out.get(0).startsWith("The amounts come to 100 g in all, a batch under 1 kg") && out.get(0).contains(
                "If kg was meant"), out.get(0));
        assertTrue(out.get(1).contains("If L was meant"), out.get(1));
        out.clear();
        CallWarnings.smallBatch("The amounts come to", "g", 1000.0, out);
        CallWarnings.smallBatch("The amounts come to", "kg", 100.0, out);
        CallWarnings.smallBatch("The amounts come to", "L", 0.5, out);
        // 1 mol of acid and 10 of water is the textbook heat-of-dilution example, in moles
        CallWarnings.smallBatch("The amounts come to", "mol", 11.0, out);
        CallWarnings.smallBatch("The amounts come to", "oz", 11.0, out);
        assertEquals(List.of(), out);
    }

    @Test
    void aCorrectionToAnUnusualReferenceFromAUsualOneIsPointedAt() {
        Card card = Cards.ETHANOL_WATER;
        List<String> out = new ArrayList<>();
        // measured at 12 °C in the tank, to be quoted at 20 °C, typed the other way round
        CallWarnings.swappedTemperatures(card, new double[] {20.0}, 12.0, out);
        assertEquals(1, out.size());
        assertTrue(isA(Problem.WARN_SWAPPED_TEMPERATURES, out.get(0)), out.get(0));
        assertTrue(out.get(0).startsWith("The reference temperature 12 °C") && out.get(0).contains(
                "the measured temperature 20 °C is one"), out.get(0));
        out.clear();
        CallWarnings.swappedTemperatures(card, new double[] {12.0}, 20.0, out);
        CallWarnings.swappedTemperatures(card, new double[] {12.0}, 15.0, out);
        CallWarnings.swappedTemperatures(card, new double[] {20.0}, 15.0, out);
        CallWarnings.swappedTemperatures(card, new double[] {12.0, 30.0}, 25.0, out);
        assertEquals(List.of(), out);
    }

    /**
     * A card whose excess enthalpy does not vary with temperature and that states no solution model is said to warm
     * its blends with the pure liquids' heat capacities; one with Laliberté's solution model is not.
     */
    @Test
    void aCardWithoutAnExcessHeatCapacityIsPointedAt() {
        List<String> out = new ArrayList<>();
        CallWarnings.pureHeatCapacity(TestCards.card("sulfuric-acid-water-nbs.tsv"), out);
        assertEquals(1, out.size());
        assertTrue(isA(Problem.WARN_PURE_HEAT_CAPACITY, out.get(0)), out.get(0));
        out.clear();
        CallWarnings.pureHeatCapacity(TestCards.card("sulfuric-acid-water-whole-range.tsv"), out);
        assertEquals(List.of(), out);
    }

    @Test
    void sixtyFahrenheitIsAUsualReferenceOnACardInFahrenheit() {
        // 60 °F is the petroleum trade's reference (15.5556 °C; °F = 9/5·°C + 32, NIST SP 811 (2008), B.8)
        Card f = CardReader.read(FahrenheitCards.convert(TestCards.cells("ethanol-water-oiml.tsv")));
        List<String> out = new ArrayList<>();
        CallWarnings.swappedTemperatures(f, new double[] {60.0}, 50.0, out);
        assertEquals(1, out.size(), out.toString());
        assertTrue(out.get(0).contains("50 °F"), out.get(0));
        out.clear();
        CallWarnings.swappedTemperatures(f, new double[] {50.0}, 60.0, out);
        CallWarnings.swappedTemperatures(f, new double[] {50.0}, 68.0, out);
        assertEquals(List.of(), out);
    }
}
