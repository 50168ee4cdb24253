package app.latentledger.core.cycles;

import java.util.Locale;

/** Whether the blower ran while the compressor was off. */
public enum BlowerState {
    ON, OFF, UNKNOWN;

    /** "on" | "off" | "unknown", as in JSON. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }
}
