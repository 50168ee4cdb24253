package app.latentledger.server;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Guessing enrol codes is slowed down: 3 attempts a minute per address here, then 429 with Retry-After. */
class EnrolRateLimitTest {
    private static TestServer t;

    @BeforeAll
    static void start() throws Exception {
        t = TestServer.start(EnrolRateLimitTest.class, 3);
        t.company("Saltreed Cooling");
    }

    @AfterAll
    static void stop() throws Exception {
        if (t != null) {
            t.close();
        }
    }

    @Test
    void attemptsPastTheLimitGet429AndEvenAGoodCodeWaits() throws Exception {
        int limited = 0;
        String retryAfter = null;
        for (int i = 0; i < 6; i++) {
            TestServer.Response r = t.post("/api/v1/enrol", null, "{\"code\": \"ZZZZ-ZZZZ-ZZZZ\", \"deviceName\": \"x\"}");
            assertNotEquals(200, r.status());
            if (r.status() == 429) {
                limited++;
                retryAfter = r.headers().firstValue("Retry-After").orElse(null);
                assertEquals("too-many-attempts", r.object().get("error").getAsString());
            } else {
                assertEquals(401, r.status(), r.text());
            }
        }
        assertEquals(3, limited, "3 of 6 attempts pass in one minute");
        assertTrue(retryAfter != null && Integer.parseInt(retryAfter) >= 1 && Integer.parseInt(retryAfter) <= 20,
                "Retry-After " + retryAfter + " s: one attempt comes back every 20 s");
        String code = t.accounts.createEnrolCode("Saltreed Cooling", "Alice Marsh", "technician");
        TestServer.Response r = t.post("/api/v1/enrol", null, "{\"code\": \"" + code + "\", \"deviceName\": \"T1\"}");
        assertEquals(429, r.status(), "the limit holds for a right code too, so guessing gains nothing");
        assertEquals(0, t.sql("select count(*) from device"));
    }
}
