package app.latentledger.chart.psychro;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.UnitSystem;

import java.util.List;
import java.util.Objects;

/**
 * Everything a psychrometric chart shows: the units and site pressure it is drawn for, up to two
 * coil processes (one, or a before/after pair) and any other states (outdoor, indoor).
 */
public record PsychroChartData(UnitSystem units, double pressurePa, String title, List<CoilProcessOverlay> overlays,
                               List<ChartPoint> points) {

    public PsychroChartData {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(title, "title");
        InputLimits.checkPressure("chart pressure", pressurePa);
        overlays = List.copyOf(overlays);
        points = List.copyOf(points);
        if (overlays.size() > 2) {
            throw new IllegalArgumentException("a chart draws one coil process or a before/after pair, got "
                    + overlays.size());
        }
    }

    /** Every plotted state, in drawing order, for hit-testing. */
    public List<ChartPoint> allPoints() {
        List<ChartPoint> all = new java.util.ArrayList<>();
        for (CoilProcessOverlay o : overlays) {
            all.add(o.entering());
            all.add(o.leaving());
        }
        all.addAll(points);
        return all;
    }
}
