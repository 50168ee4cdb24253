package app.latentledger.core.records;

import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.psychro.InputLimits;

/**
 * The accepted ranges of what a stored record may hold, in one place, for every way a record
 * comes in: the keypad, the command line, a bundle, a batch and (later) a sync. The ranges of a
 * reading are {@link FieldLimits}'; this class adds the caps and time-axis rules of stored logs and
 * bundles. Nothing here is a new limit: each constant names the rule it repeats, so a reading the hand entry refuses is also
 * refused from a bundle. The per-field ranges of a reading set stay in {@link ReadingSet} and
 * {@link HumidityReading}; this class holds what those do not cover (log samples, time axes,
 * the keypad's coil band, caps on counts).
 */
public final class RecordLimits {
    private RecordLimits() {
    }

    /** Logged temperatures, °C: the psychrometric input range the hand log import enforces. */
    public static final double LOG_MIN_TEMP_C = InputLimits.MIN_TEMP_C;
    public static final double LOG_MAX_TEMP_C = InputLimits.MAX_TEMP_C;
    /**
     * Logged RH, %: the hand import takes probe readings up to 103 % and stores them as at most
     * 100 %, so a stored RH above 100 % never came from a logger.
     */
    public static final double LOG_MIN_RH_PCT = FieldLimits.RELATIVE_HUMIDITY.minSi();
    public static final double LOG_MAX_RH_PCT = FieldLimits.RELATIVE_HUMIDITY.maxSi();
    /** A status channel is 0 (off) or 1 (on); missing is NaN. */
    public static final double LOG_MIN_STATUS = 0;
    public static final double LOG_MAX_STATUS = 1;

    /**
     * Longest median sample interval, s: cycle timing needs 5 min or less (the same limit as the
     * hand log import's {@code MAX_INTERVAL_S}).
     */
    public static final double LOG_MAX_MEDIAN_INTERVAL_S = 300;
    /** Longest span of one log, ms: a logger left on a site for up to a year (common practice, no source). */
    public static final long LOG_MAX_SPAN_MS = 366L * 24 * 3600 * 1000;
    /** Clock times of an epoch-based log: from 1970-01-01 to 2200-01-01 UTC, ms since the epoch. */
    public static final long LOG_MIN_EPOCH_MS = 0L;
    public static final long LOG_MAX_EPOCH_MS = 7_258_118_400_000L;
    /** Samples in one log: 10 million is 115 days at 1 Hz (about 560 MB of samples with six channels). */
    public static final int LOG_MAX_SAMPLES = 10_000_000;
    /** Samples of all logs in one bundle: above 28 week-long 1 Hz logs (17 million samples). */
    public static final long BUNDLE_MAX_SAMPLES = 20_000_000L;
    /** Channels in one log: the generic layout has 11; 64 leaves room for a logger's extra columns. */
    public static final int LOG_MAX_CHANNELS = 64;

    /** Coil temperature, °C: the one coil band of {@link FieldLimits#COIL_TEMPERATURE}. */
    public static final double COIL_MIN_C = FieldLimits.COIL_TEMPERATURE.minSi();
    public static final double COIL_MAX_C = FieldLimits.COIL_TEMPERATURE.maxSi();
}
