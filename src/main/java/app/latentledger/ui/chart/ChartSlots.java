package app.latentledger.ui.chart;

import javafx.beans.value.ObservableValue;
import javafx.scene.control.Label;
import javafx.scene.layout.StackPane;

/**
 * Puts the chart views into the screens' slots. The shell calls it after the first frame for the
 * psychrometric charts (they are the heaviest nodes on the first screen); the log screen's slot
 * follows its view model's timeline. Binds only: the views hold their view models.
 */
public final class ChartSlots {
    /** Tall enough for the chart's axes and the readout beside it at 18 px text. */
    static final double PSYCHRO_HEIGHT_PX = 470;
    /**
     * Asked-for height where the screen scrolls (upright, Compare): a plot at least 360 px tall
     * above the key band at full width; lying down the Results screen gives it what is left.
     */
    static final double PSYCHRO_PREF_HEIGHT_PX = 640;
    /** Room for the two line panels and the moisture bars (at least 120 px under their key) in any zoom. */
    static final double TIMELINE_HEIGHT_PX = 620;

    private ChartSlots() {
    }

    /** Draws {@code viewModel}'s chart in the slot. */
    public static PsychroChartView psychro(StackPane slot, PsychroChartViewModel viewModel) {
        PsychroChartView view = new PsychroChartView(viewModel);
        view.setId("psychro-chart");
        slot.getStyleClass().remove("slot-placeholder");
        slot.setMinHeight(PSYCHRO_HEIGHT_PX);
        slot.setPrefHeight(PSYCHRO_PREF_HEIGHT_PX);
        slot.getChildren().setAll(view);
        return view;
    }

    /** Shows the timeline of the current view model, or {@code emptyText} while there is none. */
    public static void timeline(StackPane slot, ObservableValue<TimelineViewModel> viewModel, String emptyText) {
        Runnable show = () -> {
            TimelineViewModel vm = viewModel.getValue();
            if (vm == null) {
                Label l = new Label(emptyText);
                l.getStyleClass().add("muted");
                l.setWrapText(true);
                slot.getStyleClass().remove("slot-placeholder");
                slot.getStyleClass().add("slot-placeholder");
                slot.setMinHeight(0);
                slot.setPrefHeight(javafx.scene.layout.Region.USE_COMPUTED_SIZE);
                slot.getChildren().setAll(l);
            } else {
                TimelineView view = new TimelineView(vm);
                view.setId("timeline");
                slot.getStyleClass().remove("slot-placeholder");
                slot.setMinHeight(TIMELINE_HEIGHT_PX);
                slot.setPrefHeight(TIMELINE_HEIGHT_PX);
                slot.getChildren().setAll(view);
            }
        };
        viewModel.addListener((o, a, b) -> show.run());
        show.run();
    }
}
