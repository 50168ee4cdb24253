package app.latentledger.cli;

import app.latentledger.core.findings.Cautions;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.fielddata.SyntheticLog;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SettingsCommandTest {
    /** Case A of CoilCommandTest at 1260 cfm on a nominal 3-ton unit: 1260 / 3 = 420 cfm/ton, by hand. */
    private static final String COIL_420 = "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90"
            + " --airflow 1260 --nominal-tons 3 --json";

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private Run run(String line) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> words = new ArrayList<>(List.of("--data-dir", dir.resolve("data").toString()));
        words.addAll(Arrays.asList(line.trim().split("\\s+")));
        int code = Cli.standard().run(words, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private JsonObject json(String line) {
        Run r = run(line);
        assertEquals(0, r.code(), r.err());
        return JsonParser.parseString(r.out()).getAsJsonObject();
    }

    private JsonObject setting(String key) {
        for (JsonElement e : json("settings show --json").getAsJsonArray("settings")) {
            if (e.getAsJsonObject().get("key").getAsString().equals(key)) {
                return e.getAsJsonObject();
            }
        }
        throw new AssertionError(key);
    }

    private static List<String> findingCodes(JsonObject coil) {
        List<String> codes = new ArrayList<>();
        coil.getAsJsonArray("findings").forEach(f -> codes.add(f.getAsJsonObject().get("code").getAsString()));
        return codes;
    }

    @Test
    @DisplayName("show on a tablet with no ledger lists every setting with value, unit, default and source, creating nothing")
    void showDefaultsWithoutALedger() {
        JsonObject o = json("settings show --json");
        assertEquals("ip", o.get("units").getAsString());
        JsonArray rows = o.getAsJsonArray("settings");
        assertEquals(SettingsCatalogue.keys().size(), rows.size());
        for (JsonElement e : rows) {
            JsonObject r = e.getAsJsonObject();
            for (String k : List.of("key", "group", "label", "value", "unit", "default", "source", "isDefault")) {
                assertTrue(r.has(k), k + " in " + r);
            }
            assertTrue(r.get("isDefault").getAsBoolean());
            assertFalse(r.get("source").getAsString().isBlank(), r.toString());
        }
        JsonObject high = setting("coilHighAirflowPerTon");
        assertEquals(450, high.get("value").getAsDouble(), 1e-9);
        assertEquals("cfm/ton", high.get("unit").getAsString());
        assertTrue(high.get("source").getAsString().contains("FSEC-PF-321-97"));
        assertFalse(Files.exists(dir.resolve("data")), "show created no ledger");
        Run table = run("settings show");
        assertTrue(table.out().contains("Finding thresholds"), table.out());
        assertTrue(table.out().trim().endsWith(Cautions.SAFETY_LINE));
        assertTrue(Cli.standard().overview().contains("settings"));
        // ranges as the app's hints print them, rounded inward to the shown precision: -450 m is
        // -1476.378 ft and 4500 m is 14763.78 ft (1 ft = 0.3048 m exactly, NIST SP 811); the edge band
        // of 0.15–0.45 K is 0.27–0.81 °F (× 1.8)
        assertTrue(table.out().contains("range -1476 to 14763 ft"), table.out());
        assertTrue(table.out().contains("range 0.3 to 0.8 °F"), table.out());
        assertFalse(table.out().contains("14763.7795"), table.out());
        // values and defaults at the shown decimals too: 2000 J/kg is 0.8598 Btu/lb (1 Btu/lb = 2326 J/kg
        // exactly, ASHRAE Handbook—Fundamentals ch. 39), shown to 0.1 Btu/lb like every enthalpy
        assertTrue(table.out().contains("0.9 Btu/lb   default 0.9 Btu/lb; range 0.5 to 1.2 Btu/lb"), table.out());
        assertFalse(table.out().contains("0.8598"), table.out());
        assertEquals(2000.0 / 2326, setting("blowerEnthalpyBand").get("value").getAsDouble(), 1e-4,
                "the JSON, for programs, keeps the exact value");
    }

    @Test
    @DisplayName("high-airflow-per-ton: 420 ± 48 cfm/ton passes the 450 default (FSEC-PF-321-97: 350–450 cfm/ton) and"
            + " fires at a stored 350, which it clearly exceeds")
    void aStoredThresholdChangesACoilFinding() {
        assertFalse(findingCodes(json(COIL_420)).contains("high-airflow-per-ton"));
        Run set = run("settings set coilHighAirflowPerTon 350");
        assertEquals(0, set.code(), set.err());
        assertEquals("coilHighAirflowPerTon = 350 cfm/ton  (default 450 cfm/ton)\n", set.out());
        JsonObject coil = json(COIL_420);
        assertTrue(findingCodes(coil).contains("high-airflow-per-ton"), coil.toString());
        double limit = Double.NaN;
        double shown = Double.NaN;
        for (JsonElement f : coil.getAsJsonArray("findings")) {
            if (f.getAsJsonObject().get("code").getAsString().equals("high-airflow-per-ton")) {
                for (JsonElement e : f.getAsJsonObject().getAsJsonArray("evidence")) {
                    JsonObject ev = e.getAsJsonObject();
                    if (ev.get("key").getAsString().equals("coilHighAirflowPerTon")) {
                        limit = ev.get("value").getAsDouble();
                    } else {
                        shown = ev.get("value").getAsDouble();
                    }
                }
            }
        }
        assertEquals(350, limit, 1e-9, "the finding names the stored limit");
        assertEquals(420, shown, 1e-9);
        assertEquals(0, run("settings reset coilHighAirflowPerTon").code());
        assertFalse(findingCodes(json(COIL_420)).contains("high-airflow-per-ton"));
    }

    @Test
    @DisplayName("Refused values and unknown keys: exit 2, the key, value and range named, nothing stored")
    void refusals() {
        Run r = run("settings set coilHighAirflowPerTon 700");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("coilHighAirflowPerTon"), r.err());
        assertTrue(r.err().contains("700 cfm/ton refused"), r.err());
        assertTrue(r.err().contains("accepted range 225 to 675 cfm/ton"), r.err());
        assertEquals(450, setting("coilHighAirflowPerTon").get("value").getAsDouble(), 1e-9);
        Run unknown = run("settings set coilHugeAirflow 1");
        assertEquals(2, unknown.code());
        assertTrue(unknown.err().contains("unknown setting 'coilHugeAirflow'"), unknown.err());
        Run word = run("settings set theme purple");
        assertEquals(2, word.code());
        assertTrue(word.err().contains("theme 'purple' refused: accepted light, dark, outdoor"), word.err());
        Run nan = run("settings set tolRh lots");
        assertEquals(2, nan.code());
        assertTrue(nan.err().contains("tolRh value 'lots' is not a number"), nan.err());
        assertEquals(2, run("settings reset noSuchKey").code());
        assertEquals(2, run("settings frobnicate").code());
    }

    @Test
    @DisplayName("Values are typed in the stored units; the stored units become the commands' default")
    void unitsFollowTheSetting() {
        assertEquals(0, run("settings set units si").code());
        // 2 K typed in SI = 3.6 °F (× 1.8)
        assertEquals(0, run("settings set tolDryBulb 2").code());
        assertEquals(2.0, setting("tolDryBulb").get("value").getAsDouble(), 1e-9);
        assertEquals("K", setting("tolDryBulb").get("unit").getAsString());
        assertEquals(0, run("settings set units ip").code());
        assertEquals(3.6, setting("tolDryBulb").get("value").getAsDouble(), 1e-9);
        assertEquals(0, run("settings set units si").code());
        JsonObject si = json("coil --return-db 23.9 --return-rh 50 --supply-db 12.8 --supply-rh 90 --airflow 566 --json");
        assertEquals("si", si.get("units").getAsString());
        JsonObject ip = json("coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --units ip"
                + " --json");
        assertEquals("ip", ip.get("units").getAsString(), "an explicit --units still wins");
    }

    @Test
    @DisplayName("A stored dry-bulb tolerance widens the coil's uncertainty; an explicit --tol-db still wins")
    void storedToleranceIsTheCoilDefault() {
        String caseA = "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200 --json";
        double plain = json(caseA).getAsJsonObject("uncertainty").get("enteringDewPoint").getAsDouble();
        assertEquals(0, run("settings set tolDryBulb 2").code());
        double wide = json(caseA).getAsJsonObject("uncertainty").get("enteringDewPoint").getAsDouble();
        assertTrue(wide > plain, wide + " vs " + plain);
        double explicit = json(caseA + " --tol-db 0.5").getAsJsonObject("uncertainty").get("enteringDewPoint")
                .getAsDouble();
        assertEquals(plain, explicit, 1e-12);
    }

    @Test
    @DisplayName("The stored elevation is the coil's default site; --elevation still wins")
    void storedElevation() {
        assertEquals(0, run("settings set defaultElevation 5000").code());
        String caseA = "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200";
        Run stored = run(caseA);
        assertTrue(stored.out().contains("standard atmosphere at 5,000 ft"), stored.out());
        Run explicit = run(caseA + " --elevation 0");
        assertTrue(explicit.out().contains("standard atmosphere at 0 ft"), explicit.out());
    }

    @Test
    @DisplayName("log uses the stored thresholds: 2 starts an hour is short cycling at a stored limit of 1.5")
    void storedThresholdChangesALogFinding() throws Exception {
        SyntheticLog.Scenario s = new SyntheticLog.Scenario();
        s.intervalS = 10;
        s.onOff = new double[] {1200, 600}; // 20 min on, 10 off: 2 starts an hour
        s.fillToS = 4 * 3600;
        s.blower = SyntheticLog.Blower.CONTINUOUS;
        s.returnRhPct = 45;
        s.splitK = 9;
        s.steadyDryingW = 0.0012;
        Path f = dir.resolve("log.csv");
        try (Writer w = Files.newBufferedWriter(f)) {
            SyntheticLog.generate(s).write(w, new SyntheticLog.Layout());
        }
        assertFalse(findingCodes(json("log " + f + " --json")).contains("short-cycling"));
        assertEquals(0, run("settings set cyclesPerHourMax 1.5").code());
        assertTrue(findingCodes(json("log " + f + " --json")).contains("short-cycling"));
    }

    @Test
    void resetPutsEverythingBack() {
        assertEquals(0, run("settings set paper a4").code());
        assertEquals(0, run("settings set indoorRhTarget 50").code());
        assertEquals("a4", setting("paper").get("value").getAsString());
        assertEquals(0, run("settings reset indoorRhTarget").code());
        assertEquals(60, setting("indoorRhTarget").get("value").getAsDouble(), 1e-9);
        assertEquals("a4", setting("paper").get("value").getAsString());
        assertEquals(0, run("settings reset").code());
        for (JsonElement e : json("settings show --json").getAsJsonArray("settings")) {
            assertTrue(e.getAsJsonObject().get("isDefault").getAsBoolean(), e.toString());
        }
    }
}
