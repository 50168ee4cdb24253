package app.latentledger.core.cycles;

/**
 * The per-sample series the analysis used, so a chart draws exactly what was analysed and never
 * works the psychrometrics out again: the air after any probe correction, and the compressor and
 * blower state of each sample (from status columns, or as inferred).
 *
 * @param air        return and supply air per sample, as analysed
 * @param compressor per sample 1 running, 0 off, {@link LogSeries#UNKNOWN} outside the counted cycles
 * @param blower     per sample 1 on, 0 off, {@link LogSeries#UNKNOWN} when it cannot be told
 * @param inferredBlower true when the blower state came from the air rather than a status column
 */
public record CycleSeries(AirSeries air, byte[] compressor, byte[] blower, boolean inferredBlower) {
    /** Whether the compressor ran at sample i, as analysed. */
    public boolean compressorOn(int i) {
        return compressor[i] == 1;
    }

    /** Whether the blower ran at sample i, as analysed. */
    public boolean blowerOn(int i) {
        return blower[i] == 1;
    }

    public int size() {
        return compressor.length;
    }
}
