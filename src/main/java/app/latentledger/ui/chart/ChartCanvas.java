package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Painter;
import javafx.scene.canvas.Canvas;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.input.ZoomEvent;
import javafx.scene.layout.Region;

/**
 * A region holding a canvas that is resized with it and repainted through a {@link Painter}.
 * Gestures are turned into three calls: zoom about a point, pan by a drag, and tap.
 * Touch drags arrive as scroll events with a touch count, mouse drags as mouse events; synthesized
 * mouse events from touch are ignored so a finger does not pan twice.
 */
abstract class ChartCanvas extends Region {
    /** Movement below which a press and release count as a tap, device units. */
    private static final double TAP_SLOP_PX = 8;

    private final Canvas canvas = new Canvas();
    private final FxTextMeasurer measurer = FxTextMeasurer.system();
    private double pressX;
    private double pressY;
    private double lastX;
    private double lastY;
    private boolean dragged;

    ChartCanvas() {
        getChildren().add(canvas);
        setMinSize(320, 240);
        setPrefSize(1280, 800);
        addEventHandler(ZoomEvent.ZOOM, e -> {
            zoom(e.getZoomFactor(), e.getX(), e.getY());
            e.consume();
        });
        addEventHandler(ScrollEvent.SCROLL, e -> {
            if (e.getTouchCount() > 0) {
                pan(e.getDeltaX(), e.getDeltaY());
            } else if (e.getDeltaY() != 0) {
                zoom(Math.exp(e.getDeltaY() / 300.0), e.getX(), e.getY());
            }
            e.consume();
        });
        addEventHandler(MouseEvent.MOUSE_PRESSED, e -> {
            pressX = lastX = e.getX();
            pressY = lastY = e.getY();
            dragged = false;
            // the drag is the chart's: the page around it must not scroll with it
            e.consume();
        });
        addEventHandler(MouseEvent.MOUSE_DRAGGED, e -> {
            if (Math.hypot(e.getX() - pressX, e.getY() - pressY) > TAP_SLOP_PX) {
                dragged = true;
            }
            if (dragged && !e.isSynthesized()) {
                pan(e.getX() - lastX, e.getY() - lastY);
            }
            lastX = e.getX();
            lastY = e.getY();
            e.consume();
        });
        addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (!dragged && e.isStillSincePress()) {
                tap(e.getX(), e.getY(), e.getClickCount());
            }
        });
    }

    @Override
    protected void layoutChildren() {
        double w = Math.floor(getWidth());
        double h = Math.floor(getHeight());
        if (w != canvas.getWidth() || h != canvas.getHeight()) {
            canvas.setWidth(w);
            canvas.setHeight(h);
            resized(w, h);
        }
        repaint();
    }

    /** Paints the chart now, at the canvas's current size. */
    final void repaint() {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        if (w < 1 || h < 1) {
            return;
        }
        var g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, w, h);
        g.save();
        paint(new CanvasPainter(g, measurer), w, h);
        g.restore();
    }

    Canvas canvas() {
        return canvas;
    }

    abstract void resized(double width, double height);

    abstract void paint(Painter painter, double width, double height);

    abstract void zoom(double factor, double x, double y);

    abstract void pan(double dx, double dy);

    abstract void tap(double x, double y, int clicks);
}
