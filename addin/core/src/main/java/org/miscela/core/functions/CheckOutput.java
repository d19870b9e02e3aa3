package org.miscela.core.functions;

import org.miscela.core.problem.Problem;

/** What MIX.CHECK returns about a card. */
public enum CheckOutput {
    /** "OK", the card's first problem, or "OK with n warnings: …" (one text). */
    SUMMARY("summary"),
    /** The card's warnings, one per row of a column; "OK" when it has none (or its first problem). */
    WARNINGS("warnings"),
    /** Which rows and columns of the range hold the card (needs no readable card). */
    EXTENT("extent"),
    /** Every coefficient with the significant digits written and the digits the card needs. */
    DIGITS("digits");

    private final String word;

    CheckOutput(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** Every word, as a message lists them. */
    public static String words() {
        StringBuilder all = new StringBuilder();
        for (CheckOutput o : values()) {
            all.append(all.length() == 0 ? "" : ", ").append(o.word);
        }
        return all.toString();
    }

    /** The output spelled {@code text} (case and surrounding spaces ignored); fails with a readable message. */
    public static CheckOutput lookup(String text) {
        for (CheckOutput o : values()) {
            if (o.word.equalsIgnoreCase(text.trim())) {
                return o;
            }
        }
        throw Problem.UNKNOWN_FIT_OUTPUT.raise(text.trim(), words());
    }
}
