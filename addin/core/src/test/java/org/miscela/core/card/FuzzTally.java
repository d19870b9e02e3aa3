package org.miscela.core.card;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentSkipListMap;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.Supplier;

/**
 * Outcome counts and call times of one fuzz run, reported after it (written to target/fuzz/). Every call is timed;
 * one slower than {@link #CALL_BOUND_NANOS} fails the run on the spot.
 */
public final class FuzzTally {
    /** A generous bound for one call: a typical call takes microseconds, the slowest seen milliseconds. */
    public static final long CALL_BOUND_NANOS = 2_000_000_000L;

    private final String name;
    private final Map<String, LongAdder> outcomes = new ConcurrentSkipListMap<>();
    private final LongAdder calls = new LongAdder();
    private final LongAdder unexpected = new LongAdder();
    private final long started = System.nanoTime();
    private long slowestNanos;
    private String slowest = "none";

    public FuzzTally(String name) {
        this.name = name;
    }

    /**
     * Counts one call's outcome (a kind such as "number" or "error Problem.CARD_EMPTY", grouped by target) and its
     * time; {@code what} describes the call and is only built for the slowest one.
     */
    public void count(String target, String outcome, long nanos, Supplier<String> what) {
        calls.increment();
        outcomes.computeIfAbsent(target + "\t" + outcome, k -> new LongAdder()).increment();
        if (nanos > CALL_BOUND_NANOS) {
            throw new AssertionError(String.format(Locale.ROOT, "%s took %.3f s (bound %.1f s): %s", target,
                    nanos / 1e9, CALL_BOUND_NANOS / 1e9, what.get()));
        }
        synchronized (this) {
            if (nanos > slowestNanos) {
                slowestNanos = nanos;
                slowest = target + ": " + shorten(what.get(), 600);
            }
        }
    }

    /** Records a case that broke the contract; the caller then fails the run. */
    public void unexpected() {
        unexpected.increment();
    }

    public long calls() {
        return calls.sum();
    }

    /** How many calls ended in this outcome, over every target. */
    public long count(String outcome) {
        long n = 0;
        for (Map.Entry<String, LongAdder> e : outcomes.entrySet()) {
            if (e.getKey().endsWith("\t" + outcome)) {
                n += e.getValue().sum();
            }
        }
        return n;
    }

    /** The report: totals by outcome kind, then every target × outcome count, then timings. */
    public String report() {
        Map<String, Long> byKind = new ConcurrentSkipListMap<>();
        for (Map.Entry<String, LongAdder> e : outcomes.entrySet()) {
            String outcome = e.getKey().substring(e.getKey().indexOf('\t') + 1);
            String kind = outcome.startsWith("error ") ? "designed error" : outcome;
            byKind.merge(kind, e.getValue().sum(), Long::sum);
        }
        double seconds = (System.nanoTime() - started) / 1e9;
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "fuzz run %s, profile %s: %d calls in %.1f s, %d unexpected outcome(s)%n",
                name, FuzzProfile.name(), calls(), seconds, unexpected.sum()));
        b.append(String.format(Locale.ROOT, "slowest call %.3f ms (bound %.0f ms): %s%n", slowestNanos / 1e6,
                CALL_BOUND_NANOS / 1e6, slowest));
        b.append("outcome kind\tcalls\n");
        byKind.forEach((k, v) -> b.append(k).append('\t').append(v).append('\n'));
        b.append("target\toutcome\tcalls\n");
        outcomes.forEach((k, v) -> b.append(k).append('\t').append(v.sum()).append('\n'));
        return b.toString();
    }

    /** Prints the report and writes it to target/fuzz/&lt;name&gt;-&lt;profile&gt;.txt. */
    public void write() {
        String text = report();
        Path out = Paths.get("target", "fuzz", name + "-" + FuzzProfile.name() + ".txt");
        try {
            Files.createDirectories(out.getParent());
            Files.write(out, text.getBytes(StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    static String shorten(String s, int max) {
        return s.length() <= max ? s : s.substring(0, max) + "…";
    }
}
