package app.latentledger.cli;

import app.latentledger.core.cycles.CycleResult;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.ImportReport;
import app.latentledger.io.logcsv.LogImport;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The {@code log --json} object, in the tech's units: moisture in lb (ip) or kg (si), rates per
 * hour, fractions 0–1, times in seconds or minutes as the key says. null = not computable.
 */
final class LogJson {
    private LogJson() {
    }

    static Map<String, Object> of(Path file, LogImport imported, RunCycleReport r, UnitSystem units) {
        Map<String, Object> m = new LinkedHashMap<>();
        ImportReport rep = imported.report();
        TimeOrigin origin = imported.series().origin();
        m.put("units", units.key());
        m.put("file", file.getFileName().toString());
        m.put("samples", r.samples());
        m.put("durationHours", r.durationS() / 3600.0);
        m.put("sampleIntervalSeconds", rep.medianIntervalS());
        m.put("compressorFrom", r.compressorFromStatus() ? "status column" : "temperatures");
        m.put("moistureUnit", Quantity.WATER_MASS.symbol(units));
        List<Map<String, Object>> cycles = new ArrayList<>();
        for (CycleResult c : r.cycles()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("start", origin == null ? (Object) c.cycle().startS() : origin.label(c.cycle().startS()));
            x.put("startSeconds", c.cycle().startS());
            x.put("onSeconds", c.cycle().onSeconds());
            x.put("offSeconds", c.cycle().offSeconds());
            x.put("offComplete", c.cycle().offComplete());
            x.put("offBlower", c.cycle().offBlower().key());
            x.put("blowerOnSeconds", finite(c.cycle().blowerOnSeconds()));
            // left-on (continuous fan), ran-on (fan-off delay), off or unknown: the table's words as a key
            x.put("blowerInRest", app.latentledger.core.cycles.RestBlower.of(c.cycle()).key());
            x.put("moistureRemoved", mass(c.removedKg(), units));
            x.put("moistureReturned", mass(c.returnedKg(), units));
            x.put("moistureNet", mass(c.netKg(), units));
            x.put("onsetSeconds", finite(c.moisture().onsetS()));
            x.put("coilWet", c.moisture().wet());
            x.put("latentFractionMeasured", finite(c.measuredFraction()));
            x.put("latentFractionPredicted", finite(c.predictedFraction()));
            cycles.add(x);
        }
        m.put("cycles", cycles);
        m.put("cyclesPerHour", finite(r.cyclesPerHour()));
        m.put("medianOnMinutes", finite(r.medianOnS() / 60.0));
        m.put("runtimeFraction", finite(r.runtimeFraction()));
        m.put("airflow", finite(Quantity.AIRFLOW.toDisplay(units, r.airflowM3PerS())));
        m.put("moistureRemoved", mass(r.removedKg(), units));
        m.put("moistureReturned", mass(r.returnedKg(), units));
        m.put("moistureRemovedPerHour", finite(Quantity.WATER_RATE.toDisplay(units, r.netRemovalKgPerS())));
        // the issue asks for "unknown" when no run is long enough to give a steady rate
        Double steady = finite(Quantity.WATER_RATE.toDisplay(units, r.steadyRemovalKgPerS()));
        m.put("steadyLatentRate", steady != null ? (Object) steady
                : Double.isNaN(r.steadyDryingW()) ? "unknown" : null);
        m.put("waterRateUnit", Quantity.WATER_RATE.symbol(units));
        m.put("steadyHumidityRatioDrop", finite(Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, r.steadyDryingW())));
        m.put("latentFractionMeasured", finite(r.latentFractionMeasured()));
        m.put("latentFractionPredicted", finite(r.latentFractionPredicted()));
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("twetSeconds", r.model().twetS());
        model.put("gamma", r.model().gamma());
        model.put("tauSeconds", r.model().tauS());
        model.put("nMaxPerHour", r.model().nMaxPerHour());
        model.put("source", r.model().source().key());
        model.put("fittedRests", r.fitRests());
        model.put("reference", "Henderson & Rengarajan 1996, ASHRAE Transactions 102(1) 266-274 (EnergyPlus form)");
        m.put("modelParameters", model);
        m.put("reevaporationShare", finite(r.reevaporationShare()));
        m.put("sensorOffsetRh", finite(r.sensorOffsetRhPct()));
        m.put("supplyRhCorrection", r.supplyCorrectionRhPct() == 0 ? null : -r.supplyCorrectionRhPct());
        Map<String, Object> rejected = new LinkedHashMap<>();
        rejected.put("count", rep.rejectedCount());
        rejected.put("lines", rep.rejected());
        m.put("rejectedRows", rejected);
        Map<String, Object> imp = new LinkedHashMap<>();
        imp.put("rowsRead", rep.rowsRead());
        imp.put("rowsKept", rep.rowsKept());
        imp.put("delimiter", String.valueOf(rep.delimiter()));
        imp.put("decimalComma", rep.decimalComma());
        imp.put("timeField", rep.timeField());
        imp.put("timesHaveOffset", rep.timesHaveOffset());
        imp.put("columns", rep.columns());
        imp.put("ignoredHeaders", rep.ignoredHeaders());
        imp.put("outOfOrder", rep.outOfOrder());
        imp.put("duplicates", rep.duplicates());
        imp.put("gaps", rep.gaps());
        imp.put("longestGapSeconds", rep.longestGapS());
        imp.put("irregularIntervals", rep.irregularIntervals());
        imp.put("temperatureUnit", Quantity.TEMPERATURE.symbol(rep.temperatureUnit()));
        imp.put("temperatureUnitFrom", rep.unitFromHeader() ? "header" : "settings");
        imp.put("dateOrder", rep.dateOrder() == null ? null : rep.dateOrder().key());
        imp.put("timeZone", rep.timeZone().isEmpty() ? null : rep.timeZone());
        m.put("import", imp);
        // added with blower-state inference, fan-only airflow, the house's humidity and the load line
        m.put("fanAirflow", finite(Quantity.AIRFLOW.toDisplay(units, r.fanAirflowM3PerS())));
        m.put("blowerFrom", r.blowerInferred() ? "inferred from the air" : "status column");
        m.put("fanOffDelaySeconds", finite(r.fanOffDelayMedianS()));
        m.put("fanOffDelayRests", r.fanOffDelayRests());
        m.put("blowerLeftOnRests", r.blowerLeftOnRests());
        m.put("reevaporationShareText", r.reevaporation().percent(RunCycleReport.NONE_RETURNED));
        m.put("latentFractionMeasuredText", r.latentMeasured().number(2, "more put back than removed"));
        m.put("sensorOffsetDewPoint", finite(Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, r.sensorOffsetDewPointK())));
        m.put("sensorCheckMinutes", r.sensorCheckSeconds() / 60.0);
        m.put("house", house(r.house(), units));
        m.put("loadLine", load(r.loadLine(), units));
        m.put("findings", findings(r.findings(), units));
        m.put("safety", Cautions.SAFETY_LINE);
        return m;
    }

    static List<Map<String, Object>> findings(List<Finding> findings, UnitSystem units) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (Finding f : findings) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("code", f.code().key());
            x.put("severity", f.severity().key());
            x.put("message", f.message());
            x.put("technical", f.technical());
            List<Map<String, Object>> ev = new ArrayList<>();
            for (Evidence e : f.evidence()) {
                Map<String, Object> y = new LinkedHashMap<>();
                y.put("key", e.key());
                y.put("label", e.label());
                y.put("value", finite(e.quantity().toDisplay(units, e.valueSi())));
                y.put("unit", e.quantity().symbol(units));
                y.put("uncertainty", finite(e.quantity() == Quantity.TEMPERATURE ? Double.NaN
                        : e.quantity().toDisplay(units, e.uncertaintySi())));
                ev.add(y);
            }
            x.put("evidence", ev);
            x.put("nextChecks", f.nextChecks());
            out.add(x);
        }
        return out;
    }

    private static Map<String, Object> house(app.latentledger.core.cycles.HouseHumidity h, UnitSystem units) {
        if (h == null) {
            return null;
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("dewPointMedian", temp(h.dewPointMedianC(), units));
        m.put("dewPointP95", temp(h.dewPointP95C(), units));
        m.put("dewPointMax", temp(h.dewPointMaxC(), units));
        m.put("rhMedian", finite(h.rhMedianPct()));
        m.put("rhP95", finite(h.rhP95Pct()));
        m.put("rhMax", finite(h.rhMaxPct()));
        m.put("hoursAboveRhTarget", h.hoursAboveRhTarget());
        m.put("hoursAboveDewPointBenchmark", h.hoursAboveDewPoint());
        m.put("offTrendPerHour", finite(Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, h.offTrendPerHour())));
        m.put("offTrendUnit", Quantity.HUMIDITY_RATIO_FINE.symbol(units) + " per hour");
        m.put("longOffPeriods", h.longOffPeriods());
        m.put("longOffHours", h.longOffHours());
        m.put("outdoorDewPointMedian", temp(h.outdoorDewPointMedianC(), units));
        m.put("indoorMinusOutdoorDewPoint", finite(Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units,
                h.indoorMinusOutdoorDewPointK())));
        m.put("temperatureUnit", Quantity.TEMPERATURE.symbol(units));
        return m;
    }

    private static Map<String, Object> load(app.latentledger.core.cycles.LoadLine l, UnitSystem units) {
        if (l == null) {
            return null;
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("hours", l.hours());
        List<Map<String, Object>> bins = new ArrayList<>();
        for (app.latentledger.core.cycles.LoadLine.Bin b : l.bins()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("from", temp(b.fromC(), units));
            x.put("to", temp(b.toC(), units));
            x.put("hours", b.hours());
            x.put("runtimeFraction", b.runtimeFraction());
            bins.add(x);
        }
        m.put("bins", bins);
        m.put("runtimeFractionPerDegree", finite(l.slopePerK() / Quantity.TEMPERATURE_DIFFERENCE.toDisplay(units, 1.0)));
        m.put("balanceTemperature", temp(l.balanceC(), units));
        m.put("continuousRunTemperature", temp(l.continuousC(), units));
        m.put("hottestHoursOutdoor", temp(l.hotOutdoorC(), units));
        m.put("hottestHoursRuntimeFraction", finite(l.hotRuntimeFraction()));
        m.put("hottestHoursRuntimeUncertainty", finite(l.hotRuntimeU()));
        m.put("hottestHours", l.hotHours());
        m.put("temperatureUnit", Quantity.TEMPERATURE.symbol(units));
        return m;
    }

    private static Double temp(double c, UnitSystem units) {
        return finite(Quantity.TEMPERATURE.toDisplay(units, c));
    }

    private static Double mass(double kg, UnitSystem units) {
        return finite(Quantity.WATER_MASS.toDisplay(units, kg));
    }

    static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
