package app.latentledger.report;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.List;

/**
 * The visit report of one batch row, from the records the row was checked as (the same records
 * {@code batch --store} saves), laid out by the one report layout ({@link ReportDocument}). It needs
 * no ledger, so a batch can write its reports without storing, and in parallel.
 */
public final class BatchVisitReport {
    private BatchVisitReport() {
    }

    /**
     * Writes the report to {@code output} through the report's safe-file rule (complete or absent).
     *
     * @param result the coil check of {@code set}, as the batch ran it
     */
    public static Path write(Site site, HvacSystem system, Visit visit, ReadingSet set, CoilResult result,
                             PaperSize paper, UnitSystem units, Path output) {
        ReportData data = data(site, system, visit, set, result, units);
        OffsetDateTime now = OffsetDateTime.now(visit.startedAt().getOffset());
        return VisitReport.SafeFile.write(output, out -> ReportDocument.write(data, paper, now, out));
    }

    /** As {@link #write}, into a stream; for benchmarks and tests. */
    public static void write(Site site, HvacSystem system, Visit visit, ReadingSet set, CoilResult result,
                             PaperSize paper, UnitSystem units, OutputStream out) throws IOException {
        ReportDocument.write(data(site, system, visit, set, result, units), paper,
                OffsetDateTime.now(visit.startedAt().getOffset()), out);
    }

    private static ReportData data(Site site, HvacSystem system, Visit visit, ReadingSet set, CoilResult result,
                                   UnitSystem units) {
        VisitEvidence v = new VisitEvidence(visit, site, system, List.of(new CheckedReadings(set, result, List.of())),
                List.of());
        return new ReportData(units, List.of(v), BeforeAfter.within(v));
    }
}
