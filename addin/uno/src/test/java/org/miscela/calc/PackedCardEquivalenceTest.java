package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.uno.Any;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.FuzzCards;
import org.miscela.core.card.PackedCard;
import org.miscela.core.card.TestCards;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.problem.Catalogue;
import org.miscela.testing.Figures;

/**
 * The packed card (MIX.PACK) in the card's place gives every function's outcome exactly as the range does: the same
 * numbers to the bit, the same texts, the same refusal in the same words, over fuzz calls of every function on valid,
 * extreme and mutated cards (a mutated card that cannot be read is packed all the same here, to show that its
 * refusal is the range's too). MIX.CHECK is left out: its range-size warning and its "extent" answer describe the
 * range, which a packed card no longer has; MIX.INFO reports the cache.
 */
class PackedCardEquivalenceTest {
    @Test
    void thePackedCardGivesTheRangesOutcomesExactly() {
        Random r = new Random(20_261_205L);
        List<FunctionInfo> functions = new ArrayList<>(FuzzCall.fuzzed());
        functions.removeIf(f -> f.method().equals("addInInfo") || f.method().equals("checkCard")
                || !f.arguments().get(0).name().equals("card"));
        MixtureAddIn addIn = new MixtureAddIn();
        int numbers = 0;
        int refusals = 0;
        for (int i = 0; i < 800; i++) {
            FuzzCards.Kind kind = i % 5 == 0 ? FuzzCards.Kind.MUTATED : i % 5 == 1 ? FuzzCards.Kind.EXTREME
                    : FuzzCards.Kind.VALID;
            FuzzCall call = FuzzCall.of(functions.get(r.nextInt(functions.size())), FuzzCards.of(kind, r.nextLong()),
                    r.nextLong());
            Object[][] packed = {{PackedCard.pack(call.cardCells())}};
            String range = DeterminismTest.outcome(addIn, call);
            String text;
            try {
                text = render(call.invoke(addIn, packed));
            } catch (Exception e) {
                text = "error " + e.getClass().getName() + ": " + e.getMessage();
            }
            assertEquals(range, text, "call " + i + ": " + call);
            if (range.startsWith("error")) {
                refusals++;
            } else {
                numbers++;
            }
        }
        assertTrue(numbers > 100 && refusals > 50, numbers + " results, " + refusals + " refusals");
        Figures.note(PackedCardEquivalenceTest.class, "800 fuzz calls: %d results and %d refusals identical with the "
                + "packed card", numbers, refusals);
    }

    /** DeterminismTest's rendering: raw bits of every number, texts verbatim. */
    private static String render(Object v) {
        return DeterminismTest.render(v);
    }

    /** MIX.PACK through the interface: the text of a card that reads; the card's own problem for one that does not. */
    @Test
    void packIsRefusedForACardThatDoesNotRead() throws Exception {
        MixtureAddIn addIn = new MixtureAddIn();
        Object[][] card = TestCards.cells("ethanol-water-oiml.tsv");
        String packed = (String) addIn.packCard(card);
        assertTrue(packed.startsWith("Miscela packed card 1 · "), packed.substring(0, 30));
        assertEquals(addIn.mixtureDensity(card, new Object[][] {{0.3}}, new Object[][] {{20.0}}, Any.VOID, Any.VOID,
                Any.VOID), addIn.mixtureDensity(new Object[][] {{packed}}, new Object[][] {{0.3}},
                new Object[][] {{20.0}}, Any.VOID, Any.VOID, Any.VOID));
        Object[][] broken = TestCards.cells("broken-unit.tsv");
        com.sun.star.lang.IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(
                com.sun.star.lang.IllegalArgumentException.class, () -> addIn.packCard(broken));
        assertEquals("Problem.UNKNOWN_UNIT", Catalogue.entryOf(e.getMessage()), e.getMessage());
        // packing a packed card gives the same text
        assertEquals(packed, addIn.packCard(new Object[][] {{packed}}));
    }
}
