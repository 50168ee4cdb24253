package app.latentledger.ui.compare;

import app.latentledger.core.records.ReadingSet;
import app.latentledger.ui.look.NamedRows;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.collections.ListChangeListener;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.layout.VBox;

/** The compare screen: pick an earlier reading set, see before, after and the change. Binds only. */
public final class CompareView extends VBox implements Reflowing {
    /** Id of the pane the before/after psychrometric chart goes into (after the first frame). */
    public static final String CHART_SLOT_ID = "compare-chart-slot";

    /** A change longer than this many characters is words, not a number ("not measurable: …"). */
    private static final int WORDS = 14;
    /** The width such words wrap in, px: about three numbers' worth (common practice, no source). */
    private static final double WORDS_WIDTH = 190;

    private final CompareViewModel viewModel;
    private final javafx.scene.layout.StackPane chartSlot = new javafx.scene.layout.StackPane();

    public CompareView(CompareViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-compare");
        ComboBox<ReadingSet> pick = new ComboBox<>(viewModel.earlier());
        pick.setId("compare-pick");
        // as wide as its longest entry needs at the text size in use
        pick.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        pick.setCellFactory(v -> cell());
        pick.setButtonCell(cell());
        pick.valueProperty().bindBidirectional(viewModel.chosenProperty());
        Label verdicts = Ui.label("", "subheading");
        verdicts.setId("compare-verdicts");
        verdicts.textProperty().bind(viewModel.verdictsProperty());
        Label status = Ui.wrapped("", "muted");
        status.setId("compare-status");
        status.textProperty().bind(viewModel.statusProperty());
        // a figure's name stands over its numbers where the five columns do not fit (upright, large text)
        NamedRows table = new NamedRows(4, 24, 6);
        table.setId("compare-table");
        Runnable fill = () -> {
            table.clearRows();
            Label[] heads = {Ui.label("Figure", "table-head"), Ui.label("Before", "table-head"),
                    Ui.label("After", "table-head"), Ui.label("Change", "table-head"), Ui.label("", "table-head")};
            for (Label h : heads) {
                h.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            }
            table.addHeader(heads[0], heads[1], heads[2], heads[3], heads[4]);
            for (CompareRow row : viewModel.rows()) {
                Label after = Ui.label(row.after(), "figure-value");
                after.setId("after-" + row.key());
                Label before = Ui.label(row.before(), "figure-value");
                before.setId("before-" + row.key());
                // a change said in words (a ratio withheld on one side, with its reason) wraps in a
                // column of its own width instead of pushing the numbers off the table
                boolean words = row.change().length() > WORDS;
                Label change = words ? Ui.wrapped(row.change(), "figure-value") : Ui.label(row.change(), "figure-value");
                change.setId("change-" + row.key());
                if (words) {
                    change.setPrefWidth(WORDS_WIDTH);
                }
                Label unit = Ui.label(row.unit(), "muted");
                // numbers keep every digit at any text size; the figure's name wraps instead
                for (Label l : words ? new Label[] {before, after, unit} : new Label[] {before, after, change, unit}) {
                    l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
                }
                table.addRow(NamedRows.name(row.label(), "figure-label"), before, after, change, unit);
            }
        };
        viewModel.rows().addListener((ListChangeListener<CompareRow>) c -> fill.run());
        fill.run();
        var report = Ui.button("before-after-report", "Before/after report", app.latentledger.ui.look.Icons.EXPORT,
                viewModel::beforeAfterReport);
        // not disabled while writing (a second tap is ignored): a disabled button drops its focus, and the
        // focus moving on to the chart's buttons scrolled the page away from the report's own message
        report.disableProperty().bind(viewModel.chosenProperty().isNull());
        Label reportStatus = Ui.wrapped("", "message");
        reportStatus.setId("compare-report-status");
        // takes room only when it has something to say
        reportStatus.managedProperty().bind(reportStatus.textProperty().isNotEmpty());
        reportStatus.visibleProperty().bind(reportStatus.managedProperty());
        reportStatus.textProperty().bind(viewModel.reports().statusProperty());
        var share = app.latentledger.ui.share.ShareBar.forFile(viewModel.reports().lastFileProperty());
        share.visibleProperty().bind(viewModel.reports().lastFileProperty().isNotNull());
        share.managedProperty().bind(share.visibleProperty());
        Label margins = Ui.wrapped("", "muted");
        margins.setId("compare-margins");
        margins.textProperty().bind(viewModel.marginNoteProperty());
        margins.managedProperty().bind(margins.textProperty().isNotEmpty());
        margins.visibleProperty().bind(margins.managedProperty());
        chartSlot.setId(CHART_SLOT_ID);
        chartSlot.getStyleClass().add("slot-placeholder");
        chartSlot.getChildren().add(Ui.wrapped("Drawing the before/after chart…", "muted"));
        VBox panel = Ui.panel(10, Ui.wrapped("Compare with an earlier reading set", "heading"),
                Ui.label("Earlier reading set of this system", "figure-label"), pick, verdicts, status, margins,
                report, reportStatus, share, table, chartSlot);
        getChildren().add(Ui.scroll(panel));
    }

    public CompareViewModel viewModel() {
        return viewModel;
    }

    /** The pane the before/after chart goes into. */
    public javafx.scene.layout.StackPane chartSlot() {
        return chartSlot;
    }

    @Override
    public void setPortrait(boolean portrait) {
        // one table reads the same both ways; the scroll pane takes up the extra height
    }

    private static ListCell<ReadingSet> cell() {
        return new ListCell<>() {
            @Override
            protected void updateItem(ReadingSet item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? null : CompareViewModel.describe(item));
            }
        };
    }
}
