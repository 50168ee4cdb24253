package app.latentledger.ui.log;

import app.latentledger.chart.source.LogTimelineSource;
import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.LogNotAnalysableException;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.StoredLogSeries;
import app.latentledger.io.logcsv.ImportProgress;
import app.latentledger.io.logcsv.ImportReport;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.io.logcsv.LogRefusedException;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.present.Shown;
import app.latentledger.ui.session.LogAnalysis;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.LogRequest;

import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The log analysis the app ships with, the same steps as the {@code log} command: the CSV through
 * {@link LogCsvImporter} (in the visit's units, with the tech's header map), cycles through
 * {@link RunCycleAnalysis} at the site's pressure and airflow, the log kept with the visit through
 * the ledger's {@code LogRepository} as {@link StoredLogSeries} stores it (so the report and a
 * reopened visit read it back), the timeline through {@link LogTimelineSource}.
 */
public final class CycleLogAnalysis implements LogAnalysisService {
    @Override
    public boolean wired() {
        return true;
    }

    @Override
    public LogAnalysis importAndAnalyse(LogRequest request, Path file, ImportProgress progress) throws Exception {
        LogImport imported;
        try {
            imported = new LogCsvImporter(request.units(), request.headerMap(), progress).read(file);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException("no such file: " + file);
        } catch (LogRefusedException e) {
            throw new IllegalArgumentException(file.getFileName() + " refused: " + e.getMessage(), e);
        }
        RunCycleReport report = analyse(imported.series(), request);
        // kept only once it analyses: a log the screen cannot read is not put in the visit's report
        String name = file.getFileName().toString();
        request.ledger().logs().save(new ImportedLog(Ids.newId(), request.visit().id(), name,
                mapping(imported.report().columns()), OffsetDateTime.now(), StoredLogSeries.samples(imported.series())));
        return analysis(name, imported.series(), report, request, notes(imported.report()));
    }

    @Override
    public Optional<LogAnalysis> latestKept(LogRequest request) throws Exception {
        List<String> ids = request.ledger().logs().idsForVisit(request.visit().id());
        if (ids.isEmpty()) {
            return Optional.empty();
        }
        ImportedLog log = request.ledger().logs().find(ids.get(ids.size() - 1)).orElseThrow();
        StoredLogSeries stored = StoredLogSeries.of(log.samples(), request.visit().startedAt().getOffset());
        RunCycleReport report = analyse(stored.series(), request);
        String notes = stored.ignored().isEmpty() ? "" : "Not read: " + String.join("; ", stored.ignored()) + ".";
        return Optional.of(analysis(log.sourceFileName(), stored.series(), report, request, notes));
    }

    private static RunCycleReport analyse(LogSeries series, LogRequest request) {
        try {
            return new RunCycleAnalysis(request.thresholds()).analyse(series, request.pressurePa(),
                    request.airflowM3PerS());
        } catch (InvalidInputException e) {
            throw new IllegalArgumentException(e.message(request.units()), e);
        } catch (LogNotAnalysableException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    private static LogAnalysis analysis(String source, LogSeries series, RunCycleReport r, LogRequest request,
                                        String notes) {
        UnitSystem u = request.units();
        return new LogAnalysis(source, summary(r, u), r.findings(), notes,
                LogTimelineSource.timeline(series, r, request.pressurePa(), u, source));
    }

    /** The cycle summary, in the order the {@code log} command prints it. */
    static List<Row> summary(RunCycleReport r, UnitSystem u) {
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("samples", "Samples", Shown.number(r.samples(), 0), ""));
        rows.add(new Row("duration", "Log length", Shown.number(r.durationS() / 3600.0, 1), "h"));
        rows.add(new Row("cycles", "Complete runs", Shown.number(r.cycles().size(), 0), ""));
        rows.add(new Row("cycles-per-hour", "Runs per hour", Shown.number(r.cyclesPerHour(), 2), ""));
        rows.add(new Row("median-on", "Median run", Shown.number(r.medianOnS() / 60, 1), "min"));
        rows.add(new Row("runtime", "Running", Shown.number(100 * r.runtimeFraction(), 0), "%"));
        rows.add(new Row("timed-from", "Runs timed from", r.compressorFromStatus() ? "compressor column"
                : "temperatures", ""));
        String mass = Quantity.WATER_MASS.symbol(u);
        rows.add(new Row("removed", "Water removed", Shown.of(Quantity.WATER_MASS, u, r.removedKg(), 2), mass));
        rows.add(new Row("returned", "Water returned in rests", Shown.of(Quantity.WATER_MASS, u, r.returnedKg(), 2),
                mass));
        rows.add(new Row("net-per-hour", "Net removed", Shown.of(Quantity.WATER_RATE, u, r.netRemovalKgPerS(), 3),
                Quantity.WATER_RATE.symbol(u)));
        rows.add(new Row("latent-measured", "Latent fraction, measured", Shown.number(r.latentFractionMeasured(), 2),
                ""));
        rows.add(new Row("latent-predicted", "Latent fraction, model", Shown.number(r.latentFractionPredicted(), 2),
                ""));
        return rows;
    }

    private static String mapping(Map<String, String> columns) {
        return columns.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining("; "));
    }

    private static String notes(ImportReport rep) {
        List<String> parts = new ArrayList<>();
        parts.add(rep.rowsKept() + " of " + rep.rowsRead() + " rows kept");
        if (rep.rejectedCount() > 0) {
            parts.add(rep.rejectedCount() + " kept out (" + String.join(", ", rep.rejected().subList(0,
                    Math.min(3, rep.rejected().size()))) + (rep.rejectedCount() > 3 ? ", …" : "") + ")");
        }
        if (rep.duplicates() > 0) {
            parts.add(rep.duplicates() + " repeated time(s) dropped");
        }
        if (!rep.ignoredHeaders().isEmpty()) {
            parts.add("not read: " + String.join(", ", rep.ignoredHeaders()));
        }
        return String.join("; ", parts) + ".";
    }
}
