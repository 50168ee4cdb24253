package app.latentledger.ui.settings;

import app.latentledger.store.Ledger;
import javafx.scene.Parent;

/** The entry point the app shell uses: the settings screen on the ledger's settings. */
public final class SettingsScreen {
    private SettingsScreen() {
    }

    /**
     * A settings screen that loads from and saves to {@code ledger} (the caller keeps the ledger
     * open while the screen is shown). Its view model is {@code ((SettingsView) parent).viewModel()},
     * whose {@code savedProperty()} tells the shell when units or theme change.
     */
    public static Parent create(Ledger ledger) {
        return new SettingsView(new SettingsViewModel(SettingsStore.of(ledger.settings())))
                .withSection(new OfficeView(new OfficeViewModel(() -> new app.latentledger.sync.OfficeSync(ledger),
                        OfficeViewModel.officeThread(), javafx.application.Platform::runLater)));
    }
}
