package org.miscela.core.card;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

/**
 * The card cache's two bounds (entries and retained cells) and its behaviour under many threads with many distinct
 * and repeated contents, including while it evicts. Card values are invented.
 */
class CardCacheBoundsTest {
    private static final double T = 298.15;

    /** The base card with its A0 replaced, so each value gives a distinct card. */
    private static Object[][] card(double a0) {
        return TestCard.base().set(17, "excess volume A0", "alpha + beta", a0).cells();
    }

    private static long cellsOf(Object[][] cells) {
        long n = 0;
        for (Object[] row : cells) {
            for (Object v : row) {
                n += CardReader.isBlank(v) ? 0 : 1;
            }
        }
        return n;
    }

    private static double a0(Card c) {
        return c.excessVolume(0, 1).coefficientAt(0, T);
    }

    /** A card named as whole columns: the filled rows, then blank cells down to the last row of the sheet. */
    private static Object[][] asWholeColumns(Object[][] card, int rows, int columns) {
        Object[][] out = new Object[rows][columns];
        for (int i = 0; i < rows; i++) {
            for (int c = 0; c < columns; c++) {
                out[i][c] = i < card.length && c < card[i].length ? card[i][c] : "";
            }
        }
        return out;
    }

    @Test
    void trailingBlankRowsAndCellsAreNeitherKeptNorAnotherCard() {
        CardCache cache = new CardCache(8);
        Object[][] card = card(-4.0);
        Card plain = cache.get(card);
        long kept = cache.retainedCells();
        // The last cells of the base card's rows are all filled, so the key keeps exactly the filled cells.
        assertEquals(cellsOf(card), kept);
        Object[][] columns = asWholeColumns(card, 1_048_576, 6);
        assertSame(plain, cache.get(columns), "the same card, however far the range reaches");
        assertEquals(1, cache.parseCount());
        assertEquals(kept, cache.retainedCells(), "the million blank rows are not kept");
    }

    /**
     * A card named as whole columns is cheap for the add-in: the key looks at each cell once, the reader reads only
     * the key's extent (not the million blank rows again), and a hit compares the filled cells only. The bound is
     * the fuzzers' per-call bound, far above what this takes (the time is written to target/figures/), so it only
     * catches a cost that grows out of proportion. (In Calc the same range costs seconds per call: Calc converts every cell of a range
     * argument before calling the add-in; DEVELOPERS.md has the measurement.)
     */
    @Test
    void aWholeColumnCardCostsLittleToReadAndToFindAgain() {
        Object[][] card = card(-4.0);
        CardCache cache = new CardCache(8);
        long start = System.nanoTime();
        Card first = cache.get(asWholeColumns(card, 1_048_576, 6));
        for (int i = 0; i < 10; i++) {
            assertSame(first, cache.get(asWholeColumns(card, 1_048_576, 6)));
        }
        long millis = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - start);
        assertEquals(1, cache.parseCount());
        assertEquals(-4.0, a0(first), 0.0);
        Figures.note(CardCacheBoundsTest.class,
                "11 reads of a 1,048,576 × 6 whole-column card (arrays built each time): %d ms", millis);
        assertTrue(millis < 2000 * 11, "11 reads of a whole-column card took " + millis + " ms");
    }

    @Test
    void aCardLargerThanTheBudgetIsParsedEveryTimeAndNeverKept() {
        Object[][] small = card(-4.0);
        List<Object[]> rows = new ArrayList<>(Arrays.asList(small));
        Object[] note = new Object[2000];
        Arrays.fill(note, "ignored note text");
        note[0] = "note";
        rows.add(note);
        Object[][] large = rows.toArray(new Object[0][]);
        CardCache cache = new CardCache(8, 1000);
        Card first = cache.get(large);
        Card second = cache.get(large);
        assertNotSame(first, second);
        assertEquals(-4.0, a0(second), 0.0);
        assertEquals(2, cache.parseCount());
        assertEquals(0, cache.size());
        assertEquals(0, cache.retainedCells());
        cache.get(small);
        assertEquals(1, cache.size(), "cards within the budget are kept as before");
    }

    @Test
    void theCellBudgetEvictsTheLeastRecentlyUsed() {
        long perCard = cellsOf(card(-1.0));
        CardCache cache = new CardCache(100, perCard * 5 / 2); // room for two cards, not three
        Card one = cache.get(card(-1.0));
        cache.get(card(-2.0));
        assertSame(one, cache.get(card(-1.0))); // -1 is now the most recently used
        cache.get(card(-3.0)); // evicts -2
        assertEquals(2, cache.size());
        assertTrue(cache.retainedCells() <= perCard * 5 / 2);
        assertEquals(3, cache.parseCount());
        assertSame(one, cache.get(card(-1.0)));
        assertEquals(3, cache.parseCount());
        cache.get(card(-2.0));
        assertEquals(4, cache.parseCount(), "-2 was evicted and is parsed again");
    }

    private static final int THREADS = 8;

    /**
     * Threads released together, each getting random contents from {@code distinct} cards (each content is a fresh
     * array, as every Calc call is); every result is checked against its content, and the card returned for a
     * content is recorded. Meanwhile a watcher checks both bounds hold at every moment it looks.
     */
    private static ConcurrentHashMap<Double, List<Card>> hammer(CardCache cache, int distinct, int getsPerThread,
            int capacity, long budget) throws Exception {
        ConcurrentHashMap<Double, List<Card>> seen = new ConcurrentHashMap<>();
        CountDownLatch start = new CountDownLatch(1);
        AtomicBoolean running = new AtomicBoolean(true);
        AtomicLong looks = new AtomicLong();
        ExecutorService pool = Executors.newFixedThreadPool(THREADS + 1);
        try {
            Future<?> watcher = pool.submit(() -> {
                start.await();
                while (running.get()) {
                    assertTrue(cache.size() <= capacity, "size " + cache.size());
                    assertTrue(cache.retainedCells() <= budget, "cells " + cache.retainedCells());
                    looks.incrementAndGet();
                }
                return null;
            });
            List<Future<Integer>> workers = new ArrayList<>();
            for (int t = 0; t < THREADS; t++) {
                long seed = t;
                workers.add(pool.submit(() -> {
                    Random r = new Random(seed);
                    start.await();
                    for (int i = 0; i < getsPerThread; i++) {
                        // Skewed: a few contents are asked for often, most rarely, as on a real sheet.
                        int which = r.nextBoolean() ? r.nextInt(Math.min(4, distinct)) : r.nextInt(distinct);
                        double a0 = -1.0 - which;
                        Card c = cache.get(card(a0));
                        assertEquals(a0, a0(c), 0.0);
                        seen.computeIfAbsent(a0, k -> java.util.Collections.synchronizedList(new ArrayList<>()))
                                .add(c);
                    }
                    return getsPerThread;
                }));
            }
            start.countDown();
            int total = 0;
            for (Future<Integer> f : workers) {
                total += f.get(60, TimeUnit.SECONDS); // an assertion failure in a thread surfaces here
            }
            running.set(false);
            watcher.get(10, TimeUnit.SECONDS);
            assertEquals(THREADS * getsPerThread, total);
            assertTrue(looks.get() > 0, "the watcher looked");
        } finally {
            running.set(false);
            pool.shutdownNow();
        }
        return seen;
    }

    /** With room for every content: exactly one parse per content, and every thread gets that one card. */
    @Test
    void concurrentGetsOfManyContentsParseEachExactlyOnce() throws Exception {
        int distinct = 300;
        CardCache cache = new CardCache(1024);
        ConcurrentHashMap<Double, List<Card>> seen = hammer(cache, distinct, 1500, 1024,
                CardCache.DEFAULT_CELL_BUDGET);
        assertEquals(seen.size(), cache.parseCount(), "one parse per distinct content asked for");
        assertEquals(seen.size(), cache.size());
        for (List<Card> cards : seen.values()) {
            for (Card c : cards) {
                assertSame(cards.get(0), c, "one card per content, whichever thread asked");
            }
        }
    }

    /** With room for 8 of 200 contents: evictions all the time, and still every result right and the bounds kept. */
    @Test
    void concurrentGetsWhileEvictingStayRightAndBounded() throws Exception {
        int capacity = 8;
        long budget = cellsOf(card(-1.0)) * 6; // the cell budget binds before the entry count
        CardCache cache = new CardCache(capacity, budget);
        ConcurrentHashMap<Double, List<Card>> seen = hammer(cache, 200, 1500, capacity, budget);
        assertTrue(cache.size() <= 6, "size " + cache.size());
        assertTrue(cache.retainedCells() <= budget);
        assertTrue(cache.parseCount() >= seen.size(), "every content was parsed at least once");
        assertTrue(cache.parseCount() <= THREADS * 1500L);
    }
}
