package app.latentledger.ui.export;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;

/**
 * The export screen: a bundle of the visit or of the whole site, the visit's PDF report and its
 * data as CSV or JSON. Binds only.
 */
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
        ReportViewModel reports = viewModel.reports();
        Button pdf = Ui.button("report-pdf", "Report (PDF)", Icons.EXPORT, reports::visitReport);
        pdf.getStyleClass().add("primary");
        Button csv = Ui.button("data-csv", "Data (CSV)", Icons.EXPORT,
                reports::csvData);
        Button json = Ui.button("data-json", "Data (JSON)", Icons.EXPORT,
                reports::jsonData);
        // not disabled while writing (the view model ignores a second tap while busy): a disabled
        // button drops its focus, which jumps to another button and can scroll the page away
        Label reportStatus = Ui.wrapped("", "message");
        reportStatus.setId("report-status");
        // takes room only when it has something to say
        reportStatus.managedProperty().bind(reportStatus.textProperty().isNotEmpty());
        reportStatus.visibleProperty().bind(reportStatus.managedProperty());
        reportStatus.textProperty().bind(reports.statusProperty());
        javafx.scene.layout.FlowPane reportButtons = new javafx.scene.layout.FlowPane(12, 12, pdf, csv, json);
        javafx.scene.layout.FlowPane bundleButtons = new javafx.scene.layout.FlowPane(12, 12, visit, site);
        // wrap only when the screen is narrower than the buttons (FlowPane's default wraps at 400 px)
        reportButtons.setPrefWrapLength(700);
        bundleButtons.setPrefWrapLength(700);
        VBox bundle = Ui.panel(12, Ui.label("Export a bundle", "heading"),
                Ui.wrapped("A bundle is one file with the visit's site, system, readings, logs and results as"
                        + " shown, checked by its own manifest. Another tablet imports it on its Record screen"
                        + " (Import a bundle); the office can import it there too.", "muted"),
                bundleButtons, status, bundleShareBar(viewModel),
                Ui.wrapped("Bundles are written to " + viewModel.folder(), "muted"));
        VBox report = Ui.panel(12, Ui.label("Report and data", "heading"),
                Ui.wrapped("The report is a PDF for the customer and the file: readings, results with their"
                        + " uncertainty, the chart, the findings in plain words and, when the visit has them,"
                        + " its before and after readings compared. The data export is the same numbers as"
                        + " CSV or JSON for a spreadsheet.", "muted"),
                reportButtons, reportStatus, shareBar(reports),
                Ui.wrapped("Reports are written to " + reports.folder(), "muted"));
        javafx.scene.control.Button record = Ui.button("open-record", "Notes, instruments, sign-off, recycle bin",
                Icons.NOTE, viewModel::openRecord);
        getChildren().add(Ui.scroll(new VBox(12, Ui.panel(8, Ui.label("The visit's record", "heading"), record),
                report, bundle)));
    }

    public ExportViewModel viewModel() {
        return viewModel;
    }

    @Override
    public void setPortrait(boolean portrait) {
        // a single column already
    }

    /** Open or share the bundle just written, as far as this device offers; shown once there is one. */
    private static app.latentledger.ui.share.ShareBar bundleShareBar(ExportViewModel viewModel) {
        var bar = app.latentledger.ui.share.ShareBar.forBundle(viewModel.lastBundleProperty());
        bar.visibleProperty().bind(viewModel.lastBundleProperty().isNotNull());
        bar.managedProperty().bind(bar.visibleProperty());
        return bar;
    }

    /** Open, print or share the file just written, as far as this device offers. */
    private app.latentledger.ui.share.ShareBar shareBar(ReportViewModel reports) {
        return app.latentledger.ui.share.ShareBar.forFile(reports.lastFileProperty());
    }
}
