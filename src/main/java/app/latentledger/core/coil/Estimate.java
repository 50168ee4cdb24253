package app.latentledger.core.coil;

/**
 * A result with its expanded uncertainty.
 *
 * @param valueSi    the value, SI; NaN when it does not exist (no apparatus dew point, no catch)
 * @param expandedSi expanded uncertainty, k = 2, SI; NaN when not assessable
 */
public record Estimate(double valueSi, double expandedSi) {
    /** A result that does not exist (or is withheld as not measurable). */
    public static final Estimate NONE = new Estimate(Double.NaN, Double.NaN);

    public boolean exists() {
        return Double.isFinite(valueSi);
    }

    /** True when the value lies beyond its uncertainty above zero. */
    public boolean clearlyPositive() {
        return exists() && Double.isFinite(expandedSi) && valueSi > expandedSi;
    }

    /** True when the value lies beyond its uncertainty below zero. */
    public boolean clearlyNegative() {
        return exists() && Double.isFinite(expandedSi) && valueSi < -expandedSi;
    }
}
