package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.DashPattern;
import app.latentledger.chart.draw.Labels;
import app.latentledger.chart.draw.Marker;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.chart.draw.Theme;

/**
 * Paints one coil process: entering (filled marker) and leaving (hollow marker) states, the process
 * line with a direction arrow, its extension to the apparatus dew point on the saturation curve, the
 * coil temperature on the saturation curve and the entering air's dew point.
 */
final class OverlayPainter {
    private final Painter p;
    private final Theme theme;
    private final ChartViewport vp;
    private final Labels labels;
    private final PsychroLines lines;
    private final CoilProcessOverlay overlay;
    private final OverlayStyle style;
    private final int index;
    private final String prefix;

    OverlayPainter(Painter p, Theme theme, ChartViewport vp, Labels labels, PsychroLines lines, PsychroChartData data,
                   int index) {
        this.p = p;
        this.theme = theme;
        this.vp = vp;
        this.labels = labels;
        this.lines = lines;
        this.index = index;
        this.overlay = data.overlays().get(index);
        this.style = OverlayStyle.of(theme, overlay, index, data.overlays().size());
        this.prefix = data.overlays().size() == 2 ? style.legendName() + " " : "";
    }

    void paint() {
        p.beginGroup("overlay:" + index);
        double ex = vp.x(overlay.entering().dryBulbC());
        double ey = vp.y(overlay.entering().humidityRatio());
        double lx = vp.x(overlay.leaving().dryBulbC());
        double ly = vp.y(overlay.leaving().humidityRatio());
        TextStyle small = TextStyle.of(theme.smallText(), style.colour());

        if (!Double.isNaN(overlay.enteringDewPointC())) {
            double dx = vp.x(overlay.enteringDewPointC());
            double dy = vp.y(lines.saturationHumidityRatio(overlay.enteringDewPointC()));
            p.beginGroup("dew-point:" + index);
            p.line(ex, ey, dx, dy, new Stroke(style.colour(), 1.4, DashPattern.DOTTED));
            Marker.DIAMOND.paint(p, dx, dy, 11, theme.plotBackground(), Stroke.solid(style.colour(), 2));
            String text = prefix + "dew point " + PsychroChart.Format.temperature(lines.units(),
                    overlay.enteringDewPointC());
            double half = labels.boxWidth(text, small) / 2;
            labels.firstFree(text, small, dx - half - 10, dy - 14, dx - half - 10, dy + 14, dx - half - 10, dy - 36,
                    dx - half - 10, dy + 36, dx + half + 10, dy - 16);
            p.endGroup();
        }

        if (!Double.isNaN(overlay.adpC())) {
            double ax = vp.x(overlay.adpC());
            double ay = vp.y(lines.saturationHumidityRatio(overlay.adpC()));
            p.beginGroup("adp:" + index);
            p.line(lx, ly, ax, ay, new Stroke(style.colour(), 1.6, DashPattern.DOTTED));
            p.circle(ax, ay, 6, theme.plotBackground(), Stroke.solid(style.colour(), 2.2));
            p.circle(ax, ay, 1.8, style.colour(), null);
            String text = prefix + "ADP " + PsychroChart.Format.temperature(lines.units(), overlay.adpC());
            double half = labels.boxWidth(text, small) / 2;
            labels.firstFree(text, small, ax - half - 12, ay - 10, ax - half - 12, ay + 12, ax + half + 12, ay + 16);
            p.endGroup();
        }

        if (!Double.isNaN(overlay.coilTempC())) {
            double cx = vp.x(overlay.coilTempC());
            double cy = vp.y(lines.saturationHumidityRatio(overlay.coilTempC()));
            p.beginGroup("coil:" + index);
            Marker.TRIANGLE_UP.paint(p, cx, cy, 14, theme.coil(), Stroke.solid(theme.plotBackground(), 1.5));
            String text = prefix + "coil " + PsychroChart.Format.temperature(lines.units(), overlay.coilTempC());
            double half = labels.boxWidth(text, small.coloured(theme.coil())) / 2;
            labels.firstFree(text, small.coloured(theme.coil()), cx - half - 12, cy - 8, cx - half - 12, cy + 14,
                    cx + half + 12, cy + 18);
            p.endGroup();
        }

        p.beginGroup("process:" + index);
        p.line(ex, ey, lx, ly, new Stroke(style.colour(), 3.2, style.dash()));
        arrow(ex, ey, lx, ly);
        p.endGroup();

        state(overlay.entering(), ex, ey, true);
        state(overlay.leaving(), lx, ly, false);
        p.endGroup();
    }

    /** A filled arrowhead halfway along the process, pointing from entering to leaving air. */
    private void arrow(double x0, double y0, double x1, double y1) {
        double len = Math.hypot(x1 - x0, y1 - y0);
        if (len < 40) {
            return;
        }
        double ux = (x1 - x0) / len;
        double uy = (y1 - y0) / len;
        double mx = (x0 + x1) / 2 + ux * 6;
        double my = (y0 + y1) / 2 + uy * 6;
        double s = 9;
        p.polygon(new double[] {mx, mx - ux * s * 1.6 - uy * s, mx - ux * s * 1.6 + uy * s},
                new double[] {my, my - uy * s * 1.6 + ux * s, my - uy * s * 1.6 - ux * s}, 3, style.colour(), null);
    }

    private void state(ChartPoint pt, double x, double y, boolean entering) {
        p.beginGroup((entering ? "entering:" : "leaving:") + index);
        if (entering) {
            style.marker().paint(p, x, y, PsychroChart.MARKER_PX, style.colour(), Stroke.solid(theme.plotBackground(), 2));
        } else {
            style.marker().paint(p, x, y, PsychroChart.MARKER_PX, theme.plotBackground(), Stroke.solid(style.colour(), 3));
        }
        TextStyle ts = TextStyle.of(theme.smallText() + 1, theme.text()).emphasised();
        // a label that already names its process ("Before return", as CoilChartSource makes it) is not prefixed twice
        String text = prefix.isEmpty() || pt.label().regionMatches(true, 0, prefix, 0, prefix.length()) ? pt.label()
                : prefix + pt.label().toLowerCase(java.util.Locale.ROOT);
        double half = labels.boxWidth(text, ts) / 2;
        double off = PsychroChart.MARKER_PX / 2 + 6;
        // the last places are a line further out: two states and the marks on the saturation curve
        // can crowd a small plot, and a state without its name is worse than a name a little away
        labels.firstFree(text, ts, x + off + half, y - 2, x + off + half, y - 20, x - off - half, y - 2,
                x, y - off - 10, x, y + off + 10, x - off - half, y + 20, x + off + half, y + 20,
                x, y + off + 30, x, y - off - 30, x - off - half, y - 20);
        p.endGroup();
    }
}
