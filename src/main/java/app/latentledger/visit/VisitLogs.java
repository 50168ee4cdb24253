package app.latentledger.visit;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.LogNotAnalysableException;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.LogConditions;
import app.latentledger.core.visit.StoredLogSeries;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.io.logcsv.ImportProgress;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.io.logcsv.LogRefusedException;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The one way a log goes from a file to findings, for the app, the report and the command line: read
 * it ({@link LogCsvImporter}), pick its conditions ({@link LogConditions}), analyse it
 * ({@link RunCycleAnalysis}), keep it with the visit together with the airflows and clock zone it was
 * read with, and read a kept log back with those same conditions, so its figures never change
 * silently when a later reading set brings another airflow.
 */
public final class VisitLogs {
    /** Sentence shown with a log kept before airflows were stored with logs. */
    public static final String LEGACY_NOTE = "This log was kept before airflows were stored with logs: the visit's"
            + " latest airflow is used.";

    private VisitLogs() {
    }

    /**
     * How to read a file.
     *
     * @param units       temperature unit of columns whose headers state none; also the units of messages
     * @param headerMap   another logger's header → generic field name
     * @param dateOrder   how dates that are not ISO-8601 are read
     * @param zone        zone the tech chose for clock times without a UTC offset; null: none chosen
     *                    (a visit's log is then read in its site's zone, else in {@code machineZone})
     * @param machineZone this machine's zone (null: {@link ZoneId#systemDefault()}); given by tests
     */
    public record ReadOptions(UnitSystem units, Map<String, String> headerMap, DateOrder dateOrder, ZoneId zone,
                              ZoneId machineZone) {
        public ReadOptions {
            headerMap = Map.copyOf(headerMap);
            dateOrder = dateOrder == null ? DateOrder.AUTO : dateOrder;
            machineZone = machineZone == null ? ZoneId.systemDefault() : machineZone;
        }

        /** Read in the zone chosen, else in this machine's zone. */
        public ReadOptions(UnitSystem units, Map<String, String> headerMap, DateOrder dateOrder, ZoneId zone) {
            this(units, headerMap, dateOrder, zone, null);
        }

        ReadOptions withZone(ZoneId z) {
            return new ReadOptions(units, headerMap, dateOrder, z, machineZone);
        }
    }

    /**
     * The zone a log's clock times without a UTC offset are read in, and why.
     *
     * @param zone the zone
     * @param from where it came from
     */
    public record ClockZone(ZoneId zone, From from) {
        /** Where the zone came from: chosen for this import, the visit's site, or this machine. */
        public enum From { CHOSEN, SITE, MACHINE }

        /**
         * "the site's zone America/Chicago", "this tablet's zone Europe/Lisbon", "the zone chosen,
         * -05:00".
         *
         * @param machine what the machine is called where this is shown, e.g. "tablet"
         */
        public String words(String machine) {
            return switch (from) {
                case CHOSEN -> "the zone chosen, " + zone.getId();
                case SITE -> "the site's zone " + zone.getId();
                case MACHINE -> "this " + machine + "'s zone " + zone.getId();
            };
        }
    }

    /** The one rule for a visit's log: the zone chosen, else the site's zone, else this machine's. */
    public static ClockZone clockZone(Site site, ZoneId chosen, ZoneId machine) {
        if (chosen != null) {
            return new ClockZone(chosen, ClockZone.From.CHOSEN);
        }
        if (site != null && site.zone().isPresent()) {
            return new ClockZone(site.zone().get(), ClockZone.From.SITE);
        }
        return new ClockZone(machine == null ? ZoneId.systemDefault() : machine, ClockZone.From.MACHINE);
    }

    /** {@link #clockZone(Site, ZoneId, ZoneId)} for the visit's site and the options' zones. */
    public static ClockZone clockZone(Ledger ledger, Visit visit, ReadOptions o) {
        return clockZone(ledger.sites().find(visit.siteId()).orElse(null), o.zone(), o.machineZone());
    }

    /**
     * Reads a file.
     *
     * @throws LogProblem when it cannot be read or is refused, with the reason
     */
    public static LogImport read(Path file, ReadOptions o, ImportProgress progress) throws LogProblem {
        try {
            ZoneId zone = o.zone() == null ? o.machineZone() : o.zone();
            return new LogCsvImporter(o.units(), o.headerMap(), o.dateOrder(), zone, progress).read(file);
        } catch (NoSuchFileException e) {
            throw new LogProblem("no such file: " + file, e);
        } catch (IOException e) {
            throw new LogProblem("cannot read " + file + ": " + e.getMessage(), e);
        } catch (LogRefusedException e) {
            throw new LogProblem(file.getFileName() + " refused: " + e.getMessage(), e);
        }
    }

    /** Analyses a series at the given conditions; a log the analysis cannot use comes back with its refusal. */
    public static VisitLog analyse(String logId, String source, LogSeries series, LogConditions c, ThresholdSettings t,
                                   UnitSystem units, LogImport imported, List<String> ignored, String note) {
        try {
            RunCycleReport r = new RunCycleAnalysis(t).analyse(series, c.pressurePa(), c.airflowM3PerS(),
                    c.fanAirflowM3PerS());
            return new VisitLog(logId, source, series, r, c, imported == null ? null : imported.report(), ignored, "",
                    joined(note, c, units));
        } catch (LogNotAnalysableException e) {
            return new VisitLog(logId, source, series, null, c, imported == null ? null : imported.report(), ignored,
                    e.getMessage(), joined(note, c, units));
        } catch (InvalidInputException e) {
            return new VisitLog(logId, source, series, null, c, imported == null ? null : imported.report(), ignored,
                    e.message(units), joined(note, c, units));
        }
    }

    private static String joined(String note, LogConditions c, UnitSystem units) {
        String refused = c.refused() ? "Airflow not used: " + c.refusal().message(units)
                + "; water figures are given without masses." : "";
        return (note + " " + refused).strip();
    }

    /**
     * Reads, analyses and keeps a log with the visit, with the airflows it was analysed at and the
     * zone its clock was read in ({@link #clockZone(Ledger, Visit, ReadOptions)}: the zone chosen,
     * else the site's, else this machine's). A log that does not analyse is not kept (nothing half-kept reaches
     * the visit's report).
     *
     * @param typedAirflow    airflow the tech gave, m³/s (NaN: none); used when no reading set has one
     * @param fanAirflow      fan-only airflow the tech gave, m³/s (NaN: same as during runs)
     * @throws LogProblem when the file is refused or the log cannot be analysed
     */
    public static VisitLog importAndKeep(Ledger ledger, Visit visit, Path file, ReadOptions o, double typedAirflow,
                                         double fanAirflow, ThresholdSettings t, ImportProgress progress)
            throws LogProblem {
        // clock times without an offset: the zone chosen, else the site's, else this machine's
        LogImport imported = read(file, o.withZone(clockZone(ledger, visit, o).zone()), progress);
        LogConditions c = visitConditions(ledger, visit, typedAirflow, fanAirflow);
        String name = file.getFileName().toString();
        String id = Ids.newId();
        VisitLog a = analyse(id, name, imported.series(), c, t, o.units(), imported, List.of(), "");
        if (!a.analysed()) {
            throw new LogProblem(name + " was read but cannot be analysed: " + a.refusal(), null);
        }
        ledger.logs().save(new ImportedLog(id, visit.id(), name, mapping(imported.report().columns()),
                OffsetDateTime.now(), StoredLogSeries.samples(imported.series()),
                new ImportedLog.KeptConditions(c.airflowM3PerS(), c.airflowFrom(), c.fanAirflowM3PerS(),
                        zoneOf(imported.series().origin(), imported.report().timeZone()))));
        return a;
    }

    /** A kept log read back and analysed with what it was kept with (or the visit's, for an older log). */
    public static VisitLog analyseKept(Ledger ledger, ImportedLog log, ThresholdSettings t, UnitSystem units) {
        Visit v = ledger.visits().find(log.visitId()).orElseThrow();
        ImportedLog.KeptConditions k = log.kept();
        LogConditions visitRule = visitConditions(ledger, v, Double.NaN, Double.NaN);
        LogConditions c = k == null ? visitRule : LogConditions.checked(visitRule.pressurePa(),
                visitRule.pressureFrom(), k.airflowM3PerS(), k.airflowFrom(), k.fanAirflowM3PerS());
        StoredLogSeries stored;
        try {
            stored = StoredLogSeries.of(log.samples(), shownAt(log, v));
        } catch (IllegalArgumentException e) {
            return new VisitLog(log.id(), log.sourceFileName(), null, null, c, null, List.of(), e.getMessage(), "");
        }
        return analyse(log.id(), log.sourceFileName(), stored.series(), c, t, units, null, stored.ignored(),
                k == null ? LEGACY_NOTE : "");
    }

    /** The visit's kept logs, in import order. */
    public static List<ImportedLog> kept(Ledger ledger, String visitId) {
        return ledger.logs().forVisit(visitId);
    }

    /** The visit's conditions for a log: its reading sets' pressure and latest airflow, else the ones given. */
    public static LogConditions visitConditions(Ledger ledger, Visit v, double typedAirflow, double fanAirflow) {
        Site site = ledger.sites().find(v.siteId()).orElseThrow();
        List<ReadingSet> sets = ledger.readings().forVisit(v.id());
        return LogConditions.of(sets, site, typedAirflow, fanAirflow, VisitLogs::setName);
    }

    /** A reading set as the tech knows it: its label, else "Readings HH:MM". */
    public static String setName(ReadingSet set) {
        if (!set.label().isEmpty()) {
            return set.label().substring(0, 1).toUpperCase(java.util.Locale.ROOT) + set.label().substring(1);
        }
        return "Readings " + set.takenAt().toLocalTime().withSecond(0);
    }

    /** The zone a kept log's clock is shown in: the zone it was read in, else its file's own offset. */
    static String zoneOf(TimeOrigin origin, String readZone) {
        if (origin == null) {
            return "";
        }
        if (!readZone.isEmpty()) {
            return readZone;
        }
        return origin.hasOffset() ? ZoneOffset.ofTotalSeconds(origin.offsetSeconds()).getId() : "";
    }

    private static ZoneOffset shownAt(ImportedLog log, Visit v) {
        ImportedLog.KeptConditions k = log.kept();
        if (k == null) {
            return v.startedAt().getOffset();
        }
        if (k.timeZone().isEmpty() || log.samples().size() == 0) {
            return null;
        }
        return ZoneId.of(k.timeZone()).getRules().getOffset(Instant.ofEpochMilli(log.samples().timesMs()[0]));
    }

    private static String mapping(Map<String, String> columns) {
        return columns.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining("; "));
    }
}
