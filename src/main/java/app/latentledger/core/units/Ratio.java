package app.latentledger.core.units;

import java.util.Locale;

/**
 * A fraction or share that is only shown when its denominator is clearly positive; otherwise it is
 * "not measurable" with the reason, in the same words in the app, the report and the command line.
 * A negative share is never printed as a percentage: it means the quantity reversed (more water put
 * back than taken out), and the sentence says that instead.
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
     * numerator ÷ denominator, or not measurable when the denominator is not above {@code floor}
     * (a near-zero denominator makes any ratio meaningless, whatever its sign).
     *
     * @param whyNot the reason shown when the denominator is too small, e.g. "no moisture was removed"
     */
    public static Ratio of(double numerator, double denominator, double floor, String whyNot) {
        if (Double.isNaN(numerator) || Double.isNaN(denominator)) {
            return new Ratio(Double.NaN, whyNot);
        }
        if (!(denominator > floor)) {
            return new Ratio(Double.NaN, whyNot);
        }
        return new Ratio(numerator / denominator, "");
    }

    /** A ratio already worked out; NaN becomes not measurable with the reason. */
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
     * "47 %", "not measurable (no moisture was removed)", or for a negative share "none (reversed:
     * …)" with {@code whenNegative} saying what reversed.
     */
    public String percent(String whenNegative) {
        if (!measurable()) {
            return NOT_MEASURABLE + " (" + reason + ")";
        }
        if (value < 0) {
            return "none (" + whenNegative + ")";
        }
        return String.format(Locale.ROOT, "%.0f %%", 100 * value);
    }

    /** The same, for a plain number with {@code decimals} places. */
    public String number(int decimals, String whenNegative) {
        if (!measurable()) {
            return NOT_MEASURABLE + " (" + reason + ")";
        }
        if (value < 0) {
            return "none (" + whenNegative + ")";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
