package app.latentledger.core.psychro;

/**
 * Thermodynamic wet-bulb temperature: the t* that satisfies the psychrometer equation
 * (ASHRAE Handbook—Fundamentals 2017, ch. 1, eq. 33 over water, eq. 35 over ice) for a given dry
 * bulb, humidity ratio and pressure.
 *
 * <p><b>The convention near freezing.</b> With the wet bulb close to 0 °C both equations can be
 * satisfied: one root at or above 0 °C with a liquid wick (eq. 33) and one just below 0 °C with an
 * iced wick (eq. 35). That band is narrow (about 38–42 % RH at 40 °F dry bulb) and the two roots
 * lie within about 0.6 °F. This class takes the liquid-wick root whenever it exists, because a wick
 * in air above freezing stays wet (supercooled or not) for the minutes a field reading takes; the
 * ice-bulb equation is used only when no liquid-wick root exists (dry bulb below freezing, or air so
 * dry that eq. 33 would need a wet bulb under 0 °C).
 *
 * <p><b>Method.</b> The first guess comes from the psychrometer equation with the saturation curve
 * replaced by its tangent at the dew point, t* ≈ (s·t_d + k·t)/(s + k) with s = dWs/dT at t_d and
 * k = c_p/h_fg; the curve is convex, so the guess sits a few tenths of a kelvin above the root.
 * Halley's method on the branch's equation (analytic first and second derivatives), guarded by a
 * bracket, then converges cubically: from a 0.3 K guess one step leaves about 1e−5 K. It stops
 * after a step under 1e−3 K, which leaves an error of order 1e−3 K⁻² · (1e−3 K)³ ≈ 1e−12 K,
 * far inside the 1e−6 K the app needs; typically two evaluations in all. Valid over
 * the saturation fits' range (−100 to 200 °C) below the boiling point for the pressure.
 */
public final class WetBulb {
    private static final double STEP_DONE_K = 1e-3;
    private static final double BISECTION_DONE_K = 1e-10;
    /** The triple point, where the saturation-pressure fit changes from ice to water. */
    private static final double KINK_C = SaturationPressure.TRIPLE_POINT_K - SaturationPressure.ZERO_CELSIUS_K;
    private static final double KINK_BAND_K = 0.1;
    private static final int MAX_ITERATIONS = 100;
    /** Below this dry bulb no field pressure (≥ 50 kPa, boiling at 81 °C) brings Ws* near its pole. */
    private static final double NO_POLE_BELOW_C = 80.0;

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
        double pw = Psychrometrics.vaporPressurePa(humidityRatio, pressurePa);
        double dewPointC = humidityRatio > 0 ? SaturationPressure.dewPointC(pw) : Double.NEGATIVE_INFINITY;
        return fromHumidityRatio(dryBulbC, humidityRatio, pressurePa, edition, Double.NaN, dewPointC);
    }

    /**
     * As above, reusing what the caller already has: pws at the dry bulb (NaN when unknown) and the
     * dew or frost point (−∞ for bone-dry air).
     */
    static double fromHumidityRatio(double dryBulbC, double humidityRatio, double pressurePa,
                                    HandbookEdition edition, double pwsAtDryBulb, double dewPointC) {
        double upper = dryBulbC;
        double pwsUpper = pwsAtDryBulb;
        if (dryBulbC > NO_POLE_BELOW_C) {
            // near boiling for the pressure (hot air at altitude) Ws* has a pole; start just below
            // it, where Ws* exceeds 100 kg/kg and so any real humidity ratio
            double belowBoiling = Psychrometrics.boilingPointC(pressurePa) - 0.1;
            if (belowBoiling < upper) {
                upper = belowBoiling;
                pwsUpper = Double.NaN;
            }
        }
        // [0] dW/dt*, [1] d²W/dt*², [2..5] the last evaluation's T, ln T, ln pws and pws (see evaluate)
        double[] work = {Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN};
        if (upper >= 0) {
            double guess = tangentGuess(dryBulbC, humidityRatio, pressurePa, dewPointC, false);
            double liquid = solve(dryBulbC, humidityRatio, pressurePa, edition, false, upper, pwsUpper, 0.0, guess,
                    work);
            if (!Double.isNaN(liquid)) {
                return liquid;
            }
            upper = 0.0;
            pwsUpper = Double.NaN;
        }
        double guess = tangentGuess(dryBulbC, humidityRatio, pressurePa, dewPointC, true);
        return solve(dryBulbC, humidityRatio, pressurePa, edition, true, upper, pwsUpper,
                SaturationPressure.MIN_C, guess, work);
    }

    /** The tangent-line first guess described in the class comment; NaN for bone-dry air. */
    private static double tangentGuess(double dryBulbC, double w, double p, double dewPointC, boolean ice) {
        if (!(w > 0) || !Double.isFinite(dewPointC)) {
            return Double.NaN;
        }
        double tK = dewPointC + SaturationPressure.ZERO_CELSIUS_K;
        double pw = Psychrometrics.vaporPressurePa(w, p);
        double denom = p - pw;
        double s = HandbookEdition.MASS_RATIO * p * pw * SaturationPressure.dLnPwsDT(tK) / (denom * denom);
        double k = 1.006 / (ice ? 2830.0 : 2501.0 - 2.326 * Math.max(dewPointC, 0.0));
        return (s * dewPointC + k * dryBulbC) / (s + k);
    }

    /**
     * Halley (or Newton) steps on one branch inside [lower, upper]. Returns NaN on the liquid branch
     * when the root lies below {@code lower} (0 °C), so the caller moves to the ice branch.
     */
    private static double solve(double dryBulbC, double target, double pressurePa, HandbookEdition edition,
                                boolean iceBulb, double upper, double pwsUpper, double lower, double guess,
                                double[] work) {
        // saturated, or a hair above on the rounded IP ice coefficients: the wet bulb is the upper end
        double fUpper = evaluate(dryBulbC, upper, pressurePa, edition, iceBulb, pwsUpper, work) - target;
        if (fUpper <= 0) {
            return Math.min(upper, dryBulbC);
        }
        double lo = lower;
        double hi = upper;
        boolean lowerKnown = iceBulb;
        double x;
        double f;
        if (guess > lower && guess < upper) {
            x = guess;
            f = evaluate(dryBulbC, x, pressurePa, edition, iceBulb, Double.NaN, work) - target;
        } else {
            x = upper;
            f = fUpper;
        }
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            if (f <= 0) {
                lo = x;
                lowerKnown = true;
            } else {
                hi = x;
            }
            // Halley's step (cubic convergence); Newton's if the curvature term would misbehave
            double slope = work[0];
            double denom = 2 * slope * slope - f * work[1];
            double next = denom > slope * slope ? x - 2 * f * slope / denom : x - f / slope;
            boolean inBracket = next > lo && next < hi;
            if (!inBracket) {
                if (!lowerKnown) {
                    // the step left the liquid branch: the root is below 0 °C unless W(0 °C) is still low enough
                    lowerKnown = true;
                    if (edition.humidityRatioFromWetBulb(dryBulbC, lower, pressurePa) - target > 0) {
                        return Double.NaN;
                    }
                }
                next = 0.5 * (lo + hi);
            }
            // near the triple point pws switches from eq. 5 to eq. 6: W(t*) has a kink there, the
            // cubic error estimate does not hold, so steps must shrink to nothing before stopping
            double done = Math.abs(next - KINK_C) < KINK_BAND_K ? BISECTION_DONE_K : STEP_DONE_K;
            if (inBracket ? Math.abs(next - x) < done : hi - lo < BISECTION_DONE_K) {
                return next;
            }
            x = next;
            f = evaluate(dryBulbC, x, pressurePa, edition, iceBulb, Double.NaN, work) - target;
        }
        return x;
    }

    private static double evaluate(double dryBulbC, double wetBulbC, double pressurePa, HandbookEdition edition,
                                   boolean iceBulb, double knownPws, double[] work) {
        double tK = wetBulbC + SaturationPressure.ZERO_CELSIUS_K;
        double pws;
        if (!Double.isNaN(knownPws)) {
            pws = knownPws;
        } else {
            // successive iterates lie within a fraction of a kelvin: take ln T and pws from the last
            // evaluation by short series (exact to rounding for these step sizes) instead of log and exp
            double u = (tK - work[2]) / work[2];
            double lnT = Math.abs(u) < 0.01 ? work[3] + log1p(u) : Math.log(tK);
            double lnPws = SaturationPressure.lnPwsOfKelvin(tK, lnT);
            double d = lnPws - work[4];
            pws = Math.abs(d) < 0.05 ? work[5] * expSmall(d) : Math.exp(lnPws);
            work[2] = tK;
            work[3] = lnT;
            work[4] = lnPws;
            work[5] = pws;
        }
        return edition.humidityRatioAndSlope(dryBulbC, wetBulbC, pressurePa, iceBulb, pws,
                SaturationPressure.dLnPwsDT(tK), SaturationPressure.d2LnPwsDT2(tK), work);
    }

    /** ln(1 + u) for |u| &lt; 0.01 by its Taylor series to u⁹ (remainder below 1e−19). */
    static double log1p(double u) {
        return u * (1 + u * (-1.0 / 2 + u * (1.0 / 3 + u * (-1.0 / 4 + u * (1.0 / 5 + u * (-1.0 / 6
                + u * (1.0 / 7 + u * (-1.0 / 8 + u / 9))))))));
    }

    /** e^d for |d| &lt; 0.05 by its Taylor series to d¹¹ (remainder below 1e−22). */
    static double expSmall(double d) {
        return 1 + d * (1 + d / 2 * (1 + d / 3 * (1 + d / 4 * (1 + d / 5 * (1 + d / 6 * (1 + d / 7
                * (1 + d / 8 * (1 + d / 9 * (1 + d / 10 * (1 + d / 11))))))))));
    }
}
