package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;

/**
 * docs/naming.md reviews every function's name: its table of functions is the catalogue's, display name and IDL
 * method, in catalogue order. A function added without a review entry fails here, and so does a renamed method
 * (method names are permanent: saved workbooks store them), unless the review is changed with it.
 */
class NamingReviewTest {
    private static final Pattern ROW = Pattern.compile("(?m)^\\| `(MIX\\.[A-Z]+)` \\| `(\\w+)` \\| [^|]+\\|$");

    @Test
    void theReviewedNamesAreTheCataloguesNames() throws IOException {
        String review = new String(Files.readAllBytes(Paths.get("../../docs/naming.md")), StandardCharsets.UTF_8);
        List<String> reviewed = new ArrayList<>();
        Matcher m = ROW.matcher(review);
        while (m.find()) {
            reviewed.add(m.group(1) + " = " + m.group(2));
        }
        List<String> catalogue = new ArrayList<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            catalogue.add(f.displayName() + " = " + f.method());
        }
        assertEquals(catalogue, reviewed, "docs/naming.md's function table (display name = method)");
    }
}
