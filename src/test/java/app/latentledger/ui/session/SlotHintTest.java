package app.latentledger.ui.session;

import app.latentledger.core.measure.CoilTemperatureKind;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The coil box says what its reading can show, and keeps suction-line readings out (they include the superheat). */
class SlotHintTest {
    @Test
    @DisplayName("Surface probe: not a suction-line temperature; saturation: can show a warm coil, not prove a cold one")
    void coilHints() {
        assertTrue(Slot.COIL_TEMPERATURE.hint("coil-surface").contains("superheat"));
        assertTrue(Slot.COIL_TEMPERATURE.hint("evaporator-saturation").contains("not prove a cold one"));
        assertEquals("", Slot.AIRFLOW.hint("entering"));
        assertEquals("Evaporator saturation (gauges)", Slot.choiceLabel(CoilTemperatureKind.EVAPORATOR_SATURATION.key()));
        for (String c : Slot.COIL_TEMPERATURE.choices()) {
            CoilTemperatureKind.parse("coil temperature kind", c); // every offered choice is an accepted kind
        }
    }
}
