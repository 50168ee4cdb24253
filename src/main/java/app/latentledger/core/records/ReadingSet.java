package app.latentledger.core.records;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

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
 */
public record ReadingSet(String id, String visitId, OffsetDateTime takenAt, String label, String instrument,
                         Measurement returnDryBulb, HumidityReading returnHumidity,
                         Measurement supplyDryBulb, HumidityReading supplyHumidity,
                         Measurement outdoorDryBulb, HumidityReading outdoorHumidity,
                         CoilTemperature coilTemperature, Airflow airflow, Measurement stationPressurePa,
                         Condensate condensate, String notes) {
    /** 10 K: a wider dry-bulb tolerance is a typo, not an instrument (common practice, no source). */
    static final double MAX_TEMPERATURE_TOLERANCE_K = HumidityReading.MAX_TEMPERATURE_TOLERANCE_K;
    /** 0.0094 to 25 m³/s, about 20 to 53 000 cfm: the coil check's own lower limit, so a stored set always checks. */
    public static final double MIN_AIRFLOW_M3_PER_S = app.latentledger.core.coil.CoilReadings.MIN_AIRFLOW_M3_PER_S;
    public static final double MAX_AIRFLOW_M3_PER_S = 25;
    /** 50 L in one catch is far beyond a timed catch at a drain (common practice, no source). */
    public static final double MAX_CONDENSATE_M3 = 0.05;
    /** 30 s to 24 h collection time, as the coil check accepts. */
    public static final double MIN_COLLECTION_S = 30;
    public static final double MAX_COLLECTION_S = 86_400;
    /** 5 kPa: wider than the spread between weather and the standard atmosphere. */
    static final double MAX_PRESSURE_TOLERANCE_PA = 5_000;

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
            temperature("coil temperature", coilTemperature.value());
        }
        if (airflow != null) {
            // tolerances up to half the reading, as the coil check accepts them
            airflow.volume().within("airflow", Quantity.AIRFLOW, MIN_AIRFLOW_M3_PER_S, MAX_AIRFLOW_M3_PER_S,
                    airflow.volume().valueSi() / 2);
        }
        if (stationPressurePa != null) {
            stationPressurePa.within("station pressure", Quantity.PRESSURE, InputLimits.MIN_PRESSURE_PA,
                    InputLimits.MAX_PRESSURE_PA, MAX_PRESSURE_TOLERANCE_PA);
        }
        if (condensate != null) {
            condensate.volume().within("condensate volume", Quantity.WATER_VOLUME, 0, MAX_CONDENSATE_M3,
                    condensate.volume().valueSi() / 2);
            condensate.seconds().within("condensate collection time", Quantity.DURATION_MINUTES,
                    MIN_COLLECTION_S, MAX_COLLECTION_S, condensate.seconds().valueSi() / 2);
        }
        notes = Check.optionalText("reading set notes", notes, 10_000);
    }

    private static void temperature(String field, Measurement m) {
        m.within(field, Quantity.TEMPERATURE, InputLimits.MIN_TEMP_C, InputLimits.MAX_TEMP_C,
                MAX_TEMPERATURE_TOLERANCE_K);
    }
}
