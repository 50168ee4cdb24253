package app.latentledger.core.units;

import java.util.Locale;

/**
 * A fraction, share or ratio that is only shown when its denominator is clearly positive; otherwise
 * it is "not measurable" with the reason, in the same words in the app, the report and the command
 * line (JSON carries it as null). A sensible heat ratio of −16 ± 120 or a latent share of −10 % is
 * arithmetic on noise, not a property of the equipment; a negative share of returned water means the
 * quantity reversed, and the sentence says that instead of printing a negative percentage.
 *
 * <p>"Clearly positive" for an assessed denominator is the GUM rule the verdicts use: the value
 * exceeds its expanded uncertainty (k = 2; JCGM 100:2008 §6). Where a denominator has no assessed
 * uncertainty it must be above a stated floor (or simply above zero).
 *
 * @param value  the ratio (NaN when not measurable)
 * @param reason why it is not measurable ("" when it is)
 */
public record Ratio(double value, String reason) {
    /** The words every face shows for a ratio that cannot be worked out. */
    public static final String NOT_MEASURABLE = "not measurable";

    public Ratio {
        reason = reason == null ? "" : reason;
        if (Double.isNaN(value) && reason.isEmpty()) {
            reason = "nothing to compare it with";
        }
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

    /** numerator ÷ denominator when {@link #measurable(double, double)}, else NaN. */
    public static double of(double numerator, double denominator, double denominatorExpandedSi) {
        return measurable(denominator, denominatorExpandedSi) && Double.isFinite(numerator)
                ? numerator / denominator : Double.NaN;
    }

    /** "not measurable (why)", the words used wherever a ratio is withheld. */
    public static String notMeasurable(String why) {
        return why == null || why.isBlank() ? NOT_MEASURABLE : NOT_MEASURABLE + " (" + why + ")";
    }

    /**
     * numerator ÷ denominator, or not measurable when the denominator is not above {@code floor}
     * (a near-zero denominator makes any ratio meaningless, whatever its sign).
     *
     * @param whyNot the reason shown when the denominator is too small, e.g. "no moisture was removed"
     */
    public static Ratio of(double numerator, double denominator, double floor, String whyNot) {
        if (Double.isNaN(numerator) || Double.isNaN(denominator) || !(denominator > floor)) {
            return new Ratio(Double.NaN, whyNot);
        }
        return new Ratio(numerator / denominator, "");
    }

    /** A ratio already worked out; NaN or infinity becomes not measurable with the reason. */
    public static Ratio known(double value, String whyNot) {
        return Double.isNaN(value) || Double.isInfinite(value) ? new Ratio(Double.NaN, whyNot) : new Ratio(value, "");
    }

    public boolean measurable() {
        return !Double.isNaN(value);
    }

    /** True when measurable and below zero: the quantity reversed. */
    public boolean negative() {
        return measurable() && value < 0;
    }

    /**
     * "47 %", "not measurable (no moisture was removed)", or for a negative share "none (…)" with
     * {@code whenNegative} saying what reversed.
     */
    public String percent(String whenNegative) {
        if (!measurable()) {
            return notMeasurable(reason);
        }
        if (value < 0) {
            return "none (" + whenNegative + ")";
        }
        return String.format(Locale.ROOT, "%.0f %%", 100 * value);
    }

    /** The same, for a plain number with {@code decimals} places. */
    public String number(int decimals, String whenNegative) {
        if (!measurable()) {
            return notMeasurable(reason);
        }
        if (value < 0) {
            return "none (" + whenNegative + ")";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
