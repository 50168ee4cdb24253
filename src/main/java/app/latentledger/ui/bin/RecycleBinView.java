package app.latentledger.ui.bin;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * The recycle bin: each deleted record with its days left and a Restore button; Empty, asked
 * first. The same question bar confirms deletions made on other screens. Binds only.
 */
public final class RecycleBinView extends VBox {
    private final RecycleBinViewModel viewModel;

    public RecycleBinView(RecycleBinViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-recycle-bin");

        ListView<RecycleBinViewModel.Row> list = new ListView<>(viewModel.rows());
        list.setId("bin-list");
        list.setPlaceholder(Ui.label("Nothing deleted.", "figure-label"));
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(RecycleBinViewModel.Row row, boolean empty) {
                super.updateItem(row, empty);
                if (empty || row == null) {
                    setGraphic(null);
                    return;
                }
                Label text = Ui.wrapped(row.text());
                HBox.setHgrow(text, Priority.ALWAYS);
                text.setMaxWidth(Double.MAX_VALUE);
                Button restore = Ui.button("restore-" + row.entry().recordId(), "Restore", Icons.NEW,
                        () -> viewModel.restore(row));
                setGraphic(new HBox(12, text, restore));
            }
        });
        VBox.setVgrow(list, Priority.ALWAYS);

        getChildren().addAll(Ui.label("Recycle bin", "heading"),
                Ui.wrapped("Deleted sites, systems, visits, reading sets and logs stay here for 30 days unless the"
                        + " bin is emptied.", "figure-label"),
                new DeleteQuestion(viewModel), list,
                Ui.button("bin-empty", "Empty recycle bin", Icons.FIX, viewModel::askEmpty));
    }

    public RecycleBinViewModel viewModel() {
        return viewModel;
    }
}
