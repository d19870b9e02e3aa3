package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tuple;
import net.jqwik.api.lifecycle.AddLifecycleHook;
import net.jqwik.api.lifecycle.AfterContainer;
import java.util.Set;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.IdlType;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.card.FuzzCards;
import org.miscela.core.card.FuzzProfile;
import org.miscela.core.card.FuzzTally;

/**
 * Fuzzing every method of the UNO adapter in a plain JVM with generated cards ({@link FuzzCards}) and arguments
 * ({@link FuzzCall}); the methods are the catalogue's (all but MIX.EXPLAIN, see {@link ExplainProperties}), and
 * {@link FuzzCoverageTest} fails when one has no argument generator. The contract each call must keep:
 *
 * <ul>
 *   <li>a numeric function returns a finite Double, or an array (an Any holding Object[][]) shaped like one of its
 *       range arguments (or one row per line of a block) whose cells are finite Doubles or "" (blank inputs);
 *       MIX.INSIDE gives only 1 and 0;</li>
 *   <li>the functions that answer in words (MIX.CHECK, MIX.CHECKPOINT) never throw and return "OK" or a catalogued
 *       message;</li>
 *   <li>MIX.INFO returns the version or a whole count of cards;</li>
 *   <li>MIX.TRACE returns (label, value) rows: a non-empty text label and a finite number or a text;</li>
 *   <li>a fit returns a rectangular table of finite Doubles and Strings, or (for the "check" result) "OK" or a
 *       catalogued message;</li>
 *   <li>a blending function returns a finite Double or an array of finite Doubles and "" with one value per
 *       component (a row, a column, or a row per line) or the shape of an argument; MIX.ADJUST may also return its
 *       summary sentence;</li>
 *   <li>anything else ends in com.sun.star.lang.IllegalArgumentException (Calc's Err:502) carrying a message of the
 *       catalogue ({@code Problem}), or in com.sun.star.sheet.NoConvergenceException (Err:523) carrying the words of
 *       {@code Problem.NO_CONVERGENCE};</li>
 * </ul>
 *
 * never another exception (an unexpected failure, #VALUE! in Calc, fails), never NaN or infinity, and each call within
 * {@link FuzzTally#CALL_BOUND_NANOS}.
 */
class MixtureAddInFuzzProperties {
    private static final FuzzTally TALLY = new FuzzTally("adapter");
    /** The blending functions, whose array results hold one value per component. */
    private static final Set<String> BLENDING = Set.of("convertComposition", "batchTotals", "recipe", "adjustBatch",
            "additionVolume", "compositionFromDensity", "volumeCorrection");
    private final MixtureAddIn addIn = new MixtureAddIn();

    @Provide
    Arbitrary<FuzzCall> calls() {
        Arbitrary<FuzzCards.Kind> kinds = Arbitraries.frequency(Tuple.of(50, FuzzCards.Kind.VALID),
                Tuple.of(15, FuzzCards.Kind.EXTREME), Tuple.of(25, FuzzCards.Kind.MUTATED),
                Tuple.of(5, FuzzCards.Kind.SOUP), Tuple.of(5, FuzzCards.Kind.SHAPE));
        return Combinators.combine(kinds, Arbitraries.longs(), Arbitraries.of(FuzzCall.fuzzed()),
                Arbitraries.longs()).as((kind, cardSeed, function, callSeed) ->
                FuzzCall.of(function, FuzzCards.of(kind, cardSeed), callSeed));
    }

    @Property(shrinking = ShrinkingMode.OFF)
    @FuzzProfile.Tries(ci = 7_000, full = 700_000)
    @AddLifecycleHook(FuzzProfile.class)
    void everyCallKeepsTheContract(@ForAll("calls") FuzzCall call) {
        try {
            check(call);
        } catch (AssertionError e) {
            TALLY.unexpected();
            throw e;
        }
    }

    private void check(FuzzCall call) {
        String target = "MixtureAddIn." + call.method();
        long start = System.nanoTime();
        Object result;
        try {
            result = call.invoke(addIn);
        } catch (IllegalArgumentException e) {
            long nanos = System.nanoTime() - start;
            String entry = Catalogue.entryOf(e.getMessage());
            if (entry == null || !call.function.raisesIllegalArgument()) {
                unexpected("refused with an uncatalogued message or from a check: \"" + e.getMessage() + "\"", call,
                        e);
            }
            TALLY.count(target, "error " + entry, nanos, call::toString);
            return;
        } catch (RuntimeException | Error e) {
            throw new AssertionError("MixtureAddIn." + call.method() + " threw " + e + " for " + call, e);
        } catch (Exception e) {
            // a checked UNO exception no method declares: only NoConvergenceException, with its catalogued words
            if (!(e instanceof com.sun.star.sheet.NoConvergenceException)
                    || !"Problem.NO_CONVERGENCE".equals(Catalogue.entryOf(e.getMessage()))) {
                throw new AssertionError("MixtureAddIn." + call.method() + " threw " + e + " for " + call, e);
            }
            TALLY.count(target, "error Problem.NO_CONVERGENCE", System.nanoTime() - start, call::toString);
            return;
        }
        long nanos = System.nanoTime() - start;
        TALLY.count(target, classify(call, result), nanos, call::toString);
    }

    /** The kind of a returned value, after checking it against the method's contract. */
    private static String classify(FuzzCall call, Object result) {
        if (call.function.returnType() == IdlType.STRING) {
            return text(call, result);
        }
        switch (call.method()) {
            case "checkCard":
                return check(call, result);
            case "traceEvaluation":
                return trace(call, result);
            case "fitExcessVolume":
            case "fitDensity":
            case "fitVapourLiquid":
            case "leastSquares":
                return result instanceof String ? text(call, result) : table(call, result);
            case "addInInfo":
                return info(call, result);
            case "libraryList":
            case "libraryCard":
                return library(call, result);
            case "temperaturePath":
                return path(call, result);
            case "packCard":
                if (!(result instanceof String) || !org.miscela.core.card.PackedCard.isPacked(
                        new Object[][] {{result}})) {
                    unexpected("returned " + result + ", no packed card", call, null);
                }
                org.miscela.core.card.PackedCard.unpack((String) result);
                return "packed card";
            default:
                if (BLENDING.contains(call.method())) {
                    if (call.method().equals("adjustBatch") && result instanceof String) {
                        if (((String) result).trim().isEmpty()) {
                            unexpected("returned an empty summary", call, null);
                        }
                        return "text summary";
                    }
                    return blending(call, result);
                }
                return number(call, result);
        }
    }

    /**
     * MIX.TEMPERATUREPATH: a finite number (the peak, where it is, the end), or the path: two columns of finite
     * numbers, the amount added so far never decreasing from 0.
     */
    private static String path(FuzzCall call, Object result) {
        if (result instanceof Double) {
            finite(call, (Double) result);
            return "number";
        }
        Object[][] grid = grid(call, result);
        double before = 0.0;
        for (Object[] row : grid) {
            if (row.length != 2 || !(row[0] instanceof Double) || !(row[1] instanceof Double)) {
                unexpected("returned a path row that is not two numbers", call, null);
            }
            finite(call, (Double) row[0]);
            finite(call, (Double) row[1]);
            if ((Double) row[0] < before) {
                unexpected("returned a path whose amount added decreases", call, null);
            }
            before = (Double) row[0];
        }
        if ((Double) grid[0][0] != 0.0) {
            unexpected("returned a path that does not start at nothing added", call, null);
        }
        return "path";
    }

    /** MIX.INFO: the version text, or a count of cards (a whole number, never negative). */
    private static String info(FuzzCall call, Object result) {
        if (FunctionCatalog.VERSION.equals(result)) {
            return "text version";
        }
        if (!(result instanceof Double) || !((Double) result >= 0) || (Double) result != Math.rint((Double) result)) {
            unexpected("returned " + result + ", neither the version nor a count", call, null);
        }
        return "number";
    }

    /** A blending result: one number, or finite numbers and blanks, one per component or shaped like an argument. */
    private static String blending(FuzzCall call, Object result) {
        if (result instanceof Double) {
            finite(call, (Double) result);
            return "number";
        }
        Object[][] grid = grid(call, result);
        int n = org.miscela.core.card.CardReader.read(call.cardCells()).componentCount(); // it read: the call succeeded
        int rows = grid.length;
        int cols = grid[0].length;
        boolean shaped = (rows == 1 && cols == n) || (rows == n && cols == 1);
        for (Object[][] range : call.ranges()) {
            shaped |= rows == range.length && (cols == n || cols == 1 || cols == range[0].length);
        }
        if (!shaped) {
            unexpected("returned a " + rows + "×" + cols + " array for a card of " + n + " components", call, null);
        }
        for (Object[] row : grid) {
            for (Object v : row) {
                if (v instanceof Double) {
                    finite(call, (Double) v);
                } else if (!"".equals(v)) {
                    unexpected("returned the cell " + v + " in an array of numbers", call, null);
                }
            }
        }
        return "array";
    }

    /**
     * MIX.CHECK: "OK" or a catalogued text (a card's problem, the warnings' summary, the extent, an unknown result),
     * a column of catalogued warnings, or the digits table (a text header, then rows of numbers and texts).
     */
    private static String check(FuzzCall call, Object result) {
        if (result instanceof String) {
            return text(call, result);
        }
        Object[][] grid = grid(call, result);
        if ("digits written".equals(grid[0][grid[0].length > 5 ? 5 : 0])) {
            for (Object[] row : grid) {
                if (row.length != grid[0].length) {
                    unexpected("returned a ragged digits table", call, null);
                }
                for (Object v : row) {
                    cell(call, v);
                }
            }
            return "table digits";
        }
        for (Object[] row : grid) {
            String entry = row.length == 1 && row[0] instanceof String ? Catalogue.entryOf((String) row[0]) : null;
            if (entry == null || org.miscela.core.problem.Problem.valueOf(entry.substring(8)).section()
                    != org.miscela.core.problem.Problem.Section.CHECK) {
                unexpected("returned a warning that is none of the catalogue's: " + java.util.Arrays.toString(row),
                        call, null);
            }
        }
        return "array warnings";
    }

    private static String text(FuzzCall call, Object result) {
        if (!(result instanceof String)) {
            unexpected("returned " + result + " where a text belongs", call, null);
        }
        String s = (String) result;
        if (s.equals("OK")) {
            return "text OK";
        }
        if (Catalogue.entryOf(s) == null) {
            unexpected("returned an uncatalogued text \"" + s + "\"", call, null);
        }
        return "text message";
    }

    private static String number(FuzzCall call, Object result) {
        if (result instanceof Double) {
            finite(call, (Double) result);
            inside(call, (Double) result);
            return "number";
        }
        Object[][] grid = grid(call, result);
        boolean shaped = false;
        for (Object[][] range : call.ranges()) {
            int rows = range.length;
            int cols = rows == 0 ? 0 : range[0].length;
            shaped |= (grid.length == rows && grid[0].length == cols) || (grid.length == rows && grid[0].length == 1);
        }
        if (!shaped) {
            unexpected("returned a " + grid.length + "×" + grid[0].length + " array, the shape of no argument", call,
                    null);
        }
        for (Object[] row : grid) {
            for (Object v : row) {
                if (v instanceof Double) {
                    finite(call, (Double) v);
                    inside(call, (Double) v);
                } else if (!"".equals(v)) {
                    unexpected("returned the cell " + v + " in an array of numbers", call, null);
                }
            }
        }
        return "array";
    }

    private static String trace(FuzzCall call, Object result) {
        for (Object[] row : grid(call, result)) {
            if (row.length != 2 || !(row[0] instanceof String) || ((String) row[0]).isEmpty()) {
                unexpected("returned a trace row that is not (label, value): " + java.util.Arrays.toString(row), call,
                        null);
            }
            cell(call, row[1]);
        }
        return "array";
    }

    private static String table(FuzzCall call, Object result) {
        for (Object[] row : grid(call, result)) {
            for (Object v : row) {
                cell(call, v);
            }
        }
        return "array";
    }

    private static void cell(FuzzCall call, Object v) {
        if (v instanceof Double) {
            finite(call, (Double) v);
        } else if (!(v instanceof String)) {
            unexpected("returned the cell " + v + " (" + (v == null ? "null" : v.getClass().getName()) + ")", call,
                    null);
        }
    }

    /** A library listing or card: a rectangular table of texts and finite numbers; a card reads as one. */
    private static String library(FuzzCall call, Object result) {
        Object[][] g = grid(call, result);
        for (Object[] row : g) {
            if (row.length != g[0].length) {
                unexpected("returned a ragged table", call, null);
            }
            for (Object v : row) {
                if (!(v instanceof String) && !(v instanceof Double && Double.isFinite((Double) v))) {
                    unexpected("returned the cell " + v, call, null);
                }
            }
        }
        if (call.method().equals("libraryCard")) {
            org.miscela.core.card.CardReader.read(g);
            return "library card";
        }
        return "library listing";
    }

    /** The array inside an Any result: rectangular, at least 1×1. */
    private static Object[][] grid(FuzzCall call, Object result) {
        Object inner = result instanceof Any ? ((Any) result).getObject() : null;
        if (!(inner instanceof Object[][])) {
            unexpected("returned " + result + ", neither a number nor an array", call, null);
        }
        Object[][] g = (Object[][]) inner;
        if (g.length == 0 || g[0] == null || g[0].length == 0) {
            unexpected("returned an empty array", call, null);
        }
        for (Object[] row : g) {
            if (row == null || row.length != g[0].length) {
                unexpected("returned a ragged array", call, null);
            }
        }
        return g;
    }

    private static void finite(FuzzCall call, double v) {
        if (!Double.isFinite(v)) {
            unexpected("returned " + v, call, null);
        }
    }

    private static void inside(FuzzCall call, double v) {
        if (call.method().equals("insideValidity") && v != 0.0 && v != 1.0) {
            unexpected("MIX.INSIDE returned " + v, call, null);
        }
    }

    private static void unexpected(String what, FuzzCall call, Throwable cause) {
        throw new AssertionError("MixtureAddIn." + call.method() + " " + what + " for " + call, cause);
    }

    @AfterContainer
    static void report() {
        TALLY.write();
    }
}
