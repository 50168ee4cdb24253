package app.latentledger.server;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The load and fault test in a shortened form: a few tablets sync a visit with a 24 h log each at
 * once, and one tablet back from a week offline sends 50 visits in one go; then a server in a child process is killed with SIGKILL twice mid-push and restarted.
 * Nothing acknowledged may be lost or stored twice. (The full run's figures: docs/performance.md.)
 */
class LoadTestTest {
    @Test
    void nothingAcknowledgedIsLostOrDuplicatedUnderLoadAndKills() throws Exception {
        String url = TestServer.databaseUrl();
        ByteArrayOutputStream log = new ByteArrayOutputStream();
        LoadTest.Result r = new LoadTest(url, new PrintStream(log, true, StandardCharsets.UTF_8)).run(6, 2, 3);
        String text = log.toString(StandardCharsets.UTF_8);
        assertEquals(36, r.acknowledged(), text);
        assertEquals(0, r.lost(), text);
        assertEquals(0, r.duplicated(), text);
        assertTrue(r.syncP50Ms() > 0 && r.healthP50Ms() > 0, text);
        assertEquals(2, r.kills());
        assertTrue(r.killAcknowledged() >= 3 * 6, "each tablet got at least one visit through: " + text);
        assertEquals(0, r.killLost(), text);
        assertEquals(0, r.killDuplicated(), text);
        assertEquals(0, r.weekOfflineLost(), "a week offline: 50 visits in one push, all there once: " + text);
    }
}
