package app.latentledger.ui.paperwork;

import app.latentledger.ui.look.Columns;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.beans.property.StringProperty;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The visit's record: the customer's words and the work done, the instruments (with a form to add
 * one and a tick for each that took the set on the pad), and the two sign-offs. Binds only; every
 * message sits under the part it is about.
 */
public final class PaperworkView extends VBox implements Reflowing {
    private final PaperworkViewModel paperwork;
    private final InstrumentsViewModel instruments;
    private final Columns columns;

    public PaperworkView(PaperworkViewModel paperwork, InstrumentsViewModel instruments) {
        super(12);
        this.paperwork = paperwork;
        this.instruments = instruments;
        getStyleClass().add("screen");
        setId("screen-paperwork");

        TextArea words = area("customer-words", "What the customer said", paperwork.customerWordsProperty());
        TextArea done = area("work-done", "What was done", paperwork.workDoneProperty());
        VBox notes = Ui.panel(8, Ui.label("Notes", "heading"), Ui.wrapped("Customer's words", "figure-label"), words,
                Ui.wrapped("Work done", "figure-label"), done,
                Ui.button("save-notes", "Save notes", Icons.NEW, paperwork::saveNotes), message(paperwork.notesMessageProperty()));

        ListView<InstrumentsViewModel.Row> list = new ListView<>(instruments.rows());
        list.setId("instrument-list");
        list.setPrefHeight(200);
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(InstrumentsViewModel.Row row, boolean empty) {
                super.updateItem(row, empty);
                if (empty || row == null) {
                    setGraphic(null);
                    setText(null);
                    return;
                }
                CheckBox used = new CheckBox(row.text());
                used.setWrapText(true);
                used.setSelected(row.usedOnSet());
                used.setMinHeight(Ui.MIN_TARGET_PX);
                used.setOnAction(e -> instruments.setUsed(row.instrument(), used.isSelected()));
                setGraphic(used);
                setText(null);
            }
        });
        GridPane form = new GridPane();
        form.setHgap(8);
        form.setVgap(8);
        int r = 0;
        form.addRow(r++, formLabel("Name"), field("instrument-name", instruments.nameProperty()));
        form.addRow(r++, formLabel("Serial"), field("instrument-serial", instruments.serialProperty()));
        form.addRow(r++, formLabel("Calibrated (YYYY-MM-DD)"),
                field("instrument-calibrated", instruments.calibratedProperty()));
        form.addRow(r++, formLabel("Stated ± dry bulb"), field("instrument-acc-db", instruments.dryBulbProperty()));
        form.addRow(r++, formLabel("Stated ± RH, %"), field("instrument-acc-rh", instruments.relativeHumidityProperty()));
        form.addRow(r++, formLabel("Stated ± wet bulb"), field("instrument-acc-wb", instruments.wetBulbProperty()));
        form.addRow(r++, formLabel("Stated ± dew point"), field("instrument-acc-dp", instruments.dewPointProperty()));
        form.addRow(r++, formLabel("Stated ± coil probe"), field("instrument-acc-coil", instruments.coilProperty()));
        form.addRow(r, formLabel("Stated ± airflow, %"), field("instrument-acc-airflow", instruments.airflowPctProperty()));
        VBox instrumentsPanel = Ui.panel(8, Ui.label("Instruments", "heading"),
                Ui.wrapped("Tick the instruments that took the readings on the pad; the report lists them with"
                        + " the set.", "figure-label"),
                list, form, Ui.button("add-instrument", "Add instrument", Icons.NEW, instruments::add),
                message(instruments.messageProperty()));

        VBox signOffs = Ui.panel(8, Ui.label("Sign-off", "heading"),
                Ui.label("Technician", "figure-label"), field("tech-sign-name", paperwork.technicianNameProperty()),
                field("tech-sign-remark", paperwork.technicianRemarkProperty(), "Licence or certification (optional)"),
                bound(paperwork.technicianSignedProperty()),
                whole(Ui.button("sign-technician", "Sign as technician", Icons.CHECK, paperwork::signAsTechnician)),
                Ui.label("Customer", "figure-label"), field("customer-sign-name", paperwork.customerNameProperty()),
                field("customer-sign-remark", paperwork.customerRemarkProperty(), "Remark (optional)"),
                bound(paperwork.customerSignedProperty()),
                whole(Ui.button("sign-customer", "Sign as customer", Icons.CHECK, paperwork::signAsCustomer)),
                message(paperwork.signMessageProperty()));

        columns = new Columns(12, Ui.scroll(new VBox(12, notes, signOffs)), Ui.scroll(instrumentsPanel));
        VBox.setVgrow(columns, Priority.ALWAYS);
        getChildren().add(columns);
    }

    /** A form label never shortened to an ellipsis: the field beside it gives way instead. */
    private static javafx.scene.control.Label formLabel(String text) {
        javafx.scene.control.Label l = Ui.label(text, "figure-label");
        l.setMinWidth(Region.USE_PREF_SIZE);
        return l;
    }

    /** A button that keeps its whole label. */
    private static javafx.scene.control.Button whole(javafx.scene.control.Button b) {
        b.setWrapText(true);
        b.setMaxWidth(Double.MAX_VALUE);
        return b;
    }

    @Override
    public void setPortrait(boolean portrait) {
        columns.setPortrait(portrait);
    }

    private static TextArea area(String id, String prompt, StringProperty p) {
        TextArea a = new TextArea();
        a.setId(id);
        a.setPromptText(prompt);
        a.setWrapText(true);
        a.setPrefRowCount(4);
        a.textProperty().bindBidirectional(p);
        return a;
    }

    private static TextField field(String id, StringProperty p) {
        return field(id, p, "");
    }

    private static TextField field(String id, StringProperty p, String prompt) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        f.setMinHeight(Ui.MIN_TARGET_PX);
        f.setMinWidth(140);
        f.textProperty().bindBidirectional(p);
        return f;
    }

    private static Label message(javafx.beans.value.ObservableValue<String> text) {
        Label l = Ui.wrapped("", "message");
        l.textProperty().bind(text);
        return l;
    }

    private static Label bound(javafx.beans.value.ObservableValue<String> text) {
        Label l = Ui.wrapped("", "figure-label");
        l.textProperty().bind(text);
        return l;
    }

    /** The view models this view binds to (kept strongly, as bindings hold them weakly). */
    public PaperworkViewModel paperwork() {
        return paperwork;
    }

    public InstrumentsViewModel instruments() {
        return instruments;
    }
}
