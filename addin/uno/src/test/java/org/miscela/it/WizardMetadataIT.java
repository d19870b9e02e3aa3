package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import com.sun.star.beans.PropertyValue;
import com.sun.star.container.XIndexAccess;
import com.sun.star.container.XNameAccess;
import com.sun.star.lang.XComponent;
import com.sun.star.lang.XMultiServiceFactory;
import com.sun.star.sheet.FunctionArgument;
import com.sun.star.uno.UnoRuntime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;

/**
 * What the Function Wizard shows, read from the running office (com.sun.star.sheet.FunctionDescriptions, the data the
 * wizard itself shows), equals the catalogue: names, every help text and every argument's optional flag (Calc shows an
 * argument as "(optional)" and not bold when its IsOptional is true, which Calc decides from the IDL type: every
 * {@code any} parameter is optional to it, whatever the XCU says); and the office's configuration holds every
 * function's CompatibilityName.
 */
@ExtendWith(OfficeParameterResolver.class)
class WizardMetadataIT {

    @Test
    void everyFunctionAndArgumentHasItsHelpText(Office office) throws Exception {
        XIndexAccess all = UnoRuntime.queryInterface(XIndexAccess.class,
                office.service("com.sun.star.sheet.FunctionDescriptions"));
        Map<String, Map<String, Object>> byName = new HashMap<>();
        for (int i = 0; i < all.getCount(); i++) {
            Map<String, Object> props = new HashMap<>();
            for (PropertyValue p : (PropertyValue[]) all.getByIndex(i)) {
                props.put(p.Name, p.Value);
            }
            byName.put((String) props.get("Name"), props);
        }
        List<String> requiredShownOptional = new ArrayList<>();
        List<String> optionalShownRequired = new ArrayList<>();
        int arguments = 0;
        int optional = 0;
        for (FunctionInfo f : FunctionCatalog.functions()) {
            Map<String, Object> props = byName.get(f.displayName());
            assertNotNull(props, f.displayName() + " is not in the wizard");
            assertEquals(f.summary(), props.get("Description"), f.displayName());
            FunctionArgument[] args = (FunctionArgument[]) props.get("Arguments");
            assertEquals(f.arguments().size(), args.length, f.displayName() + " argument count");
            List<String> wrongHere = new ArrayList<>();
            for (int a = 0; a < args.length; a++) {
                ArgumentInfo expected = f.arguments().get(a);
                assertEquals(expected.displayName(), args[a].Name, f.displayName() + " argument " + (a + 1));
                assertFalse(args[a].Description.trim().isEmpty(), f.displayName() + "." + args[a].Name);
                assertEquals(expected.description(), args[a].Description, f.displayName() + "." + args[a].Name);
                arguments++;
                optional += args[a].IsOptional ? 1 : 0;
                if (args[a].IsOptional != expected.optional()) {
                    wrongHere.add(args[a].Name);
                    (expected.optional() ? optionalShownRequired : requiredShownOptional).add(f.displayName()
                            + "." + args[a].Name);
                }
            }
            if (!wrongHere.isEmpty()) {
                Figures.note(WizardMetadataIT.class, "wizard: %s shows %s with the wrong optional flag", f.displayName(), wrongHere);
            }
        }
        Figures.note(WizardMetadataIT.class, "wizard: %d Miscela functions with all argument help present; %d "
                + "arguments, %d shown as optional; %d required arguments shown as optional, %d optional ones shown as "
                + "required",
                FunctionCatalog.functions().size(), arguments, optional, requiredShownOptional.size(),
                optionalShownRequired.size());
        assertEquals(List.of(), requiredShownOptional, "required arguments the wizard shows as optional");
        assertEquals(List.of(), optionalShownRequired, "optional arguments the wizard shows as required");
    }

    /**
     * The CompatibilityName of every function (the name .xls files store a call under), as the running office has
     * merged it from the installed extension's CalcAddIns.xcu into its configuration. FunctionDescriptions has no
     * such field (com.sun.star.sheet.FunctionDescription: Id, Category, Name, Description, Arguments), so this reads
     * the configuration node org.openoffice.Office.CalcAddIns/AddInInfo/SERVICE/AddInFunctions; FileFormatRoundTripIT
     * checks what it is for, the .xls round trip.
     */
    @Test
    void everyFunctionHasItsCompatibilityNameInTheOfficeConfiguration(Office office) throws Exception {
        XMultiServiceFactory provider = UnoRuntime.queryInterface(XMultiServiceFactory.class,
                office.service("com.sun.star.configuration.ConfigurationProvider"));
        Object access = provider.createInstanceWithArguments("com.sun.star.configuration.ConfigurationAccess",
                new Object[] {Office.property("nodepath", "/org.openoffice.Office.CalcAddIns/AddInInfo/"
                        + FunctionCatalog.SERVICE + "/AddInFunctions")});
        try {
            XNameAccess functions = UnoRuntime.queryInterface(XNameAccess.class, access);
            assertEquals(FunctionCatalog.functions().size(), functions.getElementNames().length,
                    "functions in the office's configuration");
            for (FunctionInfo f : FunctionCatalog.functions()) {
                XNameAccess node = UnoRuntime.queryInterface(XNameAccess.class, functions.getByName(f.method()));
                assertEquals(f.displayName(), node.getByName("CompatibilityName"), f.method());
            }
        } finally {
            UnoRuntime.queryInterface(XComponent.class, access).dispose();
        }
        Figures.note(WizardMetadataIT.class, "configuration: %d Miscela functions with their CompatibilityName",
                FunctionCatalog.functions().size());
    }
}
