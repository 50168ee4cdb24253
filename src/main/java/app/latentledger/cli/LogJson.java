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
        model.put("source", r.model().source());
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
        m.put("import", imp);
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

    private static Double mass(double kg, UnitSystem units) {
        return finite(Quantity.WATER_MASS.toDisplay(units, kg));
    }

    static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
