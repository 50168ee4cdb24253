package app.latentledger.server;

import org.junit.jupiter.api.Test;

import java.util.concurrent.atomic.AtomicLong;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The token bucket on a hand-driven clock: n a minute, refilled evenly, per client. */
class RateLimitTest {
    @Test
    void tenAMinuteThenOneEverySixSeconds() {
        AtomicLong now = new AtomicLong(0);
        RateLimit limit = new RateLimit(10, now::get);
        for (int i = 0; i < 10; i++) {
            assertEquals(0, limit.acquire("10.0.0.1"), "attempt " + i);
        }
        long wait = limit.acquire("10.0.0.1");
        assertEquals(6, wait, "60 s / 10 = 6 s until the next token");
        assertEquals(0, limit.acquire("10.0.0.2"), "another client has its own bucket");
        now.addAndGet(5_999_000_000L);
        assertTrue(limit.acquire("10.0.0.1") > 0);
        now.addAndGet(2_000_000L);
        assertEquals(0, limit.acquire("10.0.0.1"));
        now.addAndGet(3_600_000_000_000L);
        for (int i = 0; i < 10; i++) {
            assertEquals(0, limit.acquire("10.0.0.1"), "refilled to 10, never more");
        }
        assertTrue(limit.acquire("10.0.0.1") > 0);
    }
}
