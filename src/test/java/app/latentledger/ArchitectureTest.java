package app.latentledger;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import com.tngtech.archunit.library.dependencies.SliceAssignment;
import com.tngtech.archunit.library.dependencies.SliceIdentifier;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.simpleName;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.simpleNameEndingWith;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

/**
 * The house as drawn in DEVELOPERS.md ("Architecture in one picture"), checked on the compiled main
 * classes. One layered rule draws the floors, two cycle rules keep the packages from knotting, and
 * the purity rules say why each floor stays free of a library.
 *
 * <p>Floors, top down (a floor may use any floor below it, never one above, and the rooms of one
 * floor below the faces do not use each other unless the rule names it):
 * <ol>
 *   <li>faces: the composition root ({@code Main}, {@code ScreensCommand}), {@code ui}, {@code cli},
 *       {@code server} (the office server, still to come);</li>
 *   <li>services the faces share: {@code report}, {@code bundle}, {@code visit}, and {@code sync} (the
 *       office sync: its wire codec reads and writes records as the bundle does, so it may use
 *       {@code bundle});</li>
 *   <li>{@code chart}, {@code io}, {@code store};</li>
 *   <li>{@code files} (safe file writing, shared by every floor above);</li>
 *   <li>{@code core}: pure Java.</li>
 * </ol>
 * A floor may still be empty ({@code withOptionalLayers}), so a package named here can arrive later.
 */
@AnalyzeClasses(packages = "app.latentledger", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    private static final String ROOT = "Composition root";
    private static final String APP = "App";
    private static final String COMMANDS = "Command line";
    private static final String SERVER = "Office server";
    private static final String REPORT = "Report";
    private static final String BUNDLE = "Bundle";
    private static final String VISIT = "Visit services";
    private static final String SYNC = "Office sync";
    private static final String CHART = "Chart";
    private static final String IMPORT = "Import";
    private static final String STORE = "Store";
    private static final String FILES = "Files";
    private static final String CORE = "Core";

    private static final String[] FACES = {ROOT, APP, COMMANDS, SERVER};
    private static final String[] FACES_AND_SERVICES = {ROOT, APP, COMMANDS, SERVER, REPORT, BUNDLE, VISIT, SYNC};

    @ArchTest
    static final ArchRule floors = layeredArchitecture().consideringOnlyDependenciesInLayers()
            .withOptionalLayers(true)
            .layer(ROOT).definedBy(resideInAPackage("app.latentledger"))
            .layer(APP).definedBy("app.latentledger.ui..")
            .layer(COMMANDS).definedBy("app.latentledger.cli..")
            .layer(SERVER).definedBy("app.latentledger.server..")
            .layer(REPORT).definedBy("app.latentledger.report..")
            .layer(BUNDLE).definedBy("app.latentledger.bundle..")
            .layer(VISIT).definedBy("app.latentledger.visit..")
            .layer(SYNC).definedBy("app.latentledger.sync..")
            .layer(CHART).definedBy("app.latentledger.chart..")
            .layer(IMPORT).definedBy("app.latentledger.io..")
            .layer(STORE).definedBy("app.latentledger.store..")
            .layer(FILES).definedBy("app.latentledger.files..")
            .layer(CORE).definedBy("app.latentledger.core..")
            .whereLayer(ROOT).mayNotBeAccessedByAnyLayer()
            // the faces are peers: ui never imports cli, cli never imports ui
            .whereLayer(APP).mayOnlyBeAccessedByLayers(ROOT)
            .whereLayer(COMMANDS).mayOnlyBeAccessedByLayers(ROOT)
            .whereLayer(SERVER).mayOnlyBeAccessedByLayers(ROOT)
            // the report analyses a visit's logs through the visit services
            .whereLayer(REPORT).mayOnlyBeAccessedByLayers(FACES)
            // the sync's wire codec writes records with the bundle's own objects
            .whereLayer(BUNDLE).mayOnlyBeAccessedByLayers(ROOT, APP, COMMANDS, SERVER, SYNC)
            .whereLayer(SYNC).mayOnlyBeAccessedByLayers(FACES)
            .whereLayer(VISIT).mayOnlyBeAccessedByLayers(ROOT, APP, COMMANDS, SERVER, REPORT, BUNDLE, SYNC)
            .whereLayer(CHART).mayOnlyBeAccessedByLayers(FACES_AND_SERVICES)
            .whereLayer(IMPORT).mayOnlyBeAccessedByLayers(FACES_AND_SERVICES)
            .whereLayer(STORE).mayOnlyBeAccessedByLayers(FACES_AND_SERVICES)
            .whereLayer(FILES).mayOnlyBeAccessedByLayers(ROOT, APP, COMMANDS, SERVER, REPORT, BUNDLE, VISIT, SYNC,
                    CHART, IMPORT, STORE)
            .because("each floor is used by the floors above it and never the reverse, and the two faces"
                    + " meet only in Main; the picture in DEVELOPERS.md shows the same floors");

    @ArchTest
    static final ArchRule topLevelPackagesFormNoCycle = slices().matching("app.latentledger.(*)..")
            .should().beFreeOfCycles()
            .because("a knot between two floors means neither can change or be tested alone");

    /** Each package of the app (ui, ui.session, ui.entry, …) is one slice; nothing outside ui is sliced. */
    private static final SliceAssignment UI_PACKAGES = new SliceAssignment() {
        @Override
        public SliceIdentifier getIdentifierOf(JavaClass c) {
            return c.getPackageName().startsWith("app.latentledger.ui")
                    ? SliceIdentifier.of(c.getPackageName()) : SliceIdentifier.ignore();
        }

        @Override
        public String getDescription() {
            return "packages of the app";
        }
    };

    @ArchTest
    static final ArchRule uiPackagesFormNoCycle = slices().assignedFrom(UI_PACKAGES).should().beFreeOfCycles()
            .because("screens share the session model (ui.session) and the wording (ui.present), never each"
                    + " other's insides, so one screen can change without the others");

    @ArchTest
    static final ArchRule sharedUiPackagesKnowNoScreen = noClasses().that()
            .resideInAnyPackage("app.latentledger.ui.session..", "app.latentledger.ui.present..")
            .should().dependOnClassesThat().resideInAnyPackage("app.latentledger.ui.entry..",
                    "app.latentledger.ui.results..", "app.latentledger.ui.compare..", "app.latentledger.ui.log..",
                    "app.latentledger.ui.export..", "app.latentledger.ui.job..", "app.latentledger.ui.settings..",
                    "app.latentledger.ui.render..", "app.latentledger.ui.chart..", "app.latentledger.ui.look..")
            .orShould().dependOnClassesThat().resideInAPackage("app.latentledger.ui")
            .because("every screen reads the session and the shared wording; they must not know a screen");

    @ArchTest
    static final ArchRule sharedWordingNeedsOnlyTheCore = classes().that()
            .resideInAPackage("app.latentledger.ui.present..")
            .should().onlyDependOnClassesThat().resideInAnyPackage("app.latentledger.ui.present..",
                    "app.latentledger.core..", "java..")
            .because("the wording of a check (rows, cards, the screen's numbers) depends on the check alone");

    @ArchTest
    static final ArchRule coreImportsNoUiSqlOrFiles = noClasses().that().resideInAPackage("app.latentledger.core..")
            .should().dependOnClassesThat().resideInAnyPackage(
                    "javafx..", "java.sql..", "javax.sql..", "java.nio.file..", "java.awt..", "javax.swing..",
                    "com.gluonhq..", "org.sqlite..", "org.apache.commons.csv..", "com.google.gson..")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.File")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileInputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileOutputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileReader")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileWriter")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.RandomAccessFile")
            .because("the core must run and be tested without a display, a database or a disk");

    @ArchTest
    static final ArchRule coreDependsOnNoOuterLayer = noClasses().that().resideInAPackage("app.latentledger.core..")
            .should().dependOnClassesThat().resideOutsideOfPackages("app.latentledger.core..", "java..")
            .because("storage, import/export, CLI and UI depend on the core, never the reverse");

    @ArchTest
    static final ArchRule wireCodecIsPlainData = noClasses().that().resideInAPackage("app.latentledger.sync.wire..")
            .should().dependOnClassesThat().resideInAnyPackage("java.net..", "java.sql..", "javax.sql..", "javafx..",
                    "app.latentledger.store..", "com.sun.net.httpserver..")
            .orShould().dependOnClassesThat().resideInAPackage("app.latentledger.sync")
            .because("the tablet and the office server share the wire codec: it turns records into JSON and back"
                    + " and checks them, with no HTTP, database or display of either end");

    @ArchTest
    static final ArchRule commandLineNeedsNoJavaFx = noClasses().that().resideInAPackage("app.latentledger.cli..")
            .should().dependOnClassesThat().resideInAPackage("javafx..")
            .because("every command must run on a machine with no display");

    @ArchTest
    static final ArchRule chartsNeedNoDisplayToolkit = noClasses().that().resideInAPackage("app.latentledger.chart..")
            .should().dependOnClassesThat().resideInAnyPackage("javafx..", "java.awt..", "javax.swing..",
                    "org.apache.pdfbox..", "java.sql..", "java.nio.file..")
            .because("the report paints the same charts to PDF on a machine with no display");

    @ArchTest
    static final ArchRule reportNeedsNoDisplay = noClasses().that().resideInAPackage("app.latentledger.report..")
            .should().dependOnClassesThat().resideInAnyPackage("javafx..", "java.awt..", "javax.swing..")
            .because("the report is made on machines with no display (java.awt.headless=true, no DISPLAY)");

    @ArchTest
    static final ArchRule onlyTheReportDrawsPdf = noClasses().that().resideOutsideOfPackage("app.latentledger.report..")
            .should().dependOnClassesThat().resideInAPackage("org.apache.pdfbox..")
            .because("one package owns the PDF library, so an upgrade touches one place");

    /** Classes that only lay out and bind; the shell is one of them whatever its name. */
    private static final DescribedPredicate<JavaClass> VIEWS = resideInAPackage("app.latentledger.ui..")
            .and(simpleNameEndingWith("View").or(simpleNameEndingWith("Tile")).or(simpleNameEndingWith("Banner"))
                    .or(simpleNameEndingWith("List")).or(simpleNameEndingWith("Table")).or(simpleName("AppShell")))
            .as("views of the app");

    @ArchTest
    static final ArchRule viewsReachNoStorageNoCalculationAndNoCommandLine = noClasses().that(VIEWS)
            .should().dependOnClassesThat().resideInAnyPackage("app.latentledger.store..",
                    "app.latentledger.bundle..", "app.latentledger.core.coil..", "app.latentledger.core.visit..",
                    "app.latentledger.core.psychro..", "app.latentledger.core.units..", "app.latentledger.cli..")
            .because("a view binds to its view model; the view model calls the core and the store");

    @ArchTest
    static final ArchRule viewModelsNeedNoWindow = noClasses().that().resideInAPackage("app.latentledger.ui..")
            .and().haveSimpleNameEndingWith("ViewModel")
            .should().dependOnClassesThat().resideInAnyPackage("javafx.scene..", "javafx.stage..")
            .because("view models are tested without a window");

    @ArchTest
    static final ArchRule serverSharesOnlyTheWireCodec = noClasses().that().resideInAPackage("app.latentledger.server..")
            .should().dependOnClassesThat().resideInAPackage("app.latentledger.sync")
            .orShould().dependOnClassesThat().resideInAnyPackage("app.latentledger.ui..", "app.latentledger.cli..")
            .because("the office server and the tablet share the wire codec (sync.wire) and nothing of the"
                    + " tablet's sync client, screens or command line");
}
