package app.latentledger.ui.bin;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * The question before a deletion (or before emptying the bin), with "Yes, delete" and "No, keep
 * it"; shown only while a question is open, and then the outcome's message. Every screen that
 * deletes puts one next to its delete buttons. Binds only.
 */
public final class DeleteQuestion extends VBox {
    public DeleteQuestion(RecycleBinViewModel viewModel) {
        super(8);
        Label question = Ui.wrapped("", "message");
        question.setId("bin-question-text");
        HBox.setHgrow(question, Priority.ALWAYS);
        question.setMaxWidth(Double.MAX_VALUE);
        Button yes = Ui.button("bin-confirm", "Yes, delete", Icons.FIX, () -> {
            if (viewModel.pendingProperty().get() != null) {
                viewModel.confirmDelete();
            } else {
                viewModel.confirmEmpty();
            }
        });
        Button no = Ui.button("bin-cancel", "No, keep it", null, () -> {
            viewModel.cancelDelete();
            viewModel.cancelEmpty();
        });
        VBox ask = new VBox(8, question, new FlowPane(12, 8, yes, no));
        ask.setId("bin-question");
        ask.getStyleClass().add("panel");
        ask.visibleProperty().bind(viewModel.pendingProperty().isNotNull()
                .or(viewModel.emptyAskedProperty().isEqualTo(true)));
        ask.managedProperty().bind(ask.visibleProperty());
        question.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() ->
                viewModel.pendingProperty().get() != null ? viewModel.pendingProperty().get().question()
                        : "Empty the recycle bin? Everything in it is deleted for good.",
                viewModel.pendingProperty(), viewModel.emptyAskedProperty()));
        Label message = Ui.wrapped("", "message");
        message.setId("bin-message");
        message.textProperty().bind(viewModel.messageProperty());
        message.managedProperty().bind(message.textProperty().isNotEmpty().and(ask.visibleProperty().not()));
        message.visibleProperty().bind(message.managedProperty());
        getChildren().addAll(ask, message);
        managedProperty().bind(ask.visibleProperty().or(message.visibleProperty()));
        visibleProperty().bind(managedProperty());
    }
}
