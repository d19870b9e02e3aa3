package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.sheet.NoConvergenceException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.TestCards;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.problem.Problem;

/**
 * The adapter's one mapping point ({@link Failures}) in a plain JVM: a refusal is an IllegalArgumentException
 * (Err:502), a search that did not converge a NoConvergenceException (Err:523), and anything else an
 * {@link UnexpectedFailure} (#VALUE!) whose words MIX.EXPLAIN of the same call and MIX.INFO("last failure") give.
 * The unexpected failures are provoked through a path the Java API allows and the bridge never takes: a range
 * argument with a row that is null.
 */
class FailuresTest {
    private static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");
    private static final Object[][] NULL_ROW = {null};
    private static final Object[][] TWENTY = {{20.0}};
    private final MixtureAddIn addIn = new MixtureAddIn();

    @Test
    void anUnexpectedFailureShowsAsValueWithReadableWordsThatAreKept() {
        Instant before = Instant.now().truncatedTo(ChronoUnit.SECONDS);
        UnexpectedFailure f = assertThrows(UnexpectedFailure.class,
                () -> addIn.mixtureDensity(CARD, NULL_ROW, TWENTY, null, com.sun.star.uno.Any.VOID, com.sun.star.uno.Any.VOID));
        Instant after = Instant.now();
        // a UNO RuntimeException but not an IllegalArgumentException: Calc shows #VALUE!, not Err:502
        assertTrue(f instanceof com.sun.star.uno.RuntimeException);
        assertFalse(com.sun.star.uno.Exception.class.isInstance(f));
        assertTrue(f.getCause() instanceof NullPointerException, String.valueOf(f.getCause()));
        String words = f.getMessage();
        assertTrue(Catalogue.isInstance(Problem.UNEXPECTED_FAILURE.pattern(), words), words);
        assertTrue(words.startsWith("Unexpected failure in MIX.DENSITY: java.lang.NullPointerException: "), words);
        assertTrue(words.contains(" at org.miscela.calc."), "the top frames: " + words);
        assertEquals(null, Catalogue.entryOf(words), "no oracle may take an unexpected failure for a refusal");

        // MIX.EXPLAIN of the same call answers with the same words
        assertEquals(words, addIn.explainCall(new Object[][] {{"MIX.DENSITY"}}, new Object[] {CARD, NULL_ROW, TWENTY}));

        // MIX.INFO("last failure"): the time (UTC, to the second) and the words
        String last = (String) addIn.addInInfo("last failure");
        int space = last.indexOf(' ');
        Instant at = Instant.parse(last.substring(0, space));
        // the time is written to the second: compare with the start of the second the call began in, allowing two
        // seconds either way for a wall clock that is stepped while the test runs (seen on virtual machines)
        assertTrue(!at.isBefore(before.truncatedTo(java.time.temporal.ChronoUnit.SECONDS).minusSeconds(2))
                && !at.isAfter(after.plusSeconds(2)), last);
        assertEquals(words, last.substring(space + 1));
    }

    @Test
    void everyMethodAnUnexpectedFailureReachesNamesItself() {
        // each method with the card where it takes one and a null row in every other range argument
        List<String> reached = new ArrayList<>();
        for (Map.Entry<String, Explanations.Target> e : Explanations.targets().entrySet()) {
            Explanations.Target t = e.getValue();
            Object[] p = new Object[t.kinds.length()];
            for (int i = 0; i < p.length; i++) {
                p[i] = t.kinds.charAt(i) != 'R' ? null : i == 0 && takesACard(e.getKey()) ? CARD : NULL_ROW;
            }
            try {
                t.call.on(addIn, p);
            } catch (UnexpectedFailure f) {
                String name = FunctionCatalog.byMethod(e.getKey()).displayName();
                assertTrue(f.getMessage().startsWith("Unexpected failure in " + name + ": "), f.getMessage());
                reached.add(name);
            } catch (IllegalArgumentException refused) {
                // refused before the null row is read: a blank value argument, say
            }
        }
        // measured when this test was written; the list may grow, never lose one without the test noticing
        assertTrue(reached.containsAll(List.of("MIX.EXCESSVOLUME", "MIX.MOLARVOLUME", "MIX.DENSITY",
                "MIX.EXCESSENTHALPY", "MIX.INSIDE", "MIX.UNCERTAINTY", "MIX.FROMDENSITY")), reached.toString());
    }

    private static boolean takesACard(String method) {
        return !method.equals("fitExcessVolume") && !method.equals("leastSquares");
    }

    /**
     * Each method hands the mapper its own IDL name, in its one catch (an unexpected failure names the function by
     * it). The methods no test input reaches with an unexpected failure are held to it here, in the source.
     */
    @Test
    void eachMethodHasOneCatchThatNamesItself() throws IOException {
        String source = new String(Files.readAllBytes(Paths.get("src/main/java/org/miscela/calc/MixtureAddIn.java")),
                StandardCharsets.UTF_8);
        Matcher method = Pattern.compile("\n    public \\S+ (\\w+)\\(").matcher(source);
        List<Integer> starts = new ArrayList<>();
        List<String> names = new ArrayList<>();
        while (method.find()) {
            starts.add(method.start());
            names.add(method.group(1));
        }
        starts.add(source.length());
        Set<String> checked = new LinkedHashSet<>();
        Pattern handOver = Pattern.compile("(?:Failures\\.(?:refusal|words)\\(ex, |checkOrRefuse\\(result, ex, )\"(\\w+)\"\\)");
        for (int i = 0; i < names.size(); i++) {
            String body = source.substring(starts.get(i), starts.get(i + 1));
            if (!Explanations.targets().containsKey(names.get(i)) && !names.get(i).equals("explainCall")) {
                continue;
            }
            assertEquals(1, count(body, "catch (RuntimeException ex)"), names.get(i) + " has one catch");
            Matcher m = handOver.matcher(body);
            assertTrue(m.find(), names.get(i) + " hands its exception to Failures");
            assertEquals(names.get(i), m.group(1), "the name " + names.get(i) + " hands over");
            checked.add(names.get(i));
        }
        Set<String> all = new LinkedHashSet<>(Explanations.targets().keySet());
        all.add("explainCall");
        assertEquals(all, checked, "every method of the interface");
    }

    private static int count(String text, String part) {
        return text.split(Pattern.quote(part), -1).length - 1;
    }

    @Test
    void aSearchThatDidNotConvergeIsNoConvergenceException() {
        String words = Problem.NO_CONVERGENCE.format("the final temperature between 300 and 1324 K",
                "the heat balance has the same sign at both ends");
        NoConvergenceException e = assertThrows(NoConvergenceException.class,
                () -> Failures.refusal(Problem.NO_CONVERGENCE.raise("the final temperature between 300 and 1324 K",
                        "the heat balance has the same sign at both ends"), "adiabaticRise"));
        assertEquals(words, e.getMessage());
        // a Commons Math search the core did not guard says the same, naming the function
        NoConvergenceException stray = assertThrows(NoConvergenceException.class,
                () -> Failures.refusal(new TooManyEvaluationsException(200), "adiabaticRise"));
        assertTrue(stray.getMessage().startsWith("The numerical search for the result of MIX.TEMPERATURERISE did not "
                + "converge (TooManyEvaluationsException: "), stray.getMessage());
        assertEquals("Problem.NO_CONVERGENCE", Catalogue.entryOf(stray.getMessage()));
        // answered in words where the function answers in words
        assertEquals(words, Failures.words(Problem.NO_CONVERGENCE.raise("the final temperature between 300 and "
                + "1324 K", "the heat balance has the same sign at both ends"), "checkPoint"));
    }

    @Test
    void aRefusalIsIllegalArgumentExceptionWithItsMessage() {
        IllegalArgumentException e = Failures.refusal(Problem.ARG_BLANK.raise("component"), "pureDensity");
        assertEquals("The component is blank.", e.getMessage());
        assertEquals("The component is blank.", Failures.words(Problem.ARG_BLANK.raise("component"), "checkPoint"));
        // an unexpected failure is not made a refusal a second time when it passes the mapper again
        UnexpectedFailure f = assertThrows(UnexpectedFailure.class,
                () -> Failures.words(new IllegalStateException("a fault"), "checkCard"));
        assertTrue(f.getMessage().startsWith("Unexpected failure in MIX.CHECK: java.lang.IllegalStateException: a "
                + "fault at "), f.getMessage());
        assertSame(f, assertThrows(UnexpectedFailure.class, () -> Failures.refusal(f, "explainCall")));
    }

    /** Eight threads failing at once with long messages: the record is always one whole failure, and bounded. */
    @Test
    void theLastFailureIsOneWholeRecordOfBoundedLength() throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(8);
        Set<String> words = Collections.synchronizedSet(new LinkedHashSet<>());
        List<String> seen = Collections.synchronizedList(new ArrayList<>());
        try {
            List<Future<?>> done = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                final int thread = t;
                done.add(pool.submit(() -> {
                    for (int i = 0; i < 200; i++) {
                        String message = thread + "/" + i + " " + "x".repeat(5000 * (i % 3));
                        UnexpectedFailure f = assertThrows(UnexpectedFailure.class,
                                () -> Failures.refusal(new IllegalStateException(message), "mixtureDensity"));
                        words.add(f.getMessage());
                        seen.add(Failures.last());
                    }
                }));
            }
            for (Future<?> f : done) {
                f.get();
            }
        } finally {
            pool.shutdown();
        }
        int longest = 0;
        for (String record : seen) {
            String w = record.substring(record.indexOf(' ') + 1);
            assertTrue(words.contains(w), "a record that is no failure's words: " + record);
            longest = Math.max(longest, w.length());
        }
        assertTrue(longest <= 1000, "the longest record's words: " + longest + " characters");
        assertTrue(words.stream().anyMatch(w -> w.contains("x…")), "the long messages were cut");
    }
}
