package app.latentledger.core.coil;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.psychro.MoistAirState;

import java.util.List;
import java.util.Map;

/**
 * Everything a coil check found. Capacities come from SI-edition arithmetic; the states are in
 * the edition the caller asked for, for display.
 *
 * @param readings            what was read
 * @param entering            entering state (display edition)
 * @param leaving             leaving state (display edition)
 * @param process             mass-flow figures
 * @param adp                 apparatus dew point and bypass factor, or why there is none
 * @param coilTemperatureC    the coil temperature compared with the dew point (measured, or the
 *                            ADP), or NaN
 * @param coilTemperatureSource "measured" | "apparatus-dew-point" | "none"
 * @param estimates           each measurand with its expanded uncertainty (k = 2)
 * @param marginCall          the dew-point margin's call
 * @param dropCall            the humidity-ratio drop's call
 * @param verdict             the answer
 * @param condensate          condensate cross-check, or null without a catch
 * @param findings            what to tell the tech and the homeowner
 */
public record CoilResult(CoilReadings readings, MoistAirState entering, MoistAirState leaving, CoilProcess process,
                         ApparatusDewPoint adp, double coilTemperatureC, String coilTemperatureSource,
                         Map<Measurand, Estimate> estimates, CoilVerdict.Call marginCall,
                         CoilVerdict.Call dropCall, CoilVerdict verdict, CondensateCheck condensate,
                         List<Finding> findings) {
    public static final String SOURCE_MEASURED = "measured";
    public static final String SOURCE_ADP = "apparatus-dew-point";
    public static final String SOURCE_NONE = "none";

    public CoilResult {
        estimates = Map.copyOf(estimates);
        findings = List.copyOf(findings);
    }

    /** The estimate of {@code m}. */
    public Estimate estimate(Measurand m) {
        return estimates.get(m);
    }

    /** Airflow per nominal capacity, m³/s per W, or NaN without a nameplate capacity. */
    public double airflowPerNominalCapacity() {
        return readings.hasNominalCapacity() ? readings.airflowM3PerS() / readings.nominalCapacityW() : Double.NaN;
    }
}
