package app.latentledger.cli;

import app.latentledger.store.DemoScenario;
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
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class VisitsCommandTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
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

    @Test
    void listJsonHasTheIssuesFieldsAndTheDemo() {
        Run r = run("visits", "list", "--json");
        assertEquals(0, r.code(), r.err());
        JsonArray visits = JsonParser.parseString(r.out()).getAsJsonArray();
        assertEquals(2, visits.size());
        for (var v : visits) {
            JsonObject o = v.getAsJsonObject();
            for (String field : List.of("id", "site", "system", "date", "purpose")) {
                assertTrue(o.has(field), field + " in " + o);
            }
        }
        JsonObject complaint = visits.get(1).getAsJsonObject();
        assertEquals(DemoScenario.VISIT_COMPLAINT, complaint.get("id").getAsString());
        assertEquals("complaint", complaint.get("purpose").getAsString());
        assertEquals("2024-07-16T09:40:00-04:00", complaint.get("date").getAsString());
        assertEquals("Heron Spit Road residence", complaint.get("site").getAsString());
        assertTrue(Files.exists(dir.resolve("data").resolve("ledger.db")), "--data-dir used");
    }

    @Test
    void aSettingsCommandLeavesANewFolderEmptyAndVisitsThenShowsTheDemo() {
        assertEquals(0, run("settings", "show").code());
        try (app.latentledger.store.Ledger l = app.latentledger.store.Ledger.open(dir.resolve("data"))) {
            assertEquals(0, l.sites().all().size(), "only the faces a tech looks through seed the demo");
        }
        Run r = run("visits", "list", "--json");
        assertEquals(0, r.code(), r.err());
        assertEquals(2, JsonParser.parseString(r.out()).getAsJsonArray().size(), "the demo's two visits");
    }

    @Test
    void showByPrefixEndsWithTheSafetyLine() {
        Run r = run("visits", "show", DemoScenario.VISIT_COMPLAINT.substring(0, 6));
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("[before]") && r.out().contains("[after]"), r.out());
        assertTrue(r.out().contains("470 cfm/ton"), r.out());
        assertTrue(r.out().strip().endsWith(app.latentledger.core.findings.Cautions.SAFETY_LINE), r.out());
        Run json = run("visits", "show", DemoScenario.VISIT_COMPLAINT, "--json", "--units", "si");
        JsonObject o = JsonParser.parseString(json.out()).getAsJsonObject();
        assertEquals(2, o.getAsJsonArray("readingSets").size());
        // 76 °F = 24.444 °C: (76 − 32) / 1.8
        assertEquals(24.444, o.getAsJsonArray("readingSets").get(0).getAsJsonObject()
                .getAsJsonObject("returnDryBulb").get("value").getAsDouble(), 1e-3);
    }

    @Test
    void exportThenImportElsewhere() {
        Path bundle = dir.resolve("out").resolve("visit.zip");
        Run export = run("visits", "export", DemoScenario.VISIT_COMMISSIONING, bundle.toString(), "--json");
        assertEquals(0, export.code(), export.err());
        assertTrue(Files.exists(bundle));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int code = Cli.standard().run(List.of("--data-dir", dir.resolve("other").toString(), "visits", "import",
                bundle.toString(), "--json"), new PrintStream(out, true, StandardCharsets.UTF_8), System.err);
        assertEquals(0, code);
        JsonObject summary = JsonParser.parseString(out.toString(StandardCharsets.UTF_8)).getAsJsonObject();
        // the other folder was new, so it got the demo first: everything in the bundle is already there
        assertEquals(0, summary.get("added").getAsInt());
        assertEquals(4, summary.get("alreadyPresent").getAsInt());

        Run site = run("visits", "export-site", DemoScenario.SITE_HERON, dir.resolve("site.zip").toString());
        assertEquals(0, site.code(), site.err());
        assertTrue(site.out().startsWith("Exported site Heron Spit Road residence"), site.out());
    }

    @Test
    void refusalsExitWithTwoAndSayWhy() throws Exception {
        Run unknown = run("visits", "show", "zzzzzz");
        assertEquals(2, unknown.code());
        assertTrue(unknown.err().contains("no visit with id 'zzzzzz'"), unknown.err());
        Path junk = dir.resolve("junk.zip");
        Files.writeString(junk, "not a zip");
        Run bad = run("visits", "import", junk.toString());
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("not a complete zip"), bad.err());
        assertEquals(2, run("visits").code());
        assertEquals(2, run("visits", "frobnicate").code());
        assertEquals(2, run("visits", "list", "--colour").code());
        assertEquals(2, run("visits", "export", "onlyone").code());
    }
}
