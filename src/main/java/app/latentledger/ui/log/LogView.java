package app.latentledger.ui.log;

import app.latentledger.ui.look.Columns;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.results.FindingsList;
import javafx.collections.ListChangeListener;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

import java.io.File;

/**
 * The log screen: pick a logger file (with another logger's column names and the airflow when the
 * visit has none), import it with a progress bar, see its cycle summary, findings and timeline.
 * Binds only; the timeline goes into {@link #timelineSlot()} when the view model has one.
 */
public final class LogView extends VBox implements Reflowing {
    /** Id of the pane the cycle timeline goes into when the chart build is merged. */
    public static final String TIMELINE_SLOT_ID = "cycle-timeline-slot";

    private final LogImportViewModel viewModel;
    private final Columns columns;
    private final StackPane timelineSlot = new StackPane();

    public LogView(LogImportViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-logs");
        TextField file = new TextField();
        file.setId("log-file");
        file.setPromptText("Logger file (CSV)");
        file.textProperty().bindBidirectional(viewModel.fileProperty());
        HBox.setHgrow(file, Priority.ALWAYS);
        file.setMinWidth(220);
        var choose = Ui.button("choose-log", "Choose…", Icons.FOLDER, () -> {
            FileChooser fc = new FileChooser();
            fc.setTitle("Logger file");
            File f = fc.showOpenDialog(getScene() == null ? null : getScene().getWindow());
            if (f != null) {
                viewModel.fileProperty().set(f.getAbsolutePath());
            }
        });
        TextField map = new TextField();
        map.setId("log-header-map");
        map.setPromptText("Other logger: RA Temp=return_db; RA RH=return_rh");
        map.textProperty().bindBidirectional(viewModel.headerMapProperty());
        TextField airflow = new TextField();
        airflow.setId("log-airflow");
        airflow.setPromptText("Airflow");
        airflow.setPrefColumnCount(6);
        airflow.setMinWidth(140);
        airflow.textProperty().bindBidirectional(viewModel.airflowProperty());
        Label airflowCaption = Ui.label("", "figure-label");
        airflowCaption.textProperty().bind(viewModel.airflowCaptionProperty());
        Label airflowWhy = Ui.wrapped("The visit's readings have no airflow: give it for water masses.", "muted");
        HBox airflowRow = new HBox(12, airflowCaption, airflow, airflowWhy);
        airflowRow.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        HBox.setHgrow(airflowWhy, Priority.ALWAYS);
        airflowRow.visibleProperty().bind(viewModel.airflowNeededProperty());
        airflowRow.managedProperty().bind(viewModel.airflowNeededProperty());
        var go = Ui.button("import-log", "Import and analyse", Icons.LOGS, viewModel::importFile);
        go.getStyleClass().add("primary");
        if (viewModel.wired()) {
            go.disableProperty().bind(viewModel.busyProperty());
        } else {
            go.setDisable(true);
        }
        javafx.scene.control.ProgressBar bar = new javafx.scene.control.ProgressBar();
        bar.setId("log-progress");
        bar.setMaxWidth(Double.MAX_VALUE);
        bar.setMinHeight(24);
        bar.progressProperty().bind(viewModel.progressProperty());
        bar.visibleProperty().bind(viewModel.busyProperty());
        bar.managedProperty().bind(viewModel.busyProperty());
        Label notes = Ui.wrapped("", "muted");
        notes.setId("log-notes");
        notes.textProperty().bind(viewModel.notesProperty());
        Label status = Ui.wrapped("", "message");
        status.setId("log-status");
        status.textProperty().bind(viewModel.statusProperty());
        GridPane summary = new GridPane();
        summary.setHgap(12);
        summary.setVgap(6);
        Runnable fill = () -> {
            summary.getChildren().clear();
            int r = 0;
            for (Row row : viewModel.summary()) {
                summary.addRow(r++, Ui.label(row.label(), "figure-label"), Ui.label(row.value(), "figure-value"),
                        Ui.label(row.unit(), "muted"));
            }
        };
        viewModel.summary().addListener((ListChangeListener<Row>) c -> fill.run());
        fill.run();
        Label kept = Ui.wrapped("", "muted");
        Runnable keptText = () -> kept.setText(viewModel.imported().isEmpty() ? "No logs kept on this visit yet."
                : "Kept on this visit: " + String.join(", ", viewModel.imported()));
        viewModel.imported().addListener((ListChangeListener<String>) c -> keptText.run());
        keptText.run();
        timelineSlot.setId(TIMELINE_SLOT_ID);
        timelineSlot.getStyleClass().add("slot-placeholder");
        app.latentledger.ui.chart.ChartSlots.timeline(timelineSlot, viewModel.timelineProperty(),
                "The cycle timeline appears here once a log is imported.");
        VBox left = Ui.panel(10, Ui.label("Import a log", "heading"), new HBox(8, file, choose), map, airflowRow, go,
                bar, status, kept, notes, Ui.label("Cycle summary", "subheading"), summary);
        VBox.setVgrow(timelineSlot, Priority.ALWAYS);
        VBox right = Ui.panel(8, new FindingsList(viewModel.findings()));
        columns = new Columns(12, Ui.scroll(left), Ui.scroll(right));
        // the timeline below keeps its height; the columns scroll in what is left
        columns.setMinHeight(0);
        VBox.setVgrow(columns, Priority.ALWAYS);
        getChildren().addAll(columns, timelineSlot);
    }

    public LogImportViewModel viewModel() {
        return viewModel;
    }

    public StackPane timelineSlot() {
        return timelineSlot;
    }

    @Override
    public void setPortrait(boolean portrait) {
        columns.setPortrait(portrait);
    }
}
