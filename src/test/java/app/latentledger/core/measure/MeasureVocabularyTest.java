package app.latentledger.core.measure;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class MeasureVocabularyTest {

    @Test
    @DisplayName("Each kind parses back from its stored key; unknown words name the field and the choices")
    void keysRoundTrip() {
        for (HumidityKind k : HumidityKind.values()) {
            assertEquals(k, HumidityKind.parse("humidity kind", k.key()));
        }
        for (CoilTemperatureKind k : CoilTemperatureKind.values()) {
            assertEquals(k, CoilTemperatureKind.parse("coil temperature kind", k.key()));
        }
        for (AirflowPoint k : AirflowPoint.values()) {
            assertEquals(k, AirflowPoint.parse("airflow point", k.key()));
        }
        for (AirflowBasis k : AirflowBasis.values()) {
            assertEquals(k, AirflowBasis.parse("airflow basis", k.key()));
        }
        // the keys the store has always written stay the keys (no migration of old rows)
        assertEquals("rh", HumidityKind.RELATIVE_HUMIDITY.key());
        assertEquals("wet-bulb", HumidityKind.WET_BULB.key());
        InvalidChoiceException e = assertThrows(InvalidChoiceException.class,
                () -> HumidityKind.parse("return humidity kind", "grains"));
        assertEquals("return humidity kind", e.field());
        assertTrue(e.getMessage().contains("wet-bulb, rh, dew-point"), e.getMessage());
    }

    @Test
    @DisplayName("A suction-line temperature is refused as a coil temperature, and the refusal says why (superheat)")
    void suctionLineRefused() {
        for (String word : new String[] {"suction-line", "suction_line", "Suction", "clamp"}) {
            InvalidChoiceException e = assertThrows(InvalidChoiceException.class,
                    () -> CoilTemperatureKind.parse("--coil-temp-kind", word));
            assertTrue(e.getMessage().contains("superheat"), e.getMessage());
        }
        assertTrue(CoilTemperatureKind.COIL_SURFACE.isSurface());
        assertFalse(CoilTemperatureKind.EVAPORATOR_SATURATION.isSurface());
    }

    @Test
    @DisplayName("Every accepted range has a source and a non-empty span")
    void everyLimitHasASource() {
        for (FieldLimits.Limit l : FieldLimits.all()) {
            assertFalse(l.source().isBlank(), l.field());
            assertTrue(l.maxSi() > l.minSi(), l.field());
        }
    }

    @Test
    @DisplayName("One airflow range: 20 cfm to about 53 000 cfm, refused outside with the field named")
    void oneAirflowRange() {
        assertEquals(20, Quantity.AIRFLOW.toDisplay(UnitSystem.IP, FieldLimits.AIRFLOW.minSi()), 0.1);
        assertEquals(52_972, Quantity.AIRFLOW.toDisplay(UnitSystem.IP, FieldLimits.AIRFLOW.maxSi()), 1);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> FieldLimits.AIRFLOW.check(30.0));
        assertEquals("airflow", e.field());
        FieldLimits.AIRFLOW.check(25.0);
    }

    @Test
    @DisplayName("Standard air: 0.075 lb/ft³ is 1.2014 kg/m³, and is dry air near 70 °F and 29.92 inHg by the ideal-gas law")
    void standardAirDensity() {
        assertEquals(1.2014, AirflowBasis.STANDARD_DENSITY_KG_PER_M3, 5e-5);
        // Dry air at 70 °F (294.261 K) and 29.921 inHg (101 325 Pa), ideal gas with R_da = 287.042 J/(kg·K)
        // (ASHRAE Handbook—Fundamentals 2017 ch. 1, eq. 1 constants): 1.19963 kg/m³, i.e. 0.0749 lb/ft³.
        // The handbook rounds this to 0.075 lb/ft³ ("standard air"); the two agree within 0.2 %.
        double dry70 = 101_325 / (287.042 * (70 + 459.67) / 1.8);
        assertEquals(1.0, AirflowBasis.STANDARD_DENSITY_KG_PER_M3 / dry70, 0.002);
    }
}
