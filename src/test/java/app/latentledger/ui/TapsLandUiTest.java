package app.latentledger.ui;

import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.chart.PsychroChartView;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.Labeled;
import javafx.scene.control.ScrollPane;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Taps land where the eye is, walked on the real screens (TestFX on Monocle) at 1280 × 800: an
 * action's message stays in view and the page does not jump; a drag scrolls a page; tapping a
 * chart point never moves the chart's buttons; a zoom made on one reading set does not carry over
 * to a new one.
 */
@ExtendWith(ApplicationExtension.class)
class TapsLandUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        // slow work really runs in the background, a little slowly, as a PDF does on a tablet: the
        // screen is seen while it runs
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

    private static Bounds inScene(Node n) {
        return n.localToScene(n.getLayoutBounds());
    }

    private static ScrollPane pageOf(Node n) {
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p instanceof ScrollPane s) {
                return s;
            }
        }
        throw new AssertionError("no scroll pane around " + n);
    }

    @Test
    void theBeforeAfterReportMessageStaysInViewAndThePageDoesNotJump(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.COMPARE));
        Node button = robot.lookup("#before-after-report").query();
        ScrollPane page = pageOf(button);
        double before = page.getVvalue();
        robot.clickOn("#before-after-report");
        robot.sleep(300);
        WaitForAsyncUtils.waitForFxEvents();
        for (int i = 0; i < 100 && session.ledger() != null
                && !robot.lookup("#compare-report-status").queryAs(Labeled.class).getText().startsWith("Saved"); i++) {
            robot.sleep(100);
        }
        WaitForAsyncUtils.waitForFxEvents();
        Labeled status = robot.lookup("#compare-report-status").queryAs(Labeled.class);
        assertTrue(status.getText().startsWith("Saved the before/after report"), status.getText());
        assertEquals(before, page.getVvalue(), 1e-9, "the page did not scroll away");
        Bounds viewport = page.localToScene(page.getLayoutBounds());
        Bounds message = inScene(status);
        assertTrue(message.getMinY() >= viewport.getMinY() && message.getMaxY() <= viewport.getMaxY(),
                "message " + message + " inside the visible page " + viewport);
        Node focused = stage.getScene().getFocusOwner();
        assertTrue(focused == null || focused == button || !focused.getId().startsWith("zoom"),
                "focus stayed off the chart's buttons: " + focused);
    }

    @Test
    void aDragScrollsThePage(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.COMPARE));
        Node table = robot.lookup("#compare-table").query();
        ScrollPane page = pageOf(table);
        robot.interact(() -> page.setVvalue(0));
        Bounds b = inScene(table);
        double x = stage.getX() + b.getMinX() + 40;
        double y = stage.getY() + Math.min(b.getMaxY(), 700);
        robot.moveTo(x, y);
        robot.press(MouseButton.PRIMARY);
        robot.moveBy(0, -120);
        robot.moveBy(0, -120);
        robot.release(MouseButton.PRIMARY);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(page.getVvalue() > 0, "a drag up scrolled the page down: vvalue " + page.getVvalue());
    }

    @Test
    void tappingAChartPointNeverMovesTheButtons(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        PsychroChartView chart = (PsychroChartView) robot.lookup(n -> n instanceof PsychroChartView && n.isVisible())
                .query();
        assertNotNull(chart);
        Bounds zoomIn = inScene(robot.lookup("#zoom-in").query());
        Bounds whole = inScene(robot.lookup("#whole-chart").query());
        ChartPoint p = chart.viewModel().chart().data().overlays().get(0).entering();
        double[] at = chart.screenPosition(p);
        Bounds c = chart.localToScene(chart.getLayoutBounds());
        robot.clickOn(stage.getX() + c.getMinX() + at[0], stage.getY() + c.getMinY() + at[1]);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(p, chart.viewModel().selectedProperty().get(), "the tap picked the state");
        assertTrue(robot.lookup("#readout").queryAs(Labeled.class).getText().contains("Dry bulb"));
        assertEquals(zoomIn, inScene(robot.lookup("#zoom-in").query()), "Zoom in stayed put");
        assertEquals(whole, inScene(robot.lookup("#whole-chart").query()), "Whole chart stayed put");
    }

    @Test
    void aZoomDoesNotCarryOverToANewReadingSet(FxRobot robot) {
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        PsychroChartView chart = (PsychroChartView) robot.lookup(n -> n instanceof PsychroChartView && n.isVisible())
                .query();
        var whole = chart.viewModel().viewportProperty().get().range();
        robot.clickOn("#zoom-in");
        robot.clickOn("#zoom-in");
        assertTrue(chart.viewModel().viewportProperty().get().range().dbMaxC()
                - chart.viewModel().viewportProperty().get().range().dbMinC() < whole.dbMaxC() - whole.dbMinC(),
                "zoomed in");
        robot.clickOn("#new-reading-set");
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        var now = chart.viewModel().viewportProperty().get();
        assertEquals(now.limits(), now.range(), "the new set's chart starts whole");
    }
}
