package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The card's row grammar alone: cells into numbered rows, the header and version, and rows filed by label into a
 * {@link ParsedCard}, before any value is interpreted. The ranges here are fragments (no units, no components to
 * speak of) that the grammar accepts although they are no card; names and numbers are invented.
 */
class CardGrammarTest {
    private static MiscelaException refused(Problem problem, Object[][] cells) {
        MiscelaException e = assertThrows(MiscelaException.class, () -> CardGrammar.parse(cells));
        assertEquals(problem, e.problem(), e::getMessage);
        return e;
    }

    @Test
    void rowsCountBlankRowsAndEndAtTheLastNonBlankCell() {
        List<CardRow> rows = CardGrammar.rows(new Object[][] {
            {"Miscela card", 1.0, "", null},
            {"", " ", null},
            null,
            {"  Title ", "a  title ", "", "  "},
            {"", "values", "without", "a label"}});
        assertEquals(3, rows.size());
        assertEquals(1, rows.get(0).number);
        assertEquals(1, rows.get(0).values.length);
        CardRow title = rows.get(1);
        assertEquals(4, title.number);
        assertEquals("Title", title.label);
        assertEquals("title", title.key);
        assertArrayEquals(new Object[] {"a  title "}, title.values, "text values are kept as written");
        assertEquals("", rows.get(2).label);
        assertTrue(CardGrammar.rows(null).isEmpty());
    }

    @Test
    void cellsBecomeNullDoubleOrText() {
        CardRow r = CardGrammar.rows(new Object[][] {{2.5, 3, Boolean.TRUE, Boolean.FALSE, "  ", 7L, "x"}}).get(0);
        assertEquals("2.5", r.label, "a number as label is shown as the messages show numbers");
        assertArrayEquals(new Object[] {3.0, 1.0, 0.0, null, 7.0, "x"}, r.values);
    }

    @Test
    void rowsAreFiledByLabelAndSubjectInCardOrder() {
        ParsedCard card = CardGrammar.parse(new Object[][] {
            {"Miscela card", 2.0},
            {"Title:", "fragment"},
            {"# a comment", 1.0, "anything"},
            {"note", "not read"},
            {"component", " Beta ", 18.0},
            {"COMPONENT", "alpha", 46.0},
            {"excess volume A1", "alpha + beta", 1.5},
            {"excess volume covariance", "alpha + beta", 1.0, 0.0},
            {"excess volume A0", "beta + alpha", -4.0},
            {"excess volume covariance", "alpha + beta", 0.0, 1.0},
            {"excess enthalpy ternary C2", "alpha + beta + gamma", 9.0},
            {"excess enthalpy reference temperature", "alpha + beta", 298.15}});
        assertEquals(2, card.version());
        assertEquals(2, card.global("title").number);
        assertNull(card.global("note"));
        assertEquals(Arrays.asList("beta", "alpha"), new ArrayList<>(card.keyed("component").keySet()));
        assertEquals(6, card.keyed("component").get("alpha").number);
        assertTrue(card.keyed("density model").isEmpty());
        assertTrue(card.hasSection("excess volume"));
        ParsedCard.Section volume = card.section("excess volume");
        assertEquals(Arrays.asList(0, 1), new ArrayList<>(volume.binary.keySet()));
        assertEquals(9, volume.binary.get(0).get(0).number);
        assertEquals(2, volume.covariance.size(), "covariance rows repeat their subject and are not keyed");
        assertEquals(Arrays.asList(7, 8, 9, 10), numbers(volume.rows()));
        ParsedCard.Section enthalpy = card.section("excess enthalpy");
        assertEquals(11, enthalpy.ternary.get(2).get(0).number);
        assertEquals(12, enthalpy.reference.get(0).number);
        assertEquals(1, card.keyed("excess enthalpy reference temperature").size());
        assertFalse(card.hasSection("other"));
        assertTrue(card.section("other").rows().isEmpty());
    }

    @Test
    void theGrammarInterpretsNoValueBeyondASubject() {
        // Neither units nor the source are required at this stage, and values of any kind are kept as they are.
        ParsedCard card = CardGrammar.parse(new Object[][] {{"miscela card", 1.0}, {"valid temperature", "warm"}});
        assertEquals("warm", card.global("valid temperature").values[0]);
        assertEquals("The card lacks the row \"source\". A row typed below the card's named range is not part of "
                + "the card: insert rows inside the range, or widen the range (Sheet ▸ Named Ranges and Expressions ▸ "
                + "Manage).",
                assertThrows(MiscelaException.class, () -> card.required("source")).getMessage());
    }

    @Test
    void theFirstRowMustBeAKnownHeader() {
        refused(Problem.CARD_EMPTY, new Object[][] {{"", null}, {}});
        refused(Problem.CARD_EMPTY, null);
        assertEquals("Card row 2: a card starts with the row 'Miscela card | 1'; found \"title\".",
                refused(Problem.CARD_HEADER, new Object[][] {{" "}, {"title", "x"}, {"Miscela card", 1.0}})
                        .getMessage());
        refused(Problem.CARD_VERSION, new Object[][] {{"Miscela card", 2.5}});
        refused(Problem.NOT_A_NUMBER, new Object[][] {{"Miscela card", "1"}});
        refused(Problem.EXTRA_VALUE, new Object[][] {{"Miscela card", 1.0, "x"}});
    }

    @Test
    void aVersionOneCardHoldsNoVersionTwoRow() {
        for (String label : new String[] {"multicomponent model", "missing pairs", "enthalpy unit", "heat capacity",
            "excess volume covariance", "heat capacity reference temperature", "valid pair temperature",
            "valid pair mole fraction", "excess enthalpy A0", "excess volume ternary C0"}) {
            MiscelaException e = refused(Problem.NEEDS_VERSION_2,
                    new Object[][] {{"Miscela card", 1.0}, {label, "alpha + beta", 1.0}});
            assertTrue(e.getMessage().startsWith("Card row 2: \"" + label + "\""), e::getMessage);
            CardGrammar.parse(new Object[][] {{"Miscela card", 2.0}, {label, "alpha + beta", 1.0}});
        }
        // version 1 rows of a section
        CardGrammar.parse(new Object[][] {{"Miscela card", 1.0}, {"excess volume A99", "a + b", 1.0},
            {"excess volume reference temperature", "a + b", 298.15}});
    }

    @Test
    void aLabelIsGivenOncePerCardOrPerSubject() {
        assertEquals("Card row 3: \"Temperature  Unit\" is given twice (also in row 2).",
                refused(Problem.DUPLICATE_ROW, new Object[][] {{"Miscela card", 1.0}, {"temperature unit", "K"},
                    {"Temperature  Unit", "K"}}).getMessage());
        assertEquals("Card row 4: \"density model | ALPHA\" is given twice (also in row 2).",
                refused(Problem.DUPLICATE_ROW, new Object[][] {{"Miscela card", 1.0}, {"density model", "alpha"},
                    {"density model", "beta"}, {"density model", "ALPHA"}}).getMessage());
        CardGrammar.parse(new Object[][] {{"Miscela card", 1.0}, {"excess volume A0", "a + b", 1.0},
            {"excess volume A0", "a + c", 1.0}});
    }

    @Test
    void rowsOutsideTheFormatAreRefused() {
        assertEquals("Card row 2: unknown label \"excess volume ternary C3\".",
                refused(Problem.UNKNOWN_LABEL, new Object[][] {{"Miscela card", 2.0},
                    {"excess volume ternary C3", "a + b + c", 1.0}}).getMessage());
        refused(Problem.UNKNOWN_LABEL, new Object[][] {{"Miscela card", 2.0}, {"excess volume A100", "a + b", 1.0}});
        refused(Problem.UNKNOWN_LABEL, new Object[][] {{"Miscela card", 2.0}, {"excess entropy A0", "a + b", 1.0}});
        assertEquals("Card row 3 holds values but no label in its first column.",
                refused(Problem.NO_LABEL, new Object[][] {{"Miscela card", 2.0}, {"title", "t"}, {null, "x"}})
                        .getMessage());
        refused(Problem.MISSING_VALUE, new Object[][] {{"Miscela card", 2.0}, {"component"}});
        refused(Problem.NOT_TEXT, new Object[][] {{"Miscela card", 2.0}, {"density model", 4.0, "constant"}});
    }

    @Test
    void labelsFallIntoOneKindEach() {
        String[] all = {CardLabels.TITLE, CardLabels.SOURCE, CardLabels.TEMPERATURE_UNIT, CardLabels.DENSITY_UNIT,
            CardLabels.MOLAR_VOLUME_UNIT, CardLabels.MOLAR_MASS_UNIT, CardLabels.VALID_TEMPERATURE,
            CardLabels.EXTRAPOLATION, CardLabels.COMPONENT, CardLabels.DENSITY_MODEL, CardLabels.DENSITY_REFERENCE,
            CardLabels.DENSITY_COEFFICIENTS, CardLabels.VALID_MOLE_FRACTION, CardLabels.MODEL,
            CardLabels.MISSING_PAIRS, CardLabels.ENTHALPY_UNIT, CardLabels.HEAT_CAPACITY,
            CardLabels.HEAT_CAPACITY_REFERENCE, CardLabels.VALID_PAIR_TEMPERATURE, CardLabels.VALID_PAIR_FRACTION,
            "excess volume a0", "excess enthalpy ternary c1", "excess volume reference temperature",
            "excess enthalpy covariance"};
        for (String label : all) {
            int kinds = (CardLabels.isGlobal(label) ? 1 : 0) + (CardLabels.isKeyed(label) ? 1 : 0)
                    + (CardLabels.isSectionRow(label) ? 1 : 0);
            assertEquals(1, kinds, label);
            assertEquals(label, CardReader.normalise(label), "labels are kept normalised");
        }
        assertEquals(2, CardLabels.subjectSize("excess volume a12"));
        assertEquals(3, CardLabels.subjectSize("excess enthalpy ternary c0"));
        assertEquals(0, CardLabels.subjectSize("excess volume covariance"));
        assertEquals(0, CardLabels.subjectSize("component"));
        assertTrue(CardLabels.isPairKeyed(CardLabels.VALID_PAIR_FRACTION));
        assertFalse(CardLabels.isPairKeyed(CardLabels.VALID_MOLE_FRACTION));
    }

    private static List<Integer> numbers(List<CardRow> rows) {
        List<Integer> out = new ArrayList<>();
        for (CardRow r : rows) {
            out.add(r.number);
        }
        return out;
    }
}
