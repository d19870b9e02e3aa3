package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.junit.jupiter.api.Test;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The temperature rise's search for the final temperature (Brent's method on the heat balance): a solver that fails
 * is the catalogued NO_CONVERGENCE refusal with its words, never the solver's own exception. The balances here are
 * invented functions with a known root, not cards: no card is known that makes the search fail (see
 * FunctionCatalog's NOT_FROM_A_CELL).
 */
class FinalTemperatureSearchTest {
    /** A triple root at 361.44 K in the widest bracket the search passes (1024 K): the hardest balance tried. */
    private static final UnivariateFunction TRIPLE_ROOT = t -> {
        double d = t - 361.44;
        return d * d * d;
    };

    @Test
    void aBracketedRootIsFoundWithinTheEvaluationsAllowed() {
        double end = AdiabaticRise.finalTemperature(TRIPLE_ROOT, 300.0, 1324.0, AdiabaticRise.BALANCE_EVALUATIONS);
        // near a triple root the balance is below 1e-27 within 1e-9 K, so the solver stops within about 1e-6 K
        assertEquals(361.44, end, 1e-6);
    }

    @Test
    void aBalanceOfOneSignAtBothEndsIsNoConvergence() {
        MiscelaException ex = assertThrows(MiscelaException.class,
                () -> AdiabaticRise.finalTemperature(t -> 1.0, 300.0, 1324.0, AdiabaticRise.BALANCE_EVALUATIONS));
        assertEquals(Problem.NO_CONVERGENCE, ex.problem());
        assertEquals("The numerical search for the final temperature between 300 and 1324 K did not converge (the heat "
                + "balance has the same sign at both ends), so there is no result; the card's models may be irregular "
                + "there: check them near this point.", ex.getMessage());
    }

    @Test
    void runningOutOfEvaluationsIsNoConvergence() {
        // the triple root needs 101 to 120 evaluations (Commons Math 3.6.1): 120 are enough, 100 are too few
        assertEquals(361.44, AdiabaticRise.finalTemperature(TRIPLE_ROOT, 300.0, 1324.0, 120), 1e-6);
        MiscelaException ex = assertThrows(MiscelaException.class,
                () -> AdiabaticRise.finalTemperature(TRIPLE_ROOT, 300.0, 1324.0, 100));
        assertEquals(Problem.NO_CONVERGENCE, ex.problem());
        assertEquals("The numerical search for the final temperature between 300 and 1324 K did not converge (no root "
                + "within 100 evaluations of the heat balance), so there is no result; the card's models may be "
                + "irregular there: check them near this point.", ex.getMessage());
    }
}
