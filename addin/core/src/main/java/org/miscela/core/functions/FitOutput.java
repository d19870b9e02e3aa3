package org.miscela.core.functions;

import org.miscela.core.problem.Problem;

/** What a fit function returns. */
public enum FitOutput {
    COEFFICIENTS("coefficients"),
    STANDARD_ERRORS("standard errors"),
    STATISTICS("statistics"),
    COVARIANCE("covariance"),
    RESIDUALS("residuals"),
    ORDERS("orders"),
    /** The thermodynamic-consistency tests of vapour–liquid equilibrium data (MIX.FITVLE only). */
    CONSISTENCY("consistency"),
    /** "OK" or the message saying why the fit is refused: the fit's companion check, never an error itself. */
    CHECK("check");

    private final String word;

    FitOutput(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** The output spelled {@code text} (case and surrounding spaces ignored); fails with a readable message. */
    public static FitOutput lookup(String text) {
        for (FitOutput o : values()) {
            if (o.word.equalsIgnoreCase(text.trim())) {
                return o;
            }
        }
        StringBuilder all = new StringBuilder();
        for (FitOutput o : values()) {
            all.append(all.length() == 0 ? "" : ", ").append(o.word);
        }
        throw Problem.UNKNOWN_FIT_OUTPUT.raise(text.trim(), all);
    }
}
