package app.latentledger.ui.entry;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.ui.present.Shown;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Draft;
import app.latentledger.ui.session.Slot;
import app.latentledger.ui.session.SlotValue;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * The readings screen: which box is selected, what the pad holds, and what happened to the last
 * entry. Enter checks the value with {@link EntryRules} and, when it is accepted, has the session
 * keep it at once; a refused value changes nothing kept and the message says why.
 */
public final class EntryViewModel {
    private final AppSession session;
    private final KeypadViewModel pad = new KeypadViewModel();
    private final ObjectProperty<Slot> selected = new SimpleObjectProperty<>(Slot.RETURN_DRY_BULB);
    private final BooleanProperty toleranceMode = new SimpleBooleanProperty(false);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper refused = new ReadOnlyBooleanWrapper(false);
    private final Map<Slot, StringBinding> valueTexts = new EnumMap<>(Slot.class);
    private final Map<Slot, StringBinding> toleranceTexts = new EnumMap<>(Slot.class);
    private final StringBinding padTitle;
    private final StringBinding padDisplay;
    private final StringBinding padUnit;
    private final javafx.collections.ObservableList<SetChoice> sets = javafx.collections.FXCollections.observableArrayList();
    private final ObjectProperty<SetChoice> currentSet = new SimpleObjectProperty<>();

    /**
     * A reading set of the visit as the picker names it.
     *
     * @param id   reading-set id
     * @param name e.g. "10:05 · before", or "new (not complete)"
     */
    public record SetChoice(String id, String name) {
        @Override
        public String toString() {
            return name;
        }
    }

    public EntryViewModel(AppSession session) {
        this.session = session;
        selected.addListener((o, a, b) -> {
            pad.clear();
            toleranceMode.set(false);
            refused.set(false);
            message.set(b == Slot.COIL_TEMPERATURE ? Cautions.BEFORE_COIL_READINGS : "");
        });
        toleranceMode.addListener((o, a, b) -> pad.clear());
        padTitle = Bindings.createStringBinding(() -> {
            Slot sel = selected.get();
            return toleranceMode.get() ? "Tolerance of " + title(sel).toLowerCase(java.util.Locale.ROOT) : title(sel);
        }, selected, toleranceMode, session.draftProperty(), session.unitsProperty());
        padDisplay = Bindings.createStringBinding(() -> {
            if (!pad.text().isEmpty()) {
                return pad.text();
            }
            Slot sel = selected.get();
            return toleranceMode.get() ? shownTolerance(sel).replaceFirst("^± ", "").replaceFirst(" \\S+$", "")
                    : shownValue(sel);
        }, pad.textProperty(), selected, toleranceMode, session.draftProperty(), session.systemProperty(),
                session.unitsProperty());
        padUnit = Bindings.createStringBinding(this::unit, selected, toleranceMode, session.draftProperty(),
                session.unitsProperty());
        session.draftProperty().addListener((o, a, b) -> {
            if (a == null || b == null || !a.readingSetId().equals(b.readingSetId()) || a.takenAt() != b.takenAt()) {
                loadSets();
            }
        });
        currentSet.addListener((o, a, b) -> {
            if (b != null && session.draft() != null && !b.id().equals(session.draft().readingSetId())) {
                session.openReadingSet(b.id());
            }
        });
        loadSets();
    }

    /** The visit's reading sets, the one being entered included. */
    public javafx.collections.ObservableList<SetChoice> sets() {
        return sets;
    }

    /** The reading set shown; choosing another opens it. */
    public ObjectProperty<SetChoice> currentSetProperty() {
        return currentSet;
    }

    private void loadSets() {
        Draft d = session.draft();
        if (d == null || session.visit() == null) {
            return;
        }
        java.util.List<SetChoice> list = new java.util.ArrayList<>();
        java.time.format.DateTimeFormatter hm = java.time.format.DateTimeFormatter.ofPattern("HH:mm");
        boolean stored = false;
        for (app.latentledger.core.records.ReadingSet rs : session.ledger().readings().forVisit(session.visit().id())) {
            list.add(new SetChoice(rs.id(), rs.takenAt().format(hm) + (rs.label().isEmpty() ? "" : " · " + rs.label())));
            stored |= rs.id().equals(d.readingSetId());
        }
        if (!stored) {
            list.add(new SetChoice(d.readingSetId(), "New set (not complete yet)"));
        }
        sets.setAll(list);
        currentSet.set(list.stream().filter(c -> c.id().equals(d.readingSetId())).findFirst().orElse(null));
    }

    /** The pad's heading: the selected box, or its tolerance. */
    public StringBinding padTitle() {
        return padTitle;
    }

    /** What the pad shows: the number being typed, else the box's current value. */
    public StringBinding padDisplay() {
        return padDisplay;
    }

    /** The unit beside the pad's number. */
    public StringBinding padUnit() {
        return padUnit;
    }

    public KeypadViewModel pad() {
        return pad;
    }

    public ObjectProperty<Slot> selectedProperty() {
        return selected;
    }

    public BooleanProperty toleranceModeProperty() {
        return toleranceMode;
    }

    /** Why the last entry was refused, what was saved, or the coil caution. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** True while the message is a refusal. */
    public ReadOnlyBooleanProperty refusedProperty() {
        return refused.getReadOnlyProperty();
    }

    public UnitSystem units() {
        return session.units();
    }

    /** The value in a box as shown, "—" when empty. */
    public StringBinding valueText(Slot s) {
        return valueTexts.computeIfAbsent(s, k -> Bindings.createStringBinding(() -> shownValue(k),
                session.draftProperty(), session.systemProperty(), session.unitsProperty()));
    }

    /** "± 0.5 °F" for a box with a value, "" otherwise. */
    public StringBinding toleranceText(Slot s) {
        return toleranceTexts.computeIfAbsent(s, k -> Bindings.createStringBinding(() -> shownTolerance(k),
                session.draftProperty(), session.unitsProperty()));
    }

    /** The box's current choice (e.g. "wet-bulb"). */
    public String choice(Slot s) {
        return session.draft().choice(s);
    }

    public String title(Slot s) {
        return s.title(choice(s));
    }

    /** Unit shown beside the pad for what is being typed. */
    public String unit() {
        Slot s = selected.get();
        return toleranceMode.get() ? s.toleranceSymbol(units(), choice(s)) : s.symbol(units(), choice(s));
    }

    public void select(Slot s) {
        selected.set(s);
    }

    /** Picks another choice in the selected box and keeps it; refused when the value no longer fits. */
    public void choose(String choice) {
        Slot s = selected.get();
        if (choice.equals(choice(s))) {
            return;
        }
        Draft candidate = session.draft().withChoice(s, choice);
        if (tryKeep(candidate, s)) {
            message.set(s == Slot.COIL_TEMPERATURE ? Cautions.BEFORE_COIL_READINGS : "Saved: " + title(s));
        }
    }

    /** Enter on the pad: checks and keeps the typed value (or tolerance) of the selected box. */
    public boolean enter() {
        Slot s = selected.get();
        OptionalDouble typed = pad.value();
        if (typed.isEmpty()) {
            refuse("Type a number for " + title(s).toLowerCase(java.util.Locale.ROOT) + " first.");
            return false;
        }
        boolean ok = s == Slot.NOMINAL_TONS ? keepNominal(typed.getAsDouble()) : keepReading(s, typed.getAsDouble());
        if (ok) {
            pad.clear();
            toleranceMode.set(false);
            message.set("Saved: " + title(s) + " " + shownValue(s) + " " + s.symbol(units(), choice(s))
                    + (s.hasTolerance() ? " " + shownTolerance(s) : ""));
        }
        return ok;
    }

    /**
     * Enter, then move to the next box, the way a tech reads down the list. A tolerance entry stays
     * on its box: the value usually comes next.
     */
    public boolean enterAndAdvance() {
        Slot s = selected.get();
        boolean tolerance = toleranceMode.get();
        if (!enter()) {
            return false;
        }
        if (!tolerance) {
            String saved = message.get();
            List<Slot> order = List.of(Slot.values());
            selected.set(order.get((order.indexOf(s) + 1) % order.size()));
            if (selected.get() != Slot.COIL_TEMPERATURE) {
                message.set(saved);
            }
        }
        return true;
    }

    /** Keeps what the pad holds if it is an acceptable value (the app is being paused). */
    public void keepPending() {
        if (pad.value().isPresent()) {
            enter();
        }
    }

    private boolean keepReading(Slot s, double shown) {
        Draft d = session.draft();
        String c = d.choice(s);
        SlotValue old = d.value(s);
        SlotValue v;
        if (toleranceMode.get()) {
            if (old == null) {
                refuse("Enter the " + title(s).toLowerCase(java.util.Locale.ROOT) + " before its tolerance.");
                return false;
            }
            v = new SlotValue(old.valueSi(), s.toleranceFromDisplay(units(), c, Math.abs(shown)));
        } else {
            double tol = old != null ? old.toleranceSi() : session.defaultToleranceSi(s, c);
            try {
                v = new SlotValue(s.fromDisplay(units(), c, shown), tol);
            } catch (IllegalArgumentException e) {
                refuse(e.getMessage());
                return false;
            }
        }
        return tryKeep(d.with(s, v), s);
    }

    private boolean keepNominal(double tons) {
        HvacSystem sys = session.system();
        double w = Quantity.POWER_LARGE.fromDisplay(units(), tons);
        try {
            EntryRules.checkNominal(w);
            session.keep(new HvacSystem(sys.id(), sys.siteId(), sys.label(), sys.type(), w, sys.refrigerant(),
                    sys.blowerType(), sys.fanSetting(), sys.thermostatNotes()));
            refused.set(false);
            return true;
        } catch (InvalidInputException e) {
            refuse(e.message(units()));
        } catch (InvalidRecordException e) {
            refuse(e.getMessage());
        }
        return false;
    }

    private boolean tryKeep(Draft candidate, Slot s) {
        try {
            if (candidate.has(s)) {
                EntryRules.check(candidate, s, session.site());
            }
            session.keep(candidate);
            refused.set(false);
            return true;
        } catch (InvalidInputException e) {
            refuse(e.message(units()));
        } catch (InvalidRecordException e) {
            refuse(e.getMessage());
        }
        return false;
    }

    private void refuse(String why) {
        refused.set(true);
        message.set("Not saved: " + why);
    }

    private String shownValue(Slot s) {
        if (s == Slot.NOMINAL_TONS) {
            HvacSystem sys = session.system();
            return sys == null ? Shown.NONE : Shown.of(Quantity.POWER_LARGE, units(), sys.nominalCapacityW());
        }
        Draft d = session.draft();
        SlotValue v = d == null ? null : d.value(s);
        if (v == null) {
            return Shown.NONE;
        }
        String c = d.choice(s);
        return Shown.number(s.toDisplay(units(), c, v.valueSi()), DisplayNumber.decimals(s.quantity(c), s.unitsFor(units())));
    }

    private String shownTolerance(Slot s) {
        Draft d = session.draft();
        SlotValue v = d == null ? null : d.value(s);
        if (v == null || !s.hasTolerance()) {
            return "";
        }
        String c = d.choice(s);
        int decimals = DisplayNumber.decimals(s.toleranceQuantity(c), s.unitsFor(units()));
        return "± " + Shown.number(s.toleranceToDisplay(units(), c, v.toleranceSi()), decimals) + " "
                + s.toleranceSymbol(units(), c);
    }
}
