package app.latentledger.core.visit;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.cycles.Channel;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.RecordLimits;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.units.Quantity;

import java.util.Arrays;
import java.util.Locale;

/**
 * The one validation every way in shares (keypad, command line, bundle, batch, sync, and the
 * {@code visits check} of what is already stored). A record's constructor checks each field on
 * its own; these rules add what needs more than one field or more than one sample: an air stream
 * that exists (a wet bulb above its dry bulb does not), a complete reading set the coil check
 * accepts, the keypad's coil band, and for a log finite samples in range on a time axis that
 * increases within stated bounds. Ranges come from {@link RecordLimits}.
 */
public final class RecordRules {
    private RecordRules() {
    }

    /**
     * Refuses a reading set the keypad would refuse: each air stream must be a possible moist-air
     * state at the set's pressure, the coil temperature must lie in the keypad's band, and a set
     * with airflow must make valid coil-check inputs for its system and site.
     *
     * @throws IllegalArgumentException ({@link InvalidInputException} or
     *                                  {@link app.latentledger.core.records.InvalidRecordException})
     *                                  naming the field, the value and the accepted range
     */
    public static void readingSet(ReadingSet rs, HvacSystem system, Site site) {
        double pressurePa = ReadingSetCheck.pressurePa(rs, site);
        stream("return", rs.returnDryBulb(), rs.returnHumidity(), pressurePa);
        stream("supply", rs.supplyDryBulb(), rs.supplyHumidity(), pressurePa);
        if (rs.outdoorDryBulb() != null && rs.outdoorHumidity() != null) {
            stream("outdoor", rs.outdoorDryBulb(), rs.outdoorHumidity(), pressurePa);
        }
        if (rs.coilTemperature() != null) {
            double c = rs.coilTemperature().value().valueSi();
            if (!(c >= RecordLimits.COIL_MIN_C && c <= RecordLimits.COIL_MAX_C)) {
                throw new InvalidInputException("coil temperature", Quantity.TEMPERATURE, c, RecordLimits.COIL_MIN_C,
                        RecordLimits.COIL_MAX_C, "a cooling coil runs between about −20 °F and 95 °F");
            }
        }
        if (ReadingSetCheck.missing(rs).isEmpty()) {
            ReadingSetCheck.inputs(rs, system, site);
        }
    }

    private static void stream(String where, Measurement dryBulb, HumidityReading h, double pressurePa) {
        new AirReading(where, dryBulb.valueSi(), dryBulb.toleranceSi(), h.kind(), h.value().valueSi(),
                h.value().toleranceSi()).state(pressurePa, HandbookEdition.SI);
    }

    /**
     * What is wrong with one log sample or the log's time axis.
     *
     * @param sample  index of the first offending sample (0 based), or -1 for the log as a whole
     * @param field   the channel name or "time"
     * @param message what is wrong, with the value and the accepted range
     */
    public record LogProblem(int sample, String field, String message) {
    }

    /** The first problem of a log's samples, or null when the log is valid. */
    public static LogProblem logProblem(LogSamples s) {
        int n = s.size();
        if (n > RecordLimits.LOG_MAX_SAMPLES) {
            return new LogProblem(-1, "samples", n + " samples; at most " + RecordLimits.LOG_MAX_SAMPLES);
        }
        if (s.channels().size() > RecordLimits.LOG_MAX_CHANNELS) {
            return new LogProblem(-1, "channels", s.channels().size() + " channels; at most "
                    + RecordLimits.LOG_MAX_CHANNELS);
        }
        LogProblem time = timeProblem(s);
        if (time != null) {
            return time;
        }
        for (LogChannel c : s.channels()) {
            LogProblem p = channelProblem(c);
            if (p != null) {
                return p;
            }
        }
        return null;
    }

    /** Refuses a log with {@link #logProblem}; the message names the sample, field, value and range. */
    public static void log(LogSamples s) {
        LogProblem p = logProblem(s);
        if (p != null) {
            throw new app.latentledger.core.records.InvalidRecordException("log " + p.field(),
                    (p.sample() >= 0 ? "sample " + (p.sample() + 1) + ": " : "") + p.message());
        }
    }

    private static LogProblem timeProblem(LogSamples s) {
        int n = s.size();
        if (n == 0) {
            return new LogProblem(-1, "time", "no samples; a log needs at least two sample times");
        }
        long first = s.timeMs(0);
        long last = s.timeMs(n - 1);
        if (s.timeBase() == TimeBase.EPOCH) {
            for (int i = 0; i < n; i++) {
                long t = s.timeMs(i);
                if (t < RecordLimits.LOG_MIN_EPOCH_MS || t > RecordLimits.LOG_MAX_EPOCH_MS) {
                    return new LogProblem(i, "time", "clock time " + t + " ms refused: accepted range "
                            + RecordLimits.LOG_MIN_EPOCH_MS + " to " + RecordLimits.LOG_MAX_EPOCH_MS
                            + " ms since 1970-01-01 UTC (1970 to 2200)");
                }
            }
        } else if (first < 0) {
            return new LogProblem(0, "time", "elapsed time " + first + " ms refused: elapsed times start at 0 or later");
        }
        // times are non-decreasing (LogSamples), so the span is last - first
        if (last - first > RecordLimits.LOG_MAX_SPAN_MS || last - first < 0) {
            return new LogProblem(n - 1, "time", "the log spans " + (last - first) / 86_400_000L
                    + " days refused: accepted at most " + RecordLimits.LOG_MAX_SPAN_MS / 86_400_000L + " days");
        }
        long[] steps = new long[n - 1];
        int m = 0;
        for (int i = 1; i < n; i++) {
            long d = s.timeMs(i) - s.timeMs(i - 1);
            if (d > 0) {
                steps[m++] = d;
            }
        }
        if (m == 0) {
            return new LogProblem(-1, "time", "fewer than two distinct sample times; a log needs at least two");
        }
        Arrays.sort(steps, 0, m);
        double medianS = (m % 2 == 1 ? steps[m / 2] : (steps[m / 2 - 1] + steps[m / 2]) / 2.0) / 1000.0;
        if (medianS > RecordLimits.LOG_MAX_MEDIAN_INTERVAL_S) {
            return new LogProblem(-1, "time", String.format(Locale.ROOT, "samples %.0f s apart (median) refused:"
                    + " accepted at most %.0f s (cycle timing needs 5 min or less)", medianS,
                    RecordLimits.LOG_MAX_MEDIAN_INTERVAL_S));
        }
        return null;
    }

    private static LogProblem channelProblem(LogChannel c) {
        Channel ch = Channel.ofField(c.name());
        boolean si = ch != null && (c.unit().isEmpty() || c.unit().equals(StoredLogSeries.siUnit(ch)));
        for (int i = 0; i < c.size(); i++) {
            double v = c.value(i);
            if (Double.isNaN(v)) {
                continue; // a missing sample
            }
            if (!Double.isFinite(v)) {
                return new LogProblem(i, c.name(), c.name() + " " + v + " refused: not a finite number");
            }
            if (!si) {
                continue; // a channel the analysis does not read: finite is all that is asked
            }
            if (ch.isStatus()) {
                if (v < RecordLimits.LOG_MIN_STATUS || v > RecordLimits.LOG_MAX_STATUS) {
                    return new LogProblem(i, c.name(), c.name() + " " + v + " refused: a status is 0 (off) to 1 (on)");
                }
            } else if (ch.isTemperature()) {
                if (v < RecordLimits.LOG_MIN_TEMP_C || v > RecordLimits.LOG_MAX_TEMP_C) {
                    return new LogProblem(i, c.name(), new InvalidInputException(c.name(), Quantity.TEMPERATURE, v,
                            RecordLimits.LOG_MIN_TEMP_C, RecordLimits.LOG_MAX_TEMP_C, null).getMessage());
                }
            } else if (v < RecordLimits.LOG_MIN_RH_PCT || v > RecordLimits.LOG_MAX_RH_PCT) {
                return new LogProblem(i, c.name(), new InvalidInputException(c.name(), Quantity.RELATIVE_HUMIDITY, v,
                        RecordLimits.LOG_MIN_RH_PCT, RecordLimits.LOG_MAX_RH_PCT, null).getMessage());
            }
        }
        return null;
    }

    /**
     * Refuses house readings the House screen would refuse: each air reading (weather, return grille,
     * return plenum, attic or crawlspace air) a possible moist-air state at the site's standard
     * pressure (ASHRAE HoF 2017 ch. 1, eq. 3 for the pressure). The runtime fraction's range is its
     * record's own check.
     *
     * @throws InvalidInputException naming the reading, the value and the accepted range
     */
    public static void houseReadings(app.latentledger.core.house.HouseVisitReadings h, Site site) {
        double pressurePa = app.latentledger.core.psychro.StandardAtmosphere.pressurePa(site.elevationM());
        for (AirReading a : new AirReading[] {h.outdoor(), h.grille(), h.plenum(), h.space()}) {
            if (a != null) {
                a.state(pressurePa, HandbookEdition.SI);
            }
        }
    }

    /**
     * Refuses stored log conditions whose airflows lie outside the keypad's airflow range
     * ({@link app.latentledger.core.measure.FieldLimits#AIRFLOW}); a missing airflow (NaN) passes.
     *
     * @return {@code kept}, for chaining; null stays null
     */
    public static app.latentledger.core.records.ImportedLog.KeptConditions keptConditions(
            app.latentledger.core.records.ImportedLog.KeptConditions kept) {
        if (kept != null) {
            if (!Double.isNaN(kept.airflowM3PerS())) {
                app.latentledger.core.measure.FieldLimits.AIRFLOW.check("log airflow", kept.airflowM3PerS());
            }
            if (!Double.isNaN(kept.fanAirflowM3PerS())) {
                app.latentledger.core.measure.FieldLimits.AIRFLOW.check("log fan-only airflow", kept.fanAirflowM3PerS());
            }
        }
        return kept;
    }
}
