package app.latentledger.report;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.LogNotAnalysableException;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.core.visit.StoredLogSeries;
import app.latentledger.store.Ledger;

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
            logs.add(analyse(l, v, site, checked, thresholds));
        }
        return new VisitEvidence(v, site, system, checked, logs);
    }

    /**
     * The log at the pressure of the visit's first measured station pressure, else the standard
     * atmosphere at the site (ASHRAE HoF 2017 ch. 1, eq. 3), with the airflow of the visit's last
     * complete reading set: the state the system was left running in while the logger ran.
     */
    static AnalysedLog analyse(ImportedLog l, Visit v, Site site, List<CheckedReadings> checked,
                               ThresholdSettings thresholds) {
        double pressurePa = StandardAtmosphere.pressurePa(site.elevationM());
        for (CheckedReadings c : checked) {
            if (c.set().stationPressurePa() != null) {
                pressurePa = c.set().stationPressurePa().valueSi();
                break;
            }
        }
        double airflow = Double.NaN;
        String from = "";
        for (CheckedReadings c : checked) {
            if (c.set().airflow() != null) {
                airflow = c.set().airflow().volume().valueSi();
                from = c.name();
            }
        }
        StoredLogSeries stored;
        try {
            stored = StoredLogSeries.of(l.samples(), v.startedAt().getOffset());
        } catch (IllegalArgumentException e) {
            return new AnalysedLog(l, null, null, e.getMessage(), List.of(), pressurePa, airflow, from);
        }
        try {
            RunCycleReport r = new RunCycleAnalysis(thresholds).analyse(stored.series(), pressurePa,
                    airflow >= RunCycleAnalysis.MIN_AIRFLOW_M3_PER_S && airflow <= RunCycleAnalysis.MAX_AIRFLOW_M3_PER_S
                            ? airflow : Double.NaN);
            return new AnalysedLog(l, stored.series(), r, "", stored.ignored(), pressurePa, airflow, from);
        } catch (LogNotAnalysableException | InvalidInputException e) {
            return new AnalysedLog(l, stored.series(), null, e.getMessage(), stored.ignored(), pressurePa, airflow, from);
        }
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
