package org.miscela.core.card;

import org.miscela.core.problem.Problem;
import java.util.Arrays;
import java.util.List;

/**
 * The card's components as keyed rows name them: a component by its name, a pair as "a + b", a triple as
 * "a + b + c", each name compared in normalised form ({@link CardReader#normalise}).
 */
final class Subjects {
    private final List<String> names;
    private final String[] normalised;

    /** @param names the components' names as their 'component' rows spell them, in card order */
    Subjects(List<String> names) {
        this.names = names;
        this.normalised = new String[names.size()];
        for (int i = 0; i < normalised.length; i++) {
            normalised[i] = CardReader.normalise(names.get(i));
        }
    }

    int size() {
        return names.size();
    }

    String name(int i) {
        return names.get(i);
    }

    /** The components' names joined as a subject is written: "a + b" or "a + b + c". */
    String joined(int... members) {
        StringBuilder s = new StringBuilder(names.get(members[0]));
        for (int m = 1; m < members.length; m++) {
            s.append(" + ").append(names.get(members[m]));
        }
        return s.toString();
    }

    /** The index of the component of this name (compared normalised), or −1. */
    int indexOf(String name) {
        String wanted = CardReader.normalise(name);
        int found = -1;
        for (int i = 0; i < normalised.length; i++) {
            if (normalised[i].equals(wanted)) {
                found = i;
            }
        }
        return found;
    }

    /** Component indices named by the subject (column 2) of a pair row "a + b". */
    int[] pair(CardRow r) {
        int[] p = members(r);
        if (p.length != 2) {
            throw Problem.BAD_PAIR.raise(r.number, r.label, r.text(0).trim());
        }
        return p;
    }

    /** Component indices named by a subject "a + b" or "a + b + c", all different. */
    int[] members(CardRow r) {
        return members(r, 0);
    }

    /**
     * Component indices named by a subject of {@code size} members (2 or 3; 0 accepts either), all different, in
     * the order written.
     */
    int[] members(CardRow r, int size) {
        String subject = r.text(0);
        String[] parts = subject.split("\\+", -1);
        boolean triple = size == 3 || (size == 0 && parts.length == 3);
        Problem bad = triple ? Problem.BAD_TRIPLE : Problem.BAD_PAIR;
        boolean blank = parts.length != (triple ? 3 : 2);
        for (String part : parts) {
            blank |= CardReader.isBlank(part);
        }
        if (blank) {
            throw bad.raise(r.number, r.label, subject.trim());
        }
        int[] p = new int[parts.length];
        for (int s = 0; s < parts.length; s++) {
            p[s] = indexOf(parts[s]);
            if (p[s] < 0) {
                throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, parts[s].trim());
            }
            for (int q = 0; q < s; q++) {
                if (p[q] == p[s]) {
                    throw bad.raise(r.number, r.label, subject.trim());
                }
            }
        }
        return p;
    }

    /** A key for the set of these members, independent of the order written. */
    static String setKey(int... members) {
        int[] q = members.clone();
        Arrays.sort(q);
        return Arrays.toString(q);
    }
}
