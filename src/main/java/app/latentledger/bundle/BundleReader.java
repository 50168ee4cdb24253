package app.latentledger.bundle;

import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordLimits;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.text.TerminalText;
import app.latentledger.core.visit.RecordRules;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
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
 * nothing unlisted, records valid by the same rules as entering them by hand and pointing only
 * inside the bundle.
 *
 * <p>Memory is bounded by the limits in {@link BundleFormat}: the zip's entry list and the
 * manifest are checked before any other entry is inflated; each entry is inflated only up to the
 * size the manifest declares for it; log samples are parsed as they are inflated into arrays that
 * grow with the rows actually read. A bundle that still needs more memory than the device has is
 * refused with that reason, never with a crash.
 */
public final class BundleReader {
    private BundleReader() {
    }

    /** One entry as the manifest lists it. */
    private record Listed(String name, long bytes, String sha256) {
    }

    public static BundleContent read(Path file) throws BundleException {
        if (!Files.isRegularFile(file)) {
            throw new BundleException("bundle " + file + " not found");
        }
        String shown = TerminalText.escape(String.valueOf(file.getFileName()));
        try (ZipFile zip = new ZipFile(file.toFile())) {
            return read(zip, shown);
        } catch (BundleException e) {
            // every refusal says that the ledger was left as it was, whichever check refused first
            if (e.getMessage().endsWith("nothing was imported")) {
                throw e;
            }
            throw new BundleException("bundle refused: " + e.getMessage() + "; nothing was imported", e);
        } catch (ZipException e) {
            throw new BundleException("bundle " + shown + " is not a complete zip (truncated or damaged: "
                    + e.getMessage() + "); export it again; nothing was imported", e);
        } catch (IOException e) {
            throw new BundleException("bundle " + shown + " cannot be read: " + e.getMessage()
                    + "; nothing was imported", e);
        } catch (OutOfMemoryError e) {
            // the arrays being filled are unreachable once we are here, so the message can be made
            throw new BundleException("bundle " + shown + " needs more memory than this device has left ("
                    + (Runtime.getRuntime().maxMemory() >> 20) + " MiB for the app); nothing was imported");
        }
    }

    private static BundleContent read(ZipFile zip, String file) throws IOException, BundleException {
        Map<String, ZipEntry> inZip = entries(zip, file);
        ZipEntry manifestEntry = inZip.remove(BundleFormat.MANIFEST);
        if (manifestEntry == null) {
            throw new BundleException("bundle " + file + " has no " + BundleFormat.MANIFEST
                    + "; it is not a Latent Ledger bundle; nothing was imported");
        }
        byte[] manifestBytes;
        try (InputStream in = new EntryStream(zip.getInputStream(manifestEntry), BundleFormat.MANIFEST,
                BundleFormat.MAX_MANIFEST_BYTES)) {
            manifestBytes = in.readAllBytes();
        } catch (EntryStream.TooLarge e) {
            throw new BundleException(BundleFormat.MANIFEST + " is larger than " + BundleFormat.MAX_MANIFEST_BYTES
                    + " bytes (the import limit); nothing was imported", e);
        }
        JsonFields manifest = new JsonFields(parse(manifestBytes, BundleFormat.MANIFEST), BundleFormat.MANIFEST);
        String format = manifest.text("format");
        if (!BundleFormat.NAME.equals(format)) {
            throw new BundleException("bundle format '" + TerminalText.escape(format) + "' is not " + BundleFormat.NAME
                    + "; nothing was imported");
        }
        int version = manifest.integer("formatVersion");
        if (version < BundleFormat.OLDEST_READ || version > BundleFormat.VERSION) {
            throw new BundleException("bundle format version " + version + " is not one this app reads (it reads versions "
                    + BundleFormat.OLDEST_READ + " to " + BundleFormat.VERSION + ")"
                    + (version > BundleFormat.VERSION ? "; update the app" : "") + "; nothing was imported");
        }
        Map<String, Listed> listed = listed(manifest, inZip);
        BundleScope scope = scope(manifest.text("scope"));

        Site site;
        try {
            site = RecordsJson.site(new JsonFields(json(zip, inZip, listed, BundleFormat.SITE), BundleFormat.SITE));
            List<HvacSystem> systems = new ArrayList<>();
            for (JsonFields f : array(zip, inZip, listed, BundleFormat.SYSTEMS)) {
                systems.add(RecordsJson.system(f));
            }
            List<Visit> visits = new ArrayList<>();
            for (JsonFields f : array(zip, inZip, listed, BundleFormat.VISITS)) {
                visits.add(RecordsJson.visit(f));
            }
            List<String> readingLines = new ArrayList<>();
            List<ReadingSet> readings = ReadingsCsv.read(utf8(verified(zip, inZip, listed, ReadingsCsv.ENTRY),
                    ReadingsCsv.ENTRY), readingLines);
            List<JsonFields> logList = array(zip, inZip, listed, BundleFormat.LOGS);
            List<JsonFields> snapshotList = array(zip, inZip, listed, BundleFormat.SNAPSHOTS);
            // every listed entry must be one the format holds, before any log is inflated
            List<String> logEntries = new ArrayList<>();
            for (JsonFields f : logList) {
                logEntries.add(f.text("samples"));
            }
            for (String name : listed.keySet()) {
                boolean held = isRecordEntry(name) && (version >= 2 || !isPaperworkEntry(name))
                        && (version >= 3 || !name.equals(BundleFormat.HOUSE));
                if (!held && !logEntries.contains(name)) {
                    throw new BundleException("bundle entry " + TerminalText.escape(name) + " is not one this format"
                            + " holds (no log names it); nothing was imported");
                }
            }
            long[] sampleBudget = {RecordLimits.BUNDLE_MAX_SAMPLES};
            List<ImportedLog> logs = new ArrayList<>();
            for (JsonFields f : logList) {
                logs.add(log(f, zip, inZip, listed, sampleBudget, version));
            }
            List<ResultsSnapshot> snapshots = new ArrayList<>();
            for (JsonFields f : snapshotList) {
                snapshots.add(RecordsJson.snapshot(f));
            }
            List<app.latentledger.core.records.Instrument> instruments = new ArrayList<>();
            List<BundleContent.InstrumentUse> uses = new ArrayList<>();
            List<app.latentledger.core.records.VisitPaperwork> paperwork = new ArrayList<>();
            List<app.latentledger.core.records.BinEntry> deletions = new ArrayList<>();
            if (version >= 2) {
                for (JsonFields f : array(zip, inZip, listed, BundleFormat.INSTRUMENTS)) {
                    app.latentledger.core.records.Instrument i = PaperworkJson.instrument(f);
                    instruments.add(i);
                    for (String set : f.texts("usedOn")) {
                        uses.add(new BundleContent.InstrumentUse(set, i.id()));
                    }
                }
                for (JsonFields f : array(zip, inZip, listed, BundleFormat.PAPERWORK)) {
                    paperwork.add(PaperworkJson.paperwork(f));
                }
                for (JsonFields f : array(zip, inZip, listed, BundleFormat.DELETIONS)) {
                    deletions.add(PaperworkJson.deletion(f));
                }
            }
            HouseFacts houseFacts = null;
            List<BundleContent.VisitHouse> houseReadings = List.of();
            if (version >= 3) {
                JsonFields house = new JsonFields(json(zip, inZip, listed, BundleFormat.HOUSE), BundleFormat.HOUSE);
                String factsSite = HouseJson.factsSiteId(house);
                if (factsSite != null && !factsSite.equals(site.id())) {
                    throw new BundleException("bundle refused: " + BundleFormat.HOUSE + " facts name site "
                            + TerminalText.escape(factsSite) + ", not " + site.id() + "; nothing was imported");
                }
                houseFacts = house(() -> HouseJson.facts(house), BundleFormat.HOUSE + " facts");
                houseReadings = house(() -> HouseJson.readings(house), BundleFormat.HOUSE + " readings");
            }
            BundleContent content = new BundleContent(scope, site, systems, visits, readings, logs, snapshots,
                    instruments, uses, paperwork, deletions, houseFacts, houseReadings);
            content.checkConsistent();
            checkReadings(content, readingLines);
            checkHouseReadings(content);
            return content;
        } catch (IllegalArgumentException e) {
            throw new BundleException("bundle refused: " + TerminalText.escape(e.getMessage())
                    + "; nothing was imported", e);
        }
    }

    /** The zip's entries by name, capped in number; a name given twice is refused. */
    private static Map<String, ZipEntry> entries(ZipFile zip, String file) throws BundleException {
        Map<String, ZipEntry> entries = new LinkedHashMap<>();
        Enumeration<? extends ZipEntry> all = zip.entries();
        int count = 0;
        while (all.hasMoreElements()) {
            ZipEntry e = all.nextElement();
            if (++count > BundleFormat.MAX_ENTRIES) {
                throw new BundleException("bundle " + file + " holds more than " + BundleFormat.MAX_ENTRIES
                        + " entries (the import limit); nothing was imported");
            }
            if (e.isDirectory()) {
                continue;
            }
            if (entries.put(e.getName(), e) != null) {
                throw new BundleException("bundle " + file + " holds " + TerminalText.escape(e.getName())
                        + " twice; nothing was imported");
            }
        }
        return entries;
    }

    /**
     * The manifest's entry list, checked against the zip and the limits before anything else is
     * inflated: every entry listed once and present, nothing unlisted, each declared size and their
     * total within the limits.
     */
    private static Map<String, Listed> listed(JsonFields manifest, Map<String, ZipEntry> inZip) throws BundleException {
        JsonElement list = manifest.element("entries");
        if (!list.isJsonArray()) {
            throw new BundleException(BundleFormat.MANIFEST + ": \"entries\" must be a list");
        }
        Map<String, Listed> listed = new LinkedHashMap<>();
        long total = 0;
        for (JsonElement e : list.getAsJsonArray()) {
            JsonFields f = new JsonFields(e, BundleFormat.MANIFEST + " entry");
            String name = f.text("name");
            String shown = TerminalText.escape(name);
            double bytes = f.number("bytes");
            if (bytes != Math.rint(bytes) || bytes < 0) {
                throw new BundleException(BundleFormat.MANIFEST + ": entry " + shown + " bytes " + bytes
                        + " is not a whole number ≥ 0; nothing was imported");
            }
            long cap = isRecordEntry(name) ? BundleFormat.MAX_RECORD_ENTRY_BYTES : BundleFormat.MAX_ENTRY_BYTES;
            if (bytes > cap) {
                throw new BundleException("bundle entry " + shown + " declares " + (long) bytes + " bytes; the import"
                        + " limit is " + cap + " bytes (" + (cap >> 20) + " MiB) per entry; nothing was imported");
            }
            total += (long) bytes;
            if (total > BundleFormat.MAX_TOTAL_BYTES) {
                throw new BundleException("bundle entries declare more than " + BundleFormat.MAX_TOTAL_BYTES
                        + " bytes (" + (BundleFormat.MAX_TOTAL_BYTES >> 30) + " GiB, the import limit) in all;"
                        + " nothing was imported");
            }
            if (listed.put(name, new Listed(name, (long) bytes, f.text("sha256"))) != null) {
                throw new BundleException(BundleFormat.MANIFEST + " lists " + shown + " twice; nothing was imported");
            }
            if (!inZip.containsKey(name)) {
                throw new BundleException("bundle is incomplete: " + shown + " is listed in the manifest but missing"
                        + " (truncated?); nothing was imported");
            }
        }
        for (String name : inZip.keySet()) {
            if (!listed.containsKey(name)) {
                throw new BundleException("bundle entry " + TerminalText.escape(name) + " is not listed in the"
                        + " manifest: the bundle was changed after export; nothing was imported");
            }
        }
        return listed;
    }

    private static boolean isRecordEntry(String name) {
        return name.equals(BundleFormat.SITE) || name.equals(BundleFormat.SYSTEMS) || name.equals(BundleFormat.VISITS)
                || name.equals(BundleFormat.LOGS) || name.equals(BundleFormat.SNAPSHOTS) || name.equals(ReadingsCsv.ENTRY)
                || isPaperworkEntry(name) || name.equals(BundleFormat.HOUSE);
    }

    /** The record entries format 2 added; a format 1 bundle does not hold them. */
    private static boolean isPaperworkEntry(String name) {
        return name.equals(BundleFormat.INSTRUMENTS) || name.equals(BundleFormat.PAPERWORK)
                || name.equals(BundleFormat.DELETIONS);
    }

    /** A record entry's bytes, inflated no further than declared and matching its size and SHA-256. */
    private static byte[] verified(ZipFile zip, Map<String, ZipEntry> inZip, Map<String, Listed> listed, String name)
            throws IOException, BundleException {
        Listed l = listed.get(name);
        if (l == null) {
            throw new BundleException("bundle is incomplete: " + name + " missing; nothing was imported");
        }
        EntryStream in = new EntryStream(zip.getInputStream(inZip.get(name)), name, l.bytes());
        byte[] bytes;
        try (in) {
            bytes = in.readAllBytes();
        } catch (EntryStream.TooLarge e) {
            throw mismatch(name);
        }
        if (in.count() != l.bytes() || !in.sha256().equals(l.sha256())) {
            throw mismatch(name);
        }
        return bytes;
    }

    private static BundleException mismatch(String name) {
        return new BundleException("bundle entry " + TerminalText.escape(name) + " does not match its SHA-256 in the"
                + " manifest: the bundle was changed or damaged after export; nothing was imported");
    }

    /** Each reading set checked as the keypad checks it, on its system at the bundle's site. */
    private static void checkReadings(BundleContent content, List<String> lines) throws BundleException {
        Map<String, HvacSystem> systems = new HashMap<>();
        content.systems().forEach(s -> systems.put(s.id(), s));
        Map<String, HvacSystem> systemOfVisit = new HashMap<>();
        content.visits().forEach(v -> systemOfVisit.put(v.id(), systems.get(v.systemId())));
        for (int i = 0; i < content.readings().size(); i++) {
            ReadingSet rs = content.readings().get(i);
            try {
                RecordRules.readingSet(rs, systemOfVisit.get(rs.visitId()), content.site());
            } catch (IllegalArgumentException e) {
                throw new BundleException("bundle refused: " + lines.get(i) + " (reading set " + rs.id() + "): "
                        + TerminalText.escape(e.getMessage()) + "; nothing was imported", e);
            }
        }
    }

    /** Something read from {@code house.json} that its record's own checks may refuse. */
    private interface HousePart<T> {
        T read() throws BundleException;
    }

    /** Reads a part of {@code house.json}, naming the entry and part in a refusal by the facts' own ranges. */
    private static <T> T house(HousePart<T> part, String where) throws BundleException {
        try {
            return part.read();
        } catch (IllegalArgumentException e) {
            throw new BundleException("bundle refused: " + where + ": " + TerminalText.escape(e.getMessage())
                    + "; nothing was imported", e);
        }
    }

    /** Each visit's house readings checked as the House screen checks them: possible air at the site. */
    private static void checkHouseReadings(BundleContent content) throws BundleException {
        for (BundleContent.VisitHouse h : content.houseReadings()) {
            try {
                RecordRules.houseReadings(h.readings(), content.site());
            } catch (IllegalArgumentException e) {
                throw new BundleException("bundle refused: " + BundleFormat.HOUSE + " readings of visit " + h.visitId()
                        + ": " + TerminalText.escape(e.getMessage()) + "; nothing was imported", e);
            }
        }
    }

    private static BundleScope scope(String key) throws BundleException {
        for (BundleScope s : BundleScope.values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new BundleException(BundleFormat.MANIFEST + ": scope '" + TerminalText.escape(key) + "' is not visit or site");
    }

    private static ImportedLog log(JsonFields f, ZipFile zip, Map<String, ZipEntry> inZip, Map<String, Listed> listed,
                                   long[] budget, int version) throws BundleException, IOException {
        String id = f.text("id");
        String samplesEntry = f.text("samples");
        if (!samplesEntry.equals(LogCsv.entry(id))) {
            throw new BundleException(BundleFormat.LOGS + ": log " + TerminalText.escape(id) + " samples must be in "
                    + TerminalText.escape(LogCsv.entry(id)));
        }
        LogJson.Meta meta = LogJson.meta(f, BundleFormat.LOGS);
        // what the log was analysed with where it was made (format 3), checked before its samples are read
        ImportedLog.KeptConditions kept = version < 3 ? null
                : house(() -> RecordRules.keptConditions(HouseJson.kept(f)), BundleFormat.LOGS + " log "
                + TerminalText.escape(id) + " kept");
        Listed l = listed.get(samplesEntry);
        if (l == null) {
            throw new BundleException("bundle is incomplete: " + TerminalText.escape(samplesEntry)
                    + " missing; nothing was imported");
        }
        EntryStream in = new EntryStream(zip.getInputStream(inZip.get(samplesEntry)), samplesEntry, l.bytes());
        // closed in finally, not by try-with-resources: the catch below still reads the stream to its end
        try {
            BufferedReader text = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16);
            var samples = LogCsv.read(text, samplesEntry, meta.timeBase(), meta.names(), meta.units(),
                    meta.sampleCount(), budget);
            in.drain();
            if (in.count() != l.bytes() || !in.sha256().equals(l.sha256())) {
                throw new EntryStream.TooLarge("changed");
            }
            return new ImportedLog(id, f.text("visitId"), f.text("sourceFileName"), f.optionalText("columnMapping"),
                    f.time("importedAt"), samples, kept);
        } catch (BundleException | CharacterCodingException e) {
            // a tampered entry may fail to parse before its hash is known: say which it is
            if (!sameAsListed(in, l)) {
                throw mismatch(samplesEntry);
            }
            if (e instanceof CharacterCodingException) {
                throw new BundleException(samplesEntry + ": not UTF-8 text; nothing was imported", e);
            }
            throw new BundleException("bundle refused: " + e.getMessage() + "; nothing was imported", e);
        } catch (EntryStream.TooLarge e) {
            throw mismatch(samplesEntry);
        } finally {
            in.close();
        }
    }

    private static boolean sameAsListed(EntryStream in, Listed l) {
        try {
            in.drain();
        } catch (IOException e) {
            return false;
        }
        return in.count() == l.bytes() && in.sha256().equals(l.sha256());
    }

    private static List<JsonFields> array(ZipFile zip, Map<String, ZipEntry> inZip, Map<String, Listed> listed,
                                          String name) throws BundleException, IOException {
        JsonElement e = json(zip, inZip, listed, name);
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

    private static JsonElement json(ZipFile zip, Map<String, ZipEntry> inZip, Map<String, Listed> listed, String name)
            throws BundleException, IOException {
        return parse(verified(zip, inZip, listed, name), name);
    }

    private static JsonElement parse(byte[] bytes, String name) throws BundleException {
        try {
            return JsonParser.parseString(utf8(bytes, name));
        } catch (JsonParseException | StackOverflowError e) {
            throw new BundleException(name + ": not valid JSON (" + TerminalText.escape(String.valueOf(e.getMessage()))
                    + "); nothing was imported", e);
        }
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
