package app.latentledger.core.records;

import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.syntax.ArchRuleDefinition;
import org.junit.jupiter.api.Test;

/** The records are pure values: no SQL, no files, no JavaFX (the brief's rule for the core). */
class RecordsArchitectureTest {
    @Test
    void recordsKnowNoStorageOrUi() {
        ArchRuleDefinition.noClasses().that().resideInAPackage("app.latentledger.core..")
                .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "javafx..", "java.nio.file..",
                        "app.latentledger.store..", "app.latentledger.bundle..", "org.sqlite..")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.File")
                .check(new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                        .importPackages("app.latentledger.core"));
    }
}
