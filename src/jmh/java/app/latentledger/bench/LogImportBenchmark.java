package app.latentledger.bench;

import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.fielddata.SyntheticLog;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.io.logcsv.RowSplitter;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * Target: a 7-day 1 Hz log (604 800 rows) imports and analyses in ≤ 1.5 × the time a bare CSV
 * parse of the same file takes. {@link #bareCsvParse} is the stated reference: commons-csv with
 * the importer's CSV format, every field touched, nothing converted. The importer now splits rows
 * itself, so {@link #bareSplitterParse} (its own splitter, every field touched) is reported too. The log is invented by
 * {@link SyntheticLog} (20 min runs, 10 min rests, continuous blower, sensor noise) and written once
 * per trial to a temp file in the generic layout (ISO times with offset, °F, no status columns, so
 * the temperature-based cycle detector and the blower inference do the work).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class LogImportBenchmark {
    static final int ROWS = 604_800;

    Path file;

    @Setup(Level.Trial)
    public void write() throws IOException {
        SyntheticLog.Scenario s = new SyntheticLog.Scenario();
        s.intervalS = 1;
        s.leadOffS = 900;
        s.onOff = new double[] {1200, 600, 900, 900, 1500, 480};
        s.fillToS = ROWS - 1;
        s.blower = SyntheticLog.Blower.CONTINUOUS;
        s.noiseK = 0.05;
        s.noiseRhPct = 0.3;
        s.supplyLagS = 20;
        SyntheticLog.Rows rows = SyntheticLog.generate(s);
        if (rows.size() != ROWS) {
            throw new IllegalStateException(rows.size() + " rows");
        }
        SyntheticLog.Layout layout = new SyntheticLog.Layout();
        layout.status = false;
        layout.headers = new String[] {"time", "return_db", "return_rh", "supply_db", "supply_rh"};
        file = Files.createTempFile("latent-ledger-week", ".csv");
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            rows.write(w, layout);
        }
    }

    @TearDown(Level.Trial)
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    /** Reference: tokenise the file with the importer's CSV format and touch every field. */
    @Benchmark
    public long bareCsvParse() throws IOException {
        long chars = 0;
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser p = CSVParser.builder().setReader(r).setFormat(LogCsvImporter.format(',')).get()) {
            for (CSVRecord rec : p) {
                for (int i = 0; i < rec.size(); i++) {
                    chars += rec.get(i).length();
                }
            }
        }
        return chars;
    }

    /**
     * Second reference, stated beside the first because the importer no longer uses commons-csv:
     * the importer's own row splitter over the same file (the bytes decoded as the importer decodes them), every row
     * split and every field touched (its trimmed length, as the first reference counts), nothing
     * converted. It is the cheaper of the two references, so its ratios are the stricter ones.
     */
    @Benchmark
    public long bareSplitterParse() throws IOException {
        long chars = 0;
        // read as the importer reads (no extra buffer layer), so the reference is not made slower than it is
        try (Reader r = new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8)) {
            RowSplitter rows = new RowSplitter(r, ',');
            while (rows.next()) {
                for (int i = 0; i < rows.size(); i++) {
                    chars += rows.trimmedEnd(i) - rows.trimmedStart(i);
                }
            }
        }
        return chars;
    }

    /** The whole job: import (parse, convert, validate, sort check) and analyse (cycles, moisture, model, findings). */
    @Benchmark
    public RunCycleReport importAndAnalyse() throws Exception {
        LogImport imported = new LogCsvImporter(UnitSystem.IP, Map.of(), null).read(file);
        return new RunCycleAnalysis(ThresholdSettings.DEFAULTS).analyse(imported.series(), 101_325, 0.5);
    }

    /** Import alone, to see where the time goes. */
    @Benchmark
    public LogImport importOnly() throws Exception {
        return new LogCsvImporter(UnitSystem.IP, Map.of(), null).read(file);
    }
}
