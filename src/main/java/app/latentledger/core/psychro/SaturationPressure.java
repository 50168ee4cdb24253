package app.latentledger.core.psychro;

/**
 * Saturation vapor pressure of water and its inverse, after Hyland and Wexler (1983) as given in
 * ASHRAE Handbook—Fundamentals 2017, ch. 1, eqs. 5 (over ice) and 6 (over liquid water).
 *
 * <p>Valid range: −100 to 0.01 °C over ice (eq. 5), 0.01 to 200 °C over liquid (eq. 6). The switch
 * sits at the triple point (0.01 °C, 611.657 Pa), as in the handbook's Table 3 and in PsychroLib
 * (Meyer and Thevenard 2019), so below it this returns saturation over ice and its inverse is the
 * frost point. Pressures are in Pa, temperatures in K inside and °C at the public methods.
 */
public final class SaturationPressure {
    /** Triple point of water, K (ASHRAE HoF 2017 ch. 1, Table 3 note). */
    public static final double TRIPLE_POINT_K = 273.16;
    /** 0 °C in K. */
    public static final double ZERO_CELSIUS_K = 273.15;

    // eq. 5, over ice, −100 to 0 °C
    private static final double C1 = -5.6745359e3;
    private static final double C2 = 6.3925247;
    private static final double C3 = -9.6778430e-3;
    private static final double C4 = 6.2215701e-7;
    private static final double C5 = 2.0747825e-9;
    private static final double C6 = -9.4840240e-13;
    private static final double C7 = 4.1635019;
    // eq. 6, over liquid water, 0 to 200 °C
    private static final double C8 = -5.8002206e3;
    private static final double C9 = 1.3914993;
    private static final double C10 = -4.8640239e-2;
    private static final double C11 = 4.1764768e-5;
    private static final double C12 = -1.4452093e-8;
    private static final double C13 = 6.5459673;

    /** Lowest temperature the fits cover, °C. */
    public static final double MIN_C = -100.0;
    /** Highest temperature the fits cover, °C. */
    public static final double MAX_C = 200.0;

    private static final double LN_PWS_TRIPLE = lnPwsOfKelvin(TRIPLE_POINT_K);
    private static final double LN_MAGNUS_BASE = Math.log(611.2);

    private SaturationPressure() {
    }

    /**
     * Saturation vapor pressure at {@code tempC}: eq. 5 at or below the triple point, eq. 6 above.
     *
     * @param tempC temperature, −100 to 200 °C
     * @return saturation pressure, Pa
     */
    public static double pascals(double tempC) {
        return Math.exp(lnPwsOfKelvin(tempC + ZERO_CELSIUS_K));
    }

    /** Natural log of eq. 5 or 6, ln(Pa), at absolute temperature {@code tK}. */
    static double lnPwsOfKelvin(double tK) {
        return lnPwsOfKelvin(tK, Math.log(tK));
    }

    /** As {@link #lnPwsOfKelvin(double)} with ln T already known. */
    static double lnPwsOfKelvin(double tK, double lnT) {
        if (tK <= TRIPLE_POINT_K) {
            return C1 / tK + C2 + tK * (C3 + tK * (C4 + tK * (C5 + tK * C6))) + C7 * lnT;
        }
        return C8 / tK + C9 + tK * (C10 + tK * (C11 + tK * C12)) + C13 * lnT;
    }

    /** d(ln pws)/dT, 1/K, the analytic derivative of eq. 5 or 6. */
    static double dLnPwsDT(double tK) {
        if (tK <= TRIPLE_POINT_K) {
            return -C1 / (tK * tK) + C3 + tK * (2 * C4 + tK * (3 * C5 + tK * 4 * C6)) + C7 / tK;
        }
        return -C8 / (tK * tK) + C10 + tK * (2 * C11 + tK * 3 * C12) + C13 / tK;
    }

    /** d²(ln pws)/dT², 1/K², the analytic second derivative of eq. 5 or 6. */
    static double d2LnPwsDT2(double tK) {
        double t2 = tK * tK;
        if (tK <= TRIPLE_POINT_K) {
            return 2 * C1 / (t2 * tK) + 2 * C4 + tK * (6 * C5 + tK * 12 * C6) - C7 / t2;
        }
        return 2 * C8 / (t2 * tK) + 2 * C11 + tK * 6 * C12 - C13 / t2;
    }

    // First guesses for the dew point: least-squares Chebyshev fits of T (K) against y = ln(pw/Pa) to
    // eqs. 6 and 5 themselves, written as power series in u = (2y − (ymin + ymax))/(ymax − ymin).
    // They are within 8e-5 K (liquid, 0.01 to 107 °C) and 5.5e-5 K (ice, −101 to 0.01 °C) of the
    // exact inverse, so one Newton step finishes; the fit sets no result, eqs. 5/6 do.
    private static final double LIQUID_Y_MIN = 6.4161717077576945;
    private static final double LIQUID_Y_MAX = 11.76645408775935;
    private static final double[] LIQUID_GUESS = {316.65105870582005, 51.46302586564559, 9.542392192020168,
        1.8822899921681584, 0.37339043339384836, 0.07461371570024776, 0.013167870663179329};
    private static final double ICE_Y_MIN = -6.8038157905617815;
    private static final double ICE_Y_MAX = LIQUID_Y_MIN;
    private static final double[] ICE_GUESS = {211.15538782765233, 47.962973262238656, 10.812767796221184,
        2.4709266169471307, 0.573968155517599, 0.1362318308256877, 0.037825726323565255, 0.009872188248448852};

    private static double guessKelvin(double lnPw) {
        if (lnPw >= LIQUID_Y_MIN && lnPw <= LIQUID_Y_MAX) {
            return series(LIQUID_GUESS, (2 * lnPw - (LIQUID_Y_MIN + LIQUID_Y_MAX)) / (LIQUID_Y_MAX - LIQUID_Y_MIN));
        }
        if (lnPw >= ICE_Y_MIN && lnPw < ICE_Y_MAX) {
            return series(ICE_GUESS, (2 * lnPw - (ICE_Y_MIN + ICE_Y_MAX)) / (ICE_Y_MAX - ICE_Y_MIN));
        }
        // outside the fits: the inverse of the Magnus form (Alduchov and Eskridge 1996)
        double gamma = lnPw - LN_MAGNUS_BASE;
        return 243.12 * gamma / (17.62 - gamma) + ZERO_CELSIUS_K;
    }

    private static double series(double[] a, double u) {
        double v = a[a.length - 1];
        for (int k = a.length - 2; k >= 0; k--) {
            v = v * u + a[k];
        }
        return v;
    }

    /**
     * Temperature at which the saturation pressure equals {@code vaporPressurePa}: the dew point
     * over liquid water, or the frost point over ice when the pressure is below the triple-point
     * pressure. Newton's method on ln pws, seeded with a fitted inverse good to 1e−4 K, finishes in
     * one step over the fits' range (the error after it is about 0.004 K⁻¹ · (1e−4 K)² ≈ 4e−11 K)
     * and in a few more steps elsewhere, where the Magnus form seeds it.
     *
     * @param vaporPressurePa partial pressure of water vapor, Pa, above 0
     * @return dew or frost point, °C
     */
    public static double dewPointC(double vaporPressurePa) {
        double lnPw = Math.log(vaporPressurePa);
        double tK = guessKelvin(lnPw);
        boolean ice = lnPw <= LN_PWS_TRIPLE;
        // keep each Newton step on the branch that pressure belongs to
        double lo = ice ? MIN_C + ZERO_CELSIUS_K : TRIPLE_POINT_K;
        double hi = ice ? TRIPLE_POINT_K : MAX_C + ZERO_CELSIUS_K;
        tK = Math.min(Math.max(tK, lo), hi);
        for (int i = 0; i < 50; i++) {
            double f = lnPwsOfKelvin(tK) - lnPw;
            double next = Math.min(Math.max(tK - f / dLnPwsDT(tK), lo), hi);
            double step = Math.abs(next - tK);
            tK = next;
            // quadratic convergence: after a step δ the error is about |f''/(2f')|·δ² ≈ (1/T)·δ²
            // ≈ 0.004 K⁻¹·δ², so a step under 1e-3 K leaves under 4e-9 K
            if (step < 1e-3) {
                break;
            }
        }
        return tK - ZERO_CELSIUS_K;
    }
}
