package org.miscela.core.blend;

/**
 * Thrown for arguments the blending functions cannot use; the message is meant for the person at the spreadsheet.
 * The card's own checks (validity range, non-physical results) still arrive as {@link org.miscela.core.problem.MiscelaException}.
 */
public final class BlendException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;
    private final BlendProblem problem;

    BlendException(BlendProblem problem, String message) {
        super(message);
        this.problem = problem;
    }

    /** Which catalogued problem this is. */
    public BlendProblem problem() {
        return problem;
    }
}
