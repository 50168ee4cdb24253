package app.latentledger.chart.psychro;

import app.latentledger.chart.axis.LabelPlacer;
import app.latentledger.chart.axis.NiceTicks;
import app.latentledger.chart.draw.DashPattern;
import app.latentledger.chart.draw.Labels;
import app.latentledger.chart.draw.Marker;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Paints a psychrometric chart with its coil processes through a {@link Painter}. The same call
 * draws on screen and into the PDF report. Groups name what is drawn ("saturation", "rh:50",
 * "wet-bulb:65", "enthalpy:30", "volume:13.5", "db-axis", "w-axis", "overlay:0", "legend").
 */
public final class PsychroChart {
    /** Marker width for plotted states, device units. */
    public static final double MARKER_PX = 17;
    /** Radius within which a tap picks a state: half the 48 px touch target. */
    public static final double TAP_RADIUS_PX = 24;
    private static final double MIN_W_TICK_PX = 44;

    private final PsychroChartData data;
    private final PsychroLines lines;

    public PsychroChart(PsychroChartData data) {
        this.data = data;
        this.lines = new PsychroLines(data.units(), data.pressurePa());
    }

    public PsychroChartData data() {
        return data;
    }

    public PsychroLines lines() {
        return lines;
    }

    /** How far the chart may be zoomed out: the field window, widened to show every plotted state. */
    public ChartRange limits() {
        ChartRange r = ChartRange.fieldDefault(data.units());
        double dbMin = r.dbMinC();
        double dbMax = r.dbMaxC();
        double wMax = r.wMax();
        for (ChartPoint p : data.allPoints()) {
            dbMin = Math.min(dbMin, p.dryBulbC() - 2);
            dbMax = Math.max(dbMax, p.dryBulbC() + 2);
            wMax = Math.max(wMax, p.humidityRatio() * 1.08);
        }
        return new ChartRange(dbMin, dbMax, r.wMin(), wMax);
    }

    /** The whole chart in a layout. */
    public ChartViewport initialViewport(PsychroChartLayout layout) {
        ChartRange limits = limits();
        return layout.viewport(limits, limits);
    }

    /**
     * Every mark a tap can pick: the plotted states, then each process's entering dew point
     * (diamond), apparatus dew point (ring) and coil temperature (triangle). The last three sit on
     * the saturation curve, so each is the saturated state at that temperature.
     */
    public List<ChartPoint> tappableMarks() {
        List<ChartPoint> all = new java.util.ArrayList<>(data.allPoints());
        int n = data.overlays().size();
        for (int i = 0; i < n; i++) {
            CoilProcessOverlay o = data.overlays().get(i);
            String prefix = n == 2 ? OverlayStyle.of(Theme.LIGHT, o, i, n).legendName() + " " : "";
            saturated(all, prefix, "entering dew point", o.enteringDewPointC());
            saturated(all, prefix, "apparatus dew point", o.adpC());
            saturated(all, prefix, "coil temperature", o.coilTempC());
        }
        return all;
    }

    private void saturated(List<ChartPoint> into, String prefix, String what, double tC) {
        if (!Double.isNaN(tC)) {
            String label = prefix.isEmpty() ? Character.toUpperCase(what.charAt(0)) + what.substring(1) : prefix + what;
            into.add(new ChartPoint(label, tC, lines.saturationHumidityRatio(tC)));
        }
    }

    /** The chart's key (what {@link #paint} draws below the plot), for a screen that shows it beside the canvas. */
    public app.latentledger.chart.draw.LegendFlow key(Theme theme) {
        return Legend.of(theme, data);
    }

    /** The mark nearest to (x, y) within {@link #TAP_RADIUS_PX}, if any (see {@link #tappableMarks}). */
    public Optional<ChartPoint> pointNear(ChartViewport vp, double x, double y) {
        ChartPoint best = null;
        double bestD = TAP_RADIUS_PX;
        for (ChartPoint p : tappableMarks()) {
            double d = Math.hypot(vp.x(p.dryBulbC()) - x, vp.y(p.humidityRatio()) - y);
            // on a tie the earlier mark wins: a measured state over a mark drawn on top of it
            if (d < bestD || best == null && d <= bestD) {
                bestD = d;
                best = p;
            }
        }
        return Optional.ofNullable(best);
    }

    /**
     * Paints the whole, unzoomed chart into a {@code width} × {@code height} area: what the report
     * draws. For print, paint at screen size (e.g. 1000 × 620) and let the painter scale the
     * vectors to the page, so type and line weights keep their proportions.
     */
    public void paintWhole(Painter p, Theme theme, double width, double height) {
        PsychroChartLayout layout = layout(width, height, theme);
        paint(p, theme, layout, initialViewport(layout));
    }

    /** The layout of this chart in a {@code width} × {@code height} area, with room for its key below the plot. */
    public PsychroChartLayout layout(double width, double height, Theme theme) {
        return layout(width, height, theme, true);
    }

    /**
     * The layout in a {@code width} × {@code height} area; {@code withKey} false leaves the key out
     * (a screen that shows it outside the canvas gives the plot that height).
     */
    public PsychroChartLayout layout(double width, double height, Theme theme, boolean withKey) {
        if (!withKey) {
            return PsychroChartLayout.forSize(width, height, theme, 0);
        }
        double keyHeight = Legend.of(theme, data).height(PsychroChartLayout.legendWidth(width, theme));
        // the key never takes more than 40 % of the chart's height; a tiny chart keeps its plot instead
        return PsychroChartLayout.forSize(width, height, theme, keyHeight <= height * 0.4 ? keyHeight : 0);
    }

    /** Paints the whole chart: frame, line families, axes, overlays, legend and title. */
    public void paint(Painter painter, Theme theme, PsychroChartLayout layout, ChartViewport vp) {
        Painter p = theme.painter(painter);
        p.rect(0, 0, layout.width(), layout.height(), theme.background(), null);
        p.rect(vp.left(), vp.top(), vp.width(), vp.height(), theme.plotBackground(), null);
        LabelPlacer placer = new LabelPlacer(vp.left(), vp.top(), vp.left() + vp.width(), vp.top() + vp.height());
        Labels labels = new Labels(p, placer, theme.plotBackground());
        reserveMarkers(placer, vp);

        List<ChartCurve> curves = lines.compute(vp.range(), vp.width());
        p.save();
        p.clip(vp.left(), vp.top(), vp.width(), vp.height());
        paintGrid(p, theme, vp);
        for (ChartCurve.Kind kind : new ChartCurve.Kind[] {ChartCurve.Kind.ENTHALPY, ChartCurve.Kind.SPECIFIC_VOLUME,
                ChartCurve.Kind.WET_BULB, ChartCurve.Kind.RELATIVE_HUMIDITY, ChartCurve.Kind.SATURATION}) {
            for (ChartCurve c : curves) {
                if (c.kind() == kind) {
                    paintCurve(p, theme, vp, c);
                }
            }
        }
        // overlay labels first: they matter most, curve labels make way for them
        for (int i = 0; i < data.overlays().size(); i++) {
            new OverlayPainter(p, theme, vp, labels, lines, data, i).paint();
        }
        paintFreePoints(p, theme, vp, labels);
        paintCurveLabels(theme, vp, labels, curves);
        paintEnthalpyScale(p, theme, vp, labels, curves);
        p.restore();

        paintFrame(p, theme, vp);
        paintDryBulbAxis(p, theme, vp);
        paintHumidityRatioAxis(p, theme, vp);
        if (layout.legendHeight() > 0) {
            Legend.of(theme, data).paint(p, vp.left(), layout.legendTop(), PsychroChartLayout.legendWidth(layout.width(),
                    theme));
        }
        paintTitle(p, theme, layout, vp);
    }

    /** A ring around the tapped state so the tech sees which one the readout describes. */
    public void paintSelection(Painter painter, Theme theme, ChartViewport vp, ChartPoint point) {
        Painter p = theme.painter(painter);
        p.beginGroup("selection");
        p.circle(vp.x(point.dryBulbC()), vp.y(point.humidityRatio()), MARKER_PX * 0.95, null,
                Stroke.solid(theme.text(), 2.4));
        p.endGroup();
    }

    private void reserveMarkers(LabelPlacer placer, ChartViewport vp) {
        double r = MARKER_PX * 0.75;
        List<ChartPoint> states = data.allPoints();
        for (ChartPoint pt : states) {
            placer.reserve(vp.x(pt.dryBulbC()) - r, vp.y(pt.humidityRatio()) - r, 2 * r, 2 * r);
        }
    }

    private void paintGrid(Painter p, Theme theme, ChartViewport vp) {
        UnitSystem u = data.units();
        p.beginGroup("grid");
        double step = lines.dryBulbStepDisplay(vp.range(), vp.width());
        double minor = step / 5;
        double shownMin = Quantity.TEMPERATURE.toDisplay(u, vp.range().dbMinC());
        double shownMax = Quantity.TEMPERATURE.toDisplay(u, vp.range().dbMaxC());
        Stroke minorStroke = Stroke.solid(theme.gridMinor(), 1);
        Stroke majorStroke = Stroke.solid(theme.gridMajor(), 1);
        boolean showMinor = minor / (shownMax - shownMin) * vp.width() >= 9;
        for (double shown : NiceTicks.values(shownMin, shownMax, showMinor ? minor : step)) {
            double c = Quantity.TEMPERATURE.fromDisplay(u, shown);
            boolean major = Math.abs(shown / step - Math.rint(shown / step)) < 1e-6;
            double x = vp.x(c);
            double yTop = vp.y(Math.min(lines.saturationHumidityRatio(c), vp.range().wMax()));
            p.line(x, vp.y(vp.range().wMin()), x, yTop, major ? majorStroke : minorStroke);
        }
        double wStep = humidityRatioStepDisplay(vp);
        Quantity q = Quantity.HUMIDITY_RATIO_FINE;
        for (double shown : NiceTicks.values(q.toDisplay(u, vp.range().wMin()), q.toDisplay(u, vp.range().wMax()),
                wStep)) {
            double w = q.fromDisplay(u, shown);
            if (w <= 0) {
                continue;
            }
            // horizontal W lines start at the saturation curve: their left end is the dew point
            double xStart = Math.max(vp.left(), vp.x(Psychrometrics.dewPointC(w, data.pressurePa())));
            p.line(xStart, vp.y(w), vp.left() + vp.width(), vp.y(w), majorStroke);
        }
        p.endGroup();
    }

    private void paintCurve(Painter p, Theme theme, ChartViewport vp, ChartCurve c) {
        int n = c.size();
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = vp.x(c.dryBulbC()[i]);
            ys[i] = vp.y(c.humidityRatio()[i]);
        }
        p.beginGroup(groupName(c));
        p.polyline(xs, ys, n, stroke(theme, c));
        p.endGroup();
    }

    static String groupName(ChartCurve c) {
        return switch (c.kind()) {
            case SATURATION -> "saturation";
            case RELATIVE_HUMIDITY -> "rh:" + c.label().replace(" %", "");
            case WET_BULB -> "wet-bulb:" + c.label();
            case ENTHALPY -> "enthalpy:" + c.label();
            case SPECIFIC_VOLUME -> "volume:" + c.label();
        };
    }

    static Stroke stroke(Theme theme, ChartCurve c) {
        return switch (c.kind()) {
            case SATURATION -> Stroke.solid(theme.saturation(), 2.6);
            case RELATIVE_HUMIDITY -> Stroke.solid(theme.relativeHumidity(), c.valueSi() == 50 ? 1.6 : 1.1);
            case WET_BULB -> new Stroke(theme.wetBulb(), 1.0, DashPattern.DASHED);
            case ENTHALPY -> Stroke.solid(theme.enthalpy().withAlpha(0.75), 0.9);
            case SPECIFIC_VOLUME -> new Stroke(theme.volume(), 1.0, DashPattern.DASH_DOT);
        };
    }

    /**
     * The enthalpy lines continue a short way past the saturation curve into the empty upper left,
     * where they are labelled, as the handbook's charts carry their enthalpy scale outside the curve.
     */
    private void paintEnthalpyScale(Painter p, Theme theme, ChartViewport vp, Labels labels, List<ChartCurve> curves) {
        TextStyle style = TextStyle.of(theme.smallText(), theme.enthalpy());
        double reach = 30;
        boolean unitShown = false;
        // from the top down, so the unit goes on the highest label that fits
        for (int k = curves.size() - 1; k >= 0; k--) {
            ChartCurve c = curves.get(k);
            if (c.kind() != ChartCurve.Kind.ENTHALPY || c.dryBulbC()[0] <= vp.range().dbMinC() + 1e-9) {
                continue;
            }
            double db = c.dryBulbC()[0];
            double x0 = vp.x(db);
            double y0 = vp.y(c.humidityRatio()[0]);
            // direction of the line in device space, pointing up and to the left (away from the curve)
            double dDb = vp.range().dbSpanC() * 0.01;
            double w1 = lines.enthalpy(c.valueSi()).applyAsDouble(db - dDb);
            double dx = vp.x(db - dDb) - x0;
            double dy = vp.y(w1) - y0;
            double len = Math.hypot(dx, dy);
            if (!(len > 0)) {
                continue;
            }
            dx /= len;
            dy /= len;
            double x1 = x0 + dx * reach;
            double y1 = y0 + dy * reach;
            p.beginGroup("enthalpy-scale:" + c.label());
            p.line(x0, y0, x1, y1, Stroke.solid(theme.enthalpy(), 0.9));
            TextStyle rotated = style.rotated(Math.toDegrees(Math.atan2(-dy, -dx)));
            String withUnit = c.label() + " " + Quantity.ENTHALPY.symbol(data.units());
            if (!unitShown && labelOutward(labels, x1, y1, dx, dy, withUnit, rotated)) {
                unitShown = true;
            } else {
                labelOutward(labels, x1, y1, dx, dy, c.label(), rotated);
            }
            p.endGroup();
        }
    }

    private static boolean labelOutward(Labels labels, double x, double y, double dx, double dy, String text,
                                        TextStyle style) {
        double half = labels.boxWidth(text, style) / 2;
        return labels.centred(x + dx * (half + 2), y + dy * (half + 2), text, style);
    }

    private void paintCurveLabels(Theme theme, ChartViewport vp, Labels labels, List<ChartCurve> curves) {
        double small = theme.smallText();
        boolean volumeUnitShown = false;
        for (int k = curves.size() - 1; k >= 0; k--) {
            ChartCurve c = curves.get(k);
            if (c.kind() != ChartCurve.Kind.SPECIFIC_VOLUME) {
                continue;
            }
            double wLabel = vp.range().wMin() + vp.range().wSpan() * 0.07;
            int i = indexNearestW(c, wLabel);
            if (i < 0) {
                continue;
            }
            double angle = angleAt(vp, c, i);
            TextStyle vs = TextStyle.of(small, theme.volume()).rotated(angle);
            String withUnit = c.label() + " " + Quantity.SPECIFIC_VOLUME.symbol(data.units());
            if (!volumeUnitShown && labelAlongLine(vp, labels, c, i, angle, withUnit, vs)) {
                volumeUnitShown = true;
            } else {
                labelAlongLine(vp, labels, c, i, angle, c.label(), vs);
            }
        }
        for (ChartCurve c : curves) {
            switch (c.kind()) {
                case RELATIVE_HUMIDITY -> labelAlong(vp, labels, c, 0.86,
                        TextStyle.of(small, theme.relativeHumidity()).emphasised());
                case WET_BULB -> {
                    // on the saturation curve the wet bulb equals the dry bulb and the dew point
                    double x = vp.x(c.dryBulbC()[0]);
                    double y = vp.y(c.humidityRatio()[0]);
                    labels.firstFree(c.label(), TextStyle.of(small, theme.wetBulb()), x - 14, y - 12, x - 20, y - 4);
                }
                default -> { }
            }
        }
    }

    /** A label that starts just right of sample i and runs up the line. */
    private static boolean labelAlongLine(ChartViewport vp, Labels labels, ChartCurve c, int i, double angle,
                                          String text, TextStyle style) {
        double along = labels.boxWidth(text, style) / 2 - 14;
        double rad = Math.toRadians(angle);
        return labels.centred(vp.x(c.dryBulbC()[i]) + 10 + Math.cos(rad) * along,
                vp.y(c.humidityRatio()[i]) + Math.sin(rad) * along, text, style);
    }

    /** Labels a curve at a fraction of the visible width, or where it leaves the top of the plot. */
    private static void labelAlong(ChartViewport vp, Labels labels, ChartCurve c, double fraction, TextStyle style) {
        double targetX = vp.left() + fraction * vp.width();
        int best = -1;
        for (int i = 0; i < c.size(); i++) {
            double x = vp.x(c.dryBulbC()[i]);
            double y = vp.y(c.humidityRatio()[i]);
            if (y < vp.top() + 18 || x > vp.left() + vp.width() - 24) {
                break;
            }
            if (x >= vp.left()) {
                best = i;
            }
            if (x >= targetX) {
                break;
            }
        }
        if (best < 0) {
            return;
        }
        labels.centred(vp.x(c.dryBulbC()[best]), vp.y(c.humidityRatio()[best]), c.label(),
                style.rotated(angleAt(vp, c, best)));
    }

    private static int indexNearestW(ChartCurve c, double w) {
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int i = 0; i < c.size(); i++) {
            double d = Math.abs(c.humidityRatio()[i] - w);
            if (d < bestD) {
                bestD = d;
                best = i;
            }
        }
        return best;
    }

    /** The curve's direction at sample i, in degrees, turned to read left to right. */
    private static double angleAt(ChartViewport vp, ChartCurve c, int i) {
        int a = Math.max(0, i - 1);
        int b = Math.min(c.size() - 1, i + 1);
        double dx = vp.x(c.dryBulbC()[b]) - vp.x(c.dryBulbC()[a]);
        double dy = vp.y(c.humidityRatio()[b]) - vp.y(c.humidityRatio()[a]);
        double deg = Math.toDegrees(Math.atan2(dy, dx));
        if (deg > 90) {
            deg -= 180;
        } else if (deg < -90) {
            deg += 180;
        }
        return deg;
    }

    private void paintFreePoints(Painter p, Theme theme, ChartViewport vp, Labels labels) {
        for (int i = 0; i < data.points().size(); i++) {
            ChartPoint pt = data.points().get(i);
            double x = vp.x(pt.dryBulbC());
            double y = vp.y(pt.humidityRatio());
            p.beginGroup("point:" + i);
            Marker.TRIANGLE_UP.paint(p, x, y, MARKER_PX, theme.text(), Stroke.solid(theme.plotBackground(), 1.5));
            labels.firstFree(pt.label(), TextStyle.of(theme.smallText(), theme.text()).emphasised(),
                    x + 14 + labels.boxWidth(pt.label(), TextStyle.of(theme.smallText(), theme.text()).emphasised()) / 2, y,
                    x, y - 22, x, y + 22);
            p.endGroup();
        }
    }

    private void paintFrame(Painter p, Theme theme, ChartViewport vp) {
        p.beginGroup("frame");
        p.rect(vp.left(), vp.top(), vp.width(), vp.height(), null, Stroke.solid(theme.frame(), 1.2));
        p.endGroup();
    }

    private void paintDryBulbAxis(Painter p, Theme theme, ChartViewport vp) {
        UnitSystem u = data.units();
        p.beginGroup("db-axis");
        double step = lines.dryBulbStepDisplay(vp.range(), vp.width());
        double bottom = vp.top() + vp.height();
        TextStyle tick = TextStyle.of(theme.smallText() + 1, theme.text()).align(TextStyle.HAlign.CENTER,
                TextStyle.VAlign.TOP);
        Stroke tickStroke = Stroke.solid(theme.frame(), 1.2);
        for (double shown : NiceTicks.values(Quantity.TEMPERATURE.toDisplay(u, vp.range().dbMinC()),
                Quantity.TEMPERATURE.toDisplay(u, vp.range().dbMaxC()), step)) {
            double x = vp.x(Quantity.TEMPERATURE.fromDisplay(u, shown));
            p.line(x, bottom, x, bottom + 6, tickStroke);
            p.text(x, bottom + 9, NiceTicks.label(shown, step), tick);
        }
        p.text(vp.left() + vp.width() / 2, bottom + 12 + theme.baseText() * 1.3,
                "Dry bulb, " + Quantity.TEMPERATURE.symbol(u),
                TextStyle.of(theme.baseText(), theme.text()).emphasised().align(TextStyle.HAlign.CENTER, TextStyle.VAlign.TOP));
        p.endGroup();
    }

    /** Humidity-ratio tick step in display units (gr/lb or g/kg). */
    public double humidityRatioStepDisplay(ChartViewport vp) {
        Quantity q = Quantity.HUMIDITY_RATIO_FINE;
        double span = q.toDisplay(data.units(), vp.range().wMax()) - q.toDisplay(data.units(), vp.range().wMin());
        return NiceTicks.step(span, vp.height(), MIN_W_TICK_PX);
    }

    private void paintHumidityRatioAxis(Painter p, Theme theme, ChartViewport vp) {
        UnitSystem u = data.units();
        Quantity q = Quantity.HUMIDITY_RATIO_FINE;
        p.beginGroup("w-axis");
        double step = humidityRatioStepDisplay(vp);
        double right = vp.left() + vp.width();
        TextStyle tick = TextStyle.of(theme.smallText() + 1, theme.text()).align(TextStyle.HAlign.LEFT,
                TextStyle.VAlign.MIDDLE);
        Stroke tickStroke = Stroke.solid(theme.frame(), 1.2);
        for (double shown : NiceTicks.values(q.toDisplay(u, vp.range().wMin()), q.toDisplay(u, vp.range().wMax()),
                step)) {
            double y = vp.y(q.fromDisplay(u, shown));
            p.line(right, y, right + 6, y, tickStroke);
            p.text(right + 9, y, NiceTicks.label(shown, step), tick);
        }
        p.text(right + theme.baseText() * 4.4, vp.top() + vp.height() / 2, "Humidity ratio, " + q.symbol(u),
                TextStyle.of(theme.baseText(), theme.text()).emphasised().align(TextStyle.HAlign.CENTER,
                        TextStyle.VAlign.MIDDLE).rotated(-90));
        p.endGroup();
    }

    private void paintTitle(Painter p, Theme theme, PsychroChartLayout layout, ChartViewport vp) {
        p.beginGroup("title");
        TextStyle title = TextStyle.of(theme.baseText() + 4, theme.text()).emphasised();
        p.text(vp.left(), vp.top() - theme.baseText() * 1.75, data.title(), title);
        String site = String.format(Locale.ROOT, "Site pressure %s %s",
                Format.pressure(data.units(), data.pressurePa()), Quantity.PRESSURE.symbol(data.units()));
        String equations = data.units() == UnitSystem.IP ? "ASHRAE inch-pound equations" : "ASHRAE SI equations";
        TextStyle sub = TextStyle.of(theme.smallText(), theme.mutedText());
        // the longest subtitle that fits the chart's width: never cut mid-word
        double room = layout.width() - vp.left() - 4;
        String subtitle = site;
        for (String candidate : List.of(site + " · " + equations + " · rectangular dry bulb–humidity ratio axes",
                site + " · " + equations)) {
            if (p.measurer().width(candidate, sub.size(), false) <= room) {
                subtitle = candidate;
                break;
            }
        }
        p.text(vp.left(), vp.top() - theme.baseText() * 0.5, subtitle, sub);
        p.endGroup();
    }

    /** Number formats shared by the chart's labels. */
    static final class Format {
        private Format() {
        }

        static String pressure(UnitSystem u, double pa) {
            return String.format(Locale.ROOT, u == UnitSystem.IP ? "%.2f" : "%.1f", Quantity.PRESSURE.toDisplay(u, pa));
        }

        static String temperature(UnitSystem u, double c) {
            return String.format(Locale.ROOT, "%.0f %s", Quantity.TEMPERATURE.toDisplay(u, c),
                    Quantity.TEMPERATURE.symbol(u));
        }
    }

}
