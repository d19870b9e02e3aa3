package org.miscela.core.card;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Edits of a card's cells written as text, shared by the card format document's examples (CardFormatDocTest) and the
 * spreadsheet check lists (a {@code card} line of a .spec may edit its test card): edits separated by ';', each one of
 * {@code set R = a | b | c} (replace row R, 1-based), {@code add a | b | c} (append a row), {@code pad R} (blank rows
 * up to R rows: a range named larger than its card), {@code sort C} (the rows below the header sorted by column C,
 * ascending, as Data ▸ Sort does with "Range contains column labels"; {@link CalcSort}), {@code sortall C} (every row
 * sorted, the header among them). A cell that reads as a
 * number is a number, anything else text (so {@code 1,25} stays the text a locale mix-up leaves).
 */
public final class CardEdits {
    private CardEdits() {
    }

    /** The cells with the edits applied (the input is not changed); blank or null edits change nothing. */
    public static Object[][] apply(Object[][] cells, String edits) {
        List<Object[]> rows = new ArrayList<>(Arrays.asList(cells));
        if (edits != null) {
            for (String edit : edits.split(";")) {
                if (!edit.trim().isEmpty()) {
                    edit(rows, edit.trim());
                }
            }
        }
        return rows.toArray(new Object[0][]);
    }

    private static void edit(List<Object[]> rows, String edit) {
        if (edit.startsWith("set ")) {
            int eq = edit.indexOf('=');
            int row = Integer.parseInt(edit.substring(4, eq).trim());
            rows.set(row - 1, cells(edit.substring(eq + 1)));
        } else if (edit.startsWith("add ")) {
            rows.add(cells(edit.substring(4)));
        } else if (edit.startsWith("pad ")) {
            int to = Integer.parseInt(edit.substring(4).trim());
            int width = 0;
            for (Object[] r : rows) {
                width = Math.max(width, r.length);
            }
            Object[] blank = new Object[width];
            Arrays.fill(blank, "");
            while (rows.size() < to) {
                rows.add(blank);
            }
        } else if (edit.startsWith("sort ") || edit.startsWith("sortall ")) {
            boolean header = edit.startsWith("sort ");
            int column = Integer.parseInt(edit.substring(header ? 5 : 8).trim());
            Object[][] sorted = CalcSort.sorted(rows.toArray(new Object[0][]), column - 1, header, false);
            rows.clear();
            rows.addAll(Arrays.asList(sorted));
        } else {
            throw new IllegalArgumentException("unknown edit: " + edit);
        }
    }

    /** The cells of "a | b | c": trimmed; a number where the text reads as one, else the text ("" for blank). */
    static Object[] cells(String text) {
        String[] parts = text.split("\\|", -1);
        Object[] out = new Object[parts.length];
        for (int i = 0; i < parts.length; i++) {
            out[i] = CardFormatDocTest.cell(parts[i]);
        }
        return out;
    }
}
