package app.latentledger.chart.psychro;

import app.latentledger.chart.draw.Theme;

/**
 * Where the plot area sits inside a chart of a given size: room on the left for the saturation
 * temperature and enthalpy scale, at the bottom for the dry-bulb axis, on the right for the
 * humidity-ratio axis, and at the top for the title.
 */
public record PsychroChartLayout(double width, double height, double plotLeft, double plotTop, double plotWidth,
                                 double plotHeight) {

    public static PsychroChartLayout forSize(double width, double height, Theme theme) {
        double text = theme.baseText();
        double left = Math.round(text * 1.2);
        double top = Math.round(text * 3.4);
        double right = Math.round(text * 5.2);
        double bottom = Math.round(text * 4.0);
        double pw = Math.max(40, width - left - right);
        double ph = Math.max(40, height - top - bottom);
        return new PsychroChartLayout(width, height, left, top, pw, ph);
    }

    /** A viewport onto {@code range} in this layout's plot area. */
    public ChartViewport viewport(ChartRange range, ChartRange limits) {
        return new ChartViewport(range, limits, plotLeft, plotTop, plotWidth, plotHeight);
    }
}
