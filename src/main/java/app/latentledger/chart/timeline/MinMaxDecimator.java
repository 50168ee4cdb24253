package app.latentledger.chart.timeline;

import java.util.Arrays;

/**
 * Reduces a long series to what a screen can show: for each device-pixel column, the smallest and
 * the largest sample, in the order they occurred. A line through those points covers exactly the
 * vertical extent of the raw line in every column, so no peak or dip is lost, and a week at 1 Hz
 * (604,800 samples) paints as about 2 × width points. Where a column holds two samples or fewer the
 * raw samples are kept. One sample beyond each end of the window is included so the line runs to
 * the edges. A column whose samples are all NaN emits one NaN: a gap.
 *
 * <p>The method is the usual min/max envelope decimation of oscilloscopes and chart libraries
 * (common practice, no source).
 */
public final class MinMaxDecimator {
    private double[] xs = new double[0];
    private double[] ys = new double[0];
    private int count;
    private boolean reduced;

    /** Device x of point i (valid below {@link #count()}); the buffers are reused between calls. */
    public double[] xs() {
        return xs;
    }

    public double[] ys() {
        return ys;
    }

    public int count() {
        return count;
    }

    /**
     * Decimates the samples of {@code values} that fall in the viewport.
     *
     * @return the number of points written to {@link #xs()} and {@link #ys()}
     */
    public int decimate(double[] timeS, double[] values, TimeViewport vp) {
        count = 0;
        reduced = false;
        int n = timeS.length;
        int from = Math.max(0, lowerBound(timeS, vp.startS()) - 1);
        int to = Math.min(n - 1, lowerBound(timeS, vp.endS()));
        if (to < from) {
            return 0;
        }
        int columns = Math.max(1, (int) Math.ceil(vp.width()));
        ensure(Math.min(to - from + 1, 2 * columns + 4) + 2);
        if (to - from + 1 <= 2 * columns) {
            for (int i = from; i <= to; i++) {
                emit(vp.x(timeS[i]), values[i]);
            }
            return count;
        }
        reduced = true;
        double perColumn = vp.spanS() / columns;
        int i = from;
        if (timeS[i] < vp.startS()) {
            emit(vp.x(timeS[i]), values[i]);
            i++;
        }
        while (i <= to && timeS[i] <= vp.endS()) {
            int column = (int) Math.min(columns - 1, Math.floor((timeS[i] - vp.startS()) / perColumn));
            double columnEnd = vp.startS() + (column + 1) * perColumn;
            int minAt = -1;
            int maxAt = -1;
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            int firstOfColumn = i;
            while (i <= to && (timeS[i] < columnEnd || column == columns - 1) && timeS[i] <= vp.endS()) {
                double v = values[i];
                if (v < min) {
                    min = v;
                    minAt = i;
                }
                if (v > max) {
                    max = v;
                    maxAt = i;
                }
                i++;
            }
            if (minAt < 0) {
                emit(vp.x(timeS[firstOfColumn]), Double.NaN);
            } else if (minAt == maxAt) {
                emit(vp.x(timeS[minAt]), min);
            } else if (minAt < maxAt) {
                emit(vp.x(timeS[minAt]), min);
                emit(vp.x(timeS[maxAt]), max);
            } else {
                emit(vp.x(timeS[maxAt]), max);
                emit(vp.x(timeS[minAt]), min);
            }
        }
        if (i <= to) {
            emit(vp.x(timeS[i]), values[i]);
        }
        return count;
    }

    /**
     * The per-column envelope of the samples in the viewport: for column c (x = left + c + 0.5),
     * {@code min[c]} and {@code max[c]}, NaN where a column holds no finite sample. The same extremes
     * as {@link #decimate}, laid out for a filled band.
     *
     * @return the number of columns written
     */
    public static int envelope(double[] timeS, double[] values, TimeViewport vp, double[] min, double[] max) {
        int columns = Math.min(min.length, Math.max(1, (int) Math.ceil(vp.width())));
        java.util.Arrays.fill(min, 0, columns, Double.NaN);
        java.util.Arrays.fill(max, 0, columns, Double.NaN);
        double perColumn = vp.spanS() / columns;
        int n = timeS.length;
        int i = lowerBound(timeS, vp.startS());
        for (int c = 0; c < columns && i < n; c++) {
            // the last column also takes samples exactly at the window's end
            double columnEnd = c == columns - 1 ? Math.nextUp(vp.endS()) : vp.startS() + (c + 1) * perColumn;
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (; i < n && timeS[i] < columnEnd; i++) {
                double v = values[i];
                // NaN fails both tests and is skipped
                if (v < lo) {
                    lo = v;
                }
                if (v > hi) {
                    hi = v;
                }
            }
            if (lo <= hi) {
                min[c] = lo;
                max[c] = hi;
            }
        }
        return columns;
    }

    /**
     * True when the last {@link #decimate} call reduced the samples (more than two per column): the
     * points then come in min/max pairs and are best drawn as a filled envelope.
     */
    public boolean reduced() {
        return reduced;
    }

    private void emit(double x, double y) {
        if (count == xs.length) {
            ensure(count * 2 + 8);
        }
        xs[count] = x;
        ys[count] = y;
        count++;
    }

    private void ensure(int capacity) {
        if (xs.length < capacity) {
            xs = Arrays.copyOf(xs, capacity);
            ys = Arrays.copyOf(ys, capacity);
        }
    }

    /** First index whose time is at or after {@code t}; n if none. */
    static int lowerBound(double[] timeS, double t) {
        int lo = 0;
        int hi = timeS.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (timeS[mid] < t) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
