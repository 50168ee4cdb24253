package app.latentledger.cli;

import app.latentledger.core.records.BinEntry;
import app.latentledger.store.Ledger;
import app.latentledger.store.RecycleBin;

import java.time.Duration;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** {@code recycle-bin list|empty}: what was deleted and can still be restored; emptying it for good. */
public final class RecycleBinCommand implements Command {
    @Override
    public String name() {
        return "recycle-bin";
    }

    @Override
    public String summary() {
        return "deleted records still restorable (list), or delete them for good (empty --yes)";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] recycle-bin list [--json]\n"
                + "       latent-ledger [--data-dir DIR] recycle-bin empty --yes [--json]\n"
                + "  deletions stay " + RecycleBin.KEEP.toDays() + " days unless the bin is emptied; put one back with\n"
                + "  'restore KIND ID'\n";
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        boolean json = args.flag("json");
        boolean yes = args.flag("yes");
        args.rejectUnknown();
        String sub = words.size() == 1 ? words.get(0) : "";
        try (Ledger ledger = LedgerRecords.open(context)) {
            List<BinEntry> entries = ledger.recycleBin().list();
            switch (sub) {
                case "list": {
                    List<Map<String, Object>> rows = new ArrayList<>();
                    StringBuilder b = new StringBuilder();
                    for (BinEntry e : entries) {
                        long daysLeft = Math.max(0, RecycleBin.KEEP.minus(Duration.between(e.deletedAt(),
                                OffsetDateTime.now())).toDays());
                        Map<String, Object> m = new LinkedHashMap<>();
                        m.put("kind", e.kind().key());
                        m.put("id", e.recordId());
                        m.put("summary", e.summary());
                        m.put("deletedAt", e.deletedAt().toString());
                        m.put("daysLeft", daysLeft);
                        rows.add(m);
                        b.append(String.format("%-8s  %-8s  %-22s  %2d days left  %s%n", e.kind().key(),
                                Visits.shortId(e.recordId()), Visits.when(e.deletedAt()), daysLeft, e.summary()));
                    }
                    b.append(entries.isEmpty() ? "The recycle bin is empty.\n" : entries.size() + " in the recycle bin\n");
                    context.out().print(json ? Json.print(rows) + "\n" : b.toString());
                    return Cli.OK;
                }
                case "empty": {
                    if (!yes) {
                        throw new UsageException("recycle-bin empty deletes " + entries.size()
                                + " entries for good; add --yes to go ahead (see: recycle-bin list)");
                    }
                    int n = ledger.recycleBin().empty();
                    Map<String, Object> m = new LinkedHashMap<>();
                    m.put("emptied", n);
                    context.out().print(json ? Json.print(m) + "\n" : "Deleted " + n + " entries for good.\n");
                    return Cli.OK;
                }
                default:
                    throw new UsageException("recycle-bin needs list or empty\n" + usage());
            }
        }
    }
}
