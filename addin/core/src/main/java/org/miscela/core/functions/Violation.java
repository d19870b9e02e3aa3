package org.miscela.core.functions;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * One validity limit a point crosses, as the validity check finds it: which limit (a catalogue entry of the call
 * section, OUTSIDE_TEMPERATURE and the like) and the values its message quotes. A refusal states the limit and adds
 * the advice on extrapolation; the audit trace lists the limit alone, as a fact about the point.
 */
final class Violation {
    private final Problem problem;
    private final Object[] values;

    Violation(Problem problem, Object... values) {
        this.problem = problem;
        this.values = values;
    }

    /** Which limit. */
    Problem problem() {
        return problem;
    }

    /** The limit crossed, in words, without the advice: "The temperature 45 °C is outside … 0 to 40 °C." */
    String limit() {
        return problem.statement(values);
    }

    /** The refusal of a calculation at the point: the limit and the advice on extrapolation. */
    MiscelaException refusal() {
        return problem.raise(values);
    }
}
