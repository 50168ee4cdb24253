package app.latentledger.ui.job;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.core.units.Quantity;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The job screen: pick or add a site and a system, then start a visit with its purpose or go back
 * to an earlier visit.
 */
public final class JobViewModel {
    private final AppSession session;
    private final ObservableList<Site> sites = FXCollections.observableArrayList();
    private final ObservableList<HvacSystem> systems = FXCollections.observableArrayList();
    private final ObservableList<Visit> visits = FXCollections.observableArrayList();
    private final ObjectProperty<Site> site = new SimpleObjectProperty<>();
    private final ObjectProperty<HvacSystem> system = new SimpleObjectProperty<>();
    private final ObjectProperty<VisitPurpose> purpose = new SimpleObjectProperty<>(VisitPurpose.COMPLAINT);
    private final StringProperty technician = new SimpleStringProperty("");
    private final StringProperty newSiteName = new SimpleStringProperty("");
    private final StringProperty newSiteAddress = new SimpleStringProperty("");
    /** The elevation of a new site, in the tech's units (the name is older than the SI setting). */
    private final StringProperty newSiteElevationFt = new SimpleStringProperty("0");
    private final ReadOnlyStringWrapper elevationCaption = new ReadOnlyStringWrapper("");
    private final StringProperty newSystemLabel = new SimpleStringProperty("");
    private final StringProperty newSystemTons = new SimpleStringProperty("3");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");

    public JobViewModel(AppSession session) {
        this.session = session;
        // a new site starts at the tech's default elevation, shown in the units of the moment
        session.settingsProperty().addListener((o, a, b) -> showDefaultElevation());
        showDefaultElevation();
        site.addListener((o, a, b) -> loadSystems());
        system.addListener((o, a, b) -> loadVisits());
        sites.setAll(session.ledger().sites().all());
        site.set(session.site() != null ? find(session.site().id()) : sites.isEmpty() ? null : sites.get(0));
        if (session.system() != null) {
            systems.stream().filter(s -> s.id().equals(session.system().id())).findFirst().ifPresent(system::set);
        }
        if (session.visit() != null) {
            technician.set(session.visit().technician());
        }
    }

    /** "Elevation, ft" or "Elevation, m". */
    public ReadOnlyStringProperty elevationCaptionProperty() {
        return elevationCaption.getReadOnlyProperty();
    }

    private void showDefaultElevation() {
        var u = session.units();
        newSiteElevationFt.set(app.latentledger.ui.present.Shown.number(
                Quantity.ELEVATION.toDisplay(u, session.settings().defaultElevationM()), 0).replace(",", ""));
        elevationCaption.set("Elevation, " + Quantity.ELEVATION.symbol(u));
    }

    public ObservableList<Site> sites() {
        return sites;
    }

    public ObservableList<HvacSystem> systems() {
        return systems;
    }

    /** Visits to the chosen system, newest first. */
    public ObservableList<Visit> visits() {
        return visits;
    }

    public ObjectProperty<Site> siteProperty() {
        return site;
    }

    public ObjectProperty<HvacSystem> systemProperty() {
        return system;
    }

    public ObjectProperty<VisitPurpose> purposeProperty() {
        return purpose;
    }

    public StringProperty technicianProperty() {
        return technician;
    }

    public StringProperty newSiteNameProperty() {
        return newSiteName;
    }

    public StringProperty newSiteAddressProperty() {
        return newSiteAddress;
    }

    public StringProperty newSiteElevationFtProperty() {
        return newSiteElevationFt;
    }

    public StringProperty newSystemLabelProperty() {
        return newSystemLabel;
    }

    public StringProperty newSystemTonsProperty() {
        return newSystemTons;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** A system as its list shows it: label, nominal size, staging. */
    public String describe(HvacSystem s) {
        return s.label() + "\n" + app.latentledger.ui.present.Shown.of(Quantity.POWER_LARGE, session.units(),
                s.nominalCapacityW(), 1) + " " + Quantity.POWER_LARGE.symbol(session.units()) + " · " + s.type().key();
    }

    /** "Complaint", "Commissioning", "Before", "After", "Follow-up". */
    public static String purposeWord(VisitPurpose p) {
        String k = p.key();
        return Character.toUpperCase(k.charAt(0)) + k.substring(1);
    }

    /** Starts a visit to the chosen system and goes to the readings. */
    public boolean startVisit() {
        if (site.get() == null || system.get() == null) {
            status.set("Pick a site and a system first.");
            return false;
        }
        try {
            session.startVisit(site.get(), system.get(), purpose.get(), technician.get(), "");
            loadVisits();
            status.set("Visit started: " + purposeWord(purpose.get()) + " at " + site.get().name() + ".");
            session.screenProperty().set(Screen.READINGS);
            return true;
        } catch (InvalidRecordException e) {
            status.set("Not started: " + e.getMessage());
            return false;
        }
    }

    /** Goes back to an earlier visit. */
    public void resume(Visit v) {
        session.openVisit(v);
        session.screenProperty().set(Screen.RESULTS);
    }

    public boolean addSite() {
        try {
            double m = Quantity.ELEVATION.fromDisplay(session.units(), number("elevation", newSiteElevationFt.get()));
            Site s = new Site(Ids.newId(), newSiteName.get(), newSiteAddress.get(), m, "");
            session.addSite(s);
            sites.setAll(session.ledger().sites().all());
            site.set(find(s.id()));
            status.set("Site added: " + s.name() + ".");
            newSiteName.set("");
            newSiteAddress.set("");
            return true;
        } catch (InvalidInputException e) {
            status.set("Site not added: " + e.message(session.units()));
        } catch (IllegalArgumentException e) {
            status.set("Site not added: " + e.getMessage());
        }
        return false;
    }

    public boolean addSystem() {
        if (site.get() == null) {
            status.set("Pick or add the site first.");
            return false;
        }
        try {
            double w = Quantity.POWER_LARGE.fromDisplay(session.units(), number("nominal size", newSystemTons.get()));
            HvacSystem s = new HvacSystem(Ids.newId(), site.get().id(), newSystemLabel.get(), SystemType.SINGLE_STAGE,
                    w, "", "", "", "");
            session.addSystem(s);
            loadSystems();
            systems.stream().filter(x -> x.id().equals(s.id())).findFirst().ifPresent(system::set);
            status.set("System added: " + s.label() + ".");
            newSystemLabel.set("");
            return true;
        } catch (InvalidInputException e) {
            status.set("System not added: " + e.message(session.units()));
        } catch (IllegalArgumentException e) {
            status.set("System not added: " + e.getMessage());
        }
        return false;
    }

    private Site find(String id) {
        return sites.stream().filter(s -> s.id().equals(id)).findFirst().orElse(null);
    }

    private void loadSystems() {
        systems.setAll(site.get() == null ? java.util.List.of() : session.ledger().systems().forSite(site.get().id()));
        system.set(systems.isEmpty() ? null : systems.get(0));
    }

    private void loadVisits() {
        HvacSystem s = system.get();
        visits.setAll(s == null ? java.util.List.of() : session.ledger().visits().forSite(s.siteId()).stream()
                .filter(v -> v.systemId().equals(s.id())).toList());
    }

    private static double number(String field, String text) {
        try {
            return Double.parseDouble(text == null ? "" : text.strip().replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(field + " '" + text + "' is not a number");
        }
    }
}
