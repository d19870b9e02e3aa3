package org.miscela.reference;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;

/** Writes a card as tab-separated rows (label, values), the layout of the test resource cards. */
final class TsvCard {
    private final StringBuilder text = new StringBuilder();

    TsvCard row(String label, Object... values) {
        text.append(label);
        for (Object v : values) {
            if (v instanceof double[]) {
                for (double d : (double[]) v) {
                    text.append('\t').append(Double.toString(d));
                }
            } else {
                text.append('\t').append(v instanceof Double ? Double.toString((Double) v) : String.valueOf(v));
            }
        }
        text.append('\n');
        return this;
    }

    String text() {
        return text.toString();
    }

    static void write(String path, String text) throws IOException {
        Files.write(Paths.get(path), text.getBytes(StandardCharsets.UTF_8));
    }
}
