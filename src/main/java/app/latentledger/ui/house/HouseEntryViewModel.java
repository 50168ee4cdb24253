package app.latentledger.ui.house;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.Infiltration;
import app.latentledger.core.house.Ventilation;
import app.latentledger.core.house.VentilationType;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.Site;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.RecordRules;
import app.latentledger.ui.entry.KeypadViewModel;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;

import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * Typing the house's facts and the visit's house readings on the number pad. Each Enter checks the
 * number by the same rules as the {@code house} command and a bundle (the facts' own ranges, a
 * possible moist-air state at the site, {@link RecordRules#houseReadings}) and stores it at once;
 * a refusal names the field, the value and the accepted range in the tech's units and keeps what
 * was stored. Two records need two numbers before they can be stored: the house's facts (floor
 * area and bedrooms) and an air reading (dry bulb and humidity); the first of a pair waits, marked
 * "not saved yet", until the second is in. A waiting number lives in one place, the visit's
 * {@link HouseDraft}, kept on the disk by a {@link HouseDraftStore} before the screen shows it, so it
 * is still there, still "not saved yet", after the app is killed and started again. Needs no JavaFX
 * toolkit.
 */
public final class HouseEntryViewModel {
    /** The ceiling height a new house starts with, as the {@code house} command assumes (8 ft). */
    static final double DEFAULT_CEILING_M = Quantity.LENGTH.fromDisplay(UnitSystem.IP, 8.0);

    /** What the screen needs from the open visit. */
    interface Source {
        UnitSystem units();

        /** The open visit's id, or null without one. */
        String visitId();

        Site site();

        InstrumentTolerances tolerances();

        Optional<HouseFacts> facts();

        HouseVisitReadings readings();
    }

    private final Source source;
    private final Consumer<HouseFacts> saveFacts;
    private final Consumer<HouseVisitReadings> saveReadings;
    private final HouseDraftStore drafts;
    private final KeypadViewModel pad = new KeypadViewModel();
    private final ObjectProperty<HouseField> selected = new SimpleObjectProperty<>(HouseField.FLOOR_AREA);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper refused = new ReadOnlyBooleanWrapper(false);
    /** Goes up after every store or choice, so the boxes re-read what they show. */
    private final ReadOnlyIntegerWrapper revision = new ReadOnlyIntegerWrapper(0);
    /** A choice tapped for a box, used with its next number. */
    private final Map<HouseField, String> chosen = new EnumMap<>(HouseField.class);
    /** The first numbers of pairs, waiting for the second: as kept by {@link #drafts}, never apart from it. */
    private HouseDraft draft;

    HouseEntryViewModel(Source source, Consumer<HouseFacts> saveFacts, Consumer<HouseVisitReadings> saveReadings,
                        HouseDraftStore drafts) {
        this.source = source;
        this.saveFacts = saveFacts;
        this.saveReadings = saveReadings;
        this.drafts = drafts;
        this.draft = load();
        selected.addListener((o, a, b) -> {
            pad.clear();
            message.set("");
            refused.set(false);
        });
    }

    public KeypadViewModel pad() {
        return pad;
    }

    public ObjectProperty<HouseField> selectedProperty() {
        return selected;
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty refusedProperty() {
        return refused.getReadOnlyProperty();
    }

    public ReadOnlyIntegerProperty revisionProperty() {
        return revision.getReadOnlyProperty();
    }

    /** The boxes re-read what they show (the units changed). */
    void refresh() {
        revision.set(revision.get() + 1);
    }

    /** Another visit was opened: its own waiting numbers, as kept. */
    void reset() {
        draft = load();
        chosen.clear();
        pad.clear();
        message.set("");
        refused.set(false);
        revision.set(revision.get() + 1);
    }

    /** The choice lit on a box: the one tapped, else the stored one, else the first. */
    public String choice(HouseField f) {
        if (f.choices().isEmpty()) {
            return "";
        }
        String c = chosen.get(f);
        if (c != null) {
            return c;
        }
        if (draft.has(f) && !draft.half(f).choice().isEmpty()) {
            return draft.half(f).choice();
        }
        Optional<HouseFacts> facts = source.facts();
        if (f == HouseField.BLOWER_DOOR) {
            return facts.isPresent() && Double.isFinite(facts.get().ach50()) ? "ach50" : "cfm50";
        }
        if (f == HouseField.VENTILATION) {
            return facts.map(h -> h.ventilationType() == VentilationType.NONE ? "exhaust" : h.ventilationType().key())
                    .orElse("exhaust");
        }
        AirReading a = air(source.readings(), f.air());
        return a != null ? a.humidityKind().key() : f.choices().get(0);
    }

    /**
     * Taps a choice. "None" for ventilation is stored at once (no number to type); any other choice
     * goes with the box's next number.
     */
    public void choose(String c) {
        HouseField f = selected.get();
        if (!f.choices().contains(c)) {
            return;
        }
        if (f == HouseField.VENTILATION && c.equals("none")) {
            Optional<HouseFacts> now = source.site() == null ? Optional.empty() : source.facts();
            if (now.isEmpty()) {
                refuse("type floor area and bedrooms first: ventilation is kept with the house's facts");
                return;
            }
            HouseFacts h = now.get();
            store(new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(), h.occupants(),
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), VentilationType.NONE, 0.0,
                    h.ervLatentEffectiveness()), "Ventilation none saved with the house");
            chosen.remove(f);
            return;
        }
        chosen.put(f, c);
        message.set("");
        refused.set(false);
        revision.set(revision.get() + 1);
    }

    /** The quantity the selected box's number is typed in (a humidity box's follows its kind). */
    public Quantity quantity(HouseField f) {
        if (f.humidity()) {
            return kind(choice(f)).quantity();
        }
        if (f == HouseField.BLOWER_DOOR && choice(f).equals("ach50")) {
            return Quantity.DIMENSIONLESS;
        }
        return f.quantity();
    }

    /** The unit shown beside the pad ("ft²", "°F", "ACH50"). */
    public String unit(HouseField f) {
        if (f == HouseField.BLOWER_DOOR) {
            return choice(f).equals("ach50") ? "ACH50" : quantity(f).symbol(source.units()) + " at 50 Pa";
        }
        return quantity(f).symbol(source.units());
    }

    /** Stores the number on the pad in the selected box; true when it was kept (stored or waiting). */
    public boolean enter() {
        HouseField f = selected.get();
        if (source.site() == null) {
            refuse("open a visit first: the house's facts and readings are kept with its site and visit");
            return false;
        }
        var typed = pad.value();
        if (typed.isEmpty()) {
            refuse(f.title() + ": type a number first");
            return false;
        }
        double shown = typed.getAsDouble();
        UnitSystem units = source.units();
        Quantity q = quantity(f);
        double si = q.fromDisplay(units, shown);
        if (f.whole() && shown != Math.rint(shown)) {
            refuse(f.title().toLowerCase(java.util.Locale.ROOT) + " " + DisplayNumber.exact(shown)
                    + " refused: a whole number");
            return false;
        }
        try {
            if (f.group() == HouseField.Group.HOUSE) {
                fact(f, si);
            } else {
                reading(f, si);
            }
        } catch (InvalidInputException e) {
            refuse(e.message(units));
            return false;
        } catch (IllegalArgumentException e) {
            refuse(e.getMessage());
            return false;
        }
        pad.clear();
        return true;
    }

    /** {@link #enter()}, then the next box, so a run of numbers goes in without a tap between them. */
    public boolean enterAndAdvance() {
        boolean kept = enter();
        if (kept) {
            HouseField[] all = HouseField.values();
            HouseField next = all[(selected.get().ordinal() + 1) % all.length];
            String said = message.get();
            selected.set(next);
            message.set(said);
        }
        return kept;
    }

    private void fact(HouseField f, double si) {
        Optional<HouseFacts> now = source.facts();
        if (now.isPresent()) {
            store(with(now.get(), f, si, choice(f)), saved(f, si) + " saved with the house");
            return;
        }
        // no facts yet: check the number on a stand-in house, then wait for floor area and bedrooms
        HouseFacts standIn = new HouseFacts(HouseFacts.MIN_AREA_M2, DEFAULT_CEILING_M, 1, 0, 0, Double.NaN, Double.NaN, 0,
                Double.NaN, VentilationType.NONE, 0.0, Double.NaN);
        for (Map.Entry<HouseField, HouseDraft.Half> w : draft.halves().entrySet()) {
            if (w.getKey().group() == HouseField.Group.HOUSE) {
                standIn = with(standIn, w.getKey(), w.getValue().valueSi(), w.getValue().choice());
            }
        }
        HouseFacts next = with(standIn, f, si, choice(f));
        HouseDraft waiting = draft.with(f, new HouseDraft.Half(si, f.choices().isEmpty() ? "" : choice(f)));
        if (waiting.has(HouseField.FLOOR_AREA) && waiting.has(HouseField.BEDROOMS)) {
            store(next, saved(f, si) + " saved; the house's facts are kept with the site");
            keep(waiting.without(k -> k.group() == HouseField.Group.HOUSE));
        } else {
            keep(waiting);
            String missing = waiting.has(HouseField.FLOOR_AREA) ? "bedrooms" : "floor area";
            say(saved(f, si) + " not saved yet: the house's facts are saved once " + missing + " is in too");
        }
    }

    /** @param choice the box's choice the number was typed under (CFM50 or ACH50, the ventilation type) */
    private HouseFacts with(HouseFacts h, HouseField f, double si, String choice) {
        int n = (int) Math.rint(si);
        return switch (f) {
            case FLOOR_AREA -> new HouseFacts(si, h.ceilingHeightM(), h.stories(), h.bedrooms(), h.occupants(),
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), h.ervLatentEffectiveness());
            case CEILING_HEIGHT -> new HouseFacts(h.floorAreaM2(), si, h.stories(), h.bedrooms(), h.occupants(),
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), h.ervLatentEffectiveness());
            case STORIES -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), n, h.bedrooms(), h.occupants(),
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), h.ervLatentEffectiveness());
            case BEDROOMS -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), n, h.occupants(),
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), h.ervLatentEffectiveness());
            case OCCUPANTS -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(), n,
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), h.ervLatentEffectiveness());
            case BLOWER_DOOR -> choice.equals("ach50")
                    ? new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(), h.occupants(),
                    Double.NaN, si, h.shelterClass(), h.windMPerS(), h.ventilationType(), h.ventilationM3PerS(),
                    h.ervLatentEffectiveness())
                    : new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(), h.occupants(),
                    si, Double.NaN, h.shelterClass(), h.windMPerS(), h.ventilationType(), h.ventilationM3PerS(),
                    h.ervLatentEffectiveness());
            case SHELTER_CLASS -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(),
                    h.occupants(), h.cfm50M3PerS(), h.ach50(), n, h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), h.ervLatentEffectiveness());
            case WIND -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(), h.occupants(),
                    h.cfm50M3PerS(), h.ach50(), h.shelterClass(), si, h.ventilationType(), h.ventilationM3PerS(),
                    h.ervLatentEffectiveness());
            case VENTILATION -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(),
                    h.occupants(), h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(),
                    VentilationType.parse(choice), si, h.ervLatentEffectiveness());
            case ERV_EFFECTIVENESS -> new HouseFacts(h.floorAreaM2(), h.ceilingHeightM(), h.stories(), h.bedrooms(),
                    h.occupants(), h.cfm50M3PerS(), h.ach50(), h.shelterClass(), h.windMPerS(), h.ventilationType(),
                    h.ventilationM3PerS(), si);
            default -> throw new IllegalStateException(f + " is not a house fact");
        };
    }

    private void reading(HouseField f, double si) {
        HouseVisitReadings now = source.readings();
        if (f == HouseField.RUNTIME) {
            storeReadings(now.withRuntimeFraction(si), saved(f, si) + " saved with the visit");
            return;
        }
        String where = f.air();
        InstrumentTolerances tol = source.tolerances();
        AirReading current = air(now, where);
        HouseField pairOf = pair(f);
        HumidityKind kind = f.humidity() ? kind(choice(f)) : null;
        if (kind != null) {
            // the humidity on its own first: a reading out of every range is refused before it waits
            (kind == HumidityKind.RELATIVE_HUMIDITY ? FieldLimits.RELATIVE_HUMIDITY : FieldLimits.AIR_TEMPERATURE)
                    .check(where + " " + kind.label(), si);
        } else {
            FieldLimits.AIR_TEMPERATURE.check(where + " dry bulb", si);
        }
        AirReading next;
        if (current != null) {
            next = kind != null
                    ? new AirReading(where, current.dryBulbC(), current.dryBulbTolK(), kind, si, tolerance(kind, tol))
                    : new AirReading(where, si, tol.dryBulbK(), current.humidityKind(), current.humiditySi(),
                    current.humidityTolSi());
        } else if (draft.has(pairOf)) {
            double other = draft.half(pairOf).valueSi();
            HumidityKind otherKind = kind != null ? null : kind(draft.half(pairOf).choice());
            next = kind != null
                    ? new AirReading(where, other, tol.dryBulbK(), kind, si, tolerance(kind, tol))
                    : new AirReading(where, si, tol.dryBulbK(), otherKind, other, tolerance(otherKind, tol));
        } else {
            keep(draft.with(f, new HouseDraft.Half(si, kind != null ? kind.key() : "")));
            say(saved(f, si) + " not saved yet: the " + where + " reading is saved once its "
                    + (kind != null ? "dry bulb" : "humidity") + " is in too");
            return;
        }
        HouseVisitReadings changed = switch (where) {
            case "outdoor" -> now.withOutdoor(next);
            case "grille" -> now.withGrille(next);
            case "plenum" -> now.withPlenum(next);
            default -> now.withSpace(next);
        };
        RecordRules.houseReadings(changed, source.site());
        storeReadings(changed, saved(f, si) + " saved with the visit");
        keep(draft.without(k -> k == f || k == pairOf));
    }

    private static HouseField pair(HouseField f) {
        HouseField[] all = HouseField.values();
        return f.humidity() ? all[f.ordinal() - 1] : all[f.ordinal() + 1];
    }

    private static double tolerance(HumidityKind k, InstrumentTolerances t) {
        return switch (k) {
            case RELATIVE_HUMIDITY -> t.relativeHumidityPct();
            case DEW_POINT -> t.dewPointK();
            case WET_BULB -> t.wetBulbK();
        };
    }

    /** Keeps the waiting numbers on the disk first, then here: the file is the one place of truth. */
    private void keep(HouseDraft next) {
        if (next.equals(draft)) {
            return;
        }
        drafts.save(next);
        draft = next;
    }

    /**
     * The open visit's kept draft, less any half whose record has since been stored (a kill between
     * storing a pair and clearing its halves).
     */
    private HouseDraft load() {
        String visit = source.visitId();
        if (visit == null) {
            return HouseDraft.empty(null);
        }
        HouseDraft kept = drafts.find(visit);
        if (kept.isEmpty()) {
            return kept;
        }
        boolean hasFacts = source.facts().isPresent();
        HouseVisitReadings stored = source.readings();
        return kept.without(k -> k.group() == HouseField.Group.HOUSE ? hasFacts : air(stored, k.air()) != null);
    }

    private void store(HouseFacts facts, String said) {
        saveFacts.accept(facts);
        say(said);
    }

    private void storeReadings(HouseVisitReadings r, String said) {
        saveReadings.accept(r);
        say(said);
    }

    private void say(String said) {
        message.set(said);
        refused.set(false);
        revision.set(revision.get() + 1);
    }

    private void refuse(String why) {
        message.set(why);
        refused.set(true);
    }

    /** "Floor area 2,200 ft²" for the message after a store. */
    private String saved(HouseField f, double si) {
        return f.title() + " " + shown(f, si, choice(f));
    }

    /** @param choice the box's choice the number is in (its humidity kind, CFM50 or ACH50) */
    private String shown(HouseField f, double si, String choice) {
        UnitSystem u = source.units();
        Quantity q = quantity(f);
        if (f.whole()) {
            return String.valueOf((int) Math.rint(si));
        }
        if (f.humidity()) {
            HumidityKind k = kind(choice);
            return DisplayNumber.withUnit(k.quantity(), u, si) + " " + k.label();
        }
        if (f == HouseField.BLOWER_DOOR) {
            return choice.equals("ach50") ? DisplayNumber.number(si, 1) + " ACH50"
                    : DisplayNumber.withUnit(Quantity.AIRFLOW, u, si) + " at 50 Pa";
        }
        if (q == Quantity.DIMENSIONLESS) {
            return DisplayNumber.number(si, 1) + " " + unit(f);
        }
        return DisplayNumber.withUnit(q, u, si);
    }

    /** What a box shows: the stored value, a number waiting for its pair, or "—". */
    public String valueText(HouseField f) {
        if (draft.has(f)) {
            HouseDraft.Half h = draft.half(f);
            return shown(f, h.valueSi(), h.choice()) + " (not saved yet)";
        }
        UnitSystem u = source.units();
        if (f.group() == HouseField.Group.READINGS) {
            HouseVisitReadings r = source.readings();
            if (f == HouseField.RUNTIME) {
                return Double.isNaN(r.runtimeFraction()) ? "—" : DisplayNumber.withUnit(Quantity.FRACTION_PERCENT, u,
                        r.runtimeFraction());
            }
            AirReading a = air(r, f.air());
            if (a == null) {
                return "—";
            }
            return f.humidity() ? DisplayNumber.withUnit(a.humidityKind().quantity(), u, a.humiditySi()) + " "
                    + a.humidityKind().label() : DisplayNumber.withUnit(Quantity.TEMPERATURE, u, a.dryBulbC());
        }
        Optional<HouseFacts> facts = source.facts();
        if (facts.isEmpty()) {
            return "—";
        }
        HouseFacts h = facts.get();
        return switch (f) {
            case FLOOR_AREA -> DisplayNumber.withUnit(Quantity.AREA, u, h.floorAreaM2());
            case CEILING_HEIGHT -> DisplayNumber.withUnit(Quantity.LENGTH, u, h.ceilingHeightM());
            case STORIES -> String.valueOf(h.stories());
            case BEDROOMS -> String.valueOf(h.bedrooms());
            case OCCUPANTS -> h.occupants() > 0 ? String.valueOf(h.occupants())
                    : h.occupantsOrDefault() + " (bedrooms + 1)";
            case BLOWER_DOOR -> Double.isFinite(h.ach50()) ? DisplayNumber.number(h.ach50(), 1) + " ACH50"
                    : Double.isFinite(h.cfm50M3PerS()) ? DisplayNumber.withUnit(Quantity.AIRFLOW, u, h.cfm50M3PerS())
                    + " at 50 Pa" : "not tested";
            case SHELTER_CLASS -> h.shelterClass() > 0 ? String.valueOf(h.shelterClass()) : "not known";
            case WIND -> Double.isFinite(h.windMPerS()) ? DisplayNumber.withUnit(Quantity.WIND_SPEED, u, h.windMPerS())
                    : DisplayNumber.withUnit(Quantity.WIND_SPEED, u, Infiltration.DEFAULT_WIND_M_PER_S) + " (default)";
            case VENTILATION -> h.ventilationType() == VentilationType.NONE ? "None"
                    : HouseField.choiceLabel(h.ventilationType().key()) + " "
                    + DisplayNumber.withUnit(Quantity.AIRFLOW, u, h.ventilationM3PerS());
            case ERV_EFFECTIVENESS -> Double.isFinite(h.ervLatentEffectiveness())
                    ? DisplayNumber.withUnit(Quantity.FRACTION_PERCENT, u, h.ervLatentEffectiveness())
                    : DisplayNumber.withUnit(Quantity.FRACTION_PERCENT, u, Ventilation.DEFAULT_ERV_LATENT_EFFECTIVENESS)
                    + " (default)";
            default -> "—";
        };
    }

    private static AirReading air(HouseVisitReadings r, String where) {
        if (where == null) {
            return null;
        }
        return switch (where) {
            case "outdoor" -> r.outdoor();
            case "grille" -> r.grille();
            case "plenum" -> r.plenum();
            default -> r.space();
        };
    }

    private static HumidityKind kind(String key) {
        for (HumidityKind k : HumidityKind.values()) {
            if (k.key().equals(key)) {
                return k;
            }
        }
        throw new IllegalArgumentException("humidity kind '" + key + "'");
    }
}
