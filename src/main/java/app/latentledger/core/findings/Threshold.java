package app.latentledger.core.findings;

import app.latentledger.core.units.Quantity;

/**
 * A number a finding compares against, with where it comes from. Defaults live in
 * {@link Thresholds}; a tech may override them in settings.
 *
 * @param key       stable key, e.g. "highAirflowPerTon"
 * @param label     what it means, in a tech's words
 * @param quantity  its unit
 * @param defaultSi default value, SI
 * @param source    the published source, or "common practice, no source"
 */
public record Threshold(String key, String label, Quantity quantity, double defaultSi, String source) {
}
