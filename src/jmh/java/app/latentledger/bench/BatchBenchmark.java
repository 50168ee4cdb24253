package app.latentledger.bench;

import app.latentledger.cli.Cli;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.units.UnitSystem;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The batch command end to end, in one process: 10,000 rows read, checked and written to a CSV
 * results file, and 1,000 rows with one PDF report each plus the summary; against the reference of
 * the per-row coil check alone, 10,000 times in a row on one thread (no file, no parsing, no
 * output). The rows cycle through the ten invented Saltreed systems of
 * field-data-samples/commissioning-batch.csv, each with its own site name and a slightly different
 * airflow so no two rows are alike.
 *
 * <p>Targets (issue): 10,000 rows checked and written in ≤ 10 s; 1,000 PDFs in ≤ 2 min, on the
 * project's 2-core machine. Single shots (each is a whole batch), so run with few iterations:
 * <pre>mvn -B -Pjmh test-compile exec:exec -Djmh.include=BatchBenchmark</pre> or, for the short run
 * recorded in docs/performance.md:
 * <pre>java -cp target/classes:target/test-classes:$(cat target/cp.txt) org.openjdk.jmh.Main BatchBenchmark -f 1 -wi 1 -i 3</pre>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class BatchBenchmark {
    private Path dir;
    private Path rows10k;
    private Path rows1k;
    private List<CoilReadings> reference;
    private int run;

    @Setup(Level.Trial)
    public void files() throws Exception {
        dir = Files.createTempDirectory("batch-bench");
        List<String> lines = Files.readAllLines(Path.of("field-data-samples", "commissioning-batch.csv"));
        String header = lines.get(0);
        List<String> examples = lines.subList(1, lines.size());
        rows10k = write("rows10k.csv", header, examples, 10_000);
        rows1k = write("rows1k.csv", header, examples, 1_000);
        reference = new ArrayList<>();
        for (int i = 0; i < 10_000; i++) {
            reference.add(readings(i));
        }
    }

    /** {@code n} rows cycling the examples: site "… #i", airflow nudged by up to ±2 %. */
    private Path write(String name, String header, List<String> examples, int n) throws Exception {
        StringBuilder b = new StringBuilder(header).append('\n');
        for (int i = 0; i < n; i++) {
            String row = examples.get(i % examples.size());
            String[] cells = row.split(",(?=(?:[^\"]*\"[^\"]*\")*[^\"]*$)", -1);
            cells[0] = cells[0] + " #" + i;
            int airflow = 14; // the airflow column of commissioning-batch.csv
            double q = Double.parseDouble(cells[airflow]);
            cells[airflow] = Double.toString(Math.round(q * (0.98 + 0.04 * ((i * 7919) % 101) / 100.0)));
            b.append(String.join(",", cells)).append('\n');
        }
        Path f = dir.resolve(name);
        Files.writeString(f, b.toString(), StandardCharsets.UTF_8);
        return f;
    }

    /** One row's coil-check inputs, SI: return 24–25 °C / 50–60 % RH, supply 13 °C / 90 %, 0.5 m³/s. */
    private static CoilReadings readings(int i) {
        double k = (i % 10) / 10.0;
        AirReading in = new AirReading("return", 24 + k, 0.28, HumidityKind.RELATIVE_HUMIDITY, 50 + 10 * k, 2);
        AirReading out = new AirReading("supply", 13, 0.28, HumidityKind.RELATIVE_HUMIDITY, 90, 2);
        return new CoilReadings(101_325, in, out, 0.5 + 0.01 * k, 0.1, AirflowPoint.ENTERING, 9, Tolerances.COIL_K,
                CoilTemperatureKind.COIL_SURFACE, 10_550, null);
    }

    @TearDown(Level.Trial)
    public void clean() throws Exception {
        try (var files = Files.walk(dir)) {
            files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Benchmark
    public double referencePerRowCheck10kRows() {
        double sum = 0;
        for (CoilReadings r : reference) {
            sum += CoilCheck.run(r, ThresholdSettings.DEFAULTS, UnitSystem.IP).process().latentW();
        }
        return sum;
    }

    @Benchmark
    public int batch10kRowsToCsv() {
        return cli("batch", rows10k.toString(), "--out", dir.resolve("out" + (run++) + ".csv").toString());
    }

    @Benchmark
    public int batch1kRowsWithPdfs() {
        return cli("batch", rows1k.toString(), "--reports", dir.resolve("reports" + (run++)).toString(),
                "--technician", "R. Okafor");
    }

    private int cli(String... words) {
        List<String> all = new ArrayList<>(List.of("--data-dir", dir.resolve("data").toString()));
        all.addAll(List.of(words));
        ByteArrayOutputStream sink = new ByteArrayOutputStream();
        int code = Cli.standard().run(all, new PrintStream(sink, true, StandardCharsets.UTF_8),
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
        if (code != 0) {
            throw new IllegalStateException("batch exit " + code);
        }
        return sink.size();
    }
}
