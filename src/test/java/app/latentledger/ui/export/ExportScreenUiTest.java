package app.latentledger.ui.export;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.AppShell;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.Screen;
import app.latentledger.ui.share.ShareBar;
import javafx.scene.Node;
import javafx.scene.control.Labeled;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Export screen walked by taps (TestFX on Monocle) with the report written slowly in the
 * background as on a tablet: the bundle just written gets the same Open/Share bar as a report, and
 * the report button tapped keeps the focus while the report is written.
 */
@ExtendWith(ApplicationExtension.class)
class ExportScreenUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, LogAnalysisService.NOT_WIRED);
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        java.util.concurrent.Executor slowWorker = job -> {
            Thread t = new Thread(() -> {
                try {
                    Thread.sleep(300);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                job.run();
            });
            t.setDaemon(true);
            t.start();
        };
        AppShell shell = new AppShell(session, slowWorker, javafx.application.Platform::runLater);
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
    void theBundleJustWrittenHasItsOwnShareBar(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.EXPORT));
        robot.clickOn("#export-visit");
        WaitForAsyncUtils.waitForFxEvents();
        Labeled status = robot.lookup("#export-status").queryAs(Labeled.class);
        assertTrue(status.getText().startsWith("Saved"), status.getText());
        ShareBar bar = robot.lookup("#bundle-share-bar").queryAs(ShareBar.class);
        assertNotNull(bar, "a share bar for bundles");
        Path file = bar.viewModel().fileProperty().get();
        assertNotNull(file, "the bar acts on the bundle just written");
        assertTrue(Files.isRegularFile(file) && file.getFileName().toString().endsWith(".zip"), file.toString());
        assertTrue(status.getText().contains(file.getFileName().toString()), status.getText());
    }

    @Test
    void theReportButtonTappedKeepsTheFocusWhileTheReportIsWritten(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.EXPORT));
        Node button = robot.lookup("#report-pdf").query();
        robot.clickOn("#report-pdf");
        robot.sleep(100);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(button, stage.getScene().getFocusOwner(), "focus while writing");
        Labeled status = robot.lookup("#report-status").queryAs(Labeled.class);
        for (int i = 0; i < 150 && status.getText().startsWith("Writing"); i++) {
            robot.sleep(100);
        }
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(status.getText().startsWith("Saved the"), status.getText());
        assertEquals(button, stage.getScene().getFocusOwner(), "focus after writing");
    }
}
