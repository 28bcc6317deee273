package com.wayledger.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaCall;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.properties.HasOwner;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The shape of the code, checked on every build: a pure engine, feature packages without cycles.
 */
class ArchitectureTests {

  private static JavaClasses production;

  @BeforeAll
  static void importClasses() {
    production =
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("com.wayledger");
  }

  @Test
  void engineImportsNothingButJavaAndItself() {
    classes()
        .that()
        .resideInAPackage("com.wayledger.engine..")
        .should()
        .onlyDependOnClassesThat()
        .resideInAnyPackage("java..", "com.wayledger.engine..")
        .because("the calculation core must stay plain Java, free of Spring, JPA and POI")
        .check(production);
  }

  @Test
  void engineHasNoPersistenceOrWebAnnotations() {
    noClasses()
        .that()
        .resideInAPackage("com.wayledger.engine..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "jakarta..",
            "org.springframework..",
            "org.apache.poi..",
            "tools.jackson..",
            "com.fasterxml..")
        .check(production);
  }

  @Test
  void featurePackagesHaveNoCycles() {
    slices().matching("com.wayledger.(*)..").should().beFreeOfCycles().check(production);
  }

  @Test
  void systemDependsOnNoFeature() {
    noClasses()
        .that()
        .resideInAPackage("com.wayledger.system..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "com.wayledger.site..",
            "com.wayledger.board..",
            "com.wayledger.account..",
            "com.wayledger.demo..")
        .because("system is the shared kernel every feature may use")
        .check(production);
  }

  @Test
  void noFeatureUsesTheDemoScenario() {
    noClasses()
        .that()
        .resideOutsideOfPackage("com.wayledger.demo..")
        .should()
        .dependOnClassesThat()
        .resideInAPackage("com.wayledger.demo..")
        .check(production);
  }

  @Test
  void onlyTheScheduleMapperBuildsEngineInputsFromStoredData() {
    noClasses()
        .that()
        .resideOutsideOfPackages("com.wayledger.engine..", "com.wayledger.board..")
        .should()
        .callConstructorWhere(
            JavaCall.Predicates.target(
                HasOwner.Predicates.With.owner(
                    JavaClass.Predicates.resideInAPackage("com.wayledger.engine")
                        .and(JavaClass.Predicates.simpleNameEndingWith("Spec")))))
        .because("stored data becomes engine input in one mapper (board.ScheduleMapper)")
        .check(production);
  }

  @Test
  void entitiesNeverReachTheEngine() {
    noClasses()
        .that()
        .resideInAPackage("com.wayledger.engine..")
        .should()
        .dependOnClassesThat()
        .areAnnotatedWith("jakarta.persistence.Entity")
        .check(production);
  }
}
