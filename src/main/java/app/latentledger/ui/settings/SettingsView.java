package app.latentledger.ui.settings;

import app.latentledger.core.settings.DisplayTheme;
import app.latentledger.core.settings.SettingGroup;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * The settings screen, grouped as a tech thinks of them: units & site, instruments, indoor target,
 * finding thresholds, display & paper. Binds only; the view model decides and saves. Holds its
 * view model strongly: bidirectional bindings keep it only weakly. Node ids: {@code setting-KEY}
 * (field or choice box), {@code message-KEY}, {@code reset-KEY}, {@code choice-KEY-WORD}, {@code status}.
 */
public final class SettingsView extends BorderPane {
    private static final String STYLESHEET = SettingsView.class.getResource("settings.css").toExternalForm();

    private final SettingsViewModel viewModel;
    private final VBox groups = new VBox(18);

    public SettingsView(SettingsViewModel viewModel) {
        this.viewModel = viewModel;
        getStyleClass().add("settings-screen");
        getStylesheets().add(STYLESHEET);

        Label title = new Label("Settings");
        title.getStyleClass().add("title");
        Label status = new Label();
        status.setId("status");
        status.getStyleClass().add("status");
        status.setWrapText(true);
        status.textProperty().bind(viewModel.statusProperty());
        VBox header = new VBox(4, title, status);
        header.setPadding(new Insets(20, 28, 12, 28));
        setTop(header);

        groups.setPadding(new Insets(4, 28, 28, 28));
        for (SettingGroup g : SettingGroup.values()) {
            groups.getChildren().add(group(g));
        }
        ScrollPane scroll = new ScrollPane(groups);
        scroll.setFitToWidth(true);
        scroll.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        scroll.setPannable(true);
        setCenter(scroll);

        viewModel.savedProperty().addListener((o, was, now) -> applyTheme(now.theme()));
        applyTheme(viewModel.savedProperty().get().theme());
    }

    public SettingsViewModel viewModel() {
        return viewModel;
    }

    /** Adds a card below the settings' own groups (Settings → Office); returns this view. */
    public SettingsView withSection(javafx.scene.Node card) {
        groups.getChildren().add(card);
        return this;
    }

    private void applyTheme(DisplayTheme theme) {
        getStyleClass().removeAll("dark", "outdoor");
        if (theme == DisplayTheme.DARK) {
            getStyleClass().add("dark");
        } else if (theme == DisplayTheme.OUTDOOR) {
            getStyleClass().add("outdoor");
        }
    }

    private VBox group(SettingGroup g) {
        Label heading = new Label(g.title());
        heading.getStyleClass().add("group-title");
        GridPane grid = new GridPane();
        grid.setHgap(16);
        grid.setVgap(6);
        ColumnConstraints text = new ColumnConstraints();
        text.setHgrow(Priority.ALWAYS);
        text.setMinWidth(240);
        ColumnConstraints field = new ColumnConstraints(150);
        // unit and Default button take what their words need at any text size
        ColumnConstraints unit = new ColumnConstraints();
        unit.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        ColumnConstraints action = new ColumnConstraints();
        action.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        grid.getColumnConstraints().addAll(text, field, unit, action);
        int row = 0;
        for (ChoiceRow c : viewModel.choices(g)) {
            row = choice(grid, row, c);
        }
        for (NumberRow n : viewModel.numbers(g)) {
            row = number(grid, row, n);
        }
        VBox card = new VBox(10, heading, grid);
        card.getStyleClass().add("card");
        card.setId("group-" + g.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        return card;
    }

    private int choice(GridPane grid, int row, ChoiceRow c) {
        Label label = new Label(capitalised(c.label()));
        label.getStyleClass().add("setting-label");
        // the choices wrap onto a second line rather than cut their words at a large text size
        javafx.scene.layout.FlowPane buttons = new javafx.scene.layout.FlowPane(0, 6);
        buttons.setId("setting-" + c.key());
        for (String word : c.choices()) {
            ToggleButton b = new ToggleButton(ChoiceRow.caption(c.key(), word));
            b.setId("choice-" + c.key() + "-" + word);
            b.setMinHeight(48);
            b.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            b.setPrefWidth(javafx.scene.layout.Region.USE_COMPUTED_SIZE);
            b.setOnAction(e -> {
                c.choose(word);
                showChoice(buttons, c);
            });
            buttons.getChildren().add(b);
        }
        // the saved word decides what looks pressed, also after a refused or failed save
        c.valueProperty().addListener((o, was, now) -> showChoice(buttons, c));
        showChoice(buttons, c);
        Label source = new Label(c.setting().source());
        source.getStyleClass().add("source");
        source.setWrapText(true);
        grid.add(label, 0, row);
        grid.add(buttons, 1, row, 3, 1);
        grid.add(source, 0, row + 1, 4, 1);
        GridPane.setMargin(source, new Insets(0, 0, 10, 0));
        return row + 2;
    }

    private static void showChoice(javafx.scene.layout.Pane buttons, ChoiceRow c) {
        for (int i = 0; i < c.choices().size(); i++) {
            ((ToggleButton) buttons.getChildren().get(i)).setSelected(c.choices().get(i).equals(c.valueProperty().get()));
        }
    }

    private int number(GridPane grid, int row, NumberRow n) {
        Label changed = new Label("•");
        changed.getStyleClass().add("changed-mark");
        changed.visibleProperty().bind(n.changedProperty());
        Label label = new Label(capitalised(n.label()));
        label.getStyleClass().add("setting-label");
        label.setWrapText(true);
        HBox name = new HBox(6, label, changed);
        name.setAlignment(Pos.CENTER_LEFT);

        TextField field = new TextField();
        field.setId("setting-" + n.key());
        field.setMinHeight(48);
        field.textProperty().bindBidirectional(n.textProperty());
        field.setOnAction(e -> n.commit());
        field.focusedProperty().addListener((o, was, focused) -> {
            if (!focused) {
                n.commit();
            }
        });
        Label unit = new Label();
        unit.textProperty().bind(n.unitProperty());
        Button reset = new Button("Default");
        reset.setId("reset-" + n.key());
        reset.setMinHeight(48);
        reset.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        reset.disableProperty().bind(n.changedProperty().not());
        reset.setOnAction(e -> n.resetToDefault());

        Label hint = new Label();
        hint.getStyleClass().add("hint");
        hint.textProperty().bind(n.hintProperty());
        Label source = new Label("Source: " + n.source());
        source.getStyleClass().add("source");
        source.setWrapText(true);
        Label message = new Label();
        message.setId("message-" + n.key());
        message.getStyleClass().add("refused");
        message.setWrapText(true);
        message.textProperty().bind(n.messageProperty());
        message.managedProperty().bind(message.textProperty().isNotEmpty());
        message.visibleProperty().bind(message.managedProperty());
        VBox notes = new VBox(2, hint, source, message);
        notes.setPadding(new Insets(0, 0, 12, 0));

        grid.add(name, 0, row);
        grid.add(field, 1, row);
        grid.add(unit, 2, row);
        grid.add(reset, 3, row);
        grid.add(notes, 0, row + 1, 4, 1);
        return row + 2;
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
