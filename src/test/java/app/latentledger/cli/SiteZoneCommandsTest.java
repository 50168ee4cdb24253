package app.latentledger.cli;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.store.Ledger;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A site's time zone from the command line: {@code sites add/edit --time-zone}, shown by
 * {@code sites list} and {@code visits show}, refused (exit 2) when it is not a region id, and
 * used by {@code visits attach-log} for clock times written without a UTC offset.
 */
class SiteZoneCommandsTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
        JsonObject json() {
            return JsonParser.parseString(out).getAsJsonObject();
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

    private JsonObject listed(String id) {
        for (var e : JsonParser.parseString(ok("sites", "list", "--json").out()).getAsJsonArray()) {
            if (e.getAsJsonObject().get("id").getAsString().equals(id)) {
                return e.getAsJsonObject();
            }
        }
        throw new AssertionError("site " + id + " not listed");
    }

    @Test
    void addEditAndListASitesZone() {
        String id = ok("sites", "add", "--name", "Marsh residence", "--address", "7 Gull Row, Saltreed",
                "--time-zone", "America/Chicago", "--json").json().get("id").getAsString();
        assertEquals("America/Chicago", listed(id).get("timeZone").getAsString());
        assertTrue(ok("sites", "list").out().contains("America/Chicago"));
        ok("sites", "edit", id.substring(0, 8), "--time-zone", "america/denver");
        JsonObject after = listed(id);
        assertEquals("America/Denver", after.get("timeZone").getAsString(), "kept in the database's spelling");
        assertEquals("Marsh residence", after.get("name").getAsString(), "what was not given stays");
        ok("sites", "edit", id, "--time-zone", "none");
        assertTrue(listed(id).get("timeZone").isJsonNull());
        assertTrue(ok("sites", "list").out().contains("(no zone)"));
    }

    @Test
    void aZoneThatIsNotARegionIdExitsTwoNamingTheFieldAndTheValue() {
        Run bad = run("sites", "add", "--name", "Quay office", "--time-zone", "Central Time");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("site time zone") && bad.err().contains("'Central Time'")
                && bad.err().contains("America/Chicago"), bad.err());
        assertEquals(2, run("sites", "add", "--name", "Quay office", "--time-zone", "-05:00").code(),
                "a fixed offset would be an hour off once the clocks change");
        JsonArray none = JsonParser.parseString(ok("sites", "list", "--json").out()).getAsJsonArray();
        assertEquals(0, none.size(), "nothing saved");
        String id = ok("sites", "add", "--name", "Quay office", "--time-zone", "America/Halifax", "--json").json()
                .get("id").getAsString();
        assertEquals(2, run("sites", "edit", id, "--time-zone", "Atlantic/Saltreed").code());
        assertEquals("America/Halifax", listed(id).get("timeZone").getAsString(), "the refused edit saved nothing");
    }

    @Test
    void attachLogReadsClockTimesWithoutAnOffsetInTheSitesZone() throws Exception {
        String site = ok("sites", "add", "--name", "Marsh residence", "--address", "7 Gull Row, Saltreed",
                "--time-zone", "America/Denver", "--json").json().get("id").getAsString();
        String system = ok("systems", "add", site.substring(0, 8), "--label", "Attic air handler", "--nominal-tons",
                "3", "--json").json().get("id").getAsString();
        String visit = ok("visits", "new", system, "--technician", "Rowan Teale", "--started-at",
                "2026-07-15T09:00:00-06:00", "--json").json().get("id").getAsString();
        List<String> local = Files.readAllLines(Path.of("field-data-samples/oversized-short-cycling.csv")).stream()
                .map(l -> l.replaceFirst("-04:00,", ",")).toList();
        Path file = dir.resolve("no-offset.csv");
        Files.write(file, local, StandardCharsets.UTF_8);

        Run text = ok("visits", "attach-log", visit, file.toString());
        assertTrue(text.out().contains("clock times read in the site's zone America/Denver"), text.out());
        JsonObject json = ok("visits", "attach-log", visit, file.toString(), "--time-zone", "America/Chicago",
                "--json").json();
        assertEquals("America/Chicago", json.get("timeZone").getAsString());
        assertEquals("chosen", json.get("timeZoneFrom").getAsString());
        assertTrue(ok("visits", "show", visit).out().contains("America/Denver"), "the site's zone is shown");
        try (Ledger ledger = Ledger.open(dir.resolve("data"))) {
            List<ImportedLog> logs = ledger.logs().forVisit(visit);
            assertEquals("America/Denver", logs.get(0).kept().timeZone());
            // 00:00 local in Denver in July is 06:00 UTC (Mountain Daylight Time, UTC−6; from memory)
            LocalDateTime first = LocalDateTime.parse(local.get(1).substring(0, local.get(1).indexOf(',')));
            assertEquals(first.toEpochSecond(ZoneOffset.ofHours(-6)) * 1000, logs.get(0).samples().timesMs()[0]);
            assertEquals(first.toEpochSecond(ZoneOffset.ofHours(-5)) * 1000, logs.get(1).samples().timesMs()[0]);
        }
    }
}
