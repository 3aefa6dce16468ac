package org.chillwright;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.springframework.data.repository.Repository;
import org.springframework.modulith.core.ApplicationModules;

/** Keeps the layout of DEVELOPERS.md true: features do not reach into each other, physics knows nothing of the app. */
class ArchitectureTest {

    private static JavaClasses production;

    @BeforeAll
    static void importClasses() {
        production = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.chillwright");
    }

    @Test
    void featuresHaveNoCyclesAndUseOnlyEachOthersPublicFace() {
        ApplicationModules.of(ChillwrightApplication.class).verify();
    }

    @Test
    void physicsKnowsNothingOfTheApplication() {
        classes().that().resideInAPackage("org.chillwright.physics..")
                .should().onlyDependOnClassesThat().resideInAnyPackage(
                        "org.chillwright.physics..", "java..", "org.apache.commons.math3..")
                .because("the physics engine is pure Java and Commons Math: no Spring, JPA or web")
                .check(production);
    }

    @Test
    void repositoriesStayInsideTheirFeature() {
        // package-private repositories cannot be called from another feature's package
        classes().that().areInterfaces().and().areAssignableTo(Repository.class)
                .should().notBePublic()
                .because("features talk through their services, never through another feature's repository")
                .check(production);
    }
}
