package app.latentledger.bundle;

import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;

import app.latentledger.core.records.RecordLimits;
import app.latentledger.core.text.TerminalText;
import app.latentledger.core.visit.RecordRules;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * {@code logs/<id>.csv}: the samples of one log. Header {@code time_ms,<channel>,…}; one row per
 * sample; SI values, empty cell for a missing sample. Channel names are the log's field names
 * (letters, digits, '_'), so no quoting is ever needed.
 */
final class LogCsv {
    private LogCsv() {
    }

    static String entry(String logId) {
        return "logs/" + logId + ".csv";
    }

    static String write(LogSamples s) {
        StringBuilder b = new StringBuilder(s.size() * 16 * (1 + s.channels().size()));
        b.append("time_ms");
        for (LogChannel c : s.channels()) {
            b.append(',').append(c.name());
        }
        b.append('\n');
        List<double[]> columns = new ArrayList<>();
        s.channels().forEach(c -> columns.add(c.values()));
        long[] times = s.timesMs();
        for (int i = 0; i < times.length; i++) {
            b.append(times[i]);
            for (double[] column : columns) {
                b.append(',');
                if (!Double.isNaN(column[i])) {
                    b.append(column[i]);
                }
            }
            b.append('\n');
        }
        return b.toString();
    }

    /**
     * Reads samples back from the entry's text as it is inflated. Channel names and units come
     * from logs.json and must match the header. Arrays grow with the rows actually read (the count
     * logs.json declares is only compared at the end, never used to size anything), rows and lines
     * are capped, and only numbers in the form the writer uses are accepted (no NaN, Infinity or
     * hex). The samples then pass the same checks as every stored log ({@link RecordRules#log}).
     *
     * @param budget samples the rest of the bundle may still hold; reduced by this log's
     */
    static LogSamples read(Reader text, String entry, TimeBase base, List<String> names, List<String> units,
                           int declared, long[] budget) throws BundleException, IOException {
        if (declared > RecordLimits.LOG_MAX_SAMPLES) {
            throw new BundleException(BundleFormat.LOGS + ": log " + entry + " declares " + declared
                    + " samples; at most " + RecordLimits.LOG_MAX_SAMPLES + " are accepted");
        }
        if (names.size() > RecordLimits.LOG_MAX_CHANNELS) {
            throw new BundleException(entry + ": " + names.size() + " channels; at most " + RecordLimits.LOG_MAX_CHANNELS);
        }
        int capacity = 1024;
        long[] times = new long[capacity];
        double[][] columns = new double[names.size()][capacity];
        Lines in = new Lines(text, entry);
        String header = in.next();
        String expected = "time_ms" + (names.isEmpty() ? "" : "," + String.join(",", names));
        if (!expected.equals(header)) {
            throw new BundleException(entry + ": header is '" + shown(header) + "', expected '" + expected + "'");
        }
        int i = 0;
        for (String line = in.next(); line != null; line = in.next(), i++) {
            if (i >= declared) {
                throw new BundleException(entry + ": more than the " + declared + " samples logs.json lists");
            }
            if (--budget[0] < 0) {
                throw new BundleException(entry + ": the bundle holds more than " + RecordLimits.BUNDLE_MAX_SAMPLES
                        + " log samples in all; at most that many are imported at once");
            }
            if (i == capacity) {
                capacity = (int) Math.min((long) capacity * 2, RecordLimits.LOG_MAX_SAMPLES);
                times = Arrays.copyOf(times, capacity);
                for (int c = 0; c < columns.length; c++) {
                    columns[c] = Arrays.copyOf(columns[c], capacity);
                }
            }
            String[] cells = line.split(",", -1);
            if (cells.length != names.size() + 1) {
                throw new BundleException(entry + " line " + (i + 2) + ": " + cells.length + " cells, expected "
                        + (names.size() + 1));
            }
            try {
                times[i] = Long.parseLong(cells[0]);
            } catch (NumberFormatException e) {
                throw new BundleException(entry + " line " + (i + 2) + ": time_ms '" + shown(cells[0])
                        + "' is not a whole number of milliseconds");
            }
            for (int c = 0; c < names.size(); c++) {
                columns[c][i] = number(cells[c + 1], entry, i + 2, names.get(c));
            }
        }
        if (i != declared) {
            throw new BundleException(entry + ": " + i + " samples, logs.json lists " + declared);
        }
        List<LogChannel> channels = new ArrayList<>();
        for (int c = 0; c < names.size(); c++) {
            channels.add(new LogChannel(names.get(c), units.get(c), Arrays.copyOf(columns[c], i)));
        }
        LogSamples samples;
        try {
            samples = new LogSamples(base, Arrays.copyOf(times, i), channels);
        } catch (IllegalArgumentException e) {
            throw new BundleException(entry + ": " + e.getMessage(), e);
        }
        RecordRules.LogProblem p = RecordRules.logProblem(samples);
        if (p != null) {
            throw new BundleException(entry + (p.sample() >= 0 ? " line " + (p.sample() + 2) : "") + ": "
                    + p.message());
        }
        return samples;
    }

    /** A value as the writer writes it ({@code Double.toString}): digits, '.', 'E', '-'; empty = missing. */
    private static double number(String cell, String entry, int line, String channel) throws BundleException {
        if (cell.isEmpty()) {
            return Double.NaN;
        }
        for (int k = 0; k < cell.length(); k++) {
            char ch = cell.charAt(k);
            if (!(ch >= '0' && ch <= '9' || ch == '.' || ch == 'E' || ch == '-')) {
                throw new BundleException(entry + " line " + line + ": " + channel + " '" + shown(cell)
                        + "' is not a number (decimal digits only; no NaN, Infinity or hex)");
            }
        }
        try {
            return Double.parseDouble(cell);
        } catch (NumberFormatException e) {
            throw new BundleException(entry + " line " + line + ": " + channel + " '" + shown(cell) + "' is not a number");
        }
    }

    private static String shown(String s) {
        if (s == null) {
            return "(none)";
        }
        String cut = s.length() > 40 ? s.substring(0, 40) + "…" : s;
        return TerminalText.escape(cut);
    }

    /** Physical lines ('\n', "\r\n" or '\r'), each at most {@link BundleFormat#MAX_LOG_LINE_CHARS} long. */
    private static final class Lines {
        private final Reader in;
        private final String entry;
        private final StringBuilder b = new StringBuilder();
        private int pending = -2;
        private long number;

        Lines(Reader in, String entry) {
            this.in = in;
            this.entry = entry;
        }

        String next() throws IOException, BundleException {
            b.setLength(0);
            int c = pending != -2 ? pending : in.read();
            pending = -2;
            if (c == -1) {
                return null;
            }
            number++;
            while (c != -1 && c != '\n' && c != '\r') {
                if (b.length() >= BundleFormat.MAX_LOG_LINE_CHARS) {
                    throw new BundleException(entry + " line " + number + ": longer than "
                            + BundleFormat.MAX_LOG_LINE_CHARS + " characters; not a row of samples");
                }
                b.append((char) c);
                c = in.read();
            }
            if (c == '\r') {
                int d = in.read();
                if (d != '\n') {
                    pending = d;
                }
            }
            return b.toString();
        }
    }
}
