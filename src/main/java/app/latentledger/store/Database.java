package app.latentledger.store;

import org.sqlite.SQLiteConfig;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

/**
 * The ledger's SQLite file. One connection, used by one thread at a time.
 *
 * <p>Durability choices (see docs/methods.md §4): write-ahead log, so a killed process leaves
 * either the old or the new state and readers never block the writer; {@code synchronous=FULL},
 * so a commit has reached the disk (WAL fsync) before the save call returns, which is what "saved"
 * means to a tech; foreign keys on; a busy timeout so the command line and the app can share the
 * file. Every write runs in one {@code BEGIN IMMEDIATE} transaction.
 */
public final class Database implements AutoCloseable {
    /** Waiting this long for another program's write to finish before giving up. */
    static final int BUSY_TIMEOUT_MS = 10_000;

    /** The busy timeout in force: {@link #BUSY_TIMEOUT_MS}, shortened only by tests (system property). */
    static int busyTimeoutMs() {
        return Integer.getInteger("latentledger.busyTimeoutMs", BUSY_TIMEOUT_MS);
    }

    private final Path file;
    private final Connection connection;
    private final boolean created;
    private int depth;

    private Database(Path file, Connection connection, boolean created) {
        this.file = file;
        this.connection = connection;
        this.created = created;
    }

    /** Opens (creating if needed) the database and brings its schema up to this build's version. */
    public static Database open(Path file) {
        return open(file, Migration.latestVersion());
    }

    /** Opens and migrates up to {@code version} only; for tests that build older databases. */
    static Database open(Path file, int version) {
        boolean created = !Files.exists(file);
        try {
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
                // the first open of this process points the driver at the ledger folder's own copy of
                // its native library; commands that never open a ledger never pay for it
                NativeLibrary.useAppFolder(parent);
            }
        } catch (IOException | SecurityException e) {
            throw new StoreException(StoreException.Kind.UNAVAILABLE, "cannot create the folder for " + file + ": "
                    + e.getMessage(), e);
        }
        Connection c = connect(file);
        Database db = new Database(file, c, created);
        try {
            db.checkPragmas();
            db.migrate(version);
        } catch (StoreException e) {
            db.close();
            // a file that is not a database, or a folder we may not write, is a place the ledger cannot be
            String m = String.valueOf(e.getMessage());
            boolean unusable = e.kind() == StoreException.Kind.FAILED && (m.contains("not a database")
                    || m.contains("readonly") || m.contains("unable to open") || m.contains("journal mode"));
            throw unusable ? new StoreException(StoreException.Kind.UNAVAILABLE, m, e) : e;
        } catch (RuntimeException e) {
            db.close();
            throw e;
        }
        return db;
    }

    /**
     * A connection with the busy timeout, FULL sync, foreign keys and WAL. Opening is retried for up to
     * the busy timeout while SQLite answers "busy": in WAL mode the last program closing the ledger
     * holds it exclusively for a moment while it cleans up the log, and a program opening it in that
     * moment is told "busy" at once, without waiting [SQLite docs: "Write-Ahead Logging", §"Sometimes
     * queries return SQLITE_BUSY in WAL mode"]. Six `settings set` commands started together saw this
     * in about 1 of 40 races before the retry.
     */
    private static Connection connect(Path file) {
        long deadline = System.nanoTime() + busyTimeoutMs() * 1_000_000L;
        long pauseMs = 5;
        while (true) {
            try {
                SQLiteConfig config = new SQLiteConfig();
                config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
                config.enforceForeignKeys(true);
                config.setBusyTimeout(busyTimeoutMs());
                Connection c = config.createConnection("jdbc:sqlite:" + file.toAbsolutePath());
                // WAL after the busy timeout is in force, not among the driver's opening pragmas
                try (Statement s = c.createStatement()) {
                    s.execute("PRAGMA journal_mode=WAL");
                } catch (SQLException e) {
                    c.close();
                    throw e;
                }
                return c;
            } catch (SQLException e) {
                if (!busy(e) || System.nanoTime() > deadline) {
                    throw new StoreException(StoreException.Kind.UNAVAILABLE, "cannot open " + file + ": "
                            + e.getMessage(), e);
                }
            }
            try {
                Thread.sleep(pauseMs);
            } catch (InterruptedException ie) {
                Thread.currentThread().interrupt();
                throw new StoreException(StoreException.Kind.UNAVAILABLE, "cannot open " + file + ": interrupted", ie);
            }
            pauseMs = Math.min(100, pauseMs * 2);
        }
    }

    /** The pragmas are what crash safety rests on: fail loudly if SQLite did not take them. */
    private void checkPragmas() {
        String mode = read(c -> pragma(c, "journal_mode"));
        if (!"wal".equalsIgnoreCase(mode)) {
            throw new StoreException(file + ": journal mode is " + mode + ", expected wal");
        }
        if (!"2".equals(read(c -> pragma(c, "synchronous")))) {
            throw new StoreException(file + ": synchronous is not FULL");
        }
        if (!"1".equals(read(c -> pragma(c, "foreign_keys")))) {
            throw new StoreException(file + ": foreign keys are off");
        }
    }

    static String pragma(Connection c, String name) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA " + name)) {
            return r.next() ? r.getString(1) : null;
        }
    }

    /**
     * Brings the schema up to {@code target}. A ledger already at this build's schema is only read
     * (a read transaction, which in WAL mode never waits for a writer), so a command that only
     * reads never queues behind an import; the write lock is taken only when a step is missing.
     */
    private void migrate(int target) {
        int stored = read(c -> hasSchemaTable(c) ? versionIn(c) : -1);
        if (stored > Migration.latestVersion()) {
            throw newerSchema(stored);
        }
        if (stored >= Math.min(target, Migration.all().size())) {
            return;
        }
        write(c -> {
            try (Statement s = c.createStatement()) {
                s.executeUpdate("CREATE TABLE IF NOT EXISTS schema_version ("
                        + "version INTEGER PRIMARY KEY, name TEXT NOT NULL, applied_at TEXT NOT NULL) STRICT");
            }
            return null;
        });
        int current = schemaVersion();
        if (current > Migration.latestVersion()) {
            throw newerSchema(current);
        }
        for (Migration m : Migration.all()) {
            if (m.version() <= current || m.version() > target) {
                continue;
            }
            // one transaction per step: a kill mid-step leaves the previous version intact; another
            // program may have applied the step meanwhile, so it is checked again under the lock
            write(c -> {
                if (versionIn(c) >= m.version()) {
                    return null;
                }
                try (Statement s = c.createStatement()) {
                    for (String sql : m.statements()) {
                        s.executeUpdate(sql);
                    }
                }
                try (PreparedStatement p = c.prepareStatement(
                        "INSERT INTO schema_version (version, name, applied_at) VALUES (?, ?, ?)")) {
                    p.setInt(1, m.version());
                    p.setString(2, m.name());
                    p.setString(3, OffsetDateTime.now(ZoneOffset.UTC).toString());
                    p.executeUpdate();
                }
                return null;
            });
        }
    }

    private StoreException newerSchema(int version) {
        return new StoreException(StoreException.Kind.UNAVAILABLE, file + " was written by a newer version of the app"
                + " (schema " + version + "; this build knows up to " + Migration.latestVersion() + "); update the app",
                null);
    }

    private static boolean hasSchemaTable(Connection c) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(
                "SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = 'schema_version'")) {
            return r.next();
        }
    }

    private static int versionIn(Connection c) throws SQLException {
        try (Statement s = c.createStatement();
             ResultSet r = s.executeQuery("SELECT COALESCE(MAX(version), 0) FROM schema_version")) {
            r.next();
            return r.getInt(1);
        }
    }

    /** The highest schema step applied to this file. */
    public int schemaVersion() {
        return read(Database::versionIn);
    }

    /** True when this open created the file. */
    public boolean created() {
        return created;
    }

    public Path file() {
        return file;
    }

    /**
     * Runs {@code work} in one write transaction and commits it; on any failure rolls back and
     * rethrows. Called inside another transaction, it joins that one, so an import of many records
     * commits or fails as a whole.
     */
    public synchronized <T> T write(SqlWork<T> work) {
        return transaction("BEGIN IMMEDIATE", work);
    }

    /** Runs {@code work} in one read transaction: all its queries see the same committed state. */
    public synchronized <T> T read(SqlWork<T> work) {
        return transaction("BEGIN DEFERRED", work);
    }

    private <T> T transaction(String begin, SqlWork<T> work) {
        if (depth > 0) {
            return runNested(work);
        }
        try {
            exec(begin);
        } catch (SQLException e) {
            throw failure("cannot start a transaction on " + file, e);
        }
        depth++;
        boolean done = false;
        try {
            T result = work.run(connection);
            exec("COMMIT");
            done = true;
            return result;
        } catch (SQLException e) {
            throw failure("database " + file, e);
        } finally {
            depth--;
            if (!done) {
                rollbackQuietly();
            }
        }
    }

    private <T> T runNested(SqlWork<T> work) {
        try {
            return work.run(connection);
        } catch (SQLException e) {
            throw failure("database " + file, e);
        }
    }

    /** SQLITE_BUSY and SQLITE_LOCKED (primary result codes 5 and 6): another program holds the lock. */
    private static boolean busy(SQLException e) {
        int primary = e.getErrorCode() & 0xFF;
        return primary == 5 || primary == 6 || String.valueOf(e.getMessage()).contains("database is locked");
    }

    private StoreException failure(String what, SQLException e) {
        if (busy(e)) {
            return new StoreException(StoreException.Kind.BUSY, BUSY_MESSAGE + " (waited "
                    + busyTimeoutMs() / 1000.0 + " s for " + file + ")", e);
        }
        return new StoreException(what + ": " + e.getMessage(), e);
    }

    /** What a tech reads when another program (an import, the app) holds the write lock too long. */
    public static final String BUSY_MESSAGE = "the ledger is busy: another import is running; try again in a moment";

    private void exec(String sql) throws SQLException {
        try (Statement s = connection.createStatement()) {
            s.execute(sql);
        }
    }

    private void rollbackQuietly() {
        try {
            exec("ROLLBACK");
        } catch (SQLException ignored) {
            // no transaction open any more (SQLite rolls back itself on some errors)
        }
    }

    /** {@code PRAGMA integrity_check}: "ok" or the problems SQLite found. */
    public String integrityCheck() {
        return read(c -> {
            StringBuilder b = new StringBuilder();
            try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA integrity_check")) {
                while (r.next()) {
                    b.append(b.length() == 0 ? "" : "\n").append(r.getString(1));
                }
            }
            return b.toString();
        });
    }

    @Override
    public synchronized void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new StoreException("cannot close " + file + ": " + e.getMessage(), e);
        }
    }
}
