package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Painter;

/**
 * The cycle timeline on screen: canvas, buttons to step cycle by cycle or return to the whole log,
 * and the tapped cycle's readout. Pinch or wheel zooms time, a drag pans it. Holds its view model.
 */
public final class TimelineView extends ChartView {
    private final TimelineViewModel viewModel;

    public TimelineView(TimelineViewModel viewModel) {
        this(viewModel, new Surface(viewModel));
    }

    private TimelineView(TimelineViewModel viewModel, Surface surface) {
        super(surface, "Tapped cycle", viewModel.readoutProperty(), viewModel.themeProperty());
        this.viewModel = viewModel;
        surface.setId("timeline-canvas");
        addButton("previous-cycle", "◀  Previous cycle", () -> viewModel.step(-1));
        addButton("next-cycle", "Next cycle  ▶", () -> viewModel.step(1));
        addButton("whole-log", "Whole log", viewModel::wholeLog);
        viewModel.viewportProperty().addListener((o, a, b) -> repaint());
        viewModel.selectedProperty().addListener((o, a, b) -> repaint());
        applyTheme();
    }

    public TimelineViewModel viewModel() {
        return viewModel;
    }

    /** Screen x of a time on the log, in this view's coordinates. */
    public double screenX(double timeS) {
        return surface().getLayoutX() + viewModel.viewportProperty().get().x(timeS);
    }

    /** Screen y of the middle of the moisture-bar panel. */
    public double moisturePanelY() {
        var m = viewModel.layout().moisture();
        return surface().getLayoutY() + m.top() + m.height() / 2;
    }

    private static final class Surface extends ChartCanvas {
        private final TimelineViewModel viewModel;

        Surface(TimelineViewModel viewModel) {
            this.viewModel = viewModel;
        }

        @Override
        void resized(double width, double height) {
            viewModel.resize(width, height);
        }

        @Override
        void paint(Painter painter, double width, double height) {
            if (viewModel.layout() != null && viewModel.viewportProperty().get() != null) {
                viewModel.chart().paint(painter, viewModel.themeProperty().get(), viewModel.layout(),
                        viewModel.viewportProperty().get(), viewModel.selectedProperty().get());
            }
        }

        @Override
        void zoom(double factor, double x, double y) {
            viewModel.zoom(factor, x);
        }

        @Override
        void pan(double dx, double dy) {
            viewModel.pan(dx);
        }

        @Override
        void tap(double x, double y, int clicks) {
            viewModel.tap(x, clicks);
        }
    }
}
