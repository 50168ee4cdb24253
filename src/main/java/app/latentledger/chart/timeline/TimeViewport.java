package app.latentledger.chart.timeline;

/**
 * The visible stretch of time and where it sits across the device, with zoom and pan kept within
 * the log. Immutable.
 *
 * @param startS  first visible second
 * @param endS    last visible second
 * @param firstS  the log's first second (pan limit)
 * @param lastS   the log's last second
 * @param left    plot-area left edge, device units
 * @param width   plot-area width
 */
public record TimeViewport(double startS, double endS, double firstS, double lastS, double left, double width) {
    /** Narrowest window, s: two minutes still shows the shape of a cycle's start. */
    public static final double MIN_SPAN_S = 120;

    public TimeViewport {
        if (!(endS > startS) || !(width > 0)) {
            throw new IllegalArgumentException("time window " + startS + "…" + endS + " s over " + width
                    + " px must have a positive length");
        }
    }

    public static TimeViewport whole(TimelineData data, double left, double width) {
        return new TimeViewport(data.firstS(), data.lastS(), data.firstS(), data.lastS(), left, width);
    }

    public double spanS() {
        return endS - startS;
    }

    public double x(double timeS) {
        return left + (timeS - startS) / spanS() * width;
    }

    public double timeS(double x) {
        return startS + (x - left) / width * spanS();
    }

    /** Zooms by {@code factor} (above 1 zooms in) keeping the time under {@code x} in place. */
    public TimeViewport zoomed(double factor, double x) {
        if (!(factor > 0)) {
            throw new IllegalArgumentException("zoom factor " + factor + " must be above 0");
        }
        double t = timeS(x);
        double span = Math.max(MIN_SPAN_S, Math.min(lastS - firstS, spanS() / factor));
        double f = (x - left) / width;
        return within(t - f * span, span);
    }

    /** Follows a drag of {@code dx} device units. */
    public TimeViewport panned(double dx) {
        return within(startS - dx / width * spanS(), spanS());
    }

    /** Shows [fromS, toS] with a margin of a tenth on each side. */
    public TimeViewport showing(double fromS, double toS) {
        double span = Math.max(MIN_SPAN_S, (toS - fromS) * 1.2);
        return within((fromS + toS) / 2 - span / 2, Math.min(span, lastS - firstS));
    }

    public TimeViewport withPlot(double newLeft, double newWidth) {
        return new TimeViewport(startS, endS, firstS, lastS, newLeft, newWidth);
    }

    public TimeViewport whole() {
        return new TimeViewport(firstS, lastS, firstS, lastS, left, width);
    }

    private TimeViewport within(double start, double span) {
        double s = Math.max(firstS, Math.min(lastS - span, start));
        return new TimeViewport(s, s + span, firstS, lastS, left, width);
    }
}
