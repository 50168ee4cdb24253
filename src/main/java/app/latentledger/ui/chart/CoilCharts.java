package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.CoilProcessOverlay;
import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.chart.source.CoilChartSource;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * The psychrometric chart of the screens' coil checks: one process, or a before/after pair drawn
 * together, always through {@link CoilChartSource} so the screen draws what the report draws.
 */
public final class CoilCharts {
    private CoilCharts() {
    }

    /**
     * @param pressurePa site pressure, used when there is no coil check to take it from
     * @param before     the "before" check of a pair, or null for one process
     * @param current    the check of the set in hand, or null while its readings are incomplete
     */
    public static PsychroChartData of(UnitSystem units, double pressurePa, String title, CoilResult before,
                                      CoilResult current) {
        List<CoilProcessOverlay> overlays = new ArrayList<>();
        List<ChartPoint> points = new ArrayList<>();
        boolean pair = before != null && current != null;
        if (before != null) {
            overlays.add(CoilChartSource.overlay("Before", before));
        }
        if (current != null) {
            String name = pair ? "After" : "Measured";
            overlays.add(CoilChartSource.overlay(name, current));
            points.addAll(CoilChartSource.contextPoints(name, current));
        }
        double p = current != null ? current.entering().pressurePa()
                : before != null ? before.entering().pressurePa() : pressurePa;
        return new PsychroChartData(units, p, title, overlays, points);
    }

    /** {@code data}, or an empty chart at sea level when there is nothing to draw yet. */
    public static PsychroChartData orEmpty(PsychroChartData data, UnitSystem units) {
        return data != null ? data : of(units, app.latentledger.core.psychro.SitePressure.SEA_LEVEL.pressurePa(),
                "No readings yet", null, null);
    }

    /** The chart palette of the light or dark theme. */
    public static Theme theme(boolean dark) {
        return dark ? Theme.DARK : Theme.LIGHT;
    }

    /** The chart palette of the app's saved theme, outdoor included. */
    public static Theme theme(app.latentledger.core.settings.DisplayTheme theme) {
        return switch (theme) {
            case DARK -> Theme.DARK;
            case OUTDOOR -> Theme.OUTDOOR;
            case LIGHT -> Theme.LIGHT;
        };
    }
}
