package app.latentledger.ui.log;

import app.latentledger.ui.look.Columns;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.results.FindingsList;
import app.latentledger.ui.results.Row;
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

/** The log screen: pick a logger file, import it, see its cycle summary and findings. Binds only. */
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
        var go = Ui.button("import-log", "Import and analyse", Icons.LOGS, viewModel::importFile);
        go.getStyleClass().add("primary");
        go.disableProperty().set(!viewModel.wired());
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
        timelineSlot.getChildren().add(Ui.wrapped("Cycle timeline: arrives with the chart build.", "muted"));
        VBox left = Ui.panel(10, Ui.label("Import a log", "heading"), new HBox(8, file, choose), go, status, kept,
                Ui.label("Cycle summary", "subheading"), summary, timelineSlot);
        VBox right = Ui.panel(8, new FindingsList(viewModel.findings()));
        columns = new Columns(12, Ui.scroll(left), Ui.scroll(right));
        VBox.setVgrow(columns, Priority.ALWAYS);
        getChildren().add(columns);
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
