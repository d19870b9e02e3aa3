package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import java.lang.reflect.Proxy;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.catalog.IdlType;
import org.miscela.core.problem.Problem;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.card.TestCards;

/**
 * MIX.EXPLAIN in a plain JVM: its table of methods matches the interface, it finds functions by name, it counts
 * arguments as Calc does, and it gives exactly the message the call itself is refused with (or "OK").
 */
class ExplanationsTest {
    private static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");
    private final MixtureAddIn addIn = new MixtureAddIn();

    private static Object[][] one(Object v) {
        return new Object[][] {{v}};
    }

    /** MIX.EXPLAIN of the name (as Calc passes it: a one-cell range) and the arguments. */
    private String explain(Object name, Object... arguments) {
        return addIn.explainCall(one(name), arguments);
    }

    /**
     * Every function but MIX.EXPLAIN has a call, and each call hands the arguments it is given, the same objects in
     * the same order, to its own method: a call missing, calling another method, dropping, swapping or treating an
     * argument as the wrong kind fails here. The kinds themselves are the catalogue's (FunctionCatalogTest checks
     * them against the interface the office sees).
     */
    @Test
    void everyCallPassesItsArgumentsInOrderToItsOwnMethod() {
        List<String> explained = new ArrayList<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            if (f.arguments().stream().anyMatch(a -> a.kind() == IdlType.Kind.ARGUMENT_LIST)) {
                continue; // MIX.EXPLAIN itself
            }
            Explanations.Target t = Explanations.targets().get(f.method());
            assertNotNull(t, "MIX.EXPLAIN cannot run " + f.displayName() + ": add its call to Explanations");
            Object[] given = new Object[f.arguments().size()];
            for (int i = 0; i < given.length; i++) {
                String marker = f.method() + " argument " + (i + 1);
                given[i] = f.arguments().get(i).kind() == IdlType.Kind.RANGE ? new Object[][] {{marker}} : marker;
            }
            Object[][] received = new Object[1][];
            String[] called = new String[1];
            XMixtureFunctions recorder = (XMixtureFunctions) Proxy.newProxyInstance(getClass().getClassLoader(),
                    new Class<?>[] {XMixtureFunctions.class}, (proxy, method, args) -> {
                        called[0] = method.getName();
                        received[0] = args == null ? new Object[0] : args;
                        return null;
                    });
            assertDoesNotThrow(() -> t.call.on(recorder, given), f.method() + "'s call takes a value as a range");
            assertEquals(f.method(), called[0], "the call for " + f.method());
            Object[] got = received[0];
            assertEquals(given.length, got.length, f.method() + "'s arguments");
            for (int i = 0; i < given.length; i++) {
                assertSame(given[i], got[i], f.method() + " argument " + (i + 1));
            }
            assertEquals(Explanations.kinds(f), t.kinds, f.method());
            explained.add(f.method());
        }
        assertEquals(explained, new ArrayList<>(Explanations.targets().keySet()), "calls for functions the "
                + "catalogue lacks, or in another order");
    }

    /**
     * The kinds word: 'R' for each parameter typed as a range (ranges and required single values) and 'V' for each
     * optional single value, in IDL order.
     */
    @Test
    void theKindsAreTheCataloguesTypes() {
        assertEquals("RRRVVV", Explanations.kinds(FunctionCatalog.byMethod("mixtureDensity")));
        // a required single value is typed as a range (the component, the recipe's quantity, unit, basis and
        // temperature), so that the wizard shows it as required
        assertEquals("RRRRVVV", Explanations.kinds(FunctionCatalog.byMethod("partialMolarVolume")));
        assertEquals("RRRRRRVVVVVV", Explanations.kinds(FunctionCatalog.byMethod("recipe")));
        assertEquals("V", Explanations.kinds(FunctionCatalog.byMethod("addInInfo")));
    }

    @Test
    void aRefusedCallIsExplainedInItsOwnWords() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one(0.3), one(45.0), Any.VOID, Any.VOID, Any.VOID));
        assertEquals(e.getMessage(), explain("MIX.DENSITY", CARD, 0.3, 45.0));
        assertEquals("Problem.OUTSIDE_TEMPERATURE", Catalogue.entryOf(e.getMessage()));
        IllegalArgumentException unit = assertThrows(IllegalArgumentException.class, () -> addIn.batchTotals(CARD,
                new Object[][] {{50.0, 50.0}}, one("oz"), one(20.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals(unit.getMessage(), explain("MIX.BATCH", CARD, new Object[][] {{50.0, 50.0}}, "oz", 20.0));
        assertEquals("Problem.BLEND_UNKNOWN_UNIT", Catalogue.entryOf(unit.getMessage()));
    }

    @Test
    void aCallThatGivesAResultIsOk() {
        assertEquals("OK", explain("MIX.DENSITY", CARD, 0.3, 20.0));
        assertEquals("OK", explain("MIX.DENSITY", CARD, 0.3, 45.0, 1.0), "extrapolation allowed");
        assertEquals("OK", explain("MIX.BATCH", CARD, new Object[][] {{500.0, 500.0}}, "g", 20.0, "contraction",
                "mL"), "1000 g in all: no batch of millilitres");
        // a check that answers with a message still gives a result: its cell shows no error
        assertEquals("OK", explain("MIX.CHECK", one("not a card")));
    }

    /** A call that gives a result on a card with warnings: MIX.EXPLAIN says them, as MIX.CHECK does. */
    @Test
    void aCallThatGivesAResultOnACardWithWarningsSaysThem() {
        Object[][] heavy = CARD.clone();
        heavy[7] = new Object[] {"component", "ethanol", 46068.44};
        String check = (String) addIn.checkCard(heavy, Any.VOID);
        assertTrue(check.startsWith("OK with 1 warning: Card row 8 (component): the molar mass of ethanol"), check);
        assertEquals(check, explain("MIX.DENSITY", heavy, 0.3, 20.0));
        assertEquals(check, explain("MIX.CHECK", (Object) heavy));
        assertEquals(check, explain("MIX.CHECK", heavy, "extent"), "the warnings are the card's, whatever the result");
        // a refusal is a refusal: the warnings do not hide it
        assertTrue(explain("MIX.DENSITY", heavy, 0.3, 45.0).startsWith("The temperature 45 °C is outside"));
        // a function whose first argument is no card says OK
        assertEquals("OK", explain("MIX.INFO"));
    }

    /**
     * A call that gives a result but whose arguments look like a slip: MIX.EXPLAIN says "OK with 1 warning: …", found
     * by the arguments' names in the catalogue, for every function that has them; the result itself is unchanged.
     */
    @Test
    void aCallThatLooksLikeASlipIsOkWithItsWarning() throws Exception {
        String w = "OK with 1 warning: ";
        // 0.4 "%vol" meant as 40 %vol, on a property function, a recipe, an adjustment and a conversion
        assertTrue(explain("MIX.DENSITY", CARD, 0.4, 20.0, Any.VOID, "%vol").startsWith(
                w + "The composition is on the basis \"strength\" (0 to 100), but its largest value is 0.4 %vol"));
        assertTrue(explain("MIX.RECIPE", CARD, 2500.0, "L", 0.4, "%vol", 12.0).startsWith(
                w + "The composition is on the basis \"strength\""));
        assertTrue(explain("MIX.ADJUST", CARD, new Object[][] {{400.0, 600.0}}, "kg", 0.4, "%vol", 20.0)
                .startsWith(w + "The composition is on the basis \"strength\""));
        assertTrue(explain("MIX.CONVERT", CARD, 0.4, "%vol", "mass fraction").startsWith(
                w + "The composition is on the basis \"strength\""));
        // a basis temperature the basis does not use
        assertTrue(explain("MIX.DENSITY", CARD, 0.3, 20.0, Any.VOID, "mass fraction", 15.0).startsWith(
                w + "A basis temperature (15 °C) is given, but the basis is mass fraction"));
        // kg amounts typed with the unit g: the batch, the heat of mixing and a recipe's quantity
        assertTrue(explain("MIX.BATCH", CARD, new Object[][] {{40.0, 60.0}}, "g", 20.0).startsWith(
                w + "The amounts come to 100 g in all, a batch under 1 kg"));
        assertTrue(explain("MIX.RECIPE", CARD, 250.0, "mL", 40.0, "%vol", 20.0).startsWith(
                w + "The quantity comes to 250 mL in all, a batch under 1 L"));
        Object[][] acid = TestCards.cells("sulfuric-acid-water-nbs.tsv");
        assertTrue(explain("MIX.MIXINGHEAT", acid, new Object[][] {{98.0, 180.0}}, 25.0, "g").startsWith(
                w + "The amounts come to 278 g in all"));
        assertEquals("OK", explain("MIX.MIXINGHEAT", acid, new Object[][] {{1.0, 10.0}}, 25.0),
                "moles, the textbook unit of a heat of mixing, are left alone");
        // the temperatures of a volume correction swapped
        assertTrue(explain("MIX.VOLUMEFACTOR", CARD, 40.0, "%vol", 20.0, 12.0).startsWith(
                w + "The reference temperature 12 °C is none of the trade's usual ones"));
        assertEquals("OK", explain("MIX.VOLUMEFACTOR", CARD, 40.0, "%vol", 12.0, 20.0));
    }

    @Test
    void theNameMayLackThePrefixAndIgnoresCase() {
        String expected = explain("MIX.DENSITY", CARD, 0.3, 45.0);
        assertEquals(expected, explain("density", CARD, 0.3, 45.0));
        assertEquals(expected, explain(" mix.Density ", CARD, 0.3, 45.0));
        assertEquals(expected, explain(new Any(com.sun.star.uno.Type.STRING, "Density"), CARD, 0.3, 45.0));
    }

    @Test
    void anUnknownNameIsAnsweredWithTheNamesThereAre() {
        for (Object name : new Object[] {"MIX.DENSTY", "", 3.0, Any.VOID, "MIX.EXPLAIN"}) {
            String answer = explain(name, CARD, 0.3, 20.0);
            assertEquals("Problem.EXPLAIN_UNKNOWN_FUNCTION", Catalogue.entryOf(answer), answer);
            List<FunctionInfo> all = FunctionCatalog.functions();
            String last = all.stream().filter(f -> !f.method().equals("explainCall")).reduce((a, b) -> b).get()
                    .method();
            for (FunctionInfo f : all) {
                assertEquals(!f.method().equals("explainCall"), answer.contains(f.displayName() + (f.method()
                        .equals(last) ? "." : ",")), f.displayName() + " in " + answer);
            }
        }
        assertTrue(explain("MIX.DENSTY").startsWith("\"MIX.DENSTY\" names no function"));
    }

    /** Calc refuses a call with too few or too many arguments (Err:504): fewer than up to its last range. */
    @Test
    void argumentsAreCountedAsCalcCountsThem() {
        String few = explain("MIX.DENSITY", CARD, 0.3);
        assertEquals("Problem.EXPLAIN_ARGUMENT_COUNT", Catalogue.entryOf(few), few);
        assertEquals("MIX.DENSITY takes 3 to 6 arguments (MIX.DENSITY(card; x; temperature; [extrapolate]; [basis]; "
                + "[basis temperature])), not 2: "
                + "Calc shows Err:504 for such a call without calling the function.", few);
        String many = explain("MIX.CHECK", CARD, "warnings", 1.0);
        assertTrue(many.startsWith("MIX.CHECK takes 1 or 2 arguments (MIX.CHECK(card; [result])), not 3"), many);
        assertTrue(explain("MIX.FITEXCESS", one(0.5)).startsWith("MIX.FITEXCESS takes 3 to 8 arguments"));
        // the order is required and typed as a range: Calc refuses a call without it (Err:504), as MIX.EXPLAIN says
        String noOrder = explain("MIX.FITEXCESS", new Object[][] {{0.2}, {0.4}}, new Object[][] {{-0.7}, {-1.0}});
        assertEquals("Problem.EXPLAIN_ARGUMENT_COUNT", Catalogue.entryOf(noOrder), noOrder);
        assertTrue(noOrder.startsWith("MIX.FITEXCESS takes 3 to 8 arguments"), noOrder);
    }

    /**
     * A single value for a range parameter is a one-cell range; trailing value arguments left out are void; a range
     * argument left out is refused by Calc itself (Err:502), even for MIX.CHECKPOINT, which never refuses.
     */
    @Test
    void argumentsArriveInCalcsForms() throws Exception {
        assertEquals(explain("MIX.DENSITY", CARD, one(0.3), one(45.0)), explain("MIX.DENSITY", CARD, 0.3, 45.0));
        assertEquals(explain("MIX.DENSITY", CARD, 0.3, 45.0), explain("MIX.DENSITY", CARD, 0.3, 45.0, Any.VOID));
        assertEquals("The x, argument 2 of MIX.CHECKPOINT, is left out; a required argument cannot be, so Calc shows "
                + "Err:502 for the call without calling the function: give a value, a cell or a range.",
                explain("MIX.CHECKPOINT", CARD, Any.VOID, 20.0));
        String card = explain("MIX.DENSITY", Any.VOID, 0.3, 20.0);
        assertEquals("Problem.EXPLAIN_RANGE_LEFT_OUT", Catalogue.entryOf(card), card);
        assertTrue(card.startsWith("The card, argument 1 of MIX.DENSITY"), card);
        assertEquals("OK", explain("MIX.ADDVOLUME", CARD, new Object[][] {{500.0, 500.0}}, "g", "ethanol", 10.0,
                20.0, Any.VOID, "mL"), "an optional value argument left out in the middle");
        // a required single value left out in the middle: Calc's own Err:502, as for a range
        String quantity = explain("MIX.RECIPE", CARD, Any.VOID, "L", 40.0, "%vol", 20.0);
        assertEquals("The quantity, argument 2 of MIX.RECIPE, is left out; a required argument cannot be, so Calc "
                + "shows Err:502 for the call without calling the function: give a value, a cell or a range.",
                quantity);
        // given as a value, a one-cell range or inline array, a required single value means the same
        assertEquals(explain("MIX.PARTIALVOLUME", CARD, "glycol", 0.3, 20.0), explain("MIX.PARTIALVOLUME", CARD,
                one("glycol"), 0.3, 20.0));
        assertEquals("Problem.UNKNOWN_COMPONENT_ARG", Catalogue.entryOf(explain("MIX.PARTIALVOLUME", CARD,
                one("glycol"), 0.3, 20.0)));
    }
}
