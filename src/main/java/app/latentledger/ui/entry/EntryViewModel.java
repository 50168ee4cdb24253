package app.latentledger.ui.entry;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.measure.AirflowBasis;
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
import javafx.beans.property.ReadOnlyObjectProperty;
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
    /** A kind picked in the selected humidity box whose first value is not typed yet. */
    private final ObjectProperty<String> pendingChoice = new SimpleObjectProperty<>();
    /** Typed values that disagree with a saved one: held until the set agrees again, never stored. */
    private final ObjectProperty<Draft> held = new SimpleObjectProperty<>();
    private final ObjectProperty<EntryRules.Conflict> conflict = new SimpleObjectProperty<>();
    private final ReadOnlyStringWrapper undoText = new ReadOnlyStringWrapper("");
    private Runnable undo;
    /** The order a tech reads the boxes in, as the screen lays them out. */
    static final List<Slot> READING_ORDER = List.of(Slot.RETURN_DRY_BULB, Slot.RETURN_HUMIDITY,
            Slot.SUPPLY_DRY_BULB, Slot.SUPPLY_HUMIDITY, Slot.OUTDOOR_DRY_BULB, Slot.OUTDOOR_HUMIDITY,
            Slot.COIL_TEMPERATURE, Slot.NOMINAL_TONS, Slot.AIRFLOW, Slot.CONDENSATE_VOLUME, Slot.CONDENSATE_MINUTES,
            Slot.SUPPLY_DEW_POINT_OFFSET);
    /** The airflow switch: on when the number is standard cfm (0.075 lb/ft³), off for an actual volume. */
    private final BooleanProperty standardAirflow = new SimpleBooleanProperty(false);
    /** The probe switch: on when one instrument read return and supply, or the probes were compared. */
    private final BooleanProperty sameProbe = new SimpleBooleanProperty(false);
    /** True while the switches are being set from the draft (not a tap). */
    private boolean syncingSwitches;

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
            pendingChoice.set(null);
            toleranceMode.set(false);
            refused.set(false);
            message.set(b == Slot.COIL_TEMPERATURE ? Cautions.BEFORE_COIL_READINGS : "");
        });
        toleranceMode.addListener((o, a, b) -> pad.clear());
        padTitle = Bindings.createStringBinding(() -> {
            Slot sel = selected.get();
            String t = sel.title(padChoice(sel));
            return toleranceMode.get() ? "± of " + t.toLowerCase(java.util.Locale.ROOT).replace("rh", "RH") : t;
        }, selected, toleranceMode, session.draftProperty(), session.unitsProperty(), pendingChoice);
        padDisplay = Bindings.createStringBinding(() -> {
            if (!pad.text().isEmpty()) {
                return pad.text();
            }
            Slot sel = selected.get();
            if (pendingChoice.get() != null) {
                return Shown.NONE;
            }
            return toleranceMode.get() ? shownTolerance(sel).replaceFirst("^± ", "").replaceFirst(" \\S+$", "")
                    : shownValue(sel);
        }, pad.textProperty(), selected, toleranceMode, session.draftProperty(), session.systemProperty(),
                session.unitsProperty(), pendingChoice, held);
        padUnit = Bindings.createStringBinding(this::unit, selected, toleranceMode, session.draftProperty(),
                session.unitsProperty(), pendingChoice);
        session.draftProperty().addListener((o, a, b) -> {
            if (a == null || b == null || !a.readingSetId().equals(b.readingSetId())) {
                startOver();
            }
            if (a == null || b == null || !a.readingSetId().equals(b.readingSetId()) || a.takenAt() != b.takenAt()) {
                loadSets();
            }
        });
        session.draftProperty().addListener((o, a, b) -> syncSwitches());
        standardAirflow.addListener((o, a, b) -> {
            if (!syncingSwitches) {
                keepSwitch(session.draft().withAirflowBasis(b ? AirflowBasis.STANDARD : AirflowBasis.ACTUAL),
                        b ? "Airflow read as standard cfm (at 0.075 lb/ft³, as most flow hoods and flow grids give it)."
                                : "Airflow read as an actual volume (at the air's own temperature and pressure).");
            }
        });
        sameProbe.addListener((o, a, b) -> {
            if (!syncingSwitches) {
                keepSwitch(session.draft().withSameProbe(b), b
                        ? "Return and supply read with one instrument (or probes compared side by side): their offsets"
                                + " cancel in the moisture drop."
                        : "Return and supply read with two separate probes.");
            }
        });
        syncSwitches();
        currentSet.addListener((o, a, b) -> {
            if (b != null && session.draft() != null && !b.id().equals(session.draft().readingSetId())) {
                session.openReadingSet(b.id());
            }
        });
        loadSets();
    }

    /** On when the airflow is standard cfm, off for an actual volume; a tap keeps the change at once. */
    public BooleanProperty standardAirflowProperty() {
        return standardAirflow;
    }

    /** On when return and supply were read with one instrument; a tap keeps the change at once. */
    public BooleanProperty sameProbeProperty() {
        return sameProbe;
    }

    /** The switches show the draft in hand (another set opened, an undo, a refused tap). */
    private void syncSwitches() {
        Draft d = session.draft();
        syncingSwitches = true;
        try {
            standardAirflow.set(d != null && d.airflowBasis() == AirflowBasis.STANDARD);
            sameProbe.set(d != null && d.sameProbe());
        } finally {
            syncingSwitches = false;
        }
    }

    private void keepSwitch(Draft changed, String said) {
        try {
            session.keep(changed);
            refused.set(false);
            message.set(said);
        } catch (InvalidInputException e) {
            refuse(said(e));
        } catch (InvalidRecordException e) {
            refuse(e.getMessage());
        }
        syncSwitches();
    }

    /**
     * A box's title on its tile, under its group's heading: the airflow box says where it was read
     * and what its number means ("Return, standard"), the probe offset is the supply's.
     */
    public String tileTitle(Slot s) {
        if (s == Slot.AIRFLOW) {
            return ("entering".equals(choice(s)) ? "Return, " : "Supply, ") + shownDraft().airflowBasis().label();
        }
        if (s == Slot.SUPPLY_DEW_POINT_OFFSET) {
            return "Supply offset";
        }
        return s.shortTitle(choice(s));
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
                session.draftProperty(), session.systemProperty(), session.unitsProperty(), held));
    }

    /** "± 0.5 °F" for a box with a value, "" otherwise. */
    public StringBinding toleranceText(Slot s) {
        return toleranceTexts.computeIfAbsent(s, k -> Bindings.createStringBinding(() -> {
            if (isHeld(k)) {
                return "not saved yet";
            }
            return inConflict(k) ? "disagrees" : shownTolerance(k);
        }, session.draftProperty(), session.unitsProperty(), held, conflict));
    }

    /** The two boxes that disagree while a typed value is held, else null. */
    public ReadOnlyObjectProperty<EntryRules.Conflict> conflictProperty() {
        return conflict;
    }

    /** True when the box is one of the two that disagree. */
    public boolean inConflict(Slot s) {
        EntryRules.Conflict c = conflict.get();
        return c != null && (c.dryBulb() == s || c.humidity() == s);
    }

    /** True when the box shows a typed value that is held, not stored. */
    public boolean isHeld(Slot s) {
        Draft h = held.get();
        Draft d = session.draft();
        return h != null && d != null && h.value(s) != null && !h.value(s).equals(d.value(s));
    }

    /** "Undo return dry bulb 76.0 °F" while the last save can be taken back, else "". */
    public ReadOnlyStringProperty undoTextProperty() {
        return undoText.getReadOnlyProperty();
    }

    /** Takes back the last save (or drops a held value): one step, until the next entry. */
    public void undo() {
        Runnable u = undo;
        clearUndo();
        if (u != null) {
            u.run();
        }
    }

    /** The kind the pad is typing in: a newly picked one, else the box's saved kind. */
    public String padChoice(Slot s) {
        String p = pendingChoice.get();
        return p != null && s == selected.get() ? p : choice(s);
    }

    /** The kind picked in the selected box that waits for its first value, or null. */
    public ReadOnlyObjectProperty<String> pendingChoiceProperty() {
        return pendingChoice;
    }

    /** The box's current choice (e.g. "wet-bulb"). */
    public String choice(Slot s) {
        return shownDraft().choice(s);
    }

    /** The draft the boxes show: with the held values, if any. */
    private Draft shownDraft() {
        Draft h = held.get();
        return h != null ? h : session.draft();
    }

    public String title(Slot s) {
        return s.title(choice(s));
    }

    /** Unit shown beside the pad for what is being typed. */
    public String unit() {
        Slot s = selected.get();
        String c = padChoice(s);
        return toleranceMode.get() ? s.toleranceSymbol(units(), c) : s.symbol(units(), c);
    }

    public void select(Slot s) {
        selected.set(s);
    }

    /**
     * Picks another kind in the selected box. The pad is always emptied (65 °F is not 65 %). An
     * empty box takes the kind at once; a humidity box with a saved value keeps that value, shown in
     * its own kind, until a value of the new kind is entered, so a tap never erases a reading.
     */
    public void choose(String choice) {
        Slot s = selected.get();
        pad.clear();
        toleranceMode.set(false);
        if (choice.equals(choice(s))) {
            pendingChoice.set(null);
            return;
        }
        Draft d = shownDraft();
        if (s.isHumidity() && d.has(s)) {
            pendingChoice.set(choice);
            refused.set(false);
            message.set("Type the " + s.title(choice).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH")
                    + ". The saved " + Slot.choiceLabel(choice(s)).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH")
                    + " " + shownValue(s) + " " + s.symbol(units(), choice(s)) + " stays until you press Enter.");
            return;
        }
        pendingChoice.set(null);
        Draft before = session.draft();
        if (tryKeep(session.draft().withChoice(s, choice), s)) {
            offerUndo("Undo " + title(s).toLowerCase(java.util.Locale.ROOT), before, null, s);
            message.set(s == Slot.COIL_TEMPERATURE ? Cautions.BEFORE_COIL_READINGS : "Now typing: " + title(s));
        }
    }

    /** Enter on the pad: checks and keeps the typed value (or tolerance) of the selected box. */
    public boolean enter() {
        Slot s = selected.get();
        OptionalDouble typed = pad.value();
        if (typed.isEmpty()) {
            refuse("Type a number for " + s.title(padChoice(s)).toLowerCase(java.util.Locale.ROOT) + " first.");
            return false;
        }
        if (s == Slot.NOMINAL_TONS) {
            HvacSystem before = session.system();
            if (!keepNominal(typed.getAsDouble())) {
                return false;
            }
            saved(s);
            offerUndo(null, null, before, s);
            return true;
        }
        return keepReading(s, typed.getAsDouble());
    }

    private void saved(Slot s) {
        pad.clear();
        toleranceMode.set(false);
        message.set("Saved: " + title(s) + " " + shownValue(s) + " " + s.symbol(units(), choice(s))
                + (s.hasTolerance() ? " " + shownTolerance(s) : ""));
    }

    /**
     * Enter, then move to the next box in reading order. A tolerance entry stays on its box (the
     * value usually comes next); a held value moves to the box it disagrees with, the one to check.
     */
    public boolean enterAndAdvance() {
        Slot s = selected.get();
        boolean tolerance = toleranceMode.get();
        boolean ok = enter();
        EntryRules.Conflict c = conflict.get();
        if (c != null && isHeld(s)) {
            move(s == c.dryBulb() ? c.humidity() : c.dryBulb());
            return ok;
        }
        if (!ok || tolerance) {
            return ok;
        }
        int i = READING_ORDER.indexOf(s);
        if (i + 1 < READING_ORDER.size()) {
            move(READING_ORDER.get(i + 1));
        }
        return true;
    }

    /** Selects another box and keeps the message about the entry just made beside the pad. */
    private void move(Slot next) {
        String m = message.get();
        boolean r = refused.get();
        selected.set(next);
        if (next != Slot.COIL_TEMPERATURE || !m.startsWith("Saved")) {
            message.set(m);
            refused.set(r);
        }
    }

    /** Keeps what the pad holds if it is an acceptable value (the app is being paused). */
    public void keepPending() {
        if (pad.value().isPresent()) {
            enter();
        }
    }

    /** A new or another reading set: the pad starts at the first box, empty, with nothing stale. */
    private void startOver() {
        held.set(null);
        conflict.set(null);
        clearUndo();
        selected.set(READING_ORDER.get(0));
        pad.clear();
        pendingChoice.set(null);
        toleranceMode.set(false);
        refused.set(false);
        message.set("");
    }

    private boolean keepReading(Slot s, double shown) {
        Draft base = shownDraft();
        String c = padChoice(s);
        boolean sameKind = java.util.Objects.equals(c, base.choice(s));
        SlotValue old = sameKind ? base.value(s) : null;
        SlotValue v;
        if (toleranceMode.get()) {
            if (old == null) {
                refuse("Enter the " + s.title(c).toLowerCase(java.util.Locale.ROOT) + " before its tolerance.");
                return false;
            }
            v = new SlotValue(old.valueSi(), s.toleranceFromDisplay(units(), c, Math.abs(shown)));
        } else {
            try {
                double si = s.fromDisplay(units(), c, shown);
                // a ± the tech typed stays with the box; otherwise the one rule gives it for this value
                double tol = old != null && base.toleranceTyped(s) ? old.toleranceSi()
                        : session.defaultToleranceSi(s, c, si);
                v = new SlotValue(si, tol);
            } catch (IllegalArgumentException e) {
                refuse(e.getMessage());
                return false;
            }
        }
        Draft kind = sameKind ? base : base.withChoice(s, c);
        Draft candidate = toleranceMode.get() ? kind.withTypedTolerance(s, v) : kind.with(s, v);
        try {
            EntryRules.checkRange(candidate, s);
        } catch (InvalidInputException e) {
            refuse(said(e));
            return false;
        }
        Draft before = session.draft();
        java.util.Optional<EntryRules.Conflict> disagree = EntryRules.conflict(candidate, session.site());
        if (disagree.isPresent()) {
            // the stored set stays a valid one: this value is held, and whatever else in it agrees is kept
            Draft beforeKind = java.util.Objects.equals(c, before.choice(s)) ? before : before.withChoice(s, c);
            Draft alone = toleranceMode.get() ? beforeKind.withTypedTolerance(s, v) : beforeKind.with(s, v);
            boolean keptAlone = held.get() != null && EntryRules.conflict(alone, session.site()).isEmpty()
                    && keepQuietly(alone);
            held.set(candidate);
            conflict.set(disagree.get());
            pendingChoice.set(null);
            pad.clear();
            toleranceMode.set(false);
            refused.set(false);
            message.set(heldMessage(s, disagree.get(), keptAlone));
            if (keptAlone) {
                offerUndo(null, before, null, s);
            } else {
                undoText.set("Drop the held " + s.title(c).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH"));
                undo = this::dropHeld;
            }
            return false;
        }
        if (!tryKeep(candidate, s)) {
            return false;
        }
        boolean wasHeld = held.get() != null;
        held.set(null);
        conflict.set(null);
        pendingChoice.set(null);
        saved(s);
        if (wasHeld) {
            message.set(message.get() + " (the held value is saved with it)");
        }
        offerUndo(null, before, null, s);
        return true;
    }

    private boolean keepQuietly(Draft d) {
        try {
            session.keep(d);
            return true;
        } catch (InvalidInputException | InvalidRecordException e) {
            return false;
        }
    }

    private String heldMessage(Slot typed, EntryRules.Conflict c, boolean keptAlone) {
        String start = keptAlone ? "Saved: " + named(typed) + " " + shown(typed) + ". Still held: " : "Held, not saved yet: ";
        Slot first = typed == c.humidity() ? c.humidity() : c.dryBulb();
        Slot other = first == c.dryBulb() ? c.humidity() : c.dryBulb();
        return start + named(first) + " " + shown(first) + " and " + named(other) + " " + shown(other)
                + " cannot both be right. Enter the right " + named(other) + " (or change the " + named(first)
                + "): both are saved as soon as they agree.";
    }

    private String named(Slot s) {
        return title(s).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH");
    }

    private String shown(Slot s) {
        return shownValue(s) + " " + s.symbol(units(), choice(s));
    }

    private void dropHeld() {
        held.set(null);
        conflict.set(null);
        refused.set(false);
        message.set("Dropped the held value; the saved readings are unchanged.");
    }

    private void offerUndo(String label, Draft before, HvacSystem systemBefore, Slot s) {
        Draft now = session.draft();
        boolean storedAlready = before != null && session.ledger().readings().find(before.readingSetId()).isPresent();
        if (before != null && storedAlready && !app.latentledger.ui.session.DraftRecords.complete(before)) {
            // the stored set cannot go back to being incomplete: correct the value instead
            clearUndo();
            return;
        }
        String what = label != null ? label : "Undo " + title(s).toLowerCase(java.util.Locale.ROOT).replace("rh", "RH")
                + " " + shownValue(s) + " " + s.symbol(units(), choice(s));
        undoText.set(what);
        undo = () -> {
            try {
                if (systemBefore != null) {
                    session.keep(systemBefore);
                } else if (now == session.draft()) {
                    session.keep(before);
                }
                held.set(null);
                conflict.set(null);
                pad.clear();
                selected.set(s);
                refused.set(false);
                message.set("Undone: " + title(s) + " is " + shownValue(s) + " again.");
            } catch (InvalidInputException e) {
                refuse(said(e));
            } catch (InvalidRecordException e) {
                refuse(e.getMessage());
            }
        };
    }

    /**
     * A refusal in the units of the box it came from: the condensate catch is typed in mL whatever
     * the other units are, so its refusal says mL too, not fl oz.
     */
    private String said(InvalidInputException e) {
        return e.message(Slot.unitsFor(e.quantity(), units()));
    }

    private void clearUndo() {
        undo = null;
        undoText.set("");
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
            refuse(said(e));
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
            refuse(said(e));
        } catch (InvalidRecordException e) {
            refuse(e.getMessage());
        }
        return false;
    }

    /** A refusal empties the pad: the next digits start a new number, never "80120". */
    private void refuse(String why) {
        pad.clear();
        refused.set(true);
        message.set("Not saved: " + why);
    }

    private String shownValue(Slot s) {
        if (s == Slot.NOMINAL_TONS) {
            HvacSystem sys = session.system();
            return sys == null ? Shown.NONE : Shown.of(Quantity.POWER_LARGE, units(), sys.nominalCapacityW());
        }
        Draft d = session.draft() == null ? null : shownDraft();
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
