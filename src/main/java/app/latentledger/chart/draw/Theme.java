package app.latentledger.chart.draw;

/**
 * The palette and type sizes of a chart. {@link #LIGHT} is high contrast for sunlight on a tablet;
 * {@link #DARK} is for attics and crawl spaces. Colours only ever repeat what a line pattern, marker
 * shape or label already says.
 *
 * @param baseText     base font size in device units (the field app never goes below 18 px)
 * @param minLineWidth every line is drawn at least this wide, device units (0: as each chart asks)
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
        double baseText,
        double minLineWidth) {

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
            18, 0);

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
            18, 0);

    /**
     * For a screen in direct sun: white paper, black ink, every line at least 2 px and every colour
     * dark enough to stand out from white (contrast ratio at least 4.5:1 for text and 3:1 for lines
     * and grid, WCAG 2.x; checked by {@code OutdoorThemeContrastTest}).
     */
    public static final Theme OUTDOOR = new Theme("outdoor",
            Colour.rgb(0xFFFFFF), Colour.rgb(0xFFFFFF),
            Colour.rgb(0x000000), Colour.rgb(0x2B2B2B), Colour.rgb(0x000000),
            Colour.rgb(0x6B6B6B), Colour.rgb(0x8C8C8C),
            Colour.rgb(0x001F4D), Colour.rgb(0x1D3F6B), Colour.rgb(0x0B5130), Colour.rgb(0x5C3F08),
            Colour.rgb(0x4B2473),
            Colour.rgb(0x333333), Colour.rgb(0x9E2A00), Colour.rgb(0x004F5C),
            Colour.rgb(0x8A1005), Colour.rgb(0x0B2F99),
            Colour.rgb(0x27323D), Colour.rgb(0x55616D),
            Colour.rgb(0x004F5C), Colour.rgb(0x9E2A00),
            Colour.rgb(0xFFFFFF),
            18, 2);

    /** {@code p}, drawing every line at least {@link #minLineWidth()} wide when this theme asks for it. */
    public Painter painter(Painter p) {
        return minLineWidth > 0 ? new ThickLines(p, minLineWidth) : p;
    }

    /** Size of tick labels and curve labels: a step below the base, never under 15. */
    public double smallText() {
        return Math.max(15, baseText - 3);
    }
}
