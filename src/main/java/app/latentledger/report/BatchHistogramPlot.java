package app.latentledger.report;

import app.latentledger.chart.axis.NiceTicks;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;
import app.latentledger.report.pdf.Ink;

/**
 * One histogram of the batch summary, painted through the charts' {@link Painter} in device units
 * ({@link #WIDTH} × {@link #HEIGHT}), scaled to the column by the caller as the report's charts are.
 * Bars are outlined as well as filled, and every count axis starts at zero, so the plot reads the
 * same in black and white.
 */
final class BatchHistogramPlot {
    static final double WIDTH = 1000;
    static final double HEIGHT = 300;
    private static final double LEFT = 80;
    private static final double RIGHT = 20;
    private static final double TOP = 34;
    private static final double BOTTOM = 44;
    private static final double TEXT = 18;

    private final BatchSummary.Histogram h;

    BatchHistogramPlot(BatchSummary.Histogram h) {
        this.h = h;
    }

    void paint(Painter p) {
        double x0 = LEFT;
        double y0 = HEIGHT - BOTTOM;
        double plotW = WIDTH - LEFT - RIGHT;
        double plotH = HEIGHT - TOP - BOTTOM;
        TextStyle label = TextStyle.of(TEXT, Ink.MUTED);
        Stroke axis = Stroke.solid(Ink.MUTED, 1.5);
        if (h.counts().length == 0) {
            p.text(WIDTH / 2, HEIGHT / 2, "no system has this figure",
                    label.align(TextStyle.HAlign.CENTER, TextStyle.VAlign.MIDDLE));
            return;
        }
        int max = 1;
        for (int c : h.counts()) {
            max = Math.max(max, c);
        }
        double countStep = Math.max(1, NiceTicks.step(max, plotH, 40));
        double top = Math.ceil(max / countStep) * countStep;
        for (double v : NiceTicks.values(0, top, countStep)) {
            double y = y0 - v / top * plotH;
            p.line(x0, y, x0 + plotW, y, Stroke.solid(Ink.RULE, 0.8));
            p.text(x0 - 8, y, NiceTicks.label(v, countStep), label.align(TextStyle.HAlign.RIGHT, TextStyle.VAlign.MIDDLE));
        }
        p.text(18, TOP + plotH / 2, "systems", label.rotated(-90).align(TextStyle.HAlign.CENTER, TextStyle.VAlign.MIDDLE));
        int bins = h.counts().length;
        double bw = plotW / bins;
        for (int i = 0; i < bins; i++) {
            int c = h.counts()[i];
            if (c > 0) {
                double bh = c / top * plotH;
                p.rect(x0 + i * bw + 1, y0 - bh, bw - 2, bh, Ink.PANEL, Stroke.solid(Ink.ACCENT, 1.5));
                p.text(x0 + (i + 0.5) * bw, y0 - bh - 3, Integer.toString(c),
                        TextStyle.of(TEXT, Ink.TEXT).align(TextStyle.HAlign.CENTER, TextStyle.VAlign.BOTTOM));
            }
        }
        int every = Math.max(1, (int) Math.ceil(bins / 10.0));
        for (int i = 0; i <= bins; i += every) {
            double x = x0 + i * bw;
            p.line(x, y0, x, y0 + 6, axis);
            p.text(x, y0 + 9, NiceTicks.label(h.from() + i * h.width(), h.width()),
                    label.align(TextStyle.HAlign.CENTER, TextStyle.VAlign.TOP));
        }
        p.line(x0, y0, x0 + plotW, y0, axis);
        p.line(x0, y0, x0, TOP, axis);
    }
}
