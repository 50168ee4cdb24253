package app.latentledger.report;

import app.latentledger.core.units.UnitSystem;

import java.util.Locale;

/** Page sizes, in PostScript points (1/72 in). Letter 8.5 × 11 in; A4 210 × 297 mm (ISO 216). */
public enum Paper {
    LETTER("letter", 612, 792),
    A4("a4", 595.276, 841.890);

    private final String key;
    private final double widthPt;
    private final double heightPt;

    Paper(String key, double widthPt, double heightPt) {
        this.key = key;
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    public String key() {
        return key;
    }

    public double widthPt() {
        return widthPt;
    }

    public double heightPt() {
        return heightPt;
    }

    /** Letter where inch-pound units are used (the US), A4 elsewhere. */
    public static Paper defaultFor(UnitSystem units) {
        return units == UnitSystem.IP ? LETTER : A4;
    }

    /** "letter" or "a4", any case. */
    public static Paper parse(String text) {
        for (Paper p : values()) {
            if (p.key.equals(text.trim().toLowerCase(Locale.ROOT))) {
                return p;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a paper size; use letter or a4");
    }
}
