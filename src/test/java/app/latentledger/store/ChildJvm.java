package app.latentledger.store;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * A child JVM for the crash tests: started on this test run's class path, killed with SIGKILL, and
 * every line it printed read before the test looks at the ledger.
 *
 * <p>Why the kill goes through {@link ProcessHandle}: {@link Process#destroyForcibly()} sends
 * SIGKILL and then closes this side of the child's output pipe (OpenJDK's {@code ProcessImpl.destroy}
 * closes stdin, stdout and stderr). Lines the child had written but the reading thread had not yet
 * taken are thrown away, and the reader stops with "Stream closed". A test that reads the child's
 * output as the record of what it began and acknowledged then misses the last lines, most often
 * on a loaded machine where the reader lags. {@link ProcessHandle#destroyForcibly()} only sends the
 * signal: the pipe keeps every byte the child wrote, the JDK hands what is left to the reader when
 * the child has died, and the reader reaches end-of-file only after it has read all of it. The
 * reader here fails the test on any read error instead of ending quietly, so a short record can
 * never pass for a complete one.
 */
final class ChildJvm {
    private static final Duration DIE_WITHIN = Duration.ofSeconds(20);

    private final Process process;
    private final Thread reader;
    private final Path stderr;
    private final List<String> lines = new ArrayList<>();
    private IOException readError;

    private ChildJvm(Process process, Path stderr) {
        this.process = process;
        this.stderr = stderr;
        this.reader = new Thread(this::readToEnd, "child-output-" + process.pid());
        reader.setDaemon(true);
        reader.start();
    }

    /**
     * Starts {@code main} with {@code args} in a new JVM whose temp folder, home and SQLite native
     * library lie in {@code dir}; its standard error is appended to {@code dir/child.err}.
     */
    static ChildJvm start(Path dir, Class<?> main, String... args) throws IOException {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto",
                "-cp", System.getProperty("java.class.path"),
                "-Djava.io.tmpdir=" + Files.createDirectories(dir.resolve("tmp")),
                "-Duser.home=" + dir.resolve("home")));
        Path nativeDir = nativeLibraryFolder(dir);
        if (nativeDir != null) {
            command.add("-Dorg.sqlite.lib.path=" + nativeDir);
            command.add("-Dorg.sqlite.lib.name=libsqlitejdbc.so");
        }
        command.add(main.getName());
        command.addAll(List.of(args));
        Path err = dir.resolve("child.err");
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.appendTo(err.toFile())).start();
        return new ChildJvm(p, err);
    }

    /**
     * Waits until the lines printed so far satisfy {@code done}, the child ends, or {@code limit}
     * passes, whichever comes first; polls every millisecond.
     */
    void await(Predicate<List<String>> done, Duration limit) throws InterruptedException {
        long deadline = System.nanoTime() + limit.toNanos();
        while (!satisfied(done) && process.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(1);
        }
    }

    private synchronized boolean satisfied(Predicate<List<String>> done) {
        return done.test(lines);
    }

    /** True when a line read so far is exactly {@code line}. */
    synchronized boolean printed(String line) {
        return lines.contains(line);
    }

    /**
     * Kills the child with SIGKILL and returns every line it printed before it died. Fails when the
     * child ended by itself (not exit status 128 + 9) or its output could not be read to the end.
     */
    List<String> kill() throws InterruptedException {
        process.toHandle().destroyForcibly();
        assertTrue(process.waitFor(DIE_WITHIN.toSeconds(), TimeUnit.SECONDS), "child did not die");
        assertEquals(137, process.exitValue(), () -> "child must end by SIGKILL (128 + 9), not by itself: " + stderr());
        reader.join(DIE_WITHIN.toMillis());
        assertTrue(!reader.isAlive(), "the child's output was read to its end");
        closeStreams();
        synchronized (this) {
            if (readError != null) {
                fail("the child's output could not be read to its end; its record would be short", readError);
            }
            return List.copyOf(lines);
        }
    }

    private void readToEnd() {
        try (BufferedReader r = new BufferedReader(new InputStreamReader(process.getInputStream(), StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                synchronized (this) {
                    lines.add(line);
                }
            }
        } catch (IOException e) {
            synchronized (this) {
                readError = e;
            }
        }
    }

    private void closeStreams() {
        try {
            process.getOutputStream().close();
            process.getInputStream().close();
            process.getErrorStream().close();
        } catch (IOException ignored) {
            // the child is dead and its output read; nothing is left to lose
        }
    }

    private String stderr() {
        try {
            return Files.readString(stderr);
        } catch (IOException e) {
            return "(no stderr)";
        }
    }

    /**
     * Unpacks sqlite-jdbc's native library once per test folder, so the children neither unpack it
     * each (and, being killed, leave a copy behind each) nor share the app's own folder. Null when
     * this platform's library is not where expected; the children then unpack it into their temp folder.
     */
    private static Path nativeLibraryFolder(Path dir) throws IOException {
        Path folder = dir.resolve("native");
        Path lib = folder.resolve("libsqlitejdbc.so");
        if (Files.isRegularFile(lib)) {
            return folder;
        }
        String resource = "/org/sqlite/native/" + org.sqlite.util.OSInfo.getNativeLibFolderPathForCurrentOS()
                + "/libsqlitejdbc.so";
        try (InputStream in = org.sqlite.SQLiteJDBCLoader.class.getResourceAsStream(resource)) {
            if (in == null) {
                return null;
            }
            Files.createDirectories(folder);
            Path part = Files.createTempFile(folder, "libsqlitejdbc", ".part");
            Files.copy(in, part, StandardCopyOption.REPLACE_EXISTING);
            Files.move(part, lib, StandardCopyOption.ATOMIC_MOVE);
            return folder;
        }
    }
}
