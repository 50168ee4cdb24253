package app.latentledger.io.logcsv;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import org.apache.commons.csv.CSVFormat;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.time.ZoneId;

/**
 * Reads a data-logger CSV into a {@link LogSeries}, converting to SI once, here at the edge.
 *
 * <p>Layout: a header row, then one row per sample. Columns are found by the generic field names
 * ({@code time} or {@code seconds}, {@code return_db}, {@code return_rh}, {@code return_wb},
 * {@code supply_db}, {@code supply_rh}, {@code supply_wb}, {@code coil_temp}, {@code outdoor_db},
 * {@code outdoor_rh}, {@code compressor}, {@code fan}; any case) or by {@code HEADER=field} maps for
 * other loggers. The separator (',' ';' or tab) is taken from the header line; with ';' numbers
 * may use a decimal comma. Temperatures are in the given unit system (°F or °C), RH in %, status as
 * 0/1 (or on/off, true/false). Quotes around a field are removed; a quoted field cannot contain the
 * separator (loggers do not write such fields, and refusing quote parsing means a stray quote can
 * never swallow the rest of a file).
 *
 * <p>Bad rows are kept out and listed as {@code line:column: message}; empty cells and NA/NaN are
 * missing readings, not errors. RH up to 103 % is taken as 100 % (probes read slightly over
 * saturation near a wet coil; common practice, no source). Rows out of time order are sorted,
 * repeated times keep the first row. The importer throws nothing but {@link LogRefusedException}
 * for bad content (and {@link IOException} when the file cannot be read at all).
 */
public final class LogCsvImporter {
    /** Rejected rows listed by line; the rest are only counted. */
    public static final int MAX_MESSAGES = 25;
    /** Longest usual sample interval accepted, s: cycle timing needs 5 min or less. */
    public static final double MAX_INTERVAL_S = 300.0;
    private static final int MAX_HEADER_CHARS = 65_536;
    private static final int MAX_SHOWN_CHARS = 40;
    private static final double RH_SATURATION_SLACK_PCT = 3.0;
    private static final double GAP_FACTOR = 3.0;
    private static final Channel[] CHANNELS = Channel.values();

    private final UnitSystem units;
    private final Map<String, String> maps;
    private final DateOrder dateOrder;
    private final ZoneId zone;
    private final ImportProgress progress;

    /**
     * @param units    unit system of the temperature columns
     * @param maps     logger header → generic field name ({@code --map HEADER=field}), any order
     * @param progress told how far the import has got
     */
    public LogCsvImporter(UnitSystem units, Map<String, String> maps, ImportProgress progress) {
        this(units, maps, DateOrder.AUTO, null, progress);
    }

    /**
     * @param units     unit system of the temperature columns when their headers state none
     * @param maps      logger header → generic field name, any order
     * @param dateOrder how dates that are not ISO-8601 are read
     * @param zone      time zone of clock times written without a UTC offset; null reads them as
     *                  a local clock without a zone (shown as written)
     * @param progress  told how far the import has got
     */
    public LogCsvImporter(UnitSystem units, Map<String, String> maps, DateOrder dateOrder, ZoneId zone,
                          ImportProgress progress) {
        this.units = units;
        this.maps = new LinkedHashMap<>(maps);
        this.dateOrder = dateOrder == null ? DateOrder.AUTO : dateOrder;
        this.zone = zone;
        this.progress = progress == null ? ImportProgress.NONE : progress;
    }

    /** Reads a file (UTF-8; undecodable bytes become U+FFFD and so fail as values, not as a crash). */
    public LogImport read(Path file) throws IOException, LogRefusedException {
        long size = Files.size(file);
        try (Reader r = new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPLACE).onUnmappableCharacter(CodingErrorAction.REPLACE))) {
            return read(r, size);
        }
    }

    /**
     * @param in         the text
     * @param totalChars its length for progress (≤ 0 when unknown)
     */
    public LogImport read(Reader in, long totalChars) throws IOException, LogRefusedException {
        // the importer's own splitter: the same rows and fields as format(delimiter) gives, no String per cell
        RowSplitter rows0 = new RowSplitter(in, ',');
        String headerLine = firstLine(rows0);
        char delimiter = sniffDelimiter(headerLine);
        boolean decimalComma = delimiter == ';';
        rows0.delimiter(delimiter);
        if (!rows0.next()) {
            throw new LogRefusedException("the file is empty: a log needs a header row and sample rows");
        }
        HeaderLayout header = HeaderLayout.read(names(rows0), maps);
        // rows are about as long as the header: size the columns once instead of doubling them
        int capacity = (int) Math.max(1024, Math.min(50_000_000L, totalChars / Math.max(20, headerLine.length())));
        UnitSystem stated = header.statedTemperatureUnit();
        Rows rows = new Rows(header, capacity, stated != null ? stated : units, stated != null);
        int rowsRead = 0;
        IsoTimes.Parsed parsed = new IsoTimes.Parsed();
        Boolean offsetMode = null;
        while (rows0.next()) {
            // the physical line a text editor shows the row on (blank lines skipped but counted)
            long line = rows0.line();
            rowsRead++;
            if ((rowsRead & 8191) == 0 && totalChars > 0) {
                progress.progress(Math.min(1.0, rows0.position() / (double) totalChars));
            }
            RowProblem problem = rows.add(rows0, line, decimalComma, parsed, offsetMode);
            if (problem != null) {
                rows.reject(problem.text());
            } else if (offsetMode == null && header.timeIsIso && !rows.slashed) {
                offsetMode = parsed.hasOffset;
                rows.firstOffsetSeconds = parsed.offsetSeconds;
            }
        }
        progress.progress(1.0);
        return rows.finish(rowsRead, delimiter, decimalComma, Boolean.TRUE.equals(offsetMode));
    }

    /**
     * The CSV format a log's rows follow, in commons-csv terms: {@link RowSplitter} reads exactly
     * these rows and fields (its test checks that against commons-csv), and the benchmark's reference
     * parse uses it.
     */
    public static CSVFormat format(char delimiter) {
        return CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setQuote(null).setIgnoreEmptyLines(true)
                .setTrim(true).get();
    }

    /**
     * The header row, read with the importer's own splitter: the one rule for the importer and the
     * app's column picker (same length limit, same refusals).
     */
    static String firstLine(RowSplitter rows) throws IOException, LogRefusedException {
        String headerLine = rows.peekFirstLine(MAX_HEADER_CHARS);
        if (headerLine == null) {
            throw new LogRefusedException("the file is empty: a log needs a header row and sample rows");
        }
        if (headerLine.length() > MAX_HEADER_CHARS) {
            throw new LogRefusedException("the first line is over " + MAX_HEADER_CHARS
                    + " characters: not a header row of a log");
        }
        return headerLine;
    }

    static char sniffDelimiter(String header) {
        int comma = 0;
        int semi = 0;
        int tab = 0;
        for (int i = 0; i < header.length(); i++) {
            char c = header.charAt(i);
            if (c == ',') {
                comma++;
            } else if (c == ';') {
                semi++;
            } else if (c == '\t') {
                tab++;
            }
        }
        if (tab > comma && tab > semi) {
            return '\t';
        }
        return semi > comma ? ';' : ',';
    }

    /** The header row's names, cleaned: the one rule for the importer and {@link LogColumns}. */
    static String[] names(RowSplitter row) {
        String[] names = new String[row.size()];
        for (int c = 0; c < names.length; c++) {
            names[c] = clean(row.text(c));
        }
        return names;
    }

    static String clean(String s) {
        String t = s.strip();
        if (!t.isEmpty() && t.charAt(0) == '\uFEFF') {
            t = t.substring(1).strip();
        }
        if (t.length() >= 2 && t.charAt(0) == '"' && t.charAt(t.length() - 1) == '"') {
            t = t.substring(1, t.length() - 1).strip();
        }
        return t;
    }

    private static String quote(char[] b, int from, int to) {
        return quote(new String(b, from, to - from));
    }

    private static String quote(String v) {
        String s = v.length() > MAX_SHOWN_CHARS ? v.substring(0, MAX_SHOWN_CHARS) + "…" : v;
        StringBuilder b = new StringBuilder("'");
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            b.append(Character.isISOControl(c) ? '?' : c);
        }
        return b.append('\'').toString();
    }

    /** Growing columns of good rows. */
    private final class Rows {
        final HeaderLayout header;
        /** The unit temperatures are read in, and whether a header stated it. */
        final UnitSystem tempUnit;
        final boolean unitFromHeader;
        double[] time;
        /** Date fields of slashed dates (year·10⁴ + first·10² + second), decided at the end. */
        int[] dateKey;
        boolean slashed;
        boolean yearFirst;
        final SlashedTimes.Parsed slashedParsed = new SlashedTimes.Parsed();
        final double[][] analog = new double[Channel.values().length][];
        final byte[][] status = new byte[Channel.values().length][];
        int n;
        int rejectedCount;
        final List<String> rejected = new ArrayList<>();
        int firstOffsetSeconds;

        Rows(HeaderLayout header, int capacity, UnitSystem tempUnit, boolean unitFromHeader) {
            this.header = header;
            this.tempUnit = tempUnit;
            this.unitFromHeader = unitFromHeader;
            this.time = new double[capacity];
            for (Channel c : CHANNELS) {
                if (header.analogColumn[c.ordinal()] >= 0) {
                    if (c.isStatus()) {
                        status[c.ordinal()] = new byte[capacity];
                    } else {
                        analog[c.ordinal()] = new double[capacity];
                    }
                }
            }
        }

        void reject(String message) {
            rejectedCount++;
            if (rejected.size() < MAX_MESSAGES) {
                rejected.add(message);
            }
        }

        /** Adds the row, or returns why it was kept out. */
        RowProblem add(RowSplitter row, long line, boolean decimalComma, IsoTimes.Parsed parsed, Boolean offsetMode) {
            int size = row.size();
            if (size < header.width) {
                if (size == 1 && row.trimmedEnd(0) == row.trimmedStart(0)) {
                    return RowProblem.row(line, "empty row");
                }
                return RowProblem.row(line, size + " of " + header.width + " columns (line cut short?)");
            }
            for (int c = header.width; c < size; c++) {
                if (row.trimmedEnd(c) != row.trimmedStart(c)) {
                    return RowProblem.row(line, size + " columns, the header has " + header.width);
                }
            }
            if (n == time.length) {
                grow();
            }
            char[] b = row.chars();
            int tc = header.timeColumn;
            long tr = Cells.clean(b, row.trimmedStart(tc), row.trimmedEnd(tc));
            int ts = (int) (tr >>> 32);
            int te = (int) tr;
            double t;
            if (header.timeIsIso) {
                RowProblem p = clockTime(b, ts, te, line, tc, parsed, offsetMode);
                if (p != null) {
                    return p;
                }
                t = slashed ? slashedParsed.secondOfDay : parsed.epochSeconds;
            } else {
                t = DecimalText.parse(b, ts, te, decimalComma);
                if (!Double.isFinite(t)) {
                    return new RowProblem(line, tc + 1, "seconds", quote(b, ts, te) + " is not a number");
                }
            }
            for (int k = 0; k < header.present.length; k++) {
                Channel ch = header.present[k];
                int c = header.presentColumn[k];
                long r = Cells.clean(b, row.trimmedStart(c), row.trimmedEnd(c));
                int vs = (int) (r >>> 32);
                int ve = (int) r;
                String problem = ch.isStatus() ? status(ch, b, vs, ve) : analog(ch, b, vs, ve, decimalComma);
                if (problem != null) {
                    return new RowProblem(line, c + 1, ch.field(), problem);
                }
            }
            time[n] = t;
            if (slashed) {
                dateKey[n] = slashedParsed.year * 10_000 + slashedParsed.first * 100 + slashedParsed.second;
            }
            n++;
            return null;
        }

        /** ISO-8601 or a slashed date-time; the first good row decides which the file uses. */
        private RowProblem clockTime(char[] b, int ts, int te, long line, int tc, IsoTimes.Parsed parsed,
                                     Boolean offsetMode) {
            boolean first = n == 0 && !slashed && offsetMode == null;
            if (!slashed && IsoTimes.parse(b, ts, te, parsed)) {
                if (offsetMode != null && offsetMode != parsed.hasOffset) {
                    return new RowProblem(line, tc + 1, "time", quote(b, ts, te) + (parsed.hasOffset
                            ? " has a UTC offset, earlier rows had none" : " has no UTC offset, earlier rows had one"));
                }
                return null;
            }
            if ((slashed || first) && SlashedTimes.parse(b, ts, te, slashedParsed)
                    && (!slashed || slashedParsed.yearFirst == yearFirst)) {
                if (!slashed) {
                    slashed = true;
                    yearFirst = slashedParsed.yearFirst;
                    dateKey = new int[time.length];
                }
                return null;
            }
            return new RowProblem(line, tc + 1, "time", quote(b, ts, te) + " is not a date and time this reader knows"
                    + " (e.g. 2026-07-14T13:05:00, 2026-07-14T13:05:00-04:00, 7/14/2026 1:05:00 PM or"
                    + " 14/07/2026 13:05)");
        }

        private String status(Channel ch, char[] b, int vs, int ve) {
            byte s;
            if (DecimalText.missing(b, vs, ve)) {
                s = LogSeries.UNKNOWN;
            } else if (Cells.equals(b, vs, ve, "1") || Cells.equalsIgnoreCase(b, vs, ve, "on")
                    || Cells.equalsIgnoreCase(b, vs, ve, "true")) {
                s = 1;
            } else if (Cells.equals(b, vs, ve, "0") || Cells.equalsIgnoreCase(b, vs, ve, "off")
                    || Cells.equalsIgnoreCase(b, vs, ve, "false")) {
                s = 0;
            } else {
                double d = DecimalText.parse(b, vs, ve, false);
                if (!(d >= 0 && d <= 1)) {
                    return quote(b, vs, ve) + " is not a status (0/1, on/off)";
                }
                s = (byte) (d >= 0.5 ? 1 : 0);
            }
            status[ch.ordinal()][n] = s;
            return null;
        }

        private String analog(Channel ch, char[] b, int vs, int ve, boolean decimalComma) {
            double si;
            if (DecimalText.missing(b, vs, ve)) {
                si = Double.NaN;
            } else {
                double shown = DecimalText.parse(b, vs, ve, decimalComma);
                if (!Double.isFinite(shown)) {
                    return quote(b, vs, ve) + " is not a number";
                }
                if (ch.isTemperature()) {
                    si = Quantity.TEMPERATURE.fromDisplay(tempUnit, shown);
                    if (!FieldLimits.AIR_TEMPERATURE.accepts(si)) {
                        return String.format(Locale.ROOT, "%s %s outside %.0f to %.0f %s", quote(b, vs, ve),
                                Quantity.TEMPERATURE.symbol(tempUnit),
                                Quantity.TEMPERATURE.toDisplay(tempUnit, FieldLimits.AIR_TEMPERATURE.minSi()),
                                Quantity.TEMPERATURE.toDisplay(tempUnit, FieldLimits.AIR_TEMPERATURE.maxSi()),
                                Quantity.TEMPERATURE.symbol(tempUnit));
                    }
                } else {
                    if (shown < FieldLimits.RELATIVE_HUMIDITY.minSi()
                            || shown > FieldLimits.RELATIVE_HUMIDITY.maxSi() + RH_SATURATION_SLACK_PCT) {
                        return quote(b, vs, ve) + " % outside 0 to 100 %";
                    }
                    si = Math.min(100.0, shown);
                }
            }
            analog[ch.ordinal()][n] = si;
            return null;
        }

        private void grow() {
            int cap = time.length * 2;
            time = Arrays.copyOf(time, cap);
            if (dateKey != null) {
                dateKey = Arrays.copyOf(dateKey, cap);
            }
            for (int i = 0; i < analog.length; i++) {
                if (analog[i] != null) {
                    analog[i] = Arrays.copyOf(analog[i], cap);
                }
                if (status[i] != null) {
                    status[i] = Arrays.copyOf(status[i], cap);
                }
            }
        }

        LogImport finish(int rowsRead, char delimiter, boolean decimalComma, boolean hasOffset)
                throws LogRefusedException {
            if (n == 0) {
                throw new LogRefusedException("no readable rows: " + rowsRead + " data row(s), all kept out"
                        + (rejected.isEmpty() ? "" : "; first: " + rejected.get(0)));
            }
            DateOrder order = DateOrder.YMD;
            if (slashed) {
                order = ClockTimeResolver.resolve(time, dateKey, n, yearFirst, dateOrder);
            }
            boolean zoned = header.timeIsIso && !hasOffset && zone != null;
            int firstOffset = firstOffsetSeconds;
            if (zoned) {
                firstOffset = ClockTimeResolver.toUtc(time, n, zone);
            }
            UnitCheck.check(header, analog, n, tempUnit, unitFromHeader);
            int[] sorted = timeOrder();
            int outOfOrder = 0;
            double maxSoFar = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                if (time[i] < maxSoFar) {
                    outOfOrder++;
                }
                maxSoFar = Math.max(maxSoFar, time[i]);
            }
            int[] keep = new int[n];
            int kept = 0;
            int duplicates = 0;
            for (int k = 0; k < n; k++) {
                int i = sorted == null ? k : sorted[k];
                if (kept > 0 && time[i] == time[keep[kept - 1]]) {
                    duplicates++;
                    continue;
                }
                keep[kept++] = i;
            }
            if (kept < 2) {
                throw new LogRefusedException("only " + kept + " readable sample time(s): a log needs at least two");
            }
            double t0 = time[keep[0]];
            double[] t = new double[kept];
            for (int k = 0; k < kept; k++) {
                t[k] = time[keep[k]] - t0;
            }
            Map<Channel, double[]> a = new EnumMap<>(Channel.class);
            Map<Channel, byte[]> s = new EnumMap<>(Channel.class);
            for (Channel ch : CHANNELS) {
                if (analog[ch.ordinal()] != null) {
                    a.put(ch, pick(analog[ch.ordinal()], keep, kept));
                }
                if (status[ch.ordinal()] != null) {
                    s.put(ch, pick(status[ch.ordinal()], keep, kept));
                }
            }
            if (zoned && sorted != null) {
                firstOffset = zone.getRules().getOffset(java.time.Instant.ofEpochSecond((long) t0)).getTotalSeconds();
            }
            TimeOrigin origin = header.timeIsIso ? new TimeOrigin(t0, firstOffset, hasOffset || zoned) : null;
            LogSeries series = new LogSeries(t, a, s, origin);
            double median = series.nominalIntervalS();
            if (median > MAX_INTERVAL_S) {
                throw new LogRefusedException(String.format(Locale.ROOT, "samples are %.0f s apart (median): cycle"
                        + " timing needs an interval of 1 s to 5 min", median));
            }
            IntervalStats intervals = IntervalStats.of(t, median, GAP_FACTOR);
            ImportReport report = new ImportReport(delimiter, decimalComma, header.timeIsIso ? "time" : "seconds",
                    hasOffset, header.columns, header.ignored, rowsRead, kept, rejectedCount, rejected, outOfOrder,
                    duplicates, median, intervals.gaps(), intervals.longestGapS(), intervals.irregular(),
                    tempUnit, unitFromHeader, slashed ? order : null, zoned ? zone.getId() : "");
            return new LogImport(series, report);
        }

        /** Stable sort order of the rows by time, or null when they are already in order. */
        private int[] timeOrder() {
            boolean sorted = true;
            for (int i = 1; i < n && sorted; i++) {
                sorted = time[i] >= time[i - 1];
            }
            if (sorted) {
                return null;
            }
            Integer[] idx = new Integer[n];
            for (int i = 0; i < n; i++) {
                idx[i] = i;
            }
            Arrays.sort(idx, (x, y) -> Double.compare(time[x], time[y]));
            int[] out = new int[n];
            for (int i = 0; i < n; i++) {
                out[i] = idx[i];
            }
            return out;
        }
    }

    private static double[] pick(double[] v, int[] keep, int kept) {
        double[] out = new double[kept];
        for (int k = 0; k < kept; k++) {
            out[k] = v[keep[k]];
        }
        return out;
    }

    private static byte[] pick(byte[] v, int[] keep, int kept) {
        byte[] out = new byte[kept];
        for (int k = 0; k < kept; k++) {
            out[k] = v[keep[k]];
        }
        return out;
    }
}
