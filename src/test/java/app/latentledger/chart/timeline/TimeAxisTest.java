package app.latentledger.chart.timeline;

import org.junit.jupiter.api.Test;

import java.time.LocalDateTime;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Time ticks and the time window; expected values worked out on a calendar. */
class TimeAxisTest {
    private static final LocalDateTime MONDAY = LocalDateTime.of(2026, 7, 13, 0, 0);

    @Test
    void aWeekIsLabelledByDay() {
        TimeViewport vp = new TimeViewport(0, 7 * 86_400, 0, 7 * 86_400, 0, 1000);
        List<TimeTicks.Tick> ticks = TimeTicks.ticks(vp, MONDAY, 110);
        assertEquals(List.of("Mon 13", "Tue 14", "Wed 15", "Thu 16", "Fri 17", "Sat 18", "Sun 19", "Mon 20"),
                ticks.stream().map(TimeTicks.Tick::label).toList());
    }

    @Test
    void aCycleIsLabelledByClockMinutes() {
        // 15:40 to 16:10 on Monday, 1000 px: 5 min steps (110 px needs ≥ 3.3 min)
        TimeViewport vp = new TimeViewport(15 * 3600 + 40 * 60, 16 * 3600 + 10 * 60, 0, 7 * 86_400, 0, 1000);
        List<String> labels = TimeTicks.ticks(vp, MONDAY, 110).stream().map(TimeTicks.Tick::label).toList();
        assertEquals(List.of("15:40", "15:45", "15:50", "15:55", "16:00", "16:05", "16:10"), labels);
    }

    @Test
    void ticksFollowTheWallClockWhenTheLogStartsOffTheHour() {
        LocalDateTime start = LocalDateTime.of(2026, 7, 13, 9, 17, 30);
        TimeViewport vp = new TimeViewport(0, 6 * 3600, 0, 86_400, 0, 1000);
        List<TimeTicks.Tick> ticks = TimeTicks.ticks(vp, start, 110);
        assertEquals("10:00", ticks.get(0).label());
        assertEquals(42 * 60 + 30, ticks.get(0).timeS(), 1e-9);
    }

    @Test
    void elapsedLabelsWithoutAClock() {
        TimeViewport vp = new TimeViewport(0, 3 * 86_400, 0, 3 * 86_400, 0, 600);
        List<String> labels = TimeTicks.ticks(vp, null, 110).stream().map(TimeTicks.Tick::label).toList();
        assertEquals("day 1", labels.get(0));
        assertTrue(labels.contains("day 2"));
    }

    @Test
    void zoomKeepsTheTimeUnderTheFingerAndStopsAtTwoMinutes() {
        TimeViewport vp = new TimeViewport(0, 604_799, 0, 604_799, 100, 1000);
        double t = vp.timeS(350);
        TimeViewport z = vp.zoomed(10, 350);
        assertEquals(350, z.x(t), 1e-6);
        assertEquals(TimeViewport.MIN_SPAN_S, vp.zoomed(1e9, 350).spanS(), 1e-9);
        assertEquals(604_799, vp.zoomed(0.001, 350).spanS(), 1e-9);
    }

    @Test
    void showingACycleAddsATenthEachSide() {
        TimeViewport vp = new TimeViewport(0, 604_799, 0, 604_799, 0, 1000);
        TimeViewport c = vp.showing(10_000, 11_000);
        assertEquals(9_900, c.startS(), 1e-9);
        assertEquals(11_100, c.endS(), 1e-9);
    }
}
