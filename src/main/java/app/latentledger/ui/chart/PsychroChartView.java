package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Painter;
import app.latentledger.chart.psychro.ChartPoint;
import app.latentledger.chart.psychro.ChartViewport;

/**
 * The psychrometric chart on screen: the canvas, zoom buttons, the tapped state's readout and,
 * under them, the chart's key.
 * Binds and forwards gestures only; the view model holds the state. The view keeps a strong
 * reference to its view model because bindings alone would let it be collected.
 */
public final class PsychroChartView extends ChartView {
    private final PsychroChartViewModel viewModel;

    public PsychroChartView(PsychroChartViewModel viewModel) {
        this(viewModel, new Surface(viewModel));
    }

    private PsychroChartView(PsychroChartViewModel viewModel, Surface surface) {
        super(surface, "Tapped state", viewModel.readoutProperty(), viewModel.themeProperty());
        this.viewModel = viewModel;
        surface.setId("psychro-canvas");
        addButton("zoom-in", "Zoom in", () -> zoomAboutCentre(1.4));
        addButton("zoom-out", "Zoom out", () -> zoomAboutCentre(1 / 1.4));
        addButton("whole-chart", "Whole chart", viewModel::reset);
        viewModel.viewportProperty().addListener((o, a, b) -> repaint());
        viewModel.selectedProperty().addListener((o, a, b) -> repaint());
        viewModel.chartProperty().addListener((o, a, b) -> {
            repaint();
            keyChanged();
        });
        // the key goes under the chart, across its strip: the plot keeps the whole canvas height
        viewModel.keyOutsideCanvas();
        showKey(new ChartKey(() -> viewModel.chart().key(viewModel.themeProperty().get()),
                () -> viewModel.themeProperty().get()));
    }

    public PsychroChartViewModel viewModel() {
        return viewModel;
    }

    private void zoomAboutCentre(double factor) {
        ChartViewport vp = viewModel.viewportProperty().get();
        if (vp != null) {
            viewModel.zoom(factor, vp.left() + vp.width() / 2, vp.top() + vp.height() / 2);
        }
    }

    /** Screen position of a plotted state, in this view's coordinates (for tests and tooltips). */
    public double[] screenPosition(ChartPoint p) {
        ChartViewport vp = viewModel.viewportProperty().get();
        return new double[] {surface().getLayoutX() + vp.x(p.dryBulbC()), surface().getLayoutY() + vp.y(p.humidityRatio())};
    }

    private static final class Surface extends ChartCanvas {
        private final PsychroChartViewModel viewModel;

        Surface(PsychroChartViewModel viewModel) {
            this.viewModel = viewModel;
        }

        @Override
        void resized(double width, double height) {
            viewModel.resize(width, height);
        }

        @Override
        void paint(Painter painter, double width, double height) {
            if (viewModel.layout() == null || viewModel.viewportProperty().get() == null) {
                return;
            }
            viewModel.chart().paint(painter, viewModel.themeProperty().get(), viewModel.layout(),
                    viewModel.viewportProperty().get());
            ChartPoint sel = viewModel.selectedProperty().get();
            if (sel != null) {
                viewModel.chart().paintSelection(painter, viewModel.themeProperty().get(),
                        viewModel.viewportProperty().get(), sel);
            }
        }

        @Override
        void zoom(double factor, double x, double y) {
            viewModel.zoom(factor, x, y);
        }

        @Override
        void pan(double dx, double dy) {
            viewModel.pan(dx, dy);
        }

        @Override
        void tap(double x, double y, int clicks) {
            viewModel.tap(x, y);
        }
    }
}
