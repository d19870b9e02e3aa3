package org.miscela.core.problem;

/**
 * The exception the library throws on bad input: a card that cannot be read, or arguments the card cannot answer.
 * Its message is meant for the person at the spreadsheet. The fitting and blending packages throw their own
 * catalogued exceptions (FitException, BlendException) of the same kind; docs/errors.md lists all three catalogues.
 */
public final class MiscelaException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final Problem problem;

    MiscelaException(Problem problem, String message) {
        super(message, null, false, false);
        this.problem = problem;
    }

    /** Which catalogued problem this is. */
    public Problem problem() {
        return problem;
    }
}
