package app.latentledger.io.logcsv;

/**
 * Reader for the date-times loggers write when not ISO-8601: three date fields separated by '/',
 * '.' or '-' (a 4-digit year first or last), a space, {@code H:mm} or {@code H:mm:ss} (optional
 * fraction), and an optional AM/PM. The date fields are kept as written and the order decided for
 * the whole file ({@link DateOrder}), because "7/3/2026" alone is either 3 July or 7 March.
 */
final class SlashedTimes {
    /** The fields of the last parse. */
    static final class Parsed {
        /** First and second date fields, and the year. */
        int first;
        int second;
        int year;
        /** True when the year came first (year/month/day). */
        boolean yearFirst;
        double secondOfDay;
        /** Scratch for the parse, kept to save two arrays per row. */
        final int[] fields = new int[3];
        final int[] widths = new int[3];
    }

    private SlashedTimes() {
    }

    /** True and fills {@code out} when {@code s} has this shape (the date itself is checked later). */
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
        int i = 0;
        int[] f = out.fields;
        int[] width = out.widths;
        char sep = 0;
        for (int k = 0; k < 3; k++) {
            int start = i;
            int v = 0;
            while (i < n && Character.isDigit(s[o + i]) && i - start < 4) {
                v = v * 10 + (s[o + i] - '0');
                i++;
            }
            width[k] = i - start;
            if (width[k] == 0) {
                return false;
            }
            f[k] = v;
            if (k < 2) {
                if (i >= n) {
                    return false;
                }
                char c = s[o + i];
                if (c != '/' && c != '.' && c != '-' || sep != 0 && c != sep) {
                    return false;
                }
                sep = c;
                i++;
            }
        }
        boolean yearFirst = width[0] == 4;
        if (!yearFirst && width[2] != 4 || yearFirst && width[2] > 2 || width[1] > 2 || !yearFirst && width[0] > 2) {
            return false;
        }
        if (i >= n || s[o + i] != ' ' && s[o + i] != 'T') {
            return false;
        }
        while (i < n && s[o + i] == ' ' || i < n && s[o + i] == 'T') {
            i++;
        }
        int hStart = i;
        int hour = 0;
        while (i < n && Character.isDigit(s[o + i]) && i - hStart < 2) {
            hour = hour * 10 + (s[o + i] - '0');
            i++;
        }
        if (i == hStart || i + 2 >= n || s[o + i] != ':') {
            return false;
        }
        int minute = two(s, o, n, i + 1);
        i += 3;
        double second = 0;
        if (minute < 0 || minute > 59) {
            return false;
        }
        if (i < n && s[o + i] == ':') {
            int sec = two(s, o, n, i + 1);
            if (sec < 0 || sec > 59) {
                return false;
            }
            second = sec;
            i += 3;
            if (i < n && s[o + i] == '.') {
                int start = ++i;
                double scale = 0.1;
                while (i < n && Character.isDigit(s[o + i])) {
                    second += (s[o + i] - '0') * scale;
                    scale /= 10;
                    i++;
                }
                if (i == start) {
                    return false;
                }
            }
        }
        while (i < n && s[o + i] == ' ') {
            i++;
        }
        if (i < n) {
            boolean pm = Cells.equalsIgnoreCase(s, o + i, o + n, "PM") || Cells.equalsIgnoreCase(s, o + i, o + n, "P.M.");
            boolean am = Cells.equalsIgnoreCase(s, o + i, o + n, "AM") || Cells.equalsIgnoreCase(s, o + i, o + n, "A.M.");
            if (!pm && !am || hour < 1 || hour > 12) {
                return false;
            }
            hour = hour % 12 + (pm ? 12 : 0);
        } else if (hour > 23) {
            return false;
        }
        out.yearFirst = yearFirst;
        out.year = yearFirst ? f[0] : f[2];
        out.first = yearFirst ? f[1] : f[0];
        out.second = yearFirst ? f[2] : f[1];
        out.secondOfDay = hour * 3600.0 + minute * 60.0 + second;
        return true;
    }

    private static int two(char[] s, int o, int n, int i) {
        if (i + 2 > n || !Character.isDigit(s[o + i]) || !Character.isDigit(s[o + i + 1])) {
            return -1;
        }
        return (s[o + i] - '0') * 10 + (s[o + i + 1] - '0');
    }

    /** Days since 1970-01-01, or Long.MIN_VALUE when month/day are not a date. */
    static long epochDay(int year, int month, int day) {
        if (month < 1 || month > 12 || day < 1 || day > IsoTimes.daysInMonth(year, month)) {
            return Long.MIN_VALUE;
        }
        return IsoTimes.daysFromCivil(year, month, day);
    }
}
