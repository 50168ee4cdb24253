package app.latentledger.io.logcsv;

/**
 * Fast reader for the ISO-8601 date-times loggers write: {@code yyyy-MM-dd} then {@code T} or a
 * space, {@code HH:mm}, optional {@code :ss} and fraction, then optional {@code Z}, {@code ±HH},
 * {@code ±HH:mm} or {@code ±HHmm}. A week at 1 s is 604 800 timestamps, so this avoids the
 * allocation of java.time parsing; the calendar arithmetic is the proleptic Gregorian
 * days-from-civil algorithm (as java.time uses).
 */
final class IsoTimes {
    /** Result of the last successful parse. */
    static final class Parsed {
        double epochSeconds;
        boolean hasOffset;
        int offsetSeconds;
    }

    private IsoTimes() {
    }

    /**
     * @return true and fills {@code out} when {@code s} is a valid date-time; false otherwise
     *         (never throws)
     */
    static boolean parse(String s, Parsed out) {
        char[] c = s.toCharArray();
        return parse(c, 0, c.length, out);
    }

    /** The same on {@code s[from, to)}: no String per timestamp. */
    static boolean parse(char[] s, int from, int to, Parsed out) {
        return parseAt(s, from, to - from, out);
    }

    /** {@code n} chars of {@code s} from {@code o}; indices below are relative to {@code o}. */
    private static boolean parseAt(char[] s, int o, int n, Parsed out) {
        if (n < 16) {
            return false;
        }
        int year = digits(s, o, n, 0, 4);
        int month = digits(s, o, n, 5, 2);
        int day = digits(s, o, n, 8, 2);
        char sep = s[o + 10];
        int hour = digits(s, o, n, 11, 2);
        int minute = digits(s, o, n, 14, 2);
        if (year < 0 || month < 1 || month > 12 || day < 1 || s[o + 4] != '-' || s[o + 7] != '-'
                || sep != 'T' && sep != 't' && sep != ' ' || hour < 0 || hour > 23 || s[o + 13] != ':'
                || minute < 0 || minute > 59 || day > daysInMonth(year, month)) {
            return false;
        }
        int i = 16;
        double second = 0;
        if (i < n && s[o + i] == ':') {
            int sec = digits(s, o, n, i + 1, 2);
            if (sec < 0 || sec > 59) {
                return false;
            }
            second = sec;
            i += 3;
            if (i < n && (s[o + i] == '.' || s[o + i] == ',')) {
                int start = ++i;
                double scale = 0.1;
                while (i < n && s[o + i] >= '0' && s[o + i] <= '9') {
                    second += (s[o + i] - '0') * scale;
                    scale /= 10;
                    i++;
                }
                if (i == start) {
                    return false;
                }
            }
        }
        boolean hasOffset = false;
        int offset = 0;
        if (i < n) {
            char c = s[o + i];
            if ((c == 'Z' || c == 'z') && i + 1 == n) {
                hasOffset = true;
            } else if (c == '+' || c == '-') {
                int oh = digits(s, o, n, i + 1, 2);
                int om = 0;
                int rest = n - (i + 3);
                if (oh < 0 || oh > 18) {
                    return false;
                }
                if (rest == 3 && s[o + i + 3] == ':') {
                    om = digits(s, o, n, i + 4, 2);
                } else if (rest == 2) {
                    om = digits(s, o, n, i + 3, 2);
                } else if (rest != 0) {
                    return false;
                }
                if (om < 0 || om > 59) {
                    return false;
                }
                hasOffset = true;
                offset = (c == '-' ? -1 : 1) * (oh * 3600 + om * 60);
            } else {
                return false;
            }
        }
        long days = daysFromCivil(year, month, day);
        out.epochSeconds = days * 86_400.0 + hour * 3600 + minute * 60 + second - offset;
        out.hasOffset = hasOffset;
        out.offsetSeconds = offset;
        return true;
    }

    private static int digits(char[] s, int o, int n, int from, int count) {
        if (from + count > n) {
            return -1;
        }
        int v = 0;
        for (int i = from; i < from + count; i++) {
            char c = s[o + i];
            if (c < '0' || c > '9') {
                return -1;
            }
            v = v * 10 + (c - '0');
        }
        return v;
    }

    static int daysInMonth(int y, int m) {
        switch (m) {
            case 2:
                return (y % 4 == 0 && (y % 100 != 0 || y % 400 == 0)) ? 29 : 28;
            case 4: case 6: case 9: case 11:
                return 30;
            default:
                return 31;
        }
    }

    /** Days since 1970-01-01 of a proleptic Gregorian date. */
    static long daysFromCivil(int y, int m, int d) {
        int yy = m <= 2 ? y - 1 : y;
        long era = Math.floorDiv(yy, 400);
        long yoe = yy - era * 400;
        long doy = (153L * (m + (m > 2 ? -3 : 9)) + 2) / 5 + d - 1;
        long doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
        return era * 146_097 + doe - 719_468;
    }
}
