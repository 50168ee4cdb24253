package app.latentledger.io.logcsv;

/**
 * How regularly a log was sampled: the usual interval, the gaps and the irregular steps.
 *
 * @param medianIntervalS usual sample interval, s
 * @param gaps            intervals longer than the gap factor × the usual one
 * @param longestGapS     longest such interval, s (0 when none)
 * @param irregular       intervals off the usual one by more than 10 % but not gaps
 */
record IntervalStats(double medianIntervalS, int gaps, double longestGapS, int irregular) {
    /**
     * @param t         sample times, s, increasing
     * @param medianS   their median interval, s
     * @param gapFactor multiple of the median that counts as a gap
     */
    static IntervalStats of(double[] t, double medianS, double gapFactor) {
        int gaps = 0;
        int irregular = 0;
        double longest = 0;
        for (int k = 1; k < t.length; k++) {
            double x = t[k] - t[k - 1];
            if (x > gapFactor * medianS) {
                gaps++;
                longest = Math.max(longest, x);
            } else if (Math.abs(x - medianS) > 0.1 * medianS) {
                irregular++;
            }
        }
        return new IntervalStats(medianS, gaps, longest, irregular);
    }
}
