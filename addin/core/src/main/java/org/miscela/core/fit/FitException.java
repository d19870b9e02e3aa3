package org.miscela.core.fit;

/** Thrown for input the fitting engine cannot use; the message is meant for the person who supplied the data. */
public final class FitException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;
    private final FitProblem problem;

    FitException(FitProblem problem, String message) {
        super(message);
        this.problem = problem;
    }

    /** Which catalogued problem this is. */
    public FitProblem problem() {
        return problem;
    }
}
