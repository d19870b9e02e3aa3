package org.miscela.core.functions;

import org.apache.commons.math3.analysis.UnivariateFunction;

/**
 * Test access, for the adapter's tests, to the solver guard the cell functions never make fail: the final
 * temperature's search of {@link CardFunctions#adiabaticRise} on a balance of the test's choosing.
 */
public final class SolverAccess {
    private SolverAccess() {
    }

    /** {@link AdiabaticRise#finalTemperature} with the evaluations the temperature rise allows. */
    public static double finalTemperature(UnivariateFunction balance, double lo, double hi) {
        return AdiabaticRise.finalTemperature(balance, lo, hi, AdiabaticRise.BALANCE_EVALUATIONS);
    }
}
