package app.latentledger.report;

import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;

import java.util.ArrayList;
import java.util.List;

/**
 * What one report shows: one visit, or two visits compared, and the before/after pair when there is
 * one.
 *
 * <p>The pair: for one visit, its reading sets labelled "before" and "after" (else its first and
 * last complete sets) when it has two or more; for two visits, the earlier visit's first complete
 * set (as found) against the later visit's last complete set (as left). A single complete set has
 * no pair.
 *
 * @param units  display units
 * @param visits the visit, or the two visits in time order
 * @param pair   before and after, or null
 * @param paperwork the visits' notes, sign-offs and instruments
 */
public record ReportData(UnitSystem units, List<VisitEvidence> visits, BeforeAfter pair, ReportPaperwork paperwork) {
    public ReportData {
        visits = List.copyOf(visits);
        paperwork = paperwork == null ? ReportPaperwork.NONE : paperwork;
    }

    /** A report without paperwork. */
    public ReportData(UnitSystem units, List<VisitEvidence> visits, BeforeAfter pair) {
        this(units, visits, pair, ReportPaperwork.NONE);
    }

    /**
     * @param compareVisitId another visit to compare with, or null
     * @throws ReportRefusedException for an unknown visit, or a visit compared with itself
     */
    public static ReportData load(Ledger ledger, String visitId, String compareVisitId, UnitSystem units) {
        VisitEvidence main = VisitEvidence.load(ledger, visitId, units);
        if (compareVisitId == null) {
            return new ReportData(units, List.of(main), BeforeAfter.within(main),
                    ReportPaperwork.load(ledger, List.of(main)));
        }
        if (compareVisitId.equals(visitId)) {
            throw new ReportRefusedException("a visit cannot be compared with itself; its own before and after"
                    + " readings are compared in its own report");
        }
        VisitEvidence other = VisitEvidence.load(ledger, compareVisitId, units);
        List<VisitEvidence> both = new ArrayList<>(List.of(main, other));
        both.sort((a, b) -> a.visit().startedAt().toInstant().compareTo(b.visit().startedAt().toInstant()));
        return new ReportData(units, both, BeforeAfter.across(both.get(0), both.get(1)), ReportPaperwork.load(ledger, both));
    }

    public boolean comparesVisits() {
        return visits.size() == 2;
    }

    /** The visit the report is about (the later one of a compared pair). */
    public VisitEvidence latest() {
        return visits.get(visits.size() - 1);
    }

    /** Whether the compared visits are of different systems (the report says so plainly). */
    public boolean differentSystems() {
        return comparesVisits() && !visits.get(0).system().id().equals(visits.get(1).system().id());
    }
}
