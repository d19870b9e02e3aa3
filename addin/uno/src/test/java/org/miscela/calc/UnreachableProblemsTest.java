package org.miscela.calc;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.functions.SolverAccess;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.card.TestCards;
import org.miscela.core.blend.BlendFunctions;
import org.miscela.core.blend.CompositionBasis;
import org.miscela.core.fit.LeastSquaresFit;
import org.miscela.core.fit.LinearLeastSquares;
import org.miscela.core.fit.OrderSelection;
import org.miscela.core.fit.RedlichKisterFitter;

/**
 * The call problems the catalogue declares not reachable from a cell (FunctionCatalog.notFromACell, "not reachable
 * from a cell" in docs/errors.md) exist all the same: each is produced here through the library's public methods,
 * with arguments the cell functions never pass, so none is a message without a way to it. The exception is
 * NO_COMPOSITION, for which no input is known (its declaration says so); the test holds it to that.
 */
class UnreachableProblemsTest {
    private static final Card EW = TestCards.card("ethanol-water-oiml.tsv");
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double NAN = Double.NaN;

    /** Something that raises one catalogued exception. */
    interface Raise {
        void run();
    }

    private static Map<Problem, Raise> cases() {
        Map<Problem, Raise> m = new LinkedHashMap<>();
        m.put(Problem.ARG_NOT_FINITE, () -> CardFunctions.binary(EW, NAN));
        m.put(Problem.CHECK_NEEDS_BOTH, () -> {
            // the check answers in words, as MIX.CHECKPOINT does; raise it to compare like the others
            String answer = CardFunctions.check(EW, new double[] {0.5, 0.5}, NAN, E);
            assertTrue(Catalogue.isInstanceOf(Problem.CHECK_NEEDS_BOTH, answer), answer);
            throw new Checked(Problem.CHECK_NEEDS_BOTH, answer);
        });
        m.put(Problem.NO_CONVERGENCE, () -> SolverAccess.finalTemperature(t -> 1.0, 300.0, 1324.0));
        m.put(Problem.VLE_FIT_NOT_CONVERGED, () -> {
            Card vle = TestCards.card("ethanol-water-vle.tsv");
            new org.miscela.core.fit.VleFitter(org.miscela.core.fit.VleFitter.Model.NRTL, 0, 0, 298.15, 0.3, null,
                    vle.vapourPressure(0), vle.vapourPressure(1), new double[] {0.1, 0.5, 0.9},
                    new double[] {0.45, 0.65, 0.9}, new double[] {343.15, 343.15, 343.15},
                    new double[] {50000, 66000, 72000}, null).fit(true, 1);
        });
        m.put(Problem.RAGGED_DESIGN, () -> LinearLeastSquares.fit(new double[][] {{1, 0}, {1}}, new double[2],
                null));
        m.put(Problem.NO_PARAMETERS, () -> LinearLeastSquares.fit(new double[][] {{}}, new double[1], null));
        m.put(Problem.BAD_ORDER, () -> RedlichKisterFitter.excessVolumes(new double[] {0.2, 0.5, 0.8},
                new double[] {-0.7, -1.0, -0.5}, -1, 298.15, null));
        LeastSquaresFit one = line(1);
        LeastSquaresFit two = line(2);
        m.put(Problem.BAD_SIGNIFICANCE, () -> OrderSelection.compare(Arrays.asList(one, two), 1.0));
        m.put(Problem.NOT_NESTED, () -> OrderSelection.compare(Arrays.asList(two, one), 0.05));
        m.put(Problem.NOT_SAME_POINTS, () -> OrderSelection.compare(Arrays.asList(one,
                LinearLeastSquares.fit(new double[][] {{1, 0, 0}, {1, 1, 1}, {1, 2, 4}}, new double[] {1, 2, 3.1},
                        null)),
                0.05));
        m.put(Problem.ARGUMENT_NOT_FINITE, () -> CompositionBasis.molarity(Double.POSITIVE_INFINITY, 1));
        m.put(Problem.NO_SUCH_COMPONENT, () -> BlendFunctions.fromDensity(EW, 900, 20, 5, null, NAN, NAN,
                CompositionBasis.moleFraction(), E));
        m.put(Problem.VALUE_NOT_FINITE, () -> BlendFunctions.convert(EW,
                new double[] {Double.POSITIVE_INFINITY, NAN}, CompositionBasis.molarity(20, 1),
                CompositionBasis.moleFraction(), E));
        m.put(Problem.NEEDS_BALANCE, () -> BlendFunctions.convert(EW, new double[] {5, NAN},
                CompositionBasis.molarity(20, -1), CompositionBasis.moleFraction(), E));
        m.put(Problem.NEEDS_SOLVENT, () -> BlendFunctions.convert(EW, new double[] {5, NAN},
                CompositionBasis.molality(-1), CompositionBasis.moleFraction(), E));
        m.put(Problem.NEEDS_TEMPERATURE, () -> org.miscela.core.blend.Quantity.of(1,
                org.miscela.core.blend.AmountUnit.lookup("L")));
        return m;
    }

    /** A straight line (order 1) or a parabola (order 2) fitted to the same five invented points. */
    private static LeastSquaresFit line(int order) {
        double[][] design = new double[5][order + 1];
        double[] y = {1.0, 2.1, 2.9, 4.2, 5.0};
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j <= order; j++) {
                design[i][j] = Math.pow(i, j);
            }
        }
        return LinearLeastSquares.fit(design, y, null);
    }

    /** The one declared entry no known input produces. */
    private static final Problem NO_KNOWN_INPUT = Problem.NO_COMPOSITION;

    @Test
    void everyEntryDeclaredNotReachableFromACellIsProducedThroughTheLibrary() {
        Map<Problem, Raise> cases = cases();
        java.util.Set<Problem> declared = new java.util.LinkedHashSet<>(FunctionCatalog.notFromACell().keySet());
        declared.remove(NO_KNOWN_INPUT);
        assertEquals(declared, cases.keySet(), "a case for every declared entry, and only for those");
        StringBuilder printed = new StringBuilder();
        cases.forEach((problem, raise) -> {
            Problem raised = null;
            String message = null;
            try {
                raise.run();
            } catch (MiscelaException e) {
                raised = e.problem();
                message = e.getMessage();
            } catch (Checked e) {
                raised = e.problem;
                message = e.getMessage();
            }
            if (raised == null) {
                fail(problem + " was not raised");
            }
            assertEquals(problem, raised, message);
            printed.append(problem).append(": ").append(message).append('\n');
        });
        Figures.write("figures/UnreachableProblemsTest.txt", printed.toString());
    }

    @Test
    void theEntryWithoutAKnownInputSaysSo() {
        String reason = FunctionCatalog.notFromACell().get(NO_KNOWN_INPUT);
        assertTrue(reason != null && reason.contains("no card or input is known") && reason.contains("no test"),
                "the catalogue must say that nothing is known to produce " + NO_KNOWN_INPUT + ": " + reason);
    }

    /** An answer in words standing for the problem it names. */
    private static final class Checked extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final Problem problem;

        Checked(Problem problem, String message) {
            super(message);
            this.problem = problem;
        }
    }
}
