package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import com.sun.star.uno.Type;
import java.lang.reflect.InvocationTargetException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.FuzzCards;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.catalog.IdlType;
import org.miscela.core.problem.MiscelaException;

/**
 * One generated call of a {@link MixtureAddIn} method, made from a seed against a fuzz card: arguments in the forms
 * Calc passes them (ranges as rectangular Object[][] of Double and String with "" for blanks, optional arguments as
 * {@link Any#VOID}, scalars as Double, String or Boolean; a scalar for a parameter typed as a range, as every required
 * single value is, as a one-cell range), aimed at the card's components and validity range and at the edges around
 * them, with wrong shapes, blanks, text and non-finite numbers mixed in. All values are invented.
 */
final class FuzzCall {
    /**
     * The functions the fuzzers call: every function of the catalogue but MIX.EXPLAIN (whose variable argument list
     * ExplainProperties fuzzes with these calls). A function without a case in {@link Generator#call} fails
     * {@code FuzzCoverageTest}.
     */
    private static final List<FunctionInfo> FUZZED = fuzzedFunctions();
    /** The interface's methods by name, to call a method the catalogue names. */
    private static final Map<String, java.lang.reflect.Method> METHODS = new HashMap<>();

    static {
        for (java.lang.reflect.Method m : XMixtureFunctions.class.getMethods()) {
            METHODS.put(m.getName(), m);
        }
    }

    final FunctionInfo function;
    final FuzzCards.Blueprint card;
    final long seed;
    /** The arguments after the card (or all of them, for a function that takes no card), in the method's order. */
    final Object[] args;

    private FuzzCall(FunctionInfo function, FuzzCards.Blueprint card, long seed, Object[] args) {
        this.function = function;
        this.card = card;
        this.seed = seed;
        this.args = args;
    }

    private static List<FunctionInfo> fuzzedFunctions() {
        List<FunctionInfo> out = new ArrayList<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            if (f.arguments().stream().noneMatch(a -> a.kind() == IdlType.Kind.ARGUMENT_LIST)) {
                out.add(f);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** The functions to fuzz, in catalogue order. */
    static List<FunctionInfo> fuzzed() {
        return FUZZED;
    }

    /** The IDL method name of the function called. */
    String method() {
        return function.method();
    }

    /** Whether the card's cells are the first argument (they are not for MIX.FITEXCESS, MIX.LEASTSQUARES, MIX.INFO). */
    boolean takesCard() {
        return args.length + 1 == function.arguments().size();
    }

    /** The card as Calc would pass it: rectangular, "" for blanks. */
    Object[][] cardCells() {
        return FuzzCards.rectangular(card.cells);
    }

    /**
     * Every argument of the call in the method's order, the card's cells first where the method takes them, each in
     * the form Calc passes for its parameter's IDL type (the catalogue's): a single value given for a parameter typed
     * as a range (every required single value is) arrives as a one-cell range. The generators never leave such an
     * argument out: Calc refuses that call itself.
     */
    Object[] allArguments() {
        Object[] all = new Object[function.arguments().size()];
        int first = takesCard() ? 1 : 0;
        if (takesCard()) {
            all[0] = cardCells();
        }
        for (int i = 0; i < args.length && first + i < all.length; i++) {
            all[first + i] = calcForm(function.arguments().get(first + i), args[i]);
        }
        return all;
    }

    /** A generated argument as Calc passes it to a parameter of the argument's IDL type. */
    private Object calcForm(org.miscela.core.catalog.ArgumentInfo a, Object v) {
        if (a.kind() != IdlType.Kind.RANGE || v instanceof Object[][]) {
            return v;
        }
        if (v == Any.VOID) {
            throw new AssertionError("the generator left out " + method() + "'s " + a.name() + ", which Calc never "
                    + "does for a parameter typed as a range (it shows Err:502 without a call)");
        }
        return new Object[][] {{v}};
    }

    /**
     * Calls the method the catalogue names through the interface; the add-in's own exceptions pass unchanged (a UNO
     * exception such as NoConvergenceException included, which the IDL methods do not declare).
     */
    Object invoke(MixtureAddIn a) throws com.sun.star.uno.Exception {
        return invoke(a, null);
    }

    /**
     * {@link #invoke(MixtureAddIn)} with {@code card} (when not null) in the card's place, as Calc would pass another
     * range or cell there: for the packed card, one text cell.
     */
    Object invoke(MixtureAddIn a, Object[][] card) throws com.sun.star.uno.Exception {
        java.lang.reflect.Method m = METHODS.get(method());
        if (m == null) {
            throw new AssertionError("the interface has no method " + method());
        }
        Object[] all = allArguments();
        if (card != null && takesCard()) {
            all[0] = card;
        }
        if (all.length != m.getParameterCount()) {
            throw new AssertionError("the generator made " + all.length + " arguments for " + method() + ", which "
                    + "takes " + m.getParameterCount());
        }
        try {
            return m.invoke(a, all);
        } catch (InvocationTargetException e) {
            Throwable cause = e.getCause();
            if (cause instanceof com.sun.star.uno.Exception) {
                throw (com.sun.star.uno.Exception) cause;
            }
            if (cause instanceof RuntimeException) {
                throw (RuntimeException) cause;
            }
            if (cause instanceof Error) {
                throw (Error) cause;
            }
            throw new AssertionError(method() + " threw " + cause, cause);
        } catch (IllegalAccessException | java.lang.IllegalArgumentException e) {
            throw new AssertionError("the generator's arguments do not fit " + method() + ": " + e, e);
        }
    }

    /** The range arguments of this call (not the card): a well-shaped array result has the shape of one of them. */
    List<Object[][]> ranges() {
        List<Object[][]> out = new ArrayList<>();
        for (Object v : args) {
            Object u = v instanceof Any ? ((Any) v).getObject() : v;
            if (u instanceof Object[][]) {
                out.add((Object[][]) u);
            }
        }
        return out;
    }

    private static Object[][] grid(Object v) {
        return (Object[][]) v;
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(function.displayName()).append(" (").append(method())
                .append("), call seed ").append(seed).append('\n');
        int first = takesCard() ? 2 : 1;
        for (int i = 0; i < args.length; i++) {
            b.append("  arg ").append(i + first).append(": ").append(render(args[i])).append('\n');
        }
        return b.append("  card: ").append(card).toString();
    }

    private static String render(Object v) {
        if (v == Any.VOID) {
            return "VOID";
        }
        if (v instanceof Any) {
            return "Any(" + render(((Any) v).getObject()) + ")";
        }
        if (v instanceof Object[][]) {
            Object[][] g = (Object[][]) v;
            StringBuilder b = new StringBuilder("[");
            for (int i = 0; i < g.length && b.length() < 3000; i++) {
                b.append(i == 0 ? "" : "; ");
                for (int c = 0; c < g[i].length; c++) {
                    b.append(c == 0 ? "" : ", ").append(FuzzCards.show(new Object[][] {{g[i][c]}}).substring(6).trim());
                }
            }
            return b.append("] ").append(g.length).append('×').append(g.length == 0 ? 0 : g[0].length).toString();
        }
        return FuzzCards.show(new Object[][] {{v}}).substring(6).trim();
    }

    // ------------------------------------------------------------------ generation

    static FuzzCall of(FunctionInfo function, FuzzCards.Blueprint card, long seed) {
        return new Generator(new Random(seed), card).call(function, seed);
    }

    /** Builds the arguments of one call. */
    private static final class Generator {
        final Random r;
        final FuzzCards.Blueprint card;
        final int n;
        /**
         * A clean call keeps every argument inside its contract (right shapes, numbers, in-range temperatures,
         * known words), so that valid cards reach the numerics instead of stopping at the first bad argument.
         */
        final boolean clean;

        Generator(Random r, FuzzCards.Blueprint card) {
            this.r = r;
            this.card = card;
            this.clean = r.nextInt(5) < 2;
            // Now and then a composition for a card of another size.
            this.n = !clean && r.nextInt(15) == 0 ? 1 + r.nextInt(5) : Math.max(card.componentCount(), 1);
        }

        /** The arguments of a call of f, by its IDL method name. */
        FuzzCall call(FunctionInfo f, long seed) {
            String m = f.method();
            Object[] a;
            switch (m) {
                case "excessMolarVolume":
                case "mixtureMolarVolume":
                case "mixtureDensity":
                case "excessEnthalpy": {
                    Object[][] x = composition();
                    a = new Object[] {x, temperature(x), extrapolate()};
                    break;
                }
                case "partialMolarVolume":
                case "partialExcessMolarVolume":
                case "partialExcessEnthalpy":
                case "activityCoefficient":
                case "vapourFraction":
                case "partialPressure":
                case "partialExcessGibbs":
                case "partialExcessEntropy":
                case "infiniteDilutionActivity": {
                    Object[][] x = composition();
                    a = new Object[] {component(), x, temperature(x), extrapolate()};
                    break;
                }
                case "relativeVolatility": {
                    Object[][] x = composition();
                    a = new Object[] {component(), component(), x, temperature(x), extrapolate()};
                    break;
                }
                case "azeotrope":
                    a = new Object[] {clean ? pick(10.0, 50.0, 101.325) : pick(0.0, -1.0, 1e300, "", junk(), 50.0),
                        pick(Any.VOID, "composition", "temperature", clean ? "temperature" : "x"), extrapolate()};
                    break;
                case "bubblePressure":
                case "excessGibbs":
                case "excessEntropy":
                case "dewPressure": {
                    Object[][] x = composition();
                    a = new Object[] {x, temperature(x), extrapolate()};
                    break;
                }
                case "bubblePoint":
                case "dewPoint": {
                    Object[][] x = composition();
                    // pressures in the card's unit, whatever it is: a spread that sometimes meets a bubble point
                    a = new Object[] {x, clean ? new Object[][] {{pick(1.0, 10.0, 101.325, 1000.0)}}
                        : new Object[][] {{pick(0.0, -1.0, 1e300, Double.NaN, "", junk(), 50.0)}}, extrapolate()};
                    break;
                }
                case "pureDensity": {
                    Object[][] t = r.nextInt(4) == 0 ? temperatureRange(1 + r.nextInt(4), 1 + r.nextInt(3))
                            : new Object[][] {{temperatureValue()}};
                    a = new Object[] {component(), t, extrapolate()};
                    break;
                }
                case "checkCard":
                    a = new Object[] {pick(Any.VOID, "warnings", "extent", "digits", " Summary ", "colour", "",
                        2.0)};
                    break;
                case "checkPoint":
                case "insideValidity": {
                    Object[][] x = composition();
                    Object[][] t = temperature(x);
                    a = m.equals("insideValidity") ? new Object[] {x, t} : new Object[] {x, t, extrapolate()};
                    break;
                }
                case "traceEvaluation": {
                    Object[][] x = composition();
                    a = new Object[] {x, temperature(x), pick(Any.VOID, "volume", "enthalpy", " ENTHALPY ", "vapour",
                        "mass", "", 1.0, Boolean.TRUE), extrapolate()};
                    break;
                }
                case "mixingHeat": {
                    Object[][] amounts = amounts();
                    a = new Object[] {amounts, temperature(amounts), basis(), extrapolate()};
                    break;
                }
                case "adiabaticRise": {
                    Object[][] amounts = amounts();
                    a = new Object[] {amounts, temperature(amounts), basis(), extrapolate(), extrapolate()};
                    break;
                }
                case "additionHeat": {
                    Object[][] amounts = amounts();
                    a = new Object[] {amounts, component(), added(), temperature(amounts), basis(), extrapolate()};
                    break;
                }
                case "uncertainty": {
                    Object[][] x = composition();
                    a = new Object[] {x, temperature(x), pick(Any.VOID, "density", "excess volume", "molar volume",
                        "partial volume", " Density ", "viscosity", "", 2.0), r.nextInt(3) == 0 ? Any.VOID
                        : component(), extrapolate()};
                    break;
                }
                case "fitExcessVolume":
                    a = fitExcess();
                    break;
                case "fitDensity":
                    a = fitDensity();
                    break;
                case "fitVapourLiquid":
                    a = fitVapourLiquid();
                    break;
                case "flashPoint": {
                    Object[][] x = composition();
                    a = new Object[] {x, activity(), extrapolate()};
                    break;
                }
                case "flashMinimum":
                    a = new Object[] {pick(Any.VOID, "composition", "temperature", clean ? "temperature" : "peak",
                        clean ? Any.VOID : 1.0), activity(), extrapolate()};
                    break;
                case "leastSquares":
                    a = leastSquares();
                    break;
                case "convertComposition": {
                    Object from = basisWord();
                    a = new Object[] {basisValues(from), from, basisWord(), temperatureOrVoid(),
                        r.nextBoolean() ? Any.VOID : temperatureValue(), balance(), extrapolate(), pickedComponent()};
                    break;
                }
                case "batchTotals": {
                    Object[][] amounts = amounts();
                    a = new Object[] {amounts, amountUnit(), temperature(amounts), pick(Any.VOID, "volume", "mass",
                        "moles", "density", "pure volume", "contraction", "contraction %", clean ? "volume" : "weight"),
                        r.nextBoolean() ? Any.VOID : amountUnit(), storageTemperatures(), extrapolate()};
                    break;
                }
                case "recipe": {
                    Object basis = basisWord();
                    a = new Object[] {quantity(), amountUnit(), basisValues(basis), basis, temperatureValue(),
                        storageTemperatures(), r.nextBoolean() ? Any.VOID : amountUnit(), balance(), extrapolate(),
                        pickedComponent()};
                    break;
                }
                case "adjustBatch": {
                    Object basis = basisWord();
                    Object[][] batch = amounts();
                    Object what = pick(Any.VOID, "additions", "volume", "summary", clean ? "summary" : "all");
                    a = new Object[] {batch.length > 1 && r.nextBoolean() ? new Object[][] {batch[0]} : batch,
                        amountUnit(), basisValues(basis), basis, temperatureValue(),
                        pick(Any.VOID, "least", "within", "make up", clean ? "least" : "most"),
                        r.nextBoolean() ? Any.VOID : quantity(), r.nextBoolean() ? Any.VOID : amountUnit(), what,
                        r.nextBoolean() ? Any.VOID : amountUnit(), balance(), extrapolate(),
                        // a clean call names a component only where the result has one value per component
                        clean && !(what == Any.VOID || "additions".equals(what)) ? Any.VOID : pickedComponent()};
                    break;
                }
                case "additionVolume": {
                    Object[][] batch = amounts();
                    a = new Object[] {batch.length > 1 && r.nextBoolean() ? new Object[][] {batch[0]} : batch,
                        amountUnit(), component(), added(), temperatureValue(),
                        pick(Any.VOID, "exact", "first order", "difference", clean ? "exact" : "second order"),
                        r.nextBoolean() ? Any.VOID : amountUnit(), storageTemperatures(), extrapolate()};
                    break;
                }
                case "compositionFromDensity": {
                    Object[][] t = new Object[][] {{temperatureValue()}};
                    double tValue = t[0][0] instanceof Double ? (Double) t[0][0] : card.lowest;
                    Object[][] densities = r.nextInt(4) == 0
                            ? new Object[][] {{plausibleMixtureDensity(tValue)}, {plausibleMixtureDensity(tValue)}}
                            : new Object[][] {{plausibleMixtureDensity(tValue)}};
                    if (densities.length > 1 && r.nextBoolean()) {
                        t = new Object[][] {{tValue}, {temperatureValue()}};
                    }
                    a = new Object[] {densities, t, r.nextBoolean() ? Any.VOID : component(),
                        r.nextInt(4) == 0 ? Any.VOID : basisWord(),
                        temperatureOrVoid(), r.nextInt(3) == 0 ? composition() : Any.VOID,
                        r.nextBoolean() ? Any.VOID : (Object) (0.3 * r.nextDouble()),
                        r.nextBoolean() ? Any.VOID : (Object) (0.7 + 0.3 * r.nextDouble()), balance(), extrapolate()};
                    break;
                }
                case "volumeCorrection": {
                    Object basis = basisWord();
                    Object[][] x = basisValues(basis);
                    a = new Object[] {x, basis, temperature(x), temperatureValue(),
                        pick(Any.VOID, "factor", "density", "reference density", clean ? "factor" : "ratio"),
                        temperatureOrVoid(), balance(), extrapolate()};
                    break;
                }
                case "mixtureMolarMass":
                    a = new Object[] {composition()};
                    break;
                case "packCard":
                    a = new Object[0];
                    break;
                case "blendHeatCapacity": {
                    Object[][] x = composition();
                    a = new Object[] {x, temperature(x), extrapolate()};
                    break;
                }
                case "partialHeatCapacity": {
                    Object[][] x = composition();
                    a = new Object[] {component(), x, temperature(x), extrapolate()};
                    break;
                }
                case "temperaturePath": {
                    int charges = clean ? n : 1 + r.nextInt(n + 2);
                    Object[][] order = new Object[charges][1];
                    Object[][] amounts = new Object[charges][1];
                    for (int c = 0; c < charges; c++) {
                        // a cell of the charges range: a value, never a range (no cell holds one)
                        Object who = clean ? (Object) (double) (c % n + 1) : component();
                        order[c][0] = who instanceof Object[][] ? "nobody" : who;
                        amounts[c][0] = clean ? (Object) (0.5 + r.nextInt(10)) : pick(1.0, 10.0, 0.0, -1.0,
                                junk(), "");
                    }
                    Object[][] t = r.nextBoolean() ? new Object[][] {{temperatureValue()}}
                            : temperatureRange(charges, 1);
                    a = new Object[] {order, amounts, t, basis(), extrapolate(),
                        pick(Any.VOID, "path", "peak", "peak at", "final", "cooling", clean ? "peak" : "top", 2.0),
                        clean ? pick(Any.VOID, 3.0, 10.0) : pick(Any.VOID, 0.0, 1.0, 5.0, 1e9, -2.0, junk()),
                        clean ? pick(Any.VOID, 0.0, 1.5) : pick(Any.VOID, 0.5, -1.0, junk()),
                        clean ? pick(Any.VOID, 0.0, 10.0) : pick(Any.VOID, 1e3, -5.0, junk()), extrapolate(),
                        clean ? pick(Any.VOID, 60.0, 330.0) : pick(Any.VOID, 60.0, -300.0, junk())};
                    break;
                }
                case "freezingPoint":
                    a = new Object[] {composition(), pickedComponent(),
                        clean ? pick(Any.VOID, "card", "ideal", " Ideal ") : pick(Any.VOID, "ideal", "", "gamma", 1.0),
                        clean ? pick(Any.VOID, "temperature", "component") : pick(Any.VOID, "component", "x", 2.0),
                        extrapolate()};
                    break;
                case "libraryList":
                    a = new Object[] {pick(Any.VOID, "chloride", "water", " Acid ", "", clean ? "sodium" : junk(),
                        1.0, Boolean.TRUE)};
                    break;
                case "libraryCard":
                    a = new Object[] {pick("NaCl", " nacl ", "sulfuric acid + water", "ethanol + water (OIML R 22)",
                        clean ? "KCl" : junk(), "", 2.0)};
                    break;
                case "addInInfo":
                    a = new Object[] {pick(Any.VOID, "version", "card reads", "cards kept", " Cards Kept ",
                        clean ? "version" : "cards", "", 1.0, Boolean.TRUE)};
                    break;
                default:
                    throw new IllegalStateException("FuzzCall has no arguments for " + f.displayName() + " ("
                            + m + "): add a case to FuzzCall.Generator.call");
            }
            return new FuzzCall(f, card, seed, trailingBasis(m, a));
        }

        /**
         * The trailing basis arguments: a composition basis and its temperature for the property functions, the basis
         * temperature for MIX.RECIPE and MIX.ADJUST. A clean call reads its fractions as mole or mass fractions.
         */
        Object[] trailingBasis(String m, Object[] a) {
            switch (m) {
                case "excessMolarVolume":
                case "partialMolarVolume":
                case "partialExcessMolarVolume":
                case "mixtureMolarVolume":
                case "mixtureDensity":
                case "checkPoint":
                case "excessEnthalpy":
                case "partialExcessEnthalpy":
                case "insideValidity":
                case "traceEvaluation":
                case "uncertainty":
                case "activityCoefficient":
                case "vapourFraction":
                case "partialPressure":
                case "bubblePressure":
                case "bubblePoint":
                case "relativeVolatility":
                case "excessGibbs":
                case "partialExcessGibbs":
                case "excessEntropy":
                case "partialExcessEntropy":
                case "infiniteDilutionActivity":
                case "flashPoint":
                case "freezingPoint":
                case "mixtureMolarMass": {
                    Object[] out = java.util.Arrays.copyOf(a, a.length + 2);
                    out[a.length] = clean ? pick(Any.VOID, Any.VOID, "mole fraction", "mass fraction", "w")
                            : pick(Any.VOID, "mass fraction", "%w/w", "wt%", "volume fraction", "%vol", "mol %",
                                "ppm", "", 1.0);
                    out[a.length + 1] = temperatureOrVoid();
                    return out;
                }
                case "blendHeatCapacity":
                case "partialHeatCapacity": {
                    Object[] out = java.util.Arrays.copyOf(trailingBasis("mixtureMolarMass", a), a.length + 3);
                    out[a.length + 2] = clean ? pick(Any.VOID, "mol", "kg") : pick(Any.VOID, "kg", "lb", "", 1.0);
                    return out;
                }
                case "recipe":
                case "adjustBatch": {
                    Object[] out = java.util.Arrays.copyOf(a, a.length + 1);
                    out[a.length] = temperatureOrVoid();
                    return out;
                }
                default:
                    return a;
            }
        }

        @SafeVarargs
        final <T> T pick(T... options) {
            return options[r.nextInt(options.length)];
        }

        // --- single values

        /** A value that belongs nowhere: text, a number as text, blank, NaN, ±∞, a boolean, a huge number. */
        Object junk() {
            return pick("", "  ", "abc", "0.5", "20", "#N/A", "Err:502", Double.NaN, Double.POSITIVE_INFINITY,
                    Double.NEGATIVE_INFINITY, Boolean.TRUE, Boolean.FALSE, 1e308, -1e308, Double.MIN_VALUE, -0.0);
        }

        Object extrapolate() {
            int p = r.nextInt(clean ? 16 : 20);
            if (p < 10) {
                return Any.VOID;
            }
            if (p < 14) {
                return Boolean.TRUE;
            }
            if (p < 16) {
                return Boolean.FALSE;
            }
            return pick(1.0, 0.0, Double.NaN, "TRUE", "", new Any(Type.BOOLEAN, Boolean.TRUE),
                    new Object[][] {{1.0}}, -2.5);
        }

        /** The per-component results' trailing component: mostly left out, otherwise as any component argument. */
        Object pickedComponent() {
            return r.nextInt(3) == 0 ? component() : Any.VOID;
        }

        Object component() {
            int p = r.nextInt(clean ? 15 : 20);
            if (p < 10) {
                return (double) (1 + r.nextInt(Math.max(card.componentCount(), 1)));
            }
            if (p < 15 && !card.names.isEmpty()) {
                String name = card.names.get(r.nextInt(card.names.size()));
                return pick(name, name.toUpperCase(java.util.Locale.ROOT), "  " + name + " ");
            }
            return pick(0.0, (double) card.componentCount() + 1, 1.5, -1.0, Double.NaN, Double.POSITIVE_INFINITY,
                    "nobody", "", " ", Boolean.TRUE, new Object[][] {{1.0}}, new Object[][] {{1.0, 2.0}}, 1e300);
        }

        Object basis() {
            if (clean) {
                return pick(Any.VOID, "mol", "kmol", "g", "kg", "t", "lb", "kg (conventional)", "lb air");
            }
            return pick(Any.VOID, Any.VOID, "mol", "kmol", "g", "kg", " KG ", "lb", "Tonnes", "KG AIR", "oz", "", 2.0,
                    Boolean.TRUE);
        }

        Object added() {
            int p = r.nextInt(clean ? 6 : 10);
            if (p < 6) {
                return 10 * r.nextDouble();
            }
            return pick(0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY, 1e300, "one", "",
                    new Object[][] {{2.0}}, new Object[][] {{1.0, 2.0}});
        }

        // --- compositions

        /** A composition argument in one of the shapes the functions take, or a wrong one. */
        Object[][] composition() {
            int p = r.nextInt(clean ? 16 : 20);
            if (n == 2 && p < 7) {
                if (p < 4) {
                    return new Object[][] {{maybeJunk(point()[0])}};
                }
                // a row or column of x1 values
                int k = 2 + r.nextInt(5);
                boolean column = r.nextBoolean();
                Object[][] g = column ? new Object[k][1] : new Object[1][k];
                for (int i = 0; i < k; i++) {
                    Object v = r.nextInt(8) == 0 ? "" : maybeJunk(point()[0]);
                    if (column) {
                        g[i][0] = v;
                    } else {
                        g[0][i] = v;
                    }
                }
                return g;
            }
            if (p < 16) {
                int lines = p < 11 ? 1 : 2 + r.nextInt(5);
                boolean column = lines == 1 && r.nextBoolean();
                Object[][] g = column ? new Object[n][1] : new Object[lines][n];
                for (int line = 0; line < lines; line++) {
                    double[] x = point();
                    boolean blankLine = lines > 1 && r.nextInt(8) == 0;
                    for (int k = 0; k < n; k++) {
                        Object v = blankLine ? "" : maybeJunk(x[k]);
                        if (column) {
                            g[k][0] = v;
                        } else {
                            g[line][k] = v;
                        }
                    }
                }
                return g;
            }
            return randomShape();
        }

        /** Any shape up to 5×5 (including none), filled with fractions and junk. */
        Object[][] randomShape() {
            int rows = r.nextInt(6);
            int cols = rows == 0 ? 0 : r.nextInt(6);
            Object[][] g = new Object[rows][cols];
            for (Object[] row : g) {
                for (int c = 0; c < cols; c++) {
                    row[c] = r.nextInt(4) == 0 ? junk() : (Object) r.nextDouble();
                }
            }
            return g;
        }

        Object maybeJunk(double v) {
            return !clean && r.nextInt(25) == 0 ? junk() : (Object) v;
        }

        /** Mole fractions of n components: ordinary, at the corners and edges, 1e-15 away, slightly off in sum. */
        double[] point() {
            double[] x = new double[n];
            int p = r.nextInt(clean ? 16 : 20);
            if (p < 8) {
                double sum = 0;
                for (int k = 0; k < n; k++) {
                    x[k] = -Math.log(1 - r.nextDouble());
                    sum += x[k];
                }
                for (int k = 0; k < n; k++) {
                    x[k] /= sum;
                }
            } else if (p < 11) {
                x[r.nextInt(n)] = 1.0; // a pure component
            } else if (p < 14) {
                // 1e-15 (or one ulp) away from a corner
                int k = r.nextInt(n);
                double eps = pick(1e-15, 1e-300, Double.MIN_VALUE, Math.ulp(1.0));
                x[k] = 1.0 - eps;
                x[(k + 1) % n] += eps;
            } else if (p < 16) {
                // inside the card's own limits: the lower limits, the rest to the first component
                double rest = 1.0;
                for (int k = 1; k < n; k++) {
                    x[k] = k < card.lowestFraction.length ? card.lowestFraction[k] : 0.0;
                    rest -= x[k];
                }
                x[0] = rest;
            } else if (p < 18) {
                // the sum off by 1e-7 (accepted) or 1e-5 (refused)
                x[r.nextInt(n)] = 1.0 + pick(1e-7, -1e-7, 1e-5, -1e-5, 1e-6, -1e-6);
            } else {
                x[r.nextInt(n)] = pick(-1e-15, -0.0, 1.5, -1.0, 2.0);
                x[r.nextInt(n)] += 1.0;
            }
            return x;
        }

        // --- temperatures

        /** A temperature argument fitted to a composition (or amounts) argument, or a wrong shape. */
        Object[][] temperature(Object[][] x) {
            int p = r.nextInt(clean ? 18 : 20);
            if (p < 15 || x.length == 0) {
                return new Object[][] {{temperatureValue()}};
            }
            int rows = x.length;
            int cols = x[0].length;
            if (p < 18) {
                // the composition's own shape (x1 ranges), or a column with one per line (blocks)
                return r.nextBoolean() ? temperatureRange(rows, cols) : temperatureRange(rows, 1);
            }
            return temperatureRange(1 + r.nextInt(4), 1 + r.nextInt(3));
        }

        Object[][] temperatureRange(int rows, int cols) {
            Object[][] g = new Object[rows][cols];
            for (Object[] row : g) {
                for (int c = 0; c < cols; c++) {
                    row[c] = !clean && r.nextInt(10) == 0 ? "" : temperatureValue();
                }
            }
            return g;
        }

        /** Inside the range, at its limits, an ulp or more beyond, at and below absolute zero, or junk. */
        Object temperatureValue() {
            double lo = card.lowest;
            double hi = card.highest;
            double zero = card.celsius() ? -273.15 : 0.0;
            int p = r.nextInt(clean ? 24 : 40);
            if (p < 20) {
                return lo + (hi - lo) * r.nextDouble();
            }
            switch (p) {
                case 20: case 21:
                    return lo;
                case 22: case 23:
                    return hi;
                case 24:
                    return Math.nextDown(lo);
                case 25:
                    return Math.nextUp(hi);
                case 26:
                    return lo - 1e-9;
                case 27:
                    return hi + 1;
                case 28:
                    return hi + 1000;
                case 29:
                    return zero;
                case 30:
                    return Math.nextDown(zero);
                case 31:
                    return zero + 1e-9;
                case 32:
                    return pick(-1e300, 1e300, 1e6, -1e6);
                case 33:
                    return pick(Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY);
                default:
                    return r.nextInt(3) == 0 ? junk() : (Object) (lo + (hi - lo) * r.nextDouble());
            }
        }

        // --- amounts

        Object[][] amounts() {
            int p = r.nextInt(20);
            if (p < 16) {
                int lines = p < 11 ? 1 : 2 + r.nextInt(4);
                boolean column = lines == 1 && r.nextBoolean();
                Object[][] g = column ? new Object[n][1] : new Object[lines][n];
                for (int line = 0; line < lines; line++) {
                    for (int k = 0; k < n; k++) {
                        Object v = amount();
                        if (column) {
                            g[k][0] = v;
                        } else {
                            g[line][k] = v;
                        }
                    }
                }
                return g;
            }
            return randomShape();
        }

        Object amount() {
            int p = r.nextInt(clean ? 23 : 30);
            if (p < 20) {
                return 100 * r.nextDouble();
            }
            switch (p) {
                case 20: case 21: case 22:
                    return 0.0;
                case 23:
                    return pick(1e300, Double.MAX_VALUE, 1e-300, Double.MIN_VALUE);
                case 24:
                    return -1.0;
                default:
                    return r.nextInt(2) == 0 ? junk() : (Object) (1 + r.nextInt(5) * 1.0);
            }
        }

        // --- blending

        /** A composition basis by one of its spellings, or (not clean) a word that is none. */
        Object basisWord() {
            if (!clean && r.nextInt(8) == 0) {
                return pick("ppm", "", 0.0, 1.0, "mole  fraction", new Object[][] {{"x", "w"}});
            }
            return pick("mole fraction", "mass fraction", "volume fraction", "%vol", "mol/L", "g/L", "mol/kg", "x",
                    "w", "phi", " % vol ", "Mass Fraction");
        }

        private boolean concentration(Object basis) {
            String b = basis instanceof String ? ((String) basis).trim().toLowerCase(java.util.Locale.ROOT) : "";
            return b.contains("vol") && !b.contains("fraction") || b.contains("/l") || b.contains("/kg");
        }

        /** Values on a basis: fractions as compositions; concentrations per component with the balance blank. */
        Object[][] basisValues(Object basis) {
            if (!concentration(basis)) {
                return composition();
            }
            String b = ((String) basis).toLowerCase(java.util.Locale.ROOT);
            double top = b.contains("vol") ? 100 : b.contains("g/l") ? 800 : b.contains("mol/l") ? 15 : 40;
            if (n == 2 && r.nextBoolean()) {
                return new Object[][] {{maybeJunk(top * r.nextDouble())}};
            }
            Object[][] g = new Object[1][n];
            for (int k = 0; k < n; k++) {
                g[0][k] = k == n - 1 && r.nextInt(4) > 0 ? "" : maybeJunk(top / n * r.nextDouble());
            }
            return g;
        }

        Object amountUnit() {
            if (!clean && r.nextInt(8) == 0) {
                return pick("oz", "gallon", "", 0.0, 3.0, "KG", "Litre", "kg conventional", new Object[][] {{"g"}, {"kg"}});
            }
            return pick("mol", "kmol", "g", "kg", "t", "tonne", "lb", "lbs", "kg (conventional)", "g air", "lb air",
                    "mL", "millilitre", "L", "litre", "liters", "m3", "cm³", "dm3", "gal", "US gal", "imp gal",
                    "UK gal");
        }

        Object balance() {
            return r.nextBoolean() ? Any.VOID : component();
        }

        Object temperatureOrVoid() {
            return r.nextInt(3) == 0 ? Any.VOID : temperatureValue();
        }

        /** Storage temperatures: left out, one for all, one per component, or (not clean) the wrong count. */
        Object storageTemperatures() {
            int p = r.nextInt(clean ? 3 : 4);
            if (p == 0) {
                return Any.VOID;
            }
            if (p == 1) {
                return temperatureValue();
            }
            int count = p == 2 ? n : n + 1;
            Object[][] g = new Object[1][count];
            for (int k = 0; k < count; k++) {
                g[0][k] = temperatureValue();
            }
            return g;
        }

        Object quantity() {
            int p = r.nextInt(clean ? 8 : 10);
            return p < 8 ? (Object) (1000 * r.nextDouble()) : pick(0.0, -5.0, Double.NaN, 1e300, "ten", "");
        }

        /** A density the card can have at t (the mixture at a random composition), or any number if it cannot. */
        double plausibleMixtureDensity(double t) {
            try {
                Card c = CardReader.read(card.cells);
                double[] x = new double[c.componentCount()];
                x[0] = r.nextDouble();
                x[c.componentCount() - 1] += 1 - x[0];
                return org.miscela.core.functions.CardFunctions.density(c, x, t, org.miscela.core.card.Extrapolation.ALLOW);
            } catch (MiscelaException e) {
                return 500 + 1000 * r.nextDouble();
            }
        }

        // --- fits

        Object order(int usual, int highest) {
            int p = r.nextInt(clean ? 15 : 20);
            if (p < 15) {
                return (double) r.nextInt(usual + 1);
            }
            return pick((double) highest, (double) highest + 1, -1.0, 1.5, Double.NaN, "two", "",
                    new Object[][] {{2.0}}, new Object[][] {{1.0}, {2.0}}, Boolean.TRUE);
        }

        Object fitResult() {
            if (clean) {
                return pick(Any.VOID, "coefficients", "standard errors", "statistics", "covariance", "residuals",
                        "orders", "check");
            }
            return pick(Any.VOID, Any.VOID, "coefficients", "standard errors", "statistics", "covariance",
                    "residuals", "orders", "check", " Check ", "residual", 3.0);
        }

        /** A column (usually) or row of values; blanks and junk mixed in now and then, rarely a block instead. */
        Object[][] vector(double[] v, boolean row) {
            if (!clean && r.nextInt(40) == 0) {
                return randomShape();
            }
            Object[][] g = row ? new Object[1][v.length] : new Object[v.length][1];
            for (int i = 0; i < v.length; i++) {
                Object cell = !clean && r.nextInt(60) == 0 ? junk() : (Object) v[i];
                if (row) {
                    g[0][i] = cell;
                } else {
                    g[i][0] = cell;
                }
            }
            return v.length == 0 ? new Object[0][] : g;
        }

        double[] fractions(int points) {
            double[] x = new double[points];
            for (int i = 0; i < points; i++) {
                x[i] = r.nextInt(10) == 0 ? pick(0.0, 1.0, 1e-15, 1 - 1e-15) : r.nextDouble();
            }
            if (points > 0 && !clean && r.nextInt(20) == 0) {
                x[r.nextInt(points)] = pick(-0.1, 1.1, Double.NaN);
            }
            return x;
        }

        Object[] fitExcess() {
            int points = !clean && r.nextInt(20) == 0 ? 0 : 1 + r.nextInt(40);
            double[] x = fractions(points);
            double[] t = new double[points];
            double[] ve = new double[points];
            double[] w = new double[points];
            double a0 = -5 + 10 * r.nextDouble();
            double a1 = -2 + 4 * r.nextDouble();
            for (int i = 0; i < points; i++) {
                t[i] = card.lowest + (card.highest - card.lowest) * r.nextDouble();
                double d = 2 * x[i] - 1;
                ve[i] = x[i] * (1 - x[i]) * (a0 + a1 * d) * (1 + 0.01 * (t[i] - card.lowest))
                        + 1e-3 * r.nextGaussian();
                w[i] = !clean && r.nextInt(10) == 0 ? pick(0.0, -1.0, Double.NaN) : 0.5 + r.nextDouble();
            }
            boolean row = r.nextInt(6) == 0;
            int lengthError = !clean && r.nextInt(15) == 0 ? 1 : 0;
            Object temperature = r.nextBoolean() ? Any.VOID : r.nextInt(5) == 0 && points > 0 ? (Object) t[0] : vector(t, row);
            return new Object[] {vector(x, row), vector(Arrays.copyOf(ve, points + lengthError), row), order(6, 30),
                temperature, r.nextBoolean() ? Any.VOID : order(2, 10),
                r.nextBoolean() ? Any.VOID : (Object) (card.lowest + r.nextDouble()),
                r.nextInt(3) == 0 ? vector(w, row) : Any.VOID, fitResult()};
        }

        Object[] fitDensity() {
            int points = !clean && r.nextInt(20) == 0 ? 0 : 1 + r.nextInt(40);
            double[] x = fractions(points);
            double[] t = new double[points];
            double[] rho = new double[points];
            double[] w = new double[points];
            Card pure = pureOrNull();
            int[] members = new int[2];
            Object pair = pairArgument(members);
            int first = members[0];
            int second = members[1];
            for (int i = 0; i < points; i++) {
                t[i] = card.lowest + (card.highest - card.lowest) * r.nextDouble();
                rho[i] = plausibleDensity(pure, first, second, x[i], t[i]);
                w[i] = !clean && r.nextInt(10) == 0 ? pick(0.0, -1.0) : 0.5 + r.nextDouble();
            }
            boolean row = r.nextInt(6) == 0;
            Object[][] temperatures = r.nextInt(5) == 0 && points > 0 ? new Object[][] {{t[0]}} : vector(t, row);
            return new Object[] {pair, vector(x, row), vector(rho, row), temperatures, order(5, 30),
                r.nextBoolean() ? Any.VOID : order(2, 10),
                r.nextBoolean() ? Any.VOID : (Object) ((card.lowest + card.highest) / 2),
                r.nextInt(3) == 0 ? vector(w, row) : Any.VOID, fitResult()};
        }

        /** The activity argument of the flash-point functions: left out, "card" or "ideal" (or junk, unclean). */
        Object activity() {
            return clean ? pick(Any.VOID, Any.VOID, "card", "ideal")
                    : pick(Any.VOID, "card", "ideal", "Ideal ", "raoult", "", 1.0);
        }

        /** The card's pure part as a fit reads it, or null when it has none (the fits' data are then plausible only). */
        Card pureOrNull() {
            try {
                return CardReader.readPureComponents(card.cells);
            } catch (MiscelaException e) {
                return null;
            }
        }

        /** The pair argument of a fit (left out on a binary card, often): its members into {@code members}. */
        Object pairArgument(int[] members) {
            members[0] = 0;
            members[1] = Math.min(1, Math.max(card.componentCount() - 1, 0));
            if (card.componentCount() <= 2 && r.nextInt(4) != 0) {
                return Any.VOID;
            }
            members[0] = r.nextInt(Math.max(card.componentCount(), 1));
            members[1] = r.nextInt(Math.max(card.componentCount(), 1));
            String a = card.names.isEmpty() ? "a" : card.names.get(members[0]);
            String b = card.names.isEmpty() ? "b" : card.names.get(members[1]);
            return pick(a + " + " + b, a + "+" + b, "nobody + " + a, "", 1.0);
        }

        /** Vapour–liquid data for MIX.FITVLE: near-ideal pressures from the card's vapour pressures where it has them. */
        Object[] fitVapourLiquid() {
            int points = !clean && r.nextInt(20) == 0 ? 0 : 1 + r.nextInt(25);
            double[] x = fractions(points);
            double[] y = new double[points];
            double[] t = new double[points];
            double[] p = new double[points];
            double[] w = new double[points];
            Card pure = pureOrNull();
            int[] members = new int[2];
            Object pair = pairArgument(members);
            double scale = 0.5 + 1.5 * r.nextDouble();
            for (int i = 0; i < points; i++) {
                t[i] = card.lowest + (card.highest - card.lowest) * r.nextDouble();
                double[] ideal = idealBubble(pure, members, x[i], t[i]);
                p[i] = ideal[0] * scale * (1 + 0.2 * x[i] * (1 - x[i]));
                y[i] = ideal[1];
                w[i] = !clean && r.nextInt(10) == 0 ? pick(0.0, -1.0) : 0.5 + r.nextDouble();
            }
            boolean row = r.nextInt(6) == 0;
            Object model = clean ? pick(Any.VOID, "Redlich-Kister", "Wilson", "NRTL")
                    : pick(Any.VOID, "Redlich-Kister", "wilson", "NRTL", "UNIQUAC", "", 1.0);
            return new Object[] {pair, vector(x, row), r.nextInt(3) == 0 ? Any.VOID : vector(y, row),
                r.nextInt(5) == 0 && points > 0 ? new Object[][] {{t[0]}} : vector(t, row), vector(p, row), model,
                r.nextInt(3) == 0 ? order(3, 30) : Any.VOID, r.nextInt(4) == 0 ? order(1, 10) : Any.VOID,
                r.nextBoolean() ? Any.VOID : (Object) ((card.lowest + card.highest) / 2),
                r.nextInt(4) == 0 ? pick(0.2, 0.3, 0.47, clean ? 0.3 : 0.0, clean ? 0.3 : 2.0) : Any.VOID,
                r.nextInt(3) == 0 ? vector(w, row) : Any.VOID,
                r.nextInt(5) == 0 ? "consistency" : fitResult()};
        }

        /** {p, y1} of an ideal solution from the card's vapour pressures (card units), or plausible numbers. */
        double[] idealBubble(Card pure, int[] members, double x, double t) {
            if (pure != null && pure.pressureUnit() != null && members[0] < pure.componentCount()
                    && members[1] < pure.componentCount() && pure.vapourPressure(members[0]) != null
                    && pure.vapourPressure(members[1]) != null && x >= 0 && x <= 1) {
                double kelvin = pure.units().temperature().toKelvin(t);
                double p1 = x * pure.vapourPressure(members[0]).pascal(kelvin);
                double p2 = (1 - x) * pure.vapourPressure(members[1]).pascal(kelvin);
                double p = pure.pressureUnit().fromPascal(p1 + p2);
                if (Double.isFinite(p) && p > 0) {
                    return new double[] {p, p1 / (p1 + p2)};
                }
            }
            return new double[] {1 + 100 * r.nextDouble(), r.nextDouble()};
        }

        /** An ideal-mixture density from the card's pure data with a small excess, in the card's unit. */
        double plausibleDensity(Card pure, int first, int second, double x, double t) {
            if (pure == null || first == second || first >= pure.componentCount() || second >= pure.componentCount()
                    || !(x >= 0 && x <= 1)) {
                return 500 + 1000 * r.nextDouble();
            }
            double kelvin = pure.units().temperature().toKelvin(t);
            double v1 = pure.components().get(first).molarVolume(kelvin);
            double v2 = pure.components().get(second).molarVolume(kelvin);
            double m = x * pure.components().get(first).molarMass() + (1 - x) * pure.components().get(second)
                    .molarMass();
            double vm = x * v1 + (1 - x) * v2 - 2 * x * (1 - x) + 1e-4 * r.nextGaussian();
            return pure.units().density().fromKgPerM3(1000 * m / vm);
        }

        Object[] leastSquares() {
            int points = !clean && r.nextInt(20) == 0 ? 0 : 1 + r.nextInt(30);
            int parameters = !clean && r.nextInt(20) == 0 ? 0 : 1 + r.nextInt(6);
            Object[][] design = new Object[points][parameters];
            double[] y = new double[points];
            double[] w = new double[points];
            for (int i = 0; i < points; i++) {
                double u = r.nextDouble() * pick(1.0, 1e-8, 1e8);
                for (int j = 0; j < parameters; j++) {
                    design[i][j] = !clean && r.nextInt(80) == 0 ? junk() : (Object) Math.pow(u, j);
                }
                y[i] = 1 + 2 * u - 0.5 * u * u + 1e-6 * r.nextGaussian();
                w[i] = r.nextInt(10) == 0 ? 0.0 : 1.0;
            }
            if (points > 0 && parameters > 1 && r.nextInt(10) == 0) {
                for (Object[] row : design) {
                    row[parameters - 1] = row[0]; // two equal columns: rank deficient
                }
            }
            return new Object[] {points == 0 ? new Object[0][] : design, vector(y, false),
                r.nextInt(3) == 0 ? vector(w, false) : Any.VOID, fitResult()};
        }
    }
}
