package org.miscela.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardOpenOption;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * Where tests put the figures they report (worst deviations, tables, counts) instead of the test log, which stays
 * quiet on success: files under the module's {@code target/}. A failing test says what failed in its assertion
 * message; these files are the record of a passing run.
 */
public final class Figures {
    private static final Set<Path> STARTED = new HashSet<>();

    private Figures() {
    }

    /** Writes {@code text} to {@code target/<file>} (folders as needed), replacing an earlier file. */
    public static void write(String file, String text) {
        Path out = Paths.get("target", file);
        try {
            Files.createDirectories(out.getParent());
            Files.write(out, text.getBytes(StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Adds a line (formatted with {@link Locale#ROOT}) to {@code target/figures/<test class>.txt}; the first line a
     * test run writes there replaces what an earlier run left.
     */
    public static synchronized void note(Class<?> test, String format, Object... args) {
        Path out = Paths.get("target", "figures", test.getSimpleName() + ".txt");
        String line = String.format(Locale.ROOT, format, args) + System.lineSeparator();
        try {
            Files.createDirectories(out.getParent());
            if (STARTED.add(out)) {
                Files.write(out, line.getBytes(StandardCharsets.UTF_8));
            } else {
                Files.write(out, line.getBytes(StandardCharsets.UTF_8), StandardOpenOption.APPEND);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
