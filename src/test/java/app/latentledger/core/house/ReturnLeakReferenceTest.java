package app.latentledger.core.house;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.measure.HumidityKind;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The return-leak fraction recovered from readings of plenum states made by the handbook's adiabatic
 * mixing of grille and attic air (ASHRAE HoF ch. 1) with PsychroLib 2.5.0 — see
 * src/test/resources/reference/house/make-return-leak-cases.js for the generator and its
 * regeneration command.
 */
class ReturnLeakReferenceTest {
    @TestFactory
    List<DynamicTest> recoversTheMixedFraction() throws Exception {
        JsonObject root;
        try (var in = getClass().getResourceAsStream("/reference/house/return-leak-cases.json")) {
            assertNotNull(in, "return-leak-cases.json on the test class path");
            root = JsonParser.parseReader(new InputStreamReader(in, StandardCharsets.UTF_8)).getAsJsonObject();
        }
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonElement e : root.getAsJsonArray("cases")) {
            JsonObject c = e.getAsJsonObject();
            tests.add(DynamicTest.dynamicTest("PsychroLib " + c.get("id").getAsString(), () -> check(c)));
        }
        assertTrue(tests.size() >= 30);
        return tests;
    }

    private static void check(JsonObject c) {
        double p = d(c, "pressurePa");
        double wg = w(p, d(c, "grilleDb"), d(c, "grilleDewPoint"));
        double wp = w(p, d(c, "plenumDb"), d(c, "plenumDewPoint"));
        double wa = w(p, d(c, "spaceDb"), d(c, "spaceDewPoint"));
        assertEquals(d(c, "grilleW"), wg, 2e-7);
        assertEquals(d(c, "plenumW"), wp, 2e-7);
        assertEquals(d(c, "fraction"), ReturnLeak.fraction(wg, wp, wa), 1e-4);
    }

    private static double w(double p, double db, double dp) {
        return AirReading.humidityRatio(HumidityKind.DEW_POINT, p, db, dp, false);
    }

    private static double d(JsonObject c, String k) {
        return c.get(k).getAsDouble();
    }
}
