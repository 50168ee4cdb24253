package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.Theme;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Mapping, zoom, pan and hit-testing of the chart window (plain geometry, derived on paper). */
class ChartViewportTest {
    private final ChartRange limits = ChartRange.fieldDefault(UnitSystem.SI);
    private final ChartViewport vp = new ChartViewport(limits, limits, 20, 60, 900, 600);

    @Test
    void mapsAndInvertsBothAxes() {
        assertEquals(20, vp.x(0), 1e-9);
        assertEquals(920, vp.x(45), 1e-9);
        assertEquals(660, vp.y(0), 1e-9);
        assertEquals(60, vp.y(0.030), 1e-9);
        assertEquals(22.5, vp.dryBulbC(vp.x(22.5)), 1e-9);
        assertEquals(0.012, vp.humidityRatio(vp.y(0.012)), 1e-12);
    }

    @Test
    void zoomKeepsThePointUnderTheFingersInPlace() {
        double x = 500;
        double y = 300;
        double db = vp.dryBulbC(x);
        double w = vp.humidityRatio(y);
        ChartViewport z = vp.zoomed(2, x, y);
        assertEquals(limits.dbSpanC() / 2, z.range().dbSpanC(), 1e-9);
        assertEquals(x, z.x(db), 1e-9);
        assertEquals(y, z.y(w), 1e-9);
    }

    @Test
    void zoomAndPanStayWithinTheLimits() {
        ChartViewport out = vp.zoomed(0.1, 500, 300);
        assertEquals(limits, out.range());
        ChartViewport deep = vp.zoomed(1e6, 500, 300);
        assertEquals(ChartViewport.MIN_DB_SPAN_C, deep.range().dbSpanC(), 1e-9);
        ChartViewport panned = vp.zoomed(2, 500, 300).panned(10_000, -10_000);
        assertEquals(limits.dbMinC(), panned.range().dbMinC(), 1e-9);
        assertEquals(limits.wMin(), panned.range().wMin(), 1e-12);
    }

    @Test
    void dragMovesTheChartWithTheFinger() {
        ChartViewport z = vp.zoomed(3, 500, 300);
        double db = z.dryBulbC(400);
        ChartViewport moved = z.panned(50, 0);
        assertEquals(450, moved.x(db), 1e-9);
    }

    @Test
    @DisplayName("a tap within 24 px (half the 48 px touch target) picks the nearest state; farther picks none")
    void tapPicksTheNearestStateWithinTheTouchRadius() {
        ChartPoint a = new ChartPoint("Return", 24, 0.0105);
        ChartPoint b = new ChartPoint("Supply", 13, 0.0085);
        PsychroChart chart = new PsychroChart(new PsychroChartData(UnitSystem.SI, SitePressure.SEA_LEVEL.pressurePa(),
                "t", List.of(new CoilProcessOverlay("", a, b, Double.NaN, Double.NaN, Double.NaN)), List.of()));
        ChartViewport v = chart.initialViewport(PsychroChartLayout.forSize(1280, 800, Theme.LIGHT));
        assertEquals(a, chart.pointNear(v, v.x(24) + 10, v.y(0.0105) - 10).orElseThrow());
        assertEquals(b, chart.pointNear(v, v.x(13) - 5, v.y(0.0085)).orElseThrow());
        assertTrue(chart.pointNear(v, v.x(24) + 30, v.y(0.0105)).isEmpty());
    }
}
