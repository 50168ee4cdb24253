package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Theme;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.scene.layout.BorderPane;

/**
 * What both charts on screen share: the canvas in the middle, the strip beside it (buttons first,
 * then the tapped item's readout in a box of fixed size, so a tap never moves a button), and the
 * theme applied to both. A subclass supplies the canvas and its buttons and binds its view model.
 */
abstract class ChartView extends BorderPane {
    private final ChartCanvas surface;
    private final ChartSidePanel side;
    private final ObjectProperty<Theme> theme;
    private ChartKey key;

    ChartView(ChartCanvas surface, String readoutHeading, ReadOnlyStringProperty readout, ObjectProperty<Theme> theme) {
        this.surface = surface;
        this.theme = theme;
        side = new ChartSidePanel(readoutHeading, readout);
        setCenter(surface);
        setRight(side);
        theme.addListener((o, a, b) -> applyTheme());
    }

    /** Adds a button to the strip, above the readout. */
    final void addButton(String id, String text, Runnable action) {
        side.addButton(id, text, action);
    }

    /** Shows the chart's key in a band under the canvas and the strip, outside the plot. */
    final void showKey(ChartKey key) {
        this.key = key;
        setBottom(key);
        applyTheme();
    }

    /** Call once the subclass is wired: paints in the current theme. */
    final void applyTheme() {
        side.applyTheme(theme.get());
        setStyle("-fx-background-color: " + theme.get().background().hex() + ";");
        if (surface.getWidth() > 0) {
            surface.resized(surface.canvas().getWidth(), surface.canvas().getHeight());
        }
        surface.repaint();
        if (key != null) {
            key.requestLayout();
            key.repaint();
        }
    }

    final ChartCanvas surface() {
        return surface;
    }

    /** Repaints the canvas (a new window, selection or chart). */
    final void repaint() {
        surface.repaint();
    }

    /** The key changed (a new chart): new rows, so perhaps a new height. */
    final void keyChanged() {
        if (key != null) {
            key.requestLayout();
            key.repaint();
        }
    }
}
