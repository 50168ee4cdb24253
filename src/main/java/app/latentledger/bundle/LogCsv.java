package app.latentledger.bundle;

import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
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

    /** Reads samples back; channel names and units come from logs.json and must match the header. */
    static LogSamples read(String csv, String entry, TimeBase base, List<String> names, List<String> units, int size)
            throws BundleException {
        long[] times = new long[size];
        double[][] columns = new double[names.size()][size];
        try (BufferedReader in = new BufferedReader(new StringReader(csv))) {
            String header = in.readLine();
            String expected = "time_ms" + (names.isEmpty() ? "" : "," + String.join(",", names));
            if (!expected.equals(header)) {
                throw new BundleException(entry + ": header is '" + header + "', expected '" + expected + "'");
            }
            int i = 0;
            for (String line = in.readLine(); line != null; line = in.readLine(), i++) {
                if (i >= size) {
                    throw new BundleException(entry + ": more than the " + size + " samples logs.json lists");
                }
                String[] cells = line.split(",", -1);
                if (cells.length != names.size() + 1) {
                    throw new BundleException(entry + " line " + (i + 2) + ": " + cells.length + " cells, expected "
                            + (names.size() + 1));
                }
                try {
                    times[i] = Long.parseLong(cells[0]);
                    for (int c = 0; c < names.size(); c++) {
                        columns[c][i] = cells[c + 1].isEmpty() ? Double.NaN : Double.parseDouble(cells[c + 1]);
                    }
                } catch (NumberFormatException e) {
                    throw new BundleException(entry + " line " + (i + 2) + ": not a number (" + e.getMessage() + ")");
                }
            }
            if (i != size) {
                throw new BundleException(entry + ": " + i + " samples, logs.json lists " + size);
            }
        } catch (IOException e) {
            throw new BundleException(entry + ": " + e.getMessage(), e);
        }
        List<LogChannel> channels = new ArrayList<>();
        for (int c = 0; c < names.size(); c++) {
            channels.add(new LogChannel(names.get(c), units.get(c), columns[c]));
        }
        try {
            return new LogSamples(base, times, channels);
        } catch (IllegalArgumentException e) {
            throw new BundleException(entry + ": " + e.getMessage(), e);
        }
    }
}
