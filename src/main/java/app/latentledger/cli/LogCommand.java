package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.LogNotAnalysableException;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.io.logcsv.LogRefusedException;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
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
                + "                          [--airflow CFM|L_PER_S] [--map HEADER=field]... [--json]\n"
                + "  FILE: CSV with a header row; columns time (ISO-8601) or seconds (elapsed), and any of\n"
                + "        return_db return_rh return_wb supply_db supply_rh supply_wb coil_temp outdoor_db\n"
                + "        outdoor_rh compressor fan (0/1). Separator , ; or tab; decimal comma with ;\n"
                + "  --units   temperatures in the file and the output: ip (°F, lb, default) or si (°C, kg)\n"
                + "  --airflow air handler airflow (cfm | L/s); without it moisture is given only as fractions\n"
                + "  --map     read another logger's header as a field, e.g. --map \"RA Temp=return_db\" (repeatable)\n"
                + "  --json    machine-readable output\n"
                + "  --units, the elevation and the finding thresholds default to the stored settings (settings show)\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        Settings settings = CommandSettings.read(context);
        UnitSystem units = UnitOptions.units(args, settings.units());
        SitePressure site = UnitOptions.site(args, units, settings.defaultElevationM());
        Double airflow = UnitOptions.si(args, "airflow", Quantity.AIRFLOW, units);
        Map<String, String> maps = maps(args.values("map"));
        boolean json = args.flag("json");
        args.rejectUnknown();
        List<String> files = args.positionals();
        if (files.size() != 1) {
            throw new UsageException("give one log file" + (files.isEmpty() ? "" : " (got " + files.size() + ")")
                    + "\n" + usage());
        }
        Path file = Path.of(files.get(0));
        LogImport imported = importLog(file, units, maps, context.err());
        RunCycleReport report;
        try {
            report = new RunCycleAnalysis(settings.thresholds())
                    .analyse(imported.series(), site.pressurePa(), airflow == null ? Double.NaN : airflow);
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, e.field().equals("airflow") ? "--airflow" : null);
        } catch (LogNotAnalysableException e) {
            throw new UsageException(file + ": " + e.getMessage());
        }
        if (json) {
            context.out().print(Json.print(LogJson.of(file, imported, report, units)) + "\n");
        } else {
            context.out().print(LogTable.of(file, imported, report, units));
        }
        return Cli.OK;
    }

    static Map<String, String> maps(List<String> values) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String v : values) {
            int eq = v.lastIndexOf('=');
            if (eq <= 0 || eq == v.length() - 1) {
                throw new UsageException("--map '" + v + "' must be HEADER=field, e.g. --map \"RA Temp=return_db\"");
            }
            m.put(v.substring(0, eq), v.substring(eq + 1));
        }
        return m;
    }

    private static LogImport importLog(Path file, UnitSystem units, Map<String, String> maps, PrintStream err) {
        try {
            long size = Files.size(file);
            int[] lastShown = {0};
            LogCsvImporter importer = new LogCsvImporter(units, maps, size < PROGRESS_FROM_BYTES ? null : f -> {
                int pct = (int) (f * 100);
                if (pct >= lastShown[0] + 10) {
                    lastShown[0] = pct - pct % 10;
                    err.println("reading " + file.getFileName() + ": " + lastShown[0] + " %");
                }
            });
            return importer.read(file);
        } catch (NoSuchFileException e) {
            throw new UsageException("no such file: " + file);
        } catch (IOException e) {
            throw new UsageException("cannot read " + file + ": " + e.getMessage());
        } catch (LogRefusedException e) {
            throw new UsageException(file + " refused: " + e.getMessage());
        } catch (IllegalArgumentException e) {
            // sample times so far apart that, counted from the first, they no longer differ in a
            // double (e.g. -1e308 and 60): the time axis cannot be read, which is a refusal
            throw new UsageException(file + " refused: its sample times cannot be read as one increasing time"
                    + " axis (" + e.getMessage() + "); check the time column");
        }
    }
}
