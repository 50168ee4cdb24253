package app.latentledger.chart.draw;

/**
 * Line patterns. Charts never carry meaning by colour alone, so each kind of line also gets its own
 * pattern. Lengths scale with the stroke width so thick and thin lines look alike.
 */
public enum DashPattern {
    SOLID(new double[0]),
    DASHED(new double[] {6, 4}),
    DOTTED(new double[] {1.2, 3}),
    DASH_DOT(new double[] {7, 3, 1.5, 3}),
    LONG_DASH(new double[] {12, 5});

    private final double[] unitLengths;

    DashPattern(double[] unitLengths) {
        this.unitLengths = unitLengths;
    }

    /** On/off lengths in device units for a stroke of this width; empty for a solid line. */
    public double[] lengths(double strokeWidth) {
        double scale = Math.max(1.0, strokeWidth);
        double[] out = new double[unitLengths.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = unitLengths[i] * scale;
        }
        return out;
    }
}
