package app.latentledger.packaging;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

/**
 * Builds the self-contained app image with {@code src/packaging/package.sh} (jlink, jpackage,
 * class-data archive; no installer) and asks its launcher, as a tech's tablet would run it: no
 * PATH, no JAVA_HOME, no display. Skipped, saying why, where the JDK has no jpackage or there is
 * no bash to run the script (Windows builds follow docs/packaging.md instead).
 */
class PackagedAppIT {
    private static final Path BASE = Path.of(System.getProperty("latentledger.basedir", "."));
    private static final Path TARGET = Path.of(System.getProperty("latentledger.target", "target"));
    private static final Path JAR = TARGET.resolve("latent-ledger.jar");
    private static final Path IMAGE = TARGET.resolve("package/image/latent-ledger");
    private static final Path LAUNCHER = IMAGE.resolve("bin/latent-ledger");

    @BeforeAll
    static void buildImage() throws Exception {
        Path jpackage = Path.of(System.getProperty("java.home"), "bin", "jpackage");
        boolean windows = System.getProperty("os.name").toLowerCase(Locale.ROOT).startsWith("windows");
        String skip = !Files.isExecutable(jpackage)
                ? "no jpackage in " + jpackage.getParent() + " (a JRE, or a JDK without jdk.jpackage)"
                : windows ? "Windows: the image is built by hand (docs/packaging.md)" : null;
        if (skip != null) {
            System.out.println("PackagedAppIT SKIPPED, app image not built: " + skip);
        }
        assumeTrue(skip == null, "app image not built: " + skip);
        // an image already made from this very jar (e.g. by -Ppackage) is reused
        if (Files.isExecutable(LAUNCHER)
                && Files.getLastModifiedTime(LAUNCHER).compareTo(Files.getLastModifiedTime(JAR)) > 0) {
            return;
        }
        ProcessBuilder pb = new ProcessBuilder("bash", BASE.resolve("src/packaging/package.sh").toString(),
                "--image-only", TARGET.toString());
        pb.environment().put("JAVA_HOME", System.getProperty("java.home"));
        Path log = TARGET.resolve("package-it.log");
        pb.redirectErrorStream(true).redirectOutput(log.toFile());
        Process p = pb.start();
        assertTrue(p.waitFor(10, TimeUnit.MINUTES), "package.sh did not finish in 10 minutes");
        assertEquals(0, p.exitValue(), () -> "package.sh failed:\n" + read(log));
        assertTrue(Files.isExecutable(LAUNCHER), "no launcher at " + LAUNCHER);
    }

    /**
     * AHRI's rating entering air, 80 °F dry bulb / 67 °F wet bulb at sea level. Expected values
     * computed here, independently of the app's code, from ASHRAE Handbook—Fundamentals 2017 ch. 1
     * (IP): saturation pressure eq. 6 (Hyland–Wexler, over water), W from the wet bulb eq. 35,
     * vapour pressure eq. 20, enthalpy eq. 32; the dew point by bisection on eq. 6.
     */
    @Test
    void stateFromTheImageWithNoPathAndNoJavaHome(@TempDir Path dir) throws Exception {
        Run r = launch(dir, "state", "--dry-bulb", "80", "--wet-bulb", "67", "--json");
        assertEquals(0, r.code, r.err);
        JsonObject j = JsonParser.parseString(r.out).getAsJsonObject();

        double p = 14.696;
        double tdb = 80;
        double twb = 67;
        double wsStar = 0.621945 * pws(twb) / (p - pws(twb));
        double w = ((1093 - 0.556 * twb) * wsStar - 0.240 * (tdb - twb)) / (1093 + 0.444 * tdb - twb);
        double pw = p * w / (0.621945 + w);
        double rh = 100 * pw / pws(tdb);
        double dew = bisectDewPoint(pw);
        double h = 0.240 * tdb + w * (1061 + 0.444 * tdb);

        assertEquals(w, j.get("humidityRatio").getAsDouble(), 5e-6, "humidity ratio lb/lb");
        assertEquals(rh, j.get("relativeHumidity").getAsDouble(), 0.1, "RH %");
        assertEquals(dew, j.get("dewPoint").getAsDouble(), 0.05, "dew point °F");
        assertEquals(h, j.get("enthalpy").getAsDouble(), 0.02, "enthalpy Btu/lb");
    }

    @Test
    void everyOtherCommandAnswersFromTheImage(@TempDir Path dir) throws Exception {
        Run visits = launch(dir, "visits", "list");
        assertEquals(0, visits.code, visits.err);
        assertTrue(visits.out.contains("Heron Spit Road residence"), visits.out);

        Run coil = launch(dir, "coil", "--return-db", "78", "--return-rh", "55", "--supply-db", "57", "--supply-rh",
                "92", "--airflow", "1100", "--nominal-tons", "3", "--coil-temp", "47", "--json");
        assertEquals(0, coil.code, coil.err);
        assertTrue(coil.out.contains("\"dehumidifying\""), coil.out);

        Run log = launch(dir, "log", BASE.resolve("field-data-samples/oversized-short-cycling.csv").toString(),
                "--airflow", "1400", "--json");
        assertEquals(0, log.code, log.err);
        assertTrue(log.out.contains("\"cycles\""), log.out);

        Path pdf = dir.resolve("report.pdf");
        Run report = launch(dir, "report", "dfa8", "--out", pdf.toString());
        assertEquals(0, report.code, report.err);
        assertTrue(new String(Files.readAllBytes(pdf), 0, 5, StandardCharsets.ISO_8859_1).startsWith("%PDF-"));

        Run settings = launch(dir, "settings", "show");
        assertEquals(0, settings.code, settings.err);

        Run refused = launch(dir, "state", "--dry-bulb", "80", "--wet-bulb", "95");
        assertEquals(2, refused.code, "a wet bulb above the dry bulb is refused: " + refused.err);
    }

    /** As installed: /usr/bin/latent-ledger is a link to the launcher inside the image. */
    @Test
    void theLauncherWorksThroughALink(@TempDir Path dir) throws Exception {
        Path link = Files.createSymbolicLink(dir.resolve("latent-ledger"), LAUNCHER.toAbsolutePath());
        Run r = run(dir, List.of(link.toString(), "state", "--dry-bulb", "80", "--wet-bulb", "67", "--json"));
        assertEquals(0, r.code, r.err);
        assertTrue(r.out.contains("\"dewPoint\""), r.out);
    }

    @Test
    void theAppFromTheImageWithoutADisplayExitsTwo(@TempDir Path dir) throws Exception {
        Run r = launch(dir);
        assertEquals(2, r.code, r.err);
        assertTrue(r.err.startsWith("latent-ledger: the app needs a display"), r.err);
        assertEquals(1, r.err.strip().lines().count(), r.err);
    }

    private record Run(int code, String out, String err) {
    }

    /** The launcher with an empty PATH, no JAVA_HOME, no display, a throw-away home and data folder. */
    private static Run launch(Path dir, String... words) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(LAUNCHER.toString(), "--data-dir", dir.resolve("data").toString()));
        cmd.addAll(List.of(words));
        return run(dir, cmd);
    }

    private static Run run(Path dir, List<String> cmd) throws Exception {
        ProcessBuilder pb = new ProcessBuilder(cmd);
        Map<String, String> env = pb.environment();
        env.clear();
        env.put("PATH", "");
        env.put("HOME", dir.toString());
        env.put("LANG", "C.UTF-8");
        Path out = Files.createTempFile(dir, "out", ".txt");
        Path err = Files.createTempFile(dir, "err", ".txt");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        Process p = pb.start();
        if (!p.waitFor(2, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new AssertionError("no answer within 2 minutes: " + cmd);
        }
        return new Run(p.exitValue(), read(out), read(err));
    }

    /** Saturation pressure over liquid water, psia, t in °F: HoF 2017 ch. 1 eq. 6 (IP), 32–392 °F. */
    private static double pws(double tF) {
        double t = tF + 459.67;
        return Math.exp(-1.0440397e4 / t - 1.1294650e1 - 2.7022355e-2 * t + 1.2890360e-5 * t * t
                - 2.4780681e-9 * t * t * t + 6.5459673 * Math.log(t));
    }

    private static double bisectDewPoint(double pw) {
        double lo = 32;
        double hi = 120;
        for (int i = 0; i < 100; i++) {
            double mid = (lo + hi) / 2;
            if (pws(mid) < pw) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2;
    }

    private static String read(Path p) {
        try {
            return Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            return "(" + e + ")";
        }
    }
}
