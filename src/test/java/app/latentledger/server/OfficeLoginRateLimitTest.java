package app.latentledger.server;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Office log-in attempts are limited per client address like enrolment (the same setting). */
class OfficeLoginRateLimitTest {
    @Test
    void theFourthAttemptInAMinuteIsRefusedWith429AndRetryAfter() throws Exception {
        try (TestServer t = TestServer.start(OfficeLoginRateLimitTest.class, 3)) {
            t.company("Saltreed Cooling");
            OfficeWeb web = new OfficeWeb(t);
            for (int i = 0; i < 3; i++) {
                assertEquals(401, web.tryLogin(OfficeWeb.email("Saltreed Cooling"), "wrong password " + i).status());
            }
            TestServer.Response r = web.tryLogin(OfficeWeb.email("Saltreed Cooling"), OfficeWeb.PASSWORD);
            assertEquals(429, r.status(), r.text());
            assertTrue(Long.parseLong(r.headers().firstValue("retry-after").orElseThrow()) >= 1);
        }
    }
}
