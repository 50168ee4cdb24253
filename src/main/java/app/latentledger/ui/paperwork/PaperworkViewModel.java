package app.latentledger.ui.paperwork;

import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.Ledger;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.function.Supplier;

/**
 * The visit's written part on the tablet: the customer's words, the work done, and the two
 * sign-offs. Each save goes straight to the ledger; the message says what was kept, or why not,
 * next to the form it is about.
 */
public final class PaperworkViewModel {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm");

    private final Ledger ledger;
    private final Supplier<OffsetDateTime> clock;
    private String visitId;

    private final StringProperty customerWords = new SimpleStringProperty("");
    private final StringProperty workDone = new SimpleStringProperty("");
    private final StringProperty technicianName = new SimpleStringProperty("");
    private final StringProperty technicianRemark = new SimpleStringProperty("");
    private final StringProperty customerName = new SimpleStringProperty("");
    private final StringProperty customerRemark = new SimpleStringProperty("");
    private final ReadOnlyStringWrapper technicianSigned = new ReadOnlyStringWrapper("Not signed");
    private final ReadOnlyStringWrapper customerSigned = new ReadOnlyStringWrapper("Not signed");
    private final ReadOnlyStringWrapper notesMessage = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper signMessage = new ReadOnlyStringWrapper("");

    public PaperworkViewModel(Ledger ledger) {
        this(ledger, OffsetDateTime::now);
    }

    PaperworkViewModel(Ledger ledger, Supplier<OffsetDateTime> clock) {
        this.ledger = ledger;
        this.clock = clock;
    }

    /** Shows the paperwork of a visit (null: none open). */
    public void load(String visitId, String technician) {
        this.visitId = visitId;
        notesMessage.set("");
        signMessage.set("");
        VisitPaperwork w = visitId == null ? VisitPaperwork.blank("none") : ledger.paperwork().forVisit(visitId);
        customerWords.set(w.customerWords());
        workDone.set(w.workDone());
        technicianName.set(w.technician() != null ? w.technician().name() : technician == null ? "" : technician);
        technicianRemark.set(w.technician() != null ? w.technician().remark() : "");
        customerName.set(w.customer() != null ? w.customer().name() : "");
        customerRemark.set(w.customer() != null ? w.customer().remark() : "");
        showSigned(w);
    }

    /** Keeps the customer's words and the work done. */
    public boolean saveNotes() {
        if (visitId == null) {
            notesMessage.set("Start or open a visit first.");
            return false;
        }
        try {
            VisitPaperwork w = ledger.paperwork().forVisit(visitId).withNotes(customerWords.get(), workDone.get());
            ledger.paperwork().save(w);
            notesMessage.set("Notes saved.");
            return true;
        } catch (InvalidRecordException e) {
            notesMessage.set("Not saved: " + e.getMessage());
            return false;
        }
    }

    /** Signs off as the technician, now. */
    public boolean signAsTechnician() {
        return sign(true);
    }

    /** Signs off as the customer, now. */
    public boolean signAsCustomer() {
        return sign(false);
    }

    private boolean sign(boolean technician) {
        if (visitId == null) {
            signMessage.set("Start or open a visit first.");
            return false;
        }
        String name = (technician ? technicianName : customerName).get();
        if (name == null || name.isBlank()) {
            signMessage.set("Type the " + (technician ? "technician's" : "customer's") + " name to sign.");
            return false;
        }
        try {
            SignOff s = new SignOff(name, clock.get(), (technician ? technicianRemark : customerRemark).get());
            VisitPaperwork before = ledger.paperwork().forVisit(visitId);
            VisitPaperwork w = technician ? before.withTechnician(s) : before.withCustomer(s);
            ledger.paperwork().save(w);
            showSigned(w);
            signMessage.set("Signed by " + s.name() + ".");
            return true;
        } catch (InvalidRecordException e) {
            signMessage.set("Not signed: " + e.getMessage());
            return false;
        }
    }

    private void showSigned(VisitPaperwork w) {
        technicianSigned.set(signedText(w.technician()));
        customerSigned.set(signedText(w.customer()));
    }

    private static String signedText(SignOff s) {
        return s == null ? "Not signed" : "Signed by " + s.name() + ", " + s.signedAt().format(WHEN);
    }

    public StringProperty customerWordsProperty() {
        return customerWords;
    }

    public StringProperty workDoneProperty() {
        return workDone;
    }

    public StringProperty technicianNameProperty() {
        return technicianName;
    }

    public StringProperty technicianRemarkProperty() {
        return technicianRemark;
    }

    public StringProperty customerNameProperty() {
        return customerName;
    }

    public StringProperty customerRemarkProperty() {
        return customerRemark;
    }

    public ReadOnlyStringProperty technicianSignedProperty() {
        return technicianSigned.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty customerSignedProperty() {
        return customerSigned.getReadOnlyProperty();
    }

    /** What happened to the notes, shown under the notes. */
    public ReadOnlyStringProperty notesMessageProperty() {
        return notesMessage.getReadOnlyProperty();
    }

    /** What happened to a sign-off, shown under the sign-offs. */
    public ReadOnlyStringProperty signMessageProperty() {
        return signMessage.getReadOnlyProperty();
    }
}
