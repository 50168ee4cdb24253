package app.latentledger.core.records;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

/**
 * A building the tech works at. The elevation sets the standard-atmosphere pressure every
 * reading set at the site is worked out with, unless a reading set carries a measured pressure.
 *
 * @param id         stable id, kept across bundles
 * @param name       what the office calls the job, e.g. "Harbor Lane residence"
 * @param address    street address as written on the work order
 * @param elevationM site elevation above sea level, m (−450 to 4500 m, {@link InputLimits})
 * @param notes      free text
 */
public record Site(String id, String name, String address, double elevationM, String notes) {
    public Site {
        id = Check.id("site id", id);
        name = Check.text("site name", name, 200);
        address = Check.optionalText("site address", address, 500);
        Check.range("site elevation", Quantity.ELEVATION, elevationM,
                InputLimits.MIN_ELEVATION_M, InputLimits.MAX_ELEVATION_M);
        notes = Check.optionalText("site notes", notes, 10_000);
    }
}
