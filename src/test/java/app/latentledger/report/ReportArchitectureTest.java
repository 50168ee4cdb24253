package app.latentledger.report;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The report runs headless and is called by the app and the commands, never the reverse. */
class ReportArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importMainClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("app.latentledger");
    }

    @Test
    void reportNeedsNoDisplay() {
        noClasses().that().resideInAPackage("app.latentledger.report..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "java.awt..", "javax.swing..")
                .because("the report is made on machines with no display (java.awt.headless=true, no DISPLAY)")
                .check(classes);
    }

    @Test
    void reportDoesNotKnowItsCallers() {
        noClasses().that().resideInAPackage("app.latentledger.report..")
                .should().dependOnClassesThat().resideInAnyPackage("app.latentledger.ui..", "app.latentledger.cli..")
                .because("the app's views and the commands call the report, never the reverse")
                .check(classes);
    }

    @Test
    void onlyTheReportDrawsPdf() {
        noClasses().that().resideOutsideOfPackage("app.latentledger.report..")
                .should().dependOnClassesThat().resideInAPackage("org.apache.pdfbox..")
                .because("one package owns the PDF library, so an upgrade touches one place")
                .check(classes);
    }
}
