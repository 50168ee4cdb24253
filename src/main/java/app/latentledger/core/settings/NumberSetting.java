package app.latentledger.core.settings;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.Quantity;

/**
 * One numeric setting as a tech sees it: what it means, its unit, default, accepted range and
 * where the default comes from. Values are SI; {@link Quantity} shows them in the tech's units.
 *
 * @param key        stable key, as stored and typed ({@code settings set KEY VALUE})
 * @param label      what it means, in a tech's words
 * @param group      where it is shown
 * @param quantity   its unit
 * @param defaultSi  default, SI
 * @param minSi      lowest accepted, SI
 * @param maxSi      highest accepted, SI
 * @param source     where the default comes from, or "common practice, no source"
 */
public record NumberSetting(String key, String label, SettingGroup group, Quantity quantity, double defaultSi,
                            double minSi, double maxSi, String source) {
    public NumberSetting {
        if (!(minSi <= defaultSi && defaultSi <= maxSi)) {
            throw new IllegalArgumentException(key + ": default " + defaultSi + " outside its range " + minSi
                    + "…" + maxSi);
        }
    }

    /** Refuses NaN or a value outside the range, naming the setting, value and range. */
    public void check(double valueSi) {
        if (Double.isNaN(valueSi) || valueSi < minSi || valueSi > maxSi) {
            throw new InvalidInputException(label, quantity, valueSi, minSi, maxSi, null);
        }
    }
}
