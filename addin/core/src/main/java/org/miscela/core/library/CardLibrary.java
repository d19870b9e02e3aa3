package org.miscela.core.library;

import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.problem.Problem;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * The cards shipped with the add-in. {@code index.tsv} (this package's resources) lists them: key, other names,
 * file, stated accuracy and the outside check; each file is a card, tab-separated, a number where a cell holds a
 * number. Read once, on first use; immutable after that.
 */
public final class CardLibrary {
    private static final String ROOT = "/org/miscela/core/library/";
    private static volatile List<Entry> entries;

    private CardLibrary() {
    }

    /** One library card. */
    public static final class Entry {
        private final String key;
        private final List<String> otherNames;
        private final String file;
        private final String accuracy;
        private final String check;
        private final Object[][] cells;
        private final Card card;

        Entry(String key, List<String> otherNames, String file, String accuracy, String check, Object[][] cells) {
            this.key = key;
            this.otherNames = Collections.unmodifiableList(new ArrayList<>(otherNames));
            this.file = file;
            this.accuracy = accuracy;
            this.check = check;
            this.cells = cells;
            this.card = CardReader.read(cells());
        }

        public String key() {
            return key;
        }

        /** Other names the card is found by (a formula, say). */
        public List<String> otherNames() {
            return otherNames;
        }

        public String file() {
            return file;
        }

        /** The accuracy the source states for its correlation or table. */
        public String accuracy() {
            return accuracy;
        }

        /** The outside value a test holds the card to, in words. */
        public String check() {
            return check;
        }

        public Card card() {
            return card;
        }

        /**
         * The card's cells as placed in a sheet: the header, then a 'card size' row stating the rows and columns (so
         * a block too small for the array is refused, not read cut short), then the card's rows; every row as long as
         * the longest, blanks as "" (a rectangular array for Calc).
         */
        public Object[][] cells() {
            int width = 3;
            for (Object[] row : cells) {
                width = Math.max(width, row.length);
            }
            int height = cells.length + 1;
            Object[][] out = new Object[height][width];
            for (int i = 0; i < height; i++) {
                Object[] row = i == 0 ? cells[0] : i == 1 ? new Object[] {"card size", (double) height,
                    (double) width} : cells[i - 1];
                for (int j = 0; j < width; j++) {
                    out[i][j] = j < row.length ? row[j] : "";
                }
            }
            return out;
        }

        /** Whether this text names the card: its key or another name, ignoring case and runs of spaces. */
        boolean named(String text) {
            String t = plain(text);
            if (plain(key).equals(t)) {
                return true;
            }
            for (String n : otherNames) {
                if (plain(n).equals(t)) {
                    return true;
                }
            }
            return false;
        }
    }

    /** Every library card, in the index's order. */
    public static List<Entry> entries() {
        List<Entry> e = entries;
        if (e == null) {
            synchronized (CardLibrary.class) {
                e = entries;
                if (e == null) {
                    e = Collections.unmodifiableList(load());
                    entries = e;
                }
            }
        }
        return e;
    }

    /** The heading row of {@link #table}. */
    public static final String[] HEADINGS = {"name", "title", "components", "valid temperature", "source",
        "stated accuracy", "outside check"};

    /**
     * The listing: a heading row, then one row per card whose name, other names, title, components or source contain
     * {@code find} (ignoring case; every card for a blank text); refused with words when none does.
     */
    public static Object[][] table(String find) {
        String f = plain(find);
        List<Object[]> out = new ArrayList<>();
        out.add(HEADINGS.clone());
        for (Entry e : entries()) {
            Card c = e.card();
            String temperatures = org.miscela.core.problem.Numbers.show(c.units().temperature().fromKelvin(
                    c.validity().lowestKelvin())) + " to " + org.miscela.core.problem.Numbers.show(
                            c.units().temperature().fromKelvin(c.validity().highestKelvin())) + " "
                    + c.units().temperature().symbol();
            Object[] row = {e.key(), c.title(), c.componentNames(), temperatures, c.source(), e.accuracy(),
                e.check()};
            String all = plain(String.join(" ", e.otherNames()) + " " + e.key() + " " + c.title() + " "
                    + c.componentNames() + " " + c.source());
            if (f.isEmpty() || all.contains(f)) {
                out.add(row);
            }
        }
        if (out.size() == 1) {
            throw Problem.LIBRARY_NO_MATCH.raise(find.trim());
        }
        return out.toArray(new Object[0][]);
    }

    /** The card this text names; refused with the list of keys when none does. */
    public static Entry find(String name) {
        for (Entry e : entries()) {
            if (e.named(name)) {
                return e;
            }
        }
        StringBuilder keys = new StringBuilder();
        for (Entry e : entries()) {
            keys.append(keys.length() == 0 ? "" : "; ").append(e.key());
        }
        throw Problem.UNKNOWN_LIBRARY_CARD.raise(name.trim(), keys);
    }

    private static String plain(String s) {
        return s.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }

    private static List<Entry> load() {
        List<Entry> out = new ArrayList<>();
        for (String[] row : rows(text("index.tsv"))) {
            if (row.length != 5) {
                throw new IllegalStateException("index.tsv: five columns expected in " + String.join(" | ", row));
            }
            List<String> other = new ArrayList<>();
            for (String n : row[1].split(";")) {
                if (!n.trim().isEmpty()) {
                    other.add(n.trim());
                }
            }
            out.add(new Entry(row[0].trim(), other, row[2].trim(), row[3].trim(), row[4].trim(),
                    cells(text(row[2].trim()))));
        }
        return out;
    }

    /** A card file's cells: a number where the text reads as one (Java's syntax), text otherwise, "" for blanks. */
    static Object[][] cells(String text) {
        List<Object[]> out = new ArrayList<>();
        for (String[] row : rows(text)) {
            Object[] cells = new Object[row.length];
            for (int i = 0; i < row.length; i++) {
                cells[i] = cell(row[i]);
            }
            out.add(cells);
        }
        return out.toArray(new Object[0][]);
    }

    private static Object cell(String s) {
        String t = s.trim();
        if (!t.isEmpty() && (Character.isDigit(t.charAt(t.length() - 1)) || t.endsWith("."))) {
            try {
                return Double.valueOf(t);
            } catch (NumberFormatException e) {
                return s;
            }
        }
        return s;
    }

    /** Non-empty lines not starting with '#', split at tabs. */
    private static List<String[]> rows(String text) {
        List<String[]> out = new ArrayList<>();
        for (String line : text.split("\r?\n", -1)) {
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            out.add(line.split("\t", -1));
        }
        return out;
    }

    private static String text(String resource) {
        try (InputStream in = CardLibrary.class.getResourceAsStream(ROOT + resource)) {
            if (in == null) {
                throw new IllegalStateException("the library lacks " + resource);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
