package app.latentledger.store;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.Duration;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A writer process killed with SIGKILL ({@link ChildJvm}, which reads all it printed) at random
 * moments, 60 times: during JVM start, during open and migration, and between or inside saves.
 * After each kill the database must open, pass {@code PRAGMA integrity_check} and hold every
 * reading set whose save call had returned (the child prints an id only after that).
 * What it rests on: SQLite's documented guarantee that a committed WAL transaction with
 * synchronous=FULL survives a crash of the application (sqlite.org/wal.html, "pragma synchronous").
 */
class CrashSafetyTest {
    private static final int KILLS = 60;

    @TempDir
    Path dir;

    @Test
    void everyReturnedSaveSurvivesSigkill() throws Exception {
        Path db = dir.resolve("crash.db");
        Random random = new Random(20240716L);
        Set<String> confirmed = new HashSet<>();
        int killedBeforeReady = 0;
        for (int kill = 0; kill < KILLS; kill++) {
            ChildJvm child = ChildJvm.start(dir, CrashWriter.class, db.toString(), "k" + kill);
            // a few kills land before the child is ready (JVM start, open, migrations), the rest
            // after a random number of returned saves, plus a random delay inside the next save
            int mode = kill % 6;
            if (mode == 0) {
                Thread.sleep(random.nextInt(600));
            } else {
                int wanted = 1 + random.nextInt(40);
                child.await(lines -> lines.size() >= wanted + 1, Duration.ofSeconds(20));
                Thread.sleep(random.nextInt(4));
            }
            List<String> printed = child.kill();
            if (!printed.contains("ready")) {
                killedBeforeReady++;
            }
            for (String line : printed) {
                if (!line.equals("ready")) {
                    confirmed.add(line);
                }
            }
            try (Database reopened = Database.open(db)) {
                assertEquals("ok", reopened.integrityCheck(), "integrity after kill " + kill);
                assertEquals(Migration.latestVersion(), reopened.schemaVersion());
                ReadingSetRepository readings = new ReadingSetRepository(reopened);
                for (String id : confirmed) {
                    int n = Integer.parseInt(id.substring(id.indexOf('-') + 1));
                    assertEquals(java.util.Optional.of(TestRecords.fullReadingSet(id, "crash-visit", n)), readings.find(id),
                            "reading set " + id + " was confirmed saved before kill " + kill);
                }
            }
        }
        assertTrue(confirmed.size() > KILLS, "the children should have saved many reading sets, saved " + confirmed.size());
        assertTrue(killedBeforeReady > 0, "some kills should land before the writer was ready");
    }
}
