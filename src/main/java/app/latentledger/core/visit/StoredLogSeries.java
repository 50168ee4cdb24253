package app.latentledger.core.visit;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.TimeOrigin;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;

import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * A stored log ({@link LogSamples}, as the ledger keeps it) as the cycle analysis reads it
 * ({@link LogSeries}), and back. The one place the two meet, so the app, the report and the
 * commands analyse a stored log the same way.
 *
 * <p>Rules: channels are matched by their generic-layout field name ({@link Channel#ofField});
 * an analog channel must be in the SI unit the analysis expects (°C, %; an empty unit is taken as
 * SI, as {@link LogChannel} documents), anything else is left out and named in {@link #ignored}.
 * Status columns read 1 when ≥ 0.5, 0 below, unknown when missing (NaN). A sample whose time
 * repeats the one before is dropped (the analysis needs strictly increasing times; the importer
 * drops such rows the same way).
 *
 * @param series  the log as the analysis reads it
 * @param ignored channels left out, each with why
 */
public record StoredLogSeries(LogSeries series, List<String> ignored) {
    public StoredLogSeries {
        ignored = List.copyOf(ignored);
    }

    /**
     * @param samples the stored samples
     * @param shownAt UTC offset to show clock times at (the visit's offset); null shows the stored
     *                clock as it is. Only used for {@link TimeBase#EPOCH} logs.
     * @throws IllegalArgumentException with fewer than two distinct sample times
     */
    public static StoredLogSeries of(LogSamples samples, ZoneOffset shownAt) {
        long[] ms = samples.timesMs();
        int n = ms.length;
        int[] keep = new int[n];
        int kept = 0;
        for (int i = 0; i < n; i++) {
            if (kept == 0 || ms[i] > ms[keep[kept - 1]]) {
                keep[kept++] = i;
            }
        }
        if (kept < 2) {
            throw new IllegalArgumentException("the log has " + kept + " distinct sample time(s); at least 2 are needed");
        }
        double[] t = new double[kept];
        for (int k = 0; k < kept; k++) {
            t[k] = (ms[keep[k]] - ms[keep[0]]) / 1000.0;
        }
        Map<Channel, double[]> analog = new EnumMap<>(Channel.class);
        Map<Channel, byte[]> status = new EnumMap<>(Channel.class);
        List<String> ignored = new ArrayList<>();
        for (LogChannel c : samples.channels()) {
            Channel ch = Channel.ofField(c.name());
            if (ch == null) {
                ignored.add(c.name() + ": not a field the analysis reads");
                continue;
            }
            if (ch.isStatus()) {
                byte[] v = new byte[kept];
                for (int k = 0; k < kept; k++) {
                    double x = c.value(keep[k]);
                    v[k] = Double.isNaN(x) ? LogSeries.UNKNOWN : x >= 0.5 ? (byte) 1 : (byte) 0;
                }
                status.put(ch, v);
                continue;
            }
            String expected = siUnit(ch);
            if (!c.unit().isEmpty() && !c.unit().equals(expected)) {
                ignored.add(c.name() + ": stored in '" + c.unit() + "', the analysis reads " + expected);
                continue;
            }
            double[] v = new double[kept];
            for (int k = 0; k < kept; k++) {
                v[k] = c.value(keep[k]);
            }
            analog.put(ch, v);
        }
        TimeOrigin origin = null;
        if (samples.timeBase() == TimeBase.EPOCH) {
            double first = ms[keep[0]] / 1000.0;
            origin = shownAt == null ? new TimeOrigin(first, 0, false)
                    : new TimeOrigin(first, shownAt.getTotalSeconds(), true);
        }
        return new StoredLogSeries(new LogSeries(t, analog, status, origin), ignored);
    }

    /**
     * The samples to store for an analysed series: times in ms (epoch when the series has a clock
     * origin, else elapsed), channels by field name in SI, status as 1/0/NaN.
     */
    public static LogSamples samples(LogSeries series) {
        int n = series.size();
        TimeOrigin origin = series.origin();
        long base = origin == null ? 0 : Math.round(origin.firstEpochSecond() * 1000);
        long[] ms = new long[n];
        for (int i = 0; i < n; i++) {
            ms[i] = base + Math.round(series.timeS(i) * 1000);
        }
        List<LogChannel> channels = new ArrayList<>();
        for (Channel ch : series.channels()) {
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                if (ch.isStatus()) {
                    byte b = series.status(ch, i);
                    v[i] = b == LogSeries.UNKNOWN ? Double.NaN : b;
                } else {
                    v[i] = series.value(ch, i);
                }
            }
            channels.add(new LogChannel(ch.field(), siUnit(ch), v));
        }
        return new LogSamples(origin == null ? TimeBase.ELAPSED : TimeBase.EPOCH, ms, channels);
    }

    /** The SI unit a stored channel carries: "°C", "%" or "on/off". */
    static String siUnit(Channel ch) {
        if (ch.isStatus()) {
            return "on/off";
        }
        return ch.isTemperature() ? "°C" : "%";
    }
}
