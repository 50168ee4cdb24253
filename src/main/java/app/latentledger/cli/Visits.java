package app.latentledger.cli;

import app.latentledger.core.records.Visit;
import app.latentledger.store.Ledger;

import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.List;

/** Finding a visit from what the tech typed, and how ids and times are shown. */
final class Visits {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm xxx");

    private Visits() {
    }

    /** The visit with this id, or the only one whose id starts with it (at least 4 characters). */
    static Visit find(Ledger ledger, String typed) {
        var exact = ledger.visits().find(typed);
        if (exact.isPresent()) {
            return exact.get();
        }
        if (typed.length() < 4) {
            throw new UsageException("no visit with id '" + typed + "'; give the id or at least its first 4 characters"
                    + " (see: visits list)");
        }
        List<Visit> matches = ledger.visits().withIdPrefix(typed);
        if (matches.isEmpty()) {
            throw new UsageException("no visit with id '" + typed + "' (see: visits list)");
        }
        if (matches.size() > 1) {
            StringBuilder b = new StringBuilder("'" + typed + "' matches " + matches.size() + " visits; give more of the id:");
            matches.forEach(v -> b.append("\n  ").append(v.id()));
            throw new UsageException(b.toString());
        }
        return matches.get(0);
    }

    static String shortId(String id) {
        return id.length() <= 8 ? id : id.substring(0, 8);
    }

    static String when(OffsetDateTime t) {
        return t.format(WHEN);
    }
}
