package app.latentledger.server;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.LongSupplier;

/**
 * A token bucket per client address: {@code perMinute} attempts, refilled evenly over a minute.
 * Kept in this instance's memory only: behind a load balancer with n instances a client gets at most
 * n times the limit, which still stops guessing a 60-bit code (see docs/office-server.md).
 */
final class RateLimit {
    private final int perMinute;
    private final LongSupplier nanoClock;
    private final Map<String, double[]> buckets = new ConcurrentHashMap<>();

    RateLimit(int perMinute, LongSupplier nanoClock) {
        this.perMinute = perMinute;
        this.nanoClock = nanoClock;
    }

    /** Seconds to wait before the next attempt, or 0 when this one may go ahead (and is counted). */
    long acquire(String client) {
        double nanosPerToken = 60e9 / perMinute;
        long now = nanoClock.getAsLong();
        if (buckets.size() > 100_000) {
            buckets.clear();
        }
        // {time of the last look (ns), tokens left}
        double[] state = buckets.computeIfAbsent(client, k -> new double[] {now, perMinute});
        synchronized (state) {
            state[1] = Math.min(perMinute, state[1] + (now - (long) state[0]) / nanosPerToken);
            state[0] = now;
            if (state[1] >= 1) {
                state[1] -= 1;
                return 0;
            }
            return Math.max(1, (long) Math.ceil((1 - state[1]) * nanosPerToken / 1e9));
        }
    }
}
