package app.latentledger.report.pdf;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.TextStyle;

/**
 * The report's type and colours: one sans face in two weights, near-black text, a muted grey for
 * labels, one deep blue for headings and rules (the chart's light theme), pale fills for table
 * stripes. Body 9.5 pt: DejaVu runs wide, so this reads like 10.5 pt of a narrower face.
 */
public final class Ink {
    public static final Colour TEXT = Colour.rgb(0x1A1F24);
    public static final Colour MUTED = Colour.rgb(0x4F5A63);
    public static final Colour ACCENT = Colour.rgb(0x0B3C78);
    public static final Colour RULE = Colour.rgb(0xB9C2CA);
    public static final Colour STRIPE = Colour.rgb(0xF1F4F7);
    public static final Colour PANEL = Colour.rgb(0xEAF0F7);
    public static final Colour GOOD = Colour.rgb(0x1F6F43);
    public static final Colour WARN = Colour.rgb(0x9A3412);

    public static final double BODY_SIZE = 9.5;
    public static final double LEADING = 1.38;

    public static final TextStyle BODY = TextStyle.of(BODY_SIZE, TEXT);
    public static final TextStyle BODY_BOLD = BODY.emphasised();
    public static final TextStyle SMALL = TextStyle.of(8, MUTED);
    public static final TextStyle LABEL = TextStyle.of(8.5, MUTED);
    public static final TextStyle TITLE = TextStyle.of(19, ACCENT).emphasised();
    public static final TextStyle HEADING = TextStyle.of(13, ACCENT).emphasised();
    public static final TextStyle SUBHEADING = TextStyle.of(10.5, TEXT).emphasised();
    public static final TextStyle LEAD = TextStyle.of(11.5, TEXT);

    private Ink() {
    }
}
