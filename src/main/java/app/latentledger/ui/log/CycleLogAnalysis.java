package app.latentledger.ui.log;

import app.latentledger.chart.source.LogTimelineSource;
import app.latentledger.core.cycles.HouseHumidity;
import app.latentledger.core.cycles.LoadLine;
import app.latentledger.core.cycles.RestBlower;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.units.Ratio;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.ImportProgress;
import app.latentledger.io.logcsv.ImportReport;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.present.Shown;
import app.latentledger.ui.session.LogAnalysis;
import app.latentledger.ui.session.LogAnalysisService;
import app.latentledger.ui.session.LogRequest;
import app.latentledger.visit.LogProblem;
import app.latentledger.visit.VisitLog;
import app.latentledger.visit.VisitLogs;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The log analysis the app ships with: the steps of {@link VisitLogs}, the same service the report
 * and the {@code log} command call (read in the visit's units with the tech's header map, date order
 * and zone; analysed at the visit's conditions; kept with the visit with the airflows it was analysed
 * at), then the timeline through {@link LogTimelineSource} from the series the analysis used.
 */
public final class CycleLogAnalysis implements LogAnalysisService {
    @Override
    public boolean wired() {
        return true;
    }

    @Override
    public LogAnalysis importAndAnalyse(LogRequest request, Path file, ImportProgress progress) throws Exception {
        VisitLog a;
        try {
            a = VisitLogs.importAndKeep(request.ledger(), request.visit(), file, options(request),
                    request.airflowM3PerS(), request.fanAirflowM3PerS(), request.thresholds(), progress);
        } catch (LogProblem e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
        return analysis(a, request.units(), notes(a.importReport(),
                VisitLogs.clockZone(request.ledger(), request.visit(), options(request))));
    }

    @Override
    public Optional<LogAnalysis> latestKept(LogRequest request) throws Exception {
        List<String> ids = request.ledger().logs().idsForVisit(request.visit().id());
        return ids.isEmpty() ? Optional.empty() : kept(request, ids.get(ids.size() - 1));
    }

    @Override
    public Optional<LogAnalysis> kept(LogRequest request, String logId) throws Exception {
        Optional<ImportedLog> log = request.ledger().logs().find(logId)
                .filter(l -> l.visitId().equals(request.visit().id()));
        if (log.isEmpty()) {
            return Optional.empty();
        }
        VisitLog a = VisitLogs.analyseKept(request.ledger(), log.get(), request.thresholds(), request.units());
        if (!a.analysed()) {
            throw new IllegalArgumentException(a.refusal());
        }
        String notes = a.ignored().isEmpty() ? "" : "Not read: " + String.join("; ", a.ignored()) + ".";
        return Optional.of(analysis(a, request.units(), notes));
    }

    private static VisitLogs.ReadOptions options(LogRequest r) {
        return new VisitLogs.ReadOptions(r.units(), r.headerMap(), r.dateOrder(), r.zone());
    }

    private static LogAnalysis analysis(VisitLog a, UnitSystem u, String notes) {
        String all = (notes + " " + a.note()).strip();
        return new LogAnalysis(a.source(), summary(a.report(), u), a.report().findings(), all,
                LogTimelineSource.timeline(a.series(), a.report(), a.conditions().pressurePa(), u, a.source()),
                a.logId());
    }

    private static final String MORE_RETURNED = "more put back than removed";

    /** The cycle summary, in the order the {@code log} command prints it. */
    public static List<Row> summary(RunCycleReport r, UnitSystem u) {
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
        rows.add(new Row("returned-share", "Share returned", r.reevaporation().percent(RunCycleReport.NONE_RETURNED), ""));
        rows.add(new Row("blower-from", "Blower state from", r.blowerInferred() ? "the air (inferred)"
                : "blower column", ""));
        // the same counts as the findings and the log command's cycle table (RestBlower): the blower left
        // on through a rest (continuous fan) is not a fan-off delay (it ran on and stopped by itself)
        rows.add(new Row("blower-left-on", "Blower left on in rests",
                RestBlower.ofRests(r.blowerLeftOnRests(), r.cycles().size()), ""));
        rows.add(new Row("fan-off-delay", "Fan-off delay", r.fanOffDelayWords(), ""));
        rows.add(new Row("latent-measured", "Latent fraction, measured", r.latentMeasured().number(2, MORE_RETURNED),
                ""));
        rows.add(new Row("latent-predicted", "Latent fraction, expected for these runs", r.latentPredicted().number(2, MORE_RETURNED),
                ""));
        if (r.house() != null) {
            HouseHumidity h = r.house();
            rows.add(new Row("house-dew-point", "House dew point, median / p95",
                    Shown.of(Quantity.TEMPERATURE, u, h.dewPointMedianC(), 1) + " / "
                            + Shown.of(Quantity.TEMPERATURE, u, h.dewPointP95C(), 1), Quantity.TEMPERATURE.symbol(u)));
            rows.add(new Row("house-rh", "House RH, median / p95", Shown.number(h.rhMedianPct(), 0) + " / "
                    + Shown.number(h.rhP95Pct(), 0), "%"));
            rows.add(new Row("house-rh-hours", "Hours above RH target", Shown.number(h.hoursAboveRhTarget(), 1), "h"));
            // a change with its sign, so a falling trend is not read as a "negative rise"
            rows.add(new Row("house-off-trend", "Humidity change while off", h.longOffPeriods() == 0
                    ? Ratio.NOT_MEASURABLE + " (no long off period)"
                    : Double.isFinite(h.offTrendPerHour()) ? app.latentledger.core.units.DisplayNumber.signed(
                            Quantity.HUMIDITY_RATIO_FINE.toDisplay(u, h.offTrendPerHour()), 2)
                    : Shown.of(Quantity.HUMIDITY_RATIO_FINE, u, h.offTrendPerHour(), 2),
                    h.longOffPeriods() == 0 ? "" : Quantity.HUMIDITY_RATIO_FINE.symbol(u) + " per h"));
        }
        if (r.loadLine() != null) {
            LoadLine l = r.loadLine();
            rows.add(new Row("hot-runtime", "Running in the hottest hours", Shown.number(100 * l.hotRuntimeFraction(), 0)
                    + " ± " + Shown.number(100 * l.hotRuntimeU(), 0), "%"));
            rows.add(new Row("continuous-at", "Would run continuously at", Double.isNaN(l.continuousC())
                    ? Ratio.NOT_MEASURABLE + " (no line fitted)" : Shown.of(Quantity.TEMPERATURE, u, l.continuousC(), 1),
                    Double.isNaN(l.continuousC()) ? "" : Quantity.TEMPERATURE.symbol(u)));
        }
        return rows;
    }

    /** What the import noticed; {@code zone}: where the zone of clock times without an offset came from. */
    static String notes(ImportReport rep, VisitLogs.ClockZone zone) {
        List<String> parts = new ArrayList<>();
        parts.add(rep.rowsKept() + " of " + rep.rowsRead() + " rows kept");
        parts.add("temperatures in " + rep.temperatureUnitText());
        if (rep.dateOrder() != null) {
            parts.add("dates read as " + rep.dateOrder().key());
        }
        if (!rep.timeZone().isEmpty()) {
            parts.add("clock times read in " + (zone.zone().getId().equals(rep.timeZone()) ? zone.words("tablet")
                    : rep.timeZone()));
        }
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
