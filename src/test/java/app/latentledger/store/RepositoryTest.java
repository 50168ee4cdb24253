package app.latentledger.store;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.Visit;
import org.junit.jupiter.api.Test;

import java.sql.PreparedStatement;
import java.util.List;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RepositoryTest extends OneVisitLedger {
    @Test
    void durabilitySettingsAreInForce() throws Exception {
        // the settings docs/methods.md §4 relies on, read back from SQLite itself
        assertEquals("wal", ledger.database().read(c -> Database.pragma(c, "journal_mode")));
        assertEquals("2", ledger.database().read(c -> Database.pragma(c, "synchronous")), "2 = FULL");
        assertEquals("1", ledger.database().read(c -> Database.pragma(c, "foreign_keys")));
        assertEquals(String.valueOf(Database.BUSY_TIMEOUT_MS), ledger.database().read(c -> Database.pragma(c, "busy_timeout")));
    }

    @Test
    void everyRecordReadsBackEqual() {
        ReadingSet full = TestRecords.fullReadingSet("r1", "v1", 3);
        ReadingSet minimal = TestRecords.minimalReadingSet("r2", "v1");
        ledger.readings().save(full);
        ledger.readings().save(minimal);
        assertEquals(Optional.of(TestRecords.site("s1")), ledger.sites().find("s1"));
        assertEquals(List.of(TestRecords.system("y1", "s1")), ledger.systems().forSite("s1"));
        assertEquals(Optional.of(TestRecords.visit("v1", "s1", "y1")), ledger.visits().find("v1"));
        assertEquals(Optional.of(full), ledger.readings().find("r1"));
        assertEquals(Optional.of(minimal), ledger.readings().find("r2"));
        assertEquals(List.of(minimal, full), ledger.readings().forVisit("v1"), "ordered by taken-at");
        ResultsSnapshot snap = new ResultsSnapshot("n1", SnapshotSubject.READING_SET, "r1", "0.1.0",
                TestRecords.T0, "{\"verdict\": \"dehumidifying\"}");
        ledger.snapshots().save(snap);
        ledger.snapshots().save(snap); // the same again is fine
        assertEquals(List.of(snap), ledger.snapshots().forSubject(SnapshotSubject.READING_SET, "r1"));
    }

    @Test
    void savingAgainUpdates() {
        Site changed = new Site("s1", "Renamed", "2 Other Way, Saltreed", 20, "note");
        ledger.sites().save(changed);
        assertEquals(Optional.of(changed), ledger.sites().find("s1"));
    }

    @Test
    void aSitesTimeZoneReadsBackAndCanBeTakenOff() {
        Site zoned = new Site("s1", "Renamed", "2 Other Way, Saltreed", 20, "note", "America/Denver");
        ledger.sites().save(zoned);
        assertEquals(Optional.of(zoned), ledger.sites().find("s1"));
        assertEquals("America/Denver", ledger.sites().all().get(0).zone().orElseThrow().getId());
        ledger.sites().save(zoned.withTimeZone(""));
        assertEquals("", ledger.sites().find("s1").orElseThrow().timeZone());
        assertTrue(ledger.sites().find("s1").orElseThrow().zone().isEmpty());
        // kept as NULL, as every site from before V11
        assertEquals(Boolean.TRUE, ledger.database().read(c -> {
            try (PreparedStatement p = c.prepareStatement("SELECT time_zone IS NULL FROM site WHERE id = 's1'");
                 java.sql.ResultSet r = p.executeQuery()) {
                return r.next() && r.getBoolean(1);
            }
        }));
    }

    @Test
    void missingSiteIsRefusedNamingTheField() {
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> ledger.systems().save(TestRecords.system("y2", "nowhere")));
        assertEquals("system site", e.field());
        assertTrue(e.getMessage().contains("no site with id nowhere"), e.getMessage());
        assertEquals("visit site", assertThrows(InvalidRecordException.class,
                () -> ledger.visits().save(TestRecords.visit("v2", "nowhere", "y1"))).field());
        assertEquals("reading set visit", assertThrows(InvalidRecordException.class,
                () -> ledger.readings().save(TestRecords.minimalReadingSet("r9", "nowhere"))).field());
    }

    @Test
    void visitOnASystemOfAnotherSiteIsRefused() {
        ledger.sites().save(TestRecords.site("s2"));
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> ledger.visits().save(TestRecords.visit("v2", "s2", "y1")));
        assertEquals("visit system", e.field());
    }

    @Test
    void snapshotsAreNeverOverwritten() {
        ledger.readings().save(TestRecords.minimalReadingSet("r1", "v1"));
        ledger.snapshots().save(new ResultsSnapshot("n1", SnapshotSubject.READING_SET, "r1", "0.1.0", TestRecords.T0, "{}"));
        assertEquals("snapshot id", assertThrows(InvalidRecordException.class, () -> ledger.snapshots().save(
                new ResultsSnapshot("n1", SnapshotSubject.READING_SET, "r1", "0.2.0", TestRecords.T0, "{}"))).field());
        assertEquals("snapshot log", assertThrows(InvalidRecordException.class, () -> ledger.snapshots().save(
                new ResultsSnapshot("n2", SnapshotSubject.LOG, "no-log", "0.2.0", TestRecords.T0, "{}"))).field());
    }

    @Test
    void aFailedTransactionLeavesNothing() {
        assertThrows(IllegalStateException.class, () -> ledger.inTransaction(() -> {
            ledger.sites().save(TestRecords.site("s3"));
            ledger.readings().save(TestRecords.minimalReadingSet("r5", "v1"));
            throw new IllegalStateException("tablet battery gone");
        }));
        assertTrue(ledger.sites().find("s3").isEmpty());
        assertTrue(ledger.readings().find("r5").isEmpty());
        // the ledger is usable afterwards
        ledger.readings().save(TestRecords.minimalReadingSet("r6", "v1"));
        assertEquals(1, ledger.readings().count());
    }

    @Test
    void theSchemaRefusesWhatTheRecordsWouldRefuse() {
        // a second line of defence for rows written by anything but this code: CHECK constraints
        StoreException e = assertThrows(StoreException.class, () -> ledger.database().write(c -> {
            try (PreparedStatement p = c.prepareStatement("UPDATE visit SET purpose = 'inspection' WHERE id = 'v1'")) {
                return p.executeUpdate();
            }
        }));
        assertTrue(e.getMessage().contains("CHECK constraint failed"), e.getMessage());
        assertThrows(StoreException.class, () -> ledger.database().write(c -> {
            try (PreparedStatement p = c.prepareStatement("UPDATE hvac_system SET nominal_capacity_w = -1")) {
                return p.executeUpdate();
            }
        }));
        assertThrows(StoreException.class, () -> ledger.database().write(c -> {
            try (PreparedStatement p = c.prepareStatement("UPDATE visit SET site_id = 'nowhere'")) {
                return p.executeUpdate();
            }
        }), "foreign keys are enforced");
        assertEquals(SystemType.TWO_STAGE, ledger.systems().find("y1").map(HvacSystem::type).orElseThrow());
        assertEquals(Optional.of(TestRecords.visit("v1", "s1", "y1")), ledger.visits().find("v1"));
    }

    @Test
    void visitsFoundByIdPrefix() {
        ledger.visits().save(new Visit("v1-later", "s1", "y1", TestRecords.T0.plusDays(1), "Tech",
                app.latentledger.core.records.VisitPurpose.AFTER, ""));
        assertEquals(2, ledger.visits().withIdPrefix("v1").size());
        assertEquals(List.of("v1-later", "v1"), ledger.visits().all().stream().map(Visit::id).toList(), "newest first");
        assertEquals(0, ledger.visits().withIdPrefix("%").size(), "no LIKE wildcards");
    }
}
