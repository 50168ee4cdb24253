package app.latentledger.ui;

import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.ChartViewport;
import app.latentledger.chart.psychro.PsychroChartLayout;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.chart.FxTextMeasurer;
import app.latentledger.ui.chart.PsychroChartView;
import app.latentledger.ui.chart.PsychroChartViewModel;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.results.ResultsView;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
import javafx.geometry.BoundingBox;
import javafx.geometry.Bounds;
import javafx.geometry.Point2D;
import javafx.scene.Node;
import javafx.scene.control.Label;
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
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Results screen's psychrometric chart as a tech meets it on a 1280 × 800 tablet, lying down and
 * upright, on the demo's before/after pair: a plot tall enough to read (at least 360 px; the figure
 * is this project's target, no source), the key outside the plot, the subtitle whole, every mark
 * tappable where it is drawn, buttons that stay put, and a fresh window for each reading set.
 */
@ExtendWith(ApplicationExtension.class)
class ResultsChartUiTest {
    /** Smallest plot height the Results chart must get at 1280 × 800 either way up, px. */
    private static final double MIN_PLOT_PX = 360;

    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        session.openReadingSet(DemoScenario.READINGS_AFTER);
        show(1280, 800);
        stage.show();
    }

    private void show(int w, int h) {
        AppShell shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        shell.attachCharts();
        stage.setScene(shell.scene(w, h));
        stage.setWidth(w);
        stage.setHeight(h);
        session.screenProperty().set(Screen.RESULTS);
    }

    @AfterEach
    void close() {
        session.close();
    }

    private PsychroChartView chart(FxRobot robot) {
        return robot.lookup("#" + ResultsView.CHART_SLOT_ID + " #psychro-chart").queryAs(PsychroChartView.class);
    }

    private static Bounds scene(Node n) {
        return n.localToScene(n.getLayoutBounds());
    }

    /** The plot rectangle in scene coordinates. */
    private static Bounds plot(FxRobot robot, PsychroChartViewModel vm) {
        Node canvas = robot.lookup("#psychro-canvas").query();
        ChartViewport vp = vm.viewportProperty().get();
        Point2D a = canvas.localToScene(vp.left(), vp.top());
        return new BoundingBox(a.getX(), a.getY(), vp.width(), vp.height());
    }

    @Test
    void lyingDownTheChartGetsHalfTheWidthATallPlotAndItsKeyOutside(FxRobot robot) {
        checkRoom(robot, 0.5);
    }

    @Test
    void uprightTheChartTakesTheWidthATallPlotAndItsKeyOutside(FxRobot robot) {
        robot.interact(() -> show(800, 1280));
        checkRoom(robot, 0.9);
    }

    private void checkRoom(FxRobot robot, double widthShare) {
        robot.interact(() -> { });
        PsychroChartView view = chart(robot);
        PsychroChartViewModel vm = view.viewModel();
        Bounds plot = plot(robot, vm);
        Bounds screen = scene(robot.lookup("#screen-results").query());
        Bounds slot = scene(robot.lookup("#" + ResultsView.CHART_SLOT_ID).query());
        assertTrue(slot.getWidth() >= screen.getWidth() * widthShare, "chart " + slot.getWidth() + " of "
                + screen.getWidth());
        assertTrue(plot.getHeight() >= MIN_PLOT_PX, "plot is " + plot.getHeight() + " px tall");
        // the verdict and the two key figures come before the chart
        Bounds verdict = scene(robot.lookup("#verdict").query());
        Bounds margin = scene(robot.lookup("#key-dew-point-margin").query());
        Bounds water = scene(robot.lookup("#key-moisture-removal").query());
        assertTrue(margin.getMinY() >= verdict.getMaxY() && water.getMinY() >= verdict.getMaxY());
        assertTrue(margin.getMaxY() <= screen.getMaxY() && water.getMaxY() <= screen.getMaxY(),
                "key figures on screen without scrolling");
        // the key: a band of its own that does not cover the plot, with words for every mark
        Node key = robot.lookup("#chart-key").query();
        Bounds k = scene(key);
        assertTrue(k.getHeight() > 20, "key band " + k);
        assertFalse(k.intersects(plot), "key " + k + " over plot " + plot);
        assertTrue(k.getMaxY() <= slot.getMaxY() + 0.5, "key inside the chart's slot");
        assertEquals(0, vm.layout().legendHeight(), "no second key inside the canvas");
        // subtitle and axis titles: measured with the screen's font, inside the canvas
        RecordingPainter rec = new RecordingPainter(FxTextMeasurer.system());
        PsychroChartLayout layout = vm.layout();
        vm.chart().paint(rec, vm.themeProperty().get(), layout, vm.viewportProperty().get());
        RecordingPainter.Text sub = rec.ops(RecordingPainter.Text.class, "title").stream()
                .filter(t -> t.text().startsWith("Site pressure")).findFirst().orElseThrow();
        double end = sub.x() + FxTextMeasurer.system().width(sub.text(), sub.style().size(), sub.style().bold());
        assertTrue(end <= layout.width(), "'" + sub.text() + "' ends at " + end + " of " + layout.width());
        List<String> keyWords = vm.chart().key(vm.themeProperty().get()).entries().stream()
                .map(e -> e.text()).toList();
        assertTrue(keyWords.containsAll(List.of("Before", "After", "entering dew point", "apparatus dew point",
                "coil temperature")), keyWords.toString());
    }

    @Test
    void tappingEveryMarkSelectsItAndTheButtonsStayPut(FxRobot robot) {
        robot.interact(() -> { });
        PsychroChartViewModel vm = chart(robot).viewModel();
        Node canvas = robot.lookup("#psychro-canvas").query();
        Bounds zoomIn = scene(robot.lookup("#zoom-in").query());
        Bounds zoomOut = scene(robot.lookup("#zoom-out").query());
        Bounds whole = scene(robot.lookup("#whole-chart").query());
        List<ChartPoint> marks = vm.chart().tappableMarks();
        // two states each for the pair, then per process: dew point, ADP and coil
        assertEquals(4 + 6, marks.size(), marks.toString());
        ChartViewport vp = vm.viewportProperty().get();
        for (ChartPoint m : marks) {
            double x = vp.x(m.dryBulbC());
            double y = vp.y(m.humidityRatio());
            assertTrue(x > vp.left() && x < vp.left() + vp.width() && y > vp.top() && y < vp.top() + vp.height(),
                    m + " is drawn inside the plot");
            robot.clickOn(canvas.localToScreen(x, y), MouseButton.PRIMARY);
            ChartPoint picked = vm.selectedProperty().get();
            assertTrue(picked != null, "tapping " + m.label() + " selected nothing");
            // two marks may be drawn on the same spot (an ADP on the dew point): the tap picks one there
            double off = Math.hypot(vp.x(picked.dryBulbC()) - x, vp.y(picked.humidityRatio()) - y);
            assertTrue(picked.equals(m) || off < 1, "tapped " + m.label() + ", got " + picked.label());
            String readout = robot.lookup("#readout").queryAs(Label.class).getText();
            assertTrue(readout.startsWith(picked.label() + "\nDry bulb "), readout);
            assertEquals(zoomIn, scene(robot.lookup("#zoom-in").query()), "Zoom in moved after tapping " + m.label());
            assertEquals(zoomOut, scene(robot.lookup("#zoom-out").query()));
            assertEquals(whole, scene(robot.lookup("#whole-chart").query()));
        }
        long distinct = marks.stream().filter(m -> {
            robot.clickOn(canvas.localToScreen(vp.x(m.dryBulbC()), vp.y(m.humidityRatio())), MouseButton.PRIMARY);
            return m.equals(vm.selectedProperty().get());
        }).count();
        assertTrue(distinct >= marks.size() - 2, distinct + " of " + marks.size() + " marks picked as themselves");
    }

    @Test
    void aNewReadingSetStartsWithTheWholeChart(FxRobot robot) {
        robot.interact(() -> { });
        PsychroChartViewModel vm = chart(robot).viewModel();
        ChartViewport whole = vm.viewportProperty().get();
        robot.clickOn("#zoom-in");
        robot.clickOn("#zoom-in");
        assertNotEquals(whole.range(), vm.viewportProperty().get().range());
        robot.interact(() -> session.openReadingSet(DemoScenario.READINGS_BEFORE));
        ChartViewport now = vm.viewportProperty().get();
        assertEquals(vm.chart().initialViewport(vm.layout()).range(), now.range(), "zoom carried over");
    }
}
