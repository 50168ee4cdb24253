package app.latentledger.store;

import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The one recycle bin of the ledger: every deletion of a site, system, visit, reading set or log
 * goes here, and comes back from here.
 *
 * <p>A deletion moves the record and every row that hangs from it out of the live tables into the
 * bin, in one transaction. What hangs from it is found through the schema's own foreign keys, so a
 * table added later (say, notes on a log) is carried along without a change here. The live tables
 * therefore never point at something missing ({@code PRAGMA foreign_key_check} stays empty), and
 * screens, reports and commands need no "deleted" filter. A restore puts the rows back exactly,
 * then re-reads each record through its repository, so it passes the same checks as entering it,
 * and refuses (changing nothing) when something it points at is no longer in the ledger.
 *
 * <p>Entries stay until restored, until {@link #empty()}, or for {@link #KEEP} ({@link Ledger#open}
 * drops older ones).
 */
public final class RecycleBin {
    /** How long a deletion stays restorable when the bin is not emptied. */
    public static final Duration KEEP = Duration.ofDays(30);

    private static final Map<RecordKind, String> TABLE = Map.of(RecordKind.SITE, "site", RecordKind.SYSTEM,
            "hvac_system", RecordKind.VISIT, "visit", RecordKind.READINGS, "reading_set", RecordKind.LOG, "imported_log");
    /** Tables that are not field records: never walked into. */
    private static final Set<String> NOT_RECORDS = Set.of("schema_version", "recycle_bin", "recycle_bin_row", "setting");
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

    private final Database db;

    RecycleBin(Database db) {
        this.db = db;
    }

    /**
     * Moves a record and all that hangs from it into the bin.
     *
     * @return the bin entry
     * @throws InvalidRecordException when there is no such record
     */
    public BinEntry delete(RecordKind kind, String id) {
        return delete(kind, id, OffsetDateTime.now());
    }

    /** {@link #delete(RecordKind, String)} at a given time (a bundle's deletion keeps its own time). */
    public BinEntry delete(RecordKind kind, String id, OffsetDateTime at) {
        return db.write(c -> {
            deferForeignKeys(c);
            String table = TABLE.get(kind);
            Map<String, Object> top = row(c, table, id).orElseThrow(() ->
                    new InvalidRecordException(kind.key(), "no " + kind.key() + " with id " + id + " in this ledger"));
            BinEntry entry = describe(c, kind, id, at);
            List<Row> rows = new ArrayList<>();
            collect(c, new Schema(c), table, top, rows, new HashSet<>());
            try (PreparedStatement p = c.prepareStatement("INSERT INTO recycle_bin (id, kind, record_id, summary,"
                    + " deleted_at, deleted_epoch_s, site_id, visit_id) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")) {
                p.setString(1, entry.id());
                p.setString(2, kind.key());
                p.setString(3, id);
                p.setString(4, entry.summary());
                p.setString(5, Sql.time(entry.deletedAt()));
                p.setLong(6, entry.deletedAt().toEpochSecond());
                p.setString(7, entry.siteId());
                p.setString(8, entry.visitId());
                p.executeUpdate();
            }
            try (PreparedStatement p = c.prepareStatement(
                    "INSERT INTO recycle_bin_row (entry_id, seq, table_name, row_data) VALUES (?, ?, ?, ?)")) {
                for (int i = 0; i < rows.size(); i++) {
                    p.setString(1, entry.id());
                    p.setInt(2, i);
                    p.setString(3, rows.get(i).table);
                    p.setBytes(4, BinRows.encode(rows.get(i).values));
                    p.executeUpdate();
                }
            }
            // children first; with the keys deferred the order only matters for readability
            for (int i = rows.size() - 1; i >= 0; i--) {
                try (PreparedStatement p = c.prepareStatement(
                        "DELETE FROM " + quote(rows.get(i).table) + " WHERE rowid = ?")) {
                    p.setLong(1, rows.get(i).rowid);
                    p.executeUpdate();
                }
            }
            requireNoDanglingKeys(c, "delete " + kind.key() + " " + id, table);
            return entry;
        });
    }

    /**
     * Puts back the latest deletion of this record.
     *
     * @throws InvalidRecordException when the bin holds no such record, when what it points at is
     *                                not in the ledger any more, when the same id is in the ledger
     *                                again, or when the record no longer passes its checks
     */
    public BinEntry restore(RecordKind kind, String recordId) {
        return db.write(c -> {
            BinEntry entry = latest(c, kind, recordId).orElseThrow(() -> new InvalidRecordException(kind.key(),
                    "no " + kind.key() + " with id " + recordId + " in the recycle bin"));
            deferForeignKeys(c);
            List<String> restored = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT table_name, row_data FROM recycle_bin_row WHERE entry_id = ? ORDER BY seq")) {
                p.setString(1, entry.id());
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        String table = r.getString(1);
                        Map<String, Object> values = BinRows.decode(r.getBytes(2));
                        insert(c, table, values, entry);
                        if (values.get("id") instanceof String rowId) {
                            restored.add(table + "\u0000" + rowId);
                        }
                    }
                }
            }
            String what = kind.key() + " " + recordId;
            requireNoDanglingKeys(c, "restore " + what, TABLE.get(kind));
            for (String key : restored) {
                String[] parts = key.split("\u0000", 2);
                recheck(c, parts[0], parts[1], what);
            }
            try (PreparedStatement p = c.prepareStatement("DELETE FROM recycle_bin WHERE id = ?")) {
                p.setString(1, entry.id());
                p.executeUpdate();
            }
            return entry;
        });
    }

    /** Everything in the bin, newest deletion first. */
    public List<BinEntry> list() {
        return query("SELECT * FROM recycle_bin ORDER BY deleted_epoch_s DESC, id", null);
    }

    /** The deletions of records at a site (not the site itself), newest first: what a site bundle can carry. */
    public List<BinEntry> forSite(String siteId) {
        return query("SELECT * FROM recycle_bin WHERE site_id = ? AND kind <> 'site' ORDER BY deleted_epoch_s DESC, id",
                siteId);
    }

    /** The latest deletion of this record, if the bin holds it. */
    public Optional<BinEntry> find(RecordKind kind, String recordId) {
        return db.read(c -> latest(c, kind, recordId));
    }

    /** How many rows of records the entry holds (the record and all that hung from it). */
    public int rowCount(String entryId) {
        return db.read(c -> {
            try (PreparedStatement p = c.prepareStatement("SELECT COUNT(*) FROM recycle_bin_row WHERE entry_id = ?")) {
                p.setString(1, entryId);
                try (ResultSet r = p.executeQuery()) {
                    r.next();
                    return r.getInt(1);
                }
            }
        });
    }

    /** Deletes everything in the bin for good. @return how many entries went */
    public int empty() {
        return db.write(c -> {
            int n = countEntries(c, "SELECT COUNT(*) FROM recycle_bin", null);
            try (Statement s = c.createStatement()) {
                // the entries' rows go with them (ON DELETE CASCADE)
                s.executeUpdate("DELETE FROM recycle_bin");
            }
            return n;
        });
    }

    /** Deletes for good the entries deleted before {@code cutoff}. @return how many went */
    public int purgeOlderThan(OffsetDateTime cutoff) {
        // every open purges: look first without the write lock, so a read-only command never waits
        // for another program's import when there is nothing to purge
        int expired = db.read(c -> countEntries(c, "SELECT COUNT(*) FROM recycle_bin WHERE deleted_epoch_s < ?",
                cutoff.toEpochSecond()));
        if (expired == 0) {
            return 0;
        }
        return db.write(c -> {
            int n = countEntries(c, "SELECT COUNT(*) FROM recycle_bin WHERE deleted_epoch_s < ?", cutoff.toEpochSecond());
            try (PreparedStatement p = c.prepareStatement("DELETE FROM recycle_bin WHERE deleted_epoch_s < ?")) {
                p.setLong(1, cutoff.toEpochSecond());
                p.executeUpdate();
            }
            return n;
        });
    }

    private static int countEntries(Connection c, String sql, Long parameter) throws SQLException {
        try (PreparedStatement p = c.prepareStatement(sql)) {
            if (parameter != null) {
                p.setLong(1, parameter);
            }
            try (ResultSet r = p.executeQuery()) {
                r.next();
                return r.getInt(1);
            }
        }
    }

    // ---- moving rows -------------------------------------------------------------------------

    private record Row(String table, long rowid, Map<String, Object> values) {
    }

    /** A child table's foreign key onto a parent table. */
    private record ForeignKey(String child, List<String> from, List<String> to) {
    }

    /** The schema's foreign keys, read once per deletion. */
    private static final class Schema {
        private final Map<String, List<ForeignKey>> byParent = new HashMap<>();

        Schema(Connection c) throws SQLException {
            List<String> tables = new ArrayList<>();
            try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(
                    "SELECT name FROM sqlite_schema WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name")) {
                while (r.next()) {
                    if (!NOT_RECORDS.contains(r.getString(1))) {
                        tables.add(r.getString(1));
                    }
                }
            }
            for (String child : tables) {
                Map<Integer, String> parentOf = new LinkedHashMap<>();
                Map<Integer, List<String>> from = new LinkedHashMap<>();
                Map<Integer, List<String>> to = new LinkedHashMap<>();
                try (Statement s = c.createStatement();
                     ResultSet r = s.executeQuery("PRAGMA foreign_key_list(" + quote(child) + ")")) {
                    while (r.next()) {
                        int id = r.getInt("id");
                        parentOf.put(id, r.getString("table"));
                        from.computeIfAbsent(id, k -> new ArrayList<>()).add(r.getString("from"));
                        to.computeIfAbsent(id, k -> new ArrayList<>()).add(r.getString("to"));
                    }
                }
                for (Map.Entry<Integer, String> e : parentOf.entrySet()) {
                    List<String> toColumns = to.get(e.getKey());
                    if (toColumns.contains(null)) {
                        toColumns = primaryKey(c, e.getValue());
                    }
                    byParent.computeIfAbsent(e.getValue(), k -> new ArrayList<>())
                            .add(new ForeignKey(child, from.get(e.getKey()), toColumns));
                }
            }
        }

        List<ForeignKey> children(String parent) {
            return byParent.getOrDefault(parent, List.of());
        }
    }

    private static List<String> primaryKey(Connection c, String table) throws SQLException {
        Map<Integer, String> pk = new java.util.TreeMap<>();
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA table_info(" + quote(table) + ")")) {
            while (r.next()) {
                if (r.getInt("pk") > 0) {
                    pk.put(r.getInt("pk"), r.getString("name"));
                }
            }
        }
        return new ArrayList<>(pk.values());
    }

    /** The row and, depth first, every row that points at it; parents before children. */
    private static void collect(Connection c, Schema schema, String table, Map<String, Object> row, List<Row> out,
                                Set<String> seen) throws SQLException {
        long rowid = (Long) row.remove("ll_rowid");
        if (!seen.add(table + "#" + rowid)) {
            return;
        }
        out.add(new Row(table, rowid, row));
        for (ForeignKey fk : schema.children(table)) {
            StringBuilder where = new StringBuilder();
            for (String col : fk.from()) {
                where.append(where.length() == 0 ? "" : " AND ").append(quote(col)).append(" = ?");
            }
            List<Map<String, Object>> children = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT rowid AS ll_rowid, * FROM " + quote(fk.child()) + " WHERE " + where + " ORDER BY rowid")) {
                for (int i = 0; i < fk.to().size(); i++) {
                    p.setObject(i + 1, row.get(fk.to().get(i)));
                }
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        children.add(values(r));
                    }
                }
            }
            for (Map<String, Object> child : children) {
                collect(c, schema, fk.child(), child, out, seen);
            }
        }
    }

    private static Optional<Map<String, Object>> row(Connection c, String table, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT rowid AS ll_rowid, * FROM " + quote(table) + " WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(values(r)) : Optional.empty();
            }
        }
    }

    private static Map<String, Object> values(ResultSet r) throws SQLException {
        ResultSetMetaData m = r.getMetaData();
        Map<String, Object> v = new LinkedHashMap<>();
        for (int i = 1; i <= m.getColumnCount(); i++) {
            Object o = r.getObject(i);
            v.put(m.getColumnLabel(i), o instanceof Integer n ? Long.valueOf(n) : o);
        }
        return v;
    }

    private static void insert(Connection c, String table, Map<String, Object> values, BinEntry entry)
            throws SQLException {
        StringBuilder cols = new StringBuilder();
        StringBuilder marks = new StringBuilder();
        for (String col : values.keySet()) {
            cols.append(cols.length() == 0 ? "" : ", ").append(quote(col));
            marks.append(marks.length() == 0 ? "?" : ", ?");
        }
        try (PreparedStatement p = c.prepareStatement(
                "INSERT INTO " + quote(table) + " (" + cols + ") VALUES (" + marks + ")")) {
            int i = 1;
            for (Object v : values.values()) {
                p.setObject(i++, v);
            }
            p.executeUpdate();
        } catch (SQLException e) {
            if (e.getMessage() != null && e.getMessage().contains("UNIQUE")) {
                throw new InvalidRecordException(entry.kind().key(), entry.kind().key() + " " + entry.recordId()
                        + " cannot be restored: " + kindOf(table) + " " + values.get("id")
                        + " is in the ledger again (imported or made since the deletion)");
            }
            throw e;
        }
    }

    /**
     * Refuses the transaction while any row points at one that is not there, naming what is
     * missing: the record's own parent when that is it, else the first dangling row found.
     */
    private static void requireNoDanglingKeys(Connection c, String action, String topTable) throws SQLException {
        String child = null;
        String parent = null;
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA foreign_key_check")) {
            while (r.next()) {
                if (child == null || r.getString("table").equals(topTable)) {
                    child = r.getString("table");
                    parent = r.getString("parent");
                }
                if (child.equals(topTable)) {
                    break;
                }
            }
        }
        if (child == null) {
            return;
        }
        String what = action.substring(action.indexOf(' ') + 1);
        String problem = child.equals(topTable)
                ? "it belongs to a " + kindOf(parent) + " that is not in the ledger; restore that " + kindOf(parent) + " first"
                : "its " + kindOf(child) + " refers to a " + kindOf(parent) + " that is not in the ledger; restore that "
                        + kindOf(parent) + " (or what it was part of) first";
        throw new InvalidRecordException(what, "cannot " + action + ": " + problem);
    }

    /** Reads a restored record back through its repository: the same checks as entering it. */
    private static void recheck(Connection c, String table, String id, String what) throws SQLException {
        try {
            switch (table) {
                case "site" -> SiteRepository.find(c, id);
                case "hvac_system" -> SystemRepository.find(c, id);
                case "visit" -> recheckVisit(c, VisitRepository.find(c, id).orElseThrow());
                case "reading_set" -> ReadingSetRepository.find(c, id);
                case "imported_log" -> LogRepository.find(c, id);
                case "instrument" -> InstrumentRepository.find(c, id);
                case "results_snapshot" -> SnapshotRepository.find(c, id);
                default -> {
                    // a table this build does not map: the keys were checked above
                }
            }
        } catch (IllegalArgumentException e) { // InvalidInputException and InvalidRecordException too
            throw new InvalidRecordException(what, "cannot be restored: its " + kindOf(table) + " " + id
                    + " no longer passes the checks (" + e.getMessage() + ")");
        }
    }

    private static void recheckVisit(Connection c, Visit v) throws SQLException {
        HvacSystem system = SystemRepository.find(c, v.systemId()).orElseThrow();
        if (!system.siteId().equals(v.siteId())) {
            throw new InvalidRecordException("visit system", "system " + system.id() + " is now at site "
                    + system.siteId() + ", not at the visit's site " + v.siteId());
        }
    }

    private static void deferForeignKeys(Connection c) throws SQLException {
        // switched off again by SQLite at the end of the transaction
        try (Statement s = c.createStatement()) {
            s.execute("PRAGMA defer_foreign_keys = ON");
        }
    }

    // ---- entries -----------------------------------------------------------------------------

    private static BinEntry describe(Connection c, RecordKind kind, String id, OffsetDateTime at) throws SQLException {
        String entryId = Ids.newId();
        switch (kind) {
            case SITE: {
                Site s = SiteRepository.find(c, id).orElseThrow();
                return new BinEntry(entryId, kind, id, "Site " + s.name() + (s.address().isEmpty() ? "" : ", " + s.address()),
                        at, id, "");
            }
            case SYSTEM: {
                HvacSystem y = SystemRepository.find(c, id).orElseThrow();
                Site s = SiteRepository.find(c, y.siteId()).orElseThrow();
                return new BinEntry(entryId, kind, id, "System " + y.label() + " at " + s.name(), at, s.id(), "");
            }
            case VISIT: {
                Visit v = VisitRepository.find(c, id).orElseThrow();
                return new BinEntry(entryId, kind, id, "Visit " + visitText(c, v), at, v.siteId(), v.id());
            }
            case READINGS: {
                ReadingSet r = ReadingSetRepository.find(c, id).orElseThrow();
                Visit v = VisitRepository.find(c, r.visitId()).orElseThrow();
                String name = r.label().isEmpty() ? "Readings " + r.takenAt().format(WHEN)
                        : "Readings '" + r.label() + "' " + r.takenAt().format(WHEN);
                return new BinEntry(entryId, kind, id, name + " on visit " + visitText(c, v), at, v.siteId(), v.id());
            }
            default: {
                ImportedLog l = LogRepository.find(c, id).orElseThrow();
                Visit v = VisitRepository.find(c, l.visitId()).orElseThrow();
                return new BinEntry(entryId, kind, id, "Log " + l.sourceFileName() + " on visit " + visitText(c, v), at,
                        v.siteId(), v.id());
            }
        }
    }

    private static String visitText(Connection c, Visit v) throws SQLException {
        Site s = SiteRepository.find(c, v.siteId()).orElseThrow();
        HvacSystem y = SystemRepository.find(c, v.systemId()).orElseThrow();
        return v.startedAt().format(WHEN) + " at " + s.name() + ", " + y.label();
    }

    private static Optional<BinEntry> latest(Connection c, RecordKind kind, String recordId) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM recycle_bin WHERE kind = ? AND record_id = ?"
                + " ORDER BY deleted_epoch_s DESC, rowid DESC LIMIT 1")) {
            p.setString(1, kind.key());
            p.setString(2, recordId);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(entry(r)) : Optional.empty();
            }
        }
    }

    private List<BinEntry> query(String sql, String parameter) {
        return db.read(c -> {
            List<BinEntry> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(sql)) {
                if (parameter != null) {
                    p.setString(1, parameter);
                }
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(entry(r));
                    }
                }
            }
            return out;
        });
    }

    private static BinEntry entry(ResultSet r) throws SQLException {
        return new BinEntry(r.getString("id"), RecordKind.parse("bin entry kind", r.getString("kind")),
                r.getString("record_id"), r.getString("summary"), Sql.time(r, "deleted_at"), r.getString("site_id"),
                r.getString("visit_id"));
    }

    private static String kindOf(String table) {
        return switch (table) {
            case "site" -> "site";
            case "hvac_system" -> "system";
            case "visit" -> "visit";
            case "reading_set" -> "reading set";
            case "imported_log" -> "log";
            case "instrument" -> "instrument";
            case "results_snapshot" -> "saved result";
            case "visit_paperwork" -> "visit's paperwork";
            case "reading_set_instrument" -> "instrument choice";
            default -> table.replace('_', ' ');
        };
    }

    private static String quote(String name) {
        return "\"" + name.replace("\"", "\"\"") + "\"";
    }
}
