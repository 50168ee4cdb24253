package app.latentledger.store;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.BufferedReader;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A writer process killed with SIGKILL ({@code Process.destroyForcibly()} on Linux) at random
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
        Path nativeDir = nativeLibraryFolder();
        Random random = new Random(20240716L);
        Set<String> confirmed = new HashSet<>();
        int killedBeforeReady = 0;
        for (int kill = 0; kill < KILLS; kill++) {
            List<String> command = new ArrayList<>(List.of(
                    Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto",
                    "-cp", System.getProperty("java.class.path"),
                    "-Djava.io.tmpdir=" + dir.resolve("tmp"),
                    "-Duser.home=" + dir.resolve("home")));
            if (nativeDir != null) {
                command.add("-Dorg.sqlite.lib.path=" + nativeDir);
                command.add("-Dorg.sqlite.lib.name=libsqlitejdbc.so");
            }
            command.add(CrashWriter.class.getName());
            command.add(db.toString());
            command.add("k" + kill);
            Files.createDirectories(dir.resolve("tmp"));
            Path err = dir.resolve("child.err");
            Process child = new ProcessBuilder(command)
                    .redirectError(ProcessBuilder.Redirect.appendTo(err.toFile()))
                    .start();
            List<String> printed = Collections.synchronizedList(new ArrayList<>());
            Thread reader = new Thread(() -> readLines(child.getInputStream(), printed));
            reader.start();
            // a few kills land before the child is ready (JVM start, open, migrations), the rest
            // after a random number of returned saves, plus a random delay inside the next save
            int mode = kill % 6;
            if (mode == 0) {
                Thread.sleep(random.nextInt(600));
            } else {
                int wanted = 1 + random.nextInt(40);
                long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(20);
                while (printed.size() < wanted + 1 && child.isAlive() && System.nanoTime() < deadline) {
                    Thread.sleep(1);
                }
                Thread.sleep(random.nextInt(4));
            }
            if (!printed.contains("ready")) {
                killedBeforeReady++;
            }
            child.destroyForcibly();
            assertTrue(child.waitFor(20, TimeUnit.SECONDS), "child did not die");
            reader.join(5000);
            assertEquals(137, child.exitValue(), () -> "child must end by SIGKILL (128 + 9), not by itself: "
                    + readQuietly(err));
            synchronized (printed) {
                for (String line : printed) {
                    if (!line.equals("ready")) {
                        confirmed.add(line);
                    }
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

    private static String readQuietly(Path file) {
        try {
            return Files.readString(file);
        } catch (java.io.IOException e) {
            return "(no stderr)";
        }
    }

    private static void readLines(InputStream in, List<String> into) {
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                into.add(line);
            }
        } catch (java.io.IOException ignored) {
            // the pipe breaks when the child is killed
        }
    }

    /**
     * Extracts sqlite-jdbc's native library once, so 60 child JVMs do not each unpack it (and, being
     * killed, leave 60 copies behind). Null when this platform's library is not where expected; the
     * children then unpack it into the test's temp folder.
     */
    private Path nativeLibraryFolder() throws Exception {
        String resource = "/org/sqlite/native/" + org.sqlite.util.OSInfo.getNativeLibFolderPathForCurrentOS()
                + "/libsqlitejdbc.so";
        try (InputStream in = org.sqlite.SQLiteJDBCLoader.class.getResourceAsStream(resource)) {
            if (in == null) {
                return null;
            }
            Path folder = Files.createDirectories(dir.resolve("native"));
            Files.copy(in, folder.resolve("libsqlitejdbc.so"), StandardCopyOption.REPLACE_EXISTING);
            return folder;
        }
    }
}
