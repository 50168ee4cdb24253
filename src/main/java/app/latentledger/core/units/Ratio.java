package app.latentledger.core.units;

/**
 * A ratio is reported only when its denominator is clearly positive; otherwise it is "not
 * measurable", in one spelling for every screen, report and command. A sensible heat ratio of
 * −16 ± 120 or a latent share of −10 % is arithmetic on noise, not a property of the equipment.
 *
 * <p>"Clearly positive" is the GUM rule the verdicts use: the value exceeds its expanded
 * uncertainty (k = 2; JCGM 100:2008 §6). Where a denominator has no assessed uncertainty, it must
 * simply be above zero. JSON carries such a ratio as null.
 */
public final class Ratio {
    /** What a screen, report or finding says in place of a ratio that cannot be measured. */
    public static final String NOT_MEASURABLE = "not measurable";

    private Ratio() {
    }

    /**
     * True when a denominator supports a ratio: finite and above its expanded uncertainty (or above
     * zero when {@code expandedSi} is NaN, i.e. not assessed).
     */
    public static boolean measurable(double denominator, double expandedSi) {
        if (!Double.isFinite(denominator) || denominator <= 0) {
            return false;
        }
        return !Double.isFinite(expandedSi) || denominator > expandedSi;
    }

    /** numerator ÷ denominator when {@link #measurable}, else NaN. */
    public static double of(double numerator, double denominator, double denominatorExpandedSi) {
        return measurable(denominator, denominatorExpandedSi) && Double.isFinite(numerator)
                ? numerator / denominator : Double.NaN;
    }

    /** "not measurable (why)", the words used wherever a ratio is withheld. */
    public static String notMeasurable(String why) {
        return why == null || why.isBlank() ? NOT_MEASURABLE : NOT_MEASURABLE + " (" + why + ")";
    }
}
