package org.miscela.calc;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.uno.Any;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Collectors;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.lifecycle.AfterContainer;
import org.miscela.core.card.FuzzCards;
import org.miscela.core.catalog.FunctionInfo;

/**
 * The component argument of the per-component functions (MIX.RECIPE, MIX.ADJUST's additions, MIX.CONVERT), over the
 * fuzzer's generated calls on valid cards (invented): whenever the whole result is an array, asking for component k
 * gives element k of it, for every k, as a number for one line and as a column (one value per line, blanks blank) for
 * a block.
 */
class PerComponentProperties {
    private static final List<String> PER_COMPONENT = List.of("recipe", "adjustBatch", "convertComposition");
    private static final AtomicInteger COMPARED = new AtomicInteger();
    private final MixtureAddIn addIn = new MixtureAddIn();

    @Provide
    Arbitrary<FuzzCall> calls() {
        List<FunctionInfo> functions = FuzzCall.fuzzed().stream()
                .filter(f -> PER_COMPONENT.contains(f.method())).collect(Collectors.toList());
        return Combinators.combine(Arbitraries.longs(), Arbitraries.of(functions), Arbitraries.longs())
                .as((cardSeed, function, callSeed) -> FuzzCall.of(function,
                        FuzzCards.of(FuzzCards.Kind.VALID, cardSeed), callSeed));
    }

    @Property(tries = 3000, shrinking = ShrinkingMode.OFF)
    void aComponentAloneIsThatElementOfTheWholeResult(@ForAll("calls") FuzzCall call) throws Exception {
        Object[] args = call.allArguments();
        // the component argument: last but for trailing arguments appended after it (a basis temperature)
        int last = componentIndex(call.function);
        args[last] = Any.VOID;
        Object whole = invoke(call.method(), args);
        if (!(whole instanceof Any)) {
            return; // refused, or one value (MIX.CONVERT of a lone number, a volume or summary of MIX.ADJUST)
        }
        Object[][] grid = (Object[][]) ((Any) whole).getObject();
        args[last] = 1.0;
        // one line answers a component with a number, a block with a column (blank lines blank)
        boolean block = invoke(call.method(), args) instanceof Any;
        int count = block ? grid[0].length : grid.length * grid[0].length;
        assertTrue(block || grid.length == 1 || grid[0].length == 1, "one line is a row or a column: " + call);
        for (int k = 0; k < count; k++) {
            args[last] = (double) (k + 1);
            Object picked = invoke(call.method(), args);
            if (!block) {
                Object expected = grid.length == 1 ? grid[0][k] : grid[k][0];
                assertEquals(expected, picked, "component " + (k + 1) + " of " + call);
            } else {
                assertTrue(picked instanceof Any, "component " + (k + 1) + " gave " + picked + " for " + call);
                Object[][] column = (Object[][]) ((Any) picked).getObject();
                assertEquals(grid.length, column.length, "one value per line: " + call);
                for (int r = 0; r < grid.length; r++) {
                    assertEquals(1, column[r].length);
                    assertEquals(grid[r][k], column[r][0], "line " + (r + 1) + ", component " + (k + 1) + " of "
                            + call);
                }
            }
            COMPARED.incrementAndGet();
        }
    }

    @AfterContainer
    static void somethingWasCompared() {
        Figures.note(PerComponentProperties.class, "%s", "per-component property: " + COMPARED.get() + " component values compared");
        assertTrue(COMPARED.get() > 100, "the generated calls gave too few array results to compare: "
                + COMPARED.get());
    }

    /** The call's result, or null when it was refused (the fuzz contract covers refusals). */
    private Object invoke(String name, Object[] args) throws Exception {
        Method m = null;
        for (Method candidate : XMixtureFunctions.class.getMethods()) {
            if (candidate.getName().equals(name)) {
                m = candidate;
            }
        }
        try {
            return m.invoke(addIn, args);
        } catch (InvocationTargetException e) {
            if (e.getCause() instanceof com.sun.star.lang.IllegalArgumentException) {
                return null;
            }
            throw e;
        }
    }

    private static int componentIndex(org.miscela.core.catalog.FunctionInfo f) {
        java.util.List<org.miscela.core.catalog.ArgumentInfo> all = f.arguments();
        for (int i = all.size() - 1; i >= 0; i--) {
            if (all.get(i).name().equals("component")) {
                return i;
            }
        }
        throw new AssertionError(f.method() + " has no component argument");
    }
}
