package app.latentledger.ui.job;

import app.latentledger.core.records.Site;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import javafx.scene.control.ComboBox;
import javafx.scene.control.TextField;
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

/**
 * The Job screen's site form by taps (TestFX + Monocle, headless): a zone picked from the usual
 * ones, or found by searching all of them, is saved with the site; correcting the site shows it
 * again; the tablet's zone keeps none.
 */
@ExtendWith(ApplicationExtension.class)
class SiteZoneUiTest {
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

    private Site named(String name) {
        return session.ledger().sites().all().stream().filter(s -> s.name().equals(name)).findFirst().orElseThrow();
    }

    private void type(FxRobot robot, String id, String text) {
        robot.interact(() -> robot.lookup("#" + id).queryAs(TextField.class).clear());
        robot.clickOn("#" + id);
        robot.write(text);
    }

    @Test
    void aPickedZoneAndASearchedZoneAreSavedWithTheirSites(FxRobot robot) {
        robot.clickOn("#nav-job");
        type(robot, "new-site-name", "Gullwing Terrace flat");
        robot.clickOn("#new-site-zone");
        robot.clickOn("Central · America/Chicago");
        robot.clickOn("#add-site");
        assertEquals("America/Chicago", named("Gullwing Terrace flat").timeZone());

        type(robot, "new-site-name", "Lisbon Row cottage");
        type(robot, "new-site-zone-search", "lisbon");
        robot.clickOn("#new-site-zone");
        robot.clickOn("Europe/Lisbon");
        robot.clickOn("#add-site");
        assertEquals("Europe/Lisbon", named("Lisbon Row cottage").timeZone());

        type(robot, "new-site-name", "Tidewater shed");
        robot.clickOn("#add-site");
        assertEquals("", named("Tidewater shed").timeZone(), "the tablet's zone keeps none");

        // correcting a site shows its zone in the form, and a new pick replaces it
        robot.interact(() -> session.ledger().sites().all().stream().filter(s -> s.name().equals("Gullwing Terrace flat"))
                .findFirst().ifPresent(s -> robot.lookup("#site-list").queryListView().getSelectionModel().select(s)));
        robot.clickOn("#edit-site");
        @SuppressWarnings("unchecked")
        ComboBox<SiteZones.Choice> zone = robot.lookup("#new-site-zone").queryAs(ComboBox.class);
        assertEquals("America/Chicago", zone.getValue().id());
        robot.clickOn("#new-site-zone");
        robot.clickOn("Mountain · America/Denver");
        robot.clickOn("#add-site");
        assertEquals("America/Denver", named("Gullwing Terrace flat").timeZone());
    }
}
