package org.miscela.core.card;

import org.miscela.core.problem.Catalogue;
import org.miscela.core.problem.MiscelaException;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tuple;
import net.jqwik.api.lifecycle.AddLifecycleHook;
import net.jqwik.api.lifecycle.AfterContainer;

/**
 * Fuzzing the card reader: valid, extreme, mutated, label-soup and degenerate ranges (see {@link FuzzCards}) must
 * each read into a card or fail with the designed {@link MiscelaException}, whose message is an instance of its own
 * catalogue entry; never another exception, and every read within {@link FuzzTally#CALL_BOUND_NANOS}. Valid cards
 * must read, and read as written.
 *
 * <p>Cases are built from a seed (shrinking a seed means nothing, so it is off); a failure prints the whole card.
 */
class CardReaderFuzzProperties {
    private static final FuzzTally TALLY = new FuzzTally("card-reader");

    @Provide
    Arbitrary<FuzzCards.Blueprint> cards() {
        Arbitrary<FuzzCards.Kind> kinds = Arbitraries.frequency(Tuple.of(20, FuzzCards.Kind.VALID),
                Tuple.of(10, FuzzCards.Kind.EXTREME), Tuple.of(45, FuzzCards.Kind.MUTATED),
                Tuple.of(15, FuzzCards.Kind.SOUP), Tuple.of(10, FuzzCards.Kind.SHAPE));
        return Combinators.combine(kinds, Arbitraries.longs()).as(FuzzCards::of);
    }

    @Property(shrinking = ShrinkingMode.OFF)
    @FuzzProfile.Tries(ci = 5_000, full = 500_000)
    @AddLifecycleHook(FuzzProfile.class)
    void everyRangeReadsOrFailsByDesign(@ForAll("cards") FuzzCards.Blueprint card) {
        try {
            check(card);
        } catch (AssertionError e) {
            TALLY.unexpected();
            throw e;
        }
    }

    private static void check(FuzzCards.Blueprint card) {
        Object whole = read(card, false);
        Object pure = read(card, true);
        if (card.kind == FuzzCards.Kind.VALID) {
            assertTrue(whole instanceof Card, () -> "a valid card was refused: " + whole + "\n" + card);
            Card c = (Card) whole;
            assertEquals(card.names.size(), c.componentCount(), () -> card.toString());
            for (int k = 0; k < card.names.size(); k++) {
                assertEquals(card.names.get(k).trim(), c.components().get(k).name());
            }
            assertEquals(card.volume, c.excessVolume() != null, () -> card.toString());
            assertEquals(card.enthalpy, c.excessEnthalpy() != null, () -> card.toString());
        }
        if (whole instanceof Card) {
            // Reading only the pure-component part is more lenient, never stricter.
            assertTrue(pure instanceof Card, () -> "the card reads but its pure part does not: " + pure + "\n" + card);
            sanity(card, (Card) whole);
        }
    }

    /**
     * MIX.CHECK's warnings and digits table on a card that reads: never an exception, every warning an instance of a
     * CHECK entry of the catalogue, the table a header and one row of ten cells per coefficient, no NaN.
     */
    private static void sanity(FuzzCards.Blueprint card, Card c) {
        long start = System.nanoTime();
        java.util.List<String> warnings;
        Object[][] digits;
        try {
            warnings = CardSanity.warnings(card.cells, c);
            digits = CardSanity.digits(card.cells, c);
        } catch (RuntimeException | Error e) {
            throw new AssertionError("CardSanity threw " + e + " for " + card, e);
        }
        for (String w : warnings) {
            String entry = Catalogue.entryOf(w);
            assertTrue(entry != null && org.miscela.core.problem.Problem.valueOf(entry.substring(8)).section()
                    == org.miscela.core.problem.Problem.Section.CHECK, () -> "not a warning: " + w + "\n" + card);
            assertTrue(!w.contains("NaN"), () -> "a NaN in " + w + "\n" + card);
        }
        for (Object[] row : digits) {
            assertEquals(10, row.length, () -> card.toString());
            for (Object v : row) {
                assertTrue(v instanceof String || (v instanceof Double && Double.isFinite((Double) v)),
                        () -> "digits cell " + v + "\n" + card);
            }
        }
        TALLY.count("CardSanity.warnings", warnings.isEmpty() ? "no warning" : "warnings", System.nanoTime() - start,
                card::toString);
    }

    /** One timed read: the card, or the message of the designed failure. */
    private static Object read(FuzzCards.Blueprint card, boolean pureOnly) {
        String target = pureOnly ? "CardReader.readPureComponents" : "CardReader.read";
        long start = System.nanoTime();
        try {
            Card c = pureOnly ? CardReader.readPureComponents(card.cells) : CardReader.read(card.cells);
            TALLY.count(target, "card", System.nanoTime() - start, card::toString);
            return c;
        } catch (MiscelaException e) {
            long nanos = System.nanoTime() - start;
            assertNotNull(e.problem(), () -> "no problem in " + e + " for " + card);
            assertTrue(Catalogue.isInstanceOf(e.problem(), e.getMessage()),
                    () -> "message is not an instance of " + e.problem() + ": \"" + e.getMessage() + "\" for " + card);
            TALLY.count(target, "error Problem." + e.problem().name(), nanos, card::toString);
            return e.getMessage();
        } catch (RuntimeException | Error e) {
            throw new AssertionError(target + " threw " + e + " for " + card, e);
        }
    }

    @AfterContainer
    static void report() {
        TALLY.write();
    }
}
