package app.latentledger.core.psychro;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Bad readings are refused with the field, the value and the accepted range, in the tech's units. */
class InputRefusalTest {
    private static final double P = 101_325;
    private static final HandbookEdition IP = HandbookEdition.IP;

    private static InvalidInputException refused(Executable e) {
        return assertThrows(InvalidInputException.class, e);
    }

    @Test
    void wetBulbAboveDryBulb() {
        InvalidInputException e = refused(() -> MoistAirState.fromWetBulb(P, 20, 21, IP));
        assertEquals("wet bulb", e.field());
        String msg = e.message(UnitSystem.IP);
        assertTrue(msg.contains("wet bulb 69.8 °F"), msg);
        assertTrue(msg.contains("cannot be above the dry bulb"), msg);
        assertTrue(msg.contains("to 68 °F"), msg);
    }

    @Test
    void wetBulbTooLowForAnyAir() {
        InvalidInputException e = refused(() -> MoistAirState.fromWetBulb(P, 40, 5, IP));
        assertTrue(e.getMessage().contains("bone-dry"), e.getMessage());
        assertTrue(e.minSi() > 5 && e.minSi() < 40);
    }

    @Test
    void dewPointAboveDryBulb() {
        assertEquals("dew point", refused(() -> MoistAirState.fromDewPoint(P, 20, 25, IP)).field());
    }

    @Test
    void relativeHumidityOutside0To100() {
        String msg = refused(() -> MoistAirState.fromRelativeHumidity(P, 20, 101, IP)).message(UnitSystem.IP);
        assertEquals("relative humidity 101 % refused: accepted range 0 to 100 %", msg);
        refused(() -> MoistAirState.fromRelativeHumidity(P, 20, -1, IP));
    }

    @Test
    void temperaturesOutsideTheFieldRange() {
        String msg = refused(() -> MoistAirState.fromRelativeHumidity(P, 96, 50, IP)).message(UnitSystem.IP);
        assertEquals("dry bulb 204.8 °F refused: accepted range -58 to 203 °F", msg);
        String si = refused(() -> MoistAirState.fromRelativeHumidity(P, -51, 50, IP)).message(UnitSystem.SI);
        assertEquals("dry bulb -51 °C refused: accepted range -50 to 95 °C", si);
    }

    @Test
    void elevationAndPressure() {
        assertTrue(refused(() -> SitePressure.fromElevation(4600)).message(UnitSystem.IP).contains("15091.8635 ft"));
        assertEquals("pressure", refused(() -> SitePressure.measured(20_000)).field());
    }

    @Test
    void notANumberIsRefusedEverywhere() {
        assertTrue(refused(() -> MoistAirState.fromWetBulb(P, Double.NaN, 10, IP)).getMessage().contains("not a number"));
        refused(() -> MoistAirState.fromWetBulb(P, 20, Double.NaN, IP));
        refused(() -> MoistAirState.fromRelativeHumidity(P, 20, Double.NaN, IP));
        refused(() -> MoistAirState.fromHumidityRatio(P, 20, Double.NaN, IP));
        refused(() -> SitePressure.fromElevation(Double.NaN));
    }

    @Test
    void humidityRatioAboveSaturation() {
        InvalidInputException e = refused(() -> MoistAirState.fromHumidityRatio(P, 20, 0.02, IP));
        assertEquals("humidity ratio", e.field());
        assertEquals(Psychrometrics.saturationHumidityRatio(20, P), e.maxSi(), 1e-12);
    }
}
