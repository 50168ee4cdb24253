package app.latentledger.ui.paperwork;

import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.SetLabel;
import app.latentledger.core.records.Visit;
import app.latentledger.store.Ledger;
import app.latentledger.ui.bin.RecycleBinViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Draft;
import app.latentledger.ui.session.Screen;
import app.latentledger.ui.share.BundleImportViewModel;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.util.Optional;
import java.util.concurrent.Executor;

/**
 * The Record screen's state: the visit's paperwork and instruments, the label of the reading set
 * on the pad, deleting that set or the visit (asked first, into the recycle bin), the bin itself
 * and importing a bundle. Follows the session: a new visit or set reloads the forms.
 */
public final class VisitRecordModel {
    private final AppSession session;
    private final PaperworkViewModel paperwork;
    private final InstrumentsViewModel instruments;
    private final RecycleBinViewModel bin;
    private final BundleImportViewModel importer;
    private final SystemDetailsViewModel systemDetails;
    private final ReadOnlyStringWrapper setLabel = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper setMessage = new ReadOnlyStringWrapper("");

    public VisitRecordModel(AppSession session, Executor work, Executor fx) {
        this.session = session;
        Ledger ledger = session.ledger();
        this.paperwork = new PaperworkViewModel(ledger);
        this.instruments = new InstrumentsViewModel(ledger);
        this.bin = new RecycleBinViewModel(ledger);
        this.importer = new BundleImportViewModel(ledger, work, fx);
        this.systemDetails = new SystemDetailsViewModel(session::keep);
        session.systemProperty().addListener((o, a, b) -> systemDetails.load(b));
        systemDetails.load(session.system());
        bin.onChange(this::afterBinChange);
        importer.onImported(() -> {
            bin.refresh();
            reload();
        });
        session.visitProperty().addListener((o, a, b) -> reload());
        // another screen (Job) may have deleted something since: the bin shows it when this screen opens
        session.screenProperty().addListener((o, a, b) -> bin.refresh());
        session.draftProperty().addListener((o, a, b) -> reloadSet());
        session.unitsProperty().addListener((o, a, b) -> reloadSet());
        reload();
    }

    private void reload() {
        Visit v = session.visit();
        paperwork.load(v == null ? null : v.id(), v == null ? null : v.technician());
        reloadSet();
    }

    private void reloadSet() {
        Visit v = session.visit();
        Optional<ReadingSet> stored = storedSet();
        instruments.load(v == null ? null : v.id(), stored.map(ReadingSet::id).orElse(null), session.units());
        setLabel.set(stored.map(ReadingSet::label).orElse(""));
        setMessage.set("");
    }

    private Optional<ReadingSet> storedSet() {
        Draft d = session.draft();
        return d == null ? Optional.empty() : session.ledger().readings().find(d.readingSetId());
    }

    /** Labels the reading set on the pad before, after or other. */
    public void label(SetLabel label) {
        Optional<ReadingSet> stored = storedSet();
        if (stored.isEmpty()) {
            setMessage.set("Save a reading on the pad first; then label the set.");
            return;
        }
        ReadingSet s = stored.get();
        session.ledger().readings().save(new ReadingSet(s.id(), s.visitId(), s.takenAt(), label.key(), s.instrument(),
                s.returnDryBulb(), s.returnHumidity(), s.supplyDryBulb(), s.supplyHumidity(), s.outdoorDryBulb(),
                s.outdoorHumidity(), s.coilTemperature(), s.airflow(), s.stationPressurePa(), s.condensate(), s.notes()));
        // the pad's draft carries the stored set: reopen it so its next save keeps the label
        session.openReadingSet(s.id());
        setLabel.set(label.key());
        setMessage.set("This set is labelled " + label.key() + ".");
    }

    /** Asks to delete the reading set on the pad. */
    public void askDeleteSet() {
        Optional<ReadingSet> stored = storedSet();
        if (stored.isEmpty()) {
            setMessage.set("This set has no saved reading yet; nothing to delete.");
            return;
        }
        String label = stored.get().label().isEmpty() ? "" : " '" + stored.get().label() + "'";
        bin.askDelete(RecordKind.READINGS, stored.get().id(), "this reading set" + label);
    }

    /** Asks to delete the open visit with its sets, logs, instruments and paperwork. */
    public void askDeleteVisit() {
        Visit v = session.visit();
        if (v == null) {
            setMessage.set("No visit is open.");
            return;
        }
        bin.askDelete(RecordKind.VISIT, v.id(), "this visit with its readings, logs, instruments and notes");
    }

    private void afterBinChange() {
        Visit v = session.visit();
        if (v != null && session.ledger().visits().find(v.id()).isEmpty()) {
            // the open visit went to the bin: back to the job screen to pick another
            session.screenProperty().set(Screen.JOB);
            return;
        }
        if (v != null && storedSet().isEmpty() && session.draft() != null
                && session.ledger().readings().forVisit(v.id()).stream().noneMatch(r -> r.id().equals(session.draft().readingSetId()))) {
            session.openVisit(v);
        }
        reload();
    }

    public PaperworkViewModel paperwork() {
        return paperwork;
    }

    public InstrumentsViewModel instruments() {
        return instruments;
    }

    public RecycleBinViewModel bin() {
        return bin;
    }

    public SystemDetailsViewModel systemDetails() {
        return systemDetails;
    }

    public BundleImportViewModel importer() {
        return importer;
    }

    /** The label of the set on the pad ("" when none). */
    public ReadOnlyStringProperty setLabelProperty() {
        return setLabel.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty setMessageProperty() {
        return setMessage.getReadOnlyProperty();
    }
}
