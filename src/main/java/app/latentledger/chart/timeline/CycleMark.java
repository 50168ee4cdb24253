package app.latentledger.chart.timeline;

/**
 * One compressor cycle as the cycle analysis reports it, in seconds on the log's time axis.
 *
 * @param startS     compressor on
 * @param onEndS     compressor off
 * @param endS       next compressor on (or the end of the log)
 * @param removedKg  water taken out of the air while the coil ran, kg
 * @param returnedKg water put back into the air after the compressor stopped (re-evaporation), kg
 * @param onsetS     when moisture removal began, s, or NaN if it never did
 * @param blowerInRest what the blower did in the rest, in the words of the log command's cycle table
 *                   (left on through it, ran on after the compressor then stopped, or stopped with it)
 */
public record CycleMark(double startS, double onEndS, double endS, double removedKg, double returnedKg,
                        double onsetS, String blowerInRest) {
    public CycleMark {
        if (!(startS <= onEndS && onEndS <= endS)) {
            throw new IllegalArgumentException("cycle times must run start ≤ compressor off ≤ end, got " + startS
                    + ", " + onEndS + ", " + endS + " s");
        }
    }

    public double durationS() {
        return endS - startS;
    }
}
