package app.latentledger.chart.draw;

/**
 * Point-marker shapes. Before and after states differ by shape as well as colour, so the chart
 * still reads on a monochrome print or to a colour-blind eye.
 */
public enum Marker {
    CIRCLE, SQUARE, DIAMOND, TRIANGLE_UP, TRIANGLE_DOWN;

    /**
     * Paints the marker centred on (cx, cy).
     *
     * @param size overall width of the shape in device units
     */
    public void paint(Painter painter, double cx, double cy, double size, Colour fill, Stroke stroke) {
        double r = size / 2;
        switch (this) {
            case CIRCLE -> painter.circle(cx, cy, r, fill, stroke);
            case SQUARE -> {
                double s = r * 0.9;
                painter.rect(cx - s, cy - s, 2 * s, 2 * s, fill, stroke);
            }
            case DIAMOND -> painter.polygon(new double[] {cx, cx + r * 1.15, cx, cx - r * 1.15},
                    new double[] {cy - r * 1.15, cy, cy + r * 1.15, cy}, 4, fill, stroke);
            case TRIANGLE_UP -> painter.polygon(new double[] {cx, cx + r * 1.1, cx - r * 1.1},
                    new double[] {cy - r * 1.1, cy + r * 0.8, cy + r * 0.8}, 3, fill, stroke);
            case TRIANGLE_DOWN -> painter.polygon(new double[] {cx, cx + r * 1.1, cx - r * 1.1},
                    new double[] {cy + r * 1.1, cy - r * 0.8, cy - r * 0.8}, 3, fill, stroke);
            default -> throw new IllegalStateException(name());
        }
    }
}
