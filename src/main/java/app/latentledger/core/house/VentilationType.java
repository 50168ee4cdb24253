package app.latentledger.core.house;

import java.util.Locale;

/**
 * How the house is mechanically ventilated. Exhaust-only and supply-only fans are unbalanced: they
 * combine with natural infiltration in quadrature. Balanced systems add their flow whole; an energy
 * recovery ventilator (ERV) also returns part of the indoor-outdoor humidity difference (its latent
 * effectiveness); a heat recovery ventilator is a balanced system with latent effectiveness 0.
 * (EnergyPlus Engineering Reference, "Zone Air Balance Outdoor Airflow"; ASHRAE HoF ch. 16.)
 */
public enum VentilationType {
    NONE(false),
    EXHAUST(false),
    SUPPLY(false),
    BALANCED(true),
    ERV(true);

    private final boolean balanced;

    VentilationType(boolean balanced) {
        this.balanced = balanced;
    }

    /** True when supply and exhaust are matched (added whole to the natural infiltration). */
    public boolean balanced() {
        return balanced;
    }

    /** The word a tech types and the data stores, e.g. "exhaust". */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The type for {@code key}, or an {@link IllegalArgumentException} listing the accepted words. */
    public static VentilationType parse(String key) {
        for (VentilationType t : values()) {
            if (t.key().equalsIgnoreCase(key.trim())) {
                return t;
            }
        }
        throw new IllegalArgumentException("'" + key + "' not understood; accepted: none, exhaust, supply, balanced, erv");
    }
}
