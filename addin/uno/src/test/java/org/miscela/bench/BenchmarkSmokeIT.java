package org.miscela.bench;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * A small run of the speed benchmark (scripts/benchmark), so that it cannot rot: every kind of cell computes without
 * an error, the native formula, the Basic function, the scalar and the array forms agree on every density, the card
 * is parsed once, and the table is written. It asserts nothing about speed: timings belong to the benchmark.
 */
class BenchmarkSmokeIT {
    @Test
    void aSmallRunMeasuresEveryKindAndTheyAgree() throws Exception {
        CalcBenchmark.Report r = CalcBenchmark.run(300, 3, CalcBenchmark.probeExtension());
        Figures.note(BenchmarkSmokeIT.class, "%s", r.table);
        for (CalcBenchmark.Measured m : r.measured.values()) {
            assertEquals(0, m.errors, m.kind.key + " (" + m.kind.label + ") shows errors, first code " + m.firstError);
            assertEquals(3, m.seconds.size(), m.kind.key + " was timed three times");
            assertTrue(m.median() > 0, m.kind.key);
        }
        // the four ways of computing the density are one formula: they agree to rounding
        assertTrue(r.worstDensityDifference < 1e-12, "densities differ by " + r.worstDensityDifference);
        assertTrue(r.worstPartialDifference < 1e-12, "partial volumes differ by " + r.worstPartialDifference);
        assertEquals(1.0, r.cardReads, "one card content, parsed once over every document and run");
        assertTrue(r.distinctThreads >= 1);
        assertTrue(r.ownDensity.bytesPerCall > 0 && r.ownDensity.microsPerCall > 0);
        Path out = Files.createTempDirectory("miscela-benchmark-").resolve("table.md");
        CalcBenchmark.write(r, out);
        assertTrue(new String(Files.readAllBytes(out), java.nio.charset.StandardCharsets.UTF_8)
                .contains("| card parsed once per distinct content | 1 parse(s), 1 card | yes |"));
        Files.delete(out);
        Files.delete(out.getParent());
    }
}
