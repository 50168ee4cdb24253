package app.latentledger.bundle;

import app.latentledger.store.Database;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import app.latentledger.store.TestRecords;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Bundles edited and re-hashed, so the manifest is consistent and only the content checks can
 * refuse them: each must be refused whole, naming the entry, the line, the field, the value and
 * the accepted range, with the target ledger unchanged. The ranges are the hand-entry ones
 * (−50 to 95 °C and 0 to 100 % for logged air, the keypad's −30 to 35 °C coil band, a wet bulb
 * no colder than the air can make: ASHRAE HoF 2017 ch. 1 — a wet bulb far below the dry bulb
 * needs a negative humidity ratio).
 */
class BundleValidationTest {
    private static final String LOG = "logs/log-1.csv";

    @TempDir
    Path dir;
    Ledger source;
    Ledger target;
    Path template;

    @BeforeEach
    void setUp() throws IOException {
        source = TestLedgers.withDemo(dir.resolve("source"));
        source.logs().save(TestRecords.log("log-1", DemoScenario.VISIT_COMPLAINT, 2_000));
        target = new Ledger(Database.open(dir.resolve("target.db")));
        template = dir.resolve("template.zip");
        Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, template);
    }

    @AfterEach
    void tearDown() {
        source.close();
        target.close();
    }

    @Test
    void theUntouchedBundleImports() throws Exception {
        Path same = BundleFiles.rehashed(template, dir.resolve("same.zip"), e -> { });
        assertEquals(8, Bundles.importBundle(target, same).added(),
                "site, system, visit, 2 reading sets, log, the house's facts, the visit's house readings");
    }

    @Test
    void logSamplesOutOfRangeAreRefusedByLine() throws Exception {
        // line 10 of the CSV is sample 9 (line 1 is the header)
        refused(e -> cell(e, 10, 1, "4000.0"), LOG + " line 10", "return_db 4000 °C refused", "accepted range -50 to 95 °C");
        refused(e -> cell(e, 10, 1, "1.0E308"), LOG + " line 10", "return_db", "accepted range -50 to 95 °C");
        refused(e -> cell(e, 10, 1, "-273.0"), LOG + " line 10", "return_db -273 °C refused");
        refused(e -> cell(e, 10, 2, "7.0"), LOG + " line 10", "fan 7.0 refused", "0 (off) to 1 (on)");
    }

    @Test
    void nonNumbersAreRefused() throws Exception {
        refused(e -> cell(e, 10, 1, "Infinity"), LOG + " line 10", "return_db 'Infinity' is not a number");
        refused(e -> cell(e, 11, 1, "NaN"), LOG + " line 11", "'NaN' is not a number");
        refused(e -> cell(e, 12, 1, "0x1p3"), LOG + " line 12", "'0x1p3' is not a number");
    }

    @Test
    void brokenTimeAxesAreRefused() throws Exception {
        refused(e -> times(e, i -> 1_717_416_000_000L), LOG, "fewer than two distinct sample times");
        refused(e -> times(e, i -> Long.MAX_VALUE - 2_000 + i), LOG + " line 2", "clock time", "1970 to 2200");
        refused(e -> times(e, i -> -62_200_000_000_000L + i * 1000L), LOG + " line 2", "clock time");
        // ten days between samples: 2 000 samples span 54 years
        refused(e -> times(e, i -> 1_717_416_000_000L + i * 864_000_000L), LOG + " line 2001", "days refused",
                "at most 366 days");
        // a median of 10 minutes over a short span
        List<String> few = new ArrayList<>();
        refused(e -> {
            times(e, i -> 1_717_416_000_000L + i * 600_000L);
            few.add("x");
        }, LOG, "samples 600 s apart (median) refused", "at most 300 s");
    }

    @Test
    void aLyingSampleCountIsRefusedBeforeAnythingIsSizedByIt() throws Exception {
        refused(e -> BundleFiles.editText(e, "logs.json", t -> t.replace("\"sampleCount\": 2000", "\"sampleCount\": 300000000")),
                "declares 300000000 samples", "at most 10000000");
        refused(e -> BundleFiles.editText(e, "logs.json", t -> t.replace("\"sampleCount\": 2000", "\"sampleCount\": 2147483647")),
                "declares 2147483647 samples");
        refused(e -> BundleFiles.editText(e, "logs.json", t -> t.replace("\"sampleCount\": 2000", "\"sampleCount\": 2001")),
                "2000 samples, logs.json lists 2001");
    }

    @Test
    void readingSetsPassTheKeypadChecks() throws Exception {
        // a supply wet bulb of -20 °C at a 12.2 °C dry bulb is no possible air
        refused(e -> readings(e, 0, r -> {
            r.put("supply_db_c", "12.2");
            r.put("supply_hum_kind", "wet-bulb");
            r.put("supply_hum_value", "-20.0");
            r.put("supply_hum_tol", "0.3");
        }), "readings.csv line 2", "supply wet bulb");
        // inside the record's -50 to 95 °C but outside the keypad's coil band
        refused(e -> readings(e, 0, r -> {
            r.put("coil_kind", "coil-surface");
            r.put("coil_c", "60.0");
            r.put("coil_tol_k", "0.5");
        }), "readings.csv line 2", "coil temperature 60 °C refused", "accepted range -30 to 35 °C");
    }

    @Test
    void anEntryLongerThanDeclaredIsCutOffAtItsDeclaredSize() throws Exception {
        Map<String, byte[]> entries = BundleFiles.rehash(BundleFiles.entries(template));
        String manifest = new String(entries.get("manifest.json"), java.nio.charset.StandardCharsets.UTF_8);
        int logBytes = entries.get(LOG).length;
        // the manifest claims 100 bytes for the log; the entry inflates to its real size
        entries.put("manifest.json", manifest.replace("\"bytes\": " + logBytes + ",", "\"bytes\": 100,")
                .getBytes(java.nio.charset.StandardCharsets.UTF_8));
        Path file = dir.resolve("short.zip");
        BundleFiles.write(file, entries);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains(LOG + " does not match its SHA-256"), e.getMessage());
        assertEquals(0, rows(target));
    }

    @Test
    void anEntryDeclaredAboveTheLimitIsRefusedBeforeInflating() throws Exception {
        Map<String, byte[]> entries = BundleFiles.rehash(BundleFiles.entries(template));
        String manifest = new String(entries.get("manifest.json"), java.nio.charset.StandardCharsets.UTF_8);
        int logBytes = entries.get(LOG).length;
        entries.put("manifest.json", manifest.replace("\"bytes\": " + logBytes + ",", "\"bytes\": 1073741824,")
                .getBytes(java.nio.charset.StandardCharsets.UTF_8));
        Path file = dir.resolve("big.zip");
        BundleFiles.write(file, entries);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        assertTrue(e.getMessage().contains("declares 1073741824 bytes; the import limit is 268435456 bytes"), e.getMessage());
    }

    @Test
    void aListedEntryNoLogNamesIsRefused() throws Exception {
        refused(e -> e.put("../../evil.sh", "echo".getBytes(java.nio.charset.StandardCharsets.UTF_8)),
                "../../evil.sh is not one this format holds");
    }

    private void refused(Consumer<Map<String, byte[]>> change, String... expected) throws Exception {
        Path file = BundleFiles.rehashed(template, java.nio.file.Files.createTempFile(dir, "bad", ".zip"), change);
        int before = rows(target);
        BundleException e = assertThrows(BundleException.class, () -> Bundles.importBundle(target, file));
        for (String s : expected) {
            assertTrue(e.getMessage().contains(s), "expected '" + s + "' in: " + e.getMessage());
        }
        assertTrue(e.getMessage().contains("nothing was imported"), e.getMessage());
        assertEquals(before, rows(target), "a refused bundle changes nothing");
        assertEquals(0, before);
    }

    /** Sets one cell of the log CSV (line as a text editor counts it, column 0 = time_ms). */
    private static void cell(Map<String, byte[]> e, int line, int column, String value) {
        BundleFiles.editText(e, LOG, t -> {
            String[] lines = t.split("\n", -1);
            String[] cells = lines[line - 1].split(",", -1);
            cells[column] = value;
            lines[line - 1] = String.join(",", cells);
            return String.join("\n", lines);
        });
    }

    private static void times(Map<String, byte[]> e, java.util.function.IntToLongFunction time) {
        BundleFiles.editText(e, LOG, t -> {
            String[] lines = t.split("\n", -1);
            for (int i = 1; i < lines.length; i++) {
                if (lines[i].isEmpty()) {
                    continue;
                }
                lines[i] = time.applyAsLong(i - 1) + lines[i].substring(lines[i].indexOf(','));
            }
            return String.join("\n", lines);
        });
    }

    private static void readings(Map<String, byte[]> e, int row, Consumer<Map<String, String>> edit) {
        BundleFiles.editText(e, "readings.csv", rewriteRow(row, edit));
    }

    private static UnaryOperator<String> rewriteRow(int row, Consumer<Map<String, String>> edit) {
        return t -> {
            try (CSVParser p = CSVParser.parse(new StringReader(t), CSVFormat.RFC4180.builder().setHeader()
                    .setSkipHeaderRecord(true).get())) {
                List<String> header = p.getHeaderNames();
                StringWriter w = new StringWriter();
                try (CSVPrinter out = new CSVPrinter(w, CSVFormat.RFC4180.builder().setHeader(header.toArray(String[]::new)).get())) {
                    int i = 0;
                    for (CSVRecord r : p) {
                        Map<String, String> m = new java.util.LinkedHashMap<>(r.toMap());
                        if (i++ == row) {
                            edit.accept(m);
                        }
                        List<String> values = new ArrayList<>();
                        header.forEach(h -> values.add(m.get(h)));
                        out.printRecord(values);
                    }
                }
                return w.toString();
            } catch (IOException ex) {
                throw new java.io.UncheckedIOException(ex);
            }
        };
    }

    private static int rows(Ledger ledger) {
        return ledger.database().read(c -> {
            int n = 0;
            for (String table : List.of("site", "hvac_system", "visit", "reading_set", "imported_log", "log_chunk",
                    "results_snapshot")) {
                try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT COUNT(*) FROM " + table)) {
                    r.next();
                    n += r.getInt(1);
                }
            }
            return n;
        });
    }
}
