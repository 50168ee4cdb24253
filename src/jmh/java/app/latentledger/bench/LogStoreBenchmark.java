package app.latentledger.bench;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.store.Database;
import app.latentledger.store.Ledger;
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

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.OffsetDateTime;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * Issue 4's targets: a week of 1 Hz logging (604 800 samples, 6 channels) stores in ≤ 2 s and loads
 * in ≤ 1 s. Each store goes into a fresh database file and includes the commit's fsync
 * (synchronous=FULL). Reference runs in the same process: the same bytes written to a plain file
 * with one fsync, and read back into arrays — the floor any store on this disk can reach.
 *
 * <p>Run: {@code mvn -B -Pjmh test-compile exec:exec -Djmh.include=LogStoreBenchmark}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 8)
public class LogStoreBenchmark {
    static final int SAMPLES = 7 * 24 * 3600;
    static final OffsetDateTime T0 = OffsetDateTime.parse("2024-07-16T00:00:00-04:00");

    private Path dir;
    private ImportedLog log;
    private Ledger loadLedger;
    private Ledger storeLedger;
    private Path referenceFile;
    private long[] times;
    private double[][] columns;
    private int round;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        dir = Files.createTempDirectory("log-bench");
        times = new long[SAMPLES];
        columns = new double[6][SAMPLES];
        for (int i = 0; i < SAMPLES; i++) {
            times[i] = T0.toInstant().toEpochMilli() + i * 1000L;
            boolean on = (i / 900) % 3 != 0; // 15-min off periods: a cycling system
            columns[0][i] = 24 + 1.5 * Math.sin(i / 5400.0);
            columns[1][i] = 58 + 6 * Math.sin(i / 7200.0);
            columns[2][i] = on ? 13 + 0.3 * Math.sin(i / 60.0) : 23;
            columns[3][i] = on ? 92 : 70;
            columns[4][i] = on ? 1 : 0;
            columns[5][i] = 1;
        }
        String[] names = {"return_db", "return_rh", "supply_db", "supply_rh", "compressor", "fan"};
        String[] units = {"°C", "%", "°C", "%", "on/off", "on/off"};
        LogChannel[] channels = new LogChannel[6];
        for (int c = 0; c < 6; c++) {
            channels[c] = new LogChannel(names[c], units[c], columns[c]);
        }
        log = new ImportedLog("week", "v", "week-log.csv", "", T0, new LogSamples(TimeBase.EPOCH, times, List.of(channels)));
        loadLedger = ledger(dir.resolve("load.db"));
        loadLedger.logs().save(log);
        referenceFile = dir.resolve("reference.bin");
        writeReference();
    }

    private static Ledger ledger(Path file) {
        Ledger l = new Ledger(Database.open(file));
        l.sites().save(new Site("s", "Bench site", "", 0, ""));
        l.systems().save(new HvacSystem("y", "s", "Bench system", SystemType.SINGLE_STAGE, 10_550, "", "", "", ""));
        l.visits().save(new Visit("v", "s", "y", T0, "Bench", VisitPurpose.FOLLOW_UP, ""));
        return l;
    }

    @Setup(Level.Iteration)
    public void freshStore() {
        storeLedger = ledger(dir.resolve("store-" + (round++) + ".db"));
    }

    @TearDown(Level.Iteration)
    public void closeStore() {
        storeLedger.close();
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        loadLedger.close();
        try (Stream<Path> files = Files.walk(dir)) {
            files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Benchmark
    public ImportedLog storeWeekLog() {
        storeLedger.logs().save(log);
        return log;
    }

    @Benchmark
    public ImportedLog loadWeekLog() {
        return loadLedger.logs().find("week").orElseThrow();
    }

    /** Reference: the same 7 × 8 bytes per sample to a plain file, one fsync. */
    @Benchmark
    public long referenceFileWrite() throws IOException {
        return writeReference();
    }

    /** Reference: the plain file back into arrays. */
    @Benchmark
    public double referenceFileRead() throws IOException {
        ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(referenceFile)).order(ByteOrder.LITTLE_ENDIAN);
        long[] t = new long[SAMPLES];
        b.asLongBuffer().get(t);
        b.position(SAMPLES * Long.BYTES);
        var d = b.asDoubleBuffer();
        double[][] out = new double[6][SAMPLES];
        for (double[] column : out) {
            d.get(column);
        }
        return out[5][SAMPLES - 1] + t[SAMPLES - 1];
    }

    private long writeReference() throws IOException {
        ByteBuffer b = ByteBuffer.allocate(SAMPLES * 7 * 8).order(ByteOrder.LITTLE_ENDIAN);
        b.asLongBuffer().put(times);
        b.position(SAMPLES * Long.BYTES);
        var d = b.asDoubleBuffer();
        for (double[] column : columns) {
            d.put(column);
        }
        b.position(0);
        try (FileChannel ch = FileChannel.open(referenceFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            while (b.hasRemaining()) {
                ch.write(b);
            }
            ch.force(true);
        }
        return Files.size(referenceFile);
    }
}
