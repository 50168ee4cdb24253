package app.latentledger.ui.paperwork;

import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.beans.property.StringProperty;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
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

    public PaperworkView(PaperworkViewModel paperwork, InstrumentsViewModel instruments) {
        super(12);
        this.paperwork = paperwork;
        this.instruments = instruments;
        getStyleClass().add("screen");
        setId("screen-paperwork");

        TextArea words = area("customer-words", "What the customer said", paperwork.customerWordsProperty());
        TextArea done = area("work-done", "What was done", paperwork.workDoneProperty());
        VBox notes = Ui.panel(8, Ui.wrapped("Notes", "heading"), Ui.labelled("Customer's words", words),
                Ui.labelled("Work done", done),
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
        // one column of name-over-box pairs: it fits the narrow side-by-side column lying down
        VBox form = new VBox(8,
                Ui.labelled("Name", field("instrument-name", instruments.nameProperty())),
                Ui.labelled("Serial", field("instrument-serial", instruments.serialProperty())),
                Ui.labelled("Calibrated (YYYY-MM-DD)", field("instrument-calibrated", instruments.calibratedProperty())),
                Ui.labelled("Stated ± dry bulb", field("instrument-acc-db", instruments.dryBulbProperty())),
                Ui.labelled("Stated ± RH, %", field("instrument-acc-rh", instruments.relativeHumidityProperty())),
                Ui.labelled("Stated ± wet bulb", field("instrument-acc-wb", instruments.wetBulbProperty())),
                Ui.labelled("Stated ± dew point", field("instrument-acc-dp", instruments.dewPointProperty())),
                Ui.labelled("Stated ± coil probe", field("instrument-acc-coil", instruments.coilProperty())),
                Ui.labelled("Stated ± airflow, %", field("instrument-acc-airflow", instruments.airflowPctProperty())));
        VBox instrumentsPanel = Ui.panel(8, Ui.wrapped("Instruments", "heading"),
                Ui.wrapped("Tick the instruments that took the readings on the pad; the report lists them with"
                        + " the set.", "figure-label"),
                list, form, whole(Ui.button("add-instrument", "Add instrument", Icons.NEW, instruments::add)),
                message(instruments.messageProperty()));

        VBox signOffs = Ui.panel(8, Ui.wrapped("Sign-off", "heading"),
                Ui.labelled("Technician", field("tech-sign-name", paperwork.technicianNameProperty())),
                Ui.labelled("Licence or certification (optional)",
                        field("tech-sign-remark", paperwork.technicianRemarkProperty())),
                bound(paperwork.technicianSignedProperty()),
                whole(Ui.button("sign-technician", "Sign as technician", Icons.CHECK, paperwork::signAsTechnician)),
                Ui.labelled("Customer", field("customer-sign-name", paperwork.customerNameProperty())),
                Ui.labelled("Remark (optional)", field("customer-sign-remark", paperwork.customerRemarkProperty())),
                bound(paperwork.customerSignedProperty()),
                whole(Ui.button("sign-customer", "Sign as customer", Icons.CHECK, paperwork::signAsCustomer)),
                message(paperwork.signMessageProperty()));

        // one column both ways: beside the Record screen's own column, two more were too narrow
        // lying down for the instrument boxes and the headings at large text
        ScrollPane all = Ui.scroll(new VBox(12, notes, instrumentsPanel, signOffs));
        VBox.setVgrow(all, Priority.ALWAYS);
        getChildren().add(all);
    }

    /** A button as wide as its column, its words wrapping (never its letters) where the column is narrow. */
    private static javafx.scene.control.Button whole(javafx.scene.control.Button b) {
        b.setWrapText(true);
        b.setMinWidth(Region.USE_COMPUTED_SIZE);
        b.setMaxWidth(Double.MAX_VALUE);
        return b;
    }

    @Override
    public void setPortrait(boolean portrait) {
        // one column either way; the Record screen places it
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
        TextField f = new TextField();
        f.setId(id);
        f.setMinHeight(Ui.MIN_TARGET_PX);
        f.setMinWidth(120);
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
