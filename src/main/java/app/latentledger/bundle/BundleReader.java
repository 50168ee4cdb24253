package app.latentledger.bundle;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.records.Visit;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Enumeration;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipException;
import java.util.zip.ZipFile;

/**
 * Reads and checks a bundle before anything touches the ledger: a complete zip, our format and a
 * version this build reads, every entry listed in the manifest with the right size and SHA-256 and
 * nothing unlisted, records valid and pointing only inside the bundle.
 */
public final class BundleReader {
    private BundleReader() {
    }

    public static BundleContent read(Path file) throws BundleException {
        if (!Files.isRegularFile(file)) {
            throw new BundleException("bundle " + file + " not found");
        }
        Map<String, byte[]> entries;
        try (ZipFile zip = new ZipFile(file.toFile())) {
            entries = readAll(zip, file);
        } catch (ZipException e) {
            throw new BundleException("bundle " + file.getFileName() + " is not a complete zip (truncated or damaged: "
                    + e.getMessage() + "); export it again; nothing was imported", e);
        } catch (IOException e) {
            throw new BundleException("bundle " + file.getFileName() + " cannot be read: " + e.getMessage(), e);
        }
        byte[] manifestBytes = entries.remove(BundleFormat.MANIFEST);
        if (manifestBytes == null) {
            throw new BundleException("bundle " + file.getFileName() + " has no " + BundleFormat.MANIFEST
                    + "; it is not a Latent Ledger bundle; nothing was imported");
        }
        JsonFields manifest = new JsonFields(parse(manifestBytes, BundleFormat.MANIFEST), BundleFormat.MANIFEST);
        String format = manifest.text("format");
        if (!BundleFormat.NAME.equals(format)) {
            throw new BundleException("bundle format '" + format + "' is not " + BundleFormat.NAME + "; nothing was imported");
        }
        int version = manifest.integer("formatVersion");
        if (version < BundleFormat.OLDEST_READ || version > BundleFormat.VERSION) {
            throw new BundleException("bundle format version " + version + " is not one this app reads (it reads versions "
                    + BundleFormat.OLDEST_READ + " to " + BundleFormat.VERSION + ")"
                    + (version > BundleFormat.VERSION ? "; update the app" : "") + "; nothing was imported");
        }
        checkEntries(manifest, entries);
        BundleScope scope = scope(manifest.text("scope"));

        Site site;
        try {
            site = RecordsJson.site(new JsonFields(json(entries, BundleFormat.SITE), BundleFormat.SITE));
            List<HvacSystem> systems = new ArrayList<>();
            for (JsonFields f : array(entries, BundleFormat.SYSTEMS)) {
                systems.add(RecordsJson.system(f));
            }
            List<Visit> visits = new ArrayList<>();
            for (JsonFields f : array(entries, BundleFormat.VISITS)) {
                visits.add(RecordsJson.visit(f));
            }
            List<ReadingSet> readings = ReadingsCsv.read(text(entries, ReadingsCsv.ENTRY));
            List<ImportedLog> logs = new ArrayList<>();
            for (JsonFields f : array(entries, BundleFormat.LOGS)) {
                logs.add(log(f, entries));
            }
            List<ResultsSnapshot> snapshots = new ArrayList<>();
            for (JsonFields f : array(entries, BundleFormat.SNAPSHOTS)) {
                snapshots.add(RecordsJson.snapshot(f));
            }
            List<app.latentledger.core.records.Instrument> instruments = new ArrayList<>();
            List<BundleContent.InstrumentUse> uses = new ArrayList<>();
            List<app.latentledger.core.records.VisitPaperwork> paperwork = new ArrayList<>();
            List<app.latentledger.core.records.BinEntry> deletions = new ArrayList<>();
            if (version >= 2) {
                for (JsonFields f : array(entries, BundleFormat.INSTRUMENTS)) {
                    app.latentledger.core.records.Instrument i = PaperworkJson.instrument(f);
                    instruments.add(i);
                    for (String set : f.texts("usedOn")) {
                        uses.add(new BundleContent.InstrumentUse(set, i.id()));
                    }
                }
                for (JsonFields f : array(entries, BundleFormat.PAPERWORK)) {
                    paperwork.add(PaperworkJson.paperwork(f));
                }
                for (JsonFields f : array(entries, BundleFormat.DELETIONS)) {
                    deletions.add(PaperworkJson.deletion(f));
                }
            }
            BundleContent content = new BundleContent(scope, site, systems, visits, readings, logs, snapshots,
                    instruments, uses, paperwork, deletions);
            content.checkConsistent();
            return content;
        } catch (IllegalArgumentException e) {
            throw new BundleException("bundle refused: " + e.getMessage() + "; nothing was imported", e);
        }
    }

    private static Map<String, byte[]> readAll(ZipFile zip, Path file) throws IOException, BundleException {
        Map<String, byte[]> entries = new LinkedHashMap<>();
        Enumeration<? extends ZipEntry> all = zip.entries();
        while (all.hasMoreElements()) {
            ZipEntry e = all.nextElement();
            if (e.isDirectory()) {
                continue;
            }
            if (entries.containsKey(e.getName())) {
                throw new BundleException("bundle " + file.getFileName() + " holds " + e.getName() + " twice; nothing was imported");
            }
            try (InputStream in = zip.getInputStream(e)) {
                byte[] bytes = in.readNBytes((int) BundleFormat.MAX_ENTRY_BYTES + 1);
                if (bytes.length > BundleFormat.MAX_ENTRY_BYTES) {
                    throw new BundleException("bundle entry " + e.getName() + " is larger than "
                            + (BundleFormat.MAX_ENTRY_BYTES >> 20) + " MiB; nothing was imported");
                }
                entries.put(e.getName(), bytes);
            }
        }
        return entries;
    }

    private static void checkEntries(JsonFields manifest, Map<String, byte[]> entries) throws BundleException {
        JsonElement listed = manifest.element("entries");
        if (!listed.isJsonArray()) {
            throw new BundleException(BundleFormat.MANIFEST + ": \"entries\" must be a list");
        }
        Map<String, Boolean> seen = new HashMap<>();
        for (JsonElement e : listed.getAsJsonArray()) {
            JsonFields f = new JsonFields(e, BundleFormat.MANIFEST + " entry");
            String name = f.text("name");
            byte[] bytes = entries.get(name);
            if (bytes == null) {
                throw new BundleException("bundle is incomplete: " + name + " is listed in the manifest but missing"
                        + " (truncated?); nothing was imported");
            }
            if (f.number("bytes") != bytes.length || !BundleFormat.sha256(bytes).equals(f.text("sha256"))) {
                throw new BundleException("bundle entry " + name + " does not match its SHA-256 in the manifest: the"
                        + " bundle was changed or damaged after export; nothing was imported");
            }
            seen.put(name, true);
        }
        for (String name : entries.keySet()) {
            if (!seen.containsKey(name)) {
                throw new BundleException("bundle entry " + name + " is not listed in the manifest: the bundle was"
                        + " changed after export; nothing was imported");
            }
        }
    }

    private static BundleScope scope(String key) throws BundleException {
        for (BundleScope s : BundleScope.values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new BundleException(BundleFormat.MANIFEST + ": scope '" + key + "' is not visit or site");
    }

    private static ImportedLog log(JsonFields f, Map<String, byte[]> entries) throws BundleException {
        String id = f.text("id");
        String samplesEntry = f.text("samples");
        if (!samplesEntry.equals(LogCsv.entry(id))) {
            throw new BundleException(BundleFormat.LOGS + ": log " + id + " samples must be in " + LogCsv.entry(id));
        }
        JsonElement channelList = f.element("channels");
        if (!channelList.isJsonArray()) {
            throw new BundleException(BundleFormat.LOGS + ": log " + id + " channels must be a list");
        }
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        for (JsonElement c : channelList.getAsJsonArray()) {
            JsonFields ch = new JsonFields(c, BundleFormat.LOGS + " log " + id + " channel");
            names.add(ch.text("name"));
            units.add(ch.optionalText("unit"));
        }
        TimeBase base = TimeBase.parse("log time base", f.text("timeBase"));
        return new ImportedLog(id, f.text("visitId"), f.text("sourceFileName"), f.optionalText("columnMapping"),
                f.time("importedAt"),
                LogCsv.read(text(entries, samplesEntry), samplesEntry, base, names, units, f.integer("sampleCount")));
    }

    private static List<JsonFields> array(Map<String, byte[]> entries, String name) throws BundleException {
        JsonElement e = json(entries, name);
        if (!e.isJsonArray()) {
            throw new BundleException(name + ": expected a JSON list");
        }
        JsonArray a = e.getAsJsonArray();
        List<JsonFields> out = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            out.add(new JsonFields(a.get(i), name + " item " + (i + 1)));
        }
        return out;
    }

    private static JsonElement json(Map<String, byte[]> entries, String name) throws BundleException {
        return parse(bytes(entries, name), name);
    }

    private static JsonElement parse(byte[] bytes, String name) throws BundleException {
        try {
            return JsonParser.parseString(utf8(bytes, name));
        } catch (JsonParseException e) {
            throw new BundleException(name + ": not valid JSON (" + e.getMessage() + ")", e);
        }
    }

    private static String text(Map<String, byte[]> entries, String name) throws BundleException {
        return utf8(bytes(entries, name), name);
    }

    private static byte[] bytes(Map<String, byte[]> entries, String name) throws BundleException {
        byte[] b = entries.get(name);
        if (b == null) {
            throw new BundleException("bundle is incomplete: " + name + " missing; nothing was imported");
        }
        return b;
    }

    private static String utf8(byte[] bytes, String name) throws BundleException {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new BundleException(name + ": not UTF-8 text", e);
        }
    }
}
