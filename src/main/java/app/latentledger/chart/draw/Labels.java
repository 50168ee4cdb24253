package app.latentledger.chart.draw;

import app.latentledger.chart.axis.LabelPlacer;

/**
 * Text with a halo (a box of the background colour behind it) so labels stay legible where they
 * cross grid lines, placed through a {@link LabelPlacer} so no two labels overlap.
 */
public final class Labels {
    private static final double HALO_PAD = 3;

    private final Painter painter;
    private final LabelPlacer placer;
    private final Colour halo;

    public Labels(Painter painter, LabelPlacer placer, Colour halo) {
        this.painter = painter;
        this.placer = placer;
        this.halo = halo;
    }

    public LabelPlacer placer() {
        return placer;
    }

    /**
     * Draws {@code text} centred on (cx, cy), turned by {@code style.rotationDeg()}, if its bounding box is
     * free. The style's own anchors are ignored: centring makes the rotated box easy to bound.
     *
     * @return true if drawn
     */
    public boolean centred(double cx, double cy, String text, TextStyle style) {
        TextMeasurer m = painter.measurer();
        double w = m.width(text, style.size(), style.bold()) + 2 * HALO_PAD;
        double h = m.ascent(style.size()) + m.descent(style.size()) + 2 * HALO_PAD;
        double a = Math.toRadians(style.rotationDeg());
        double cos = Math.abs(Math.cos(a));
        double sin = Math.abs(Math.sin(a));
        double bw = w * cos + h * sin;
        double bh = w * sin + h * cos;
        if (!placer.tryPlace(cx - bw / 2, cy - bh / 2, bw, bh, 1)) {
            return false;
        }
        double c = Math.cos(a);
        double s = Math.sin(a);
        double[] xs = new double[4];
        double[] ys = new double[4];
        double[][] corners = {{-w / 2, -h / 2}, {w / 2, -h / 2}, {w / 2, h / 2}, {-w / 2, h / 2}};
        for (int i = 0; i < 4; i++) {
            xs[i] = cx + corners[i][0] * c - corners[i][1] * s;
            ys[i] = cy + corners[i][0] * s + corners[i][1] * c;
        }
        painter.polygon(xs, ys, 4, halo, null);
        painter.text(cx, cy, text, style.align(TextStyle.HAlign.CENTER, TextStyle.VAlign.MIDDLE));
        return true;
    }

    /**
     * Tries each candidate centre in turn (pairs of x, y) and draws at the first free one.
     *
     * @return true if drawn
     */
    public boolean firstFree(String text, TextStyle style, double... centres) {
        for (int i = 0; i + 1 < centres.length; i += 2) {
            if (centred(centres[i], centres[i + 1], text, style)) {
                return true;
            }
        }
        return false;
    }

    /** Width of the text's box as {@link #centred} would draw it. */
    public double boxWidth(String text, TextStyle style) {
        return painter.measurer().width(text, style.size(), style.bold()) + 2 * HALO_PAD;
    }
}
