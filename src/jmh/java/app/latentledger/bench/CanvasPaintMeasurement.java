package app.latentledger.bench;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.timeline.TimeViewport;
import app.latentledger.chart.timeline.TimelineChart;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.chart.timeline.TimelineLayout;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.ui.chart.CanvasPainter;
import app.latentledger.ui.chart.FxTextMeasurer;
import javafx.application.Platform;
import javafx.scene.canvas.Canvas;

import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;

/**
 * One-off measurement (not JMH: JavaFX must paint on its own thread) of the week timeline painted
 * on a real JavaFX canvas at 1280 × 800, headless Monocle with the software pipeline: the time to
 * issue the drawing calls, and the time including rasterising them (a canvas snapshot forces the
 * render). Prints medians of 30 runs after 10 warm-ups.
 *
 * <p>Run (after {@code mvn -B -Pjmh test-compile}):
 * {@code java -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw -cp <test class path>
 * app.latentledger.bench.CanvasPaintMeasurement}
 */
public final class CanvasPaintMeasurement {
    private CanvasPaintMeasurement() {
    }

    public static void main(String[] args) throws Exception {
        TimelineData week = SaltreedDemo.week(UnitSystem.IP, 7);
        CompletableFuture<Void> started = new CompletableFuture<>();
        Platform.startup(() -> started.complete(null));
        started.get();
        CompletableFuture<String> result = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                result.complete(measure(week));
            } catch (RuntimeException e) {
                result.completeExceptionally(e);
            }
        });
        System.out.println(result.get());
        Platform.exit();
    }

    private static String measure(TimelineData week) {
        Canvas canvas = new Canvas(1280, 800);
        FxTextMeasurer measurer = FxTextMeasurer.system();
        TimelineLayout layout = TimelineLayout.forSize(1280, 800, Theme.LIGHT);
        TimelineChart chart = new TimelineChart(week);
        TimeViewport whole = layout.viewport(week);
        int warm = 10;
        int runs = 30;
        double[] issue = new double[runs];
        double[] withRender = new double[runs];
        for (int k = 0; k < warm + runs; k++) {
            TimeViewport vp = k % 2 == 0 ? whole : whole.zoomed(1.25, whole.left() + whole.width() / 2);
            long t0 = System.nanoTime();
            var g = canvas.getGraphicsContext2D();
            g.clearRect(0, 0, 1280, 800);
            chart.paint(new CanvasPainter(g, measurer), Theme.LIGHT, layout, vp, -1);
            long t1 = System.nanoTime();
            canvas.snapshot(null, null);
            long t2 = System.nanoTime();
            if (k >= warm) {
                issue[k - warm] = (t1 - t0) / 1e6;
                withRender[k - warm] = (t2 - t0) / 1e6;
            }
        }
        return String.format(Locale.ROOT, "canvas 1280x800, 604800 samples: issue calls median %.1f ms,"
                + " with rasterising (snapshot) median %.1f ms", median(issue), median(withRender));
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s[s.length / 2];
    }
}
