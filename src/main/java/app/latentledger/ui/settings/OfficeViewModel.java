package app.latentledger.ui.settings;

import app.latentledger.sync.OfficeAccount;
import app.latentledger.sync.OfficeSync;
import app.latentledger.sync.SyncException;
import app.latentledger.sync.SyncReport;
import app.latentledger.sync.SyncState;
import app.latentledger.sync.SyncStatus;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Supplier;

/**
 * Settings → Office: the server address, enrolling with a code, "Sync now", the last sync and what
 * is waiting. Every call to the office and every look at the ledger runs on {@code work}, never on
 * the screen's thread, so the keypad stays free; results come back through {@code fx}. Without a
 * network the message says so plainly and nothing here changes.
 */
public final class OfficeViewModel {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm");

    private final Supplier<OfficeSync> open;
    private final Executor work;
    private final Executor fx;
    private OfficeSync sync;

    private final StringProperty server = new SimpleStringProperty("");
    private final StringProperty code = new SimpleStringProperty("");
    private final StringProperty deviceName = new SimpleStringProperty("Tablet");
    private final ReadOnlyBooleanWrapper enrolled = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyStringWrapper office = new ReadOnlyStringWrapper("Not enrolled with an office yet.");
    private final ReadOnlyStringWrapper lastSync = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper waiting = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper refusals = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");

    /**
     * @param open makes the sync on the ledger (called once, on {@code work})
     * @param work where the sync and the ledger reads run
     * @param fx   where the results are shown
     */
    public OfficeViewModel(Supplier<OfficeSync> open, Executor work, Executor fx) {
        this.open = open;
        this.work = work;
        this.fx = fx;
        refresh();
    }

    /**
     * The app's own thread for the office: a sync may wait on the network for a minute, and that
     * must not hold up a log import or a report on the shared worker.
     */
    public static Executor officeThread() {
        return OFFICE;
    }

    private static final ExecutorService OFFICE = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "latent-ledger-office");
        t.setDaemon(true);
        return t;
    });

    private OfficeSync sync() {
        if (sync == null) {
            sync = open.get();
        }
        return sync;
    }

    /** Reads the account, the last sync and what is waiting again. */
    public void refresh() {
        run(() -> {
            SyncStatus s = sync().status();
            fx.execute(() -> show(s));
        }, null);
    }

    /** Enrols with the address and code typed. */
    public void enrol() {
        String url = server.get();
        String c = code.get();
        String name = deviceName.get();
        message.set("Enrolling with " + url.strip() + " …");
        run(() -> {
            OfficeAccount a = sync().enrol(url, c, name);
            SyncStatus s = sync().status();
            fx.execute(() -> {
                code.set("");
                show(s);
                message.set("Enrolled with " + a.company() + ". Tap Sync now to send and fetch records.");
            });
        }, "Enrolment");
    }

    /** Sends what changed here and fetches what changed at the office. */
    public void syncNow() {
        message.set("Syncing with the office …");
        run(() -> {
            SyncReport r = sync().syncNow();
            SyncStatus s = sync().status();
            fx.execute(() -> {
                show(s);
                message.set(r.summary());
            });
        }, "Sync");
    }

    private void run(Runnable job, String what) {
        busy.set(true);
        work.execute(() -> {
            try {
                job.run();
            } catch (SyncException e) {
                String m = e.getMessage();
                fx.execute(() -> message.set(capitalised(m) + "."));
                refreshAfterFailure();
            } catch (RuntimeException e) {
                String m = (what == null ? "Reading the office status" : what) + " stopped: " + e.getMessage()
                        + ". Nothing on this tablet was lost.";
                fx.execute(() -> message.set(m));
            } finally {
                fx.execute(() -> busy.set(false));
            }
        });
    }

    private void refreshAfterFailure() {
        try {
            SyncStatus s = sync().status();
            fx.execute(() -> show(s));
        } catch (RuntimeException ignored) {
            // the message already says what went wrong
        }
    }

    private void show(SyncStatus s) {
        enrolled.set(s.account().isPresent());
        if (s.account().isPresent()) {
            OfficeAccount a = s.account().get();
            if (server.get().isBlank()) {
                server.set(a.serverUrl());
            }
            office.set(a.company() + " at " + a.serverUrl() + " — this tablet is " + a.deviceName()
                    + (a.technician().isEmpty() ? "" : ", enrolled for " + a.technician()) + ".");
        } else {
            office.set("Not enrolled with an office yet. Type the server address and the code the office gave you.");
        }
        lastSync.set(s.lastSync().map(OfficeViewModel::lastSync).orElse(s.account().isPresent()
                ? "Not synced yet." : ""));
        int n = s.waiting();
        waiting.set(n == 0 ? "Nothing is waiting to go." : n + (n == 1 ? " record is" : " records are")
                + " waiting to go to the office.");
        StringBuilder b = new StringBuilder();
        for (SyncReport.Refused r : s.refusals()) {
            b.append(b.length() == 0 ? "Refused by the office (kept here; fix and sync again): " : "; ")
                    .append(r.sentence());
        }
        refusals.set(b.toString());
    }

    private static String lastSync(SyncState.LastSync l) {
        String outcome = switch (l.outcome()) {
            case "done" -> "done";
            case "refusals" -> "done, with refusals";
            case "failed" -> "did not finish";
            default -> l.outcome();
        };
        return "Last sync " + when(l.at()) + ", " + outcome + ": " + l.message();
    }

    private static String when(OffsetDateTime t) {
        return t.atZoneSameInstant(java.time.ZoneId.systemDefault()).format(WHEN);
    }

    private static String capitalised(String s) {
        return s == null || s.isEmpty() ? "" : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    public StringProperty serverProperty() {
        return server;
    }

    public StringProperty codeProperty() {
        return code;
    }

    public StringProperty deviceNameProperty() {
        return deviceName;
    }

    public ReadOnlyBooleanProperty enrolledProperty() {
        return enrolled.getReadOnlyProperty();
    }

    /** True while the office is being asked: the buttons wait. */
    public ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty officeProperty() {
        return office.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty lastSyncProperty() {
        return lastSync.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty waitingProperty() {
        return waiting.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty refusalsProperty() {
        return refusals.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }
}
