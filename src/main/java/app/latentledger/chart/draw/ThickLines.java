package app.latentledger.chart.draw;

/**
 * A painter that draws every line at least {@code minWidth} device units wide and passes all else
 * through: how the outdoor theme keeps thin grid and curve lines visible in direct sun without each
 * chart knowing about it.
 */
final class ThickLines implements Painter {
    private final Painter inner;
    private final double minWidth;

    ThickLines(Painter inner, double minWidth) {
        this.inner = inner;
        this.minWidth = minWidth;
    }

    private Stroke thick(Stroke s) {
        return s == null || s.width() >= minWidth ? s : s.withWidth(minWidth);
    }

    @Override
    public void save() {
        inner.save();
    }

    @Override
    public void restore() {
        inner.restore();
    }

    @Override
    public void clip(double x, double y, double width, double height) {
        inner.clip(x, y, width, height);
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, Stroke stroke) {
        inner.line(x1, y1, x2, y2, thick(stroke));
    }

    @Override
    public void polyline(double[] xs, double[] ys, int count, Stroke stroke) {
        inner.polyline(xs, ys, count, thick(stroke));
    }

    @Override
    public void polygon(double[] xs, double[] ys, int count, Colour fill, Stroke stroke) {
        inner.polygon(xs, ys, count, fill, thick(stroke));
    }

    @Override
    public void rect(double x, double y, double width, double height, Colour fill, Stroke stroke) {
        inner.rect(x, y, width, height, fill, thick(stroke));
    }

    @Override
    public void circle(double cx, double cy, double radius, Colour fill, Stroke stroke) {
        inner.circle(cx, cy, radius, fill, thick(stroke));
    }

    @Override
    public void text(double x, double y, String text, TextStyle style) {
        inner.text(x, y, text, style);
    }

    @Override
    public TextMeasurer measurer() {
        return inner.measurer();
    }

    @Override
    public void beginGroup(String name) {
        inner.beginGroup(name);
    }

    @Override
    public void endGroup() {
        inner.endGroup();
    }
}
