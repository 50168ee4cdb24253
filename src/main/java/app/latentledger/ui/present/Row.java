package app.latentledger.ui.present;

/**
 * One line of figures on a screen.
 *
 * @param key   stable id (node ids, tests)
 * @param label what a tech calls it
 * @param value the number as shown, "—" when it does not exist
 * @param unit  its unit symbol, "" for a pure number
 */
public record Row(String key, String label, String value, String unit) {
}
