package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.Theme;

/**
 * Where the plot area sits inside a chart of a given size: room on the left for the saturation
 * temperature and enthalpy scale, at the bottom for the dry-bulb axis and below it the key, on the
 * right for the humidity-ratio axis, and at the top for the title.
 *
 * @param legendTop    top of the key's band, below the dry-bulb axis title
 * @param legendHeight height of that band (0: no key)
 */
public record PsychroChartLayout(double width, double height, double plotLeft, double plotTop, double plotWidth,
                                 double plotHeight, double legendTop, double legendHeight) {

    /** A layout with no room for a key. */
    public static PsychroChartLayout forSize(double width, double height, Theme theme) {
        return forSize(width, height, theme, 0);
    }

    /** A layout whose bottom band holds a key {@code legendHeight} tall, below the dry-bulb axis. */
    public static PsychroChartLayout forSize(double width, double height, Theme theme, double legendHeight) {
        double text = theme.baseText();
        double left = Math.round(text * 1.2);
        double top = Math.round(text * 3.4);
        double right = Math.round(text * 5.2);
        double axis = Math.round(text * 3.7);
        double bottom = axis + (legendHeight > 0 ? legendHeight + 6 : 0);
        double pw = Math.max(40, width - left - right);
        double ph = Math.max(40, height - top - bottom);
        return new PsychroChartLayout(width, height, left, top, pw, ph, top + ph + axis, legendHeight);
    }

    /** Width of the key's band: under the plot and the humidity-ratio axis. */
    public static double legendWidth(double width, Theme theme) {
        return Math.max(40, width - Math.round(theme.baseText() * 1.2) - 8);
    }

    /** A viewport onto {@code range} in this layout's plot area. */
    public ChartViewport viewport(ChartRange range, ChartRange limits) {
        return new ChartViewport(range, limits, plotLeft, plotTop, plotWidth, plotHeight);
    }
}
