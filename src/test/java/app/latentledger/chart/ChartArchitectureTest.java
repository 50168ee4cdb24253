package app.latentledger.chart;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The charts paint through our own interface so the PDF report can draw them without a display. */
class ChartArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importMainClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("app.latentledger");
    }

    @Test
    void chartsNeedNoDisplayToolkit() {
        noClasses().that().resideInAPackage("app.latentledger.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "java.awt..", "javax.swing..",
                        "org.apache.pdfbox..", "java.sql..", "java.nio.file..")
                .because("the report paints the same charts to PDF on a machine with no display")
                .check(classes);
    }

    @Test
    void chartsDependOnlyOnTheCore() {
        noClasses().that().resideInAPackage("app.latentledger.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("app.latentledger.ui..", "app.latentledger.cli..",
                        "app.latentledger.store..")
                .because("views, commands and storage use the charts, never the reverse")
                .check(classes);
    }
}
