package app.latentledger.core.coil;

import app.latentledger.core.measure.AirflowPoint;
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
 * Coil cases computed outside the project: states from PsychroLib 2.5.0 (npm psychrolib@1.1.1,
 * Meyer and Thevenard 2019) and the coil balance written independently in JavaScript from HoF
 * ch. 1 (src/test/resources/reference/coil/make-coil-cases.js; regeneration command in its header).
 */
class ReferenceCasesTest {
    @TestFactory
    List<DynamicTest> matchesPsychroLibReference() throws Exception {
        JsonObject root;
        try (var in = getClass().getResourceAsStream("/reference/coil/coil-cases.json")) {
            assertNotNull(in, "coil-cases.json on the test class path");
            root = JsonParser.parseReader(new InputStreamReader(in, StandardCharsets.UTF_8)).getAsJsonObject();
        }
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonElement e : root.getAsJsonArray("cases")) {
            JsonObject c = e.getAsJsonObject();
            tests.add(DynamicTest.dynamicTest(c.get("id").getAsString() + " — " + c.get("note").getAsString(),
                    () -> check(c)));
        }
        assertTrue(tests.size() >= 6);
        return tests;
    }

    private static void check(JsonObject c) {
        double p = c.get("pressurePa").getAsDouble();
        AirReading in = reading("return", c, "entering");
        AirReading out = reading("supply", c, "leaving");
        AirflowPoint at = "leaving".equals(c.get("airflowAt").getAsString())
                ? AirflowPoint.LEAVING : AirflowPoint.ENTERING;
        CoilReadings r = new CoilReadings(p, in, out, c.get("airflowM3PerS").getAsDouble(), 0.1, at, Double.NaN, 0,
                null, Double.NaN, null);
        CoilResult res = CoilCheck.run(r, app.latentledger.core.findings.ThresholdSettings.DEFAULTS,
                app.latentledger.core.units.UnitSystem.SI);
        CoilProcess q = res.process();
        // same equations and coefficients on both sides: agreement to solver precision
        close(c, "massFlowKgPerS", q.massFlowKgPerS(), 1e-7);
        close(c, "totalW", q.totalW(), 1e-6);
        close(c, "sensibleW", q.sensibleW(), 1e-6);
        close(c, "latentW", q.latentW(), 1e-5);
        close(c, "moistureKgPerS", q.moistureRemovalKgPerS(), 1e-5);
        close(c, "shr", q.sensibleHeatRatio(), 1e-6);
        assertEquals(c.get("enteringDewPointC").getAsDouble(), res.estimate(Measurand.ENTERING_DEW_POINT).valueSi(), 1e-6);
        assertEquals(c.get("leavingDewPointC").getAsDouble(), res.estimate(Measurand.LEAVING_DEW_POINT).valueSi(), 1e-6);
        assertEquals(c.get("adpC").getAsDouble(), res.adp().temperatureC(), 1e-6);
        assertEquals(c.get("bypassFactor").getAsDouble(), res.adp().bypassFactor(), 1e-6);
    }

    private static AirReading reading(String where, JsonObject c, String side) {
        String kind = c.get(side + "Kind").getAsString();
        HumidityKind k = kind.equals("rh") ? HumidityKind.RELATIVE_HUMIDITY
                : kind.equals("wb") ? HumidityKind.WET_BULB : HumidityKind.DEW_POINT;
        return new AirReading(where, c.get(side + "Db").getAsDouble(), 0.2778, k, c.get(side + "Value").getAsDouble(),
                Tolerances.humidity(k));
    }

    private static void close(JsonObject c, String key, double actual, double relative) {
        double expected = c.get(key).getAsDouble();
        assertEquals(expected, actual, Math.abs(expected) * relative, key);
    }
}
