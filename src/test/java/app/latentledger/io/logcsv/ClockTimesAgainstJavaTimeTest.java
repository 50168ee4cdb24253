package app.latentledger.io.logcsv;

import app.latentledger.core.units.UnitSystem;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

import java.io.StringReader;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.time.zone.ZoneOffsetTransition;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The importer's hand-written clock-time readers against java.time as the outside reference:
 * random instants in several zones, written in the forms loggers use, read straight from a char
 * buffer; and local clock times across daylight-saving changes, turned into moments with the file's
 * zone, against {@link ZonedDateTime#of(LocalDateTime, ZoneId)} (which takes the offset before a
 * gap and the earlier offset in an overlap, as the importer documents). Dates 1990–2040, whose
 * zone changes fall on whole minutes.
 */
class ClockTimesAgainstJavaTimeTest {
    private static final String[] ZONES = {"America/New_York", "Europe/Berlin", "Australia/Sydney",
        "Australia/Lord_Howe", "Pacific/Chatham", "America/St_Johns", "Asia/Kolkata", "UTC"};
    private static final DateTimeFormatter[] WITH_OFFSET = {
        DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ssXXX"),
        DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm:ss.SSSxx"),
        DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mmxxx"),
    };
    /** 1990-01-01T00:00:00Z and 2040-01-01T00:00:00Z, checked against java.time in {@link #range}. */
    private static final long FROM = 631_152_000L;
    private static final long TO = 2_208_988_800L;

    @net.jqwik.api.Example
    void range() {
        assertEquals(Instant.parse("1990-01-01T00:00:00Z").getEpochSecond(), FROM);
        assertEquals(Instant.parse("2040-01-01T00:00:00Z").getEpochSecond(), TO);
    }

    @Property(tries = 3000)
    void isoTimesWithAnOffsetAreTheSameMomentAsJavaTime(@ForAll @LongRange(min = 0, max = TO - FROM) long second,
                                                        @ForAll @IntRange(min = 0, max = 999) int millis,
                                                        @ForAll @IntRange(min = 0, max = 7) int zone,
                                                        @ForAll @IntRange(min = 0, max = 2) int form) {
        Instant at = Instant.ofEpochSecond(FROM + second, millis * 1_000_000L);
        String text = ZonedDateTime.ofInstant(at, ZoneId.of(ZONES[zone])).format(WITH_OFFSET[form]);
        double expected = OffsetDateTime.parse(text, WITH_OFFSET[form]).toInstant().toEpochMilli() / 1000.0;
        // inside a larger buffer, as the row splitter hands it over
        char[] buf = ("x," + text + ",y").toCharArray();
        IsoTimes.Parsed p = new IsoTimes.Parsed();
        assertTrue(IsoTimes.parse(buf, 2, 2 + text.length(), p), text);
        assertEquals(expected, p.epochSeconds, 1e-6, text);
        assertEquals(OffsetDateTime.parse(text, WITH_OFFSET[form]).getOffset().getTotalSeconds(), p.offsetSeconds, text);
    }

    @Property(tries = 150)
    void localClockTimesAcrossDaylightSavingChanges(@ForAll @LongRange(min = 0, max = TO - FROM - 400 * 86_400L) long second,
                                                    @ForAll @IntRange(min = 0, max = 5) int zoneIndex,
                                                    @ForAll("forms") String pattern,
                                                    @ForAll @IntRange(min = 1, max = 120) int stepS,
                                                    @ForAll @IntRange(min = 0, max = 10_800) int leadS) throws Exception {
        ZoneId zone = ZoneId.of(ZONES[zoneIndex]);
        ZoneOffsetTransition change = zone.getRules().nextTransition(Instant.ofEpochSecond(FROM + second));
        long start = change.getInstant().getEpochSecond() - leadS;
        DateTimeFormatter f = DateTimeFormatter.ofPattern(pattern, Locale.US);
        StringBuilder csv = new StringBuilder("time,return_db\n");
        TreeSet<Long> expected = new TreeSet<>();
        for (int i = 0; i < 300; i++) {
            LocalDateTime local = LocalDateTime.ofInstant(Instant.ofEpochSecond(start + (long) i * stepS), zone);
            csv.append(local.format(f)).append(",75\n");
            expected.add(ZonedDateTime.of(local, zone).toEpochSecond());
        }
        DateOrder order = pattern.startsWith("M") ? DateOrder.MDY : pattern.startsWith("d") ? DateOrder.DMY : DateOrder.AUTO;
        String text = csv.toString();
        LogImport got = new LogCsvImporter(UnitSystem.IP, Map.of(), order, zone, null)
                .read(new StringReader(text), text.length());
        assertEquals(expected.size(), got.series().size(), pattern + " " + zone + " around " + change);
        int k = 0;
        for (long e : expected) {
            double t = got.series().origin().firstEpochSecond() + got.series().timeS(k++);
            assertEquals(e, t, 1e-6, pattern + " " + zone + " around " + change + ", row " + k);
        }
    }

    @Provide
    Arbitrary<String> forms() {
        return Arbitraries.of("uuuu-MM-dd'T'HH:mm:ss", "uuuu-MM-dd HH:mm:ss", "M/d/uuuu h:mm:ss a",
                "dd/MM/uuuu HH:mm:ss", "dd.MM.uuuu HH:mm:ss");
    }
}
