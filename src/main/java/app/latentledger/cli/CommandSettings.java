package app.latentledger.cli;

import app.latentledger.core.settings.Settings;
import app.latentledger.store.DataLocation;
import app.latentledger.store.StoreException;
import app.latentledger.store.StoredSettings;

/**
 * The tech's stored settings for a calculation command ({@code coil}, {@code log}): read from the
 * data folder {@code visits} uses, without creating a ledger (no ledger means the defaults). A
 * ledger that exists but cannot be read stops the calculation with the reason: running on the
 * defaults instead would give a verdict on thresholds the tech did not choose.
 */
final class CommandSettings {
    private CommandSettings() {
    }

    static Settings read(CliContext context) {
        DataLocation location = DataLocation.resolve(context.dataDir());
        try {
            return StoredSettings.read(location);
        } catch (StoreException e) {
            throw new StoreException(e.kind() == StoreException.Kind.FAILED ? StoreException.Kind.UNAVAILABLE : e.kind(),
                    "settings not read from " + location + " (" + e.getMessage() + "); nothing was worked out on"
                    + " the defaults instead", e);
        }
    }
}
