package app.latentledger.report;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.CoilProcessOverlay;
import app.latentledger.chart.psychro.PsychroChart;
import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.chart.source.CoilChartSource;
import app.latentledger.chart.source.LogTimelineSource;
import app.latentledger.chart.timeline.TimelineChart;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.PageFlow;
import app.latentledger.report.pdf.PdfPainter;
import app.latentledger.report.pdf.Typeset;

import java.util.ArrayList;
import java.util.List;

/**
 * The app's own charts, painted as PDF vectors: the psychrometric chart with the coil process
 * (a before/after pair drawn together) and the cycle timeline of a stored log. Painted at screen
 * size and scaled to the column once, so type and line weights keep their on-screen proportions.
 */
final class ChartSection {
    /** Screen-sized drawing areas, device units (the chart engineer's print sizes). */
    static final double PSYCHRO_WIDTH = 1000;
    static final double PSYCHRO_HEIGHT = 620;
    static final double TIMELINE_WIDTH = 1000;
    static final double TIMELINE_HEIGHT = 600;

    private final ReportData data;

    ChartSection(ReportData data) {
        this.data = data;
    }

    /** The psychrometric chart, or nothing when no reading set could be worked out. */
    void psychro(Typeset t) {
        PsychroChartData chart = psychroData();
        if (chart == null) {
            return;
        }
        PageFlow f = t.flow();
        double scale = f.width() / PSYCHRO_WIDTH;
        t.heading("The coil process on the psychrometric chart", PSYCHRO_HEIGHT * scale + 30);
        t.paragraph(explanation(), Ink.SMALL, 0);
        draw(f, scale, PSYCHRO_WIDTH, PSYCHRO_HEIGHT, p -> new PsychroChart(chart).paintWhole(p, Theme.LIGHT,
                PSYCHRO_WIDTH, PSYCHRO_HEIGHT));
    }

    private String explanation() {
        return "Air enters the coil at the filled marker and leaves at the hollow one; the arrow runs from entering"
                + " to leaving. Air that loses water moves down the chart (less water per pound of air); air that only"
                + " cools moves straight left. The dotted level line marks the entering air's dew point: a coil colder"
                + " than it (triangle) condenses water. Drawn at "
                + DisplayNumber.withUnit(Quantity.PRESSURE, data.units(), pressurePa()) + ".";
    }

    PsychroChartData psychroData() {
        List<CoilProcessOverlay> overlays = new ArrayList<>();
        List<ChartPoint> points = new ArrayList<>();
        BeforeAfter pair = data.pair();
        if (pair != null) {
            overlays.add(CoilChartSource.overlay("Before", pair.before().result()));
            overlays.add(CoilChartSource.overlay("After", pair.after().result()));
            points.addAll(CoilChartSource.contextPoints("Before", pair.before().result()));
            points.addAll(CoilChartSource.contextPoints("After", pair.after().result()));
        } else {
            List<CheckedReadings> sets = data.latest().checkedReadings();
            if (sets.isEmpty()) {
                return null;
            }
            CheckedReadings c = sets.get(sets.size() - 1);
            overlays.add(CoilChartSource.overlay(c.name(), c.result()));
            points.addAll(CoilChartSource.contextPoints(c.name(), c.result()));
        }
        return new PsychroChartData(data.units(), pressurePa(), "Coil process, " + data.latest().site().name(),
                overlays, points);
    }

    private double pressurePa() {
        BeforeAfter pair = data.pair();
        CoilResult r = pair != null ? pair.after().result()
                : data.latest().checkedReadings().get(data.latest().checkedReadings().size() - 1).result();
        return r.readings().pressurePa();
    }

    /** The timeline of one analysed log. */
    void timeline(Typeset t, AnalysedLog log) {
        PageFlow f = t.flow();
        double scale = f.width() / TIMELINE_WIDTH;
        TimelineData d = LogTimelineSource.timeline(log.series(), log.report(), log.pressurePa(), data.units(),
                "Logged run: " + log.log().sourceFileName());
        f.need(TIMELINE_HEIGHT * scale + 8);
        draw(f, scale, TIMELINE_WIDTH, TIMELINE_HEIGHT, p -> new TimelineChart(d).paintWhole(p, Theme.LIGHT,
                TIMELINE_WIDTH, TIMELINE_HEIGHT));
    }

    private static void draw(PageFlow f, double scale, double width, double height,
                             java.util.function.Consumer<PdfPainter> paint) {
        f.need(height * scale + 6);
        PdfPainter p = f.painter();
        p.place(f.left(), f.y(), scale, width, height);
        paint.accept(p);
        p.restore();
        p.rect(f.left(), f.y(), width * scale, height * scale, null,
                app.latentledger.chart.draw.Stroke.solid(Ink.RULE, 0.5));
        f.advance(height * scale + 8);
    }
}
