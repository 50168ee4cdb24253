package app.latentledger.bundle;

import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Bundles built to exhaust memory, imported by the real command line in a child JVM with a 48 MiB
 * heap: each must be refused with the limit it hit (exit 2), never end in an OutOfMemoryError or
 * a stack trace. Before the limits, the same bundles took the importer to gigabytes.
 */
class BundleMemoryTest {
    private static final String LOG = "logs/log-1.csv";

    @TempDir
    Path dir;
    Map<String, byte[]> entries;

    @BeforeEach
    void setUp() throws Exception {
        try (Ledger source = TestLedgers.withDemo(dir.resolve("source"))) {
            source.logs().save(TestRecords.log("log-1", DemoScenario.VISIT_COMPLAINT, 2_000));
            Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, dir.resolve("template.zip"));
        }
        entries = BundleFiles.rehash(BundleFiles.entries(dir.resolve("template.zip")));
    }

    @Test
    void unlistedEntriesOfZerosAreRefusedBeforeInflating() throws Exception {
        // 4 × 32 MiB of zeros, about 130 KB zipped: beyond the child's heap if inflated
        Path bomb = dir.resolve("bomb.zip");
        try (ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(bomb))) {
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                put(zip, e.getKey(), e.getValue());
            }
            for (int i = 0; i < 4; i++) {
                zeros(zip, "pad/" + i + ".bin", 32L << 20, null);
            }
        }
        Result r = importInSmallHeap(bomb);
        assertRefused(r, "not listed in the manifest");
    }

    @Test
    void aListedEntryOfZerosIsCutOffByTheLineLimit() throws Exception {
        // a listed, correctly hashed "log" of 64 MiB zeros without a line break (more than the heap)
        Path bomb = dir.resolve("listed.zip");
        MessageDigest sha = MessageDigest.getInstance("SHA-256");
        long size = 64L << 20;
        try (ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(bomb))) {
            zeros(zip, LOG, size, sha);
            JsonObject manifest = JsonParser.parseString(new String(entries.get("manifest.json"), StandardCharsets.UTF_8))
                    .getAsJsonObject();
            for (var e : manifest.getAsJsonArray("entries")) {
                JsonObject o = e.getAsJsonObject();
                if (o.get("name").getAsString().equals(LOG)) {
                    o.addProperty("bytes", size);
                    o.addProperty("sha256", HexFormat.of().formatHex(sha.digest()));
                }
            }
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                if (!e.getKey().equals(LOG) && !e.getKey().equals("manifest.json")) {
                    put(zip, e.getKey(), e.getValue());
                }
            }
            put(zip, "manifest.json", BundleFormat.GSON.toJson(manifest).getBytes(StandardCharsets.UTF_8));
        }
        assertRefused(importInSmallHeap(bomb), LOG + " line 1: longer than 16384 characters");
    }

    @Test
    void aLyingSampleCountIsRefusedUnderASmallHeap() throws Exception {
        BundleFiles.editText(entries, "logs.json", t -> t.replace("\"sampleCount\": 2000", "\"sampleCount\": 300000000"));
        Path lie = dir.resolve("lie.zip");
        BundleFiles.write(lie, BundleFiles.rehash(entries));
        assertRefused(importInSmallHeap(lie), "declares 300000000 samples; at most 10000000");
    }

    private static void assertRefused(Result r, String expected) {
        assertEquals(2, r.code, r.err);
        assertTrue(r.err.contains(expected), r.err);
        assertTrue(r.err.contains("nothing was imported"), r.err);
        assertFalse(r.err.contains("OutOfMemoryError"), r.err);
        assertFalse(r.err.contains("\tat "), "no stack trace: " + r.err);
    }

    private record Result(int code, String err) {
    }

    private Result importInSmallHeap(Path bundle) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx48m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-cp", System.getProperty("java.class.path"),
                "-Djava.io.tmpdir=" + Files.createDirectories(dir.resolve("tmp")),
                "-Duser.home=" + dir.resolve("home"), "-Djava.awt.headless=true",
                "app.latentledger.Main", "--data-dir", dir.resolve("data").toString(), "visits", "import", bundle.toString()));
        Path err = dir.resolve("err.txt");
        Process p = new ProcessBuilder(command).redirectError(err.toFile()).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "child finished");
        return new Result(p.exitValue(), Files.readString(err));
    }

    private static void put(ZipOutputStream zip, String name, byte[] bytes) throws Exception {
        zip.putNextEntry(new ZipEntry(name));
        zip.write(bytes);
        zip.closeEntry();
    }

    private static void zeros(ZipOutputStream zip, String name, long size, MessageDigest sha) throws Exception {
        zip.putNextEntry(new ZipEntry(name));
        byte[] block = new byte[1 << 20];
        for (long done = 0; done < size; done += block.length) {
            zip.write(block);
            if (sha != null) {
                sha.update(block);
            }
        }
        zip.closeEntry();
    }
}
