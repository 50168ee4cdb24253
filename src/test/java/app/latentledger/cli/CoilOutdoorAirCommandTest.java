package app.latentledger.cli;

import app.latentledger.core.findings.Cautions;
import com.google.gson.JsonObject;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.List;
import java.util.Locale;

import static app.latentledger.cli.CoilCommandTest.json;
import static app.latentledger.cli.CoilCommandTest.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code coil} with outdoor air mixed into the return upstream of the coil. */
class CoilOutdoorAirCommandTest {
    private static final String SUPPLY = " --supply-db 55 --supply-rh 90 --airflow 1200 --nominal-tons 3";
    private static final String MIXED = "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77"
            + " --outdoor-fraction 20" + SUPPLY;

    @Test
    @DisplayName("--json: enteringSource 'mixed', return and outdoor states, the fraction by volume and by dry-air mass")
    void jsonKeys() {
        JsonObject j = json(MIXED);
        assertEquals("mixed", j.get("enteringSource").getAsString());
        assertEquals(75.0, j.getAsJsonObject("return").get("dryBulb").getAsDouble(), 1e-9);
        assertEquals(92.0, j.getAsJsonObject("outdoor").get("dryBulb").getAsDouble(), 1e-9);
        assertEquals(77.0, j.getAsJsonObject("outdoor").get("wetBulb").getAsDouble(), 1e-6);
        assertEquals(20.0, j.get("outdoorAirFraction").getAsDouble(), 1e-9);
        // hotter, lighter outdoor air: its dry-air share is below its volume share (19.3 %, see MixedAirCoilTest)
        double mass = j.get("outdoorAirMassFraction").getAsDouble();
        assertTrue(mass < 20.0 && mass > 19.0, "mass fraction " + mass);
        double tMix = j.getAsJsonObject("entering").get("dryBulb").getAsDouble();
        assertTrue(tMix > 75 && tMix < 92);
        JsonObject u = j.getAsJsonObject("uncertainty");
        for (String key : List.of("returnDewPoint", "outdoorDewPoint", "enteringDewPoint")) {
            assertTrue(u.get(key).getAsDouble() > 0, key);
        }
        JsonObject tol = u.getAsJsonObject("inputTolerances");
        assertEquals(0.5, tol.get("outdoorDryBulb").getAsDouble(), 1e-9);
        assertEquals(0.5, tol.get("outdoorHumidity").getAsDouble(), 1e-9);
        assertEquals(5.0, tol.get("outdoorAirFraction").getAsDouble(), 1e-9, "default ±5 %-points");
    }

    @Test
    @DisplayName("The mix computed from return + outdoor gives the same result as that mix typed in as the entering reading")
    void sameAsTypedMix() {
        JsonObject mixed = json(MIXED);
        JsonObject e = mixed.getAsJsonObject("entering");
        JsonObject typed = json(String.format(Locale.ROOT, "coil --return-db %.9f --return-dew-point %.9f",
                e.get("dryBulb").getAsDouble(), e.get("dewPoint").getAsDouble()) + SUPPLY);
        assertEquals("measured", typed.get("enteringSource").getAsString());
        for (String key : List.of("sensible", "latent", "total", "moistureRemoval", "apparatusDewPoint",
                "enteringDewPoint", "dewPointMargin")) {
            double a = mixed.get(key).getAsDouble();
            assertEquals(typed.get(key).getAsDouble(), a, Math.abs(a) * 1e-6, key);
        }
        assertEquals(typed.get("verdict").getAsString(), mixed.get("verdict").getAsString());
    }

    @Test
    @DisplayName("Without outdoor air: enteringSource 'measured', outdoor and fraction null, return = entering")
    void withoutOutdoor() {
        JsonObject j = json("coil --return-db 75 --return-rh 50" + SUPPLY);
        assertEquals("measured", j.get("enteringSource").getAsString());
        assertTrue(j.get("outdoor").isJsonNull());
        assertTrue(j.get("outdoorAirFraction").isJsonNull());
        assertTrue(j.get("outdoorAirMassFraction").isJsonNull());
        assertEquals(j.getAsJsonObject("entering"), j.getAsJsonObject("return"));
        assertTrue(j.getAsJsonObject("uncertainty").get("outdoorDewPoint") == null);
    }

    @Test
    @DisplayName("Outdoor tolerances follow --tol-db and --tol-rh; --tol-outdoor-fraction sets the fraction's")
    void tolerances() {
        JsonObject j = json("coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-rh 55 --outdoor-fraction 20"
                + SUPPLY + " --tol-db 0.2 --tol-rh 3 --tol-outdoor-fraction 2");
        JsonObject tol = j.getAsJsonObject("uncertainty").getAsJsonObject("inputTolerances");
        assertEquals(0.2, tol.get("outdoorDryBulb").getAsDouble(), 1e-9);
        assertEquals(3.0, tol.get("outdoorHumidity").getAsDouble(), 1e-9);
        assertEquals(2.0, tol.get("outdoorAirFraction").getAsDouble(), 1e-9);
    }

    @Test
    @DisplayName("SI units: outdoor dew point in °C, fraction still in %")
    void si() {
        JsonObject j = json("coil --units si --return-db 24 --return-rh 50 --outdoor-db 33 --outdoor-dew-point 22"
                + " --outdoor-fraction 25 --supply-db 13 --supply-rh 90 --airflow 570");
        assertEquals(22.0, j.getAsJsonObject("outdoor").get("dewPoint").getAsDouble(), 1e-6);
        assertEquals(25.0, j.get("outdoorAirFraction").getAsDouble(), 1e-9);
        assertEquals("mixed", j.get("enteringSource").getAsString());
    }

    @Test
    @DisplayName("Readable output shows return, outdoor and mixed air, the fraction, and ends with the safety line")
    void readable() {
        CoilCommandTest.Run r = run(MIXED);
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("return") && r.out().contains("outdoor") && r.out().contains("mixed"), r.out());
        assertTrue(r.out().contains("% of airflow by volume"), r.out());
        assertTrue(r.out().contains("return dew point"), r.out());
        assertTrue(r.out().stripTrailing().endsWith(Cautions.SAFETY_LINE));
    }

    @ParameterizedTest(name = "refused, names {1}: {0}")
    @CsvSource(delimiter = '|', value = {
            "coil --return-db 75 --return-rh 50 --outdoor-fraction 20" + SUPPLY + " | --outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77" + SUPPLY + " | --outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --outdoor-rh 50" + SUPPLY + " | --outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-fraction 20" + SUPPLY + " | --outdoor-wb",
            "coil --return-db 75 --return-rh 50 --outdoor-rh 50 --outdoor-fraction 20" + SUPPLY + " | --outdoor-db",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-rh 120 --outdoor-fraction 20" + SUPPLY + " | --outdoor-rh",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 95 --outdoor-fraction 20" + SUPPLY + " | --outdoor-wb",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77 --outdoor-rh 50 --outdoor-fraction 20" + SUPPLY + " | --outdoor-rh",
            "coil --return-db 75 --return-rh 50 --outdoor-db 300 --outdoor-wb 77 --outdoor-fraction 20" + SUPPLY + " | --outdoor-db",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77 --outdoor-fraction 120" + SUPPLY + " | --outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77 --outdoor-fraction -5" + SUPPLY + " | --outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77 --outdoor-fraction 20 --tol-outdoor-fraction 60" + SUPPLY + " | --tol-outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --outdoor-db 92 --outdoor-wb 77 --outdoor-fraction 20 --tol-outdoor-fraction -1" + SUPPLY + " | --tol-outdoor-fraction",
            "coil --return-db 75 --return-rh 50 --tol-outdoor-fraction 3" + SUPPLY + " | --tol-outdoor-fraction",
            "coil --return-db 40 --return-rh 99 --outdoor-db 95 --outdoor-rh 99 --outdoor-fraction 50 --supply-db 38 --supply-rh 99 --airflow 1200 | mixed air"})
    void refused(String line, String named) {
        CoilCommandTest.Run r = run(line);
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains(named), r.err());
    }
}
