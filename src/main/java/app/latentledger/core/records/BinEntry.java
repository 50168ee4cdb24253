package app.latentledger.core.records;

import java.time.OffsetDateTime;

/**
 * One deletion kept in the recycle bin: the record and everything that hung from it (a visit's
 * reading sets and logs, a site's systems and visits) until it is restored, the bin is emptied, or
 * it is older than the bin keeps things.
 *
 * @param id        the bin entry's id
 * @param kind      what was deleted
 * @param recordId  the deleted record's id
 * @param summary   what the tech sees in the bin, e.g. "Visit 2026-07-16 10:05, Heron Cove residence"
 * @param deletedAt when
 * @param siteId    the site it was at (its own id for a site), so a site bundle can carry it
 * @param visitId   the visit it was on (its own id for a visit), or "" for a site or system
 */
public record BinEntry(String id, RecordKind kind, String recordId, String summary, OffsetDateTime deletedAt,
                       String siteId, String visitId) {
    public BinEntry {
        id = Check.id("bin entry id", id);
        Check.present("bin entry kind", kind);
        recordId = Check.id("bin entry record", recordId);
        summary = Check.optionalText("bin entry summary", summary, 500);
        Check.present("bin entry time", deletedAt);
        siteId = Check.id("bin entry site", siteId);
        visitId = visitId == null ? "" : visitId;
    }
}
