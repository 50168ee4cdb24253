package app.latentledger.chart.timeline;

import app.latentledger.chart.axis.NiceTicks;
import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.DashPattern;
import app.latentledger.chart.draw.Marker;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.chart.draw.Theme;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.OptionalInt;

/**
 * Paints the cycle timeline through a {@link Painter}. Series are decimated to the device width
 * ({@link MinMaxDecimator}), so the cost follows the visible samples and the pixel count, not the
 * log's length alone. Groups: "series:return-db", "series:supply-db", "series:return-w",
 * "series:supply-w", "band:compressor", "band:blower", "moisture", "onsets", "time-axis".
 */
public final class TimelineChart {
    private static final double MIN_TIME_TICK_PX = 110;
    private static final double MIN_VALUE_TICK_PX = 34;

    private final TimelineData data;
    private final OnRuns compressor;
    private final OnRuns blower;
    private final MinMaxDecimator decimator = new MinMaxDecimator();
    private final double[][] scratch = new double[2][];

    public TimelineChart(TimelineData data) {
        this.data = data;
        this.compressor = OnRuns.of(data.timeS(), data.compressorOn());
        this.blower = OnRuns.of(data.timeS(), data.blowerOn());
    }

    public TimelineData data() {
        return data;
    }

    /** The cycle whose span holds the time under {@code x}, if any. */
    public OptionalInt cycleAt(TimeViewport vp, double x) {
        double t = vp.timeS(x);
        List<CycleMark> cs = data.cycles();
        for (int i = 0; i < cs.size(); i++) {
            if (t >= cs.get(i).startS() && t < cs.get(i).endS()) {
                return OptionalInt.of(i);
            }
        }
        return OptionalInt.empty();
    }

    /**
     * Paints the whole log into a {@code width} × {@code height} area: what the report draws (see
     * {@code PsychroChart.paintWhole} on sizes for print).
     */
    public void paintWhole(Painter p, Theme theme, double width, double height) {
        TimelineLayout layout = TimelineLayout.forSize(width, height, theme);
        paint(p, theme, layout, layout.viewport(data), -1);
    }

    /** Paints everything; {@code selectedCycle} (−1 for none) is shaded across the panels. */
    public void paint(Painter painter, Theme theme, TimelineLayout layout, TimeViewport vp, int selectedCycle) {
        Painter p = theme.painter(painter);
        UnitSystem u = data.units();
        p.rect(0, 0, layout.width(), layout.height(), theme.background(), null);
        paintTitle(p, theme, layout, vp);
        if (selectedCycle >= 0 && selectedCycle < data.cycles().size()) {
            CycleMark c = data.cycles().get(selectedCycle);
            p.save();
            p.clip(vp.left(), layout.temperature().top(), vp.width(), layout.axisTop() - layout.temperature().top());
            p.rect(vp.x(c.startS()), layout.temperature().top(), vp.x(c.endS()) - vp.x(c.startS()),
                    layout.axisTop() - layout.temperature().top(), theme.gridMinor().withAlpha(0.6), null);
            p.restore();
        }
        List<TimeTicks.Tick> ticks = TimeTicks.ticks(vp, data.startLocal(), MIN_TIME_TICK_PX);
        paintTimeGrid(p, theme, layout, vp, ticks);

        Quantity temp = Quantity.TEMPERATURE;
        Quantity fine = Quantity.HUMIDITY_RATIO_FINE;
        paintSeriesPanel(p, theme, layout, vp, layout.temperature(), temp, "Temperature, " + temp.symbol(u),
                data.returnDbC(), data.supplyDbC(), "db");
        paintSeriesPanel(p, theme, layout, vp, layout.humidity(), fine, "Humidity ratio, " + fine.symbol(u),
                data.returnW(), data.supplyW(), "w");
        paintOnsets(p, theme, vp, layout.humidity());
        paintBand(p, theme, layout, vp, layout.compressor(), compressor, "Compressor", theme.compressorBand(),
                "band:compressor");
        paintBand(p, theme, layout, vp, layout.blower(), blower, "Blower", theme.blowerBand(), "band:blower");
        paintMoisture(p, theme, layout, vp, selectedCycle);
        paintTimeAxis(p, theme, layout, vp, ticks);
    }

    private void paintTitle(Painter p, Theme theme, TimelineLayout layout, TimeViewport vp) {
        p.beginGroup("title");
        double top = layout.temperature().top();
        p.text(vp.left(), top - theme.baseText() * 1.75, data.title(),
                TextStyle.of(theme.baseText() + 4, theme.text()).emphasised());
        TextStyle sub = TextStyle.of(theme.smallText(), theme.mutedText());
        // the longest form that fits the canvas: a narrow (upright) chart drops the note on bands first
        String full = windowText(vp);
        String shown = full;
        double room = layout.width() - vp.left() - 4;
        for (String candidate : List.of(full, full.replace(" · shaded bands: low to high readings", ""),
                full.replace(" · shaded bands: low to high readings", "").replaceFirst("^.* · ", ""))) {
            shown = candidate;
            if (p.measurer().width(candidate, sub.size(), false) <= room) {
                break;
            }
        }
        p.text(vp.left(), top - theme.baseText() * 0.5, shown, sub);
        p.endGroup();
    }

    /** "Mon 13 Jul 08:00 – 14:00 · 6.0 h" or elapsed hours when the clock is unknown. */
    String windowText(TimeViewport vp) {
        double hours = vp.spanS() / 3600;
        String span = hours >= 48 ? String.format(Locale.ROOT, "%.1f days", hours / 24)
                : hours >= 2 ? String.format(Locale.ROOT, "%.1f h", hours)
                : String.format(Locale.ROOT, "%.0f min", vp.spanS() / 60);
        if (data.startLocal() == null) {
            return span;
        }
        DateTimeFormatter f = DateTimeFormatter.ofPattern("EEE d MMM HH:mm", Locale.ENGLISH);
        return f.format(data.startLocal().plusSeconds(Math.round(vp.startS()))) + " – "
                + f.format(data.startLocal().plusSeconds(Math.round(vp.endS()))) + " · " + span
                + (bandsShown(vp) ? " · shaded bands: low to high readings" : "");
    }

    /** True when the window holds more than two samples per pixel column, so series draw as bands. */
    boolean bandsShown(TimeViewport vp) {
        int from = MinMaxDecimator.lowerBound(data.timeS(), vp.startS());
        int to = MinMaxDecimator.lowerBound(data.timeS(), vp.endS());
        return to - from + 1 > 2 * Math.ceil(vp.width());
    }

    private void paintTimeGrid(Painter p, Theme theme, TimelineLayout layout, TimeViewport vp,
                               List<TimeTicks.Tick> ticks) {
        p.beginGroup("time-grid");
        for (TimeTicks.Tick t : ticks) {
            double x = vp.x(t.timeS());
            Stroke s = Stroke.solid(t.major() ? theme.gridMajor() : theme.gridMinor(), t.major() ? 1.2 : 1);
            p.line(x, layout.temperature().top(), x, layout.humidity().bottom(), s);
            p.line(x, layout.compressor().top(), x, layout.axisTop(), s);
        }
        p.endGroup();
    }

    private void paintSeriesPanel(Painter p, Theme theme, TimelineLayout layout, TimeViewport vp,
                                  TimelineLayout.Band band, Quantity q, String header, double[] ret, double[] sup,
                                  String key) {
        UnitSystem u = data.units();
        boolean reduced = bandsShown(vp);
        Series r = reduced ? Series.envelope(data.timeS(), ret, vp) : Series.line(decimator, data.timeS(), ret, vp);
        Series s = reduced ? Series.envelope(data.timeS(), sup, vp) : Series.line(decimator, data.timeS(), sup, vp);
        // the envelope of both sets the value axis
        double lo = Math.min(r.lo(), s.lo());
        double hi = Math.max(r.hi(), s.hi());
        if (!(hi >= lo)) {
            lo = 0;
            hi = 1;
        }
        double loShown = q.toDisplay(u, lo);
        double hiShown = q.toDisplay(u, hi);
        double pad = Math.max((hiShown - loShown) * 0.08, q == Quantity.TEMPERATURE ? 1 : 2);
        ValueAxis axis = new ValueAxis(loShown - pad, hiShown + pad * 2.6, band);

        p.beginGroup("axis:" + key);
        p.rect(vp.left(), band.top(), vp.width(), band.height(), null, Stroke.solid(theme.gridMajor(), 1));
        double step = NiceTicks.step(axis.span(), band.height(), MIN_VALUE_TICK_PX);
        TextStyle tick = TextStyle.of(theme.smallText(), theme.text()).align(TextStyle.HAlign.RIGHT,
                TextStyle.VAlign.MIDDLE);
        for (double v : NiceTicks.values(axis.lo, axis.hi, step)) {
            double y = axis.y(v);
            p.line(vp.left(), y, vp.left() + vp.width(), y, Stroke.solid(theme.gridMinor(), 1));
            p.line(vp.left() - 5, y, vp.left(), y, Stroke.solid(theme.frame(), 1.2));
            p.text(vp.left() - 9, y, NiceTicks.label(v, step), tick);
        }
        p.endGroup();

        p.save();
        p.clip(vp.left(), band.top(), vp.width(), band.height());
        p.beginGroup("series:supply-" + key);
        Stroke supplyStroke = new Stroke(theme.supplyAir(), 2.2, DashPattern.DASHED);
        if (reduced) {
            // edges of a supply band zigzag with every part-cycle in a column: fill only
            paintEnvelope(p, vp, s, axis, q, u, theme.supplyAir(), null);
        } else {
            paintLine(p, s.xs(), s.ys(), s.xs().length, axis, q, u, supplyStroke);
        }
        p.endGroup();
        p.beginGroup("series:return-" + key);
        Stroke returnStroke = new Stroke(theme.returnAir(), 2.2, DashPattern.SOLID);
        if (reduced) {
            paintEnvelope(p, vp, r, axis, q, u, theme.returnAir(), returnStroke.withWidth(1.6));
        } else {
            paintLine(p, r.xs(), r.ys(), r.xs().length, axis, q, u, returnStroke);
        }
        p.endGroup();
        p.restore();

        p.beginGroup("header:" + key);
        TextStyle h = TextStyle.of(theme.smallText() + 1, theme.text()).emphasised().align(TextStyle.HAlign.LEFT,
                TextStyle.VAlign.MIDDLE);
        double y = band.top() + theme.baseText() * 0.9;
        double x = vp.left() + 10;
        double w = p.measurer().width(header, h.size(), true);
        double legendW = 240;
        p.rect(x - 6, y - theme.baseText() * 0.7, w + legendW + 12, theme.baseText() * 1.4,
                theme.legendBackground(), null);
        p.text(x, y, header, h);
        x += w + 18;
        TextStyle lt = TextStyle.of(theme.smallText(), theme.text()).align(TextStyle.HAlign.LEFT, TextStyle.VAlign.MIDDLE);
        p.line(x, y, x + 32, y, new Stroke(theme.returnAir(), 2.6, DashPattern.SOLID));
        p.text(x + 38, y, "return", lt);
        x += 38 + p.measurer().width("return", lt.size(), false) + 18;
        p.line(x, y, x + 32, y, new Stroke(theme.supplyAir(), 2.6, DashPattern.DASHED));
        p.text(x + 38, y, "supply", lt);
        p.endGroup();
    }

    /**
     * A series with several samples per pixel column, drawn as its min/max band: filled lightly (and
     * edged, if {@code edge} is given), so a week of cycling reads as a band, not a scribble.
     */
    private void paintEnvelope(Painter p, TimeViewport vp, Series series, ValueAxis axis, Quantity q, UnitSystem u,
                               Colour colour, Stroke edge) {
        double[] envMin = series.ys();
        double[] envMax = series.ys2();
        int n = envMin.length;
        int start = 0;
        for (int c = 0; c <= n; c++) {
            if (c == n || Double.isNaN(envMin[c])) {
                int len = c - start;
                if (len >= 2) {
                    double[] xs = new double[2 * len];
                    double[] ys = new double[2 * len];
                    double[] top = new double[len];
                    double[] bottom = new double[len];
                    for (int k = 0; k < len; k++) {
                        double x = vp.left() + start + k + 0.5;
                        top[k] = axis.y(q.toDisplay(u, envMax[start + k]));
                        bottom[k] = axis.y(q.toDisplay(u, envMin[start + k]));
                        xs[k] = x;
                        ys[k] = top[k];
                        xs[2 * len - 1 - k] = x;
                        ys[2 * len - 1 - k] = bottom[k];
                    }
                    p.polygon(xs, ys, 2 * len, colour.withAlpha(edge == null ? 0.30 : 0.5), null);
                    if (edge != null) {
                        double[] edgeX = java.util.Arrays.copyOf(xs, len);
                        p.polyline(edgeX, top, len, edge);
                        p.polyline(edgeX, bottom, len, edge);
                    }
                }
                start = c + 1;
            }
        }
    }

    /** Draws a decimated series in display units, split into pieces at NaN gaps. */
    private void paintLine(Painter p, double[] xs, double[] ys, int n, ValueAxis axis, Quantity q, UnitSystem u,
                           Stroke stroke) {
        double[] py = scratch(n);
        int start = 0;
        for (int i = 0; i <= n; i++) {
            boolean gap = i == n || Double.isNaN(ys[i]);
            if (gap) {
                if (i - start >= 2) {
                    p.polyline(slice(xs, start, i), slice(py, start, i), i - start, stroke);
                }
                start = i + 1;
            } else {
                py[i] = axis.y(q.toDisplay(u, ys[i]));
            }
        }
    }

    private static double[] slice(double[] a, int from, int to) {
        return from == 0 ? a : java.util.Arrays.copyOfRange(a, from, to);
    }

    private double[] scratch(int n) {
        if (scratch[0] == null || scratch[0].length < n) {
            scratch[0] = new double[Math.max(n, 16)];
        }
        return scratch[0];
    }

    private void paintOnsets(Painter p, Theme theme, TimeViewport vp, TimelineLayout.Band band) {
        p.beginGroup("onsets");
        p.save();
        p.clip(vp.left() - 8, band.top(), vp.width() + 16, band.height());
        for (CycleMark c : data.cycles()) {
            if (Double.isNaN(c.onsetS()) || c.onsetS() < vp.startS() || c.onsetS() > vp.endS()) {
                continue;
            }
            double x = vp.x(c.onsetS());
            double cycleWidth = vp.x(c.endS()) - vp.x(c.startS());
            if (cycleWidth >= 60) {
                p.line(x, band.top() + theme.baseText() * 1.8, x, band.bottom(),
                        new Stroke(theme.coil(), 1.4, DashPattern.DOTTED));
            }
            if (cycleWidth >= 8) {
                Marker.TRIANGLE_DOWN.paint(p, x, band.bottom() - 8, 11, theme.coil(), null);
            }
            // only where the panel holds the words between its key and the marker; cut words help no one
            boolean labelFits = band.height() >= theme.baseText() * 1.8 + theme.smallText() * 1.05 + 16;
            if (cycleWidth >= 220 && labelFits) {
                // the label reads right of its line, or left of it where it would cross the plot's edge
                TextStyle label = TextStyle.of(theme.smallText(), theme.coil());
                String words = "removal begins";
                boolean flip = x + 6 + p.measurer().width(words, label.size(), false) > vp.left() + vp.width() - 2;
                p.text(flip ? x - 6 : x + 6, band.top() + theme.baseText() * 1.8, words,
                        label.align(flip ? TextStyle.HAlign.RIGHT : TextStyle.HAlign.LEFT, TextStyle.VAlign.TOP));
            }
        }
        p.restore();
        p.endGroup();
    }

    private void paintBand(Painter p, Theme theme, TimelineLayout layout, TimeViewport vp, TimelineLayout.Band band,
                           OnRuns runs, String name, Colour colour, String group) {
        p.beginGroup(group);
        p.rect(vp.left(), band.top(), vp.width(), band.height(), null, Stroke.solid(theme.gridMajor(), 1));
        p.text(vp.left() - 9, band.top() + band.height() / 2, name, TextStyle.of(theme.smallText(), theme.text())
                .align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.MIDDLE));
        double inset = 4;
        double laneH = band.height() - 2 * inset;
        int columns = (int) Math.ceil(vp.width());
        double[] onS = new double[columns];
        double perColumn = vp.spanS() / columns;
        // seconds on per pixel column: a run narrower than a pixel shows as a shorter bar, so a
        // week of short cycles reads as run-time fraction instead of a solid or a noisy strip
        for (int i = runs.firstEndingAfter(vp.startS()); i < runs.size() && runs.startS(i) <= vp.endS(); i++) {
            double a = Math.max(vp.startS(), runs.startS(i));
            double b = Math.min(vp.endS(), runs.endS(i));
            int c0 = (int) Math.min(columns - 1, Math.floor((a - vp.startS()) / perColumn));
            int c1 = (int) Math.min(columns - 1, Math.floor((b - vp.startS()) / perColumn));
            for (int c = c0; c <= c1; c++) {
                double lo = Math.max(a, vp.startS() + c * perColumn);
                double hi = Math.min(b, vp.startS() + (c + 1) * perColumn);
                onS[c] += Math.max(0, hi - lo);
            }
        }
        int c = 0;
        while (c < columns) {
            double h = Math.rint(Math.min(1, onS[c] / perColumn) * laneH);
            int e = c + 1;
            while (e < columns && Math.rint(Math.min(1, onS[e] / perColumn) * laneH) == h) {
                e++;
            }
            if (h > 0) {
                p.rect(vp.left() + c, band.bottom() - inset - h, e - c, h, colour, null);
            }
            c = e;
        }
        p.endGroup();
    }

    private void paintMoisture(Painter p, Theme theme, TimelineLayout layout, TimeViewport vp, int selected) {
        UnitSystem u = data.units();
        Quantity q = Quantity.WATER_MASS;
        TimelineLayout.Band band = layout.moisture();
        double maxKg = 0;
        for (CycleMark c : data.cycles()) {
            if (c.endS() >= vp.startS() && c.startS() <= vp.endS()) {
                maxKg = Math.max(maxKg, Math.max(c.removedKg(), c.returnedKg()));
            }
        }
        double maxShown = maxKg > 0 ? q.toDisplay(u, maxKg) * 1.1 : 1;
        TextStyle h = TextStyle.of(theme.smallText() + 1, theme.text()).emphasised().align(TextStyle.HAlign.LEFT,
                TextStyle.VAlign.MIDDLE);
        TextStyle lt = TextStyle.of(theme.smallText(), theme.text()).align(TextStyle.HAlign.LEFT, TextStyle.VAlign.MIDDLE);
        // the longest wording whose title and key fit one line over the plot; the swatches (filled,
        // hollow) and the bars' side of the zero line still tell removed from returned when it is short
        String sym = q.symbol(u);
        String[][] wordings = {
            {"Moisture per cycle, " + sym, "removed (up, filled)", "returned (down, hollow)"},
            {"Moisture per cycle, " + sym, "removed (up)", "returned (down)"},
            {"Moisture, " + sym, "removed (up)", "returned (down)"},
            {"Moisture, " + sym, "removed", "returned"}};
        double right = vp.left() + vp.width() - 4;
        String[] chosen = wordings[wordings.length - 1];
        for (String[] w : wordings) {
            if (keyFlow(p, h, lt, w, vp.left() + 10, right, false)[0] == 0) {
                chosen = w;
                break;
            }
        }
        String title = chosen[0];
        String[] keys = {chosen[1], chosen[2]};
        double lineH = theme.baseText() * 1.4;
        // still too wide (a very narrow chart): the key wraps below the title if the band has room for it
        // and the bars keep their least plot height under it
        boolean wrap = band.height() - TimelineLayout.moistureHeader(theme) - lineH
                >= Math.max(band.height() * 0.6, TimelineLayout.MIN_MOISTURE_PLOT_PX);
        double[] flow = keyFlow(p, h, lt, chosen, vp.left() + 10, wrap ? right : Double.MAX_VALUE, true);
        int line = (int) flow[0];
        double widest = flow[1];
        double[] keyX = {flow[2], flow[4]};
        int[] keyLine = {(int) flow[3], (int) flow[5]};
        double header = TimelineLayout.moistureHeader(theme) + line * lineH;
        double zeroY = band.top() + header + (band.height() - header) * 0.62;
        double upPx = zeroY - band.top() - header;
        double downPx = band.bottom() - zeroY;
        double pxPerUnit = Math.min(upPx, downPx / 0.6) / maxShown;

        p.beginGroup("moisture");
        p.rect(vp.left(), band.top(), vp.width(), band.height(), null, Stroke.solid(theme.gridMajor(), 1));
        double step = NiceTicks.step(maxShown, upPx, MIN_VALUE_TICK_PX);
        TextStyle tick = TextStyle.of(theme.smallText(), theme.text()).align(TextStyle.HAlign.RIGHT,
                TextStyle.VAlign.MIDDLE);
        for (double v : NiceTicks.values(-downPx / pxPerUnit, upPx / pxPerUnit, step)) {
            double y = zeroY - v * pxPerUnit;
            p.line(vp.left(), y, vp.left() + vp.width(), y, Stroke.solid(theme.gridMinor(), 1));
            p.text(vp.left() - 9, y, NiceTicks.label(Math.abs(v), step), tick);
        }
        p.save();
        p.clip(vp.left(), band.top(), vp.width(), band.height());
        for (int i = 0; i < data.cycles().size(); i++) {
            CycleMark c = data.cycles().get(i);
            if (c.endS() < vp.startS() || c.startS() > vp.endS()) {
                continue;
            }
            double x0 = vp.x(c.startS());
            double x1 = vp.x(c.endS());
            double gap = Math.min(6, (x1 - x0) * 0.15);
            double bw = Math.max(1.5, x1 - x0 - 2 * gap);
            double bx = x0 + gap;
            double up = q.toDisplay(u, c.removedKg()) * pxPerUnit;
            double down = q.toDisplay(u, c.returnedKg()) * pxPerUnit;
            Stroke edge = i == selected ? Stroke.solid(theme.text(), 2) : null;
            p.rect(bx, zeroY - up, bw, up, theme.removed(), edge);
            // returned water is drawn hollow as well as in its own colour
            p.rect(bx, zeroY, bw, down, theme.returned().withAlpha(0.35),
                    bw >= 4 ? Stroke.solid(theme.returned(), 1.4) : edge);
        }
        p.restore();
        p.line(vp.left(), zeroY, vp.left() + vp.width(), zeroY, Stroke.solid(theme.frame(), 1.2));
        double y = band.top() + theme.baseText() * 0.9;
        double x0 = vp.left() + 10;
        p.rect(x0 - 6, y - theme.baseText() * 0.7, widest - x0 + 12, theme.baseText() * 1.4 + line * lineH,
                theme.legendBackground(), null);
        p.text(x0, y, title, h);
        for (int k = 0; k < keys.length; k++) {
            double ky = y + keyLine[k] * lineH;
            if (k == 0) {
                p.rect(keyX[k], ky - 7, 14, 14, theme.removed(), null);
            } else {
                p.rect(keyX[k], ky - 7, 14, 14, theme.returned().withAlpha(0.35), Stroke.solid(theme.returned(), 1.4));
            }
            p.text(keyX[k] + 20, ky, keys[k], lt);
        }
        p.endGroup();
    }

    /**
     * Lays out a panel header: the title, then two key entries (a 14 px swatch, 6 px, the words),
     * wrapping to a new line at {@code right}. Returns {lines − 1, right end of the widest line,
     * x and line of entry 1, x and line of entry 2}; with {@code wrap} false only the first value
     * is meaningful (0 when everything fits one line).
     */
    private static double[] keyFlow(Painter p, TextStyle title, TextStyle key, String[] words, double left,
                                    double right, boolean wrap) {
        double x = left + p.measurer().width(words[0], title.size(), true) + 18;
        int line = 0;
        double widest = x;
        double[] out = new double[6];
        for (int k = 1; k < 3; k++) {
            double w = 20 + p.measurer().width(words[k], key.size(), false);
            if (x + w > right) {
                if (!wrap) {
                    out[0] = 1;
                    return out;
                }
                line++;
                x = left;
            }
            out[2 * k] = x;
            out[2 * k + 1] = line;
            x += w + 18;
            widest = Math.max(widest, x - 18);
        }
        out[0] = line;
        out[1] = widest;
        return out;
    }

    private void paintTimeAxis(Painter p, Theme theme, TimelineLayout layout, TimeViewport vp,
                               List<TimeTicks.Tick> ticks) {
        p.beginGroup("time-axis");
        double y = layout.axisTop();
        TextStyle ts = TextStyle.of(theme.smallText() + 1, theme.text()).align(TextStyle.HAlign.CENTER,
                TextStyle.VAlign.TOP);
        for (TimeTicks.Tick t : ticks) {
            double x = vp.x(t.timeS());
            p.line(x, y, x, y + 6, Stroke.solid(theme.frame(), 1.2));
            TextStyle style = t.major() ? ts.emphasised() : ts;
            // a label at the right end is drawn flush with the canvas edge rather than cut by it
            if (x + p.measurer().width(t.label(), style.size(), style.bold()) / 2 > layout.width() - 2) {
                p.text(layout.width() - 2, y + 9, t.label(), style.align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.TOP));
            } else {
                p.text(x, y + 9, t.label(), style);
            }
        }
        p.endGroup();
    }

    /**
     * A series ready to draw: either decimated points (xs, ys) or, when reduced, per-column minima
     * (ys) and maxima (ys2) with xs unused; lo and hi are its finite extremes.
     */
    private record Series(double[] xs, double[] ys, double[] ys2, double lo, double hi) {

        static Series line(MinMaxDecimator d, double[] t, double[] v, TimeViewport vp) {
            int n = d.decimate(t, v, vp);
            double[] xs = java.util.Arrays.copyOf(d.xs(), n);
            double[] ys = java.util.Arrays.copyOf(d.ys(), n);
            double[] range = range(ys, ys);
            return new Series(xs, ys, null, range[0], range[1]);
        }

        static Series envelope(double[] t, double[] v, TimeViewport vp) {
            int columns = (int) Math.ceil(vp.width());
            double[] min = new double[columns];
            double[] max = new double[columns];
            MinMaxDecimator.envelope(t, v, vp, min, max);
            double[] range = range(min, max);
            return new Series(null, min, max, range[0], range[1]);
        }

        private static double[] range(double[] a, double[] b) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < a.length; i++) {
                if (!Double.isNaN(a[i])) {
                    lo = Math.min(lo, a[i]);
                }
                if (!Double.isNaN(b[i])) {
                    hi = Math.max(hi, b[i]);
                }
            }
            return new double[] {lo, hi};
        }
    }

    /** A linear value axis over a band, in display units. */
    private static final class ValueAxis {
        final double lo;
        final double hi;
        final TimelineLayout.Band band;

        ValueAxis(double lo, double hi, TimelineLayout.Band band) {
            this.lo = lo;
            this.hi = hi;
            this.band = band;
        }

        double span() {
            return hi - lo;
        }

        double y(double shown) {
            return band.bottom() - (shown - lo) / (hi - lo) * band.height();
        }
    }
}
