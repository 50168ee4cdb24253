package app.latentledger.cli;

import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;
import com.google.gson.JsonArray;
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
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Recording from the command line: every command prints the id it made, saves through the same
 * rules as the app, refuses with exit 2, and what it stores checks to the same verdict and figures
 * as the {@code coil} command on the same readings.
 */
class RecordCommandsTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
        JsonObject json() {
            return JsonParser.parseString(out).getAsJsonObject();
        }

        String id() {
            return json().get("id").getAsString();
        }
    }

    private Run run(String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(List.of("--data-dir", dir.resolve("data").toString()));
        all.addAll(List.of(words));
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Run ok(String... words) {
        Run r = run(words);
        assertEquals(0, r.code(), String.join(" ", words) + "\n" + r.err());
        return r;
    }

    private String visit() {
        String site = ok("sites", "add", "--name", "Marsh residence", "--address", "7 Gull Row, Saltreed",
                "--elevation", "650", "--json").id();
        String system = ok("systems", "add", site.substring(0, 8), "--label", "Attic air handler", "--nominal-tons", "3",
                "--stages", "two-stage", "--refrigerant", "R-410A", "--metering-device", "TXV", "--blower-type", "PSC",
                "--blower-setting", "medium-high tap", "--filter", "16x25x1 pleated", "--json").id();
        return ok("visits", "new", system, "--technician", "Rowan Teale", "--purpose", "complaint",
                "--started-at", "2026-07-16T10:00:00-04:00", "--json").id();
    }

    private static final String[] READINGS = {"--return-db", "76", "--return-wb", "64", "--supply-db", "56",
        "--supply-wb", "54", "--airflow", "1200", "--coil-temp", "44"};

    private static String[] with(String[] first, String... more) {
        List<String> all = new ArrayList<>(List.of(first));
        all.addAll(List.of(more));
        return all.toArray(String[]::new);
    }

    @Test
    void aStoredSetChecksToWhatTheCoilCommandSaysForTheSameReadings() {
        String v = visit();
        Run added = ok(with(with(new String[] {"readings", "add", v}, READINGS), "--label", "before", "--json"));
        JsonObject a = added.json();
        // the coil command with the site's elevation and the system's size typed by hand
        JsonObject coil = ok(with(with(new String[] {"coil"}, READINGS), "--elevation", "650", "--nominal-tons", "3",
                "--json")).json();
        assertEquals(coil.get("verdict").getAsString(), a.get("verdict").getAsString());
        List<String> coilCodes = new ArrayList<>();
        coil.getAsJsonArray("findings").forEach(f -> coilCodes.add(f.getAsJsonObject().get("code").getAsString()));
        List<String> storedCodes = new ArrayList<>();
        a.getAsJsonArray("findings").forEach(f -> storedCodes.add(f.getAsString()));
        assertEquals(coilCodes, storedCodes, "the same findings as the coil command");
        JsonArray list = JsonParser.parseString(ok("visits", "list", "--json").out()).getAsJsonArray();
        JsonObject mine = null;
        for (var e : list) {
            if (e.getAsJsonObject().get("id").getAsString().equals(v)) {
                mine = e.getAsJsonObject();
            }
        }
        assertEquals(coil.get("verdict").getAsString(), mine.get("latestVerdict").getAsString());
        assertTrue(ok("visits", "list").out().contains(coil.get("verdict").getAsString()));
        try (Ledger ledger = Ledger.open(dir.resolve("data"))) {
            ReadingSet set = ledger.readings().find(a.get("id").getAsString()).orElseThrow();
            assertEquals("before", set.label());
            assertEquals(Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, 76), set.returnDryBulb().valueSi(), 1e-12);
            assertEquals("TXV", ledger.systems().find(ledger.visits().find(v).orElseThrow().systemId())
                    .orElseThrow().meteringDevice());
        }
    }

    @Test
    void anInstrumentsStatedAccuracyFillsTheTolerancesNotTyped() {
        String v = visit();
        ok("visits", "instruments", v, "--name", "Probe kit A", "--serial", "SR-1001", "--calibrated", "2026-03-02",
                "--acc-db", "0.2", "--acc-coil", "0.3");
        String id = ok(with(with(new String[] {"readings", "add", v}, READINGS), "--instrument", "probe kit a",
                "--tol-coil", "2", "--json")).id();
        try (Ledger ledger = Ledger.open(dir.resolve("data"))) {
            ReadingSet set = ledger.readings().find(id).orElseThrow();
            // 0.2 °F stated → 0.2 / 1.8 K; the coil tolerance typed (2 °F) wins over the stated 0.3 °F
            assertEquals(0.2 / 1.8, set.returnDryBulb().toleranceSi(), 1e-12);
            assertEquals(2 / 1.8, set.coilTemperature().value().toleranceSi(), 1e-12);
            // the wet bulb was not stated: the settings' default (±0.5 °F out of the box)
            assertEquals(0.5 / 1.8, set.returnHumidity().value().toleranceSi(), 1e-12);
            assertEquals(1, ledger.instruments().usedOn(id).size());
            assertTrue(set.instrument().contains("SR-1001"), set.instrument());
        }
        Run listed = ok("visits", "instruments", v);
        assertTrue(listed.out().contains("stated dry bulb ±0.2 °F"), listed.out());
    }

    @Test
    void refusalsExitTwoAndSaveNothing() {
        String v = visit();
        Run wet = run("readings", "add", v, "--return-db", "76", "--return-wb", "80", "--supply-db", "56",
                "--supply-wb", "54", "--airflow", "1200");
        assertEquals(2, wet.code());
        assertTrue(wet.err().contains("--return-wb") && wet.err().contains("accepted range"), wet.err());
        Run label = run(with(with(new String[] {"readings", "add", v}, READINGS), "--label", "during"));
        assertEquals(2, label.code());
        assertTrue(label.err().contains("'during' is not one of before, after, other"), label.err());
        Run outdoor = run(with(with(new String[] {"readings", "add", v}, READINGS), "--outdoor-db", "90"));
        assertEquals(2, outdoor.code());
        Run elevation = run("sites", "add", "--name", "Too high", "--elevation", "99999");
        assertEquals(2, elevation.code());
        assertTrue(elevation.err().contains("99999 ft") && elevation.err().contains("accepted range"), elevation.err());
        assertEquals(2, run("visits", "new", "nosuchsystem", "--technician", "X").code());
        Run badLog = run("visits", "attach-log", v, dir.resolve("missing.csv").toString());
        assertEquals(2, badLog.code());
        try (Ledger ledger = Ledger.open(dir.resolve("data"))) {
            assertTrue(ledger.readings().forVisit(v).isEmpty());
            assertTrue(ledger.logs().idsForVisit(v).isEmpty());
            assertTrue(ledger.instruments().forVisit(v).isEmpty());
        }
    }

    @Test
    void paperworkSignOffAndALogAreKeptWithTheVisit() {
        String v = visit();
        ok("visits", "notes", v, "--customer-words", "Sticky upstairs at night", "--work-done", "Slowed the blower");
        ok("visits", "sign-off", v, "--technician", "Rowan Teale", "--remark", "cert 12-345");
        ok("visits", "sign-off", v, "--customer", "Ada Marsh");
        String log = ok("visits", "attach-log", v, Path.of("field-data-samples/oversized-short-cycling.csv").toString(),
                "--json").id();
        Run show = ok("visits", "show", v);
        assertTrue(show.out().contains("Sticky upstairs at night"), show.out());
        assertTrue(show.out().contains("signed by the customer: Ada Marsh"), show.out());
        assertTrue(show.out().contains("log " + log.substring(0, 8)), show.out());
        assertTrue(show.out().contains("metering     TXV"), show.out());
    }

    @Test
    void deleteRestoreAndTheRecycleBin() {
        String v = visit();
        String set = ok(with(new String[] {"readings", "add", v}, READINGS)).out().split("\\s+")[3];
        Run deleted = ok("delete", "visit", v.substring(0, 8), "--json");
        assertEquals(v, deleted.id());
        assertTrue(ok("recycle-bin", "list").out().contains("Marsh residence"));
        // the set went with its visit: it cannot be deleted on its own now
        assertEquals(2, run("delete", "readings", set).code());
        Run restored = ok("restore", "visit", v);
        assertTrue(restored.out().startsWith("Restored Visit"), restored.out());
        ok("delete", "readings", set);
        ok("delete", "visit", v);
        Run early = run("restore", "readings", set);
        assertEquals(2, early.code());
        assertTrue(early.err().contains("restore that visit first"), early.err());
        ok("restore", "visit", v);
        ok("restore", "readings", set);
        assertEquals(2, run("recycle-bin", "empty").code(), "emptying asks for --yes");
        ok("delete", "site", siteOf(v));
        assertEquals(1, ok("recycle-bin", "empty", "--yes", "--json").json().get("emptied").getAsInt());
        assertTrue(ok("recycle-bin", "list").out().contains("empty"));
        try (Ledger ledger = Ledger.open(dir.resolve("data"))) {
            assertEquals("ok", ledger.database().integrityCheck());
            assertTrue(ledger.visits().find(v).isEmpty());
        }
    }

    private String siteOf(String visit) {
        try (Ledger ledger = Ledger.open(dir.resolve("data"))) {
            return ledger.visits().find(visit).orElseThrow().siteId();
        }
    }
}
