package app.latentledger.store;

import java.util.List;

/**
 * A settings save refused because another program (the command line, another window) changed the
 * same setting to another value since these settings were loaded. Nothing was written; load the
 * settings again, look at the other change, and save again.
 */
public final class SettingsConflictException extends StoreException {
    private static final long serialVersionUID = 1L;

    private final transient List<String> clashes;

    SettingsConflictException(List<String> clashes) {
        super(Kind.CONFLICT, "settings not saved: changed elsewhere since they were loaded: " + String.join("; ", clashes)
                + "; nothing was written; load them again and repeat the change if it still applies", null);
        this.clashes = List.copyOf(clashes);
    }

    /** One line per setting changed on both sides. */
    public List<String> clashes() {
        return clashes;
    }
}
