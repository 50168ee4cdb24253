package app.latentledger.chart.axis;

import java.util.ArrayList;
import java.util.List;

/**
 * Keeps labels from overlapping: a label is placed only where its box clears every box placed
 * before it, so the most important labels go first. Boxes are axis-aligned in device units.
 */
public final class LabelPlacer {
    private final List<double[]> taken = new ArrayList<>();
    private final double minX;
    private final double minY;
    private final double maxX;
    private final double maxY;

    /** Labels must fall wholly inside this area. */
    public LabelPlacer(double minX, double minY, double maxX, double maxY) {
        this.minX = minX;
        this.minY = minY;
        this.maxX = maxX;
        this.maxY = maxY;
    }

    /** Reserves a box (e.g. a marker or the legend) without a label. */
    public void reserve(double x, double y, double width, double height) {
        taken.add(new double[] {x, y, x + width, y + height});
    }

    /** Reserves the box and answers true if it is inside the area and overlaps nothing placed. */
    public boolean tryPlace(double x, double y, double width, double height, double pad) {
        double x0 = x - pad;
        double y0 = y - pad;
        double x1 = x + width + pad;
        double y1 = y + height + pad;
        if (x < minX || y < minY || x + width > maxX || y + height > maxY) {
            return false;
        }
        for (double[] b : taken) {
            if (x0 < b[2] && x1 > b[0] && y0 < b[3] && y1 > b[1]) {
                return false;
            }
        }
        taken.add(new double[] {x, y, x + width, y + height});
        return true;
    }
}
