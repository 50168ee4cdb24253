package app.latentledger.chart.psychro;

import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

class StateReadoutTest {

    @Test
    @DisplayName("readout of 80 °F / 50 % at sea level matches PsychroLib 2.5.0 grid row ip_e0_db80_rh50")
    void readoutMatchesPsychroLib() {
        PsychroLibRow row = PsychroLibRow.get("ip_e0_db80_rh50");
        List<String> lines = StateReadout.lines(new ChartPoint("Return", row.dryBulbC(), row.humidityRatio()),
                row.pressurePa(), UnitSystem.IP);
        // PsychroLib: wb 66.66 °F, dp 59.71 °F, W 0.0109244 lb/lb = 76.5 gr/lb, h 31.18 Btu/lb
        assertEquals(List.of("Return", "Dry bulb 80.0 °F", "Wet bulb 66.7 °F", "Dew point 59.7 °F", "RH 50 %",
                "Humidity ratio 76 gr/lb", "Enthalpy 31.2 Btu/lb"), lines);
    }

    @Test
    @DisplayName("SI readout of 25 °C / 60 % matches PsychroLib 2.5.0 grid row si_e0_db25_rh60")
    void siReadoutMatchesPsychroLib() {
        PsychroLibRow row = PsychroLibRow.get("si_e0_db25_rh60");
        List<String> lines = StateReadout.lines(new ChartPoint("Room", row.dryBulbC(), row.humidityRatio()),
                row.pressurePa(), UnitSystem.SI);
        assertEquals(String.format(java.util.Locale.ROOT, "Wet bulb %.1f °C", row.wetBulbC()), lines.get(2));
        assertEquals(String.format(java.util.Locale.ROOT, "Dew point %.1f °C", row.dewPointC()), lines.get(3));
        assertEquals(String.format(java.util.Locale.ROOT, "Humidity ratio %.1f g/kg", row.humidityRatio() * 1000),
                lines.get(5));
        assertEquals(String.format(java.util.Locale.ROOT, "Enthalpy %.1f kJ/kg", row.enthalpyShown()), lines.get(6));
    }
}
