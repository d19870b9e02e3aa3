package org.miscela.core.card;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.zip.CRC32;
import org.miscela.core.problem.Problem;

/**
 * A card's cells as one self-contained text, for a cell that single-cell formulas can name instead of the card's
 * range: Calc then hands each call one text value instead of converting every cell of the range. The text holds the
 * card's whole content (never a key into memory that a restart could lose), canonical (trailing blank cells and rows
 * dropped, as the reader ignores them), versioned and checksummed, with the title and source first so that a person
 * sees which card it is:
 *
 * <pre>
 *   Miscela packed card 1 · &lt;title&gt; · source: &lt;source&gt; · 42×8 · crc32 1a2b3c4d · cells(3456): &lt;cells&gt;
 * </pre>
 *
 * The title and source are cut to {@value #SHOWN} characters; the cells are the last {@code n} characters, rows
 * separated by '/', cells by '|', a number written 'n' and its exact decimal form (Java's, which reads back to the same
 * double), a text 't' and the text with '%', '|', '/', tab, line feed and carriage return written %25, %7C, %2F, %09,
 * %0A, %0D, a blank cell as nothing. Unpacking checks the version, the length, the checksum and that the title and
 * source shown are the card's, and refuses anything else in words: a packed text edited by hand is not read.
 */
public final class PackedCard {
    /** What every packed text starts with. */
    public static final String PREFIX = "Miscela packed card ";
    static final int VERSION = 1;
    /** The characters of the title and the source shown before the cells. */
    static final int SHOWN = 60;
    private static final String SEPARATOR = " · ";
    private static final String CELLS = "cells(";

    private PackedCard() {
    }

    /** Whether these cells are one text cell holding a packed card. */
    public static boolean isPacked(Object[][] cells) {
        return cells != null && cells.length == 1 && cells[0] != null && cells[0].length == 1
                && cells[0][0] instanceof String && ((String) cells[0][0]).startsWith(PREFIX);
    }

    /** The cells of the card a packed text holds, or the cells themselves when they are no packed card. */
    public static Object[][] cellsOf(Object[][] cells) {
        return isPacked(cells) ? unpack((String) cells[0][0]) : cells;
    }

    /** The packed text of the card these cells hold (which the caller has read: packing checks nothing else). */
    public static String pack(Object[][] cells) {
        List<Object[]> rows = trimmed(cells);
        int width = 0;
        StringBuilder payload = new StringBuilder();
        for (int r = 0; r < rows.size(); r++) {
            Object[] row = rows.get(r);
            width = Math.max(width, row.length);
            if (r > 0) {
                payload.append('/');
            }
            for (int c = 0; c < row.length; c++) {
                if (c > 0) {
                    payload.append('|');
                }
                encode(row[c], payload);
            }
        }
        String p = payload.toString();
        String[] shown = shown(rows);
        return PREFIX + VERSION + SEPARATOR + shown[0] + SEPARATOR + "source: " + shown[1] + SEPARATOR + rows.size()
                + "×" + width + SEPARATOR + "crc32 " + crc(p) + SEPARATOR + CELLS + p.length() + "): " + p;
    }

    /** The cells a packed text holds; refused in words when the text is not one this version wrote, intact. */
    public static Object[][] unpack(String text) {
        String rest = text.substring(PREFIX.length());
        int sep = rest.indexOf(SEPARATOR);
        if (sep < 0 || !rest.substring(0, sep).equals(String.valueOf(VERSION))) {
            throw Problem.PACKED_VERSION.raise(sep < 0 ? rest : rest.substring(0, sep), VERSION);
        }
        int open = text.lastIndexOf(SEPARATOR + CELLS);
        int close = open < 0 ? -1 : text.indexOf("): ", open);
        int length;
        try {
            length = close < 0 ? -1 : Integer.parseInt(text.substring(open + SEPARATOR.length() + CELLS.length(),
                    close));
        } catch (NumberFormatException notANumber) {
            length = -1;
        }
        String payload = close < 0 ? "" : text.substring(close + 3);
        if (length < 0 || payload.length() != length) {
            throw Problem.PACKED_DAMAGED.raise("its length");
        }
        String head = text.substring(0, open);
        int crcAt = head.lastIndexOf(SEPARATOR + "crc32 ");
        if (crcAt < 0 || !head.substring(crcAt + SEPARATOR.length() + 6).equals(crc(payload))) {
            throw Problem.PACKED_DAMAGED.raise("its checksum");
        }
        Object[][] cells = decode(payload);
        String[] shown = shown(trimmed(cells));
        String expected = PREFIX + VERSION + SEPARATOR + shown[0] + SEPARATOR + "source: " + shown[1] + SEPARATOR
                + cells.length + "×" + width(cells);
        if (!head.substring(0, crcAt).equals(expected)) {
            throw Problem.PACKED_DAMAGED.raise("its title, source or size");
        }
        return cells;
    }

    private static int width(Object[][] cells) {
        int w = 0;
        for (Object[] row : cells) {
            w = Math.max(w, row.length);
        }
        return w;
    }

    /** The rows up to the last non-blank one, each up to its last non-blank cell. */
    private static List<Object[]> trimmed(Object[][] cells) {
        List<Object[]> rows = new ArrayList<>();
        int last = -1;
        Object[][] in = cells == null ? new Object[0][] : cells;
        for (int r = 0; r < in.length; r++) {
            Object[] row = in[r] == null ? new Object[0] : in[r];
            int n = row.length;
            while (n > 0 && CardReader.isBlank(row[n - 1])) {
                n--;
            }
            rows.add(java.util.Arrays.copyOf(row, n));
            if (n > 0) {
                last = r;
            }
        }
        return new ArrayList<>(rows.subList(0, last + 1));
    }

    /** The card's title and source (its rows so labelled), cut to SHOWN characters; "" when absent. */
    private static String[] shown(List<Object[]> rows) {
        String[] out = {"", ""};
        for (Object[] row : rows) {
            if (row.length > 1 && row[0] instanceof String && row[1] instanceof String) {
                String label = CardReader.normalise((String) row[0]);
                int i = label.equals(CardLabels.TITLE) ? 0 : label.equals(CardLabels.SOURCE) ? 1 : -1;
                if (i >= 0 && out[i].isEmpty()) {
                    String v = ((String) row[1]).replaceAll("\\s+", " ").trim();
                    out[i] = v.length() > SHOWN ? v.substring(0, SHOWN) + "…" : v;
                }
            }
        }
        return out;
    }

    private static void encode(Object v, StringBuilder out) {
        if (v == null || (v instanceof String && ((String) v).isEmpty())) {
            return;
        }
        if (v instanceof Number) {
            out.append('n').append(Double.toString(((Number) v).doubleValue()));
            return;
        }
        if (v instanceof Boolean) {
            // Calc passes no booleans in a range, but a caller might: as Calc counts them
            out.append('n').append(((Boolean) v) ? "1.0" : "0.0");
            return;
        }
        String s = String.valueOf(v);
        out.append('t');
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            switch (ch) {
                case '%':
                case '|':
                case '/':
                case '\t':
                case '\n':
                case '\r':
                    out.append('%').append(String.format(Locale.ROOT, "%02X", (int) ch));
                    break;
                default:
                    out.append(ch);
            }
        }
    }

    private static Object[][] decode(String payload) {
        if (payload.isEmpty()) {
            return new Object[0][];
        }
        String[] rows = payload.split("/", -1);
        Object[][] out = new Object[rows.length][];
        for (int r = 0; r < rows.length; r++) {
            String[] cells = rows[r].isEmpty() ? new String[0] : rows[r].split("\\|", -1);
            out[r] = new Object[cells.length];
            for (int c = 0; c < cells.length; c++) {
                out[r][c] = decodeCell(cells[c]);
            }
        }
        return out;
    }

    private static Object decodeCell(String cell) {
        if (cell.isEmpty()) {
            return "";
        }
        String body = cell.substring(1);
        if (cell.charAt(0) == 'n') {
            try {
                return Double.parseDouble(body);
            } catch (NumberFormatException e) {
                throw Problem.PACKED_DAMAGED.raise("a number in it");
            }
        }
        if (cell.charAt(0) != 't') {
            throw Problem.PACKED_DAMAGED.raise("a cell in it");
        }
        StringBuilder s = new StringBuilder(body.length());
        for (int i = 0; i < body.length(); i++) {
            char ch = body.charAt(i);
            if (ch == '%') {
                try {
                    s.append((char) Integer.parseInt(body.substring(i + 1, i + 3), 16));
                } catch (NumberFormatException | IndexOutOfBoundsException e) {
                    throw Problem.PACKED_DAMAGED.raise("a text in it");
                }
                i += 2;
            } else {
                s.append(ch);
            }
        }
        return s.toString();
    }

    private static String crc(String payload) {
        CRC32 c = new CRC32();
        c.update(payload.getBytes(StandardCharsets.UTF_8));
        return String.format(Locale.ROOT, "%08x", c.getValue());
    }
}
