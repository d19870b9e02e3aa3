package org.miscela.core.card;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Cards kept as tab-separated test resources: numbers become Double, everything else String, as Calc passes them. */
public final class TestCards {
    private TestCards() {
    }

    /** The cards a spec file or test names: a test resource under cards/, or "library:" and a library card's name. */
    public static Object[][] cells(String resource) {
        if (resource.startsWith("library:")) {
            return org.miscela.core.library.CardLibrary.find(resource.substring("library:".length())).cells();
        }
        try (InputStream in = TestCards.class.getResourceAsStream("/cards/" + resource)) {
            if (in == null) {
                throw new IllegalArgumentException("no test card " + resource);
            }
            return fromText(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The cells of a card written as tab-separated text, numbers where a cell reads as one. */
    public static Object[][] fromText(String text) {
        List<Object[]> rows = new ArrayList<>();
        for (String line : text.split("\n", -1)) {
            if (line.isEmpty()) {
                continue;
            }
            String[] parts = line.split("\t", -1);
            Object[] row = new Object[parts.length];
            for (int i = 0; i < parts.length; i++) {
                row[i] = cell(parts[i]);
            }
            rows.add(row);
        }
        return rows.toArray(new Object[0][]);
    }

    public static Card card(String resource) {
        return CardReader.read(cells(resource));
    }

    static Object cell(String s) {
        try {
            return Double.valueOf(s.trim());
        } catch (NumberFormatException e) {
            return s;
        }
    }
}
