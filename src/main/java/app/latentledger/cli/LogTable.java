package app.latentledger.cli;

import app.latentledger.core.cycles.CycleResult;
import app.latentledger.core.cycles.RestBlower;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.findings.Cautions;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.ImportReport;
import app.latentledger.io.logcsv.LogImport;

import java.nio.file.Path;
import java.util.Locale;

/** Readable {@code log} output: import summary, cycle table, summary, findings, safety line. */
final class LogTable {
    /** Longest cycle table printed; the JSON always has every cycle. */
    private static final int MAX_ROWS = 200;

    private LogTable() {
    }

    static String of(Path file, LogImport imported, RunCycleReport r, UnitSystem units) {
        StringBuilder b = new StringBuilder();
        ImportReport rep = imported.report();
        TimeOrigin origin = imported.series().origin();
        String mass = Quantity.WATER_MASS.symbol(units);
        b.append("Run-cycle log: ").append(file.getFileName()).append('\n');
        b.append(Format.row("samples", String.valueOf(r.samples()), "(" + rep.rowsKept() + " of " + rep.rowsRead()
                + " rows kept)"));
        b.append(Format.row("duration", Format.fixed(r.durationS() / 3600.0, 2), "h"));
        b.append(Format.row("sample interval", Format.fixed(rep.medianIntervalS(), 0), "s"));
        b.append("  compressor timed from  ").append(r.compressorFromStatus() ? "its status column" : "supply and return temperatures").append('\n');
        b.append("  blower state from      ").append(r.blowerInferred() ? "the air (end of the constant-enthalpy"
                + " signature after each run)" : "its status column").append('\n');
        b.append("  temperatures read in   ").append(rep.temperatureUnitText()).append('\n');
        if (rep.dateOrder() != null) {
            b.append("  dates read as          ").append(rep.dateOrder().key()).append('\n');
        }
        if (!rep.timeZone().isEmpty()) {
            b.append("  clock times in zone    ").append(rep.timeZone()).append('\n');
        }
        if (rep.rejectedCount() > 0) {
            b.append("  rejected rows: ").append(rep.rejectedCount()).append('\n');
            for (String s : rep.rejected()) {
                b.append("    ").append(s).append('\n');
            }
            if (rep.rejectedCount() > rep.rejected().size()) {
                b.append("    … and ").append(rep.rejectedCount() - rep.rejected().size()).append(" more\n");
            }
        }
        if (rep.outOfOrder() + rep.duplicates() + rep.gaps() + rep.irregularIntervals() > 0) {
            b.append(String.format(Locale.ROOT, "  time axis: %d row(s) out of order (sorted), %d duplicate time(s)"
                            + " dropped, %d gap(s) (longest %.0f s), %d irregular interval(s)%n", rep.outOfOrder(),
                    rep.duplicates(), rep.gaps(), rep.longestGapS(), rep.irregularIntervals()));
        }
        b.append("\nCycles\n");
        b.append(String.format(Locale.ROOT, "  %4s  %-25s %7s %7s %-14s %9s %9s %7s%n", "#", "start", "on min",
                "off min", "blower", "removed", "returned", "onset"));
        b.append(String.format(Locale.ROOT, "  %4s  %-25s %7s %7s %-14s %9s %9s %7s%n", "", "", "", "",
                "in the rest", mass, mass, "s"));
        int k = 0;
        for (CycleResult c : r.cycles()) {
            if (++k > MAX_ROWS) {
                b.append("  … ").append(r.cycles().size() - MAX_ROWS).append(" more cycles (see --json)\n");
                break;
            }
            String start = origin == null ? Format.fixed(c.cycle().startS(), 0) + " s" : origin.label(c.cycle().startS());
            b.append(String.format(Locale.ROOT, "  %4d  %-25s %7s %7s %-14s %9s %9s %7s%n", k, start,
                    Format.fixed(c.cycle().onSeconds() / 60, 1),
                    Format.fixed(c.cycle().offSeconds() / 60, 1) + (c.cycle().offComplete() ? "" : "+"),
                    RestBlower.cell(c.cycle()), Format.fixed(Quantity.WATER_MASS.toDisplay(units, c.removedKg()), 3),
                    Format.fixed(Quantity.WATER_MASS.toDisplay(units, c.returnedKg()), 3),
                    Format.fixed(c.moisture().onsetS(), 0)));
        }
        if (r.cycles().isEmpty()) {
            b.append("  (no complete compressor run found)\n");
        }
        b.append("\nSummary\n");
        b.append(Format.row("cycles per hour", Format.fixed(r.cyclesPerHour(), 2), ""));
        b.append(Format.row("median on-time", Format.fixed(r.medianOnS() / 60, 1), "min"));
        b.append(Format.row("runtime fraction", Format.fixed(100 * r.runtimeFraction(), 0), "%"));
        b.append(Format.row("moisture removed", Format.fixed(Quantity.WATER_MASS.toDisplay(units, r.removedKg()), 2), mass
                + (Double.isNaN(r.airflowM3PerS()) ? "  (give --airflow for masses)" : "")));
        b.append(Format.row("moisture returned", Format.fixed(Quantity.WATER_MASS.toDisplay(units, r.returnedKg()), 2), mass
                + (Double.isNaN(r.fanAirflowM3PerS()) || r.fanAirflowM3PerS() == r.airflowM3PerS() ? ""
                : "  (at the fan-only airflow " + Format.fixed(Quantity.AIRFLOW.toDisplay(units, r.fanAirflowM3PerS()), 0)
                + " " + Quantity.AIRFLOW.symbol(units) + ")")));
        b.append(Format.row("returned share", r.reevaporation().percent(RunCycleReport.NONE_RETURNED), ""));
        b.append(Format.row("blower left on", RestBlower.ofRests(r.blowerLeftOnRests(), r.cycles().size()),
                "(through the rest: continuous fan)"));
        b.append(Format.row("fan-off delay", r.fanOffDelayWords(), ""));
        b.append(Format.row("net removed per hour", Format.fixed(Quantity.WATER_RATE.toDisplay(units, r.netRemovalKgPerS()), 3),
                Quantity.WATER_RATE.symbol(units)));
        b.append(Format.row("steady latent rate", Double.isNaN(r.steadyDryingW()) ? "unknown"
                        : Format.fixed(Quantity.WATER_RATE.toDisplay(units, r.steadyRemovalKgPerS()), 3),
                Double.isNaN(r.steadyDryingW()) ? "(no run long enough)" : Quantity.WATER_RATE.symbol(units)
                        + "  (drop " + Format.fixed(Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, r.steadyDryingW()), 1)
                        + " " + Quantity.HUMIDITY_RATIO_FINE.symbol(units) + ")"));
        b.append(Format.row("latent fraction measured", fraction(r.latentFractionMeasured()), ""));
        b.append(Format.row("latent fraction predicted", fraction(r.latentFractionPredicted()), ""));
        b.append(String.format(Locale.ROOT, "  model: Henderson & Rengarajan 1996, t_wet %.0f s, gamma %.2f, tau %.0f s"
                        + " (%s%s)%n", r.model().twetS(), r.model().gamma(), r.model().tauS(), r.model().source(),
                r.fitRests() > 0 ? " from " + r.fitRests() + " rests" : ", EnergyPlus-suggested values"));
        house(b, r, units);
        load(b, r, units);
        b.append("\nFindings\n");
        if (r.findings().isEmpty()) {
            b.append("  none: cycling and off-cycle moisture are within the limits checked\n");
        }
        for (Finding f : r.findings()) {
            b.append("  [").append(f.severity().key().toUpperCase(Locale.ROOT)).append("] ").append(f.code().key())
                    .append(": ").append(f.message()).append('\n');
            b.append("        ").append(f.technical()).append('\n');
            for (String n : f.nextChecks()) {
                b.append("        next: ").append(n).append('\n');
            }
        }
        b.append('\n').append(Cautions.SAFETY_LINE).append('\n');
        return b.toString();
    }

    private static String fraction(double v) {
        return app.latentledger.core.units.Ratio.known(v, "not worked out").number(2, "more put back than removed");
    }

    private static void house(StringBuilder b, RunCycleReport r, UnitSystem units) {
        app.latentledger.core.cycles.HouseHumidity h = r.house();
        if (h == null) {
            return;
        }
        String t = Quantity.TEMPERATURE.symbol(units);
        b.append("\nThe house's humidity (return air)\n");
        b.append(Format.row("dew point median/p95/max", Format.fixed(Quantity.TEMPERATURE.toDisplay(units,
                h.dewPointMedianC()), 1) + " / " + Format.fixed(Quantity.TEMPERATURE.toDisplay(units, h.dewPointP95C()), 1)
                + " / " + Format.fixed(Quantity.TEMPERATURE.toDisplay(units, h.dewPointMaxC()), 1), t));
        b.append(Format.row("RH median/p95/max", Format.fixed(h.rhMedianPct(), 0) + " / " + Format.fixed(h.rhP95Pct(), 0)
                + " / " + Format.fixed(h.rhMaxPct(), 0), "%"));
        b.append(Format.row("hours above RH target", Format.fixed(h.hoursAboveRhTarget(), 1), "h"));
        b.append(Format.row("hours above dew-point benchmark", Format.fixed(h.hoursAboveDewPoint(), 1), "h"));
        b.append(Format.row("rise while off", h.longOffPeriods() == 0 ? "not measurable (no off period of 30 min or more)"
                : Format.fixed(Quantity.HUMIDITY_RATIO_FINE.toDisplay(units, h.offTrendPerHour()), 2), h.longOffPeriods() == 0
                ? "" : Quantity.HUMIDITY_RATIO_FINE.symbol(units) + " per hour over " + h.longOffPeriods() + " off periods"));
        if (!Double.isNaN(h.outdoorDewPointMedianC())) {
            b.append(Format.row("outdoor dew point median", Format.fixed(Quantity.TEMPERATURE.toDisplay(units,
                    h.outdoorDewPointMedianC()), 1), t));
        }
    }

    private static void load(StringBuilder b, RunCycleReport r, UnitSystem units) {
        app.latentledger.core.cycles.LoadLine l = r.loadLine();
        if (l == null) {
            return;
        }
        String t = Quantity.TEMPERATURE.symbol(units);
        b.append("\nLoad line (runtime against outdoor temperature, ").append(l.hours()).append(" hours)\n");
        for (app.latentledger.core.cycles.LoadLine.Bin bin : l.bins()) {
            b.append(String.format(Locale.ROOT, "  %6.1f to %6.1f %s  %3d h  runtime %3.0f %%%n",
                    Quantity.TEMPERATURE.toDisplay(units, bin.fromC()), Quantity.TEMPERATURE.toDisplay(units, bin.toC()),
                    t, bin.hours(), 100 * bin.runtimeFraction()));
        }
        b.append(Format.row("would run continuously at", Double.isNaN(l.continuousC()) ? "not measurable (no line fitted)"
                : Format.fixed(Quantity.TEMPERATURE.toDisplay(units, l.continuousC()), 1), Double.isNaN(l.continuousC()) ? ""
                : t + " outdoors"));
        b.append(Format.row("hottest hours runtime", Format.fixed(100 * l.hotRuntimeFraction(), 0) + " ± "
                + Format.fixed(100 * l.hotRuntimeU(), 0), "% over " + l.hotHours() + " h at "
                + Format.fixed(Quantity.TEMPERATURE.toDisplay(units, l.hotOutdoorC()), 1) + " " + t));
    }
}
