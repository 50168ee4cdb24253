package app.latentledger.core.findings;

import app.latentledger.core.units.Quantity;

/**
 * One number behind a finding, SI inside, with how to show it and its expanded uncertainty.
 *
 * @param key            stable machine key, e.g. "dewPointMargin"
 * @param label          what a tech calls it, e.g. "entering dew point minus coil temperature"
 * @param quantity       how to convert and label it for display
 * @param valueSi        the value, SI
 * @param uncertaintySi  expanded uncertainty (k = 2) in the same SI unit, or NaN when not assessed
 */
public record Evidence(String key, String label, Quantity quantity, double valueSi, double uncertaintySi) {
    /** Evidence without an uncertainty estimate. */
    public static Evidence of(String key, String label, Quantity quantity, double valueSi) {
        return new Evidence(key, label, quantity, valueSi, Double.NaN);
    }
}
