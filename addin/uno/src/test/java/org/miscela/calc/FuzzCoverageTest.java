package org.miscela.calc;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.FuzzCards;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.catalog.IdlType;

/**
 * Every function of the catalogue is fuzzed and explained: the fuzzers ({@link MixtureAddInFuzzProperties},
 * {@link ExplainProperties}, {@link DeterminismTest}) draw their functions from the catalogue, and this test fails
 * when one of them has no argument generator in {@link FuzzCall}, when the generator's arguments do not fit the
 * catalogue's signature, when none of its generated calls reaches a result, or when MIX.EXPLAIN cannot run it.
 */
class FuzzCoverageTest {
    private static final int CALLS = 50;
    private static final int PATIENCE = 1000;
    private static List<Generated> generated;

    @Test
    void everyFunctionButExplainIsFuzzedAndExplained() {
        List<String> fuzzed = new ArrayList<>();
        for (Generated g : generatedForEveryFunction()) {
            fuzzed.add(g.function.method());
        }
        List<String> expected = new ArrayList<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            boolean explain = f.arguments().stream().anyMatch(a -> a.kind() == IdlType.Kind.ARGUMENT_LIST);
            if (!explain) {
                expected.add(f.method());
                assertNotNull(Explanations.targets().get(f.method()), "MIX.EXPLAIN cannot run " + f.displayName());
            }
        }
        assertEquals(expected, fuzzed, "the fuzzed functions are the catalogue's, all but MIX.EXPLAIN");
        assertEquals(FunctionCatalog.functions().size() - 1, fuzzed.size(), "one function takes an argument list");
    }

    /** The generated calls fit each function's signature: the count of arguments, and a range for each range. */
    @Test
    void theGeneratedArgumentsFitTheCataloguesSignatures() {
        for (Generated g : generatedForEveryFunction()) {
            List<ArgumentInfo> signature = g.function.arguments();
            for (FuzzCall call : g.calls) {
                Object[] all = call.allArguments();
                assertEquals(signature.size(), all.length, call::toString);
                for (int i = 0; i < all.length; i++) {
                    int argument = i + 1;
                    if (signature.get(i).kind() == IdlType.Kind.RANGE) {
                        assertTrue(all[i] instanceof Object[][], () -> g.function.method() + " argument " + argument
                                + " is a range: " + call);
                    }
                }
            }
        }
    }

    /**
     * Each function's generated calls give results, not only refusals: the fuzzers reach its arithmetic. Calls are
     * made from fixed seeds until one gives a result; {@link #PATIENCE} calls without one fail.
     */
    @Test
    void everyFunctionsCallsReachAResult() throws Exception {
        MixtureAddIn addIn = new MixtureAddIn();
        List<String> never = new ArrayList<>();
        StringBuilder needed = new StringBuilder();
        Random r = new Random(20_261_206L);
        for (FunctionInfo f : FuzzCall.fuzzed()) {
            int calls = 0;
            boolean result = false;
            while (!result && calls < PATIENCE) {
                calls++;
                try {
                    FuzzCall.of(f, FuzzCards.of(FuzzCards.Kind.VALID, r.nextLong()), r.nextLong()).invoke(addIn);
                    result = true;
                } catch (IllegalArgumentException refused) {
                    // a refusal: the fuzz property checks its message; go on until a call gives a result
                }
            }
            needed.append(f.displayName()).append(' ').append(calls).append(", ");
            if (!result) {
                never.add(f.displayName());
            }
        }
        Figures.note(FuzzCoverageTest.class, "%s", "generated calls up to the first result: " + needed);
        assertTrue(never.isEmpty(), "functions whose " + PATIENCE + " generated calls give no result: " + never);
    }

    /** CALLS calls of each fuzzed function on valid generated cards, from fixed seeds (made once). */
    private static synchronized List<Generated> generatedForEveryFunction() {
        if (generated != null) {
            return generated;
        }
        List<Generated> out = new ArrayList<>();
        Random r = new Random(20_261_205L);
        for (FunctionInfo f : FuzzCall.fuzzed()) {
            List<FuzzCall> calls = new ArrayList<>();
            for (int i = 0; i < CALLS; i++) {
                calls.add(FuzzCall.of(f, FuzzCards.of(FuzzCards.Kind.VALID, r.nextLong()), r.nextLong()));
            }
            out.add(new Generated(f, calls));
        }
        generated = out;
        return out;
    }

    /** A function and calls generated for it. */
    private static final class Generated {
        final FunctionInfo function;
        final List<FuzzCall> calls;

        Generated(FunctionInfo function, List<FuzzCall> calls) {
            this.function = function;
            this.calls = calls;
        }
    }
}
