package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.EnumSet;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.Problem;

/**
 * MIX.CHECK's and MIX.EXPLAIN's warnings in the spreadsheet checks, without an office: the "warned" rows of the
 * check lists (sheets/*.spec) name every entry of the catalogue's CHECK and SLIP sections, and nothing else. SpreadsheetChecksIT checks in
 * Calc that each row shows its warning.
 */
class WarningSheetTest {
    @Test
    void everyWarningOfTheCatalogueHasARowThatShowsIt() throws Exception {
        Set<Problem> named = EnumSet.noneOf(Problem.class);
        try (Stream<Path> specs = Files.list(Paths.get("src/test/resources/sheets"))) {
            for (Path spec : (Iterable<Path>) specs.filter(p -> p.toString().endsWith(".spec"))::iterator) {
                for (String line : Files.readAllLines(spec, StandardCharsets.UTF_8)) {
                    String[] f = line.split("\t", -1);
                    if (f[0].equals("warned")) {
                        Problem p = Problem.valueOf(f[2].substring("Problem.".length()));
                        assertTrue(p.section() == Problem.Section.CHECK || p.section() == Problem.Section.SLIP,
                                spec + ": " + line);
                        named.add(p);
                    }
                }
            }
        }
        Set<Problem> missing = EnumSet.copyOf(Problem.of(Problem.Section.CHECK));
        missing.addAll(Problem.of(Problem.Section.SLIP));
        missing.removeAll(named);
        assertTrue(missing.isEmpty(), "warnings no spreadsheet row shows: " + missing);
    }
}
