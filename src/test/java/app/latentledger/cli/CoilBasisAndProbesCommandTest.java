package app.latentledger.cli;

import com.google.gson.JsonObject;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static app.latentledger.cli.CoilCommandTest.json;
import static app.latentledger.cli.CoilCommandTest.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code coil --airflow-basis}, {@code --same-probe}, {@code --supply-dew-point-offset} and the JSON keys they bring. */
class CoilBasisAndProbesCommandTest {
    private static final String CASE_A = "coil --return-db 75 --return-rh 50 --supply-db 55 --supply-rh 90 --airflow 1200";

    @Test
    @DisplayName("airflowBasis defaults to actual; standard cfm at 8,000 ft is 1,200 × 0.075 × 60 lb/h of air (standard air)")
    void basis() {
        assertEquals("actual", json(CASE_A).get("airflowBasis").getAsString());
        JsonObject std = json(CASE_A + " --elevation 8000 --airflow-basis standard");
        assertEquals("standard", std.get("airflowBasis").getAsString());
        double moistAirLbPerH = std.get("massFlowDryAir").getAsDouble()
                * (1 + std.getAsJsonObject("entering").get("humidityRatio").getAsDouble());
        assertEquals(1200 * 0.075 * 60, moistAirLbPerH, 1e-6 * 5400);
        assertEquals(2, run(CASE_A + " --airflow-basis metric").code());
    }

    @Test
    @DisplayName("airflowPerTon is per nominal ton, null without a nameplate; the table asks for the nameplate")
    void perNominalTon() {
        assertTrue(json(CASE_A).get("airflowPerTon").isJsonNull());
        assertEquals(400, json(CASE_A + " --nominal-tons 3").get("airflowPerTon").getAsDouble(), 1e-9);
        assertTrue(run(CASE_A).out().contains("airflow per ton (nominal): not measurable (no nameplate size given"));
    }

    @Test
    @DisplayName("--same-probe shrinks U(ΔW) and says so; --supply-dew-point-offset raises the drop")
    void probes() {
        double independent = json(CASE_A).getAsJsonObject("uncertainty").get("humidityRatioDrop").getAsDouble();
        JsonObject same = json(CASE_A + " --same-probe");
        assertTrue(same.get("sameProbe").getAsBoolean());
        assertTrue(same.getAsJsonObject("uncertainty").get("humidityRatioDrop").getAsDouble() < 0.5 * independent);
        assertTrue(same.getAsJsonObject("uncertainty").get("method").getAsString().contains("correlated"));
        double drop = json(CASE_A).get("humidityRatioDrop").getAsDouble();
        JsonObject offset = json(CASE_A + " --supply-dew-point-offset 1");
        assertTrue(offset.get("humidityRatioDrop").getAsDouble() > drop + 1.5, "1 °F of dew point ≈ 2 gr at 52 °F");
        assertEquals(2, run(CASE_A + " --supply-dew-point-offset 20").code(), "±9 °F accepted");
    }

    @Test
    @DisplayName("latentFromCondensate and shrFromCondensate appear for a steady catch, null without one")
    void condensateLatent() {
        JsonObject with = json(CASE_A + " --condensate 560 --condensate-minutes 15");
        assertFalse(with.get("latentFromCondensate").isJsonNull());
        assertFalse(with.get("shrFromCondensate").isJsonNull());
        JsonObject without = json(CASE_A);
        assertTrue(without.get("latentFromCondensate").isJsonNull());
        assertTrue(without.get("shrFromCondensate").isJsonNull());
    }

    @Test
    @DisplayName("A suction-line temperature is refused with exit 2 and a message about superheat")
    void suctionLineRefused() {
        CoilCommandTest.Run r = run(CASE_A + " --coil-temp 48 --coil-temp-kind suction-line");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("superheat"), r.err());
    }

    @Test
    @DisplayName("Supply wetter than return: shr is null in JSON and 'not measurable' in the table, never −16")
    void undefinedShr() {
        String wetter = "coil --return-db 75 --return-rh 50 --supply-db 68 --supply-rh 75 --airflow 1200";
        assertTrue(json(wetter).get("shr").isJsonNull());
        assertTrue(run(wetter).out().contains("sensible heat ratio: not measurable"), run(wetter).out());
    }
}
