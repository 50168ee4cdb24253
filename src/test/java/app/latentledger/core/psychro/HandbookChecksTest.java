package app.latentledger.core.psychro;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Checks against ASHRAE Handbook—Fundamentals ch. 1 tables and worked examples. */
class HandbookChecksTest {

    /**
     * ASHRAE HoF 2017/2021 ch. 1, Table 1 (standard atmospheric data), values as listed in
     * docs/methods.md §9.8. The table rounds to 0.001 kPa and 0.1 °C.
     */
    @ParameterizedTest(name = "Table 1: {0} m → {1} kPa, {2} °C")
    @CsvSource({
        "-500, 107.478, 18.2",
        "0, 101.325, 15.0",
        "500, 95.461, 11.8",
        "1000, 89.875, 8.5",
        "1500, 84.556, 5.2",
        "2000, 79.495, 2.0",
        "3000, 70.108, -4.5",
        "4000, 61.640, -11.0"
    })
    void standardAtmosphereMatchesTable1(double elevationM, double kPa, double tempC) {
        assertEquals(kPa, StandardAtmosphere.pressurePa(elevationM) / 1000.0, 0.0015);
        assertEquals(tempC, StandardAtmosphere.temperatureC(elevationM), 0.051);
    }

    /**
     * Saturation pressure against ASHRAE HoF ch. 1 Table 3 (from memory; Table 3 lists IAPWS
     * values). Hyland–Wexler eqs. 5/6 sit 0.01–0.02 % from IAPWS (docs/methods.md §1 (outside checks)), so the
     * tolerance is 0.05 % to cover that plus the table's 5-digit rounding.
     */
    @ParameterizedTest(name = "Table 3: {0} °C → {1} kPa")
    @CsvSource({
        "-40, 0.012842",
        "-20, 0.10326",
        "0.01, 0.61165",
        "20, 2.3392",
        "25, 3.1699",
        "30, 4.2470",
        "40, 7.3849",
        "100, 101.42"
    })
    void saturationPressureMatchesTable3(double tempC, double kPa) {
        assertEquals(1.0, SaturationPressure.pascals(tempC) / 1000.0 / kPa, 5e-4);
    }

    /** Eq. 5 and 6 meet at the triple point (611.657 Pa) to within the fits' accuracy. */
    @Test
    void iceAndWaterBranchesMeetAtTheTriplePoint() {
        double below = SaturationPressure.pascals(0.01 - 1e-9);
        double above = SaturationPressure.pascals(0.01 + 1e-9);
        assertEquals(611.657, below, 0.05, "Table 3 triple-point pressure (from memory)");
        assertEquals(below, above, 0.05);
    }

    /**
     * ASHRAE HoF 2017 ch. 1, Example 1: 40 °C db, 20 °C wb, 101.325 kPa. Expected values computed
     * by hand from the handbook's own equations with Table 3's pws(20 °C) = 2.3392 kPa and
     * pws(40 °C) = 7.3849 kPa (from memory): Ws* = 0.621945·2.3392/(101.325 − 2.3392) = 0.014698;
     * eq. 33: W = ((2501 − 46.52)·0.014698 − 1.006·20)/(2501 + 74.4 − 83.72) = 0.006404;
     * eq. 32: h = 40.24 + 0.006404·2575.4 = 56.73 kJ/kg; eq. 20 inverted: pw = 1.0327 kPa,
     * RH = 1.0327/7.3849 = 13.98 %; dew point where pws = 1.0327 kPa: 7.43 °C (Table 3 interpolated);
     * eq. 28: v = 0.287042·313.15·(1 + 1.607858·0.006404)/101.325 = 0.8962 m³/kg.
     * The handbook's printed answers round these (W ≈ 0.0064, h ≈ 56.7, td ≈ 7.4 °C, RH ≈ 14 %,
     * v ≈ 0.896), from memory.
     */
    @Test
    void example1FromTheHandbook() {
        MoistAirState s = MoistAirState.fromWetBulb(101_325, 40, 20, HandbookEdition.SI);
        assertEquals(0.006404, s.humidityRatio(), 0.000005);
        assertEquals(56.73, s.enthalpyJPerKg() / 1000, 0.02);
        assertEquals(13.98, s.relativeHumidityPct(), 0.02);
        assertEquals(7.43, s.dewPointC(), 0.02);
        assertEquals(0.8962, s.specificVolumeM3PerKg(), 0.0002);
    }

    /**
     * AHRI 210/240 rating entering air, 80 °F db / 67 °F wb at sea level: W 0.01117 lb/lb
     * (78.2 gr/lb), RH 51.1 %, dew point 60.3 °F, h 31.45 Btu/lb — values derived from the HoF
     * IP-edition equations by an independent implementation (docs/methods.md §9.8, [DER]).
     */
    @Test
    void ratingPointInInchPound() {
        MoistAirState s = MoistAirState.fromWetBulb(101_325, (80 - 32) / 1.8, (67 - 32) / 1.8, HandbookEdition.IP);
        assertEquals(0.01117, s.humidityRatio(), 0.000005);
        assertEquals(78.2, s.humidityRatio() * 7000, 0.05);
        assertEquals(51.1, s.relativeHumidityPct(), 0.05);
        assertEquals(60.3, s.dewPointC() * 1.8 + 32, 0.05);
        assertEquals(31.45, s.enthalpyJPerKg() / 2326, 0.005);
    }

    /**
     * ASHRAE 62.1-2022 §5.12 caps indoor dew point at 60 °F; at sea level that is 77.3 gr/lb, and
     * ASHRAE 55's W = 0.012 limit is a 62.3 °F dew point (docs/methods.md §9.8, [DER]).
     */
    @Test
    void indoorHumidityLimitsInGrains() {
        double p = 101_325;
        double w60 = Psychrometrics.humidityRatio(SaturationPressure.pascals((60 - 32) / 1.8), p);
        assertEquals(77.3, w60 * 7000, 0.05);
        assertEquals(62.3, Psychrometrics.dewPointC(0.012, p) * 1.8 + 32, 0.05);
    }

    /**
     * Standard air, 0.075 lb/ft³ (13.33 ft³/lb), is about dry air at 69 °F or saturated air at
     * 60 °F at sea level (ASHRAE HoF ch. 18 standard-air note; docs/methods.md §9.8).
     * Both readings are per mass of dry air: 1/v, not the (1 + W)/v density of the mixture.
     */
    @Test
    void standardAirDensity() {
        MoistAirState dry = MoistAirState.fromHumidityRatio(101_325, (69 - 32) / 1.8, 0, HandbookEdition.IP);
        MoistAirState saturated = MoistAirState.fromRelativeHumidity(101_325, (60 - 32) / 1.8, 100, HandbookEdition.IP);
        double ft3PerLbDry = dry.specificVolumeM3PerKg() / 0.028316846592 * 0.45359237;
        double lbPerFt3Sat = 1 / (saturated.specificVolumeM3PerKg() / 0.028316846592 * 0.45359237);
        assertEquals(13.33, ft3PerLbDry, 0.02);
        assertEquals(0.075, lbPerFt3Sat, 0.0005);
    }
}
