package app.latentledger.core.house;

/**
 * Share of the return airflow that a return duct draws from the attic or crawlspace it runs through,
 * from three humidity readings: the return grille (house air, g), the return plenum after the leak
 * (p) and the space around the duct (a).
 *
 * <p>Adiabatic mixing of two streams (ASHRAE HoF 2017 ch. 1, "Adiabatic mixing of two moist
 * airstreams"): ṁ_p = ṁ_g + ṁ_a and ṁ_p·W_p = ṁ_g·W_g + ṁ_a·W_a, so the dry-air mass fraction of
 * leak air is f = (W_p − W_g)/(W_a − W_g). Humidity ratio is used rather than temperature or
 * enthalpy because conduction through the duct wall changes neither W nor this balance. When the
 * space and the grille differ by less than 10 gr/lb (1.43 g/kg) f is indeterminate (common practice).
 *
 * <p>Uncertainty (first order, independent readings): u(f) = √(u_p² + (1−f)²u_g² + f²u_a²)/(W_a − W_g);
 * the budget propagates the readings themselves. Reading grille and plenum with the same probe
 * cancels a common offset.
 */
public final class ReturnLeak {
    /** Smallest space-minus-grille humidity-ratio difference that gives a leak fraction, kg/kg. */
    public static final double MIN_CONTRAST = 10.0 / 7000.0;

    private ReturnLeak() {
    }

    /** The leak fraction, or NaN when the space is too close to the house air to tell. */
    public static double fraction(double wGrille, double wPlenum, double wSpace) {
        double contrast = wSpace - wGrille;
        if (!(Math.abs(contrast) >= MIN_CONTRAST)) {
            return Double.NaN;
        }
        return (wPlenum - wGrille) / contrast;
    }

    /** Standard uncertainty of f from the standard uncertainties of the three humidity ratios. */
    public static double standardUncertainty(double f, double wGrille, double wSpace, double uPlenum,
                                             double uGrille, double uSpace) {
        double d = wSpace - wGrille;
        return Math.sqrt(uPlenum * uPlenum + (1 - f) * (1 - f) * uGrille * uGrille + f * f * uSpace * uSpace)
                / Math.abs(d);
    }
}
