package org.miscela.core.card;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Data ▸ Sort as Calc does it on a card's cells, for tests: by one column, ascending or descending, stable; numbers
 * before text, text in the order {@link CardSanity#compareText} approximates Calc's collation by, blank cells last
 * either way; with "Range contains column labels" the first
 * row stays on top. (CardSanityIT sorts with the office itself.)
 */
public final class CalcSort {
    private CalcSort() {
    }

    /** Calc's ascending order of two non-blank cells. */
    private static final Comparator<Object> ASCENDING = (a, b) -> {
        if (a instanceof Double && b instanceof Double) {
            return Double.compare((Double) a, (Double) b);
        }
        if (a instanceof Double || b instanceof Double) {
            return a instanceof Double ? -1 : 1;
        }
        return CardSanity.compareText(a.toString(), b.toString());
    };

    /** The rows sorted by column {@code column} (0-based); the header row kept first when {@code header}. */
    public static Object[][] sorted(Object[][] cells, int column, boolean header, boolean descending) {
        List<Object[]> rows = new ArrayList<>(Arrays.asList(cells));
        List<Object[]> body = rows.subList(header ? 1 : 0, rows.size());
        body.sort((r, s) -> {
            Object a = column < r.length ? r[column] : "";
            Object b = column < s.length ? s[column] : "";
            boolean blankA = CardReader.isBlank(a);
            boolean blankB = CardReader.isBlank(b);
            if (blankA || blankB) {
                return Boolean.compare(blankA, blankB);
            }
            return descending ? ASCENDING.compare(b, a) : ASCENDING.compare(a, b);
        });
        return rows.toArray(new Object[0][]);
    }
}
