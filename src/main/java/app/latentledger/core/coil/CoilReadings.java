package app.latentledger.core.coil;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.measure.ProbeMatch;

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
 * @param airflowBasis       whether the airflow is an actual volume or standard cfm
 * @param probes             whether the return and supply probes are one instrument, and the
 *                           supply probe's offset
 */
public record CoilReadings(double pressurePa, AirReading entering, AirReading leaving,
                           double airflowM3PerS, double airflowTolFraction, AirflowPoint airflowAt,
                           double coilTemperatureC, double coilTolK, CoilTemperatureKind coilKind,
                           double nominalCapacityW, Condensate condensate, OutdoorAir outdoor,
                           AirflowBasis airflowBasis, ProbeMatch probes) {
    public CoilReadings {
        Objects.requireNonNull(entering, "entering");
        Objects.requireNonNull(leaving, "leaving");
        Objects.requireNonNull(airflowAt, "airflowAt");
        Objects.requireNonNull(airflowBasis, "airflowBasis");
        Objects.requireNonNull(probes, "probes");
        FieldLimits.PRESSURE.check(pressurePa);
        FieldLimits.AIRFLOW.check(airflowM3PerS);
        FieldLimits.AIRFLOW_TOLERANCE.check(airflowTolFraction);
        if (!Double.isNaN(coilTemperatureC)) {
            FieldLimits.COIL_TEMPERATURE.check(coilTemperatureC);
            FieldLimits.TEMPERATURE_TOLERANCE.check("coil temperature tolerance", coilTolK);
            Objects.requireNonNull(coilKind, "coilKind");
        }
        if (!Double.isNaN(nominalCapacityW)) {
            FieldLimits.NOMINAL_CAPACITY.check(nominalCapacityW);
        }
    }

    /** Readings without outdoor air: the entering reading is the air entering the coil. */
    public CoilReadings(double pressurePa, AirReading entering, AirReading leaving,
                        double airflowM3PerS, double airflowTolFraction, AirflowPoint airflowAt,
                        double coilTemperatureC, double coilTolK, CoilTemperatureKind coilKind,
                        double nominalCapacityW, Condensate condensate) {
        this(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt, coilTemperatureC, coilTolK,
                coilKind, nominalCapacityW, condensate, null);
    }

    /** Readings with an actual airflow and independent probes. */
    public CoilReadings(double pressurePa, AirReading entering, AirReading leaving,
                        double airflowM3PerS, double airflowTolFraction, AirflowPoint airflowAt,
                        double coilTemperatureC, double coilTolK, CoilTemperatureKind coilKind,
                        double nominalCapacityW, Condensate condensate, OutdoorAir outdoor) {
        this(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt, coilTemperatureC, coilTolK,
                coilKind, nominalCapacityW, condensate, outdoor, AirflowBasis.ACTUAL, ProbeMatch.INDEPENDENT);
    }

    /** These readings with outdoor air mixed into the return upstream of the coil. */
    public CoilReadings withOutdoor(OutdoorAir air) {
        return new CoilReadings(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt,
                coilTemperatureC, coilTolK, coilKind, nominalCapacityW, condensate, air, airflowBasis, probes);
    }

    /** These readings with the airflow read on {@code basis}. */
    public CoilReadings withAirflowBasis(AirflowBasis basis) {
        return new CoilReadings(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt,
                coilTemperatureC, coilTolK, coilKind, nominalCapacityW, condensate, outdoor, basis, probes);
    }

    /** These readings with the probes related as {@code match}. */
    public CoilReadings withProbes(ProbeMatch match) {
        return new CoilReadings(pressurePa, entering, leaving, airflowM3PerS, airflowTolFraction, airflowAt,
                coilTemperatureC, coilTolK, coilKind, nominalCapacityW, condensate, outdoor, airflowBasis, match);
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
