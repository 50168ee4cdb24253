package app.latentledger.ui.settings;

import app.latentledger.core.InvalidInputException;

import app.latentledger.core.settings.NumberSetting;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.ShownNumber;
import app.latentledger.core.units.UnitSystem;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

/**
 * One numeric setting on the screen: the text the tech types, its unit, default and range in the
 * tech's units, its source, and the message of the last refused value.
 */
public final class NumberRow {
    private final NumberSetting setting;
    private final SettingsViewModel owner;
    private final StringProperty text = new SimpleStringProperty("");
    private final ReadOnlyStringWrapper unit = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper hint = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private final SimpleBooleanProperty changed = new SimpleBooleanProperty();

    NumberRow(NumberSetting setting, SettingsViewModel owner) {
        this.setting = setting;
        this.owner = owner;
    }

    /** Shows the saved value in {@code s}'s units and forgets any typing not committed. */
    void show(Settings s) {
        UnitSystem u = s.units();
        text.set(shown(s));
        unit.set(setting.quantity().symbol(u));
        String symbol = unit.get().isEmpty() ? "" : " " + unit.get();
        // the range as the refusal and the settings command print it: rounded inward to the shown precision
        hint.set("default " + ShownNumber.rounded(setting.quantity(), u, setting.defaultSi()) + symbol + " · accepts "
                + InvalidInputException.range(setting.quantity(), u, setting.minSi(), setting.maxSi()) + symbol);
        changed.set(!s.isDefault(setting.key()));
    }

    /**
     * The box's text for the saved value: an untouched default at the quantity's shown decimals
     * (2000 J/kg reads "0.9" Btu/lb), a value the tech typed exactly as it is stored, so it reads
     * back as typed.
     */
    String shown(Settings s) {
        UnitSystem u = s.units();
        return s.isDefault(setting.key()) ? ShownNumber.rounded(setting.quantity(), u, setting.defaultSi())
                : ShownNumber.text(setting.quantity().toDisplay(u, s.numberSi(setting.key())));
    }

    void refuse(String why) {
        message.set(why);
    }

    void clearMessage() {
        message.set("");
    }

    /** Saves what was typed, or keeps the saved value and says why not. */
    public void commit() {
        owner.commit(this);
    }

    /** Puts the setting back to its default and saves that. */
    public void resetToDefault() {
        owner.reset(this);
    }

    public NumberSetting setting() {
        return setting;
    }

    public String key() {
        return setting.key();
    }

    public String label() {
        return setting.label();
    }

    /** Where the default comes from; "common practice, no source" when nothing published gives it. */
    public String source() {
        return setting.source();
    }

    public StringProperty textProperty() {
        return text;
    }

    public ReadOnlyStringProperty unitProperty() {
        return unit.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty hintProperty() {
        return hint.getReadOnlyProperty();
    }

    /** Empty, or why the last value typed was refused. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** True when the saved value differs from the default. */
    public ReadOnlyBooleanProperty changedProperty() {
        return changed;
    }
}
