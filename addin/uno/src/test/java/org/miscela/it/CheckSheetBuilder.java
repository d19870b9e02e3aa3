package org.miscela.it;

import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.uno.UnoRuntime;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.miscela.core.card.CardEdits;
import org.miscela.core.card.TestCards;

/**
 * Builds a spreadsheet test file (.fods) from a check list (.spec): sheet "Summary" holds one cell that is TRUE when
 * every check passes; sheet "Checks" has per row the formula's result, the expected value, the tolerance, a pass
 * cell, the formula as text and the source of the expected value; sheet "Cards" holds the named card ranges.
 * A "refused" row (see {@link ErrorSheet}) has its expected error code in the expected column and, in three more
 * columns, MIX.EXPLAIN of the same call, the catalogue message as a wildcard pattern, and the catalogue entry. A
 * "warned" row's result is a text that must be an instance of a catalogue entry (a warning of MIX.CHECK): its pattern
 * with wildcards is the expected value and the entry is in the entry column. A card line may edit its test card
 * ({@link CardEdits}, a fourth field); a card of more than {@value #TALL} rows gets columns of its own.
 * The office writes the file itself, so it is valid ODF. Usage: CheckSheetBuilder SPEC... (writes SPEC → .fods).
 */
public final class CheckSheetBuilder {
    /** Cards of more rows than this (ranges named far larger than their card) get columns of their own. */
    private static final int TALL = 1000;
    /** The first column of those. */
    private static final int TALL_COLUMN = 12;

    private CheckSheetBuilder() {
    }

    public static void main(String[] args) throws Exception {
        Office office = Office.start();
        try {
            for (String spec : args) {
                Path in = Paths.get(spec);
                Path out = in.resolveSibling(in.getFileName().toString().replace(".spec", ".fods"));
                build(office, in, out);
                System.out.println("wrote " + out);
            }
        } finally {
            office.dispose();
        }
    }

    static void build(Office office, Path spec, Path out) throws Exception {
        List<String[]> checks = new ArrayList<>();
        List<String[]> cards = new ArrayList<>();
        for (String line : Files.readAllLines(spec, StandardCharsets.UTF_8)) {
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\t", -1);
            if (f[0].equals("card")) {
                cards.add(f);
            } else {
                checks.add(f);
            }
        }
        XComponent doc = office.newSpreadsheet();
        // Lookups of trace labels (which hold '+' and '[') need wildcards, not regular expressions.
        com.sun.star.beans.XPropertySet settings = UnoRuntime.queryInterface(com.sun.star.beans.XPropertySet.class,
                doc);
        settings.setPropertyValue("RegularExpressions", false);
        settings.setPropertyValue("Wildcards", true);
        // A refused row's pattern must match the whole explanation, in its case.
        settings.setPropertyValue("MatchWholeCell", true);
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        sd.getSheets().insertNewByName("Checks", (short) 1);
        sd.getSheets().insertNewByName("Cards", (short) 2);
        XSpreadsheet first = Sheets.sheet(doc, 0);
        UnoRuntime.queryInterface(com.sun.star.container.XNamed.class, first).setName("Summary");
        XSpreadsheet cardSheet = Sheets.sheet(doc, "Cards");
        int row = 0;
        int tall = 0;
        for (String[] c : cards) {
            String edits = c.length > 3 ? c[3] : "";
            Object[][] cells = CardEdits.apply(TestCards.cells(c[2]), edits);
            String what = "card range '" + c[1] + "' (test resource cards/" + c[2]
                    + (edits.isEmpty() ? "" : ", edited: " + edits) + ")";
            if (cells.length > TALL) {
                // a range named far larger than its card gets columns of its own, from the sheet's first row
                int col = TALL_COLUMN + 8 * tall++;
                Sheets.putCard(doc, cardSheet, "Cards", c[1], cells, col, 0);
                Sheets.put(first, 0, 6 + tall, what + " in column " + Sheets.column(col) + " of sheet Cards");
                continue;
            }
            Sheets.put(cardSheet, 0, row, what);
            Sheets.putCard(doc, cardSheet, "Cards", c[1], cells, 0, row + 1);
            row += cells.length + 3;
        }
        XSpreadsheet sheet = Sheets.sheet(doc, "Checks");
        String[] headers = {"result", "expected", "tolerance", "pass", "formula", "kind", "source of the expected value"};
        for (int i = 0; i < headers.length; i++) {
            Sheets.put(sheet, i, 0, headers[i]);
        }
        if (checks.stream().anyMatch(c -> c[0].equals("refused") || c[0].equals("warned"))) {
            String[] more = {"MIX.EXPLAIN of the same call", "catalogue message (wildcards)", "catalogue entry"};
            for (int i = 0; i < more.length; i++) {
                Sheets.put(sheet, 7 + i, 0, more[i]);
            }
        }
        for (int i = 0; i < checks.size(); i++) {
            String[] c = checks.get(i);
            int r = i + 1;
            String a = "A" + (r + 1);
            String b = "B" + (r + 1);
            String t = "C" + (r + 1);
            Sheets.cell(sheet, 0, r).setFormula(c[1]);
            String pass;
            switch (c[0]) {
                case "value":
                    if (c[2].startsWith("=")) {
                        Sheets.cell(sheet, 1, r).setFormula(c[2]);
                    } else {
                        Sheets.cell(sheet, 1, r).setValue(Double.parseDouble(c[2]));
                    }
                    Sheets.cell(sheet, 2, r).setValue(Double.parseDouble(c[3]));
                    pass = "=IFERROR(ABS(" + a + "-" + b + ")<=" + t + ";FALSE())";
                    break;
                case "error":
                    Sheets.cell(sheet, 1, r).setValue(Double.parseDouble(c[2]));
                    pass = "=IFERROR(ERRORTYPE(" + a + ")=" + b + ";FALSE())";
                    break;
                case "contains":
                    Sheets.put(sheet, 1, r, c[2]);
                    pass = "=IFERROR(ISNUMBER(FIND(" + b + ";" + a + "));FALSE())";
                    break;
                case "refused": {
                    // c[2] the catalogue entry, c[3] the error code the call shows (Err:502 when empty)
                    Sheets.cell(sheet, 1, r).setValue(c[3].isEmpty() ? 502 : Double.parseDouble(c[3]));
                    Sheets.cell(sheet, 7, r).setFormula(ErrorSheet.explanation(c[1]));
                    Sheets.put(sheet, 8, r, ErrorSheet.wildcards(ErrorSheet.pattern(c[2])));
                    Sheets.put(sheet, 9, r, c[2]);
                    String h = "H" + (r + 1);
                    String p = "I" + (r + 1);
                    pass = "=IFERROR(AND(ERRORTYPE(" + a + ")=" + b + ";COUNTIF(" + h + ";" + p + ")=1);FALSE())";
                    break;
                }
                case "warned": {
                    // c[2] the catalogue entry (a warning of MIX.CHECK): the result, a text, must be its message
                    Sheets.put(sheet, 1, r, ErrorSheet.wildcards(ErrorSheet.pattern(c[2])));
                    Sheets.put(sheet, 9, r, c[2]);
                    pass = "=IFERROR(COUNTIF(" + a + ";" + b + ")=1;FALSE())";
                    break;
                }
                default:
                    throw new IllegalArgumentException("unknown check kind " + c[0]);
            }
            Sheets.cell(sheet, 3, r).setFormula(pass);
            Sheets.cell(sheet, 4, r).setFormula("=FORMULA(" + a + ")");
            Sheets.put(sheet, 5, r, c[0]);
            Sheets.put(sheet, 6, r, c[4]);
        }
        int last = checks.size() + 1;
        Sheets.put(first, 0, 0, "all checks pass");
        Sheets.cell(first, 1, 0).setFormula("=AND($Checks.D2:D" + last + ")");
        Sheets.put(first, 0, 1, "checks");
        Sheets.cell(first, 1, 1).setFormula("=COUNTA($Checks.F2:F" + last + ")");
        Sheets.put(first, 0, 2, "failing");
        Sheets.cell(first, 1, 2).setFormula("=COUNTIF($Checks.D2:D" + last + ";FALSE())");
        Sheets.put(first, 0, 4, "Built by CheckSheetBuilder from " + spec.getFileName() + "; open sheet Checks for "
                + "the rows.");
        Sheets.recalculate(doc);
        Path scratch = office.scratch(out.getFileName().toString());
        UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(scratch.toUri().toString(),
                new com.sun.star.beans.PropertyValue[] {
                    Office.property("FilterName", "OpenDocument Spreadsheet Flat XML")});
        Sheets.close(doc);
        Files.copy(scratch, out, StandardCopyOption.REPLACE_EXISTING);
    }
}
