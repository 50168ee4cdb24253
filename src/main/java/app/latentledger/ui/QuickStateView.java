package app.latentledger.ui;

import javafx.beans.property.StringProperty;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;

/**
 * The quick moist-air check: three fields and the computed state. Binds only; the view model does
 * the work. The view keeps its view model alive: bidirectional bindings hold it only weakly.
 */
public final class QuickStateView extends VBox {
    private final QuickStateViewModel viewModel;

    public QuickStateView(QuickStateViewModel viewModel) {
        super(20);
        this.viewModel = viewModel;
        GridPane form = new GridPane();
        form.setHgap(16);
        form.setVgap(12);
        addField(form, 0, "Elevation (ft)", "elevation", viewModel.elevationProperty());
        addField(form, 1, "Dry bulb (°F)", "dry-bulb", viewModel.dryBulbProperty());
        addField(form, 2, "Wet bulb (°F)", "wet-bulb", viewModel.wetBulbProperty());
        Label result = new Label();
        result.setId("result");
        result.textProperty().bind(viewModel.resultProperty());
        Label problem = new Label();
        problem.setId("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(viewModel.problemProperty());
        getChildren().addAll(new Label("Quick moist-air check"), form, result, problem);
        setPadding(new Insets(24));
        setStyle("-fx-font-size: 20px;");
    }

    public QuickStateViewModel viewModel() {
        return viewModel;
    }

    private static void addField(GridPane form, int row, String label, String id, StringProperty value) {
        TextField field = new TextField();
        field.setId(id);
        field.setMinHeight(48);
        field.textProperty().bindBidirectional(value);
        form.addRow(row, new Label(label), field);
    }
}
