package app.latentledger.ui.share;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

import java.io.File;

/**
 * Import a bundle: a file picker, then what it would add in words, then Import or Cancel. The
 * picker is the platform's; the view model reads and checks the file. Binds only.
 */
public final class BundleImportPanel extends VBox {
    private final BundleImportViewModel viewModel;

    public BundleImportPanel(BundleImportViewModel viewModel) {
        super(8);
        this.viewModel = viewModel;
        getStyleClass().add("panel");
        setId("bundle-import");
        Button choose = Ui.button("bundle-choose", "Choose a bundle…", Icons.FOLDER, this::pick);
        choose.disableProperty().bind(viewModel.busyProperty());
        Label preview = Ui.wrapped("", "figure-label");
        preview.setId("bundle-preview");
        preview.textProperty().bind(viewModel.previewProperty());
        Button confirm = Ui.button("bundle-import", "Import", Icons.NEW, viewModel::confirm);
        confirm.getStyleClass().add("primary");
        confirm.visibleProperty().bind(viewModel.canImportProperty());
        confirm.managedProperty().bind(confirm.visibleProperty());
        Button cancel = Ui.button("bundle-cancel", "Cancel", null, viewModel::cancel);
        cancel.visibleProperty().bind(viewModel.fileProperty().isNotNull());
        cancel.managedProperty().bind(cancel.visibleProperty());
        Label message = Ui.wrapped("", "message");
        message.textProperty().bind(viewModel.messageProperty());
        getChildren().addAll(Ui.label("Import a bundle", "heading"),
                Ui.wrapped("A visit or site exported from another tablet (.zip). You see what it adds before"
                        + " anything changes.", "figure-label"),
                choose, preview, new FlowPane(8, 8, confirm, cancel), message);
    }

    private void pick() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Import a bundle");
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Latent Ledger bundle (*.zip)", "*.zip"));
        File f = chooser.showOpenDialog(getScene() == null ? null : getScene().getWindow());
        if (f != null) {
            viewModel.choose(f.toPath());
        }
    }

    public BundleImportViewModel viewModel() {
        return viewModel;
    }
}
