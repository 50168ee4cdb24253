package app.latentledger.cli;

import app.latentledger.core.cycles.CycleResult;
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
        b.append(String.format(Locale.ROOT, "  %4s  %-25s %7s %7s %-8s %9s %9s %7s%n", "#", "start", "on min",
                "off min", "blower", "removed", "returned", "onset"));
        b.append(String.format(Locale.ROOT, "  %4s  %-25s %7s %7s %-8s %9s %9s %7s%n", "", "", "", "", "",
                mass, mass, "s"));
        int k = 0;
        for (CycleResult c : r.cycles()) {
            if (++k > MAX_ROWS) {
                b.append("  … ").append(r.cycles().size() - MAX_ROWS).append(" more cycles (see --json)\n");
                break;
            }
            String start = origin == null ? Format.fixed(c.cycle().startS(), 0) + " s" : origin.label(c.cycle().startS());
            b.append(String.format(Locale.ROOT, "  %4d  %-25s %7s %7s %-8s %9s %9s %7s%n", k, start,
                    Format.fixed(c.cycle().onSeconds() / 60, 1),
                    Format.fixed(c.cycle().offSeconds() / 60, 1) + (c.cycle().offComplete() ? "" : "+"),
                    c.cycle().offBlower().key(), Format.fixed(Quantity.WATER_MASS.toDisplay(units, c.removedKg()), 3),
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
        b.append(Format.row("moisture returned", Format.fixed(Quantity.WATER_MASS.toDisplay(units, r.returnedKg()), 2), mass));
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
        return Double.isNaN(v) ? "unknown" : Format.fixed(v, 2);
    }
}
