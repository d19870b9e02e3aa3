package org.miscela.core;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Parsed cards keyed by the content of their cells, so a sheet with thousands of formulas over one card parses it
 * once. Failed parses are remembered too (the same bad card fails the same way). Thread-safe and bounded: the least
 * recently used entry goes first.
 */
public final class CardCache {
    private static final CardCache SHARED = new CardCache(64);

    private final int capacity;
    private final Map<ContentKey, Object> entries;
    private final AtomicLong parses = new AtomicLong();

    public CardCache(int capacity) {
        this.capacity = capacity;
        this.entries = new LinkedHashMap<ContentKey, Object>(16, 0.75f, true) {
            private static final long serialVersionUID = 1L;

            @Override
            protected boolean removeEldestEntry(Map.Entry<ContentKey, Object> eldest) {
                return size() > CardCache.this.capacity;
            }
        };
    }

    /** The process-wide cache the add-in uses. */
    public static CardCache shared() {
        return SHARED;
    }

    /** The card these cells hold, parsed at most once per distinct content; throws the parse failure otherwise. */
    public Card get(Object[][] cells) {
        ContentKey key = new ContentKey(cells);
        Object hit;
        // Parsing under the lock keeps "at most once per content" true when threads miss together; a parse is
        // short (tens of microseconds for a typical card) next to the bridge cost of one call.
        synchronized (entries) {
            hit = entries.get(key);
            if (hit == null) {
                try {
                    hit = CardReader.read(cells);
                } catch (MiscelaException e) {
                    hit = e;
                }
                parses.incrementAndGet();
                entries.put(key.detached(), hit);
            }
        }
        if (hit instanceof MiscelaException) {
            throw (MiscelaException) hit;
        }
        return (Card) hit;
    }

    /** How many parses this cache has run (a measure of how well it works). */
    public long parseCount() {
        return parses.get();
    }

    public int size() {
        synchronized (entries) {
            return entries.size();
        }
    }

    /** The cells' content as a map key; compares cell by cell. */
    private static final class ContentKey {
        private final Object[][] cells;
        private final int hash;

        ContentKey(Object[][] cells) {
            this.cells = cells == null ? new Object[0][] : cells;
            this.hash = Arrays.deepHashCode(this.cells);
        }

        private ContentKey(Object[][] cells, int hash) {
            this.cells = cells;
            this.hash = hash;
        }

        /** A copy that no longer shares the caller's arrays (cell values themselves are immutable). */
        ContentKey detached() {
            Object[][] copy = new Object[cells.length][];
            for (int i = 0; i < cells.length; i++) {
                copy[i] = cells[i] == null ? null : cells[i].clone();
            }
            return new ContentKey(copy, hash);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof ContentKey && ((ContentKey) o).hash == hash
                    && Arrays.deepEquals(((ContentKey) o).cells, cells);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }
}
