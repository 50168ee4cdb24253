package app.latentledger.visit;

import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.visit.LogConditions;
import app.latentledger.io.logcsv.ImportReport;

import java.util.List;

/**
 * One log and what its analysis found, as every face shows it.
 *
 * @param logId        id of the kept log, "" for a file analysed without keeping it
 * @param source       the file it came from
 * @param series       the samples as the analysis read them, or null when they could not be read
 * @param report       the cycle analysis, or null (see {@code refusal})
 * @param conditions   the pressure and airflows used, with where they came from
 * @param importReport what the import noticed, null for a kept log read back
 * @param ignored      stored channels the analysis does not read
 * @param refusal      why there is no analysis ("" when there is one)
 * @param note         a sentence on the conditions the tech should know ("" when none), e.g. that a
 *                     log kept before airflows were stored uses the visit's latest airflow
 */
public record VisitLog(String logId, String source, LogSeries series, RunCycleReport report, LogConditions conditions,
                       ImportReport importReport, List<String> ignored, String refusal, String note) {
    public VisitLog {
        ignored = List.copyOf(ignored);
        refusal = refusal == null ? "" : refusal;
        note = note == null ? "" : note;
    }

    public boolean analysed() {
        return report != null;
    }
}
