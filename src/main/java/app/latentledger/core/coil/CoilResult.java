package app.latentledger.core.coil;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.psychro.AdiabaticMixing;
import app.latentledger.core.psychro.MoistAirState;

import java.util.List;
import java.util.Map;

/**
 * Everything a coil check found. Capacities come from SI-edition arithmetic; the states are in
 * the edition the caller asked for, for display.
 *
 * @param readings            what was read
 * @param entering            state of the air entering the coil (display edition): the entering
 *                            reading, or the mix of return and outdoor air
 * @param leaving             leaving state (display edition)
 * @param process             mass-flow figures
 * @param adp                 apparatus dew point and bypass factor, or why there is none
 * @param coilTemperatureC    the coil temperature compared with the dew point (measured, or the
 *                            ADP), or NaN
 * @param coilTemperatureSource which coil temperature stood in
 * @param estimates           each measurand with its expanded uncertainty (k = 2)
 * @param marginCall          the dew-point margin's call
 * @param dropCall            the humidity-ratio drop's call
 * @param verdict             the answer
 * @param condensate          condensate cross-check, or null without a catch
 * @param findings            what to tell the tech and the homeowner
 * @param returnAir           the return (indoor) state (display edition); the entering state
 *                            itself when no outdoor air is mixed in
 * @param outdoorAir          the outdoor state (display edition), or null
 * @param mix                 the adiabatic mix that gave {@code entering}, or null
 */
public record CoilResult(CoilReadings readings, MoistAirState entering, MoistAirState leaving, CoilProcess process,
                         ApparatusDewPoint adp, double coilTemperatureC, CoilTemperatureSource coilTemperatureSource,
                         Map<Measurand, Estimate> estimates, CoilVerdict.Call marginCall,
                         CoilVerdict.Call dropCall, CoilVerdict verdict, CondensateCheck condensate,
                         List<Finding> findings, MoistAirState returnAir, MoistAirState outdoorAir,
                         AdiabaticMixing.Mix mix) {

    public CoilResult {
        estimates = Map.copyOf(estimates);
        findings = List.copyOf(findings);
    }

    /** A reading, or the mix of return and outdoor air. */
    public EnteringSource enteringSource() {
        return mix != null ? EnteringSource.MIXED : EnteringSource.MEASURED;
    }

    public boolean mixed() {
        return mix != null;
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
