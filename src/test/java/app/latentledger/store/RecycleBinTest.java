package app.latentledger.store;

import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.VisitPaperwork;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The one recycle bin: a delete takes the record and all that hangs from it out of the live
 * tables, a restore puts back exactly what was there, and at every step SQLite's own
 * {@code PRAGMA integrity_check} says "ok" and {@code PRAGMA foreign_key_check} finds nothing.
 */
class RecycleBinTest {
    @TempDir
    Path dir;
    Ledger ledger;

    @BeforeEach
    void open() {
        ledger = new Ledger(Database.open(dir.resolve("bin.db")));
        ledger.sites().save(TestRecords.site("s1"));
        ledger.systems().save(TestRecords.system("y1", "s1"));
        ledger.systems().save(TestRecords.system("y2", "s1"));
        ledger.visits().save(TestRecords.visit("v1", "s1", "y1"));
        ledger.visits().save(TestRecords.visit("v2", "s1", "y2"));
        ledger.readings().save(TestRecords.fullReadingSet("r1", "v1", 1));
        ledger.readings().save(TestRecords.minimalReadingSet("r2", "v1"));
        ledger.readings().save(TestRecords.fullReadingSet("r3", "v2", 2));
        ledger.logs().save(TestRecords.log("l1", "v1", 20_000)); // three sample chunks
        ledger.snapshots().save(new ResultsSnapshot("n1", SnapshotSubject.READING_SET, "r1", "0.1.0",
                TestRecords.T0, "{\"verdict\":\"dehumidifying\"}"));
        ledger.snapshots().save(new ResultsSnapshot("n2", SnapshotSubject.LOG, "l1", "0.1.0", TestRecords.T0, "{}"));
        ledger.instruments().save(new Instrument("i1", "v1", "Probe kit A", "SR-1001", LocalDate.of(2024, 1, 15),
                new StatedAccuracy(0.3, 2.0, null, null, 0.5, null)));
        ledger.instruments().save(new Instrument("i2", "v1", "Flow hood", "", null, StatedAccuracy.NONE));
        ledger.instruments().useOn("r1", List.of("i1", "i2"));
        ledger.paperwork().save(new VisitPaperwork("v1", "Sticky upstairs at night", "Set blower to 350 cfm/ton",
                new SignOff("Test Tech", TestRecords.T0, "licence 0000"), null));
    }

    @AfterEach
    void close() {
        ledger.close();
    }

    @ParameterizedTest(name = "delete and restore a {0}")
    @EnumSource(RecordKind.class)
    void aRoundTripPutsBackExactlyWhatWasThere(RecordKind kind) {
        String id = switch (kind) {
            case SITE -> "s1";
            case SYSTEM -> "y1";
            case VISIT -> "v1";
            case READINGS -> "r1";
            case LOG -> "l1";
        };
        Map<String, List<String>> before = dump();
        BinEntry entry = ledger.recycleBin().delete(kind, id);
        assertHealthy();
        Map<String, List<String>> deleted = dump();
        assertNotEquals(before, deleted);
        assertTrue(ledger.recycleBin().rowCount(entry.id()) > 0);
        assertEquals(List.of(entry), ledger.recycleBin().list());

        ledger.recycleBin().restore(kind, id);
        assertHealthy();
        assertEquals(before, dump(), "every row of every table back, byte for byte");
        assertTrue(ledger.recycleBin().list().isEmpty(), "a restored entry leaves the bin");
    }

    @Test
    void aVisitTakesItsReadingsLogsInstrumentsAndPaperworkWithIt() {
        ledger.recycleBin().delete(RecordKind.VISIT, "v1");
        assertTrue(ledger.visits().find("v1").isEmpty());
        assertTrue(ledger.readings().forVisit("v1").isEmpty());
        assertTrue(ledger.logs().idsForVisit("v1").isEmpty());
        assertTrue(ledger.instruments().forVisit("v1").isEmpty());
        assertTrue(ledger.paperwork().find("v1").isEmpty());
        assertTrue(ledger.snapshots().find("n1").isEmpty());
        assertEquals(0, count("log_chunk"));
        // the other visit at the site is untouched
        assertEquals(1, ledger.readings().forVisit("v2").size());
        BinEntry e = ledger.recycleBin().list().get(0);
        assertEquals("s1", e.siteId());
        assertEquals("v1", e.visitId());
        assertTrue(e.summary().startsWith("Visit 2024-06-03 08:15 at Test site s1"), e.summary());
    }

    @Test
    void aSetCannotComeBackWithoutItsVisit() {
        ledger.recycleBin().delete(RecordKind.READINGS, "r2");
        ledger.recycleBin().delete(RecordKind.VISIT, "v1");
        Map<String, List<String>> state = dump();
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> ledger.recycleBin().restore(RecordKind.READINGS, "r2"));
        assertTrue(e.getMessage().contains("restore that visit first"), e.getMessage());
        assertEquals(state, dump(), "a refused restore changes nothing");
        assertEquals(2, ledger.recycleBin().list().size());
        assertHealthy();
        // in the right order both come back
        ledger.recycleBin().restore(RecordKind.VISIT, "v1");
        ledger.recycleBin().restore(RecordKind.READINGS, "r2");
        assertEquals(2, ledger.readings().forVisit("v1").size());
        assertHealthy();
    }

    @Test
    void aRecordMadeAgainMeanwhileIsNotOverwritten() {
        ledger.recycleBin().delete(RecordKind.READINGS, "r2");
        ledger.readings().save(TestRecords.minimalReadingSet("r2", "v2"));
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> ledger.recycleBin().restore(RecordKind.READINGS, "r2"));
        assertTrue(e.getMessage().contains("in the ledger again"), e.getMessage());
        assertEquals("v2", ledger.readings().find("r2").orElseThrow().visitId());
    }

    @Test
    void aRestoreReChecksTheRecord() throws Exception {
        BinEntry entry = ledger.recycleBin().delete(RecordKind.SITE, "s1");
        // the bin row altered behind the app's back: an elevation no site can have
        ledger.database().write(c -> {
            byte[] data;
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT row_data FROM recycle_bin_row WHERE entry_id = ? AND table_name = 'site'")) {
                p.setString(1, entry.id());
                try (ResultSet r = p.executeQuery()) {
                    r.next();
                    data = r.getBytes(1);
                }
            }
            Map<String, Object> row = BinRows.decode(data);
            row.put("elevation_m", 99_999.0);
            try (PreparedStatement p = c.prepareStatement(
                    "UPDATE recycle_bin_row SET row_data = ? WHERE entry_id = ? AND table_name = 'site'")) {
                p.setBytes(1, BinRows.encode(row));
                p.setString(2, entry.id());
                return p.executeUpdate();
            }
        });
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> ledger.recycleBin().restore(RecordKind.SITE, "s1"));
        assertTrue(e.getMessage().contains("no longer passes the checks"), e.getMessage());
        assertTrue(ledger.sites().find("s1").isEmpty());
        assertEquals(1, ledger.recycleBin().list().size());
    }

    @Test
    void aTableAddedLaterIsCarriedThroughItsForeignKey() throws Exception {
        // a later schema step adds notes on a log; the bin needs no change to carry them
        ledger.database().write(c -> {
            try (Statement s = c.createStatement()) {
                s.executeUpdate("CREATE TABLE log_note (id TEXT PRIMARY KEY, log_id TEXT NOT NULL"
                        + " REFERENCES imported_log (id), text TEXT NOT NULL) STRICT");
                return s.executeUpdate("INSERT INTO log_note VALUES ('ln1', 'l1', 'logger fell off the plenum')");
            }
        });
        Map<String, List<String>> before = dump();
        ledger.recycleBin().delete(RecordKind.VISIT, "v1");
        assertEquals(0, count("log_note"));
        assertHealthy();
        ledger.recycleBin().restore(RecordKind.VISIT, "v1");
        assertEquals(before, dump());
    }

    @Test
    void unknownRecordsAreRefusedByName() {
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> ledger.recycleBin().delete(RecordKind.LOG, "nope"));
        assertTrue(e.getMessage().contains("no log with id nope"), e.getMessage());
        e = assertThrows(InvalidRecordException.class, () -> ledger.recycleBin().restore(RecordKind.SITE, "s1"));
        assertTrue(e.getMessage().contains("no site with id s1 in the recycle bin"), e.getMessage());
    }

    @Test
    void emptyingAndAgeingDeleteForGood() {
        ledger.recycleBin().delete(RecordKind.READINGS, "r2", TestRecords.T0.minusDays(40));
        ledger.recycleBin().delete(RecordKind.LOG, "l1", TestRecords.T0.minusDays(10));
        assertEquals(1, ledger.recycleBin().purgeOlderThan(TestRecords.T0.minus(RecycleBin.KEEP)));
        assertEquals(List.of("l1"), ledger.recycleBin().list().stream().map(BinEntry::recordId).toList());
        assertEquals(1, ledger.recycleBin().empty());
        assertEquals(0, count("recycle_bin_row"), "the rows go with their entry");
        assertTrue(ledger.recycleBin().list().isEmpty());
        assertHealthy();
    }

    @Test
    void openingTheLedgerDropsEntriesOlderThanThirtyDays() {
        Path data = dir.resolve("data");
        try (Ledger demo = Ledger.open(data, Ledger.FirstRun.SEED_DEMO)) {
            var sets = demo.readings().count();
            assertTrue(sets >= 2, "the demo has reading sets");
            var visit = demo.visits().all().get(0);
            var readings = demo.readings().forVisit(visit.id());
            demo.recycleBin().delete(RecordKind.READINGS, readings.get(0).id(),
                    java.time.OffsetDateTime.now().minusDays(31));
            demo.recycleBin().delete(RecordKind.VISIT, visit.id(), java.time.OffsetDateTime.now().minusDays(29));
            assertEquals(2, demo.recycleBin().list().size());
        }
        try (Ledger reopened = Ledger.open(data)) {
            assertEquals(List.of(RecordKind.VISIT),
                    reopened.recycleBin().list().stream().map(BinEntry::kind).toList(),
                    "the 31-day-old deletion is gone for good, the 29-day-old one stays");
        }
    }

    @Test
    void aSystemWithVisitsCannotMoveToAnotherSite() {
        ledger.sites().save(TestRecords.site("s2"));
        var moved = new app.latentledger.core.records.HvacSystem("y1", "s2", "Test system",
                app.latentledger.core.records.SystemType.TWO_STAGE, 7033.7, "R-410A", "ECM", "auto", "");
        assertThrows(InvalidRecordException.class, () -> ledger.systems().save(moved));
        assertHealthy();
    }

    private void assertHealthy() {
        assertEquals("ok", ledger.database().integrityCheck());
        List<String> dangling = ledger.database().read(c -> {
            List<String> out = new ArrayList<>();
            try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA foreign_key_check")) {
                while (r.next()) {
                    out.add(r.getString(1) + " row " + r.getLong(2) + " -> " + r.getString(3));
                }
            }
            return out;
        });
        assertEquals(List.of(), dangling, "PRAGMA foreign_key_check");
    }

    private int count(String table) {
        return ledger.database().read(c -> {
            try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT COUNT(*) FROM " + table)) {
                r.next();
                return r.getInt(1);
            }
        });
    }

    /** Every row of every record table as text, sorted (rowids are not part of a record). */
    private Map<String, List<String>> dump() {
        return ledger.database().read(c -> {
            Map<String, List<String>> out = new TreeMap<>();
            List<String> tables = new ArrayList<>();
            try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(
                    "SELECT name FROM sqlite_schema WHERE type = 'table' AND name NOT LIKE 'sqlite_%'"
                            + " AND name NOT IN ('recycle_bin', 'recycle_bin_row', 'schema_version')")) {
                while (r.next()) {
                    tables.add(r.getString(1));
                }
            }
            for (String t : tables) {
                List<String> rows = new ArrayList<>();
                try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT * FROM " + t)) {
                    ResultSetMetaData m = r.getMetaData();
                    while (r.next()) {
                        StringBuilder b = new StringBuilder();
                        for (int i = 1; i <= m.getColumnCount(); i++) {
                            Object v = r.getObject(i);
                            b.append(m.getColumnName(i)).append('=')
                                    .append(v instanceof byte[] bytes ? HexFormat.of().formatHex(bytes) : v).append('|');
                        }
                        rows.add(b.toString());
                    }
                }
                rows.sort(null);
                out.put(t, rows);
            }
            return out;
        });
    }

    @Test
    void dumpSeesEveryRow() {
        // the round-trip comparison is only as good as its dump: it must see a one-row change
        Map<String, List<String>> before = dump();
        ledger.instruments().useOn("r1", List.of("i1"));
        assertFalse(before.equals(dump()));
    }
}
