package app.latentledger.core.cycles;

import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

/**
 * The clock time of a log's first sample, when the log has one (elapsed-seconds logs do not).
 *
 * @param firstEpochSecond epoch second of the first sample; for a log without UTC offsets, the
 *                         local clock reading taken as if it were UTC
 * @param offsetSeconds    UTC offset of the first sample, s (0 when the log has none)
 * @param hasOffset        whether the log's times carried a UTC offset
 */
public record TimeOrigin(double firstEpochSecond, int offsetSeconds, boolean hasOffset) {
    private static final DateTimeFormatter WITH_OFFSET = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ssXXX");
    private static final DateTimeFormatter LOCAL = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss");

    /** ISO-8601 date-time of the moment {@code elapsedS} after the first sample, to the second. */
    public String label(double elapsedS) {
        long s = (long) Math.floor(firstEpochSecond + elapsedS + 1e-6);
        if (hasOffset) {
            ZoneOffset offset = ZoneOffset.ofTotalSeconds(offsetSeconds);
            return OffsetDateTime.ofInstant(java.time.Instant.ofEpochSecond(s), offset).format(WITH_OFFSET);
        }
        return LocalDateTime.ofEpochSecond(s, 0, ZoneOffset.UTC).format(LOCAL);
    }
}
