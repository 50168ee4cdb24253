package app.latentledger.bench;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.StoredLogSeries;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.report.ReportData;
import app.latentledger.report.VisitReport;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * Time to make the demo reports as PDF in memory (load the records, run the coil checks and log
 * analysis, lay out, paint the charts as vectors, subset and embed the fonts, save), against the
 * reference of loading and working out the same data without any PDF, in the same process. The
 * "with log" visit carries the invented 24 h short-cycling sample (8640 samples at 10 s).
 * Target (PROPOSAL): a report well under 2 s on the tablet, so the tech can hand it over on site.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ReportBenchmark {
    private Path dir;
    private Ledger ledger;
    private Ledger withLog;

    @Setup(Level.Trial)
    public void open() throws Exception {
        dir = Files.createTempDirectory("report-bench");
        ledger = Ledger.open(dir.resolve("plain"), Ledger.FirstRun.SEED_DEMO);
        withLog = Ledger.open(dir.resolve("log"), Ledger.FirstRun.SEED_DEMO);
        var series = new LogCsvImporter(UnitSystem.IP, Map.of(), null)
                .read(Path.of("field-data-samples/oversized-short-cycling.csv")).series();
        withLog.logs().save(new ImportedLog("bench-log", DemoScenario.VISIT_COMPLAINT, "oversized-short-cycling.csv",
                "", OffsetDateTime.parse("2024-07-17T08:00:00-04:00"), StoredLogSeries.samples(series)));
    }

    @TearDown(Level.Trial)
    public void close() throws Exception {
        ledger.close();
        withLog.close();
        try (var files = Files.walk(dir)) {
            files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Benchmark
    public ReportData referenceLoadAndWorkOut() {
        return ReportData.load(ledger, DemoScenario.VISIT_COMPLAINT, null, UnitSystem.IP);
    }

    @Benchmark
    public int complaintBeforeAfterPdf() throws Exception {
        return pdf(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP);
    }

    @Benchmark
    public int commissioningPdfSi() throws Exception {
        return pdf(ledger, DemoScenario.VISIT_COMMISSIONING, null, PaperSize.A4, UnitSystem.SI);
    }

    @Benchmark
    public int twoVisitsComparedPdf() throws Exception {
        return pdf(ledger, DemoScenario.VISIT_COMPLAINT, DemoScenario.VISIT_COMMISSIONING, PaperSize.LETTER, UnitSystem.IP);
    }

    @Benchmark
    public int complaintWithLogPdf() throws Exception {
        return pdf(withLog, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP);
    }

    private static int pdf(Ledger l, String visit, String compare, PaperSize paper, UnitSystem units) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream(1 << 17);
        VisitReport.write(l, visit, compare, paper, units, out);
        return out.size();
    }
}
