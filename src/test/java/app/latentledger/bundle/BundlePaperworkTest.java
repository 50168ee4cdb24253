package app.latentledger.bundle;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.Database;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Enumeration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Bundle format version 2: instruments (and which set each took), paperwork and system details
 * travel with a visit; deletions travel only when the exporting tech asks; version 1 bundles
 * still import.
 */
class BundlePaperworkTest {
    @TempDir
    Path dir;
    Ledger source;
    Ledger target;

    @BeforeEach
    void setUp() {
        source = Ledger.open(dir.resolve("source"), Ledger.FirstRun.SEED_DEMO);
        HvacSystem s = source.systems().find(DemoScenario.SYSTEM_HERON).orElseThrow();
        source.systems().save(new HvacSystem(s.id(), s.siteId(), s.label(), s.type(), s.nominalCapacityW(),
                s.refrigerant(), s.blowerType(), s.fanSetting(), s.thermostatNotes(), "TXV", "16x25x1 pleated, dirty"));
        source.instruments().save(new Instrument("inst-a", DemoScenario.VISIT_COMPLAINT, "Probe kit A", "SR-1001",
                LocalDate.of(2026, 3, 2), new StatedAccuracy(0.3, 2.0, null, null, 0.5, null)));
        source.instruments().save(new Instrument("inst-b", DemoScenario.VISIT_COMPLAINT, "Flow grid", "", null,
                new StatedAccuracy(null, null, null, null, null, 0.07)));
        source.instruments().useOn(DemoScenario.READINGS_BEFORE, List.of("inst-a"));
        source.instruments().useOn(DemoScenario.READINGS_AFTER, List.of("inst-a", "inst-b"));
        source.paperwork().save(new VisitPaperwork(DemoScenario.VISIT_COMPLAINT, "Clammy upstairs, windows sweat",
                "Slowed the blower one tap", new SignOff("Rowan Teale", TestRecords.T0, "cert 12-345"),
                new SignOff("Ada Marsh", TestRecords.T0.plusMinutes(5), "")));
        target = new Ledger(Database.open(dir.resolve("target.db")));
    }

    @AfterEach
    void tearDown() {
        source.close();
        target.close();
    }

    @Test
    void paperworkInstrumentsAndSystemDetailsTravelWithTheVisit() throws Exception {
        Path file = dir.resolve("visit.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, file);
        Bundles.ImportSummary s = Bundles.importBundle(target, file);
        assertEquals(Bundles.ofVisit(source, DemoScenario.VISIT_COMPLAINT),
                Bundles.ofVisit(target, DemoScenario.VISIT_COMPLAINT));
        assertEquals("TXV", target.systems().find(DemoScenario.SYSTEM_HERON).orElseThrow().meteringDevice());
        assertEquals(List.of("inst-b", "inst-a").stream().sorted().toList(),
                target.instruments().usedOn(DemoScenario.READINGS_AFTER).stream().map(Instrument::id).sorted().toList());
        assertEquals("Ada Marsh", target.paperwork().forVisit(DemoScenario.VISIT_COMPLAINT).customer().name());
        assertEquals(2, s.addedByKind().get("instrument"));
        assertEquals(2, s.addedByKind().get("instrument choice"));
        assertEquals(1, s.addedByKind().get("paperwork"));
        // a second import finds it all present
        Bundles.ImportSummary again = Bundles.importBundle(target, file);
        assertEquals(0, again.added());
    }

    @Test
    void deletionsTravelOnlyWhenAsked() throws Exception {
        Path full = dir.resolve("full.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, full);
        Bundles.importBundle(target, full);
        source.recycleBin().delete(RecordKind.READINGS, DemoScenario.READINGS_BEFORE);

        Path plain = dir.resolve("plain.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, plain);
        assertTrue(entry(plain, "deletions.json").strip().equals("[]"), "no deletions unless asked");
        assertEquals(0, Bundles.importBundle(target, plain).deleted());
        assertTrue(target.readings().find(DemoScenario.READINGS_BEFORE).isPresent());

        Path asked = dir.resolve("asked.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, asked, true);
        Bundles.ImportSummary preview = Bundles.preview(target, asked);
        assertEquals(1, preview.deleted());
        assertTrue(target.readings().find(DemoScenario.READINGS_BEFORE).isPresent(), "a preview changes nothing");
        assertEquals(1, Bundles.importBundle(target, asked).deleted());
        assertTrue(target.readings().find(DemoScenario.READINGS_BEFORE).isEmpty());
        assertEquals(List.of(DemoScenario.READINGS_BEFORE),
                target.recycleBin().list().stream().map(e -> e.recordId()).toList(),
                "deleted into the receiving ledger's bin, so the office can still restore it");
        assertEquals("ok", target.database().integrityCheck());
        // importing it again deletes nothing more
        assertEquals(0, Bundles.importBundle(target, asked).deleted());
        target.recycleBin().restore(RecordKind.READINGS, DemoScenario.READINGS_BEFORE);
        assertEquals(Bundles.ofVisit(target, DemoScenario.VISIT_COMPLAINT).readings().size(), 2);
    }

    @Test
    void aPreviewSaysWhatAnImportWouldAddAndChangesNothing() throws Exception {
        Path file = dir.resolve("site.zip");
        Bundles.exportSite(source, DemoScenario.SITE_HERON, file);
        Bundles.ImportSummary p = Bundles.preview(target, file);
        assertEquals(1, p.addedByKind().get("site"));
        assertTrue(p.plainWords().startsWith("Adds 1 site, 1 system, "), p.plainWords());
        assertTrue(p.plainWords().contains("0 records are already here"), p.plainWords());
        assertEquals(List.of(), p.conflicts());
        assertTrue(target.sites().all().isEmpty());
        Bundles.ImportSummary done = Bundles.importBundle(target, file);
        assertEquals(p.added(), done.added());
        assertEquals(p.addedByKind(), done.addedByKind());
    }

    @Test
    void aVersionOneBundleStillImports() throws Exception {
        Path file = dir.resolve("visit.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, file);
        Path v1 = asVersionOne(file);
        Bundles.ImportSummary s = Bundles.importBundle(target, v1);
        assertTrue(s.added() >= 5, "site, system, visit and both sets");
        assertTrue(target.instruments().forVisit(DemoScenario.VISIT_COMPLAINT).isEmpty());
        assertTrue(target.paperwork().find(DemoScenario.VISIT_COMPLAINT).isEmpty());
        assertEquals("ok", target.database().integrityCheck());
    }

    /** The bundle as format version 1 wrote it: no instrument, paperwork, deletion or house entries. */
    private Path asVersionOne(Path v2) throws Exception {
        Set<String> newer = Set.of("instruments.json", "paperwork.json", "deletions.json", "house.json");
        Map<String, byte[]> entries = new LinkedHashMap<>();
        try (ZipFile zip = new ZipFile(v2.toFile())) {
            Enumeration<? extends ZipEntry> all = zip.entries();
            while (all.hasMoreElements()) {
                ZipEntry e = all.nextElement();
                if (!newer.contains(e.getName())) {
                    try (InputStream in = zip.getInputStream(e)) {
                        entries.put(e.getName(), in.readAllBytes());
                    }
                }
            }
        }
        JsonObject manifest = JsonParser.parseString(new String(entries.get("manifest.json"), StandardCharsets.UTF_8))
                .getAsJsonObject();
        manifest.addProperty("formatVersion", 1);
        JsonArray kept = new JsonArray();
        for (JsonElement e : manifest.getAsJsonArray("entries")) {
            if (!newer.contains(e.getAsJsonObject().get("name").getAsString())) {
                kept.add(e);
            }
        }
        manifest.add("entries", kept);
        entries.put("manifest.json", manifest.toString().getBytes(StandardCharsets.UTF_8));
        Path out = dir.resolve("v1.zip");
        try (OutputStream f = Files.newOutputStream(out); ZipOutputStream zip = new ZipOutputStream(f)) {
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                zip.putNextEntry(new ZipEntry(e.getKey()));
                zip.write(e.getValue());
                zip.closeEntry();
            }
        }
        return out;
    }

    private static String entry(Path zipFile, String name) throws Exception {
        try (ZipFile zip = new ZipFile(zipFile.toFile()); InputStream in = zip.getInputStream(zip.getEntry(name))) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
