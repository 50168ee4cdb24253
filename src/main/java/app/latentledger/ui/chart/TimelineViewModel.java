package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.timeline.CycleMark;
import app.latentledger.chart.timeline.CycleReadout;
import app.latentledger.chart.timeline.TimeViewport;
import app.latentledger.chart.timeline.TimelineChart;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.chart.timeline.TimelineLayout;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;

import java.util.OptionalInt;

/**
 * State of a cycle timeline on screen: the time window, the selected cycle and its readout. A tap
 * selects a cycle, a double tap (or the cycle buttons) zooms to it.
 */
public final class TimelineViewModel {
    private static final String HINT = "Tap a cycle to read it; double-tap to zoom to it";

    private final TimelineChart chart;
    private final ObjectProperty<Theme> theme = new SimpleObjectProperty<>(Theme.LIGHT);
    private final ReadOnlyObjectWrapper<TimeViewport> viewport = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyIntegerWrapper selected = new ReadOnlyIntegerWrapper(-1);
    private final ReadOnlyStringWrapper readout = new ReadOnlyStringWrapper(HINT);
    private TimelineLayout layout;

    public TimelineViewModel(TimelineData data) {
        this.chart = new TimelineChart(data);
    }

    public TimelineChart chart() {
        return chart;
    }

    public ObjectProperty<Theme> themeProperty() {
        return theme;
    }

    public ReadOnlyObjectProperty<TimeViewport> viewportProperty() {
        return viewport.getReadOnlyProperty();
    }

    public ReadOnlyIntegerProperty selectedProperty() {
        return selected.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty readoutProperty() {
        return readout.getReadOnlyProperty();
    }

    public TimelineLayout layout() {
        return layout;
    }

    public void resize(double width, double height) {
        layout = TimelineLayout.forSize(width, height, theme.get());
        TimeViewport vp = viewport.get();
        viewport.set(vp == null ? layout.viewport(chart.data()) : vp.withPlot(layout.left(), layout.plotWidth()));
    }

    public void zoom(double factor, double x) {
        if (viewport.get() != null) {
            viewport.set(viewport.get().zoomed(factor, x));
        }
    }

    public void pan(double dx) {
        if (viewport.get() != null) {
            viewport.set(viewport.get().panned(dx));
        }
    }

    public void wholeLog() {
        if (viewport.get() != null) {
            viewport.set(viewport.get().whole());
        }
    }

    public void tap(double x, int clicks) {
        if (viewport.get() == null) {
            return;
        }
        OptionalInt hit = chart.cycleAt(viewport.get(), x);
        select(hit.orElse(-1));
        if (clicks >= 2 && hit.isPresent()) {
            zoomToCycle(hit.getAsInt());
        }
    }

    /** Shows one whole cycle, on and off, with a little margin. */
    public void zoomToCycle(int index) {
        if (viewport.get() == null || index < 0 || index >= chart.data().cycles().size()) {
            return;
        }
        CycleMark c = chart.data().cycles().get(index);
        select(index);
        viewport.set(viewport.get().showing(c.startS(), c.endS()));
    }

    /** Steps to the next (+1) or previous (−1) cycle, from the selected one or the window's centre. */
    public void step(int direction) {
        if (viewport.get() == null) {
            return;
        }
        int from = selected.get();
        if (from < 0) {
            TimeViewport vp = viewport.get();
            from = chart.cycleAt(vp, vp.left() + vp.width() / 2).orElse(0) - direction;
        }
        zoomToCycle(Math.max(0, Math.min(chart.data().cycles().size() - 1, from + direction)));
    }

    private void select(int index) {
        selected.set(index);
        readout.set(index < 0 ? HINT : String.join("\n", CycleReadout.lines(index, chart.data().cycles().get(index),
                chart.data().units())));
    }
}
