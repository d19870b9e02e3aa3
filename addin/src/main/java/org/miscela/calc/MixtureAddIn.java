package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.lang.XServiceInfo;
import com.sun.star.lib.uno.helper.WeakBase;
import org.miscela.calc.meta.FunctionCatalog;
import org.miscela.core.Card;
import org.miscela.core.CardFunctions;
import org.miscela.core.Extrapolation;
import org.miscela.core.MiscelaException;

/**
 * The UNO face of the add-in: each method decodes Calc's arguments, calls the core, and encodes the result.
 * A {@link MiscelaException} becomes an IllegalArgumentException, which Calc shows as Err:502.
 */
public final class MixtureAddIn extends WeakBase implements XMixtureFunctions, XServiceInfo {
    private static final String[] POINT = {"mole fraction", "temperature"};
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
            return Arguments.broadcast(c, POINT, new Object[][][] {moleFraction, temperature},
                    (k, p) -> CardFunctions.excessMolarVolume(k, p[0], p[1], e));
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
            return Arguments.broadcast(c, POINT, new Object[][][] {moleFraction, temperature},
                    (k, p) -> CardFunctions.partialMolarVolume(k, i, p[0], p[1], e));
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
            return Arguments.broadcast(c, POINT, new Object[][][] {moleFraction, temperature},
                    (k, p) -> CardFunctions.partialExcessMolarVolume(k, i, p[0], p[1], e));
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
            return Arguments.broadcast(c, POINT, new Object[][][] {moleFraction, temperature},
                    (k, p) -> CardFunctions.molarVolume(k, p[0], p[1], e));
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
            return Arguments.broadcast(c, POINT, new Object[][][] {moleFraction, temperature},
                    (k, p) -> CardFunctions.density(k, p[0], p[1], e));
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
            return CardFunctions.check(Arguments.card(card), Arguments.single("mole fraction", moleFraction),
                    Arguments.single("temperature", temperature), Arguments.extrapolation(extrapolate));
        } catch (MiscelaException ex) {
            return ex.getMessage();
        }
    }

    private static IllegalArgumentException refused(MiscelaException ex) {
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
