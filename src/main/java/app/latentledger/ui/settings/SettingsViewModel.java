package app.latentledger.ui.settings;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.settings.ChoiceSetting;
import app.latentledger.core.settings.NumberSetting;
import app.latentledger.core.settings.SettingGroup;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.settings.ShownNumber;
import app.latentledger.core.units.TypedNumber;
import app.latentledger.store.StoreException;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;

/**
 * The settings screen's state. Every accepted change is saved at once (there is no Save button to
 * forget on a roof); a refused value leaves the saved one in force, shows it again and says why,
 * naming the value and the accepted range in the tech's units.
 */
public final class SettingsViewModel {
    private final SettingsStore store;
    private final ReadOnlyObjectWrapper<Settings> saved;
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper("");
    private final Map<String, NumberRow> numbers = new LinkedHashMap<>();
    private final Map<String, ChoiceRow> choices = new LinkedHashMap<>();

    public SettingsViewModel(SettingsStore store) {
        this.store = store;
        this.saved = new ReadOnlyObjectWrapper<>(store.load());
        for (ChoiceSetting c : SettingsCatalogue.choices()) {
            choices.put(c.key(), new ChoiceRow(c, this));
        }
        for (NumberSetting n : SettingsCatalogue.allNumbers()) {
            numbers.put(n.key(), new NumberRow(n, this));
        }
        showAll();
    }

    /** The settings in force (as saved); the app shell may listen to it for units and theme. */
    public ReadOnlyObjectProperty<Settings> savedProperty() {
        return saved.getReadOnlyProperty();
    }

    /**
     * Settings changed elsewhere (the header's theme switch): shown here, so the next change on
     * this screen starts from them and does not undo them.
     */
    public void showSaved(Settings changed) {
        if (changed != null && !changed.equals(saved.get())) {
            saved.set(changed);
            showAll();
        }
    }

    /** What happened last: "Saved …", or why nothing was saved. */
    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    public List<NumberRow> numbers(SettingGroup group) {
        List<NumberRow> rows = new ArrayList<>();
        for (NumberRow r : numbers.values()) {
            if (r.setting().group() == group) {
                rows.add(r);
            }
        }
        return rows;
    }

    public List<ChoiceRow> choices(SettingGroup group) {
        List<ChoiceRow> rows = new ArrayList<>();
        for (ChoiceRow r : choices.values()) {
            if (r.setting().group() == group) {
                rows.add(r);
            }
        }
        return rows;
    }

    public NumberRow number(String key) {
        NumberRow r = numbers.get(key);
        if (r == null) {
            throw SettingsCatalogue.unknownKey(key);
        }
        return r;
    }

    public ChoiceRow choice(String key) {
        ChoiceRow r = choices.get(key);
        if (r == null) {
            throw SettingsCatalogue.unknownKey(key);
        }
        return r;
    }

    void commit(NumberRow row) {
        Settings s = saved.get();
        String typed = row.textProperty().get();
        if (typed != null && typed.trim().equals(row.shown(s))) {
            row.clearMessage();
            return; // nothing changed: no save, no message
        }
        Double shown = ShownNumber.parse(typed);
        if (shown == null) {
            refuse(row, TypedNumber.refusal(row.label(), typed) + "; " + row.hintProperty().get());
            return;
        }
        apply(row, x -> x.withTyped(row.key(), shown, x.units()));
    }

    void reset(NumberRow row) {
        apply(row, x -> x.reset(row.key()));
    }

    void choose(ChoiceRow row, String word) {
        Settings next;
        try {
            next = saved.get().withChoice(row.key(), word);
        } catch (IllegalArgumentException e) {
            status.set(e.getMessage());
            showAll();
            return;
        }
        save(next, row.label() + ": " + ChoiceRow.caption(row.key(), next.choice(row.key())));
    }

    private void apply(NumberRow row, UnaryOperator<Settings> change) {
        Settings next;
        try {
            next = change.apply(saved.get());
        } catch (InvalidInputException e) {
            refuse(row, e.message(saved.get().units()));
            return;
        }
        row.clearMessage();
        if (save(next, null)) {
            String symbol = row.unitProperty().get().isEmpty() ? "" : " " + row.unitProperty().get();
            status.set("Saved " + row.label() + ": " + row.textProperty().get() + symbol);
        }
    }

    private void refuse(NumberRow row, String why) {
        row.show(saved.get());
        row.refuse(why);
        status.set("Not saved: " + why);
    }

    private boolean save(Settings next, String what) {
        try {
            store.save(next);
        } catch (StoreException e) {
            status.set("Not saved, the ledger could not be written: " + e.getMessage());
            showAll();
            return false;
        }
        // what the store now holds: the change merged with any made elsewhere meanwhile
        saved.set(store.load());
        showAll();
        if (what != null) {
            status.set("Saved " + what);
        }
        return true;
    }

    private void showAll() {
        Settings s = saved.get();
        choices.values().forEach(r -> r.show(s));
        numbers.values().forEach(r -> r.show(s));
    }
}
