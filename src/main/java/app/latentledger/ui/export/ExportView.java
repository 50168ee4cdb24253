package app.latentledger.ui.export;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;

/** The export screen: a bundle of the visit or of the whole site. Binds only. */
public final class ExportView extends VBox implements Reflowing {
    private final ExportViewModel viewModel;

    public ExportView(ExportViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-export");
        Button visit = Ui.button("export-visit", "Export this visit", Icons.EXPORT, viewModel::exportVisit);
        visit.getStyleClass().add("primary");
        Button site = Ui.button("export-site", "Export the whole site", Icons.EXPORT, viewModel::exportSite);
        Label status = Ui.wrapped("", "message");
        status.setId("export-status");
        status.textProperty().bind(viewModel.statusProperty());
        getChildren().add(Ui.panel(12, Ui.label("Export a bundle", "heading"),
                Ui.wrapped("A bundle is one file with the visit's site, system, readings, logs and results as"
                        + " shown, checked by its own manifest. Another tablet or the office imports it with"
                        + " the visits command.", "muted"),
                visit, site, status, Ui.wrapped("Bundles are written to " + viewModel.folder(), "muted")));
    }

    public ExportViewModel viewModel() {
        return viewModel;
    }

    @Override
    public void setPortrait(boolean portrait) {
        // a single column already
    }
}
