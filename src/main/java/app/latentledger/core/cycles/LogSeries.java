package app.latentledger.core.cycles;

import java.util.EnumMap;
import java.util.Map;
import java.util.Set;

/**
 * A data-logger record in columns: strictly increasing sample times and one array per channel,
 * SI, NaN for a missing reading; status channels as bytes (1 on, 0 off, {@link #UNKNOWN}).
 * Columns rather than row objects keep a week at 1 s (604 800 rows) small and fast to scan.
 * Arrays are copied in and never handed out, so a series cannot change once made.
 */
public final class LogSeries {
    /** Status value for a sample whose status was not logged. */
    public static final byte UNKNOWN = -1;

    private final double[] timeS;
    private final Map<Channel, double[]> analog;
    private final Map<Channel, byte[]> status;
    private final TimeOrigin origin;
    private final double nominalIntervalS;

    /**
     * @param timeS  seconds since the first sample (first value 0), strictly increasing
     * @param analog analog channels, each as long as {@code timeS}
     * @param status status channels (COMPRESSOR, FAN), each as long as {@code timeS}
     * @param origin clock time of the first sample, or null for an elapsed-seconds log
     */
    public LogSeries(double[] timeS, Map<Channel, double[]> analog, Map<Channel, byte[]> status, TimeOrigin origin) {
        int n = timeS.length;
        for (int i = 1; i < n; i++) {
            if (!(timeS[i] > timeS[i - 1])) {
                throw new IllegalArgumentException("sample times must increase: row " + i);
            }
        }
        this.timeS = timeS.clone();
        this.analog = new EnumMap<>(Channel.class);
        this.status = new EnumMap<>(Channel.class);
        analog.forEach((c, v) -> {
            if (c.isStatus() || v.length != n) {
                throw new IllegalArgumentException(c + ": not an analog channel of " + n + " samples");
            }
            this.analog.put(c, v.clone());
        });
        status.forEach((c, v) -> {
            if (!c.isStatus() || v.length != n) {
                throw new IllegalArgumentException(c + ": not a status channel of " + n + " samples");
            }
            this.status.put(c, v.clone());
        });
        this.origin = origin;
        this.nominalIntervalS = medianInterval(this.timeS);
    }

    public int size() {
        return timeS.length;
    }

    /** Seconds since the first sample. */
    public double timeS(int i) {
        return timeS[i];
    }

    public double durationS() {
        return timeS.length == 0 ? 0 : timeS[timeS.length - 1] - timeS[0];
    }

    public boolean has(Channel c) {
        return c.isStatus() ? status.containsKey(c) : analog.containsKey(c);
    }

    public Set<Channel> channels() {
        java.util.EnumSet<Channel> s = java.util.EnumSet.noneOf(Channel.class);
        s.addAll(analog.keySet());
        s.addAll(status.keySet());
        return s;
    }

    /** Analog reading, SI, or NaN when missing or the channel was not logged. */
    public double value(Channel c, int i) {
        double[] v = analog.get(c);
        return v == null ? Double.NaN : v[i];
    }

    /** Status 1 / 0, or {@link #UNKNOWN}. */
    public byte status(Channel c, int i) {
        byte[] v = status.get(c);
        return v == null ? UNKNOWN : v[i];
    }

    /** Clock time of the first sample, or null for elapsed-seconds logs. */
    public TimeOrigin origin() {
        return origin;
    }

    /** Median sample interval, s (NaN with fewer than two samples). */
    public double nominalIntervalS() {
        return nominalIntervalS;
    }

    private static double medianInterval(double[] t) {
        if (t.length < 2) {
            return Double.NaN;
        }
        double[] d = new double[t.length - 1];
        for (int i = 1; i < t.length; i++) {
            d[i - 1] = t[i] - t[i - 1];
        }
        return Stats.median(d, d.length);
    }

    @Override
    public String toString() {
        return "LogSeries[" + size() + " samples, " + channels() + ", interval " + nominalIntervalS + " s]"
                + (origin == null ? "" : " from " + origin.label(0));
    }
}
