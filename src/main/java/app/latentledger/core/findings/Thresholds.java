package app.latentledger.core.findings;

import java.util.List;

/**
 * Every threshold a finding uses, in one place, each with its source. Sections per analysis; add
 * a new one to {@link #all()} as well.
 */
public final class Thresholds {
    /** Says where a value comes from when no published source gives it. */
    public static final String COMMON_PRACTICE = "common practice, no source";

    // --- coil check -------------------------------------------------------------------------

    // --- logged run cycles ------------------------------------------------------------------

    private Thresholds() {
    }

    /** All thresholds, for settings screens and the methods document. */
    public static List<Threshold> all() {
        return List.of();
    }
}
