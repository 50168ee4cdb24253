package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.DashPattern;
import app.latentledger.chart.draw.LegendFlow;
import app.latentledger.chart.draw.Marker;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.units.Quantity;

/**
 * The psychrometric chart's key, drawn in a band below the plot so it never hides a state or a
 * line: each coil process by marker and line pattern (filled = entering, hollow = leaving), every
 * other mark the chart can draw (the entering air's dew point, the apparatus dew point, the coil
 * temperature, other plotted states) and the line families.
 */
final class Legend {
    private Legend() {
    }

    static LegendFlow of(Theme theme, PsychroChartData data) {
        LegendFlow key = new LegendFlow(theme);
        int n = data.overlays().size();
        boolean dewPoint = false;
        boolean adp = false;
        boolean coil = false;
        for (int i = 0; i < n; i++) {
            CoilProcessOverlay o = data.overlays().get(i);
            OverlayStyle s = OverlayStyle.of(theme, o, i, n);
            key.add((p, x, y, w) -> {
                p.line(x, y, x + w, y, new Stroke(s.colour(), 3.2, s.dash()));
                s.marker().paint(p, x + 7, y, 13, s.colour(), Stroke.solid(theme.plotBackground(), 1.5));
                s.marker().paint(p, x + w - 7, y, 13, theme.plotBackground(), Stroke.solid(s.colour(), 2.5));
            }, s.legendName(), true);
            dewPoint |= !Double.isNaN(o.enteringDewPointC());
            adp |= !Double.isNaN(o.adpC());
            coil |= !Double.isNaN(o.coilTempC());
        }
        if (n > 0) {
            key.add((p, x, y, w) -> {
                Marker.CIRCLE.paint(p, x + 9, y, 13, theme.mutedText(), null);
                Marker.CIRCLE.paint(p, x + w - 9, y, 13, theme.plotBackground(), Stroke.solid(theme.mutedText(), 2.5));
            }, "entering, leaving");
        }
        if (dewPoint) {
            key.add(LegendFlow.marker(Marker.DIAMOND, 11, theme.plotBackground(), Stroke.solid(theme.mutedText(), 2)),
                    "entering dew point");
        }
        if (adp) {
            key.add((p, x, y, w) -> {
                p.circle(x + w / 2, y, 6, theme.plotBackground(), Stroke.solid(theme.mutedText(), 2.2));
                p.circle(x + w / 2, y, 1.8, theme.mutedText(), null);
            }, "apparatus dew point");
        }
        if (coil) {
            key.add(LegendFlow.marker(Marker.TRIANGLE_UP, 14, theme.coil(), Stroke.solid(theme.plotBackground(), 1.5)),
                    "coil temperature");
        }
        for (ChartPoint pt : data.points()) {
            key.add(LegendFlow.marker(Marker.TRIANGLE_UP, 15, theme.text(), Stroke.solid(theme.plotBackground(), 1.5)),
                    pt.label());
        }
        key.add(LegendFlow.line(Stroke.solid(theme.relativeHumidity(), 1.4)), "RH, 10 % steps");
        key.add(LegendFlow.line(new Stroke(theme.wetBulb(), 1.2, DashPattern.DASHED)),
                "wet bulb, " + Quantity.TEMPERATURE.symbol(data.units()));
        key.add(LegendFlow.line(Stroke.solid(theme.enthalpy(), 1.0)),
                "enthalpy, " + Quantity.ENTHALPY.symbol(data.units()));
        key.add(LegendFlow.line(new Stroke(theme.volume(), 1.2, DashPattern.DASH_DOT)),
                "volume, " + Quantity.SPECIFIC_VOLUME.symbol(data.units()));
        return key;
    }
}
