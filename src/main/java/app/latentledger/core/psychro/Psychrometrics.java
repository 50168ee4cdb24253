package app.latentledger.core.psychro;

/**
 * Moist-air relations of ASHRAE Handbook—Fundamentals 2017, ch. 1, on a perfect-gas basis.
 * SI throughout: °C, Pa, kg/kg. The edition-dependent equations live in {@link HandbookEdition}.
 *
 * <p>Valid range: −100 to 200 °C and vapor pressures below the total pressure; the core's
 * {@link InputLimits} narrow that to what a field reading can be.
 */
public final class Psychrometrics {
    private Psychrometrics() {
    }

    /**
     * Humidity ratio from vapor partial pressure, eq. 20 (W = 0.621945 pw / (p − pw)).
     *
     * @return kg water per kg dry air
     */
    public static double humidityRatio(double vaporPressurePa, double pressurePa) {
        return HandbookEdition.MASS_RATIO * vaporPressurePa / (pressurePa - vaporPressurePa);
    }

    /** Vapor partial pressure from humidity ratio, eq. 20 solved for pw, Pa. */
    public static double vaporPressurePa(double humidityRatio, double pressurePa) {
        return pressurePa * humidityRatio / (HandbookEdition.MASS_RATIO + humidityRatio);
    }

    /**
     * Saturation humidity ratio, eq. 23 (W = 0.621945 pws / (p − pws)), kg/kg. At or above the
     * boiling point for the pressure (pws ≥ p, e.g. 200 °F at 15 000 ft) air has no saturation
     * limit and this returns +∞.
     */
    public static double saturationHumidityRatio(double dryBulbC, double pressurePa) {
        double pws = SaturationPressure.pascals(dryBulbC);
        return pws >= pressurePa ? Double.POSITIVE_INFINITY : humidityRatio(pws, pressurePa);
    }

    /** Temperature at which water boils at this pressure (pws = p, eq. 6 inverted), °C. */
    public static double boilingPointC(double pressurePa) {
        return SaturationPressure.dewPointC(pressurePa);
    }

    /**
     * Relative humidity, eq. 24 on a perfect-gas basis (φ = pw / pws(t)), in percent. Below the
     * triple point it is relative to saturation over ice, as in the handbook's tables.
     */
    public static double relativeHumidityPct(double vaporPressurePa, double dryBulbC) {
        return 100.0 * vaporPressurePa / SaturationPressure.pascals(dryBulbC);
    }

    /** Degree of saturation, eq. 12 (μ = W / Ws), dimensionless. */
    public static double degreeOfSaturation(double humidityRatio, double dryBulbC, double pressurePa) {
        return humidityRatio / saturationHumidityRatio(dryBulbC, pressurePa);
    }

    /** Dew point (frost point below the triple point) of air with humidity ratio W, °C; eqs. 20 and 5/6. */
    public static double dewPointC(double humidityRatio, double pressurePa) {
        return SaturationPressure.dewPointC(vaporPressurePa(humidityRatio, pressurePa));
    }

    /** Moist-air density per volume of mixture, eq. 11 (ρ = (1 + W)/v), kg/m³. */
    public static double densityKgPerM3(double humidityRatio, double specificVolumeM3PerKg) {
        return (1.0 + humidityRatio) / specificVolumeM3PerKg;
    }
}
