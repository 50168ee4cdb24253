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
        double lnT = Math.log(tK);
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

    /**
     * Temperature at which the saturation pressure equals {@code vaporPressurePa}: the dew point
     * over liquid water, or the frost point over ice when the pressure is below the triple-point
     * pressure. Newton's method on ln pws, seeded with the inverse of the Magnus form
     * (Alduchov and Eskridge 1996, within about 0.3 K over the field range), converges to better
     * than 4e−9 K in two steps over the field range.
     *
     * @param vaporPressurePa partial pressure of water vapor, Pa, above 0
     * @return dew or frost point, °C
     */
    public static double dewPointC(double vaporPressurePa) {
        double lnPw = Math.log(vaporPressurePa);
        double gamma = lnPw - LN_MAGNUS_BASE;
        double tK = 243.12 * gamma / (17.62 - gamma) + ZERO_CELSIUS_K;
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
