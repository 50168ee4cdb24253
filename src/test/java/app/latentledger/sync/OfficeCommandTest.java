package app.latentledger.sync;

import app.latentledger.cli.Cli;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code office enrol|sync|status} end to end, against the test double of the office server. */
class OfficeCommandTest {
    @TempDir
    Path dir;
    StubOffice office;
    String out;
    String err;

    @BeforeEach
    void start() throws Exception {
        office = new StubOffice();
        try (Ledger l = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            l.sites().all(); // the demo, so there is something to send
        }
    }

    @AfterEach
    void stop() {
        office.close();
        assertEquals(List.of(), office.violations);
    }

    private int run(String... words) {
        List<String> all = new ArrayList<>(List.of("--data-dir", dir.toString(), "office"));
        all.addAll(List.of(words));
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int code = Cli.standard().run(all, new PrintStream(o, true, StandardCharsets.UTF_8),
                new PrintStream(e, true, StandardCharsets.UTF_8));
        out = o.toString(StandardCharsets.UTF_8);
        err = e.toString(StandardCharsets.UTF_8);
        return code;
    }

    @Test
    void enrolSyncAndStatus() {
        assertEquals(0, run("status"));
        assertTrue(out.startsWith("Not enrolled with an office."), out);
        assertEquals(0, run("enrol", "--server", office.url(), "--code", office.newCode(), "--device-name", "Van 2"));
        assertTrue(out.startsWith("Enrolled with " + StubOffice.COMPANY + " at " + office.url() + " as Van 2"), out);
        assertEquals(0, run("status", "--json"));
        JsonObject s = JsonParser.parseString(out).getAsJsonObject();
        assertTrue(s.get("enrolled").getAsBoolean());
        assertTrue(s.get("waiting").getAsInt() > 0);
        assertTrue(s.get("lastSync").isJsonNull());
        assertEquals(0, run("sync"));
        assertTrue(out.contains("Nothing is waiting to go."), out);
        assertEquals(0, run("status"));
        assertTrue(out.contains("Last sync:  ") && out.contains(", done: Sent "), out);
        assertEquals(0, run("sync", "--json"));
        assertEquals(0, JsonParser.parseString(out).getAsJsonObject().get("sent").getAsInt());
    }

    @Test
    void badInputNoNetworkAndRefusalsExit2() throws Exception {
        assertEquals(2, run("sync"));
        assertTrue(err.contains("not enrolled"), err);
        assertEquals(2, run("enrol", "--server", "office.saltreed", "--code", "X"));
        assertTrue(err.contains("server address 'office.saltreed' refused"), err);
        assertEquals(2, run("enrol", "--server", office.url()));
        assertEquals(2, run("frobnicate"));
        assertEquals(2, run("status", "--code", "X"));

        try (Ledger l = Ledger.open(dir)) {
            l.readings().save(new ReadingSet("rs-bad", DemoScenario.VISIT_COMPLAINT, TestRecords.T0, "", "",
                    new Measurement(24, 0.3), new HumidityReading(HumidityKind.WET_BULB, new Measurement(27, 0.3)),
                    new Measurement(13, 0.3), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(90, 2)),
                    null, null, null, null, null, null, "", null));
        }
        assertEquals(0, run("enrol", "--server", office.url(), "--code", office.newCode()));
        assertEquals(2, run("sync", "--json"));
        JsonObject r = JsonParser.parseString(out).getAsJsonObject();
        assertEquals("rs-bad", r.getAsJsonArray("refused").get(0).getAsJsonObject().get("id").getAsString());
        assertEquals("27 °C", r.getAsJsonArray("refused").get(0).getAsJsonObject().get("value").getAsString());
        assertEquals(0, run("status"));
        assertTrue(out.contains("Refused:    readings rs-bad: "), out);

        office.close();
        assertEquals(2, run("sync"));
        assertTrue(err.contains("cannot reach the office server"), err);
        office = new StubOffice();
    }
}
