package app.latentledger.core.settings;

import java.util.Locale;

/**
 * Paper for printed reports. Sizes: US Letter 8.5 × 11 in (ANSI/ASME Y14.1), A4 210 × 297 mm
 * (ISO 216).
 */
public enum PaperSize {
    LETTER(215.9, 279.4), A4(210.0, 297.0);

    private final double widthMm;
    private final double heightMm;

    PaperSize(double widthMm, double heightMm) {
        this.widthMm = widthMm;
        this.heightMm = heightMm;
    }

    /** Portrait width, mm. */
    public double widthMm() {
        return widthMm;
    }

    /** Portrait height, mm. */
    public double heightMm() {
        return heightMm;
    }

    /** "letter" | "a4", as stored and typed. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Parses a key; null when not one. */
    public static PaperSize parseOrNull(String text) {
        for (PaperSize p : values()) {
            if (p.key().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return p;
            }
        }
        return null;
    }
}
