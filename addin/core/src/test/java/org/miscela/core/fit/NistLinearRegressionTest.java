package org.miscela.core.fit;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * NIST ITL Statistical Reference Datasets, Linear Least Squares Regression: all eleven problems through
 * {@link LinearLeastSquares}, every certified value (coefficients, their standard deviations, residual standard
 * deviation, R²) compared by its log relative error, the number of correct significant digits. Certified values and
 * models are read from the .dat files themselves (test resources, copied verbatim).
 */
public class NistLinearRegressionTest {
    private static final String[] DATASETS = {"Norris", "Pontius", "NoInt1", "NoInt2", "Filip", "Longley",
        "Wampler1", "Wampler2", "Wampler3", "Wampler4", "Wampler5"};
    /** Certified values carry 15 significant digits, so agreement beyond that cannot be told apart. */
    static final double LRE_CAP = 15.0;
    /** Digits required: 10 everywhere, 7 for Filip (degree-10 polynomial, condition number ~1e15 unscaled). */
    static final double REQUIRED = 10.0;
    static final double REQUIRED_FILIP = 7.0;

    /**
     * LRE = −log10(|q − c| / |c|), capped at {@link #LRE_CAP}. Where the certified value is zero (Wampler1 and
     * Wampler2 fit exactly) the absolute error is used instead, −log10|q| (the usual convention for StRD, from
     * memory: McCullough 1998, "Assessing the reliability of statistical software").
     */
    public static double lre(double computed, double certified) {
        if (computed == certified) {
            return LRE_CAP;
        }
        double error = certified == 0 ? Math.abs(computed) : Math.abs(computed - certified) / Math.abs(certified);
        return Math.min(LRE_CAP, -Math.log10(error));
    }

    @Test
    void everyCertifiedValueToTheRequiredDigits() throws IOException {
        List<String> table = new ArrayList<>();
        table.add("NIST StRD linear least squares through LinearLeastSquares: worst LRE (correct significant digits,"
                + " capped at 15); cond = condition number of the column-scaled design");
        table.add(String.format(Locale.ROOT, "%-9s %4s %3s  %-26s %7s %7s %7s %7s %5s %9s", "dataset", "n", "p",
                "model terms", "coeffs", "SDs", "res.SD", "R²", "need", "cond"));
        List<Executable> checks = new ArrayList<>();
        for (String name : DATASETS) {
            NistDataset d = NistDataset.load(name);
            LeastSquaresFit fit = LinearLeastSquares.fit(d.design(), d.response());
            double[] b = fit.coefficients();
            double[] se = fit.standardErrors();
            double worstB = LRE_CAP;
            double worstSe = LRE_CAP;
            for (int k = 0; k < b.length; k++) {
                worstB = Math.min(worstB, lre(b[k], d.certifiedCoefficients[k]));
                worstSe = Math.min(worstSe, lre(se[k], d.certifiedStandardDeviations[k]));
            }
            double residualSd = lre(fit.residualStandardDeviation(), d.certifiedResidualSd);
            double rSquared = lre(fit.rSquared(), d.certifiedRSquared);
            String terms = d.describeTerms();
            double required = name.equals("Filip") ? REQUIRED_FILIP : REQUIRED;
            table.add(String.format(Locale.ROOT, "%-9s %4d %3d  %-26s %7.1f %7.1f %7.1f %7.1f %5.0f %9.2e", name,
                    fit.pointCount(), b.length, terms.length() > 26 ? terms.substring(0, 23) + "..." : terms,
                    worstB, worstSe, residualSd, rSquared, required, fit.conditionNumber()));
            double[] worst = {worstB, worstSe, residualSd, rSquared};
            String[] what = {"coefficients", "standard deviations", "residual SD", "R²"};
            for (int q = 0; q < worst.length; q++) {
                double lre = worst[q];
                String label = name + " " + what[q] + ": " + String.format(Locale.ROOT, "%.1f", lre)
                        + " digits, need " + required;
                checks.add(() -> assertTrue(lre >= required, label));
            }
            checks.add(() -> assertTrue(b.length == d.declaredParameters && fit.pointCount() == d.declaredObservations,
                    name + ": read " + fit.pointCount() + " observations and the terms " + terms + "; the header states "
                            + d.declaredObservations + " observations and " + d.declaredParameters + " parameters"));
        }
        String text = String.join(System.lineSeparator(), table) + System.lineSeparator();
        Path out = Paths.get("target", "nist-lre.txt");
        Files.createDirectories(out.getParent());
        Files.write(out, text.getBytes(StandardCharsets.UTF_8));
        assertAll(checks);
    }
}
