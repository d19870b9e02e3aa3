package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Assume;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tuple;
import net.jqwik.api.lifecycle.AddLifecycleHook;
import org.miscela.core.card.FuzzCards;
import org.miscela.core.card.FuzzProfile;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.problem.Problem;

/**
 * MIX.EXPLAIN agrees with the call it explains, for the fuzzers' calls ({@link FuzzCall}): "OK" when the call gives a
 * result, and exactly the message of the refusal when it is refused, with the arguments in the forms Calc's variable
 * argument list brings them (a one-cell range as its value now and then, trailing left-out arguments left out).
 */
class ExplainProperties {
    private final MixtureAddIn addIn = new MixtureAddIn();

    @Provide
    Arbitrary<Tuple.Tuple2<FuzzCall, Long>> calls() {
        Arbitrary<FuzzCards.Kind> kinds = Arbitraries.frequency(Tuple.of(55, FuzzCards.Kind.VALID),
                Tuple.of(10, FuzzCards.Kind.EXTREME), Tuple.of(25, FuzzCards.Kind.MUTATED),
                Tuple.of(5, FuzzCards.Kind.SOUP), Tuple.of(5, FuzzCards.Kind.SHAPE));
        return Combinators.combine(kinds, Arbitraries.longs(), Arbitraries.of(FuzzCall.fuzzed()),
                Arbitraries.longs(), Arbitraries.longs()).as((kind, cardSeed, function, callSeed, formSeed) ->
                Tuple.of(FuzzCall.of(function, FuzzCards.of(kind, cardSeed), callSeed), formSeed));
    }

    @Property(shrinking = ShrinkingMode.OFF)
    @FuzzProfile.Tries(ci = 2_000, full = 100_000)
    @AddLifecycleHook(FuzzProfile.class)
    void theExplanationIsTheCallsOwnAnswer(@ForAll("calls") Tuple.Tuple2<FuzzCall, Long> generated) {
        FuzzCall call = generated.get1();
        String expected;
        try {
            call.invoke(addIn);
            expected = warnings(call);
        } catch (IllegalArgumentException | com.sun.star.uno.Exception e) {
            // a refusal, or a catalogued non-convergence (a checked UNO exception): MIX.EXPLAIN gives its words
            expected = e.getMessage();
        }
        String name = call.function.displayName();
        Explanations.Target target = Explanations.targets().get(call.method());
        Object[] arguments = calcForms(call, target, new Random(generated.get2()));
        for (int i = 0; i < arguments.length; i++) {
            // Calc never calls with a range argument missing (it shows Err:502 itself)
            Assume.that(target.kinds.charAt(i) != 'R' || arguments[i] != null);
        }
        assertEquals(expected, addIn.explainCall(new Object[][] {{name}}, arguments), () -> "MIX.EXPLAIN(\"" + name + "\"; …) of " + call
                + "\n  as " + Arrays.deepToString(arguments));
    }

    /**
     * "OK", or the summary of the warnings of the call's card when it reads and has any (its first argument), followed
     * by those about its arguments in the method's own form; each of these must be a warning of the SLIP section.
     */
    private static String warnings(FuzzCall call) {
        List<String> all = new ArrayList<>(cardWarnings(call));
        for (String w : CallWarningArguments.callWarnings(call.function, call.allArguments())) {
            String entry = Catalogue.entryOf(w);
            assertEquals(Problem.Section.SLIP, Problem.valueOf(entry.substring("Problem.".length())).section(),
                    () -> "not a warning about arguments: " + w);
            all.add(w);
        }
        return org.miscela.core.functions.CardFunctions.summary(all);
    }

    /** The warnings of the call's card when it reads (its first argument); none when it does not. */
    private static List<String> cardWarnings(FuzzCall call) {
        if (!call.function.arguments().get(0).name().equals("card")) {
            return List.of();
        }
        org.miscela.core.card.Card card;
        try {
            card = org.miscela.core.card.CardReader.read(call.cardCells());
        } catch (org.miscela.core.problem.MiscelaException unreadable) {
            return List.of();
        }
        return org.miscela.core.card.CardSanity.warnings(call.cardCells(), card);
    }

    /** The call's arguments as Calc's variable argument list could hold them. */
    private static Object[] calcForms(FuzzCall call, Explanations.Target target, Random r) {
        List<Object> out = new ArrayList<>(Arrays.asList(call.allArguments()));
        for (int i = 0; i < out.size(); i++) {
            Object v = out.get(i);
            if (target.kinds.charAt(i) == 'R' && v instanceof Object[][] && ((Object[][]) v).length == 1
                    && ((Object[][]) v)[0].length == 1 && ((Object[][]) v)[0][0] != null && r.nextBoolean()) {
                out.set(i, ((Object[][]) v)[0][0]); // a single cell arrives as its value
            }
        }
        while (out.size() > target.fewest() && out.get(out.size() - 1) == Any.VOID && r.nextBoolean()) {
            out.remove(out.size() - 1); // a trailing optional argument left out of the call
        }
        return out.toArray();
    }
}
