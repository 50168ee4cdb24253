package app.latentledger.ui.share;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.VBox;

/** Open, Print, Share for the file just written; only the buttons this device offers show. Binds only. */
public final class ShareBar extends VBox {
    private final ShareViewModel viewModel;

    public ShareBar(ShareViewModel viewModel) {
        super(8);
        this.viewModel = viewModel;
        setId("share-bar");
        Button open = Ui.button("report-open", "Open", Icons.RESULTS, viewModel::open);
        Button print = Ui.button("report-print", "Print", Icons.EXPORT, viewModel::print);
        Button share = Ui.button("report-share", "Share", Icons.EXPORT, viewModel::share);
        show(open, viewModel.canOpenProperty());
        show(print, viewModel.canPrintProperty());
        show(share, viewModel.canShareProperty());
        Label message = Ui.wrapped("", "message");
        message.textProperty().bind(viewModel.messageProperty());
        getChildren().addAll(new FlowPane(8, 8, open, print, share), message);
    }

    private static void show(Button b, javafx.beans.value.ObservableBooleanValue can) {
        b.visibleProperty().bind(can);
        b.managedProperty().bind(can);
    }

    /** A bar for the file a screen last wrote ({@code null} until then), offering what this device can do. */
    public static ShareBar forFile(javafx.beans.value.ObservableValue<java.nio.file.Path> lastFile) {
        ShareViewModel share = new ShareViewModel(app.latentledger.handoff.HandOffs.forThisDevice(),
                app.latentledger.ui.session.Background.worker(), app.latentledger.ui.session.Background.fx());
        share.fileProperty().bind(lastFile);
        share.titleProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() ->
                lastFile.getValue() == null ? "Report" : lastFile.getValue().getFileName().toString(), lastFile));
        return new ShareBar(share);
    }

    public ShareViewModel viewModel() {
        return viewModel;
    }
}
