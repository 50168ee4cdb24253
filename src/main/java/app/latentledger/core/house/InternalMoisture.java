package app.latentledger.core.house;

import app.latentledger.core.units.Conversions;

/**
 * Water the occupants and their activities release indoors. Two published presets, both recalled
 * from memory and shown as such, bracket it:
 * <ul>
 *   <li>ASHRAE HoF ch. 17 (residential, RLF method) design-day latent internal gain
 *       q_l = 68 + 0.07·A_cf + 41·N_oc Btu/h (A_cf conditioned floor area, ft²; N_oc occupants),
 *       converted to water at 1076 Btu/lb (the latent heat in the handbook's "4840" factor) — from
 *       memory; a design-day peak, not a daily production, and the low end.</li>
 *   <li>ASHRAE Standard 160 design moisture generation: 8, 12, 14, 16 kg/day for 1–4 bedrooms, +1
 *       kg/day per further bedroom — from memory, unverified; a conservative (high) design value.</li>
 * </ul>
 * Their 3–4× spread is the real uncertainty of this term, so the budget uses the midpoint with the
 * half-spread as a rectangular half-width (common practice for a bracketed value, GUM §4.3.7).
 * Occupants default to bedrooms + 1 (the 62.2 convention).
 */
public final class InternalMoisture {
    /** Latent heat implied by the handbook's 4840 factor, Btu/lb (from memory). */
    public static final double BTU_PER_LB = 1076.0;
    /** Tag shown beside every value of this term. */
    public static final String MEMORY_ONLY = "from memory (ASHRAE HoF ch. 17 and Std 160 presets, not yet checked"
            + " against the purchased texts)";

    private InternalMoisture() {
    }

    /** HoF ch. 17 design-day latent gain as water, kg/s. */
    public static double handbookKgPerS(double floorAreaM2, int occupants) {
        double ft2 = floorAreaM2 / (Conversions.M_PER_FT * Conversions.M_PER_FT);
        double btuPerH = 68.0 + 0.07 * ft2 + 41.0 * occupants;
        return btuPerH / BTU_PER_LB * Conversions.KG_PER_LB / 3600.0;
    }

    /** Std 160 design moisture generation, kg/s. */
    public static double standard160KgPerS(int bedrooms) {
        int br = Math.max(1, bedrooms);
        double kgPerDay = br <= 1 ? 8 : br == 2 ? 12 : br == 3 ? 14 : 16 + (br - 4);
        return kgPerDay / 86_400.0;
    }

    /** Midpoint of the two presets, kg/s. */
    public static double midpointKgPerS(double floorAreaM2, int bedrooms, int occupants) {
        return 0.5 * (handbookKgPerS(floorAreaM2, occupants) + standard160KgPerS(bedrooms));
    }

    /** Half the spread of the two presets, kg/s (the rectangular half-width). */
    public static double halfSpreadKgPerS(double floorAreaM2, int bedrooms, int occupants) {
        return 0.5 * Math.abs(standard160KgPerS(bedrooms) - handbookKgPerS(floorAreaM2, occupants));
    }
}
