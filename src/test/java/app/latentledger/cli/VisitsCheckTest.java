package app.latentledger.cli;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.visit.RecordRules;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestLedgers;
import app.latentledger.store.OlderBuild;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code visits check}: logs an older build stored without today's rules (RH 500 %, a broken time
 * axis) are listed; {@code --repair} makes out-of-range samples missing and leaves a log whose
 * time axis fails for removal.
 */
class VisitsCheckTest {
    @TempDir
    Path dir;

    @Test
    void listsAndRepairsStoredRecordsThatFailTodaysRules() {
        Path data = dir.resolve("data");
        try (Ledger ledger = TestLedgers.withDemo(data)) {
            ImportedLog good = TestRecords.log("rh-log", DemoScenario.VISIT_COMPLAINT, 100);
            List<LogChannel> channels = new ArrayList<>(good.samples().channels());
            double[] rh = new double[100];
            java.util.Arrays.fill(rh, 55);
            rh[17] = 500; // the attack's RH 500 %
            channels.add(new LogChannel("return_rh", "%", rh));
            OlderBuild.saveLog(ledger, new ImportedLog("rh-log", good.visitId(), good.sourceFileName(),
                    good.columnMapping(), good.importedAt(), new LogSamples(TimeBase.EPOCH, good.samples().timesMs(), channels)));
            long[] same = new long[10];
            java.util.Arrays.fill(same, 1_717_416_000_000L);
            OlderBuild.saveLog(ledger, new ImportedLog("flat-log", good.visitId(), "flat.csv", "", good.importedAt(),
                    new LogSamples(TimeBase.EPOCH, same, List.of(new LogChannel("return_db", "°C", new double[10])))));
        }
        JsonObject before = json(run(data, "visits", "check", "--json"));
        assertEquals(2, before.get("failing").getAsInt(), before.toString());
        String text = run(data, "visits", "check");
        assertTrue(text.contains("log rh-log") && text.contains("sample 18: return_rh 500 % refused: accepted range 0 to 100 %"),
                text);
        assertTrue(text.contains("repairable with --repair"), text);
        assertTrue(text.contains("log flat-log") && text.contains("cannot be repaired"), text);

        String repaired = run(data, "visits", "check", "--repair");
        assertTrue(repaired.contains("repaired: return_rh: 1 sample(s) outside the accepted range made missing"), repaired);
        try (Ledger ledger = Ledger.open(data)) {
            ImportedLog back = ledger.logs().find("rh-log").orElseThrow();
            assertNull(RecordRules.logProblem(back.samples()), "the repaired log passes");
            LogChannel rh = back.samples().channels().stream().filter(c -> c.name().equals("return_rh")).findFirst()
                    .orElseThrow();
            assertTrue(Double.isNaN(rh.value(17)), "the bad sample is now missing");
            assertEquals(55, rh.value(16));
        }
        JsonObject after = json(run(data, "visits", "check", "--json"));
        assertEquals(1, after.get("failing").getAsInt(), "only the log that cannot be repaired is left: " + after);

        String removed = run(data, "visits", "check", "--remove");
        assertTrue(removed.contains("moved to the recycle bin"), removed);
        assertEquals(0, json(run(data, "visits", "check", "--json")).get("failing").getAsInt(), "nothing failing is left");
        try (Ledger ledger = Ledger.open(data)) {
            assertTrue(ledger.logs().find("flat-log").isEmpty(), "the log left the live tables");
            assertTrue(ledger.recycleBin().list().stream().anyMatch(e -> e.recordId().equals("flat-log")),
                    "and waits in the recycle bin");
            assertEquals("ok", ledger.database().integrityCheck());
        }
    }

    private static JsonObject json(String out) {
        return JsonParser.parseString(out).getAsJsonObject();
    }

    private static String run(Path data, String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(List.of("--data-dir", data.toString()));
        all.addAll(List.of(words));
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8), System.err);
        assertEquals(0, code);
        return out.toString(StandardCharsets.UTF_8);
    }
}
