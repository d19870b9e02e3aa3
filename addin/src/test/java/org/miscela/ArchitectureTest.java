package org.miscela;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The core is a plain Java library: no office type may appear in its sources or its compiled classes. */
class ArchitectureTest {
    private static final Path CORE_SOURCES = Paths.get("src/main/java/org/miscela/core");
    private static final Path CORE_CLASSES = Paths.get("target/classes/org/miscela/core");

    @Test
    void coreSourcesImportNothingFromTheOffice() throws IOException {
        List<Path> offenders = files(CORE_SOURCES, ".java").stream()
                .filter(p -> read(p).contains("com.sun.star")).collect(Collectors.toList());
        assertTrue(files(CORE_SOURCES, ".java").size() > 5, "core sources not found");
        assertTrue(offenders.isEmpty(), "core sources mention com.sun.star: " + offenders);
    }

    /** The compiled constant pools name every referenced class, so this also catches fully qualified uses. */
    @Test
    void coreClassesReferenceNothingFromTheOffice() throws IOException {
        List<Path> classes = files(CORE_CLASSES, ".class");
        assertTrue(classes.size() > 5, "core classes not found");
        List<Path> offenders = classes.stream().filter(p -> read(p).contains("com/sun/star"))
                .collect(Collectors.toList());
        assertTrue(offenders.isEmpty(), "core classes reference com/sun/star: " + offenders);
    }

    private static List<Path> files(Path dir, String suffix) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(p -> p.toString().endsWith(suffix)).collect(Collectors.toList());
        }
    }

    private static String read(Path p) {
        try {
            return new String(Files.readAllBytes(p), StandardCharsets.ISO_8859_1);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
