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
import app.latentledger.core.units.TypedNumber;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
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
    /** The site's time zone as chosen; {@link SiteZones#TABLET}: none kept, the tablet's is used. */
    private final ObjectProperty<SiteZones.Choice> newSiteZone = new SimpleObjectProperty<>(SiteZones.TABLET);
    /** What the tech typed to search every zone; the choices follow it. */
    private final StringProperty zoneSearch = new SimpleStringProperty("");
    private final ObservableList<SiteZones.Choice> zoneChoices = FXCollections.observableArrayList(SiteZones.common());
    private final StringProperty newSystemLabel = new SimpleStringProperty("");
    private final StringProperty newSystemTons = new SimpleStringProperty("3");
    /** How the new system's capacity steps; the rest of its details go on the Record screen. */
    private final ObjectProperty<SystemType> newSystemStages = new SimpleObjectProperty<>(SystemType.SINGLE_STAGE);
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    /** Messages shown next to the column they are about: site and system each have their own. */
    private final ReadOnlyStringWrapper siteStatus = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper systemStatus = new ReadOnlyStringWrapper("");
    /** True while the site (system) message says the last add or save was refused. */
    private final javafx.beans.property.ReadOnlyBooleanWrapper siteRefused = new javafx.beans.property.ReadOnlyBooleanWrapper();
    private final javafx.beans.property.ReadOnlyBooleanWrapper systemRefused = new javafx.beans.property.ReadOnlyBooleanWrapper();
    /** The site whose name, address and elevation the site fields hold for a correction; null: a new site. */
    private final ReadOnlyObjectWrapper<Site> editingSite = new ReadOnlyObjectWrapper<>();
    private final app.latentledger.ui.bin.RecycleBinViewModel bin;

    public JobViewModel(AppSession session) {
        this.session = session;
        // any new message clears the refusal; the refusing paths set it again after their message
        siteStatus.addListener((o, a, b) -> siteRefused.set(false));
        systemStatus.addListener((o, a, b) -> systemRefused.set(false));
        // a new site starts at the tech's default elevation, shown in the units of the moment
        session.settingsProperty().addListener((o, a, b) -> showDefaultElevation());
        showDefaultElevation();
        zoneSearch.addListener((o, a, b) -> {
            // a drop-down whose items are replaced may drop its value: the zone chosen stays chosen
            SiteZones.Choice keep = newSiteZone.get();
            zoneChoices.setAll(SiteZones.search(b, keep));
            newSiteZone.set(keep);
        });
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
        bin = new app.latentledger.ui.bin.RecycleBinViewModel(session.ledger());
        bin.onChange(this::afterBinChange);
        // a new choice starts without the last choice's messages ("Visit started" at the site left included)
        site.addListener((o, a, b) -> {
            siteStatus.set("");
            systemStatus.set("");
            status.set("");
        });
    }

    /** Deleting asks first and goes to the ledger's one recycle bin (restorable from the Record screen). */
    public app.latentledger.ui.bin.RecycleBinViewModel bin() {
        return bin;
    }

    public ReadOnlyStringProperty siteStatusProperty() {
        return siteStatus.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty systemStatusProperty() {
        return systemStatus.getReadOnlyProperty();
    }

    /** The site message is a refusal (shown as one), not a saved site or a hint. */
    public javafx.beans.property.ReadOnlyBooleanProperty siteRefusedProperty() {
        return siteRefused.getReadOnlyProperty();
    }

    /** The system message is a refusal (shown as one), not a saved system or a hint. */
    public javafx.beans.property.ReadOnlyBooleanProperty systemRefusedProperty() {
        return systemRefused.getReadOnlyProperty();
    }

    /** Single-stage, two-stage or variable-capacity, for the system about to be added. */
    public ObjectProperty<SystemType> newSystemStagesProperty() {
        return newSystemStages;
    }

    /** The site being corrected in the site fields, or null while they describe a new site. */
    public ReadOnlyObjectProperty<Site> editingSiteProperty() {
        return editingSite.getReadOnlyProperty();
    }

    /** Asks to delete the chosen site with its systems, visits, readings and logs. */
    public void askDeleteSite() {
        if (site.get() == null) {
            siteStatus.set("Pick the site to delete first.");
            return;
        }
        bin.askDelete(app.latentledger.core.records.RecordKind.SITE, site.get().id(),
                "the site " + site.get().name() + " with its systems, visits, readings and logs");
    }

    /** Asks to delete the chosen system with its visits, readings and logs. */
    public void askDeleteSystem() {
        if (system.get() == null) {
            systemStatus.set("Pick the system to delete first.");
            return;
        }
        bin.askDelete(app.latentledger.core.records.RecordKind.SYSTEM, system.get().id(),
                "the system " + system.get().label() + " with its visits, readings and logs");
    }

    /** Asks to delete one earlier visit with its readings, logs, instruments and notes. */
    public void askDeleteVisit(Visit v) {
        if (v == null) {
            status.set("Pick the visit to delete first.");
            return;
        }
        bin.askDelete(app.latentledger.core.records.RecordKind.VISIT, v.id(), "the visit of "
                + v.startedAt().toLocalDate() + " with its readings, logs, instruments and notes");
    }

    private void afterBinChange() {
        session.recordsChanged();
        String siteId = site.get() == null ? null : site.get().id();
        String systemId = system.get() == null ? null : system.get().id();
        sites.setAll(session.ledger().sites().all());
        Site again = siteId == null ? null : find(siteId);
        site.set(again != null ? again : sites.isEmpty() ? null : sites.get(0));
        loadSystems();
        if (systemId != null) {
            systems.stream().filter(x -> x.id().equals(systemId)).findFirst().ifPresent(system::set);
        }
        loadVisits();
        status.set(bin.messageProperty().get());
    }

    /** Puts the chosen site's name, address, elevation and time zone in the site fields to correct them. */
    public void editSite() {
        Site s = site.get();
        if (s == null) {
            siteStatus.set("Pick the site to correct first.");
            return;
        }
        editingSite.set(s);
        newSiteName.set(s.name());
        newSiteAddress.set(s.address());
        newSiteElevationFt.set(app.latentledger.ui.present.Shown.of(Quantity.ELEVATION, session.units(), s.elevationM(),
                0).replace(",", ""));
        showZone(SiteZones.of(s.timeZone()));
        siteStatus.set("Correct the fields, then save the site.");
    }

    /** Leaves a correction unsaved: the fields describe a new site again. */
    public void cancelEdit() {
        editingSite.set(null);
        newSiteName.set("");
        newSiteAddress.set("");
        showDefaultElevation();
        showZone(SiteZones.TABLET);
        siteStatus.set("");
    }

    /** The zone field showing {@code z}, with the usual choices (and {@code z}) to pick from. */
    private void showZone(SiteZones.Choice z) {
        zoneChoices.setAll(SiteZones.search("", z));
        newSiteZone.set(z);
        zoneSearch.set("");
    }

    /** The site's time zone as chosen in the form. */
    public ObjectProperty<SiteZones.Choice> newSiteZoneProperty() {
        return newSiteZone;
    }

    /** Words typed to search every time zone ("regina", "Europe/Lis"); empty: the usual ones. */
    public StringProperty zoneSearchProperty() {
        return zoneSearch;
    }

    /** The time zones offered: the tablet's, the usual ones of the US and Canada, or those searched for. */
    public ObservableList<SiteZones.Choice> zoneChoices() {
        return zoneChoices;
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

    /** Adds the site in the fields, or saves the correction of the site being edited. */
    public boolean addSite() {
        Site editing = editingSite.get();
        String verb = editing == null ? "added" : "saved";
        try {
            double m = Quantity.ELEVATION.fromDisplay(session.units(), number("elevation", newSiteElevationFt.get()));
            String zone = newSiteZone.get() == null ? "" : newSiteZone.get().id();
            Site s = editing == null ? new Site(Ids.newId(), newSiteName.get(), newSiteAddress.get(), m, "", zone)
                    : new Site(editing.id(), newSiteName.get(), newSiteAddress.get(), m, editing.notes(), zone);
            if (editing == null) {
                session.addSite(s);
            } else {
                session.correctSite(s);
            }
            editingSite.set(null);
            sites.setAll(session.ledger().sites().all());
            Site shown = find(s.id());
            if (site.get() != null && site.get().id().equals(s.id())) {
                site.set(null);
            }
            site.set(shown);
            siteStatus.set("Site " + verb + ": " + s.name() + (s.timeZone().isEmpty() ? "" : ", time zone "
                    + s.timeZone()) + ".");
            newSiteName.set("");
            newSiteAddress.set("");
            showDefaultElevation();
            showZone(SiteZones.TABLET);
            return true;
        } catch (InvalidInputException e) {
            siteStatus.set("Site not " + verb + ": " + e.message(session.units()));
            siteRefused.set(true);
        } catch (IllegalArgumentException e) {
            siteStatus.set("Site not " + verb + ": " + e.getMessage());
            siteRefused.set(true);
        }
        return false;
    }

    public boolean addSystem() {
        if (site.get() == null) {
            systemStatus.set("Pick or add the site first.");
            return false;
        }
        try {
            double w = Quantity.POWER_LARGE.fromDisplay(session.units(), number("nominal size", newSystemTons.get()));
            HvacSystem s = new HvacSystem(Ids.newId(), site.get().id(), newSystemLabel.get(), newSystemStages.get(),
                    w, "", "", "", "");
            session.addSystem(s);
            loadSystems();
            systems.stream().filter(x -> x.id().equals(s.id())).findFirst().ifPresent(system::set);
            systemStatus.set("System added: " + s.label() + ".");
            newSystemLabel.set("");
            return true;
        } catch (InvalidInputException e) {
            systemStatus.set("System not added: " + e.message(session.units()));
            systemRefused.set(true);
        } catch (IllegalArgumentException e) {
            systemStatus.set("System not added: " + e.getMessage());
            systemRefused.set(true);
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

    /** The app's one number rule: a comma is refused, never read as a decimal point ("5,000" is not 5 ft). */
    private static double number(String field, String text) {
        return TypedNumber.parse(field, text);
    }
}
