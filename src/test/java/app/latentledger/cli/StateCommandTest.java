package app.latentledger.cli;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The {@code state} command as a tech or a script uses it. */
class StateCommandTest {

    record Run(int code, String out, String err) {
        JsonObject json() {
            return JsonParser.parseString(out).getAsJsonObject();
        }
    }

    static Run run(String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.standard().run(List.of(words), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** AHRI rating entering air 80/67 °F (docs/methods.md §9.8, values [DER] from HoF IP eqs). */
    @Test
    void jsonForTheRatingPoint() {
        Run r = run("state", "--dry-bulb", "80", "--wet-bulb", "67", "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject j = r.json();
        for (String key : List.of("units", "pressure", "dryBulb", "wetBulb", "dewPoint", "relativeHumidity",
                "humidityRatio", "enthalpy", "specificVolume")) {
            assertTrue(j.has(key), key);
        }
        assertEquals("ip", j.get("units").getAsString());
        assertEquals(14.696, j.get("pressure").getAsDouble(), 0.0005);
        assertEquals(60.3, j.get("dewPoint").getAsDouble(), 0.05);
        assertEquals(51.1, j.get("relativeHumidity").getAsDouble(), 0.05);
        assertEquals(0.01117, j.get("humidityRatio").getAsDouble(), 0.000005);
        assertEquals(31.45, j.get("enthalpy").getAsDouble(), 0.005);
        // 13.85 ft³/lb: PsychroLib 2.5.0 GetMoistAirVolume at the same state (its grid README anchor)
        assertEquals(13.8494, j.get("specificVolume").getAsDouble(), 0.0005);
    }

    /** ASHRAE HoF 2017 ch. 1 Example 1 in SI (see HandbookChecksTest for the hand calculation). */
    @Test
    void siExample1() {
        JsonObject j = run("state", "--units", "si", "--dry-bulb", "40", "--wet-bulb", "20", "--json").json();
        assertEquals("si", j.get("units").getAsString());
        assertEquals(101.325, j.get("pressure").getAsDouble(), 1e-9);
        assertEquals(0.006404, j.get("humidityRatio").getAsDouble(), 0.000005);
        assertEquals(56.73, j.get("enthalpy").getAsDouble(), 0.02);
        assertEquals(0.8962, j.get("specificVolume").getAsDouble(), 0.0002);
    }

    /** 5280 ft standard atmosphere 12.100 psia (docs/methods.md §9.8, [DER] from eq. 3). */
    @Test
    void elevationSetsPressure() {
        JsonObject j = run("state", "--elevation", "5280", "--dry-bulb", "75", "--rh", "40", "--json").json();
        assertEquals(12.100, j.get("pressure").getAsDouble(), 0.001);
        JsonObject m = run("state", "--pressure", "12.1", "--dry-bulb", "75", "--rh", "40", "--json").json();
        assertEquals(j.get("humidityRatio").getAsDouble(), m.get("humidityRatio").getAsDouble(), 2e-6);
    }

    @Test
    void everyHumidityInputDescribesTheSameAir() {
        JsonObject base = run("state", "--dry-bulb", "75", "--rh", "50", "--json").json();
        double dp = base.get("dewPoint").getAsDouble();
        double wb = base.get("wetBulb").getAsDouble();
        double w = base.get("humidityRatio").getAsDouble();
        for (String[] alt : new String[][] {{"--dew-point", String.valueOf(dp)}, {"--wet-bulb", String.valueOf(wb)},
                {"--humidity-ratio", String.valueOf(w)}, {"--grains", String.valueOf(w * 7000)}}) {
            JsonObject j = run("state", "--dry-bulb", "75", alt[0], alt[1], "--json").json();
            assertEquals(50, j.get("relativeHumidity").getAsDouble(), 1e-6, Arrays.toString(alt));
        }
        JsonObject si = run("state", "--units", "si", "--dry-bulb", "23.888889", "--grams", String.valueOf(w * 1000),
                "--json").json();
        assertEquals(50, si.get("relativeHumidity").getAsDouble(), 0.001);
    }

    @Test
    void readableTableEndsWithUnits() {
        Run r = run("state", "--dry-bulb", "80", "--wet-bulb", "67");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("dew point"), r.out());
        assertTrue(r.out().matches("(?s).*60\\.32 °F.*"), r.out());
        assertTrue(r.out().contains("gr/lb"), r.out());
    }

    @ParameterizedTest(name = "refused: {0}")
    @CsvSource(delimiter = '|', value = {
        "--dry-bulb 65 --wet-bulb 70|--wet-bulb: wet bulb 70 °F refused: a wet bulb cannot be above the dry bulb",
        "--dry-bulb 65 --dew-point 70|--dew-point: dew point 70 °F refused: a dew point cannot be above the dry bulb",
        "--dry-bulb 75 --rh 120|--rh: relative humidity 120 % refused: accepted range 0 to 100 %",
        "--dry-bulb 250 --rh 50|--dry-bulb: dry bulb 250 °F refused: accepted range -58 to 203 °F",
        "--dry-bulb 75 --rh 50 --elevation 20000|--elevation: elevation 20000 ft refused: accepted range",
        "--dry-bulb 75 --rh 50 --pressure 3|--pressure: pressure 3 psia refused: accepted range",
        "--dry-bulb abc --rh 50|--dry-bulb value 'abc' is not a number",
        "--dry-bulb NaN --rh 50|--dry-bulb value 'NaN' is not a number",
        "--dry-bulb 75|give exactly one of --wet-bulb",
        "--dry-bulb 75 --rh 50 --wet-bulb 60|give exactly one of",
        "--rh 50|--dry-bulb is required",
        "--dry-bulb 75 --rh 50 --elevation 0 --pressure 14.7|give --elevation or --pressure, not both",
        "--dry-bulb 75 --rh 50 --units metric|--units units 'metric' not understood",
        "--dry-bulb 75 --rh 50 --colour red|unknown option --colour",
        "--dry-bulb 75 --grams 10|--grams goes with --units si"
    })
    void badInputExitsTwoNamingTheField(String options, String expected) {
        String[] words = ("state " + options).split(" ");
        Run r = run(words);
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains(expected), r.err());
        assertEquals("", r.out());
    }

    @Test
    void unknownCommandAndHelp() {
        assertEquals(2, run("colour").code());
        Run help = run("state", "--help");
        assertEquals(0, help.code());
        assertTrue(help.out().contains("--wet-bulb"));
        assertTrue(run("--help").out().contains("state"));
    }
}
