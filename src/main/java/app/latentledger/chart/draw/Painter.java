package app.latentledger.chart.draw;

/**
 * The drawing calls a chart needs, in device units with the origin at the top left and y growing
 * downwards. Implementations: {@code CanvasPainter} (JavaFX), {@link RecordingPainter} (tests), and a
 * PDF painter. Coordinates arrive already mapped; a painter never knows about dry bulbs or seconds.
 *
 * <p>Polylines take arrays plus a count so callers can reuse buffers; a painter must not keep them.
 */
public interface Painter {

    /** Push the current clip so that {@link #restore()} can bring it back. */
    void save();

    /** Pop the state pushed by the matching {@link #save()}. */
    void restore();

    /** Intersect the clip with this rectangle until the matching restore. */
    void clip(double x, double y, double width, double height);

    void line(double x1, double y1, double x2, double y2, Stroke stroke);

    /** Open polyline through the first {@code count} points. */
    void polyline(double[] xs, double[] ys, int count, Stroke stroke);

    /** Closed polygon through the first {@code count} points; {@code fill} or {@code stroke} may be null. */
    void polygon(double[] xs, double[] ys, int count, Colour fill, Stroke stroke);

    /** Axis-aligned rectangle; {@code fill} or {@code stroke} may be null. */
    void rect(double x, double y, double width, double height, Colour fill, Stroke stroke);

    /** Circle; {@code fill} or {@code stroke} may be null. */
    void circle(double cx, double cy, double radius, Colour fill, Stroke stroke);

    /** One line of text anchored at (x, y) as the style says. */
    void text(double x, double y, String text, TextStyle style);

    /** How this painter's fonts measure text. */
    TextMeasurer measurer();

    /**
     * Marks the start of a named group of calls (e.g. "saturation-curve"). Back ends may ignore it;
     * the recording keeps it so tests can find a curve, and a PDF back end may tag content with it.
     */
    default void beginGroup(String name) {
    }

    /** Ends the group begun last. */
    default void endGroup() {
    }
}
