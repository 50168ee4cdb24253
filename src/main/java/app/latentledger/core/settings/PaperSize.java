package app.latentledger.core.settings;

import app.latentledger.core.units.UnitSystem;

import java.util.Locale;

/**
 * Paper for printed reports. Sizes: US Letter 8.5 × 11 in (ANSI/ASME Y14.1), A4 210 × 297 mm
 * (ISO 216).
 */
public enum PaperSize {
    LETTER(215.9, 279.4, 612, 792), A4(210.0, 297.0, 595.276, 841.890);

    private final double widthMm;
    private final double heightMm;
    private final double widthPt;
    private final double heightPt;

    PaperSize(double widthMm, double heightMm, double widthPt, double heightPt) {
        this.widthMm = widthMm;
        this.heightMm = heightMm;
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    /** Portrait width in PostScript points (1/72 in), as a PDF page takes it. */
    public double widthPt() {
        return widthPt;
    }

    /** Portrait height in PostScript points. */
    public double heightPt() {
        return heightPt;
    }

    /** Letter where inch-pound units are used (the US), A4 elsewhere. */
    public static PaperSize defaultFor(UnitSystem units) {
        return units == UnitSystem.IP ? LETTER : A4;
    }

    /** "letter" or "a4", any case; refuses anything else with a message saying what is accepted. */
    public static PaperSize parse(String text) {
        PaperSize p = parseOrNull(text);
        if (p == null) {
            throw new IllegalArgumentException("'" + text + "' is not a paper size; use letter or a4");
        }
        return p;
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
