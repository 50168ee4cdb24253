package app.latentledger.report;

import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.records.ImportedLog;

import java.util.List;

/**
 * A stored log with its cycle analysis, or why it could not be analysed.
 *
 * @param log           the stored log
 * @param series        the samples as the analysis read them, or null when they could not be read
 * @param report        the analysis, or null
 * @param refusal       why there is no analysis; empty when there is one
 * @param ignored       stored channels the analysis does not read
 * @param pressurePa    pressure the analysis used
 * @param airflowM3PerS airflow used for the masses, NaN when the visit has none
 * @param airflowFrom   where the airflow came from ("reading set Before", "given at import"; "" when none)
 * @param note          what the tech should know about the conditions used ("" when nothing)
 */
public record AnalysedLog(ImportedLog log, LogSeries series, RunCycleReport report, String refusal,
                          List<String> ignored, double pressurePa, double airflowM3PerS, String airflowFrom,
                          String note) {
    public AnalysedLog {
        ignored = List.copyOf(ignored);
    }

    public boolean analysed() {
        return report != null;
    }
}
