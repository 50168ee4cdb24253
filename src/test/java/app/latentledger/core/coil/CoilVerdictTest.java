package app.latentledger.core.coil;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static app.latentledger.core.coil.CoilVerdict.Call.*;
import static org.junit.jupiter.api.Assertions.assertEquals;

class CoilVerdictTest {
    @ParameterizedTest(name = "margin {0}, drop {1} → {2} (rule of docs/methods.md §9.7, a GUM-based proposal)")
    @CsvSource({
            "BELOW, REMOVING, DEHUMIDIFYING", "BELOW, WITHIN, CANT_TELL", "BELOW, ADDING, CANT_TELL",
            "ABOVE, REMOVING, CANT_TELL", "ABOVE, WITHIN, NOT_DEHUMIDIFYING", "ABOVE, ADDING, NOT_DEHUMIDIFYING",
            "WITHIN, REMOVING, CANT_TELL", "WITHIN, ADDING, CANT_TELL", "UNKNOWN, ADDING, NOT_DEHUMIDIFYING",
            "UNKNOWN, WITHIN, CANT_TELL", "UNKNOWN, REMOVING, CANT_TELL", "BELOW, UNKNOWN, CANT_TELL"})
    void rule(CoilVerdict.Call margin, CoilVerdict.Call drop, CoilVerdict expected) {
        assertEquals(expected, CoilVerdict.decide(margin, drop));
    }

    @Test
    @DisplayName("Calls compare each value with its own k = 2 uncertainty")
    void calls() {
        assertEquals(BELOW, CoilVerdict.marginCall(new Estimate(2.1, 2.0)));
        assertEquals(WITHIN, CoilVerdict.marginCall(new Estimate(1.9, 2.0)));
        assertEquals(ABOVE, CoilVerdict.marginCall(new Estimate(-2.1, 2.0)));
        assertEquals(UNKNOWN, CoilVerdict.marginCall(new Estimate(Double.NaN, Double.NaN)));
        assertEquals(UNKNOWN, CoilVerdict.marginCall(new Estimate(3, Double.NaN)));
        assertEquals(REMOVING, CoilVerdict.dropCall(new Estimate(0.001, 0.0005)));
        assertEquals(ADDING, CoilVerdict.dropCall(new Estimate(-0.001, 0.0005)));
        assertEquals(WITHIN, CoilVerdict.dropCall(new Estimate(0.0004, 0.0005)));
    }

    @Test
    @DisplayName("JSON keys are dehumidifying, not-dehumidifying, cant-tell")
    void keys() {
        assertEquals("dehumidifying", CoilVerdict.DEHUMIDIFYING.key());
        assertEquals("not-dehumidifying", CoilVerdict.NOT_DEHUMIDIFYING.key());
        assertEquals("cant-tell", CoilVerdict.CANT_TELL.key());
    }

    // Realistic field readings (invented, Saltreed demo calls); dew points by HoF ch. 1 eqs. 20, 24, 6.

    @Test
    @DisplayName("Dehumidifying: 78 °F/55 % return (dp 60.7 °F), 57 °F/92 % supply, coil surface 47 °F")
    void dehumidifying() {
        CoilResult r = IpCase.returnRh(78, 55).supplyRh(57, 92).cfm(1100).nominalTons(3).coilF(47).run();
        assertEquals(CoilVerdict.DEHUMIDIFYING, r.verdict());
        assertEquals(CoilResult.SOURCE_MEASURED, r.coilTemperatureSource());
    }

    @Test
    @DisplayName("Dehumidifying with the ADP standing in for the coil (case A, no coil probe)")
    void dehumidifyingOnAdp() {
        CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run();
        assertEquals(CoilVerdict.DEHUMIDIFYING, r.verdict());
        assertEquals(CoilResult.SOURCE_ADP, r.coilTemperatureSource());
        assertEquals(r.adp().temperatureC(), r.coilTemperatureC(), 0);
    }

    @Test
    @DisplayName("Not dehumidifying: dry coil — 75 °F/50 % return (dp 55.1 °F), coil surface 59 °F, 1450 cfm on 3 tons")
    void notDehumidifying() {
        CoilResult r = IpCase.returnRh(75, 50).supplyRh(62, 78).cfm(1450).nominalTons(3).coilF(59).run();
        assertEquals(CoilVerdict.NOT_DEHUMIDIFYING, r.verdict());
    }

    @Test
    @DisplayName("Not dehumidifying: supply wetter than return with no coil probe (fan running, compressor off)")
    void notDehumidifyingAddingMoisture() {
        CoilResult r = IpCase.returnRh(75, 50).supplyRh(63, 86).cfm(1200).run();
        assertEquals(CoilVerdict.NOT_DEHUMIDIFYING, r.verdict());
        assertEquals(CoilResult.SOURCE_NONE, r.coilTemperatureSource());
    }

    @Test
    @DisplayName("Can't tell: coil surface 59 °F against a 60.2 °F entering dew point (76 °F/58 %)")
    void cantTell() {
        CoilResult r = IpCase.returnRh(76, 58).supplyRh(59, 90).cfm(1200).nominalTons(3).coilF(59).run();
        assertEquals(CoilVerdict.CANT_TELL, r.verdict());
        assertEquals(CoilVerdict.Call.WITHIN, r.marginCall());
    }
}
