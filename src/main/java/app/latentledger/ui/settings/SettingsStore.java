package app.latentledger.ui.settings;

import app.latentledger.core.settings.Settings;
import app.latentledger.store.SettingsRepository;

/** Where the screen loads and saves; the ledger's repository, or a stand-in in tests. */
public interface SettingsStore {
    Settings load();

    void save(Settings settings);

    /** The ledger's settings table. */
    static SettingsStore of(SettingsRepository repository) {
        return new SettingsStore() {
            @Override
            public Settings load() {
                return repository.load();
            }

            @Override
            public void save(Settings settings) {
                repository.save(settings);
            }
        };
    }
}
