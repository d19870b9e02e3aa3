package org.miscela.core.card;

import org.miscela.core.problem.MiscelaException;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Reads a card from the cells of a spreadsheet range (rows of label, then values). Strict: every problem is reported
 * with the row it is in, and nothing is guessed. See docs/card-format.md for the layout.
 *
 * <p>Cells arrive as {@link Double} (numbers and booleans), {@link String} (text; the empty string is a blank cell),
 * {@link Boolean} or null.
 *
 * <p>Reading takes two steps: {@link CardGrammar} turns the cells into rows and sorts them by label
 * ({@link ParsedCard}); {@link CardBuilder} reads their values into the {@link Card}.
 */
public final class CardReader {
    /** The newest card format version this reader understands; it also reads every older one. */
    public static final int FORMAT_VERSION = 2;

    /** Runs of white space, compiled once: a parse normalises every label and, per keyed row, every name. */
    private static final Pattern WHITE_SPACE = Pattern.compile("\\s+");

    private CardReader() {
    }

    /** Parses a card; throws {@link MiscelaException} naming the first problem found. */
    public static Card read(Object[][] cells) {
        return read(cells, false);
    }

    /**
     * Parses the pure-component part of a card: like {@link #read}, but pairs without coefficient rows are ideal and
     * the composition limits may be left out. The fit functions read the data they fit against from such a range
     * (the top of a card, whose coefficient rows below hold the fit's array formula, which would otherwise refer to
     * itself).
     */
    public static Card readPureComponents(Object[][] cells) {
        return read(cells, true);
    }

    /** The card the cells hold: a card's range, or one cell holding a packed card ({@link PackedCard}). */
    private static Card read(Object[][] cells, boolean pureOnly) {
        Object[][] c = PackedCard.cellsOf(cells);
        return new CardBuilder(CardGrammar.parse(c), pureOnly, extent(c)).card();
    }

    /** The rows down to the last with a non-blank cell, and the columns out to the rightmost non-blank cell. */
    static int[] extent(Object[][] cells) {
        int rows = 0;
        int columns = 0;
        for (int i = 0; cells != null && i < cells.length; i++) {
            for (int j = 0; cells[i] != null && j < cells[i].length; j++) {
                if (!isBlank(cells[i][j])) {
                    rows = i + 1;
                    columns = Math.max(columns, j + 1);
                }
            }
        }
        return new int[] {rows, columns};
    }

    /** Whether a cell counts as blank: null, or text of white space only. */
    static boolean isBlank(Object o) {
        return o == null || (o instanceof String && ((String) o).trim().isEmpty());
    }

    /** Lower case, single spaces, no trailing colon: the form labels and names are compared in. */
    static String normalise(String s) {
        String t = WHITE_SPACE.matcher(s.trim()).replaceAll(" ").toLowerCase(Locale.ROOT);
        return t.endsWith(":") ? t.substring(0, t.length() - 1).trim() : t;
    }
}
