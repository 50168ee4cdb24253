package app.latentledger.store;

import app.latentledger.cli.Cli;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Another program holds the write lock (as a long import does, {@code BEGIN IMMEDIATE} and rows
 * written but not committed). Read-only commands must answer at once from the last committed
 * state (SQLite WAL: readers do not wait for the writer, sqlite.org/wal.html); a write waits for
 * the busy timeout and then says the ledger is busy, exit 2. The busy timeout is shortened to
 * 1.5 s for the test.
 */
class ReadersDuringWritesTest {
    @TempDir
    Path dir;

    @Test
    void readOnlyCommandsDoNotWaitForAWriterAndWritesSayBusy() throws Exception {
        Path data = dir.resolve("data");
        assertEquals(0, cli(data, "settings", "set", "tolRh", "5").code, "ledger made, a setting stored");
        assertEquals(0, cli(data, "visits", "list").code, "a first run's demo, if any, added before the lock is held");
        String before = System.getProperty("latentledger.busyTimeoutMs");
        System.setProperty("latentledger.busyTimeoutMs", "1500");
        try (Connection writer = DriverManager.getConnection("jdbc:sqlite:" + data.resolve(Ledger.FILE_NAME))) {
            try (Statement s = writer.createStatement()) {
                s.execute("PRAGMA busy_timeout = 0");
                s.execute("BEGIN IMMEDIATE");
                s.execute("INSERT INTO setting (key, number_si, updated_at) VALUES ('tolDryBulb', 1.5, 'x')"
                        + " ON CONFLICT (key) DO UPDATE SET number_si = 1.5");
            }
            for (List<String> read : List.of(List.of("settings", "show", "--json"), List.of("visits", "list"),
                    List.of("coil", "--return-db", "75", "--return-rh", "50", "--supply-db", "55", "--supply-rh", "90",
                            "--airflow", "1200"))) {
                long start = System.nanoTime();
                Result r = cli(data, read.toArray(String[]::new));
                long ms = (System.nanoTime() - start) / 1_000_000;
                assertEquals(0, r.code, read + ": " + r.err);
                assertFalse(r.err.contains("using the defaults"), r.err);
                assertTrue(ms < 1500, read + " waited " + ms + " ms for the writer");
            }
            assertTrue(cli(data, "settings", "show").out.contains("tolRh"), "the committed value is shown");
            Result write = cli(data, "settings", "set", "tolRh", "4");
            assertEquals(2, write.code, write.err);
            assertTrue(write.err.contains("another import is running; try again in a moment"), write.err);
            assertFalse(write.err.contains("unexpected failure"), write.err);
            try (Statement s = writer.createStatement()) {
                s.execute("ROLLBACK");
            }
        } finally {
            if (before == null) {
                System.clearProperty("latentledger.busyTimeoutMs");
            } else {
                System.setProperty("latentledger.busyTimeoutMs", before);
            }
        }
        assertEquals(0, cli(data, "settings", "set", "tolRh", "4").code, "the write goes through once the lock is free");
    }

    private record Result(int code, String out, String err) {
    }

    private static Result cli(Path data, String... words) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        List<String> all = new ArrayList<>(List.of("--data-dir", data.toString()));
        all.addAll(List.of(words));
        int code = Cli.standard().run(all, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Result(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }
}
