package org.miscela.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.EvaluationResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * What ships in the .oxt's jar: the adapter (org.miscela.calc) and the core. No side channel in either, the adapter
 * only decodes, calls the core and maps errors, and nothing shipped reaches the build tools (org.miscela.tools, which
 * write files and are on this module's class path at build time only).
 */
class ShippedCodeArchitectureTest {
    private static JavaClasses shipped;
    private static JavaClasses tools;

    @BeforeAll
    static void importClasses() {
        // the core's test classes come on this module's test class path as a test jar, not a test-classes folder
        ClassFileImporter importer = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .withImportOption(location -> !location.contains("-tests.jar") && !location.contains("/test-classes/"));
        shipped = importer.importPackages("org.miscela.calc", "org.miscela.core");
        tools = importer.importPackages("org.miscela.tools");
        assertTrue(shipped.containPackage("org.miscela.calc"), "adapter classes not found");
        assertTrue(shipped.containPackage("org.miscela.core.card"), "core classes not found");
        assertTrue(tools.size() > 0, "build tool classes not found");
    }

    @Test
    void noSideChannels() {
        ArchitectureRules.noSideChannels().check(shipped);
    }

    /** The rule is not blind: the build tool, which writes files, breaks it. */
    @Test
    void theRuleSeesTheBuildToolsFileAccess() {
        EvaluationResult result = ArchitectureRules.noSideChannels().evaluate(tools);
        assertTrue(result.hasViolation());
        assertTrue(result.getFailureReport().toString().contains("java.nio.file.Files"), result.getFailureReport()::toString);
    }

    @Test
    void nothingShippedReachesTheBuildTools() {
        noClasses().should().dependOnClassesThat().resideInAPackage("org.miscela.tools..").check(shipped);
    }

    /** The office's types stay in the adapter. */
    @Test
    void theCoreNamesNoOfficeType() {
        noClasses().that().resideInAPackage("org.miscela.core..").should().dependOnClassesThat()
                .resideInAPackage("com.sun.star..").check(shipped);
        assertFalse(shipped.getPackage("org.miscela.calc").getClassDependenciesFromThisPackageTree().isEmpty());
    }
}
