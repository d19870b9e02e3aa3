package org.miscela.probe;

import com.sun.star.lang.XSingleComponentFactory;
import com.sun.star.lib.uno.helper.Factory;

/** Named by the probe jar's RegistrationClassName. */
public final class Registration {
    private Registration() {
    }

    public static XSingleComponentFactory __getComponentFactory(String implementationName) {
        if (BridgeProbe.class.getName().equals(implementationName)) {
            return Factory.createComponentFactory(BridgeProbe.class, new String[] {BridgeProbe.SERVICE});
        }
        if (BridgeProbeAddIn.class.getName().equals(implementationName)) {
            return Factory.createComponentFactory(BridgeProbeAddIn.class,
                    new String[] {BridgeProbeAddIn.SERVICE, "com.sun.star.sheet.AddIn"});
        }
        return null;
    }
}
