package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Measurand;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Timestamps;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * A visit's data as export rows: every reading with its unit and tolerance, every computed result
 * with its expanded uncertainty, every finding with its evidence and next checks, every logged
 * figure. Values in the chosen display units at full precision (no rounding), so the export can be
 * worked with and checked.
 */
final class VisitDataRows {
    private final VisitEvidence v;
    private final UnitSystem units;
    private final List<DataRow> rows = new ArrayList<>();

    private VisitDataRows(VisitEvidence v, UnitSystem units) {
        this.v = v;
        this.units = units;
    }

    static List<DataRow> of(VisitEvidence v, UnitSystem units) {
        VisitDataRows b = new VisitDataRows(v, units);
        b.visit();
        for (CheckedReadings c : v.readings()) {
            b.readingSet(c);
        }
        for (AnalysedLog l : v.logs()) {
            b.log(l);
        }
        return List.copyOf(b.rows);
    }

    private void visit() {
        String id = v.visit().id();
        info("visit", id, "", "startedAt", "visit date-time", Timestamps.text(v.visit().startedAt()));
        info("visit", id, "", "purpose", "visit purpose", v.visit().purpose().key());
        info("visit", id, "", "technician", "technician", v.visit().technician());
        info("visit", id, "", "notes", "visit notes", v.visit().notes());
        info("visit", id, "", "site", "site", v.site().name() + ", " + v.site().address());
        add("visit", id, "", "info", "siteElevation", "site elevation", Quantity.ELEVATION, v.site().elevationM(),
                Double.NaN, "", "", "");
        info("visit", id, "", "system", "system", v.system().label() + " (" + v.system().type().key() + ")");
        add("visit", id, "", "info", "nominalCapacity", "nominal capacity", Quantity.POWER_LARGE,
                v.system().nominalCapacityW(), Double.NaN, "", "", "");
    }

    private void readingSet(CheckedReadings c) {
        ReadingSet s = c.set();
        String id = s.id();
        String label = s.label();
        info("reading-set", id, label, "takenAt", "taken at", Timestamps.text(s.takenAt()));
        info("reading-set", id, label, "instrument", "instruments", s.instrument());
        temperature(id, label, "returnDryBulb", "return dry bulb", s.returnDryBulb());
        humidity(id, label, "returnHumidity", "return humidity", s.returnHumidity());
        temperature(id, label, "supplyDryBulb", "supply dry bulb", s.supplyDryBulb());
        humidity(id, label, "supplyHumidity", "supply humidity", s.supplyHumidity());
        temperature(id, label, "outdoorDryBulb", "outdoor dry bulb", s.outdoorDryBulb());
        humidity(id, label, "outdoorHumidity", "outdoor humidity", s.outdoorHumidity());
        if (s.coilTemperature() != null) {
            reading(id, label, "coilTemperature", "coil temperature", Quantity.TEMPERATURE, s.coilTemperature().value(),
                    s.coilTemperature().kind().key());
        }
        if (s.airflow() != null) {
            reading(id, label, "airflow", "airflow", Quantity.AIRFLOW, s.airflow().volume(),
                    s.airflow().point().key() + "; " + s.airflow().basis().key()
                            + (s.airflow().method().isEmpty() ? "" : "; " + s.airflow().method()));
        }
        if (s.stationPressurePa() != null) {
            reading(id, label, "stationPressure", "station pressure", Quantity.PRESSURE, s.stationPressurePa(), "measured");
        }
        if (s.condensate() != null) {
            reading(id, label, "condensateVolume", "condensate caught", Quantity.WATER_VOLUME, s.condensate().volume(), "");
            reading(id, label, "condensateTime", "condensate collection time", Quantity.DURATION_MINUTES,
                    s.condensate().seconds(), "");
        }
        info("reading-set", id, label, "notes", "notes", s.notes());
        if (!c.checked()) {
            info("reading-set", id, label, "notWorkedOut", "coil check not worked out", String.join("; ", c.missing()));
            return;
        }
        CoilResult r = c.result();
        add("reading-set", id, label, "result", "verdict", "coil check verdict", null, Double.NaN, Double.NaN, "", "",
                r.verdict().key());
        result(id, label, "pressure", "pressure used", Quantity.PRESSURE, r.readings().pressurePa(), Double.NaN);
        for (Measurand m : Measurand.values()) {
            Estimate e = r.estimate(m);
            if (e.exists()) {
                result(id, label, m.key(), m.label(units), m.quantity(), e.valueSi(), e.expandedSi());
            }
        }
        result(id, label, "massFlowDryAir", "dry-air mass flow", Quantity.WATER_RATE, r.process().massFlowKgPerS(),
                Double.NaN);
        result(id, label, "totalLarge", "total capacity", Quantity.POWER_LARGE, r.process().totalW(), Double.NaN);
        result(id, label, "moistureRemovalDaily", "water removed if it ran all day", Quantity.WATER_RATE_DAILY,
                r.process().moistureRemovalKgPerS(), Double.NaN);
        result(id, label, "airflowPerNominalCapacity", Measurand.AIRFLOW_PER_NOMINAL_CAPACITY.label(units), Quantity.AIRFLOW_PER_CAPACITY,
                r.airflowPerNominalCapacity(), Double.NaN);
        findings("reading-set", id, label, r.findings());
    }

    private void log(AnalysedLog l) {
        String id = l.log().id();
        String label = l.log().sourceFileName();
        info("log", id, label, "samples", "samples stored", Integer.toString(l.log().samples().size()));
        if (!l.analysed()) {
            info("log", id, label, "notAnalysed", "log not analysed", l.refusal());
            return;
        }
        RunCycleReport r = l.report();
        logResult(id, label, "durationMinutes", "log duration", Quantity.DURATION_MINUTES, r.durationS());
        logResult(id, label, "cycles", "complete runs", Quantity.DIMENSIONLESS, r.cycles().size());
        logResult(id, label, "cyclesPerHour", "runs started per hour", Quantity.DIMENSIONLESS, r.cyclesPerHour());
        logResult(id, label, "medianOnTime", "median run time", Quantity.DURATION_MINUTES, r.medianOnS());
        logResult(id, label, "runtimeFraction", "run-time fraction", Quantity.FRACTION_PERCENT, r.runtimeFraction());
        logResult(id, label, "airflow", "airflow used for masses", Quantity.AIRFLOW, r.airflowM3PerS());
        logResult(id, label, "removed", "water removed during runs", Quantity.WATER_MASS, r.removedKg());
        logResult(id, label, "returned", "water returned in blower-on rests", Quantity.WATER_MASS, r.returnedKg());
        logResult(id, label, "netRemovalRate", "net removal rate", Quantity.WATER_RATE, r.netRemovalKgPerS());
        logResult(id, label, "steadyRemovalRate", "steady-state removal rate", Quantity.WATER_RATE,
                r.steadyRemovalKgPerS());
        logResult(id, label, "latentFractionMeasured", "latent fraction delivered, measured", Quantity.FRACTION_PERCENT,
                r.latentFractionMeasured());
        logResult(id, label, "latentFractionPredicted", "latent fraction, part-load model", Quantity.FRACTION_PERCENT,
                r.latentFractionPredicted());
        logResult(id, label, "reevaporationShare", "re-evaporated share", Quantity.FRACTION_PERCENT,
                r.reevaporationShare());
        logResult(id, label, "pressure", "pressure used", Quantity.PRESSURE, l.pressurePa());
        findings("log", id, label, r.findings());
    }

    private void findings(String source, String id, String label, List<Finding> findings) {
        for (Finding f : findings) {
            add(source, id, label, "finding", f.code().key(), f.severity().key(), null, Double.NaN, Double.NaN, "", f.code().key(),
                    f.message());
            add(source, id, label, "technical", f.code().key(), "technical", null, Double.NaN, Double.NaN, "", f.code().key(),
                    f.technical());
            for (Evidence e : f.evidence()) {
                add(source, id, label, "evidence", e.key(), e.label(), e.quantity(), e.valueSi(), e.uncertaintySi(),
                        Double.isNaN(e.uncertaintySi()) ? "" : DataRow.EXPANDED, f.code().key(), "");
            }
            for (String n : f.nextChecks()) {
                add(source, id, label, "next-check", f.code().key(), "next check", null, Double.NaN, Double.NaN, "", f.code().key(), n);
            }
        }
    }

    private void temperature(String id, String label, String key, String name, Measurement m) {
        if (m != null) {
            reading(id, label, key, name, Quantity.TEMPERATURE, m, "dry-bulb");
        }
    }

    private void humidity(String id, String label, String key, String name, HumidityReading h) {
        if (h != null) {
            reading(id, label, key, name, h.kind() == HumidityKind.RELATIVE_HUMIDITY ? Quantity.RELATIVE_HUMIDITY : Quantity.TEMPERATURE,
                    h.value(), h.kind().key());
        }
    }

    private void reading(String id, String label, String key, String name, Quantity q, Measurement m, String text) {
        add("reading-set", id, label, "reading", key, name, q, m.valueSi(), m.toleranceSi(), DataRow.TOLERANCE, "", text);
    }

    private void result(String id, String label, String key, String name, Quantity q, double si, double uSi) {
        add("reading-set", id, label, "result", key, name, q, si, uSi, Double.isNaN(uSi) ? "" : DataRow.EXPANDED, "", "");
    }

    private void logResult(String id, String label, String key, String name, Quantity q, double si) {
        add("log", id, label, "result", key, name, q, si, Double.NaN, "", "", "");
    }

    private void info(String source, String id, String label, String key, String name, String text) {
        add(source, id, label, "info", key, name, null, Double.NaN, Double.NaN, "", "", text);
    }

    private void add(String source, String id, String label, String record, String key, String name, Quantity q,
                     double si, double spreadSi, String spreadKind, String findingCode, String text) {
        double value = q == null || !Double.isFinite(si) ? Double.NaN : q.toDisplay(units, si);
        double spread = q == null || !Double.isFinite(spreadSi) ? Double.NaN : DisplayNumber.spreadQuantity(q).toDisplay(units, spreadSi);
        rows.add(new DataRow(v.visit().id(), source, id, label, record, key, name, value,
                q == null ? "" : q.symbol(units), spread, Double.isNaN(spread) ? "" : spreadKind, findingCode, text));
    }
}
