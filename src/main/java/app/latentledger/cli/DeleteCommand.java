package app.latentledger.cli;

import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.RecordKind;
import app.latentledger.store.Ledger;
import app.latentledger.store.RecycleBin;

import java.util.List;
import java.util.Map;

/**
 * {@code delete KIND ID} and {@code restore KIND ID}: move a record (with all that hangs from it)
 * into the ledger's one recycle bin, or put it back. One class, two words: both take the same KIND
 * and ID and say the same things.
 */
public final class DeleteCommand implements Command {
    private final boolean restore;

    private DeleteCommand(boolean restore) {
        this.restore = restore;
    }

    public static DeleteCommand delete() {
        return new DeleteCommand(false);
    }

    public static DeleteCommand restore() {
        return new DeleteCommand(true);
    }

    @Override
    public String name() {
        return restore ? "restore" : "delete";
    }

    @Override
    public String summary() {
        return restore ? "put a deleted site, system, visit, reading set or log back from the recycle bin"
                : "move a site, system, visit, reading set or log (and all under it) to the recycle bin";
    }

    @Override
    public String usage() {
        return "usage: latent-ledger [--data-dir DIR] " + name() + " KIND ID [--json]\n"
                + "  KIND: site | system | visit | readings | log; ID: its id or first characters (at least 4)\n"
                + (restore
                ? "  restores the latest deletion of that record; refused (nothing changes) while what it belongs\n"
                        + "  to is deleted too (restore that first) or when the record no longer passes its checks\n"
                : "  a site takes its systems and visits with it, a visit its reading sets, logs, instruments and\n"
                        + "  paperwork; restorable for " + RecycleBin.KEEP.toDays() + " days or until 'recycle-bin empty'\n");
    }

    @Override
    public int run(Args args, CliContext context) {
        List<String> words = args.positionals();
        boolean json = args.flag("json");
        args.rejectUnknown();
        if (words.size() != 2) {
            throw new UsageException("give: " + name() + " KIND ID\n" + usage());
        }
        RecordKind kind = LedgerRecords.kind(words.get(0));
        try (Ledger ledger = LedgerRecords.open(context)) {
            BinEntry entry;
            int rows;
            try {
                if (restore) {
                    BinEntry binned = LedgerRecords.binned(ledger, kind, words.get(1));
                    rows = ledger.recycleBin().rowCount(binned.id());
                    entry = ledger.recycleBin().restore(kind, binned.recordId());
                } else {
                    String id = LedgerRecords.liveId(ledger, kind, words.get(1));
                    entry = ledger.recycleBin().delete(kind, id);
                    rows = ledger.recycleBin().rowCount(entry.id());
                }
            } catch (InvalidRecordException e) {
                throw new UsageException(e.getMessage());
            }
            Map<String, Object> m = LedgerRecords.made(entry.recordId(), kind.key());
            m.put("summary", entry.summary());
            m.put("rows", rows);
            m.put(restore ? "restored" : "deleted", true);
            String text = restore
                    ? "Restored " + entry.summary() + " (" + entry.recordId() + ")\n"
                    : "Moved " + entry.summary() + " (" + entry.recordId() + ") to the recycle bin"
                            + (rows > 1 ? " with " + (rows - 1) + (rows == 2 ? " row" : " rows") + " of records under it" : "")
                            + "; undo with: restore " + kind.key() + " " + entry.recordId() + "\n";
            context.out().print(json ? Json.print(m) + "\n" : text);
            return Cli.OK;
        }
    }
}
