package app.latentledger.ui.chart;

import app.latentledger.chart.draw.LegendFlow;
import app.latentledger.chart.draw.Theme;
import javafx.geometry.Orientation;
import javafx.scene.canvas.Canvas;
import javafx.scene.layout.Region;

import java.util.function.Supplier;

/**
 * A chart's key in its own band under the chart view, across the canvas and the strip beside it:
 * outside the plot, so it never covers a state and never takes the plot's height. The rows are
 * flowed by {@link LegendFlow} for the band's width; the band is as tall as they need.
 */
final class ChartKey extends Region {
    private final Canvas canvas = new Canvas();
    private final Supplier<LegendFlow> key;
    private final Supplier<Theme> theme;
    private final FxTextMeasurer measurer = FxTextMeasurer.system();

    ChartKey(Supplier<LegendFlow> key, Supplier<Theme> theme) {
        this.key = key;
        this.theme = theme;
        getChildren().add(canvas);
        setId("chart-key");
    }

    @Override
    public Orientation getContentBias() {
        return Orientation.HORIZONTAL;
    }

    private double inset() {
        return Math.round(theme.get().baseText() * 1.2);
    }

    @Override
    protected double computePrefHeight(double width) {
        double w = width > 0 ? width : getWidth() > 0 ? getWidth() : 800;
        return Math.ceil(key.get().height(w - 2 * inset())) + 8;
    }

    @Override
    protected double computeMinHeight(double width) {
        return computePrefHeight(width);
    }

    @Override
    protected void layoutChildren() {
        canvas.setWidth(Math.floor(getWidth()));
        canvas.setHeight(Math.floor(getHeight()));
        repaint();
    }

    /** Paints the key again (a new chart or theme); asks for a new height if the rows changed. */
    void repaint() {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        if (w < 1 || h < 1) {
            return;
        }
        var g = canvas.getGraphicsContext2D();
        Theme t = theme.get();
        g.clearRect(0, 0, w, h);
        g.setFill(javafx.scene.paint.Color.web(t.background().hex()));
        g.fillRect(0, 0, w, h);
        g.save();
        key.get().paint(t.painter(new CanvasPainter(g, measurer)), inset(), 0, w - 2 * inset());
        g.restore();
    }
}
