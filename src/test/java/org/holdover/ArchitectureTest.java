package org.holdover;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** The layers of DESIGN.md: cli → report → sizing → engine packages → project types; libraries stay in their place. */
class ArchitectureTest {

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.holdover");

    private static final String[] ENGINE = {"org.holdover.project..", "org.holdover.catalog..", "org.holdover.load..",
        "org.holdover.solar..", "org.holdover.pv..", "org.holdover.battery..", "org.holdover.inverter..", "org.holdover.dc..",
        "org.holdover.sim..", "org.holdover.sizing.."};

    @Test
    void theEngineNeverReachesThePresentationLayers() {
        noClasses().that().resideInAnyPackage(ENGINE)
                .should().dependOnClassesThat().resideInAnyPackage("org.holdover.report..", "org.holdover.cli..")
                .check(MAIN);
    }

    @Test
    void theWorkbookNeverReachesTheCommandLine() {
        noClasses().that().resideInAPackage("org.holdover.report..")
                .should().dependOnClassesThat().resideInAPackage("org.holdover.cli..").check(MAIN);
    }

    @Test
    void spreadsheetAndCommandLineLibrariesStayInTheirPackages() {
        noClasses().that().resideOutsideOfPackage("org.holdover.report..")
                .should().dependOnClassesThat().resideInAPackage("org.apache.poi..").check(MAIN);
        noClasses().that().resideOutsideOfPackage("org.holdover.cli..")
                .should().dependOnClassesThat().resideInAPackage("picocli..").check(MAIN);
        noClasses().that().resideOutsideOfPackages("org.holdover.project..")
                .should().dependOnClassesThat().resideInAPackage("com.fasterxml.jackson..").check(MAIN);
    }

    @Test
    void theEngineNeverPrints() {
        noClasses().that().resideInAnyPackage(ENGINE)
                .should().accessField(System.class, "out").orShould().accessField(System.class, "err").check(MAIN);
    }

    @Test
    void basicPackagesDoNotReachUp() {
        noClasses().that().resideInAPackage("org.holdover.project..")
                .should().dependOnClassesThat().resideInAnyPackage(ENGINE[1], ENGINE[2], ENGINE[3], ENGINE[4], ENGINE[5],
                        ENGINE[6], ENGINE[7], ENGINE[8], ENGINE[9]).check(MAIN);
        noClasses().that().resideInAnyPackage("org.holdover.load..", "org.holdover.battery..", "org.holdover.inverter..",
                        "org.holdover.dc..", "org.holdover.sim..", "org.holdover.solar..", "org.holdover.pv..")
                .should().dependOnClassesThat().resideInAnyPackage("org.holdover.sizing..", "org.holdover.catalog..")
                .check(MAIN);
    }
}
