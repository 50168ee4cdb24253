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
        this(viewModel, "report", true);
    }

    /**
     * A bar whose node ids start with {@code idPrefix} ("report-open", "bundle-share-bar"), so two bars
     * can share a screen; {@code printable} false for files no printer makes sense of (a bundle).
     */
    public ShareBar(ShareViewModel viewModel, String idPrefix, boolean printable) {
        super(8);
        this.viewModel = viewModel;
        setId("report".equals(idPrefix) ? "share-bar" : idPrefix + "-share-bar");
        Button open = Ui.button(idPrefix + "-open", "Open", Icons.RESULTS, viewModel::open);
        Button print = Ui.button(idPrefix + "-print", "Print", Icons.EXPORT, viewModel::print);
        Button share = Ui.button(idPrefix + "-share", "Share", Icons.EXPORT, viewModel::share);
        show(open, viewModel.canOpenProperty());
        show(print, printable ? viewModel.canPrintProperty() : new javafx.beans.property.SimpleBooleanProperty(false));
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
        return new ShareBar(shareFor(lastFile), "report", true);
    }

    /** A bar for the bundle a screen last wrote: Open and Share where offered, never Print. */
    public static ShareBar forBundle(javafx.beans.value.ObservableValue<java.nio.file.Path> lastFile) {
        return new ShareBar(shareFor(lastFile), "bundle", false);
    }

    private static ShareViewModel shareFor(javafx.beans.value.ObservableValue<java.nio.file.Path> lastFile) {
        ShareViewModel share = new ShareViewModel(app.latentledger.handoff.HandOffs.forThisDevice(),
                app.latentledger.ui.session.Background.worker(), app.latentledger.ui.session.Background.fx());
        share.fileProperty().bind(lastFile);
        share.titleProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() ->
                lastFile.getValue() == null ? "Report" : lastFile.getValue().getFileName().toString(), lastFile));
        return share;
    }

    public ShareViewModel viewModel() {
        return viewModel;
    }
}
