package app.latentledger.core.visit;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.AirflowPoint;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.records.CoilTemperatureKind;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HumidityKind;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;

import java.time.OffsetDateTime;

/**
 * The way back from {@link ReadingSetCheck#inputs}: coil-check readings typed on the command line
 * (or read from a batch row) as the reading set the ledger keeps, so a set recorded there checks
 * to exactly the numbers it was typed as. The site pressure is not copied: a set keeps a station
 * pressure only when one was measured; otherwise its site's elevation gives it.
 */
public final class StoredReadings {
    private StoredReadings() {
    }

    /**
     * @param stationPressure the measured station pressure, Pa ± Pa, or null to use the site's elevation
     * @param airflowMethod   how the airflow was measured ("" when not said)
     * @throws IllegalArgumentException when the readings mix in outdoor air: a reading set keeps the
     *                                  coil-entering air only
     */
    public static ReadingSet of(String id, String visitId, OffsetDateTime takenAt, String label, String instrumentText,
                                CoilReadings c, Measurement stationPressure, String airflowMethod, String notes) {
        if (c.outdoor() != null) {
            throw new IllegalArgumentException("a reading set keeps the air entering the coil; record the mixed air"
                    + " as the return reading instead of outdoor air and its share");
        }
        CoilTemperature coil = null;
        if (!Double.isNaN(c.coilTemperatureC())) {
            CoilTemperatureKind kind = switch (c.coilKind()) {
                case COIL_SURFACE -> CoilTemperatureKind.COIL_SURFACE;
                case EVAPORATOR_SATURATION -> CoilTemperatureKind.EVAPORATOR_SATURATION;
            };
            coil = new CoilTemperature(kind, new Measurement(c.coilTemperatureC(), c.coilTolK()));
        }
        AirflowPoint point = switch (c.airflowAt()) {
            case ENTERING -> AirflowPoint.ENTERING;
            case LEAVING -> AirflowPoint.LEAVING;
        };
        Airflow airflow = new Airflow(new Measurement(c.airflowM3PerS(), c.airflowM3PerS() * c.airflowTolFraction()),
                point, airflowMethod);
        Condensate condensate = null;
        if (c.condensate() != null) {
            var k = c.condensate();
            condensate = new Condensate(new Measurement(k.volumeM3(), k.volumeM3() * k.volumeTolFraction()),
                    new Measurement(k.seconds(), k.secondsTolS()));
        }
        return new ReadingSet(id, visitId, takenAt, label, instrumentText,
                new Measurement(c.entering().dryBulbC(), c.entering().dryBulbTolK()), humidity(c.entering()),
                new Measurement(c.leaving().dryBulbC(), c.leaving().dryBulbTolK()), humidity(c.leaving()),
                null, null, coil, airflow, stationPressure, condensate, notes);
    }

    private static HumidityReading humidity(AirReading a) {
        HumidityKind kind = switch (a.humidityKind()) {
            case WET_BULB -> HumidityKind.WET_BULB;
            case RELATIVE_HUMIDITY -> HumidityKind.RH;
            case DEW_POINT -> HumidityKind.DEW_POINT;
        };
        return new HumidityReading(kind, new Measurement(a.humiditySi(), a.humidityTolSi()));
    }
}
