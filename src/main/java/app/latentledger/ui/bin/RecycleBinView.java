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

        Label question = Ui.wrapped("", "message");
        Button yes = Ui.button("bin-confirm", "Yes, delete", Icons.FIX, this::confirm);
        Button no = Ui.button("bin-cancel", "No, keep it", null, this::cancel);
        HBox ask = new HBox(12, question, Ui.grow(), yes, no);
        ask.setId("bin-question");
        ask.visibleProperty().bind(viewModel.pendingProperty().isNotNull().or(viewModel.emptyAskedProperty().isEqualTo(true)));
        ask.managedProperty().bind(ask.visibleProperty());
        question.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() ->
                viewModel.pendingProperty().get() != null ? viewModel.pendingProperty().get().question()
                        : "Empty the recycle bin? Everything in it is deleted for good.",
                viewModel.pendingProperty(), viewModel.emptyAskedProperty()));

        Label message = Ui.wrapped("", "message");
        message.textProperty().bind(viewModel.messageProperty());
        getChildren().addAll(Ui.label("Recycle bin", "heading"),
                Ui.wrapped("Deleted sites, systems, visits, reading sets and logs stay here for 30 days unless the"
                        + " bin is emptied.", "figure-label"),
                ask, list, new HBox(12, Ui.button("bin-empty", "Empty recycle bin", Icons.FIX, viewModel::askEmpty),
                        message));
    }

    private void confirm() {
        if (viewModel.pendingProperty().get() != null) {
            viewModel.confirmDelete();
        } else {
            viewModel.confirmEmpty();
        }
    }

    private void cancel() {
        viewModel.cancelDelete();
        viewModel.cancelEmpty();
    }

    public RecycleBinViewModel viewModel() {
        return viewModel;
    }
}
