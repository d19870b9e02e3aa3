package org.miscela.it;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.problem.Problem;

/**
 * The spreadsheet test of the error catalogue (sheets/errors.spec, built into errors.fods): its "refused" rows, each
 * a call that Calc must refuse with an error code and whose MIX.EXPLAIN must give a catalogue entry's message,
 * matched as a wildcard pattern made from the entry's message pattern.
 */
public final class ErrorSheet {
    /** The spec, relative to the addin module (where Maven runs the tests). */
    public static final Path SPEC = Paths.get("src/test/resources/sheets/errors.spec");
    private static final Pattern CALL = Pattern.compile("=(MIX\\.[A-Za-z]+)\\((.*)\\)");
    private static final Pattern BLANK = Pattern.compile("%%|%[-#+ 0,(]*\\d*(?:\\.\\d+)?[a-zA-Z]");

    private ErrorSheet() {
    }

    /** One "refused" row: the call, the catalogue entry ("Problem.X", "Problem.X", "Problem.X"), the code. */
    public static final class Row {
        public final String formula;
        public final String entry;
        public final int code;
        public final String reason;

        Row(String formula, String entry, int code, String reason) {
            this.formula = formula;
            this.entry = entry;
            this.code = code;
            this.reason = reason;
        }
    }

    /** The "refused" rows of a spec, in order. */
    public static List<Row> rows(Path spec) throws IOException {
        List<Row> out = new ArrayList<>();
        for (String line : Files.readAllLines(spec, StandardCharsets.UTF_8)) {
            String[] f = line.split("\t", -1);
            if (f[0].equals("refused")) {
                out.add(new Row(f[1], f[2], f[3].isEmpty() ? 502 : Integer.parseInt(f[3]), f[4]));
            }
        }
        return out;
    }

    /** The MIX.EXPLAIN formula for a refused call {@code =MIX.NAME(args)}: {@code =MIX.EXPLAIN("MIX.NAME"; args)}. */
    public static String explanation(String formula) {
        Matcher m = CALL.matcher(formula);
        if (!m.matches()) {
            throw new IllegalArgumentException("a refused row must be one call =MIX.NAME(…): " + formula);
        }
        String args = m.group(2);
        return "=MIX.EXPLAIN(\"" + m.group(1) + "\"" + (args.isEmpty() ? "" : ";" + args) + ")";
    }

    /** The message pattern of a catalogue entry named "Problem.X". */
    public static String pattern(String entry) {
        if (!entry.startsWith("Problem.")) {
            throw new IllegalArgumentException("not a catalogue entry: " + entry);
        }
        return Problem.valueOf(entry.substring("Problem.".length())).pattern();
    }

    /**
     * The entries a spreadsheet row must produce: every call, fit and blending problem and every answer of MIX.EXPLAIN,
     * except those the catalogue declares not reachable from a cell.
     */
    public static Set<String> producibleEntries() {
        Set<String> out = new LinkedHashSet<>();
        for (Problem p : FunctionCatalog.callProblems()) {
            if (!FunctionCatalog.notFromACell().containsKey(p)) {
                out.add(name(p));
            }
        }
        for (Problem p : FunctionCatalog.explainAnswers()) {
            out.add(name(p));
        }
        return out;
    }

    /** The entries declared not reachable from a cell, by name. */
    public static Set<String> notFromACell() {
        Set<String> out = new LinkedHashSet<>();
        for (Problem p : FunctionCatalog.notFromACell().keySet()) {
            out.add(name(p));
        }
        return out;
    }

    /** Whether the entry is one of a card's problems (shown by MIX.CHECK; CardProblemsIT covers those). */
    public static boolean isCardProblem(String entry) {
        return entry.startsWith("Problem.")
                && Problem.valueOf(entry.substring(8)).section() == Problem.Section.CARD;
    }

    /** The entry's name as the tests write it. */
    public static String name(Problem problem) {
        return "Problem." + problem.name();
    }

    /**
     * A Calc wildcard pattern matching exactly the messages of a pattern: its literal text with Calc's wildcard
     * characters escaped by '~', and '*' for each blank.
     */
    public static String wildcards(String pattern) {
        StringBuilder b = new StringBuilder();
        Matcher m = BLANK.matcher(pattern);
        int at = 0;
        while (m.find()) {
            literal(b, pattern.substring(at, m.start()));
            b.append(m.group().equals("%%") ? "%" : "*");
            at = m.end();
        }
        literal(b, pattern.substring(at));
        return b.toString();
    }

    private static void literal(StringBuilder b, String text) {
        for (char ch : text.toCharArray()) {
            if (ch == '~' || ch == '*' || ch == '?') {
                b.append('~');
            }
            b.append(ch);
        }
    }
}
