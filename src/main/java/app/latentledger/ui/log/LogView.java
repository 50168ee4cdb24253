package app.latentledger.ui.log;

import app.latentledger.ui.log.LogImportViewModel.About;
import app.latentledger.ui.log.LogImportViewModel.KeptLog;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.results.FindingsList;
import javafx.beans.binding.Bindings;
import javafx.beans.value.ObservableValue;
import javafx.collections.FXCollections;
import javafx.collections.ListChangeListener;
import javafx.geometry.Bounds;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

import java.io.File;
import java.util.EnumMap;
import java.util.Map;

/**
 * The log screen: the visit's kept logs (show one, delete one after a question), the import form
 * (file, what each column the importer does not know by name holds, the airflow when the visit has none, the fan-only airflow,
 * the date order and the clock's zone), which closes once a log is shown, then the cycle summary,
 * the findings and the timeline. Each message sits beside the field or part it is about and is
 * kept in view; an action never moves the focus away from where the tech is. The screen is one
 * page that scrolls by its bar or by a drag. Binds only; the timeline goes into {@link #timelineSlot()} when the view model has one.
 */
public final class LogView extends VBox implements Reflowing {
    /** Id of the pane the cycle timeline goes into when the chart build is merged. */
    public static final String TIMELINE_SLOT_ID = "cycle-timeline-slot";

    private final LogImportViewModel viewModel;
    private final StackPane columns = new StackPane();
    private final StackPane timelineSlot = new StackPane();
    private final Map<About, Label> messages = new EnumMap<>(About.class);
    private final VBox left;
    private final VBox right;
    private final VBox page;
    private final ScrollPane scroll;

    public LogView(LogImportViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-logs");
        for (About a : About.values()) {
            messages.put(a, message(a));
        }

        // kept logs, with the question before a delete
        VBox kept = new VBox(8);
        kept.setId("log-kept-list");
        Runnable keptRows = () -> {
            kept.getChildren().clear();
            if (viewModel.keptLogs().isEmpty()) {
                kept.getChildren().add(Ui.wrapped("No logs kept on this visit yet.", "muted"));
            }
            for (KeptLog k : viewModel.keptLogs()) {
                kept.getChildren().add(keptRow(k));
            }
        };
        viewModel.keptLogs().addListener((ListChangeListener<KeptLog>) c -> keptRows.run());
        keptRows.run();
        Label question = Ui.wrapped("", "message");
        question.setId("log-delete-question");
        question.textProperty().bind(Bindings.createStringBinding(() -> viewModel.pendingDeleteProperty().get() == null
                ? "" : viewModel.pendingDeleteProperty().get().question(), viewModel.pendingDeleteProperty()));
        Button yes = Ui.button("log-delete-confirm", "Yes, delete", Icons.FIX, viewModel::confirmDelete);
        Button no = Ui.button("log-delete-cancel", "No, keep it", null, viewModel::cancelDelete);
        VBox ask = new VBox(8, question, new FlowPane(8, 8, yes, no));
        ask.setId("log-delete-ask");
        ask.visibleProperty().bind(viewModel.pendingDeleteProperty().isNotNull());
        ask.managedProperty().bind(ask.visibleProperty());

        // the import form, closed once a log is shown
        ToggleButton formToggle = new ToggleButton();
        formToggle.setId("log-import-toggle");
        formToggle.setGraphic(Icons.NEW.node(24));
        formToggle.setGraphicTextGap(10);
        formToggle.setMinHeight(Ui.MIN_TARGET_PX);
        formToggle.setMaxWidth(Double.MAX_VALUE);
        formToggle.setAlignment(Pos.CENTER_LEFT);
        formToggle.selectedProperty().bindBidirectional(viewModel.formOpenProperty());
        formToggle.textProperty().bind(Bindings.when(viewModel.formOpenProperty()).then("Import a log (tap to close)")
                .otherwise("Import another log"));
        VBox form = form();
        form.setId("log-import-form");
        showForm(form, formToggle, viewModel.formOpenProperty().get());
        viewModel.formOpenProperty().addListener((o, a, open) -> showForm(form, formToggle, open));

        Label notes = Ui.wrapped("", "muted");
        notes.setId("log-notes");
        notes.textProperty().bind(viewModel.notesProperty());
        notes.managedProperty().bind(notes.textProperty().isNotEmpty());
        notes.visibleProperty().bind(notes.managedProperty());

        VBox summary = summaryRows();
        timelineSlot.setId(TIMELINE_SLOT_ID);
        timelineSlot.getStyleClass().add("slot-placeholder");
        app.latentledger.ui.chart.ChartSlots.timeline(timelineSlot, viewModel.timelineProperty(),
                "The cycle timeline appears here once a log is imported.");
        left = Ui.panel(10, Ui.label("Logs on this visit", "heading"), kept, ask, messages.get(About.LOGS),
                formToggle, form, notes, Ui.label("Cycle summary", "subheading"), summary);
        left.setId("log-left");
        right = Ui.panel(8, new FindingsList(viewModel.findings()));
        right.setId("log-right");
        // one page that scrolls as a whole (by its bar or by a drag): the summary, the findings and the
        // timeline each get their natural height instead of sharing one screen's height
        columns.setId("log-columns");
        page = new VBox(12, columns, timelineSlot);
        scroll = new ScrollPane(page);
        scroll.setId("log-scroll");
        scroll.setFitToWidth(true);
        scroll.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        scroll.setPannable(true);
        VBox.setVgrow(scroll, Priority.ALWAYS);
        setPortrait(false);
        getChildren().add(scroll);
        // a drag on the timeline pans the timeline, not the page
        addEventFilter(javafx.scene.input.MouseEvent.MOUSE_PRESSED, e ->
                scroll.setPannable(!(e.getTarget() instanceof Node n && isInside(n, timelineSlot))));
        addEventHandler(javafx.scene.input.MouseEvent.MOUSE_RELEASED, e -> scroll.setPannable(true));
        // a new message stays in view beside its field, without moving what is already in view
        viewModel.statusProperty().addListener((o, a, b) -> keepInView(messages.get(viewModel.aboutProperty().get())));
    }

    private VBox form() {
        TextField file = new TextField();
        file.setId("log-file");
        file.setPromptText("Logger file (CSV)");
        file.textProperty().bindBidirectional(viewModel.fileProperty());
        HBox.setHgrow(file, Priority.ALWAYS);
        file.setMinWidth(160);
        var choose = Ui.button("choose-log", "Choose…", Icons.FOLDER, () -> {
            FileChooser fc = new FileChooser();
            fc.setTitle("Logger file");
            File f = fc.showOpenDialog(getScene() == null ? null : getScene().getWindow());
            if (f != null) {
                viewModel.fileProperty().set(f.getAbsolutePath());
            }
        });
        choose.setMinWidth(Region.USE_PREF_SIZE);
        VBox picker = columnPicker();
        TextField airflow = field("log-airflow", "Airflow", viewModel.airflowProperty());
        Label airflowCaption = Ui.wrapped("", "figure-label");
        airflowCaption.textProperty().bind(viewModel.airflowCaptionProperty());
        VBox airflowBox = new VBox(4, airflowCaption, airflow,
                Ui.wrapped("The visit's readings have no airflow: give it for water masses.", "muted"),
                messages.get(About.AIRFLOW));
        airflowBox.visibleProperty().bind(viewModel.airflowNeededProperty());
        airflowBox.managedProperty().bind(viewModel.airflowNeededProperty());
        TextField fan = field("log-fan-airflow", "Same as during runs", viewModel.fanAirflowProperty());
        Label fanCaption = Ui.wrapped("", "figure-label");
        fanCaption.textProperty().bind(Bindings.createStringBinding(() -> "Fan-only airflow (blower alone), "
                + viewModel.airflowCaptionProperty().get().replaceFirst("^Airflow, ", ""), viewModel.airflowCaptionProperty()));
        VBox fanBox = new VBox(4, fanCaption, fan, Ui.wrapped("A continuous-fan speed is often lower than the cooling"
                + " speed; leave empty when the blower runs at one speed.", "muted"), messages.get(About.FAN_AIRFLOW));

        ToggleGroup orders = new ToggleGroup();
        FlowPane orderButtons = new FlowPane(8, 8);
        orderButtons.setId("log-date-order");
        for (Map.Entry<String, String> e : LogImportViewModel.DATE_ORDERS) {
            ToggleButton b = new ToggleButton(e.getValue());
            b.setId("log-date-order-" + (e.getKey().isEmpty() ? "auto" : e.getKey()));
            b.setToggleGroup(orders);
            b.setUserData(e.getKey());
            b.setMinHeight(Ui.MIN_TARGET_PX);
            b.setMinWidth(Region.USE_PREF_SIZE);
            orderButtons.getChildren().add(b);
        }
        Runnable pickOrder = () -> orders.getToggles().forEach(t -> t.setSelected(
                t.getUserData().equals(viewModel.dateOrderProperty().get() == null ? "" : viewModel.dateOrderProperty().get())));
        pickOrder.run();
        viewModel.dateOrderProperty().addListener((o, a, b) -> pickOrder.run());
        orders.selectedToggleProperty().addListener((o, a, b) -> {
            if (b == null) {
                pickOrder.run(); // one order is always chosen
            } else {
                viewModel.dateOrderProperty().set((String) b.getUserData());
            }
        });
        VBox orderBox = new VBox(4, Ui.wrapped("Dates like 7/8/2026 are read as", "figure-label"), orderButtons,
                messages.get(About.DATE_ORDER));

        TextField zone = field("log-time-zone", "", viewModel.timeZoneProperty());
        zone.promptTextProperty().bind(viewModel.timeZonePromptProperty());
        VBox zoneBox = new VBox(4, Ui.wrapped("Time zone of clock times written without one", "figure-label"), zone,
                Ui.wrapped("A zone such as America/Chicago or an offset such as -05:00; the zone used is kept with"
                        + " the log.", "muted"), messages.get(About.TIME_ZONE));

        Button go = Ui.button("import-log", "Import and analyse", Icons.LOGS, viewModel::importFile);
        go.getStyleClass().add("primary");
        // never disabled while busy: a disabled button gives the focus away (importFile ignores a second tap)
        go.setDisable(!viewModel.wired());
        ProgressBar bar = new ProgressBar();
        bar.setId("log-progress");
        bar.setMaxWidth(Double.MAX_VALUE);
        bar.setMinHeight(24);
        bar.progressProperty().bind(viewModel.progressProperty());
        bar.visibleProperty().bind(viewModel.busyProperty());
        bar.managedProperty().bind(viewModel.busyProperty());
        return new VBox(10, new HBox(8, file, choose), picker, airflowBox,
                fanBox, orderBox, zoneBox, go, bar, messages.get(About.IMPORT));
    }

    /**
     * One drop-down per column the importer does not know by name, under the column's header, with
     * what it may hold in words; the columns it knows are named in one line above them.
     */
    private VBox columnPicker() {
        VBox rows = new VBox(8);
        rows.setId("log-column-picks");
        ColumnPicks cols = viewModel.columns();
        Runnable fill = () -> {
            rows.getChildren().clear();
            int i = 0;
            for (ColumnPicks.Pick p : cols.picks()) {
                Label header = Ui.wrapped("Column '" + p.header() + "' holds", "figure-label");
                ComboBox<LogField> choice = new ComboBox<>(FXCollections.observableArrayList(LogField.choices()));
                choice.setId("log-column-pick-" + i++);
                choice.setUserData(p.header());
                choice.valueProperty().bindBidirectional(p.fieldProperty());
                choice.setMinHeight(Ui.MIN_TARGET_PX);
                choice.setMaxWidth(Double.MAX_VALUE);
                choice.setVisibleRowCount(8);
                rows.getChildren().add(new VBox(4, header, choice));
            }
        };
        cols.picks().addListener((ListChangeListener<ColumnPicks.Pick>) c -> fill.run());
        fill.run();
        Label ask = Ui.wrapped("Some columns of this file have names the app does not know: say what each one"
                + " holds, or leave it Not used.", "muted");
        Label known = Ui.wrapped("", "muted");
        known.setId("log-columns-known");
        known.textProperty().bind(cols.knownProperty());
        VBox picks = new VBox(8, ask, rows);
        picks.visibleProperty().bind(Bindings.isNotEmpty(cols.picks()));
        picks.managedProperty().bind(picks.visibleProperty());
        known.visibleProperty().bind(known.textProperty().isNotEmpty());
        known.managedProperty().bind(known.visibleProperty());
        VBox box = new VBox(6, known, picks, messages.get(About.COLUMNS));
        box.setId("log-columns");
        return box;
    }

    private static TextField field(String id, String prompt, javafx.beans.property.StringProperty p) {
        TextField t = new TextField();
        t.setId(id);
        t.setPromptText(prompt);
        t.textProperty().bindBidirectional(p);
        t.setMinHeight(Ui.MIN_TARGET_PX);
        t.setMinWidth(140);
        return t;
    }

    /** The message beside one field: shown only while the current message is about it. */
    private Label message(About about) {
        Label l = Ui.wrapped("", "message");
        l.setId("log-message-" + about.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        ObservableValue<String> text = Bindings.createStringBinding(() -> viewModel.aboutProperty().get() == about
                ? viewModel.statusProperty().get() : "", viewModel.aboutProperty(), viewModel.statusProperty());
        l.textProperty().bind(text);
        l.managedProperty().bind(l.textProperty().isNotEmpty());
        l.visibleProperty().bind(l.managedProperty());
        l.textProperty().addListener((o, a, b) -> {
            boolean refused = b.startsWith("Not ") || b.contains("cannot");
            l.getStyleClass().remove("refused");
            if (refused) {
                l.getStyleClass().add("refused");
            }
        });
        return l;
    }

    /**
     * One kept log: its name and when it was kept over the whole width (a file name has no spaces to
     * wrap at, so beside the buttons it was cut mid-word with large text), the buttons under them.
     */
    private Node keptRow(KeptLog k) {
        Label name = Ui.wrapped(k.name(), "figure-value");
        Label when = Ui.wrapped(k.when() + (k.shown() ? " · shown below" : ""), "muted");
        Button view = Ui.button("log-view-" + k.id(), k.shown() ? "Shown" : "Show", Icons.RESULTS, () -> viewModel.view(k));
        view.setDisable(k.shown());
        view.setMinWidth(Region.USE_PREF_SIZE);
        Button delete = Ui.button("log-delete-" + k.id(), "Delete", Icons.FIX, () -> viewModel.askDelete(k));
        delete.setMinWidth(Region.USE_PREF_SIZE);
        FlowPane buttons = new FlowPane(8, 8, view, delete);
        buttons.setAlignment(Pos.CENTER_LEFT);
        VBox row = new VBox(6, new VBox(2, name, when), buttons);
        row.setMinWidth(0);
        row.getStyleClass().add("kept-log");
        if (k.shown()) {
            row.getStyleClass().add("shown");
        }
        row.setId("log-kept-" + k.id());
        return row;
    }

    /**
     * The cycle summary, one row per figure: the words take what is left and wrap between words; the
     * value with its unit keeps its whole width, so neither is ever cut.
     */
    private VBox summaryRows() {
        VBox summary = new VBox(6);
        summary.setId("log-summary");
        Runnable fill = () -> {
            summary.getChildren().clear();
            for (Row row : viewModel.summary()) {
                Label words = Ui.wrapped(row.label(), "figure-label");
                words.setMinWidth(0);
                words.setMaxWidth(Double.MAX_VALUE);
                HBox.setHgrow(words, Priority.ALWAYS);
                Label value = Ui.wrapped(row.unit().isEmpty() ? row.value() : row.value() + " " + row.unit(),
                        "figure-value");
                // a number and its unit never wrap; a phrase ("not measurable (…)") wraps between words
                value.setMinWidth(value.getText().length() <= 16 ? Region.USE_PREF_SIZE : 160);
                value.setMaxWidth(Region.USE_PREF_SIZE);
                HBox line = new HBox(12, words, value);
                line.setAlignment(Pos.BASELINE_LEFT);
                line.setId("log-summary-" + row.key());
                summary.getChildren().add(line);
            }
        };
        viewModel.summary().addListener((ListChangeListener<Row>) c -> fill.run());
        fill.run();
        return summary;
    }

    /**
     * Opens or closes the form. Before it closes, the focus moves to the toggle that reopens it if it
     * was inside the form, so closing never sends the focus (and the view) elsewhere on the screen.
     */
    private void showForm(VBox form, ToggleButton toggle, boolean open) {
        if (!open && getScene() != null && getScene().getFocusOwner() != null && isInside(getScene().getFocusOwner(), form)) {
            toggle.requestFocus();
        }
        form.setVisible(open);
        form.setManaged(open);
    }

    private static boolean isInside(Node n, Node parent) {
        for (Node p = n; p != null; p = p.getParent()) {
            if (p == parent) {
                return true;
            }
        }
        return false;
    }

    /**
     * Scrolls the left column by the least amount that brings the message into view, after the layout
     * has settled; a message already in view moves nothing.
     */
    private void keepInView(Label message) {
        if (message == null) {
            return;
        }
        javafx.application.Platform.runLater(() -> {
            scroll.layout();
            Node content = scroll.getContent();
            Bounds viewport = scroll.getViewportBounds();
            double contentH = content.getLayoutBounds().getHeight();
            double extra = contentH - viewport.getHeight();
            if (extra <= 0 || !message.isVisible()) {
                return;
            }
            Bounds m = content.sceneToLocal(message.localToScene(message.getLayoutBounds()));
            double top = scroll.getVvalue() * extra;
            double bottom = top + viewport.getHeight();
            if (m.getMinY() < top) {
                scroll.setVvalue(Math.max(0, m.getMinY()) / extra);
            } else if (m.getMaxY() > bottom) {
                scroll.setVvalue(Math.min(extra, m.getMaxY() - viewport.getHeight()) / extra);
            }
        });
    }

    public LogImportViewModel viewModel() {
        return viewModel;
    }

    public StackPane timelineSlot() {
        return timelineSlot;
    }

    /** Side by side in landscape (equal shares), the findings under the summary upright. */
    @Override
    public void setPortrait(boolean portrait) {
        javafx.scene.layout.Pane box = portrait ? new VBox(12) : new HBox(12);
        for (VBox part : new VBox[] {left, right}) {
            part.setPrefWidth(portrait ? Region.USE_COMPUTED_SIZE : 10);
            part.setMinWidth(0);
            HBox.setHgrow(part, Priority.ALWAYS);
            box.getChildren().add(part);
        }
        columns.getChildren().setAll(box);
    }
}
