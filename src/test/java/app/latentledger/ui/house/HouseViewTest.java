package app.latentledger.ui.house;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ToggleButton;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The House screen on its own, headless (TestFX + Monocle): a row per fix, each a 48 px target to tap. */
@ExtendWith(ApplicationExtension.class)
class HouseViewTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private HouseViewModel model;

    @Start
    void start(Stage stage) throws IOException {
        session = TestSessions.open(Files.createTempDirectory(dir, "tablet"));
        session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
        model = new HouseViewModel(session);
        stage.setScene(new Scene(new HouseView(model), 1280, 800));
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void aFactTappedOnThePadIsStoredAtOnceAndShownAfterARestart(FxRobot robot) throws IOException {
        tap(robot, "#house-box-bedrooms");
        tap(robot, "#house-key-5");
        tap(robot, "#house-key-enter");
        assertEquals(5, session.ledger().houses().facts(DemoScenario.SITE_HERON).orElseThrow().bedrooms());
        assertTrue(robot.lookup("#house-pad-message").queryAs(javafx.scene.control.Label.class).getText()
                .contains("Bedrooms 5 saved"));
        Path folder = session.dataFolder();
        robot.interact(() -> session.close());
        session = TestSessions.open(folder);
        session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
        HouseViewModel again = new HouseViewModel(session);
        robot.interact(() -> robot.lookup("#house-screen").query().getScene().setRoot(new HouseView(again)));
        assertTrue(robot.lookup("#house-box-bedrooms").queryAs(ToggleButton.class).getText().endsWith("\n5"));
    }

    private static void tap(FxRobot robot, String query) {
        robot.interact(() -> robot.lookup(query).queryAs(javafx.scene.control.ButtonBase.class).fire());
    }

    @Test
    void everyFixIsATargetToTap(FxRobot robot) {
        Set<Node> rows = robot.lookup(".toggle-button").match(n -> n.getId() != null && n.getId().startsWith("fix-"))
                .queryAll();
        assertEquals(model.fixRows().size(), rows.size());
        for (Node n : rows) {
            var b = n.getBoundsInLocal();
            assertTrue(b.getHeight() >= 48 && b.getWidth() >= 48, n.getId() + " " + b);
        }
        ToggleButton asFound = robot.lookup("#fix-as-found").queryAs(ToggleButton.class);
        assertTrue(asFound.isSelected(), "as found is shown first");
        String other = "#fix-" + model.fixRows().get(1).key();
        robot.clickOn(other);
        assertTrue(robot.lookup(other).queryAs(ToggleButton.class).isSelected());
    }
}
