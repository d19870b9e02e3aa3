package org.miscela.core.card;

import org.miscela.core.problem.MiscelaException;
import java.util.Arrays;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Parsed cards keyed by the content of their cells, so a sheet with thousands of formulas over one card parses it
 * once. Failed parses are remembered too (the same bad card fails the same way). Thread-safe and bounded twice: at
 * most {@code capacity} entries and at most {@code cellBudget} cells kept in the keys, the least recently used entry
 * going first. A key keeps only the card's extent: trailing blank rows and cells, which the reader ignores, are
 * dropped, so a card named as whole columns costs what its filled cells cost. A card larger than the whole budget is
 * parsed on every call and never kept. The entry found last is also kept aside and checked first, in place: a call
 * with the same card as the one before costs one comparison of its cells and allocates nothing (that entry may
 * outlive its eviction from the map by one lookup's time, so the bounds hold to within one card).
 */
public final class CardCache {
    /**
     * Cells the shared cache may keep. A kept cell costs a reference in the key plus the cell's value kept alive
     * (about 24 bytes for a number, 50 or more for a text), so this bounds the keys to some 25 to 60 MB; typical cards
     * have a few hundred cells, and the entry count binds long before this does.
     */
    public static final long DEFAULT_CELL_BUDGET = 1_000_000;
    private static final CardCache SHARED = new CardCache(64, DEFAULT_CELL_BUDGET);

    private final int capacity;
    private final long cellBudget;
    /** Access order: the eldest entry is the least recently used. Guarded by itself, as is {@link #cells}. */
    private final LinkedHashMap<ContentKey, Object> entries = new LinkedHashMap<>(16, 0.75f, true);
    private long cells;
    private final AtomicLong parses = new AtomicLong();

    public CardCache(int capacity) {
        this(capacity, DEFAULT_CELL_BUDGET);
    }

    public CardCache(int capacity, long cellBudget) {
        this.capacity = capacity;
        this.cellBudget = cellBudget;
    }

    /** The process-wide cache the add-in uses. */
    public static CardCache shared() {
        return SHARED;
    }

    /**
     * The entry the last lookup found or made. A sheet's formulas nearly always name the same card, so most calls
     * end here: the cells are compared with this entry's key in place, without a copy, a hash or the lock.
     */
    private volatile Recent recent;

    /** The card these cells hold, parsed at most once per distinct content; throws the parse failure otherwise. */
    public Card get(Object[][] cells) {
        Recent r = recent;
        if (r != null && r.key.sameContent(cells)) {
            return r.card();
        }
        ContentKey key = new ContentKey(cells);
        Object hit;
        // Parsing under the lock keeps "at most once per content" true when threads miss together; a parse is
        // short (tens of microseconds for a typical card) next to the bridge cost of one call.
        synchronized (entries) {
            hit = entries.get(key);
            if (hit == null) {
                try {
                    if (PackedCard.isPacked(key.cells)) {
                        // A packed card (MIX.PACK) is one text cell: kept under its text, it is the card of the
                        // cells it holds, looked up (or parsed) as those cells, so both forms share one card.
                        hit = get(PackedCard.unpack((String) key.cells[0][0]));
                    } else {
                        // The key's cells are the card's extent: the reader ignores what was trimmed, so it reads
                        // the same card without scanning the blank rest of a range named as whole columns again.
                        parses.incrementAndGet();
                        hit = CardReader.read(key.cells);
                    }
                } catch (MiscelaException e) {
                    hit = e;
                }
                if (key.cellCount <= cellBudget) {
                    entries.put(key, hit);
                    this.cells += key.cellCount;
                    evict();
                }
            }
        }
        Recent found = new Recent(key, hit);
        if (key.cellCount <= cellBudget) {
            recent = found;
        }
        return found.card();
    }

    /** A key with its card or its parse failure. Immutable. */
    private static final class Recent {
        final ContentKey key;
        final Object value;

        Recent(ContentKey key, Object value) {
            this.key = key;
            this.value = value;
        }

        Card card() {
            if (value instanceof MiscelaException) {
                throw (MiscelaException) value;
            }
            return (Card) value;
        }
    }

    /** Drops least recently used entries until both bounds hold (the newest entry fits the budget alone). */
    private void evict() {
        Iterator<ContentKey> eldest = entries.keySet().iterator();
        while (entries.size() > capacity || this.cells > cellBudget) {
            this.cells -= eldest.next().cellCount;
            eldest.remove();
        }
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

    /** How many cells the keys of the entries hold. */
    public long retainedCells() {
        synchronized (entries) {
            return cells;
        }
    }

    /**
     * The cells' content as a map key, compared cell by cell: a copy (the caller may reuse its arrays) of the rows up
     * to the last one with a non-blank cell, each up to its last non-blank cell. Blank rows inside the card stay, as
     * empty rows, because messages count them.
     */
    private static final class ContentKey {
        private final Object[][] cells;
        private final int hash;
        final long cellCount;

        ContentKey(Object[][] range) {
            Object[][] in = range == null ? new Object[0][] : range;
            int rows = in.length;
            while (rows > 0 && extent(in[rows - 1]) == 0) {
                rows--;
            }
            this.cells = new Object[rows][];
            long count = 0;
            for (int i = 0; i < rows; i++) {
                cells[i] = in[i] == null ? new Object[0] : Arrays.copyOf(in[i], extent(in[i]));
                count += cells[i].length;
            }
            this.cellCount = count;
            this.hash = Arrays.deepHashCode(cells);
        }

        /** The length of the row without its trailing blank cells. */
        private static int extent(Object[] row) {
            if (row == null) {
                return 0;
            }
            int last = row.length;
            while (last > 0 && CardReader.isBlank(row[last - 1])) {
                last--;
            }
            return last;
        }

        /**
         * Whether these cells hold this key's content: the same cells as {@link #equals} compares, with every cell
         * beyond the key's extent blank.
         */
        boolean sameContent(Object[][] range) {
            Object[][] in = range == null ? new Object[0][] : range;
            if (in.length < cells.length) {
                return false;
            }
            for (int i = 0; i < cells.length; i++) {
                Object[] row = in[i] == null ? new Object[0] : in[i];
                Object[] kept = cells[i];
                if (row.length < kept.length) {
                    return false;
                }
                for (int c = 0; c < kept.length; c++) {
                    if (!java.util.Objects.equals(kept[c], row[c])) {
                        return false;
                    }
                }
                if (extent(row) != kept.length) {
                    return false;
                }
            }
            for (int i = cells.length; i < in.length; i++) {
                if (extent(in[i]) != 0) {
                    return false;
                }
            }
            return true;
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
