package app.latentledger.store;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.settings.Settings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.io.InputStream;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A database made by every earlier schema version opens with this build, keeps its data and ends
 * at the latest version. Rows are written with the SQL each old version had, not with today's
 * repositories, as an old app would have written them.
 */
class MigrationsTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "database made at schema version {0}")
    @ValueSource(ints = {1, 2, 3, 4})
    void opensADatabaseMadeByAnEarlierVersion(int version) throws Exception {
        assertTrue(version < Migration.latestVersion(), "list every earlier version here");
        Path file = dir.resolve("v" + version + ".db");
        try (Database old = Database.open(file, version)) {
            assertEquals(version, old.schemaVersion());
            old.write(c -> {
                writeVersion1Rows(c);
                if (version >= 2) {
                    writeVersion2Rows(c);
                }
                if (version >= 3) {
                    writeVersion3Rows(c);
                }
                return null;
            });
        }
        try (Ledger ledger = new Ledger(Database.open(file))) {
            assertEquals(Migration.latestVersion(), ledger.database().schemaVersion());
            assertEquals("ok", ledger.database().integrityCheck());
            assertEquals("Old site", ledger.sites().find("s").orElseThrow().name());
            // V11: a site from before it has no time zone (its logs are read in the tablet's)
            assertEquals("", ledger.sites().find("s").orElseThrow().timeZone());
            ledger.sites().save(ledger.sites().find("s").orElseThrow().withTimeZone("America/Chicago"));
            assertEquals("America/Chicago", ledger.sites().find("s").orElseThrow().timeZone());
            assertEquals(3 * 3516.85, ledger.systems().find("y").orElseThrow().nominalCapacityW());
            assertEquals("complaint", ledger.visits().find("v").orElseThrow().purpose().key());
            ReadingSet r = ledger.readings().find("r").orElseThrow();
            assertEquals(version >= 3 ? "before" : "", r.label(), "label added in V3 defaults to empty");
            assertEquals(24.4, r.returnDryBulb().valueSi());
            assertEquals(0.6655, r.airflow().volume().valueSi());
            assertEquals(AirflowBasis.ACTUAL, r.airflow().basis(), "sets stored before V5 were worked out as actual cfm");
            assertEquals(ProbeMatch.INDEPENDENT, r.probes(), "and with independent probes");
            if (version >= 2) {
                ImportedLog log = ledger.logs().find("l").orElseThrow();
                assertEquals(3, log.samples().size());
                assertEquals(25.5, log.samples().channels().get(0).value(2));
            }
            if (version >= 3) {
                assertEquals(1, ledger.snapshots().forSubject(SnapshotSubject.READING_SET, "r").size());
            }
            assertEquals(Settings.DEFAULTS, ledger.settings().load(), "no settings before V4: the defaults");
            // and the current code can write to it
            ledger.readings().save(TestRecords.fullReadingSet("r-new", "v", 1));
            assertEquals(2, ledger.readings().count());
            Settings changed = Settings.DEFAULTS.withChoice("units", "si");
            ledger.settings().save(changed);
            assertEquals(changed, ledger.settings().load());
            assertEquals(appliedSteps(ledger.database()), Migration.all().stream().map(Migration::version).toList());
            // V7: systems from before it have no metering device or filter; the paperwork tables work
            assertEquals("", ledger.systems().find("y").orElseThrow().meteringDevice());
            ledger.paperwork().save(app.latentledger.core.records.VisitPaperwork.blank("v").withNotes("words", "done"));
            assertEquals("done", ledger.paperwork().forVisit("v").workDone());
            ledger.recycleBin().delete(app.latentledger.core.records.RecordKind.VISIT, "v");
            ledger.recycleBin().restore(app.latentledger.core.records.RecordKind.VISIT, "v");
            assertEquals("ok", ledger.database().integrityCheck());
            if (version >= 2) {
                assertEquals(null, ledger.logs().find("l").orElseThrow().kept(), "a log kept before V6 has no stored conditions");
            }
        }
    }

    @Test
    void aDatabaseFromANewerAppIsRefusedUntouched() throws Exception {
        Path file = dir.resolve("newer.db");
        try (Database db = Database.open(file)) {
            db.write(c -> {
                try (PreparedStatement p = c.prepareStatement(
                        "INSERT INTO schema_version (version, name, applied_at) VALUES (99, 'V99__future.sql', 'x')")) {
                    return p.executeUpdate();
                }
            });
        }
        StoreException e = assertThrows(StoreException.class, () -> Database.open(file));
        assertTrue(e.getMessage().contains("newer version of the app"), e.getMessage());
    }

    @Test
    void releasedMigrationsAreNeverEdited() throws Exception {
        // a released step must stay byte-for-byte what older databases were migrated with;
        // change the schema with a new V<n> file instead (SHA-256 taken when each step was released)
        Map<String, String> released = Map.of(
                "V1__sites_systems_visits_readings.sql", "00151f48aced556301847e1d4762c55fb5ac52b1b73e719d3a10623eeb57d518",
                "V2__imported_logs.sql", "b83fdf6d6fc0db62404a6563f87aed961f82e97128605ea6d566277fce83894c",
                "V3__results_snapshots_and_labels.sql", "22ac719e9e4eac5cc2007254d923acba9f96424c710d782779efe17e1cd33e68",
                "V4__settings.sql", "bb110aba1a9644e2a20a56beda68be0079e63521b3164734bcf3e049cb8142d5",
                "V5__airflow_basis_and_probes.sql", "4260386c78970defa1e3922918850cdec89999f0a42426b7280088ef47d8c257",
                "V6__log_conditions.sql", "1696abc12866c2c22da55c21732391e8bcaa5e62f4b6ccafa998893a8ba11194",
                "V7__paperwork_and_recycle_bin.sql", "315109d0f711683fafeafb5c713728291c54a68b24972d8bbf7307d4102f5c4e",
                "V9__house_facts.sql", "b265b23ce40679f4a3c3c62f270a85fb5f3c2fb6ae6b152ca5691c521b204874",
                "V10__office_sync.sql", "e00cf6afc6973b57b4909a1df69b91e34a83bf13135a98fc0e5afdf1554826bf",
                "V11__site_time_zone.sql", "a45bd5f2d6c406d64c4ea77a420eb14ddd0caa1adc48faacee4fccade5931da9");

        for (Map.Entry<String, String> e : released.entrySet()) {
            try (InputStream in = Migration.class.getResourceAsStream("migrations/" + e.getKey())) {
                assertEquals(e.getValue(), java.util.HexFormat.of().formatHex(
                        java.security.MessageDigest.getInstance("SHA-256").digest(in.readAllBytes())), e.getKey());
            }
        }
        assertTrue(Migration.FILES.containsAll(released.keySet()), "a released step is never dropped");
    }

    @Test
    void statementsSplitAtLineEndSemicolonsAndCommentsAreDropped() {
        assertEquals(List.of("CREATE TABLE a (x TEXT);", "CREATE TABLE b (\ny TEXT\n);"),
                Migration.split("-- intro\nCREATE TABLE a (x TEXT); -- trailing\n\nCREATE TABLE b (\n  y TEXT -- why\n);\n")
                        .stream().map(s -> s.replaceAll("\n\\s+", "\n")).toList());
        assertThrows(IllegalStateException.class, () -> Migration.split("CREATE TABLE a (x TEXT)"));
    }

    private static List<Integer> appliedSteps(Database db) {
        return db.read(c -> {
            List<Integer> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement("SELECT version FROM schema_version ORDER BY version");
                 ResultSet r = p.executeQuery()) {
                while (r.next()) {
                    out.add(r.getInt(1));
                }
            }
            return out;
        });
    }

    /** The rows as version 1 of the app wrote them (its reading_set had no label column). */
    private static void writeVersion1Rows(Connection c) throws SQLException {
        exec(c, "INSERT INTO site (id, name, address, elevation_m, notes) VALUES ('s', 'Old site', '3 Old Road, Saltreed', 8, '')");
        exec(c, "INSERT INTO hvac_system (id, site_id, label, type, nominal_capacity_w) VALUES ('y', 's', 'Old system',"
                + " 'single-stage', " + (3 * 3516.85) + ")");
        exec(c, "INSERT INTO visit (id, site_id, system_id, started_at, started_epoch_s, technician, purpose)"
                + " VALUES ('v', 's', 'y', '2023-07-01T09:00:00-04:00', 1688216400, 'Old Tech', 'complaint')");
        exec(c, "INSERT INTO reading_set (id, visit_id, taken_at, taken_epoch_s, return_db_c, return_db_tol_k,"
                + " return_hum_kind, return_hum_value, return_hum_tol, supply_db_c, supply_db_tol_k, supply_hum_kind,"
                + " supply_hum_value, supply_hum_tol, airflow_m3_per_s, airflow_tol_m3_per_s, airflow_point)"
                + " VALUES ('r', 'v', '2023-07-01T09:30:00-04:00', 1688218200, 24.4, 0.28, 'wet-bulb', 18.9, 0.28,"
                + " 18.3, 0.28, 'rh', 86, 2, 0.6655, 0.047, 'entering')");
    }

    /** Version 2 added logs with chunked samples. */
    private static void writeVersion2Rows(Connection c) throws SQLException {
        exec(c, "INSERT INTO imported_log (id, visit_id, source_file_name, imported_at, imported_epoch_s, time_base,"
                + " sample_count) VALUES ('l', 'v', 'old.csv', '2023-07-02T09:00:00-04:00', 1688302800, 'elapsed', 3)");
        exec(c, "INSERT INTO log_channel (log_id, position, name, unit) VALUES ('l', 0, 'return_db', '°C')");
        try (PreparedStatement p = c.prepareStatement("INSERT INTO log_chunk (log_id, chunk_no, first_sample,"
                + " sample_count, times, samples) VALUES ('l', 0, 0, 3, ?, ?)")) {
            p.setBytes(1, SampleChunks.times(new long[] {0, 1000, 2000}, 0, 3));
            p.setBytes(2, SampleChunks.values(new double[][] {{25.1, 25.3, 25.5}}, 0, 3));
            p.executeUpdate();
        }
    }

    /** Version 3 added reading-set labels and results snapshots. */
    private static void writeVersion3Rows(Connection c) throws SQLException {
        exec(c, "UPDATE reading_set SET label = 'before' WHERE id = 'r'");
        exec(c, "INSERT INTO results_snapshot (id, reading_set_id, log_id, app_version, computed_at, json)"
                + " VALUES ('snap', 'r', NULL, '0.1.0', '2023-07-01T09:31:00-04:00', '{}')");
    }

    private static void exec(Connection c, String sql) throws SQLException {
        try (PreparedStatement p = c.prepareStatement(sql)) {
            p.executeUpdate();
        }
    }
}
