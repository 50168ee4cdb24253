package app.latentledger.ui.entry;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import app.latentledger.ui.session.Slot;
import javafx.scene.control.Label;
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

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The airflow-basis and same-instrument switches and the supply probe offset, tapped on the real
 * readings screen (TestFX on Monocle), kept in the reading set, and back on the screen after the app
 * was killed (a second session opened on the same data folder while the first never closed, so
 * nothing was saved on the way out). °F differences: 1 °F = 1/1.8 K (exact).
 */
@ExtendWith(ApplicationExtension.class)
class ReadingSwitchesUiTest {
    @TempDir
    static Path dir;

    private Stage stage;
    private AppSession session;
    private AppSession restarted;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = TestSessions.withNewVisit(dir);
        show(session);
        stage.show();
    }

    private void show(AppSession s) {
        AppShell shell = new AppShell(s, Background.DIRECT, Background.DIRECT);
        s.screenProperty().set(Screen.READINGS);
        stage.setScene(shell.scene(1280, 800));
        stage.setWidth(1280);
        stage.setHeight(800);
    }

    @AfterEach
    void close() {
        session.close();
        if (restarted != null) {
            restarted.close();
        }
    }

    private static void typeIn(FxRobot robot, Slot slot, String number) {
        robot.clickOn("#slot-" + slot.key());
        for (char c : number.toCharArray()) {
            robot.clickOn(c == '.' ? "#key-point" : c == '-' ? "#key-sign" : "#key-" + c);
        }
        robot.clickOn("#key-enter");
    }

    private static boolean on(FxRobot robot, String id) {
        return robot.lookup(id).queryAs(ToggleButton.class).isSelected();
    }

    @Test
    void switchesAndOffsetAreKeptWithTheSetAndComeBackAfterAKill(FxRobot robot) {
        robot.clickOn("#airflow-standard");
        robot.clickOn("#same-probe");
        typeIn(robot, Slot.RETURN_DRY_BULB, "75");
        typeIn(robot, Slot.RETURN_HUMIDITY, "63");
        typeIn(robot, Slot.SUPPLY_DRY_BULB, "56");
        typeIn(robot, Slot.SUPPLY_HUMIDITY, "54");
        typeIn(robot, Slot.AIRFLOW, "1100");
        typeIn(robot, Slot.SUPPLY_DEW_POINT_OFFSET, "-1.5");
        assertEquals("-1.5", robot.lookup("#value-supply-dew-point-offset").queryAs(Label.class).getText());
        String setId = session.draft().readingSetId();
        ReadingSet stored = session.ledger().readings().find(setId).orElseThrow();
        assertEquals(AirflowBasis.STANDARD, stored.airflow().basis());
        assertTrue(stored.probes().sameInstrument());
        assertEquals(-1.5 / 1.8, stored.probes().supplyDewPointOffsetK(), 1e-12);
        // tapped off again: kept at once, the stored set follows
        robot.clickOn("#same-probe");
        assertFalse(session.ledger().readings().find(setId).orElseThrow().probes().sameInstrument());
        robot.clickOn("#same-probe");

        // killed: a new app opens the same folder; the first session never closed or saved anything more
        robot.interact(() -> {
            restarted = TestSessions.open(dir);
            show(restarted);
        });
        assertEquals(setId, restarted.draft().readingSetId());
        assertTrue(on(robot, "#airflow-standard"), "standard airflow came back");
        assertTrue(on(robot, "#same-probe"), "same instrument came back");
        assertEquals("-1.5", robot.lookup("#value-supply-dew-point-offset").queryAs(Label.class).getText());
        assertTrue(restarted.currentCheck().checked(), restarted.currentCheck().refusal());
        assertEquals(AirflowBasis.STANDARD, restarted.currentCheck().readings().airflow().basis());
        // and the switch still works after the restart
        robot.clickOn("#airflow-standard");
        assertEquals(AirflowBasis.ACTUAL, restarted.ledger().readings().find(setId).orElseThrow().airflow().basis());
    }
}
