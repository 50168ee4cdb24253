package app.latentledger.core.coil;

import app.latentledger.core.findings.FindingCode;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.UnitSystem;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The coil check with outdoor air mixed into the return upstream of the coil. */
class MixedAirCoilTest {
    private static final int DRAWS = 20_000;

    private static List<JsonObject> referenceCases() throws Exception {
        try (var in = MixedAirCoilTest.class.getResourceAsStream("/reference/coil/mixing-cases.json")) {
            JsonObject root = JsonParser.parseReader(new InputStreamReader(in, StandardCharsets.UTF_8)).getAsJsonObject();
            List<JsonObject> out = new ArrayList<>();
            for (JsonElement e : root.getAsJsonArray("cases")) {
                if (e.getAsJsonObject().has("coil")) {
                    out.add(e.getAsJsonObject());
                }
            }
            return out;
        }
    }

    private static AirReading reading(String where, JsonObject c, String prefix) {
        String kind = c.get(prefix + "Kind").getAsString();
        HumidityKind k = kind.equals("rh") ? HumidityKind.RELATIVE_HUMIDITY
                : kind.equals("wb") ? HumidityKind.WET_BULB : HumidityKind.DEW_POINT;
        return new AirReading(where, c.get(prefix + "Db").getAsDouble(), Tolerances.DRY_BULB_K, k,
                c.get(prefix + "Value").getAsDouble(), Tolerances.humidity(k));
    }

    private static CoilResult run(CoilReadings r) {
        return CoilCheck.run(r, ThresholdSettings.DEFAULTS, UnitSystem.SI);
    }

    /**
     * Outside reference: PsychroLib 2.5.0 states mixed and put through the coil balance by
     * src/test/resources/reference/coil/make-mixing-cases.js (HoF ch. 1 mixing and coil equations
     * written out independently; regeneration command in its header). Then the same mixed state,
     * typed directly as the entering reading (the reference's mixed dry bulb and dew point), must
     * give the same coil result as the mix computed from return + outdoor readings.
     */
    @TestFactory
    List<DynamicTest> mixedEqualsHandMixedTypedDirectly() throws Exception {
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonObject c : referenceCases()) {
            tests.add(DynamicTest.dynamicTest("PsychroLib " + c.get("id").getAsString() + " — " + c.get("note").getAsString(), () -> {
                double p = c.get("pressurePa").getAsDouble();
                AirReading supply = reading("supply", c, "supply");
                double airflow = c.get("airflowM3PerS").getAsDouble();
                CoilReadings mixed = new CoilReadings(p, reading("return", c, "return"), supply, airflow, 0.1,
                        AirflowLocation.ENTERING, Double.NaN, 0, null, Double.NaN, null,
                        new OutdoorAir(reading("outdoor", c, "outdoor"), c.get("outdoorVolumeFraction").getAsDouble(),
                                Tolerances.OUTDOOR_FRACTION));
                AirReading typed = new AirReading("return", c.get("mixedDb").getAsDouble(), Tolerances.DRY_BULB_K,
                        HumidityKind.DEW_POINT, c.get("mixedDewPoint").getAsDouble(), Tolerances.DEW_POINT_K);
                CoilReadings direct = new CoilReadings(p, typed, supply, airflow, 0.1, AirflowLocation.ENTERING,
                        Double.NaN, 0, null, Double.NaN, null);
                CoilResult a = run(mixed);
                CoilResult b = run(direct);
                assertEquals(CoilResult.ENTERING_MIXED, a.enteringSource());
                assertEquals(CoilResult.ENTERING_MEASURED, b.enteringSource());
                assertEquals(c.get("mixedDb").getAsDouble(), a.entering().dryBulbC(), 1e-4);
                assertEquals(c.get("mixedW").getAsDouble(), a.entering().humidityRatio(), 1e-7);
                assertEquals(b.entering().humidityRatio(), a.entering().humidityRatio(), 1e-7);
                JsonObject coil = c.getAsJsonObject("coil");
                for (String key : List.of("totalW", "sensibleW", "latentW")) {
                    double ref = coil.get(key).getAsDouble();
                    double got = key.equals("totalW") ? a.process().totalW()
                            : key.equals("sensibleW") ? a.process().sensibleW() : a.process().latentW();
                    double typedValue = key.equals("totalW") ? b.process().totalW()
                            : key.equals("sensibleW") ? b.process().sensibleW() : b.process().latentW();
                    assertEquals(ref, got, Math.abs(ref) * 2e-4, key + " vs PsychroLib");
                    assertEquals(typedValue, got, Math.abs(ref) * 2e-4, key + " vs typed mix");
                }
                assertEquals(coil.get("shr").getAsDouble(), a.process().sensibleHeatRatio(), 2e-4);
                assertEquals(coil.get("massFlowKgPerS").getAsDouble(), a.process().massFlowKgPerS(), 1e-6);
                assertEquals(coil.get("moistureKgPerS").getAsDouble(), a.process().moistureRemovalKgPerS(),
                        coil.get("moistureKgPerS").getAsDouble() * 5e-4);
                assertEquals(coil.get("adpC").getAsDouble(), a.adp().temperatureC(), 0.01);
                assertEquals(b.adp().temperatureC(), a.adp().temperatureC(), 0.01);
                assertEquals(b.estimate(Measurand.DEW_POINT_MARGIN).valueSi(),
                        a.estimate(Measurand.DEW_POINT_MARGIN).valueSi(), 0.01);
                assertEquals(b.verdict(), a.verdict());
            }));
        }
        assertTrue(tests.size() >= 2);
        return tests;
    }

    @Test
    @DisplayName("0 % outdoor air gives exactly the check without outdoor air (mass balance, HoF ch. 1 mixing)")
    void zeroFractionIsNoMix() {
        CoilResult plain = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run();
        CoilResult zero = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).outdoorWb(92, 77, 0).run();
        assertEquals(plain.process().totalW(), zero.process().totalW(), 1e-9 * plain.process().totalW());
        assertEquals(plain.entering().dryBulbC(), zero.entering().dryBulbC(), 1e-9);
        assertEquals(plain.verdict(), zero.verdict());
        assertEquals(CoilResult.ENTERING_MIXED, zero.enteringSource());
    }

    @Test
    @DisplayName("Without outdoor air: entering source 'measured', no outdoor state, outdoor dew point absent")
    void measuredWithoutOutdoor() {
        CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run();
        assertEquals(CoilResult.ENTERING_MEASURED, r.enteringSource());
        assertNull(r.outdoorAir());
        assertNull(r.mix());
        assertFalse(r.estimate(Measurand.OUTDOOR_DEW_POINT).exists());
        assertEquals(r.estimate(Measurand.ENTERING_DEW_POINT), r.estimate(Measurand.RETURN_DEW_POINT));
    }

    @Test
    @DisplayName("The outdoor-air fraction's tolerance enters the budget: ±0 %-points gives a smaller U(entering dew point)")
    void fractionToleranceCounts() {
        CoilReadings base = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).readings();
        AirReading oa = new AirReading("outdoor", IpCase.c(92), Tolerances.DRY_BULB_K, HumidityKind.WET_BULB,
                IpCase.c(77), Tolerances.WET_BULB_K);
        double withTol = run(base.withOutdoor(new OutdoorAir(oa, 0.25, 0.05))).estimate(Measurand.ENTERING_DEW_POINT).expandedSi();
        double exact = run(base.withOutdoor(new OutdoorAir(oa, 0.25, 0.0))).estimate(Measurand.ENTERING_DEW_POINT).expandedSi();
        assertTrue(withTol > exact * 1.05, withTol + " vs " + exact);
        // and the outdoor humidity's tolerance: the mixed dew point is less certain than with exact outdoor readings
        AirReading exactOa = new AirReading("outdoor", IpCase.c(92), 0, HumidityKind.WET_BULB, IpCase.c(77), 0);
        assertTrue(exact > run(base.withOutdoor(new OutdoorAir(exactOa, 0.25, 0.0)))
                .estimate(Measurand.ENTERING_DEW_POINT).expandedSi());
    }

    /** JCGM 100:2008 first order vs JCGM 101:2008 Monte Carlo on the same inputs, outdoor air included. */
    @ParameterizedTest(name = "outdoor air 25 %, measured coil, condensate: first order vs Monte Carlo within 10 % — {0}")
    @EnumSource(Measurand.class)
    void firstOrderAgreesWithMonteCarlo(Measurand m) {
        CoilReadings r = IpCase.returnRh(75, 52).supplyWb(56, 54).cfm(1200).coilF(46).condensate(700, 15)
                .outdoorWb(92, 77, 25).readings();
        CoilModel model = new CoilModel(r);
        double fo = Propagation.firstOrder(model.inputs(), model).expanded()[m.ordinal()];
        double mc = Propagation.monteCarlo(model.inputs(), model, DRAWS, 20240612L).expanded()[m.ordinal()];
        assertTrue(fo > 0, m + " has an uncertainty");
        assertEquals(mc, fo, 0.10 * mc, m.key() + ": first order " + fo + " vs Monte Carlo " + mc);
    }

    private static List<FindingCode> codes(CoilResult r) {
        return r.findings().stream().map(Finding::code).collect(Collectors.toList());
    }

    @Test
    @DisplayName("indoor-humidity-high looks at the return (indoor) air: dry house, humid outdoor air → quiet, though the mix is above 60 °F dp")
    void indoorHumidityReadsReturnQuiet() {
        // return 75 °F / 45 % (dp 52.6 °F); outdoor 92 °F db / 78 °F wb at 35 %: mixed dew point above 60 °F
        CoilResult r = IpCase.returnRh(75, 45).supplyRh(56, 92).cfm(1200).nominalTons(3).coilF(45)
                .outdoorWb(92, 78, 35).run();
        assertTrue(r.estimate(Measurand.ENTERING_DEW_POINT).valueSi() > IpCase.c(60), "mixed dew point above 60 °F");
        assertFalse(codes(r).contains(FindingCode.INDOOR_HUMIDITY_HIGH), codes(r).toString());
        // the same mixed air typed as the entering reading is (rightly, for lack of the return) taken as indoor air
        AirReading mixedTyped = new AirReading("return", r.entering().dryBulbC(), Tolerances.DRY_BULB_K,
                HumidityKind.DEW_POINT, r.entering().dewPointC(), Tolerances.DEW_POINT_K);
        CoilResult typed = CoilCheck.run(new CoilReadings(101_325, mixedTyped, r.readings().leaving(),
                r.readings().airflowM3PerS(), 0.1, AirflowLocation.ENTERING, IpCase.c(45), Tolerances.COIL_K,
                CoilTemperatureKind.COIL_SURFACE, r.readings().nominalCapacityW(), null),
                ThresholdSettings.DEFAULTS, UnitSystem.IP);
        assertTrue(codes(typed).contains(FindingCode.INDOOR_HUMIDITY_HIGH), codes(typed).toString());
    }

    @Test
    @DisplayName("indoor-humidity-high fires on a humid return even when dry outdoor air makes the mix look fine")
    void indoorHumidityReadsReturnFires() {
        // return 76 °F / 62 % (dp 62 °F); outdoor 85 °F / 25 % at 40 %: mix about 58 °F dp, RH under 50 %
        CoilResult r = IpCase.returnRh(76, 62).supplyRh(56, 92).cfm(1200).nominalTons(3).coilF(45)
                .outdoorRh(85, 25, 40).run();
        assertTrue(r.estimate(Measurand.ENTERING_DEW_POINT).valueSi() < IpCase.c(60));
        assertTrue(r.estimate(Measurand.ENTERING_RELATIVE_HUMIDITY).valueSi() < 60);
        Finding f = r.findings().stream().filter(x -> x.code().equals(FindingCode.INDOOR_HUMIDITY_HIGH)).findFirst()
                .orElseThrow(() -> new AssertionError(codes(r).toString()));
        assertTrue(f.technical().contains("outdoor dew point"), f.technical());
        assertTrue(f.evidence().stream().anyMatch(e -> e.key().equals("returnDewPoint")));
        assertTrue(f.evidence().stream().anyMatch(e -> e.key().equals("outdoorDewPoint")));
    }

    @Test
    @DisplayName("Two near-saturated streams that mix into fog are refused, naming the mixed air")
    void fogRefused() {
        // a straight mixing line between two points on the convex saturation curve passes above it
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> IpCase.returnRh(40, 99).supplyRh(38, 99).cfm(1200).outdoorRh(95, 99, 50).run());
        assertTrue(e.field().contains("mixed air"), e.field());
    }
}
