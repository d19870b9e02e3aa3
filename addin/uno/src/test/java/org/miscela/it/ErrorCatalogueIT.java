package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.table.XCell;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.problem.Catalogue;

/**
 * The error catalogue in a real office (sheets/errors.fods, built from errors.spec): every row's call shows its error
 * code, MIX.EXPLAIN of the same call shows the message of the row's catalogue entry (checked by the sheet with
 * wildcards and here literally), the sheet's patterns are those of the catalogue as it is now, and the rows between
 * them produce every entry of the call, fit and blending tables and every answer of MIX.EXPLAIN, except those the
 * catalogue declares not reachable from a cell.
 */
@ExtendWith(OfficeParameterResolver.class)
class ErrorCatalogueIT {
    private static final Path SHEET = Paths.get("src/test/resources/sheets/errors.fods");

    /**
     * Whether the message's most specific entry is the row's own, or one with the very same words (a few entries of
     * different catalogues read alike, "The … is blank." for one; Calc cannot tell those apart, and need not).
     */
    private static boolean sameWords(String entry, String best) {
        return entry.equals(best) || (best != null
                && ErrorSheet.wildcards(ErrorSheet.pattern(best)).equals(ErrorSheet.wildcards(ErrorSheet.pattern(entry))));
    }

    @Test
    void everyCatalogueEntryIsShownInCalc(Office office) throws Exception {
        List<ErrorSheet.Row> spec = ErrorSheet.rows(ErrorSheet.SPEC);
        XComponent doc = office.load(office.stage(SHEET));
        try {
            Sheets.recalculate(doc);
            XSpreadsheet checks = Sheets.sheet(doc, "Checks");
            List<String> wrong = new ArrayList<>();
            List<String> entries = new ArrayList<>();
            Set<String> shown = new LinkedHashSet<>();
            for (int r = 1; !Sheets.text(Sheets.cell(checks, 5, r)).isEmpty(); r++) {
                if (!Sheets.text(Sheets.cell(checks, 5, r)).equals("refused")) {
                    continue;
                }
                XCell call = Sheets.cell(checks, 0, r);
                String formula = Sheets.text(Sheets.cell(checks, 4, r));
                int code = (int) Sheets.cell(checks, 1, r).getValue();
                String explanation = Sheets.text(Sheets.cell(checks, 7, r));
                String pattern = Sheets.text(Sheets.cell(checks, 8, r));
                String entry = Sheets.text(Sheets.cell(checks, 9, r));
                entries.add(entry);
                String problem = null;
                if (!pattern.equals(ErrorSheet.wildcards(ErrorSheet.pattern(entry)))) {
                    problem = "the sheet's pattern is not the catalogue's (rebuild errors.fods)";
                } else if (call.getError() != code) {
                    problem = "the call shows error " + call.getError() + ", not " + code;
                } else if (!Catalogue.isInstance(ErrorSheet.pattern(entry), explanation)) {
                    problem = "MIX.EXPLAIN says \"" + explanation + "\"";
                } else if (!sameWords(entry, Catalogue.entryOf(explanation))) {
                    problem = "MIX.EXPLAIN's words are those of " + Catalogue.entryOf(explanation);
                } else if (Sheets.cell(checks, 3, r).getValue() != 1.0) {
                    problem = "the sheet's own check (ERRORTYPE, COUNTIF with wildcards) fails";
                }
                if (problem == null) {
                    shown.add(entry);
                    Figures.note(ErrorCatalogueIT.class,
                            "%s: %s → Err:%d; MIX.EXPLAIN: %s", entry, formula, code, explanation);
                } else {
                    wrong.add("row " + (r + 1) + " " + formula + " [" + entry + "]: " + problem);
                }
            }
            assertTrue(wrong.isEmpty(), String.join("\n", wrong));
            List<String> specEntries = new ArrayList<>();
            spec.forEach(row -> specEntries.add(row.entry));
            assertEquals(specEntries, entries, "errors.fods holds the rows of errors.spec (rebuild it)");

            Set<String> expected = ErrorSheet.producibleEntries();
            Set<String> missing = new TreeSet<>(expected);
            missing.removeAll(shown);
            Set<String> extra = new TreeSet<>(shown);
            extra.removeAll(expected);
            extra.removeIf(ErrorSheet::isCardProblem);
            Set<String> tables = new TreeSet<>(shown);
            tables.retainAll(expected);
            Figures.note(ErrorCatalogueIT.class,
                    "error catalogue in Calc: %d rows; %d of the %d entries to show shown, and %d card "
                    + "problem(s); declared not reachable from a cell: %d", entries.size(), tables.size(),
                    expected.size(), shown.size() - tables.size(), ErrorSheet.notFromACell().size());
            assertTrue(missing.isEmpty(), "catalogue entries no row of errors.spec produces in Calc: " + missing);
            assertTrue(extra.isEmpty(), "rows produce entries declared not reachable from a cell: " + extra);
        } finally {
            Sheets.close(doc);
        }
    }
}
