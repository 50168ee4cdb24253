package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.ChartViewport;
import app.latentledger.chart.psychro.PsychroChart;
import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.chart.psychro.PsychroChartLayout;
import app.latentledger.chart.psychro.StateReadout;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;

import java.util.Optional;

/**
 * State of a psychrometric chart on screen: the chart, the theme, the zoom/pan window, and the
 * state the tech last tapped. No drawing here; testable without a stage. {@link #show} puts new
 * data on the same chart (a value typed on the pad): a window the tech zoomed or panned is kept,
 * an untouched one is fitted to the new states.
 */
public final class PsychroChartViewModel {
    private final ReadOnlyObjectWrapper<PsychroChart> chart;
    /** True once the tech zoomed or panned, until "whole chart". */
    private boolean moved;
    private final ObjectProperty<Theme> theme = new SimpleObjectProperty<>(Theme.LIGHT);
    private final ReadOnlyObjectWrapper<ChartViewport> viewport = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<ChartPoint> selected = new ReadOnlyObjectWrapper<>();
    private static final String HINT = "Tap a point to read its state";

    private final ReadOnlyStringWrapper readout = new ReadOnlyStringWrapper(HINT);
    private PsychroChartLayout layout;
    /** False when the screen shows the key beside the canvas: the plot then takes the key's band. */
    private boolean keyInCanvas = true;

    public PsychroChartViewModel(PsychroChartData data) {
        this.chart = new ReadOnlyObjectWrapper<>(new PsychroChart(data));
    }

    public PsychroChart chart() {
        return chart.get();
    }

    /** The chart drawn; replaced by {@link #show}. */
    public ReadOnlyObjectProperty<PsychroChart> chartProperty() {
        return chart.getReadOnlyProperty();
    }

    /** Draws other states (or the same states in other units). The tapped state is cleared. */
    public void show(PsychroChartData data) {
        PsychroChartData was = chart.get().data();
        PsychroChart next = new PsychroChart(data);
        boolean sameAxes = was.units() == data.units() && was.pressurePa() == data.pressurePa();
        selected.set(null);
        readout.set(HINT);
        chart.set(next);
        if (layout != null) {
            // the key may have more or fewer rows: the plot area follows it
            layout = next.layout(layout.width(), layout.height(), theme.get(), keyInCanvas);
            ChartViewport vp = viewport.get();
            viewport.set(moved && sameAxes && vp != null
                    ? vp.withPlot(layout.plotLeft(), layout.plotTop(), layout.plotWidth(), layout.plotHeight())
                    : next.initialViewport(layout));
            moved = moved && sameAxes;
        }
    }

    /**
     * Draws the states of another reading set: unlike {@link #show}, a zoom or pan made on the
     * previous set is dropped, so the new set's states all start in view.
     */
    public void showNewSet(PsychroChartData data) {
        moved = false;
        show(data);
    }

    public ObjectProperty<Theme> themeProperty() {
        return theme;
    }

    public ReadOnlyObjectProperty<ChartViewport> viewportProperty() {
        return viewport.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<ChartPoint> selectedProperty() {
        return selected.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty readoutProperty() {
        return readout.getReadOnlyProperty();
    }

    public PsychroChartLayout layout() {
        return layout;
    }

    /** A new size: keep the window, move it into the new plot area. */
    public void resize(double width, double height) {
        layout = chart.get().layout(width, height, theme.get(), keyInCanvas);
        ChartViewport vp = viewport.get();
        viewport.set(vp == null ? chart.get().initialViewport(layout)
                : vp.withPlot(layout.plotLeft(), layout.plotTop(), layout.plotWidth(), layout.plotHeight()));
    }

    /** Leaves the key out of the canvas (the view shows it outside); the plot grows into its band. */
    public void keyOutsideCanvas() {
        if (keyInCanvas) {
            keyInCanvas = false;
            if (layout != null) {
                resize(layout.width(), layout.height());
            }
        }
    }

    public boolean keyInCanvas() {
        return keyInCanvas;
    }

    public void zoom(double factor, double x, double y) {
        if (viewport.get() != null) {
            viewport.set(viewport.get().zoomed(factor, x, y));
            moved = true;
        }
    }

    public void pan(double dx, double dy) {
        if (viewport.get() != null) {
            viewport.set(viewport.get().panned(dx, dy));
            moved = true;
        }
    }

    public void reset() {
        if (viewport.get() != null) {
            viewport.set(viewport.get().reset());
            moved = false;
        }
    }

    /**
     * Selects the mark under a tap (a state, a dew point, the ADP or the coil temperature), or clears
     * the selection if there is none.
     */
    public void tap(double x, double y) {
        if (viewport.get() == null) {
            return;
        }
        PsychroChart c = chart.get();
        Optional<ChartPoint> hit = c.pointNear(viewport.get(), x, y);
        selected.set(hit.orElse(null));
        readout.set(hit.map(p -> String.join("\n", StateReadout.lines(p, c.data().pressurePa(),
                c.data().units()))).orElse(HINT));
    }
}
