package app.latentledger.bundle;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.SnapshotSubject;
import app.latentledger.core.records.Visit;
import app.latentledger.store.Database;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestRecords;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.Statement;
import java.util.Arrays;
import java.util.Enumeration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Consumer;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class BundleTest {
    private static final List<String> TABLES = List.of("site", "hvac_system", "visit", "reading_set", "imported_log",
            "log_channel", "log_chunk", "results_snapshot");

    @TempDir
    Path dir;
    Ledger source;
    Ledger target;

    @BeforeEach
    void setUp() {
        source = Ledger.open(dir.resolve("source"), Ledger.FirstRun.SEED_DEMO);
        // a log and a snapshot on the demo's complaint visit, so every entry kind is exported
        source.logs().save(TestRecords.log("log-1", DemoScenario.VISIT_COMPLAINT, 20_000));
        source.snapshots().save(new ResultsSnapshot("snap-1", SnapshotSubject.READING_SET, DemoScenario.READINGS_AFTER,
                "0.1.0", TestRecords.T0, "{\n  \"verdict\": \"dehumidifying\",\n  \"shr\": 0.71\n}"));
        source.snapshots().save(new ResultsSnapshot("snap-2", SnapshotSubject.LOG, "log-1", "0.1.0", TestRecords.T0,
                "{\"cycles\": 14}"));
        target = new Ledger(Database.open(dir.resolve("target.db"))); // fresh, no demo
    }

    @AfterEach
    void tearDown() {
        source.close();
        target.close();
    }

    @Test
    void aVisitRoundTripsIntoAFreshLedger() throws Exception {
        Path file = dir.resolve("visit.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, file);
        Bundles.ImportSummary s = Bundles.importBundle(target, file);
        // site, system, visit, 2 reading sets, 1 log, 2 snapshots, the house's facts, the visit's house readings
        assertEquals(10, s.added());
        assertEquals(List.of(DemoScenario.VISIT_COMPLAINT), s.visitIds());
        assertEquals(Bundles.ofVisit(source, DemoScenario.VISIT_COMPLAINT), Bundles.ofVisit(target, DemoScenario.VISIT_COMPLAINT));
        ImportedLog log = target.logs().find("log-1").orElseThrow();
        assertTrue(Double.isNaN(log.samples().channels().get(0).value(3)), "missing sample still missing");
        assertEquals(source.snapshots().find("snap-1"), target.snapshots().find("snap-1"), "snapshot text byte-identical");
        assertEquals("ok", target.database().integrityCheck());
    }

    @Test
    void aSiteRoundTripsAndReimportingChangesNothing() throws Exception {
        Path file = dir.resolve("site.zip");
        Bundles.exportSite(source, DemoScenario.SITE_HERON, file);
        Bundles.importBundle(target, file);
        assertEquals(Bundles.ofSite(source, DemoScenario.SITE_HERON), Bundles.ofSite(target, DemoScenario.SITE_HERON));
        String before = dump(target);
        Bundles.ImportSummary again = Bundles.importBundle(target, file);
        assertEquals(0, again.added());
        assertEquals(10, again.alreadyPresent(), "8 records, the house's facts and the complaint visit's house readings");
        assertEquals(before, dump(target));
    }

    @Test
    void importIntoALedgerThatAlreadyHasOtherRecords() throws Exception {
        Path file = dir.resolve("quay.zip");
        Bundles.exportSite(source, DemoScenario.SITE_QUAY, file);
        target.sites().save(TestRecords.site("mine"));
        Bundles.importBundle(target, file);
        assertEquals(2, target.sites().all().size());
        assertEquals(Bundles.ofSite(source, DemoScenario.SITE_QUAY), Bundles.ofSite(target, DemoScenario.SITE_QUAY));
    }

    @Test
    void truncatedBundlesAreRefusedAndChangeNothing() throws Exception {
        Path file = dir.resolve("visit.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, file);
        byte[] whole = Files.readAllBytes(file);
        String before = dump(target);
        Random random = new Random(7);
        for (int i = 0; i < 20; i++) {
            int length = i == 0 ? 0 : i == 1 ? whole.length - 1 : random.nextInt(whole.length);
            Path cut = dir.resolve("cut-" + i + ".zip");
            Files.write(cut, Arrays.copyOf(whole, length));
            BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, cut),
                    "cut at " + length);
            assertTrue(e.getMessage().contains("nothing was imported"), e.getMessage());
        }
        assertEquals(before, dump(target));
    }

    @Test
    void aMissingEntryIsRefusedAsIncomplete() throws Exception {
        Path file = rewritten(entries -> entries.remove("snapshots.json"));
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains("incomplete: snapshots.json"), e.getMessage());
        try (Ledger empty = new Ledger(Database.open(dir.resolve("empty.db")))) {
            assertEquals(dump(empty), dump(target));
        }
    }

    @Test
    void aTamperedEntryIsRefusedByItsChecksum() throws Exception {
        String before = dump(target);
        // one character of one reading changed; the CSV is still valid, only the checksum tells
        Path file = rewritten(entries -> entries.put("readings.csv",
                new String(entries.get("readings.csv"), StandardCharsets.UTF_8).replaceFirst("\\.4444", ".5444")
                        .getBytes(StandardCharsets.UTF_8)));
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains("readings.csv does not match its SHA-256"), e.getMessage());
        assertEquals(before, dump(target));

        Path extra = rewritten(entries -> entries.put("logs/extra.csv", "time_ms\n".getBytes(StandardCharsets.UTF_8)));
        assertTrue(assertThrows(BundleException.class, () -> Bundles.importBundle(target, extra)).getMessage()
                .contains("not listed in the manifest"));
        assertEquals(before, dump(target));
    }

    @Test
    void anUnknownFormatVersionIsRefused() throws Exception {
        Path file = rewritten(entries -> entries.put("manifest.json", new String(entries.get("manifest.json"),
                StandardCharsets.UTF_8).replace("\"formatVersion\": 3", "\"formatVersion\": 4").getBytes(StandardCharsets.UTF_8)));
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains("format version 4 is not one this app reads"), e.getMessage());
        assertTrue(e.getMessage().contains("update the app"), e.getMessage());

        Path other = rewritten(entries -> entries.put("manifest.json", new String(entries.get("manifest.json"),
                StandardCharsets.UTF_8).replace("latent-ledger-bundle", "something-else").getBytes(StandardCharsets.UTF_8)));
        assertTrue(assertThrows(BundleException.class, () -> Bundles.importBundle(target, other)).getMessage()
                .contains("'something-else' is not latent-ledger-bundle"));
        assertTrue(target.sites().all().isEmpty());
    }

    @Test
    void aConflictingRecordRefusesTheWholeImport() throws Exception {
        Path file = dir.resolve("visit.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, file);
        Bundles.importBundle(target, file);
        Visit mine = target.visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow();
        target.visits().save(new Visit(mine.id(), mine.siteId(), mine.systemId(), mine.startedAt(), mine.technician(),
                mine.purpose(), "edited on this tablet"));
        source.readings().save(TestRecords.minimalReadingSet("new-set", DemoScenario.VISIT_COMPLAINT));
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, file);
        String before = dump(target);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains("visit " + DemoScenario.VISIT_COMPLAINT + " differs"), e.getMessage());
        assertEquals(before, dump(target), "the new reading set was not imported either");
    }

    @Test
    void recordsThatPointOutsideTheBundleAreRefused() throws Exception {
        // a consistent checksum over inconsistent content: a visit naming a system not in the bundle
        Path file = rewritten(entries -> {
            String visits = new String(entries.get("visits.json"), StandardCharsets.UTF_8)
                    .replace(DemoScenario.SYSTEM_HERON, "elsewhere");
            entries.put("visits.json", visits.getBytes(StandardCharsets.UTF_8));
        }, true);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains("names system elsewhere, not in the bundle"), e.getMessage());
        Path bad = rewritten(entries -> entries.put("visits.json", new String(entries.get("visits.json"),
                StandardCharsets.UTF_8).replace("\"complaint\"", "\"inspection\"").getBytes(StandardCharsets.UTF_8)), true);
        assertTrue(assertThrows(BundleException.class, () -> Bundles.importBundle(target, bad)).getMessage()
                .contains("visit purpose refused: 'inspection' is not one of"));
        assertTrue(target.sites().all().isEmpty());
    }

    /** The exported visit bundle with {@code change} applied to its entries, manifest untouched. */
    private Path rewritten(Consumer<Map<String, byte[]>> change) throws IOException {
        return rewritten(change, false);
    }

    /** …or with the manifest's checksums recomputed, as a careful tamperer would. */
    private Path rewritten(Consumer<Map<String, byte[]>> change, boolean fixChecksums) throws IOException {
        Path original = dir.resolve("original.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, original);
        Map<String, byte[]> entries = new LinkedHashMap<>();
        try (ZipFile zip = new ZipFile(original.toFile())) {
            Enumeration<? extends ZipEntry> all = zip.entries();
            while (all.hasMoreElements()) {
                ZipEntry e = all.nextElement();
                try (InputStream in = zip.getInputStream(e)) {
                    entries.put(e.getName(), in.readAllBytes());
                }
            }
        }
        Map<String, byte[]> before = new LinkedHashMap<>(entries);
        change.accept(entries);
        if (fixChecksums) {
            String manifest = new String(entries.get("manifest.json"), StandardCharsets.UTF_8);
            for (String name : entries.keySet()) {
                if (before.containsKey(name) && !name.equals("manifest.json")) {
                    manifest = manifest.replace(BundleFormat.sha256(before.get(name)), BundleFormat.sha256(entries.get(name)))
                            .replace("\"bytes\": " + before.get(name).length + ",", "\"bytes\": " + entries.get(name).length + ",");
                }
            }
            entries.put("manifest.json", manifest.getBytes(StandardCharsets.UTF_8));
        }
        Path out = Files.createTempFile(dir, "changed", ".zip");
        try (OutputStream file = Files.newOutputStream(out); ZipOutputStream zip = new ZipOutputStream(file)) {
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                zip.putNextEntry(new ZipEntry(e.getKey()));
                zip.write(e.getValue());
                zip.closeEntry();
            }
        }
        return out;
    }

    /** Every row of every table, to prove a refused import changed nothing. */
    private static String dump(Ledger ledger) {
        return ledger.database().read(c -> {
            StringBuilder b = new StringBuilder();
            for (String table : TABLES) {
                try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT * FROM " + table + " ORDER BY rowid")) {
                    ResultSetMetaData m = r.getMetaData();
                    while (r.next()) {
                        b.append(table);
                        for (int i = 1; i <= m.getColumnCount(); i++) {
                            Object v = r.getObject(i);
                            b.append('|').append(v instanceof byte[] bytes ? Arrays.hashCode(bytes) : v);
                        }
                        b.append('\n');
                    }
                }
            }
            return b.toString();
        });
    }
}
