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
 * @param coilTemperatureSource "measured" | "apparatus-dew-point" | "none"
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
                         ApparatusDewPoint adp, double coilTemperatureC, String coilTemperatureSource,
                         Map<Measurand, Estimate> estimates, CoilVerdict.Call marginCall,
                         CoilVerdict.Call dropCall, CoilVerdict verdict, CondensateCheck condensate,
                         List<Finding> findings, MoistAirState returnAir, MoistAirState outdoorAir,
                         AdiabaticMixing.Mix mix) {
    public static final String SOURCE_MEASURED = "measured";
    /** {@link #enteringSource()}: the entering state is a reading. */
    public static final String ENTERING_MEASURED = "measured";
    /** {@link #enteringSource()}: the entering state is computed as a mix of return and outdoor air. */
    public static final String ENTERING_MIXED = "mixed";
    public static final String SOURCE_ADP = "apparatus-dew-point";
    public static final String SOURCE_NONE = "none";

    public CoilResult {
        estimates = Map.copyOf(estimates);
        findings = List.copyOf(findings);
    }

    /** "measured" | "mixed". */
    public String enteringSource() {
        return mix != null ? ENTERING_MIXED : ENTERING_MEASURED;
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
