package org.morphscout.app.gui;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Layering rules: the library knows nothing of the application, its packages form no cycles and it never prints; the
 * application reaches the catalog only through the library's facade; view-models know nothing of scene graphs.
 */
class ArchitectureTest {
  private static JavaClasses classes;

  @BeforeAll
  static void importClasses() {
    classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
        .importPackages("org.morphscout");
  }

  @Test
  void indexerNeverUsesTheApplicationOrJavaFx() {
    noClasses().that().resideInAPackage("org.morphscout.indexer..")
        .should().dependOnClassesThat().resideInAnyPackage("org.morphscout.app..", "javafx..")
        .check(classes);
  }

  @Test
  void indexerPackagesDependOnEachOtherWithoutCycles() {
    // Each package of the library can be understood (and tested) from the ones below it.
    slices().matching("org.morphscout.indexer.(*)..").should().beFreeOfCycles().check(classes);
  }

  @Test
  void theLibraryNeverWritesToTheStandardStreams() {
    // The library reports through return values, exceptions and SLF4J; only the command line prints.
    noClasses().that().resideInAPackage("org.morphscout.indexer..")
        .should().accessField(System.class, "out").orShould().accessField(System.class, "err")
        .check(classes);
  }

  @Test
  void benchmarksStayOutOfTheLibrary() {
    // The library jar is what other programs embed; the benchmarks belong to the application that runs them.
    noClasses().that().resideInAPackage("org.morphscout.indexer..").should().haveSimpleNameEndingWith("Benchmark")
        .check(classes);
  }

  @Test
  void onlyTheCommandLineWritesToStandardOutput() {
    // Main hands System.out to the command line's writers; everything else goes through those writers or SLF4J
    noClasses().that().resideOutsideOfPackage("org.morphscout.app.cli..")
        .and().doNotHaveFullyQualifiedName("org.morphscout.app.Main")
        .should().accessField(System.class, "out")
        .check(classes);
  }

  @Test
  void viewModelsAndServicesDoNotTouchTheSceneGraph() {
    noClasses().that().haveSimpleNameEndingWith("ViewModel")
        .or().resideInAnyPackage("org.morphscout.app.gui.service..", "org.morphscout.app.gui.task..")
        .or().haveSimpleName("Session")
        .should().dependOnClassesThat().resideInAnyPackage("javafx.scene..", "javafx.stage..")
        .check(classes);
  }

  @Test
  void viewsLeaveTheLibraryToTheirViewModels() {
    noClasses().that().haveSimpleNameEndingWith("View")
        .should().dependOnClassesThat().haveFullyQualifiedName("org.morphscout.indexer.library.Library")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("org.morphscout.indexer.catalog.FeatureStore")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("org.morphscout.indexer.catalog.DecisionStore")
        .orShould().dependOnClassesThat().haveFullyQualifiedName("org.morphscout.indexer.catalog.Catalog")
        .orShould().dependOnClassesThat().haveSimpleNameEndingWith("Backend")
        .check(classes);
  }

  @Test
  void theApplicationReachesTheCatalogOnlyThroughTheLibraryFacade() {
    // The command line and the browser call the same services of indexer.library (with the plain values of
    // indexer.values); the stores, the vector index and the scanner are that facade's business. The benchmarks, and
    // the bench command that sets them up, measure those internals on purpose.
    noClasses().that().resideInAPackage("org.morphscout.app..")
        .and().resideOutsideOfPackage("org.morphscout.app.bench..")
        .and().haveNameNotMatching("org\\.morphscout\\.app\\.cli\\.BenchCommand(\\$.*)?")
        .should().dependOnClassesThat().resideInAnyPackage("org.morphscout.indexer.catalog..",
            "org.morphscout.indexer.vector..", "org.morphscout.indexer.ingest..")
        .check(classes);
  }

  @Test
  void applicationPackagesDependOnEachOtherWithoutCycles() {
    // Each pane of the browser, the command line and the benchmarks can be read from the packages below it: the main
    // window assembles the panes, the panes share gui.common, gui.service and gui.task, never the window.
    slices().matching("org.morphscout.app.(**)").should().beFreeOfCycles().check(classes);
  }
}
