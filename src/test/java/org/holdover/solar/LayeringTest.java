package org.holdover.solar;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * Keeps the solar and pv engine packages to the project's layering: the SPA library only behind
 * {@link SunPositions}, no workbook/CLI/JSON libraries, no console output.
 */
class LayeringTest {

    private static final JavaClasses ENGINE = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.holdover.solar", "org.holdover.pv");

    @Test
    void theSpaLibraryIsOnlyUsedBehindSunPositions() {
        noClasses().that().doNotHaveFullyQualifiedName(SunPositions.class.getName())
                .should().dependOnClassesThat().resideInAPackage("net.e175.klaus..")
                .check(ENGINE);
    }

    @Test
    void noWorkbookCliOrJsonLibraries() {
        noClasses().should().dependOnClassesThat().resideInAnyPackage("org.apache.poi..", "picocli..",
                "com.fasterxml.jackson..", "org.holdover.report..", "org.holdover.cli..", "org.holdover.sizing..")
                .check(ENGINE);
    }

    @Test
    void theEngineNeverPrints() {
        noClasses().should().accessField(System.class, "out").orShould().accessField(System.class, "err")
                .check(ENGINE);
    }
}
