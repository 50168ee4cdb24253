package app.latentledger.report;

import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.Evidence;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.Table;
import app.latentledger.report.pdf.Typeset;

import java.util.List;

/**
 * For the tech and the file: every finding with its technical line, the numbers behind it and the
 * next checks; each stored log's cycle figures and its timeline.
 */
final class TechnicalSection {
    private final ReportData data;
    private final UnitSystem units;
    private final ChartSection charts;

    TechnicalSection(ReportData data, ChartSection charts) {
        this.data = data;
        this.units = data.units();
        this.charts = charts;
    }

    void findings(Typeset t) {
        t.heading("Findings: technical evidence and next checks", 80);
        for (VisitEvidence v : data.visits()) {
            for (CheckedReadings c : v.readings()) {
                String title = c.name() + " (" + PlainWords.time(c.set().takenAt()) + ")"
                        + (data.comparesVisits() ? ", visit of " + PlainWords.date(v.visit().startedAt()) : "");
                if (!c.checked()) {
                    t.subheading(title + ": not worked out", 20);
                    t.paragraph("Lacks " + String.join(", ", c.missing()) + ".", Ink.BODY, 0);
                    continue;
                }
                t.subheading(title + ": coil check says " + c.result().verdict().key(), 40);
                list(t, c.result().findings());
            }
            for (AnalysedLog l : v.logs()) {
                if (l.analysed()) {
                    t.subheading("Logged run " + l.log().sourceFileName(), 40);
                    list(t, l.report().findings());
                }
            }
        }
    }

    private void list(Typeset t, List<Finding> findings) {
        if (findings.isEmpty()) {
            t.paragraph("No findings.", Ink.BODY, 10);
        }
        for (Finding f : findings) {
            t.flow().need(60);
            t.leadIn("[" + f.severity().key() + "] " + f.code().key() + " — ", f.message(), Ink.BODY, 10, t.flow().width() - 10);
            t.gap(1);
            t.leadIn("Technical: ", f.technical(), Ink.BODY.sized(8.8), 10, t.flow().width() - 10);
            t.gap(1);
            if (!f.evidence().isEmpty()) {
                t.paragraph("Evidence (± U, k = 2 where assessed):", Ink.LABEL.emphasised(), 10, t.flow().width() - 10);
                for (Evidence e : f.evidence()) {
                    t.bullet(EvidenceText.of(e, units), Ink.BODY.sized(8.8), 18);
                }
            }
            if (!f.nextChecks().isEmpty()) {
                t.paragraph("Next checks:", Ink.LABEL.emphasised(), 10, t.flow().width() - 10);
                for (String n : f.nextChecks()) {
                    t.bullet(n, Ink.BODY.sized(8.8), 18);
                }
            }
            t.gap(5);
        }
    }

    void logs(Typeset t) {
        for (VisitEvidence v : data.visits()) {
            for (AnalysedLog l : v.logs()) {
                t.heading("Logged run: " + l.log().sourceFileName(), 120);
                if (!l.analysed()) {
                    t.paragraph("This log could not be analysed: " + l.refusal(), Ink.BODY, 0);
                    continue;
                }
                figures(l).draw(t);
                if (!l.ignored().isEmpty()) {
                    t.paragraph("Channels not read: " + String.join("; ", l.ignored()) + ".", Ink.SMALL, 0);
                }
                charts.timeline(t, l);
            }
        }
    }

    private static final String MORE_RETURNED = "more put back than removed";

    private Table figures(AnalysedLog l) {
        RunCycleReport r = l.report();
        Table tb = new Table(new String[] {"Logged figure", "Value"}, new double[] {1.6, 2.4}, new boolean[] {false, false});
        tb.row("Samples", r.samples() + " over " + DisplayNumber.number(r.durationS() / 3600.0, 1) + " h, every "
                + DisplayNumber.number(l.series().nominalIntervalS(), 0) + " s (median)");
        tb.row("Runs found", r.cycles().size() + (r.compressorFromStatus() ? " (timed from the compressor column)"
                : " (inferred from the supply temperature)"));
        tb.row("Cycles per hour", DisplayNumber.number(r.cyclesPerHour(), 2));
        tb.row("Median run time", DisplayNumber.withUnit(Quantity.DURATION_MINUTES, units, r.medianOnS()));
        tb.row("Run-time fraction", DisplayNumber.withUnit(Quantity.FRACTION_PERCENT, units, r.runtimeFraction()));
        tb.row("Airflow used for masses", Double.isFinite(r.airflowM3PerS())
                ? DisplayNumber.withUnit(Quantity.AIRFLOW, units, r.airflowM3PerS()) + " (" + l.airflowFrom() + ")"
                : "none: masses not worked out");
        if (Double.isFinite(r.fanAirflowM3PerS()) && r.fanAirflowM3PerS() != r.airflowM3PerS()) {
            tb.row("Fan-only airflow used in rests", DisplayNumber.withUnit(Quantity.AIRFLOW, units, r.fanAirflowM3PerS()));
        }
        if (!l.note().isEmpty()) {
            tb.row("Note", l.note());
        }
        tb.row("Blower state in rests", r.blowerInferred() ? "inferred from the air" : "from the blower column");
        tb.row("Blower left on through the rest", app.latentledger.core.cycles.RestBlower.ofRests(
                r.blowerLeftOnRests(), r.cycles().size()));
        tb.row("Fan-off delay (blower ran on, then stopped)", r.fanOffDelayWords());
        tb.row("Water removed during runs", DisplayNumber.withUnit(Quantity.WATER_MASS, units, r.removedKg()));
        tb.row("Water returned in blower-on rests", DisplayNumber.withUnit(Quantity.WATER_MASS, units, r.returnedKg()));
        tb.row("Net removal rate over the log", DisplayNumber.withUnit(Quantity.WATER_RATE, units, r.netRemovalKgPerS()));
        tb.row("Steady-state removal rate", DisplayNumber.withUnit(Quantity.WATER_RATE, units, r.steadyRemovalKgPerS()));
        tb.row("Latent fraction delivered, measured", r.latentMeasured().percent(MORE_RETURNED));
        tb.row("Latent fraction, expected for these runs (part-load model)", r.latentPredicted().percent(MORE_RETURNED));
        tb.row("Re-evaporated share", r.reevaporation().percent(RunCycleReport.NONE_RETURNED));
        if (r.house() != null) {
            tb.row("House dew point, median / 95th percentile", DisplayNumber.withUnit(Quantity.TEMPERATURE, units,
                    r.house().dewPointMedianC()) + " / " + DisplayNumber.withUnit(Quantity.TEMPERATURE, units,
                    r.house().dewPointP95C()));
            tb.row("House RH, median / 95th percentile", DisplayNumber.number(r.house().rhMedianPct(), 0) + " / "
                    + DisplayNumber.number(r.house().rhP95Pct(), 0) + " %");
        }
        if (r.loadLine() != null) {
            tb.row("Runtime in the hottest logged hours", DisplayNumber.number(100 * r.loadLine().hotRuntimeFraction(), 0)
                    + " ± " + DisplayNumber.number(100 * r.loadLine().hotRuntimeU(), 0) + " % over "
                    + r.loadLine().hotHours() + " h");
        }
        tb.row("Pressure used", DisplayNumber.withUnit(Quantity.PRESSURE, units, l.pressurePa()));
        return tb;
    }
}
