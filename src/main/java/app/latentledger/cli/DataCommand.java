package app.latentledger.cli;

import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.ReportRefusedException;
import app.latentledger.report.VisitDataExport;
import app.latentledger.store.DataLocation;
import app.latentledger.store.Ledger;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** {@code data}: a visit's readings, results and findings as open CSV or JSON (docs/data-export.md). */
public final class DataCommand implements Command {
    @Override
    public String name() {
        return "data";
    }

    @Override
    public String summary() {
        return "open data export of a visit: every reading, result and finding as CSV or JSON";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] data VISIT_ID --format csv|json --out FILE [--units ip|si]\n"
                + "  VISIT_ID: a visit id or its first characters (at least 4), as 'visits list' shows them\n"
                + "  every reading with its unit and tolerance, every computed result with its expanded\n"
                + "  uncertainty (k = 2), every finding with its evidence; values in --units (default ip)\n"
                + "  the file appears only when complete; an existing file is replaced\n";
    }

    @Override
    public int run(Args args, CliContext context) throws IOException {
        UnitSystem units = UnitOptions.units(args);
        String formatText = args.value("format");
        String out = args.value("out");
        args.rejectUnknown();
        List<String> words = args.positionals();
        if (words.size() != 1) {
            throw new UsageException("give one visit id" + (words.isEmpty() ? "" : " (got " + words.size() + ")")
                    + "\n" + usage());
        }
        if (formatText == null) {
            throw new UsageException("data needs --format csv|json\n" + usage());
        }
        if (out == null || out.isBlank()) {
            throw new UsageException("data needs --out FILE\n" + usage());
        }
        VisitDataExport.Format format;
        try {
            format = VisitDataExport.Format.parse(formatText);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--format " + e.getMessage());
        }
        try (Ledger ledger = Ledger.open(DataLocation.resolve(context.dataDir()).folder(), Ledger.FirstRun.SEED_DEMO)) {
            Visit visit = Visits.find(ledger, words.get(0));
            Path written;
            try {
                written = VisitDataExport.write(ledger, visit.id(), format, units, Path.of(out));
            } catch (ReportRefusedException e) {
                throw new UsageException(e.getMessage());
            }
            context.out().print("Wrote " + written + " (" + format.key() + ", " + units.key() + ", "
                    + Files.size(written) + " bytes)\n");
        }
        return Cli.OK;
    }
}
