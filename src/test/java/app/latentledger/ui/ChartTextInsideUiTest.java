package app.latentledger.ui;

import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.chart.FxTextMeasurer;
import app.latentledger.ui.chart.PsychroChartView;
import app.latentledger.ui.chart.PsychroChartViewModel;
import app.latentledger.ui.chart.TimelineView;
import app.latentledger.ui.chart.TimelineViewModel;
import app.latentledger.ui.compare.CompareView;
import app.latentledger.ui.log.CycleLogAnalysis;
import app.latentledger.ui.results.ResultsView;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.Screen;
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
import java.util.function.Consumer;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every word the charts paint lies wholly inside its canvas, as the screens give it: the timeline on
 * Logs and the psychrometric charts on Results and Compare, lying down at 1280 × 800 and upright at
 * 800 × 1280. A canvas cuts what runs past its edge without an ellipsis, so no label test sees it;
 * this one measures each painted text with the screen's font and turns it as it is drawn.
 */
@ExtendWith(ApplicationExtension.class)
class ChartTextInsideUiTest {
    @TempDir
    static Path dir;

    private AppSession session;
    private Stage stage;
    private AppShell shell;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        session = AppSession.open(dir, new CycleLogAnalysis());
        session.openVisit(session.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
        session.openReadingSet(DemoScenario.READINGS_AFTER);
        show(1280, 800);
        stage.show();
        // an invented sample log kept on the visit, so Logs draws its timeline
        var logs = shell.logs();
        logs.airflowProperty().set("1200");
        logs.formOpenProperty().set(true);
        logs.fileProperty().set(Path.of("field-data-samples", "oversized-short-cycling.csv").toAbsolutePath().toString());
        logs.importFile();
    }

    private void show(int w, int h) {
        shell = new AppShell(session, Background.DIRECT, Background.DIRECT);
        shell.attachCharts();
        stage.setScene(shell.scene(w, h));
        stage.setWidth(w);
        stage.setHeight(h);
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void lyingDownNoChartTextRunsOffItsCanvas(FxRobot robot) {
        List<String> problems = walk(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void uprightNoChartTextRunsOffItsCanvas(FxRobot robot) {
        robot.interact(() -> show(800, 1280));
        List<String> problems = walk(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void lyingDownOneCycleKeepsMoistureReadableAndMarkersInsideThePlot(FxRobot robot) {
        List<String> problems = oneCycle(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void uprightOneCycleKeepsMoistureReadableAndMarkersInsideThePlot(FxRobot robot) {
        robot.interact(() -> show(800, 1280));
        List<String> problems = oneCycle(robot);
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    /**
     * Zoomed to one cycle (as "Next cycle" does): the moisture panel keeps at least {@link #MIN_BARS_PX}
     * of plot below its title and key, and each marker label ("removal begins") stays between the
     * plot's left and right edges instead of being cut by the right one.
     */
    private List<String> oneCycle(FxRobot robot) {
        List<String> problems = new ArrayList<>();
        robot.interact(() -> session.screenProperty().set(Screen.LOGS));
        TimelineView timeline = robot.lookup("#timeline").queryAs(TimelineView.class);
        TimelineViewModel t = timeline.viewModel();
        int cycles = t.chart().data().cycles().size();
        assertTrue(cycles >= 2, "the sample log has cycles");
        FxTextMeasurer m = FxTextMeasurer.system();
        for (int i = 0; i < cycles; i++) {
            int index = i;
            robot.interact(() -> t.zoomToCycle(index));
            RecordingPainter rec = new RecordingPainter(m);
            robot.interact(() -> t.chart().paint(rec, t.themeProperty().get(), t.layout(), t.viewportProperty().get(),
                    index));
            String at = String.format("cycle %d at %.0f×%.0f", index, t.layout().width(), t.layout().height());
            var band = t.layout().moisture();
            double keyBottom = rec.ops(RecordingPainter.Rect.class, "moisture").stream()
                    .filter(r -> t.themeProperty().get().legendBackground().equals(r.fill()))
                    .mapToDouble(r -> r.y() + r.height()).max().orElseThrow();
            double plot = band.bottom() - keyBottom;
            if (plot < MIN_BARS_PX) {
                problems.add(String.format("%s: moisture plot %.0f px below its key (band %.0f px)", at, plot,
                        band.height()));
            }
            var vp = t.viewportProperty().get();
            for (RecordingPainter.Text text : rec.ops(RecordingPainter.Text.class, "onsets")) {
                double w = m.width(text.text(), text.style().size(), text.style().bold());
                double x0 = switch (text.style().hAlign()) {
                    case LEFT -> text.x();
                    case CENTER -> text.x() - w / 2;
                    case RIGHT -> text.x() - w;
                };
                if (x0 < vp.left() - 1 || x0 + w > vp.left() + vp.width() + 1) {
                    problems.add(String.format("%s: '%s' spans x %.0f–%.0f, plot %.0f–%.0f", at, text.text(), x0,
                            x0 + w, vp.left(), vp.left() + vp.width()));
                }
                // drawn from its top; a font's ascent plus descent is about 1.05 of its size (from memory)
                var hum = t.layout().humidity();
                if (text.y() < hum.top() - 1 || text.y() + text.style().size() * 1.05 > hum.bottom() + 1) {
                    problems.add(String.format("%s: '%s' spans y %.0f–%.0f, panel %.0f–%.0f", at, text.text(),
                            text.y(), text.y() + text.style().size() * 1.05, hum.top(), hum.bottom()));
                }
            }
        }
        return problems;
    }

    /** Room for the bars to read as sizes, not ticks (common practice, no source). */
    private static final double MIN_BARS_PX = 120;

    private List<String> walk(FxRobot robot) {
        List<String> problems = new ArrayList<>();
        robot.interact(() -> session.screenProperty().set(Screen.LOGS));
        TimelineView timeline = robot.lookup("#timeline").queryAs(TimelineView.class);
        TimelineViewModel t = timeline.viewModel();
        robot.interact(() -> inside("Logs timeline", t.layout().width(), t.layout().height(),
                p -> t.chart().paint(p, t.themeProperty().get(), t.layout(), t.viewportProperty().get(), -1), problems));
        robot.interact(() -> session.screenProperty().set(Screen.RESULTS));
        psychro(robot, "Results", "#" + ResultsView.CHART_SLOT_ID + " #psychro-chart", problems);
        robot.interact(() -> session.screenProperty().set(Screen.COMPARE));
        psychro(robot, "Compare", "#" + CompareView.CHART_SLOT_ID + " #psychro-chart", problems);
        return problems;
    }

    private void psychro(FxRobot robot, String screen, String query, List<String> problems) {
        PsychroChartViewModel vm = robot.lookup(query).queryAs(PsychroChartView.class).viewModel();
        robot.interact(() -> inside(screen + " chart", vm.layout().width(), vm.layout().height(),
                p -> vm.chart().paint(p, vm.themeProperty().get(), vm.layout(), vm.viewportProperty().get()), problems));
    }

    private static void inside(String what, double w, double h, Consumer<Painter> paint, List<String> problems) {
        FxTextMeasurer m = FxTextMeasurer.system();
        RecordingPainter rec = new RecordingPainter(m);
        paint.accept(rec);
        int texts = 0;
        for (RecordingPainter.Text t : rec.ops(RecordingPainter.Text.class, null)) {
            texts++;
            TextStyle s = t.style();
            double tw = m.width(t.text(), s.size(), s.bold());
            // the text's box before turning, relative to its anchor (a font's ascent and descent are
            // about 0.8 and 0.25 of its size; from memory)
            double x0 = switch (s.hAlign()) {
                case LEFT -> 0;
                case CENTER -> -tw / 2;
                case RIGHT -> -tw;
            };
            double y0 = switch (s.vAlign()) {
                case TOP -> 0;
                case MIDDLE -> -s.size() * 0.525;
                case BASELINE -> -s.size() * 0.8;
                case BOTTOM -> -s.size() * 1.05;
            };
            double a = Math.toRadians(s.rotationDeg());
            double minX = Double.MAX_VALUE;
            double maxX = -Double.MAX_VALUE;
            double minY = Double.MAX_VALUE;
            double maxY = -Double.MAX_VALUE;
            for (double[] c : new double[][] {{x0, y0}, {x0 + tw, y0}, {x0, y0 + s.size() * 1.05},
                    {x0 + tw, y0 + s.size() * 1.05}}) {
                double x = t.x() + c[0] * Math.cos(a) - c[1] * Math.sin(a);
                double y = t.y() + c[0] * Math.sin(a) + c[1] * Math.cos(a);
                minX = Math.min(minX, x);
                maxX = Math.max(maxX, x);
                minY = Math.min(minY, y);
                maxY = Math.max(maxY, y);
            }
            if (minX < -1 || maxX > w + 1 || minY < -1 || maxY > h + 1) {
                problems.add(String.format("%s %.0f×%.0f: '%s' spans x %.0f–%.0f, y %.0f–%.0f", what, w, h, t.text(),
                        minX, maxX, minY, maxY));
            }
        }
        assertFalse(texts == 0, what + " painted no text");
    }
}
