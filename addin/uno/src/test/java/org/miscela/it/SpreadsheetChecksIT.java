package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.table.XCell;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Loads every spreadsheet test file (src/test/resources/sheets/*.fods) into the real office with the extension
 * installed, recalculates, and asserts the summary cell; on failure it lists the failing rows with their formulas.
 */
@ExtendWith(OfficeParameterResolver.class)
class SpreadsheetChecksIT {
    private static Office office;

    @BeforeAll
    static void start(Office o) {
        office = o;
    }

    static Stream<Path> sheets() throws Exception {
        Path dir = Paths.get("src/test/resources/sheets");
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.toString().endsWith(".fods")).sorted().collect(Collectors.toList());
        }
        assertTrue(!files.isEmpty(), "no spreadsheet test files in " + dir.toAbsolutePath());
        return files.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sheets")
    void everyCheckPasses(Path file) throws Exception {
        XComponent doc = office.load(office.stage(file));
        try {
            Sheets.recalculate(doc);
            List<String> failing = failingRows(doc, file.toString());
            Figures.note(SpreadsheetChecksIT.class,
                    "%s: %d checks, %d failing", file.getFileName(), checkCount(doc), failing.size());
            assertEquals(0, failing.size(), String.join("\n", failing));
            assertEquals(1.0, Sheets.cell(Sheets.sheet(doc, "Summary"), 1, 0).getValue(), "summary cell of " + file);
        } finally {
            Sheets.close(doc);
        }
    }

    /** The number of checks the built sheet counts on its summary sheet. */
    static int checkCount(XComponent doc) throws Exception {
        return (int) Sheets.cell(Sheets.sheet(doc, "Summary"), 1, 1).getValue();
    }

    /** The rows of a recalculated check sheet whose pass cell is not TRUE, each with its formula, result and reason. */
    static List<String> failingRows(XComponent doc, String what) throws Exception {
        XSpreadsheet checks = Sheets.sheet(doc, "Checks");
        int count = checkCount(doc);
        assertTrue(count > 0, "no checks counted in " + what);
        List<String> failing = new ArrayList<>();
        for (int r = 1; r <= count; r++) {
            XCell pass = Sheets.cell(checks, 3, r);
            if (pass.getValue() != 1.0 || pass.getError() != 0) {
                XCell result = Sheets.cell(checks, 0, r);
                failing.add(String.format("row %d: %s → %s (error %d), expected %s ± %s [%s]", r + 1,
                        Sheets.text(Sheets.cell(checks, 4, r)), Sheets.text(result), result.getError(),
                        Sheets.text(Sheets.cell(checks, 1, r)), Sheets.text(Sheets.cell(checks, 2, r)),
                        Sheets.text(Sheets.cell(checks, 6, r))));
            }
        }
        return failing;
    }
}
