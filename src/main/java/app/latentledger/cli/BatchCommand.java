package app.latentledger.cli;

import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.files.SafeFiles;
import app.latentledger.report.BatchSummary;
import app.latentledger.report.BatchSummaryReport;
import app.latentledger.report.BatchVisitReport;
import app.latentledger.report.ReportRefusedException;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.LinkedHashMap;

/**
 * {@code batch FILE.csv}: one row per system (docs/batch.md), each checked as {@code coil} checks
 * it; results to a file, optionally stored as visits, one report per system and a summary.
 * Bad rows are refused one by one (line, column, value, accepted range) and never stop the good
 * ones: exit 0 when every row was checked, 2 when any was refused or the file cannot be read.
 */
public final class BatchCommand implements Command {
    @Override
    public String name() {
        return "batch";
    }

    @Override
    public String summary() {
        return "check a CSV of systems (one row each): results, stored visits, a report each and a summary";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] batch FILE.csv [--out RESULTS.csv|RESULTS.json] [--store]\n"
                + "                      [--reports DIR] [--technician NAME] [--units ip|si] [--paper letter|a4] [--json]\n"
                + "       latent-ledger batch --template\n"
                + "  one row per system; the header names the columns (batch --template prints it with an example row;\n"
                + "  every column in docs/batch.md). Reading columns are the coil command's options without the\n"
                + "  dashes (return-db, return-rh, airflow, …), in the row's units (a units cell, else --units, else\n"
                + "  the settings); numbers use a decimal point\n"
                + "  --out: every figure with its k = 2 uncertainty, the verdict and finding codes, one line per row\n"
                + "  --store: each checked row saved as a site, system, commissioning visit and reading set, as\n"
                + "  sites add / systems add / visits new / readings add save them (rows with outdoor air are\n"
                + "  checked but not stored: a stored reading set keeps the coil-entering air only)\n"
                + "  --reports DIR: one PDF per system and batch-summary.pdf (the app's reports are in\n"
                + "  DATA/reports: give that folder to find them beside the app's own)\n"
                + "  --technician: for rows without a technician cell (needed with --store and --reports)\n"
                + "  --units: the units of rows without a units cell, and of every result\n"
                + "  exit 0 every row checked; 2 any row refused (each on standard error, the good rows still written)\n"
                + "  or the file unreadable; 1 an unexpected failure\n";
    }

    @Override
    public int run(Args args, CliContext context) throws Exception {
        boolean template = args.flag("template");
        String outText = args.value("out");
        boolean store = args.flag("store");
        String reportsText = args.value("reports");
        String technician = args.value("technician");
        String paperText = args.value("paper");
        String unitsText = args.value("units");
        boolean json = args.flag("json");
        args.rejectUnknown();
        List<String> words = args.positionals();
        if (template) {
            if (!words.isEmpty() || outText != null || store || reportsText != null) {
                throw new UsageException("batch --template takes no file or other option; it prints the header and an"
                        + " example row");
            }
            context.out().print(BatchColumns.template());
            return Cli.OK;
        }
        if (words.size() != 1) {
            throw new UsageException("give one batch file" + (words.isEmpty() ? "" : " (got " + words.size() + ")")
                    + "\n" + usage());
        }
        Path file = Path.of(words.get(0));
        Path out = outText == null ? null : outFile(outText);
        Path reports = reportsText == null ? null : reportsFolder(reportsText);
        List<BatchCsv.Row> rows = BatchCsv.read(file);

        Ledger ledger = store ? LedgerRecords.open(context) : null;
        BatchRun run = new BatchRun(Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), 8)));
        try {
            Settings settings = ledger != null ? ledger.settings().load() : CommandSettings.read(context);
            UnitSystem units = unitsText == null ? settings.units() : UnitOptions.units(args, settings.units());
            PaperSize paper = paper(paperText, settings, units, paperText != null);
            BatchCheck check = new BatchCheck(units, units, settings.defaultElevationM(), settings.tolerances(),
                    settings.thresholds(), technician, false, OffsetDateTime.now(),
                    store || reports != null);
            List<BatchCheck.Outcome> outcomes = run.check(rows, check, BatchProgress.onTerminal(!json, "checked",
                    rows.size()));

            Map<Integer, String> visitIds = new LinkedHashMap<>();
            Map<Integer, String> notStored = new LinkedHashMap<>();
            if (ledger != null) {
                BatchStore saver = new BatchStore(ledger);
                BatchProgress progress = BatchProgress.onTerminal(!json, "stored", outcomes.size());
                int n = 0;
                for (BatchCheck.Outcome o : outcomes) {
                    progress.done(++n);
                    if (o.checked() == null) {
                        continue;
                    }
                    if (!o.checked().storable()) {
                        notStored.put(o.row().line(), "outdoor air mixed in: a stored reading set keeps the"
                                + " coil-entering air only; record the mixed air as the return reading to store it");
                        continue;
                    }
                    visitIds.put(o.row().line(), saver.store(o.checked()).visit().id());
                }
                progress.finish();
            }

            Map<Integer, String> reportNames = new LinkedHashMap<>();
            String summaryName = null;
            BatchSummary summary;
            List<BatchSummary.Entry> entries = new ArrayList<>();
            List<BatchSummary.Refused> refused = new ArrayList<>();
            for (BatchCheck.Outcome o : outcomes) {
                if (o.checked() != null) {
                    String name = reports == null ? "" : reportName(o);
                    reportNames.put(o.row().line(), reports == null ? null : name);
                    entries.add(new BatchSummary.Entry(o.row().line(), o.site(), o.system(), o.checked().result(), name));
                } else {
                    BatchRefusal r = o.refused();
                    refused.add(new BatchSummary.Refused(r.line(), r.column(), r.value(), r.range(), r.message()));
                }
            }
            summary = new BatchSummary(file.getFileName().toString(), units,
                    OffsetDateTime.now(), entries, refused);
            if (reports != null) {
                run.reports(outcomes, reportNames, reports, paper, units, BatchProgress.onTerminal(!json, "reports",
                        entries.size()));
                summaryName = "batch-summary.pdf";
                try {
                    BatchSummaryReport.write(summary, paper, reports.resolve(summaryName));
                } catch (ReportRefusedException e) {
                    throw new UsageException(e.getMessage());
                }
            }

            List<BatchResults.Row> results = new ArrayList<>();
            for (BatchCheck.Outcome o : outcomes) {
                int line = o.row().line();
                results.add(new BatchResults.Row(o, visitIds.get(line), notStored.get(line), reportNames.get(line)));
            }
            Map<String, Object> summaryJson = BatchResults.summary(summary, visitIds.size(),
                    reports == null ? null : reports.toString(), summaryName == null ? null : reports.resolve(summaryName).toString());
            if (out != null) {
                write(out, results, summaryJson, units);
            }
            for (BatchCheck.Outcome o : outcomes) {
                if (o.refused() != null) {
                    context.err().println("latent-ledger: " + file.getFileName() + " " + o.refused().say());
                }
            }
            notStored.forEach((line, why) -> context.err().println("latent-ledger: line " + line + " checked, not stored: "
                    + why));
            if (json) {
                Map<String, Object> m = new LinkedHashMap<>();
                List<Object> list = new ArrayList<>();
                results.forEach(r -> list.add(BatchResults.json(r, units)));
                m.put("rows", list);
                m.put("summary", summaryJson);
                context.out().print(Json.print(m) + "\n");
            } else {
                context.out().print(table(results, summary, out, reports, summaryName, visitIds.size()));
            }
            return refused.isEmpty() ? Cli.OK : Cli.REFUSED;
        } finally {
            run.close();
            if (ledger != null) {
                ledger.close();
            }
        }
    }

    private static String table(List<BatchResults.Row> results, BatchSummary s, Path out, Path reports,
                                String summaryName, int stored) {
        StringBuilder b = new StringBuilder();
        b.append(String.format("%5s  %-28s  %-16s  %-17s  %s%n", "line", "site", "system", "verdict", "findings"));
        for (BatchResults.Row r : results) {
            BatchCheck.Outcome o = r.outcome();
            String verdict = o.checked() != null ? o.checked().result().verdict().key() : "refused";
            String rest = o.checked() != null ? String.join(" ", BatchResults.codes(o.checked().result()))
                    : o.refused().column() + ": " + o.refused().message();
            b.append(String.format("%5d  %-28s  %-16s  %-17s  %s%n", o.row().line(), cut(o.site(), 28),
                    cut(o.system(), 16), verdict, rest));
        }
        b.append(s.systems().size()).append(" checked, ").append(s.refused().size()).append(" refused");
        s.counts().forEach((v, n) -> b.append("; ").append(v.key()).append(' ').append(n));
        b.append('\n');
        if (stored > 0) {
            b.append("Stored ").append(stored).append(" visits (visits list shows them)\n");
        }
        if (out != null) {
            b.append("Results: ").append(out).append('\n');
        }
        if (reports != null) {
            b.append("Reports: ").append(s.systems().size()).append(" PDFs and ").append(summaryName).append(" in ")
                    .append(reports).append('\n');
        }
        return b.toString();
    }

    private static String cut(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "…";
    }

    /** The row's report file: line number first, so the folder lists in file order and names never clash. */
    static String reportName(BatchCheck.Outcome o) {
        return String.format(Locale.ROOT, "%05d-%s-%s.pdf", o.row().line(), slug(o.site()), slug(o.system()));
    }

    private static String slug(String s) {
        String t = s.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        t = t.length() > 40 ? t.substring(0, 40) : t;
        return t.isEmpty() ? "x" : t;
    }

    private static Path outFile(String text) {
        String lower = text.toLowerCase(Locale.ROOT);
        if (!lower.endsWith(".csv") && !lower.endsWith(".json")) {
            throw new UsageException("--out " + text + ": give a file ending in .csv or .json");
        }
        Path p = Path.of(text).toAbsolutePath().normalize();
        if (p.getParent() == null || !Files.isDirectory(p.getParent())) {
            throw new UsageException("--out " + text + ": folder " + p.getParent() + " does not exist");
        }
        if (Files.isDirectory(p)) {
            throw new UsageException("--out " + text + " is a folder; give a file name");
        }
        return p;
    }

    private static Path reportsFolder(String text) {
        Path p = Path.of(text).toAbsolutePath().normalize();
        if (Files.exists(p) && !Files.isDirectory(p)) {
            throw new UsageException("--reports " + text + " is a file; give a folder");
        }
        try {
            Files.createDirectories(p);
        } catch (IOException e) {
            throw new UsageException("--reports " + text + ": the folder cannot be made (" + e.getMessage() + ")");
        }
        return p;
    }

    private static PaperSize paper(String text, Settings settings, UnitSystem units, boolean given) {
        if (!given) {
            return settings.paper();
        }
        try {
            return PaperSize.parse(text);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--paper " + e.getMessage());
        }
    }

    private static void write(Path out, List<BatchResults.Row> rows, Map<String, Object> summary, UnitSystem units)
            throws IOException {
        boolean csv = out.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv");
        SafeFiles.writeAtomically(out, stream -> {
            Writer w = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
            if (csv) {
                BatchResults.csv(rows, units, w);
            } else {
                Map<String, Object> m = new LinkedHashMap<>();
                List<Object> list = new ArrayList<>();
                rows.forEach(r -> list.add(BatchResults.json(r, units)));
                m.put("rows", list);
                m.put("summary", summary);
                w.write(Json.print(m));
                w.write("\n");
            }
            w.flush();
        }, SafeFiles.Durability.REPLACE_WHOLE);
    }
}
