package org.miscela.probe;

import com.sun.star.lang.Locale;
import com.sun.star.lang.XLocalizable;
import com.sun.star.lang.XServiceName;
import com.sun.star.lib.uno.helper.WeakBase;
import com.sun.star.sheet.XAddIn;

/**
 * The same cheapest call as {@link BridgeProbe#echoNumber}, registered through XAddIn (Calc asks the component for
 * its names and help) instead of an XCU file, so the benchmark can compare the two registration styles.
 */
public final class BridgeProbeAddIn extends WeakBase implements XBridgeProbeAddInRoute, XAddIn, XServiceName,
        XLocalizable {
    public static final String SERVICE = "org.miscela.probe.BridgeProbeAddIn";
    private static final String METHOD = "echoViaAddIn";
    private static final String DISPLAY = "PROBE.ECHOADDIN";

    private Locale locale = new Locale("en", "US", "");

    @Override
    public double echoViaAddIn(double value) {
        return value;
    }

    @Override
    public String getProgrammaticFuntionName(String displayName) {
        return DISPLAY.equalsIgnoreCase(displayName) ? METHOD : "";
    }

    @Override
    public String getDisplayFunctionName(String programmaticName) {
        return METHOD.equals(programmaticName) ? DISPLAY : "";
    }

    @Override
    public String getFunctionDescription(String programmaticName) {
        return METHOD.equals(programmaticName) ? "Returns its argument (bridge probe, XAddIn route)." : "";
    }

    @Override
    public String getDisplayArgumentName(String programmaticName, int argument) {
        return METHOD.equals(programmaticName) && argument == 0 ? "value" : "";
    }

    @Override
    public String getArgumentDescription(String programmaticName, int argument) {
        return METHOD.equals(programmaticName) && argument == 0 ? "any number" : "";
    }

    @Override
    public String getProgrammaticCategoryName(String programmaticName) {
        return "Add-In";
    }

    @Override
    public String getDisplayCategoryName(String programmaticName) {
        return "Add-In";
    }

    @Override
    public String getServiceName() {
        return SERVICE;
    }

    @Override
    public void setLocale(Locale value) {
        locale = value;
    }

    @Override
    public Locale getLocale() {
        return locale;
    }
}
