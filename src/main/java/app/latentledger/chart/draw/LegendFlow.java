package app.latentledger.chart.draw;

import java.util.ArrayList;
import java.util.List;

/**
 * A chart's key as both charts draw it: entries of a small sample (a line, a marker, a swatch) and
 * its words, flowed left to right into rows that fit a width, on the theme's legend background.
 * The psychrometric chart puts it in a band below its plot and the timeline in each panel's header
 * line, so the key never covers data. Rows are decided with {@link TextMeasurer#ESTIMATE} widened
 * by a margin, so the layout (made without a font) and the painting agree on the number of rows.
 */
public final class LegendFlow {
    /** Paints one entry's sample centred vertically on {@code y}, between {@code x} and {@code x + width}. */
    @FunctionalInterface
    public interface Sample {
        void paint(Painter p, double x, double y, double width);
    }

    /** One key entry; {@code emphasised} sets its words in bold (the coil processes). */
    public record Entry(Sample sample, String text, boolean emphasised) {
    }

    /** Width of a sample, device units. */
    public static final double SAMPLE_W = 40;
    private static final double GAP = 8;
    private static final double ENTRY_GAP = 22;
    private static final double PAD = 8;
    /** The estimate is about ±10 %; a wider allowance keeps real glyphs inside their slot. */
    private static final double ESTIMATE_MARGIN = 1.12;

    private final Theme theme;
    private final double textSize;
    private final List<Entry> entries = new ArrayList<>();

    public LegendFlow(Theme theme) {
        this(theme, theme.smallText());
    }

    public LegendFlow(Theme theme, double textSize) {
        this.theme = theme;
        this.textSize = textSize;
    }

    public LegendFlow add(Sample sample, String text, boolean emphasised) {
        entries.add(new Entry(sample, text, emphasised));
        return this;
    }

    public LegendFlow add(Sample sample, String text) {
        return add(sample, text, false);
    }

    /** A line sample in {@code stroke}. */
    public static Sample line(Stroke stroke) {
        return (p, x, y, w) -> p.line(x, y, x + w, y, stroke);
    }

    /** A marker in the middle of the sample. */
    public static Sample marker(Marker m, double size, Colour fill, Stroke stroke) {
        return (p, x, y, w) -> m.paint(p, x + w / 2, y, size, fill, stroke);
    }

    public List<Entry> entries() {
        return List.copyOf(entries);
    }

    public double rowHeight() {
        return textSize * 1.55;
    }

    private double width(Entry e) {
        return SAMPLE_W + GAP + TextMeasurer.ESTIMATE.width(e.text(), textSize, e.emphasised()) * ESTIMATE_MARGIN;
    }

    /** The entries in rows no wider than {@code width}; an entry wider than the width gets a row alone. */
    public List<List<Entry>> rows(double width) {
        List<List<Entry>> rows = new ArrayList<>();
        List<Entry> row = new ArrayList<>();
        double used = 0;
        for (Entry e : entries) {
            double w = width(e);
            if (!row.isEmpty() && used + ENTRY_GAP + w > width - 2 * PAD) {
                rows.add(row);
                row = new ArrayList<>();
                used = 0;
            }
            used += (row.isEmpty() ? 0 : ENTRY_GAP) + w;
            row.add(e);
        }
        if (!row.isEmpty()) {
            rows.add(row);
        }
        return rows;
    }

    /** Height of the key flowed into {@code width}, padding included; 0 when it has no entries. */
    public double height(double width) {
        int n = rows(width).size();
        return n == 0 ? 0 : n * rowHeight() + 2 * PAD;
    }

    /** Paints the key in the box at (x, y) of the given width, in a group named "legend". */
    public void paint(Painter p, double x, double y, double width) {
        if (entries.isEmpty()) {
            return;
        }
        p.beginGroup("legend");
        p.rect(x, y, width, height(width), theme.legendBackground(), Stroke.solid(theme.gridMajor(), 1));
        TextStyle ts = TextStyle.of(textSize, theme.text()).align(TextStyle.HAlign.LEFT, TextStyle.VAlign.MIDDLE);
        double cy = y + PAD + rowHeight() / 2;
        for (List<Entry> row : rows(width)) {
            double cx = x + PAD;
            for (Entry e : row) {
                e.sample().paint(p, cx, cy, SAMPLE_W);
                p.text(cx + SAMPLE_W + GAP, cy, e.text(), e.emphasised() ? ts.emphasised() : ts);
                cx += width(e) + ENTRY_GAP;
            }
            cy += rowHeight();
        }
        p.endGroup();
    }
}
