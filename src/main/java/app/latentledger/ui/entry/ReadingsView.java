package app.latentledger.ui.entry;

import app.latentledger.core.findings.Cautions;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.results.ResultsViewModel;
import app.latentledger.ui.results.VerdictBanner;
import app.latentledger.ui.session.Slot;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

import java.util.List;

/**
 * The readings screen: the boxes grouped as the tech walks the system (return, supply, outdoor,
 * coil, airflow, condensate), the pad, and the live verdict underneath. Binds only.
 */
public final class ReadingsView extends VBox implements Reflowing {
    private final EntryViewModel viewModel;
    private final ResultsViewModel results;
    private final GridPane boxes = new GridPane();
    private final KeypadView pad;
    private final HBox landscape = new HBox(16);
    private final VBox portrait = new VBox(12);
    private final VBox boxesColumn;
    private final javafx.scene.control.ScrollPane uprightBoxes = Ui.scroll(null);

    public ReadingsView(EntryViewModel viewModel, ResultsViewModel results) {
        super(12);
        this.viewModel = viewModel;
        this.results = results;
        getStyleClass().add("screen");
        setId("screen-readings");
        boxes.setHgap(10);
        boxes.setVgap(8);
        pad = new KeypadView(viewModel);
        Label caution = Ui.wrapped(Cautions.BEFORE_COIL_READINGS, "caution");
        caution.setId("coil-caution");
        caution.setGraphic(Icons.CAUTION.node(22));
        javafx.scene.control.ComboBox<EntryViewModel.SetChoice> set = new javafx.scene.control.ComboBox<>(viewModel.sets());
        set.setId("reading-set-pick");
        set.valueProperty().bindBidirectional(viewModel.currentSetProperty());
        HBox setRow = new HBox(10, Ui.label("Reading set", "group-title"), set);
        setRow.setAlignment(Pos.CENTER_LEFT);
        boxesColumn = new VBox(8, setRow, boxes, caution);
        VerdictBanner live = new VerdictBanner(results.sheetProperty(), true);
        live.setId("live-verdict");
        HBox.setHgrow(boxesColumn, Priority.ALWAYS);
        pad.setMinWidth(420);
        pad.setPrefWidth(460);
        getChildren().addAll(new VBox(), live);
        setPortrait(false);
    }

    public EntryViewModel viewModel() {
        return viewModel;
    }

    public ResultsViewModel results() {
        return results;
    }

    @Override
    public void setPortrait(boolean upright) {
        getStyleClass().remove("portrait");
        if (upright) {
            // an upright tablet has 1280 px for everything: tiles and keys give up a little height
            getStyleClass().add("portrait");
        }
        fillBoxes(2);
        pad.setPortrait(upright);
        landscape.getChildren().clear();
        portrait.getChildren().clear();
        Node body;
        if (upright) {
            // upright the pad keeps its fixed size below and the boxes scroll above it when they are
            // more than the height left (the probe row made them so): nothing is squeezed or pushed off
            uprightBoxes.setContent(boxesColumn);
            portrait.getChildren().addAll(uprightBoxes, pad);
            body = portrait;
        } else {
            uprightBoxes.setContent(null);
            landscape.getChildren().addAll(boxesColumn, pad);
            body = landscape;
        }
        VBox.setVgrow(body, Priority.ALWAYS);
        getChildren().set(0, body);
    }

    /** Beside the airflow box: on for standard cfm (most flow hoods and grids), off for an actual volume. */
    private javafx.scene.control.ToggleButton airflowSwitch() {
        javafx.scene.control.ToggleButton b = switchButton("airflow-standard", "Standard air");
        b.selectedProperty().bindBidirectional(viewModel.standardAirflowProperty());
        return b;
    }

    /** Beside the probe offset: on when one instrument read return and supply (or both were compared). */
    private javafx.scene.control.ToggleButton probeSwitch() {
        javafx.scene.control.ToggleButton b = switchButton("same-probe", "One probe");
        b.selectedProperty().bindBidirectional(viewModel.sameProbeProperty());
        return b;
    }

    private static javafx.scene.control.ToggleButton switchButton(String id, String text) {
        javafx.scene.control.ToggleButton b = new javafx.scene.control.ToggleButton(text) {
            // at least a gloved finger's height, and tall enough for its wrapped words at any text size
            @Override
            protected double computeMinHeight(double width) {
                return Math.max(48, computePrefHeight(width));
            }
        };
        b.setId(id);
        b.getStyleClass().add("switch-box");
        b.setWrapText(true);
        b.setMaxWidth(Double.MAX_VALUE);
        b.setMaxHeight(Double.MAX_VALUE);
        b.setFocusTraversable(false);
        return b;
    }

    private void fillBoxes(int groupsPerRow) {
        boxes.getChildren().clear();
        boxes.getColumnConstraints().clear();
        int columns = groupsPerRow * 2;
        for (int i = 0; i < columns; i++) {
            ColumnConstraints c = new ColumnConstraints();
            c.setPercentWidth(100.0 / columns);
            c.setFillWidth(true);
            boxes.getColumnConstraints().add(c);
        }
        // a null box is the group's switch: beside the airflow, what its number means; beside the
        // probe offset, whether one instrument read both sides
        List<List<Slot>> groups = java.util.Arrays.asList(
                List.of(Slot.RETURN_DRY_BULB, Slot.RETURN_HUMIDITY),
                List.of(Slot.SUPPLY_DRY_BULB, Slot.SUPPLY_HUMIDITY),
                List.of(Slot.OUTDOOR_DRY_BULB, Slot.OUTDOOR_HUMIDITY),
                List.of(Slot.COIL_TEMPERATURE, Slot.NOMINAL_TONS),
                java.util.Arrays.asList(Slot.AIRFLOW, null),
                List.of(Slot.CONDENSATE_VOLUME, Slot.CONDENSATE_MINUTES),
                java.util.Arrays.asList(null, Slot.SUPPLY_DEW_POINT_OFFSET));
        List<String> names = List.of("Return air", "Supply air", "Outdoor (optional)", "Coil and system",
                "Airflow", "Condensate (optional)", "Humidity probes");
        int row = 0;
        for (int g = 0; g < groups.size(); g++) {
            int col = (g % groupsPerRow) * 2;
            if (g > 0 && g % groupsPerRow == 0) {
                row += 2;
            }
            Label name = Ui.label(names.get(g), "group-title");
            boxes.add(name, col, row, 2, 1);
            List<Slot> slots = groups.get(g);
            for (int i = 0; i < slots.size(); i++) {
                Node box = slots.get(i) != null ? new SlotTile(viewModel, slots.get(i))
                        : slots.contains(Slot.AIRFLOW) ? airflowSwitch() : probeSwitch();
                boxes.add(box, col + i, row + 1, slots.size() == 1 ? 2 : 1, 1);
            }
        }
        boxes.setAlignment(Pos.TOP_LEFT);
    }
}
