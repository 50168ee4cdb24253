package app.latentledger.ui.bin;

import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.RecordKind;
import app.latentledger.store.Ledger;
import app.latentledger.store.RecycleBin;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import java.time.Duration;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/**
 * Deleting with a question first, and the recycle bin screen: what was deleted, how long it stays,
 * restore, and emptying (also asked first). Every deletion in the app goes through here into the
 * ledger's one {@link RecycleBin}.
 */
public final class RecycleBinViewModel {
    /** One bin entry as the list shows it. */
    public record Row(BinEntry entry, String when, long daysLeft) {
        public String text() {
            return entry.summary() + " — deleted " + when + ", " + daysLeft + (daysLeft == 1 ? " day" : " days")
                    + " left";
        }
    }

    /** A deletion waiting for the tech's yes. */
    public record PendingDelete(RecordKind kind, String id, String what) {
        public String question() {
            return "Delete " + what + "? It goes to the recycle bin with everything under it and can be restored"
                    + " for " + RecycleBin.KEEP.toDays() + " days.";
        }
    }

    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm");

    private final Ledger ledger;
    private final Supplier<OffsetDateTime> clock;
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ReadOnlyObjectWrapper<PendingDelete> pending = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<Boolean> emptyAsked = new ReadOnlyObjectWrapper<>(false);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private Runnable afterChange = () -> { };

    public RecycleBinViewModel(Ledger ledger) {
        this(ledger, OffsetDateTime::now);
    }

    RecycleBinViewModel(Ledger ledger, Supplier<OffsetDateTime> clock) {
        this.ledger = ledger;
        this.clock = clock;
        refresh();
    }

    /** Called after a delete or restore, so the screens showing those records reload. */
    public void onChange(Runnable afterChange) {
        this.afterChange = afterChange == null ? () -> { } : afterChange;
    }

    public void refresh() {
        List<Row> out = new ArrayList<>();
        OffsetDateTime now = clock.get();
        for (BinEntry e : ledger.recycleBin().list()) {
            long left = Math.max(0, RecycleBin.KEEP.minus(Duration.between(e.deletedAt(), now)).toDays());
            out.add(new Row(e, e.deletedAt().format(WHEN), left));
        }
        rows.setAll(out);
    }

    /** Step one of a delete: ask. */
    public void askDelete(RecordKind kind, String id, String what) {
        pending.set(new PendingDelete(kind, id, what));
        message.set("");
    }

    /** Step two: the tech said yes. */
    public boolean confirmDelete() {
        PendingDelete p = pending.get();
        if (p == null) {
            return false;
        }
        pending.set(null);
        try {
            BinEntry e = ledger.recycleBin().delete(p.kind(), p.id());
            message.set("Deleted " + e.summary() + ". Restore it from the recycle bin.");
            refresh();
            afterChange.run();
            return true;
        } catch (InvalidRecordException e) {
            message.set("Not deleted: " + e.getMessage());
            return false;
        }
    }

    public void cancelDelete() {
        pending.set(null);
    }

    public boolean restore(Row row) {
        try {
            ledger.recycleBin().restore(row.entry().kind(), row.entry().recordId());
            message.set("Restored " + row.entry().summary() + ".");
            refresh();
            afterChange.run();
            return true;
        } catch (InvalidRecordException e) {
            message.set("Not restored: " + e.getMessage());
            return false;
        }
    }

    /** Step one of emptying: ask. */
    public void askEmpty() {
        emptyAsked.set(!rows.isEmpty());
        message.set(rows.isEmpty() ? "The recycle bin is already empty." : "");
    }

    public int confirmEmpty() {
        if (!Boolean.TRUE.equals(emptyAsked.get())) {
            return 0;
        }
        emptyAsked.set(false);
        int n = ledger.recycleBin().empty();
        message.set("Deleted " + n + (n == 1 ? " entry" : " entries") + " for good.");
        refresh();
        return n;
    }

    public void cancelEmpty() {
        emptyAsked.set(false);
    }

    public ObservableList<Row> rows() {
        return rows;
    }

    public ReadOnlyObjectProperty<PendingDelete> pendingProperty() {
        return pending.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Boolean> emptyAskedProperty() {
        return emptyAsked.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }
}
