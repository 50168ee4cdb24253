package app.latentledger.ui.settings;

import app.latentledger.core.settings.ChoiceSetting;
import app.latentledger.core.settings.Settings;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.util.List;

/** One word setting on the screen (units, theme, paper): the saved word; choosing saves at once. */
public final class ChoiceRow {
    private final ChoiceSetting setting;
    private final SettingsViewModel owner;
    private final ReadOnlyStringWrapper value = new ReadOnlyStringWrapper("");

    ChoiceRow(ChoiceSetting setting, SettingsViewModel owner) {
        this.setting = setting;
        this.owner = owner;
    }

    void show(Settings s) {
        value.set(s.choice(setting.key()));
    }

    /** Saves {@code word} (one of {@link #choices()}). */
    public void choose(String word) {
        owner.choose(this, word);
    }

    public ChoiceSetting setting() {
        return setting;
    }

    public String key() {
        return setting.key();
    }

    public String label() {
        return setting.label();
    }

    public List<String> choices() {
        return setting.choices();
    }

    /** The word shown on a choice's button, e.g. "IP (°F, cfm)". */
    public static String caption(String key, String word) {
        switch (key + ":" + word) {
            case "units:ip": return "IP  °F · cfm";
            case "units:si": return "SI  °C · L/s";
            case "theme:light": return "Light";
            case "theme:dark": return "Dark";
            case "theme:outdoor": return "Outdoor";
            case "paper:letter": return "Letter";
            case "paper:a4": return "A4";
            default: return word;
        }
    }

    public ReadOnlyStringProperty valueProperty() {
        return value.getReadOnlyProperty();
    }
}
