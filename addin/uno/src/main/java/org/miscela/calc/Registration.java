package org.miscela.calc;

import com.sun.star.lang.XSingleComponentFactory;
import com.sun.star.lib.uno.helper.Factory;
import org.miscela.core.catalog.FunctionCatalog;

/** Named by the jar manifest's RegistrationClassName: the office asks it for the component's factory. */
public final class Registration {
    private Registration() {
    }

    public static XSingleComponentFactory __getComponentFactory(String implementationName) {
        if (MixtureAddIn.class.getName().equals(implementationName)) {
            return Factory.createComponentFactory(MixtureAddIn.class, new String[] {FunctionCatalog.SERVICE});
        }
        return null;
    }
}
