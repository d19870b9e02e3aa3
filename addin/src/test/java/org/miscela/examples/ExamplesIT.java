package org.miscela.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.it.Office;
import org.miscela.it.OfficeParameterResolver;

/** The bundled example workbooks recalculate in the real office with no error cell and every check cell "OK". */
@ExtendWith(OfficeParameterResolver.class)
class ExamplesIT {
    @Test
    void everyExampleRecalculatesCleanly(Office office) throws Exception {
        Path root = ExampleWorkbooks.repoRoot();
        List<Path> workbooks = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(root.resolve("examples"), "*.ods")) {
            ds.forEach(workbooks::add);
        }
        assertFalse(workbooks.isEmpty(), "no example workbooks");
        Path out = Files.createDirectories(Paths.get("target/examples-out"));
        for (Path wb : workbooks) {
            assertEquals(0, ExampleRunner.run(office, wb, out), wb.getFileName() + " has problem cells");
        }
    }
}
