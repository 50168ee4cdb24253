package app.latentledger.chart.psychro;

/**
 * Maps chart coordinates (dry bulb °C, humidity ratio kg/kg) to device coordinates and back, and
 * carries the zoom and pan state. Dry bulb runs left to right and humidity ratio bottom to top, both
 * linear (a rectangular t–W chart; the handbook's charts are drawn on oblique h–W axes instead, see
 * docs/methods.md §5). Immutable: zooming or panning returns a new viewport.
 *
 * @param range  visible window
 * @param limits the farthest the tech may zoom out or pan to
 * @param left   plot-area left edge, device units
 * @param top    plot-area top edge
 * @param width  plot-area width
 * @param height plot-area height
 */
public record ChartViewport(ChartRange range, ChartRange limits, double left, double top, double width, double height) {

    /** Narrowest dry-bulb window, K: about one field thermometer's resolution per pixel row of labels. */
    public static final double MIN_DB_SPAN_C = 2.0;
    /** Narrowest humidity-ratio window, kg/kg (about 3.5 gr/lb). */
    public static final double MIN_W_SPAN = 0.0005;

    public ChartViewport {
        if (!(width > 0) || !(height > 0)) {
            throw new IllegalArgumentException("plot area " + width + " × " + height + " must be above 0 in both");
        }
    }

    public double x(double dryBulbC) {
        return left + (dryBulbC - range.dbMinC()) / range.dbSpanC() * width;
    }

    public double y(double humidityRatio) {
        return top + height - (humidityRatio - range.wMin()) / range.wSpan() * height;
    }

    public double dryBulbC(double x) {
        return range.dbMinC() + (x - left) / width * range.dbSpanC();
    }

    public double humidityRatio(double y) {
        return range.wMin() + (top + height - y) / height * range.wSpan();
    }

    public boolean contains(double x, double y) {
        return x >= left && x <= left + width && y >= top && y <= top + height;
    }

    /** The same window in another plot area (after a resize). */
    public ChartViewport withPlot(double newLeft, double newTop, double newWidth, double newHeight) {
        return new ChartViewport(range, limits, newLeft, newTop, newWidth, newHeight);
    }

    /**
     * Zooms by {@code factor} (above 1 zooms in) keeping the chart point under (x, y) in place,
     * within {@link #limits} and the minimum spans.
     */
    public ChartViewport zoomed(double factor, double x, double y) {
        if (!(factor > 0)) {
            throw new IllegalArgumentException("zoom factor " + factor + " must be above 0");
        }
        double db = dryBulbC(x);
        double w = humidityRatio(y);
        double dbSpan = clamp(range.dbSpanC() / factor, MIN_DB_SPAN_C, limits.dbSpanC());
        double wSpan = clamp(range.wSpan() / factor, MIN_W_SPAN, limits.wSpan());
        double fx = (x - left) / width;
        double fy = (top + height - y) / height;
        return within(db - fx * dbSpan, w - fy * wSpan, dbSpan, wSpan);
    }

    /** Moves the window so the chart follows a drag of (dx, dy) device units. */
    public ChartViewport panned(double dx, double dy) {
        double dbShift = -dx / width * range.dbSpanC();
        double wShift = dy / height * range.wSpan();
        return within(range.dbMinC() + dbShift, range.wMin() + wShift, range.dbSpanC(), range.wSpan());
    }

    /** Back to the whole chart. */
    public ChartViewport reset() {
        return new ChartViewport(limits, limits, left, top, width, height);
    }

    private ChartViewport within(double dbMin, double wMin, double dbSpan, double wSpan) {
        double db0 = clamp(dbMin, limits.dbMinC(), limits.dbMaxC() - dbSpan);
        double w0 = clamp(wMin, limits.wMin(), limits.wMax() - wSpan);
        return new ChartViewport(new ChartRange(db0, db0 + dbSpan, w0, w0 + wSpan), limits, left, top, width, height);
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }
}
