package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.records.BinEntry;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DataLocation;
import app.latentledger.store.Ledger;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

/**
 * What the recording commands share: opening the tech's ledger, finding a record from what was
 * typed (its id, or its first 4 or more characters as the lists show them), and saying a refusal
 * the way every command does (exit 2, the field, the value and the accepted range).
 */
final class LedgerRecords {
    private LedgerRecords() {
    }

    static Ledger open(CliContext context) {
        return Ledger.open(DataLocation.resolve(context.dataDir()).folder());
    }

    /** Runs a save; a refused record becomes a usage refusal in the tech's units. */
    static <T> T refusing(UnitSystem units, String option, Supplier<T> save) {
        try {
            return save.get();
        } catch (InvalidInputException e) {
            throw UnitOptions.refused(e, units, option);
        } catch (InvalidRecordException e) {
            throw new UsageException(e.getMessage());
        }
    }

    static Site site(Ledger ledger, String typed) {
        Map<String, Site> all = new LinkedHashMap<>();
        ledger.sites().all().forEach(s -> all.put(s.id(), s));
        return pick("site", typed, all, "sites list");
    }

    static HvacSystem system(Ledger ledger, String typed) {
        Map<String, HvacSystem> all = new LinkedHashMap<>();
        for (Site s : ledger.sites().all()) {
            ledger.systems().forSite(s.id()).forEach(y -> all.put(y.id(), y));
        }
        return pick("system", typed, all, "systems list SITE");
    }

    static Visit visit(Ledger ledger, String typed) {
        return Visits.find(ledger, typed);
    }

    static ReadingSet readings(Ledger ledger, String typed) {
        Map<String, ReadingSet> all = new LinkedHashMap<>();
        for (Visit v : ledger.visits().all()) {
            ledger.readings().forVisit(v.id()).forEach(r -> all.put(r.id(), r));
        }
        return pick("reading set", typed, all, "visits show VISIT");
    }

    static String logId(Ledger ledger, String typed) {
        Map<String, String> all = new LinkedHashMap<>();
        for (Visit v : ledger.visits().all()) {
            ledger.logs().idsForVisit(v.id()).forEach(id -> all.put(id, id));
        }
        return pick("log", typed, all, "visits show VISIT");
    }

    /** The id of a live record of {@code kind} from what the tech typed. */
    static String liveId(Ledger ledger, RecordKind kind, String typed) {
        return switch (kind) {
            case SITE -> site(ledger, typed).id();
            case SYSTEM -> system(ledger, typed).id();
            case VISIT -> visit(ledger, typed).id();
            case READINGS -> readings(ledger, typed).id();
            case LOG -> logId(ledger, typed);
        };
    }

    /** A recycle-bin entry of {@code kind} from the record id the tech typed. */
    static BinEntry binned(Ledger ledger, RecordKind kind, String typed) {
        Map<String, BinEntry> all = new LinkedHashMap<>();
        for (BinEntry e : ledger.recycleBin().list()) {
            if (e.kind() == kind) {
                all.putIfAbsent(e.recordId(), e);
            }
        }
        return pick(kind.key() + " in the recycle bin", typed, all, "recycle-bin list");
    }

    static RecordKind kind(String word) {
        try {
            return RecordKind.parse("KIND", word);
        } catch (InvalidRecordException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static <T> T pick(String what, String typed, Map<String, T> byId, String listCommand) {
        T exact = byId.get(typed);
        if (exact != null) {
            return exact;
        }
        if (typed.length() < 4) {
            throw new UsageException("no " + what + " with id '" + typed + "'; give the id or at least its first 4"
                    + " characters (see: " + listCommand + ")");
        }
        List<String> matches = new ArrayList<>();
        for (String id : byId.keySet()) {
            if (id.startsWith(typed)) {
                matches.add(id);
            }
        }
        if (matches.isEmpty()) {
            throw new UsageException("no " + what + " with id '" + typed + "' (see: " + listCommand + ")");
        }
        if (matches.size() > 1) {
            StringBuilder b = new StringBuilder("'" + typed + "' matches " + matches.size() + " of them; give more of the id:");
            matches.forEach(id -> b.append("\n  ").append(id));
            throw new UsageException(b.toString());
        }
        return byId.get(matches.get(0));
    }

    /** The JSON answer of a command that made or changed one record. */
    static Map<String, Object> made(String id, String kind) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", id);
        m.put("kind", kind);
        return m;
    }
}
