package app.latentledger.ui.paperwork;

import app.latentledger.core.records.SetLabel;
import app.latentledger.ui.bin.RecycleBinView;
import app.latentledger.ui.look.Columns;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import app.latentledger.ui.share.BundleImportPanel;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/**
 * The Record screen: the visit's paperwork and instruments; this set's label; deleting the set or
 * the visit (asked first); the recycle bin; importing a bundle. Binds only.
 */
public final class VisitRecordView extends VBox implements Reflowing {
    private final VisitRecordModel model;
    private final PaperworkView paperworkView;
    private final Columns columns;

    public VisitRecordView(VisitRecordModel model) {
        super(12);
        this.model = model;
        getStyleClass().add("screen");
        setId("screen-record");
        paperworkView = new PaperworkView(model.paperwork(), model.instruments());
        VBox.setVgrow(paperworkView, Priority.ALWAYS);

        ToggleGroup group = new ToggleGroup();
        FlowPane labels = new FlowPane(8, 8);
        for (SetLabel l : SetLabel.values()) {
            ToggleButton b = new ToggleButton(Character.toUpperCase(l.key().charAt(0)) + l.key().substring(1));
            b.setId("set-label-" + l.key());
            b.setMinHeight(Ui.MIN_TARGET_PX);
            b.setToggleGroup(group);
            b.setOnAction(e -> model.label(l));
            labels.getChildren().add(b);
        }
        model.setLabelProperty().addListener((o, was, now) -> select(group, now));
        select(group, model.setLabelProperty().get());
        Label setMessage = Ui.wrapped("", "message");
        setMessage.textProperty().bind(model.setMessageProperty());
        VBox thisSet = Ui.panel(8, Ui.label("This reading set", "heading"),
                Ui.wrapped("Label this set here so the report pairs before with after.", "figure-label"),
                labels, setMessage,
                new FlowPane(8, 8, Ui.button("delete-set", "Delete this set", Icons.FIX, model::askDeleteSet),
                        Ui.button("delete-visit", "Delete this visit", Icons.FIX, model::askDeleteVisit)));
        VBox system = systemPanel(model.systemDetails());
        RecycleBinView bin = new RecycleBinView(model.bin());
        bin.setMinHeight(360);
        BundleImportPanel importer = new BundleImportPanel(model.importer());
        columns = new Columns(12, paperworkView, Ui.scroll(new VBox(12, thisSet, system, bin, importer)));
        VBox.setVgrow(columns, Priority.ALWAYS);
        getChildren().add(columns);
    }

    private static VBox systemPanel(SystemDetailsViewModel vm) {
        FlowPane stages = app.latentledger.ui.look.StageChoice.toggles("stages-", vm.stagesProperty());
        Label message = Ui.wrapped("", "message");
        message.textProperty().bind(vm.messageProperty());
        return Ui.panel(8, Ui.label("The system as found", "heading"), stages,
                detail("system-refrigerant", "Refrigerant", "e.g. R-410A", vm.refrigerantProperty()),
                detail("system-metering", "Metering device", "e.g. TXV", vm.meteringDeviceProperty()),
                detail("system-blower-type", "Blower type", "e.g. PSC", vm.blowerTypeProperty()),
                detail("system-blower-setting", "Blower setting as found", "", vm.blowerSettingProperty()),
                detail("system-filter", "Filter", "size, type, condition", vm.filterProperty()),
                detail("system-thermostat", "Thermostat as found", "", vm.thermostatProperty()),
                Ui.button("save-system", "Save system details", Icons.NEW, vm::save), message);
    }

    /** A detail box with its name above it: a placeholder alone vanishes once the box is filled. */
    private static VBox detail(String id, String name, String example, javafx.beans.property.StringProperty p) {
        javafx.scene.control.TextField f = new javafx.scene.control.TextField();
        f.setId(id);
        f.setPromptText(example);
        f.setMinHeight(Ui.MIN_TARGET_PX);
        f.textProperty().bindBidirectional(p);
        return Ui.labelled(name, f);
    }

    private static void select(ToggleGroup group, String key) {
        group.getToggles().forEach(t -> t.setSelected(((ToggleButton) t).getId().equals("set-label-" + key)));
    }

    @Override
    public void setPortrait(boolean portrait) {
        columns.setPortrait(portrait);
    }

    public VisitRecordModel model() {
        return model;
    }
}
