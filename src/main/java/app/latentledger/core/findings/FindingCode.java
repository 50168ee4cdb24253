package app.latentledger.core.findings;

import java.util.Locale;

/**
 * Every finding's stable code, in one place. A code never changes meaning once released: reports,
 * exported data and stored snapshots refer to findings by {@link #key()}.
 *
 * <p>Grouped by the analysis that raises it; each group's thresholds live in the matching section
 * of {@link Thresholds}. A new finding adds its constant in its own group (see the contributor guide,
 * "Adding a finding").
 */
public enum FindingCode {
    // The coil check (core.coil.CoilFindings).
    COIL_ABOVE_DEW_POINT,
    COIL_MARGIN_INCONCLUSIVE,
    MOISTURE_DROP_INCONCLUSIVE,
    COIL_ADDING_MOISTURE,
    READINGS_INCONSISTENT,
    HIGH_AIRFLOW_PER_TON,
    LOW_AIRFLOW_PER_TON,
    LOW_LATENT_SHARE,
    INDOOR_HUMIDITY_HIGH,
    CONDENSATE_MISMATCH,

    // Logged run cycles (core.cycles.CycleFindings).
    SHORT_CYCLING,
    SHORT_CYCLING_LIMITS_LATENT,
    OFF_CYCLE_REEVAPORATION,
    COIL_NEVER_WET,
    SENSOR_OFFSET,

    // The house's moisture budget (core.house).
    ;

    private final String key = name().toLowerCase(Locale.ROOT).replace('_', '-');

    /** The stable kebab-case code, e.g. {@code coil-above-dew-point}. */
    public String key() {
        return key;
    }

    /** The code for {@code key}, or an {@link IllegalArgumentException} naming it. */
    public static FindingCode ofKey(String key) {
        for (FindingCode c : values()) {
            if (c.key.equals(key)) {
                return c;
            }
        }
        throw new IllegalArgumentException("unknown finding code: " + key);
    }

    /** The key, so a code prints as the tech reads it in reports and exports. */
    @Override
    public String toString() {
        return key;
    }
}
