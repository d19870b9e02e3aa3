package org.miscela.core.card;

import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.List;

/** The malformed cards of {@link CardReaderTest}, for tests outside the package (e.g. in a real office). */
public final class MalformedCards {
    private MalformedCards() {
    }

    /** One case: what is wrong, the problem expected, a fragment of its message, and the card's cells. */
    public static final class Case {
        public final String what;
        public final Problem problem;
        public final String fragment;
        public final Object[][] cells;

        Case(String what, Problem problem, String fragment, Object[][] cells) {
            this.what = what;
            this.problem = problem;
            this.fragment = fragment;
            this.cells = cells;
        }
    }

    public static List<Case> all() {
        List<Case> out = new ArrayList<>();
        CardReaderTest.malformed().forEach(a -> {
            Object[] v = a.get();
            out.add(new Case((String) v[0], (Problem) v[1], (String) v[3], (Object[][]) v[4]));
        });
        return out;
    }
}
