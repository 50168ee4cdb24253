package app.latentledger.ui;

import app.latentledger.ui.look.Reflowing;
import app.latentledger.ui.settings.SettingsView;
import javafx.scene.layout.StackPane;

/**
 * The settings screen in the shell: one scrolling column reads the same upright and on its side,
 * so reflowing only passes the orientation on (nothing to move).
 */
final class ReflowingSettings extends StackPane implements Reflowing {
    private final SettingsView view;

    ReflowingSettings(SettingsView view) {
        this.view = view;
        setId("screen-settings");
        getChildren().add(view);
    }

    SettingsView view() {
        return view;
    }

    @Override
    public void setPortrait(boolean portrait) {
        // the settings list is a single column already
    }
}
