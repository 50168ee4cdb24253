package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.LogConditions;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.io.logcsv.HeaderMap;
import app.latentledger.io.logcsv.ImportProgress;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.visit.LogProblem;
import app.latentledger.visit.VisitLog;
import app.latentledger.visit.VisitLogs;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneId;
import java.util.List;
import java.util.Map;

/** {@code log FILE}: run cycles, moisture per cycle and findings from a data-logger CSV. */
public final class LogCommand implements Command {
    /** Files larger than this show import progress on standard error. */
    private static final long PROGRESS_FROM_BYTES = 2_000_000;

    @Override
    public String name() {
        return "log";
    }

    @Override
    public String summary() {
        return "run cycles, moisture per cycle and findings from a data-logger CSV";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger log FILE [--units ip|si] [--elevation FT|M | --pressure PSIA|KPA]\n"
                + "                          [--airflow CFM|L_PER_S] [--fan-airflow CFM|L_PER_S] [--map HEADER=field]...\n"
                + "                          [--date-order mdy|dmy|ymd] [--time-zone ZONE] [--json]\n"
                + "  FILE: CSV with a header row; columns time (date and time) or seconds (elapsed), and any of\n"
                + "        return_db return_rh return_wb supply_db supply_rh supply_wb coil_temp outdoor_db\n"
                + "        outdoor_rh compressor fan (0/1). Separator , ; or tab; decimal comma with ;\n"
                + "        Times: ISO-8601 (2026-07-14T13:05:00, with or without -04:00), 7/14/2026 1:05:00 PM,\n"
                + "        14/07/2026 13:05 or 2026/07/14 13:05:00\n"
                + "  --units   temperatures in the file (unless its headers say, e.g. return_db [°C]) and the output:\n"
                + "            ip (°F, lb, default) or si (°C, kg); a file implausible in that unit is refused\n"
                + "  --airflow air handler airflow during runs (cfm | L/s); without it moisture is given only as fractions\n"
                + "  --fan-airflow airflow with the blower alone (fan-only speed) for the water blown back in rests;\n"
                + "            default: the same as --airflow\n"
                + "  --map     read another logger's header as a field, e.g. --map \"RA Temp=return_db\" (repeatable)\n"
                + "  --date-order how to read dates like 7/3/2026 when the file does not tell (default: from the file)\n"
                + "  --time-zone zone of clock times written without a UTC offset, e.g. America/Chicago\n"
                + "            (default: this machine's zone)\n"
                + "  --json    machine-readable output\n"
                + "  --units, the elevation and the finding thresholds default to the stored settings (settings show)\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        Settings settings = CommandSettings.read(context);
        UnitSystem units = UnitOptions.units(args, settings.units());
        SitePressure site = UnitOptions.site(args, units, settings.defaultElevationM());
        Double airflow = UnitOptions.si(args, "airflow", Quantity.AIRFLOW, units);
        Double fanAirflow = UnitOptions.si(args, "fan-airflow", Quantity.AIRFLOW, units);
        Map<String, String> maps;
        DateOrder order;
        ZoneId zone;
        try {
            maps = HeaderMap.parse(args.values("map"));
            String o = args.value("date-order");
            order = o == null ? DateOrder.AUTO : DateOrder.parse(o);
            String z = args.value("time-zone");
            zone = z == null ? ZoneId.systemDefault() : ZoneId.of(z.strip());
        } catch (java.time.DateTimeException e) {
            throw new UsageException("--time-zone: " + e.getMessage() + " (e.g. America/Chicago or -05:00)");
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        boolean json = args.flag("json");
        args.rejectUnknown();
        List<String> files = args.positionals();
        if (files.size() != 1) {
            throw new UsageException("give one log file" + (files.isEmpty() ? "" : " (got " + files.size() + ")")
                    + "\n" + usage());
        }
        Path file = Path.of(files.get(0));
        LogImport imported;
        try {
            imported = VisitLogs.read(file, new VisitLogs.ReadOptions(units, maps, order, zone), progress(file,
                    context.err()));
        } catch (LogProblem e) {
            throw new UsageException(e.getMessage());
        } catch (IllegalArgumentException e) {
            // sample times so far apart that, counted from the first, they no longer differ in a
            // double (e.g. -1e308 and 60): the time axis cannot be read, which is a refusal
            throw new UsageException(file + " refused: its sample times cannot be read as one increasing time"
                    + " axis (" + e.getMessage() + "); check the time column");
        }
        LogConditions conditions;
        try {
            conditions = LogConditions.checked(site.pressurePa(), "", airflow == null ? Double.NaN : airflow, "--airflow",
                    fanAirflow == null ? Double.NaN : fanAirflow);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, null);
        }
        if (conditions.refused()) {
            InvalidInputException e = conditions.refusal();
            throw UnitOptions.refused(e, units, e.field().equals("airflow") ? "--airflow" : "--fan-airflow");
        }
        VisitLog analysed = VisitLogs.analyse("", file.getFileName().toString(), imported.series(), conditions,
                settings.thresholds(), units, imported, List.of(), "");
        if (!analysed.analysed()) {
            throw new UsageException(file + ": " + analysed.refusal());
        }
        RunCycleReport report = analysed.report();
        if (json) {
            context.out().print(Json.print(LogJson.of(file, imported, report, units)) + "\n");
        } else {
            context.out().print(LogTable.of(file, imported, report, units));
        }
        return Cli.OK;
    }

    private static ImportProgress progress(Path file, PrintStream err) {
        long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            return null;
        }
        if (size < PROGRESS_FROM_BYTES) {
            return null;
        }
        int[] lastShown = {0};
        return f -> {
            int pct = (int) (f * 100);
            if (pct >= lastShown[0] + 10) {
                lastShown[0] = pct - pct % 10;
                err.println("reading " + file.getFileName() + ": " + lastShown[0] + " %");
            }
        };
    }
}
