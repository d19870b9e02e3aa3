package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.problem.Catalogue;

/**
 * The error catalogue's spreadsheet test (sheets/errors.spec) in a plain JVM, so a gap shows without an office: its
 * rows name every entry of the call, fit and blending tables and every answer of MIX.EXPLAIN but those declared not
 * reachable from a cell (and none of those), each row's function lists its entry in the reference, and the wildcard
 * patterns the sheet matches with are exact. ErrorCatalogueIT checks in Calc that each row shows what it names.
 */
class ErrorSheetTest {
    @Test
    void theRowsProduceEveryEntryThatACellCanProduce() throws Exception {
        Set<String> named = new LinkedHashSet<>();
        for (ErrorSheet.Row row : ErrorSheet.rows(ErrorSheet.SPEC)) {
            ErrorSheet.pattern(row.entry); // a catalogue entry
            ErrorSheet.explanation(row.formula); // one call
            assertTrue(row.code == 502 || row.code == 504 || row.code == 525, row.formula + ": code " + row.code);
            named.add(row.entry);
        }
        Set<String> missing = new TreeSet<>(ErrorSheet.producibleEntries());
        missing.removeAll(named);
        assertTrue(missing.isEmpty(), "catalogue entries no row of errors.spec produces: " + missing);
        Set<String> declared = new TreeSet<>(ErrorSheet.notFromACell());
        declared.retainAll(named);
        assertTrue(declared.isEmpty(), "rows for entries declared not reachable from a cell: " + declared);
        Set<String> unknown = new TreeSet<>(named);
        unknown.removeAll(ErrorSheet.producibleEntries());
        unknown.removeIf(ErrorSheet::isCardProblem);
        assertTrue(unknown.isEmpty(), "rows for entries outside the tables: " + unknown);
        Figures.note(ErrorSheetTest.class,
                "errors.spec: %d entries named, %d to produce, %d declared not reachable from a cell",
                named.size(), ErrorSheet.producibleEntries().size(), ErrorSheet.notFromACell().size());
    }

    /** A row produced by a function that the reference does not list under its entry would mean a wrong list. */
    @Test
    void eachRowsFunctionListsItsEntry() throws Exception {
        List<String> wrong = new ArrayList<>();
        for (ErrorSheet.Row row : ErrorSheet.rows(ErrorSheet.SPEC)) {
            String name = row.formula.substring(1, row.formula.indexOf('('));
            FunctionInfo f = FunctionCatalog.functions().stream().filter(i -> i.displayName().equals(name))
                    .findFirst().orElse(null);
            if (ErrorSheet.isCardProblem(row.entry) || row.entry.startsWith("Problem.EXPLAIN_")) {
                continue; // every function reports the card's problems; MIX.EXPLAIN's answers belong to no function
            }
            boolean listed = f != null && f.errors().stream().anyMatch(e -> ErrorSheet.name(e).equals(row.entry));
            if (!listed) {
                wrong.add(row.formula + ": " + name + " does not list " + row.entry);
            }
        }
        assertTrue(wrong.isEmpty(), String.join("\n", wrong));
    }

    @Test
    void wildcardPatternsAreTheMessagesLiteralTextWithStarsForTheBlanks() {
        assertEquals("The * is blank.", ErrorSheet.wildcards("The %s is blank."));
        assertEquals("reach only * % of", ErrorSheet.wildcards("reach only %s %% of"));
        assertEquals("a ~* b ~? c ~~ *", ErrorSheet.wildcards("a * b ? c ~ %d"));
        for (org.miscela.core.problem.Problem p : FunctionCatalog.callProblems()) {
            String pattern = ErrorSheet.pattern(ErrorSheet.name(p));
            String wild = ErrorSheet.wildcards(pattern);
            // a message with "x" in every blank matches the pattern it came from
            String message = wild.replace("~*", "\u0001").replace("~?", "\u0002").replace("~~", "\u0003")
                    .replace("*", "x").replace('\u0001', '*').replace('\u0002', '?').replace('\u0003', '~');
            assertTrue(Catalogue.isInstance(pattern, message), p + ": " + message);
        }
    }
}
