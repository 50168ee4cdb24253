package app.latentledger.core.cycles;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;

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
 * @param airflowM3PerS           airflow used for the masses, m³/s (NaN when not given)
 * @param removedKg               total removed during runs, kg
 * @param returnedKg              total returned in blower-on rests, kg
 * @param netRemovalKgPerS        (removed − returned) ÷ the same covered time, kg/s
 * @param steadyDryingW           steady W_return − W_supply from the long runs, kg/kg
 * @param steadyRemovalKgPerS     steady-state moisture removal rate, kg/s
 * @param latentFractionMeasured  Σ net ÷ (steady rate × Σ on-time) over the cycles
 * @param latentFractionPredicted the same from {@link LatentDegradationModel} at the observed timing
 * @param model                   the model parameters used
 * @param fitRests                blower-on rests t_wet and γ were fitted to (0 when defaults)
 * @param reevaporationShare      returned ÷ removed
 * @param blowerOnRests           rests in which the blower ran at all (continuous or a fan-off delay)
 * @param sensorOffsetRhPct       median supply − return RH over a dry coil with the blower on, % RH
 * @param sensorCheckSamples      samples behind that median (0: not checkable)
 * @param supplyCorrectionRhPct   RH taken off every supply reading because the probes disagreed
 *                                beyond tolerance, % RH (0 when not corrected)
 * @param findings                findings, most urgent first
 */
public record RunCycleReport(int samples, double durationS, boolean compressorFromStatus, List<CycleResult> cycles,
                             double cyclesPerHour, double medianOnS, double runtimeFraction, double airflowM3PerS,
                             double removedKg, double returnedKg, double netRemovalKgPerS, double steadyDryingW,
                             double steadyRemovalKgPerS, double latentFractionMeasured,
                             double latentFractionPredicted, LatentDegradationModel model, int fitRests,
                             double reevaporationShare, int blowerOnRests, double sensorOffsetRhPct,
                             int sensorCheckSamples, double supplyCorrectionRhPct, List<Finding> findings) {
    public RunCycleReport {
        cycles = List.copyOf(cycles);
        findings = List.copyOf(findings);
    }

    /** Whether a finding with this code is present. */
    public boolean has(FindingCode code) {
        return findings.stream().anyMatch(f -> f.code() == code);
    }
}
