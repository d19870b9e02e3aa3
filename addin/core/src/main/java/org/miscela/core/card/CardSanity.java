package org.miscela.core.card;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.miscela.core.problem.Problem;

/**
 * What MIX.CHECK says about a card beyond "it reads": warnings about what is readable but looks like a mistake, and
 * which part of the range holds the card. Warnings never change what any function computes; they are words for the
 * person who made the card. In the order they are listed:
 *
 * <ul>
 *   <li>the range is far larger than the card in it (a card named as whole columns): every call pays for every cell
 *       ({@link #WARN_CELLS}, {@link #WARN_FACTOR});</li>
 *   <li>the rows after the header are in sorted order, as Data ▸ Sort leaves them, so the component rows may have
 *       moved ({@link #SORTED_ROWS}); a card with a 'component order' row is refused instead when they have;</li>
 *   <li>molar masses, pure densities, thermal expansion and molar volumes outside the ranges of common liquids
 *       ({@link CardPlausibility});</li>
 *   <li>coefficients written with fewer significant digits than the card needs because its terms cancel
 *       ({@link CardDigits});</li>
 *   <li>a G^E and an H^E on one card that disagree by the Gibbs–Helmholtz relation ({@link CardGibbsHelmholtz}).</li>
 * </ul>
 */
public final class CardSanity {
    /** A range of fewer cells costs little whatever it holds (0.34 µs a cell and call: under 4 ms). */
    static final long WARN_CELLS = 10_000;
    /** How many times the card's own extent a range must be to count as far larger than its card. */
    static final long WARN_FACTOR = 10;
    /** Calc's cost of handing one cell of a range argument to the add-in, per call (docs/performance.md). */
    static final double SECONDS_PER_CELL = 0.34e-6;
    /** Fewest rows after the header whose sorted order counts as a sign of Data ▸ Sort (and distinct keys among them). */
    static final int SORTED_ROWS = 8;
    private static final int SORTED_KEYS = 3;

    private CardSanity() {
    }

    /** Which part of a range holds a card: the range's size and the last row and column with a non-blank cell. */
    public static final class Extent {
        private final int rows;
        private final int columns;
        private final int lastRow;
        private final int lastColumn;
        private final int readRows;

        Extent(int rows, int columns, int lastRow, int lastColumn, int readRows) {
            this.rows = rows;
            this.columns = columns;
            this.lastRow = lastRow;
            this.lastColumn = lastColumn;
            this.readRows = readRows;
        }

        /** Rows of the range. */
        public int rows() {
            return rows;
        }

        /** Columns of the range (of its widest row). */
        public int columns() {
            return columns;
        }

        /** The last row (1-based) with a non-blank cell. */
        public int lastRow() {
            return lastRow;
        }

        /** The last column (1-based) with a non-blank cell in any row. */
        public int lastColumn() {
            return lastColumn;
        }

        /** Rows with a non-blank cell: the rows the reader reads. */
        public int readRows() {
            return readRows;
        }

        /** Cells of the range, every one of which Calc converts for every call. */
        public long cells() {
            return (long) rows * columns;
        }

        /** Cells of the block the card fills, from the range's first cell to its last row and column. */
        public long filledCells() {
            return (long) lastRow * lastColumn;
        }

        /** The extent in words: the range, the block the card fills, and what happens to a row typed below it. */
        public String words() {
            if (lastRow == rows) {
                return Problem.CHECK_EXTENT_TIGHT.format(rows, columns, lastRow, lastColumn, readRows);
            }
            return Problem.CHECK_EXTENT_SPARE.format(rows, columns, lastRow, lastColumn, readRows, lastRow + 1, rows,
                    rows);
        }
    }

    /** The extent of the card in a range; refused ({@code CARD_EMPTY}) when the range holds no non-blank cell. */
    public static Extent extent(Object[][] cells) {
        Object[][] in = cells == null ? new Object[0][] : cells;
        int columns = 0;
        int lastRow = 0;
        int lastColumn = 0;
        int read = 0;
        for (int i = 0; i < in.length; i++) {
            Object[] row = in[i] == null ? new Object[0] : in[i];
            columns = Math.max(columns, row.length);
            int last = row.length;
            while (last > 0 && CardReader.isBlank(row[last - 1])) {
                last--;
            }
            if (last > 0) {
                read++;
                lastRow = i + 1;
                lastColumn = Math.max(lastColumn, last);
            }
        }
        if (read == 0) {
            throw Problem.CARD_EMPTY.raise();
        }
        return new Extent(in.length, columns, lastRow, lastColumn, read);
    }

    /**
     * The warnings about a card that reads, in the order of the class comment; empty when there are none.
     *
     * @param cells the range as Calc passes it
     * @param card the card those cells hold (as {@link CardCache} or {@link CardReader} made it)
     */
    public static List<String> warnings(Object[][] cells, Card card) {
        List<String> out = new ArrayList<>();
        Extent extent = extent(cells);
        if (extent.cells() >= WARN_CELLS && extent.cells() >= WARN_FACTOR * extent.filledCells()) {
            out.add(Problem.WARN_RANGE_SIZE.format(grouped(extent.rows()), grouped(extent.columns()),
                    grouped(extent.cells()), extent.lastRow(), extent.lastColumn(), grouped(extent.filledCells()),
                    CardPlausibility.shown(extent.cells() * SECONDS_PER_CELL, 2)));
        }
        Object[][] filled = trimmed(cells, extent);
        ParsedCard rows = CardGrammar.parse(filled);
        String sorted = sorted(CardGrammar.rows(filled), rows, card);
        if (sorted != null) {
            out.add(sorted);
        }
        CardPlausibility.warnings(rows, card, out);
        CardDigits.warnings(rows, card, out);
        CardGibbsHelmholtz.warnings(card, out);
        return Collections.unmodifiableList(out);
    }

    /**
     * Every coefficient the conditioning check weighs, as a table with a header row: its card row, label, subject,
     * column, value as written, significant digits written and needed, what rounding in its last written digit can
     * change, in which property, and how many times the contribution of its whole pair (or term, or pure density) its
     * own term is.
     */
    public static Object[][] digits(Object[][] cells, Card card) {
        Object[][] filled = trimmed(cells, extent(cells));
        return CardDigits.table(CardGrammar.parse(filled), card);
    }

    /** The range cut to its filled block (rows to the last filled one, each to its last non-blank cell). */
    private static Object[][] trimmed(Object[][] cells, Extent extent) {
        Object[][] out = new Object[extent.lastRow()][];
        for (int i = 0; i < out.length; i++) {
            Object[] row = cells[i] == null ? new Object[0] : cells[i];
            int last = row.length;
            while (last > 0 && CardReader.isBlank(row[last - 1])) {
                last--;
            }
            out[i] = java.util.Arrays.copyOf(row, last);
        }
        return out;
    }

    /**
     * The warning about rows in sorted order, or null. Data ▸ Sort with "Range contains column labels" keeps the
     * header on top and sorts the rest, by the labels or by another column; a card written by hand is never sorted.
     * A card with a 'component order' row needs no warning: the reader refuses it when its component rows moved.
     */
    private static String sorted(List<CardRow> lines, ParsedCard rows, Card card) {
        if (rows.global(CardLabels.COMPONENT_ORDER) != null || lines.size() - 1 < SORTED_ROWS) {
            return null;
        }
        List<CardRow> body = lines.subList(1, lines.size());
        for (int column = 1; column <= 2; column++) {
            List<Object> keys = new ArrayList<>();
            for (CardRow r : body) {
                keys.add(column == 1 ? r.key : r.values.length > 0 ? r.values[0] : null);
            }
            String order = order(keys);
            if (order != null) {
                CardRow first = rows.keyed(CardLabels.COMPONENT).values().iterator().next();
                return Problem.WARN_SORTED.format(body.get(0).number, body.get(body.size() - 1).number, column, order,
                        card.components().get(0).name(), first.number);
            }
        }
        return null;
    }

    /**
     * "ascending" or "descending" when the keys are in Calc's sort order that way (numbers before text, text by
     * {@link #compareText}, blank cells last either way), with at least {@link #SORTED_KEYS} different keys; else null.
     * Calc sorts text by the locale's collation, which this only approximates, so one step in ten against the order
     * (at least one) is let pass: a card written by hand goes against any order at every other row or so.
     */
    static String order(List<Object> keys) {
        int blanks = 0;
        while (blanks < keys.size() && keys.get(keys.size() - 1 - blanks) == null) {
            blanks++;
        }
        List<Object> set = keys.subList(0, keys.size() - blanks);
        if (set.contains(null) || distinct(set) < SORTED_KEYS) {
            return null;
        }
        int against = Math.max(1, set.size() / 10);
        int down = 0;
        int up = 0;
        for (int i = 1; i < set.size(); i++) {
            int c = compare(set.get(i - 1), set.get(i));
            down += c > 0 ? 1 : 0;
            up += c < 0 ? 1 : 0;
        }
        return down <= against ? "ascending" : up <= against ? "descending" : null;
    }

    private static int distinct(List<Object> keys) {
        java.util.TreeSet<Object> set = new java.util.TreeSet<>(CardSanity::compare);
        set.addAll(keys);
        return set.size();
    }

    /** Calc's ascending order of two non-blank cells: numbers first, by value; then text ({@link #compareText}). */
    private static int compare(Object a, Object b) {
        if (a instanceof Double && b instanceof Double) {
            return Double.compare((Double) a, (Double) b);
        }
        if (a instanceof Double || b instanceof Double) {
            return a instanceof Double ? -1 : 1;
        }
        return compareText(a.toString(), b.toString());
    }

    /**
     * Text in the order of the common collation Calc sorts by, closely enough to tell a sorted card: without regard
     * to case and accents (³ is 3), spaces before punctuation, before symbols (°), before digits, before letters.
     */
    static int compareText(String a, String b) {
        String x = fold(a);
        String y = fold(b);
        for (int i = 0; i < Math.min(x.length(), y.length()); i++) {
            char p = x.charAt(i);
            char q = y.charAt(i);
            if (p != q) {
                int c = Integer.compare(rank(p), rank(q));
                return c != 0 ? c : Character.compare(p, q);
            }
        }
        return Integer.compare(x.length(), y.length());
    }

    /** Lower case, compatibility forms (³ → 3) and accents dropped. */
    private static String fold(String s) {
        String n = java.text.Normalizer.normalize(s.trim(), java.text.Normalizer.Form.NFKD);
        return n.replaceAll("\\p{M}", "").toLowerCase(Locale.ROOT);
    }

    private static int rank(char c) {
        if (Character.isWhitespace(c)) {
            return 0;
        }
        if (Character.isDigit(c)) {
            return 3;
        }
        if (Character.isLetter(c)) {
            return 4;
        }
        switch (Character.getType(c)) {
            case Character.MATH_SYMBOL:
            case Character.CURRENCY_SYMBOL:
            case Character.MODIFIER_SYMBOL:
            case Character.OTHER_SYMBOL:
                return 2;
            default:
                return 1;
        }
    }

    /** A count with thousands separators, as the warnings write large numbers: 1,048,576. */
    private static String grouped(long n) {
        return String.format(Locale.ROOT, "%,d", n);
    }
}
