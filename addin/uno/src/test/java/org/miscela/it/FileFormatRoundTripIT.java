package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.beans.XPropertySet;
import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.lang.XMultiServiceFactory;
import com.sun.star.sheet.FormulaResult;
import com.sun.star.sheet.FormulaToken;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XArrayFormulaTokens;
import com.sun.star.sheet.XFormulaOpCodeMapper;
import com.sun.star.sheet.XFormulaTokens;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.CellContentType;
import com.sun.star.table.XCell;
import com.sun.star.table.XCellRange;
import com.sun.star.uno.UnoRuntime;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.TestCards;
import org.miscela.core.catalog.FunctionCatalog;

/**
 * A workbook with a card and MIX formulas of every form (scalar, array, text result, optional arguments left out at
 * the end and in the middle, an inline array argument, a native formula depending on an add-in cell) survives being
 * saved as .ods (ODF), .xlsx (Office Open XML) and .xls (Excel 97) and reopened in an office with the extension
 * installed: after a full recalculation every formula is the same formula, every value equals the value before saving
 * (within 10⁻¹² relative; how many are bit-identical is reported), every text the same text, and no cell shows an
 * error. The .xls case needs the CompatibilityName the XCU gives every function: without it Calc stores the calls as
 * macro names and they reopen as #MACRO? (Err:531).
 *
 * <p>Each format is checked in full before the test fails, and what the files store for the add-in calls (the names
 * in the .xls binary, the formulas in the .xlsx sheet) is written with the outcome to
 * {@code target/file-formats.txt}, and the saved files are kept in {@code target/file-formats/}. So is what each file
 * shows in an office without the extension, as loaded and after a recalculation (recorded, not asserted: that is the
 * office's behaviour, not the add-in's).
 */
@ExtendWith(OfficeParameterResolver.class)
class FileFormatRoundTripIT {
    private static final double RELATIVE = 1e-12;

    /** Single-cell formulas in column A of the first sheet, one per row. */
    private static final String[] SCALARS = {
        "=MIX.DENSITY(card;0.4;20)",
        "=MIX.EXCESSVOLUME(card;0.4;20;TRUE())",
        "=MIX.PARTIALVOLUME(card;\"ethanol\";0.4;20)",
        "=MIX.CHECK(card)",
        "=MIX.CHECKPOINT(card;0.3;45)",
        "=MIX.CONVERT(card;0.5;\"mass fraction\";\"%vol\";20)",
        "=MIX.FROMDENSITY(card;913.771;20;1;\"mass fraction\")",
        "=MIX.ADDVOLUME(card;{50;50};\"g\";\"ethanol\";10;20;;\"mL\")",
        "=MIX.INFO()",
        // the trailing component argument of a per-component result
        "=MIX.RECIPE(card;1;\"L\";40;\"%vol\";20;20;\"mL\";;;\"water\")",
        "=A1*1000-A2",
    };

    /** Array formulas: the range they fill (columns, rows; 0-based, inclusive) and the formula. */
    private static final Object[][] ARRAYS = {
        {new int[] {2, 0, 2, 4}, "=MIX.DENSITY(card;B1:B5;20)"},
        {new int[] {4, 0, 5, 0}, "=MIX.RECIPE(card;1;\"L\";40;\"%vol\";20;20;\"mL\")"},
        {new int[] {4, 2, 5, 7}, "=MIX.TRACE(card;0.3;20)"},
        // a per-component result down a column, for a composition given as a column
        {new int[] {9, 0, 9, 1}, "=MIX.RECIPE(card;1;\"kg\";{0.4|0.6};\"mass fraction\";20)"},
        {new int[] {7, 0, 7, 1}, "=MIX.FITEXCESS({0.2|0.4|0.6|0.8};{-0.736|-1.008|-0.912|-0.544};1)"},
    };

    /** The filters, by the extension of the file they write. */
    private static final String[][] FORMATS = {
        {"ods", "calc8"},
        {"xlsx", "Calc MS Excel 2007 XML"},
        {"xls", "MS Excel 97"},
    };

    @Test
    void savedAsOdsXlsxAndXlsTheWorkbookReopensWithTheSameFormulasAndValues(Office office) throws Exception {
        Map<String, Path> saved = new LinkedHashMap<>();
        Map<String, Cell> before;
        Map<String, Cell> inputsBefore;
        XComponent doc = office.newSpreadsheet();
        try {
            build(doc);
            Sheets.recalculate(doc);
            before = snapshot(doc);
            inputsBefore = inputs(doc);
            for (Cell c : before.values()) {
                assertEquals(0, c.error, c.where + " shows an error before saving: " + c.formula);
                assertEquals(c.where.equals("A" + SCALARS.length) ? 0 : 1, c.calls.size(),
                        c.where + " calls one add-in function (the last scalar only a native formula): " + c.formula);
            }
            // the text results are text: the card check, a point outside the validity range, the version
            assertTrue(before.get("A4").isText && before.get("A4").text.equals("OK"), before.get("A4").text);
            assertTrue(before.get("A5").isText && before.get("A5").text.contains("45"), before.get("A5").text);
            assertTrue(before.get("A9").isText && before.get("A9").text.equals(FunctionCatalog.VERSION),
                    before.get("A9").text);
            // MIX.TRACE's array mixes text and numbers (docs/trace.md: its fourth row is the number of components)
            assertTrue(before.get("E6").isText && !before.get("F6").isText && before.get("F6").value == 2.0,
                    "MIX.TRACE's components row: " + before.get("E6").text + " " + before.get("F6").text);
            for (String[] format : FORMATS) {
                Path file = office.scratch("round-trip." + format[0]);
                UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(file.toUri().toString(),
                        new com.sun.star.beans.PropertyValue[] {Office.property("FilterName", format[1])});
                saved.put(format[0], file);
            }
        } finally {
            Sheets.close(doc);
        }

        StringBuilder report = new StringBuilder("File formats: save, close, reopen with the extension installed, "
                + "calculateAll, compare with the values before saving (" + before.size() + " formula cells: "
                + SCALARS.length + " single-cell, the rest in " + ARRAYS.length + " array formulas)\n\n");
        List<String> failures = new ArrayList<>();
        for (Map.Entry<String, Path> e : saved.entrySet()) {
            List<String> problems = new ArrayList<>();
            int identical = 0;
            double worst = 0.0;
            List<String> changed = new ArrayList<>();
            int inputsIdentical = 0;
            int inputNumbers = 0;
            double inputsWorst = 0.0;
            String shown;
            XComponent reopened = office.load(e.getValue());
            try {
                Sheets.recalculate(reopened);
                for (Cell a : inputs(reopened).values()) {
                    Cell i = inputsBefore.get(a.where);
                    if (a.type != i.type) {
                        problems.add(a.where + ": input of content type " + a.type.getValue() + " instead of "
                                + i.type.getValue());
                    } else if (i.type == CellContentType.TEXT && !i.text.equals(a.text)) {
                        problems.add(a.where + ": input text \"" + a.text + "\" instead of \"" + i.text + "\"");
                    } else if (i.type == CellContentType.VALUE) {
                        inputNumbers++;
                        double d = relative(i.value, a.value);
                        inputsWorst = Math.max(inputsWorst, d);
                        if (Double.doubleToRawLongBits(i.value) == Double.doubleToRawLongBits(a.value)) {
                            inputsIdentical++;
                        } else {
                            changed.add(String.format("%s %s -> %s", a.where, Double.toString(i.value),
                                    Double.toString(a.value)));
                            if (!(d <= RELATIVE)) {
                                problems.add(a.where + ": input " + a.value + " instead of " + i.value);
                            }
                        }
                    }
                }
                Map<String, Cell> after = snapshot(reopened);
                shown = "A1 " + after.get("A1").formula + ", C1:C5 " + after.get("C1").formula;
                for (Cell b : before.values()) {
                    Cell a = after.get(b.where);
                    if (!b.formula.equals(a.formula)) {
                        problems.add(b.where + ": formula " + a.formula + " instead of " + b.formula);
                    }
                    if (!b.calls.equals(a.calls)) {
                        problems.add(b.where + ": add-in calls " + a.calls + " instead of " + b.calls);
                    }
                    if (a.error != 0) {
                        problems.add(b.where + ": Err:" + a.error + " (" + a.text + ") for " + b.formula);
                        continue;
                    }
                    if (b.isText != a.isText || b.isText && !b.text.equals(a.text)) {
                        problems.add(b.where + ": text \"" + a.text + "\" instead of \"" + b.text + "\"");
                    }
                    double d = relative(b.value, a.value);
                    worst = Math.max(worst, d);
                    if (Double.doubleToRawLongBits(b.value) == Double.doubleToRawLongBits(a.value)) {
                        identical++;
                    } else if (!(d <= RELATIVE)) {
                        problems.add(b.where + ": " + a.value + " instead of " + b.value + " (relative " + d + ")");
                    }
                }
            } finally {
                Sheets.close(reopened);
            }
            report.append(String.format("%-5s %s: %d of %d results bit-identical, largest relative difference %.3g;"
                    + " inputs: %d of %d numbers bit-identical, largest relative change %.3g; %d problems%n"
                    + "      reopened formulas: %s%n", e.getKey(), problems.isEmpty() ? "PASS" : "FAIL", identical,
                    before.size(), worst, inputsIdentical, inputNumbers, inputsWorst, problems.size(), shown));
            if (!changed.isEmpty()) {
                report.append("      inputs changed (first 5): ")
                        .append(String.join("; ", changed.subList(0, Math.min(5, changed.size())))).append('\n');
            }
            for (String p : problems) {
                report.append("      ").append(p).append('\n');
                failures.add(e.getKey() + " " + p);
            }
        }
        report.append("\nOpened in an office without the extension (recorded, not asserted; 'kept' = the value or "
                + "text from before saving):\n");
        report.append(withoutTheExtension(saved, before));
        report.append("\nWhat the files store for the add-in calls:\n");
        report.append("xls   names in the file: ").append(namesInXls(saved.get("xls"))).append('\n');
        report.append("xlsx  formulas of sheet1: ").append(formulasInXlsx(saved.get("xlsx"))).append('\n');
        Files.createDirectories(Paths.get("target", "file-formats"));
        for (Path file : saved.values()) {
            Files.copy(file, Paths.get("target", "file-formats").resolve(file.getFileName().toString()),
                    java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        Files.write(Paths.get("target", "file-formats.txt"), report.toString().getBytes(StandardCharsets.UTF_8));
        Figures.write("figures/FileFormatRoundTripIT-report.txt", String.valueOf(report));
        assertTrue(failures.isEmpty(), "after reopening:\n" + String.join("\n", failures));
    }

    /**
     * What a colleague without the add-in sees: each saved file opened in a second office on a fresh profile with no
     * extension, once as loaded and once after calculateAll, summarised over the formula cells.
     */
    private static String withoutTheExtension(Map<String, Path> saved, Map<String, Cell> before) throws Exception {
        StringBuilder out = new StringBuilder();
        Path base = Office.freshDirectory();
        Office bare = Office.launch(base, base.resolve("profile"));
        try {
            for (Map.Entry<String, Path> e : saved.entrySet()) {
                XComponent doc = bare.load(e.getValue());
                try {
                    out.append(String.format("%-5s as loaded:        %s%n", e.getKey(), shows(doc, before)));
                    Sheets.recalculate(doc);
                    out.append(String.format("%-5s after calculateAll: %s%n", e.getKey(), shows(doc, before)));
                } finally {
                    Sheets.close(doc);
                }
            }
        } finally {
            bare.dispose();
        }
        return out.toString();
    }

    /** Per kind of cell (single-cell number, single-cell text, array), how many show what. */
    private static String shows(XComponent doc, Map<String, Cell> before) throws Exception {
        XSpreadsheet sheet = Sheets.sheet(doc, 0);
        Map<String, Map<String, Integer>> kinds = new LinkedHashMap<>();
        for (Cell b : before.values()) {
            String kind = b.where.startsWith("A") && !b.formula.startsWith("{")
                    ? (b.where.equals("A" + SCALARS.length) ? "native formula" : b.isText ? "text" : "number")
                    : "array " + (b.isText ? "text" : "number");
            int col = b.where.charAt(0) - 'A';
            int row = Integer.parseInt(b.where.substring(1)) - 1;
            XCell c = Sheets.cell(sheet, col, row);
            String what = c.getError() != 0 ? "Err:" + c.getError() + " " + Sheets.text(c)
                    : b.isText ? (Sheets.text(c).equals(b.text) ? "kept" : "text '" + Sheets.text(c) + "'")
                    : Double.doubleToRawLongBits(c.getValue()) == Double.doubleToRawLongBits(b.value) ? "kept"
                    : relative(c.getValue(), b.value) <= RELATIVE ? "kept within 1e-12" : "other value";
            kinds.computeIfAbsent(kind, k -> new LinkedHashMap<>()).merge(what, 1, Integer::sum);
        }
        return kinds.toString();
    }

    /** The card on its own sheet, named {@code card}; the formulas on the first sheet, x1 inputs in B1:B5. */
    private static void build(XComponent doc) throws Exception {
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        sd.getSheets().insertNewByName("Card", (short) 1);
        Sheets.putCard(doc, Sheets.sheet(doc, "Card"), "Card", "card", TestCards.cells("ethanol-water-oiml.tsv"), 0, 0);
        XSpreadsheet sheet = Sheets.sheet(doc, 0);
        for (int r = 0; r < 5; r++) {
            Sheets.cell(sheet, 1, r).setValue(0.1 + 0.2 * r);
        }
        for (int r = 0; r < SCALARS.length; r++) {
            Sheets.cell(sheet, 0, r).setFormula(SCALARS[r]);
        }
        for (Object[] a : ARRAYS) {
            int[] at = (int[]) a[0];
            UnoRuntime.queryInterface(XArrayFormulaRange.class,
                    sheet.getCellRangeByPosition(at[0], at[1], at[2], at[3])).setArrayFormula((String) a[1]);
        }
    }

    /** Every formula cell of the first sheet, by address: formula (an array's for its cells), value, text, error. */
    private static Map<String, Cell> snapshot(XComponent doc) throws Exception {
        XSpreadsheet sheet = Sheets.sheet(doc, 0);
        int external = UnoRuntime.queryInterface(XFormulaOpCodeMapper.class,
                UnoRuntime.queryInterface(XMultiServiceFactory.class, doc)
                        .createInstance("com.sun.star.sheet.FormulaOpCodeMapper")).getOpCodeExternal();
        Map<String, Cell> cells = new LinkedHashMap<>();
        for (int r = 0; r < SCALARS.length; r++) {
            XCell c = Sheets.cell(sheet, 0, r);
            cells.put("A" + (r + 1), new Cell("A" + (r + 1), c.getType() == CellContentType.FORMULA
                    ? c.getFormula() : "(not a formula: " + c.getType().getValue() + ")",
                    addInCalls(UnoRuntime.queryInterface(XFormulaTokens.class, c).getTokens(), external), c));
        }
        for (Object[] a : ARRAYS) {
            int[] at = (int[]) a[0];
            XCellRange range = sheet.getCellRangeByPosition(at[0], at[1], at[2], at[3]);
            // empty unless the range is exactly one array formula's
            String formula = UnoRuntime.queryInterface(XArrayFormulaRange.class, range).getArrayFormula();
            List<String> calls = addInCalls(UnoRuntime.queryInterface(XArrayFormulaTokens.class, range)
                    .getArrayTokens(), external);
            for (int col = at[0]; col <= at[2]; col++) {
                for (int row = at[1]; row <= at[3]; row++) {
                    String where = Sheets.column(col) + (row + 1);
                    cells.put(where, new Cell(where, formula, calls, Sheets.cell(sheet, col, row)));
                }
            }
        }
        return cells;
    }

    /**
     * The add-in functions a formula calls, by programmatic name: its tokens with the office's add-in op-code. A
     * call that reopens as a macro name (#MACRO?) has another op-code, and its formula text alone does not show it.
     */
    private static List<String> addInCalls(FormulaToken[] tokens, int external) {
        List<String> calls = new ArrayList<>();
        for (FormulaToken t : tokens == null ? new FormulaToken[0] : tokens) {
            if (t.OpCode == external) {
                calls.add(String.valueOf(t.Data));
            }
        }
        return calls;
    }

    /** The card's cells (sheet Card) and the x1 inputs B1:B5, by address: value and text. */
    private static Map<String, Cell> inputs(XComponent doc) throws Exception {
        Map<String, Cell> cells = new LinkedHashMap<>();
        Object[][] card = TestCards.cells("ethanol-water-oiml.tsv");
        XSpreadsheet cardSheet = Sheets.sheet(doc, "Card");
        for (int r = 0; r < card.length; r++) {
            for (int c = 0; c < card[r].length; c++) {
                String where = "Card." + Sheets.column(c) + (r + 1);
                cells.put(where, new Cell(where, "", null, Sheets.cell(cardSheet, c, r)));
            }
        }
        XSpreadsheet sheet = Sheets.sheet(doc, 0);
        for (int r = 0; r < 5; r++) {
            cells.put("B" + (r + 1), new Cell("B" + (r + 1), "", null, Sheets.cell(sheet, 1, r)));
        }
        return cells;
    }

    private static double relative(double a, double b) {
        if (a == b) {
            return 0.0;
        }
        return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
    }

    /**
     * The add-in-like names in an .xls file (BIFF8 keeps names as 8-bit or UTF-16LE text): anything that looks like
     * a MIX. name, the service or the method names' prefix.
     */
    private static String namesInXls(Path xls) throws Exception {
        byte[] bytes = Files.readAllBytes(xls);
        Pattern name = Pattern.compile("(?i)(?:MIX\\.[A-Z]+|org\\.miscela[\\w.]*|_xll\\.[\\w.]+)");
        TreeSet<String> found = new TreeSet<>();
        List<String> texts = new ArrayList<>();
        texts.add(new String(bytes, StandardCharsets.ISO_8859_1));
        texts.add(new String(bytes, StandardCharsets.UTF_16LE));
        texts.add(new String(bytes, 1, bytes.length - 1, StandardCharsets.UTF_16LE));
        for (String t : texts) {
            Matcher m = name.matcher(t);
            while (m.find()) {
                found.add(m.group());
            }
        }
        return found.toString();
    }

    /** The formulas of the first sheet of an .xlsx file as stored ({@code <f>} elements). */
    private static String formulasInXlsx(Path xlsx) throws Exception {
        try (ZipFile z = new ZipFile(xlsx.toFile())) {
            ZipEntry e = z.getEntry("xl/worksheets/sheet1.xml");
            String xml;
            try (InputStream in = z.getInputStream(e)) {
                xml = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            }
            List<String> formulas = new ArrayList<>();
            Matcher m = Pattern.compile("<f[^>]*>([^<]*)</f>").matcher(xml);
            while (m.find()) {
                formulas.add(m.group(1).replace("&quot;", "\"").replace("&amp;", "&"));
            }
            return formulas.toString();
        }
    }

    /** One cell as the test sees it. */
    private static final class Cell {
        final String where;
        final String formula;
        /** The add-in functions the formula calls (null for an input cell). */
        final List<String> calls;
        final double value;
        final String text;
        final int error;
        final CellContentType type;
        /** A formula whose result is text (com.sun.star.sheet.FormulaResult). */
        final boolean isText;

        Cell(String where, String formula, List<String> calls, XCell c) throws Exception {
            this.where = where;
            this.formula = formula;
            this.calls = calls;
            this.value = c.getValue();
            this.text = Sheets.text(c);
            this.error = c.getError();
            this.type = c.getType();
            this.isText = type == CellContentType.FORMULA && (Integer) UnoRuntime.queryInterface(XPropertySet.class, c)
                    .getPropertyValue("FormulaResultType2") == FormulaResult.STRING;
        }
    }
}
