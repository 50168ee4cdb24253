package app.latentledger.core.cycles;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

class CyclesArchitectureTest {
    private static final JavaClasses CORE = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("app.latentledger.core.cycles");

    @Test
    @DisplayName("the log analysis is pure: no files, SQL, JavaFX, CSV library, importer or CLI")
    void pure() {
        noClasses().should().dependOnClassesThat().resideInAnyPackage("java.nio.file..", "java.sql..", "javafx..",
                        "org.apache.commons.csv..", "app.latentledger.io..", "app.latentledger.cli..", "app.latentledger.ui..")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.File")
                .check(CORE);
    }
}
