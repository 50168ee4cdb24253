package app.latentledger.ui.chart;

import app.latentledger.chart.draw.Painter;
import javafx.scene.layout.BorderPane;

/**
 * The cycle timeline on screen: canvas, the tapped cycle's readout and buttons to step cycle by
 * cycle or return to the whole log. Pinch or wheel zooms time, a drag pans it. Holds its view model.
 */
public final class TimelineView extends BorderPane {
    private final TimelineViewModel viewModel;
    private final Surface surface = new Surface();
    private final ChartSidePanel side;

    public TimelineView(TimelineViewModel viewModel) {
        this.viewModel = viewModel;
        surface.setId("timeline-canvas");
        side = new ChartSidePanel("Tapped cycle", viewModel.readoutProperty());
        side.addButton("previous-cycle", "◀  Previous cycle", () -> viewModel.step(-1));
        side.addButton("next-cycle", "Next cycle  ▶", () -> viewModel.step(1));
        side.addButton("whole-log", "Whole log", viewModel::wholeLog);
        side.addSpacer();
        setCenter(surface);
        setRight(side);
        viewModel.viewportProperty().addListener((o, a, b) -> surface.repaint());
        viewModel.selectedProperty().addListener((o, a, b) -> surface.repaint());
        viewModel.themeProperty().addListener((o, a, b) -> applyTheme());
        applyTheme();
    }

    public TimelineViewModel viewModel() {
        return viewModel;
    }

    private void applyTheme() {
        side.applyTheme(viewModel.themeProperty().get());
        setStyle("-fx-background-color: " + viewModel.themeProperty().get().background().hex() + ";");
        if (surface.getWidth() > 0) {
            viewModel.resize(surface.canvas().getWidth(), surface.canvas().getHeight());
        }
        surface.repaint();
    }

    /** Screen x of a time on the log, in this view's coordinates. */
    public double screenX(double timeS) {
        return surface.getLayoutX() + viewModel.viewportProperty().get().x(timeS);
    }

    /** Screen y of the middle of the moisture-bar panel. */
    public double moisturePanelY() {
        var m = viewModel.layout().moisture();
        return surface.getLayoutY() + m.top() + m.height() / 2;
    }

    private final class Surface extends ChartCanvas {
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
