package app.latentledger.core.visit;

import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The log rules at their edges. Ranges: −50 to 95 °C and 0 to 100 % (the hand import's, from the
 * psychrometric input range), status 0 to 1, a median interval of at most 5 min (cycle timing),
 * clock times 1970 to 2200.
 */
class RecordRulesTest {
    private static LogSamples log(TimeBase base, long[] t, String channel, String unit, double... v) {
        return new LogSamples(base, t, List.of(new LogChannel(channel, unit, v)));
    }

    private static long[] every(long startMs, long stepMs, int n) {
        long[] t = new long[n];
        for (int i = 0; i < n; i++) {
            t[i] = startMs + i * stepMs;
        }
        return t;
    }

    @Test
    void valuesAtTheEdgesPassAndJustBeyondFail() {
        long[] t = every(0, 60_000, 3);
        assertNull(RecordRules.logProblem(log(TimeBase.ELAPSED, t, "return_db", "°C", -50, 95, Double.NaN)));
        assertNull(RecordRules.logProblem(log(TimeBase.ELAPSED, t, "supply_rh", "%", 0, 100, 50)));
        RecordRules.LogProblem hot = RecordRules.logProblem(log(TimeBase.ELAPSED, t, "return_db", "°C", 20, 95.001, 20));
        assertEquals(1, hot.sample());
        assertTrue(hot.message().contains("accepted range -50 to 95 °C"), hot.message());
        assertEquals(2, RecordRules.logProblem(log(TimeBase.ELAPSED, t, "supply_rh", "%", 50, 50, 100.5)).sample());
        assertNotNull(RecordRules.logProblem(log(TimeBase.ELAPSED, t, "fan", "on/off", 0, 1, 2)));
        assertNotNull(RecordRules.logProblem(log(TimeBase.ELAPSED, t, "other", "", 0, Double.POSITIVE_INFINITY, 2)));
        // a channel the analysis does not read may hold any finite value
        assertNull(RecordRules.logProblem(log(TimeBase.ELAPSED, t, "other", "", 0, 1e300, 2)));
        // a temperature stored in another unit is ignored by the analysis, so only finiteness applies
        assertNull(RecordRules.logProblem(log(TimeBase.ELAPSED, t, "return_db", "°F", 0, 150, 2)));
    }

    @Test
    void timeAxes() {
        assertNull(RecordRules.logProblem(log(TimeBase.ELAPSED, every(0, 300_000, 3), "fan", "", 0, 1, 0)),
                "5 min is still cycle timing");
        assertNotNull(RecordRules.logProblem(log(TimeBase.ELAPSED, every(0, 300_001, 3), "fan", "", 0, 1, 0)));
        assertNotNull(RecordRules.logProblem(log(TimeBase.ELAPSED, every(-1, 1000, 3), "fan", "", 0, 1, 0)));
        assertNotNull(RecordRules.logProblem(log(TimeBase.EPOCH, every(-1000, 1000, 3), "fan", "", 0, 1, 0)));
        assertNotNull(RecordRules.logProblem(log(TimeBase.ELAPSED, new long[] {5, 5, 5}, "fan", "", 0, 1, 0)));
        assertNotNull(RecordRules.logProblem(log(TimeBase.ELAPSED, new long[] {0, 1000, 367L * 86_400_000}, "fan", "", 0, 1, 0)),
                "a span over a year");
        assertNull(RecordRules.logProblem(log(TimeBase.EPOCH, every(1_717_416_000_000L, 1000, 3), "fan", "", 0, 1, 0)));
    }
}
