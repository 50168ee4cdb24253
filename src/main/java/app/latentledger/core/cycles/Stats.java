package app.latentledger.core.cycles;

import java.util.Arrays;

/** Order statistics the analysis needs; NaN-free input expected. */
final class Stats {
    private Stats() {
    }

    /** Median of the first {@code n} values (the array is not changed); NaN when n is 0. */
    static double median(double[] values, int n) {
        if (n == 0) {
            return Double.NaN;
        }
        double[] c = Arrays.copyOf(values, n);
        Arrays.sort(c);
        return n % 2 == 1 ? c[n / 2] : 0.5 * (c[n / 2 - 1] + c[n / 2]);
    }
}
