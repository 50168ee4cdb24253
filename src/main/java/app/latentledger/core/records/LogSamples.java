package app.latentledger.core.records;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The samples of a logged run: one time axis and any number of channels of equal length.
 *
 * @param timeBase what {@code timesMs} counts from
 * @param timesMs  sample times, ms, non-decreasing (the importer has already sorted and reported)
 * @param channels the columns, names unique
 */
public record LogSamples(TimeBase timeBase, long[] timesMs, List<LogChannel> channels) {
    public LogSamples {
        Check.present("log time base", timeBase);
        timesMs = Check.present("log sample times", timesMs).clone();
        channels = List.copyOf(Check.present("log channels", channels));
        for (int i = 1; i < timesMs.length; i++) {
            if (timesMs[i] < timesMs[i - 1]) {
                throw new InvalidRecordException("log sample times", "sample " + i + " is earlier than the one before");
            }
        }
        Set<String> names = new HashSet<>();
        for (LogChannel c : channels) {
            if (c.size() != timesMs.length) {
                throw new InvalidRecordException("log channel " + c.name(),
                        c.size() + " values for " + timesMs.length + " sample times");
            }
            if (!names.add(c.name())) {
                throw new InvalidRecordException("log channel " + c.name(), "appears twice");
            }
        }
    }

    @Override
    public long[] timesMs() {
        return timesMs.clone();
    }

    public long timeMs(int sample) {
        return timesMs[sample];
    }

    public int size() {
        return timesMs.length;
    }

    public List<String> channelNames() {
        List<String> n = new ArrayList<>();
        channels.forEach(c -> n.add(c.name()));
        return n;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LogSamples s && s.timeBase == timeBase && Arrays.equals(s.timesMs, timesMs)
                && s.channels.equals(channels);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(timesMs) * 31 + channels.hashCode();
    }

    @Override
    public String toString() {
        return "LogSamples[" + timeBase.key() + ", " + timesMs.length + " samples, " + channelNames() + "]";
    }
}
