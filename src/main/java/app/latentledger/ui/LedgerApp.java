package app.latentledger.ui;

import javafx.application.Application;
import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;

/**
 * The tablet app. This first screen is a quick moist-air check from dry bulb and wet bulb; the
 * visit flow builds on it.
 */
public final class LedgerApp extends Application {
    /** Called from the plain {@code Main} so a class-path launch finds the JavaFX runtime. */
    public static void launchWith(String[] args) {
        Application.launch(LedgerApp.class, args);
    }

    @Override
    public void start(Stage stage) {
        stage.setTitle("Latent Ledger");
        stage.setScene(createScene(new QuickStateViewModel()));
        stage.show();
    }

    /** Builds the quick-state screen bound to {@code vm}; no computation happens here. */
    public static Scene createScene(QuickStateViewModel vm) {
        GridPane form = new GridPane();
        form.setHgap(16);
        form.setVgap(12);
        addField(form, 0, "Elevation (ft)", "elevation", vm.elevationProperty());
        addField(form, 1, "Dry bulb (°F)", "dry-bulb", vm.dryBulbProperty());
        addField(form, 2, "Wet bulb (°F)", "wet-bulb", vm.wetBulbProperty());
        Label result = new Label();
        result.setId("result");
        result.textProperty().bind(vm.resultProperty());
        Label problem = new Label();
        problem.setId("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(vm.problemProperty());
        VBox root = new VBox(20, new Label("Quick moist-air check"), form, result, problem);
        root.setPadding(new Insets(24));
        root.setStyle("-fx-font-size: 20px;");
        return new Scene(root, 1280, 800);
    }

    private static void addField(GridPane form, int row, String label, String id,
                                 javafx.beans.property.StringProperty value) {
        TextField field = new TextField();
        field.setId(id);
        field.setMinHeight(48);
        field.textProperty().bindBidirectional(value);
        form.addRow(row, new Label(label), field);
    }
}
