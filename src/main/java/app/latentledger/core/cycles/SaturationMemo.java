package app.latentledger.core.cycles;

import app.latentledger.core.psychro.SaturationPressure;

/**
 * Saturation pressure over water/ice ({@link SaturationPressure#pascals}, ASHRAE Handbook—Fundamentals
 * 2017 ch. 1 eqs. 5–6) remembered per dry-bulb value: a logger writes temperatures to 0.1 °F or
 * 0.1 °C, so a week of 604 800 samples holds only a few hundred distinct readings, and each one costs
 * an exp and a log. Exact: a hit returns the value computed for the identical input (same bits).
 * Direct-mapped, one instance per analysis (not shared between threads).
 */
final class SaturationMemo {
    private static final int BITS = 12;
    private final long[] keys = new long[1 << BITS];
    private final double[] values = new double[1 << BITS];
    private final boolean[] filled = new boolean[1 << BITS];

    /** Saturation pressure at {@code tempC}, Pa; as {@link SaturationPressure#pascals(double)}. */
    double pascals(double tempC) {
        long bits = Double.doubleToRawLongBits(tempC);
        int slot = (int) ((bits ^ (bits >>> 29)) * 0x9E3779B97F4A7C15L >>> (64 - BITS));
        if (filled[slot] && keys[slot] == bits) {
            return values[slot];
        }
        double v = SaturationPressure.pascals(tempC);
        keys[slot] = bits;
        values[slot] = v;
        filled[slot] = true;
        return v;
    }
}
