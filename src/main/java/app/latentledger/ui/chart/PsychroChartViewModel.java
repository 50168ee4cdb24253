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
 * state the tech last tapped. No drawing here; testable without a stage.
 */
public final class PsychroChartViewModel {
    private final PsychroChart chart;
    private final ObjectProperty<Theme> theme = new SimpleObjectProperty<>(Theme.LIGHT);
    private final ReadOnlyObjectWrapper<ChartViewport> viewport = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<ChartPoint> selected = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper readout = new ReadOnlyStringWrapper("Tap a point to read its state");
    private PsychroChartLayout layout;

    public PsychroChartViewModel(PsychroChartData data) {
        this.chart = new PsychroChart(data);
    }

    public PsychroChart chart() {
        return chart;
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
        layout = PsychroChartLayout.forSize(width, height, theme.get());
        ChartViewport vp = viewport.get();
        viewport.set(vp == null ? chart.initialViewport(layout)
                : vp.withPlot(layout.plotLeft(), layout.plotTop(), layout.plotWidth(), layout.plotHeight()));
    }

    public void zoom(double factor, double x, double y) {
        if (viewport.get() != null) {
            viewport.set(viewport.get().zoomed(factor, x, y));
        }
    }

    public void pan(double dx, double dy) {
        if (viewport.get() != null) {
            viewport.set(viewport.get().panned(dx, dy));
        }
    }

    public void reset() {
        if (viewport.get() != null) {
            viewport.set(viewport.get().reset());
        }
    }

    /** Selects the state under a tap, or clears the selection if there is none. */
    public void tap(double x, double y) {
        if (viewport.get() == null) {
            return;
        }
        Optional<ChartPoint> hit = chart.pointNear(viewport.get(), x, y);
        selected.set(hit.orElse(null));
        readout.set(hit.map(p -> String.join("\n", StateReadout.lines(p, chart.data().pressurePa(),
                chart.data().units()))).orElse("Tap a point to read its state"));
    }
}
