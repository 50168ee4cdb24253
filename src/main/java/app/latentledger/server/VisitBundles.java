package app.latentledger.server;

import app.latentledger.bundle.BundleContent;
import app.latentledger.bundle.BundleObjects;
import app.latentledger.bundle.BundleScope;
import app.latentledger.bundle.BundleWriter;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * A visit as a bundle zip, built from the company's current revisions and written by the same
 * {@link BundleWriter} a tablet's export uses, so a download equals an export of the same visit
 * (without saved results: they are derived, not synced, and the importing side computes them).
 */
final class VisitBundles {
    private final OfficeDatabase db;

    VisitBundles(OfficeDatabase db) {
        this.db = db;
    }

    Reply bundle(Caller who, String visitId) {
        BundleContent content = Sql.inTransaction(db, c -> content(c, who, visitId));
        try {
            Path tmp = Files.createTempFile("visit-", ".zip");
            try {
                Files.delete(tmp);
                BundleWriter.write(content, visitId, tmp);
                return Reply.bytes(200, "application/zip", Files.readAllBytes(tmp))
                        .withHeader("Content-Disposition", "attachment; filename=\"visit-" + visitId + ".zip\"");
            } finally {
                Files.deleteIfExists(tmp);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static BundleContent content(Connection c, Caller who, String visitId) throws SQLException {
        SyncService.Current vr = live(c, who, SyncKind.VISIT, visitId);
        Visit visit = WireCodec.visit(vr.body());
        Site site = WireCodec.site(live(c, who, SyncKind.SITE, visit.siteId()).body());
        HvacSystem system = WireCodec.system(live(c, who, SyncKind.SYSTEM, visit.systemId()).body());
        List<ReadingSet> readings = new ArrayList<>();
        for (SyncService.Current r : SyncService.currentOfVisit(c, who.companyId(), SyncKind.READINGS, visitId)) {
            if (!r.deleted()) {
                readings.add(WireCodec.readingSet(r.body()));
            }
        }
        List<ImportedLog> logs = new ArrayList<>();
        for (SyncService.Current l : SyncService.currentOfVisit(c, who.companyId(), SyncKind.LOG, visitId)) {
            if (!l.deleted()) {
                byte[] samples = LogSamples.complete(c, who, l.id());
                if (samples == null) {
                    throw new ApiError(409, "samples-incomplete", "log " + l.id() + " of this visit has not all its"
                            + " samples on the server yet; sync the tablet that made it");
                }
                logs.add(WireCodec.log(l.body(), samples));
            }
        }
        List<Instrument> instruments = new ArrayList<>();
        List<BundleContent.InstrumentUse> uses = new ArrayList<>();
        for (SyncService.Current i : SyncService.currentOfVisit(c, who.companyId(), SyncKind.INSTRUMENT, visitId)) {
            if (!i.deleted()) {
                BundleObjects.InstrumentObject o = WireCodec.instrument(i.body());
                instruments.add(o.instrument());
                for (String readingSet : o.usedOn()) {
                    uses.add(new BundleContent.InstrumentUse(readingSet, o.instrument().id()));
                }
            }
        }
        List<VisitPaperwork> paperwork = new ArrayList<>();
        SyncService.currentOf(c, who.companyId(), SyncKind.PAPERWORK, visitId).filter(p -> !p.deleted())
                .ifPresent(p -> paperwork.add(WireCodec.paperwork(p.body())));
        return new BundleContent(BundleScope.VISIT, site, List.of(system), List.of(visit), readings, logs, List.of(),
                instruments, uses, paperwork, List.of());
    }

    /** The current live revision; 404 when absent, deleted or another company's (never revealing which). */
    private static SyncService.Current live(Connection c, Caller who, SyncKind kind, String id) throws SQLException {
        return SyncService.currentOf(c, who.companyId(), kind, id).filter(r -> !r.deleted())
                .orElseThrow(() -> ApiError.notFound("no " + kind.wire() + " " + id));
    }
}
