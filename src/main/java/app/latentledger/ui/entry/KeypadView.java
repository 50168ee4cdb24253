package app.latentledger.ui.entry;

import app.latentledger.ui.look.Ui;
import app.latentledger.ui.session.Slot;
import javafx.beans.binding.Bindings;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import java.util.ArrayList;
import java.util.List;

/**
 * The number pad with the selected box's name, the number being typed and its unit, the choice
 * buttons of the box, and the message that says what was saved or why not.
 */
final class KeypadView extends VBox {
    /** One key's height on every box (a glove-sized 15 mm on a 10" tablet at 150 px/in). */
    static final double KEY_HEIGHT = 76;
    /** Upright, the boxes sit above the pad: every part gives up a little, the same on every box. */
    static final double KEY_HEIGHT_UPRIGHT = 56;

    private final java.util.List<Runnable> upright = new java.util.ArrayList<>();
    private final java.util.List<Runnable> flat = new java.util.ArrayList<>();

    KeypadView(EntryViewModel vm) {
        super(10);
        getStyleClass().add("panel");
        KeypadViewModel pad = vm.pad();
        Label title = Ui.wrapped("", "subheading");
        title.setId("pad-title");
        title.textProperty().bind(vm.padTitle());
        title.setMinWidth(0);
        HBox.setHgrow(title, Priority.ALWAYS);
        title.setMaxWidth(Double.MAX_VALUE);
        ToggleButton tolerance = new ToggleButton("± Tolerance");
        tolerance.setId("key-tolerance");
        tolerance.selectedProperty().bindBidirectional(vm.toleranceModeProperty());
        tolerance.disableProperty().bind(Bindings.createBooleanBinding(
                () -> !vm.selectedProperty().get().hasTolerance(), vm.selectedProperty()));
        tolerance.setMinWidth(Region.USE_PREF_SIZE);
        HBox head = new HBox(10, title, tolerance);
        head.setAlignment(Pos.CENTER_LEFT);
        fixHeight(head, 64, 52);

        Label display = Ui.label("", "pad-display");
        display.setId("pad-display");
        display.setMaxWidth(Double.MAX_VALUE);
        display.textProperty().bind(vm.padDisplay());
        Label unit = Ui.label("", "pad-unit");
        unit.setId("pad-unit");
        unit.textProperty().bind(vm.padUnit());
        unit.setMinWidth(80);
        HBox.setHgrow(display, Priority.ALWAYS);
        HBox shown = new HBox(10, display, unit);
        shown.setAlignment(Pos.CENTER_LEFT);

        HBox choices = new HBox(8);
        choices.setId("pad-choices");
        Label hint = Ui.wrapped("", "hint");
        hint.setId("pad-hint");
        Runnable fillChoices = () -> {
            choices.getChildren().clear();
            Slot s = vm.selectedProperty().get();
            hint.setText(s.hint(vm.choice(s)));
            hint.setManaged(!hint.getText().isEmpty());
            hint.setVisible(!hint.getText().isEmpty());
            javafx.scene.control.ToggleGroup group = new javafx.scene.control.ToggleGroup();
            for (String c : s.choices()) {
                ToggleButton b = new ToggleButton(Slot.choiceLabel(c));
                b.setId("choice-" + c);
                b.setSelected(c.equals(vm.padChoice(s)));
                b.setToggleGroup(group);
                b.setOnAction(e -> {
                    b.setSelected(true);
                    vm.choose(c);
                });
                choices.getChildren().add(b);
            }
        };
        vm.selectedProperty().addListener((o, a, b) -> fillChoices.run());
        vm.pendingChoiceProperty().addListener((o, a, b) -> fillChoices.run());
        // a refused choice leaves the draft as it was: redraw from the view model either way
        vm.messageProperty().addListener((o, a, b) -> fillChoices.run());
        fillChoices.run();

        Button undo = Ui.button("key-undo", "", null, vm::undo);
        undo.getStyleClass().add("undo");
        undo.textProperty().bind(vm.undoTextProperty());
        undo.visibleProperty().bind(vm.undoTextProperty().isNotEmpty());
        undo.setFocusTraversable(false);
        undo.setMinWidth(0);
        undo.setMaxWidth(220);
        undo.setWrapText(true);
        // the kinds on the left, undo on the right: one fixed row on every box, empty or not
        HBox choiceRow = new HBox(8, choices, Ui.grow(), undo);
        choiceRow.setAlignment(Pos.CENTER_LEFT);
        fixHeight(choiceRow, 56);

        Label message = Ui.wrapped("", "message");
        message.setId("pad-message");
        message.textProperty().bind(vm.messageProperty());
        message.setAlignment(Pos.TOP_LEFT);
        message.setMaxWidth(Double.MAX_VALUE);
        // the coil box's line on what its kinds can show sits above the message, in the same fixed
        // space: a long refusal or a hint never pushes or shrinks the keys
        VBox notes = new VBox(4, hint, message);
        fixHeight(notes, 112, 60);
        vm.refusedProperty().addListener((o, a, b) -> {
            message.getStyleClass().remove("refused");
            if (b) {
                message.getStyleClass().add("refused");
            }
        });

        GridPane keys = keys(vm);
        fixHeight(shown, 64);
        getChildren().addAll(head, shown, choiceRow, keys, notes);
        HardwareKeys.attach(this, vm);
    }

    private void fixHeight(Region r, double px) {
        fixHeight(r, px, px - (px > 100 ? 24 : 8));
    }

    private void fixHeight(Region r, double px, double uprightPx) {
        flat.add(() -> fix(r, px));
        upright.add(() -> fix(r, uprightPx));
        fix(r, px);
    }

    private static void fix(Region r, double px) {
        r.setMinHeight(px);
        r.setPrefHeight(px);
        r.setMaxHeight(px);
    }

    /** Fixed heights for the orientation: the keys never move while the tablet is held one way. */
    void setPortrait(boolean uprightNow) {
        (uprightNow ? upright : flat).forEach(Runnable::run);
    }

    private GridPane keys(EntryViewModel vm) {
        List<javafx.scene.layout.RowConstraints> rows = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            javafx.scene.layout.RowConstraints rc = new javafx.scene.layout.RowConstraints();
            // fixed: the same key is at the same place on every box, whatever the message says
            flat.add(() -> fixRow(rc, KEY_HEIGHT));
            upright.add(() -> fixRow(rc, KEY_HEIGHT_UPRIGHT));
            fixRow(rc, KEY_HEIGHT);
            rc.setFillHeight(true);
            rows.add(rc);
        }
        return KeyGrid.of(vm.pad(), "", vm::enterAndAdvance, rows);
    }

    private static void fixRow(javafx.scene.layout.RowConstraints rc, double px) {
        rc.setMinHeight(px);
        rc.setPrefHeight(px);
        rc.setMaxHeight(px);
    }
}
