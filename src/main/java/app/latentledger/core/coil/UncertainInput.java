package app.latentledger.core.coil;

import app.latentledger.core.units.Quantity;

/**
 * One input of an uncertainty budget: a reading and the ± half-width its instrument is good to.
 * With nothing known but "±a", the guide treats the error as rectangular on [−a, +a], standard
 * uncertainty a/√3 (JCGM 100:2008, GUM §4.3.7).
 *
 * @param key              stable key, e.g. "returnDryBulb"
 * @param label            what the tech calls it
 * @param quantity         the tolerance's unit (a temperature tolerance is a TEMPERATURE_DIFFERENCE)
 * @param valueSi          the reading, SI
 * @param halfWidthSi      the ± tolerance, SI, 0 when exact
 * @param correlationGroup inputs sharing a non-null group carry the same error (correlation
 *                         coefficient 1, GUM §5.2): one instrument read at two points, or two
 *                         probes compared side by side and corrected to each other; null when
 *                         independent of every other input
 */
public record UncertainInput(String key, String label, Quantity quantity, double valueSi, double halfWidthSi,
                             String correlationGroup) {
    /** An input independent of every other. */
    public UncertainInput(String key, String label, Quantity quantity, double valueSi, double halfWidthSi) {
        this(key, label, quantity, valueSi, halfWidthSi, null);
    }

    /** Standard uncertainty, a/√3. */
    public double standardUncertainty() {
        return halfWidthSi / Math.sqrt(3.0);
    }

    /** True when this input's error is the same error as {@code other}'s. */
    public boolean correlatedWith(UncertainInput other) {
        return correlationGroup != null && correlationGroup.equals(other.correlationGroup);
    }
}
