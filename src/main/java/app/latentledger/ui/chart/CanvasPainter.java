package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextMeasurer;
import app.latentledger.chart.draw.TextStyle;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;

/** Paints the chart drawing calls onto a JavaFX canvas. */
public final class CanvasPainter implements Painter {
    private final GraphicsContext g;
    private final FxTextMeasurer measurer;

    public CanvasPainter(GraphicsContext g, FxTextMeasurer measurer) {
        this.g = g;
        this.measurer = measurer;
        g.setLineCap(StrokeLineCap.BUTT);
        g.setLineJoin(StrokeLineJoin.ROUND);
    }

    static Color fx(Colour c) {
        return Color.rgb(c.red(), c.green(), c.blue(), c.alpha());
    }

    private void apply(Stroke s) {
        g.setStroke(fx(s.colour()));
        g.setLineWidth(s.width());
        double[] dashes = s.dash().lengths(s.width());
        g.setLineDashes(dashes.length == 0 ? null : dashes);
    }

    @Override
    public void save() {
        g.save();
    }

    @Override
    public void restore() {
        g.restore();
    }

    @Override
    public void clip(double x, double y, double width, double height) {
        g.beginPath();
        g.rect(x, y, width, height);
        g.closePath();
        g.clip();
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, Stroke stroke) {
        apply(stroke);
        g.strokeLine(x1, y1, x2, y2);
    }

    @Override
    public void polyline(double[] xs, double[] ys, int count, Stroke stroke) {
        if (count < 2) {
            return;
        }
        apply(stroke);
        g.strokePolyline(xs, ys, count);
    }

    @Override
    public void polygon(double[] xs, double[] ys, int count, Colour fill, Stroke stroke) {
        if (fill != null) {
            g.setFill(fx(fill));
            g.fillPolygon(xs, ys, count);
        }
        if (stroke != null) {
            apply(stroke);
            g.strokePolygon(xs, ys, count);
        }
    }

    @Override
    public void rect(double x, double y, double width, double height, Colour fill, Stroke stroke) {
        if (fill != null) {
            g.setFill(fx(fill));
            g.fillRect(x, y, width, height);
        }
        if (stroke != null) {
            apply(stroke);
            g.strokeRect(x, y, width, height);
        }
    }

    @Override
    public void circle(double cx, double cy, double radius, Colour fill, Stroke stroke) {
        if (fill != null) {
            g.setFill(fx(fill));
            g.fillOval(cx - radius, cy - radius, 2 * radius, 2 * radius);
        }
        if (stroke != null) {
            apply(stroke);
            g.strokeOval(cx - radius, cy - radius, 2 * radius, 2 * radius);
        }
    }

    @Override
    public void text(double x, double y, String text, TextStyle style) {
        Font font = measurer.font(style.size(), style.bold());
        g.setFont(font);
        g.setFill(fx(style.colour()));
        g.setTextAlign(switch (style.hAlign()) {
            case LEFT -> TextAlignment.LEFT;
            case CENTER -> TextAlignment.CENTER;
            case RIGHT -> TextAlignment.RIGHT;
        });
        // MIDDLE is centred on the digits' height rather than the font box, which sits too low
        double shift = 0;
        switch (style.vAlign()) {
            case TOP -> shift = measurer.ascent(style.size());
            case MIDDLE -> shift = measurer.ascent(style.size()) / 2;
            case BOTTOM -> shift = -measurer.descent(style.size());
            default -> { }
        }
        g.setTextBaseline(VPos.BASELINE);
        if (style.rotationDeg() == 0) {
            g.fillText(text, x, y + shift);
        } else {
            g.save();
            g.translate(x, y);
            g.rotate(style.rotationDeg());
            g.fillText(text, 0, shift);
            g.restore();
        }
    }

    @Override
    public TextMeasurer measurer() {
        return measurer;
    }
}
