package org.miscela.core.card;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** The content-keyed card cache. Card values are invented. */
class CardCacheTest {
    private static final double T = 298.15;

    /** The base card with its A0 replaced, so each value gives a distinct card. */
    private static Object[][] card(double a0) {
        return TestCard.base().set(17, "excess volume A0", "alpha + beta", a0).cells();
    }

    @Test
    void sameContentIsParsedOnce() {
        CardCache cache = new CardCache(8);
        Object[][] cells = card(-4.0);
        Card first = cache.get(cells);
        Card second = cache.get(cells);
        assertSame(first, second);
        assertEquals(1, cache.parseCount());
        assertEquals(1, cache.size());
    }

    @Test
    void equalContentInAnotherArrayHits() {
        CardCache cache = new CardCache(8);
        Card first = cache.get(card(-4.0));
        Card second = cache.get(card(-4.0)); // a fresh array with equal cells
        assertSame(first, second);
        assertEquals(1, cache.parseCount());
        Card other = cache.get(card(-3.0));
        assertNotSame(first, other);
        assertEquals(-3.0, other.excessVolume(0, 1).coefficientAt(0, T), 0.0);
        assertEquals(2, cache.parseCount());
    }

    @Test
    void changingTheCallersArrayAfterwardsDoesNotChangeTheEntry() {
        CardCache cache = new CardCache(8);
        Object[][] cells = card(-4.0);
        Card first = cache.get(cells);
        cells[16][2] = -3.0; // the caller reuses its array for other content
        Card changed = cache.get(cells);
        assertEquals(-3.0, changed.excessVolume(0, 1).coefficientAt(0, T), 0.0);
        assertSame(first, cache.get(card(-4.0)));
        assertEquals(2, cache.parseCount());
    }

    @Test
    void leastRecentlyUsedEntryIsEvictedBeyondCapacity() {
        CardCache cache = new CardCache(2);
        Card a = cache.get(card(-1.0));
        cache.get(card(-2.0));
        assertSame(a, cache.get(card(-1.0))); // -1 is now the most recently used
        cache.get(card(-3.0)); // evicts -2
        assertEquals(2, cache.size());
        assertEquals(3, cache.parseCount());
        assertSame(a, cache.get(card(-1.0)));
        assertEquals(3, cache.parseCount());
        cache.get(card(-2.0)); // parsed again; evicts -3
        assertEquals(4, cache.parseCount());
        assertEquals(2, cache.size());
        cache.get(card(-3.0));
        assertEquals(5, cache.parseCount());
    }

    @Test
    void failuresAreCachedAndRethrown() {
        CardCache cache = new CardCache(8);
        Object[][] bad = TestCard.base().set(4, "temperature unit", "kelvin").cells();
        MiscelaException first = assertThrows(MiscelaException.class, () -> cache.get(bad));
        assertEquals(Problem.UNKNOWN_UNIT, first.problem());
        MiscelaException again = assertThrows(MiscelaException.class,
                () -> cache.get(TestCard.base().set(4, "temperature unit", "kelvin").cells()));
        assertSame(first, again);
        assertEquals(first.getMessage(), again.getMessage());
        assertEquals(1, cache.parseCount());
        assertEquals(1, cache.size());
    }

    @Test
    void emptyAndNullRangesFailTheSameWay() {
        CardCache cache = new CardCache(8);
        assertEquals(Problem.CARD_EMPTY, assertThrows(MiscelaException.class, () -> cache.get(null)).problem());
        assertEquals(Problem.CARD_EMPTY,
                assertThrows(MiscelaException.class, () -> cache.get(new Object[0][])).problem());
    }

    @Test
    void sharedCacheIsOneInstance() {
        assertSame(CardCache.shared(), CardCache.shared());
    }

    private static final int THREADS = 8;
    private static final int GETS_PER_THREAD = 2000;
    private static final double[] A0 = {-1.0, -2.0, -3.0, -4.0, -5.0};
    /** The distinct contents the concurrent tests use: the cards of {@link #A0} and one malformed card. */
    private static final int DISTINCT = A0.length + 1;

    private static Object[][] malformed() {
        return TestCard.base().blank(16).cells();
    }

    /** 8 threads × 2,000 gets over the distinct contents, released together; every result is checked. */
    private static void hammer(CardCache cache) throws Exception {
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        try {
            List<Future<Integer>> results = new ArrayList<>();
            for (int t = 0; t < THREADS; t++) {
                final int seed = t;
                results.add(pool.submit(() -> {
                    start.await();
                    int checked = 0;
                    for (int i = 0; i < GETS_PER_THREAD; i++) {
                        int which = (i * 7 + seed * 3) % DISTINCT;
                        if (which == A0.length) {
                            MiscelaException e = assertThrows(MiscelaException.class, () -> cache.get(malformed()));
                            assertEquals(Problem.NO_COMPOSITION_LIMIT, e.problem());
                        } else {
                            Card c = cache.get(card(A0[which]));
                            assertEquals(A0[which], c.excessVolume(0, 1).coefficientAt(0, T), 0.0);
                        }
                        checked++;
                    }
                    return checked;
                }));
            }
            start.countDown();
            int total = 0;
            for (Future<Integer> f : results) {
                total += f.get(60, TimeUnit.SECONDS); // an assertion failure in a thread surfaces here
            }
            assertEquals(THREADS * GETS_PER_THREAD, total);
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void concurrentGetsReturnTheRightCard() throws Exception {
        CardCache cache = new CardCache(16); // room for all: no evictions
        hammer(cache);
        assertEquals(DISTINCT, cache.size());
        assertTrue(cache.parseCount() >= DISTINCT);
    }

    @Test
    void concurrentGetsOnAWarmCacheParseNothingMore() throws Exception {
        CardCache cache = new CardCache(16);
        for (double a : A0) {
            cache.get(card(a));
        }
        assertThrows(MiscelaException.class, () -> cache.get(malformed()));
        assertEquals(DISTINCT, cache.parseCount());
        hammer(cache);
        assertEquals(DISTINCT, cache.parseCount());
        assertEquals(DISTINCT, cache.size());
    }

    /**
     * The documented promise "parsed at most once per distinct content" under concurrency, with no evictions:
     * parseCount ≤ distinct cards + evictions (= 0 here).
     */
    @Test
    void concurrentColdGetsParseEachContentOnce() throws Exception {
        CardCache cache = new CardCache(16);
        hammer(cache);
        assertTrue(cache.parseCount() <= DISTINCT,
                "parsed " + cache.parseCount() + " times for " + DISTINCT + " distinct cards");
    }

    /** The cells widened by blank columns and followed by blank rows, as a card named generously arrives. */
    private static Object[][] padded(Object[][] cells, int extraColumns, int extraRows) {
        int width = 0;
        for (Object[] row : cells) {
            width = Math.max(width, row.length);
        }
        Object[][] out = new Object[cells.length + extraRows][width + extraColumns];
        for (int r = 0; r < out.length; r++) {
            java.util.Arrays.fill(out[r], "");
            if (r < cells.length) {
                System.arraycopy(cells[r], 0, out[r], 0, cells[r].length);
            }
        }
        return out;
    }

    @Test
    void theRecentEntryIsComparedByContentAndIgnoresOnlyBlanks() {
        CardCache cache = new CardCache(8);
        Card first = cache.get(card(-4.0));
        // the same content with blank margins: a hit in place, no parse
        assertSame(first, cache.get(padded(card(-4.0), 3, 5)));
        assertEquals(1, cache.parseCount());
        // a text in what was a blank margin cell is other content (and this one a faulty card)
        Object[][] noted = padded(card(-4.0), 3, 5);
        noted[2][noted[2].length - 1] = "a note";
        assertThrows(MiscelaException.class, () -> cache.get(noted));
        assertEquals(2, cache.parseCount());
        // back to the first content: found in the map (not the recent entry), still no new parse
        assertSame(first, cache.get(card(-4.0)));
        assertEquals(2, cache.parseCount());
        // a text in a blank row below the card is other content too
        Object[][] below = padded(card(-4.0), 0, 2);
        below[below.length - 1][0] = "stray";
        assertThrows(MiscelaException.class, () -> cache.get(below));
        assertEquals(3, cache.parseCount());
        // a remembered failure is thrown again from the recent entry, without a parse
        assertThrows(MiscelaException.class, () -> cache.get(below));
        assertEquals(3, cache.parseCount());
        // a row cut short loses a value: other content
        Object[][] cut = card(-4.0);
        cut[16] = java.util.Arrays.copyOf(cut[16], 2);
        assertThrows(MiscelaException.class, () -> cache.get(cut));
        assertEquals(4, cache.parseCount());
        // a number that only looks equal is not: -0.0 and 0.0 differ in their bits, as in the map's key
        Card zero = cache.get(card(0.0));
        assertNotSame(zero, cache.get(card(-0.0)));
        assertEquals(6, cache.parseCount());
    }
}
