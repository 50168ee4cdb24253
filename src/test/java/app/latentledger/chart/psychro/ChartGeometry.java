package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.chart.draw.Theme;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/** Paints a chart into a recording and measures what was drawn. */
final class ChartGeometry {
    final PsychroChart chart;
    final PsychroChartLayout layout;
    final ChartViewport vp;
    final RecordingPainter rec = new RecordingPainter();

    ChartGeometry(PsychroChartData data) {
        this(data, 1280, 800);
    }

    ChartGeometry(PsychroChartData data, double width, double height) {
        chart = new PsychroChart(data);
        layout = chart.layout(width, height, Theme.LIGHT);
        vp = chart.initialViewport(layout);
        chart.paint(rec, Theme.LIGHT, layout, vp);
    }

    /** The single polyline drawn in a group. */
    RecordingPainter.Polyline polyline(String group) {
        List<RecordingPainter.Polyline> lines = rec.ops(RecordingPainter.Polyline.class, group);
        assertFalse(lines.isEmpty(), "nothing drawn in group " + group);
        assertEquals(1, lines.size(), "one polyline in " + group);
        return lines.get(0);
    }

    /** Shortest distance, device units, from (x, y) to the polyline. */
    static double distance(RecordingPainter.Polyline line, double x, double y) {
        double best = Double.POSITIVE_INFINITY;
        double[] xs = line.xs();
        double[] ys = line.ys();
        for (int i = 0; i + 1 < xs.length; i++) {
            double dx = xs[i + 1] - xs[i];
            double dy = ys[i + 1] - ys[i];
            double len2 = dx * dx + dy * dy;
            double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((x - xs[i]) * dx + (y - ys[i]) * dy) / len2));
            best = Math.min(best, Math.hypot(x - (xs[i] + t * dx), y - (ys[i] + t * dy)));
        }
        return best;
    }
}
