package app.latentledger.ui.job;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.ui.look.Columns;
import app.latentledger.ui.look.Icons;
import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.look.Ui;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

import java.time.format.DateTimeFormatter;
import java.util.function.Function;

/** The job screen: site, system, and the visit to start or go back to. Binds only. */
public final class JobView extends VBox implements Reflowing {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");
    private final JobViewModel viewModel;
    private final Columns columns;

    public JobView(JobViewModel viewModel) {
        super(12);
        this.viewModel = viewModel;
        getStyleClass().add("screen");
        setId("screen-job");

        ListView<Site> sites = list("site-list", viewModel.sites(), s -> s.name() + "\n" + s.address());
        bindSelection(sites, viewModel.siteProperty());
        TextField siteName = field("new-site-name", "New site name", viewModel.newSiteNameProperty());
        TextField siteAddress = field("new-site-address", "Address", viewModel.newSiteAddressProperty());
        TextField siteElevation = field("new-site-elevation", "Elevation", viewModel.newSiteElevationFtProperty());
        javafx.scene.control.Label elevationCaption = Ui.label("", "figure-label");
        elevationCaption.textProperty().bind(viewModel.elevationCaptionProperty());
        // the time zone a logger's clock times without an offset are read in: picked, never typed by heart
        javafx.scene.control.ComboBox<SiteZones.Choice> siteZone = new javafx.scene.control.ComboBox<>(
                viewModel.zoneChoices());
        siteZone.setId("new-site-zone");
        siteZone.setMaxWidth(Double.MAX_VALUE);
        // a long name ("Mountain, no daylight saving (Arizona) · America/Phoenix") wraps, never cut
        siteZone.setButtonCell(zoneCell());
        siteZone.setCellFactory(v -> zoneCell());
        siteZone.valueProperty().bindBidirectional(viewModel.newSiteZoneProperty());
        TextField zoneSearch = field("new-site-zone-search", "Search all zones, e.g. Regina",
                viewModel.zoneSearchProperty());
        javafx.scene.control.Button addSite = Ui.button("add-site", "Add site", Icons.NEW, viewModel::addSite);
        addSite.textProperty().bind(javafx.beans.binding.Bindings.when(viewModel.editingSiteProperty().isNull())
                .then("Add site").otherwise("Save site"));
        javafx.scene.control.Button cancelEdit = Ui.button("cancel-site-edit", "Cancel", null, viewModel::cancelEdit);
        cancelEdit.visibleProperty().bind(viewModel.editingSiteProperty().isNotNull());
        cancelEdit.managedProperty().bind(cancelEdit.visibleProperty());
        Label siteStatus = Ui.wrapped("", "message");
        siteStatus.setId("site-status");
        siteStatus.textProperty().bind(viewModel.siteStatusProperty());
        Ui.refusedWhen(siteStatus, viewModel.siteRefusedProperty());
        VBox siteCol = Ui.panel(8, Ui.wrapped("1  Site", "heading"), sites,
                new FlowPane(8, 8, Ui.button("edit-site", "Correct site", null, viewModel::editSite),
                        Ui.button("delete-site", "Delete site", Icons.FIX, viewModel::askDeleteSite)),
                siteName, siteAddress, elevationCaption, siteElevation, Ui.wrapped("Time zone", "figure-label"),
                siteZone, zoneSearch, new FlowPane(8, 8, addSite, cancelEdit),
                siteStatus);

        ListView<HvacSystem> systems = list("system-list", viewModel.systems(), viewModel::describe);
        bindSelection(systems, viewModel.systemProperty());
        TextField sysLabel = field("new-system-label", "New system name", viewModel.newSystemLabelProperty());
        TextField sysTons = field("new-system-tons", "Nominal tons", viewModel.newSystemTonsProperty());
        Label systemStatus = Ui.wrapped("", "message");
        systemStatus.setId("system-status");
        systemStatus.textProperty().bind(viewModel.systemStatusProperty());
        Ui.refusedWhen(systemStatus, viewModel.systemRefusedProperty());
        Label more = Ui.wrapped("Refrigerant, metering device, blower and filter go on the Record screen"
                + " (Export → Notes, instruments, sign-off).", "muted");
        more.setId("new-system-more");
        VBox systemCol = Ui.panel(8, Ui.wrapped("2  System", "heading"), systems,
                Ui.button("delete-system", "Delete system", Icons.FIX, viewModel::askDeleteSystem), sysLabel,
                Ui.wrapped("Nominal size, tons", "figure-label"), sysTons, Ui.wrapped("Staging", "figure-label"),
                app.latentledger.ui.look.StageChoice.toggles("new-system-stages-", viewModel.newSystemStagesProperty()),
                more, Ui.button("add-system", "Add system", Icons.NEW, viewModel::addSystem), systemStatus);

        FlowPane purposes = new FlowPane(8, 8);
        ToggleGroup group = new ToggleGroup();
        for (VisitPurpose p : VisitPurpose.values()) {
            ToggleButton b = new ToggleButton(JobViewModel.purposeWord(p));
            b.setId("purpose-" + p.key());
            b.setToggleGroup(group);
            b.setSelected(p == viewModel.purposeProperty().get());
            b.setOnAction(e -> {
                b.setSelected(true);
                viewModel.purposeProperty().set(p);
            });
            purposes.getChildren().add(b);
        }
        TextField tech = field("technician", "Technician", viewModel.technicianProperty());
        ListView<Visit> visits = new ListView<>(viewModel.visits());
        visits.setId("visit-list");
        visits.setPrefHeight(240);
        visits.setMinHeight(140);
        VBox.setVgrow(visits, Priority.ALWAYS);
        visits.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(Visit item, boolean empty) {
                super.updateItem(item, empty);
                setText(null);
                if (empty || item == null) {
                    setGraphic(null);
                    return;
                }
                Label text = Ui.wrapped(item.startedAt().format(WHEN) + " · " + JobViewModel.purposeWord(item.purpose())
                        + "\n" + item.technician());
                javafx.scene.layout.HBox.setHgrow(text, Priority.ALWAYS);
                text.setMaxWidth(Double.MAX_VALUE);
                // the row fits the list's width: the words wrap, the Delete button stays in view
                text.setMinWidth(0);
                text.setPrefWidth(0);
                setPrefWidth(0);
                javafx.scene.control.Button delete = Ui.button("delete-visit-" + item.id(), "Delete", Icons.FIX,
                        () -> viewModel.askDeleteVisit(item));
                // its own tap: deleting never also opens the visit
                delete.addEventHandler(javafx.scene.input.MouseEvent.MOUSE_CLICKED, javafx.event.Event::consume);
                setGraphic(new javafx.scene.layout.HBox(8, text, delete));
            }
        });
        visits.setOnMouseClicked(e -> {
            Visit v = visits.getSelectionModel().getSelectedItem();
            if (v != null) {
                viewModel.resume(v);
            }
        });
        javafx.scene.control.Button start = Ui.button("start-visit", "Start visit", Icons.READINGS, viewModel::startVisit);
        start.getStyleClass().add("primary");
        start.setMaxWidth(Double.MAX_VALUE);
        Label status = Ui.wrapped("", "message");
        status.setId("job-status");
        status.textProperty().bind(viewModel.statusProperty());
        VBox visitCol = Ui.panel(8, Ui.wrapped("3  Visit", "heading"), Ui.label("Purpose", "figure-label"), purposes,
                tech, start, status, Ui.wrapped("Earlier visits (tap to open)", "figure-label"), visits);

        columns = new Columns(12, siteCol, systemCol, visitCol);
        VBox.setVgrow(columns, Priority.ALWAYS);
        // the question before a deletion, above the three columns where every delete button can see it
        getChildren().addAll(new app.latentledger.ui.bin.DeleteQuestion(viewModel.bin()), columns);
    }

    public JobViewModel viewModel() {
        return viewModel;
    }

    @Override
    public void setPortrait(boolean portrait) {
        columns.setPortrait(portrait);
    }

    private static TextField field(String id, String prompt, javafx.beans.property.StringProperty value) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        f.textProperty().bindBidirectional(value);
        return f;
    }

    private static ListCell<SiteZones.Choice> zoneCell() {
        ListCell<SiteZones.Choice> c = new ListCell<>() {
            @Override
            protected void updateItem(SiteZones.Choice item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? null : item.label());
            }
        };
        c.setWrapText(true);
        c.setMinWidth(0);
        c.setPrefWidth(0);
        return c;
    }

    private static <T> ListView<T> list(String id, javafx.collections.ObservableList<T> items, Function<T, String> text) {
        ListView<T> l = new ListView<>(items);
        l.setId(id);
        l.setPrefHeight(240);
        l.setMinHeight(140);
        VBox.setVgrow(l, Priority.ALWAYS);
        l.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(T item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? null : text.apply(item));
            }
        });
        return l;
    }

    private static <T> void bindSelection(ListView<T> l, javafx.beans.property.ObjectProperty<T> chosen) {
        l.getSelectionModel().select(chosen.get());
        chosen.addListener((o, a, b) -> l.getSelectionModel().select(b));
        l.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && b != chosen.get()) {
                chosen.set(b);
            }
        });
    }
}
