package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.container.XNameAccess;
import com.sun.star.lang.XMultiServiceFactory;
import com.sun.star.uno.UnoRuntime;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

/**
 * The office the tests talk to is the one at office.program: its configuration names the same version as that
 * program's {@code soffice --version}, and, when office.expected.version is set (scripts/test-office-25 sets it),
 * it is that LibreOffice line.
 */
@ExtendWith(OfficeParameterResolver.class)
class OfficeVersionIT {

    @Test
    void theOfficeUnderTestIsTheOneAsked(Office office) throws Exception {
        XMultiServiceFactory provider = UnoRuntime.queryInterface(XMultiServiceFactory.class,
                office.service("com.sun.star.configuration.ConfigurationProvider"));
        XNameAccess product = UnoRuntime.queryInterface(XNameAccess.class, provider.createInstanceWithArguments(
                "com.sun.star.configuration.ConfigurationAccess",
                new Object[] {Office.property("nodepath", "/org.openoffice.Setup/Product")}));
        String name = (String) product.getByName("ooName");
        String line = (String) product.getByName("ooSetupVersion");
        String full = (String) product.getByName("ooSetupVersionAboutBox");
        assertFalse(line.isEmpty() || full.isEmpty(), "the office names its version");
        assertTrue(full.startsWith(line + "."), full + " is of the " + line + " line");

        String printed = Office.run(office.directory(), 120, Office.program().resolve("soffice").toString(),
                "--version", "-env:UserInstallation=" + office.scratch("version-profile").toUri()).trim();
        assertTrue(printed.contains(name + " " + full), "soffice --version printed \"" + printed
                + "\", the running office says " + name + " " + full);

        Figures.note(OfficeVersionIT.class, "office under test: %s (%s)", printed, Office.program());
        String expected = System.getProperty("office.expected.version", "").trim();
        if (!expected.isEmpty()) {
            assertEquals(expected, line, "LibreOffice line under test");
        }
    }
}
