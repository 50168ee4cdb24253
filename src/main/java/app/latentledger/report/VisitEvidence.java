package app.latentledger.report;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.Ledger;
import app.latentledger.visit.VisitLog;
import app.latentledger.visit.VisitLogs;

import java.util.ArrayList;
import java.util.List;

/**
 * One visit with everything the report and the data export show: its site and system, each reading
 * set with its coil check, each stored log with its cycle analysis. Computed once, here, with the
 * default thresholds, so the PDF and the CSV/JSON export cannot disagree.
 */
public record VisitEvidence(Visit visit, Site site, HvacSystem system, List<CheckedReadings> readings,
                            List<AnalysedLog> logs) {
    public VisitEvidence {
        readings = List.copyOf(readings);
        logs = List.copyOf(logs);
    }

    /**
     * @throws ReportRefusedException when there is no visit with this id
     */
    public static VisitEvidence load(Ledger ledger, String visitId, UnitSystem units) {
        Visit v = ledger.visits().find(visitId)
                .orElseThrow(() -> new ReportRefusedException("no visit with id '" + visitId + "'"));
        Site site = ledger.sites().find(v.siteId()).orElseThrow();
        HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
        // the tech's stored thresholds, so the report finds what the app showed on site
        ThresholdSettings thresholds = ledger.settings().load().thresholds();
        List<CheckedReadings> checked = new ArrayList<>();
        for (ReadingSet rs : ledger.readings().forVisit(v.id())) {
            List<String> missing = ReadingSetCheck.missing(rs);
            if (!missing.isEmpty()) {
                checked.add(new CheckedReadings(rs, null, missing));
                continue;
            }
            try {
                checked.add(new CheckedReadings(rs, ReadingSetCheck.run(rs, system, site, thresholds, units), List.of()));
            } catch (InvalidInputException e) {
                // readings the core refuses (e.g. a wet bulb above its dry bulb) are shown, not worked out
                checked.add(new CheckedReadings(rs, null, List.of(e.message(units))));
            }
        }
        List<AnalysedLog> logs = new ArrayList<>();
        for (ImportedLog l : ledger.logs().forVisit(v.id())) {
            logs.add(analyse(ledger, l, thresholds, units));
        }
        return new VisitEvidence(v, site, system, checked, logs);
    }

    /**
     * The log as every face analyses it ({@link VisitLogs#analyseKept}): at the visit's pressure rule
     * and with the airflows it was kept with (a log kept before those were stored uses the visit's
     * latest airflow, and says so). An airflow out of range is refused the same way everywhere: the
     * log is analysed without masses and the reason is given.
     */
    static AnalysedLog analyse(Ledger ledger, ImportedLog l, ThresholdSettings thresholds, UnitSystem units) {
        VisitLog a = VisitLogs.analyseKept(ledger, l, thresholds, units);
        return new AnalysedLog(l, a.series(), a.report(), a.refusal(), a.ignored(), a.conditions().pressurePa(),
                a.conditions().airflowM3PerS(), a.conditions().airflowFrom(), a.note());
    }

    /** The complete reading sets, in the order taken. */
    public List<CheckedReadings> checkedReadings() {
        return readings.stream().filter(CheckedReadings::checked).toList();
    }

    /** The first analysed log, or null. */
    public AnalysedLog firstAnalysedLog() {
        return logs.stream().filter(AnalysedLog::analysed).findFirst().orElse(null);
    }
}
