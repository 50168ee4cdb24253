package app.latentledger.ui.compare;

/**
 * One line of the before/after table.
 *
 * @param key    stable id
 * @param label  the figure
 * @param before the earlier reading set's value as shown
 * @param after  the current reading set's value as shown
 * @param change after minus before, signed, with the unit; "—" when either is missing
 * @param unit   unit symbol
 */
public record CompareRow(String key, String label, String before, String after, String change, String unit) {
}
