package app.latentledger.chart.axis;

import java.util.ArrayList;
import java.util.List;

/**
 * Tick values on a linear axis at 1, 2 or 5 × 10ⁿ display units, the spacing a reader can count in
 * their head. Common practice, no source (the usual "nice numbers" rule of chart makers).
 */
public final class NiceTicks {
    private NiceTicks() {
    }

    /**
     * The smallest nice step that leaves at least {@code minPixels} between ticks.
     *
     * @param span      visible range in display units, above 0
     * @param pixels    length of the axis in device units, above 0
     * @param minPixels least distance wanted between ticks
     */
    public static double step(double span, double pixels, double minPixels) {
        if (!(span > 0) || !(pixels > 0)) {
            throw new IllegalArgumentException("axis span " + span + " and length " + pixels + " must be above 0");
        }
        double raw = span * minPixels / pixels;
        double decade = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * decade >= raw * (1 - 1e-9)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    /** Multiples of {@code step} within [from, to], computed by index so they carry no drift. */
    public static List<Double> values(double from, double to, double step) {
        List<Double> out = new ArrayList<>();
        long first = (long) Math.ceil(from / step - 1e-9);
        long last = (long) Math.floor(to / step + 1e-9);
        for (long i = first; i <= last; i++) {
            out.add(i * step);
        }
        return out;
    }

    /** A tick value as text, with as many decimals as the step needs and no "-0". */
    public static String label(double value, double step) {
        int decimals = step >= 1 ? 0 : (int) Math.ceil(-Math.log10(step) - 1e-9);
        double v = Math.abs(value) < step * 1e-6 ? 0 : value;
        return String.format(java.util.Locale.ROOT, "%." + decimals + "f", v);
    }
}
