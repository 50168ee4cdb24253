package app.latentledger.core.visit;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.AirflowLocation;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilTemperatureKind;
import app.latentledger.core.coil.Condensate;
import app.latentledger.core.coil.HumidityKind;
import app.latentledger.core.coil.OutdoorAir;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import org.junit.jupiter.api.Test;

import java.time.OffsetDateTime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * A reading set recorded from coil-check readings (the command line's {@code readings add}) goes
 * back through {@link ReadingSetCheck#inputs} to the very readings it was made from, so the stored
 * set checks to what was typed.
 */
class StoredReadingsTest {
    private static final OffsetDateTime AT = OffsetDateTime.parse("2026-07-16T10:05:00-04:00");
    private static final Site SITE = new Site("s", "Test", "", 198, "");
    private static final HvacSystem SYSTEM = new HvacSystem("y", "s", "Attic", SystemType.SINGLE_STAGE, 10_550.6,
            "", "", "", "");

    @Test
    void everyKindOfReadingComesBackUnchanged() {
        double p = StandardAtmosphere.pressurePa(SITE.elevationM());
        for (HumidityKind kind : HumidityKind.values()) {
            double value = kind == HumidityKind.RELATIVE_HUMIDITY ? 55 : 17.5;
            double tol = kind == HumidityKind.RELATIVE_HUMIDITY ? 2 : 0.3;
            CoilReadings typed = new CoilReadings(p, new AirReading("return", 24.4, 0.25, kind, value, tol),
                    new AirReading("supply", 13.3, 0.25, HumidityKind.WET_BULB, 12.2, 0.3), 0.566, 0.08,
                    AirflowLocation.LEAVING, 7.2, 0.6, CoilTemperatureKind.EVAPORATOR_SATURATION,
                    SYSTEM.nominalCapacityW(), new Condensate(850e-6, 0.02, 900, 5));
            ReadingSet stored = StoredReadings.of("r", "v", AT, "before", "", typed, null, "hood", "");
            assertEquals(typed, ReadingSetCheck.inputs(stored, SYSTEM, SITE), kind.name());
        }
    }

    @Test
    void aMeasuredPressureIsKeptAndUsed() {
        CoilReadings typed = new CoilReadings(99_000, new AirReading("return", 24, 0.3, HumidityKind.RELATIVE_HUMIDITY,
                50, 2), new AirReading("supply", 13, 0.3, HumidityKind.RELATIVE_HUMIDITY, 90, 2), 0.5, 0.1,
                AirflowLocation.ENTERING, Double.NaN, 0, null, SYSTEM.nominalCapacityW(), null);
        ReadingSet stored = StoredReadings.of("r", "v", AT, "", "", typed, new Measurement(99_000, 300), "", "");
        assertEquals(typed, ReadingSetCheck.inputs(stored, SYSTEM, SITE));
    }

    @Test
    void outdoorAirIsRefused() {
        double p = StandardAtmosphere.pressurePa(0);
        AirReading r = new AirReading("return", 24, 0.3, HumidityKind.RELATIVE_HUMIDITY, 50, 2);
        CoilReadings mixed = new CoilReadings(p, r, new AirReading("supply", 13, 0.3, HumidityKind.RELATIVE_HUMIDITY,
                90, 2), 0.5, 0.1, AirflowLocation.ENTERING, Double.NaN, 0, null, Double.NaN, null)
                .withOutdoor(new OutdoorAir(new AirReading("outdoor", 32, 0.3, HumidityKind.RELATIVE_HUMIDITY, 60, 2),
                        0.2, 0.05));
        assertThrows(IllegalArgumentException.class,
                () -> StoredReadings.of("r", "v", AT, "", "", mixed, null, "", ""));
    }
}
