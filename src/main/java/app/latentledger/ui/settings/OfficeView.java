package app.latentledger.ui.settings;

import app.latentledger.ui.look.Ui;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * Settings → Office, as one card of the settings screen: the office and this tablet, the server
 * address, code and device name to enrol, "Sync now", the last sync, what is waiting and what was
 * refused. Binds only. Node ids: {@code office-server}, {@code office-code}, {@code office-device},
 * {@code office-enrol}, {@code office-sync}, {@code office-status}, {@code office-last},
 * {@code office-waiting}, {@code office-refused}, {@code office-message}.
 */
public final class OfficeView extends VBox {
    private final OfficeViewModel viewModel;

    public OfficeView(OfficeViewModel viewModel) {
        super(10);
        this.viewModel = viewModel;
        getStyleClass().add("card");
        setId("group-office");

        Label heading = Ui.label("Office", "group-title");
        Label office = bound("office-status", viewModel.officeProperty().getValue());
        office.textProperty().bind(viewModel.officeProperty());

        TextField server = field("office-server", "https://office.example", 380);
        server.textProperty().bindBidirectional(viewModel.serverProperty());
        TextField code = field("office-code", "ABCD-EFGH-JKLM", 240);
        code.textProperty().bindBidirectional(viewModel.codeProperty());
        TextField device = field("office-device", "Tablet 3", 200);
        device.textProperty().bindBidirectional(viewModel.deviceNameProperty());
        Button enrol = Ui.button("office-enrol", "Enrol", null, viewModel::enrol);
        enrol.setMinWidth(120);
        enrol.disableProperty().bind(viewModel.busyProperty()
                .or(viewModel.serverProperty().isEmpty()).or(viewModel.codeProperty().isEmpty()));
        FlowPane enrolRow = new FlowPane(12, 8, labelled("Server address", server), labelled("Code", code),
                labelled("This tablet's name", device), enrol);
        enrolRow.setAlignment(Pos.BOTTOM_LEFT);

        Button sync = Ui.button("office-sync", "Sync now", null, viewModel::syncNow);
        sync.disableProperty().bind(viewModel.busyProperty().or(viewModel.enrolledProperty().not()));
        Label waiting = bound("office-waiting", "");
        waiting.textProperty().bind(viewModel.waitingProperty());
        HBox.setHgrow(waiting, Priority.ALWAYS);
        HBox syncRow = new HBox(16, sync, waiting);
        syncRow.setAlignment(Pos.CENTER_LEFT);

        Label last = bound("office-last", "");
        last.textProperty().bind(viewModel.lastSyncProperty());
        Label refused = bound("office-refused", "");
        refused.getStyleClass().add("refused");
        refused.textProperty().bind(viewModel.refusalsProperty());
        refused.managedProperty().bind(refused.textProperty().isNotEmpty());
        refused.visibleProperty().bind(refused.managedProperty());
        Label message = bound("office-message", "");
        message.textProperty().bind(viewModel.messageProperty());
        for (Label l : new Label[] {last, message}) {
            l.managedProperty().bind(l.textProperty().isNotEmpty());
            l.visibleProperty().bind(l.managedProperty());
        }
        Label note = Ui.wrapped("Records stay on this tablet and work without a network; a sync sends what changed"
                + " here and fetches what changed at the office.", "source");

        getChildren().addAll(heading, office, enrolRow, syncRow, last, refused, message, note);
        setPadding(new Insets(12, 16, 16, 16));
    }

    public OfficeViewModel viewModel() {
        return viewModel;
    }

    private static Label bound(String id, String text) {
        Label l = Ui.wrapped(text, "setting-label");
        l.setId(id);
        return l;
    }

    private static TextField field(String id, String prompt, double width) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        f.setMinHeight(48);
        // the settings sheet sizes its number fields narrow and right-aligned; words read from the left
        f.setStyle("-fx-pref-width: " + width + "px; -fx-alignment: center-left;");
        return f;
    }

    private static VBox labelled(String text, TextField field) {
        return new VBox(4, Ui.label(text, "hint"), field);
    }
}
