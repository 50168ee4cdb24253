package app.latentledger.core.cycles;

/** Order statistics the analysis needs; NaN-free input expected. */
final class Stats {
    private Stats() {
    }

    /**
     * Median of the first {@code n} values (the array is not changed); NaN when n is 0. Quickselect
     * on a copy, O(n): a week at 1 s has 604 799 intervals.
     */
    static double median(double[] values, int n) {
        if (n == 0) {
            return Double.NaN;
        }
        double[] c = java.util.Arrays.copyOf(values, n);
        double upper = select(c, n / 2);
        if (n % 2 == 1) {
            return upper;
        }
        // after selecting k = n/2, everything left of it is ≤ it: the lower middle is their maximum
        double lower = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n / 2; i++) {
            lower = Math.max(lower, c[i]);
        }
        return 0.5 * (lower + upper);
    }

    /**
     * Nearest-rank percentile (the ⌈q·n⌉-th smallest) of the first {@code n} values, the array not
     * changed; NaN when n is 0. Quickselect on a copy, O(n), where a sort would be O(n log n).
     */
    static double percentile(double[] values, int n, double q) {
        if (n == 0) {
            return Double.NaN;
        }
        int k = Math.max(0, Math.min(n - 1, (int) Math.ceil(q * n) - 1));
        return select(java.util.Arrays.copyOf(values, n), k);
    }

    /** Largest of the first {@code n} values; NaN when n is 0. */
    static double max(double[] values, int n) {
        double m = n == 0 ? Double.NaN : Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            m = Math.max(m, values[i]);
        }
        return m;
    }

    /** The k-th smallest value (0-based); reorders {@code a}. Hoare partition with middle pivot. */
    private static double select(double[] a, int k) {
        int lo = 0;
        int hi = a.length - 1;
        while (lo < hi) {
            double pivot = a[(lo + hi) >>> 1];
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double tmp = a[i];
                    a[i] = a[j];
                    a[j] = tmp;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return a[k];
            }
        }
        return a[k];
    }
}
