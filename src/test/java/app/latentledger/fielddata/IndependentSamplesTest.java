package app.latentledger.fielddata;

import app.latentledger.cli.Cli;
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

/** The independently generated samples: reproducible, and the command line finds what their README says. */
class IndependentSamplesTest {
    private static final Path DIR = Path.of("field-data-samples");

    private static final Map<String, Set<String>> DOCUMENTED = Map.of(
            "fan-delay-no-status.csv", Set.of("fan-off-delay-reevaporation"),
            "celsius-plain.csv", Set.of("fan-off-delay-reevaporation"),
            "us-dates-hot-week.csv", Set.of("oversized-for-load", "short-cycling"));

    private static int run(List<String> words, ByteArrayOutputStream out, ByteArrayOutputStream err) {
        return Cli.standard().run(words, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    @Test
    @DisplayName("committed files are what the independent generator writes")
    void reproducible() throws Exception {
        for (IndependentSamples.Sample s : IndependentSamples.all()) {
            String committed = Files.readString(DIR.resolve(s.file()), StandardCharsets.UTF_8);
            assertEquals(s.truth().csv(), committed, s.file() + " differs from its generator; rerun IndependentSamples");
            assertTrue(committed.length() < 1_000_000, s.file());
        }
    }

    @Test
    @DisplayName("each gives its documented findings; returned share within ±10 points of the integrated truth")
    void documented() throws Exception {
        for (IndependentSamples.Sample s : IndependentSamples.all()) {
            List<String> words = new ArrayList<>(List.of("log", DIR.resolve(s.file()).toString()));
            words.addAll(s.options());
            words.add("--json");
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            ByteArrayOutputStream err = new ByteArrayOutputStream();
            assertEquals(0, run(words, out, err), s.file() + ": " + err.toString(StandardCharsets.UTF_8));
            JsonObject o = JsonParser.parseString(out.toString(StandardCharsets.UTF_8)).getAsJsonObject();
            Set<String> codes = new TreeSet<>();
            for (JsonElement e : o.getAsJsonArray("findings")) {
                codes.add(e.getAsJsonObject().get("code").getAsString());
            }
            assertEquals(DOCUMENTED.get(s.file()), codes, s.file());
            IndependentLog.Truth t = s.truth();
            assertEquals(t.runs(), o.getAsJsonArray("cycles").size(), 1, s.file() + " runs");
            if (t.returnedKg() > 0) {
                assertEquals(t.share(), o.get("reevaporationShare").getAsDouble(), 0.10, s.file() + " share");
            }
        }
    }

    @Test
    @DisplayName("the °C sample under °F settings is refused with the column, its values and the unit (exit 2)")
    void celsiusRefusedUnderFahrenheit() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = run(List.of("log", DIR.resolve("celsius-plain.csv").toString(), "--units", "ip"), out, err);
        String msg = err.toString(StandardCharsets.UTF_8);
        assertEquals(2, code, msg);
        assertTrue(msg.contains("return_db") && msg.contains("°F") && msg.contains("°C"), msg);
    }
}
