package app.latentledger.core.psychro;

import app.latentledger.core.units.Quantity;

/**
 * Adiabatic mixing of two streams of moist air, as where outdoor air joins return air upstream
 * of a coil.
 *
 * <p><b>Equations</b> (ASHRAE Handbook—Fundamentals 2017/2021, ch. 1, section "Adiabatic mixing
 * of two streams of moist air": the dry-air, water and energy balances, all per mass of dry air.
 * Equation numbers from memory, not checked against the book: the brief recalled eqs. 43–45; in
 * the numbering the coil code cites (eq. 43 = coil energy balance) they follow as eqs. 44–46. The
 * section title is the reference):
 * <ul>
 *   <li>ṁ₃ = ṁ₁ + ṁ₂ (dry air);</li>
 *   <li>W₃ = (ṁ₁ W₁ + ṁ₂ W₂) / ṁ₃ (water);</li>
 *   <li>h₃ = (ṁ₁ h₁ + ṁ₂ h₂) / ṁ₃ (energy, h by eq. 32 of the edition given);</li>
 *   <li>t₃ from h₃ and W₃ by inverting eq. 32, which is linear in t at fixed W.</li>
 * </ul>
 * Streams are weighted by <i>dry-air mass</i>, never by volume: a volume fraction is turned into
 * a mass fraction with each stream's specific volume (eq. 28), as the handbook's worked mixing
 * example does ({@link #massFractionFromVolumeFraction}). Valid for two unsaturated streams at one
 * total pressure, no heat or water exchanged with the casing (the "adiabatic" of the title), dry
 * bulbs within {@link InputLimits} (−50…95 °C). A mix of two nearly saturated streams can land past
 * saturation (fog); the result then has W₃ above W_s(t₃) and {@link Mix#supersaturated} says so —
 * the caller decides (a state cannot be built from it).
 */
public final class AdiabaticMixing {
    private AdiabaticMixing() {
    }

    /**
     * The mixed stream, per kg of dry air.
     *
     * @param dryBulbC              t₃, °C
     * @param humidityRatio         W₃, kg/kg
     * @param enthalpyJPerKg        h₃ on the edition's datum, J/kg of dry air
     * @param secondMassFraction    ṁ₂ / ṁ₃, the dry-air mass fraction of the second stream
     * @param supersaturated        true when W₃ exceeds saturation at t₃ and p
     */
    public record Mix(double dryBulbC, double humidityRatio, double enthalpyJPerKg, double secondMassFraction,
                      boolean supersaturated) {
    }

    /**
     * Mixes stream 1 (t₁, W₁) with stream 2 (t₂, W₂), stream 2 being {@code secondMassFraction} of
     * the dry air.
     *
     * @param pressurePa          total pressure, Pa (only to tell a supersaturated mix)
     * @param t1C                 stream 1 dry bulb, °C
     * @param w1                  stream 1 humidity ratio, kg/kg
     * @param t2C                 stream 2 dry bulb, °C
     * @param w2                  stream 2 humidity ratio, kg/kg
     * @param secondMassFraction  ṁ₂ / (ṁ₁ + ṁ₂), 0…1
     * @param edition             whose eq. 32 to use (the dry bulb found hardly depends on it:
     *                            the two editions' c_pv/c_pa differ by 0.05 %)
     * @throws app.latentledger.core.InvalidInputException when the fraction lies outside 0…1
     */
    public static Mix of(double pressurePa, double t1C, double w1, double t2C, double w2, double secondMassFraction,
                         HandbookEdition edition) {
        InputLimits.check("outdoor-air mass fraction", Quantity.FRACTION_PERCENT, secondMassFraction, 0, 1, null);
        double x = secondMassFraction;
        double w3 = (1 - x) * w1 + x * w2;
        double h3 = (1 - x) * edition.enthalpyJPerKg(t1C, w1) + x * edition.enthalpyJPerKg(t2C, w2);
        double t3 = dryBulbFromEnthalpy(h3, w3, edition);
        boolean over = w3 > Psychrometrics.saturationHumidityRatio(t3, pressurePa);
        return new Mix(t3, w3, h3, x, over);
    }

    /**
     * Dry-air mass fraction of stream 2 from its share of the volume flow, each volume at its own
     * stream's state: x = (f / v₂) / (f / v₂ + (1 − f) / v₁), from ṁ = V̇ / v (HoF ch. 1 eq. 28 for v).
     *
     * @param secondVolumeFraction f = V̇₂ / (V̇₁ + V̇₂), 0…1
     * @param v1M3PerKg            stream 1 specific volume, m³/kg of dry air
     * @param v2M3PerKg            stream 2 specific volume, m³/kg of dry air
     */
    public static double massFractionFromVolumeFraction(double secondVolumeFraction, double v1M3PerKg,
                                                        double v2M3PerKg) {
        InputLimits.check("outdoor-air fraction", Quantity.FRACTION_PERCENT, secondVolumeFraction, 0, 1, null);
        double m2 = secondVolumeFraction / v2M3PerKg;
        double m1 = (1 - secondVolumeFraction) / v1M3PerKg;
        return m2 / (m1 + m2);
    }

    /**
     * t from h and W: eq. 32 is h = a(W) + b(W)·t in either edition (the IP datum only shifts a),
     * so two evaluations of the edition's own enthalpy give the exact inverse.
     */
    static double dryBulbFromEnthalpy(double hJPerKg, double w, HandbookEdition edition) {
        double h0 = edition.enthalpyJPerKg(0.0, w);
        double slope = edition.enthalpyJPerKg(1.0, w) - h0;
        return (hJPerKg - h0) / slope;
    }
}
