package app.latentledger.core.units;

import java.util.regex.Pattern;

/**
 * The one rule for a number a tech types into a box in the app, the same rule the command line
 * keeps without {@code --decimal-comma}: ASCII digits with an optional sign, at most one decimal
 * point and an exponent. A comma is refused, never guessed: "5,000" may mean five thousand or five,
 * and storing the wrong one silently (a site at 5 ft instead of 5000 ft) is worse than asking.
 * No hex, NaN or Infinity either.
 */
public final class TypedNumber {
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern GROUPED = Pattern.compile("[+-]?\\d{1,3}(,\\d{3})+");

    private TypedNumber() {
    }

    /** True when {@code typed} (trimmed) is a number by this rule. */
    public static boolean isNumber(String typed) {
        return typed != null && isPlainDecimal(typed.strip());
    }

    /** True when {@code text}, exactly as given (no trimming), is a number by this rule. */
    public static boolean isPlainDecimal(String text) {
        return DECIMAL.matcher(text).matches();
    }

    /**
     * The number typed, or a {@link NumberFormatException} whose message names the field, the
     * text and what is accepted, e.g. "elevation '5,000' refused: type digits with a point for
     * decimals, no thousands separator, e.g. 5000".
     */
    public static double parse(String field, String typed) {
        String t = typed == null ? "" : typed.strip();
        if (!DECIMAL.matcher(t).matches()) {
            throw new NumberFormatException(refusal(field, typed));
        }
        return Double.parseDouble(t);
    }

    /** The number typed, or null for an empty box; otherwise as {@link #parse}. */
    public static Double parseOrNull(String field, String typed) {
        return typed == null || typed.isBlank() ? null : parse(field, typed);
    }

    /** Why {@code typed} is not a number for {@code field}, with an example of what is. */
    public static String refusal(String field, String typed) {
        String t = typed == null ? "" : typed.strip();
        return field + " '" + t + "' refused: type digits with a point for decimals, no thousands separator, e.g. "
                + example(t);
    }

    private static String example(String t) {
        if (GROUPED.matcher(t).matches()) {
            return t.replace(",", ""); // "5,000" reads as grouped thousands
        }
        String pointed = t.replace(',', '.');
        return DECIMAL.matcher(pointed).matches() ? pointed : "1500 or 12.5";
    }
}
