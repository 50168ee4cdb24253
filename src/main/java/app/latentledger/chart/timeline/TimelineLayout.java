package app.latentledger.chart.timeline;

import app.latentledger.chart.draw.Theme;

/**
 * Where the timeline's panels sit, top to bottom: temperatures, humidity ratios, the compressor and
 * blower bands, the per-cycle moisture bars, then the time axis. All share one time axis.
 */
public record TimelineLayout(double width, double height, double left, double plotWidth, Band temperature,
                             Band humidity, Band compressor, Band blower, Band moisture, double axisTop) {

    /** A horizontal strip of the chart, device units. */
    public record Band(double top, double height) {
        public double bottom() {
            return top + height;
        }

        public boolean contains(double y) {
            return y >= top && y <= top + height;
        }
    }

    /** The least height of the moisture bars' plot, under their title and key, device units. */
    public static final double MIN_MOISTURE_PLOT_PX = 120;

    /** Height of the moisture panel's title and key line, above its plot. */
    static double moistureHeader(Theme theme) {
        return theme.baseText() * 1.8;
    }

    public static TimelineLayout forSize(double width, double height, Theme theme) {
        double text = theme.baseText();
        double left = Math.round(text * 6.2);
        double right = Math.round(text * 1.6);
        double top = Math.round(text * 3.6);
        double bottom = Math.round(text * 2.6);
        double gap = Math.round(text * 0.8);
        double lane = Math.round(text * 1.5);
        // the moisture bars keep MIN_MOISTURE_PLOT_PX below their title and key in every zoom, even
        // when that squeezes the two line panels on a short canvas: a sliver of bars reads as nothing
        double bars0 = moistureHeader(theme) + MIN_MOISTURE_PLOT_PX;
        double rest = Math.max(bars0 + Math.round(text * 5), height - top - bottom - 2 * lane - 5 * gap);
        double bars = Math.max(rest - Math.round(rest * 0.40) - Math.round(rest * 0.32), bars0);
        double temp = Math.round((rest - bars) * 0.40 / 0.72);
        double hum = rest - bars - temp;
        double y = top;
        Band t = new Band(y, temp);
        y += temp + gap;
        Band h = new Band(y, hum);
        y += hum + gap * 1.5;
        Band c = new Band(y, lane);
        y += lane + gap * 0.5;
        Band b = new Band(y, lane);
        y += lane + gap * 1.5;
        Band m = new Band(y, bars);
        y += bars;
        return new TimelineLayout(width, height, left, Math.max(40, width - left - right), t, h, c, b, m, y);
    }

    public TimeViewport viewport(TimelineData data) {
        return TimeViewport.whole(data, left, plotWidth);
    }
}
