package app.latentledger.ui.job;

import java.time.ZoneId;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The time zones the site form offers, so a tech picks "Central" rather than typing an IANA id:
 * the tablet's zone (no zone kept), the zones of the United States and Canada by their usual names,
 * and, when searched, any region id Java knows. The ids are those of the IANA time zone database,
 * whose rules (daylight saving included) Java applies.
 */
public final class SiteZones {
    /**
     * One choice.
     *
     * @param id    the IANA region id kept with the site, "" for the tablet's zone
     * @param label what the list shows
     */
    public record Choice(String id, String label) {
        @Override
        public String toString() {
            return label;
        }
    }

    /** No zone kept with the site: logs are read in the tablet's zone. */
    public static final Choice TABLET = new Choice("", "Tablet's zone (default)");

    /** The usual zones of the United States and Canada, east to west, then those without daylight saving. */
    private static final List<Choice> COMMON = List.of(
            TABLET,
            new Choice("America/St_Johns", "Newfoundland · America/St_Johns"),
            new Choice("America/Halifax", "Atlantic · America/Halifax"),
            new Choice("America/New_York", "Eastern · America/New_York"),
            new Choice("America/Toronto", "Eastern · America/Toronto"),
            new Choice("America/Chicago", "Central · America/Chicago"),
            new Choice("America/Winnipeg", "Central · America/Winnipeg"),
            new Choice("America/Denver", "Mountain · America/Denver"),
            new Choice("America/Edmonton", "Mountain · America/Edmonton"),
            new Choice("America/Los_Angeles", "Pacific · America/Los_Angeles"),
            new Choice("America/Vancouver", "Pacific · America/Vancouver"),
            new Choice("America/Anchorage", "Alaska · America/Anchorage"),
            new Choice("Pacific/Honolulu", "Hawaii · Pacific/Honolulu"),
            new Choice("America/Phoenix", "Mountain, no daylight saving (Arizona) · America/Phoenix"),
            new Choice("America/Regina", "Central, no daylight saving (Saskatchewan) · America/Regina"),
            new Choice("America/Puerto_Rico", "Atlantic, no daylight saving · America/Puerto_Rico"));

    /** At most this many matches of a search are listed. */
    static final int MAX_FOUND = 40;

    private SiteZones() {
    }

    /** The tablet's zone and the usual zones of the United States and Canada. */
    public static List<Choice> common() {
        return COMMON;
    }

    /** The choice for a kept zone id: its usual name when it has one, else the id itself ("" → the tablet's). */
    public static Choice of(String id) {
        for (Choice c : COMMON) {
            if (c.id().equals(id == null ? "" : id)) {
                return c;
            }
        }
        return new Choice(id, id);
    }

    /**
     * The choices for what the tech typed to search: the tablet's zone and {@code current} first, then
     * the usual zones whose name or id holds it, then any other region id that does ("regina",
     * "los angeles" and "Europe/Lis" all find theirs); the usual list when nothing is typed.
     */
    public static List<Choice> search(String typed, Choice current) {
        Set<Choice> out = new LinkedHashSet<>();
        out.add(TABLET);
        if (current != null) {
            out.add(current);
        }
        String q = typed == null ? "" : typed.strip().toLowerCase(Locale.ROOT);
        if (q.isEmpty()) {
            out.addAll(COMMON);
            return new ArrayList<>(out);
        }
        String asId = q.replace(' ', '_');
        for (Choice c : COMMON) {
            if (c.label().toLowerCase(Locale.ROOT).contains(q) || c.id().toLowerCase(Locale.ROOT).contains(asId)) {
                out.add(c);
            }
        }
        List<String> ids = new ArrayList<>(ZoneId.getAvailableZoneIds());
        ids.sort(null);
        int found = 0;
        for (String id : ids) {
            if (found >= MAX_FOUND) {
                break;
            }
            if (id.contains("/") && id.toLowerCase(Locale.ROOT).contains(asId) && out.add(of(id))) {
                found++;
            }
        }
        return new ArrayList<>(out);
    }
}
