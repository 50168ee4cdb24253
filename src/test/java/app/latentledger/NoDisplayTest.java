package app.latentledger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Started where nothing can be shown, the app and {@code screens} say so in one line and exit 2;
 * the commands that need no screen still answer.
 */
class NoDisplayTest {

    @Test
    void linuxWithoutDisplayOrWaylandHasNoDisplay() {
        String line = DisplayCheck.missing("the app", "Linux", Map.of(), null).orElseThrow();
        assertTrue(line.contains("the app needs a display"), line);
        assertTrue(line.contains("every other command works without one"), line);
        assertFalse(line.contains("\n"), "one line: " + line);
        assertTrue(DisplayCheck.missing("the app", "Linux", Map.of("DISPLAY", "  "), null).isPresent(), "blank DISPLAY");
    }

    @Test
    void anX11OrWaylandSessionOrMonocleIsEnough() {
        assertTrue(DisplayCheck.missing("the app", "Linux", Map.of("DISPLAY", ":0"), null).isEmpty());
        assertTrue(DisplayCheck.missing("the app", "Linux", Map.of("WAYLAND_DISPLAY", "wayland-0"), null).isEmpty());
        assertTrue(DisplayCheck.missing("the app", "Linux", Map.of(), "Monocle").isEmpty());
        assertTrue(DisplayCheck.missing("the app", "Windows 11", Map.of(), null).isEmpty());
        assertTrue(DisplayCheck.missing("the app", "Mac OS X", Map.of(), null).isEmpty());
    }

    @Test
    void javaFxStartFailuresForTheDisplayAreRecognised() {
        assertTrue(DisplayCheck.isNoDisplayFailure(new UnsupportedOperationException("Unable to open DISPLAY")));
        assertTrue(DisplayCheck.isNoDisplayFailure(
                new RuntimeException(new UnsupportedOperationException("Unable to load glass GTK library."))));
        assertFalse(DisplayCheck.isNoDisplayFailure(new IllegalStateException("Unable to open DISPLAY")));
        assertFalse(DisplayCheck.isNoDisplayFailure(new UnsupportedOperationException("something else")));
    }

    @Test
    void theAppWithoutADisplayExitsTwoWithOneLine(@TempDir Path dir) throws Exception {
        Result r = runMain(dir, "--data-dir", dir.resolve("data").toString());
        assertEquals(2, r.code, r.err);
        assertEquals(1, r.err.strip().lines().count(), "exactly one line: " + r.err);
        assertTrue(r.err.startsWith("latent-ledger: the app needs a display"), r.err);
        assertTrue(r.err.contains("every other command works without one"), r.err);
        assertEquals("", r.out);
    }

    @Test
    void screensWithoutADisplayExitsTwoButStateAnswers(@TempDir Path dir) throws Exception {
        Result screens = runMain(dir, "--data-dir", dir.resolve("data").toString(), "screens", "--out",
                dir.resolve("png").toString());
        assertEquals(2, screens.code, screens.err);
        assertTrue(screens.err.startsWith("latent-ledger: screens needs a display"), screens.err);
        assertEquals(1, screens.err.strip().lines().count(), screens.err);

        Result state = runMain(dir, "--data-dir", dir.resolve("data").toString(), "state", "--dry-bulb", "80",
                "--wet-bulb", "67", "--json");
        assertEquals(0, state.code, state.err);
        assertTrue(state.out.contains("\"dewPoint\""), state.out);
    }

    private record Result(int code, String out, String err) {
    }

    /** Runs Main in a fresh JVM on this test's class path, with every display variable removed. */
    private static Result runMain(Path dir, String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"),
                "-Duser.home=" + dir, "-Djava.awt.headless=true",
                "app.latentledger.Main"));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        pb.environment().remove("JAVA_TOOL_OPTIONS");
        File out = dir.resolve("out.txt").toFile();
        File err = dir.resolve("err.txt").toFile();
        pb.redirectOutput(out).redirectError(err);
        Process p = pb.start();
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("no exit within 60 s: " + cmd);
        }
        return new Result(p.exitValue(), java.nio.file.Files.readString(out.toPath(), StandardCharsets.UTF_8),
                java.nio.file.Files.readString(err.toPath(), StandardCharsets.UTF_8));
    }
}
