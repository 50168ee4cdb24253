package app.latentledger.core.records;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

import java.time.ZoneId;
import java.util.Optional;

/**
 * A building the tech works at. The elevation sets the standard-atmosphere pressure every
 * reading set at the site is worked out with, unless a reading set carries a measured pressure.
 *
 * @param id         stable id, kept across bundles
 * @param name       what the office calls the job, e.g. "Harbor Lane residence"
 * @param address    street address as written on the work order
 * @param elevationM site elevation above sea level, m (−450 to 4500 m, {@link InputLimits})
 * @param notes      free text
 * @param timeZone   the site's time zone as an IANA region id ("America/Chicago"), "" when not
 *                   given: a logger's clock times written without a UTC offset are read in it
 */
public record Site(String id, String name, String address, double elevationM, String notes, String timeZone) {
    public Site {
        id = Check.id("site id", id);
        name = Check.text("site name", name, 200);
        address = Check.optionalText("site address", address, 500);
        Check.range("site elevation", Quantity.ELEVATION, elevationM,
                InputLimits.MIN_ELEVATION_M, InputLimits.MAX_ELEVATION_M);
        notes = Check.optionalText("site notes", notes, 10_000);
        timeZone = SiteTimeZone.check("site time zone", timeZone);
    }

    /** A site without a time zone (logs at it are read in the machine's zone unless one is chosen). */
    public Site(String id, String name, String address, double elevationM, String notes) {
        this(id, name, address, elevationM, notes, "");
    }

    /** The site's zone, empty when none was given. */
    public Optional<ZoneId> zone() {
        return timeZone.isEmpty() ? Optional.empty() : Optional.of(ZoneId.of(timeZone));
    }

    /** The same site in another zone ("" or null: none). */
    public Site withTimeZone(String zone) {
        return new Site(id, name, address, elevationM, notes, zone);
    }
}
