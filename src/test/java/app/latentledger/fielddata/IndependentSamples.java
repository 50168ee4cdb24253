package app.latentledger.fielddata;

import app.latentledger.fielddata.IndependentLog.Config;
import app.latentledger.fielddata.IndependentLog.StillAir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Writes the field-data samples made by {@link IndependentLog}, the generator that shares no code
 * with the analysis (Saltreed, invented). Deterministic: same seed, same bytes.
 *
 * <p>Regenerate:
 * <pre>mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) app.latentledger.fielddata.IndependentSamples field-data-samples</pre>
 */
public final class IndependentSamples {
    /** One sample: file, model, the options it needs and its integrated truth. */
    record Sample(String file, Config config, List<String> options) {
        IndependentLog.Truth truth() {
            return IndependentLog.generate(config);
        }
    }

    private IndependentSamples() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "field-data-samples");
        Files.createDirectories(dir);
        for (Sample s : all()) {
            IndependentLog.Truth t = s.truth();
            Files.writeString(dir.resolve(s.file()), t.csv(), StandardCharsets.UTF_8);
            System.out.printf("%s  %d KiB  truth: %d runs, median %.0f s, removed %.2f kg, returned %.2f kg (%.1f %%)%n",
                    s.file(), t.csv().length() / 1024, t.runs(), t.medianOnS(), t.removedKg(), t.returnedKg(),
                    100 * t.share());
        }
    }

    static List<Sample> all() {
        return List.of(fanDelayNoStatus(), celsiusPlain(), usDatesHotWeek());
    }

    /** 3-minute fan-off delay, T/RH loggers only, 1 K blower heat, RH probe 45 s behind. */
    static Sample fanDelayNoStatus() {
        Config c = IndependentLogTest.delay(180, false, 1.0, 45, StillAir.COOLS);
        return new Sample("fan-delay-no-status.csv", c, List.of("--airflow", "1200"));
    }

    /** The same house in °C with plain headers: refused under °F settings, read with --units si. */
    static Sample celsiusPlain() {
        Config c = IndependentLogTest.delay(120, false, 0.5, 30, StillAir.WARMS);
        c.celsius = true;
        c.seed = 41;
        return new Sample("celsius-plain.csv", c, List.of("--units", "si", "--airflow", "570"));
    }

    /** A hot week with outdoor columns and US dates, oversized unit (continuous only at 60 °C). */
    static Sample usDatesHotWeek() {
        Config c = IndependentLogTest.hotWeek(60);
        c.usDates = true;
        return new Sample("us-dates-hot-week.csv", c, List.of("--airflow", "1200", "--time-zone", "America/Chicago"));
    }
}
