package app.latentledger.cli;

import app.latentledger.core.findings.Cautions;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CoilCommandTest {
    private static final String CASE_A = "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200";

    record Run(int code, String out, String err) {
    }

    static Run run(String line) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> words = new ArrayList<>(Arrays.asList(line.trim().split("\\s+")));
        int code = Cli.standard().run(words, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    static JsonObject json(String line) {
        Run r = run(line + " --json");
        assertEquals(0, r.code(), r.err());
        return JsonParser.parseString(r.out()).getAsJsonObject();
    }

    @Test
    @DisplayName("a refused --condensate says mL, the unit it is typed in, even in IP units; --condensate-floz says fl oz")
    void condensateRefusalInTheTypedUnit() {
        // the catch limit is 0.05 m³ = 50000 mL = 1690.7 fl oz (1 US fl oz = 29.5735295625 mL, NIST SP 811)
        Run ml = run(CASE_A + " --condensate 60000 --condensate-minutes 15");
        assertEquals(2, ml.code(), ml.err());
        assertTrue(ml.err().contains("--condensate: condensate volume 60000 mL refused: accepted range 0 to 50000 mL"),
                ml.err());
        Run floz = run(CASE_A + " --condensate-floz 2000 --condensate-minutes 15");
        assertEquals(2, floz.code(), floz.err());
        assertTrue(floz.err().contains("--condensate-floz: condensate volume 2000 fl oz refused: accepted range 0 to"
                + " 1690.7 fl oz"), floz.err());
    }

    @Test
    @DisplayName("--json carries the issue's keys; case A answers as computed by hand from HoF ch. 1 (see CoilProcessTest)")
    void jsonKeysAndCaseA() {
        JsonObject j = json(CASE_A);
        for (String key : List.of("entering", "leaving", "sensible", "latent", "total", "shr", "moistureRemoval",
                "apparatusDewPoint", "bypassFactor", "enteringDewPoint", "coilTemperature", "coilTemperatureSource",
                "dewPointMargin", "verdict", "uncertainty", "findings", "safety")) {
            assertTrue(j.has(key), key);
        }
        assertEquals(75.0, j.getAsJsonObject("entering").get("dryBulb").getAsDouble(), 1e-9);
        assertEquals(25_694, j.get("sensible").getAsDouble(), 25_694 * 0.003);
        assertEquals(31_135, j.get("total").getAsDouble(), 31_135 * 0.003);
        assertEquals(5.12, j.get("moistureRemoval").getAsDouble(), 0.02);
        assertEquals(51.6, j.get("apparatusDewPoint").getAsDouble(), 0.05);
        assertEquals(0.146, j.get("bypassFactor").getAsDouble(), 0.001);
        assertEquals("apparatus-dew-point", j.get("coilTemperatureSource").getAsString());
        assertEquals("dehumidifying", j.get("verdict").getAsString());
        JsonObject u = j.getAsJsonObject("uncertainty");
        assertEquals(2, u.get("coverageFactor").getAsInt());
        for (String key : List.of("enteringDewPoint", "humidityRatioDrop", "latent", "shr", "dewPointMargin")) {
            assertTrue(u.get(key).getAsDouble() > 0, key);
        }
        JsonObject f = j.getAsJsonArray("findings").get(0).getAsJsonObject();
        for (String key : List.of("code", "severity", "message", "evidence")) {
            assertTrue(f.has(key), key);
        }
        assertEquals(Cautions.SAFETY_LINE, j.get("safety").getAsString());
    }

    @Test
    @DisplayName("No ADP: apparatusDewPoint and bypassFactor are null, not a number")
    void nullWhenNoAdp() {
        JsonObject j = json("coil --return-db 75 --return-rh 50 --supply-db 63 --supply-rh 86 --airflow 1200");
        assertTrue(j.get("apparatusDewPoint").isJsonNull());
        assertTrue(j.get("bypassFactor").isJsonNull());
        assertEquals("coil-added-moisture", j.get("apparatusDewPointStatus").getAsString());
        assertEquals("not-dehumidifying", j.get("verdict").getAsString());
    }

    @Test
    @DisplayName("Capacities agree between --units ip and --units si to well under 0.1 % (same readings, exact conversions)")
    void unitsAgree() {
        JsonObject ip = json(CASE_A + " --nominal-tons 3");
        // 75 °F = 23.8889 °C, 55 °F = 12.7778 °C, 1200 cfm = 566.3369 L/s
        JsonObject si = json("coil --units si --return-db 23.888888889 --return-rh 50 --supply-db 12.777777778"
                + " --supply-rh 90 --airflow 566.33693184 --nominal-tons 3");
        double wattsPerBtuH = 1055.05585262 / 3600;
        for (String key : List.of("sensible", "latent", "total")) {
            double a = ip.get(key).getAsDouble() * wattsPerBtuH;
            double b = si.get(key).getAsDouble();
            assertEquals(b, a, Math.abs(b) * 1e-4, key);
        }
        assertEquals(ip.get("shr").getAsDouble(), si.get("shr").getAsDouble(), 1e-5);
        assertEquals(ip.get("verdict").getAsString(), si.get("verdict").getAsString());
    }

    @ParameterizedTest(name = "{1}: {0}")
    @CsvSource(delimiter = '|', value = {
            "coil --return-db 78 --return-rh 55 --supply-db 57 --supply-rh 92 --airflow 1100 --nominal-tons 3 --coil-temp 47 | dehumidifying",
            "coil --return-db 75 --return-rh 50 --supply-db 62 --supply-rh 78 --airflow 1450 --nominal-tons 3 --coil-temp 59 | not-dehumidifying",
            "coil --return-db 75 --return-rh 50 --supply-db 73 --supply-rh 53 --airflow 1200 --nominal-tons 3 --coil-temp 55 | cant-tell"})
    void threeVerdicts(String line, String verdict) {
        assertEquals(verdict, json(line).get("verdict").getAsString());
    }

    @Test
    @DisplayName("Readable output is a table that ends with the safety line")
    void readable() {
        Run r = run(CASE_A + " --coil-temp 45 --condensate 560 --condensate-minutes 15");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Verdict: dehumidifying"));
        assertTrue(r.out().contains("Btu/h"));
        assertTrue(r.out().stripTrailing().endsWith(Cautions.SAFETY_LINE));
    }

    @Test
    @DisplayName("Wet bulb and dew point options, condensate in fl oz, tolerance overrides")
    void otherOptions() {
        JsonObject j = json("coil --return-db 80 --return-wb 67 --supply-db 58 --supply-dew-point 55 --airflow 1000"
                + " --airflow-at supply --coil-temp 40 --coil-temp-kind evaporator-saturation --condensate-floz 20"
                + " --condensate-minutes 10 --tol-db 0.2 --tol-wb 0.3 --tol-dew-point 0.5 --tol-coil 2 --tol-airflow-pct 5");
        assertEquals("evaporator-saturation", j.get("coilTemperatureKind").getAsString());
        assertEquals("leaving", j.get("airflowMeasuredAt").getAsString());
        JsonObject tol = j.getAsJsonObject("uncertainty").getAsJsonObject("inputTolerances");
        assertEquals(0.2, tol.get("enteringDryBulb").getAsDouble(), 1e-9);
        assertEquals(0.3, tol.get("enteringHumidity").getAsDouble(), 1e-9);
        assertEquals(0.5, tol.get("leavingHumidity").getAsDouble(), 1e-9);
        assertEquals(2.0, tol.get("coilTemperature").getAsDouble(), 1e-9);
        assertEquals(50, tol.get("airflow").getAsDouble(), 1e-6);
        // 20 US fl oz = 591.47 mL in 10 min = 3.549 kg/h = 7.82 lb/h (exact pint, 1 g per mL)
        assertEquals(7.82, j.getAsJsonObject("condensate").get("rate").getAsDouble(), 0.01);
    }

    @ParameterizedTest(name = "refused, names {1}: {0}")
    @CsvSource(delimiter = '|', value = {
            "coil --return-db 75 --return-rh 120 --supply-db 55 --supply-rh 90 --airflow 1200 | --return-rh",
            "coil --return-db 75 --return-wb 80 --supply-db 55 --supply-rh 90 --airflow 1200 | --return-wb",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-dew-point 60 --airflow 1200 | --supply-dew-point",
            "coil --return-db 300 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 | --return-db",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 0 | --airflow",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 | --airflow",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --supply-wb 54 --airflow 1200 | --supply-wb",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --coil-temp 150 | --coil-temp",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --condensate 500 | --condensate-minutes",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --tol-rh -1 | --tol-rh",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --nominal-tons 0.1 | --nominal-tons",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow abc | --airflow",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --coil-temp 45 --coil-temp-kind fin | --coil-temp-kind",
            "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --returndb 3 | --returndb"})
    void badInput(String line, String option) {
        Run r = run(line);
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains(option), r.err());
    }

    @Test
    @DisplayName("state keeps working, and coil is listed")
    void stateUnchangedAndListed() {
        assertEquals(0, run("state --dry-bulb 80 --wet-bulb 67").code());
        assertTrue(run("--help").out().contains("coil"));
    }
}
