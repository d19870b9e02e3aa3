package org.miscela.bench;

import java.lang.management.ManagementFactory;
import java.util.Locale;
import org.miscela.calc.MixtureAddIn;

/**
 * What the add-in itself spends per scalar call, measured in this JVM without an office: the time and the bytes
 * allocated by {@link MixtureAddIn#mixtureDensity} and {@link MixtureAddIn#partialMolarVolume} on the benchmark card.
 * Every call gets its own copy of the card's cells, with new String and Double objects, as the UNO bridge hands over;
 * the copies are made before the clock starts, so only the add-in's work is counted.
 */
public final class AdapterCost {
    /** Time and allocation of one kind of call. */
    static final class Cost {
        final double microsPerCall;
        final double bytesPerCall;

        Cost(double microsPerCall, double bytesPerCall) {
            this.microsPerCall = microsPerCall;
            this.bytesPerCall = bytesPerCall;
        }
    }

    private static final int BATCH = 2_000;
    /** The component argument as Calc passes it: a one-cell range (the first component). */
    private static final Object[][] ONE = {{1.0}};
    private static final com.sun.management.ThreadMXBean THREADS =
            (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();

    private AdapterCost() {
    }

    static Cost density(int calls) throws Exception {
        MixtureAddIn addIn = new MixtureAddIn();
        return measure(calls, (card, x, t) -> addIn.mixtureDensity(card, x, t, null, com.sun.star.uno.Any.VOID, com.sun.star.uno.Any.VOID));
    }

    static Cost partialVolume(int calls) throws Exception {
        MixtureAddIn addIn = new MixtureAddIn();
        return measure(calls, (card, x, t) -> addIn.partialMolarVolume(card, ONE, x, t, null, com.sun.star.uno.Any.VOID, com.sun.star.uno.Any.VOID));
    }

    /** One array call over a block of {@code rows} compositions: time and bytes per row. */
    static Cost densityBlock(int rows) throws Exception {
        MixtureAddIn addIn = new MixtureAddIn();
        Object[][] card = new BenchmarkCard().cells();
        Object[][] data = CalcBenchmark.data(rows);
        long nanos = 0;
        long bytes = 0;
        for (int pass = 0; pass < 4; pass++) {
            Object[][] x = new Object[rows][];
            Object[][] t = new Object[rows][];
            for (int r = 0; r < rows; r++) {
                x[r] = new Object[] {fresh(data[r][0]), fresh(data[r][1]), fresh(data[r][2])};
                t[r] = new Object[] {fresh(data[r][3])};
            }
            Object[][] c = fresh(card);
            long b0 = allocated();
            long t0 = System.nanoTime();
            Object result = addIn.mixtureDensity(c, x, t, null, com.sun.star.uno.Any.VOID, com.sun.star.uno.Any.VOID);
            long t1 = System.nanoTime();
            long b1 = allocated();
            if (result == null) {
                throw new IllegalStateException("no result");
            }
            if (pass > 0) {
                nanos += t1 - t0;
                bytes += b1 - b0;
            }
        }
        return new Cost(nanos / 1e3 / (3.0 * rows), bytes / (3.0 * rows));
    }

    interface Call {
        Object at(Object[][] card, Object[][] x, Object[][] t) throws Exception;
    }

    private static Cost measure(int calls, Call call) throws Exception {
        Object[][] card = new BenchmarkCard().cells();
        Object[][] data = CalcBenchmark.data(BATCH);
        double sink = 0;
        // warm up the JIT on one batch, then measure whole batches
        long nanos = 0;
        long bytes = 0;
        int done = 0;
        for (int pass = -1; done < calls; pass++) {
            Object[][][] cards = new Object[BATCH][][];
            Object[][][] xs = new Object[BATCH][][];
            Object[][][] ts = new Object[BATCH][][];
            for (int i = 0; i < BATCH; i++) {
                cards[i] = fresh(card);
                xs[i] = new Object[][] {{fresh(data[i][0]), fresh(data[i][1]), fresh(data[i][2])}};
                ts[i] = new Object[][] {{fresh(data[i][3])}};
            }
            long b0 = allocated();
            long t0 = System.nanoTime();
            for (int i = 0; i < BATCH; i++) {
                sink += (Double) call.at(cards[i], xs[i], ts[i]);
            }
            long t1 = System.nanoTime();
            long b1 = allocated();
            if (pass >= 0) {
                nanos += t1 - t0;
                bytes += b1 - b0;
                done += BATCH;
            }
        }
        if (!(sink > 0)) {
            throw new IllegalStateException("the calls gave no densities");
        }
        return new Cost(nanos / 1e3 / done, (double) bytes / done);
    }

    /** Bytes this thread has allocated so far. */
    private static long allocated() {
        return THREADS.getThreadAllocatedBytes(Thread.currentThread().getId());
    }

    /** A copy with new cell objects, as the bridge delivers them on every call. */
    private static Object[][] fresh(Object[][] cells) {
        Object[][] out = new Object[cells.length][];
        for (int r = 0; r < cells.length; r++) {
            out[r] = new Object[cells[r].length];
            for (int c = 0; c < cells[r].length; c++) {
                out[r][c] = fresh(cells[r][c]);
            }
        }
        return out;
    }

    @SuppressWarnings({"deprecation", "removal"})
    private static Object fresh(Object cell) {
        return cell instanceof String ? new String(((String) cell).toCharArray()) : new Double((Double) cell);
    }

    public static void main(String[] args) throws Exception {
        int calls = args.length > 0 ? Integer.parseInt(args[0]) : 200_000;
        for (int i = 0; i < 3; i++) {
            Cost d = density(calls);
            Cost p = partialVolume(calls);
            Cost b = densityBlock(100_000);
            System.out.printf(Locale.ROOT, "density: %.2f µs, %.0f bytes per call; partial volume: %.2f µs, %.0f bytes"
                    + " per call; density over a 100,000-row block: %.3f µs, %.0f bytes per row%n", d.microsPerCall,
                    d.bytesPerCall, p.microsPerCall, p.bytesPerCall, b.microsPerCall, b.bytesPerCall);
        }
    }
}
