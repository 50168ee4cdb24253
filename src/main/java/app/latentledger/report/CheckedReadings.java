package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.records.ReadingSet;

import java.util.List;

/**
 * One stored reading set with its coil check, run through {@code ReadingSetCheck} (the same path
 * as the app and the commands), or what it lacks.
 *
 * @param set     the readings as stored
 * @param result  the coil check, or null when the set is incomplete
 * @param missing what the coil check still needs; empty when {@code result} exists
 */
public record CheckedReadings(ReadingSet set, CoilResult result, List<String> missing) {
    public CheckedReadings {
        missing = List.copyOf(missing);
    }

    public boolean checked() {
        return result != null;
    }

    /** The set's label, or "readings HH:MM" when it has none. */
    public String name() {
        if (!set.label().isEmpty()) {
            return set.label().substring(0, 1).toUpperCase(java.util.Locale.ROOT) + set.label().substring(1);
        }
        return "Readings " + set.takenAt().toLocalTime().withSecond(0);
    }
}
