package app.latentledger.core.coil;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

import java.util.Objects;

/**
 * Everything a tech reads for one coil check, SI, each reading with its tolerance.
 *
 * @param pressurePa         site barometric pressure, Pa (measured or standard atmosphere)
 * @param entering           the return air; with no {@code outdoor}, whatever air enters the coil
 *                           (return, or mixed air read directly)
 * @param leaving            air leaving the coil (supply)
 * @param airflowM3PerS      volumetric airflow, m³/s
 * @param airflowTolFraction ± tolerance of the airflow as a fraction of reading
 * @param airflowAt          where the airflow was measured
 * @param coilTemperatureC   measured coil temperature, °C, or NaN when none was taken
 * @param coilTolK           ± tolerance of the coil temperature, K
 * @param coilKind           what the coil temperature is; null when none was taken
 * @param nominalCapacityW   nameplate total capacity, W, or NaN
 * @param condensate         timed condensate catch, or null
 * @param outdoor            outdoor air mixed into the return upstream of the coil, or null when
 *                           the entering reading already is the coil-entering air
 */
public record CoilReadings(double pressurePa, AirReading entering, AirReading leaving,
                           double airflowM3PerS, double airflowTolFraction, AirflowLocation airflowAt,
                           double coilTemperatureC, double coilTolK, CoilTemperatureKind coilKind,
                           double nominalCapacityW, Condensate condensate, OutdoorAir outdoor) {
    /** 20 cfm: below any air handler. */
    public static final double MIN_AIRFLOW_M3_PER_S = 0.0094;
    /** 100 000 cfm: above any single coil a field tablet meets. */
    public static final double MAX_AIRFLOW_M3_PER_S = 47.2;
    /** Half a ton. */
    public static final double MIN_NOMINAL_W = 1758.0;
    /** 500 tons. */
    public static final double MAX_NOMINAL_W = 1.76e6;

    public CoilReadings {
        Objects.requireNonNull(entering, "entering");
        Objects.requireNonNull(leaving, "leaving");
        Objects.requireNonNull(airflowAt, "airflowAt");
        InputLimits.checkPressure("pressure", pressurePa);
        InputLimits.check("airflow", Quantity.AIRFLOW, airflowM3PerS, MIN_AIRFLOW_M3_PER_S, MAX_AIRFLOW_M3_PER_S, null);
        InputLimits.check("airflow tolerance", Quantity.FRACTION_PERCENT, airflowTolFraction, 0, 0.5, null);
        if (!Double.isNaN(coilTemperatureC)) {
            InputLimits.check("coil temperature", Quantity.TEMPERATURE, coilTemperatureC, -30.0, 35.0,
                    "a cooling coil runs between about −20 °F and 95 °F");
            InputLimits.check("coil temperature tolerance", Quantity.TEMPERATURE_DIFFERENCE, coilTolK, 0, 10, null);
            Objects.requireNonNull(coilKind, "coilKind");
        }
        if (!Double.isNaN(nominalCapacityW)) {
            InputLimits.check("nominal capacity", Quantity.POWER_LARGE, nominalCapacityW, MIN_NOMINAL_W, MAX_NOMINAL_W, null);
        }
    }

    /** Readings without outdoor air: the entering reading is the air entering the coil. */
    public CoilReadings(double pressurePa, AirReading entering, AirReading leaving,
                        double airflowM3PerS, double airflowTolFraction, AirflowLocation airflowAt,
                        double coilTemperatureC, double coilTolK, CoilTemperatureKind coilKind,
                        double nominalCapacityW, Condensate condensate) {
        this(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt, coilTemperatureC, coilTolK,
                coilKind, nominalCapacityW, condensate, null);
    }

    /** These readings with outdoor air mixed into the return upstream of the coil. */
    public CoilReadings withOutdoor(OutdoorAir air) {
        return new CoilReadings(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt,
                coilTemperatureC, coilTolK, coilKind, nominalCapacityW, condensate, air);
    }

    /** True when the entering state is computed as a mix of return and outdoor air. */
    public boolean hasOutdoorAir() {
        return outdoor != null;
    }

    /** True when a coil temperature was measured. */
    public boolean hasCoilTemperature() {
        return !Double.isNaN(coilTemperatureC);
    }

    public boolean hasNominalCapacity() {
        return !Double.isNaN(nominalCapacityW);
    }
}
