package org.miscela.bench;

import com.sun.star.container.XNameAccess;
import com.sun.star.container.XNameContainer;
import com.sun.star.container.XNamed;
import com.sun.star.lang.XComponent;
import com.sun.star.lang.XMultiServiceFactory;
import com.sun.star.script.XLibraryContainer;
import com.sun.star.sheet.FillDirection;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XCalculatable;
import com.sun.star.sheet.XCellSeries;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCellRange;
import com.sun.star.sheet.XCellRangeData;
import com.sun.star.uno.UnoRuntime;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.function.IntFunction;
import org.miscela.it.Office;
import org.miscela.it.Sheets;

/**
 * The speed benchmark (docs/performance.md): in one headless office with the built extension and the bridge probe
 * installed, full-recalculates N formula cells of each kind — the equivalent native inline formula, the add-in's
 * scalar density and partial molar volume, the cheapest possible Java add-in call (the bridge floor) and its
 * variants, the same density as a Basic macro function, and the add-in's array forms over the same cells — repeats
 * every kind R times (interleaved, after one untimed first recalculation), and prints medians, µs per cell, ratios to
 * the native formula and to the bridge floor, the office process's memory growth, the card parse count and whether
 * every kind computed the same numbers. The table also goes to a file.
 *
 * <p>Run it with scripts/benchmark ({@code --cells N --repeats R --out FILE}); system properties miscela.oxt and
 * miscela.probe.oxt name the two extensions. Not a test: it asserts nothing about speed (BenchmarkSmokeIT runs a
 * small one so it cannot rot).
 */
public final class CalcBenchmark {
    static final String CARD_SHEET = "Card";
    static final String CARD_NAME = "bench";
    static final String MACRO = "BENCHDENSITY";

    /**
     * How a kind's cells are written: one formula per cell (filled down), one array formula over the column, or a
     * single formula cell (for the probes that split an array call into its halves).
     */
    enum Layout { PER_CELL, ARRAY, ONE_CELL }

    /** One kind of formula cell the benchmark times. */
    static final class Kind {
        final String key;
        final String label;
        final Layout layout;
        final IntFunction<String> formula;
        /** The most formula cells of this kind (0: as many as the run's cells). */
        final int most;

        Kind(String key, String label, Layout layout, IntFunction<String> formula) {
            this(key, label, layout, formula, 0);
        }

        Kind(String key, String label, Layout layout, IntFunction<String> formula, int most) {
            this.key = key;
            this.label = label;
            this.layout = layout;
            this.formula = formula;
            this.most = most;
        }

        /** The formula cells of this kind in a run of {@code cells}. */
        int cells(int cells) {
            return layout == Layout.ONE_CELL ? 1 : most == 0 ? cells : Math.min(most, cells);
        }
    }

    /** The card packed by MIX.PACK in one cell of the card sheet, and the same for a card named as whole columns. */
    static final String PACKED = "$" + CARD_SHEET + ".$J$1";
    /** The card packed by MIX.PACK entered as a one-cell array formula (its text kept in the array's result). */
    static final String PACKED_ARRAY = "$" + CARD_SHEET + ".$J$5";
    static final String COLUMNS_NAME = "benchcolumns";
    static final String PACKED_COLUMNS = "$" + CARD_SHEET + ".$J$2";
    static final String PACKED_COLUMNS_ARRAY = "$" + CARD_SHEET + ".$J$6";
    /** Single-cell formulas over a card named as whole columns: each converts the whole columns on every call. */
    static final int WHOLE_COLUMN_CELLS = 5;

    /** What one kind measured. */
    static final class Measured {
        final Kind kind;
        double firstSeconds;
        final List<Double> seconds = new ArrayList<>();
        long firstGrowthKb;
        final List<Long> growthKb = new ArrayList<>();
        double firstHeapGrowthMb;
        final List<Double> heapGrowthMb = new ArrayList<>();
        double[] values;
        int errors;
        /** Calc's error code of the first cell that shows one. */
        int firstError;

        Measured(Kind kind) {
            this.kind = kind;
        }

        double median() {
            double[] s = seconds.stream().mapToDouble(Double::doubleValue).sorted().toArray();
            return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
        }

        long medianGrowthKb() {
            long[] s = growthKb.stream().mapToLong(Long::longValue).sorted().toArray();
            return s[s.length / 2];
        }

        double medianHeapGrowthMb() {
            double[] s = heapGrowthMb.stream().mapToDouble(Double::doubleValue).sorted().toArray();
            return s[s.length / 2];
        }
    }

    /** The result of a whole run. */
    static final class Report {
        final Map<String, Measured> measured = new LinkedHashMap<>();
        int cells;
        int repeats;
        double cardReads;
        double cardsKept;
        double distinctThreads;
        long officeRssStartKb;
        long officeRssEndKb;
        double heapStartMb;
        double heapEndMb;
        String officeVersion;
        String addInVersion;
        double worstDensityDifference;
        double worstPartialDifference;
        List<String> jvmOptions;
        AdapterCost.Cost ownDensity;
        AdapterCost.Cost ownPartial;
        String table;
    }

    private CalcBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int cells = 100_000;
        int repeats = 3;
        Path out = Paths.get("out", "benchmark", "benchmark.md");
        List<String> jvmOptions = new ArrayList<>();
        List<String> only = null;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--cells":
                    cells = Integer.parseInt(args[++i]);
                    break;
                case "--repeats":
                    repeats = Integer.parseInt(args[++i]);
                    break;
                case "--out":
                    out = Paths.get(args[++i]);
                    break;
                case "--jvm-option":
                    jvmOptions.add(args[++i]);
                    break;
                case "--kinds":
                    only = Arrays.asList(args[++i].split(","));
                    break;
                default:
                    System.err.println("usage: CalcBenchmark [--cells N] [--repeats R] [--out FILE] "
                            + "[--kinds a,c,b1,…] [--jvm-option OPTION]…");
                    System.exit(2);
            }
        }
        if (cells < 1 || repeats < 1) {
            System.err.println("cells and repeats must be at least 1");
            System.exit(2);
        }
        Report report = run(cells, repeats, probeExtension(), only, jvmOptions);
        System.out.println(report.table);
        write(report, out);
        System.out.println("Table written to " + out.toAbsolutePath());
    }

    /** Writes the report's table (Markdown) to the file, making its folder when needed. */
    static void write(Report report, Path out) throws IOException {
        Path target = out.toAbsolutePath();
        Files.createDirectories(target.getParent());
        Files.write(target, report.table.getBytes(StandardCharsets.UTF_8));
    }

    static Path probeExtension() {
        String p = System.getProperty("miscela.probe.oxt");
        if (p == null) {
            throw new IllegalStateException("system property miscela.probe.oxt is not set (scripts/benchmark sets it)");
        }
        return Paths.get(p);
    }

    /** The kinds, in the order they are timed within each round. */
    static List<Kind> kinds(BenchmarkCard card, int cells) {
        String last = String.valueOf(cells);
        List<Kind> k = new ArrayList<>();
        k.add(new Kind("a", "native inline formula (density)", Layout.PER_CELL,
                r -> card.nativeFormula(CARD_SHEET, r)));
        k.add(new Kind("b1", "MIX.DENSITY, one call per cell", Layout.PER_CELL,
                r -> "=MIX.DENSITY(" + CARD_NAME + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("b2", "MIX.PARTIALVOLUME, one call per cell", Layout.PER_CELL,
                r -> "=MIX.PARTIALVOLUME(" + CARD_NAME + ";1;A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c", "bridge floor: PROBE.ECHO(number)", Layout.PER_CELL, r -> "=PROBE.ECHO(D" + r + ")"));
        k.add(new Kind("c-any", "probe: PROBE.ECHOANY(any)", Layout.PER_CELL, r -> "=PROBE.ECHOANY(D" + r + ")"));
        k.add(new Kind("c-doc", "probe: PROBE.ECHODOC(document, number)", Layout.PER_CELL,
                r -> "=PROBE.ECHODOC(D" + r + ")"));
        k.add(new Kind("c-range", "probe: PROBE.ECHORANGE(card range, number)", Layout.PER_CELL,
                r -> "=PROBE.ECHORANGE(" + CARD_NAME + ";D" + r + ")"));
        k.add(new Kind("c-args", "probe: PROBE.ECHODENSITYARGS(card; composition; temperature), MIX.DENSITY's "
                + "arguments and no work", Layout.PER_CELL,
                r -> "=PROBE.ECHODENSITYARGS(" + CARD_NAME + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c-cells", "probe: PROBE.ECHOCELLS(card as cell range object, number)", Layout.PER_CELL,
                r -> "=PROBE.ECHOCELLS(" + CARD_NAME + ";D" + r + ")"));
        k.add(new Kind("c-address", "probe: PROBE.ECHOADDRESS(card as cell range object, number), asks its address",
                Layout.PER_CELL, r -> "=PROBE.ECHOADDRESS(" + CARD_NAME + ";D" + r + ")"));
        k.add(new Kind("c-addin", "probe: PROBE.ECHOADDIN(number), XAddIn registration", Layout.PER_CELL,
                r -> "=PROBE.ECHOADDIN(D" + r + ")"));
        k.add(new Kind("d", "Basic macro function (density)", Layout.PER_CELL,
                r -> "=" + MACRO + "(" + CARD_NAME + ";A" + r + ";B" + r + ";C" + r + ";D" + r + ")"));
        k.add(new Kind("b1-p", "MIX.DENSITY with the packed card (MIX.PACK in one cell), one call per cell",
                Layout.PER_CELL, r -> "=MIX.DENSITY(" + PACKED + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("b2-p", "MIX.PARTIALVOLUME with the packed card, one call per cell", Layout.PER_CELL,
                r -> "=MIX.PARTIALVOLUME(" + PACKED + ";1;A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("b1-pa", "MIX.DENSITY with the packed card entered as a one-cell array formula",
                Layout.PER_CELL, r -> "=MIX.DENSITY(" + PACKED_ARRAY + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("b2-pa", "MIX.PARTIALVOLUME with the packed card entered as a one-cell array formula",
                Layout.PER_CELL, r -> "=MIX.PARTIALVOLUME(" + PACKED_ARRAY + ";1;A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c-args-pa", "probe: PROBE.ECHODENSITYARGS(packed card as a one-cell array formula; "
                + "composition; temperature), no work", Layout.PER_CELL,
                r -> "=PROBE.ECHODENSITYARGS(" + PACKED_ARRAY + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c-args-p", "probe: PROBE.ECHODENSITYARGS(packed card; composition; temperature), no work",
                Layout.PER_CELL, r -> "=PROBE.ECHODENSITYARGS(" + PACKED + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c-args-1", "probe: PROBE.ECHODENSITYARGS(one number; composition; temperature), the floor for "
                + "MIX.DENSITY's own non-card arguments", Layout.PER_CELL,
                r -> "=PROBE.ECHODENSITYARGS(D" + r + ";A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c-text-100", "probe: PROBE.ECHODENSITYARGS(a cell of 100 characters; composition; "
                + "temperature), no work", Layout.PER_CELL,
                r -> "=PROBE.ECHODENSITYARGS($" + CARD_SHEET + ".$J$3;A" + r + ":C" + r + ";D" + r + ")"));
        k.add(new Kind("c-text-3500", "probe: PROBE.ECHODENSITYARGS(a cell of 3,500 characters, about the packed "
                + "card's length; composition; temperature), no work", Layout.PER_CELL,
                r -> "=PROBE.ECHODENSITYARGS($" + CARD_SHEET + ".$J$4;A" + r + ":C" + r + ";D" + r + ")"));
        if (cells >= 10_000) {
            k.add(new Kind("b1-col", "MIX.DENSITY over the card named as whole columns, " + WHOLE_COLUMN_CELLS
                    + " cells only", Layout.PER_CELL,
                    r -> "=MIX.DENSITY(" + COLUMNS_NAME + ";A" + r + ":C" + r + ";D" + r + ")", WHOLE_COLUMN_CELLS));
            k.add(new Kind("b1-col-p", "MIX.DENSITY with the whole-column card packed once (MIX.PACK in one cell)",
                    Layout.PER_CELL, r -> "=MIX.DENSITY(" + PACKED_COLUMNS + ";A" + r + ":C" + r + ";D" + r + ")"));
            k.add(new Kind("b1-col-pa", "MIX.DENSITY with the whole-column card packed once, as a one-cell array "
                    + "formula", Layout.PER_CELL,
                    r -> "=MIX.DENSITY(" + PACKED_COLUMNS_ARRAY + ";A" + r + ":C" + r + ";D" + r + ")"));
        }
        k.add(new Kind("e1", "MIX.DENSITY, one array formula over the column", Layout.ARRAY,
                r -> "MIX.DENSITY(" + CARD_NAME + ";A1:C" + last + ";D1:D" + last + ")"));
        k.add(new Kind("e2", "MIX.PARTIALVOLUME, one array formula over the column", Layout.ARRAY,
                r -> "MIX.PARTIALVOLUME(" + CARD_NAME + ";1;A1:C" + last + ";D1:D" + last + ")"));
        k.add(new Kind("e-args", "probe: PROBE.ECHODENSITYBLOCK over the column, e1's arguments and result and no "
                + "work", Layout.ARRAY, r -> "PROBE.ECHODENSITYBLOCK(" + CARD_NAME + ";A1:C" + last + ";D1:D" + last + ")"));
        k.add(new Kind("e-in", "probe: PROBE.ECHODENSITYARGS over the whole block in one cell, e1's arguments only",
                Layout.ONE_CELL, r -> "=PROBE.ECHODENSITYARGS(" + CARD_NAME + ";A1:C" + last + ";D1:D" + last + ")"));
        k.add(new Kind("e-out", "probe: PROBE.COLUMN over the column, e1's result only", Layout.ARRAY,
                r -> "PROBE.COLUMN(" + last + ")"));
        return k;
    }

    /** Runs the whole benchmark in one office process. */
    static Report run(int cells, int repeats, Path probe) throws Exception {
        return run(cells, repeats, probe, null, new ArrayList<>());
    }

    /**
     * Runs the benchmark in one office process: every kind, or those named in {@code only} (the native formula "a"
     * and the bridge floor "c" always run, as the ratios need them), with these options for the office's JVM.
     */
    static Report run(int cells, int repeats, Path probe, List<String> only, List<String> jvmOptions)
            throws Exception {
        BenchmarkCard card = new BenchmarkCard();
        Object[][] data = data(cells);
        List<Kind> kinds = new ArrayList<>(kinds(card, cells));
        if (only != null) {
            kinds.removeIf(k -> !only.contains(k.key) && !k.key.equals("a") && !k.key.equals("c"));
        }
        Report report = new Report();
        report.cells = cells;
        report.repeats = repeats;
        report.jvmOptions = jvmOptions;
        Office office = Office.start(jvmOptions, probe);
        try {
            ProcessHandle soffice = office.officeProcess();
            report.officeVersion = officeVersion(office);
            XComponent control = office.newSpreadsheet();
            XSpreadsheet controlSheet = Sheets.sheet(control, 0);
            Sheets.cell(controlSheet, 0, 0).setFormula("=MIX.INFO(\"card reads\")");
            Sheets.cell(controlSheet, 0, 1).setFormula("=MIX.INFO(\"cards kept\")");
            Sheets.cell(controlSheet, 0, 2).setFormula("=MIX.INFO()");
            Sheets.recalculate(control);
            double readsBefore = Sheets.cell(controlSheet, 0, 0).getValue();

            installMacro(office, card);
            Map<String, XComponent> docs = new LinkedHashMap<>();
            for (Kind k : kinds) {
                docs.put(k.key, document(office, card, data, k, cells));
                report.measured.put(k.key, new Measured(k));
            }
            XComponent heapDoc = office.newSpreadsheet();
            Sheets.cell(Sheets.sheet(heapDoc, 0), 0, 0).setFormula("=PROBE.HEAP(0)");
            XComponent collectDoc = office.newSpreadsheet();
            Sheets.cell(Sheets.sheet(collectDoc, 0), 0, 0).setFormula("=PROBE.HEAP(2)");
            report.heapStartMb = heap(heapDoc);
            report.officeRssStartKb = rssKb(soffice);
            for (int round = 0; round <= repeats; round++) {
                for (Kind k : kinds) {
                    Measured m = report.measured.get(k.key);
                    collect(collectDoc);
                    double heapBefore = heap(heapDoc);
                    long before = rssKb(soffice);
                    long t0 = System.nanoTime();
                    UnoRuntime.queryInterface(XCalculatable.class, docs.get(k.key)).calculateAll();
                    double s = (System.nanoTime() - t0) / 1e9;
                    long growth = rssKb(soffice) - before;
                    double heapGrowth = heap(heapDoc) - heapBefore;
                    if (round == 0) {
                        m.firstSeconds = s;
                        m.firstGrowthKb = growth;
                        m.firstHeapGrowthMb = heapGrowth;
                    } else {
                        m.seconds.add(s);
                        m.growthKb.add(growth);
                        m.heapGrowthMb.add(heapGrowth);
                    }
                }
            }
            report.officeRssEndKb = rssKb(soffice);
            report.heapEndMb = heap(heapDoc);
            Sheets.close(heapDoc);
            Sheets.close(collectDoc);
            for (Kind k : kinds) {
                Measured m = report.measured.get(k.key);
                m.values = column(docs.get(k.key), k.cells(cells));
                for (int i = 0; i < m.values.length; i++) {
                    if (Double.isNaN(m.values[i])) {
                        if (m.errors++ == 0) {
                            m.firstError = Sheets.sheet(docs.get(k.key), 0).getCellByPosition(4, i).getError();
                        }
                    }
                }
            }
            report.distinctThreads = threads(office, cells);
            Sheets.recalculate(control);
            report.cardReads = Sheets.cell(controlSheet, 0, 0).getValue() - readsBefore;
            report.cardsKept = Sheets.cell(controlSheet, 0, 1).getValue();
            report.addInVersion = Sheets.text(Sheets.cell(controlSheet, 0, 2));
            for (XComponent d : docs.values()) {
                Sheets.close(d);
            }
            Sheets.close(control);
        } finally {
            office.dispose();
        }
        report.worstDensityDifference = Math.max(worst(report, "a", "b1"), Math.max(worst(report, "d", "b1"),
                worst(report, "e1", "b1")));
        report.worstPartialDifference = worst(report, "e2", "b2");
        report.ownDensity = AdapterCost.density(Math.max(cells, 20_000));
        report.ownPartial = AdapterCost.partialVolume(Math.max(cells, 20_000));
        report.table = table(report);
        return report;
    }

    /** Compositions (x1, x2, x3, each ≥ 0.02) and temperatures (5–55 °C) inside the card's range, seeded. */
    static Object[][] data(int cells) {
        SplittableRandom random = new SplittableRandom(20261202L);
        Object[][] rows = new Object[cells][];
        for (int r = 0; r < cells; r++) {
            double a = 0.02 + 0.96 * random.nextDouble();
            double b = (1 - a - 0.02) * random.nextDouble();
            double x1 = Math.round(a * 1e4) / 1e4;
            double x2 = Math.max(0.01, Math.round(b * 1e4) / 1e4);
            double x3 = 1 - x1 - x2;
            double t = Math.round((5 + 50 * random.nextDouble()) * 10) / 10.0;
            rows[r] = new Object[] {x1, x2, x3, t};
        }
        return rows;
    }

    /** A document with the card (named range), the data in A:D and the kind's formulas in column E, not yet computed. */
    private static XComponent document(Office office, BenchmarkCard card, Object[][] data, Kind kind, int cells)
            throws Exception {
        XComponent doc = office.newSpreadsheet();
        XCalculatable calc = UnoRuntime.queryInterface(XCalculatable.class, doc);
        calc.enableAutomaticCalculation(false);
        XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
        sd.getSheets().insertNewByName(CARD_SHEET, (short) 1);
        XSpreadsheet cardSheet = Sheets.sheet(doc, CARD_SHEET);
        XCellRange cardRange = cardSheet.getCellRangeByName("A1:" + Sheets.column(BenchmarkCard.COLUMNS - 1)
                + card.rowCount());
        UnoRuntime.queryInterface(XCellRangeData.class, cardRange).setDataArray(card.cells());
        Sheets.nameRange(doc, CARD_NAME, "$" + CARD_SHEET + ".$A$1:$" + Sheets.column(BenchmarkCard.COLUMNS - 1) + "$"
                + card.rowCount());
        Sheets.nameRange(doc, COLUMNS_NAME, "$" + CARD_SHEET + ".$A$1:$" + Sheets.column(BenchmarkCard.COLUMNS - 1)
                + "$1048576");
        // each document holds only the packed cell its kind names: a pack over the whole columns costs one pass of
        // every recalculation, which must not land on the other kinds
        boolean wholeColumns = kind.key.startsWith("b1-col");
        if (kind.key.endsWith("-p")) {
            cardSheet.getCellByPosition(9, wholeColumns ? 1 : 0).setFormula("=MIX.PACK("
                    + (wholeColumns ? COLUMNS_NAME : CARD_NAME) + ")");
        }
        if (kind.key.endsWith("-pa")) {
            UnoRuntime.queryInterface(XArrayFormulaRange.class, cardSheet.getCellRangeByName(wholeColumns ? "J6:J6"
                    : "J5:J5")).setArrayFormula("MIX.PACK(" + (wholeColumns ? COLUMNS_NAME : CARD_NAME) + ")");
        }
        // plain texts of two lengths, to tell the cost of a text argument's length from the add-in's work
        Sheets.put(cardSheet, 9, 2, "x".repeat(100));
        Sheets.put(cardSheet, 9, 3, "x".repeat(3500));
        XSpreadsheet sheet = Sheets.sheet(doc, 0);
        UnoRuntime.queryInterface(XNamed.class, sheet).setName("Data");
        UnoRuntime.queryInterface(XCellRangeData.class, sheet.getCellRangeByName("A1:D" + cells)).setDataArray(data);
        int n = kind.cells(cells);
        XCellRange column = sheet.getCellRangeByName("E1:E" + n);
        if (kind.layout == Layout.ONE_CELL) {
            sheet.getCellByPosition(4, 0).setFormula(kind.formula.apply(1));
        } else if (kind.layout == Layout.ARRAY) {
            UnoRuntime.queryInterface(XArrayFormulaRange.class, column).setArrayFormula(kind.formula.apply(1));
        } else {
            sheet.getCellByPosition(4, 0).setFormula(kind.formula.apply(1));
            if (n > 1) {
                UnoRuntime.queryInterface(XCellSeries.class, column).fillAuto(FillDirection.TO_BOTTOM, 1);
            }
        }
        return doc;
    }

    /**
     * Puts the Basic function into the application's Standard library ("My Macros"): Calc refuses to run a new
     * document's own macros (every cell shows #VALUE!), and the application library is where users keep theirs.
     */
    private static void installMacro(Office office, BenchmarkCard card) throws Exception {
        XLibraryContainer libraries = UnoRuntime.queryInterface(XLibraryContainer.class,
                office.service("com.sun.star.script.ApplicationScriptLibraryContainer"));
        libraries.loadLibrary("Standard");
        XNameContainer standard = UnoRuntime.queryInterface(XNameContainer.class, libraries.getByName("Standard"));
        if (standard.hasByName("Benchmark")) {
            standard.removeByName("Benchmark");
        }
        standard.insertByName("Benchmark", card.basicModule(MACRO));
    }

    /** Column E's values; NaN for a cell that shows an error or no number (an error cell reads as no value). */
    private static double[] column(XComponent doc, int cells) throws Exception {
        Object[][] got = UnoRuntime.queryInterface(XCellRangeData.class,
                Sheets.sheet(doc, 0).getCellRangeByName("E1:E" + cells)).getDataArray();
        double[] v = new double[cells];
        for (int r = 0; r < cells; r++) {
            v[r] = got[r][0] instanceof Double ? (Double) got[r][0] : Double.NaN;
        }
        return v;
    }

    /** PROBE.THREADS over the cells: how many distinct Java threads the bridge used for that many scalar calls. */
    private static double threads(Office office, int cells) throws Exception {
        XComponent doc = office.newSpreadsheet();
        try {
            UnoRuntime.queryInterface(XCalculatable.class, doc).enableAutomaticCalculation(false);
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            Object[][] ones = new Object[cells][];
            for (int r = 0; r < cells; r++) {
                ones[r] = new Object[] {1.0};
            }
            UnoRuntime.queryInterface(XCellRangeData.class, sheet.getCellRangeByName("A1:A" + cells)).setDataArray(ones);
            sheet.getCellByPosition(1, 0).setFormula("=PROBE.THREADS(A1)");
            if (cells > 1) {
                UnoRuntime.queryInterface(XCellSeries.class, sheet.getCellRangeByName("B1:B" + cells))
                        .fillAuto(FillDirection.TO_BOTTOM, 1);
            }
            Sheets.recalculate(doc);
            double max = 0;
            for (Object[] row : UnoRuntime.queryInterface(XCellRangeData.class,
                    sheet.getCellRangeByName("B1:B" + cells)).getDataArray()) {
                max = Math.max(max, row[0] instanceof Double ? (Double) row[0] : Double.NaN);
            }
            return max;
        } finally {
            Sheets.close(doc);
        }
    }

    /** The largest relative difference between two kinds' values (infinite when either has an error cell). */
    private static double worst(Report report, String a, String b) {
        if (!report.measured.containsKey(a) || !report.measured.containsKey(b)) {
            return Double.NaN;
        }
        double[] x = report.measured.get(a).values;
        double[] y = report.measured.get(b).values;
        double w = 0;
        for (int i = 0; i < x.length; i++) {
            double d = Math.abs(x[i] - y[i]) / Math.max(Math.abs(y[i]), 1e-300);
            w = Double.isNaN(d) ? Double.POSITIVE_INFINITY : Math.max(w, d);
        }
        return w;
    }

    /** The office JVM's committed heap in MB, through the probe's cell in its own document. */
    /** Asks the office's JVM for a garbage collection (PROBE.HEAP(2)) before a kind is timed. */
    private static void collect(XComponent collectDoc) throws Exception {
        Sheets.recalculate(collectDoc);
    }

    private static double heap(XComponent heapDoc) throws Exception {
        Sheets.recalculate(heapDoc);
        return Sheets.cell(Sheets.sheet(heapDoc, 0), 0, 0).getValue();
    }

    /** Resident memory of a process, in kB, from /proc (Linux). */
    static long rssKb(ProcessHandle p) throws IOException {
        for (String line : Files.readAllLines(Paths.get("/proc", String.valueOf(p.pid()), "status"))) {
            if (line.startsWith("VmRSS:")) {
                return Long.parseLong(line.replaceAll("[^0-9]", ""));
            }
        }
        throw new IOException("no VmRSS for process " + p.pid());
    }

    private static String officeVersion(Office office) throws Exception {
        XMultiServiceFactory provider = UnoRuntime.queryInterface(XMultiServiceFactory.class,
                office.service("com.sun.star.configuration.ConfigurationProvider"));
        XNameAccess product = UnoRuntime.queryInterface(XNameAccess.class, provider.createInstanceWithArguments(
                "com.sun.star.configuration.ConfigurationAccess",
                new Object[] {Office.property("nodepath", "/org.openoffice.Setup/Product")}));
        return product.getByName("ooName") + " " + product.getByName("ooSetupVersionAboutBox");
    }

    /** The machine the figures were measured on, in one line. */
    static String machine() {
        String cpu = "unknown CPU";
        try {
            for (String line : Files.readAllLines(Paths.get("/proc/cpuinfo"))) {
                if (line.startsWith("model name")) {
                    cpu = line.substring(line.indexOf(':') + 1).trim();
                    break;
                }
            }
        } catch (IOException e) {
            // not Linux: the CPU stays unnamed
        }
        String load = "";
        try {
            String[] avg = new String(Files.readAllBytes(Paths.get("/proc/loadavg")), StandardCharsets.UTF_8).split(" ");
            load = ", load average " + avg[0] + " at the end (other work on the machine slows every kind alike)";
        } catch (IOException e) {
            // not Linux: no load figure
        }
        return cpu + ", " + Runtime.getRuntime().availableProcessors() + " cores available, "
                + System.getProperty("os.name") + " " + System.getProperty("os.version") + load;
    }

    static String table(Report r) {
        Measured floor = r.measured.get("c");
        Measured nat = r.measured.get("a");
        StringBuilder s = new StringBuilder();
        s.append("# Miscela benchmark: ").append(String.format(Locale.ROOT, "%,d", r.cells))
                .append(" cells per kind, full recalculation, median of ").append(r.repeats)
                .append(r.repeats == 1 ? " run" : " runs").append(" after one untimed first run\n\n");
        s.append("- when: ").append(ZonedDateTime.now().format(DateTimeFormatter.ISO_OFFSET_DATE_TIME)).append('\n');
        s.append("- machine: ").append(machine()).append('\n');
        s.append("- office: ").append(r.officeVersion).append(", one process, headless; Miscela ")
                .append(r.addInVersion).append('\n');
        s.append("- office JVM options: ").append(r.jvmOptions.isEmpty() ? "none (the defaults)"
                : String.join(" ", r.jvmOptions)).append('\n');
        s.append("- card: ").append(new BenchmarkCard().rowCount()).append(" rows × ").append(BenchmarkCard.COLUMNS)
                .append(" columns, 3 components, temperature-dependent densities and coefficients, ternary term "
                        + "(invented values)\n\n");
        s.append("| kind | formula | median s | µs per cell | × native (a), per cell | × bridge floor (c), per cell "
                + "| first run s "
                + "| memory growth, first run MB | memory growth, median run MB | of which JVM heap, first / median MB "
                + "| cells with errors |\n");
        s.append("|---|---|---|---|---|---|---|---|---|---|---|\n");
        for (Measured m : r.measured.values()) {
            double med = m.median();
            s.append(String.format(Locale.ROOT, "| %s | %s | %.3f | %.2f | %.2f | %.2f | %.3f | %.1f | %.1f | %.0f / %.0f | %s |%n",
                    m.kind.key, m.kind.label, med, med / m.kind.cells(r.cells) * 1e6,
                    med / m.kind.cells(r.cells) / (nat.median() / r.cells), med / m.kind.cells(r.cells)
                    / (floor.median() / r.cells),
                    m.firstSeconds, m.firstGrowthKb / 1024.0, m.medianGrowthKb() / 1024.0,
                    m.firstHeapGrowthMb, m.medianHeapGrowthMb(), m.errors == 0 ? "0" : m.errors + " (first: error code " + m.firstError + ")"));
        }
        s.append('\n');
        s.append(String.format(Locale.ROOT, "- card reads (parses) during the run: %.0f; cards kept: %.0f%n",
                r.cardReads, r.cardsKept));
        s.append(String.format(Locale.ROOT, "- distinct Java threads seen by %,d scalar calls: %.0f%n", r.cells,
                r.distinctThreads));
        s.append(String.format(Locale.ROOT, "- office memory (VmRSS): %.0f MB before the timed runs, %.0f MB after; "
                + "the office JVM's committed heap: %.0f MB before, %.0f MB after%n", r.officeRssStartKb / 1024.0,
                r.officeRssEndKb / 1024.0, r.heapStartMb, r.heapEndMb));
        s.append(String.format(Locale.ROOT, "- agreement: density, native (a), Basic (d) and array (e1) vs scalar (b1): "
                + "worst relative difference %.1e; partial volume, array (e2) vs scalar (b2): %.1e%n",
                r.worstDensityDifference, r.worstPartialDifference));
        if (r.ownDensity != null) {
            s.append(String.format(Locale.ROOT, "- the add-in's own work per scalar call, measured without an office "
                    + "(AdapterCost): MIX.DENSITY %.2f µs and %.0f bytes allocated, MIX.PARTIALVOLUME %.2f µs and "
                    + "%.0f bytes%n", r.ownDensity.microsPerCall, r.ownDensity.bytesPerCall,
                    r.ownPartial.microsPerCall, r.ownPartial.bytesPerCall));
        }
        boolean full = r.measured.keySet().containsAll(Arrays.asList("b1", "b2", "c-args", "d", "e1", "e2"));
        s.append('\n').append(full ? targets(r) : "Targets are judged on a run of every kind only.\n");
        return s.toString();
    }

    /** The targets, each with the measured figure and whether it is met. */
    static String targets(Report r) {
        double floor = r.measured.get("c").median();
        double sameArguments = r.measured.get("c-args").median();
        double nat = r.measured.get("a").median();
        double macro = r.measured.get("d").median();
        StringBuilder s = new StringBuilder("| target | measured | met |\n|---|---|---|\n");
        for (String k : new String[] {"b1", "b2"}) {
            double ratio = r.measured.get(k).median() / floor;
            s.append(target(k + " scalar ≤ 1.15 × bridge floor (c)", String.format(Locale.ROOT, "%.2f ×", ratio),
                    ratio <= 1.15));
        }
        double own = r.measured.get("b1").median() / sameArguments;
        s.append(target("b1 scalar ≤ 1.15 × the floor for its own arguments (c-args)",
                String.format(Locale.ROOT, "%.2f ×", own), own <= 1.15));
        for (String k : new String[] {"e1", "e2"}) {
            double ratio = r.measured.get(k).median() / nat;
            s.append(target(k + " array ≤ 1.5 × native (a)", String.format(Locale.ROOT, "%.2f ×", ratio),
                    ratio <= 1.5));
        }
        for (String k : new String[] {"b1", "b2", "e1", "e2"}) {
            double speedup = macro / r.measured.get(k).median();
            s.append(target(k + " ≥ 5 × faster than the macro (d)", String.format(Locale.ROOT, "%.1f ×", speedup),
                    speedup >= 5));
        }
        for (String k : new String[] {"b1", "b2", "e1", "e2"}) {
            Measured m = r.measured.get(k);
            double mb = Math.max(m.firstGrowthKb, m.medianGrowthKb()) / 1024.0;
            String figure = String.format(Locale.ROOT, "%.1f MB over %,d cells", mb, r.cells);
            s.append(r.cells >= 100_000 ? target(k + " memory growth ≤ 50 MB over a 100,000-cell recalculation",
                    figure, mb <= 50) : "| " + k + " memory growth ≤ 50 MB over a 100,000-cell recalculation | "
                    + figure + " | not judged below 100,000 cells |\n");
        }
        s.append(target("card parsed once per distinct content", String.format(Locale.ROOT, "%.0f parse(s), 1 card",
                r.cardReads), r.cardReads == 1));
        s.append(packedTargets(r));
        return s.toString();
    }

    /** The packed card's targets: near the floor of its own arguments, faster than the range, one whole-column pass. */
    static String packedTargets(Report r) {
        StringBuilder s = new StringBuilder();
        if (!r.measured.containsKey("b1-p") || !r.measured.containsKey("b2-p") || !r.measured.containsKey("b1-pa")
                || !r.measured.containsKey("b2-pa") || !r.measured.containsKey("c-args-1")) {
            return "";
        }
        double own = r.measured.get("c-args-1").median();
        for (String k : new String[] {"b1-p", "b2-p", "b1-pa", "b2-pa"}) {
            double ratio = r.measured.get(k).median() / own;
            s.append(target(k + " packed ≤ 1.3 × the floor for its own non-card arguments (c-args-1)",
                    String.format(Locale.ROOT, "%.2f ×", ratio), ratio <= 1.3));
        }
        for (String[] pair : new String[][] {{"b1", "b1-p"}, {"b2", "b2-p"}, {"b1", "b1-pa"}, {"b2", "b2-pa"}}) {
            double speedup = r.measured.get(pair[0]).median() / r.measured.get(pair[1]).median();
            s.append(target(pair[1] + " ≥ 2.5 × faster than the range form (" + pair[0] + ")",
                    String.format(Locale.ROOT, "%.2f ×", speedup), speedup >= 2.5));
        }
        if (r.measured.containsKey("b1-col") && r.measured.containsKey("b1-col-p")) {
            Measured col = r.measured.get("b1-col");
            double onePass = col.median() / col.kind.cells(r.cells);
            for (String k : new String[] {"p", "pa"}) {
                double extra = r.measured.get("b1-col-" + k).median() - r.measured.get("b1-" + k).median();
                s.append(target("a whole-column card packed costs about one pass per recalculation (b1-col-" + k
                        + " − b1-" + k + " ≤ 2 × one b1-col call)", String.format(Locale.ROOT,
                        "%.3f s extra against %.3f s per call", extra, onePass), extra <= 2 * onePass));
            }
        }
        return s.toString();
    }

    private static String target(String what, String measured, boolean met) {
        return "| " + what + " | " + measured + " | " + (met ? "yes" : "no") + " |\n";
    }
}
