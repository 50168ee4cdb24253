package app.latentledger.ui.present;

import app.latentledger.core.findings.Severity;

import java.util.List;

/**
 * A finding as the screen shows it: severity (in words and an icon), the plain sentence, the
 * tech's line, its evidence worded in the tech's units and what to check next.
 */
public record FindingCard(String code, Severity severity, String message, String technical, List<String> evidence,
                          List<String> nextChecks) {
    public FindingCard {
        evidence = List.copyOf(evidence);
        nextChecks = List.copyOf(nextChecks);
    }

    /** The severity as a word for the badge. */
    public String severityWord() {
        return switch (severity) {
            case NOTE -> "Note";
            case CHECK -> "Check";
            case FIX -> "Fix";
        };
    }
}
