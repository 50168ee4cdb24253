package app.latentledger.ui.job;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.SystemType;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextField;
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
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Job screen's new-system form by taps (TestFX + Monocle, headless): the staging picked is the
 * one saved, the form says where the other details go, and a refused site or system reads as
 * refused while a saved one does not.
 */
@ExtendWith(ApplicationExtension.class)
class JobSystemFormUiTest {
    @TempDir
    static Path dir;

    private AppSession session;

    @Start
    void start(Stage stage) {
        session = TestSessions.open(dir);
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        stage.setScene(shell.scene(1280, 800));
        stage.setWidth(1280);
        stage.setHeight(800);
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    private void type(FxRobot robot, String id, String text) {
        robot.interact(() -> robot.lookup("#" + id).queryAs(TextField.class).clear());
        robot.clickOn("#" + id);
        robot.write(text);
    }

    private HvacSystem named(String label) {
        return session.ledger().sites().all().stream()
                .flatMap(s -> session.ledger().systems().forSite(s.id()).stream())
                .filter(s -> s.label().equals(label)).findFirst().orElseThrow();
    }

    @Test
    void theStagingPickedOnTheJobFormIsTheOneSaved(FxRobot robot) {
        robot.clickOn("#nav-job");
        for (SystemType t : SystemType.values()) {
            ToggleButton b = robot.lookup("#new-system-stages-" + t.key()).queryAs(ToggleButton.class);
            assertNotNull(b, "a toggle for " + t.key());
            assertTrue(b.getHeight() >= Ui.MIN_TARGET_PX, t.key() + " is " + b.getHeight() + " px high");
        }
        Labeled more = robot.lookup("#new-system-more").queryAs(Labeled.class);
        assertTrue(more.getText().contains("Record screen") && more.getText().toLowerCase(java.util.Locale.ROOT).contains("refrigerant"),
                more.getText());

        type(robot, "new-system-label", "Attic air handler");
        type(robot, "new-system-tons", "3");
        robot.clickOn("#new-system-stages-two-stage");
        robot.clickOn("#add-system");
        assertEquals(SystemType.TWO_STAGE, named("Attic air handler").type());

        type(robot, "new-system-label", "Garage mini split");
        type(robot, "new-system-tons", "1.5");
        robot.clickOn("#new-system-stages-variable-capacity");
        robot.clickOn("#add-system");
        assertEquals(SystemType.VARIABLE_CAPACITY, named("Garage mini split").type());
    }

    @Test
    void aRefusedSiteOrSystemReadsAsRefusedAndASavedOneDoesNot(FxRobot robot) {
        robot.clickOn("#nav-job");
        Labeled systemStatus = robot.lookup("#system-status").queryAs(Labeled.class);
        type(robot, "new-system-label", "Closet furnace coil");
        type(robot, "new-system-tons", "lots");
        robot.clickOn("#add-system");
        assertTrue(systemStatus.getText().startsWith("System not added"), systemStatus.getText());
        assertTrue(systemStatus.getStyleClass().contains("refused"), "refused style on " + systemStatus.getText());
        type(robot, "new-system-tons", "2");
        robot.clickOn("#add-system");
        assertTrue(systemStatus.getText().startsWith("System added"), systemStatus.getText());
        assertFalse(systemStatus.getStyleClass().contains("refused"), "plain style on " + systemStatus.getText());

        Labeled siteStatus = robot.lookup("#site-status").queryAs(Labeled.class);
        type(robot, "new-site-name", "Saltreed dune cottage");
        type(robot, "new-site-elevation", "high");
        robot.clickOn("#add-site");
        assertTrue(siteStatus.getText().startsWith("Site not added"), siteStatus.getText());
        assertTrue(siteStatus.getStyleClass().contains("refused"), "refused style on " + siteStatus.getText());
        type(robot, "new-site-elevation", "12");
        robot.clickOn("#add-site");
        assertTrue(siteStatus.getText().startsWith("Site added"), siteStatus.getText());
        assertFalse(siteStatus.getStyleClass().contains("refused"), "plain style on " + siteStatus.getText());
    }
}
