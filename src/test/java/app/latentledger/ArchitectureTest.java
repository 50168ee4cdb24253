package app.latentledger;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/**
 * The domain core (psychrometrics, coil process, cycles, diagnosis) stays pure: storage,
 * import/export, the command line and the UI depend on it, never the reverse.
 */
class ArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importMainClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("app.latentledger");
    }

    @Test
    void coreImportsNoUiSqlOrFiles() {
        noClasses().that().resideInAPackage("app.latentledger.core..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "javafx..", "java.sql..", "javax.sql..", "java.nio.file..", "java.awt..", "javax.swing..",
                        "com.gluonhq..", "org.sqlite..", "org.apache.commons.csv..", "com.google.gson..")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.File")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileInputStream")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileOutputStream")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileReader")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileWriter")
                .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.RandomAccessFile")
                .because("the core must run and be tested without a display, a database or a disk")
                .check(classes);
    }

    @Test
    void coreDependsOnNoOuterLayer() {
        noClasses().that().resideInAPackage("app.latentledger.core..")
                .should().dependOnClassesThat().resideOutsideOfPackages("app.latentledger.core..", "java..")
                .because("storage, import/export, CLI and UI depend on the core, never the reverse")
                .check(classes);
    }

    @Test
    void commandLineNeedsNoJavaFx() {
        noClasses().that().resideInAPackage("app.latentledger.cli..")
                .should().dependOnClassesThat().resideInAPackage("javafx..")
                .because("every command must run on a machine with no display")
                .check(classes);
    }
}
