package app.latentledger.core.cycles;

import org.junit.jupiter.api.Test;

import java.util.Map;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The sliding derivative window used to sharpen a week of supply humidity in one pass gives, at
 * every sample, the same window as walking out from that sample alone (the definition: the last
 * sample at least 20 s before, else the first; the first at least 20 s after, else the last). Times
 * are irregular, with gaps and bursts, so both ends stall and jump.
 */
class HumidityLagWindowTest {
    private static int directStart(LogSeries log, int i) {
        int a = i;
        while (a > 0 && log.timeS(i) - log.timeS(a) < HumidityLag.HALF_WINDOW_S) {
            a--;
        }
        return a;
    }

    @Test
    void theSlidingWindowIsTheWindowOfEachSample() {
        Random r = new Random(7);
        for (int run = 0; run < 20; run++) {
            int n = 500;
            double[] t = new double[n];
            for (int i = 1; i < n; i++) {
                double step = r.nextInt(10) == 0 ? 30 + 60 * r.nextDouble() : 0.5 + 9 * r.nextDouble();
                t[i] = t[i - 1] + step;
            }
            LogSeries log = new LogSeries(t, Map.of(), Map.of(), null);
            int a = 0;
            int b = 0;
            for (int i = 0; i < n; i++) {
                a = HumidityLag.windowStart(log, i, a);
                b = HumidityLag.windowEnd(log, i, b);
                assertEquals(directStart(log, i), a, "start at " + i);
                assertEquals(HumidityLag.windowEnd(log, i, i), b, "end at " + i);
            }
        }
    }
}
