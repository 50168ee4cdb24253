package app.latentledger.io.logcsv;

import java.util.Locale;

/** How a date written with slashes, dots or dashes (not ISO-8601) is read. */
public enum DateOrder {
    /** Decide from the file: a field above 12 is the day; else the order under which days follow days. */
    AUTO,
    /** Month/day/year, as US loggers write it: 7/14/2026 1:05:00 PM. */
    MDY,
    /** Day/month/year: 14/07/2026 13:05. */
    DMY,
    /** Year/month/day: 2026/07/14 13:05:00. */
    YMD;

    /** "mdy", "dmy", "ymd" or "auto", any case. */
    public static DateOrder parse(String text) {
        for (DateOrder d : values()) {
            if (d.name().equalsIgnoreCase(text.strip())) {
                return d;
            }
        }
        throw new IllegalArgumentException("date order '" + text + "' is not one of mdy, dmy, ymd, auto");
    }

    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }
}
