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
import java.util.List;

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
            }
        } catch (IOException e) {
            throw new StoreException("cannot create the folder for " + file + ": " + e.getMessage(), e);
        }
        Connection c;
        try {
            SQLiteConfig config = new SQLiteConfig();
            config.setJournalMode(SQLiteConfig.JournalMode.WAL);
            config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
            config.enforceForeignKeys(true);
            config.setBusyTimeout(BUSY_TIMEOUT_MS);
            c = config.createConnection("jdbc:sqlite:" + file.toAbsolutePath());
        } catch (SQLException e) {
            throw new StoreException("cannot open " + file + ": " + e.getMessage(), e);
        }
        Database db = new Database(file, c, created);
        try {
            db.checkPragmas();
            db.migrate(version);
        } catch (RuntimeException e) {
            db.close();
            throw e;
        }
        return db;
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

    private void migrate(int target) {
        write(c -> {
            try (Statement s = c.createStatement()) {
                s.executeUpdate("CREATE TABLE IF NOT EXISTS schema_version ("
                        + "version INTEGER PRIMARY KEY, name TEXT NOT NULL, applied_at TEXT NOT NULL) STRICT");
            }
            return null;
        });
        int current = schemaVersion();
        if (current > Migration.latestVersion()) {
            throw new StoreException(file + " was written by a newer version of the app (schema " + current
                    + "; this build knows up to " + Migration.latestVersion() + "); update the app");
        }
        List<Migration> all = Migration.all();
        for (Migration m : all.stream().filter(x -> x.version() > current && x.version() <= target).toList()) {
            // one transaction per step: a kill mid-step leaves the previous version intact
            write(c -> {
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

    /** The highest schema step applied to this file. */
    public int schemaVersion() {
        return read(c -> {
            try (Statement s = c.createStatement();
                 ResultSet r = s.executeQuery("SELECT COALESCE(MAX(version), 0) FROM schema_version")) {
                r.next();
                return r.getInt(1);
            }
        });
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
            throw new StoreException("cannot start a transaction on " + file + ": " + e.getMessage(), e);
        }
        depth++;
        boolean done = false;
        try {
            T result = work.run(connection);
            exec("COMMIT");
            done = true;
            return result;
        } catch (SQLException e) {
            throw new StoreException("database " + file + ": " + e.getMessage(), e);
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
            throw new StoreException("database " + file + ": " + e.getMessage(), e);
        }
    }

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
