package app.latentledger.io.logcsv;

import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.zone.ZoneRules;

/**
 * Turns a file's clock readings into moments: the order of slashed dates, decided for the whole
 * file, and the time zone of clock times written without a UTC offset.
 */
final class ClockTimeResolver {
    private static final int DAY_S = 86_400;

    private ClockTimeResolver() {
    }

    /**
     * Decides the date order and turns {@code time} (seconds of the day) into local clock seconds
     * (epoch seconds as if the clock were UTC).
     *
     * <p>{@link DateOrder#AUTO}: a first field above 12 can only be a day (day/month), a second field
     * above 12 only a day (month/day). When every field is 12 or less, the order under which the log's
     * date changes are steps of one day wins (under the wrong order a change of day reads as a change
     * of month); when neither order shows a change, the file does not say and is refused.
     *
     * @throws LogRefusedException when the order cannot be told, or a date is not a date in it
     */
    static DateOrder resolve(double[] time, int[] dateKey, int n, boolean yearFirst, DateOrder asked)
            throws LogRefusedException {
        DateOrder order;
        if (yearFirst) {
            order = DateOrder.YMD;
        } else if (asked == DateOrder.MDY || asked == DateOrder.DMY) {
            order = asked;
        } else {
            order = guess(dateKey, n);
        }
        for (int i = 0; i < n; i++) {
            long day = epochDay(dateKey[i], order);
            if (day == Long.MIN_VALUE) {
                throw new LogRefusedException("the date " + written(dateKey[i], yearFirst) + " is not a date when read as "
                        + order.key() + " (" + describe(order) + "); choose the date order the logger wrote");
            }
            time[i] = day * (double) DAY_S + time[i];
        }
        return order;
    }

    private static DateOrder guess(int[] dateKey, int n) throws LogRefusedException {
        int maxFirst = 0;
        int maxSecond = 0;
        for (int i = 0; i < n; i++) {
            maxFirst = Math.max(maxFirst, dateKey[i] / 100 % 100);
            maxSecond = Math.max(maxSecond, dateKey[i] % 100);
        }
        if (maxFirst > 12 && maxSecond <= 12) {
            return DateOrder.DMY;
        }
        if (maxSecond > 12 && maxFirst <= 12) {
            return DateOrder.MDY;
        }
        if (maxFirst <= 12 && maxSecond <= 12) {
            int mdy = oddSteps(dateKey, n, DateOrder.MDY);
            int dmy = oddSteps(dateKey, n, DateOrder.DMY);
            boolean changes = changes(dateKey, n);
            if (changes && mdy < dmy) {
                return DateOrder.MDY;
            }
            if (changes && dmy < mdy) {
                return DateOrder.DMY;
            }
        }
        throw new LogRefusedException("dates such as " + written(dateKey[0], false) + " can be read as month/day/year"
                + " or day/month/year and the file does not tell which: choose the date order (mdy or dmy)");
    }

    private static boolean changes(int[] key, int n) {
        for (int i = 1; i < n; i++) {
            if (key[i] != key[i - 1]) {
                return true;
            }
        }
        return false;
    }

    /** Date changes between neighbouring rows that are not a step of one day (or an invalid date). */
    private static int oddSteps(int[] key, int n, DateOrder order) {
        int odd = 0;
        long prev = Long.MIN_VALUE;
        for (int i = 0; i < n; i++) {
            long d = epochDay(key[i], order);
            if (d == Long.MIN_VALUE) {
                odd++;
                continue;
            }
            if (prev != Long.MIN_VALUE && d != prev && Math.abs(d - prev) != 1) {
                odd++;
            }
            prev = d;
        }
        return odd;
    }

    private static long epochDay(int key, DateOrder order) {
        int year = key / 10_000;
        int first = key / 100 % 100;
        int second = key % 100;
        return order == DateOrder.DMY ? SlashedTimes.epochDay(year, second, first)
                : SlashedTimes.epochDay(year, first, second);
    }

    private static String written(int key, boolean yearFirst) {
        int year = key / 10_000;
        int first = key / 100 % 100;
        int second = key % 100;
        return yearFirst ? year + "/" + first + "/" + second : first + "/" + second + "/" + year;
    }

    private static String describe(DateOrder o) {
        return switch (o) {
            case MDY -> "month/day/year";
            case DMY -> "day/month/year";
            default -> "year/month/day";
        };
    }

    /**
     * Local clock seconds (as if UTC) → epoch seconds in {@code zone}, in place; the zone's rules
     * (daylight saving included) are looked up once per clock minute, as zones change their offset
     * on whole minutes (not always on whole hours: Newfoundland changed at 00:01 until 2011, the
     * Chatham Islands change at 2:45). A clock time in a gap takes the offset before it, one in an
     * overlap the earlier offset, as {@link java.time.ZonedDateTime#of} does.
     *
     * @return the UTC offset of the first row, s
     */
    static int toUtc(double[] time, int n, ZoneId zone) {
        ZoneRules rules = zone.getRules();
        long lastMinute = Long.MIN_VALUE;
        int offset = 0;
        int first = 0;
        for (int i = 0; i < n; i++) {
            long minute = (long) Math.floor(time[i] / 60.0);
            if (minute != lastMinute) {
                LocalDateTime local = LocalDateTime.ofEpochSecond(minute * 60, 0, ZoneOffset.UTC);
                offset = rules.getOffset(local).getTotalSeconds();
                lastMinute = minute;
            }
            if (i == 0) {
                first = offset;
            }
            time[i] -= offset;
        }
        return first;
    }
}
