package app.latentledger.ui;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.ButtonBase;
import javafx.scene.control.ToggleButton;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * "Why is the house humid?" is one tap from every screen of a visit, in both orientations of a
 * 10" tablet: the House button is on the screen list, inside the window, at least 48 px both ways
 * (common practice, no source), and tapping it shows the House screen. Settings is reached from the
 * header and lights its own button there.
 */
@ExtendWith(ApplicationExtension.class)
class HouseNavigationUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        show(1280, 800);
        stage.show();
    }

    private void show(int w, int h) {
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        stage.setScene(shell.scene(w, h));
        stage.setWidth(w);
        stage.setHeight(h);
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void theScreenListHoldsSevenStepsOfAVisitWithHouseAmongThem() {
        ShellViewModel shell = new ShellViewModel(session);
        assertEquals(List.of(Screen.JOB, Screen.READINGS, Screen.RESULTS, Screen.LOGS, Screen.HOUSE, Screen.COMPARE,
                Screen.EXPORT), shell.screens());
        assertEquals(Screen.SETTINGS, shell.headerScreen());
        assertEquals(Screen.EXPORT, shell.lit(Screen.RECORD), "Record, opened from Export, lights Export");
        assertEquals(Screen.SETTINGS, shell.lit(Screen.SETTINGS));
    }

    @Test
    void landscapeHouseIsOneTapFromEveryScreen(FxRobot robot) {
        walk(robot, 1280, 800);
    }

    @Test
    void uprightHouseIsOneTapFromEveryScreen(FxRobot robot) {
        robot.interact(() -> show(800, 1280));
        walk(robot, 800, 1280);
    }

    @Test
    void settingsIsReachedFromTheHeaderAndLightsItsButton(FxRobot robot) {
        tap(robot, "#nav-settings");
        assertEquals(Screen.SETTINGS, session.screenProperty().get());
        assertTrue(robot.lookup("#nav-settings").queryAs(ToggleButton.class).isSelected());
        assertFalse(robot.lookup("#nav-house").queryAs(ToggleButton.class).isSelected());
        tap(robot, "#nav-house");
        assertFalse(robot.lookup("#nav-settings").queryAs(ToggleButton.class).isSelected());
    }

    private void walk(FxRobot robot, double w, double h) {
        for (Screen s : Screen.values()) {
            robot.interact(() -> session.screenProperty().set(s));
            Node house = robot.lookup("#nav-house").query();
            Bounds b = house.localToScene(house.getLayoutBounds());
            assertTrue(b.getMinX() >= 0 && b.getMinY() >= 0 && b.getMaxX() <= w && b.getMaxY() <= h,
                    s + ": House button off screen " + b);
            assertTrue(b.getWidth() >= 48 && b.getHeight() >= 48, s + ": House button " + b);
            tap(robot, "#nav-house");
            assertEquals(Screen.HOUSE, session.screenProperty().get(), "one tap from " + s);
            assertTrue(robot.lookup("#house-screen").tryQuery().isPresent(), "the House screen is shown");
        }
    }

    private static void tap(FxRobot robot, String query) {
        robot.interact(() -> robot.lookup(query).queryAs(ButtonBase.class).fire());
    }
}
