package org.miscela.core.problem;

import java.util.ArrayList;
import java.util.List;

/**
 * Recognises a message as an instance of one catalogue entry of {@link Problem}: the entry's literal text, in order,
 * with anything in its blanks. The words of an unexpected failure (its FAILURE section) are left out: they are never
 * an acceptable answer, so no oracle may take them for a catalogued message. Literal matching rather than a regular expression per entry,
 * because messages quote cell text of any length and a pattern with several wildcards would backtrack over it.
 */
public final class Catalogue {
    /** One catalogue entry as its literal pieces between the blanks. */
    private static final class Entry {
        final String name;
        final String[] pieces;
        final int literalLength;

        Entry(String name, String pattern) {
            this.name = name;
            this.pieces = pattern.split("%[-#+ 0,(]*\\d*(?:\\.\\d+)?[a-zA-Z]", -1);
            int length = 0;
            for (String p : pieces) {
                length += p.length();
            }
            this.literalLength = length;
        }

        /** Whether the message is the pieces in order, anchored at both ends, with anything between them. */
        boolean matches(String message) {
            if (pieces.length == 1) {
                return message.equals(pieces[0]);
            }
            String first = pieces[0];
            String last = pieces[pieces.length - 1];
            if (!message.startsWith(first) || !message.endsWith(last)
                    || message.length() < first.length() + last.length()) {
                return false;
            }
            int at = first.length();
            int end = message.length() - last.length();
            for (int i = 1; i < pieces.length - 1; i++) {
                int found = message.indexOf(pieces[i], at);
                if (found < 0 || found + pieces[i].length() > end) {
                    return false;
                }
                at = found + pieces[i].length();
            }
            return true;
        }
    }

    private static final List<Entry> ENTRIES = new ArrayList<>();

    static {
        for (Problem p : Problem.values()) {
            if (p.section() != Problem.Section.FAILURE) {
                ENTRIES.add(new Entry("Problem." + p.name(), p.pattern()));
            }
        }
    }

    private Catalogue() {
    }

    /**
     * The catalogue entry this message is an instance of ("Problem.CARD_EMPTY", "Problem.NO_POINTS"), the most
     * specific when several fit; null when it is none of them.
     */
    public static String entryOf(String message) {
        if (message == null) {
            return null;
        }
        Entry best = null;
        for (Entry e : ENTRIES) {
            if ((best == null || e.literalLength > best.literalLength) && e.matches(message)) {
                best = e;
            }
        }
        return best == null ? null : best.name;
    }

    /** Whether the message is an instance of this very problem's pattern. */
    public static boolean isInstanceOf(Problem problem, String message) {
        return isInstance(problem.pattern(), message);
    }

    /** Whether the message is an instance of a message pattern (its literal text in order, anything in its blanks). */
    public static boolean isInstance(String pattern, String message) {
        return message != null && new Entry("", pattern).matches(message);
    }
}
