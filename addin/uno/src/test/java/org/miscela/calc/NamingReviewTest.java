package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;

/** docs/naming.md reviews every function's name: a function added without a review entry fails here. */
class NamingReviewTest {
    @Test
    void everyFunctionNameIsReviewed() throws IOException {
        String review = new String(Files.readAllBytes(Paths.get("../../docs/naming.md")), StandardCharsets.UTF_8);
        for (FunctionInfo f : FunctionCatalog.functions()) {
            assertTrue(review.contains("| `" + f.displayName() + "` | `" + f.method() + "` |"),
                    "docs/naming.md has no review of " + f.displayName());
        }
    }
}
