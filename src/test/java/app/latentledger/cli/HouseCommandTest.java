package app.latentledger.cli;

import app.latentledger.store.DemoScenario;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code house} from the command line: the issue's keys, the check house's infiltration against the
 * N-factor rule (Sherman 1987) with the outdoor air's own specific volume (HoF ch. 1 eq. 28) — 52.18
 * lb/day, computed independently with PsychroLib — refusals naming field, value and range, and the
 * demo visit from a stored ledger.
 */
class HouseCommandTest {
    private static final String SYSTEM = "--return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200"
            + " --nominal-tons 3";
    private static final String HOUSE = " --floor-area 2000 --bedrooms 3 --ach50 5 --outdoor-db 85"
            + " --outdoor-dew-point 72 --runtime-fraction 55";

    @TempDir
    Path dir;

    private CoilCommandTest.Run run(String line) {
        return CoilCommandTest.run("--data-dir " + dir.resolve("data") + " " + line);
    }

    private JsonObject json(String line) {
        CoilCommandTest.Run r = run(line + " --json");
        assertEquals(0, r.code(), r.err());
        return JsonParser.parseString(r.out()).getAsJsonObject();
    }

    private static double v(JsonObject o, String key) {
        return o.getAsJsonObject(key).get("value").getAsDouble();
    }

    @Test
    void jsonCarriesTheIssuesKeys() {
        JsonObject j = json("house " + SYSTEM + HOUSE);
        for (String key : List.of("gains", "removal", "balance", "equilibriumIndoorDewPoint", "returnLeakFraction",
                "whatIf", "dehumidifier", "findings")) {
            assertTrue(j.has(key), key);
        }
        for (String key : List.of("infiltration", "ventilation", "internal", "returnLeak", "total")) {
            assertTrue(j.getAsJsonObject("gains").getAsJsonObject(key).has("uncertainty"), key);
        }
        for (String key : List.of("needed", "ratedPortable65F", "ratedWholeHome73F", "rated80F")) {
            assertTrue(j.getAsJsonObject("dehumidifier").has(key), key);
        }
        assertEquals("n-factor", j.get("infiltrationMethod").getAsString());
        assertTrue(j.get("returnLeakFraction").isJsonNull(), "no leak readings, no fraction");
        assertEquals(52.18, v(j.getAsJsonObject("gains"), "infiltration"), 52.18 * 0.005);
        assertEquals(0.0, v(j.getAsJsonObject("gains"), "ventilation"), 1e-12);
        JsonObject g = j.getAsJsonObject("gains");
        double sum = v(g, "infiltration") + v(g, "ventilation") + v(g, "internal") + v(g, "returnLeak");
        assertEquals(sum, v(g, "total"), 1e-9);
        assertEquals(v(g, "total") - v(j, "removal"), v(j, "balance"), 1e-9);
    }

    @Test
    void siUnitsGiveTheSameBudget() {
        // the same inputs in SI: 185.8 m², 23.889 °C, 29.444 °C db / 22.222 °C dp, 566.34 L/s
        JsonObject j = json("house --units si --return-db 23.8889 --return-rh 50 --supply-db 12.7778 --supply-rh 90"
                + " --airflow 566.337 --nominal-kw 10.5506 --floor-area 185.806 --bedrooms 3 --ach50 5"
                + " --outdoor-db 29.4444 --outdoor-dew-point 22.2222 --runtime-fraction 55");
        assertEquals(23.67, v(j.getAsJsonObject("gains"), "infiltration"), 23.67 * 0.005, "kg/day");
        JsonObject ip = json("house " + SYSTEM + HOUSE);
        assertEquals(v(ip, "removal") * 0.45359237, v(j, "removal"), 0.002 * Math.abs(v(j, "removal")));
    }

    @Test
    void returnLeakAndWhatIfs() {
        JsonObject j = json("house " + SYSTEM + HOUSE + " --grille-db 75 --grille-rh 50 --plenum-db 78.25"
                + " --plenum-dew-point 57.13 --space-db 115 --space-dew-point 74 --what-if-airflow 1050"
                + " --what-if-ach50 3");
        assertEquals(0.080, j.getAsJsonObject("returnLeakFraction").get("value").getAsDouble(), 0.002);
        List<String> keys = new java.util.ArrayList<>();
        j.getAsJsonArray("whatIf").forEach(w -> keys.add(w.getAsJsonObject().get("key").getAsString()));
        assertTrue(keys.containsAll(List.of("lower-airflow", "seal-return-leak", "tighten-envelope")), keys.toString());
        double balance = v(j, "balance");
        j.getAsJsonArray("whatIf").forEach(w -> assertTrue(v(w.getAsJsonObject(), "balance") <= balance + 1e-9,
                w.getAsJsonObject().get("key").getAsString()));
    }

    @Test
    void readableTableNamesTheTermsAndCautions() {
        CoilCommandTest.Run r = run("house " + SYSTEM + HOUSE);
        assertEquals(0, r.code(), r.err());
        for (String s : List.of("Where the water comes from", "air leakage (n-factor)", "people and activities",
                "Equilibrium indoor humidity", "Fixes compared", "from memory", "attics", "licensed")) {
            assertTrue(r.out().contains(s), s + "\n" + r.out());
        }
    }

    @Test
    void refusalsNameFieldValueAndRange() {
        CoilCommandTest.Run stories = run("house " + SYSTEM + HOUSE + " --stories 4");
        assertEquals(2, stories.code());
        assertTrue(stories.err().contains("--stories") && stories.err().contains("4") && stories.err().contains("3"),
                stories.err());
        CoilCommandTest.Run area = run("house " + SYSTEM + HOUSE.replace("--floor-area 2000", "--floor-area 50"));
        assertEquals(2, area.code());
        assertTrue(area.err().contains("--floor-area") && area.err().contains("ft²"), area.err());
        CoilCommandTest.Run rh = run("house " + SYSTEM + HOUSE.replace("--outdoor-dew-point 72", "--outdoor-rh 120"));
        assertEquals(2, rh.code());
        assertTrue(rh.err().contains("--outdoor-rh"), rh.err());
        CoilCommandTest.Run noRuntime = run("house " + SYSTEM + HOUSE.replace(" --runtime-fraction 55", ""));
        assertEquals(2, noRuntime.code());
        assertTrue(noRuntime.err().contains("--runtime-fraction"), noRuntime.err());
        CoilCommandTest.Run partLeak = run("house " + SYSTEM + HOUSE + " --grille-db 75 --grille-rh 50");
        assertEquals(2, partLeak.code());
        assertTrue(partLeak.err().contains("all three"), partLeak.err());
        CoilCommandTest.Run typo = run("house " + SYSTEM + HOUSE + " --what-if-airflw 900");
        assertEquals(2, typo.code());
        assertTrue(typo.err().contains("unknown option --what-if-airflw"), typo.err());
    }

    @Test
    void theDemoVisitHasAPlausibleBudget() {
        JsonObject j = json("house --visit " + DemoScenario.VISIT_COMPLAINT);
        JsonObject g = j.getAsJsonObject("gains");
        assertEquals("sherman-grimsrud", j.get("infiltrationMethod").getAsString());
        double total = v(g, "total");
        assertTrue(total > 20 && total < 300, "a house gains tens to a few hundred lb of water a day: " + total);
        assertFalse(j.get("returnLeakFraction").isJsonNull());
        double f = j.getAsJsonObject("returnLeakFraction").get("value").getAsDouble();
        assertTrue(f > 0 && f < 0.2, "a leaky return draws a few per cent: " + f);
        assertTrue(v(j, "removal") > 0);
        CoilCommandTest.Run table = run("house --visit " + DemoScenario.VISIT_COMPLAINT);
        assertEquals(0, table.code(), table.err());
        System.out.println(table.out());
    }

    @Test
    void aKeptLogGivesRuntimeLatentFractionAndWhatTheBlowerPutsBack() {
        String file = "field-data-samples/blower-left-on.csv";
        JsonObject log = json("log " + file + " --units si --airflow 566");
        double share = log.get("reevaporationShare").getAsDouble();
        JsonObject j = json("house " + SYSTEM + HOUSE.replace(" --runtime-fraction 55", "") + " --log " + file
                + " --log-units si");
        assertEquals("log", j.get("runtimeSource").getAsString());
        assertEquals("log", j.get("latentFractionSource").getAsString());
        assertEquals(share, v(j, "reevaporated") / v(j, "removedDuringRuns"), 1e-9,
                "the share the log command reports for the same file");
        assertEquals(100 * log.get("runtimeFraction").getAsDouble(), v(j, "runtimeFraction"), 1e-6);
        JsonObject auto = null;
        for (var w : j.getAsJsonArray("whatIf")) {
            if (w.getAsJsonObject().get("key").getAsString().equals("fan-auto")) {
                auto = w.getAsJsonObject();
            }
        }
        assertNotNull(auto, "blower-on rests put water back: fan AUTO is offered");
        assertEquals(v(j, "removedDuringRuns"), v(auto, "removal"), 1e-9, "AUTO keeps what the runs removed");
        CoilCommandTest.Run both = run("house " + SYSTEM + HOUSE + " --log " + file);
        assertEquals(2, both.code());
        assertTrue(both.err().contains("not both"), both.err());
    }

    @Test
    void aVisitWithoutHouseFactsIsRefusedPlainly() {
        CoilCommandTest.Run r = run("house --visit " + DemoScenario.VISIT_COMMISSIONING);
        assertEquals(2, r.code());
        assertTrue(r.err().contains("no house facts"), r.err());
        CoilCommandTest.Run none = run("house --visit zzzzzz");
        assertEquals(2, none.code());
        assertTrue(none.err().contains("no visit"), none.err());
    }

    @Test
    void factsAndWeatherTypedWithAVisitAreKeptForTheNextRun() {
        String visit = DemoScenario.VISIT_COMMISSIONING;
        CoilCommandTest.Run typed = run("house --visit " + visit
                + " --floor-area 1500 --bedrooms 2 --ach50 6 --outdoor-db 88 --outdoor-dew-point 70"
                + " --runtime-fraction 50");
        assertEquals(0, typed.code(), typed.err());
        // the second run types nothing: the facts and the weather came back from the ledger
        JsonObject again = json("house --visit " + visit + " --runtime-fraction 50");
        JsonObject first = json("house --visit " + visit + " --runtime-fraction 50");
        assertEquals(v(first.getAsJsonObject("gains"), "total"), v(again.getAsJsonObject("gains"), "total"), 1e-9);
        assertTrue(v(again.getAsJsonObject("gains"), "infiltration") > 0, again.toString());
        // a refused fact stores nothing
        CoilCommandTest.Run bad = run("house --visit " + visit + " --floor-area 50 --bedrooms 2 --runtime-fraction 50");
        assertEquals(2, bad.code());
        assertEquals(v(first.getAsJsonObject("gains"), "total"),
                v(json("house --visit " + visit + " --runtime-fraction 50").getAsJsonObject("gains"), "total"), 1e-9);
    }
}
