package app.latentledger.report;

import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.Ledger;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The paperwork of the report's visits: the customer's words, the work done, the sign-offs, the
 * instruments used and which of them took each reading set.
 *
 * @param byVisit            paperwork by visit id (absent = nothing written)
 * @param instrumentsByVisit instruments recorded on each visit
 * @param usedBySet          instruments chosen for each reading set
 */
public record ReportPaperwork(Map<String, VisitPaperwork> byVisit, Map<String, List<Instrument>> instrumentsByVisit,
                              Map<String, List<Instrument>> usedBySet) {
    /** No paperwork at all. */
    public static final ReportPaperwork NONE = new ReportPaperwork(Map.of(), Map.of(), Map.of());

    public ReportPaperwork {
        byVisit = Map.copyOf(byVisit);
        instrumentsByVisit = Map.copyOf(instrumentsByVisit);
        usedBySet = Map.copyOf(usedBySet);
    }

    static ReportPaperwork load(Ledger ledger, List<VisitEvidence> visits) {
        Map<String, VisitPaperwork> byVisit = new HashMap<>();
        Map<String, List<Instrument>> instruments = new HashMap<>();
        Map<String, List<Instrument>> used = new HashMap<>();
        for (VisitEvidence v : visits) {
            String id = v.visit().id();
            ledger.paperwork().find(id).ifPresent(w -> byVisit.put(id, w));
            instruments.put(id, ledger.instruments().forVisit(id));
            for (CheckedReadings c : v.readings()) {
                used.put(c.set().id(), ledger.instruments().usedOn(c.set().id()));
            }
        }
        return new ReportPaperwork(byVisit, instruments, used);
    }

    /** The visit's paperwork, blank when nothing was written. */
    public VisitPaperwork of(String visitId) {
        return byVisit.getOrDefault(visitId, VisitPaperwork.blank(visitId));
    }

    public List<Instrument> instruments(String visitId) {
        return instrumentsByVisit.getOrDefault(visitId, List.of());
    }

    public List<Instrument> usedOn(String readingSetId) {
        return usedBySet.getOrDefault(readingSetId, List.of());
    }
}
