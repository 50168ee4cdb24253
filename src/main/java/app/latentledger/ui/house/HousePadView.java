package app.latentledger.ui.house;

import app.latentledger.ui.entry.HardwareKeys;
import app.latentledger.ui.entry.KeyGrid;
import app.latentledger.ui.entry.KeypadViewModel;
import app.latentledger.ui.look.Ui;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.RowConstraints;
import javafx.scene.layout.VBox;
import java.util.ArrayList;
import java.util.List;

/**
 * The House screen's number pad: the selected box's name, the number being typed on the shared
 * {@link KeypadViewModel} with its unit, the box's choices (humidity kind, blower-door result,
 * ventilation type), the keys in the Readings pad's places, and the message that says what was
 * saved or why not. Binds to {@link HouseEntryViewModel} only.
 */
final class HousePadView extends VBox {
    /** A key's height: 56 px, above the 48 px glove target with room for the boxes beside it. */
    static final double KEY_HEIGHT = 56;

    private final HouseEntryViewModel vm; // strong reference: bindings hold their partner weakly
    private final Label title = Ui.label("", "subheading");
    private final Label unit = Ui.label("", "pad-unit");
    private final HBox choices = new HBox(8);

    HousePadView(HouseEntryViewModel vm) {
        super(8);
        this.vm = vm;
        getStyleClass().add("panel");
        setId("house-pad");
        KeypadViewModel pad = vm.pad();
        title.setId("house-pad-title");
        title.setWrapText(true);
        title.setMinHeight(Region.USE_PREF_SIZE);
        Label display = Ui.label("", "pad-display");
        display.setId("house-pad-display");
        display.setMaxWidth(Double.MAX_VALUE);
        display.textProperty().bind(pad.textProperty());
        HBox.setHgrow(display, Priority.ALWAYS);
        unit.setId("house-pad-unit");
        unit.setMinWidth(Region.USE_PREF_SIZE);
        HBox shown = new HBox(10, display, unit);
        shown.setAlignment(Pos.CENTER_LEFT);
        choices.setId("house-pad-choices");
        choices.setMinHeight(Ui.MIN_TARGET_PX);
        Label message = Ui.wrapped("", "message");
        message.setId("house-pad-message");
        message.textProperty().bind(vm.messageProperty());
        message.setMaxWidth(Double.MAX_VALUE);
        vm.refusedProperty().addListener((o, a, b) -> {
            message.getStyleClass().remove("refused");
            if (b) {
                message.getStyleClass().add("refused");
            }
        });
        vm.selectedProperty().addListener((o, a, b) -> fill());
        vm.revisionProperty().addListener((o, a, b) -> fill());
        fill();
        getChildren().addAll(title, shown, choices, keys(pad), message);
        // a USB or Bluetooth keyboard types here as on the Readings pad: one mapping for both
        HardwareKeys.attach(this, pad, vm::enterAndAdvance);
    }

    /** The box's name, unit and choices, as the view model has them now. */
    private void fill() {
        HouseField f = vm.selectedProperty().get();
        title.setText(f.title());
        unit.setText(vm.unit(f));
        choices.getChildren().clear();
        choices.setManaged(!f.choices().isEmpty());
        choices.setVisible(!f.choices().isEmpty());
        ToggleGroup group = new ToggleGroup();
        for (String c : f.choices()) {
            ToggleButton b = new ToggleButton(HouseField.choiceLabel(c));
            b.setId("house-choice-" + c);
            b.setMinHeight(Ui.MIN_TARGET_PX);
            b.setMinWidth(Region.USE_PREF_SIZE);
            b.setToggleGroup(group);
            b.setSelected(c.equals(vm.choice(f)));
            b.setOnAction(e -> {
                b.setSelected(true);
                vm.choose(c);
            });
            choices.getChildren().add(b);
        }
    }

    private GridPane keys(KeypadViewModel pad) {
        List<RowConstraints> rows = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            rows.add(new RowConstraints(KEY_HEIGHT, KEY_HEIGHT, KEY_HEIGHT));
        }
        return KeyGrid.of(pad, "house-", vm::enterAndAdvance, rows);
    }
}
