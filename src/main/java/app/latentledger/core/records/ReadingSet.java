package app.latentledger.core.records;

import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.measure.ProbeMatch;

import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;

/**
 * One set of coil readings taken together: everything the coil check needs, each value with the
 * tolerance it was entered with. Optional parts are null when not measured.
 *
 * @param id                  stable id
 * @param visitId             the visit it was taken on
 * @param takenAt             when, to the second, with the tablet's offset
 * @param label               short tag such as "before", "after", "" when none
 * @param instrument          instruments used (ids and calibration-check dates as the tech types them)
 * @param returnDryBulb       coil-entering dry bulb, °C ± K
 * @param returnHumidity      coil-entering humidity reading
 * @param supplyDryBulb       coil-leaving dry bulb, °C ± K
 * @param supplyHumidity      coil-leaving humidity reading
 * @param outdoorDryBulb      outdoor dry bulb, °C ± K, or null
 * @param outdoorHumidity     outdoor humidity reading, or null (needs {@code outdoorDryBulb})
 * @param coilTemperature     measured coil temperature, or null
 * @param airflow             airflow through the coil, or null when not measured
 * @param stationPressurePa   measured station pressure, Pa ± Pa, or null to use the site elevation
 * @param condensate          condensate caught, or null
 * @param notes               free text
 * @param probes              whether one instrument read return and supply, and the supply
 *                            probe's dew-point offset; {@link ProbeMatch#INDEPENDENT} when not said
 */
public record ReadingSet(String id, String visitId, OffsetDateTime takenAt, String label, String instrument,
                         Measurement returnDryBulb, HumidityReading returnHumidity,
                         Measurement supplyDryBulb, HumidityReading supplyHumidity,
                         Measurement outdoorDryBulb, HumidityReading outdoorHumidity,
                         CoilTemperature coilTemperature, Airflow airflow, Measurement stationPressurePa,
                         Condensate condensate, String notes, ProbeMatch probes) {
    // every range below is FieldLimits', the same the keypad and the coil check use, so a stored set always checks

    public ReadingSet {
        id = Check.id("reading set id", id);
        visitId = Check.id("reading set visit", visitId);
        takenAt = Check.present("reading set taken-at", takenAt).truncatedTo(ChronoUnit.SECONDS);
        label = Check.optionalText("reading set label", label, 100);
        instrument = Check.optionalText("reading set instrument", instrument, 1000);
        temperature("return dry bulb", Check.present("return dry bulb", returnDryBulb));
        Check.present("return humidity", returnHumidity).checked("return");
        temperature("supply dry bulb", Check.present("supply dry bulb", supplyDryBulb));
        Check.present("supply humidity", supplyHumidity).checked("supply");
        if (outdoorDryBulb != null) {
            temperature("outdoor dry bulb", outdoorDryBulb);
        }
        if (outdoorHumidity != null) {
            if (outdoorDryBulb == null) {
                throw new InvalidRecordException("outdoor dry bulb", "missing; an outdoor humidity reading needs one");
            }
            outdoorHumidity.checked("outdoor");
        }
        if (coilTemperature != null) {
            coilTemperature.value().within("coil temperature", FieldLimits.COIL_TEMPERATURE,
                    FieldLimits.TEMPERATURE_TOLERANCE.maxSi());
        }
        if (airflow != null) {
            // tolerances up to half the reading, as the coil check accepts them
            airflow.volume().within("airflow", FieldLimits.AIRFLOW,
                    airflow.volume().valueSi() * FieldLimits.AIRFLOW_TOLERANCE.maxSi());
        }
        if (stationPressurePa != null) {
            stationPressurePa.within("station pressure", FieldLimits.PRESSURE, FieldLimits.PRESSURE_TOLERANCE.maxSi());
        }
        if (condensate != null) {
            condensate.volume().within("condensate volume", FieldLimits.CONDENSATE_VOLUME,
                    condensate.volume().valueSi() * FieldLimits.CONDENSATE_VOLUME_TOLERANCE.maxSi());
            condensate.seconds().within("condensate collection time", FieldLimits.COLLECTION_TIME,
                    condensate.seconds().valueSi() / 2);
        }
        notes = Check.optionalText("reading set notes", notes, 10_000);
        probes = probes == null ? ProbeMatch.INDEPENDENT : probes;
    }

    /** A reading set with independent probes and no offset. */
    public ReadingSet(String id, String visitId, OffsetDateTime takenAt, String label, String instrument,
                      Measurement returnDryBulb, HumidityReading returnHumidity,
                      Measurement supplyDryBulb, HumidityReading supplyHumidity,
                      Measurement outdoorDryBulb, HumidityReading outdoorHumidity,
                      CoilTemperature coilTemperature, Airflow airflow, Measurement stationPressurePa,
                      Condensate condensate, String notes) {
        this(id, visitId, takenAt, label, instrument, returnDryBulb, returnHumidity, supplyDryBulb, supplyHumidity,
                outdoorDryBulb, outdoorHumidity, coilTemperature, airflow, stationPressurePa, condensate, notes,
                ProbeMatch.INDEPENDENT);
    }

    private static void temperature(String field, Measurement m) {
        m.within(field, FieldLimits.AIR_TEMPERATURE, FieldLimits.TEMPERATURE_TOLERANCE.maxSi());
    }
}
