package app.latentledger.chart.timeline;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Min/max decimation: derived on paper, every column of the output must reach exactly the raw
 * column's extremes (common practice for envelope decimation, no source).
 */
class MinMaxDecimatorTest {
    private static final int WEEK = 604_800;

    private static double[] seconds(int n) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i;
        }
        return t;
    }

    @Test
    @DisplayName("a 1 Hz week at 1280 px becomes at most 2 points per column and keeps every column's min and max")
    void keepsEveryColumnsExtremes() {
        double[] t = seconds(WEEK);
        double[] v = new double[WEEK];
        Random r = new Random(7);
        for (int i = 0; i < WEEK; i++) {
            v[i] = Math.sin(i / 600.0) + r.nextGaussian() * 0.1;
        }
        v[123_457] = 40;   // a one-sample spike
        v[500_001] = -40;  // a one-sample dip
        TimeViewport vp = new TimeViewport(0, WEEK - 1, 0, WEEK - 1, 0, 1280);
        MinMaxDecimator d = new MinMaxDecimator();
        int n = d.decimate(t, v, vp);
        assertTrue(d.reduced());
        assertTrue(n <= 2 * 1280 + 2, "points: " + n);
        double[] min = new double[1280];
        double[] max = new double[1280];
        MinMaxDecimator.envelope(t, v, vp, min, max);
        for (int c = 0; c < 1280; c++) {
            boolean sawMin = false;
            boolean sawMax = false;
            for (int i = 0; i < n; i++) {
                int col = (int) Math.min(1279, Math.floor(d.xs()[i]));
                if (col == c && d.ys()[i] == min[c]) {
                    sawMin = true;
                }
                if (col == c && d.ys()[i] == max[c]) {
                    sawMax = true;
                }
            }
            assertTrue(sawMin && sawMax, "column " + c);
        }
        double top = Double.NEGATIVE_INFINITY;
        double bottom = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            top = Math.max(top, d.ys()[i]);
            bottom = Math.min(bottom, d.ys()[i]);
        }
        assertEquals(40, top);
        assertEquals(-40, bottom);
    }

    @Test
    @DisplayName("points come out in time order, so the line is drawn as the signal went")
    void pointsStayInTimeOrder() {
        double[] t = seconds(10_000);
        double[] v = new double[10_000];
        for (int i = 0; i < v.length; i++) {
            v[i] = (i * 7919) % 101;
        }
        MinMaxDecimator d = new MinMaxDecimator();
        int n = d.decimate(t, v, new TimeViewport(0, 9_999, 0, 9_999, 0, 300));
        for (int i = 1; i < n; i++) {
            assertTrue(d.xs()[i] >= d.xs()[i - 1], "x order at " + i);
        }
    }

    @Test
    @DisplayName("zoomed in to fewer than two samples per column, raw samples pass through plus one beyond each edge")
    void rawSamplesWhenZoomedIn() {
        double[] t = seconds(WEEK);
        double[] v = new double[WEEK];
        for (int i = 0; i < WEEK; i++) {
            v[i] = i;
        }
        MinMaxDecimator d = new MinMaxDecimator();
        int n = d.decimate(t, v, new TimeViewport(1000.5, 1600.5, 0, WEEK - 1, 0, 1280));
        assertTrue(!d.reduced());
        assertEquals(1000, d.ys()[0]);
        assertEquals(1601, d.ys()[n - 1]);
        assertEquals(602, n);
    }

    @Test
    @DisplayName("a column of missing readings (NaN) becomes a gap, not a zero")
    void missingReadingsBecomeAGap() {
        double[] t = seconds(100_000);
        double[] v = new double[100_000];
        for (int i = 0; i < v.length; i++) {
            v[i] = i >= 40_000 && i < 50_000 ? Double.NaN : 5;
        }
        MinMaxDecimator d = new MinMaxDecimator();
        int n = d.decimate(t, v, new TimeViewport(0, 99_999, 0, 99_999, 0, 100));
        int nans = 0;
        for (int i = 0; i < n; i++) {
            if (Double.isNaN(d.ys()[i])) {
                nans++;
            } else {
                assertEquals(5, d.ys()[i]);
            }
        }
        assertTrue(nans >= 9, "gap columns: " + nans);
    }
}
