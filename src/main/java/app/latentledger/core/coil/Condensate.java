package app.latentledger.core.coil;

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
        InputLimits.check("condensate volume", Quantity.WATER_VOLUME, volumeM3, 0, 0.05,
                "more than 50 L in one catch is not a condensate reading");
        InputLimits.check("condensate minutes", Quantity.DURATION_MINUTES, seconds, 30, 24 * 3600.0,
                "time at least half a minute");
        InputLimits.check("condensate volume tolerance", Quantity.FRACTION_PERCENT, volumeTolFraction, 0, 0.5, null);
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
