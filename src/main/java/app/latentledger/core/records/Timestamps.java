package app.latentledger.core.records;

import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;

/** The one text form of a record time: ISO-8601 with seconds and offset, e.g. 2024-07-16T10:05:00-04:00. */
public final class Timestamps {
    private Timestamps() {
    }

    public static String text(OffsetDateTime t) {
        return t.format(DateTimeFormatter.ISO_OFFSET_DATE_TIME);
    }
}
