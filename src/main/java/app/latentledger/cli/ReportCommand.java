package app.latentledger.cli;

import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.report.ReportRefusedException;
import app.latentledger.report.VisitReport;
import app.latentledger.store.DataLocation;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** {@code report}: the visit's PDF report, one visit or a before/after pair of visits. */
public final class ReportCommand implements Command {
    @Override
    public String name() {
        return "report";
    }

    @Override
    public String summary() {
        return "PDF report of a visit (or two visits compared) for the customer and the file";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] report VISIT_ID [--compare OTHER_VISIT_ID] --out FILE.pdf\n"
                + "                      [--paper letter|a4] [--units ip|si] [--json]\n"
                + "  VISIT_ID: a visit id or its first characters (at least 4), as 'visits list' shows them\n"
                + "  a visit with 'before' and 'after' reading sets is reported as a before/after pair;\n"
                + "  --compare: the earlier visit's first readings (as found) against the later visit's last (as left)\n"
                + "  --paper: default letter with --units ip, a4 with --units si\n"
                + "  the file appears only when complete; an existing file is replaced\n";
    }

    @Override
    public int run(Args args, CliContext context) throws IOException {
        UnitSystem units = UnitOptions.units(args);
        String compare = args.value("compare");
        String out = args.value("out");
        String paperText = args.value("paper");
        boolean json = args.flag("json");
        args.rejectUnknown();
        List<String> words = args.positionals();
        if (words.size() != 1) {
            throw new UsageException("give one visit id" + (words.isEmpty() ? "" : " (got " + words.size() + ")")
                    + "\n" + usage());
        }
        if (out == null || out.isBlank()) {
            throw new UsageException("report needs --out FILE.pdf\n" + usage());
        }
        PaperSize paper;
        try {
            paper = paperText == null ? PaperSize.defaultFor(units) : PaperSize.parse(paperText);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--paper " + e.getMessage());
        }
        Path file = Path.of(out);
        DataLocation location = DataLocation.resolve(context.dataDir());
        try (Ledger ledger = Ledger.open(location.folder(), Ledger.FirstRun.SEED_DEMO)) {
            Visit visit = Visits.find(ledger, words.get(0));
            Visit other = compare == null ? null : Visits.find(ledger, compare);
            long started = System.nanoTime();
            Path written;
            try {
                written = VisitReport.write(ledger, visit.id(), other == null ? null : other.id(), paper, units, file);
            } catch (ReportRefusedException e) {
                throw new UsageException(e.getMessage());
            }
            long ms = (System.nanoTime() - started) / 1_000_000;
            if (json) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("file", written.toString());
                m.put("visit", visit.id());
                m.put("compare", other == null ? null : other.id());
                m.put("paper", paper.key());
                m.put("units", units.key());
                m.put("bytes", Files.size(written));
                m.put("milliseconds", ms);
                context.out().print(Json.print(m) + "\n");
            } else {
                context.out().print("Wrote " + written + " (" + Files.size(written) / 1024 + " KiB, " + paper.key()
                        + ", " + units.key() + ") in " + ms + " ms\n");
            }
        }
        return Cli.OK;
    }
}
