package app.latentledger.ui.house;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.function.Predicate;

/**
 * The House pad's numbers typed but not yet storable: the first of a pair (floor area without
 * bedrooms for a new house, a dry bulb without its humidity or the other way round), each with the
 * choice it was typed under (its humidity kind, CFM50 or ACH50, the ventilation type), so it reads
 * back after a restart as it was typed. Immutable: every change makes a new draft, which is kept
 * (see {@link HouseDraftStore}) before the screen shows it.
 *
 * @param visitId the visit the numbers were typed on
 * @param halves  the waiting numbers, by box
 */
public record HouseDraft(String visitId, Map<HouseField, Half> halves) {
    /**
     * One waiting number.
     *
     * @param valueSi the number in SI (its box's quantity, or its humidity kind's)
     * @param choice  the box's choice it was typed under, "" for a box without choices
     */
    public record Half(double valueSi, String choice) {
        public Half {
            choice = choice == null ? "" : choice;
        }
    }

    public HouseDraft {
        halves = Collections.unmodifiableMap(halves.isEmpty() ? new EnumMap<>(HouseField.class) : new EnumMap<>(halves));
    }

    public static HouseDraft empty(String visitId) {
        return new HouseDraft(visitId, Map.of());
    }

    public boolean has(HouseField f) {
        return halves.containsKey(f);
    }

    /** The waiting number of {@code f}, or null. */
    public Half half(HouseField f) {
        return halves.get(f);
    }

    public boolean isEmpty() {
        return halves.isEmpty();
    }

    public HouseDraft with(HouseField f, Half h) {
        Map<HouseField, Half> m = copy();
        m.put(f, h);
        return new HouseDraft(visitId, m);
    }

    /** The same draft without the boxes {@code gone} picks (a pair just stored). */
    public HouseDraft without(Predicate<HouseField> gone) {
        Map<HouseField, Half> m = copy();
        m.keySet().removeIf(gone);
        return new HouseDraft(visitId, m);
    }

    private Map<HouseField, Half> copy() {
        return halves.isEmpty() ? new EnumMap<>(HouseField.class) : new EnumMap<>(halves);
    }
}
