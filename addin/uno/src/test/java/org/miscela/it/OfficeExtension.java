package org.miscela.it;

import org.junit.jupiter.api.extension.ExtensionContext;

/** One office for the whole integration-test run, started on first use and ended when the run ends. */
final class OfficeExtension {
    private static Office office;

    private OfficeExtension() {
    }

    static synchronized Office office(ExtensionContext context) throws Exception {
        if (office == null) {
            office = Office.start();
            Office started = office;
            // also when the test JVM is stopped before JUnit closes its store
            Runtime.getRuntime().addShutdownHook(new Thread(started::close, "miscela-office-shutdown"));
            context.getRoot().getStore(ExtensionContext.Namespace.GLOBAL).put("miscela-office",
                    (AutoCloseable) started::dispose);
        }
        return office;
    }
}
