package app.latentledger.bundle;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Timestamps;
import app.latentledger.core.records.Visit;
import app.latentledger.files.SafeFiles;
import app.latentledger.store.AppVersion;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

/** Writes a bundle zip. The file appears under its name only once it is complete. */
public final class BundleWriter {
    private BundleWriter() {
    }

    /** Writes {@code content} to {@code target}, replacing it. */
    public static void write(BundleContent content, String subjectId, Path target) throws IOException {
        Map<String, byte[]> entries = new LinkedHashMap<>();
        entries.put(BundleFormat.SITE, json(RecordsJson.site(content.site())));
        JsonArray systems = new JsonArray();
        for (HvacSystem s : content.systems()) {
            systems.add(RecordsJson.system(s));
        }
        entries.put(BundleFormat.SYSTEMS, json(systems));
        JsonArray visits = new JsonArray();
        for (Visit v : content.visits()) {
            visits.add(RecordsJson.visit(v));
        }
        entries.put(BundleFormat.VISITS, json(visits));
        entries.put(ReadingsCsv.ENTRY, ReadingsCsv.write(content.readings()).getBytes(StandardCharsets.UTF_8));
        JsonArray logs = new JsonArray();
        for (ImportedLog l : content.logs()) {
            logs.add(LogJson.write(l));
            entries.put(LogCsv.entry(l.id()), LogCsv.write(l.samples()).getBytes(StandardCharsets.UTF_8));
        }
        entries.put(BundleFormat.LOGS, json(logs));
        JsonArray snapshots = new JsonArray();
        for (ResultsSnapshot s : content.snapshots()) {
            snapshots.add(RecordsJson.snapshot(s));
        }
        entries.put(BundleFormat.SNAPSHOTS, json(snapshots));
        JsonArray instruments = new JsonArray();
        for (app.latentledger.core.records.Instrument i : content.instruments()) {
            java.util.List<String> usedOn = new java.util.ArrayList<>();
            for (BundleContent.InstrumentUse u : content.instrumentUses()) {
                if (u.instrumentId().equals(i.id())) {
                    usedOn.add(u.readingSetId());
                }
            }
            instruments.add(PaperworkJson.instrument(i, usedOn));
        }
        entries.put(BundleFormat.INSTRUMENTS, json(instruments));
        JsonArray paperwork = new JsonArray();
        content.paperwork().forEach(w -> paperwork.add(PaperworkJson.paperwork(w)));
        entries.put(BundleFormat.PAPERWORK, json(paperwork));
        JsonArray deletions = new JsonArray();
        content.deletions().forEach(d -> deletions.add(PaperworkJson.deletion(d)));
        entries.put(BundleFormat.DELETIONS, json(deletions));
        entries.put(BundleFormat.HOUSE, json(HouseJson.house(content.houseFacts(), content.site().id(),
                content.houseReadings())));

        JsonObject manifest = new JsonObject();
        manifest.addProperty("format", BundleFormat.NAME);
        manifest.addProperty("formatVersion", BundleFormat.VERSION);
        manifest.addProperty("createdAt", Timestamps.text(OffsetDateTime.now(ZoneOffset.UTC).truncatedTo(ChronoUnit.SECONDS)));
        manifest.addProperty("appVersion", AppVersion.current());
        manifest.addProperty("scope", content.scope().key());
        manifest.addProperty("subjectId", subjectId);
        JsonArray list = new JsonArray();
        for (Map.Entry<String, byte[]> e : entries.entrySet()) {
            JsonObject entry = new JsonObject();
            entry.addProperty("name", e.getKey());
            entry.addProperty("bytes", e.getValue().length);
            entry.addProperty("sha256", BundleFormat.sha256(e.getValue()));
            list.add(entry);
        }
        manifest.add("entries", list);

        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder == null || absolute.getFileName() == null) {
            throw new IOException(target + " is a folder; give a file name for the bundle");
        }
        Files.createDirectories(folder);
        if (Files.isDirectory(absolute)) {
            throw new IOException(target + " is a folder; give a file name for the bundle");
        }
        // private (rw-------) and written whole: SafeFiles names the temporary for this process
        SafeFiles.writeAtomically(absolute, file -> {
            ZipOutputStream zip = new ZipOutputStream(file);
            put(zip, BundleFormat.MANIFEST, json(manifest));
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                put(zip, e.getKey(), e.getValue());
            }
            zip.finish();
        }, SafeFiles.Durability.REPLACE_WHOLE);
    }

    private static byte[] json(Object tree) {
        return (BundleFormat.GSON.toJson(tree) + "\n").getBytes(StandardCharsets.UTF_8);
    }

    private static void put(ZipOutputStream zip, String name, byte[] bytes) throws IOException {
        zip.putNextEntry(new ZipEntry(name));
        zip.write(bytes);
        zip.closeEntry();
    }
}
