package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.catalog.IdlType;
import org.miscela.core.problem.Problem;

/**
 * MIX.EXPLAIN: runs another function's method on the arguments of a call, exactly as Calc would pass them, and gives
 * the words of its refusal, or "OK". The arguments arrive as Calc's variable argument list: a single cell as its
 * value, a range as {@code Object[][]}, a left-out argument as void. Each method's parameters are either typed as
 * ranges (IDL {@code sequence<sequence<any>>}, here 'R': the ranges, and every required single value) or optional
 * single values ({@code any}, here 'V'), as the function catalogue says; a value given for a range parameter becomes
 * a one-cell range, as Calc itself would pass it. A range parameter left out is refused by Calc itself (Err:502, the
 * add-in is not called), and so is a call with too few or too many arguments (Err:504): for those MIX.EXPLAIN says
 * so rather than run the method.
 */
final class Explanations {
    /** One method called with the decoded arguments, in its parameters' order. */
    interface Call {
        Object on(XMixtureFunctions functions, Object[] p) throws IllegalArgumentException;
    }

    /** A method's parameter kinds ('R' typed as a range, 'V' optional value) in IDL order, and how to call it. */
    static final class Target {
        final String kinds;
        final Call call;

        Target(String kinds, Call call) {
            this.kinds = kinds;
            this.call = call;
        }

        /**
         * The fewest arguments Calc accepts: up to the last range parameter (Calc passes a left-out value parameter
         * as void, but refuses a call that leaves out a trailing range with Err:504).
         */
        int fewest() {
            return kinds.lastIndexOf('R') + 1;
        }
    }

    /**
     * Every function of the catalogue but MIX.EXPLAIN itself, by IDL method name: the kinds from the catalogue, the
     * call written out (shipped code uses no reflection). ExplanationsTest fails when a function has no call here or
     * a call passes other arguments, in another order, or to another method.
     */
    private static final Map<String, Target> TARGETS = new LinkedHashMap<>();

    private static void add(String method, Call call) {
        TARGETS.put(method, new Target(kinds(FunctionCatalog.byMethod(method)), call));
    }

    /**
     * A function's parameter kinds as a word of 'R' (typed as a range: a range, or a required single value) and 'V'
     * (an optional single value), in IDL order.
     */
    static String kinds(FunctionInfo f) {
        StringBuilder kinds = new StringBuilder();
        for (ArgumentInfo a : f.arguments()) {
            kinds.append(a.kind() == IdlType.Kind.RANGE ? 'R' : 'V');
        }
        return kinds.toString();
    }

    static {
        add("excessMolarVolume", (a, p) -> a.excessMolarVolume(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("partialMolarVolume", (a, p) -> a.partialMolarVolume(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5],
                p[6]));
        add("partialExcessMolarVolume", (a, p) -> a.partialExcessMolarVolume(r(p[0]), r(p[1]), r(p[2]), r(p[3]),
                p[4], p[5], p[6]));
        add("mixtureMolarVolume", (a, p) -> a.mixtureMolarVolume(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("mixtureDensity", (a, p) -> a.mixtureDensity(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("pureDensity", (a, p) -> a.pureDensity(r(p[0]), r(p[1]), r(p[2]), p[3]));
        add("checkCard", (a, p) -> a.checkCard(r(p[0]), p[1]));
        add("checkPoint", (a, p) -> a.checkPoint(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("excessEnthalpy", (a, p) -> a.excessEnthalpy(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("partialExcessEnthalpy", (a, p) -> a.partialExcessEnthalpy(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4],
                p[5], p[6]));
        add("mixingHeat", (a, p) -> a.mixingHeat(r(p[0]), r(p[1]), r(p[2]), p[3], p[4]));
        add("additionHeat", (a, p) -> a.additionHeat(r(p[0]), r(p[1]), r(p[2]), r(p[3]), r(p[4]), p[5],
                p[6]));
        add("adiabaticRise", (a, p) -> a.adiabaticRise(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("insideValidity", (a, p) -> a.insideValidity(r(p[0]), r(p[1]), r(p[2]), p[3], p[4]));
        add("traceEvaluation", (a, p) -> a.traceEvaluation(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5],
                p[6]));
        add("fitExcessVolume", (a, p) -> a.fitExcessVolume(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5], p[6],
                p[7]));
        add("fitDensity",
            (a, p) -> a.fitDensity(r(p[0]), p[1], r(p[2]), r(p[3]), r(p[4]), r(p[5]), p[6], p[7], p[8], p[9]));
        add("leastSquares", (a, p) -> a.leastSquares(r(p[0]), r(p[1]), p[2], p[3]));
        add("uncertainty", (a, p) -> a.uncertainty(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5], p[6],
                p[7]));
        add("convertComposition",
            (a, p) -> a.convertComposition(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5], p[6], p[7],
                p[8]));
        add("batchTotals", (a, p) -> a.batchTotals(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5], p[6],
                p[7]));
        add("recipe", (a, p) -> a.recipe(r(p[0]), r(p[1]), r(p[2]), r(p[3]), r(p[4]), r(p[5]), p[6], p[7],
                p[8], p[9], p[10], p[11]));
        add("adjustBatch", (a, p) -> a.adjustBatch(r(p[0]), r(p[1]), r(p[2]), r(p[3]), r(p[4]), r(p[5]), p[6],
                p[7], p[8], p[9], p[10], p[11], p[12], p[13], p[14]));
        add("additionVolume",
            (a, p) -> a.additionVolume(r(p[0]), r(p[1]), r(p[2]), r(p[3]), r(p[4]), r(p[5]), p[6], p[7],
                p[8], p[9]));
        add("compositionFromDensity", (a, p) -> a.compositionFromDensity(r(p[0]), r(p[1]), r(p[2]), p[3], p[4],
                p[5], p[6], p[7], p[8], p[9], p[10]));
        add("volumeCorrection",
            (a, p) -> a.volumeCorrection(r(p[0]), r(p[1]), r(p[2]), r(p[3]), r(p[4]), p[5], p[6], p[7],
                p[8]));
        add("addInInfo", (a, p) -> a.addInInfo(p[0]));
        add("mixtureMolarMass", (a, p) -> a.mixtureMolarMass(r(p[0]), r(p[1]), p[2], p[3]));
        add("blendHeatCapacity", (a, p) -> a.blendHeatCapacity(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5], p[6]));
        add("partialHeatCapacity", (a, p) -> a.partialHeatCapacity(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5],
                p[6], p[7]));
        add("temperaturePath", (a, p) -> a.temperaturePath(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5], p[6],
                p[7], p[8], p[9], p[10], p[11]));
        add("packCard", (a, p) -> a.packCard(r(p[0])));
        add("libraryList", (a, p) -> a.libraryList(p[0]));
        add("libraryCard", (a, p) -> a.libraryCard(r(p[0])));
        add("activityCoefficient", (a, p) -> a.activityCoefficient(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5],
                p[6]));
        add("bubblePressure", (a, p) -> a.bubblePressure(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("vapourFraction", (a, p) -> a.vapourFraction(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5], p[6]));
        add("bubblePoint", (a, p) -> a.bubblePoint(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("dewPoint", (a, p) -> a.dewPoint(r(p[0]), r(p[1]), r(p[2]), p[3]));
        add("relativeVolatility", (a, p) -> a.relativeVolatility(r(p[0]), r(p[1]), r(p[2]), r(p[3]), r(p[4]), p[5],
                p[6], p[7]));
        add("azeotrope", (a, p) -> a.azeotrope(r(p[0]), r(p[1]), p[2], p[3]));
        add("excessGibbs", (a, p) -> a.excessGibbs(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("partialExcessGibbs", (a, p) -> a.partialExcessGibbs(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5],
                p[6]));
        add("fitVapourLiquid", (a, p) -> a.fitVapourLiquid(r(p[0]), p[1], r(p[2]), p[3], r(p[4]), r(p[5]), p[6],
                p[7], p[8], p[9], p[10], p[11], p[12]));
        add("excessEntropy", (a, p) -> a.excessEntropy(r(p[0]), r(p[1]), r(p[2]), p[3], p[4], p[5]));
        add("partialExcessEntropy", (a, p) -> a.partialExcessEntropy(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5],
                p[6]));
        add("infiniteDilutionActivity", (a, p) -> a.infiniteDilutionActivity(r(p[0]), r(p[1]), r(p[2]), r(p[3]),
                p[4], p[5], p[6]));
        add("dewPressure", (a, p) -> a.dewPressure(r(p[0]), r(p[1]), r(p[2]), p[3]));
        add("partialPressure", (a, p) -> a.partialPressure(r(p[0]), r(p[1]), r(p[2]), r(p[3]), p[4], p[5], p[6]));
        add("flashPoint", (a, p) -> a.flashPoint(r(p[0]), r(p[1]), p[2], p[3], p[4], p[5]));
        add("flashMinimum", (a, p) -> a.flashMinimum(r(p[0]), p[1], p[2], p[3]));
        add("freezingPoint", (a, p) -> a.freezingPoint(r(p[0]), r(p[1]), p[2], p[3], p[4], p[5], p[6], p[7]));
    }

    private Explanations() {
    }

    /** The methods MIX.EXPLAIN can run, by IDL name, with their parameter kinds (for the tests). */
    static Map<String, Target> targets() {
        return java.util.Collections.unmodifiableMap(TARGETS);
    }

    /**
     * "OK" when the call of the named function with these arguments gives a result, otherwise the message of its
     * refusal, or the words of its unexpected failure. Throws {@link org.miscela.core.problem.MiscelaException} only when there is no such function or Calc itself
     * would refuse the call: for its number of arguments (Err:504) or a range argument left out (Err:502).
     */
    static String explain(MixtureAddIn addIn, Object name, Object[] arguments) {
        FunctionInfo f = function(name);
        Object[] given = arguments == null ? new Object[0] : arguments;
        Target t = TARGETS.get(f.method());
        if (given.length < t.fewest() || given.length > t.kinds.length()) {
            throw Problem.EXPLAIN_ARGUMENT_COUNT.raise(f.displayName(), count(t.fewest(), t.kinds.length()),
                    f.syntax(), given.length);
        }
        Object[] p = new Object[t.kinds.length()];
        for (int i = 0; i < p.length; i++) {
            Object v = i < given.length ? Arguments.unwrap(given[i]) : null;
            if (t.kinds.charAt(i) == 'R' && v == null) {
                throw Problem.EXPLAIN_RANGE_LEFT_OUT.raise(f.arguments().get(i).displayName(), i + 1,
                        f.displayName());
            }
            p[i] = t.kinds.charAt(i) == 'R' ? asRange(v) : v == null ? Any.VOID : v;
        }
        try {
            t.call.on(addIn, p);
            return CallWarningArguments.summary(f, p);
        } catch (IllegalArgumentException | UnexpectedFailure refused) {
            return refused.getMessage();
        } catch (Exception undeclared) {
            // NoConvergenceException (Err:523): no method declares it, so it can only be caught as an Exception
            if (undeclared instanceof com.sun.star.sheet.NoConvergenceException) {
                return undeclared.getMessage();
            }
            throw undeclared;
        }
    }

    /** The function a name gives, with or without "MIX.", in any case; MIX.EXPLAIN itself is not one. */
    private static FunctionInfo function(Object name) {
        Object v = Arguments.unwrap(name);
        if (v instanceof String) {
            String wanted = ((String) v).trim().toUpperCase(Locale.ROOT);
            for (FunctionInfo f : FunctionCatalog.functions()) {
                String d = f.displayName().toUpperCase(Locale.ROOT);
                if (TARGETS.containsKey(f.method()) && (d.equals(wanted) || d.equals("MIX." + wanted))) {
                    return f;
                }
            }
        }
        StringBuilder names = new StringBuilder();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            if (TARGETS.containsKey(f.method())) {
                names.append(names.length() == 0 ? "" : ", ").append(f.displayName());
            }
        }
        throw Problem.EXPLAIN_UNKNOWN_FUNCTION.raise(v instanceof String ? "\"" + ((String) v).trim() + "\""
                : v == null ? "A left-out name" : Arguments.describe(v), names);
    }

    /** A range parameter's cells: a range as given, a single value as a one-cell range (as Calc passes a cell). */
    private static Object[][] asRange(Object v) {
        if (v instanceof Object[][]) {
            return (Object[][]) v;
        }
        return new Object[][] {{v}};
    }

    private static String count(int fewest, int most) {
        if (fewest == most) {
            return most + (most == 1 ? " argument" : " arguments");
        }
        return fewest + (most == fewest + 1 ? " or " : " to ") + most + " arguments";
    }

    private static Object[][] r(Object v) {
        return (Object[][]) v;
    }
}
