package app.latentledger.ui.session;

import app.latentledger.core.records.ReadingSet;

import java.time.OffsetDateTime;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/**
 * The reading set being filled in, box by box: what has been accepted so far, the choice made in
 * each box, and what an already stored reading set carries that the pad does not edit (label,
 * instruments, notes, airflow method, measured pressure, when it was taken). Immutable: every
 * accepted value makes a new draft.
 *
 * @param readingSetId the reading set this draft becomes (and, once complete, is saved as)
 * @param visitId      the visit
 * @param values       accepted values; the nominal size lives on the system, not here
 * @param choices      the choice in each box that has one
 * @param base         the stored reading set this draft started from, or null for a new one
 * @param takenAt      when the reading set was first complete (or stored), or null
 */
public record Draft(String readingSetId, String visitId, Map<Slot, SlotValue> values, Map<Slot, String> choices,
                    ReadingSet base, OffsetDateTime takenAt) {
    public Draft {
        values = Collections.unmodifiableMap(copy(values));
        choices = Collections.unmodifiableMap(copy(choices));
    }

    public static Draft empty(String readingSetId, String visitId) {
        return new Draft(readingSetId, visitId, Map.of(), Map.of(), null, null);
    }

    public SlotValue value(Slot s) {
        return values.get(s);
    }

    public boolean has(Slot s) {
        return values.containsKey(s);
    }

    /** The box's choice, or its default. */
    public String choice(Slot s) {
        return choices.getOrDefault(s, s.defaultChoice());
    }

    public Draft with(Slot s, SlotValue v) {
        Map<Slot, SlotValue> m = copy(values);
        m.put(s, v);
        return new Draft(readingSetId, visitId, m, choices, base, takenAt);
    }

    public Draft without(Slot s) {
        Map<Slot, SlotValue> m = copy(values);
        m.remove(s);
        return new Draft(readingSetId, visitId, m, choices, base, takenAt);
    }

    /**
     * The same draft with another choice in a box. A humidity box loses its value when its kind
     * changes: 65 °F wet bulb is neither 65 % RH nor a 65 °F dew point, and silently reading it as
     * one would store a reading nobody took. A coil or airflow box keeps its number (the same
     * quantity, only its source or place changes).
     */
    public Draft withChoice(Slot s, String choice) {
        if (!s.choices().contains(choice)) {
            throw new IllegalArgumentException(s.key() + " offers " + s.choices() + ", not " + choice);
        }
        Map<Slot, String> c = copy(choices);
        c.put(s, choice);
        Draft d = new Draft(readingSetId, visitId, values, c, base, takenAt);
        return s.isHumidity() && !choice.equals(choice(s)) ? d.without(s) : d;
    }

    public Draft takenAt(OffsetDateTime t) {
        return new Draft(readingSetId, visitId, values, choices, base, t);
    }

    private static <V> Map<Slot, V> copy(Map<Slot, V> m) {
        return m.isEmpty() ? new EnumMap<>(Slot.class) : new EnumMap<>(m);
    }
}
