package app.latentledger.ui;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/**
 * Views only bind: anything that computes, stores or decides lives in a view model or below
 * (the MVVM rule of aesthetics-anchors.md §C).
 */
class UiArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void load() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("app.latentledger.ui");
    }

    @Test
    void viewsReachNoStorageNoCalculationAndNoCommandLine() {
        noClasses().that().haveSimpleNameEndingWith("View").or().haveSimpleNameEndingWith("Tile")
                .or().haveSimpleNameEndingWith("Banner").or().haveSimpleNameEndingWith("List")
                .or().haveSimpleNameEndingWith("Table")
                .should().dependOnClassesThat().resideInAnyPackage("app.latentledger.store..",
                        "app.latentledger.bundle..", "app.latentledger.core.coil..", "app.latentledger.core.visit..",
                        "app.latentledger.core.psychro..", "app.latentledger.core.units..", "app.latentledger.cli..")
                .because("a view binds to its view model; the view model calls the core and the store")
                .check(classes);
    }

    @Test
    void viewModelsNeedNoWindow() {
        noClasses().that().haveSimpleNameEndingWith("ViewModel")
                .should().dependOnClassesThat().resideInAnyPackage("javafx.scene..", "javafx.stage..")
                .because("view models are tested without a window")
                .check(classes);
    }
}
