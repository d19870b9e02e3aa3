package org.miscela.core.card;

import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;

/**
 * The card's row grammar: a range's cells become numbered rows; the first must be the header with a version this
 * reader knows; every other row is a comment, or a label of the format (one the header's version allows) filed into
 * a {@link ParsedCard}. Values are not interpreted here beyond what filing needs (a keyed row's subject).
 */
final class CardGrammar {
    private CardGrammar() {
    }

    /** Reads the rows of a range and sorts them; throws the first problem found, naming its row. */
    static ParsedCard parse(Object[][] cells) {
        List<CardRow> rows = rows(cells);
        if (rows.isEmpty()) {
            throw Problem.CARD_EMPTY.raise();
        }
        CardRow header = rows.get(0);
        if (!header.key.equals(CardLabels.HEADER)) {
            throw Problem.CARD_HEADER.raise(header.number, header.label);
        }
        double version = header.number(0);
        if (version != 1 && version != 2) {
            throw Problem.CARD_VERSION.raise(header.number, Numbers.show(version), CardReader.FORMAT_VERSION);
        }
        header.atMost(1);
        ParsedCard card = new ParsedCard((int) version);
        for (CardRow r : rows.subList(1, rows.size())) {
            if (card.version() < 2 && CardLabels.isVersion2(r.key)) {
                throw Problem.NEEDS_VERSION_2.raise(r.number, r.label);
            }
            file(r, card);
        }
        return card;
    }

    /**
     * The non-blank rows of a range, numbered from 1 with blank rows counted; each row's cells end at its last
     * non-blank one. A null range or line holds no cell.
     */
    static List<CardRow> rows(Object[][] cells) {
        List<CardRow> rows = new ArrayList<>();
        if (cells == null) {
            return rows;
        }
        for (int i = 0; i < cells.length; i++) {
            Object[] line = cells[i] == null ? new Object[0] : cells[i];
            int last = line.length - 1;
            while (last >= 0 && CardReader.isBlank(line[last])) {
                last--;
            }
            if (last < 0) {
                continue;
            }
            Object[] values = new Object[last];
            for (int c = 1; c <= last; c++) {
                values[c - 1] = normaliseCell(line[c]);
            }
            Object labelCell = normaliseCell(line[0]);
            String label = labelCell == null ? "" : labelCell instanceof Double ? Numbers.show((Double) labelCell)
                    : ((String) labelCell).trim();
            rows.add(new CardRow(i + 1, label, values));
        }
        return rows;
    }

    /** null for blank, Double for numbers and booleans, String otherwise. */
    private static Object normaliseCell(Object o) {
        if (CardReader.isBlank(o)) {
            return null;
        }
        if (o instanceof Number) {
            return ((Number) o).doubleValue();
        }
        if (o instanceof Boolean) {
            return ((Boolean) o) ? 1.0 : 0.0;
        }
        return o.toString();
    }

    /** Files one row after the header by its label; notes and comments ("#…") are passed over. */
    private static void file(CardRow r, ParsedCard card) {
        if (r.key.isEmpty()) {
            throw Problem.NO_LABEL.raise(r.number);
        }
        if (r.key.equals(CardLabels.NOTE) || r.label.startsWith("#")) {
            return;
        }
        if (CardLabels.isGlobal(r.key)) {
            card.putGlobal(r);
            return;
        }
        Matcher m = CardLabels.sectionRow(r.key);
        if (m.matches()) {
            ParsedCard.Section section = card.sectionFor(m.group(1));
            if (m.group(2) != null) {
                section.binary.computeIfAbsent(Integer.parseInt(m.group(2)), k -> new ArrayList<>()).add(r);
            } else if (m.group(3) != null) {
                int c = Integer.parseInt(m.group(3));
                if (c > 2) {
                    throw Problem.UNKNOWN_LABEL.raise(r.number, r.label);
                }
                section.ternary.computeIfAbsent(c, k -> new ArrayList<>()).add(r);
            } else if (m.group(5) != null) {
                // One row per coefficient: the same subject repeats, so these rows are not keyed.
                section.covariance.add(r);
                return;
            } else {
                section.reference.add(r);
            }
            card.putKeyed(r);
            return;
        }
        if (CardLabels.isKeyed(r.key)) {
            card.putKeyed(r);
            return;
        }
        throw Problem.UNKNOWN_LABEL.raise(r.number, r.label);
    }
}
