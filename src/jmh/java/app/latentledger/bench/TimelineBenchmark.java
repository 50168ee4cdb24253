package app.latentledger.bench;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextMeasurer;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.psychro.ChartViewport;
import app.latentledger.chart.psychro.PsychroChart;
import app.latentledger.chart.psychro.PsychroChartLayout;
import app.latentledger.chart.timeline.TimeViewport;
import app.latentledger.chart.timeline.TimelineChart;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.chart.timeline.TimelineLayout;
import app.latentledger.core.units.UnitSystem;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

import java.util.concurrent.TimeUnit;

/**
 * The timeline of a 7-day 1 Hz log (604,800 samples per column, invented Saltreed data) painted at
 * 1280 × 800: the first paint (finding the relay runs, then painting the whole week) and one zoom
 * step (×1.25 about the centre), into a painter that only counts calls and into the recording
 * painter. Reference in the same JVM: copying the four value columns once (the least any paint
 * must touch). Also the psychrometric chart's full paint.
 *
 * <p>Run: {@code mvn -B -Pjmh test-compile exec:exec -Djmh.include=TimelineBenchmark}
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xmx2g"})
public class TimelineBenchmark {
    private TimelineData week;
    private TimelineChart chart;
    private TimelineLayout layout;
    private TimeViewport whole;
    private TimeViewport zoomedIn;
    private PsychroChart psychro;
    private PsychroChartLayout psychroLayout;
    private ChartViewport psychroViewport;
    private final CountingPainter counting = new CountingPainter();
    private final RecordingPainter recording = new RecordingPainter();

    /** A painter that does no drawing: what is left is the chart's own work. */
    static final class CountingPainter implements Painter {
        long calls;
        double sink;

        @Override public void save() { calls++; }
        @Override public void restore() { calls++; }
        @Override public void clip(double x, double y, double w, double h) { calls++; }
        @Override public void line(double x1, double y1, double x2, double y2, Stroke s) { calls++; sink += x2; }
        @Override public void polyline(double[] xs, double[] ys, int n, Stroke s) { calls++; sink += xs[n - 1]; }
        @Override public void polygon(double[] xs, double[] ys, int n, Colour f, Stroke s) { calls++; sink += xs[0]; }
        @Override public void rect(double x, double y, double w, double h, Colour f, Stroke s) { calls++; sink += w; }
        @Override public void circle(double cx, double cy, double r, Colour f, Stroke s) { calls++; }
        @Override public void text(double x, double y, String t, TextStyle st) { calls++; }
        @Override public TextMeasurer measurer() { return TextMeasurer.ESTIMATE; }
    }

    @Setup
    public void setUp() {
        week = SaltreedDemo.week(UnitSystem.IP, 7);
        layout = TimelineLayout.forSize(1280, 800, Theme.LIGHT);
        chart = new TimelineChart(week);
        whole = layout.viewport(week);
        zoomedIn = whole.zoomed(1.25, whole.left() + whole.width() / 2);
        psychro = new PsychroChart(SaltreedDemo.beforeAfter(UnitSystem.IP));
        psychroLayout = PsychroChartLayout.forSize(1280, 800, Theme.LIGHT);
        psychroViewport = psychro.initialViewport(psychroLayout);
    }

    /** Reference: copy the four value columns of the week once. */
    @Benchmark
    public void referenceCopyColumns(Blackhole bh) {
        bh.consume(week.returnDbC().clone());
        bh.consume(week.supplyDbC().clone());
        bh.consume(week.returnW().clone());
        bh.consume(week.supplyW().clone());
    }

    /** First paint: build the chart (relay runs) and paint the whole week. */
    @Benchmark
    public long firstPaintWeek() {
        TimelineChart fresh = new TimelineChart(week);
        fresh.paint(counting, Theme.LIGHT, layout, whole, -1);
        return counting.calls;
    }

    /** One zoom step of an open chart: the week at ×1.25. */
    @Benchmark
    public long zoomStep() {
        chart.paint(counting, Theme.LIGHT, layout, zoomedIn, -1);
        return counting.calls;
    }

    /** The whole week into the recording painter (copies every point it is given). */
    @Benchmark
    public int paintWeekRecorded() {
        recording.clear();
        chart.paint(recording, Theme.LIGHT, layout, whole, -1);
        return recording.ops().size();
    }

    /** The psychrometric chart with a before/after pair, every line family, at 1280 × 800. */
    @Benchmark
    public long psychroChartPaint() {
        psychro.paint(counting, Theme.LIGHT, psychroLayout, psychroViewport);
        return counting.calls;
    }
}
