package org.miscela.examples;

import com.sun.star.beans.PropertyValue;
import com.sun.star.container.XEnumeration;
import com.sun.star.container.XIndexAccess;
import com.sun.star.container.XNamed;
import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.CellFlags;
import com.sun.star.sheet.FormulaResult;
import com.sun.star.sheet.XCalculatable;
import com.sun.star.sheet.XCellRangesQuery;
import com.sun.star.sheet.XSheetCellRanges;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCell;
import com.sun.star.text.XText;
import com.sun.star.uno.UnoRuntime;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.miscela.it.Office;

/**
 * The examples' main job: installs the built extension into a fresh private office profile, opens every
 * examples/*.ods (the builders' nine workbooks must be among them, see {@link #EXPECTED}), recalculates it, and
 * writes a PDF of each workbook and a CSV of each of its sheets into the output folder (first argument, else system
 * property miscela.examples.out, else out/examples under the repository root). It then checks that no formula cell
 * shows an error and that every check cell (MIX.CHECK, MIX.CHECKPOINT, a fit's result "check") says OK, and exits
 * non-zero when one does not.
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.ExampleRunner -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}. To choose the
 * folder use {@code -Dmiscela.examples.out=DIR}: {@code -Dexec.args} would also reach the build's own exec execution
 * (the wizard metadata writer) when a lifecycle phase such as test-compile runs in the same command.
 */
public final class ExampleRunner {
    /**
     * Comma-separated, double quotes, UTF-8, from line 1, cell contents saved as shown, formulas not exported,
     * spaces kept; the twelfth token (the 1-based sheet number) is appended per sheet.
     */
    static final String CSV_OPTIONS = "44,34,76,1,,0,false,true,true,false,false,";

    /** The workbooks the builders write: the job fails when one of them is missing. */
    static final String[] EXPECTED = {ExampleWorkbookBuilder.FILE, TernaryWorkbookBuilder.FILE,
        QuoteWorkbookBuilder.FILE, PlantWorkbookBuilder.FILE, LabFitWorkbookBuilder.FILE,
        AcidDilutionWorkbookBuilder.FILE, BrinePlantWorkbookBuilder.FILE,
        SolventRecoveryWorkbookBuilder.FILE, SanitiserStrengthWorkbookBuilder.FILE};

    /** Error cells listed per sheet before the rest are only counted. */
    private static final int SHOWN = 12;

    private ExampleRunner() {
    }

    public static void main(String[] args) throws Exception {
        Path root = ExampleWorkbooks.repoRoot();
        String chosen = args.length > 0 ? args[0] : System.getProperty("miscela.examples.out");
        Path out = chosen != null ? Paths.get(chosen).toAbsolutePath() : root.resolve("out").resolve("examples");
        List<Path> workbooks = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(root.resolve("examples"), "*.ods")) {
            ds.forEach(workbooks::add);
        }
        workbooks.sort(null);
        for (String expected : EXPECTED) {
            if (!Files.exists(root.resolve("examples").resolve(expected))) {
                System.err.println("missing example workbook " + root.resolve("examples").resolve(expected)
                        + " (its builder writes it)");
                System.exit(2);
            }
        }
        Files.createDirectories(out);
        int failures = 0;
        Office office = Office.start();
        try {
            for (Path wb : workbooks) {
                failures += run(office, wb, out, System.out::println, System.err::println);
            }
        } finally {
            office.dispose();
        }
        if (failures > 0) {
            System.err.println("FAILED: " + failures + " problem(s)");
            System.exit(1);
        }
        System.out.println("all examples recalculated without errors");
    }

    /**
     * Exports one workbook and returns how many problems it has; what it wrote and each sheet's counts go to
     * {@code progress}, each problem cell or missing sheet to {@code problems}.
     */
    static int run(Office office, Path workbook, Path out, Consumer<String> progress, Consumer<String> problems)
            throws Exception {
        String base = workbook.getFileName().toString().replaceFirst("\\.ods$", "");
        XComponent doc = office.load(office.stage(workbook));
        int count = 0;
        try {
            UnoRuntime.queryInterface(XCalculatable.class, doc).calculateAll();
            XStorable store = UnoRuntime.queryInterface(XStorable.class, doc);

            Path pdf = office.scratch(base + ".pdf");
            store.storeToURL(pdf.toUri().toString(), new PropertyValue[] {
                Office.property("FilterName", "calc_pdf_Export")});
            progress.accept("wrote " + copy(pdf, out));

            XIndexAccess sheets = UnoRuntime.queryInterface(XIndexAccess.class,
                    UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc).getSheets());
            for (int i = 0; i < sheets.getCount(); i++) {
                XSpreadsheet sheet = UnoRuntime.queryInterface(XSpreadsheet.class, sheets.getByIndex(i));
                String name = UnoRuntime.queryInterface(XNamed.class, sheet).getName();
                // the CSV filter writes the sheet named by its twelfth option token (1-based), and then adds
                // "-<sheet name>" to the file name it is given
                Path csv = office.scratch(base + "-" + name + ".csv");
                store.storeToURL(office.scratch(base + ".csv").toUri().toString(), new PropertyValue[] {
                    Office.property("FilterName", "Text - txt - csv (StarCalc)"),
                    Office.property("FilterOptions", CSV_OPTIONS + (i + 1))});
                Path written = copy(csv, out);
                progress.accept("wrote " + written);
                String a1 = UnoRuntime.queryInterface(XText.class, sheet.getCellByPosition(0, 0)).getString();
                String text = new String(Files.readAllBytes(written), StandardCharsets.UTF_8);
                if (a1.isEmpty() || !text.contains(a1)) {
                    problems.accept(base + " / " + name + ": the CSV does not hold this sheet (A1 not found)");
                    count++;
                }
                count += check(base, name, sheet, progress, problems);
            }
        } finally {
            doc.dispose();
        }
        return count;
    }

    /** Counts formula cells, error results and check cells that do not say OK on one sheet; reports the counts. */
    private static int check(String book, String name, XSpreadsheet sheet, Consumer<String> progress,
            Consumer<String> problems) throws Exception {
        XCellRangesQuery q = UnoRuntime.queryInterface(XCellRangesQuery.class, sheet);
        List<XCell> formulas = cells(q.queryContentCells((short) CellFlags.FORMULA));
        List<XCell> errors = cells(q.queryFormulaCells(FormulaResult.ERROR));
        int checks = 0;
        int notOk = 0;
        for (XCell c : formulas) {
            String f = c.getFormula().toUpperCase(java.util.Locale.ROOT);
            if (f.contains("MIX.CHECK") || f.contains("CHECKCARD") || f.contains("CHECKPOINT")
                    || f.contains("\"CHECK\")")) {
                checks++;
                String shown = UnoRuntime.queryInterface(XText.class, c).getString();
                if (!"OK".equals(shown)) {
                    notOk++;
                    problems.accept(book + " / " + name + ": " + address(c) + " says: " + shown);
                }
            }
        }
        for (int i = 0; i < errors.size() && i < SHOWN; i++) {
            XCell c = errors.get(i);
            problems.accept(book + " / " + name + ": " + address(c) + " shows error " + c.getError() + " ("
                    + c.getFormula() + ")");
        }
        if (errors.size() > SHOWN) {
            problems.accept(book + " / " + name + ": ... and " + (errors.size() - SHOWN) + " more error cells");
        }
        progress.accept(book + " / " + name + ": " + formulas.size() + " formula cells, " + errors.size()
                + " with an error, " + checks + " check cells, " + notOk + " not OK");
        return errors.size() + notOk;
    }

    private static String address(XCell c) {
        com.sun.star.table.CellAddress a = UnoRuntime.queryInterface(com.sun.star.sheet.XCellAddressable.class, c)
                .getCellAddress();
        String col = "";
        for (int n = a.Column + 1; n > 0; n = (n - 1) / 26) {
            col = (char) ('A' + (n - 1) % 26) + col;
        }
        return col + (a.Row + 1);
    }

    private static List<XCell> cells(XSheetCellRanges ranges) throws Exception {
        List<XCell> list = new ArrayList<>();
        XEnumeration e = ranges.getCells().createEnumeration();
        while (e.hasMoreElements()) {
            list.add(UnoRuntime.queryInterface(XCell.class, e.nextElement()));
        }
        return list;
    }

    private static Path copy(Path from, Path dir) throws Exception {
        if (!Files.exists(from)) {
            try (java.util.stream.Stream<Path> l = Files.list(from.getParent())) {
                throw new IllegalStateException("the office did not write " + from + "; the folder holds "
                        + java.util.Arrays.toString(l.map(p -> p.getFileName().toString()).toArray()));
            }
        }
        Path to = dir.resolve(from.getFileName().toString());
        Files.copy(from, to, StandardCopyOption.REPLACE_EXISTING);
        return to;
    }
}
