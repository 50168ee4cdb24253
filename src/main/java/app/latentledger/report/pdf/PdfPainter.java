package app.latentledger.report.pdf;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextMeasurer;
import app.latentledger.chart.draw.TextStyle;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState;
import org.apache.pdfbox.util.Matrix;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Map;

/**
 * The chart drawing calls as PDF vectors. One transform at the start turns the page into the
 * painter's device space (origin top left, y down, 1 unit = 1 pt); {@link #place} adds a scaled
 * frame for a chart painted at screen size, so line weights and type keep the proportions they
 * have on the tablet. Text is set in the embedded fonts and un-flipped with its own text matrix.
 * No display, no AWT: runs headless.
 */
public final class PdfPainter implements Painter {
    /** Bézier handle length for a quarter circle (4/3·(√2 − 1)); common practice, no source. */
    private static final double KAPPA = 0.5522847498;

    private final PDPageContentStream cs;
    private final ReportFonts fonts;
    private final Map<Long, PDExtendedGraphicsState> alphas = new HashMap<>();
    private int depth;

    /**
     * @param cs         the page's content stream, positioned outside any text object
     * @param pageHeight page height, pt: the y flip
     */
    public PdfPainter(PDPageContentStream cs, ReportFonts fonts, double pageHeight) {
        this.cs = cs;
        this.fonts = fonts;
        io(() -> cs.transform(new Matrix(1, 0, 0, -1, 0, (float) pageHeight)));
    }

    /**
     * Starts a frame at ({@code x}, {@code y}) in which one device unit is {@code scale} pt, and
     * clips to {@code width} × {@code height} device units. End it with {@link #restore()}.
     */
    public void place(double x, double y, double scale, double width, double height) {
        save();
        io(() -> cs.transform(new Matrix((float) scale, 0, 0, (float) scale, (float) x, (float) y)));
        clip(0, 0, width, height);
    }

    @Override
    public void save() {
        depth++;
        io(cs::saveGraphicsState);
    }

    @Override
    public void restore() {
        if (depth == 0) {
            throw new IllegalStateException("restore without save");
        }
        depth--;
        io(cs::restoreGraphicsState);
    }

    @Override
    public void clip(double x, double y, double width, double height) {
        io(() -> {
            cs.addRect((float) x, (float) y, (float) width, (float) height);
            cs.clip();
        });
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, Stroke stroke) {
        io(() -> {
            stroke(stroke);
            cs.moveTo((float) x1, (float) y1);
            cs.lineTo((float) x2, (float) y2);
            cs.stroke();
        });
    }

    @Override
    public void polyline(double[] xs, double[] ys, int count, Stroke stroke) {
        if (count < 2) {
            return;
        }
        io(() -> {
            stroke(stroke);
            path(xs, ys, count);
            cs.stroke();
        });
    }

    @Override
    public void polygon(double[] xs, double[] ys, int count, Colour fill, Stroke stroke) {
        if (count < 3 || fill == null && stroke == null) {
            return;
        }
        io(() -> {
            path(xs, ys, count);
            cs.closePath();
            paint(fill, stroke);
        });
    }

    @Override
    public void rect(double x, double y, double width, double height, Colour fill, Stroke stroke) {
        if (fill == null && stroke == null) {
            return;
        }
        io(() -> {
            cs.addRect((float) x, (float) y, (float) width, (float) height);
            paint(fill, stroke);
        });
    }

    @Override
    public void circle(double cx, double cy, double r, Colour fill, Stroke stroke) {
        if (fill == null && stroke == null) {
            return;
        }
        double k = KAPPA * r;
        io(() -> {
            cs.moveTo((float) (cx + r), (float) cy);
            cs.curveTo((float) (cx + r), (float) (cy + k), (float) (cx + k), (float) (cy + r), (float) cx, (float) (cy + r));
            cs.curveTo((float) (cx - k), (float) (cy + r), (float) (cx - r), (float) (cy + k), (float) (cx - r), (float) cy);
            cs.curveTo((float) (cx - r), (float) (cy - k), (float) (cx - k), (float) (cy - r), (float) cx, (float) (cy - r));
            cs.curveTo((float) (cx + k), (float) (cy - r), (float) (cx + r), (float) (cy - k), (float) (cx + r), (float) cy);
            cs.closePath();
            paint(fill, stroke);
        });
    }

    @Override
    public void text(double x, double y, String text, TextStyle style) {
        String shown = fonts.printable(text);
        if (shown.isEmpty()) {
            return;
        }
        double size = style.size();
        double width = fonts.width(shown, size, style.bold());
        double dx = switch (style.hAlign()) {
            case LEFT -> 0;
            case CENTER -> -width / 2;
            case RIGHT -> -width;
        };
        // text space has y up; the anchor's offset to the baseline, measured upwards
        double dy = switch (style.vAlign()) {
            case TOP -> -fonts.ascent(size);
            case MIDDLE -> -fonts.ascent(size) / 2;
            case BASELINE -> 0;
            case BOTTOM -> fonts.descent(size);
        };
        double theta = Math.toRadians(style.rotationDeg());
        double cos = Math.cos(theta);
        double sin = Math.sin(theta);
        // glyph space (y up) flipped into the painter's y-down space, then turned clockwise by theta
        double a = cos;
        double b = sin;
        double c = sin;
        double d = -cos;
        double e = x + a * dx + c * dy;
        double f = y + b * dx + d * dy;
        io(() -> {
            fill(style.colour());
            cs.beginText();
            cs.setFont(fonts.face(style.bold()), (float) size);
            cs.setTextMatrix(new Matrix((float) a, (float) b, (float) c, (float) d, (float) e, (float) f));
            cs.showText(shown);
            cs.endText();
        });
    }

    @Override
    public TextMeasurer measurer() {
        return fonts;
    }

    private void path(double[] xs, double[] ys, int count) throws IOException {
        cs.moveTo((float) xs[0], (float) ys[0]);
        for (int i = 1; i < count; i++) {
            cs.lineTo((float) xs[i], (float) ys[i]);
        }
    }

    private void paint(Colour fill, Stroke stroke) throws IOException {
        if (fill != null) {
            fill(fill);
        }
        if (stroke != null) {
            stroke(stroke);
        }
        if (fill != null && stroke != null) {
            cs.fillAndStroke();
        } else if (fill != null) {
            cs.fill();
        } else {
            cs.stroke();
        }
    }

    private void fill(Colour c) throws IOException {
        cs.setNonStrokingColor(c.red() / 255f, c.green() / 255f, c.blue() / 255f);
        cs.setGraphicsStateParameters(alpha(c.alpha(), true));
    }

    private void stroke(Stroke s) throws IOException {
        Colour c = s.colour();
        cs.setStrokingColor(c.red() / 255f, c.green() / 255f, c.blue() / 255f);
        cs.setGraphicsStateParameters(alpha(c.alpha(), false));
        cs.setLineWidth((float) s.width());
        double[] dash = s.dash().lengths(s.width());
        float[] pattern = new float[dash.length];
        for (int i = 0; i < dash.length; i++) {
            pattern[i] = (float) dash[i];
        }
        cs.setLineDashPattern(pattern, 0);
        cs.setLineJoinStyle(1);
    }

    private PDExtendedGraphicsState alpha(double alpha, boolean fill) {
        long key = Math.round(alpha * 1000) * 2 + (fill ? 1 : 0);
        return alphas.computeIfAbsent(key, k -> {
            PDExtendedGraphicsState gs = new PDExtendedGraphicsState();
            if (fill) {
                gs.setNonStrokingAlphaConstant((float) alpha);
            } else {
                gs.setStrokingAlphaConstant((float) alpha);
            }
            return gs;
        });
    }

    private interface PdfCall {
        void run() throws IOException;
    }

    private static void io(PdfCall call) {
        try {
            call.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
