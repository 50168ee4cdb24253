package app.latentledger.sync.wire;

import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;

import java.util.Objects;

/**
 * The house facts of a visit as one synced record (id = the visit's id): the facts kept with the
 * visit's site (null when none are kept) and the house readings kept with the visit.
 */
public record HouseRecord(String visitId, String siteId, HouseFacts facts, HouseVisitReadings readings) {
    public HouseRecord {
        Objects.requireNonNull(visitId, "visitId");
        Objects.requireNonNull(siteId, "siteId");
        readings = readings == null ? HouseVisitReadings.EMPTY : readings;
    }

    /** True when there is nothing to keep: no facts and no readings. */
    public boolean isEmpty() {
        return facts == null && readings.equals(HouseVisitReadings.EMPTY);
    }
}
