package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import com.sun.star.beans.PropertyValue;
import com.sun.star.container.XIndexAccess;
import com.sun.star.sheet.FunctionArgument;
import com.sun.star.uno.UnoRuntime;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;

/** What the Function Wizard shows, read from the running office, equals the catalogue: names and every help text. */
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
        for (FunctionInfo f : FunctionCatalog.functions()) {
            Map<String, Object> props = byName.get(f.displayName());
            assertNotNull(props, f.displayName() + " is not in the wizard");
            assertEquals(f.summary(), props.get("Description"), f.displayName());
            FunctionArgument[] args = (FunctionArgument[]) props.get("Arguments");
            assertEquals(f.arguments().size(), args.length, f.displayName() + " argument count");
            for (int a = 0; a < args.length; a++) {
                ArgumentInfo expected = f.arguments().get(a);
                assertEquals(expected.displayName(), args[a].Name, f.displayName() + " argument " + (a + 1));
                assertFalse(args[a].Description.trim().isEmpty(), f.displayName() + "." + args[a].Name);
                assertEquals(expected.description(), args[a].Description, f.displayName() + "." + args[a].Name);
            }
        }
        Figures.note(WizardMetadataIT.class, "wizard: %d Miscela functions with all argument help present",
                FunctionCatalog.functions().size());
    }
}
