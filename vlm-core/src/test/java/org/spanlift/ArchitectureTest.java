package org.spanlift;

import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import org.junit.jupiter.api.Test;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;

/**
 * The layers of the core, bottom to top, as DEVELOPERS.md describes them. A layer may use the layers below
 * it and never one above; packages form no cycle.
 */
class ArchitectureTest {

    private static final JavaClasses CORE = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.spanlift");

    @Test
    void layersUseOnlyTheLayersBelowThem() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("input").definedBy("org.spanlift.input..")
                .layer("model").definedBy("org.spanlift.geometry..", "org.spanlift.section..",
                        "org.spanlift.atmosphere..", "org.spanlift.structure..")
                .layer("lattice").definedBy("org.spanlift.lattice..")
                .layer("solve").definedBy("org.spanlift.solve..", "org.spanlift.results..")
                .layer("analyses").definedBy("org.spanlift.flight..", "org.spanlift.stall..", "org.spanlift.loads..",
                        "org.spanlift.washout..", "org.spanlift.balance..")
                .layer("vocabulary").definedBy("org.spanlift.vocabulary..")
                .layer("sweep").definedBy("org.spanlift.sweep..")
                .layer("readers").definedBy("org.spanlift.io..")
                .layer("batch").definedBy("org.spanlift.batch..")
                .whereLayer("input").mayNotAccessAnyLayer()
                .whereLayer("model").mayOnlyAccessLayers("input")
                .whereLayer("lattice").mayOnlyAccessLayers("input", "model")
                .whereLayer("solve").mayOnlyAccessLayers("input", "model", "lattice")
                .whereLayer("analyses").mayOnlyAccessLayers("input", "model", "lattice", "solve")
                .whereLayer("vocabulary").mayOnlyAccessLayers("input", "model", "lattice", "solve", "analyses")
                .whereLayer("sweep").mayOnlyAccessLayers("input", "model", "lattice", "solve", "analyses",
                        "vocabulary")
                .whereLayer("readers").mayOnlyAccessLayers("input", "model", "lattice", "solve", "analyses",
                        "vocabulary", "sweep")
                .withOptionalLayers(true)
                .check(CORE);
    }

    @Test
    void packagesFormNoCycle() {
        slices().matching("org.spanlift.(**)").should().beFreeOfCycles().check(CORE);
    }

    @Test
    void everyPackageBelongsToALayer() {
        com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes().should().resideInAnyPackage(
                "org.spanlift.input..", "org.spanlift.geometry..", "org.spanlift.section..",
                "org.spanlift.atmosphere..", "org.spanlift.structure..", "org.spanlift.lattice..",
                "org.spanlift.solve..", "org.spanlift.results..", "org.spanlift.flight..", "org.spanlift.stall..",
                "org.spanlift.loads..", "org.spanlift.washout..", "org.spanlift.balance..", "org.spanlift.vocabulary..",
                "org.spanlift.sweep..", "org.spanlift.io..",
                "org.spanlift.batch..")
                .check(CORE);
    }
}
