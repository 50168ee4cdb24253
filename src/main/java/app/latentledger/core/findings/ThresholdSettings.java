package app.latentledger.core.findings;

import java.util.Map;

/**
 * The thresholds in force: the defaults of {@link Thresholds} with any overrides a tech set.
 *
 * @param overridesSi threshold key to SI value
 */
public record ThresholdSettings(Map<String, Double> overridesSi) {
    /** The published or common-practice defaults, no overrides. */
    public static final ThresholdSettings DEFAULTS = new ThresholdSettings(Map.of());

    public ThresholdSettings {
        overridesSi = Map.copyOf(overridesSi);
    }

    /** The value in force for {@code t}, SI. */
    public double valueSi(Threshold t) {
        Double v = overridesSi.get(t.key());
        return v != null ? v : t.defaultSi();
    }
}
