package app.latentledger.ui.session;

import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.core.findings.Finding;
import app.latentledger.ui.present.Row;

import java.util.List;

/**
 * What a log import gives the screen: where it came from, the cycle summary as rows, the findings
 * and the timeline to draw.
 *
 * @param source   the file it came from, as the tech would recognise it
 * @param summary  cycle summary figures, already in the tech's units
 * @param findings findings of the cycle analysis, in its order
 * @param notes    what the import noticed (rows kept out, repeated times), "" when nothing
 * @param timeline the log and its cycles as the timeline draws them, or null
 * @param logId    id of the kept log, "" when it was not kept
 */
public record LogAnalysis(String source, List<Row> summary, List<Finding> findings, String notes,
                          TimelineData timeline, String logId) {
    public LogAnalysis {
        summary = List.copyOf(summary);
        findings = List.copyOf(findings);
        notes = notes == null ? "" : notes;
        logId = logId == null ? "" : logId;
    }

    /** A log analysed without knowing which kept log it is. */
    public LogAnalysis(String source, List<Row> summary, List<Finding> findings, String notes, TimelineData timeline) {
        this(source, summary, findings, notes, timeline, "");
    }

    /** Figures and findings without a timeline (a stand-in analysis). */
    public LogAnalysis(String source, List<Row> summary, List<Finding> findings) {
        this(source, summary, findings, "", null);
    }
}
