package app.latentledger.core.cycles;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.units.Ratio;

import java.util.List;

/**
 * Everything the log analysis found. SI throughout; NaN means "not computable from this log".
 *
 * @param samples                 samples analysed
 * @param durationS               first to last sample, s
 * @param compressorFromStatus    runs timed from a compressor column (else from temperatures)
 * @param cycles                  complete runs in order
 * @param cyclesPerHour           runs started per hour of log
 * @param medianOnS               median run time, s
 * @param runtimeFraction         Σ run time ÷ Σ (run + rest) of the cycles, the time they cover (not the
 *                                whole log: runs cut by its ends or a gap are not counted)
 * @param airflowM3PerS           airflow used for the masses during runs, m³/s (NaN when not given)
 * @param removedKg               total removed during runs, kg
 * @param returnedKg              total returned while the blower ran in rests, kg (at the fan-only airflow)
 * @param netRemovalKgPerS        (removed − returned) ÷ the same covered time, kg/s
 * @param steadyDryingW           steady W_return − W_supply from the long runs, kg/kg
 * @param steadyRemovalKgPerS     steady-state moisture removal rate, kg/s
 * @param latentFractionMeasured  Σ net ÷ (steady rate × Σ on-time) over the cycles
 * @param latentFractionPredicted the same from {@link LatentDegradationModel} at the observed timing
 * @param model                   the model parameters used
 * @param fitRests                blower-on rests t_wet and γ were fitted to (0 when defaults)
 * @param reevaporationShare      returned ÷ removed (NaN when nothing measurable was removed)
 * @param blowerOnRests           rests in which the blower ran at all (continuous or a fan-off delay)
 * @param sensorOffsetRhPct       median supply RH minus the RH the return's vapour pressure gives at the
 *                                supply's dry bulb, over a dry coil with the blower on, % RH (NaN: not checked)
 * @param sensorCheckSamples      samples behind that median (0: not checkable)
 * @param supplyCorrectionRhPct   RH taken off every supply reading because the probes disagreed
 *                                beyond tolerance, % RH (0 when not corrected)
 * @param findings                findings, most urgent first
 * @param fanAirflowM3PerS        airflow used for water returned in rests, m³/s (NaN when not given)
 * @param fanOffDelayMedianS      median blower run-on after the compressor in rests where the blower
 *                                then stopped, s (NaN when no such rest)
 * @param fanOffDelayRests        rests with such a run-on
 * @param blowerInferred          blower state came from the air (no blower column)
 * @param sensorOffsetDewPointK   the same disagreement as a dew-point difference, supply − return, K
 * @param sensorCheckSeconds      blower time over a dry coil the check rests on, s
 * @param house                   the house's humidity over the log (null without return humidity)
 * @param loadLine                runtime against outdoor temperature (null without outdoor column or hours)
 * @param series                  the per-sample series the analysis used
 * @param supplyHumidityLagS      the supply humidity probe's lag behind its thermistor found and taken
 *                                out, s (0 when none was found or it could not be told)
 */
public record RunCycleReport(int samples, double durationS, boolean compressorFromStatus, List<CycleResult> cycles,
                             double cyclesPerHour, double medianOnS, double runtimeFraction, double airflowM3PerS,
                             double removedKg, double returnedKg, double netRemovalKgPerS, double steadyDryingW,
                             double steadyRemovalKgPerS, double latentFractionMeasured,
                             double latentFractionPredicted, LatentDegradationModel model, int fitRests,
                             double reevaporationShare, int blowerOnRests, double sensorOffsetRhPct,
                             int sensorCheckSamples, double supplyCorrectionRhPct, List<Finding> findings,
                             double fanAirflowM3PerS, double fanOffDelayMedianS, int fanOffDelayRests,
                             boolean blowerInferred, double sensorOffsetDewPointK, double sensorCheckSeconds,
                             HouseHumidity house, LoadLine loadLine, CycleSeries series, double supplyHumidityLagS) {
    /** Why a share of returned water cannot be given. */
    public static final String NOTHING_REMOVED = "no moisture measurably removed during the runs";
    /** Said of a returned share below zero: the rests took water out rather than putting it back. */
    public static final String NONE_RETURNED = "the air left the coil drier in the rests";
    /** Why a latent fraction cannot be given. */
    public static final String NO_STEADY_RUN = "no run long and wet enough to give the steady removal rate";

    public RunCycleReport {
        cycles = List.copyOf(cycles);
        findings = List.copyOf(findings);
    }

    /** Whether a finding with this code is present. */
    public boolean has(FindingCode code) {
        return findings.stream().anyMatch(f -> f.code() == code);
    }

    /** The same report with these findings. */
    public RunCycleReport withFindings(List<Finding> f) {
        return new RunCycleReport(samples, durationS, compressorFromStatus, cycles, cyclesPerHour, medianOnS,
                runtimeFraction, airflowM3PerS, removedKg, returnedKg, netRemovalKgPerS, steadyDryingW,
                steadyRemovalKgPerS, latentFractionMeasured, latentFractionPredicted, model, fitRests,
                reevaporationShare, blowerOnRests, sensorOffsetRhPct, sensorCheckSamples, supplyCorrectionRhPct, f,
                fanAirflowM3PerS, fanOffDelayMedianS, fanOffDelayRests, blowerInferred, sensorOffsetDewPointK,
                sensorCheckSeconds, house, loadLine, series, supplyHumidityLagS);
    }

    /** Rests the blower was left on through (continuous fan), as the cycle table marks them. */
    public int blowerLeftOnRests() {
        return RestBlower.count(cycles, RestBlower.LEFT_ON);
    }

    /** Median blower time in a rest it was left on through, s (NaN when none). */
    public double blowerLeftOnMedianS() {
        return RestBlower.medianBlowerS(cycles, RestBlower.LEFT_ON);
    }

    /**
     * The fan-off delay in words for a summary line: "180 s median in 92 of 93 rests", or why there is
     * none ("none (blower left on instead)" when it never stopped by itself).
     */
    public String fanOffDelayWords() {
        if (fanOffDelayRests > 0) {
            return String.format(java.util.Locale.ROOT, "%.0f s median in %s", fanOffDelayMedianS,
                    RestBlower.ofRests(fanOffDelayRests, cycles.size()));
        }
        int leftOn = blowerLeftOnRests();
        return leftOn > 0 ? "none (blower left on instead)" : "none found";
    }

    /** Returned ÷ removed, or not measurable with the reason. */
    public Ratio reevaporation() {
        return Ratio.known(reevaporationShare, NOTHING_REMOVED);
    }

    /** Measured latent fraction, or not measurable with the reason. */
    public Ratio latentMeasured() {
        return Ratio.known(latentFractionMeasured, NO_STEADY_RUN);
    }

    /** Model latent fraction, or not measurable with the reason. */
    public Ratio latentPredicted() {
        return Ratio.known(latentFractionPredicted, "the blower's state in the rests is not known");
    }

    /** Share of the covered time the compressor ran. */
    public Ratio runtime() {
        return Ratio.known(runtimeFraction, "no complete run and rest in the log");
    }
}
