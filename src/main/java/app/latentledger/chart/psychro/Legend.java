package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.DashPattern;
import app.latentledger.chart.draw.Marker;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextMeasurer;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.units.Quantity;

import java.util.ArrayList;
import java.util.List;

/**
 * The key in the chart's empty upper-left corner (above the saturation curve): each coil process
 * by marker and line pattern, filled = entering and hollow = leaving, and the line families.
 */
final class Legend {
    private static final double PAD = 12;
    private static final double SAMPLE_W = 44;

    private final Theme theme;
    private final PsychroChartData data;

    Legend(Theme theme, PsychroChartData data) {
        this.theme = theme;
        this.data = data;
    }

    private double rowHeight() {
        return theme.smallText() * 1.55;
    }

    private List<String> texts() {
        List<String> t = new ArrayList<>();
        for (int i = 0; i < data.overlays().size(); i++) {
            t.add(OverlayStyle.of(theme, data.overlays().get(i), i, data.overlays().size()).legendName());
        }
        if (!data.overlays().isEmpty()) {
            t.add("filled entering, hollow leaving");
        }
        t.add("relative humidity, 10 % steps");
        t.add(wetBulb());
        t.add(enthalpy());
        t.add(volume());
        return t;
    }

    private String wetBulb() {
        return "wet bulb, " + Quantity.TEMPERATURE.symbol(data.units());
    }

    private String enthalpy() {
        return "enthalpy, " + Quantity.ENTHALPY.symbol(data.units());
    }

    private String volume() {
        return "specific volume, " + Quantity.SPECIFIC_VOLUME.symbol(data.units());
    }

    /** {x, y, width, height} of the legend box in device units. */
    double[] box(Painter p, ChartViewport vp) {
        TextMeasurer m = p.measurer();
        double w = 0;
        for (String s : texts()) {
            w = Math.max(w, m.width(s, theme.smallText(), false));
        }
        double width = PAD * 3 + SAMPLE_W + w;
        double height = PAD * 2 + rowHeight() * texts().size();
        return new double[] {vp.left() + 14, vp.top() + 14, width, height};
    }

    void paint(Painter p, double[] box) {
        p.beginGroup("legend");
        p.rect(box[0], box[1], box[2], box[3], theme.legendBackground(), Stroke.solid(theme.gridMajor(), 1));
        double x = box[0] + PAD;
        double textX = x + SAMPLE_W + PAD;
        double y = box[1] + PAD + rowHeight() / 2;
        TextStyle ts = TextStyle.of(theme.smallText(), theme.text()).align(TextStyle.HAlign.LEFT,
                TextStyle.VAlign.MIDDLE);
        int n = data.overlays().size();
        for (int i = 0; i < n; i++) {
            OverlayStyle s = OverlayStyle.of(theme, data.overlays().get(i), i, n);
            p.line(x, y, x + SAMPLE_W, y, new Stroke(s.colour(), 3.2, s.dash()));
            s.marker().paint(p, x + 8, y, 14, s.colour(), Stroke.solid(theme.plotBackground(), 1.5));
            s.marker().paint(p, x + SAMPLE_W - 8, y, 14, theme.plotBackground(), Stroke.solid(s.colour(), 2.5));
            p.text(textX, y, s.legendName(), ts.emphasised());
            y += rowHeight();
        }
        if (n > 0) {
            Marker.CIRCLE.paint(p, x + 10, y, 13, theme.mutedText(), null);
            Marker.CIRCLE.paint(p, x + SAMPLE_W - 10, y, 13, theme.plotBackground(),
                    Stroke.solid(theme.mutedText(), 2.5));
            p.text(textX, y, "filled entering, hollow leaving", ts);
            y += rowHeight();
        }
        sample(p, x, y, Stroke.solid(theme.relativeHumidity(), 1.4), textX, "relative humidity, 10 % steps", ts);
        y += rowHeight();
        sample(p, x, y, new Stroke(theme.wetBulb(), 1.2, DashPattern.DASHED), textX, wetBulb(), ts);
        y += rowHeight();
        sample(p, x, y, Stroke.solid(theme.enthalpy(), 1.0), textX, enthalpy(), ts);
        y += rowHeight();
        sample(p, x, y, new Stroke(theme.volume(), 1.2, DashPattern.DASH_DOT), textX, volume(), ts);
        p.endGroup();
    }

    private static void sample(Painter p, double x, double y, Stroke stroke, double textX, String text, TextStyle ts) {
        p.line(x, y, x + SAMPLE_W, y, stroke);
        p.text(textX, y, text, ts);
    }
}
