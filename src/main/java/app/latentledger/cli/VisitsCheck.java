package app.latentledger.cli;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.RecordKind;
import app.latentledger.core.visit.RecordRepair;
import app.latentledger.core.visit.RecordRules;
import app.latentledger.store.Ledger;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * {@code visits check [--repair] [--remove]}: every stored reading set and log checked against today's
 * rules ({@link RecordRules}, the same as for a new record), for records kept by an older build or
 * imported before the rules applied. {@code --repair} makes failing optional values missing
 * ({@link RecordRepair}) in one transaction; a record that cannot be repaired is listed, and {@code --remove} moves it to the recycle bin.
 */
final class VisitsCheck {
    private VisitsCheck() {
    }

    /** One record that fails, and what was done about it. */
    record Finding(String record, String id, String visitId, String problem, String outcome) {
    }

    static List<Finding> run(Ledger ledger, boolean repair, boolean remove) {
        List<Finding> found = new ArrayList<>();
        List<Runnable> repairs = new ArrayList<>();
        List<Runnable> removals = new ArrayList<>();
        for (Visit v : ledger.visits().all()) {
            Site site = ledger.sites().find(v.siteId()).orElseThrow();
            HvacSystem system = ledger.systems().find(v.systemId()).orElseThrow();
            for (ReadingSet rs : ledger.readings().forVisit(v.id())) {
                try {
                    RecordRules.readingSet(rs, system, site);
                } catch (IllegalArgumentException e) {
                    RecordRepair.Outcome<ReadingSet> o = RecordRepair.readingSet(rs, system, site);
                    found.add(new Finding("reading set", rs.id(), v.id(), e.getMessage(),
                            outcome(o, repair, remove, RecordKind.READINGS, rs.id())));
                    if (repair && o.repaired() != null) {
                        repairs.add(() -> ledger.readings().save(o.repaired()));
                    } else if (remove && o.repaired() == null) {
                        removals.add(() -> ledger.recycleBin().delete(RecordKind.READINGS, rs.id()));
                    }
                }
            }
            for (ImportedLog log : ledger.logs().forVisit(v.id())) {
                RecordRules.LogProblem p = RecordRules.logProblem(log.samples());
                if (p == null) {
                    continue;
                }
                RecordRepair.Outcome<LogSamples> o = RecordRepair.log(log.samples());
                String where = p.sample() >= 0 ? "sample " + (p.sample() + 1) + ": " : "";
                found.add(new Finding("log", log.id(), v.id(), where + p.message(),
                        outcome(o, repair, remove, RecordKind.LOG, log.id())));
                if (remove && o.repaired() == null) {
                    removals.add(() -> ledger.recycleBin().delete(RecordKind.LOG, log.id()));
                }
                if (repair && o.repaired() != null) {
                    repairs.add(() -> ledger.logs().save(new ImportedLog(log.id(), log.visitId(), log.sourceFileName(),
                            log.columnMapping(), log.importedAt(), o.repaired())));
                }
            }
        }
        if (!repairs.isEmpty()) {
            ledger.inTransaction(() -> repairs.forEach(Runnable::run));
        }
        // each removal is its own transaction in the bin; a record moved there can be restored, and a
        // restored record is checked again like any new input
        removals.forEach(Runnable::run);
        return found;
    }

    private static String outcome(RecordRepair.Outcome<?> o, boolean repair, boolean remove, RecordKind kind,
                                  String id) {
        if (o.repaired() == null) {
            return remove ? "cannot be repaired without inventing readings; moved to the recycle bin (restore "
                    + kind.key() + " " + id + " brings it back)"
                    : "cannot be repaired without inventing readings; move it to the recycle bin with --remove"
                    + " (or: delete " + kind.key() + " " + id + ")";
        }
        return (repair ? "repaired: " : "repairable with --repair: ") + String.join("; ", o.changes());
    }

    static Object json(List<Finding> found) {
        List<Object> rows = new ArrayList<>();
        for (Finding f : found) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("record", f.record());
            m.put("id", f.id());
            m.put("visitId", f.visitId());
            m.put("problem", f.problem());
            m.put("outcome", f.outcome());
            rows.add(m);
        }
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("failing", rows.size());
        root.put("records", rows);
        return root;
    }

    static String table(List<Finding> found) {
        if (found.isEmpty()) {
            return "Every stored reading set and log passes today's checks.\n";
        }
        StringBuilder b = new StringBuilder();
        for (Finding f : found) {
            b.append(f.record()).append(' ').append(f.id()).append(" (visit ").append(Visits.shortId(f.visitId()))
                    .append("): ").append(f.problem()).append("\n  ").append(f.outcome()).append('\n');
        }
        return b.append(found.size()).append(found.size() == 1 ? " record fails" : " records fail")
                .append(" today's checks\n").toString();
    }
}
