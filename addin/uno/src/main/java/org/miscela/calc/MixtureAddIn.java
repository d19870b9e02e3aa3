package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.lang.XServiceInfo;
import com.sun.star.lib.uno.helper.WeakBase;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.functions.AmountBasis;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardCache;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.CardSanity;
import org.miscela.core.card.PackedCard;
import org.miscela.core.library.CardLibrary;
import org.miscela.core.functions.CheckOutput;
import org.miscela.core.functions.FitFunctions;
import org.miscela.core.functions.FitOutput;
import org.miscela.core.functions.FlashPoints;
import org.miscela.core.functions.PhaseFunctions;
import org.miscela.core.functions.TemperaturePath;
import org.miscela.core.blend.BlendFunctions;
import org.miscela.core.blend.CompositionBasis;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.fit.RedlichKisterFitter;
import org.miscela.core.fit.VleFitter;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The UNO face of the add-in: each method decodes Calc's arguments, calls the core, and encodes the result. Whatever
 * a call throws goes to {@link Failures} by the method's one catch, with the method's IDL name: a refusal becomes an
 * IllegalArgumentException (Err:502), a search that did not converge a NoConvergenceException (Err:523), anything
 * else an {@link UnexpectedFailure} (#VALUE!) whose words MIX.EXPLAIN and MIX.INFO("last failure") give.
 */
public final class MixtureAddIn extends WeakBase implements XMixtureFunctions, XServiceInfo {
    private static final String[] TEMPERATURE = {"temperature"};

    /** The office's factory needs a public no-argument constructor; the add-in keeps no per-instance state. */
    public MixtureAddIn() {
        // every call stands alone
    }

    @Override
    public Object excessMolarVolume(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.excessMolarVolume(k, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "excessMolarVolume");
        }
    }

    @Override
    public Object partialMolarVolume(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.partialMolarVolume(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialMolarVolume");
        }
    }

    @Override
    public Object partialExcessMolarVolume(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.partialExcessMolarVolume(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialExcessMolarVolume");
        }
    }

    @Override
    public Object mixtureMolarVolume(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.molarVolume(k, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "mixtureMolarVolume");
        }
    }

    @Override
    public Object mixtureDensity(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.density(k, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "mixtureDensity");
        }
    }

    @Override
    public Object pureDensity(Object[][] card, Object[][] component, Object[][] temperature, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.broadcast(c, TEMPERATURE, new Object[][][] {temperature},
                    (k, p) -> CardFunctions.pureDensity(k, i, p[0], e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "pureDensity");
        }
    }

    @Override
    public Object checkCard(Object[][] card, Object result) {
        try {
            CheckOutput output = Arguments.checkOutput(result);
            Object[][] cells = PackedCard.cellsOf(card);
            if (output == CheckOutput.EXTENT) {
                return CardSanity.extent(cells).words(); // needs no readable card
            }
            Object answer = CardFunctions.checkCard(cells, Arguments.card(card), output);
            return answer instanceof Object[][] ? Arguments.table((Object[][]) answer) : answer;
        } catch (RuntimeException ex) {
            return Failures.words(ex, "checkCard");
        }
    }

    @Override
    public String checkPoint(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return CardFunctions.check(c, BasisArguments.singleComposition(c, "composition", moleFraction,
                    BasisArguments.basis(c, basis, basisTemperature), e),
                    Arguments.single("temperature", temperature), e);
        } catch (RuntimeException ex) {
            return Failures.words(ex, "checkPoint");
        }
    }

    @Override
    public Object excessEnthalpy(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.excessEnthalpy(k, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "excessEnthalpy");
        }
    }

    @Override
    public Object partialExcessEnthalpy(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.partialExcessEnthalpy(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialExcessEnthalpy");
        }
    }

    @Override
    public Object mixingHeat(Object[][] card, Object[][] amounts, Object[][] temperature, Object basis,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            AmountBasis b = Arguments.basis(basis);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return CompositionArguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> CardFunctions.mixingHeat(k, n, b, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "mixingHeat");
        }
    }

    @Override
    public Object additionHeat(Object[][] card, Object[][] amounts, Object[][] component, Object[][] added,
            Object[][] temperature, Object basis, Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            double more = Arguments.number("amount added", Arguments.value(added));
            AmountBasis b = Arguments.basis(basis);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return CompositionArguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> CardFunctions.additionHeat(k, n, i, more, b, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "additionHeat");
        }
    }

    @Override
    public Object adiabaticRise(Object[][] card, Object[][] amounts, Object[][] temperature, Object basis,
            Object extrapolate, Object boiling) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            AmountBasis b = Arguments.basis(basis);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            boolean boils = Arguments.flag("boiling argument", boiling, false);
            return CompositionArguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> CardFunctions.adiabaticRise(k, n, b, t, e, boils));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "adiabaticRise");
        }
    }

    @Override
    public Object insideValidity(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object basis,
            Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), Extrapolation.ALLOW, CardFunctions::inside);
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "insideValidity");
        }
    }

    @Override
    public Object traceEvaluation(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object quantity,
            Object extrapolate, Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            CompositionBasis b = BasisArguments.basis(c, basis, basisTemperature);
            return Arguments.table(BlendFunctions.traced(c, CardFunctions.trace(c,
                    BasisArguments.singleComposition(c, "composition", moleFraction, b, e),
                    Arguments.single("temperature", temperature), Arguments.property(quantity), e), b));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "traceEvaluation");
        }
    }

    @Override
    public Object fitExcessVolume(Object[][] moleFraction, Object[][] excessVolume, Object[][] order,
            Object temperature, Object orderInTemperature, Object referenceTemperature, Object weights, Object result)
            throws IllegalArgumentException {
        try {
            FitOutput output = Arguments.fitOutput(result);
            int m = Arguments.requiredCount("order", Arguments.value(order), RedlichKisterFitter.MAX_ORDER_IN_X);
            int mt = Arguments.count("order in T", orderInTemperature, RedlichKisterFitter.MAX_ORDER_IN_T, 0);
            double[][] d = DataArguments.dataColumns(new String[] {"mole fraction", "excess volume", "temperature",
                "weight"}, new Object[][][] {moleFraction, excessVolume, Arguments.optionalRange(temperature),
                    Arguments.optionalRange(weights)}, new boolean[] {false, false, false, false});
            return Arguments.table(FitFunctions.excess(d[0], d[1], m, d[2], mt,
                    Arguments.optionalNumber("reference temperature", referenceTemperature), d[3], output));
        } catch (RuntimeException ex) {
            return checkOrRefuse(result, ex, "fitExcessVolume");
        }
    }

    @Override
    public Object fitDensity(Object[][] pure, Object pair, Object[][] moleFraction, Object[][] density,
            Object[][] temperature, Object[][] order, Object orderInTemperature, Object referenceTemperature,
            Object weights, Object result) throws IllegalArgumentException {
        try {
            FitOutput output = Arguments.fitOutput(result);
            Card c = CardReader.readPureComponents(pure);
            int[] p = Arguments.pair(c, pair);
            int m = Arguments.requiredCount("order", Arguments.value(order), RedlichKisterFitter.MAX_ORDER_IN_X);
            int mt = Arguments.count("order in T", orderInTemperature, RedlichKisterFitter.MAX_ORDER_IN_T, 0);
            double[][] d = DataArguments.dataColumns(new String[] {"mole fraction", "density", "temperature", "weight"},
                    new Object[][][] {moleFraction, density, temperature, Arguments.optionalRange(weights)},
                    new boolean[] {false, false, true, false});
            return Arguments.table(FitFunctions.density(c, p[0], p[1], d[0], d[1], d[2], m, mt,
                    Arguments.optionalNumber("reference temperature", referenceTemperature), d[3], output));
        } catch (RuntimeException ex) {
            return checkOrRefuse(result, ex, "fitDensity");
        }
    }

    @Override
    public Object leastSquares(Object[][] design, Object[][] response, Object weights, Object result)
            throws IllegalArgumentException {
        try {
            Object[][] w = Arguments.optionalRange(weights);
            return Arguments.table(FitFunctions.leastSquares(DataArguments.numbers("design", design),
                    DataArguments.values("response", response), w == null ? null : DataArguments.values("weights", w),
                    Arguments.fitOutput(result)));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "leastSquares");
        }
    }

    @Override
    public Object uncertainty(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object quantity,
            Object component, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            String q = Arguments.text("quantity", quantity, "density");
            int i = Arguments.unwrap(component) == null ? -1 : Arguments.component(c, component);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.uncertainty(k, q, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "uncertainty");
        }
    }

    @Override
    public Object convertComposition(Object[][] card, Object[][] values, Object[][] from, Object[][] to,
            Object temperature, Object targetTemperature, Object balance, Object extrapolate, Object component)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int pick = Arguments.optionalComponent(c, component, -1);
            int b = Arguments.optionalComponent(c, balance, BlendFunctions.DEFAULT_BALANCE);
            double t = Arguments.optionalNumber("temperature", temperature);
            double tTo = Arguments.optionalNumber("to temperature", targetTemperature);
            CompositionBasis in = BlendFunctions.basis(c, Arguments.text("from", Arguments.value(from), ""), t, b);
            CompositionBasis out = BlendFunctions.basis(c, Arguments.text("to", Arguments.value(to), ""),
                    Double.isNaN(tTo) ? t : tTo, b);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            // Each basis carries its own temperature, so the lines need none of their own (0 is never read).
            return CompositionArguments.overValueLines(c, "values", values, new Object[][] {{0.0}},
                    v -> BlendFunctions.binary(c, v, in), true, pick,
                    (v, unused) -> BlendFunctions.convert(c, v, in, out, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "convertComposition");
        }
    }

    @Override
    public Object batchTotals(Object[][] card, Object[][] amounts, Object[][] unit, Object[][] temperature,
            Object result, Object resultUnit, Object storageTemperatures, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            String u = Arguments.text("unit", Arguments.value(unit), null);
            String r = Arguments.text("result", result, null);
            String ru = Arguments.text("result unit", resultUnit, null);
            double[] storage = CompositionArguments.optionalLine(c, "storage temperatures", storageTemperatures);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return CompositionArguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> BlendFunctions.batch(k, n, u, storage, t, r, ru, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "batchTotals");
        }
    }

    @Override
    public Object recipe(Object[][] card, Object[][] quantity, Object[][] unit, Object[][] composition,
            Object[][] basis, Object[][] temperature, Object storageTemperatures, Object resultUnit, Object balance,
            Object extrapolate, Object component, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int pick = Arguments.optionalComponent(c, component, -1);
            double q = Arguments.number("quantity", Arguments.value(quantity));
            String u = Arguments.text("unit", Arguments.value(unit), null);
            double t = Arguments.number("temperature", Arguments.value(temperature));
            CompositionBasis in = BlendFunctions.basis(c, Arguments.text("basis", Arguments.value(basis), ""),
                    Arguments.optionalNumber("basis temperature", basisTemperature),
                    Arguments.optionalComponent(c, balance, BlendFunctions.DEFAULT_BALANCE));
            double[] storage = CompositionArguments.optionalLine(c, "storage temperatures", storageTemperatures);
            String ru = Arguments.text("result unit", resultUnit, null);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return CompositionArguments.overValueLines(c, "composition", composition, new Object[][] {{t}},
                    v -> BlendFunctions.binary(c, v, in), false, pick,
                    (v, at) -> BlendFunctions.recipe(c, q, u, at, v, in, storage, ru, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "recipe");
        }
    }

    @Override
    public Object adjustBatch(Object[][] card, Object[][] amounts, Object[][] unit, Object[][] target,
            Object[][] basis, Object[][] temperature, Object mode, Object limit, Object limitUnit, Object result,
            Object resultUnit, Object balance, Object extrapolate, Object component, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int pick = Arguments.optionalComponent(c, component, -1);
            String what = Arguments.text("result", result, null);
            if (pick >= 0 && what != null && !what.trim().equalsIgnoreCase("additions")) {
                // one value for the whole batch: refused before the batch is worked out
                throw Problem.COMPONENT_NOT_HERE.raise(what);
            }
            double t = Arguments.number("temperature", Arguments.value(temperature));
            CompositionBasis in = BlendFunctions.basis(c, Arguments.text("basis", Arguments.value(basis), ""),
                    Arguments.optionalNumber("basis temperature", basisTemperature),
                    Arguments.optionalComponent(c, balance, BlendFunctions.DEFAULT_BALANCE));
            double[] batch = CompositionArguments.singleComposition(c, "amounts", amounts);
            double[] goal = CompositionArguments.optionalLine(c, "target", target);
            if (goal.length == 1) {
                goal = BlendFunctions.binary(c, goal[0], in);
            }
            Object r = BlendFunctions.adjust(c, batch, Arguments.text("unit", Arguments.value(unit), null), null, goal,
                    in, t,
                    Arguments.text("mode", mode, null), Arguments.optionalNumber("limit", limit),
                    Arguments.text("limit unit", limitUnit, null), Arguments.text("result", result, null),
                    Arguments.text("result unit", resultUnit, null), Arguments.extrapolation(extrapolate));
            if (pick >= 0 && !(r instanceof double[])) {
                throw Problem.COMPONENT_NOT_HERE.raise(Arguments.text("result", result, "additions"));
            }
            return r instanceof double[] ? CompositionArguments.perComponent(c, amounts, (double[]) r, pick)
                    : r instanceof Double ? Arguments.finite((Double) r) : r;
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "adjustBatch");
        }
    }

    @Override
    public Object additionVolume(Object[][] card, Object[][] amounts, Object[][] unit, Object[][] component,
            Object[][] added, Object[][] temperature, Object result, Object resultUnit, Object storageTemperatures,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            String u = Arguments.text("unit", Arguments.value(unit), null);
            return Arguments.finite(BlendFunctions.additionVolume(c,
                    CompositionArguments.singleComposition(c, "amounts", amounts), u,
                    CompositionArguments.optionalLine(c, "storage temperatures", storageTemperatures),
                    Arguments.component(c, Arguments.value(component)),
                    Arguments.number("amount added", Arguments.value(added)), u,
                    Arguments.number("temperature", Arguments.value(temperature)), Arguments.text("result", result, null),
                    Arguments.text("result unit", resultUnit, null), Arguments.extrapolation(extrapolate)));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "additionVolume");
        }
    }

    @Override
    public Object compositionFromDensity(Object[][] card, Object[][] density, Object[][] temperature,
            Object component, Object basis, Object basisTemperature, Object reference, Object from, Object to,
            Object balance, Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int k = Arguments.optionalComponent(c, component, 0);
            int b = Arguments.optionalComponent(c, balance, BlendFunctions.DEFAULT_BALANCE);
            String basisText = Arguments.text("basis", basis, "mole fraction");
            double tb = Arguments.optionalNumber("basis temperature", basisTemperature);
            double[] ref = CompositionArguments.optionalLine(c, "reference", reference);
            double lo = Arguments.optionalNumber("from", from);
            double hi = Arguments.optionalNumber("to", to);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.broadcast(c, new String[] {"density", "temperature"},
                    new Object[][][] {density, temperature}, (card1, p) -> BlendFunctions.fromDensity(card1, p[0],
                            p[1], k, ref, lo, hi, BlendFunctions.basis(card1, basisText, tb, b), e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "compositionFromDensity");
        }
    }

    @Override
    public Object volumeCorrection(Object[][] card, Object[][] composition, Object[][] basis, Object[][] temperature,
            Object[][] referenceTemperature, Object result, Object basisTemperature, Object balance,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            double tRef = Arguments.number("reference temperature", Arguments.value(referenceTemperature));
            double tb = Arguments.optionalNumber("basis temperature", basisTemperature);
            CompositionBasis in = BlendFunctions.basis(c, Arguments.text("basis", Arguments.value(basis), ""),
                    tb, Arguments.optionalComponent(c, balance,
                    BlendFunctions.DEFAULT_BALANCE));
            String r = Arguments.text("result", result, null);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return CompositionArguments.overValueLines(c, "composition", composition, temperature,
                    v -> BlendFunctions.binary(c, v, in), true,
                    (v, t) -> new double[] {BlendFunctions.volumeCorrection(c, v, in, t, tRef, r, e)});
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "volumeCorrection");
        }
    }

    @Override
    public String explainCall(Object[][] functionName, Object[] arguments) {
        try {
            return Explanations.explain(this, Arguments.value(functionName), arguments);
        } catch (RuntimeException ex) {
            return Failures.words(ex, "explainCall");
        }
    }

    /** A fit's problem: its words when the "check" result was asked for, a refusal (Err:502) otherwise. */
    private static Object checkOrRefuse(Object result, RuntimeException ex, String method)
            throws IllegalArgumentException {
        boolean check;
        try {
            check = Arguments.fitOutput(result) == FitOutput.CHECK;
        } catch (MiscelaException unknown) {
            check = false;
        }
        if (check) {
            return Failures.words(ex, method);
        }
        throw Failures.refusal(ex, method);
    }

    @Override
    public Object addInInfo(Object item) throws IllegalArgumentException {
        try {
            String what = Arguments.text("item", item, "version").trim().toLowerCase(java.util.Locale.ROOT);
            switch (what) {
                case "version":
                    return FunctionCatalog.VERSION;
                case "card reads":
                    return (double) CardCache.shared().parseCount();
                case "cards kept":
                    return (double) CardCache.shared().size();
                case "last failure":
                    return Failures.last();
                default:
                    throw Problem.UNKNOWN_INFO_ITEM.raise(what, "version, card reads, cards kept, last failure");
            }
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "addInInfo");
        }
    }

    @Override
    public Object mixtureMolarMass(Object[][] card, Object[][] moleFraction, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            // no temperature: each composition is paired with 0, which the molar mass never reads
            return BasisArguments.overCompositions(c, moleFraction, new Object[][] {{0.0}},
                    BasisArguments.basis(c, basis, basisTemperature), Extrapolation.AS_CARD,
                    (k, x, unused) -> CardFunctions.meanMolarMass(k, x));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "mixtureMolarMass");
        }
    }

    @Override
    public Object blendHeatCapacity(Object[][] card, Object[][] moleFraction, Object[][] temperature,
            Object extrapolate, Object basis, Object basisTemperature, Object per) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            boolean perMass = Arguments.perMass(per);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.heatCapacity(k, x, t, e, perMass));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "blendHeatCapacity");
        }
    }

    @Override
    public Object partialHeatCapacity(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature, Object per)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            boolean perMass = Arguments.perMass(per);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> CardFunctions.partialHeatCapacity(k, i, x, t, e, perMass));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialHeatCapacity");
        }
    }

    @Override
    public Object temperaturePath(Object[][] card, Object[][] charges, Object[][] amounts, Object[][] temperature,
            Object basis, Object extrapolate, Object result, Object steps, Object vesselHeatCapacity,
            Object heatRemoved, Object boiling, Object limit) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int[] order = DataArguments.components(c, "charges", charges);
            double[] n = DataArguments.values("amounts", amounts);
            if (n.length != order.length) {
                throw Problem.DATA_LENGTH.raise("amounts", n.length, "charges", order.length);
            }
            double[] t = DataArguments.values("temperature", temperature);
            if (t.length != 1 && t.length != order.length) {
                throw Problem.DATA_LENGTH.raise("temperature", t.length, "charges", order.length);
            }
            double[] feeds = t.length == 1 ? filled(order.length, t[0]) : t;
            String output = Arguments.text("result", result, TemperaturePath.Output.PATH.word());
            return pathResult(CardFunctions.temperaturePath(c, order, n, Arguments.basis(basis), feeds,
                    Arguments.extrapolation(extrapolate), TemperaturePath.Output.lookup(output),
                    Arguments.count("steps", steps, TemperaturePath.MOST_STEPS, 20),
                    zeroIfLeftOut("vessel heat capacity", vesselHeatCapacity),
                    zeroIfLeftOut("heat removed", heatRemoved), Arguments.flag("boiling argument", boiling, false),
                    Arguments.optionalNumber("limit", limit)));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "temperaturePath");
        }
    }

    @Override
    public Object packCard(Object[][] card) throws IllegalArgumentException {
        try {
            Arguments.card(card); // a card that does not read is refused with its own problem, never packed
            return PackedCard.pack(PackedCard.cellsOf(card));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "packCard");
        }
    }

    @Override
    public Object libraryList(Object find) throws IllegalArgumentException {
        try {
            return Arguments.table(CardLibrary.table(Arguments.text("find", find, "")));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "libraryList");
        }
    }

    @Override
    public Object libraryCard(Object[][] name) throws IllegalArgumentException {
        try {
            return Arguments.table(CardLibrary.find(Arguments.text("card's name", Arguments.value(name), "")).cells());
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "libraryCard");
        }
    }

    @Override
    public Object activityCoefficient(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.activityCoefficient(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "activityCoefficient");
        }
    }

    @Override
    public Object bubblePressure(Object[][] card, Object[][] moleFraction, Object[][] temperature,
            Object extrapolate, Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.bubblePressure(k, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "bubblePressure");
        }
    }

    @Override
    public Object vapourFraction(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.vapourFraction(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "vapourFraction");
        }
    }

    @Override
    public Object bubblePoint(Object[][] card, Object[][] moleFraction, Object[][] pressure, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            // the pressures pair with the compositions as temperatures do elsewhere
            return BasisArguments.overCompositions(c, moleFraction, pressure, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, p) -> PhaseFunctions.bubblePoint(k, x, p, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "bubblePoint");
        }
    }

    @Override
    public Object dewPoint(Object[][] card, Object[][] vapourComposition, Object[][] pressure, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            // a vapour composition is read as mole fractions only: no liquid basis applies to it
            return CompositionArguments.overCompositions(c, vapourComposition, pressure,
                    (k, y, p) -> PhaseFunctions.dewPoint(k, y, p, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "dewPoint");
        }
    }

    @Override
    public Object relativeVolatility(Object[][] card, Object[][] component, Object[][] reference,
            Object[][] moleFraction, Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            int j = Arguments.component(c, Arguments.value(reference));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.relativeVolatility(k, i, j, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "relativeVolatility");
        }
    }

    @Override
    public Object azeotrope(Object[][] card, Object[][] pressure, Object result, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            double p = Arguments.number("pressure", Arguments.value(pressure));
            boolean temperature = keyword("result", result, "composition", "temperature") == 1;
            return PhaseFunctions.azeotrope(c, p, temperature, Arguments.extrapolation(extrapolate));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "azeotrope");
        }
    }

    @Override
    public Object excessGibbs(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.excessGibbs(k, -1, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "excessGibbs");
        }
    }

    @Override
    public Object partialExcessGibbs(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.excessGibbs(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialExcessGibbs");
        }
    }

    @Override
    public Object fitVapourLiquid(Object[][] pure, Object pair, Object[][] moleFraction, Object vapourFraction,
            Object[][] temperature, Object[][] pressure, Object model, Object order, Object orderInTemperature,
            Object referenceTemperature, Object alpha, Object weights, Object result) throws IllegalArgumentException {
        try {
            FitOutput output = Arguments.fitOutput(result);
            Card c = CardReader.readPureComponents(pure);
            int[] p = Arguments.pair(c, pair);
            VleFitter.Model m = VleFitter.Model.lookup(Arguments.text("model", model, "Redlich-Kister"));
            int k = Arguments.count("order", order, RedlichKisterFitter.MAX_ORDER_IN_X, -1);
            int mt = Arguments.count("order in T", orderInTemperature, RedlichKisterFitter.MAX_ORDER_IN_T, 0);
            double a = Arguments.unwrap(alpha) == null ? FitFunctions.DEFAULT_NRTL_ALPHA
                    : Arguments.optionalNumber("alpha", alpha);
            double[][] d = DataArguments.dataColumns(new String[] {"mole fraction", "vapour mole fraction",
                "temperature", "pressure", "weight"}, new Object[][][] {moleFraction,
                    Arguments.optionalRange(vapourFraction), temperature, pressure, Arguments.optionalRange(weights)},
                    new boolean[] {false, false, true, true, false});
            return Arguments.table(FitFunctions.vle(c, p[0], p[1], d[0], d[1], d[2], d[3], m, k, mt,
                    Arguments.optionalNumber("reference temperature", referenceTemperature), a, d[4], output));
        } catch (RuntimeException ex) {
            return checkOrRefuse(result, ex, "fitVapourLiquid");
        }
    }

    @Override
    public Object excessEntropy(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.excessEntropy(k, -1, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "excessEntropy");
        }
    }

    @Override
    public Object partialExcessEntropy(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.excessEntropy(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialExcessEntropy");
        }
    }

    @Override
    public Object infiniteDilutionActivity(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.infiniteDilutionActivity(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "infiniteDilutionActivity");
        }
    }

    @Override
    public Object dewPressure(Object[][] card, Object[][] vapourComposition, Object[][] temperature,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            // a vapour composition is read as mole fractions only: no liquid basis applies to it
            return CompositionArguments.overCompositions(c, vapourComposition, temperature,
                    (k, y, t) -> PhaseFunctions.dewPressure(k, y, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "dewPressure");
        }
    }

    @Override
    public Object partialPressure(Object[][] card, Object[][] component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, Arguments.value(component));
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return BasisArguments.overCompositions(c, moleFraction, temperature, BasisArguments.basis(c, basis,
                    basisTemperature), e, (k, x, t) -> PhaseFunctions.partialPressure(k, i, x, t, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "partialPressure");
        }
    }

    @Override
    public Object flashPoint(Object[][] card, Object[][] moleFraction, Object activity, Object extrapolate,
            Object basis, Object basisTemperature) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            boolean ideal = Arguments.idealActivity(activity);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            // no temperature: each composition is paired with 0, which the search never reads
            return BasisArguments.overCompositions(c, moleFraction, new Object[][] {{0.0}},
                    BasisArguments.basis(c, basis, basisTemperature), e,
                    (k, x, unused) -> FlashPoints.flashPoint(k, x, ideal, e));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "flashPoint");
        }
    }

    @Override
    public Object flashMinimum(Object[][] card, Object result, Object activity, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            boolean temperature = keyword("result", result, "composition", "temperature") == 1;
            return FlashPoints.minimum(c, temperature, Arguments.idealActivity(activity),
                    Arguments.extrapolation(extrapolate));
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "flashMinimum");
        }
    }

    @Override
    public Object freezingPoint(Object[][] card, Object[][] moleFraction, Object component, Object activity,
            Object result, Object extrapolate, Object basis, Object basisTemperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.optionalComponent(c, component, -1);
            PhaseFunctions.Activity a = Arguments.idealActivity(activity) ? PhaseFunctions.Activity.IDEAL
                    : PhaseFunctions.Activity.CARD;
            boolean which = keyword("result", result, "temperature", "component") == 1;
            Extrapolation e = Arguments.extrapolation(extrapolate);
            // no temperature is given: a one-cell placeholder stands where the other functions take it
            return BasisArguments.overCompositions(c, moleFraction, new Object[][] {{0.0}},
                    BasisArguments.basis(c, basis, basisTemperature), e, (k, x, t) -> {
                        double freezing = PhaseFunctions.freezingPoint(k, i, x, a, e);
                        return which ? PhaseFunctions.freezingComponent(k, i, x, a) + 1 : freezing;
                    });
        } catch (RuntimeException ex) {
            throw Failures.refusal(ex, "freezingPoint");
        }
    }

    /** The index of a keyword argument among its choices (0, the first, when left out or blank). */
    private static int keyword(String what, Object value, String... choices) {
        String v = Arguments.text(what, value, choices[0]).trim().toLowerCase(java.util.Locale.ROOT);
        for (int j = 0; j < choices.length; j++) {
            if (v.isEmpty() || v.equals(choices[j])) {
                return v.isEmpty() ? 0 : j;
            }
        }
        throw Problem.UNKNOWN_RESULT.raise(v, String.join(", ", choices));
    }

    /** The path's rows as a range, or its peak, the amount at the peak or its end as a number. */
    private static Object pathResult(Object result) {
        if (result instanceof double[][]) {
            double[][] rows = (double[][]) result;
            Object[][] out = new Object[rows.length][];
            for (int r = 0; r < rows.length; r++) {
                out[r] = new Object[] {rows[r][0], rows[r][1]};
            }
            return Arguments.table(out);
        }
        return Arguments.finite((Double) result);
    }

    private static double[] filled(int n, double v) {
        double[] out = new double[n];
        java.util.Arrays.fill(out, v);
        return out;
    }

    private static double zeroIfLeftOut(String what, Object value) {
        double v = Arguments.optionalNumber(what, value);
        return Double.isNaN(v) ? 0.0 : v;
    }

    // --- XServiceInfo

    @Override
    public String getImplementationName() {
        return MixtureAddIn.class.getName();
    }

    @Override
    public boolean supportsService(String name) {
        return FunctionCatalog.SERVICE.equals(name);
    }

    @Override
    public String[] getSupportedServiceNames() {
        return new String[] {FunctionCatalog.SERVICE};
    }
}
