package app.latentledger.core.cycles;

import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.findings.ThresholdSettings;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds compressor runs and what the blower did in between.
 *
 * <p>Compressor: from the {@code compressor} status column when logged (ground truth; a missing
 * status holds the last one). Otherwise from the supply and return dry bulbs: a start needs the
 * supply to fall {@link Thresholds#SUPPLY_EDGE} below its resting high with a return-minus-supply
 * split above {@link Thresholds#SPLIT_ON}; a stop needs the supply to rise the same amount above its
 * running low, or the split to fall under {@link Thresholds#SPLIT_OFF}. The two-sided rule is the
 * hysteresis; a rise rule is needed besides the split because a wet coil with the blower on keeps the
 * split at several kelvin after the compressor stops (evaporative cooling). Each edge is dated back
 * to where the supply began to move (within {@link Thresholds#EDGE_TOLERANCE} of its high or low),
 * and runs or rests shorter than {@link Thresholds#MIN_RUN_TIME} are merged away. Signatures after
 * docs/methods.md §9.9 (common practice).
 *
 * <p>Blower in the rest: from the {@code fan} column when logged; otherwise judged from 90 s to
 * 10 min into the rest: with the blower on, air passes the stopped coil and any evaporation is
 * adiabatic, so supply enthalpy stays within {@link Thresholds#BLOWER_ENTHALPY_BAND} of the return
 * (supply ≈ return dry bulb on a dry coil, cooler and more humid on a wet one); with the blower off
 * the still supply probe stays colder and drier than that, drifting slowly (docs/methods.md §9.9).
 *
 * <p>A sample interval over {@link Thresholds#GAP_FACTOR} × the log's median breaks the record: a
 * run across it is dropped (its length is unknown) and a rest ends at it. A run still going when
 * the log ends is dropped the same way, and the rest before it ends at its start (it is not rest).
 */
public final class CycleDetector {
    private static final double BLOWER_JUDGE_FROM_S = 90.0;
    private static final double BLOWER_JUDGE_TO_S = 600.0;

    /** Stop index of a run broken by a gap: its start bounds the rest before it, it makes no cycle. */
    private static final int BROKEN = -1;

    private final ThresholdSettings settings;

    public CycleDetector(ThresholdSettings settings) {
        this.settings = settings;
    }

    /** Runs found, in order; only runs whose start and stop were both seen. */
    List<Cycle> detect(LogSeries log, AirSeries air) {
        boolean fromStatus = log.has(Channel.COMPRESSOR);
        List<int[]> runs = fromStatus ? runsFromStatus(log) : runsFromTemperatures(log, air);
        return cycles(log, air, runs, fromStatus);
    }

    double gapS(LogSeries log) {
        return settings.valueSi(Thresholds.GAP_FACTOR) * log.nominalIntervalS();
    }

    /** Index pairs [start, stop) of running samples with both edges seen; -1 marks an unseen edge. */
    private List<int[]> runsFromStatus(LogSeries log) {
        List<int[]> runs = new ArrayList<>();
        double gap = gapS(log);
        int n = log.size();
        byte state = LogSeries.UNKNOWN;
        int start = -1;
        boolean startSeen = false;
        for (int i = 0; i < n; i++) {
            if (i > 0 && log.timeS(i) - log.timeS(i - 1) > gap) {
                if (state == 1 && startSeen) {
                    runs.add(new int[] {start, BROKEN}); // its stop is lost in the gap
                }
                state = LogSeries.UNKNOWN;
            }
            byte s = log.status(Channel.COMPRESSOR, i);
            if (s == LogSeries.UNKNOWN) {
                continue;
            }
            if (state == LogSeries.UNKNOWN) {
                state = s;
                start = i;
                startSeen = false;
                continue;
            }
            if (s == 1 && state == 0) {
                start = i;
                startSeen = true;
            } else if (s == 0 && state == 1 && startSeen) {
                runs.add(new int[] {start, i});
            }
            state = s;
        }
        if (state == 1 && startSeen) {
            runs.add(new int[] {start, BROKEN}); // still running at the log's end: it bounds the rest before it
        }
        return runs;
    }

    private List<int[]> runsFromTemperatures(LogSeries log, AirSeries air) {
        double splitOn = settings.valueSi(Thresholds.SPLIT_ON);
        double splitOff = settings.valueSi(Thresholds.SPLIT_OFF);
        double edgeK = settings.valueSi(Thresholds.SUPPLY_EDGE);
        double tol = settings.valueSi(Thresholds.EDGE_TOLERANCE);
        double gap = gapS(log);
        double[] tr = air.returnDbC;
        double[] ts = air.supplyDbC;
        int n = log.size();
        List<int[]> raw = new ArrayList<>(); // with segment ids to keep merges within one unbroken stretch
        List<Integer> segmentOf = new ArrayList<>();
        int segment = 0;
        final int unknown = 0;
        final int on = 1;
        final int off = 2;
        int state = unknown;
        int phaseStart = 0; // first sample of the current phase (where its extreme is searched from)
        boolean startSeen = false;
        int runStart = -1;
        double extreme = Double.NaN;
        int prev = -1;
        for (int i = 0; i < n; i++) {
            if (Double.isNaN(tr[i]) || Double.isNaN(ts[i])) {
                continue;
            }
            if (prev >= 0 && log.timeS(i) - log.timeS(prev) > gap) {
                if (state == on && startSeen) {
                    raw.add(new int[] {runStart, BROKEN}); // its stop is lost in the gap
                    segmentOf.add(segment);
                }
                state = unknown;
                segment++;
            }
            prev = i;
            double split = tr[i] - ts[i];
            if (state == unknown) {
                state = split > splitOn ? on : off;
                phaseStart = i;
                startSeen = false;
                extreme = ts[i];
                continue;
            }
            if (state == on) {
                extreme = Math.min(extreme, ts[i]);
                if (ts[i] > extreme + edgeK || split < splitOff) {
                    // the last sample still at the low is the moment of the stop: the rise shows one sample later
                    int stop = Math.max(edge(log, ts, phaseStart, i, extreme, tol, false), runStart + 1);
                    if (startSeen) {
                        raw.add(new int[] {runStart, stop});
                        segmentOf.add(segment);
                    }
                    state = off;
                    phaseStart = stop;
                    extreme = max(ts, stop, i);
                }
            } else {
                extreme = Math.max(extreme, ts[i]);
                if (ts[i] < extreme - edgeK && split > splitOn) {
                    int start = edge(log, ts, phaseStart, i, extreme, tol, true);
                    runStart = start;
                    startSeen = true;
                    state = on;
                    phaseStart = start;
                    extreme = min(ts, start, i);
                }
            }
        }
        if (state == on && startSeen) {
            raw.add(new int[] {runStart, BROKEN}); // still running at the log's end: it bounds the rest before it
            segmentOf.add(segment);
        }
        return mergeShort(log, raw, segmentOf);
    }

    /**
     * The sample at which the supply began to leave its low (stop) or high (start) between
     * {@code from} and {@code to}: the straight line through the first two departures beyond tol
     * and 2·tol is run back to zero departure, and the edge is the sample nearest that moment, never
     * after the last sample still within tol. A sudden change gives the last sample within tol; a
     * slow drift (blower off) is dated back to where it began.
     */
    private static int edge(LogSeries log, double[] ts, int from, int to, double extreme, double tol, boolean high) {
        int lastNear = from;
        for (int j = to; j >= from; j--) {
            if (!Double.isNaN(ts[j]) && departure(ts[j], extreme, high) <= tol) {
                lastNear = j;
                break;
            }
        }
        int q = lastNear + 1;
        while (q <= to && Double.isNaN(ts[q])) {
            q++;
        }
        if (q > to) {
            return lastNear;
        }
        double rq = departure(ts[q], extreme, high);
        double t0 = log.timeS(q);
        for (int p = q + 1; p <= to; p++) {
            double rp = Double.isNaN(ts[p]) ? Double.NaN : departure(ts[p], extreme, high);
            if (rp > 2 * tol) {
                if (rp > rq) {
                    t0 = log.timeS(q) - rq * (log.timeS(p) - log.timeS(q)) / (rp - rq);
                }
                break;
            }
        }
        int idx = lastNear;
        while (idx > from && log.timeS(idx) - t0 > 0.5 * (log.timeS(idx) - log.timeS(idx - 1))) {
            idx--;
        }
        return idx;
    }

    private static double departure(double v, double extreme, boolean high) {
        return high ? extreme - v : v - extreme;
    }

    private static double max(double[] v, int from, int to) {
        double m = Double.NEGATIVE_INFINITY;
        for (int j = from; j <= to; j++) {
            if (!Double.isNaN(v[j])) {
                m = Math.max(m, v[j]);
            }
        }
        return m;
    }

    private static double min(double[] v, int from, int to) {
        double m = Double.POSITIVE_INFINITY;
        for (int j = from; j <= to; j++) {
            if (!Double.isNaN(v[j])) {
                m = Math.min(m, v[j]);
            }
        }
        return m;
    }

    /** Joins runs split by a rest shorter than the minimum, then drops runs shorter than it. */
    private List<int[]> mergeShort(LogSeries log, List<int[]> raw, List<Integer> segmentOf) {
        double minRun = settings.valueSi(Thresholds.MIN_RUN_TIME);
        List<int[]> merged = new ArrayList<>();
        int lastSegment = -1;
        for (int k = 0; k < raw.size(); k++) {
            int[] r = raw.get(k);
            int seg = segmentOf.get(k);
            if (!merged.isEmpty() && seg == lastSegment && merged.get(merged.size() - 1)[1] != BROKEN) {
                int[] last = merged.get(merged.size() - 1);
                if (log.timeS(r[0]) - log.timeS(last[1]) < minRun) {
                    last[1] = r[1];
                    continue;
                }
            }
            merged.add(new int[] {r[0], r[1]});
            lastSegment = seg;
        }
        merged.removeIf(r -> r[1] != BROKEN && log.timeS(r[1]) - log.timeS(r[0]) < minRun);
        return merged;
    }

    private List<Cycle> cycles(LogSeries log, AirSeries air, List<int[]> runs, boolean fromStatus) {
        List<Cycle> out = new ArrayList<>();
        double gap = gapS(log);
        int n = log.size();
        for (int k = 0; k < runs.size(); k++) {
            int a = runs.get(k)[0];
            int b = runs.get(k)[1];
            if (b == BROKEN) {
                continue;
            }
            int limit = k + 1 < runs.size() ? runs.get(k + 1)[0] : n;
            int e = b;
            boolean complete = k + 1 < runs.size();
            while (e < limit) {
                if (e > b && log.timeS(e) - log.timeS(e - 1) > gap) {
                    complete = false;
                    break;
                }
                e++;
            }
            double offEndS = e < n && complete ? log.timeS(e) : log.timeS(e - 1);
            double onS = log.timeS(b) - log.timeS(a);
            double offS = offEndS - log.timeS(b);
            BlowerState blower;
            double blowerOnS;
            if (log.has(Channel.FAN)) {
                blowerOnS = fanSeconds(log, b, e, gap);
                blower = Double.isNaN(blowerOnS) ? BlowerState.UNKNOWN
                        : blowerOnS >= 0.5 * offS ? BlowerState.ON : BlowerState.OFF;
            } else {
                blower = inferBlower(log, air, b, e);
                blowerOnS = blower == BlowerState.ON ? offS : blower == BlowerState.OFF ? 0.0 : Double.NaN;
            }
            out.add(new Cycle(a, b, e, log.timeS(a), onS, offS, complete, blower, blowerOnS, fromStatus));
        }
        return out;
    }

    /** Seconds with the fan status on over [from, to); NaN when most of it is unknown. */
    private static double fanSeconds(LogSeries log, int from, int to, double gap) {
        double onS = 0;
        double knownS = 0;
        double totalS = 0;
        for (int i = from; i < to; i++) {
            double dt = i + 1 < log.size() ? log.timeS(i + 1) - log.timeS(i) : 0;
            if (dt > gap) {
                dt = 0;
            }
            totalS += dt;
            byte s = log.status(Channel.FAN, i);
            if (s != LogSeries.UNKNOWN) {
                knownS += dt;
                if (s == 1) {
                    onS += dt;
                }
            }
        }
        return totalS > 0 && knownS < 0.5 * totalS ? Double.NaN : onS;
    }

    private BlowerState inferBlower(LogSeries log, AirSeries air, int from, int to) {
        if (!air.humidity) {
            return BlowerState.UNKNOWN;
        }
        double band = settings.valueSi(Thresholds.BLOWER_ENTHALPY_BAND);
        double t0 = log.timeS(from);
        double[] dh = new double[Math.max(0, to - from)];
        int m = 0;
        for (int i = from; i < to; i++) {
            double s = log.timeS(i) - t0;
            if (s < BLOWER_JUDGE_FROM_S || s > BLOWER_JUDGE_TO_S) {
                continue;
            }
            double d = air.supplyH[i] - air.returnH[i];
            if (!Double.isNaN(d)) {
                dh[m++] = d;
            }
        }
        if (m < 2) {
            return BlowerState.UNKNOWN;
        }
        double median = Stats.median(dh, m);
        if (Math.abs(median) <= band) {
            return BlowerState.ON;
        }
        return median < -band ? BlowerState.OFF : BlowerState.UNKNOWN;
    }
}
