package org.miscela.it;

import org.junit.jupiter.api.extension.ExtensionContext;
import org.junit.jupiter.api.extension.ParameterContext;
import org.junit.jupiter.api.extension.ParameterResolver;

/** Supplies the shared {@link Office} to test methods and lifecycle methods that ask for one. */
public final class OfficeParameterResolver implements ParameterResolver {
    @Override
    public boolean supportsParameter(ParameterContext p, ExtensionContext e) {
        return p.getParameter().getType() == Office.class;
    }

    @Override
    public Object resolveParameter(ParameterContext p, ExtensionContext e) {
        try {
            return OfficeExtension.office(e);
        } catch (Exception ex) {
            throw new IllegalStateException("could not start the office", ex);
        }
    }
}
