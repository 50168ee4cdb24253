package app.latentledger.core.psychro;

/**
 * The barometric pressure every state at a site is computed at, and where it came from.
 *
 * @param pressurePa barometric pressure, Pa
 * @param elevationM site elevation, m, or NaN when the pressure was measured
 * @param measured   true when the tech entered a barometer reading rather than an elevation
 */
public record SitePressure(double pressurePa, double elevationM, boolean measured) {
    /** Sea level, standard atmosphere: 101 325 Pa. */
    public static final SitePressure SEA_LEVEL = fromElevation(0.0);

    /** Standard-atmosphere pressure at the site's elevation (ASHRAE HoF 2017 ch. 1, eq. 3). */
    public static SitePressure fromElevation(double elevationM) {
        InputLimits.checkElevation("elevation", elevationM);
        return new SitePressure(StandardAtmosphere.pressurePa(elevationM), elevationM, false);
    }

    /** A measured station (not sea-level-corrected) barometric pressure. */
    public static SitePressure measured(double pressurePa) {
        InputLimits.checkPressure("pressure", pressurePa);
        return new SitePressure(pressurePa, Double.NaN, true);
    }
}
