package app.latentledger.ui.log;

import app.latentledger.core.findings.Finding;
import app.latentledger.ui.results.Row;

import java.util.List;

/**
 * What a log import gives the screen: where it came from, the cycle summary as rows and the
 * findings.
 *
 * @param source   the file or instrument it came from, as the tech would recognise it
 * @param summary  cycle summary figures, already in the tech's units
 * @param findings findings of the cycle analysis, in its order
 */
public record LogAnalysis(String source, List<Row> summary, List<Finding> findings) {
    public LogAnalysis {
        summary = List.copyOf(summary);
        findings = List.copyOf(findings);
    }
}
