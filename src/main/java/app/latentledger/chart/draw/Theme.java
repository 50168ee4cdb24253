package app.latentledger.chart.draw;

/**
 * The palette and type sizes of a chart. {@link #LIGHT} is high contrast for sunlight on a tablet;
 * {@link #DARK} is for attics and crawl spaces. Colours only ever repeat what a line pattern, marker
 * shape or label already says.
 *
 * @param baseText base font size in device units (the field app never goes below 18 px)
 */
public record Theme(
        String name,
        Colour background,
        Colour plotBackground,
        Colour text,
        Colour mutedText,
        Colour frame,
        Colour gridMajor,
        Colour gridMinor,
        Colour saturation,
        Colour relativeHumidity,
        Colour wetBulb,
        Colour enthalpy,
        Colour volume,
        Colour before,
        Colour after,
        Colour coil,
        Colour returnAir,
        Colour supplyAir,
        Colour compressorBand,
        Colour blowerBand,
        Colour removed,
        Colour returned,
        Colour legendBackground,
        double baseText) {

    /** White paper, near-black ink, deep blue and burnt orange: readable in full sun and in print. */
    public static final Theme LIGHT = new Theme("light",
            Colour.rgb(0xFFFFFF), Colour.rgb(0xFFFFFF),
            Colour.rgb(0x1A1F24), Colour.rgb(0x4F5A63), Colour.rgb(0x3A434B),
            Colour.rgb(0xB9C2CA), Colour.rgb(0xE3E8EC),
            Colour.rgb(0x0B3C78), Colour.rgb(0x5C7FA3), Colour.rgb(0x2E7D5B), Colour.rgb(0x8A6D3B),
            Colour.rgb(0x7A5C99),
            Colour.rgb(0x6B6F73), Colour.rgb(0xC2410C), Colour.rgb(0x0E7490),
            Colour.rgb(0xB42318), Colour.rgb(0x1D4ED8),
            Colour.rgb(0x5B6B7A), Colour.rgb(0x9AA8B5),
            Colour.rgb(0x0E7490), Colour.rgb(0xC2410C),
            Colour.rgb(0xFFFFFF).withAlpha(0.92),
            18);

    /** Slate background, soft light lines, warm and cool accents of equal weight. */
    public static final Theme DARK = new Theme("dark",
            Colour.rgb(0x14181D), Colour.rgb(0x181D23),
            Colour.rgb(0xE8EDF2), Colour.rgb(0xA9B4BF), Colour.rgb(0x8894A0),
            Colour.rgb(0x3C4652), Colour.rgb(0x262E37),
            Colour.rgb(0x9CC3F0), Colour.rgb(0x6F8FB3), Colour.rgb(0x6FC29A), Colour.rgb(0xC9A86A),
            Colour.rgb(0xB49AD6),
            Colour.rgb(0xB8BEC4), Colour.rgb(0xFF9B5E), Colour.rgb(0x5CC8E0),
            Colour.rgb(0xFF7A6E), Colour.rgb(0x7FA8FF),
            Colour.rgb(0x8C9BAA), Colour.rgb(0x5C6B7A),
            Colour.rgb(0x5CC8E0), Colour.rgb(0xFF9B5E),
            Colour.rgb(0x1E242B).withAlpha(0.94),
            18);

    /** Size of tick labels and curve labels: a step below the base, never under 15. */
    public double smallText() {
        return Math.max(15, baseText - 3);
    }
}
