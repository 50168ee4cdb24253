package app.latentledger.core.records;

import java.time.ZoneId;
import java.util.Set;

/**
 * The rule for a site's time zone: a region id of the IANA time zone database as Java knows it
 * ({@link ZoneId#getAvailableZoneIds()}, e.g. "America/Chicago"), so daylight saving time follows
 * the place. A fixed offset ("-05:00") is refused: it would read a summer log an hour off once the
 * clocks change. Letter case is forgiven ("america/chicago" is kept as "America/Chicago").
 */
public final class SiteTimeZone {
    private SiteTimeZone() {
    }

    /**
     * The zone id as kept: "" for none (null or blank), else the known region id.
     *
     * @throws InvalidRecordException naming the field and the value, when it is not a region id
     */
    public static String check(String field, String value) {
        String t = value == null ? "" : value.strip();
        if (t.isEmpty()) {
            return "";
        }
        Set<String> known = ZoneId.getAvailableZoneIds();
        if (known.contains(t)) {
            return t;
        }
        for (String k : known) {
            if (k.equalsIgnoreCase(t)) {
                return k;
            }
        }
        throw new InvalidRecordException(field, "'" + t + "' is not a time zone region id; give one such as"
                + " America/Chicago, America/New_York or America/Denver (IANA time zone database), or none");
    }
}
