package app.latentledger.chart.timeline;

import java.util.Arrays;

/**
 * The stretches during which a relay (compressor, blower) was on, found once from the 1 Hz flags
 * so painting a band costs the number of runs, not the number of samples.
 */
public final class OnRuns {
    private final double[] startS;
    private final double[] endS;

    private OnRuns(double[] startS, double[] endS) {
        this.startS = startS;
        this.endS = endS;
    }

    /** A run lasts from its first "on" sample to the first "off" sample after it (or the last sample). */
    public static OnRuns of(double[] timeS, boolean[] on) {
        double[] s = new double[16];
        double[] e = new double[16];
        int n = 0;
        int i = 0;
        while (i < on.length) {
            if (!on[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j < on.length && on[j]) {
                j++;
            }
            if (n == s.length) {
                s = Arrays.copyOf(s, n * 2);
                e = Arrays.copyOf(e, n * 2);
            }
            s[n] = timeS[i];
            e[n] = timeS[Math.min(j, on.length - 1)];
            n++;
            i = j;
        }
        return new OnRuns(Arrays.copyOf(s, n), Arrays.copyOf(e, n));
    }

    public int size() {
        return startS.length;
    }

    public double startS(int i) {
        return startS[i];
    }

    public double endS(int i) {
        return endS[i];
    }

    /** Index of the first run that ends at or after {@code t}. */
    int firstEndingAfter(double t) {
        int lo = 0;
        int hi = endS.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (endS[mid] < t) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
