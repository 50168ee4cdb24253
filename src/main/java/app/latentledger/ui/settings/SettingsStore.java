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
            /** What this screen loaded: saves merge with changes made elsewhere since. */
            private SettingsRepository.Stamped base;

            @Override
            public Settings load() {
                base = repository.loadStamped();
                return base.settings();
            }

            @Override
            public void save(Settings settings) {
                base = repository.save(base == null ? repository.loadStamped() : base, settings);
            }
        };
    }
}
