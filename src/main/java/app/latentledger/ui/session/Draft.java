package app.latentledger.ui.session;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.records.ReadingSet;

import java.time.OffsetDateTime;
import java.util.Collections;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

/**
 * The reading set being filled in, box by box: what has been accepted so far, the choice made in
 * each box, and what an already stored reading set carries that the pad does not edit (label,
 * instruments, notes, airflow method, measured pressure, when it was taken). Immutable: every
 * accepted value makes a new draft.
 *
 * @param readingSetId    the reading set this draft becomes (and, once complete, is saved as)
 * @param visitId         the visit
 * @param values          accepted values; the nominal size lives on the system, not here; the supply
 *                        probe's dew-point offset is the box {@link Slot#SUPPLY_DEW_POINT_OFFSET}
 * @param choices         the choice in each box that has one
 * @param base            the stored reading set this draft started from, or null for a new one
 * @param takenAt         when the reading set was first complete (or stored), or null
 * @param airflowBasis    what the airflow number means, an actual volume or standard cfm; kept even
 *                        before the airflow is typed, so the toggle never resets
 * @param sameProbe       true when one instrument read return and supply, or the two probes were
 *                        compared side by side and corrected to each other
 * @param typedTolerances the boxes whose ± the tech typed (or that came stored with a record): these
 *                        keep their tolerance; every other box follows the one tolerance rule
 *                        ({@link Tolerancing}) when the set's instruments or the settings change
 */
public record Draft(String readingSetId, String visitId, Map<Slot, SlotValue> values, Map<Slot, String> choices,
                    ReadingSet base, OffsetDateTime takenAt, AirflowBasis airflowBasis, boolean sameProbe,
                    Set<Slot> typedTolerances) {
    public Draft {
        values = Collections.unmodifiableMap(copy(values));
        choices = Collections.unmodifiableMap(copy(choices));
        airflowBasis = airflowBasis == null ? AirflowBasis.ACTUAL : airflowBasis;
        typedTolerances = Collections.unmodifiableSet(typedTolerances == null || typedTolerances.isEmpty()
                ? EnumSet.noneOf(Slot.class) : EnumSet.copyOf(typedTolerances));
    }

    /**
     * A draft with the stored set's airflow basis and probe match (or actual airflow and independent
     * probes for a new set), every tolerance following the rule.
     */
    public Draft(String readingSetId, String visitId, Map<Slot, SlotValue> values, Map<Slot, String> choices,
                 ReadingSet base, OffsetDateTime takenAt) {
        this(readingSetId, visitId, values, choices, base, takenAt,
                base == null || base.airflow() == null ? AirflowBasis.ACTUAL : base.airflow().basis(),
                base != null && base.probes().sameInstrument(), Set.of());
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
        return new Draft(readingSetId, visitId, m, choices, base, takenAt, airflowBasis, sameProbe, typedTolerances);
    }

    /** The same, with the box's ± marked as typed by the tech: no later rule changes it. */
    public Draft withTypedTolerance(Slot s, SlotValue v) {
        Set<Slot> typed = EnumSet.noneOf(Slot.class);
        typed.addAll(typedTolerances);
        typed.add(s);
        return with(s, v).withTyped(typed);
    }

    /** True when the box's ± was typed by the tech (or stored with a record), not given by the rule. */
    public boolean toleranceTyped(Slot s) {
        return typedTolerances.contains(s);
    }

    public Draft without(Slot s) {
        Map<Slot, SlotValue> m = copy(values);
        m.remove(s);
        Set<Slot> typed = EnumSet.noneOf(Slot.class);
        typed.addAll(typedTolerances);
        typed.remove(s);
        return new Draft(readingSetId, visitId, m, choices, base, takenAt, airflowBasis, sameProbe, typed);
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
        Draft d = new Draft(readingSetId, visitId, values, c, base, takenAt, airflowBasis, sameProbe, typedTolerances);
        return s.isHumidity() && !choice.equals(choice(s)) ? d.without(s) : d;
    }

    /** The same draft with the airflow read as {@code basis}: the number stays, its meaning changes. */
    public Draft withAirflowBasis(AirflowBasis basis) {
        return new Draft(readingSetId, visitId, values, choices, base, takenAt, basis, sameProbe, typedTolerances);
    }

    /** The same draft with return and supply read by one instrument (or probes compared), or not. */
    public Draft withSameProbe(boolean same) {
        return new Draft(readingSetId, visitId, values, choices, base, takenAt, airflowBasis, same, typedTolerances);
    }

    /** The same draft with {@code typed} as the boxes whose ± the tech typed. */
    public Draft withTyped(Set<Slot> typed) {
        return new Draft(readingSetId, visitId, values, choices, base, takenAt, airflowBasis, sameProbe, typed);
    }

    public Draft takenAt(OffsetDateTime t) {
        return new Draft(readingSetId, visitId, values, choices, base, t, airflowBasis, sameProbe, typedTolerances);
    }

    /** The same draft on top of another stored record (what the ledger holds now). */
    public Draft onBase(ReadingSet stored) {
        return new Draft(readingSetId, visitId, values, choices, stored, takenAt, airflowBasis, sameProbe,
                typedTolerances);
    }

    private static <V> Map<Slot, V> copy(Map<Slot, V> m) {
        return m.isEmpty() ? new EnumMap<>(Slot.class) : new EnumMap<>(m);
    }
}
