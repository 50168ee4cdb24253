package app.latentledger.core.findings;

import java.util.List;

/**
 * Something the app found, in plain words, with the numbers behind it.
 *
 * @param code       stable code that never changes meaning once released, e.g. {@code coil-above-dew-point}
 * @param severity   how much it asks of the tech
 * @param message    one plain sentence a homeowner understands
 * @param technical  one line for the tech, with the figures that matter
 * @param evidence   the numbers behind it
 * @param nextChecks what to check next, most useful first
 */
public record Finding(FindingCode code, Severity severity, String message, String technical,
                      List<Evidence> evidence, List<String> nextChecks) {
    public Finding {
        evidence = List.copyOf(evidence);
        nextChecks = List.copyOf(nextChecks);
    }
}
