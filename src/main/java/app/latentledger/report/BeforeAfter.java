package app.latentledger.report;

import java.util.List;

/**
 * A before/after pair of checked reading sets and the logs that go with each side.
 *
 * @param before      the "as found" readings
 * @param beforeVisit the visit they were taken on
 * @param after       the "as left" readings
 * @param afterVisit  the visit they were taken on
 * @param beforeLog   the before visit's first analysed log, only when two visits are compared, else null
 * @param afterLog    the after visit's first analysed log, as above
 */
public record BeforeAfter(CheckedReadings before, VisitEvidence beforeVisit, CheckedReadings after,
                          VisitEvidence afterVisit, AnalysedLog beforeLog, AnalysedLog afterLog) {

    /** Whether the two sides come from two visits. */
    public boolean acrossVisits() {
        return beforeVisit != afterVisit;
    }

    /** "As found", or "Earlier visit" when two visits are compared. */
    public String beforeTitle() {
        return acrossVisits() ? "Earlier visit" : "As found";
    }

    /** "After the work", or "Later visit" when two visits are compared. */
    public String afterTitle() {
        return acrossVisits() ? "Later visit" : "After the work";
    }

    /** The pair within one visit, or null when it has fewer than two complete reading sets. */
    static BeforeAfter within(VisitEvidence v) {
        List<CheckedReadings> sets = v.checkedReadings();
        if (sets.size() < 2) {
            return null;
        }
        CheckedReadings before = labelled(sets, "before");
        CheckedReadings after = labelled(sets, "after");
        if (before == null || after == null || before == after) {
            before = sets.get(0);
            after = sets.get(sets.size() - 1);
        }
        return new BeforeAfter(before, v, after, v, null, null);
    }

    /** Earlier visit's first complete set against the later visit's last; null when either has none. */
    static BeforeAfter across(VisitEvidence earlier, VisitEvidence later) {
        List<CheckedReadings> a = earlier.checkedReadings();
        List<CheckedReadings> b = later.checkedReadings();
        if (a.isEmpty() || b.isEmpty()) {
            return null;
        }
        return new BeforeAfter(a.get(0), earlier, b.get(b.size() - 1), later, earlier.firstAnalysedLog(),
                later.firstAnalysedLog());
    }

    private static CheckedReadings labelled(List<CheckedReadings> sets, String label) {
        for (CheckedReadings c : sets) {
            if (c.set().label().equalsIgnoreCase(label)) {
                return c;
            }
        }
        return null;
    }
}
