package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.lang.XServiceInfo;
import com.sun.star.lib.uno.helper.WeakBase;
import org.miscela.calc.meta.FunctionCatalog;
import org.miscela.core.AmountBasis;
import org.miscela.core.Card;
import org.miscela.core.CardReader;
import org.miscela.core.FitFunctions;
import org.miscela.core.FitOutput;
import org.miscela.core.fit.FitException;
import org.miscela.core.CardFunctions;
import org.miscela.core.Extrapolation;
import org.miscela.core.MiscelaException;

/**
 * The UNO face of the add-in: each method decodes Calc's arguments, calls the core, and encodes the result.
 * A {@link MiscelaException} becomes an IllegalArgumentException, which Calc shows as Err:502.
 */
public final class MixtureAddIn extends WeakBase implements XMixtureFunctions, XServiceInfo {
    private static final String[] TEMPERATURE = {"temperature"};

    /** The office's factory needs a public no-argument constructor; the add-in keeps no per-instance state. */
    public MixtureAddIn() {
        // every call stands alone
    }

    @Override
    public Object excessMolarVolume(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.excessMolarVolume(k, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object partialMolarVolume(Object[][] card, Object component, Object[][] moleFraction, Object[][] temperature,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, component);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.partialMolarVolume(k, i, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object partialExcessMolarVolume(Object[][] card, Object component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, component);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.partialExcessMolarVolume(k, i, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object mixtureMolarVolume(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.molarVolume(k, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object mixtureDensity(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.density(k, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object pureDensity(Object[][] card, Object component, Object[][] temperature, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, component);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.broadcast(c, TEMPERATURE, new Object[][][] {temperature},
                    (k, p) -> CardFunctions.pureDensity(k, i, p[0], e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public String checkCard(Object[][] card) {
        try {
            return CardFunctions.check(Arguments.card(card), Double.NaN, Double.NaN, Extrapolation.AS_CARD);
        } catch (MiscelaException ex) {
            return ex.getMessage();
        }
    }

    @Override
    public String checkPoint(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate) {
        try {
            Card c = Arguments.card(card);
            return CardFunctions.check(c, Arguments.singleComposition(c, "composition", moleFraction),
                    Arguments.single("temperature", temperature), Arguments.extrapolation(extrapolate));
        } catch (MiscelaException ex) {
            return ex.getMessage();
        }
    }

    @Override
    public Object excessEnthalpy(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object extrapolate)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.excessEnthalpy(k, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object partialExcessEnthalpy(Object[][] card, Object component, Object[][] moleFraction,
            Object[][] temperature, Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, component);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.partialExcessEnthalpy(k, i, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object mixingHeat(Object[][] card, Object[][] amounts, Object[][] temperature, Object basis,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            AmountBasis b = Arguments.basis(basis);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> CardFunctions.mixingHeat(k, n, b, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object additionHeat(Object[][] card, Object[][] amounts, Object component, Object added,
            Object[][] temperature, Object basis, Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            int i = Arguments.component(c, component);
            double more = Arguments.number("amount added", added);
            AmountBasis b = Arguments.basis(basis);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> CardFunctions.additionHeat(k, n, i, more, b, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object adiabaticRise(Object[][] card, Object[][] amounts, Object[][] temperature, Object basis,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            AmountBasis b = Arguments.basis(basis);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overRows(c, "amount", amounts, temperature,
                    (k, n, t) -> CardFunctions.adiabaticRise(k, n, b, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object insideValidity(Object[][] card, Object[][] moleFraction, Object[][] temperature)
            throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            return Arguments.overCompositions(c, moleFraction, temperature, CardFunctions::inside);
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object traceEvaluation(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object quantity,
            Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            return Arguments.table(CardFunctions.trace(c, Arguments.singleComposition(c, "composition", moleFraction),
                    Arguments.single("temperature", temperature), Arguments.property(quantity),
                    Arguments.extrapolation(extrapolate)));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object fitExcessVolume(Object[][] moleFraction, Object[][] excessVolume, Object order, Object temperature,
            Object orderInTemperature, Object referenceTemperature, Object weights, Object result)
            throws IllegalArgumentException {
        try {
            FitOutput output = Arguments.fitOutput(result);
            int m = Arguments.count("order", order, MAX_ORDER_IN_X, -1);
            int mt = Arguments.count("order in T", orderInTemperature, MAX_ORDER_IN_T, 0);
            double[][] d = Arguments.dataColumns(new String[] {"mole fraction", "excess volume", "temperature",
                "weight"}, new Object[][][] {moleFraction, excessVolume, Arguments.optionalRange(temperature),
                    Arguments.optionalRange(weights)}, new boolean[] {false, false, false, false});
            return Arguments.table(FitFunctions.excess(d[0], d[1], m, d[2], mt,
                    Arguments.optionalNumber("reference temperature", referenceTemperature), d[3], output));
        } catch (MiscelaException | FitException ex) {
            return checkOrRefuse(result, ex);
        }
    }

    @Override
    public Object fitDensity(Object[][] pure, Object pair, Object[][] moleFraction, Object[][] density,
            Object[][] temperature, Object order, Object orderInTemperature, Object referenceTemperature,
            Object weights, Object result) throws IllegalArgumentException {
        try {
            FitOutput output = Arguments.fitOutput(result);
            Card c = CardReader.readPureComponents(pure);
            int[] p = Arguments.pair(c, pair);
            int m = Arguments.count("order", order, MAX_ORDER_IN_X, -1);
            int mt = Arguments.count("order in T", orderInTemperature, MAX_ORDER_IN_T, 0);
            double[][] d = Arguments.dataColumns(new String[] {"mole fraction", "density", "temperature", "weight"},
                    new Object[][][] {moleFraction, density, temperature, Arguments.optionalRange(weights)},
                    new boolean[] {false, false, true, false});
            return Arguments.table(FitFunctions.density(c, p[0], p[1], d[0], d[1], d[2], m, mt,
                    Arguments.optionalNumber("reference temperature", referenceTemperature), d[3], output));
        } catch (MiscelaException | FitException ex) {
            return checkOrRefuse(result, ex);
        }
    }

    @Override
    public Object leastSquares(Object[][] design, Object[][] response, Object weights, Object result)
            throws IllegalArgumentException {
        try {
            Object[][] w = Arguments.optionalRange(weights);
            return Arguments.table(FitFunctions.leastSquares(Arguments.numbers("design", design),
                    Arguments.values("response", response), w == null ? null : Arguments.values("weights", w),
                    Arguments.fitOutput(result)));
        } catch (MiscelaException | FitException ex) {
            throw refused(ex);
        }
    }

    @Override
    public Object uncertainty(Object[][] card, Object[][] moleFraction, Object[][] temperature, Object quantity,
            Object component, Object extrapolate) throws IllegalArgumentException {
        try {
            Card c = Arguments.card(card);
            String q = Arguments.text("quantity", quantity, "density");
            int i = Arguments.unwrap(component) == null ? -1 : Arguments.component(c, component);
            Extrapolation e = Arguments.extrapolation(extrapolate);
            return Arguments.overCompositions(c, moleFraction, temperature,
                    (k, x, t) -> CardFunctions.uncertainty(k, q, i, x, t, e));
        } catch (MiscelaException ex) {
            throw refused(ex);
        }
    }

    /** A fit's problem: the message itself when the "check" result was asked for, Err:502 otherwise. */
    private static Object checkOrRefuse(Object result, RuntimeException ex) throws IllegalArgumentException {
        boolean check;
        try {
            check = Arguments.fitOutput(result) == FitOutput.CHECK;
        } catch (MiscelaException unknown) {
            check = false;
        }
        if (check) {
            return ex.getMessage();
        }
        throw refused(ex);
    }

    /** The fit engine's limits on the orders (beyond them the power basis is too ill-conditioned). */
    private static final int MAX_ORDER_IN_X = 30;
    private static final int MAX_ORDER_IN_T = 10;

    private static IllegalArgumentException refused(RuntimeException ex) {
        return new IllegalArgumentException(ex.getMessage());
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
