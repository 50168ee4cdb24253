package app.latentledger.core.coil;

import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

/**
 * Condensate caught at the drain over a timed interval.
 *
 * @param volumeM3           water caught, m³ (1 mL = 1e−6 m³)
 * @param volumeTolFraction  ± tolerance of the volume as a fraction (graduated cylinder ±1–2 %,
 *                           docs/methods.md §9.1, common practice, no source)
 * @param seconds            collection time, s
 * @param secondsTolS        ± tolerance of the timing, s
 */
public record Condensate(double volumeM3, double volumeTolFraction, double seconds, double secondsTolS) {
    /**
     * Liquid water density used for caught condensate, kg/m³. 1 mL ≈ 1 g is the trade's reading
     * of a graduated container (common practice, no source); at 10–25 °C water is 997–1000 kg/m³,
     * well inside the volume tolerance.
     */
    public static final double WATER_DENSITY_KG_PER_M3 = 1000.0;

    public Condensate {
        FieldLimits.CONDENSATE_VOLUME.check(volumeM3);
        FieldLimits.COLLECTION_TIME.check("condensate minutes", seconds);
        FieldLimits.CONDENSATE_VOLUME_TOLERANCE.check(volumeTolFraction);
        InputLimits.check("condensate timing tolerance", Quantity.DURATION_SECONDS, secondsTolS, 0, seconds / 2, null);
    }

    /** Mass rate of the water caught, kg/s, at 1000 kg/m³. */
    public double rateKgPerS() {
        return rateKgPerS(volumeM3, seconds);
    }

    static double rateKgPerS(double volumeM3, double seconds) {
        return WATER_DENSITY_KG_PER_M3 * volumeM3 / seconds;
    }
}
