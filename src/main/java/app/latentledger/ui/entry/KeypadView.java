package app.latentledger.ui.entry;

import app.latentledger.ui.look.Ui;
import app.latentledger.ui.session.Slot;
import javafx.beans.binding.Bindings;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * The number pad with the selected box's name, the number being typed and its unit, the choice
 * buttons of the box, and the message that says what was saved or why not.
 */
final class KeypadView extends VBox {
    KeypadView(EntryViewModel vm) {
        super(10);
        getStyleClass().add("panel");
        KeypadViewModel pad = vm.pad();
        Label title = Ui.label("", "subheading");
        title.setId("pad-title");
        title.textProperty().bind(vm.padTitle());
        ToggleButton tolerance = new ToggleButton("± Tolerance");
        tolerance.setId("key-tolerance");
        tolerance.selectedProperty().bindBidirectional(vm.toleranceModeProperty());
        tolerance.disableProperty().bind(Bindings.createBooleanBinding(
                () -> !vm.selectedProperty().get().hasTolerance(), vm.selectedProperty()));
        HBox head = new HBox(10, title, Ui.grow(), tolerance);
        head.setAlignment(Pos.CENTER_LEFT);

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
        Runnable fillChoices = () -> {
            choices.getChildren().clear();
            Slot s = vm.selectedProperty().get();
            javafx.scene.control.ToggleGroup group = new javafx.scene.control.ToggleGroup();
            for (String c : s.choices()) {
                ToggleButton b = new ToggleButton(Slot.choiceLabel(c));
                b.setId("choice-" + c);
                b.setSelected(c.equals(vm.choice(s)));
                b.setToggleGroup(group);
                b.setOnAction(e -> {
                    b.setSelected(true);
                    vm.choose(c);
                });
                choices.getChildren().add(b);
            }
        };
        vm.selectedProperty().addListener((o, a, b) -> fillChoices.run());
        // a refused choice leaves the draft as it was: redraw from the view model either way
        vm.messageProperty().addListener((o, a, b) -> fillChoices.run());
        fillChoices.run();

        Label message = Ui.wrapped("", "message");
        message.setId("pad-message");
        message.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        message.textProperty().bind(vm.messageProperty());
        vm.refusedProperty().addListener((o, a, b) -> {
            message.getStyleClass().remove("refused");
            if (b) {
                message.getStyleClass().add("refused");
            }
        });

        GridPane keys = keys(vm);
        VBox.setVgrow(keys, Priority.ALWAYS);
        getChildren().addAll(head, shown, choices, keys, message);
    }

    private static GridPane keys(EntryViewModel vm) {
        KeypadViewModel pad = vm.pad();
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(8);
        for (int i = 0; i < 4; i++) {
            ColumnConstraints c = new ColumnConstraints();
            c.setPercentWidth(25);
            g.getColumnConstraints().add(c);
        }
        int[][] digits = {{7, 8, 9}, {4, 5, 6}, {1, 2, 3}};
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                int d = digits[r][c];
                g.add(key("key-" + d, String.valueOf(d), () -> pad.digit(d)), c, r);
            }
        }
        g.add(key("key-back", "⌫", pad::backspace), 3, 0);
        g.add(key("key-clear", "C", pad::clear), 3, 1);
        g.add(key("key-sign", "±", pad::sign), 0, 3);
        g.add(key("key-0", "0", () -> pad.digit(0)), 1, 3);
        g.add(key("key-point", ".", pad::point), 2, 3);
        Button enter = key("key-enter", "Enter", vm::enterAndAdvance);
        enter.getStyleClass().add("enter");
        g.getRowConstraints().clear();
        for (int i = 0; i < 4; i++) {
            javafx.scene.layout.RowConstraints rc = new javafx.scene.layout.RowConstraints();
            rc.setVgrow(Priority.ALWAYS);
            rc.setFillHeight(true);
            rc.setMaxHeight(96);
            g.getRowConstraints().add(rc);
        }
        g.getChildren().forEach(n -> ((Button) n).setMaxHeight(Double.MAX_VALUE));
        enter.setMaxHeight(Double.MAX_VALUE);
        g.add(enter, 3, 2, 1, 2);
        return g;
    }

    private static Button key(String id, String text, Runnable action) {
        Button b = Ui.button(id, text, null, action);
        b.getStyleClass().add("key");
        b.setMaxWidth(Double.MAX_VALUE);
        b.setFocusTraversable(false);
        return b;
    }
}
