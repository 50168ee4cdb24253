package app.latentledger.ui;

import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.log.LogImportViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Logs screen on Monocle with two invented sample logs kept on a new visit: the kept logs are
 * listed, shown again and deleted after a question; the import form closes after an import; the
 * message about an action stays in view beside its part of the screen and the focus stays there;
 * a drag scrolls the columns; and at 1280 × 800, 800 × 1280 and with text at 150 % (27 px for the
 * 18 px base) every target is at least 48 px and no text is cut, by {@link LayoutUiTest}'s rules.
 */
@ExtendWith(ApplicationExtension.class)
class LogsScreenUiTest {
    private static final Path SAMPLES = Path.of("field-data-samples");

    @TempDir
    static Path dir;

    private AppSession session;
    private AppShell shell;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(session::openVisit);
        session.startVisit(session.site(), session.system(), VisitPurpose.COMPLAINT, "Test Tech", "");
        show(1280, 800);
        stage.show();
        LogImportViewModel vm = shell.logs();
        vm.airflowProperty().set("1200");
        for (String f : new String[] {"healthy-long-cycling.csv", "oversized-short-cycling.csv"}) {
            vm.formOpenProperty().set(true);
            vm.fileProperty().set(SAMPLES.resolve(f).toString());
            vm.importFile();
        }
        session.screenProperty().set(Screen.LOGS);
    }

    private void show(int w, int h) {
        shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        shell.attachCharts();
        stage.setScene(shell.scene(w, h));
        stage.setWidth(w);
        stage.setHeight(h);
        session.screenProperty().set(Screen.LOGS);
    }

    @AfterEach
    void close() {
        session.close();
    }

    private List<String> problems(FxRobot robot) {
        List<String> problems = new ArrayList<>();
        robot.interact(() -> {
            stage.getScene().getRoot().applyCss();
            stage.getScene().getRoot().layout();
        });
        robot.interact(() -> LayoutUiTest.check(Screen.LOGS, stage.getScene().getRoot(), problems));
        return problems;
    }

    /** Saves what the screen looks like to target/screens, for a person to look at. */
    private void save(FxRobot robot, String name) {
        robot.interact(() -> {
            try {
                java.io.File out = new java.io.File("target/screens");
                out.mkdirs();
                javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(
                        stage.getScene().snapshot(null), null), "png", new java.io.File(out, name + ".png"));
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
    }

    /** The screen with the form closed, then open with a delete question, at one size and text scale. */
    private void checkBothStates(FxRobot robot, String where) {
        List<String> problems = problems(robot);
        save(robot, "logs " + where + " closed");
        ScrollPane pane = robot.lookup("#log-scroll").query();
        robot.interact(() -> pane.setVvalue(1));
        save(robot, "logs " + where + " closed, scrolled to the timeline");
        robot.interact(() -> pane.setVvalue(0));
        robot.interact(() -> {
            shell.logs().formOpenProperty().set(true);
            shell.logs().askDelete(shell.logs().keptLogs().get(0));
        });
        problems.addAll(problems(robot));
        save(robot, "logs " + where + " open");
        assertTrue(problems.isEmpty(), where + ":\n" + String.join("\n", problems));
    }

    @Test
    void landscapeUprightAndLargeTextKeepTargetsWholeAndTextUncut(FxRobot robot) {
        checkBothStates(robot, "1280 × 800");
        robot.interact(() -> show(800, 1280));
        checkBothStates(robot, "800 × 1280");
        robot.interact(() -> {
            show(1280, 800);
            stage.getScene().getRoot().setStyle("-fx-font-size: 27px;");
        });
        checkBothStates(robot, "1280 × 800, text 150 %");
        robot.interact(() -> {
            show(800, 1280);
            stage.getScene().getRoot().setStyle("-fx-font-size: 27px;");
        });
        checkBothStates(robot, "800 × 1280, text 150 %");
    }

    @Test
    void bothKeptLogsAreListedAndTheFormIsClosedAfterTheImport(FxRobot robot) {
        assertEquals(2, robot.lookup(".kept-log").queryAll().size());
        assertFalse(robot.lookup("#log-import-form").query().isVisible(), "closed once a log is shown");
        robot.clickOn("#log-import-toggle");
        assertTrue(robot.lookup("#log-import-form").query().isVisible(), "the toggle opens it again");
        assertTrue(robot.lookup("#log-date-order-auto").query().isVisible());
        assertTrue(robot.lookup("#log-time-zone").query().isVisible());
        assertTrue(robot.lookup("#log-fan-airflow").query().isVisible());
    }

    @Test
    void showingTheOtherLogKeepsTheFocusAndItsMessageInView(FxRobot robot) {
        String first = shell.logs().keptLogs().get(0).id();
        robot.clickOn("#log-view-" + first);
        assertEquals(first, shell.logs().shownIdProperty().get());
        assertInView(robot, "#log-message-logs");
        robot.interact(() -> { });
        Node focus = stage.getScene().getFocusOwner();
        assertFalse(focus != null && focus.getId() != null && focus.getId().startsWith("timeline"),
                "focus went to " + focus);
    }

    @Test
    void anImportFromTheFormClosesItAndTheFocusStaysOnTheToggleNotTheTimeline(FxRobot robot) {
        robot.clickOn("#log-import-toggle");
        robot.interact(() -> shell.logs().fileProperty().set(SAMPLES.resolve("fan-delay-no-status.csv").toString()));
        robot.interact(() -> shell.logs().airflowProperty().set("1200"));
        reveal(robot, "#import-log");
        robot.clickOn("#import-log");
        robot.interact(() -> { });
        assertEquals(3, shell.logs().keptLogs().size(), shell.logs().statusProperty().get());
        assertFalse(robot.lookup("#log-import-form").query().isVisible());
        assertEquals("log-import-toggle", stage.getScene().getFocusOwner().getId(),
                "focus moved to " + stage.getScene().getFocusOwner());
        assertInView(robot, "#log-message-logs");
    }

    @Test
    void aRefusedFieldIsSaidBesideThatFieldInView(FxRobot robot) {
        robot.clickOn("#log-import-toggle");
        TextField zone = robot.lookup("#log-time-zone").query();
        robot.interact(() -> {
            shell.logs().fileProperty().set(SAMPLES.resolve("celsius-plain.csv").toString());
            zone.setText("Saltreed/Nowhere");
        });
        reveal(robot, "#import-log");
        robot.clickOn("#import-log");
        robot.interact(() -> { });
        assertTrue(shell.logs().statusProperty().get().contains("Saltreed/Nowhere"), shell.logs().statusProperty().get());
        assertInView(robot, "#log-message-time-zone");
        assertEquals("import-log", stage.getScene().getFocusOwner().getId(), "the focus stays on the button tapped");
    }

    /** Taps the drop-down under a column's header open and taps the words of one choice. */
    private static void pick(FxRobot robot, String header, String words) {
        Node combo = robot.lookup("#log-column-picks .combo-box").match((Node n) -> header.equals(n.getUserData())).query();
        reveal(robot, "#" + combo.getId());
        robot.clickOn(combo);
        robot.clickOn(robot.lookup(".combo-box-popup .list-cell").match((javafx.scene.control.ListCell<?> c) ->
                words.equals(c.getText())).queryAs(Node.class));
        robot.interact(() -> { });
    }

    @Test
    void anotherLoggersColumnsArePickedInWordsAndItsRefusalsNeverShowFieldNames(FxRobot robot) {
        robot.clickOn("#log-import-toggle");
        assertFalse(robot.lookup("#log-header-map").tryQuery().isPresent(), "no typed header map in the app");
        robot.interact(() -> shell.logs().fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString()));
        List<String> headers = robot.lookup("#log-column-picks .combo-box").queryAll().stream()
                .map(n -> (String) n.getUserData()).toList();
        assertEquals(List.of("Date/Time", "RA Temp [°C]", "RA RH [%]", "SA Temp [°C]", "SA RH [%]", "Battery [V]"),
                headers, "one drop-down per column the app does not know by name");
        List<String> problems = problems(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));

        // a tap on Import before any pick: refused in words beside the picker, nothing kept
        reveal(robot, "#import-log");
        robot.clickOn("#import-log");
        String refused = shell.logs().statusProperty().get();
        assertTrue(refused.startsWith("Not imported: no column holds the time"), refused);
        assertFalse(refused.contains("--map") || refused.contains("HEADER") || refused.contains("return_db"), refused);
        assertInView(robot, "#log-message-columns");
        assertEquals(2, shell.logs().keptLogs().size());

        pick(robot, "Date/Time", "Date and time");
        pick(robot, "RA Temp [°C]", "Return dry bulb");
        pick(robot, "RA RH [%]", "Return relative humidity");
        pick(robot, "SA Temp [°C]", "Supply dry bulb");
        pick(robot, "SA RH [%]", "Supply relative humidity");
        reveal(robot, "#import-log");
        robot.clickOn("#import-log");
        robot.interact(() -> { });
        assertEquals(3, shell.logs().keptLogs().size(), shell.logs().statusProperty().get());
        assertTrue(shell.logs().statusProperty().get().startsWith("Imported other-logger-export.csv"),
                shell.logs().statusProperty().get());
        assertFalse(robot.lookup("#log-import-form").query().isVisible(), "the form closes after the import");
    }

    @Test
    void theColumnPickerKeepsTargetsWholeAndTextUncutUprightWithLargeText(FxRobot robot) {
        robot.interact(() -> {
            show(800, 1280);
            stage.getScene().getRoot().setStyle("-fx-font-size: 27px;");
            shell.logs().formOpenProperty().set(true);
            shell.logs().fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString());
        });
        assertEquals(6, robot.lookup("#log-column-picks .combo-box").queryAll().size());
        List<String> problems = problems(robot);
        save(robot, "logs 800 × 1280, text 150 %, column picker");
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void deletingAskedFromTheListMovesTheLogToTheRecycleBin(FxRobot robot) {
        String id = shell.logs().keptLogs().get(1).id();
        robot.clickOn("#log-delete-" + id);
        assertTrue(robot.lookup("#log-delete-ask").query().isVisible(), "asked first");
        assertEquals(2, shell.logs().keptLogs().size());
        robot.clickOn("#log-delete-confirm");
        assertEquals(1, shell.logs().keptLogs().size());
        assertTrue(session.ledger().recycleBin().find(RecordKind.LOG, id).isPresent());
        assertInView(robot, "#log-message-logs");
    }

    @Test
    void aDragScrollsTheScreenLandscapeAndUpright(FxRobot robot) {
        for (int[] size : new int[][] {{1280, 800}, {800, 1280}}) {
            robot.interact(() -> show(size[0], size[1]));
            robot.interact(() -> shell.logs().formOpenProperty().set(true));
            String id = "#log-scroll";
            ScrollPane pane = robot.lookup(id).query();
            robot.interact(() -> pane.setVvalue(0));
            Bounds b = pane.localToScreen(pane.getLayoutBounds());
            double x = b.getMinX() + b.getWidth() * 0.5;
            double fromY = b.getMinY() + b.getHeight() * 0.8;
            robot.moveTo(new javafx.geometry.Point2D(x, fromY));
            robot.press(MouseButton.PRIMARY);
            robot.moveBy(0, -b.getHeight() * 0.3);
            robot.moveBy(0, -b.getHeight() * 0.3);
            robot.release(MouseButton.PRIMARY);
            robot.interact(() -> { });
            assertNotEquals(0.0, pane.getVvalue(), size[0] + " × " + size[1] + ": a drag did not scroll");
        }
    }

    /** Scrolls the screen until the node is in view, as a tech would before tapping it. */
    private static void reveal(FxRobot robot, String id) {
        Node n = robot.lookup(id).query();
        ScrollPane pane = robot.lookup("#log-scroll").query();
        robot.interact(() -> {
            Node content = pane.getContent();
            double extra = content.getLayoutBounds().getHeight() - pane.getViewportBounds().getHeight();
            Bounds b = content.sceneToLocal(n.localToScene(n.getLayoutBounds()));
            double y = Math.max(0, Math.min(extra, b.getMinY() - 40));
            pane.setVvalue(extra <= 0 ? 0 : y / extra);
        });
    }

    @Test
    void aDragOnTheTimelinePansTheTimelineNotThePage(FxRobot robot) {
        ScrollPane pane = robot.lookup("#log-scroll").query();
        reveal(robot, "#timeline");
        double before = pane.getVvalue();
        Node timeline = robot.lookup("#timeline").query();
        Bounds b = timeline.localToScreen(timeline.getLayoutBounds());
        robot.moveTo(new javafx.geometry.Point2D(b.getMinX() + b.getWidth() * 0.5, b.getMinY() + b.getHeight() * 0.4));
        robot.press(MouseButton.PRIMARY);
        robot.moveBy(-80, -60);
        robot.moveBy(-80, -60);
        robot.release(MouseButton.PRIMARY);
        robot.interact(() -> { });
        assertEquals(before, pane.getVvalue(), 1e-9, "the page moved under a drag on the timeline");
        assertTrue(pane.isPannable(), "after the drag the page pans again");
    }

    private void assertInView(FxRobot robot, String id) {
        Node n = robot.lookup(id).query();
        assertTrue(n.isVisible(), id + " hidden");
        ScrollPane pane = robot.lookup("#log-scroll").query();
        robot.interact(() -> { });
        Bounds view = pane.localToScene(pane.getLayoutBounds());
        Bounds m = n.localToScene(n.getLayoutBounds());
        assertTrue(m.getMinY() >= view.getMinY() - 1 && m.getMaxY() <= view.getMaxY() + 1,
                id + " at " + m + " outside the view " + view);
    }
}
