package app.latentledger.core.psychro;

/**
 * The U.S. Standard Atmosphere (1976) as ASHRAE Handbook—Fundamentals 2017, ch. 1, eqs. 3 and 4
 * give it for psychrometric work.
 *
 * <p>Valid range: −5000 to 11 000 m (the troposphere). Weather moves real station pressure a few
 * percent around this value; a measured barometric pressure is better when the tech has one.
 */
public final class StandardAtmosphere {
    private StandardAtmosphere() {
    }

    /**
     * Eq. 3: p = 101.325 (1 − 2.25577 × 10⁻⁵ Z)^5.2559 kPa.
     *
     * @param elevationM altitude above sea level, m
     * @return standard barometric pressure, Pa
     */
    public static double pressurePa(double elevationM) {
        return 101_325.0 * Math.pow(1.0 - 2.25577e-5 * elevationM, 5.2559);
    }

    /**
     * Eq. 4: t = 15 − 0.0065 Z °C.
     *
     * @param elevationM altitude above sea level, m
     * @return standard air temperature, °C
     */
    public static double temperatureC(double elevationM) {
        return 15.0 - 0.0065 * elevationM;
    }
}
