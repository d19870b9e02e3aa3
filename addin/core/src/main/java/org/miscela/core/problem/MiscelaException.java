package org.miscela.core.problem;

/**
 * The one exception the library throws on input it refuses: a card that cannot be read, arguments the card cannot
 * answer, data a fit cannot use, a blend that cannot be made, or a numerical search that did not converge. It carries
 * one entry of the {@link Problem} catalogue, and its message is meant for the person at the spreadsheet
 * (docs/errors.md lists them all). Any other exception out of the library is a fault, not a refusal.
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
