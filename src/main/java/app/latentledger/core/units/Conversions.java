package app.latentledger.core.units;

/**
 * Exact unit definitions (NIST SP 811, 2008 edition, appendix B) and the few trade conventions
 * that are definitions rather than measurements.
 */
public final class Conversions {
    /** International foot, exact. */
    public static final double M_PER_FT = 0.3048;
    /** Avoirdupois pound, exact. */
    public static final double KG_PER_LB = 0.45359237;
    /** Pound-force per square inch, from the exact lbf and inch. */
    public static final double PA_PER_PSI = 6894.757293168361;
    /** International Table Btu per lb is exactly 2.326 kJ/kg. */
    public static final double J_PER_KG_PER_BTU_PER_LB = 2326.0;
    /** International Table Btu, exact. */
    public static final double J_PER_BTU = 1055.05585262;
    /** 7000 grains make one avoirdupois pound (definition). */
    public static final double GRAINS_PER_LB = 7000.0;
    /** Cubic foot in cubic metres, exact. */
    public static final double M3_PER_FT3 = M_PER_FT * M_PER_FT * M_PER_FT;
    /** US liquid pint, exact (231 in³ / 8). */
    public static final double M3_PER_US_PINT = 4.73176473e-4;
    /** US fluid ounce, exact (1/16 pint). */
    public static final double M3_PER_US_FL_OZ = M3_PER_US_PINT / 16;
    /** One ton of refrigeration is 12 000 Btu/h (definition). */
    public static final double BTU_PER_H_PER_TON = 12_000.0;

    private Conversions() {
    }

    public static double fahrenheitToCelsius(double f) {
        return (f - 32.0) / 1.8;
    }

    public static double celsiusToFahrenheit(double c) {
        return c * 1.8 + 32.0;
    }

    /** Watts to Btu per hour. */
    public static double wattsToBtuPerHour(double w) {
        return w * 3600.0 / J_PER_BTU;
    }
}
