package app.latentledger.chart.timeline;

import app.latentledger.fielddata.SaltreedDemo;
import app.latentledger.chart.draw.RecordingPainter;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The timeline painted into a recording: sizes of what is drawn, panels and bars. */
class TimelineChartTest {
    private static TimelineData week;

    @BeforeAll
    static void makeWeek() {
        week = SaltreedDemo.week(UnitSystem.IP, 7);
    }

    private static RecordingPainter paint(TimeViewport vp, TimelineLayout layout, int selected) {
        RecordingPainter rec = new RecordingPainter();
        new TimelineChart(week).paint(rec, Theme.LIGHT, layout, vp, selected);
        assertTrue(rec.balanced());
        return rec;
    }

    @Test
    @DisplayName("a 604,800-sample week paints each series in at most ~2 points per pixel column")
    void weekPaintsInBoundedPoints() {
        assertEquals(604_800, week.size());
        TimelineLayout layout = TimelineLayout.forSize(1280, 800, Theme.LIGHT);
        RecordingPainter rec = paint(layout.viewport(week), layout, -1);
        int columns = (int) Math.ceil(layout.plotWidth());
        for (String s : List.of("series:return-db", "series:supply-db", "series:return-w", "series:supply-w")) {
            int points = 0;
            for (RecordingPainter.Polygon p : rec.ops(RecordingPainter.Polygon.class, s)) {
                points += p.xs().length;
            }
            for (RecordingPainter.Polyline p : rec.ops(RecordingPainter.Polyline.class, s)) {
                points += p.xs().length;
            }
            assertTrue(points > 0 && points <= 4 * columns + 8, s + ": " + points);
        }
        // a relay band costs at most one rectangle per pixel column plus its frame
        assertTrue(rec.ops(RecordingPainter.Rect.class, "band:compressor").size() <= columns + 1);
    }

    @Test
    @DisplayName("zoomed to one cycle: raw lines, one removed and one returned bar per visible cycle, an onset mark")
    void oneCycleShowsItsBarsAndOnset() {
        TimelineLayout layout = TimelineLayout.forSize(1280, 800, Theme.LIGHT);
        CycleMark c = week.cycles().get(40);
        TimeViewport vp = layout.viewport(week).showing(c.startS(), c.endS());
        RecordingPainter rec = paint(vp, layout, 40);
        long visible = week.cycles().stream().filter(k -> k.endS() >= vp.startS() && k.startS() <= vp.endS()).count();
        // frame + 2 legend swatches + header box + 2 bars per visible cycle
        assertEquals(4 + 2 * visible, rec.ops(RecordingPainter.Rect.class, "moisture").size());
        assertFalse(rec.ops(RecordingPainter.Polyline.class, "series:supply-db").isEmpty());
        assertTrue(rec.ops(RecordingPainter.Polygon.class, "series:supply-db").isEmpty(), "no bands when zoomed in");
        assertTrue(rec.ops(RecordingPainter.Polygon.class, "onsets").size() >= 1);
        List<String> axis = rec.ops(RecordingPainter.Text.class, "time-axis").stream()
                .map(RecordingPainter.Text::text).toList();
        assertTrue(axis.stream().allMatch(s -> s.matches("\\d\\d:\\d\\d")), axis.toString());
    }

    @Test
    void tapFindsTheCycleUnderTheFinger() {
        TimelineLayout layout = TimelineLayout.forSize(1280, 800, Theme.LIGHT);
        TimelineChart chart = new TimelineChart(week);
        TimeViewport vp = layout.viewport(week);
        CycleMark c = week.cycles().get(100);
        assertEquals(100, chart.cycleAt(vp, vp.x((c.startS() + c.endS()) / 2)).orElseThrow());
    }

    @Test
    void mismatchedColumnsAreRefusedWithTheirNames() {
        double[] t = {0, 1, 2};
        double[] v = {1, 2, 3};
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new TimelineData(UnitSystem.IP, "t", null, t, v, new double[2], v, v, new boolean[3],
                        new boolean[3], List.of()));
        assertEquals("supply dry bulb has 2 samples, time has 3", e.getMessage());
    }

    @Test
    @DisplayName("outdoors every timeline line is at least 2 px wide and the grid is drawn in its dark grey")
    void outdoorTimelineHasThickLinesAndAVisibleGrid() {
        TimelineData day = SaltreedDemo.week(UnitSystem.IP, 1);
        RecordingPainter outdoor = new RecordingPainter();
        new TimelineChart(day).paintWhole(outdoor, Theme.OUTDOOR, 1000, 620);
        RecordingPainter light = new RecordingPainter();
        new TimelineChart(day).paintWhole(light, Theme.LIGHT, 1000, 620);
        assertTrue(thinnest(outdoor) >= 2.0, "thinnest outdoor line " + thinnest(outdoor));
        // the check can fail: the light theme draws 1 px grid lines
        assertTrue(thinnest(light) < 2.0);
        List<RecordingPainter.Line> grid = outdoor.ops(RecordingPainter.Line.class, "time-grid");
        assertFalse(grid.isEmpty(), "no time grid");
        for (RecordingPainter.Line l : grid) {
            // the outdoor grid greys (contrast checked against white in OutdoorThemeContrastTest)
            assertTrue(l.stroke().colour().equals(Theme.OUTDOOR.gridMajor())
                    || l.stroke().colour().equals(Theme.OUTDOOR.gridMinor()), l.toString());
        }
    }

    private static double thinnest(RecordingPainter p) {
        double min = Double.MAX_VALUE;
        for (RecordingPainter.Op op : p.ops()) {
            app.latentledger.chart.draw.Stroke s = null;
            if (op instanceof RecordingPainter.Line l) {
                s = l.stroke();
            } else if (op instanceof RecordingPainter.Polyline l) {
                s = l.stroke();
            } else if (op instanceof RecordingPainter.Polygon l) {
                s = l.stroke();
            } else if (op instanceof RecordingPainter.Rect l) {
                s = l.stroke();
            } else if (op instanceof RecordingPainter.Circle l) {
                s = l.stroke();
            }
            if (s != null) {
                min = Math.min(min, s.width());
            }
        }
        return min;
    }
}
