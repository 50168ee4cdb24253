package app.latentledger.cli;

import app.latentledger.core.settings.Settings;
import app.latentledger.store.DataLocation;
import app.latentledger.store.StoreException;
import app.latentledger.store.StoredSettings;

/**
 * The tech's stored settings for a calculation command ({@code coil}, {@code log}): read from the
 * data folder {@code visits} uses, without creating a ledger (no ledger means the defaults). A
 * ledger that cannot be read does not stop a calculation: it runs on the defaults and says so on
 * standard error, so the tech knows their own thresholds were not used.
 */
final class CommandSettings {
    private CommandSettings() {
    }

    static Settings read(CliContext context) {
        DataLocation location = DataLocation.resolve(context.dataDir());
        try {
            return StoredSettings.read(location);
        } catch (StoreException e) {
            context.err().println("latent-ledger: settings not read from " + location + " (" + e.getMessage()
                    + "); using the defaults");
            return Settings.DEFAULTS;
        }
    }
}
