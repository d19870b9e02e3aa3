package org.miscela.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The core's shape: no office type (its class path has none, so this also guards against a copy pasted in), no
 * side channel, no cycle between its packages, and the lower layers know nothing of the upper ones.
 */
class CoreArchitectureTest {
    private static JavaClasses core;

    @BeforeAll
    static void importCore() {
        core = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.miscela.core");
        assertTrue(core.size() > 50, "core classes not found: " + core.size());
    }

    @Test
    void noOfficeTypes() {
        noClasses().should().dependOnClassesThat().resideInAPackage("com.sun.star..").check(core);
    }

    @Test
    void noSideChannels() {
        ArchitectureRules.noSideChannels().check(core);
    }

    @Test
    void packagesFormNoCycle() {
        slices().matching("org.miscela.core.(*)..").should().beFreeOfCycles().check(core);
    }

    /** Messages and the numbers in them come first: they depend on no other package of the core. */
    @Test
    void problemsDependOnNothingElse() {
        noClasses().that().resideInAPackage("org.miscela.core.problem..").should().dependOnClassesThat()
                .resideInAnyPackage("org.miscela.core.model..", "org.miscela.core.card..",
                        "org.miscela.core.functions..", "org.miscela.core.fit..", "org.miscela.core.blend..",
                        "org.miscela.core.catalog..")
                .check(core);
    }

    /** The models are numerics on plain numbers: they know nothing of cards, cell functions, fits or blending. */
    @Test
    void modelsKnowNoCard() {
        noClasses().that().resideInAPackage("org.miscela.core.model..").should().dependOnClassesThat()
                .resideInAnyPackage("org.miscela.core.card..", "org.miscela.core.functions..",
                        "org.miscela.core.fit..", "org.miscela.core.blend..", "org.miscela.core.catalog..")
                .check(core);
    }

    /** Nothing below the catalogue of cell functions depends on it. */
    @Test
    void onlyTheCatalogueNamesTheCellFunctions() {
        noClasses().that().resideOutsideOfPackage("org.miscela.core.catalog..").should().dependOnClassesThat()
                .resideInAPackage("org.miscela.core.catalog..").check(core);
    }
}
