package app.latentledger.core.psychro;

/**
 * Thermodynamic wet-bulb temperature: the t* that satisfies the psychrometer equation
 * (ASHRAE Handbook—Fundamentals 2017, ch. 1, eq. 33 over water, eq. 35 over ice) for a given dry
 * bulb, humidity ratio and pressure.
 *
 * <p><b>The convention near freezing.</b> With the wet bulb close to 0 °C both equations can be
 * satisfied: one root at or above 0 °C with a liquid wick (eq. 33) and one just below 0 °C with an
 * iced wick (eq. 35). That band is narrow (around 38–42 % RH at 40 °F dry bulb) and the two roots
 * lie within about 0.5 °F. This class takes the liquid-wick root whenever it exists, because a wick
 * in air above freezing stays wet (supercooled or not) for the minutes a field reading takes; the
 * ice-bulb equation is used only when no liquid-wick root exists (dry bulb below freezing, or air so
 * dry that eq. 33 would need a wet bulb under 0 °C).
 *
 * <p><b>Method.</b> On each branch W(t*) rises and is convex, so Newton's method started from the
 * branch's upper end (the dry bulb, or 0 °C) approaches the root from above without overshoot.
 * It stops when a step is under 1e−9 K, so the result is good to well inside 1e−6 K.
 */
public final class WetBulb {
    private static final double STEP_TOLERANCE_K = 1e-9;
    private static final int MAX_ITERATIONS = 60;

    private WetBulb() {
    }

    /**
     * @param dryBulbC      dry bulb, °C
     * @param humidityRatio kg/kg, at most saturation at the dry bulb
     * @param pressurePa    total pressure, Pa
     * @param edition       which edition's psychrometer coefficients to satisfy
     * @return wet bulb, °C, never above the dry bulb
     */
    public static double fromHumidityRatio(double dryBulbC, double humidityRatio, double pressurePa,
                                           HandbookEdition edition) {
        double[] slope = new double[1];
        // near boiling for the pressure (hot air at altitude) Ws* has a pole; start just below it,
        // where Ws* is above 100 kg/kg and so above any real humidity ratio
        double upper = Math.min(dryBulbC, Psychrometrics.boilingPointC(pressurePa) - 0.1);
        if (upper >= 0) {
            double atZero = edition.humidityRatioAndSlope(dryBulbC, 0.0, pressurePa, false, slope);
            if (atZero <= humidityRatio) {
                return solve(dryBulbC, humidityRatio, pressurePa, edition, false, upper, 0.0, slope);
            }
            return solve(dryBulbC, humidityRatio, pressurePa, edition, true, 0.0, SaturationPressure.MIN_C, slope);
        }
        return solve(dryBulbC, humidityRatio, pressurePa, edition, true, upper, SaturationPressure.MIN_C, slope);
    }

    private static double solve(double dryBulbC, double target, double pressurePa, HandbookEdition edition,
                                boolean iceBulb, double upper, double lower, double[] slope) {
        double x = upper;
        double lo = lower;
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double f = edition.humidityRatioAndSlope(dryBulbC, x, pressurePa, iceBulb, slope) - target;
            if (f <= 0) {
                if (x == upper) {
                    // saturated at the upper end (rounded IP ice coefficients can put the root a hair above it)
                    return Math.min(upper, dryBulbC);
                }
                lo = x;
            }
            double next = x - f / slope[0];
            if (!(next > lo && next <= upper)) {
                next = 0.5 * (x + lo);
            }
            if (Math.abs(next - x) < STEP_TOLERANCE_K) {
                return next;
            }
            x = next;
        }
        return x;
    }
}
