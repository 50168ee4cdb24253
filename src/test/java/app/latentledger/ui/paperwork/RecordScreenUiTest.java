package app.latentledger.ui.paperwork;

import app.latentledger.core.records.RecordKind;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextArea;
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
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Record screen by taps (TestFX on Monocle): reached from Export; the customer's words saved;
 * an instrument added and ticked for the set on the pad; the set labelled; the set deleted only
 * after the question, shown in the recycle bin and restored from it.
 */
@ExtendWith(ApplicationExtension.class)
class RecordScreenUiTest {
    @TempDir
    static Path dir;

    private AppSession session;

    @Start
    void start(Stage stage) {
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        stage.setScene(shell.scene(1280, 800));
        stage.show();
    }

    @AfterEach
    void close() {
        session.close();
    }

    private static void fire(FxRobot robot, String query) {
        robot.interact(() -> robot.lookup(query).queryAs(javafx.scene.control.ButtonBase.class).fire());
    }

    @Test
    void aWholeRecordByTaps(FxRobot robot) {
        robot.clickOn("#nav-export");
        fire(robot, "#open-record");
        assertEquals(Screen.RECORD, session.screenProperty().get());
        assertTrue(robot.lookup("#screen-record").tryQuery().isPresent());

        robot.interact(() -> robot.lookup("#customer-words").queryAs(TextArea.class).setText("Windows sweat"));
        fire(robot, "#save-notes");
        assertEquals("Windows sweat", session.ledger().paperwork().forVisit(DemoScenario.VISIT_COMPLAINT).customerWords());

        robot.interact(() -> robot.lookup("#instrument-name").queryAs(TextField.class).setText("Probe kit A"));
        robot.interact(() -> robot.lookup("#instrument-acc-db").queryAs(TextField.class).setText("0.3"));
        fire(robot, "#add-instrument");
        assertEquals(1, session.ledger().instruments().forVisit(DemoScenario.VISIT_COMPLAINT).size());

        String setId = session.draft().readingSetId();
        fire(robot, "#set-label-other");
        assertEquals("other", session.ledger().readings().find(setId).orElseThrow().label());
        assertEquals(setId, session.draft().readingSetId(), "the same set stays on the pad");

        fire(robot, "#delete-set");
        assertTrue(session.ledger().readings().find(setId).isPresent(), "nothing deleted before yes");
        assertTrue(robot.lookup("#bin-question").query().isVisible());
        fire(robot, "#bin-confirm");
        assertTrue(session.ledger().readings().find(setId).isEmpty());
        assertEquals(RecordKind.READINGS, session.ledger().recycleBin().list().get(0).kind());
        fire(robot, "#restore-" + setId);
        assertTrue(session.ledger().readings().find(setId).isPresent());
        String message = robot.lookup("#screen-recycle-bin .message").queryAllAs(Labeled.class).stream()
                .map(Labeled::getText).filter(t -> t.startsWith("Restored")).findFirst().orElse("");
        assertTrue(message.startsWith("Restored"), message);
        assertEquals("ok", session.ledger().database().integrityCheck());
    }
}
