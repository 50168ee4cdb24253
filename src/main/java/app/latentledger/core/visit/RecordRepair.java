package app.latentledger.core.visit;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;

import java.util.ArrayList;
import java.util.List;

/**
 * Repairs a stored record that fails today's {@link RecordRules} where that can be done without
 * inventing a reading: a value that may be missing is made missing. A log sample out of range or
 * not finite becomes a missing sample (NaN, as a logger gap); a reading set's coil temperature
 * outside the keypad's band, or an outdoor humidity that makes no possible air, is removed. A
 * record whose required readings or time axis fail cannot be repaired this way; it is reported
 * for removal instead.
 */
public final class RecordRepair {
    private RecordRepair() {
    }

    /** A repaired record and what was changed, or null record when it cannot be repaired. */
    public record Outcome<T>(T repaired, List<String> changes) {
    }

    /** The log with failing values made missing; null when its time axis or size fails. */
    public static Outcome<LogSamples> log(LogSamples s) {
        RecordRules.LogProblem first = RecordRules.logProblem(s);
        if (first == null) {
            return new Outcome<>(s, List.of());
        }
        if (first.field().equals("time") || first.field().equals("samples") || first.field().equals("channels")) {
            return new Outcome<>(null, List.of(first.message()));
        }
        List<String> changes = new ArrayList<>();
        List<LogChannel> channels = new ArrayList<>();
        for (LogChannel c : s.channels()) {
            double[] v = c.values();
            int blanked = 0;
            for (int i = 0; i < v.length; i++) {
                if (!Double.isNaN(v[i]) && RecordRules.logProblem(one(s, c, v[i])) != null) {
                    v[i] = Double.NaN;
                    blanked++;
                }
            }
            if (blanked > 0) {
                changes.add(c.name() + ": " + blanked + " sample(s) outside the accepted range made missing");
            }
            channels.add(new LogChannel(c.name(), c.unit(), v));
        }
        LogSamples repaired = new LogSamples(s.timeBase(), s.timesMs(), channels);
        RecordRules.LogProblem left = RecordRules.logProblem(repaired);
        return left == null ? new Outcome<>(repaired, changes) : new Outcome<>(null, List.of(left.message()));
    }

    /** A two-sample log holding one value, to ask the rules about that value alone. */
    private static LogSamples one(LogSamples s, LogChannel c, double value) {
        return new LogSamples(s.timeBase(), new long[] {s.timeMs(0), s.timeMs(0) + 1000},
                List.of(new LogChannel(c.name(), c.unit(), new double[] {value, value})));
    }

    /** The reading set without the optional parts that fail; null when a required part fails. */
    public static Outcome<ReadingSet> readingSet(ReadingSet rs, HvacSystem system, Site site) {
        List<String> changes = new ArrayList<>();
        ReadingSet current = rs;
        for (int attempt = 0; attempt < 3; attempt++) {
            try {
                RecordRules.readingSet(current, system, site);
                return new Outcome<>(current, changes);
            } catch (IllegalArgumentException e) {
                String m = String.valueOf(e.getMessage());
                if (current.coilTemperature() != null && m.startsWith("coil temperature")) {
                    changes.add("coil temperature removed (" + m + ")");
                    current = with(current, false, true);
                } else if (current.outdoorHumidity() != null && m.startsWith("outdoor")) {
                    changes.add("outdoor humidity removed (" + m + ")");
                    current = with(current, true, false);
                } else {
                    return new Outcome<>(null, List.of(m));
                }
            }
        }
        return new Outcome<>(null, changes);
    }

    private static ReadingSet with(ReadingSet r, boolean keepCoil, boolean keepOutdoorHumidity) {
        return new ReadingSet(r.id(), r.visitId(), r.takenAt(), r.label(), r.instrument(), r.returnDryBulb(),
                r.returnHumidity(), r.supplyDryBulb(), r.supplyHumidity(), r.outdoorDryBulb(),
                keepOutdoorHumidity ? r.outdoorHumidity() : null, keepCoil ? r.coilTemperature() : null, r.airflow(),
                r.stationPressurePa(), r.condensate(), r.notes());
    }
}
