package app.latentledger.store;

import java.nio.file.Path;

/**
 * The field records of one tablet: the database and its repositories. Open it with
 * {@link #open(Path)} on the folder {@link DataLocation} chose.
 */
public final class Ledger implements AutoCloseable {
    /** The database file inside the data folder. */
    public static final String FILE_NAME = "ledger.db";

    private final Database db;
    private final SiteRepository sites;
    private final SystemRepository systems;
    private final VisitRepository visits;
    private final ReadingSetRepository readings;
    private final LogRepository logs;
    private final SnapshotRepository snapshots;
    private final SettingsRepository settings;
    private final InstrumentRepository instruments;
    private final PaperworkRepository paperwork;
    private final RecycleBin recycleBin;

    public Ledger(Database db) {
        this.db = db;
        this.sites = new SiteRepository(db);
        this.systems = new SystemRepository(db);
        this.visits = new VisitRepository(db);
        this.readings = new ReadingSetRepository(db);
        this.logs = new LogRepository(db);
        this.snapshots = new SnapshotRepository(db);
        this.settings = new SettingsRepository(db);
        this.instruments = new InstrumentRepository(db);
        this.paperwork = new PaperworkRepository(db);
        this.recycleBin = new RecycleBin(db);
    }

    /** What a ledger that holds no site yet (its first run) is given. */
    public enum FirstRun {
        /** Nothing: a command that only reads or sets something leaves a new ledger empty. */
        NOTHING,
        /** The invented Saltreed demo, so the app and the visit, report and data commands have something to show. */
        SEED_DEMO
    }

    /** Opens the ledger in {@code dataDir}, creating the folder and file on first use; adds nothing. */
    public static Ledger open(Path dataDir) {
        return open(dataDir, FirstRun.NOTHING);
    }

    /**
     * Opens the ledger in {@code dataDir}, creating the folder and file on first use, and takes the
     * first-run step the caller names when the ledger holds no site yet. The faces a tech looks
     * through (the app, {@code visits}, {@code report}, {@code data}) seed the demo; nothing else does.
     */
    public static Ledger open(Path dataDir, FirstRun firstRun) {
        Ledger ledger = new Ledger(Database.open(dataDir.resolve(FILE_NAME)));
        try {
            if (firstRun == FirstRun.SEED_DEMO) {
                DemoScenario.seedIfEmpty(ledger);
            }
            ledger.recycleBin().purgeOlderThan(java.time.OffsetDateTime.now().minus(RecycleBin.KEEP));
        } catch (RuntimeException e) {
            ledger.close();
            throw e;
        }
        return ledger;
    }

    public Database database() {
        return db;
    }

    public SiteRepository sites() {
        return sites;
    }

    public SystemRepository systems() {
        return systems;
    }

    public VisitRepository visits() {
        return visits;
    }

    public ReadingSetRepository readings() {
        return readings;
    }

    public LogRepository logs() {
        return logs;
    }

    public SnapshotRepository snapshots() {
        return snapshots;
    }

    /** The tech's settings (units, tolerances, thresholds, theme, paper). */
    public SettingsRepository settings() {
        return settings;
    }

    /** Instruments used on visits and which took each reading set. */
    public InstrumentRepository instruments() {
        return instruments;
    }

    /** Each visit's customer words, work done and sign-offs. */
    public PaperworkRepository paperwork() {
        return paperwork;
    }

    /**
     * The one recycle bin: delete, restore, list, empty. Every deletion in the product goes
     * through it, so nothing is lost to a wrong tap for {@link RecycleBin#KEEP}.
     */
    public RecycleBin recycleBin() {
        return recycleBin;
    }

    /** Runs {@code work} as one transaction: every save inside it commits together or not at all. */
    public void inTransaction(Runnable work) {
        db.write(c -> {
            work.run();
            return null;
        });
    }

    @Override
    public void close() {
        db.close();
    }
}
