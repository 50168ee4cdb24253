package app.latentledger.store;

import app.latentledger.core.settings.Settings;

import java.nio.file.Files;

/**
 * The settings a command reads without changing anything: from the ledger in the data folder, or
 * the defaults when there is no ledger yet. A calculation never creates a database just to learn
 * that the defaults apply (and never seeds the demo scenario); the app and the {@code visits} and
 * {@code settings set} commands create it on first use. An existing older ledger is brought up to
 * this build's schema on open, as every open does.
 */
public final class StoredSettings {
    private StoredSettings() {
    }

    /** The settings stored in {@code location}, or {@link Settings#DEFAULTS} when it holds no ledger. */
    public static Settings read(DataLocation location) {
        if (!Files.isRegularFile(location.databaseFile())) {
            return Settings.DEFAULTS;
        }
        try (Database db = Database.open(location.databaseFile())) {
            return new SettingsRepository(db).load();
        }
    }
}
