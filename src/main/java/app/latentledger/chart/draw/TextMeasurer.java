package app.latentledger.chart.draw;

/**
 * Measures text so charts can place labels without overlaps. Each back end supplies its own (font
 * metrics of the canvas or of the embedded PDF font); {@link #ESTIMATE} works without any font.
 */
public interface TextMeasurer {

    /** Advance width of {@code text} in device units. */
    double width(String text, double size, boolean bold);

    /** Height above the baseline of capital letters and digits, device units. */
    default double ascent(double size) {
        return 0.72 * size;
    }

    /** Depth below the baseline of descenders, device units. */
    default double descent(double size) {
        return 0.21 * size;
    }

    /**
     * An estimate from average glyph widths of a humanist sans-serif (digits ≈ 0.56 em, lower case ≈
     * 0.5 em, capitals ≈ 0.65 em, spaces and punctuation ≈ 0.3 em), about ±10 % on chart labels.
     * Common practice, no source: these are rounded typical values, not metrics of one font.
     */
    TextMeasurer ESTIMATE = (text, size, bold) -> {
        double em = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isDigit(c)) {
                em += 0.56;
            } else if (Character.isUpperCase(c)) {
                em += 0.65;
            } else if (Character.isLowerCase(c)) {
                em += 0.50;
            } else if (c == ' ' || c == '.' || c == ',' || c == ':' || c == '\'' || c == '|') {
                em += 0.28;
            } else {
                em += 0.56;
            }
        }
        return em * size * (bold ? 1.06 : 1.0);
    };
}
