package app.latentledger.core.coil;

import app.latentledger.core.units.Quantity;

/**
 * One input of an uncertainty budget: a reading and the ± half-width its instrument is good to.
 * With nothing known but "±a", the guide treats the error as rectangular on [−a, +a], standard
 * uncertainty a/√3 (JCGM 100:2008, GUM §4.3.7).
 *
 * @param key         stable key, e.g. "returnDryBulb"
 * @param label       what the tech calls it
 * @param quantity    the tolerance's unit (a temperature tolerance is a TEMPERATURE_DIFFERENCE)
 * @param valueSi     the reading, SI
 * @param halfWidthSi the ± tolerance, SI, 0 when exact
 */
public record UncertainInput(String key, String label, Quantity quantity, double valueSi, double halfWidthSi) {
    /** Standard uncertainty, a/√3. */
    public double standardUncertainty() {
        return halfWidthSi / Math.sqrt(3.0);
    }
}
