package app.latentledger.core.findings;

/**
 * How much a finding asks of the tech, on the project's own three-step scale. Ordered from least
 * to most urgent; shown in words (and an icon in the app), never by colour alone.
 */
public enum Severity {
    /** Worth recording; nothing to do now. */
    NOTE,
    /** Look closer before leaving the site: a measurement to repeat or a setting to confirm. */
    CHECK,
    /** The system is not doing its job on moisture; a repair or change is called for. */
    FIX;

    /** Lower-case key as used in JSON ("note" | "check" | "fix"). */
    public String key() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
