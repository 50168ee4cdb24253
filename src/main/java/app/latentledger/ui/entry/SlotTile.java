package app.latentledger.ui.entry;

import app.latentledger.ui.session.Slot;
import javafx.beans.binding.Bindings;
import javafx.css.PseudoClass;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/** One reading box: its title, value with unit and tolerance; a tap selects it for the pad. */
final class SlotTile extends Button {
    private static final PseudoClass SELECTED = PseudoClass.getPseudoClass("selected");
    private static final PseudoClass CONFLICT = PseudoClass.getPseudoClass("conflict");

    SlotTile(EntryViewModel vm, Slot slot) {
        setId("slot-" + slot.key());
        getStyleClass().add("slot-tile");
        Label title = new Label();
        title.getStyleClass().add("slot-title");
        Label value = new Label();
        value.getStyleClass().add("slot-value");
        value.setId("value-" + slot.key());
        Label unit = new Label();
        unit.getStyleClass().add("slot-tolerance");
        Label tolerance = new Label();
        tolerance.getStyleClass().add("slot-tolerance");
        tolerance.setId("tolerance-" + slot.key());
        title.textProperty().bind(Bindings.createStringBinding(() -> vm.tileTitle(slot), vm.valueText(slot),
                vm.standardAirflowProperty()));
        value.textProperty().bind(vm.valueText(slot));
        unit.textProperty().bind(Bindings.createStringBinding(() -> slot.symbol(vm.units(), vm.choice(slot)),
                vm.valueText(slot)));
        tolerance.textProperty().bind(vm.toleranceText(slot));
        value.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        unit.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        HBox line = new HBox(6, value, unit);
        line.setAlignment(javafx.geometry.Pos.BASELINE_LEFT);
        setGraphic(new VBox(2, title, line, tolerance));
        setMaxWidth(Double.MAX_VALUE);
        pseudoClassStateChanged(SELECTED, vm.selectedProperty().get() == slot);
        vm.selectedProperty().addListener((o, a, b) -> pseudoClassStateChanged(SELECTED, b == slot));
        // both boxes of a pair that disagree are marked, the held one and the saved one
        pseudoClassStateChanged(CONFLICT, vm.inConflict(slot));
        vm.conflictProperty().addListener((o, a, b) -> pseudoClassStateChanged(CONFLICT, vm.inConflict(slot)));
        setOnAction(e -> vm.select(slot));
    }
}
