package app.latentledger.ui;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.scene.Node;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The parts joined in the app, headless (TestFX + Monocle): the log screen imports a field-data
 * sample into the visit and shows its timeline and findings ending with the safety line; the
 * settings screen changes units and theme for every screen at once; the report buttons write
 * their files and say so. Slow jobs run on the test thread (Background.DIRECT) so each tap's
 * result is on screen when the tap returns.
 */
@ExtendWith(ApplicationExtension.class)
class WiredScreensUiTest {
    @TempDir
    static Path dir;

    private AppSession session;

    @Start
    void start(Stage stage) {
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        shell.attachCharts();
        stage.setScene(shell.scene(1280, 800));
        stage.setWidth(1280);
        stage.setHeight(800);
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void aLogImportedByTapsShowsItsTimelineFindingsAndSafetyLine(FxRobot robot) {
        robot.clickOn("#nav-logs");
        robot.interact(() -> robot.lookup("#log-file").queryAs(TextField.class)
                .setText(Path.of("field-data-samples/oversized-short-cycling.csv").toAbsolutePath().toString()));
        // the Logs screen is one scrolling page: a tap on the button wherever the page is scrolled
        tap(robot, "#import-log");
        String status = robot.lookup("#log-message-logs").queryAs(Labeled.class).getText();
        assertTrue(status.startsWith("Imported oversized-short-cycling.csv"), status);
        assertTrue(robot.lookup("#cycle-timeline-slot #timeline-canvas").tryQuery().isPresent(), "timeline in its slot");
        // field-data-samples/README.md: this sample short-cycles
        assertTrue(robot.lookup("#finding-short-cycling").tryQuery().isPresent());
        assertEquals(app.latentledger.core.findings.Cautions.SAFETY_LINE,
                robot.lookup("#screen-logs #safety-line").queryAs(Labeled.class).getText());
        tap(robot, "#next-cycle");
        assertTrue(robot.lookup("#cycle-timeline-slot #readout").queryAs(Labeled.class).getText().contains("1"),
                "a cycle is read out");
        assertTrue(session.ledger().logs().idsForVisit(session.visit().id()).size() >= 1, "kept with the visit");
    }

    @Test
    void unitsAndThemeChangedInSettingsReachTheOtherScreensAtOnce(FxRobot robot) {
        robot.clickOn("#nav-settings");
        robot.clickOn("#choice-units-si");
        // the theme is further down the settings list: a tap on it wherever the list is scrolled
        tap(robot, "#choice-theme-dark");
        assertTrue(robot.lookup("#shell").query().getStyleClass().contains(app.latentledger.ui.look.Theme.DARK_CLASS));
        robot.clickOn("#nav-results");
        assertTrue(robot.lookup(".label").queryAll().stream().filter(n -> n instanceof Labeled)
                .map(n -> ((Labeled) n).getText()).anyMatch("°C"::equals), "temperatures shown in °C");
        robot.clickOn("#nav-settings");
        robot.clickOn("#choice-units-ip");
        tap(robot, "#choice-theme-light");
        assertTrue(!robot.lookup("#shell").query().getStyleClass().contains(app.latentledger.ui.look.Theme.DARK_CLASS));
    }

    private static void tap(FxRobot robot, String query) {
        robot.interact(() -> robot.lookup(query).queryAs(javafx.scene.control.ButtonBase.class).fire());
    }

    @Test
    void theReportButtonsWriteTheirFilesAndNameThem(FxRobot robot) throws Exception {
        robot.clickOn("#nav-export");
        robot.clickOn("#report-pdf");
        String status = robot.lookup("#report-status").queryAs(Labeled.class).getText();
        assertTrue(status.startsWith("Saved the report: ") && status.contains(".pdf"), status);
        robot.clickOn("#data-csv");
        assertTrue(robot.lookup("#report-status").queryAs(Labeled.class).getText().contains(".csv"));
        robot.clickOn("#nav-compare");
        robot.clickOn("#before-after-report");
        String compared = robot.lookup("#compare-report-status").queryAs(Labeled.class).getText();
        assertTrue(compared.startsWith("Saved the before/after report: "), compared);
        try (var files = Files.list(dir.resolve("reports"))) {
            assertTrue(files.count() >= 3);
        }
    }

    @Test
    void theNewControlsAreAtLeast48PxAndTheirTextAtLeast18Px(FxRobot robot) {
        for (Screen s : Screen.values()) {
            robot.interact(() -> session.screenProperty().set(s));
            Set<Node> targets = robot.lookup(".button").queryAll();
            targets.addAll(robot.lookup(".toggle-button").queryAll());
            targets.addAll(robot.lookup(".text-field").queryAll());
            for (Node n : targets) {
                if (n.isVisible() && n.getScene() != null && n.getParent() != null) {
                    var b = n.getBoundsInLocal();
                    assertTrue(b.getHeight() >= 48 && b.getWidth() >= 48,
                            s + " " + n.getId() + " is " + b.getWidth() + " × " + b.getHeight());
                }
            }
        }
        for (String id : new String[] {"#report-pdf", "#data-csv", "#data-json"}) {
            robot.interact(() -> session.screenProperty().set(Screen.EXPORT));
            assertTrue(robot.lookup(id).queryAs(Labeled.class).getFont().getSize() >= 18, id);
        }
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        for (Node n : robot.lookup("#psychro-chart-slot .button").queryAll()) {
            assertTrue(((Labeled) n).getFont().getSize() >= 18, n.getId() + " " + ((Labeled) n).getFont().getSize());
        }
    }
}
