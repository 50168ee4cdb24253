package app.latentledger.core.cycles;

/**
 * One compressor run and the rest that follows it. Sample indexes are into the {@link LogSeries}:
 * the compressor runs over samples [startIndex, stopIndex) and rests over [stopIndex, endIndex).
 *
 * @param startIndex      first running sample
 * @param stopIndex       first resting sample
 * @param endIndex        one past the last resting sample (next start, a gap, or the log's end)
 * @param startS          start, s since the first sample
 * @param onSeconds       compressor run time, s
 * @param offSeconds      rest time until the next start (or until the log ends or breaks), s
 * @param offComplete     false when the rest was cut short by the end of the log or a gap
 * @param offBlower       blower state during the rest
 * @param blowerOnSeconds how long the blower ran during the rest, s (NaN when unknown)
 * @param fromStatus      true when timed from a compressor status column, false when inferred
 *                        from temperatures
 */
public record Cycle(int startIndex, int stopIndex, int endIndex, double startS, double onSeconds,
                    double offSeconds, boolean offComplete, BlowerState offBlower, double blowerOnSeconds,
                    boolean fromStatus) {
}
