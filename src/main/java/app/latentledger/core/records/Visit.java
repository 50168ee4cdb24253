package app.latentledger.core.records;

import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;

/**
 * One trip to a site to look at one system.
 *
 * @param id         stable id
 * @param siteId     where
 * @param systemId   which system (must belong to the site; the store checks)
 * @param startedAt  local date-time with its offset, as the tablet's clock had it, to the second
 * @param technician who took the readings
 * @param purpose    why the visit was made
 * @param notes      free text: complaint in the owner's words, what was changed
 */
public record Visit(String id, String siteId, String systemId, OffsetDateTime startedAt, String technician,
                    VisitPurpose purpose, String notes) {
    public Visit {
        id = Check.id("visit id", id);
        siteId = Check.id("visit site", siteId);
        systemId = Check.id("visit system", systemId);
        // seconds are enough on a work order and make stored text and bundles round-trip exactly
        startedAt = Check.present("visit date-time", startedAt).truncatedTo(ChronoUnit.SECONDS);
        technician = Check.text("visit technician", technician, 200);
        Check.present("visit purpose", purpose);
        notes = Check.optionalText("visit notes", notes, 10_000);
    }
}
