package app.latentledger.fielddata;

import app.latentledger.cli.Cli;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The invented logs in field-data-samples/ give what their README says. Ground truth is the
 * generator's own run list (the cycles it was told to make), so the counts are exact.
 */
class FieldSamplesTest {
    private static final Path DIR = Path.of("field-data-samples");

    /** Findings documented in field-data-samples/README.md. */
    private static final Map<String, Set<String>> DOCUMENTED = Map.of(
            "healthy-long-cycling.csv", Set.of(),
            "oversized-short-cycling.csv", Set.of("short-cycling", "short-cycling-limits-latent", "fan-off-delay-reevaporation"),
            "blower-left-on.csv", Set.of("off-cycle-reevaporation"),
            "other-logger-export.csv", Set.of("off-cycle-reevaporation", "sensor-offset"));

    private static JsonObject run(FieldSamples.Sample s) {
        List<String> words = new ArrayList<>(List.of("log", DIR.resolve(s.file()).toString()));
        words.addAll(s.options());
        words.add("--json");
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.standard().run(words, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(0, code, err.toString(StandardCharsets.UTF_8));
        return JsonParser.parseString(out.toString(StandardCharsets.UTF_8)).getAsJsonObject();
    }

    private static Set<String> codes(JsonObject o) {
        Set<String> c = new TreeSet<>();
        for (JsonElement e : o.getAsJsonArray("findings")) {
            c.add(e.getAsJsonObject().get("code").getAsString());
        }
        return c;
    }

    @Test
    @DisplayName("committed sample files are exactly what the generator writes (reproducible) and stay small")
    void reproducible() throws Exception {
        for (FieldSamples.Sample s : FieldSamples.all()) {
            String committed = Files.readString(DIR.resolve(s.file()), StandardCharsets.UTF_8);
            assertEquals(s.text(), committed, s.file() + " differs from its generator; rerun FieldSamples");
            assertTrue(committed.length() < 1_000_000, s.file());
        }
    }

    @Test
    @DisplayName("each sample gives exactly the findings its README documents, and every run it was made with")
    void documentedFindings() throws Exception {
        for (FieldSamples.Sample s : FieldSamples.all()) {
            JsonObject o = run(s);
            assertEquals(new TreeSet<>(DOCUMENTED.get(s.file())), codes(o), s.file());
            assertEquals(s.trueRuns(), o.getAsJsonArray("cycles").size(), s.file() + " cycle count");
            assertEquals(24.0, o.get("durationHours").getAsDouble(), 0.01, s.file());
        }
    }

    @Test
    @DisplayName("sample details from the README: fitted model, blower states, rejected rows, sensor correction")
    void details() throws Exception {
        Map<String, JsonObject> r = new java.util.HashMap<>();
        for (FieldSamples.Sample s : FieldSamples.all()) {
            r.put(s.file(), run(s));
        }
        JsonObject healthy = r.get("healthy-long-cycling.csv");
        assertTrue(healthy.get("latentFractionMeasured").getAsDouble() > 0.9);
        assertAllBlower(healthy.getAsJsonArray("cycles"), "off");
        assertEquals("default", healthy.getAsJsonObject("modelParameters").get("source").getAsString());

        JsonObject shortCycling = r.get("oversized-short-cycling.csv");
        assertTrue(shortCycling.get("cyclesPerHour").getAsDouble() > 3);
        assertTrue(shortCycling.get("medianOnMinutes").getAsDouble() < 8);
        assertTrue(shortCycling.get("latentFractionMeasured").getAsDouble() < 0.7);

        JsonObject blowerOn = r.get("blower-left-on.csv");
        assertAllBlower(blowerOn.getAsJsonArray("cycles"), "on");
        JsonObject model = blowerOn.getAsJsonObject("modelParameters");
        assertEquals("fitted", model.get("source").getAsString());
        // generator: t_wet 1300 s, gamma 1.3 (invented coil)
        assertEquals(1300, model.get("twetSeconds").getAsDouble(), 0.1 * 1300);
        assertEquals(1.3, model.get("gamma").getAsDouble(), 0.1 * 1.3);

        JsonObject other = r.get("other-logger-export.csv");
        assertEquals(2, other.getAsJsonObject("rejectedRows").get("count").getAsInt());
        assertEquals(1, other.getAsJsonObject("import").get("duplicates").getAsInt());
        assertEquals(4.5, other.get("sensorOffsetRh").getAsDouble(), 0.5);
        assertEquals(List.of("Battery [V]"), List.of(other.getAsJsonObject("import").getAsJsonArray("ignoredHeaders")
                .get(0).getAsString()));
    }

    private static void assertAllBlower(JsonArray cycles, String state) {
        for (JsonElement c : cycles) {
            JsonObject o = c.getAsJsonObject();
            if (o.get("offComplete").getAsBoolean()) {
                assertEquals(state, o.get("offBlower").getAsString(), o.toString());
            }
        }
    }
}
